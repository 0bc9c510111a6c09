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
    /** {@code 1 / k!} in double precision: a digit is a multiply and at most one correction. */
    private static final double[] INVERSE_FACTORIAL = new double[21];

    static {
        FACTORIAL[0] = 1;
        for (int k = 1; k < FACTORIAL.length; k++) {
            FACTORIAL[k] = FACTORIAL[k - 1] * k;
        }
        for (int k = 0; k < FACTORIAL.length; k++) {
            INVERSE_FACTORIAL[k] = 1.0 / FACTORIAL[k];
        }
    }

    /** Returns whether {@link #preimage} serves n points (n! fits a long). */
    static boolean preimageServes(int n) {
        return n < FACTORIAL.length;
    }

    /**
     * Returns the point j with π(j) = {@code letter} for the permutation of Lehmer index
     * {@code index} (n ≤ 20), reading digits from the top only until j is found; with
     * {@code evenCode}, digit n−2 is replaced by the parity of the digits before it (the
     * coding of {@link AlternatingFamily}, whose member i has index 2i).
     *
     * <p>Why no decoding: π(j) = letter exactly when digit c_j equals the rank of the letter
     * among the values still unused, and that rank drops by one each time an earlier digit
     * picks a smaller value (c_j below it). Digit j is q_j − (n−j)·q_{j−1} with
     * q_j = ⌊index / (n−1−j)!⌋, and each q_j is computed on its own (a floating-point estimate
     * corrected exactly), so the steps do not wait on each other.
     */
    static int preimage(long index, int n, int letter, boolean evenCode) {
        if (index < 0 || index >= FACTORIAL[n]) {
            throw new IndexOutOfBoundsException("index " + index + " is not below " + n + "!");
        }
        if (letter < 0 || letter >= n) {
            throw new IllegalArgumentException("letter " + letter + " is not below " + n);
        }
        int rank = letter;
        long previous = 0;
        int sum = 0;
        for (int j = 0; j < n; j++) {
            long q = quotient(index, n - 1 - j);
            int c = (int) (q - (n - j) * previous);
            previous = q;
            if (evenCode && j == n - 2) {
                c = sum & 1;
            }
            sum += c;
            if (c == rank) {
                return j;
            }
            // Branch-free (c < rank exactly when c − rank is negative; both are below n): the
            // digits are random, so a branch here would often mispredict.
            rank -= (c - rank) >>> 31;
        }
        throw new IllegalStateException("index " + index + " does not code a permutation of " + n);
    }

    /** Returns ⌊index / k!⌋ exactly (0 ≤ index &lt; 2^63). */
    private static long quotient(long index, int k) {
        long f = FACTORIAL[k];
        if (index >= 1L << 52) {
            return index / f;
        }
        // Below 2^52 the estimate is off by at most one.
        long q = (long) (index * INVERSE_FACTORIAL[k]);
        long r = index - q * f;
        if (r < 0) {
            q--;
        } else if (r >= f) {
            q++;
        }
        return q;
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
