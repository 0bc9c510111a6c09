package org.precedence.runtime.search;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

/**
 * Adds one die to a fair word in every possible way that keeps the required fairness.
 *
 * <p>Why this is enough: every subset of an order-fair set is order-fair, so an order-fair set
 * of k+1 dice restricted to its first k dice is an order-fair set of k dice. Every solution is
 * therefore a solution on fewer dice with the new die's faces slipped in between. Placing a
 * face of the new die X after the first g letters of the base word (gap g) adds to the count
 * of the pattern {@code u X v} exactly {@code pre_g(u) · suf_g(v)}: the occurrences of u
 * before the gap times those of v after it. Patterns without X are already fair. So the
 * insertion is a choice of a multiset of s gaps whose contribution vectors sum to the target
 * counts: for each letter set T of the base (1 ≤ |T| < depth), each ordering of T ∪ {X} must
 * occur {@code Π_{t∈T} s_t · s_X / (|T|+1)!} times.
 *
 * <p>The gaps are chosen left to right (non-decreasing), and a branch is cut as soon as some
 * pattern can no longer reach its target: all contributions are non-negative, so with r faces
 * left and next gap at least g, each pattern gains between r·min and r·max of the remaining
 * contributions (precomputed suffix minima and maxima). Shorter patterns are checked first,
 * since they fail earliest.
 *
 * <p>Immutable and shared by all threads for one level; each call allocates its own buffers.
 */
final class DieInsertion {
    private final int baseLetters;
    private final int newSides;
    private final PartialPatterns table;
    private final int patterns;
    private final int[] preState;
    private final int[] sufState;
    private final long[] target;

    /** Receives each extended word; the array is owned by the receiver. */
    interface Sink {
        void accept(byte[] word);
    }

    /**
     * @param sides side counts of the base dice followed by the new die's
     * @param depth required subset depth of the result (every depth-subset order-fair)
     */
    DieInsertion(int[] sides, int depth) {
        this.baseLetters = sides.length - 1;
        this.newSides = sides[baseLetters];
        int maxSubset = Math.min(baseLetters, depth - 1);
        this.table = new PartialPatterns(baseLetters, maxSubset);
        List<long[]> found = new ArrayList<>();
        for (int mask = 1; mask < (1 << baseLetters); mask++) {
            int m = Integer.bitCount(mask);
            if (m > maxSubset) {
                continue;
            }
            int[] members = new int[m];
            long product = newSides;
            for (int t = 0, j = 0; t < baseLetters; t++) {
                if ((mask & (1 << t)) != 0) {
                    members[j++] = t;
                    product *= sides[t];
                }
            }
            long orderings = factorial(m + 1);
            if (product % orderings != 0) {
                throw new IllegalArgumentException("sides fail the divisibility bound");
            }
            for (int[] arrangement : arrangements(members)) {
                for (int split = 0; split <= m; split++) {
                    int pre = table.indexOf(arrangement, 0, split, false);
                    int suf = table.indexOf(arrangement, split, m, true);
                    found.add(new long[] {m, pre, suf, product / orderings});
                }
            }
        }
        found.sort(Comparator.comparingLong(p -> p[0]));
        this.patterns = found.size();
        this.preState = new int[patterns];
        this.sufState = new int[patterns];
        this.target = new long[patterns];
        for (int p = 0; p < patterns; p++) {
            preState[p] = (int) found.get(p)[1];
            sufState[p] = (int) found.get(p)[2];
            target[p] = found.get(p)[3];
        }
    }

    /** Returns the number of pattern counts each insertion must hit. */
    int patternCount() {
        return patterns;
    }

