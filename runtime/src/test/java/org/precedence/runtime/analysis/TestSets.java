package org.precedence.runtime.analysis;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.SplittableRandom;
import java.util.TreeSet;
import org.precedence.runtime.dice.DiceSet;
import org.precedence.runtime.dice.Word;

/** Seeded random sets and exhaustive word families for the tests. */
final class TestSets {
    /** Default seed; override with -Dprecedence.test.seed=N to explore, the seed is logged. */
    static final long DEFAULT_SEED = 20_261_202L;

    private TestSets() {
    }

    static long seed(String testName) {
        long seed = Long.getLong("precedence.test.seed", DEFAULT_SEED);
        System.out.println(testName + ": seed " + seed);
        return seed;
    }

    /**
     * A random set of {@code n} dice with the given side counts: a uniformly shuffled word,
     * then spread to random distinct values (negative and large ones too) listed in random
     * order on each die, so that the set-to-word step is exercised as well.
     */
    static DiceSet randomSet(SplittableRandom rnd, int[] sides) {
        int n = sides.length;
        int total = Arrays.stream(sides).sum();
        int[] letters = new int[total];
        for (int d = 0, i = 0; d < n; d++) {
            for (int f = 0; f < sides[d]; f++) {
                letters[i++] = d;
            }
        }
        for (int i = total - 1; i > 0; i--) {
            int j = rnd.nextInt(i + 1);
            int t = letters[i];
            letters[i] = letters[j];
            letters[j] = t;
        }
        TreeSet<Long> values = new TreeSet<>();
        while (values.size() < total) {
            values.add(rnd.nextLong(-1_000_000_000_000L, 1_000_000_000_000L));
        }
        Long[] sorted = values.toArray(new Long[0]);
        List<List<Long>> faces = new ArrayList<>();
        for (int d = 0; d < n; d++) {
            faces.add(new ArrayList<>());
        }
        for (int i = 0; i < total; i++) {
            faces.get(letters[i]).add(sorted[i]);
        }
        List<long[]> out = new ArrayList<>();
        for (List<Long> f : faces) {
            long[] a = f.stream().mapToLong(Long::longValue).toArray();
            for (int i = a.length - 1; i > 0; i--) {
                int j = rnd.nextInt(i + 1);
                long t = a[i];
                a[i] = a[j];
                a[j] = t;
            }
            out.add(a);
        }
        return DiceSet.of(out, null);
    }

    /** Random side counts for n dice, all equal or mixed, with product at most {@code maxProduct}. */
    static int[] randomSides(SplittableRandom rnd, int n, boolean equal, long maxProduct) {
        while (true) {
            int[] s = new int[n];
            long product = 1;
            int common = 1 + rnd.nextInt(8);
            for (int d = 0; d < n; d++) {
                s[d] = equal ? common : 1 + rnd.nextInt(8);
                product *= s[d];
            }
            if (product <= maxProduct) {
                return s;
            }
        }
    }

    /** Every word with the given number of letters of each die (distinct arrangements). */
    static List<Word> allWords(int... sides) {
        List<Word> out = new ArrayList<>();
        int total = Arrays.stream(sides).sum();
        fill(new int[total], 0, sides.clone(), out);
        return out;
    }

    private static void fill(int[] w, int i, int[] left, List<Word> out) {
        if (i == w.length) {
            out.add(Word.of(left.length, w));
            return;
        }
        for (int d = 0; d < left.length; d++) {
            if (left[d] > 0) {
                left[d]--;
                w[i] = d;
                fill(w, i + 1, left, out);
                left[d]++;
            }
        }
    }
}
