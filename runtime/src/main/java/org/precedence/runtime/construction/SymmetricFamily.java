package org.precedence.runtime.construction;

import java.math.BigInteger;

/**
 * All n! permutations, numbered by Lehmer code and never listed. Uniform on ordered k-tuples
 * for every k ≤ n: exactly (n−k)! permutations map one k-tuple onto another.
 */
final class SymmetricFamily implements PermutationFamily {
    /** Up to this many points the proof enumerates every member. */
    static final int EXHAUSTIVE_UP_TO = 8;

    private final int n;
    private final BigInteger order;

    SymmetricFamily(int n) {
        if (n < 2) {
            throw new IllegalArgumentException("a permutation family needs at least 2 points, got " + n);
        }
        this.n = n;
        this.order = Lehmer.factorial(n);
    }

    @Override
    public String name() {
        return "S" + n;
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
        return n;
    }

    @Override
    public void member(BigInteger index, int[] out) {
        if (index.signum() < 0 || index.compareTo(order) >= 0) {
            throw new IndexOutOfBoundsException("member " + index + " of " + name());
        }
        int[] code = new int[n];
        Lehmer.digits(index, n, code);
        Lehmer.decode(code, n, out);
    }

    @Override
    public int preimage(long index, int letter, int[] scratch) {
        if (!Lehmer.preimageServes(n)) {
            return PermutationFamily.super.preimage(index, letter, scratch);
        }
        return Lehmer.preimage(index, n, letter, false);
    }

    @Override
    public FamilyProof prove() {
        // Every member is a permutation and rank∘member is the identity, so members are
        // pairwise distinct; n! distinct permutations are all of them. For the full group the
        // members mapping a k-tuple u onto w are the (n−k)! ways to place the other points.
        String how;
        if (n <= EXHAUSTIVE_UP_TO) {
            long count = order.longValueExact();
            for (long i = 0; i < count; i++) {
                checkRoundTrip(BigInteger.valueOf(i));
            }
            how = "all " + order + " members enumerated: each a permutation, Lehmer ranks 0.."
                    + (count - 1) + " each hit once, so the family is the whole group S" + n
                    + " and the orbit of (0,…," + (n - 1) + ") has " + order + " tuples with trivial stabiliser";
        } else {
            for (BigInteger i : FamilySamples.indices(order, n)) {
                checkRoundTrip(i);
            }
            how = "Lehmer decoding is a bijection from 0.." + n + "!−1 onto S" + n
                    + " (mixed radix n, n−1, …, 1); rank∘member = id checked at both ends and "
                    + FamilySamples.COUNT + " fixed pseudo-random indices";
        }
        return new FamilyProof(name(), n, order, n, how);
    }

    private void checkRoundTrip(BigInteger index) {
        int[] p = member(index);
        FamilySamples.requirePermutation(p, name());
        if (!Lehmer.rank(p).equals(index)) {
            throw new IllegalStateException(name() + ": member " + index + " ranks as " + Lehmer.rank(p));
        }
    }
}
