package org.precedence.runtime.analysis;

import java.math.BigDecimal;
import java.math.BigInteger;
import java.math.MathContext;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.precedence.api.RankingConvention;
import org.precedence.runtime.dice.DiceSet;
import org.precedence.runtime.dice.DieNames;

/**
 * The reference the exact engine is checked against: rolls every combination of faces
 * (the product of the side counts), sorts the rolled values and tallies. Deliberately shares
 * no code with the analysis package beyond {@link DieNames} for writing rankings.
 */
final class BruteForce {
    final int players;
    final RankingConvention convention;
    /** Outcomes per ranking in acting order; rankings that never happen are absent. */
    final Map<String, Long> rankingCounts = new TreeMap<>();
    /** {@code seat[d][p]}: outcomes with die d at acting position p. */
    final long[][] seat;
    final long outcomes;

    private BruteForce(DiceSet set, RankingConvention convention) {
        this.players = set.players();
        this.convention = convention;
        this.seat = new long[players][players];
        int[] sides = set.sides();
        int[] face = new int[players];
        long total = 0;
        Integer[] order = new Integer[players];
        long[] rolled = new long[players];
        while (true) {
            for (int d = 0; d < players; d++) {
                rolled[d] = set.face(d, face[d]);
                order[d] = d;
            }
            Arrays.sort(order, (a, b) -> convention == RankingConvention.LOWEST_FIRST
                    ? Long.compare(rolled[a], rolled[b]) : Long.compare(rolled[b], rolled[a]));
            int[] acting = new int[players];
            for (int p = 0; p < players; p++) {
                acting[p] = order[p];
                seat[order[p]][p]++;
            }
            rankingCounts.merge(DieNames.ranking(acting), 1L, Long::sum);
            total++;
            int d = 0;
            while (d < players && ++face[d] == sides[d]) {
                face[d] = 0;
                d++;
            }
            if (d == players) {
                break;
            }
        }
        this.outcomes = total;
    }

    static BruteForce of(DiceSet set, RankingConvention convention) {
        return new BruteForce(set, convention);
    }

    static BruteForce of(DiceSet set) {
        return new BruteForce(set, RankingConvention.LOWEST_FIRST);
    }

    long count(String ranking) {
        return rankingCounts.getOrDefault(ranking, 0L);
    }

    /** All n! rankings happen, equally often. */
    boolean orderFair() {
        return rankingCounts.size() == factorial(players)
                && rankingCounts.values().stream().distinct().count() == 1;
    }

    boolean seatFair() {
        return Arrays.stream(seat).flatMapToLong(Arrays::stream).distinct().count() == 1;
    }

    boolean leadFair() {
        return Arrays.stream(seat).mapToLong(row -> row[0]).distinct().count() == 1;
    }

    long min() {
        return rankingCounts.size() < factorial(players) ? 0
                : rankingCounts.values().stream().mapToLong(Long::longValue).min().orElseThrow();
    }

    long max() {
        return rankingCounts.values().stream().mapToLong(Long::longValue).max().orElseThrow();
    }

    /** Every ranking in acting order, lexicographically (including those that never happen). */
    List<String> allRankings() {
        List<String> out = new ArrayList<>();
        permute(new int[players], 0, new boolean[players], out);
        return out;
    }

    private void permute(int[] p, int i, boolean[] used, List<String> out) {
        if (i == players) {
            out.add(DieNames.ranking(p));
            return;
        }
        for (int d = 0; d < players; d++) {
            if (!used[d]) {
                used[d] = true;
                p[i] = d;
                permute(p, i + 1, used, out);
                used[d] = false;
            }
        }
    }

    /** The lexicographically first ranking with the largest |n!·count − outcomes|. */
    String worstRanking() {
        long f = factorial(players);
        String worst = null;
        BigInteger best = BigInteger.valueOf(-1);
        for (String r : allRankings()) {
            BigInteger gap = BigInteger.valueOf(count(r)).multiply(BigInteger.valueOf(f))
                    .subtract(BigInteger.valueOf(outcomes)).abs();
            if (gap.compareTo(best) > 0) {
                best = gap;
                worst = r;
            }
        }
        return worst;
    }

    /** Total variation distance from uniform: ½ Σ |count/outcomes − 1/n!|, rounded to 16 digits. */
    BigDecimal totalVariation() {
        long f = factorial(players);
        BigInteger num = BigInteger.ZERO;
        for (String r : allRankings()) {
            num = num.add(BigInteger.valueOf(count(r)).multiply(BigInteger.valueOf(f))
                    .subtract(BigInteger.valueOf(outcomes)).abs());
        }
        BigInteger den = BigInteger.valueOf(f).multiply(BigInteger.valueOf(outcomes)).shiftLeft(1);
        return new BigDecimal(num).divide(new BigDecimal(den), MathContext.DECIMAL64);
    }

    /**
     * Largest k such that every k of the dice, rolled alone, are order-fair; computed for every
     * k independently (no assumption that fairness passes down to subsets).
     */
    static int subsetDepth(DiceSet set) {
        int n = set.players();
        int depth = 1;
        for (int k = 2; k <= n; k++) {
            boolean all = true;
            for (int[] subset : subsets(n, k)) {
                all &= of(set.subset(subset)).orderFair();
            }
            if (all) {
                depth = k;
            }
        }
        return depth;
    }

    /** All k-element subsets of 0..n-1, each ascending. */
    static List<int[]> subsets(int n, int k) {
        List<int[]> out = new ArrayList<>();
        for (int mask = 0; mask < 1 << n; mask++) {
            if (Integer.bitCount(mask) == k) {
                int[] s = new int[k];
                for (int d = 0, i = 0; d < n; d++) {
                    if ((mask & (1 << d)) != 0) {
                        s[i++] = d;
                    }
                }
                out.add(s);
            }
        }
        return out;
    }

    static long factorial(int n) {
        long f = 1;
        for (int i = 2; i <= n; i++) {
            f *= i;
        }
        return f;
    }
}
