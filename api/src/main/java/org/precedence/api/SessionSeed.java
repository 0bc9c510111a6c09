package org.precedence.api;

import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.security.SecureRandom;
import java.util.Arrays;
import java.util.HexFormat;
import java.util.Objects;

/**
 * The secret from which every round of a session is derived: 32 bytes (256 bits).
 *
 * <p>A seed is made in one of three ways, all specified exactly so that ports agree:
 * <ul>
 *   <li>{@link #random()}: 32 bytes from {@link SecureRandom} (the default for live play);</li>
 *   <li>{@link #fromText(String)}: SHA-256 (FIPS 180-4) of the UTF-8 bytes of
 *       {@code "precedence-seed-v1:" + text}, for reproducible sessions named by a phrase or
 *       a number written in decimal;</li>
 *   <li>{@link #fromHex(String)}: exactly 64 hexadecimal digits, taken as the bytes.</li>
 * </ul>
 * {@link #parse(String)} accepts {@code hex:} followed by 64 hex digits, or any other
 * non-blank text.
 */
public final class SessionSeed {
    /** Length of every seed in bytes. */
    public static final int BYTES = 32;
    private static final String TEXT_PREFIX = "precedence-seed-v1:";
    private static final HexFormat HEX = HexFormat.of();

    private final byte[] bytes;

    private SessionSeed(byte[] bytes) {
        this.bytes = bytes;
    }

    /** Returns a fresh seed from the platform's strong {@link SecureRandom}. */
    public static SessionSeed random() {
        byte[] b = new byte[BYTES];
        new SecureRandom().nextBytes(b);
        return new SessionSeed(b);
    }

    /** Wraps exactly {@value #BYTES} bytes (copied). */
    public static SessionSeed ofBytes(byte[] bytes) {
        Objects.requireNonNull(bytes, "bytes");
        if (bytes.length != BYTES) {
            throw new IllegalArgumentException(
                    "a session seed has exactly " + BYTES + " bytes, got " + bytes.length);
        }
        return new SessionSeed(bytes.clone());
    }

    /** Derives a seed from a phrase or decimal number; the same text always gives the same seed. */
    public static SessionSeed fromText(String text) {
        Objects.requireNonNull(text, "text");
        if (text.isBlank()) {
            throw new IllegalArgumentException("a seed text must not be blank");
        }
        return new SessionSeed(sha256((TEXT_PREFIX + text).getBytes(StandardCharsets.UTF_8)));
    }

    /** Reads exactly 64 hexadecimal digits (either case). */
    public static SessionSeed fromHex(String hex) {
        Objects.requireNonNull(hex, "hex");
        if (hex.length() != 2 * BYTES) {
            throw new IllegalArgumentException("a hex seed has exactly " + (2 * BYTES)
                    + " hexadecimal digits, got " + hex.length());
        }
        for (int i = 0; i < hex.length(); i++) {
            if (Character.digit(hex.charAt(i), 16) < 0) {
                // The text may be a secret: name the position, not the digits.
                throw new IllegalArgumentException("a hex seed may only contain 0-9 and a-f; character "
                        + (i + 1) + " is not a hexadecimal digit");
            }
        }
        return new SessionSeed(HEX.parseHex(hex));
    }

    /** Derives a seed from a number: the same as {@link #fromText} of its decimal form. */
    public static SessionSeed fromNumber(long number) {
        return fromText(Long.toString(number));
    }

    /** Reads {@code hex:<64 hex digits>} as raw bytes, anything else as {@link #fromText text}. */
    public static SessionSeed parse(String spec) {
        Objects.requireNonNull(spec, "spec");
        if (spec.startsWith("hex:")) {
            return fromHex(spec.substring(4));
        }
        return fromText(spec);
    }

    /** Returns a copy of the seed bytes. */
    public byte[] bytes() {
        return bytes.clone();
    }

    /** Returns the seed as 64 lowercase hexadecimal digits. */
    public String toHex() {
        return HEX.formatHex(bytes);
    }

    /**
     * Returns the commitment published before play: SHA-256 of the 32 seed bytes, as 64
     * lowercase hex digits. Revealing the seed afterwards lets anyone check it.
     */
    public String commitment() {
        return HEX.formatHex(sha256(bytes));
    }

    /** Returns whether {@code commitmentHex} is this seed's {@link #commitment()} (case-insensitive). */
    public boolean matchesCommitment(String commitmentHex) {
        Objects.requireNonNull(commitmentHex, "commitmentHex");
        return MessageDigest.isEqual(commitment().getBytes(StandardCharsets.US_ASCII),
                commitmentHex.toLowerCase(java.util.Locale.ROOT).getBytes(StandardCharsets.US_ASCII));
    }

    private static byte[] sha256(byte[] data) {
        try {
            return MessageDigest.getInstance("SHA-256").digest(data);
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("every Java platform must provide SHA-256", e);
        }
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof SessionSeed other && MessageDigest.isEqual(bytes, other.bytes);
    }

    @Override
    public int hashCode() {
        return Arrays.hashCode(bytes);
    }

    /** Never prints the secret; shows the commitment instead. */
    @Override
    public String toString() {
        return "SessionSeed[commitment=" + commitment() + "]";
    }
}
