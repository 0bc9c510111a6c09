package org.precedence.runtime.search;

import java.util.ArrayList;
import java.util.List;

/**
 * The symmetries that map order-fair words to order-fair words without changing the side
 * counts: renaming dice among those with equal side counts, and reading the word backwards
 * (negating every face). Order-fairness is kept by both because they only permute the
 * rankings. A class is represented by its lexicographically least member.
 */
final class SymmetryGroup {
    private final int[][] renamings;

    SymmetryGroup(int[] sides) {
        List<int[]> found = new ArrayList<>();
        permute(sides, new int[sides.length], 0, 0, found);
        this.renamings = found.toArray(new int[0][]);
    }

    private static void permute(int[] sides, int[] image, int pos, int usedMask, List<int[]> out) {
        if (pos == sides.length) {
            out.add(image.clone());
            return;
        }
        for (int t = 0; t < sides.length; t++) {
            if ((usedMask & (1 << t)) == 0 && sides[t] == sides[pos]) {
                image[pos] = t;
                permute(sides, image, pos + 1, usedMask | (1 << t), out);
            }
        }
    }

    /** Returns the number of symmetries (renamings times the two reading directions). */
    int order() {
        return 2 * renamings.length;
    }

    /** Returns the least image of {@code word} under the group. */
    byte[] canonical(byte[] word) {
        byte[] best = word.clone();
        int n = word.length;
        for (int[] r : renamings) {
            for (int dir = 0; dir < 2; dir++) {
                if (lessThan(word, r, dir == 1, best)) {
                    for (int i = 0; i < n; i++) {
                        best[i] = (byte) r[word[dir == 1 ? n - 1 - i : i]];
                    }
                }
            }
        }
        return best;
    }

    /** Returns how many symmetries fix {@code word}. */
    int stabilizer(byte[] word) {
        int fixed = 0;
        int n = word.length;
        for (int[] r : renamings) {
            for (int dir = 0; dir < 2; dir++) {
                boolean same = true;
                for (int i = 0; i < n && same; i++) {
                    same = r[word[dir == 1 ? n - 1 - i : i]] == word[i];
                }
                fixed += same ? 1 : 0;
            }
        }
        return fixed;
    }

    /** Returns the size of the class of {@code word}. */
    int orbitSize(byte[] word) {
        return order() / stabilizer(word);
    }

    private static boolean lessThan(byte[] word, int[] r, boolean reversed, byte[] best) {
        int n = word.length;
        for (int i = 0; i < n; i++) {
            int v = r[word[reversed ? n - 1 - i : i]];
            if (v != best[i]) {
                return v < best[i];
            }
        }
        return false;
    }
}
