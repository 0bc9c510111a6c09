package org.precedence.runtime.analysis;

import java.math.BigDecimal;
import java.math.BigInteger;
import java.math.MathContext;
import java.util.Arrays;
import java.util.Map;
import org.precedence.api.RankingConvention;
import org.precedence.runtime.dice.DiceSet;
import org.precedence.runtime.dice.DieNames;
import org.precedence.runtime.dice.Word;

/**
 * Derives every fairness property of a set from its {@link PatternTable}.
 *
 * <p>Rankings are patterns of all n letters read left to right, i.e. by increasing value; under
 * {@link RankingConvention#HIGHEST_FIRST} the acting order is that pattern reversed. Order
 * fairness and subset depth do not depend on the convention (reversing every ranking permutes
 * the rankings); seat and lead fairness do.
 */
public final class FairnessAnalysis {
    private FairnessAnalysis() {
    }

    /** Analyses {@code set} under the lowest-first convention. */
    public static FairnessReport analyse(DiceSet set) {
        return analyse(set.word(), RankingConvention.LOWEST_FIRST);
    }

    /** Analyses {@code set} under {@code convention}. */
    public static FairnessReport analyse(DiceSet set, RankingConvention convention) {
        return analyse(set.word(), convention);
    }

    /**
     * Analyses {@code word} under {@code convention}.
     *
     * @throws IllegalArgumentException if the word has more than {@link PatternTable#MAX_PLAYERS} dice
     */
    public static FairnessReport analyse(Word word, RankingConvention convention) {
        return analyse(word, convention, false);
    }

    /** As {@link #analyse(Word, RankingConvention)}; {@code forceBig} takes the BigInteger path (tests). */
    static FairnessReport analyse(Word word, RankingConvention convention, boolean forceBig) {
        PatternTable table = PatternTable.count(word, forceBig);
        int n = word.players();
        int[] sides = word.sides();
        BigInteger outcomes = PatternTable.productOfSides(word);
        boolean descending = convention == RankingConvention.HIGHEST_FIRST;
        BigInteger factorial = factorial(n);
        Rankings r = table.fitsLong()
                ? longRankings(table, n, outcomes.longValueExact() / factorial.longValueExact(),
                        descending)
                : bigRankings(table, n, outcomes.divide(factorial), descending);

        // Mean count per ranking is outcomes / n!, so compare n!·count with outcomes to stay
        // exact. The count farthest from the mean is the minimum or the maximum.
        BigInteger gapMin = outcomes.subtract(factorial.multiply(r.min));
        BigInteger gapMax = factorial.multiply(r.max).subtract(outcomes);
        int cmp = gapMax.compareTo(gapMin);
        int[] worst = cmp > 0 ? r.firstMax : cmp < 0 ? r.firstMin
                : lexicographicallyFirst(acting(r.firstMin, descending),
                        acting(r.firstMax, descending)) <= 0 ? r.firstMin : r.firstMax;
        // Σ|n!·c − O| = 2·Σ_{n!·c > O}(n!·c − O) because the signed gaps sum to zero.
        BigInteger absSum = factorial.multiply(r.sumAbove)
                .subtract(outcomes.multiply(BigInteger.valueOf(r.countAbove))).shiftLeft(1);
        // TV = ½ Σ |c/O − 1/n!| = Σ|n!·c − O| / (2·n!·O).
        BigDecimal tv = new BigDecimal(absSum).divide(
                new BigDecimal(factorial.multiply(outcomes).shiftLeft(1)), MathContext.DECIMAL64);

        boolean orderFair = r.min.equals(r.max);
        boolean seatFair = allEqual(r.seat);
        boolean leadFair = true;
        for (int d = 1; d < n; d++) {
            leadFair &= r.seat[d][0].equals(r.seat[0][0]);
        }
        Map<String, BigInteger> orderCounts = new RankingCounts(table, convention);
        return new FairnessReport(n, sides, outcomes, convention, orderCounts, r.seat, orderFair,
                seatFair, leadFair, subsetDepth(table, n), r.min, r.max,
                DieNames.ranking(acting(worst, descending)), tv);
    }

    /** What one pass over the full rankings yields. */
    private static final class Rankings {
        BigInteger min;
        BigInteger max;
        int[] firstMin;
        int[] firstMax;
        /** Sum of the counts above the mean, and how many rankings have them. */
        BigInteger sumAbove;
        long countAbove;
        BigInteger[][] seat;
    }

