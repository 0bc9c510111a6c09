package org.precedence.cli.testing;

import java.util.ArrayList;
import java.util.List;
import org.precedence.api.FairnessGrade;
import org.precedence.runtime.analysis.FairnessAnalysis;
import org.precedence.runtime.analysis.FairnessReport;
import org.precedence.runtime.dice.ExplicitDice;
import org.precedence.runtime.dice.Word;

/**
 * Dice sets for tests, each checked exactly with {@link FairnessAnalysis} before use, so a
 * test never relies on a set being what its name says.
 *
 * <p>Fair sets come from the plain construction (published mathematics: relabel the word by
 * every permutation of the letters and concatenate; each level raises the subset depth by
 * one), starting from the word "AB…": n − 1 levels give an order-fair set of (n!)^(n−1) sides
 * per die, e.g. a 55,296-letter word for 4 dice (a check value of the construction).
 */
public final class VerifiedSets {
    private VerifiedSets() {
    }

    /** The order-fair set of the plain construction for {@code n} dice, verified exactly. */
    public static ExplicitDice orderFair(int n) {
        Word w = plainConstruction(n, n - 1);
        FairnessReport report = FairnessAnalysis.analyse(w.toDiceSet());
        if (!report.orderFair() || report.subsetDepth() != n) {
            throw new AssertionError("construction for " + n + " dice is not order-fair");
        }
        return new ExplicitDice("test-plain-" + n, w.toDiceSet(), FairnessGrade.ORDER_FAIR, n);
    }

    /**
     * An unfair set for 3 dice of 6 sides: the word ABCABC…ABC. Die A always holds the lowest
     * face of each triple, so A acts first far more often than a third of the time.
     */
    public static ExplicitDice unfairThree() {
        int[] letters = new int[18];
        for (int i = 0; i < letters.length; i++) {
            letters[i] = i % 3;
        }
        Word w = Word.of(3, letters);
        FairnessReport report = FairnessAnalysis.analyse(w.toDiceSet());
        if (report.leadFair()) {
            throw new AssertionError("ABC repeated should not be lead-fair");
        }
        return new ExplicitDice("test-unfair-3", w.toDiceSet(), report.grade(), report.subsetDepth());
    }

    /** {@code levels} rounds of "concatenate every relabelling" applied to the word A B … . */
    public static Word plainConstruction(int n, int levels) {
        int[] start = new int[n];
        for (int i = 0; i < n; i++) {
            start[i] = i;
        }
        Word w = Word.of(n, start);
        List<int[]> perms = permutations(n);
        for (int level = 0; level < levels; level++) {
            Word next = null;
            for (int[] sigma : perms) {
                Word block = w.relabel(sigma);
                next = next == null ? block : next.concat(block);
            }
            w = next;
        }
        return w;
    }

    static List<int[]> permutations(int n) {
        List<int[]> out = new ArrayList<>();
        permute(new int[n], new boolean[n], 0, out);
        return out;
    }

    private static void permute(int[] a, boolean[] used, int k, List<int[]> out) {
        if (k == a.length) {
            out.add(a.clone());
            return;
        }
        for (int x = 0; x < a.length; x++) {
            if (!used[x]) {
                used[x] = true;
                a[k] = x;
                permute(a, used, k + 1, out);
                used[x] = false;
            }
        }
    }
}
