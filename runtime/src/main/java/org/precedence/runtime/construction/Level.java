package org.precedence.runtime.construction;

import java.math.BigInteger;
import java.util.Objects;

/**
 * One level of the construction: the previous word W is written once per block, block b being
 * W relabelled by member b of a {@link PermutationFamily}, or — for reversal doubling — W
 * followed by W read backwards. A level multiplies the side count by {@link #blocks()} and
 * lifts the subset depth to {@link #liftsTo()}.
 */
public final class Level {
    private final PermutationFamily family;
    private final int points;
    private final int liftsTo;
    /** Word-specific levels: the blocks listed one by one, with their reversal flags. */
    private final int[][] listed;
    private final boolean[] listedReversed;
    private final String listedName;
    private final Doubling doubling;

    /** What a "W, then W backwards" level is used for; the construction checks the context. */
    enum Doubling {
        /** Not a doubling level. */
        NONE,
        /** Depth 1 to 2: any equal-sided word. */
        PAIRS,
        /** Depth kept; the result is a palindrome, as the top doubling needs. */
        MIRROR,
        /** Depth n−1 to n: after the full group S_n applied to a palindrome. */
        TOP
    }

    private Level(PermutationFamily family, int points, int liftsTo, Doubling doubling) {
        this.family = family;
        this.points = points;
        this.liftsTo = liftsTo;
        this.listed = null;
        this.listedReversed = null;
        this.listedName = null;
        this.doubling = doubling;
    }

    private Level(String name, int points, int liftsTo, int[][] listed, boolean[] reversed) {
        this.family = null;
        this.points = points;
        this.liftsTo = liftsTo;
        this.listed = listed;
        this.listedReversed = reversed;
        this.listedName = name;
        this.doubling = Doubling.NONE;
    }

    /**
     * A level whose blocks are listed (relabelling, and whether the block is read backwards),
     * chosen for one particular previous word rather than uniform on tuples. It lifts the depth
     * only for that word, so a construction using it is served only after its exact counts have
     * been composed and checked ({@link ConstructedDice} does this).
     */
    public static Level wordSpecific(String name, int[][] relabellings, boolean[] reversed, int liftsTo) {
        if (relabellings.length == 0 || relabellings.length != reversed.length) {
            throw new IllegalArgumentException("a listed level needs as many reversal flags as blocks (at least one)");
        }
        int n = relabellings[0].length;
        int[][] copy = new int[relabellings.length][];
        for (int b = 0; b < copy.length; b++) {
            copy[b] = relabellings[b].clone();
            if (copy[b].length != n) {
                throw new IllegalArgumentException("block " + b + " relabels " + copy[b].length + " letters, not " + n);
            }
            FamilySamples.requirePermutation(copy[b], name);
        }
        return new Level(name, n, liftsTo, copy, reversed.clone());
    }

    /** Returns whether this level is valid only for its particular previous word. */
    public boolean isWordSpecific() {
        return listed != null;
    }

    /**
     * A level relabelling by every member of {@code family}, lifting depth {@code liftsTo − 1}
     * to {@code liftsTo}; the family must be uniform on ordered {@code liftsTo}-tuples.
     */
    public static Level relabelling(PermutationFamily family, int liftsTo) {
        Objects.requireNonNull(family, "family");
        if (liftsTo < 2 || liftsTo > family.uniformTuples()) {
            throw new IllegalArgumentException(family.name() + " is uniform on tuples up to length "
                    + family.uniformTuples() + ", so it cannot lift depth to " + liftsTo);
        }
        return new Level(family, family.points(), liftsTo, Doubling.NONE);
    }

    /** Reversal doubling: W then W backwards, lifting depth 1 to 2 for equal side counts. */
    public static Level reversal(int points) {
        return new Level(null, points, 2, Doubling.PAIRS);
    }

    /**
     * Mirror: W then W backwards, keeping depth {@code depth} and making the word a palindrome
     * (a palindrome's pattern counts are symmetric under reading backwards).
     */
    public static Level mirror(int points, int depth) {
        return new Level(null, points, depth, Doubling.MIRROR);
    }

    /**
     * Top doubling: W then W backwards, lifting depth n−1 to n. Valid (and accepted by {@link
     * Construction}) only when W is the full group S_n applied to a palindrome of depth n−2;
     * see {@link #proof()} for why.
     */
    public static Level topReversal(int points) {
        return new Level(null, points, points, Doubling.TOP);
    }

    /** Returns the role of a doubling level ({@link Doubling#NONE} for other levels). */
    Doubling doubling() {
        return doubling;
    }

