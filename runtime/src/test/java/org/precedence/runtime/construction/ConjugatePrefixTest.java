package org.precedence.runtime.construction;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigInteger;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.precedence.runtime.analysis.PatternTable;
import org.precedence.runtime.dice.Word;

class ConjugatePrefixTest {

    @Test
    void conjugateSearch_rederivesTheShippedConjugator() {
        // Independent of ComposedCounts: 3-pattern counts of ABCDEFG GFEDCBA by the analysis
        // engine, then the lifting condition Σ_g N(g⁻¹w) equal for all 210 ordered triples w.
        PatternTable table = PatternTable.count(Word.parse("ABCDEFGGFEDCBA"));
        List<int[]> all = new ArrayList<>();
        SymmetricFamily s7 = new SymmetricFamily(7);
        for (int i = 0; i < 5040; i++) {
            all.add(s7.member(BigInteger.valueOf(i)));
        }
        int working = 0;
        int[] first = null;
        for (int[] pi : all) {
            if (lifts(table, 7, SearchedPlans.conjugatedFrobenius21(pi))) {
                working++;
                if (first == null) {
                    first = pi;
                }
            }
        }
        assertEquals(672, working);
        assertArrayEquals(SearchedPlans.SEVEN_CONJUGATOR, first);
        // The unconjugated group does not work: the choice of labelling matters.
        assertTrue(!lifts(table, 7, SearchedPlans.conjugatedFrobenius21(new int[] {0, 1, 2, 3, 4, 5, 6})));
    }

    @Test
    void nineDice_conjugatedAffineGroupLiftsToDepthThree() {
        PatternTable table = PatternTable.count(Word.parse("ABCDEFGHIIHGFEDCBA"));
        int[][] members = SearchedPlans.conjugated(Families.affine(9), SearchedPlans.NINE_CONJUGATOR);
        assertEquals(72, members.length);
        assertTrue(lifts(table, 9, members));
        Construction c = Construction.smallest(9);
        assertEquals("reversal · AGL(1,9)' · A9 · A9 · A9 · A9 · mirror · S9 · reversal", c.method());
        assertArrayEquals(new int[] {2, 3}, ComposedCounts.of(c, 2, 3).depthAfterLevel());
        assertEquals(9, new ConstructedDice(c).subsetDepth());
    }

    @Test
    void servedSevenDice_prefixReachesDepthThreeAndTheNextLevelFour() {
        Construction c = Construction.smallest(7);
        ConstructedDice dice = new ConstructedDice(c);
        assertEquals(7, dice.subsetDepth());
        // Exact counts of patterns up to length 4 through the first A7 level.
        int[] depths = ComposedCounts.of(c, 3, 4).depthAfterLevel();
        assertArrayEquals(new int[] {2, 3, 4}, depths);
    }

    /** The lifting condition, computed directly: Σ_g N(g⁻¹w) equal over all ordered triples w. */
    private static boolean lifts(PatternTable table, int n, int[][] members) {
        BigInteger first = null;
        int[] inverse = new int[n];
        for (int a = 0; a < n; a++) {
            for (int b = 0; b < n; b++) {
                for (int c = 0; c < n; c++) {
                    if (a == b || b == c || a == c) {
                        continue;
                    }
                    BigInteger sum = BigInteger.ZERO;
                    for (int[] g : members) {
                        for (int x = 0; x < n; x++) {
                            inverse[g[x]] = x;
                        }
                        sum = sum.add(table.countOf(inverse[a], inverse[b], inverse[c]));
                    }
                    if (first == null) {
                        first = sum;
                    } else if (!first.equals(sum)) {
                        return false;
                    }
                }
            }
        }
        return true;
    }
}
