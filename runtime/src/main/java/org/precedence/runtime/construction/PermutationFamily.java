package org.precedence.runtime.construction;

import java.math.BigInteger;

/**
 * A finite family of permutations of the points {@code 0..points()-1}, members numbered
 * {@code 0..order()-1}. A level of the construction writes one relabelled copy of the previous
 * word per member.
 *
 * <p>Contract: the family is <em>uniform on ordered k-tuples</em> for every
 * {@code k ≤ uniformTuples()}: for any two ordered k-tuples u, w of distinct points, exactly
 * {@code order() / (points)_k} members map u onto w. {@link #prove()} checks this by
 * computation and says how; the construction never uses a family whose proof failed.
 *
 * <p>Families are immutable, thread-safe and hold no per-member storage unless their
 * {@linkplain #name() name} says they are a listed group (the Mathieu groups).
 */
public interface PermutationFamily {

    /** Returns a short name, such as {@code S6}, {@code A10}, {@code PGL(2,5)}, {@code M12}. */
    String name();

    /** Returns the number of points permuted (the number of dice). */
    int points();

    /** Returns the number of members. */
    BigInteger order();

    /** Returns the largest k for which the family is uniform on ordered k-tuples. */
    int uniformTuples();

    /**
     * Writes member {@code index}: {@code out[x]} becomes the image of point {@code x}.
     *
     * @throws IndexOutOfBoundsException if the index is outside {@code 0..order()-1}
     */
    void member(BigInteger index, int[] out);

    /**
     * Returns the point that member {@code index} maps to {@code letter} (the preimage),
     * using {@code scratch} (at least {@link #points()} long) as working space.
     *
     * @throws IndexOutOfBoundsException if the index is outside {@code 0..order()-1}
     */
    default int preimage(long index, int letter, int[] scratch) {
        member(BigInteger.valueOf(index), scratch);
        for (int x = 0; x < points(); x++) {
            if (scratch[x] == letter) {
                return x;
            }
        }
        throw new IllegalStateException(name() + ": member " + index + " is not a permutation");
    }

    /** Returns member {@code index} as a new array. */
    default int[] member(BigInteger index) {
        int[] out = new int[points()];
        member(index, out);
        return out;
    }

    /**
     * Checks the uniformity claim by computation and returns what was checked.
     *
     * @throws IllegalStateException if the check fails (a bug, never bad input)
     */
    FamilyProof prove();
}
