package org.precedence.runtime.analysis;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.precedence.runtime.dice.Word;

/**
 * A tiny exhaustive search for order-fair words with given side counts, used by the tests to
 * find order-fair sets of their own (never copied from anywhere). Builds the word letter by
 * letter, keeping every pattern's count for the prefix, and abandons a prefix as soon as some
 * pattern over k dice already has more occurrences than its share, the product of those dice's
 * side counts divided by k!.
 */
final class OrderFairSearch {
    private final int n;
    private final int[] sides;
    private final int total;
    /** Pattern table layout: patterns as sequences, indexed like {@link PatternTable}. */
    private final PatternTable layout;
    private final int[][] from;
    private final int[][] to;
    private final long[] target;
    private final List<Word> found = new ArrayList<>();

    private OrderFairSearch(int[] sides) {
        this.n = sides.length;
        this.sides = sides.clone();
        this.total = Arrays.stream(sides).sum();
        // Borrow the numbering from a real table over a throwaway word.
        int[] letters = new int[n];
        for (int d = 0; d < n; d++) {
            letters[d] = d;
        }
        this.layout = PatternTable.count(Word.of(n, letters));
        int size = layout.size();
        this.target = new long[size];
        this.from = new int[n][];
        this.to = new int[n][];
        for (int x = 0; x < n; x++) {
            List<int[]> pairs = new ArrayList<>();
            for (int s = 0; s < size; s++) {
                int[] p = layout.pattern(s);
                int[] ext = Arrays.copyOf(p, p.length + 1);
                ext[p.length] = x;
                int c = layout.indexOf(ext);
                if (c >= 0) {
                    pairs.add(new int[] {s, c});
                }
            }
            from[x] = pairs.stream().mapToInt(a -> a[0]).toArray();
            to[x] = pairs.stream().mapToInt(a -> a[1]).toArray();
        }
        for (int s = 0; s < size; s++) {
            int[] p = layout.pattern(s);
            long product = 1;
            for (int l : p) {
                product *= sides[l];
            }
            target[s] = p.length < 2 ? Long.MAX_VALUE : product / BruteForce.factorial(p.length);
        }
    }

    /** Returns every order-fair word with exactly {@code sides[d]} letters d (none if the bound fails). */
    static List<Word> find(int... sides) {
        if (!LowerBounds.sidesAllowed(sides)) {
            return List.of();
        }
        OrderFairSearch s = new OrderFairSearch(sides);
        long[] counts = new long[s.layout.size()];
        counts[0] = 1;
        s.extend(new int[s.total], 0, s.sides.clone(), counts);
        return s.found;
    }

    private void extend(int[] word, int i, int[] left, long[] counts) {
        if (i == total) {
            found.add(Word.of(n, word));
            return;
        }
        for (int x = 0; x < n; x++) {
            if (left[x] == 0) {
                continue;
            }
            long[] next = counts.clone();
            boolean ok = true;
            int[] f = from[x];
            int[] t = to[x];
            for (int j = 0; j < f.length && ok; j++) {
                next[t[j]] += next[f[j]];
                ok = next[t[j]] <= target[t[j]];
            }
            if (ok) {
                left[x]--;
                word[i] = x;
                extend(word, i + 1, left, next);
                left[x]++;
            }
        }
    }
}
