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
 * empty one (count 1) to full rankings; there are {@code Σ n!/(n−k)! ≈ e·n!} of them. Reading
 * the word left to right, a letter {@code x} extends every partial pattern {@code p} not
 * containing {@code x}: {@code count[p+x] += count[p]}. Visiting longer patterns first keeps
 * each letter from extending a pattern it has just created. Cost: word length × number of
 * states; memory: one counter per state plus the successor table.
 *
 * <p>Counts are {@code long} when the product of the side counts fits in a long (no pattern
 * can exceed it), {@link BigInteger} otherwise.
 */
public final class PatternTable {
    private final int players;
    private final int stateCount;
    /** Successor table: {@code next[s * players + x]} is the index of {@code s+x}, or -1. */
    private final int[] next;
    /** Letters of each state, packed: {@code letters[offset[s] .. offset[s]+length[s]]}. */
    private final byte[] length;
    private final int[] parent;
    private final byte[] lastLetter;
    private final long[] longCounts;
    private final BigInteger[] bigCounts;

    private PatternTable(int players, int stateCount, int[] next, byte[] length, int[] parent,
                         byte[] lastLetter, long[] longCounts, BigInteger[] bigCounts) {
        this.players = players;
        this.stateCount = stateCount;
        this.next = next;
        this.length = length;
        this.parent = parent;
        this.lastLetter = lastLetter;
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
     * @throws IllegalArgumentException if the table would exceed {@code Integer.MAX_VALUE} states
     */
    public static PatternTable count(Word word) {
        int n = word.players();
        if (n > 127) {
            throw new IllegalArgumentException("pattern tables support at most 127 dice, got " + n);
        }
        long states = stateCount(n);
        if (states * n > Integer.MAX_VALUE - 8) {
            throw new IllegalArgumentException("a pattern table over " + n + " dice needs " + states
                    + " states; the limit is " + ((Integer.MAX_VALUE - 8) / n) + " (at most 11 dice)");
        }
        int size = (int) states;
        int[] next = new int[size * n];
        Arrays.fill(next, -1);
        byte[] length = new byte[size];
        int[] parent = new int[size];
        byte[] lastLetter = new byte[size];
        long[] usedMask = new long[size * ((n + 63) / 64)];
        int words = (n + 63) / 64;
        parent[0] = -1;
        lastLetter[0] = -1;
        int created = 1;
        // Breadth-first: states appear in order of increasing length.
        for (int s = 0; s < created; s++) {
            for (int x = 0; x < n; x++) {
                if ((usedMask[s * words + (x >>> 6)] & (1L << (x & 63))) != 0) {
                    continue;
                }
                int c = created++;
                next[s * n + x] = c;
                length[c] = (byte) (length[s] + 1);
                parent[c] = s;
                lastLetter[c] = (byte) x;
                System.arraycopy(usedMask, s * words, usedMask, c * words, words);
                usedMask[c * words + (x >>> 6)] |= 1L << (x & 63);
            }
        }
        boolean fitsLong = productOfSides(word).bitLength() < 63;
        if (fitsLong) {
            long[] counts = new long[size];
            counts[0] = 1;
            for (int i = 0; i < word.length(); i++) {
                int x = word.letterAt(i);
                for (int s = size - 1; s >= 0; s--) {
                    int c = next[s * n + x];
                    if (c >= 0) {
                        counts[c] += counts[s];
                    }
                }
            }
            return new PatternTable(n, size, next, length, parent, lastLetter, counts, null);
        }
        BigInteger[] counts = new BigInteger[size];
        Arrays.fill(counts, BigInteger.ZERO);
        counts[0] = BigInteger.ONE;
        for (int i = 0; i < word.length(); i++) {
            int x = word.letterAt(i);
            for (int s = size - 1; s >= 0; s--) {
                int c = next[s * n + x];
                if (c >= 0 && counts[s].signum() != 0) {
                    counts[c] = counts[c].add(counts[s]);
                }
            }
        }
        return new PatternTable(n, size, next, length, parent, lastLetter, null, counts);
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

    /** Returns the index of the pattern, or -1 if it repeats a letter or is out of range. */
    public int indexOf(int... pattern) {
        int s = 0;
        for (int x : pattern) {
            if (x < 0 || x >= players) {
                return -1;
            }
            s = next[s * players + x];
            if (s < 0) {
                return -1;
            }
        }
        return s;
    }

    /** Returns the length of pattern {@code state}. */
    public int length(int state) {
        return length[state];
    }

    /** Returns the letters of pattern {@code state}, first to last. */
    public int[] pattern(int state) {
        int[] p = new int[length[state]];
        for (int s = state, i = p.length - 1; s > 0; s = parent[s], i--) {
            p[i] = lastLetter[s];
        }
        return p;
    }

    /** Returns whether counts are held as longs (they all fit). */
    public boolean fitsLong() {
        return longCounts != null;
    }

    /** Returns the occurrence count of pattern {@code state}. */
    public BigInteger count(int state) {
        return longCounts != null ? BigInteger.valueOf(longCounts[state]) : bigCounts[state];
    }

    /** Returns the occurrence count of pattern {@code state}; requires {@link #fitsLong()}. */
    public long countLong(int state) {
        if (longCounts == null) {
            throw new ArithmeticException("counts of this table exceed a long");
        }
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
}
