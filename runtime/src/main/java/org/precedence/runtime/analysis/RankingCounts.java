package org.precedence.runtime.analysis;

import java.math.BigInteger;
import java.util.AbstractMap;
import java.util.AbstractSet;
import java.util.Iterator;
import java.util.Map;
import java.util.NoSuchElementException;
import java.util.Set;
import org.precedence.api.RankingConvention;
import org.precedence.runtime.dice.DieNames;

/**
 * An unmodifiable map view "ranking in acting order → outcomes" over the full-length patterns
 * of a {@link PatternTable}, so a report over many dice costs no memory beyond the table.
 * Keys are die names in acting order ({@link DieNames#ranking}); iteration is in
 * lexicographic order of the acting order.
 */
final class RankingCounts extends AbstractMap<String, BigInteger> {
    private final PatternTable table;
    private final boolean descending;
    private final int players;
    private final int size;

    RankingCounts(PatternTable table, RankingConvention convention) {
        this.table = table;
        this.descending = convention == RankingConvention.HIGHEST_FIRST;
        this.players = table.players();
        this.size = table.endOfLength(players) - table.firstOfLength(players);
    }

    /** Returns the table state of the ranking whose acting order is {@code acting}. */
    int stateOf(int[] acting) {
        int[] byValue = descending ? reversed(acting) : acting;
        return table.indexOf(byValue);
    }

    @Override
    public BigInteger get(Object key) {
        int[] acting = parse(key);
        return acting == null ? null : table.count(stateOf(acting));
    }

    @Override
    public boolean containsKey(Object key) {
        return parse(key) != null;
    }

    @Override
    public int size() {
        return size;
    }

    @Override
    public Set<Entry<String, BigInteger>> entrySet() {
        return new AbstractSet<>() {
            @Override
            public Iterator<Entry<String, BigInteger>> iterator() {
                return new Rankings();
            }

            @Override
            public int size() {
                return size;
            }
        };
    }

    /** Returns the acting order named by {@code key}, or null if it is not a ranking of all dice. */
    private int[] parse(Object key) {
        if (!(key instanceof String s)) {
            return null;
        }
        String[] tokens = s.contains("-") ? s.split("-", -1) : s.split("");
        if (tokens.length != players) {
            return null;
        }
        int[] acting = new int[players];
        for (int i = 0; i < players; i++) {
            acting[i] = DieNames.indexOf(tokens[i]);
            if (acting[i] < 0 || acting[i] >= players) {
                return null;
            }
        }
        if (!DieNames.ranking(acting).equals(s) || stateOf(acting) < 0) {
            return null;
        }
        return acting;
    }

    private static int[] reversed(int[] a) {
        int[] r = new int[a.length];
        for (int i = 0; i < a.length; i++) {
            r[i] = a[a.length - 1 - i];
        }
        return r;
    }

    /** Acting orders in lexicographic order (the standard next-permutation step). */
    private final class Rankings implements Iterator<Entry<String, BigInteger>> {
        private int[] next;

        Rankings() {
            next = new int[players];
            for (int i = 0; i < players; i++) {
                next[i] = i;
            }
        }

        @Override
        public boolean hasNext() {
            return next != null;
        }

        @Override
        public Entry<String, BigInteger> next() {
            if (next == null) {
                throw new NoSuchElementException();
            }
            int[] acting = next.clone();
            next = successor(next);
            return Map.entry(DieNames.ranking(acting), table.count(stateOf(acting)));
        }

        private int[] successor(int[] p) {
            int i = p.length - 2;
            while (i >= 0 && p[i] > p[i + 1]) {
                i--;
            }
            if (i < 0) {
                return null;
            }
            int j = p.length - 1;
            while (p[j] < p[i]) {
                j--;
            }
            int t = p[i];
            p[i] = p[j];
            p[j] = t;
            for (int a = i + 1, b = p.length - 1; a < b; a++, b--) {
                t = p[a];
                p[a] = p[b];
                p[b] = t;
            }
            return p;
        }
    }
}
