package org.precedence.runtime.search;

import java.util.Arrays;

/**
 * Index of every sequence of distinct letters over {@code k} letters up to a maximum length,
 * with a successor table, so that occurrence counts of all of them in a growing prefix can be
 * kept in one array. States appear in order of increasing length (parents before children),
 * which lets one update pass run from the last state down without reusing a fresh count.
 */
final class PartialPatterns {
    private final int letters;
    private final int size;
    private final int[] next;

    PartialPatterns(int letters, int maxLength) {
        this.letters = letters;
        int capacity = 1;
        long term = 1;
        for (int len = 1; len <= Math.min(letters, maxLength); len++) {
            term *= letters - len + 1;
            capacity += (int) term;
        }
        int[] nx = new int[Math.max(1, capacity * Math.max(1, letters))];
        Arrays.fill(nx, -1);
        int[] len = new int[capacity];
        int[] used = new int[capacity];
        int created = 1;
        for (int s = 0; s < created; s++) {
            if (len[s] >= maxLength) {
                continue;
            }
            for (int x = 0; x < letters; x++) {
                if ((used[s] & (1 << x)) != 0) {
                    continue;
                }
                int c = created++;
                nx[s * letters + x] = c;
                len[c] = len[s] + 1;
                used[c] = used[s] | (1 << x);
            }
        }
        this.size = created;
        this.next = nx;
    }

    int size() {
        return size;
    }

    /** Returns the state of {@code seq} (distinct letters, within the length bound), or -1. */
    int indexOf(int[] seq, int from, int to, boolean reversed) {
        int s = 0;
        for (int i = 0; i < to - from; i++) {
            int x = reversed ? seq[to - 1 - i] : seq[from + i];
            s = next[s * letters + x];
            if (s < 0) {
                return -1;
            }
        }
        return s;
    }

    /** Adds one occurrence of letter {@code x} at the end of the counted text. */
    void append(long[] counts, int x) {
        for (int s = size - 1; s >= 0; s--) {
            int c = next[s * letters + x];
            if (c >= 0) {
                counts[c] += counts[s];
            }
        }
    }
}
