package org.precedence.game.bots;

import java.nio.ByteBuffer;
import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import org.precedence.api.SessionSeed;
import org.precedence.game.MoveChooser;

/** Makes bots. */
public final class Bots {
    private Bots() {
    }

    /** Returns the harbour-racer bot: lights what it reaches, sails for the brightest dark lantern. */
    public static MoveChooser racer(long botSeed) {
        return new RacerBot(botSeed);
    }

    /**
     * Derives the bots' seed from the session seed: the first 8 bytes (big-endian) of SHA-256
     * over {@code "shoal-lights-bots-v1:"} followed by the seed's 32 bytes. Hashing keeps the
     * session seed itself out of the bots' choices.
     */
    public static long seedFor(SessionSeed seed) {
        try {
            MessageDigest sha = MessageDigest.getInstance("SHA-256");
            sha.update("shoal-lights-bots-v1:".getBytes(StandardCharsets.US_ASCII));
            sha.update(seed.bytes());
            return ByteBuffer.wrap(sha.digest()).getLong();
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("every Java platform must provide SHA-256", e);
        }
    }
}
