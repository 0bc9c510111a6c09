package org.precedence.runtime.search;

import java.util.ArrayList;
import java.util.List;

/**
 * An independent reference for the search: generates words letter by letter and keeps those in
 * which every pattern on at most {@code depth} distinct letters occurs exactly its fair number
 * of times. Its only pruning is that no count may exceed its target (counts never decrease),
 * so it shares nothing with the gap-insertion search but the definition of fairness.
 */
final class BruteForce {
    private final int[] sides;
    private final List<int[]> patterns = new ArrayList<>();
    private final int[] prefixOf;
    private final int[] lastLetter;
    private final long[] target;
    private final List<int[]> found = new ArrayList<>();

    private BruteForce(int[] sides, int depth) {
        this.sides = sides.clone();
        collect(new int[0], depth);
        prefixOf = new int[patterns.size()];
        lastLetter = new int[patterns.size()];
        target = new long[patterns.size()];
        for (int p = 0; p < patterns.size(); p++) {
            int[] pat = patterns.get(p);
            lastLetter[p] = pat[pat.length - 1];
            prefixOf[p] = pat.length == 1 ? -1 : indexOf(java.util.Arrays.copyOf(pat, pat.length - 1));
            long product = 1;
            long fact = 1;
            for (int i = 0; i < pat.length; i++) {
                product *= sides[pat[i]];
                fact *= i + 1;
            }
            target[p] = product % fact == 0 ? product / fact : -1;
        }
    }

    /** Returns every word (letters 0..n-1) with these side counts and subset depth ≥ depth. */
    static List<int[]> fairWords(int[] sides, int depth) {
        BruteForce b = new BruteForce(sides, depth);
        int total = 0;
        for (int s : sides) {
            total += s;
        }
        b.extend(new int[total], 0, sides.clone(), new long[b.patterns.size()]);
        return b.found;
    }

    private void collect(int[] prefix, int depth) {
        if (prefix.length == depth) {
            return;
        }
        for (int x = 0; x < sides.length; x++) {
            boolean used = false;
            for (int y : prefix) {
                used |= y == x;
            }
            if (!used) {
                int[] next = java.util.Arrays.copyOf(prefix, prefix.length + 1);
                next[prefix.length] = x;
                patterns.add(next);
                collect(next, depth);
            }
        }
    }

    private int indexOf(int[] pattern) {
        for (int p = 0; p < patterns.size(); p++) {
            if (java.util.Arrays.equals(patterns.get(p), pattern)) {
                return p;
            }
        }
        throw new IllegalStateException();
    }

    private void extend(int[] word, int pos, int[] left, long[] counts) {
        if (pos == word.length) {
            for (int p = 0; p < counts.length; p++) {
                if (patterns.get(p).length >= 2 && counts[p] != target[p]) {
                    return;
                }
            }
            found.add(word.clone());
            return;
        }
        for (int x = 0; x < sides.length; x++) {
            if (left[x] == 0) {
                continue;
            }
            long[] next = counts.clone();
            boolean ok = true;
            // Each pattern ending in x gains the occurrences of its prefix before this letter.
            for (int p = next.length - 1; p >= 0; p--) {
                if (lastLetter[p] != x) {
                    continue;
                }
                next[p] += prefixOf[p] < 0 ? 1 : counts[prefixOf[p]];
            }
            for (int p = 0; p < next.length && ok; p++) {
                ok = patterns.get(p).length < 2 || (target[p] >= 0 && next[p] <= target[p]);
            }
            if (ok) {
                word[pos] = x;
                left[x]--;
                extend(word, pos + 1, left, next);
                left[x]++;
            }
        }
    }

    /** Returns the least image of {@code word} under renaming equal-sided letters and reversal. */
    static String canonical(int[] word, int[] sides) {
        String best = null;
        for (int[] perm : sidePreservingPermutations(sides)) {
            for (int dir = 0; dir < 2; dir++) {
                StringBuilder sb = new StringBuilder();
                for (int i = 0; i < word.length; i++) {
                    sb.append((char) ('A' + perm[word[dir == 0 ? i : word.length - 1 - i]]));
                }
                String s = sb.toString();
                best = best == null || s.compareTo(best) < 0 ? s : best;
            }
        }
        return best;
    }

    private static List<int[]> sidePreservingPermutations(int[] sides) {
        List<int[]> out = new ArrayList<>();
        permute(sides, new int[sides.length], 0, new boolean[sides.length], out);
        return out;
    }

    private static void permute(int[] sides, int[] img, int pos, boolean[] used, List<int[]> out) {
        if (pos == sides.length) {
            out.add(img.clone());
            return;
        }
        for (int t = 0; t < sides.length; t++) {
            if (!used[t] && sides[t] == sides[pos]) {
                used[t] = true;
                img[pos] = t;
                permute(sides, img, pos + 1, used, out);
                used[t] = false;
            }
        }
    }
}
