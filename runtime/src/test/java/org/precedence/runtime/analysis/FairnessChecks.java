package org.precedence.runtime.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigInteger;
import java.util.Arrays;
import java.util.Map;
import java.util.concurrent.atomic.AtomicInteger;
import org.precedence.api.RankingConvention;
import org.precedence.runtime.dice.DiceSet;
import org.precedence.runtime.dice.DieNames;

/**
 * One place that checks a set's exact analysis against {@link BruteForce} (independent
 * enumeration of every outcome) under both conventions, and, whenever the set turns out
 * order-fair, that every subset of it is order-fair as well.
 */
final class FairnessChecks {
    /** How many order-fair sets had their subsets checked (so a test can see it happened). */
    static final AtomicInteger ORDER_FAIR_SETS_CHECKED = new AtomicInteger();

    private FairnessChecks() {
    }

    /** Checks the analysis and the pattern table of {@code set}; returns the lowest-first report. */
    static FairnessReport assertExact(DiceSet set) {
        assertPatternTableExact(set);
        int depth = BruteForce.subsetDepth(set);
        FairnessReport lowest = null;
        for (RankingConvention c : RankingConvention.values()) {
            FairnessReport r = FairnessAnalysis.analyse(set, c);
            BruteForce b = BruteForce.of(set, c);
            String where = set + " under " + c;
            assertEquals(set.players(), r.players(), where);
            assertEquals(BigInteger.valueOf(b.outcomes), r.outcomes(), where);
            assertEquals(b.orderFair(), r.orderFair(), "orderFair of " + where);
            assertEquals(b.seatFair(), r.seatFair(), "seatFair of " + where);
            assertEquals(b.leadFair(), r.leadFair(), "leadFair of " + where);
            assertEquals(depth, r.subsetDepth(), "subsetDepth of " + where);
            assertEquals(BigInteger.valueOf(b.min()), r.minCount(), "minCount of " + where);
            assertEquals(BigInteger.valueOf(b.max()), r.maxCount(), "maxCount of " + where);
            assertEquals(b.worstRanking(), r.worstRanking(), "worstRanking of " + where);
            assertEquals(0, b.totalVariation().compareTo(r.totalVariation()),
                    "totalVariation of " + where + ": " + b.totalVariation() + " vs "
                            + r.totalVariation());
            // Every ranking, in lexicographic order, with its exact count.
            assertEquals(b.allRankings(), r.orderCounts().keySet().stream().toList(), where);
            for (Map.Entry<String, BigInteger> e : r.orderCounts().entrySet()) {
                assertEquals(BigInteger.valueOf(b.count(e.getKey())), e.getValue(),
                        "count of " + e.getKey() + " in " + where);
                assertEquals(e.getValue(), r.orderCounts().get(e.getKey()));
            }
            BigInteger[][] seat = r.seatCounts();
            for (int d = 0; d < set.players(); d++) {
                for (int p = 0; p < set.players(); p++) {
                    assertEquals(BigInteger.valueOf(b.seat[d][p]), seat[d][p],
                            "seat of die " + d + " at " + p + " in " + where);
                }
            }
            if (c == RankingConvention.LOWEST_FIRST) {
                lowest = r;
            }
        }
        if (lowest.orderFair()) {
            assertEverySubsetOrderFair(set);
        }
        return lowest;
    }

    /**
     * Every stored pattern X1…Xk counts the outcomes of dice X1…Xk alone that rank them in
     * that order (lowest first) — compared with enumeration of each subset's outcomes.
     */
    static void assertPatternTableExact(DiceSet set) {
        PatternTable table = PatternTable.count(set.word());
        int n = set.players();
        assertEquals(PatternTable.stateCount(n), table.size());
        assertEquals(BigInteger.ONE, table.count(0));
        int checked = 1;
        for (int d = 0; d < n; d++) {
            // A single die "ranks" alone in each of its faces.
            assertEquals(BigInteger.valueOf(set.sides()[d]), table.countOf(d));
            checked++;
        }
        for (int k = 2; k <= n; k++) {
            for (int[] subset : BruteForce.subsets(n, k)) {
                BruteForce b = BruteForce.of(set.subset(subset));
                for (String ranking : b.allRankings()) {
                    int[] pattern = new int[k];
                    for (int i = 0; i < k; i++) {
                        pattern[i] = subset[DieNames.indexOf(ranking.substring(i, i + 1))];
                    }
                    int state = table.indexOf(pattern);
                    assertEquals(k, table.length(state));
                    assertEquals(Arrays.toString(pattern),
                            Arrays.toString(table.pattern(state)));
                    assertEquals(BigInteger.valueOf(b.count(ranking)), table.count(state),
                            "pattern " + Arrays.toString(pattern) + " of " + set);
                    checked++;
                }
            }
        }
        assertEquals(table.size(), checked, "every pattern checked once");
    }

    /** Every subset of at least two dice of an order-fair set is order-fair, by both methods. */
    static void assertEverySubsetOrderFair(DiceSet set) {
        int n = set.players();
        for (int k = 2; k < n; k++) {
            for (int[] subset : BruteForce.subsets(n, k)) {
                DiceSet sub = set.subset(subset);
                assertTrue(FairnessAnalysis.analyse(sub).orderFair(), "subset of " + set + ": " + sub);
                assertTrue(BruteForce.of(sub).orderFair(), "subset of " + set + ": " + sub);
            }
        }
        ORDER_FAIR_SETS_CHECKED.incrementAndGet();
    }
}
