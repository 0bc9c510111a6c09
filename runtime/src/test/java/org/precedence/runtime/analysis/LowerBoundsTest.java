package org.precedence.runtime.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigInteger;
import org.junit.jupiter.api.Test;

class LowerBoundsTest {

    @Test
    void leastEqualSides_factsOfTheTrade() {
        // Fact of the trade (common practice, no source): 2 dice need an even side count,
        // 3 dice a multiple of 6, 5 dice at least 30 sides, 7 dice at least 210.
        assertEquals(BigInteger.TWO, LowerBounds.leastEqualSides(2));
        assertEquals(BigInteger.valueOf(6), LowerBounds.leastEqualSides(3));
        assertEquals(BigInteger.valueOf(6), LowerBounds.leastEqualSides(4));
        assertEquals(BigInteger.valueOf(30), LowerBounds.leastEqualSides(5));
        assertEquals(BigInteger.valueOf(30), LowerBounds.leastEqualSides(6));
        assertEquals(BigInteger.valueOf(210), LowerBounds.leastEqualSides(7));
        assertEquals(BigInteger.valueOf(210), LowerBounds.leastEqualSides(10));
        assertEquals(BigInteger.valueOf(2310), LowerBounds.leastEqualSides(11));
    }

    @Test
    void equalSidesAllowed_threeDice_exactlyTheMultiplesOfSix() {
        for (int s = 1; s <= 60; s++) {
            assertEquals(s % 6 == 0, LowerBounds.equalSidesAllowed(3, s), "s = " + s);
        }
    }

    @Test
    void equalSidesAllowed_noSmallerCountThanTheLeastPasses() {
        // The least allowed count is the least s with s^n divisible by n!, searched directly.
        for (int n = 2; n <= 8; n++) {
            long least = LowerBounds.leastEqualSides(n).longValueExact();
            for (long s = 1; s < least; s++) {
                assertFalse(LowerBounds.equalSidesAllowed(n, s), n + " dice, " + s + " sides");
            }
            assertTrue(LowerBounds.equalSidesAllowed(n, least));
            assertTrue(LowerBounds.equalSidesAllowed(n, 2 * least));
        }
        assertFalse(LowerBounds.equalSidesAllowed(5, 12));
        assertFalse(LowerBounds.equalSidesAllowed(7, 30));
    }

    @Test
    void sidesAllowed_mixedSides() {
        assertTrue(LowerBounds.sidesAllowed(2, 4, 6)); // 48 = 8·3!
        assertTrue(LowerBounds.sidesAllowed(2, 2, 3)); // 12 = 2·3!, yet no such fair set (A362634)
        assertFalse(LowerBounds.sidesAllowed(2, 2, 2)); // 8
        assertFalse(LowerBounds.sidesAllowed(3, 3, 3)); // 27
        assertTrue(LowerBounds.sidesAllowed(1, 2)); // one face against two: B below or above
        assertTrue(LowerBounds.sidesAllowed(4, 6, 6, 6)); // 864 = 36·4!
        assertTrue(LowerBounds.sidesAllowed(4, 4, 6, 6)); // 576 = 24·4!
        assertFalse(LowerBounds.sidesAllowed(3, 3, 6, 6)); // 324 = 13.5·4!
    }

    @Test
    void sidesAllowed_agreesWithExistenceOnTinySets() {
        // Where the bound fails, no order-fair set exists (exhaustive search over all words).
        int[][] cases = {{2, 2, 2}, {3, 3, 3}, {2, 3, 3}, {1, 1}, {1, 3}, {2, 2, 4}};
        for (int[] sides : cases) {
            if (!LowerBounds.sidesAllowed(sides)) {
                for (var w : TestSets.allWords(sides)) {
                    assertFalse(BruteForce.of(w.toDiceSet()).orderFair(), w.toString());
                }
            }
        }
    }

    @Test
    void bounds_rejectNonsense() {
        assertThrows(IllegalArgumentException.class, () -> LowerBounds.leastEqualSides(1));
        assertThrows(IllegalArgumentException.class, () -> LowerBounds.equalSidesAllowed(3, 0));
        assertThrows(IllegalArgumentException.class, () -> LowerBounds.sidesAllowed(6));
        assertThrows(IllegalArgumentException.class, () -> LowerBounds.sidesAllowed(6, 0, 6));
    }
}
