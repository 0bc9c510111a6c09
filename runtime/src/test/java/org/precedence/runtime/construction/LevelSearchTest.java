package org.precedence.runtime.construction;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigInteger;
import org.junit.jupiter.api.Test;

class LevelSearchTest {

    @Test
    void search_threeAndFourDice_reachTheLeastSideCounts() {
        // Facts of the trade (common practice, no source): 6 sides is the least for 3
        // order-fair dice, 12 the least for 4.
        Construction three = LevelSearch.search(3, 120, 3).orElseThrow();
        assertEquals(BigInteger.valueOf(6), three.sidesPerDie());
        assertTrue(ComposedCounts.of(three).orderFair());
        Construction four = LevelSearch.search(4, 120, 3).orElseThrow();
        assertEquals(BigInteger.valueOf(12), four.sidesPerDie());
        assertTrue(ComposedCounts.of(four).orderFair());
    }

    @Test
    void search_reproducesTheShippedPlans() {
        for (int n = 3; n <= 5; n++) {
            Construction found = LevelSearch.search(n, 120, 3).orElseThrow();
            Construction shipped = SearchedPlans.forPlayers(n).orElseThrow();
            assertEquals(SearchedPlans.format(shipped), SearchedPlans.format(found), "n=" + n);
        }
    }

    @Test
    void search_outsideItsRange_isRejected() {
        assertThrows(IllegalArgumentException.class, () -> LevelSearch.search(7, 60, 3));
    }
}
