package org.precedence.runtime.construction;

import java.math.BigInteger;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.BitSet;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.precedence.runtime.analysis.PatternTable;

/**
 * Searches, for one small n, levels fitted to the particular word they extend (brief §5,
 * second way): at each level it tries the subgroups of S_n × {forward, backward} — a block may
 * relabel and also read the previous word backwards — in increasing order and keeps those under
 * which the previous word's (t+1)-pattern counts, summed over the blocks, come out equal for
 * every pattern. That condition is exactly what lifting depth t to t+1 needs (patterns split
 * across blocks are equal already), and it is linear in the block multiplicities; searching
 * groups is a cheap way to find small solutions. Block order is the members' index order.
 *
 * <p>Depth-first with a budget: at most {@code tries} valid groups per level, pruned by the best
 * side count found so far. Subgroups are enumerated by closing cyclic subgroups under one more
 * cyclic generator at a time, abandoning closures above {@code maxOrder}. Offered for n ≤ 6
 * (S6 × C2 has 1440 elements; the multiplication table is 8 MB). For n = 6 it takes about
 * half a minute on one core, so the result is shipped as {@link SearchedPlans} and re-proven
 * by exact counts whenever it is served.
 */
public final class LevelSearch {
    private final int n;
    private final int half;
    private final int elements;
    private final int maxOrder;
    private final int tries;
    private final int[][] perms;
    private final int[][] mul;
    private final PatternSpace space;
    private final int[][] relabel;
    private final int[] reverse;
    private long bestSides = Long.MAX_VALUE;
    private List<int[]> best;

    private LevelSearch(int n, int maxOrder, int tries) {
        if (n < 2 || n > 6) {
            throw new IllegalArgumentException("the level search is offered for 2..6 dice, got " + n);
        }
        this.n = n;
        this.maxOrder = maxOrder;
        this.tries = tries;
        this.half = Lehmer.factorial(n).intValueExact();
        this.elements = 2 * half;
        SymmetricFamily s = new SymmetricFamily(n);
        this.perms = new int[half][];
        for (int i = 0; i < half; i++) {
            perms[i] = s.member(BigInteger.valueOf(i));
        }
        this.mul = new int[elements][elements];
        for (int i = 0; i < half; i++) {
            for (int j = 0; j < half; j++) {
                int[] c = new int[n];
                for (int x = 0; x < n; x++) {
                    c[x] = perms[i][perms[j][x]];
                }
                int k = Lehmer.rank(c).intValueExact();
                // Reading backwards commutes with relabelling, so the flags just add mod 2.
                mul[i][j] = k;
                mul[i + half][j] = k + half;
                mul[i][j + half] = k + half;
                mul[i + half][j + half] = k;
            }
        }
        this.space = new PatternSpace(n);
        this.relabel = new int[half][];
        for (int i = 0; i < half; i++) {
            int[] inverse = new int[n];
            for (int x = 0; x < n; x++) {
                inverse[perms[i][x]] = x;
            }
            relabel[i] = space.relabelMap(inverse);
        }
        this.reverse = space.reverseMap();
    }

    /**
     * Runs the search from the letters AB… and returns the smallest construction found, each
     * level listed block by block; empty if none was found within the budget.
     */
    public static Optional<Construction> search(int n, int maxOrder, int tries) {
        LevelSearch s = new LevelSearch(n, maxOrder, tries);
        List<int[]> groups = s.subgroups();
        groups.sort(Comparator.comparingInt(g -> g.length));
        int[] letters = new int[n];
        for (int i = 0; i < n; i++) {
            letters[i] = i;
        }
        PatternTable t = PatternTable.count(org.precedence.runtime.dice.Word.of(n, letters));
        BigInteger[] counts = new BigInteger[s.space.size];
        for (int st = 0; st < s.space.size; st++) {
            counts[st] = t.countOf(s.space.letters[st]);
        }
        s.depthFirst(counts, 1, 1, new ArrayList<>(), groups);
        if (s.best == null) {
            return Optional.empty();
        }
        return Optional.of(SearchedPlans.fromElements(n, s.best));
    }

