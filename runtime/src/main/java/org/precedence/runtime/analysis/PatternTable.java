package org.precedence.runtime.analysis;

import java.math.BigInteger;
import java.util.Arrays;
import org.precedence.runtime.dice.Word;

/**
 * Occurrence counts of every ordered pattern of distinct letters in a word.
 *
 * <p>Rolling the dice picks one position per letter of the word; the ranking is the order in
 * which the chosen letters appear. So the number of outcomes ranking dice {@code X1…Xk} in
 * that order (with the other dice rolled freely) is the number of times {@code X1…Xk} occurs
 * as a scattered subsequence of the word, times the side counts of the dice not in the pattern.
 * This class stores the plain occurrence counts.
 *
 * <p>Algorithm (the classic subsequence-counting dynamic programme, extended to all patterns
 * at once): keep a count for each "partial pattern" — a sequence of distinct letters, from the
 * empty one (count 1) to full rankings; there are {@code Σ n!/(n−k)! ≈ e·n!} of them (see
 * {@link #stateCount}). Reading the word left to right, a letter {@code x} extends every
 * partial pattern {@code p} not containing {@code x}: {@code count[p+x] += count[p]}. The
 * update reads only patterns without {@code x} and writes only patterns ending in {@code x},
 * so within one letter the order of the updates does not matter. For speed every letter has
 * its own precomputed list of (pattern, extended pattern) index pairs, so a step touches only
 * the {@code stateCount(n−1)} patterns it changes. Cost: word length × {@code stateCount(n−1)}
 * additions; memory: one counter per state plus two ints per state for the pair lists.
 *
 * <p>Numbering of the states: by length first, then lexicographically by the letters. Within
 * length {@code k} the index is the mixed-radix number whose digits are the ranks of each
 * letter among the letters not used before it (radices {@code n, n−1, …, n−k+1}), which is
 * what {@link #indexOf} and {@link #pattern} compute without any lookup table.
 *
 * <p>Counts are {@code long} when the product of the side counts fits in a long (no pattern
 * can exceed it), {@link BigInteger} otherwise.
 */
public final class PatternTable {
    /** Most dice a table supports: 12 dice would need 1.3 billion states. */
    public static final int MAX_PLAYERS = 11;

    private final int players;
    private final int stateCount;
    /** {@code offset[k]}: index of the first pattern of length k; {@code offset[n+1] = size}. */
    private final int[] offset;
    private final long[] longCounts;
    private final BigInteger[] bigCounts;

    private PatternTable(int players, int[] offset, long[] longCounts, BigInteger[] bigCounts) {
        this.players = players;
        this.stateCount = offset[players + 1];
        this.offset = offset;
        this.longCounts = longCounts;
        this.bigCounts = bigCounts;
    }

    /** Returns the number of partial patterns of distinct letters over {@code n} letters. */
    public static long stateCount(int n) {
        long total = 0;
        long term = 1;
        for (int k = 0; k <= n; k++) {
            total += term;
            term *= (n - k);
        }
        return total;
    }

    /**
     * Counts every pattern in {@code word}.
     *
     * @throws IllegalArgumentException if the word has more than {@link #MAX_PLAYERS} dice
     */
    public static PatternTable count(Word word) {
        return count(word, false);
    }

    /** As {@link #count(Word)}; {@code forceBig} takes the BigInteger path (for tests). */
    static PatternTable count(Word word, boolean forceBig) {
        int n = word.players();
        if (n > MAX_PLAYERS) {
            throw new IllegalArgumentException("exact analysis supports at most " + MAX_PLAYERS
                    + " dice (a table over " + n + " dice would need " + stateCount(n)
                    + " patterns), got " + n);
        }
        int[] offset = offsets(n);
        int size = offset[n + 1];
        int[][] from = new int[n][];
        int[][] to = new int[n][];
        buildTransitions(n, offset, from, to);
        int[] letters = word.letters();
        if (!forceBig && productOfSides(word).bitLength() < 63) {
            long[] counts = new long[size];
            counts[0] = 1;
            for (int x : letters) {
                int[] f = from[x];
                int[] t = to[x];
                for (int j = 0; j < f.length; j++) {
                    counts[t[j]] += counts[f[j]];
                }
            }
            return new PatternTable(n, offset, counts, null);
        }
        BigInteger[] counts = new BigInteger[size];
        Arrays.fill(counts, BigInteger.ZERO);
        counts[0] = BigInteger.ONE;
        for (int x : letters) {
            int[] f = from[x];
            int[] t = to[x];
            for (int j = 0; j < f.length; j++) {
                BigInteger c = counts[f[j]];
                if (c.signum() != 0) {
                    counts[t[j]] = counts[t[j]].add(c);
                }
            }
        }
        return new PatternTable(n, offset, null, counts);
    }

    private static int[] offsets(int n) {
        int[] offset = new int[n + 2];
        long term = 1;
        for (int k = 0; k <= n; k++) {
            offset[k + 1] = (int) (offset[k] + term);
            term *= (n - k);
        }
        return offset;
    }

    /**
     * Fills, for each letter x, the pairs (p, p+x) over all patterns p without x. Walks the
     * patterns depth-first in index order, so each length's indices come out consecutively.
     */
    private static void buildTransitions(int n, int[] offset, int[][] from, int[][] to) {
        int perLetter = (int) stateCount(n - 1);
        for (int x = 0; x < n; x++) {
            from[x] = new int[perLetter];
            to[x] = new int[perLetter];
        }
        int[] filled = new int[n];
        int[] nextIndex = new int[n + 1];
        for (int k = 0; k <= n; k++) {
            nextIndex[k] = offset[k];
        }
        walk(n, 0, 0L, 0, nextIndex, from, to, filled);
    }

