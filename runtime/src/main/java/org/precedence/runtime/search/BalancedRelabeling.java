package org.precedence.runtime.search;

import java.util.ArrayList;
import java.util.List;
import org.precedence.runtime.analysis.PatternTable;
import org.precedence.runtime.dice.Word;

/**
 * Finds lists of letter renamings F such that writing σ(W) for each σ in F, one after another,
 * raises the subset depth of an equal-sided word W from t to t+1.
 *
 * <p>Why the condition is linear: a (t+1)-letter pattern of the joined word either lies inside
 * one block or is split across blocks. Split occurrences combine patterns of at most t letters
 * from different blocks; every block has depth t and equal sides, so those counts are the same
 * for every ordering and the split part is equal for all (t+1)-patterns. Inside block σ(W) the
 * pattern w occurs as often as σ⁻¹(w) occurs in W. So the joined word has depth t+1 exactly
 * when {@code Σ_{σ∈F} count_W(σ⁻¹(w))} is the same for every (t+1)-pattern w, namely
 * {@code |F| · s^{t+1} / (t+1)!}.
 *
 * <p>Renaming the whole joined word does not change its depth, so the first block can be
 * taken to be W itself (σ = identity) and the rest chosen as a multiset in increasing index
 * order; a branch is cut as soon as a pattern exceeds its target or can no longer reach it.
 * The order of the blocks does not affect this level, only the next one, so callers that go
 * on try the distinct orders of the result.
 */
final class BalancedRelabeling {
    private final int letters;
    private final int[][] permutations;
    private final int identity;

    BalancedRelabeling(int letters) {
        this.letters = letters;
        List<int[]> perms = new ArrayList<>();
        permute(new int[letters], 0, 0, perms);
        this.permutations = perms.toArray(new int[0][]);
        int id = -1;
        for (int i = 0; i < permutations.length && id < 0; i++) {
            boolean same = true;
            for (int x = 0; x < letters; x++) {
                same &= permutations[i][x] == x;
            }
            id = same ? i : -1;
        }
        this.identity = id;
    }

    /** Returns all permutations of the letters, in lexicographic order. */
    int[][] permutations() {
        return permutations.clone();
    }

    /**
     * Returns up to {@code limit} multisets of {@code blocks} renamings (indices into {@link
     * #permutations()}, ascending, containing the identity) that raise {@code word} from depth
     * {@code level-1} to {@code level}.
     *
     * @param word  an equal-sided word of depth at least {@code level - 1}
     */
    List<int[]> find(Word word, int level, int blocks, int limit, SearchControl control) {
        int side = word.sides()[0];
        PatternTable table = PatternTable.count(word);
        List<int[]> patterns = new ArrayList<>();
        injective(new int[level], 0, 0, patterns);
        int pc = patterns.size();
        long totalPerBlock = 1;
        for (int i = 0; i < level; i++) {
            totalPerBlock *= side;
        }
        long orderings = DieInsertion.factorial(level);
        if ((totalPerBlock * blocks) % orderings != 0) {
            return List.of();
        }
        long target = totalPerBlock * blocks / orderings;
        int perms = permutations.length;
        long[][] gain = new long[perms][pc];
        for (int s = 0; s < perms; s++) {
            int[] inverse = new int[letters];
            for (int x = 0; x < letters; x++) {
                inverse[permutations[s][x]] = x;
            }
            for (int p = 0; p < pc; p++) {
                int[] w = patterns.get(p);
                int[] pre = new int[level];
                for (int i = 0; i < level; i++) {
                    pre[i] = inverse[w[i]];
                }
                gain[s][p] = table.countLong(table.indexOf(pre));
            }
        }
        long[][] minFrom = new long[perms + 1][pc];
        long[][] maxFrom = new long[perms + 1][pc];
        java.util.Arrays.fill(minFrom[perms], Long.MAX_VALUE / 4);
        for (int s = perms - 1; s >= 0; s--) {
            for (int p = 0; p < pc; p++) {
                minFrom[s][p] = Math.min(gain[s][p], minFrom[s + 1][p]);
                maxFrom[s][p] = Math.max(gain[s][p], maxFrom[s + 1][p]);
            }
        }
        List<int[]> out = new ArrayList<>();
        long[][] sums = new long[blocks + 1][pc];
        int[] chosen = new int[blocks];
        chosen[0] = identity;
        System.arraycopy(gain[identity], 0, sums[1], 0, pc);
        choose(1, 0, blocks, target, gain, minFrom, maxFrom, sums, chosen, out, limit, control);
        return out;
    }

