package org.precedence.runtime.randomness;

import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.Objects;
import org.precedence.api.RandomnessMode;
import org.precedence.api.SessionSeed;

/**
 * A keyed block function from a 256-bit counter to four 64-bit words: the only source of
 * randomness behind a roll.
 *
 * <p>The counter is four 64-bit words {@code (c0, c1, c2, c3)}; see {@link #word} for how a
 * (draw index, stream, player, digit, attempt) tuple is laid out in it. The key is derived
 * from the session seed and the algorithm id:
 * {@code K = SHA-256(UTF-8(algorithmId) || 0x00 || seed)}, so the two modes never share a key
 * and a key exposed by fast-mode output reveals neither the seed nor the secure-mode key.
 *
 * <p>Instances are immutable and thread-safe.
 */
public abstract class RollGenerator {
    /** Algorithm id of the fast mode; recorded in every log. */
    public static final String FAST_ID = "precedence-roll-v1/philox4x64";
    /** Algorithm id of the secure mode; recorded in every log. */
    public static final String SECURE_ID = "precedence-roll-v1/hmac-sha256";

    /** Players served by one block: the low two bits of the player index pick the word. */
    public static final int LANES = 4;

    RollGenerator() {
    }

    /** Returns the generator of {@code mode} keyed by {@code seed}. */
    public static RollGenerator of(RandomnessMode mode, SessionSeed seed) {
        Objects.requireNonNull(mode, "mode");
        Objects.requireNonNull(seed, "seed");
        return switch (mode) {
            case FAST -> PhiloxGenerator.fromKeyBytes(deriveKey(FAST_ID, seed));
            case SECURE -> new HmacGenerator(deriveKey(SECURE_ID, seed));
        };
    }

    /** Returns the algorithm id of {@code mode}. */
    public static String algorithmId(RandomnessMode mode) {
        return Objects.requireNonNull(mode, "mode") == RandomnessMode.FAST ? FAST_ID : SECURE_ID;
    }

    /** Returns the mode whose algorithm id is {@code id}, or null if the id is unknown. */
    public static RandomnessMode modeOf(String id) {
        if (FAST_ID.equals(id)) {
            return RandomnessMode.FAST;
        }
        return SECURE_ID.equals(id) ? RandomnessMode.SECURE : null;
    }

    /** Returns {@code SHA-256(UTF-8(algorithmId) || 0x00 || seed bytes)}. */
    static byte[] deriveKey(String algorithmId, SessionSeed seed) {
        try {
            MessageDigest sha = MessageDigest.getInstance("SHA-256");
            sha.update(algorithmId.getBytes(StandardCharsets.UTF_8));
            sha.update((byte) 0);
            sha.update(seed.bytes());
            return sha.digest();
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("every Java platform must provide SHA-256", e);
        }
    }

    /** Returns this generator's algorithm id. */
    public abstract String algorithmId();

    /**
     * Writes the four words of the block at counter {@code (c0, c1, c2, c3)} into
     * {@code out[0..3]}.
     */
    public abstract void block(long c0, long c1, long c2, long c3, long[] out);

    /** Returns a new per-thread cursor over this generator's blocks (same words, maybe cheaper). */
    public BlockCursor cursor() {
        return new BlockCursor.Direct(this);
    }

    /**
     * Returns counter word {@code c1} for a stream and player: the stream in the high 32 bits,
     * the player's lane group ({@code player >>> 2}) in the low 32 bits.
     */
    public static long groupWord(int stream, int player) {
        return ((long) stream << 32) | (player >>> 2);
    }

    /**
     * Returns the word for one draw: word {@code player & 3} of the block at counter
     * {@code (index, groupWord(stream, player), digit, attempt)}.
     *
     * @param index   the draw index (a round, or a block of rounds, depending on the stream)
     * @param stream  which kind of draw (see {@code docs/roll-spec.md}); 0 ≤ stream
     * @param player  the player (die) index, ≥ 0
     * @param digit   the face digit, ≥ 0
     * @param attempt the attempt counter of the rejection sampler, ≥ 0
     */
    public long word(long index, int stream, int player, int digit, long attempt) {
        long[] out = new long[LANES];
        block(index, groupWord(stream, player), digit, attempt, out);
        return out[player & 3];
    }
}