    /** Visits pattern {@code state} (length {@code depth}, letters {@code used}) and its extensions. */
    private static void walk(int n, int state, long used, int depth, int[] nextIndex,
                             int[][] from, int[][] to, int[] filled) {
        if (depth == n) {
            return;
        }
        // The children of this state are the next (n - depth) indices of length depth+1, in
        // increasing letter order; record them before descending so indices stay consecutive.
        int firstChild = nextIndex[depth + 1];
        nextIndex[depth + 1] += n - depth;
        int child = firstChild;
        for (int x = 0; x < n; x++) {
            if ((used & (1L << x)) == 0) {
                from[x][filled[x]] = state;
                to[x][filled[x]] = child;
                filled[x]++;
                child++;
            }
        }
        child = firstChild;
        for (int x = 0; x < n; x++) {
            if ((used & (1L << x)) == 0) {
                walk(n, child, used | (1L << x), depth + 1, nextIndex, from, to, filled);
                child++;
            }
        }
    }

    static BigInteger productOfSides(Word word) {
        BigInteger p = BigInteger.ONE;
        for (int s : word.sides()) {
            p = p.multiply(BigInteger.valueOf(s));
        }
        return p;
    }

    /** Returns the number of dice. */
    public int players() {
        return players;
    }

    /** Returns the number of stored patterns (including the empty one). */
    public int size() {
        return stateCount;
    }

    /** Returns the index of the first pattern of length {@code k} (patterns of one length are contiguous). */
    public int firstOfLength(int k) {
        return offset[k];
    }

    /** Returns one past the index of the last pattern of length {@code k}. */
    public int endOfLength(int k) {
        return offset[k + 1];
    }

    /** Returns the index of the pattern, or -1 if it repeats a letter or is out of range. */
    public int indexOf(int... pattern) {
        if (pattern.length > players) {
            return -1;
        }
        long used = 0;
        long rank = 0;
        for (int i = 0; i < pattern.length; i++) {
            int x = pattern[i];
            if (x < 0 || x >= players || (used & (1L << x)) != 0) {
                return -1;
            }
            int r = x - Long.bitCount(used & ((1L << x) - 1));
            rank = rank * (players - i) + r;
            used |= 1L << x;
        }
        return (int) (offset[pattern.length] + rank);
    }

    /** Returns the length of pattern {@code state}. */
    public int length(int state) {
        checkState(state);
        int k = 0;
        while (offset[k + 1] <= state) {
            k++;
        }
        return k;
    }

    /** Returns the letters of pattern {@code state}, first to last. */
    public int[] pattern(int state) {
        int k = length(state);
        int[] digits = new int[k];
        long rank = state - offset[k];
        for (int i = k - 1; i >= 0; i--) {
            int radix = players - i;
            digits[i] = (int) (rank % radix);
            rank /= radix;
        }
        int[] p = new int[k];
        long used = 0;
        for (int i = 0; i < k; i++) {
            int r = digits[i];
            int x = 0;
            while (true) {
                if ((used & (1L << x)) == 0) {
                    if (r == 0) {
                        break;
                    }
                    r--;
                }
                x++;
            }
            p[i] = x;
            used |= 1L << x;
        }
        return p;
    }

    /**
     * Calls {@code visitor} for every pattern of length {@code k}, in index order, with its
     * letters in a reused array (copy it to keep it). Cheaper than {@link #pattern} per state.
     */
    public void forEachOfLength(int k, PatternVisitor visitor) {
        if (k < 0 || k > players) {
            throw new IllegalArgumentException("pattern length must be 0.." + players + ", got " + k);
        }
        int[] p = new int[k];
        int[] state = {offset[k]};
        visit(p, 0, 0L, visitor, state);
    }

    private void visit(int[] p, int depth, long used, PatternVisitor visitor, int[] state) {
        if (depth == p.length) {
            visitor.visit(p, state[0]++);
            return;
        }
        for (int x = 0; x < players; x++) {
            if ((used & (1L << x)) == 0) {
                p[depth] = x;
                visit(p, depth + 1, used | (1L << x), visitor, state);
            }
        }
    }

    /** Receives patterns from {@link #forEachOfLength}. */
    @FunctionalInterface
    public interface PatternVisitor {
        /** Receives the letters of pattern {@code state} (a reused array). */
        void visit(int[] letters, int state);
    }

    /** Returns whether counts are held as longs (they all fit). */
    public boolean fitsLong() {
        return longCounts != null;
    }

    /** Returns the occurrence count of pattern {@code state}. */
    public BigInteger count(int state) {
        checkState(state);
        return longCounts != null ? BigInteger.valueOf(longCounts[state]) : bigCounts[state];
    }

    /** Returns the occurrence count of pattern {@code state}; requires {@link #fitsLong()}. */
    public long countLong(int state) {
        if (longCounts == null) {
            throw new ArithmeticException("counts of this table exceed a long");
        }
        checkState(state);
        return longCounts[state];
    }

    /** Returns the occurrence count of {@code pattern} (distinct letters). */
    public BigInteger countOf(int... pattern) {
        int s = indexOf(pattern);
        if (s < 0) {
            throw new IllegalArgumentException("not a pattern of distinct letters below " + players
                    + ": " + Arrays.toString(pattern));
        }
        return count(s);
    }

    private void checkState(int state) {
        if (state < 0 || state >= stateCount) {
            throw new IndexOutOfBoundsException("pattern index " + state + " outside 0.."
                    + (stateCount - 1));
        }
    }
}
