package org.precedence.runtime.construction;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigInteger;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.precedence.runtime.analysis.PatternTable;
import org.precedence.runtime.dice.Word;

class ComposedCountsTest {

    @Test
    void servedAndUniformConstructions_twoToSix_allRankingsEqual() {
        List<Construction> served = new java.util.ArrayList<>();
        for (int n = 2; n <= 6; n++) {
            served.add(Construction.smallest(n));
            served.add(Construction.smallestUniform(n));
        }
        for (Construction c : served) {
            int n = c.players();
            ComposedCounts counts = ComposedCounts.of(c);
            assertEquals(Families.factorial(n).intValueExact(), counts.rankingCounts().size());
            assertTrue(counts.orderFair(), "n=" + n);
            // Each of the n! rankings gets s^n / n! of the s^n outcomes.
            BigInteger expected = c.sidesPerDie().pow(n).divide(Families.factorial(n));
            assertEquals(List.of(expected), counts.distinctRankingCounts(), "n=" + n);
            // The depth each level claims is reached (a mirror may happen to reach more).
            int[] reached = counts.depthAfterLevel();
            for (int i = 0; i < reached.length; i++) {
                assertTrue(reached[i] >= c.levels().get(i).liftsTo(), "n=" + n + " level " + i);
            }
            assertEquals(n, reached[reached.length - 1]);
        }
    }

    @Test
    void composedCounts_equalPatternTableOnMaterialisedWords() {
        for (Construction c : List.of(Construction.smallest(2), Construction.smallest(3),
                Construction.smallest(4), Construction.smallest(5), Construction.smallestUniform(3),
                Construction.smallestUniform(4), Construction.plain(3), Construction.plain(4))) {
            Word word = Materialise.byDefinition(c);
            PatternTable table = PatternTable.count(word);
            ComposedCounts composed = ComposedCounts.of(c);
            for (int s = 0; s < table.size(); s++) {
                assertEquals(table.count(s), composed.countOf(table.pattern(s)), c + " " + s);
            }
        }
    }

    @Test
    void composedCounts_detectAnUnfairWord() {
        // The cyclic shifts of 4 letters cannot lift ABCDDCBA from depth 2 to 3; pass them off
        // as a uniform family and check that the counts notice.
        PermutationFamily claimsThree = new PermutationFamily() {
            @Override public String name() {
                return "C4-claiming-4";
            }
            @Override public int points() {
                return 4;
            }
            @Override public BigInteger order() {
                return BigInteger.valueOf(4);
            }
            @Override public int uniformTuples() {
                return 4;
            }
            @Override public void member(BigInteger index, int[] out) {
                for (int x = 0; x < 4; x++) {
                    out[x] = (x + index.intValueExact()) % 4;
                }
            }
            @Override public FamilyProof prove() {
                throw new IllegalStateException("not uniform");
            }
        };
        Construction bogus = new Construction(StartingWord.letters(4), List.of(Level.reversal(4),
                Level.relabelling(claimsThree, 3), Level.relabelling(Families.symmetric(4), 4)));
        ComposedCounts counts = ComposedCounts.of(bogus);
        assertFalse(counts.orderFair());
        assertEquals(2, counts.depthAfterLevel()[1]);
    }
}