    /** Returns the family name, or {@code reversal}. */
    public String name() {
        if (listed != null) {
            return listedName;
        }
        if (family == null) {
            return doubling == Doubling.MIRROR ? "mirror" : "reversal";
        }
        return family.name();
    }

    /** Returns the number of blocks (the factor on the side count). */
    public BigInteger blocks() {
        if (listed != null) {
            return BigInteger.valueOf(listed.length);
        }
        return family == null ? BigInteger.TWO : family.order();
    }

    /** Returns the subset depth after this level. */
    public int liftsTo() {
        return liftsTo;
    }

    /** Returns the number of dice. */
    public int points() {
        return points;
    }

    /** Returns whether this is reversal doubling. */
    public boolean isReversal() {
        return family == null && listed == null;
    }

    /** Returns whether this level relabels by every permutation of the letters. */
    boolean isFullSymmetricGroup() {
        return family instanceof SymmetricFamily;
    }

    /** Returns the family, or null for reversal doubling. */
    public PermutationFamily family() {
        return family;
    }

    /** Returns whether block {@code block} is written backwards. */
    boolean reversed(BigInteger block) {
        if (listed != null) {
            return listedReversed[block.intValueExact()];
        }
        return family == null && block.signum() != 0;
    }

    /** Returns whether every block but block 0 is written backwards (the doubling levels). */
    boolean reversesAllButFirst() {
        return listed == null && family == null;
    }

    /** Returns the listed levels' reversal flags by block (not a copy), or null for other levels. */
    boolean[] listedReversals() {
        return listedReversed;
    }

    /** As {@link #reversed(BigInteger)} for a block index that fits a long. */
    boolean reversed(long block) {
        if (listed != null) {
            return listedReversed[Math.toIntExact(block)];
        }
        return family == null && block != 0;
    }

    /**
     * Writes block {@code block}'s relabelling into {@code out} (out[x] = new letter of x), or
     * returns false when the block keeps the letters.
     */
    boolean relabel(BigInteger block, int[] out) {
        if (listed != null) {
            System.arraycopy(listed[block.intValueExact()], 0, out, 0, points);
            return true;
        }
        if (family == null) {
            return false;
        }
        family.member(block, out);
        return true;
    }

    /**
     * Returns the letter that block {@code block}'s relabelling sends to {@code letter} (the
     * letter itself when the block keeps the letters); {@code scratch} holds at least
     * {@link #points()} ints.
     */
    int preimage(long block, int letter, int[] scratch) {
        if (listed != null) {
            int[] sigma = listed[Math.toIntExact(block)];
            for (int x = 0; x < points; x++) {
                if (sigma[x] == letter) {
                    return x;
                }
            }
            throw new IllegalStateException(listedName + ": block " + block + " is not a permutation");
        }
        if (family == null) {
            return letter;
        }
        return family.preimage(block, letter, scratch);
    }

    /** Returns (once per family) what was checked about this level's relabellings. */
    public FamilyProof proof() {
        if (listed != null) {
            return new FamilyProof(listedName, points, blocks(), 0,
                    "listed for its previous word only; valid because the exact composed counts of the"
                            + " word after this level have subset depth " + liftsTo);
        }
        if (doubling == Doubling.MIRROR) {
            return new FamilyProof("mirror", points, BigInteger.TWO, liftsTo,
                    "two words of depth " + liftsTo + " and equal sides in a row keep depth " + liftsTo
                            + " (split patterns count the same for every pattern); W followed by W"
                            + " backwards is a palindrome, so N(rev u) = N(u) for every pattern u");
        }
        if (doubling == Doubling.TOP) {
            return new FamilyProof("reversal", points, BigInteger.TWO, points,
                    "W = σ₁(V)…σ_r(V) over all of S_n with V a palindrome of depth n−2: the terms of"
                            + " N_W(w) + N_W(rev w) that depend on w pair up as (r−1)·m·Σ_σ N_V(σ⁻¹P) for an"
                            + " (n−1)-pattern P, the same for every w since σ⁻¹P runs over all (n−1)-tuples;"
                            + " so W then W backwards counts every ranking N_W(w) + N_W(rev w) + const times");
        }
        if (family == null) {
            return new FamilyProof("reversal", points, BigInteger.TWO, 2,
                    "a word with m faces per die followed by its reverse holds each ordered pair xy"
                            + " N(xy) + N(yx) + m² = 2m² times, since N(xy) + N(yx) = m²");
        }
        return Families.proofOf(family);
    }

    @Override
    public String toString() {
        return name() + "→" + liftsTo;
    }
}
