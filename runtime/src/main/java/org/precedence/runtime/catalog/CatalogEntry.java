package org.precedence.runtime.catalog;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import org.precedence.api.FairnessGrade;
import org.precedence.runtime.dice.DiceSet;
import org.precedence.runtime.dice.ExplicitDice;
import org.precedence.runtime.dice.Word;

/**
 * One shipped set.
 *
 * @param id          stable identifier, e.g. {@code d3-6x3}
 * @param players     number of dice
 * @param sides       side count of each die
 * @param grade       proven grade (exact analysis at generation, re-verified by the tests)
 * @param subsetDepth proven subset depth
 * @param dice        face values of each die, renumbered 1..total in word order
 * @param sha256      SHA-256 of the canonical form of the set ({@link Word#sha256()})
 * @param provenance  how the set was found
 */
public record CatalogEntry(String id, int players, List<Integer> sides, FairnessGrade grade,
                           int subsetDepth, List<List<Long>> dice, String sha256,
                           Provenance provenance) {

    /**
     * How an entry was found.
     *
     * @param method     {@code exhaustive search} or {@code structured search}
     * @param parameters the search parameters, as text
     * @param steps      the steps taken, in order
     */
    public record Provenance(String method, String parameters, List<String> steps) {
        public Provenance {
            Objects.requireNonNull(method, "method");
            Objects.requireNonNull(parameters, "parameters");
            steps = List.copyOf(steps);
        }
    }

    public CatalogEntry {
        Objects.requireNonNull(id, "id");
        Objects.requireNonNull(grade, "grade");
        Objects.requireNonNull(sha256, "sha256");
        Objects.requireNonNull(provenance, "provenance");
        sides = List.copyOf(sides);
        List<List<Long>> copy = new ArrayList<>(dice.size());
        for (List<Long> die : dice) {
            copy.add(List.copyOf(die));
        }
        dice = List.copyOf(copy);
    }

    /** Returns the set with default die names A, B, C, …. */
    public DiceSet toDiceSet() {
        long[][] faces = new long[dice.size()][];
        for (int d = 0; d < faces.length; d++) {
            faces[d] = dice.get(d).stream().mapToLong(Long::longValue).toArray();
        }
        return DiceSet.of(faces);
    }

    /** Returns the word of the set. */
    public Word word() {
        return toDiceSet().word();
    }

    /** Returns the total number of faces. */
    public int totalFaces() {
        return sides.stream().mapToInt(Integer::intValue).sum();
    }

    /** Returns the set as rollable dice carrying this entry's id, grade and subset depth. */
    public ExplicitDice toDice() {
        return new ExplicitDice(id, toDiceSet(), grade, subsetDepth);
    }
}
