package org.precedence.runtime.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import java.math.BigInteger;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.precedence.api.FairnessGrade;
import org.precedence.api.RankingConvention;
import org.precedence.runtime.dice.DiceSet;
import org.precedence.runtime.dice.Word;

/** Every derived property against brute-force enumeration ({@link FairnessChecks}). */
class FairnessAnalysisTest {

    @Test
    void analyse_randomSmallSets_matchBruteForce() {
        SplittableRandom rnd = new SplittableRandom(TestSets.seed("FairnessAnalysisTest.random"));
        for (int trial = 0; trial < 160; trial++) {
            int n = 2 + rnd.nextInt(4);
            boolean equal = trial % 2 == 0;
            int[] sides = TestSets.randomSides(rnd, n, equal, 3000);
            assertGradesNest(FairnessChecks.assertExact(TestSets.randomSet(rnd, sides)));
        }
    }

    @Test
    void analyse_everyWordWithSides336_matchesBruteForce() {
        // 12!/(3!·3!·6!) = 18,480 words, 54 outcomes each. None is order-fair, yet seat- and
        // lead-fair words without order fairness occur: 2 seat-fair and 94 lead-fair (counted by
        // the Java brute force here, and independently by a throwaway script while writing this).
        List<Word> words = TestSets.allWords(3, 3, 6);
        assertEquals(18480, words.size());
        int seatFair = 0;
        int leadFair = 0;
        for (Word w : words) {
            FairnessReport r = FairnessChecks.assertExact(w.toDiceSet());
            assertGradesNest(r);
            assertFalse(r.orderFair());
            seatFair += r.seatFair() ? 1 : 0;
            leadFair += r.leadFair() ? 1 : 0;
        }
        assertEquals(2, seatFair);
        assertEquals(94, leadFair);
    }

    @Test
    void analyse_everyWordOfFourTwoSidedDice_matchesBruteForce() {
        for (Word w : TestSets.allWords(2, 2, 2, 2)) {
            assertGradesNest(FairnessChecks.assertExact(w.toDiceSet()));
        }
    }

    @Test
    void analyse_orderFairSetsWithSides246_existAndPassDownToSubsets() {
        // OEIS A362634 notes that three dice with 2, 4 and 6 sides can be order-fair
        // (from the entry's comments as summarised in our brief). Exhaustive search here.
        List<Word> fair = OrderFairSearch.find(2, 4, 6);
        assertFalse(fair.isEmpty());
        System.out.println("order-fair 2/4/6: " + fair.size() + " words, first " + fair.get(0));
        int before = FairnessChecks.ORDER_FAIR_SETS_CHECKED.get();
        for (Word w : fair) {
            FairnessReport r = FairnessChecks.assertExact(w.toDiceSet());
            assertTrue(r.orderFair());
            assertEquals(3, r.subsetDepth());
            assertEquals(BigInteger.valueOf(8), r.minCount());
        }
        assertEquals(before + fair.size(), FairnessChecks.ORDER_FAIR_SETS_CHECKED.get());
        // And the search agrees with the analysis on every one of the 13,860 words.
        int byAnalysis = 0;
        for (Word w : TestSets.allWords(2, 4, 6)) {
            byAnalysis += FairnessAnalysis.analyse(w, RankingConvention.LOWEST_FIRST).orderFair() ? 1 : 0;
        }
        assertEquals(fair.size(), byAnalysis);
    }

    @Test
    void analyse_threeSixSidedDice_exactlySixFairSetsUpToRenamingAndReversal() {
        // Fact of the trade (common practice, no source): order-fair sets of three 6-sided
        // dice exist, and up to renaming the dice and reading the word backwards there are
        // exactly six of them.
        List<Word> fair = OrderFairSearch.find(6, 6, 6);
        Set<Word> orbitRepresentatives = new HashSet<>();
        for (Word w : fair) {
            orbitRepresentatives.add(Symmetry.canonical(w, true));
        }
        assertEquals(6, orbitRepresentatives.size());
        orbitRepresentatives.stream().map(Word::toString).sorted()
                .forEach(w -> System.out.println("order-fair 3 x 6: " + w));
        for (Word w : orbitRepresentatives) {
            FairnessReport r = FairnessChecks.assertExact(w.toDiceSet());
            assertTrue(r.orderFair());
            assertEquals(BigInteger.valueOf(36), r.maxCount());
        }
        // Every member of every orbit is fair, and the search found whole orbits.
        for (Word w : fair) {
            for (Word image : Symmetry.orbit(w, true)) {
                assertTrue(fair.contains(image));
            }
        }
    }

    @Test
    void analyse_balancedWordFollowedByItsReverse_hasDepthTwo() {
        // Brief §5: any word with each letter once followed by its reverse has depth 2.
        for (String s : List.of("ABC", "ABCD", "ABCDE", "DBEAC")) {
            Word w = Word.parse(s).concat(Word.parse(s).reversed());
            FairnessReport r = FairnessChecks.assertExact(w.toDiceSet());
            assertEquals(2, r.subsetDepth(), s);
            assertFalse(r.orderFair(), s);
        }
    }

