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

    private Level(PermutationFamily family, int points, int liftsTo) {
        this.family = family;
        this.points = points;
        this.liftsTo = liftsTo;
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
        return new Level(family, family.points(), liftsTo);
    }

    /** Reversal doubling: W then W backwards, lifting depth 1 to 2 for equal side counts. */
    public static Level reversal(int points) {
        return new Level(null, points, 2);
    }

    /** Returns the family name, or {@code reversal}. */
    public String name() {
        return family == null ? "reversal" : family.name();
    }

    /** Returns the number of blocks (the factor on the side count). */
    public BigInteger blocks() {
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
        return family == null;
    }

    /** Returns the family, or null for reversal doubling. */
    public PermutationFamily family() {
        return family;
    }

    /** Returns whether block {@code block} is written backwards. */
    boolean reversed(BigInteger block) {
        return family == null && block.signum() != 0;
    }

    /**
     * Writes block {@code block}'s relabelling into {@code out} (out[x] = new letter of x), or
     * returns false when the block keeps the letters.
     */
    boolean relabel(BigInteger block, int[] out) {
        if (family == null) {
            return false;
        }
        family.member(block, out);
        return true;
    }

    /** Returns (once per family) what was checked about this level's relabellings. */
    public FamilyProof proof() {
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
