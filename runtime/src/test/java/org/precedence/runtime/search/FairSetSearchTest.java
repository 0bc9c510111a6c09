package org.precedence.runtime.search;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigInteger;
import java.time.Duration;
import java.util.List;
import java.util.Set;
import java.util.TreeSet;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.precedence.api.RankingConvention;
import org.precedence.runtime.analysis.FairnessAnalysis;
import org.precedence.runtime.dice.Word;

class FairSetSearchTest {

    private static SearchResult run(int... sides) {
        return FairSetSearch.run(SearchRequest.orderFair(sides));
    }

    /** Checks the search's counts and classes against the independent brute force. */
    private static void assertMatchesBruteForce(int[] sides, int depth) {
        List<int[]> all = BruteForce.fairWords(sides, depth);
        Set<String> classes = new TreeSet<>();
        for (int[] w : all) {
            classes.add(BruteForce.canonical(w, sides));
        }
        SearchResult r = FairSetSearch.run(SearchRequest.orderFair(sides).withDepth(depth));
        assertTrue(r.complete());
        assertEquals(BigInteger.valueOf(all.size()), r.solutions(), "labelled count");
        assertEquals(classes.size(), r.classes(), "class count");
        Set<String> got = new TreeSet<>();
        for (Word w : r.words()) {
            got.add(w.toString());
        }
        assertEquals(classes, got, "class representatives");
    }

    @Test
    void run_threeDiceSixSides_findsExactlySixClasses() {
        SearchResult r = run(6, 6, 6);
        assertTrue(r.complete());
        // Fact of the trade (common practice, no source): up to renaming the dice and reversing
        // the word there are exactly six order-fair sets of three 6-sided dice.
        assertEquals(6, r.classes());
        assertEquals(6, r.words().size());
        for (Word w : r.words()) {
            assertTrue(FairnessAnalysis.analyse(w, RankingConvention.LOWEST_FIRST).orderFair(), w::toString);
        }
    }

    @Test
    void run_threeDiceSixSides_countsMatchBruteForce() {
        assertMatchesBruteForce(new int[] {6, 6, 6}, 3);
    }

    @Test
    void run_smallSideLists_matchBruteForce() {
        int[][] cases = {{2, 2}, {4, 4}, {2, 6}, {4, 6}, {6, 6}, {1, 2}, {2, 4, 6}, {4, 4, 6},
            {3, 4, 6}, {2, 2, 6}, {4, 5, 6}, {3, 3, 4}, {4, 4, 4}};
        for (int[] sides : cases) {
            assertMatchesBruteForce(sides, sides.length);
        }
        assertMatchesBruteForce(new int[] {4, 4, 4}, 2);
        assertMatchesBruteForce(new int[] {2, 2, 2, 2}, 2);
        assertMatchesBruteForce(new int[] {3, 3, 3, 3}, 3);
    }

    @ParameterizedTest
    @ValueSource(ints = {2, 3, 4, 5})
    void run_threeDiceFewerThanSixSides_noneAndBoundSaysWhy(int sides) {
        // Fact of the trade: no order-fair three dice with fewer than 6 sides each. The brief's
        // divisibility bound explains it: 6 = 3! must divide s^3, or a pair fails 2 | s^2.
        SearchResult r = run(sides, sides, sides);
        assertTrue(r.complete());
        assertEquals(BigInteger.ZERO, r.solutions());
        assertEquals(0, r.classes());
        assertNotNull(r.reason(), "the bound must explain the answer");
        assertEquals(0, r.nodes(), "an impossible request must not search");
    }

    @Test
    void run_sides246_findsAllThree() {
        // OEIS A362634 notes that three dice with 2, 4 and 6 sides can be order-fair; the brute
        // force below confirms the exact count independently.
        SearchResult r = run(2, 4, 6);
        assertTrue(r.complete());
        assertEquals(3, r.classes());
        assertEquals(BigInteger.valueOf(3), r.solutions());
        assertEquals(BruteForce.fairWords(new int[] {2, 4, 6}, 3).size(), 3);
    }

    @Test
    void run_fourDiceSixSides_provesNone() {
        // Fact of the trade (common practice, no source): four 6-sided order-fair dice do not
        // exist, although 6^4 is divisible by 4!.
        assertTrue(SideBounds.violation(new int[] {6, 6, 6, 6}, 4).isEmpty());
        SearchResult r = run(6, 6, 6, 6);
        assertTrue(r.complete());
        assertEquals(BigInteger.ZERO, r.solutions());
        assertEquals(0, r.classes());
        assertNull(r.reason());
        assertTrue(r.nodes() > 0);
    }

    @Test
    void run_fourDiceSixSidesDepthThree_classesSumToLabelledCount() {
        SearchResult r = FairSetSearch.run(SearchRequest.orderFair(6, 6, 6, 6).withDepth(3));
        assertTrue(r.complete());
        assertTrue(r.classes() > 0);
        SymmetryGroup g = new SymmetryGroup(new int[] {6, 6, 6, 6});
        long sum = 0;
        for (Word w : r.words()) {
            sum += g.orbitSize(StructuredSearch.toBytes(w));
            assertEquals(3, FairnessAnalysis.analyse(w, RankingConvention.LOWEST_FIRST).subsetDepth());
        }
        assertEquals(BigInteger.valueOf(sum), r.solutions());
    }

    @Test
    void run_oneOrTwoThreads_sameResult() {
        SearchResult one = FairSetSearch.run(SearchRequest.orderFair(6, 6, 6).withThreads(1));
        SearchResult two = FairSetSearch.run(SearchRequest.orderFair(6, 6, 6).withThreads(2));
        assertEquals(one.solutions(), two.solutions());
        assertEquals(one.words(), two.words());
    }

    @Test
    void run_timeLimit_stopsIncomplete() {
        SearchResult r = FairSetSearch.run(SearchRequest.orderFair(12, 12, 12)
                .withTimeLimit(Duration.ofMillis(300)));
        assertFalse(r.complete());
        assertEquals("time limit reached", r.reason());
        assertTrue(r.elapsedMs() < 20_000, "stopped promptly: " + r.elapsedMs());
    }

    @Test
    void run_stopAfter_returnsThatManyClasses() {
        SearchResult r = FairSetSearch.run(SearchRequest.orderFair(6, 6, 6).withStopAfter(1)
                .withThreads(1));
        assertFalse(r.complete());
        assertEquals(1, r.classes());
        assertTrue(FairnessAnalysis.analyse(r.words().get(0), RankingConvention.LOWEST_FIRST).orderFair());
    }

    @Test
    void sideBounds_violation_namesTheFailingSubset() {
        assertEquals("2 dice with sides 3×3: the product 9 is not divisible by 2! = 2, so the 2 "
                + "rankings cannot be equally likely", SideBounds.violation(new int[] {3, 3, 3}, 3).orElseThrow());
        // The brief's bound: 5 dice need a multiple of 30 sides; 12 passes every smaller subset.
        assertTrue(SideBounds.violation(new int[] {12, 12, 12, 12, 12}, 5).isPresent());
        assertTrue(SideBounds.violation(new int[] {12, 12, 12, 12, 12}, 4).isEmpty());
        assertTrue(SideBounds.violation(new int[] {30, 30, 30, 30, 30}, 5).isEmpty());
    }
}
