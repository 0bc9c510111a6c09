package org.precedence.runtime.search;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.precedence.api.RankingConvention;
import org.precedence.runtime.analysis.FairnessAnalysis;
import org.precedence.runtime.analysis.FairnessReport;
import org.precedence.runtime.dice.Word;

class StructuredSearchTest {

    private static FairnessReport analyse(Word w) {
        return FairnessAnalysis.analyse(w, RankingConvention.LOWEST_FIRST);
    }

    @Test
    void raise_wordAndItsReverse_giveDepthTwo() {
        // Brief §5 (first principles): a balanced word followed by its reverse has depth 2; for
        // the plain word "ABCD" the only balancing second copy is the reversal.
        List<Word> raised = StructuredSearch.raise(Word.parse("ABCD"), 2, 2, 10);
        assertEquals(List.of(Word.parse("ABCDDCBA")), raised);
    }

    @Test
    void raise_everyResult_hasTheClaimedDepth() {
        List<Word> depthThree = StructuredSearch.raise(Word.parse("ABCDDCBA"), 3, 3, 100);
        assertFalse(depthThree.isEmpty());
        for (Word w : depthThree) {
            FairnessReport r = analyse(w);
            assertEquals(3, r.subsetDepth(), w::toString);
            assertArrayEquals(new int[] {6, 6, 6, 6}, r.sides());
        }
    }

    @Test
    void orderFairByRaising_fourDiceTwelveSides_findsOrderFairSets() {
        // Fact of the trade (common practice, no source): four 12-sided order-fair dice exist.
        List<Word> found = StructuredSearch.orderFairByRaising(4, 12, null);
        assertFalse(found.isEmpty());
        for (Word w : found) {
            FairnessReport r = analyse(w);
            assertTrue(r.orderFair(), w::toString);
            assertArrayEquals(new int[] {12, 12, 12, 12}, r.sides());
        }
    }

    @Test
    void orderFairByRaising_fourDiceSixSides_findsNone() {
        // Consistent with the exhaustive proof that four 6-sided order-fair dice do not exist.
        assertTrue(StructuredSearch.orderFairByRaising(4, 6, null).isEmpty());
    }

    @Test
    void addDie_keepsDepthFour_andFindsCandidates() {
        Word four = StructuredSearch.orderFairByRaising(4, 12, null).get(0);
        List<Word> five = StructuredSearch.addDie(four, 12, 4);
        assertFalse(five.isEmpty());
        for (Word w : five.subList(0, Math.min(5, five.size()))) {
            FairnessReport r = analyse(w);
            assertEquals(4, r.subsetDepth(), w::toString);
            assertFalse(r.orderFair(), "12^5 is not divisible by 5!, so depth 5 is impossible");
        }
    }

    @Test
    void fiveDice_isOrderFairWithAtMost120Sides() {
        // Published bound (American Mathematical Monthly 2024, "Building Sets of Permutation-Fair
        // Dice"): five order-fair dice with 120 sides each exist; our recipe must reach it.
        StructuredSearch.Construction c = StructuredSearch.fiveDice().orElseThrow();
        FairnessReport r = analyse(c.word());
        assertTrue(r.orderFair());
        assertEquals(5, r.subsetDepth());
        for (int s : r.sides()) {
            assertTrue(s <= 120 && s % 30 == 0, "sides " + s);
        }
        assertFalse(c.steps().isEmpty());
        // Deterministic: the shipped entry made by this recipe is exactly this word.
        String shipped = org.precedence.runtime.catalog.Catalog.shipped().entries(5).stream()
                .filter(e -> e.provenance().parameters().contains("recipe=five-dice"))
                .findFirst().orElseThrow().sha256();
        assertEquals(shipped, c.word().sha256());
    }
}
