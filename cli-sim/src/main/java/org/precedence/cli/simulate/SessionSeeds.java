package org.precedence.cli.simulate;

import java.nio.ByteBuffer;
import org.precedence.api.SessionSeed;

/**
 * How one simulation seed becomes one seed per session. Session 0 uses the given seed itself,
 * so its rounds can be replayed with the other commands; session {@code i ≥ 1} uses
 * {@code SessionSeed.fromText(hex + "/session/" + i)} where {@code hex} is the given seed's
 * 64 hex digits. Distinct sessions therefore get unrelated seeds (SHA-256 of distinct texts).
 */
final class SessionSeeds {
    private SessionSeeds() {
    }

    /** Returns the seed of session {@code session}. */
    static SessionSeed of(SessionSeed master, long session) {
        if (session < 0) {
            throw new IllegalArgumentException("session must be >= 0, got " + session);
        }
        return session == 0 ? master : SessionSeed.fromText(master.toHex() + "/session/" + session);
    }

    /** Returns the seed's first 16 bytes as two longs (big-endian), to seed a library generator. */
    static long[] twoLongs(SessionSeed seed) {
        ByteBuffer b = ByteBuffer.wrap(seed.bytes());
        return new long[] {b.getLong(), b.getLong()};
    }
}
