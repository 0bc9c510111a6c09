package org.precedence.runtime.randomness;

import java.math.BigInteger;
import java.util.Objects;

/**
 * Exactly uniform integers in {@code [0, radix)} from uniform 64-bit words, by rejection; the
 * attempt counter numbers the words consumed, so every accepted value is a pure function of
 * the words.
 *
 * <p>Two rules, chosen by the radix alone:
 * <ul>
 *   <li>{@code radix == 1}: the value is 0 and no word is consumed.</li>
 *   <li>{@code 2 ≤ radix < 2^63}: Lemire's multiply-and-reject method (D. Lemire, "Fast Random
 *       Integer Generation in an Interval", ACM TOMACS 29(1), 2019). With word x (unsigned)
 *       and m = x·radix as a 128-bit product, the attempt is rejected when
 *       {@code (m mod 2^64) < (2^64 − radix) mod radix}; otherwise the value is
 *       {@code floor(m / 2^64)}. Attempt a uses word a. Each value is hit by exactly
 *       {@code floor(2^64 / radix)} accepted words.</li>
 *   <li>{@code radix ≥ 2^63}: masked rejection. With L = bitLength(radix − 1) and
 *       w = ceil(L / 64), attempt a reads words a·w, a·w+1, …, a·w+w−1 as one big-endian
 *       integer (first word most significant), keeps its low L bits, and accepts it when it
 *       is below the radix (probability above 1/2).</li>
 * </ul>
 * Both rules are also given for narrow words ({@code bits} &lt; 64) so that tests can
 * enumerate a toy generator completely.
 */
public final class BoundedSampler {
    /** Returned by {@link #lemire64} when the word is rejected. */
    public static final long REJECTED = -1;
    static final BigInteger TWO_POW_63 = BigInteger.ONE.shiftLeft(63);

    private BoundedSampler() {
    }

    /** Supplies the word of a given attempt; the same attempt always gives the same word. */
    @FunctionalInterface
    public interface AttemptWords {
        /** Returns word number {@code attempt} (0, 1, 2, …). */
        long word(long attempt);
    }

    /**
     * One attempt of Lemire's method with a 64-bit word: the value in {@code [0, radix)}, or
     * {@link #REJECTED}.
     *
     * @param radix in {@code [1, 2^63)}
     */
    public static long lemire64(long word, long radix) {
        long low = word * radix;
        if (Long.compareUnsigned(low, radix) < 0) {
            // Only now is the (costly) threshold needed: it is always below the radix.
            long threshold = Long.remainderUnsigned(-radix, radix);
            if (Long.compareUnsigned(low, threshold) < 0) {
                return REJECTED;
            }
        }
        return unsignedMultiplyHigh(word, radix);
    }

    /**
     * One attempt of Lemire's method with a 16-bit chunk: with m = chunk·radix (below 2^32),
     * the attempt is rejected when {@code (m mod 2^16) < (2^16 − radix) mod radix}; otherwise
     * the value is {@code floor(m / 2^16)}. Each value is hit by exactly
     * {@code floor(2^16 / radix)} accepted chunks.
     *
     * @param chunk in {@code [0, 2^16)}
     * @param radix in {@code [1, 2^16)}
     * @return the value in {@code [0, radix)}, or {@link #REJECTED} (as an int, -1)
     */
    public static int lemire16(int chunk, int radix) {
        int m = chunk * radix;
        int low = m & 0xFFFF;
        if (low < radix && low < (0x10000 - radix) % radix) {
            return (int) REJECTED;
        }
        return m >>> 16;
    }

    /**
     * One attempt of Lemire's method with a 32-bit chunk: with m = chunk·radix (below 2^64,
     * unsigned), the attempt is rejected when {@code (m mod 2^32) < (2^32 − radix) mod radix};
     * otherwise the value is {@code floor(m / 2^32)}. Each value is hit by exactly
     * {@code floor(2^32 / radix)} accepted chunks.
     *
     * @param chunk in {@code [0, 2^32)}
     * @param radix in {@code [1, 2^32)}
     * @return the value in {@code [0, radix)}, or {@link #REJECTED}
     */
    public static long lemire32(long chunk, long radix) {
        long m = chunk * radix;
        long low = m & 0xFFFF_FFFFL;
        if (low < radix && low < (0x1_0000_0000L - radix) % radix) {
            return REJECTED;
        }
        return m >>> 32;
    }

    /** The high 64 bits of the unsigned 128-bit product (Java 17 has only the signed one). */
    static long unsignedMultiplyHigh(long a, long b) {
        return Math.multiplyHigh(a, b) + ((a >> 63) & b) + ((b >> 63) & a);
    }

    /**
     * One attempt of Lemire's method with a {@code bits}-bit word, for exhaustive checks on a
     * toy generator.
     *
     * @param bits  word width, 1..32
     * @param radix in {@code [1, 2^bits)}
     */
    static long lemireNarrow(long word, long radix, int bits) {
        long m = word * radix;
        long low = m & ((1L << bits) - 1);
        long threshold = ((1L << bits) - radix) % radix;
        return low < threshold ? REJECTED : m >>> bits;
    }

    /**
     * Draws an exactly uniform value in {@code [0, radix)} from 64-bit words.
     *
     * @throws IllegalArgumentException if {@code radix < 1}
     */
    public static BigInteger draw(BigInteger radix, AttemptWords words) {
        return draw(radix, words, 64);
    }

    /** Draws from {@code bits}-bit words (64 in production, fewer in toy tests). */
    static BigInteger draw(BigInteger radix, AttemptWords words, int bits) {
        Objects.requireNonNull(radix, "radix");
        if (radix.signum() <= 0) {
            throw new IllegalArgumentException("a radix must be >= 1, got " + radix);
        }
        if (radix.equals(BigInteger.ONE)) {
            return BigInteger.ZERO;
        }
        BigInteger lemireLimit = bits == 64 ? TWO_POW_63 : BigInteger.ONE.shiftLeft(bits - 1);
        if (radix.compareTo(lemireLimit) < 0) {
            long r = radix.longValue();
            for (long attempt = 0; ; attempt++) {
                long w = words.word(attempt);
                long v = bits == 64 ? lemire64(w, r) : lemireNarrow(w, r, bits);
                if (v != REJECTED) {
                    return BigInteger.valueOf(v);
                }
            }
        }
        int length = radix.subtract(BigInteger.ONE).bitLength();
        int perAttempt = (length + bits - 1) / bits;
        BigInteger mask = BigInteger.ONE.shiftLeft(length).subtract(BigInteger.ONE);
        BigInteger wordMask = BigInteger.ONE.shiftLeft(bits).subtract(BigInteger.ONE);
        for (long attempt = 0; ; attempt++) {
            BigInteger x = BigInteger.ZERO;
            for (int i = 0; i < perAttempt; i++) {
                long w = words.word(attempt * perAttempt + i);
                x = x.shiftLeft(bits).or(BigInteger.valueOf(w).and(wordMask));
            }
            x = x.and(mask);
            if (x.compareTo(radix) < 0) {
                return x;
            }
        }
    }
}
