package org.precedence.runtime.analysis;

import java.math.BigDecimal;
import java.math.BigInteger;
import java.math.MathContext;
import java.util.HashMap;
import java.util.Map;
import java.util.TreeMap;
import org.precedence.api.RankingConvention;
import org.precedence.runtime.dice.DiceSet;
import org.precedence.runtime.dice.DieNames;
import org.precedence.runtime.dice.Word;

/**
 * Derives every fairness property of a set from its {@link PatternTable}.
 *
 * <p>Rankings are patterns of all n letters read left to right, i.e. by increasing value; under
 * {@link RankingConvention#HIGHEST_FIRST} the acting order is that pattern reversed.
 */
public final class FairnessAnalysis {
    private FairnessAnalysis() {
    }

    /** Analyses {@code set} under the lowest-first convention. */
    public static FairnessReport analyse(DiceSet set) {
        return analyse(set.word(), RankingConvention.LOWEST_FIRST);
    }

    /** Analyses {@code word} under {@code convention}. */
    public static FairnessReport analyse(Word word, RankingConvention convention) {
        PatternTable table = PatternTable.count(word);
        int n = word.players();
        int[] sides = word.sides();
        BigInteger outcomes = PatternTable.productOfSides(word);
        boolean descending = convention == RankingConvention.HIGHEST_FIRST;

        Map<String, BigInteger> orderCounts = new TreeMap<>();
        BigInteger[][] seat = new BigInteger[n][n];
        for (BigInteger[] row : seat) {
            java.util.Arrays.fill(row, BigInteger.ZERO);
        }
        BigInteger min = null;
        BigInteger max = null;
        int rankings = 0;
        for (int s = 0; s < table.size(); s++) {
            if (table.length(s) != n) {
                continue;
            }
            rankings++;
            int[] pattern = table.pattern(s);
            int[] acting = descending ? reverse(pattern) : pattern;
            BigInteger c = table.count(s);
            orderCounts.put(DieNames.ranking(acting), c);
            for (int p = 0; p < n; p++) {
                seat[acting[p]][p] = seat[acting[p]][p].add(c);
            }
            min = min == null || c.compareTo(min) < 0 ? c : min;
            max = max == null || c.compareTo(max) > 0 ? c : max;
        }

        // Mean count per ranking is outcomes / n!; compare n!·count with outcomes to stay exact.
        BigInteger factorial = factorial(n);
        String worst = null;
        BigInteger worstGap = BigInteger.valueOf(-1);
        BigInteger absSum = BigInteger.ZERO;
        for (Map.Entry<String, BigInteger> e : orderCounts.entrySet()) {
            BigInteger gap = e.getValue().multiply(factorial).subtract(outcomes).abs();
            absSum = absSum.add(gap);
            if (gap.compareTo(worstGap) > 0) {
                worstGap = gap;
                worst = e.getKey();
            }
        }
        // TV = ½ Σ |count/outcomes − 1/n!| = Σ|n!·count − outcomes| / (2·n!·outcomes).
        BigDecimal tv = new BigDecimal(absSum).divide(
                new BigDecimal(factorial.multiply(outcomes).shiftLeft(1)), MathContext.DECIMAL64);

        boolean orderFair = min.equals(max) && rankings == factorial.intValueExact();
        boolean seatFair = allEqual(seat);
        boolean leadFair = true;
        for (int d = 1; d < n; d++) {
            leadFair &= seat[d][0].equals(seat[0][0]);
        }
        return new FairnessReport(n, sides, outcomes, convention, orderCounts, seat, orderFair,
                seatFair, leadFair, subsetDepth(table, n), min, max, worst, tv);
    }

    /**
     * Returns the largest k such that every k of the dice, alone, are order-fair. Uses the
     * occurrence counts of length-k patterns: for a fixed set of k letters these are exactly
     * the outcome counts of the k dice's rankings.
     */
    static int subsetDepth(PatternTable table, int n) {
        int depth = 1;
        for (int k = 2; k <= n; k++) {
            Map<Long, BigInteger> firstCount = new HashMap<>();
            boolean fair = true;
            for (int s = 0; s < table.size() && fair; s++) {
                if (table.length(s) != k) {
                    continue;
                }
                long mask = 0;
                for (int x : table.pattern(s)) {
                    mask |= 1L << x;
                }
                BigInteger c = table.count(s);
                BigInteger prior = firstCount.putIfAbsent(mask, c);
                fair = prior == null || prior.equals(c);
            }
            if (!fair) {
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
