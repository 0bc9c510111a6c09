package org.precedence.runtime.provider;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import org.precedence.api.FairnessGrade;
import org.precedence.api.RankingConvention;
import org.precedence.runtime.analysis.FairnessAnalysis;
import org.precedence.runtime.analysis.FairnessReport;
import org.precedence.runtime.dice.ExplicitDice;
import org.precedence.runtime.dice.MixedRadixDice;
import org.precedence.runtime.dice.Word;
import org.precedence.runtime.source.SetSource;

/**
 * Test sets for 2 to 4 players, built independently of the construction package and proven
 * before they are served: the word "AB…" followed by its reverse has subset depth 2; each
 * further level writes the word once under every permutation of the letters, raising the
 * depth by one, until depth n. Each set is checked exactly with {@link FairnessAnalysis}.
 */
final class RelabelingSets implements SetSource {
    static final int MAX_PLAYERS = 4;
    private final Map<Integer, MixedRadixDice> cache = new ConcurrentHashMap<>();

    @Override
    public MixedRadixDice forPlayers(int players, FairnessGrade grade) {
        if (players < 2 || players > MAX_PLAYERS) {
            throw new IllegalArgumentException("relabeling sets serve 2 to " + MAX_PLAYERS + " players, got " + players);
        }
        return cache.computeIfAbsent(players, RelabelingSets::build);
    }

    @Override
    public int maxPlayers() {
        return MAX_PLAYERS;
    }

    static Word word(int n) {
        int[] up = new int[n];
        for (int i = 0; i < n; i++) {
            up[i] = i;
        }
        Word w = Word.of(n, up);
        w = w.concat(w.reversed());
        List<int[]> perms = permutations(n);
        for (int depth = 2; depth < n; depth++) {
            Word next = null;
            for (int[] p : perms) {
                Word block = w.relabel(p);
                next = next == null ? block : next.concat(block);
            }
            w = next;
        }
        return w;
    }

    private static MixedRadixDice build(int n) {
        Word w = word(n);
        FairnessReport report = FairnessAnalysis.analyse(w, RankingConvention.LOWEST_FIRST);
        if (!report.orderFair()) {
            throw new IllegalStateException("relabeling set for " + n + " players is not order-fair");
        }
        return new ExplicitDice("relabeling-" + n + "x" + w.length() / n, w.toDiceSet(),
                FairnessGrade.ORDER_FAIR, report.subsetDepth());
    }

    /** All permutations of 0..n-1 in lexicographic order. */
    static List<int[]> permutations(int n) {
        List<int[]> out = new ArrayList<>();
        permute(new int[n], new boolean[n], 0, out);
        return out;
    }

    private static void permute(int[] cur, boolean[] used, int k, List<int[]> out) {
        if (k == cur.length) {
            out.add(cur.clone());
            return;
        }
        for (int v = 0; v < cur.length; v++) {
            if (!used[v]) {
                used[v] = true;
                cur[k] = v;
                permute(cur, used, k + 1, out);
                used[v] = false;
            }
        }
    }
}
