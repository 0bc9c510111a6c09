package org.precedence.runtime.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.math.BigInteger;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.precedence.api.RankingConvention;
import org.precedence.runtime.dice.Word;

/**
 * OEIS A362634 (minimal unfairness of dice with given side counts): its worked example says
 * that for side counts 2, 2, 3 the best numbering has order counts ranging from 1 to 3, a
 * difference of 2, and that this best numbering is unique. (As summarised in our brief; the
 * entry itself was not consulted here.) Reproduced by exhaustive search over all 210 words.
 *
 * <p>What "unique" means, and what this test checks: exactly two words reach the optimum,
 * CABCBAC and CBACABC. They differ only by swapping the names of the two 2-sided dice A and B —
 * the one renaming that keeps every die's side count — and each reads the same backwards, so
 * reversal adds nothing. The best numbering is therefore unique up to renaming equal-sided
 * dice, with or without reversal; and it is not unique as a labelled word.
 */
class MinimalUnfairnessTest {

    @Test
    void sides223_bestNumbering_hasCountsOneToThreeAndIsUnique() {
        List<Word> words = TestSets.allWords(2, 2, 3);
        assertEquals(210, words.size()); // 7!/(2!·2!·3!)
        BigInteger best = null;
        List<Word> optimal = new ArrayList<>();
        for (Word w : words) {
            FairnessReport r = FairnessAnalysis.analyse(w, RankingConvention.LOWEST_FIRST);
            BigInteger spread = r.maxCount().subtract(r.minCount());
            BruteForce b = BruteForce.of(w.toDiceSet());
            assertEquals(BigInteger.valueOf(b.max() - b.min()), spread, w.toString());
            int cmp = best == null ? -1 : spread.compareTo(best);
            if (cmp < 0) {
                best = spread;
                optimal.clear();
            }
            if (cmp <= 0) {
                optimal.add(w);
            }
        }
        assertEquals(BigInteger.TWO, best);
        for (Word w : optimal) {
            FairnessReport r = FairnessChecks.assertExact(w.toDiceSet());
            assertEquals(BigInteger.ONE, r.minCount());
            assertEquals(BigInteger.valueOf(3), r.maxCount());
        }
        Set<String> names = new HashSet<>();
        optimal.forEach(w -> names.add(w.toString()));
        assertEquals(Set.of("CABCBAC", "CBACABC"), names);

        // Unique up to renaming equal-sided dice: the optimum is a single orbit, with or
        // without reversal, and each optimal word is its own reverse.
        Word first = optimal.get(0);
        assertEquals(new HashSet<>(optimal), Symmetry.orbit(first, false));
        assertEquals(new HashSet<>(optimal), Symmetry.orbit(first, true));
        for (Word w : optimal) {
            assertEquals(w, w.reversed());
        }
    }
}
