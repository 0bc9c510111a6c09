package org.precedence.runtime.provider;

import java.util.List;
import org.precedence.api.FairnessGrade;
import org.precedence.api.RankingConvention;
import org.precedence.runtime.analysis.FairnessAnalysis;
import org.precedence.runtime.dice.DiceSet;
import org.precedence.runtime.dice.ExplicitDice;
import org.precedence.runtime.dice.MixedRadixDice;
import org.precedence.runtime.dice.Word;
import org.precedence.runtime.source.SetSource;

/**
 * A small set source for tests, independent of the catalog: every set is proven order-fair
 * with {@link FairnessAnalysis} before it is served.
 * <ul>
 *   <li>2 players: A = {1, 4}, B = {2, 3} (the word ABBA).</li>
 *   <li>3 players: 6-sided dice found by an exhaustive search over the 6^3 ways of writing the
 *       depth-2 word ABCCBA under three letter relabelings, one after another.</li>
 *   <li>4 players: the built-in construction (ABCDDCBA, then every relabeling, twice).</li>
 * </ul>
 */
public final class TestSets implements SetSource {
    public static final TestSets INSTANCE = new TestSets();

    private final MixedRadixDice[] sets = new MixedRadixDice[5];

    private TestSets() {
        sets[2] = proven("test-2x2", DiceSet.ofInts(new int[] {1, 4}, new int[] {2, 3}).word());
        sets[3] = proven("test-3x6", searchThreeSixSided());
        sets[4] = proven("test-4x" + RelabelingSets.word(4).length() / 4, RelabelingSets.word(4));
    }

    /** The first order-fair word (in search order) made of three relabeled copies of ABCCBA. */
    static Word searchThreeSixSided() {
        Word base = Word.parse("ABCCBA");
        List<int[]> perms = RelabelingSets.permutations(3);
        for (int[] a : perms) {
            for (int[] b : perms) {
                for (int[] c : perms) {
                    Word w = base.relabel(a).concat(base.relabel(b)).concat(base.relabel(c));
                    if (FairnessAnalysis.analyse(w, RankingConvention.LOWEST_FIRST).orderFair()) {
                        return w;
                    }
                }
            }
        }
        throw new AssertionError("no order-fair 3-dice 6-sided set among the relabelings");
    }

    private static MixedRadixDice proven(String id, Word w) {
        var report = FairnessAnalysis.analyse(w, RankingConvention.LOWEST_FIRST);
        if (!report.orderFair()) {
            throw new AssertionError(id + " is not order-fair");
        }
        return new ExplicitDice(id, w.toDiceSet(), FairnessGrade.ORDER_FAIR, report.subsetDepth());
    }

    @Override
    public MixedRadixDice forPlayers(int players, FairnessGrade grade) {
        if (players < 2 || players > 4) {
            throw new IllegalArgumentException("test sets serve 2 to 4 players, got " + players);
        }
        return sets[players];
    }

    @Override
    public int maxPlayers() {
        return 4;
    }
}
