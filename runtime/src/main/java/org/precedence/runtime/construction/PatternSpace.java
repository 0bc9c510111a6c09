package org.precedence.runtime.construction;

import java.util.Arrays;

/**
 * All sequences of distinct letters over n letters (the empty one included), indexed
 * breadth-first, with the index maps that composing counts needs: prefix and suffix at every
 * split point, relabelling, reversal.
 */
final class PatternSpace {
    final int n;
    final int size;
    final int[] length;
    final int[][] letters;
    private final int[] next;
    /** {@code prefix[s][i]}: index of the first i letters of s. */
    final int[][] prefix;
    /** {@code suffix[s][i]}: index of the letters of s from position i on. */
    final int[][] suffix;

    /** Length of the longest pattern held. */
    final int maxLength;

    PatternSpace(int n) {
        this(n, n);
    }

    /** All patterns of at most {@code maxLength} distinct letters over n letters. */
    PatternSpace(int n, int maxLength) {
        long states = 0;
        long term = 1;
        for (int k = 0; k <= maxLength; k++) {
            states += term;
            term *= n - k;
        }
        if (states > 2_000_000) {
            throw new IllegalArgumentException("composed counts over " + n + " dice up to length " + maxLength
                    + " need " + states + " patterns; the limit is 2000000");
        }
        this.n = n;
        this.maxLength = maxLength;
        this.size = (int) states;
        this.length = new int[size];
        this.letters = new int[size][];
        this.next = new int[size * n];
        Arrays.fill(next, -1);
        letters[0] = new int[0];
        int created = 1;
        for (int s = 0; s < created; s++) {
            if (letters[s].length == maxLength) {
                continue;
            }
            for (int x = 0; x < n; x++) {
                if (contains(letters[s], x)) {
                    continue;
                }
                int c = created++;
                next[s * n + x] = c;
                letters[c] = Arrays.copyOf(letters[s], letters[s].length + 1);
                letters[c][letters[s].length] = x;
                length[c] = letters[c].length;
            }
        }
        this.prefix = new int[size][];
        this.suffix = new int[size][];
        for (int s = 0; s < size; s++) {
            int len = length[s];
            prefix[s] = new int[len + 1];
            suffix[s] = new int[len + 1];
            for (int i = 0; i <= len; i++) {
                prefix[s][i] = indexOf(letters[s], 0, i);
                suffix[s][i] = indexOf(letters[s], i, len);
            }
        }
    }

    private static boolean contains(int[] a, int x) {
        for (int v : a) {
            if (v == x) {
                return true;
            }
        }
        return false;
    }

    int indexOf(int[] pattern, int from, int to) {
        int s = 0;
        for (int i = from; i < to; i++) {
            s = next[s * n + pattern[i]];
        }
        return s;
    }

    /** Returns index map s ↦ index of (map[p_1] … map[p_k]). */
    int[] relabelMap(int[] map) {
        int[] out = new int[size];
        int[] buf = new int[n];
        for (int s = 0; s < size; s++) {
            for (int i = 0; i < length[s]; i++) {
                buf[i] = map[letters[s][i]];
            }
            out[s] = indexOf(buf, 0, length[s]);
        }
        return out;
    }

    /** Returns index map s ↦ index of s read backwards. */
    int[] reverseMap() {
        int[] out = new int[size];
        int[] buf = new int[n];
        for (int s = 0; s < size; s++) {
            for (int i = 0; i < length[s]; i++) {
                buf[i] = letters[s][length[s] - 1 - i];
            }
            out[s] = indexOf(buf, 0, length[s]);
        }
        return out;
    }
}
