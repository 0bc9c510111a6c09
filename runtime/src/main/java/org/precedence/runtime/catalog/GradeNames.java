package org.precedence.runtime.catalog;

import java.util.Locale;
import org.precedence.api.FairnessGrade;

/** The catalog's spelling of grades: {@code order-fair}, {@code seat-fair}, {@code lead-fair}. */
final class GradeNames {
    private GradeNames() {
    }

    static String text(FairnessGrade grade) {
        return grade.name().toLowerCase(Locale.ROOT).replace('_', '-');
    }

    static FairnessGrade parse(String text) {
        for (FairnessGrade g : FairnessGrade.values()) {
            if (text(g).equals(text)) {
                return g;
            }
        }
        throw new IllegalArgumentException("unknown grade '" + text
                + "' (allowed: order-fair, seat-fair, lead-fair, unfair)");
    }
}