    private void choose(int placed, int from, int blocks, long target, long[][] gain,
                        long[][] minFrom, long[][] maxFrom, long[][] sums, int[] chosen,
                        List<int[]> out, int limit, SearchControl control) {
        int pc = sums[0].length;
        if (placed == blocks) {
            for (int p = 0; p < pc; p++) {
                if (sums[placed][p] != target) {
                    return;
                }
            }
            int[] multiset = chosen.clone();
            java.util.Arrays.sort(multiset);
            out.add(multiset);
            return;
        }
        if (control.shouldStop(1)) {
            return;
        }
        long[] now = sums[placed];
        long[] next = sums[placed + 1];
        int remaining = blocks - placed;
        for (int s = from; s < gain.length && out.size() < limit; s++) {
            boolean hopeless = false;
            for (int p = 0; p < pc && !hopeless; p++) {
                hopeless = now[p] + remaining * minFrom[s][p] > target
                        || now[p] + remaining * maxFrom[s][p] < target;
            }
            if (hopeless) {
                return;
            }
            boolean ok = true;
            int rest = remaining - 1;
            for (int p = 0; p < pc && ok; p++) {
                long v = now[p] + gain[s][p];
                next[p] = v;
                ok = v + rest * minFrom[s][p] <= target && v + rest * maxFrom[s][p] >= target;
            }
            if (ok) {
                chosen[placed] = s;
                choose(placed + 1, s, blocks, target, gain, minFrom, maxFrom, sums, chosen, out,
                        limit, control);
            }
        }
    }

    /** Returns σ_1(W) σ_2(W) … for the renamings at the given indices, in the order given. */
    Word join(Word word, int[] order) {
        Word out = word.relabel(permutations[order[0]]);
        for (int i = 1; i < order.length; i++) {
            out = out.concat(word.relabel(permutations[order[i]]));
        }
        return out;
    }

    /** Returns the distinct orders of {@code multiset} with the identity first. */
    List<int[]> ordersIdentityFirst(int[] multiset) {
        List<Integer> rest = new ArrayList<>();
        boolean removed = false;
        for (int s : multiset) {
            if (!removed && s == identity) {
                removed = true;
            } else {
                rest.add(s);
            }
        }
        List<int[]> out = new ArrayList<>();
        int[] current = new int[multiset.length];
        current[0] = identity;
        distinctOrders(rest.stream().mapToInt(Integer::intValue).sorted().toArray(),
                new boolean[rest.size()], current, 1, out);
        return out;
    }

    private static void distinctOrders(int[] items, boolean[] used, int[] current, int pos,
                                       List<int[]> out) {
        if (pos == current.length) {
            out.add(current.clone());
            return;
        }
        for (int i = 0; i < items.length; i++) {
            if (used[i] || (i > 0 && items[i] == items[i - 1] && !used[i - 1])) {
                continue;
            }
            used[i] = true;
            current[pos] = items[i];
            distinctOrders(items, used, current, pos + 1, out);
            used[i] = false;
        }
    }

    private void permute(int[] image, int pos, int used, List<int[]> out) {
        if (pos == letters) {
            out.add(image.clone());
            return;
        }
        for (int t = 0; t < letters; t++) {
            if ((used & (1 << t)) == 0) {
                image[pos] = t;
                permute(image, pos + 1, used | (1 << t), out);
            }
        }
    }

    private void injective(int[] current, int pos, int used, List<int[]> out) {
        if (pos == current.length) {
            out.add(current.clone());
            return;
        }
        for (int t = 0; t < letters; t++) {
            if ((used & (1 << t)) == 0) {
                current[pos] = t;
                injective(current, pos + 1, used | (1 << t), out);
            }
        }
    }
}