    private void depthFirst(BigInteger[] counts, int depth, long sides, List<int[]> chosen, List<int[]> groups) {
        if (depth == n) {
            if (sides < bestSides) {
                bestSides = sides;
                best = new ArrayList<>(chosen);
            }
            return;
        }
        int k = depth + 1;
        long rest = 1L << (n - k);
        int tried = 0;
        for (int[] g : groups) {
            if (sides * g.length * rest >= bestSides) {
                break;
            }
            if (!lifts(counts, g, k)) {
                continue;
            }
            chosen.add(g);
            depthFirst(compose(counts, g), k, sides * g.length, chosen, groups);
            chosen.remove(chosen.size() - 1);
            if (++tried >= tries) {
                break;
            }
        }
    }

    private int mapOf(int e, int st) {
        return relabel[e % half][e >= half ? reverse[st] : st];
    }

    private boolean lifts(BigInteger[] counts, int[] g, int k) {
        BigInteger first = null;
        for (int st = 0; st < space.size; st++) {
            if (space.length[st] != k) {
                continue;
            }
            BigInteger sum = BigInteger.ZERO;
            for (int e : g) {
                sum = sum.add(counts[mapOf(e, st)]);
            }
            if (first == null) {
                first = sum;
            } else if (!first.equals(sum)) {
                return false;
            }
        }
        return true;
    }

    private BigInteger[] compose(BigInteger[] counts, int[] g) {
        BigInteger[] acc = new BigInteger[space.size];
        java.util.Arrays.fill(acc, BigInteger.ZERO);
        acc[0] = BigInteger.ONE;
        BigInteger[] block = new BigInteger[space.size];
        for (int e : g) {
            for (int st = 0; st < space.size; st++) {
                block[st] = counts[mapOf(e, st)];
            }
            BigInteger[] out = new BigInteger[space.size];
            for (int st = 0; st < space.size; st++) {
                int[] pre = space.prefix[st];
                int[] suf = space.suffix[st];
                BigInteger sum = BigInteger.ZERO;
                for (int i = 0; i < pre.length; i++) {
                    BigInteger l = acc[pre[i]];
                    BigInteger r = block[suf[i]];
                    if (l.signum() != 0 && r.signum() != 0) {
                        sum = sum.add(l.multiply(r));
                    }
                }
                out[st] = sum;
            }
            acc = out;
        }
        return acc;
    }

    private List<int[]> subgroups() {
        Map<BitSet, List<Integer>> seen = new HashMap<>();
        List<BitSet> frontier = new ArrayList<>();
        List<Integer> cyclic = new ArrayList<>();
        for (int e = 0; e < elements; e++) {
            List<Integer> gens = List.of(e);
            BitSet b = closure(gens);
            if (b != null && !seen.containsKey(b)) {
                seen.put(b, gens);
                frontier.add(b);
                cyclic.add(e);
            }
        }
        while (!frontier.isEmpty()) {
            List<BitSet> next = new ArrayList<>();
            for (BitSet h : frontier) {
                for (int e : cyclic) {
                    if (h.get(e)) {
                        continue;
                    }
                    List<Integer> gens = new ArrayList<>(seen.get(h));
                    gens.add(e);
                    BitSet b = closure(gens);
                    if (b != null && !seen.containsKey(b)) {
                        seen.put(b, gens);
                        next.add(b);
                    }
                }
            }
            frontier = next;
        }
        List<int[]> out = new ArrayList<>();
        for (BitSet b : seen.keySet()) {
            out.add(b.stream().toArray());
        }
        // Deterministic order among equal sizes: by member list.
        out.sort(Comparator.<int[]>comparingInt(g -> g.length).thenComparing(java.util.Arrays::compare));
        return out;
    }

    private BitSet closure(List<Integer> gens) {
        BitSet b = new BitSet(elements);
        b.set(0);
        ArrayDeque<Integer> queue = new ArrayDeque<>();
        queue.add(0);
        int size = 1;
        while (!queue.isEmpty()) {
            int x = queue.poll();
            for (int g : gens) {
                int y = mul[x][g];
                if (!b.get(y)) {
                    b.set(y);
                    queue.add(y);
                    if (++size > maxOrder) {
                        return null;
                    }
                }
            }
        }
        return b;
    }
}
