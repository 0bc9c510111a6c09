package org.precedence.runtime.construction;

import java.util.Objects;
import org.precedence.runtime.analysis.FairnessAnalysis;
import org.precedence.api.RankingConvention;
import org.precedence.runtime.dice.ExplicitDice;
import org.precedence.runtime.dice.MixedRadixDice;
import org.precedence.runtime.dice.Word;

/**
 * The word the first level starts from: the n distinct letters {@code AB…} (depth 1, one face
 * per die) or an explicit set with equal side counts whose subset depth is proven.
 *
 * @param word  the word
 * @param depth its subset depth (checked exactly on creation)
 * @param label {@code letters} or {@code catalog:<id>}
 */
public record StartingWord(Word word, int depth, String label) {
    public StartingWord {
        Objects.requireNonNull(word, "word");
        Objects.requireNonNull(label, "label");
        int[] sides = word.sides();
        for (int s : sides) {
            if (s != sides[0]) {
                throw new IllegalArgumentException("a starting word needs equal side counts, got "
                        + java.util.Arrays.toString(sides));
            }
        }
        if (depth < 1 || depth > word.players()) {
            throw new IllegalArgumentException("depth must be in 1.." + word.players() + ", got " + depth);
        }
    }

    /** The word A, B, …: each die one face. */
    public static StartingWord letters(int players) {
        int[] letters = new int[players];
        for (int i = 0; i < players; i++) {
            letters[i] = i;
        }
        return new StartingWord(Word.of(players, letters), 1, "letters");
    }

    /**
     * A catalog or searched set as starting point; its depth is recomputed exactly with the
     * analysis engine, and a claim the counts do not support is rejected.
     */
    public static StartingWord of(MixedRadixDice dice) {
        if (!(dice instanceof ExplicitDice explicit)) {
            throw new IllegalArgumentException("only sets with listed faces can start a construction, got "
                    + dice.id());
        }
        Word word = explicit.set().word();
        int depth = FairnessAnalysis.analyse(word, RankingConvention.LOWEST_FIRST).subsetDepth();
        if (depth < dice.subsetDepth()) {
            throw new IllegalStateException(dice.id() + " claims subset depth " + dice.subsetDepth()
                    + " but its counts give " + depth);
        }
        return new StartingWord(word, depth, "catalog:" + dice.id());
    }

    /** Returns the number of faces per die. */
    public int sidesPerDie() {
        return word.sides()[0];
    }
}
