package org.precedence.runtime.dice;

import java.math.BigInteger;
import org.precedence.api.FairnessGrade;

/**
 * The view through which any served set is rolled, whether its faces are listed ({@link
 * ExplicitDice}) or too many to list (a constructed set).
 *
 * <p>A face of die {@code d} is a digit string {@code (x_0, x_1, …, x_{k-1})}, most significant
 * first, with {@code 0 ≤ x_j < radix(d, j)}; each digit is drawn independently and uniformly, so
 * every face is equally likely. The face index is the mixed-radix number the digits spell.
 * Comparing two dice's faces needs only as many digits as it takes to tell them apart, which
 * is why {@link #compare} pulls digits lazily from a {@link FaceDigits}.
 */
public interface MixedRadixDice {

    /** Lazily supplies face digits; the same (die, digit) must always give the same value. */
    @FunctionalInterface
    interface FaceDigits {
        /** Returns digit {@code digit} of the face rolled by {@code die}. */
        BigInteger digit(int die, int digit);
    }

    /** A stable identifier of the set (catalog id, or construction method and size). */
    String id();

    /** SHA-256 of the set's canonical form, or of the construction's exact description. */
    String sha256();

    /** Returns the number of dice. */
    int players();

    /** Returns how many digits a face has (1 for explicit sets). */
    int digits();

    /** Returns the radix of digit {@code digit} of die {@code die}'s faces. */
    BigInteger radix(int die, int digit);

    /** Returns the number of sides of die {@code die} (the product of its radices). */
    default BigInteger sides(int die) {
        BigInteger s = BigInteger.ONE;
        for (int j = 0; j < digits(); j++) {
            s = s.multiply(radix(die, j));
        }
        return s;
    }

    /**
     * Writes the first {@code k} digits of die {@code die}'s faces whose <em>leading key</em> is
     * {@code key} into {@code out[0..k)}: the inverse of numbering the possible leading-digit
     * strings 0, 1, …, R_0·…·R_{k−1} − 1. The numbering is a bijection, so a uniform key gives
     * independent uniform digits; the roll algorithm with leading groups draws the key
     * ({@code org.precedence.runtime.randomness.LeadingGroup}). A set whose values follow a
     * different order than its digit strings numbers them in value order, so that the key alone
     * ranks faces that differ within those digits. The default numbers them plainly (the digits
     * of the key in mixed radix, most significant first).
     *
     * @param key in {@code [0, R_0·…·R_{k−1})}, which must be below 2^63
     */
    default void leadingDigits(int die, long key, int k, long[] out) {
        long v = key;
        for (int j = k - 1; j >= 0; j--) {
            long r = radix(die, j).longValueExact();
            out[j] = v % r;
            v /= r;
        }
    }

    /**
     * Compares the faces rolled by two different dice: negative when {@code a}'s value is lower.
     * Never 0 for different dice, since all values in a set are distinct.
     */
    int compare(int a, int b, FaceDigits faces);

    /** Returns the exact face value (1..total faces of the set) of a fully drawn face. */
    BigInteger faceValue(int die, BigInteger[] digits);

    /** Returns the fairness grade that has been proven for this set. */
    FairnessGrade grade();

    /** Returns the proven subset depth: every this-many dice form an order-fair set. */
    int subsetDepth();
}
