package org.precedence.runtime.construction;

import java.math.BigInteger;
import java.util.ArrayList;
import java.util.List;

/** Shared helpers of the family proofs: fixed sample indices, permutation checks, tuple ranks. */
final class FamilySamples {
    /** Number of pseudo-random indices checked beside both ends when a family is too big to list. */
    static final int COUNT = 64;

    private FamilySamples() {
    }

    /** Returns 0, 1, order−1 and {@link #COUNT} indices from a fixed seed (the same every run). */
    static List<BigInteger> indices(BigInteger order, int n) {
        List<BigInteger> out = new ArrayList<>();
        out.add(BigInteger.ZERO);
        out.add(BigInteger.ONE);
        out.add(order.subtract(BigInteger.ONE));
        java.util.Random random = new java.util.Random(0x5eed_0000L + n);
        int bits = order.bitLength() + 8;
        for (int i = 0; i < COUNT; i++) {
            out.add(new BigInteger(bits, random).mod(order));
        }
        return out;
    }

    static void requirePermutation(int[] p, String family) {
        boolean[] seen = new boolean[p.length];
        for (int v : p) {
            if (v < 0 || v >= p.length || seen[v]) {
                throw new IllegalStateException(family + ": member is not a permutation");
            }
            seen[v] = true;
        }
    }

    /** Returns 0 for even permutations, 1 for odd ones (by cycle count). */
    static int parity(int[] p) {
        boolean[] seen = new boolean[p.length];
        int cycles = 0;
        for (int i = 0; i < p.length; i++) {
            if (!seen[i]) {
                cycles++;
                for (int j = i; !seen[j]; j = p[j]) {
                    seen[j] = true;
                }
            }
        }
        return (p.length - cycles) & 1;
    }

    /** Ranks the ordered tuple (p[0..k−1]) of distinct points below n, 0..(n)_k−1. */
    static int tupleRank(int[] p, int k, int n) {
        int rank = 0;
        long used = 0;
        for (int j = 0; j < k; j++) {
            int smallerFree = Long.bitCount(~used & ((1L << p[j]) - 1));
            rank = rank * (n - j) + smallerFree;
            used |= 1L << p[j];
        }
        return rank;
    }

    /** Inverse of {@link #tupleRank}: writes the tuple of rank {@code rank} into t[0..k−1]. */
    static void tupleOf(int rank, int k, int n, int[] t) {
        int[] digits = new int[k];
        for (int j = k - 1; j >= 0; j--) {
            digits[j] = rank % (n - j);
            rank /= n - j;
        }
        long used = 0;
        for (int j = 0; j < k; j++) {
            int c = digits[j];
            for (int v = 0; v < n; v++) {
                if ((used & (1L << v)) == 0 && c-- == 0) {
                    t[j] = v;
                    used |= 1L << v;
                    break;
                }
            }
        }
    }
}
