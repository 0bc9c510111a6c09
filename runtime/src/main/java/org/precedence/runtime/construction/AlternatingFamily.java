package org.precedence.runtime.construction;

import java.math.BigInteger;

/**
 * The n!/2 even permutations, never listed: member {@code i} has the Lehmer code whose first
 * n−2 digits spell {@code i} (radices n, n−1, …, 3) and whose digit n−2 is the parity of their
 * sum, so the inversion count is even. The first n−2 digits fix the images of points
 * 0..n−3 and range over every ordered (n−2)-tuple exactly once, so the group is sharply
 * (n−2)-transitive: uniform on ordered k-tuples for every k ≤ n−2.
 */
final class AlternatingFamily implements PermutationFamily {
    private final int n;
    private final BigInteger order;

    AlternatingFamily(int n) {
        if (n < 4) {
            throw new IllegalArgumentException("the alternating family is offered from 4 points, got " + n);
        }
        this.n = n;
        this.order = Lehmer.factorial(n).shiftRight(1);
    }

    @Override
    public String name() {
        return "A" + n;
    }

    @Override
    public int points() {
        return n;
    }

    @Override
    public BigInteger order() {
        return order;
    }

    @Override
    public int uniformTuples() {
        return n - 2;
    }

    @Override
    public void member(BigInteger index, int[] out) {
        if (index.signum() < 0 || index.compareTo(order) >= 0) {
            throw new IndexOutOfBoundsException("member " + index + " of " + name());
        }
        int[] code = new int[n];
        // index·2 spells digits 0..n−3 with a zero in the radix-2 place; then fix that place.
        Lehmer.digits(index.shiftLeft(1), n, code);
        int sum = 0;
        for (int j = 0; j < n - 2; j++) {
            sum += code[j];
        }
        code[n - 2] = sum & 1;
        Lehmer.decode(code, n, out);
    }

    @Override
    public int preimage(long index, int letter, int[] scratch) {
        if (!Lehmer.preimageServes(n) || index < 0 || index > Long.MAX_VALUE >> 1) {
            return PermutationFamily.super.preimage(index, letter, scratch);
        }
        return Lehmer.preimage(index << 1, n, letter, true);
    }

    /** Returns the member index of an even permutation. */
    static BigInteger indexOf(int[] even) {
        return Lehmer.rank(even).shiftRight(1);
    }

    @Override
    public FamilyProof prove() {
        String how;
        int k = n - 2;
        if (n <= SymmetricFamily.EXHAUSTIVE_UP_TO) {
            // Count, for every ordered (n−2)-tuple, the members sending (0..n−3) onto it.
            int tuples = Lehmer.falling(n, k).intValueExact();
            int[] hits = new int[tuples];
            long count = order.longValueExact();
            for (long i = 0; i < count; i++) {
                int[] p = checked(BigInteger.valueOf(i));
                hits[tupleRank(p, k)]++;
            }
            for (int t = 0; t < tuples; t++) {
                if (hits[t] != 1) {
                    throw new IllegalStateException(name() + ": tuple " + t + " hit " + hits[t] + " times");
                }
            }
            how = "all " + order + " members enumerated: each an even permutation with its own index;"
                    + " the orbit of (0,…," + (k - 1) + ") is all " + tuples
                    + " ordered " + k + "-tuples with trivial stabiliser (|A" + n + "| = " + tuples + " · 1)";
        } else {
            for (BigInteger i : FamilySamples.indices(order, n)) {
                checked(i);
            }
            how = "first n−2 Lehmer digits range over all (" + n + ")_" + k
                    + " ordered images of (0,…," + (k - 1) + "), the last free digit is fixed by parity,"
                    + " so |A" + n + "| = " + order + " = (" + n + ")_" + k
                    + " · 1; parity and index round trip checked at both ends and "
                    + FamilySamples.COUNT + " fixed pseudo-random indices";
        }
        return new FamilyProof(name(), n, order, k, how);
    }

    private int[] checked(BigInteger index) {
        int[] p = member(index);
        FamilySamples.requirePermutation(p, name());
        if (FamilySamples.parity(p) != 0) {
            throw new IllegalStateException(name() + ": member " + index + " is odd");
        }
        if (!indexOf(p).equals(index)) {
            throw new IllegalStateException(name() + ": member " + index + " ranks as " + indexOf(p));
        }
        return p;
    }

    /** Ranks the ordered tuple (p[0..k−1]) among ordered k-tuples of distinct points. */
    private int tupleRank(int[] p, int k) {
        return FamilySamples.tupleRank(p, k, n);
    }
}