    /*
     * Both passes visit rankings in table order (lexicographic by value order). The first
     * minimum/maximum in acting order is then resolved by comparing acting orders explicitly.
     */
    private static Rankings longRankings(PatternTable table, int n, long meanFloor,
                                         boolean descending) {
        long[][] seat = new long[n][n];
        long[] stats = {Long.MAX_VALUE, Long.MIN_VALUE, 0, 0};
        int[][] first = new int[2][];
        table.forEachOfLength(n, (p, s) -> {
            long c = table.countLong(s);
            for (int i = 0; i < n; i++) {
                seat[p[i]][descending ? n - 1 - i : i] += c;
            }
            if (c < stats[0] || c == stats[0] && earlier(p, first[0], descending)) {
                stats[0] = c;
                first[0] = p.clone();
            }
            if (c > stats[1] || c == stats[1] && earlier(p, first[1], descending)) {
                stats[1] = c;
                first[1] = p.clone();
            }
            if (c > meanFloor) {
                stats[2] += c;
                stats[3]++;
            }
        });
        Rankings r = new Rankings();
        r.min = BigInteger.valueOf(stats[0]);
        r.max = BigInteger.valueOf(stats[1]);
        r.firstMin = first[0];
        r.firstMax = first[1];
        r.sumAbove = BigInteger.valueOf(stats[2]);
        r.countAbove = stats[3];
        r.seat = new BigInteger[n][n];
        for (int d = 0; d < n; d++) {
            for (int p = 0; p < n; p++) {
                r.seat[d][p] = BigInteger.valueOf(seat[d][p]);
            }
        }
        return r;
    }

    private static Rankings bigRankings(PatternTable table, int n, BigInteger meanFloor,
                                        boolean descending) {
        Rankings r = new Rankings();
        r.seat = new BigInteger[n][n];
        for (BigInteger[] row : r.seat) {
            Arrays.fill(row, BigInteger.ZERO);
        }
        r.sumAbove = BigInteger.ZERO;
        table.forEachOfLength(n, (p, s) -> {
            BigInteger c = table.count(s);
            for (int i = 0; i < n; i++) {
                int pos = descending ? n - 1 - i : i;
                r.seat[p[i]][pos] = r.seat[p[i]][pos].add(c);
            }
            int lo = r.min == null ? -1 : c.compareTo(r.min);
            if (lo < 0 || lo == 0 && earlier(p, r.firstMin, descending)) {
                r.min = c;
                r.firstMin = p.clone();
            }
            int hi = r.max == null ? 1 : c.compareTo(r.max);
            if (hi > 0 || hi == 0 && earlier(p, r.firstMax, descending)) {
                r.max = c;
                r.firstMax = p.clone();
            }
            if (c.compareTo(meanFloor) > 0) {
                r.sumAbove = r.sumAbove.add(c);
                r.countAbove++;
            }
        });
        return r;
    }

    /** Whether value-order pattern {@code p} comes before {@code q} in acting-order lexicographic order. */
    private static boolean earlier(int[] p, int[] q, boolean descending) {
        return lexicographicallyFirst(acting(p, descending), acting(q, descending)) < 0;
    }

    private static int lexicographicallyFirst(int[] a, int[] b) {
        return Arrays.compare(a, b);
    }

    private static int[] acting(int[] byValue, boolean descending) {
        return descending ? reverse(byValue) : byValue;
    }

    /**
     * Returns the largest k such that every k of the dice, alone, are order-fair (at least 1).
     * Uses the occurrence counts of length-k patterns: for a fixed set of k letters these are
     * exactly the outcome counts of those k dice's rankings. Stops at the first failing k,
     * since a set whose k-subsets are all order-fair has order-fair (k−1)-subsets too.
     */
    static int subsetDepth(PatternTable table, int n) {
        int depth = 1;
        BigInteger[] firstCount = new BigInteger[1 << n];
        for (int k = 2; k <= n; k++) {
            Arrays.fill(firstCount, null);
            boolean[] fair = {true};
            table.forEachOfLength(k, (p, s) -> {
                if (!fair[0]) {
                    return;
                }
                int mask = 0;
                for (int x : p) {
                    mask |= 1 << x;
                }
                BigInteger c = table.count(s);
                if (firstCount[mask] == null) {
                    firstCount[mask] = c;
                } else if (!firstCount[mask].equals(c)) {
                    fair[0] = false;
                }
            });
            if (!fair[0]) {
                break;
            }
            depth = k;
        }
        return depth;
    }

    private static boolean allEqual(BigInteger[][] m) {
        for (BigInteger[] row : m) {
            for (BigInteger v : row) {
                if (!v.equals(m[0][0])) {
                    return false;
                }
            }
        }
        return true;
    }

    private static int[] reverse(int[] a) {
        int[] r = new int[a.length];
        for (int i = 0; i < a.length; i++) {
            r[i] = a[a.length - 1 - i];
        }
        return r;
    }

    static BigInteger factorial(int n) {
        BigInteger f = BigInteger.ONE;
        for (int i = 2; i <= n; i++) {
            f = f.multiply(BigInteger.valueOf(i));
        }
        return f;
    }
}
