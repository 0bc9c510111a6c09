package org.precedence.runtime.randomness;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigInteger;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.precedence.api.FairnessGrade;
import org.precedence.runtime.construction.ConstructedDice;
import org.precedence.runtime.dice.MixedRadixDice;
import org.precedence.runtime.source.SetSource;
import org.precedence.runtime.source.SetSources;

/**
 * The leading groups of the served sets, and the leading key as an exact numbering of the
 * leading digit strings: a bijection (so a uniform key gives uniform independent digits) that
 * is the prefix key (so keys rank faces).
 */
class LeadingGroupTest {
    private static final SetSource SERVED = SetSources.standard();

    @Test
    void tenPlayers_groupTheReversalTheSymmetricLevelAndTheMirror() {
        MixedRadixDice ten = SERVED.forPlayers(10, FairnessGrade.ORDER_FAIR);
        LeadingGroup group = LeadingGroup.of(ten, 0);
        // Digits 0..2 have radices 2, 10! = 3,628,800 (OEIS A000142) and 2; the next, |A10| =
        // 10!/2, would take the product past 2^24.
        assertEquals(BigInteger.TWO, ten.radix(0, 0));
        assertEquals(BigInteger.valueOf(3_628_800), ten.radix(0, 1));
        assertEquals(BigInteger.TWO, ten.radix(0, 2));
        assertEquals(BigInteger.valueOf(1_814_400), ten.radix(0, 3));
        assertEquals(3, group.digits());
        assertEquals(14_515_200L, group.product());
    }

    @Test
    void singleDigitFaces_haveNoGroup() {
        for (int n = 2; n <= 6; n++) {
            MixedRadixDice listed = SERVED.forPlayers(n, FairnessGrade.ORDER_FAIR);
            if (listed.digits() == 1) {
                assertEquals(0, LeadingGroup.of(listed, 0).digits(), listed.id());
                assertEquals(1, LeadingGroup.of(listed, 0).product(), listed.id());
            }
        }
    }

    @Test
    void everyServedConstruction_groupsAsManyDigitsAsStayBelowTheLimit() {
        for (int n = 7; n <= SetSources.MAX_PLAYERS; n++) {
            MixedRadixDice dice = SERVED.forPlayers(n, FairnessGrade.ORDER_FAIR);
            LeadingGroup group = LeadingGroup.of(dice, 0);
            BigInteger product = BigInteger.ONE;
            for (int j = 0; j < group.digits(); j++) {
                product = product.multiply(dice.radix(0, j));
            }
            assertEquals(BigInteger.valueOf(group.product()), product, "n=" + n);
            assertTrue(group.product() < LeadingGroup.LIMIT, "n=" + n);
            assertTrue(group.digits() >= 1, "every construction starts with a reversal, n=" + n);
            BigInteger next = product.multiply(dice.radix(0, group.digits()));
            assertTrue(next.compareTo(BigInteger.valueOf(LeadingGroup.LIMIT)) >= 0, "n=" + n);
        }
    }

    /**
     * Exhaustive where the group has at most 2^21 keys, sampled above: every key spells digits
     * within their radices whose prefix key is the key again. A map from [0, Π) into the Π
     * digit strings with a left inverse is a bijection.
     */
    @Test
    void leadingDigits_isTheInverseOfThePrefixKey_forEveryServedConstruction() {
        SplittableRandom random = new SplittableRandom(2424L); // fixed seed: inputs only
        for (int n = 7; n <= SetSources.MAX_PLAYERS; n++) {
            ConstructedDice dice = (ConstructedDice) SERVED.forPlayers(n, FairnessGrade.ORDER_FAIR);
            int k = LeadingGroup.of(dice, 0).digits();
            long product = LeadingGroup.of(dice, 0).product();
            boolean exhaustive = product <= 1 << 21;
            long count = exhaustive ? product : 50_000;
            long[] digits = new long[k];
            for (long i = 0; i < count; i++) {
                long key = exhaustive ? i : random.nextLong(product);
                int die = (int) (i % n);
                dice.leadingDigits(die, key, k, digits);
                for (int j = 0; j < k; j++) {
                    assertTrue(digits[j] >= 0 && BigInteger.valueOf(digits[j]).compareTo(dice.radix(die, j)) < 0);
                }
                assertEquals(key, dice.prefixKey(digits, k), "n=" + n + " key " + key);
            }
        }
    }

    @Test
    void leadingDigits_longerPrefixes_roundTripToo() {
        SplittableRandom random = new SplittableRandom(4848L); // fixed seed: inputs only
        for (int n : new int[] {7, 8, 10, 16, 33, 64}) {
            ConstructedDice dice = (ConstructedDice) SERVED.forPlayers(n, FairnessGrade.ORDER_FAIR);
            int k = dice.prefixDigits(40);
            long product = 1;
            for (int j = 0; j < k; j++) {
                product *= dice.radix(0, j).longValueExact();
            }
            long[] digits = new long[k];
            for (int i = 0; i < 20_000; i++) {
                long key = random.nextLong(product);
                dice.leadingDigits(i % n, key, k, digits);
                assertEquals(key, dice.prefixKey(digits, k), "n=" + n);
            }
        }
    }
}
