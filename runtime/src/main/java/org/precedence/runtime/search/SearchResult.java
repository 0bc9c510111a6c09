package org.precedence.runtime.search;

import java.math.BigInteger;
import java.util.List;
import java.util.Optional;
import org.precedence.runtime.dice.Word;

/**
 * The outcome of a search.
 *
 * @param sides      side count of each die
 * @param depth      the subset depth that was required
 * @param complete   true when the search space was exhausted, so the counts are exact
 * @param solutions  number of words (dice labelled, faces renumbered) meeting the requirement;
 *                   meaningful only when complete
 * @param classes    number of those up to renaming equal-sided dice and reversing the word;
 *                   when incomplete, the number of classes found so far
 * @param words      one representative per class found (the least word of the class), sorted,
 *                   at most {@link FairSetSearch#MAX_WORDS} of them; each has been
 *                   re-verified with the exact analysis
 * @param reason     why the answer is immediate (a divisibility bound fails) or why the search
 *                   stopped early, else null
 * @param elapsedMs  wall-clock time of the run
 * @param nodes      search nodes visited (a measure of work)
 */
public record SearchResult(int[] sides, int depth, boolean complete, BigInteger solutions,
                           long classes, List<Word> words, String reason, long elapsedMs,
                           long nodes) {

    public SearchResult {
        sides = sides.clone();
        words = List.copyOf(words);
    }

    /** Returns the number of dice. */
    public int players() {
        return sides.length;
    }

    @Override
    public int[] sides() {
        return sides.clone();
    }

    /** Returns the reason, if any. */
    public Optional<String> reasonText() {
        return Optional.ofNullable(reason);
    }
}
