package org.precedence.runtime.construction;

import java.math.BigInteger;

/**
 * Permutations numbered by their Lehmer code (the factorial number system).
 *
 * <p>Digit {@code c_j} (radix {@code n−j}) says which of the still unused values, in increasing
 * order, point {@code j} maps to; the index is {@code Σ c_j·(n−1−j)!}, so index order is the
 * lexicographic order of the image lists. The code also counts inversions:
 * {@code c_j = #{k > j : π(k) < π(j)}}, hence the parity of the permutation is the parity of
 * {@code Σ c_j} — which is how {@link AlternatingFamily} stays implicit.
 */
final class Lehmer {
    private Lehmer() {
    }

    /** Writes the digits of {@code index} in radices n, n−1, …, 1 (the last is always 0). */
    static void digits(BigInteger index, int n, int[] code) {
        if (index.bitLength() < 63) {
            long rest = index.longValueExact();
            for (int j = n - 1; j >= 0; j--) {
                int radix = n - j;
                code[j] = (int) (rest % radix);
                rest /= radix;
            }
            if (rest != 0) {
                throw new IndexOutOfBoundsException("index " + index + " is not below " + n + "!");
            }
            return;
        }
        BigInteger rest = index;
        for (int j = n - 1; j >= 0; j--) {
            BigInteger[] qr = rest.divideAndRemainder(BigInteger.valueOf(n - j));
            code[j] = qr[1].intValue();
            rest = qr[0];
        }
        if (rest.signum() != 0) {
            throw new IndexOutOfBoundsException("index " + index + " is not below " + n + "!");
        }
    }

    /** {@code FACTORIAL[k] = k!} for k ≤ 20 (the largest that fits a long). */
    private static final long[] FACTORIAL = new long[21];

    static {
        FACTORIAL[0] = 1;
        for (int k = 1; k < FACTORIAL.length; k++) {
            FACTORIAL[k] = FACTORIAL[k - 1] * k;
        }
    }

    /** Returns whether {@link #preimage} serves n points (n! fits a long). */
    static boolean preimageServes(int n) {
        return n < FACTORIAL.length;
    }

    /**
     * Returns the point j with π(j) = {@code letter} for the permutation of Lehmer index
     * {@code index} (n ≤ 20), decoding digits from the top only until j is found; with
     * {@code evenCode}, digit n−2 is replaced by the parity of the digits before it (the
     * coding of {@link AlternatingFamily}, whose member i has index 2i). The unused values
     * are a bit mask, and the digits come from dividing by factorials (32-bit once the rest
     * fits, the common case).
     */
    static int preimage(long index, int n, int letter, boolean evenCode) {
        if (index < 0 || index >= FACTORIAL[n]) {
            throw new IndexOutOfBoundsException("index " + index + " is not below " + n + "!");
        }
        long free = (1L << n) - 1;
        long rest = index;
        int sum = 0;
        for (int j = 0; j < n; j++) {
            int c;
            if (evenCode && j == n - 2) {
                c = sum & 1;
            } else {
                long f = FACTORIAL[n - 1 - j];
                // f ≤ rest ≤ 2^31 − 1 makes the 32-bit division exact.
                c = rest < f ? 0 : rest <= Integer.MAX_VALUE ? (int) rest / (int) f : (int) (rest / f);
                rest -= c * f;
            }
            sum += c;
            long m = free;
            for (; c > 0; c--) {
                m &= m - 1;
            }
            int value = Long.numberOfTrailingZeros(m);
            if (value == letter) {
                return j;
            }
            free &= ~(1L << value);
        }
        throw new IllegalArgumentException("letter " + letter + " is not below " + n);
    }

    /** Decodes a Lehmer code into {@code out} (out[j] = image of point j). */
    static void decode(int[] code, int n, int[] out) {
        // Values still free, kept sorted; n ≤ a few hundred, so the quadratic shift is cheaper
        // than a tree.
        int[] free = new int[n];
        for (int v = 0; v < n; v++) {
            free[v] = v;
        }
        int size = n;
        for (int j = 0; j < n; j++) {
            int c = code[j];
            out[j] = free[c];
            System.arraycopy(free, c + 1, free, c, size - c - 1);
            size--;
        }
    }

    /** Returns the Lehmer index of {@code perm} (a permutation of 0..n−1). */
    static BigInteger rank(int[] perm) {
        int n = perm.length;
        BigInteger index = BigInteger.ZERO;
        for (int j = 0; j < n; j++) {
            int c = 0;
            for (int k = j + 1; k < n; k++) {
                if (perm[k] < perm[j]) {
                    c++;
                }
            }
            index = index.multiply(BigInteger.valueOf(n - j)).add(BigInteger.valueOf(c));
        }
        return index;
    }

    static BigInteger factorial(int n) {
        BigInteger f = BigInteger.ONE;
        for (int i = 2; i <= n; i++) {
            f = f.multiply(BigInteger.valueOf(i));
        }
        return f;
    }

    /** Returns {@code n·(n−1)·…·(n−k+1)}, the number of ordered k-tuples of distinct points. */
    static BigInteger falling(int n, int k) {
        BigInteger f = BigInteger.ONE;
        for (int i = 0; i < k; i++) {
            f = f.multiply(BigInteger.valueOf(n - i));
        }
        return f;
    }
}
