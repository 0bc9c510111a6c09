package org.precedence.runtime.randomness;

import java.math.BigInteger;
import org.precedence.runtime.dice.MixedRadixDice;

/**
 * The leading group of a die's face under {@link RollGenerator#FAST_ID}: its most significant
 * digits, as many as keep the product of their radices below {@link #LIMIT}, drawn together as
 * one <em>leading key</em> in {@code [0, product)} from a 32-bit chunk ({@link
 * RollGenerator#groupValue}) and turned into digits by {@link MixedRadixDice#leadingDigits}.
 *
 * <p>Why: a constructed face's order is almost always settled by its first few digits, and
 * drawing them one by one costs a generator block per digit per four dice; drawn together, one
 * block serves eight dice. And since a constructed set's key is the rank of the sub-block in
 * value order, the keys alone rank the dice unless two are equal: no digit is computed. The key
 * numbers the digit strings bijectively, so a uniform key gives digits that are independent
 * and each uniform on its radix: the faces keep exactly the distribution of digit-by-digit
 * draws. The limit keeps the 32-bit rejection rate below 2^−8.
 *
 * <p>Only faces of two digits or more have a group; single-digit faces (explicit and listed
 * sets) are drawn as under {@link RollGenerator#FAST_V2_ID}. Immutable.
 */
public final class LeadingGroup {
    /** The product of a group's radices stays below this. */
    public static final long LIMIT = 1L << 24;
    private static final LeadingGroup NONE = new LeadingGroup(0, 1);
    private static final BigInteger BIG_LIMIT = BigInteger.valueOf(LIMIT);

    private final int digits;
    private final long product;

    private LeadingGroup(int digits, long product) {
        this.digits = digits;
        this.product = product;
    }

    /**
     * Returns the leading group of die {@code die} of {@code dice}: digits 0..P−1 for the largest
     * P whose radix product is below {@link #LIMIT} (P = 0 when the face has one digit or its
     * first radix alone reaches the limit).
     */
    public static LeadingGroup of(MixedRadixDice dice, int die) {
        int m = dice.digits();
        if (m < 2) {
            return NONE;
        }
        BigInteger product = BigInteger.ONE;
        int p = 0;
        while (p < m) {
            BigInteger next = product.multiply(dice.radix(die, p));
            if (next.compareTo(BIG_LIMIT) >= 0) {
                break;
            }
            product = next;
            p++;
        }
        if (p == 0) {
            return NONE;
        }
        return new LeadingGroup(p, product.longValueExact());
    }

    /** Returns the number of digits in the group (0: none). */
    public int digits() {
        return digits;
    }

    /** Returns the product of the group's radices (1 for an empty group or radices of 1). */
    public long product() {
        return product;
    }
}
