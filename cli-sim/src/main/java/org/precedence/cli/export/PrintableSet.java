package org.precedence.cli.export;

import java.util.List;
import java.util.Objects;
import org.precedence.api.FairnessGrade;

/**
 * A served set whose faces are listed: what every export format prints.
 *
 * @param id          the set's identifier
 * @param sha256      SHA-256 of its canonical form
 * @param grade       proven fairness grade
 * @param subsetDepth proven subset depth
 * @param faces       face values per die, in increasing order, 1..total across the set
 */
record PrintableSet(String id, String sha256, FairnessGrade grade, int subsetDepth, List<long[]> faces) {
    PrintableSet {
        Objects.requireNonNull(id, "id");
        Objects.requireNonNull(sha256, "sha256");
        Objects.requireNonNull(grade, "grade");
        faces = List.copyOf(faces);
    }

    int players() {
        return faces.size();
    }

    long totalFaces() {
        long t = 0;
        for (long[] f : faces) {
            t += f.length;
        }
        return t;
    }
}
