package org.precedence.runtime.construction;

import java.math.BigInteger;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.precedence.runtime.dice.DieNames;

/**
 * Exact occurrence counts of every pattern of distinct letters in a constructed word, computed
 * level by level from the start word's counts — the word itself is never built.
 *
 * <p>Two rules suffice. Relabelling: a pattern w occurs in σ(W) as often as σ⁻¹(w) occurs in W;
 * reversal: w occurs in W backwards as often as w backwards occurs in W. Concatenation: an
 * occurrence of w in XY splits w into a prefix inside X and a suffix inside Y, so
 * N_XY(w) = Σ_i N_X(w_1…w_i)·N_Y(w_{i+1}…w_k). Folding the blocks of a level from left to right
 * with these rules gives the next level's counts. The block list is read from the same {@link
 * Level} objects the served {@link ConstructedDice} compares with, so the counts are those of
 * the set that is served. Offered up to 7 dice (the last level of S7 has 5040 blocks).
 */
public final class ComposedCounts {
    private final int players;
    private final PatternSpace space;
    private final BigInteger[] counts;
    private final int[] depthAfterLevel;

    private ComposedCounts(int players, PatternSpace space, BigInteger[] counts, int[] depthAfterLevel) {
        this.players = players;
        this.space = space;
        this.counts = counts;
        this.depthAfterLevel = depthAfterLevel;
    }

    /** Composes the counts of every pattern in {@code construction}'s word (up to 7 dice). */
    public static ComposedCounts of(Construction construction) {
        int n = construction.players();
        if (n > 7) {
            throw new IllegalArgumentException("composed counts are offered up to 7 dice, got " + n);
        }
        return of(construction, construction.levels().size(), n);
    }

    /**
     * Composes the counts of the patterns of at most {@code maxLength} letters in the word after
     * the first {@code levelCount} levels. Occurrences of a short pattern in a concatenation only
     * split into shorter ones, so short patterns never need long ones: checking depth d needs
     * patterns up to length d only, which keeps this cheap for any number of dice.
     */
    public static ComposedCounts of(Construction construction, int levelCount, int maxLength) {
        int n = construction.players();
        PatternSpace space = new PatternSpace(n, maxLength);
        BigInteger[] counts = startCounts(construction.start().word(), space);
        List<Level> levels = construction.levels().subList(0, levelCount);
        int[] depths = new int[levels.size()];
        int[] sigma = new int[n];
        int[] inverse = new int[n];
        int[] reverse = space.reverseMap();
        for (int li = 0; li < levels.size(); li++) {
            Level level = levels.get(li);
            BigInteger[] acc = unit(space.size);
            BigInteger[] block = new BigInteger[space.size];
            for (BigInteger b = BigInteger.ZERO; b.compareTo(level.blocks()) < 0; b = b.add(BigInteger.ONE)) {
                int[] map;
                if (level.relabel(b, sigma)) {
                    for (int x = 0; x < n; x++) {
                        inverse[sigma[x]] = x;
                    }
                    map = space.relabelMap(inverse);
                } else {
                    map = identity(space.size);
                }
                boolean rev = level.reversed(b);
                for (int s = 0; s < space.size; s++) {
                    int t = rev ? reverse[s] : s;
                    block[s] = counts[map[t]];
                }
                acc = concat(space, acc, block);
            }
            counts = acc;
            depths[li] = depthOf(space, counts);
        }
        return new ComposedCounts(n, space, counts, depths);
    }

    /** Counts every pattern of the space in the start word (a short word, counted directly). */
    private static BigInteger[] startCounts(org.precedence.runtime.dice.Word word, PatternSpace space) {
        BigInteger[] counts = new BigInteger[space.size];
        java.util.Arrays.fill(counts, BigInteger.ZERO);
        counts[0] = BigInteger.ONE;
        int[] children = new int[space.size * space.n];
        java.util.Arrays.fill(children, -1);
        for (int s = 1; s < space.size; s++) {
            int[] p = space.letters[s];
            int parent = space.prefix[s][p.length - 1];
            children[parent * space.n + p[p.length - 1]] = s;
        }
        for (int i = 0; i < word.length(); i++) {
            int x = word.letterAt(i);
            for (int s = space.size - 1; s >= 0; s--) {
                int c = children[s * space.n + x];
                if (c >= 0 && counts[s].signum() != 0) {
                    counts[c] = counts[c].add(counts[s]);
                }
            }
        }
        return counts;
    }

    private static BigInteger[] unit(int size) {
        BigInteger[] u = new BigInteger[size];
        Arrays.fill(u, BigInteger.ZERO);
        u[0] = BigInteger.ONE;
        return u;
    }

    private static int[] identity(int size) {
        int[] id = new int[size];
        for (int i = 0; i < size; i++) {
            id[i] = i;
        }
        return id;
    }

    private static BigInteger[] concat(PatternSpace space, BigInteger[] left, BigInteger[] right) {
        BigInteger[] out = new BigInteger[space.size];
        for (int s = 0; s < space.size; s++) {
            int[] pre = space.prefix[s];
            int[] suf = space.suffix[s];
            BigInteger sum = BigInteger.ZERO;
            for (int i = 0; i < pre.length; i++) {
                BigInteger l = left[pre[i]];
                BigInteger r = right[suf[i]];
                if (l.signum() != 0 && r.signum() != 0) {
                    sum = sum.add(l.multiply(r));
                }
            }
            out[s] = sum;
        }
        return out;
    }

    /** Largest k such that, for every set of k letters, all its orderings have the same count. */
    private static int depthOf(PatternSpace space, BigInteger[] counts) {
        int depth = 1;
        for (int k = 2; k <= space.maxLength; k++) {
            Map<Long, BigInteger> bySet = new java.util.HashMap<>();
            for (int s = 0; s < space.size; s++) {
                if (space.length[s] != k) {
                    continue;
                }
                long mask = 0;
                for (int x : space.letters[s]) {
                    mask |= 1L << x;
                }
                BigInteger prior = bySet.putIfAbsent(mask, counts[s]);
                if (prior != null && !prior.equals(counts[s])) {
                    return depth;
                }
            }
            depth = k;
        }
        return depth;
    }

    public int players() {
        return players;
    }

    /** Returns the count of a pattern of distinct letters. */
    public BigInteger countOf(int... pattern) {
        return counts[space.indexOf(pattern, 0, pattern.length)];
    }

    /** Returns the subset depth reached after each level, first level first. */
    public int[] depthAfterLevel() {
        return depthAfterLevel.clone();
    }

    /** Returns the count of every full ranking (letters in increasing value), keyed by die names. */
    public Map<String, BigInteger> rankingCounts() {
        Map<String, BigInteger> out = new LinkedHashMap<>();
        for (int s = 0; s < space.size; s++) {
            if (space.length[s] == players) {
                out.put(DieNames.ranking(space.letters[s]), counts[s]);
            }
        }
        return out;
    }

    /** Returns the distinct values among the n! ranking counts (one value when order-fair). */
    public List<BigInteger> distinctRankingCounts() {
        List<BigInteger> out = new ArrayList<>();
        for (BigInteger c : rankingCounts().values()) {
            if (!out.contains(c)) {
                out.add(c);
            }
        }
        return out;
    }

    /** Returns whether all n! rankings have the same count (false when rankings were not composed). */
    public boolean orderFair() {
        return space.maxLength == players && distinctRankingCounts().size() == 1;
    }
}
