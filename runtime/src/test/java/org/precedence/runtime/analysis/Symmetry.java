package org.precedence.runtime.analysis;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import org.precedence.runtime.dice.Word;

/**
 * The symmetries that never change how fair a set is: renaming dice that have the same number
 * of sides, and reading the word backwards (negating every face value).
 */
final class Symmetry {
    private Symmetry() {
    }

    /** The images of {@code w} under every renaming of equal-sided dice, and their reverses if asked. */
    static Set<Word> orbit(Word w, boolean withReversal) {
        Set<Word> out = new LinkedHashSet<>();
        int[] sides = w.sides();
        for (int[] perm : permutations(w.players())) {
            boolean keepsSides = true;
            for (int d = 0; d < perm.length; d++) {
                keepsSides &= sides[perm[d]] == sides[d];
            }
            if (keepsSides) {
                Word image = w.relabel(perm);
                out.add(image);
                if (withReversal) {
                    out.add(image.reversed());
                }
            }
        }
        return out;
    }

    /** The lexicographically smallest member of the orbit (letters compared as numbers). */
    static Word canonical(Word w, boolean withReversal) {
        Word best = null;
        for (Word o : orbit(w, withReversal)) {
            if (best == null || java.util.Arrays.compare(o.letters(), best.letters()) < 0) {
                best = o;
            }
        }
        return best;
    }

    static List<int[]> permutations(int n) {
        List<int[]> out = new ArrayList<>();
        permute(new int[n], 0, new boolean[n], out);
        return out;
    }

    private static void permute(int[] p, int i, boolean[] used, List<int[]> out) {
        if (i == p.length) {
            out.add(p.clone());
            return;
        }
        for (int d = 0; d < p.length; d++) {
            if (!used[d]) {
                used[d] = true;
                p[i] = d;
                permute(p, i + 1, used, out);
                used[d] = false;
            }
        }
    }
}