    /**
     * Enumerates every way to insert the new die into {@code base}.
     *
     * @return the number of extensions delivered
     */
    long extend(byte[] base, Sink sink, SearchControl control) {
        int len = base.length;
        int states = table.size();
        long[][] contribution = new long[len + 1][patterns];
        long[] pre = new long[states];
        long[][] suffix = new long[len + 1][];
        long[] suf = new long[states];
        suf[0] = 1;
        suffix[len] = suf.clone();
        for (int i = len - 1; i >= 0; i--) {
            table.append(suf, base[i]);
            suffix[i] = suf.clone();
        }
        pre[0] = 1;
        for (int g = 0; g <= len; g++) {
            if (g > 0) {
                table.append(pre, base[g - 1]);
            }
            long[] c = contribution[g];
            long[] sg = suffix[g];
            for (int p = 0; p < patterns; p++) {
                c[p] = pre[preState[p]] * sg[sufState[p]];
            }
        }
        long[][] minFrom = new long[len + 1][];
        long[][] maxFrom = new long[len + 1][];
        minFrom[len] = contribution[len].clone();
        maxFrom[len] = contribution[len].clone();
        for (int g = len - 1; g >= 0; g--) {
            minFrom[g] = new long[patterns];
            maxFrom[g] = new long[patterns];
            for (int p = 0; p < patterns; p++) {
                minFrom[g][p] = Math.min(contribution[g][p], minFrom[g + 1][p]);
                maxFrom[g][p] = Math.max(contribution[g][p], maxFrom[g + 1][p]);
            }
        }
        Walk walk = new Walk(base, contribution, minFrom, maxFrom, sink, control);
        walk.place(0, 0);
        control.shouldStop(walk.sinceCheck);
        return walk.delivered;
    }

    /** One depth-first walk over gap multisets, with its own buffers. */
    private final class Walk {
        private final byte[] base;
        private final long[][] contribution;
        private final long[][] minFrom;
        private final long[][] maxFrom;
        private final Sink sink;
        private final SearchControl control;
        private final long[][] sums;
        private final int[] gaps;
        long delivered;
        long sinceCheck;

        Walk(byte[] base, long[][] contribution, long[][] minFrom, long[][] maxFrom, Sink sink,
             SearchControl control) {
            this.base = base;
            this.contribution = contribution;
            this.minFrom = minFrom;
            this.maxFrom = maxFrom;
            this.sink = sink;
            this.control = control;
            this.sums = new long[newSides + 1][patterns];
            this.gaps = new int[newSides];
        }

        void place(int placed, int fromGap) {
            if (placed == newSides) {
                if (java.util.Arrays.equals(sums[placed], target)) {
                    delivered++;
                    sink.accept(merge());
                }
                return;
            }
            if (++sinceCheck >= 4096) {
                boolean stop = control.shouldStop(sinceCheck);
                sinceCheck = 0;
                if (stop) {
                    return;
                }
            } else if (control.stopped()) {
                return;
            }
            long[] now = sums[placed];
            long[] after = sums[placed + 1];
            int remaining = newSides - placed;
            for (int g = fromGap; g < contribution.length; g++) {
                long[] lo = minFrom[g];
                long[] hi = maxFrom[g];
                // No gap from g on can help any more: minima only grow, maxima only shrink.
                boolean hopeless = false;
                for (int p = 0; p < patterns && !hopeless; p++) {
                    hopeless = now[p] + remaining * lo[p] > target[p]
                            || now[p] + remaining * hi[p] < target[p];
                }
                if (hopeless) {
                    return;
                }
                long[] c = contribution[g];
                int rest = remaining - 1;
                boolean ok = true;
                for (int p = 0; p < patterns; p++) {
                    long v = now[p] + c[p];
                    after[p] = v;
                    if (v + rest * lo[p] > target[p] || v + rest * hi[p] < target[p]) {
                        ok = false;
                        break;
                    }
                }
                if (ok) {
                    gaps[placed] = g;
                    place(placed + 1, g);
                    if (control.stopped()) {
                        return;
                    }
                }
            }
        }

        private byte[] merge() {
            byte[] out = new byte[base.length + newSides];
            byte letter = (byte) baseLetters;
            int o = 0;
            int j = 0;
            for (int i = 0; i <= base.length; i++) {
                while (j < newSides && gaps[j] == i) {
                    out[o++] = letter;
                    j++;
                }
                if (i < base.length) {
                    out[o++] = base[i];
                }
            }
            return out;
        }
    }

    static long factorial(int n) {
        long f = 1;
        for (int i = 2; i <= n; i++) {
            f *= i;
        }
        return f;
    }

    private static List<int[]> arrangements(int[] members) {
        List<int[]> out = new ArrayList<>();
        arrange(members, new int[members.length], 0, 0, out);
        return out;
    }

    private static void arrange(int[] members, int[] current, int pos, int used, List<int[]> out) {
        if (pos == members.length) {
            out.add(current.clone());
            return;
        }
        for (int i = 0; i < members.length; i++) {
            if ((used & (1 << i)) == 0) {
                current[pos] = members[i];
                arrange(members, current, pos + 1, used | (1 << i), out);
            }
        }
    }
}