    @Test
    void analyse_twoDiceFairSet_isOrderFair() {
        FairnessReport r = FairnessChecks.assertExact(Word.parse("ABBA").toDiceSet());
        assertTrue(r.orderFair());
        assertEquals(FairnessGrade.ORDER_FAIR, r.grade());
        assertEquals(0, r.totalVariation().signum());
        assertEquals(2, r.subsetDepth());
    }

    @Test
    void analyse_plainWord_isAsUnfairAsCanBe() {
        // ABC: A always lowest, so one ranking takes every outcome.
        FairnessReport r = FairnessAnalysis.analyse(Word.parse("ABC"), RankingConvention.LOWEST_FIRST);
        assertEquals(BigInteger.ONE, r.orderCounts().get("ABC"));
        assertEquals(BigInteger.ZERO, r.orderCounts().get("CBA"));
        assertEquals("ABC", r.worstRanking());
        assertEquals(0, new BigDecimal("0.8333333333333333").compareTo(r.totalVariation()));
        assertEquals(FairnessGrade.UNFAIR, r.grade());
        FairnessReport d = FairnessAnalysis.analyse(Word.parse("ABC"), RankingConvention.HIGHEST_FIRST);
        assertEquals(BigInteger.ONE, d.orderCounts().get("CBA"));
        assertEquals("CBA", d.worstRanking());
        assertEquals(BigInteger.ONE, d.seatCounts()[2][0], "C, the highest, acts first");
    }

    @Test
    void orderCounts_isImmutableAndRejectsNonRankings() {
        FairnessReport r = FairnessAnalysis.analyse(Word.parse("ABBA").toDiceSet());
        assertThrows(UnsupportedOperationException.class, () -> r.orderCounts().put("AB", BigInteger.ONE));
        assertEquals(null, r.orderCounts().get("AA"));
        assertEquals(null, r.orderCounts().get("ABC"));
        assertEquals(null, r.orderCounts().get(42));
        assertFalse(r.orderCounts().containsKey("C"));
        assertEquals(2, r.orderCounts().size());
        r.seatCounts()[0][0] = BigInteger.TEN;
        assertEquals(BigInteger.TWO, r.seatCounts()[0][0], "the report hands out copies");
    }

    @Test
    void analyse_eightDiceSet_countsShareOutTheOutcomes() {
        SplittableRandom rnd = new SplittableRandom(TestSets.seed("FairnessAnalysisTest.eight"));
        DiceSet set = TestSets.randomSet(rnd, new int[] {5, 6, 7, 8, 9, 10, 11, 12});
        FairnessReport r = FairnessAnalysis.analyse(set, RankingConvention.HIGHEST_FIRST);
        assertEquals(40320, r.orderCounts().size());
        BigInteger sum = r.orderCounts().values().stream().reduce(BigInteger.ZERO, BigInteger::add);
        assertEquals(r.outcomes(), sum);
        assertGradesNest(r);
        assertTrue(r.minCount().compareTo(r.maxCount()) < 0);
    }

    @Test
    void analyse_bigIntegerPath_givesTheSameReport() {
        SplittableRandom rnd = new SplittableRandom(TestSets.seed("FairnessAnalysisTest.big"));
        List<Word> words = new java.util.ArrayList<>(OrderFairSearch.find(2, 4, 6));
        for (int trial = 0; trial < 80; trial++) {
            int n = 2 + rnd.nextInt(5);
            words.add(TestSets.randomSet(rnd, TestSets.randomSides(rnd, n, trial % 2 == 0, 50_000)).word());
        }
        for (Word w : words) {
            for (RankingConvention c : RankingConvention.values()) {
                FairnessReport plain = FairnessAnalysis.analyse(w, c, false);
                FairnessReport big = FairnessAnalysis.analyse(w, c, true);
                assertEquals(plain.orderCounts(), big.orderCounts(), w.toString());
                assertEquals(java.util.Arrays.deepToString(plain.seatCounts()),
                        java.util.Arrays.deepToString(big.seatCounts()));
                assertEquals(plain.orderFair(), big.orderFair());
                assertEquals(plain.seatFair(), big.seatFair());
                assertEquals(plain.leadFair(), big.leadFair());
                assertEquals(plain.subsetDepth(), big.subsetDepth());
                assertEquals(plain.minCount(), big.minCount());
                assertEquals(plain.maxCount(), big.maxCount());
                assertEquals(plain.worstRanking(), big.worstRanking());
                assertEquals(0, plain.totalVariation().compareTo(big.totalVariation()));
            }
        }
    }

    /** order-fair ⇒ seat-fair ⇒ lead-fair, on every report the tests see. */
    private static void assertGradesNest(FairnessReport r) {
        assertTrue(!r.orderFair() || r.seatFair(), "order-fair implies seat-fair");
        assertTrue(!r.seatFair() || r.leadFair(), "seat-fair implies lead-fair");
        assertEquals(r.orderFair(), r.subsetDepth() == r.players());
    }
}
