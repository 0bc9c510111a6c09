package org.precedence.game.replay;

import java.util.List;
import java.util.Objects;

/**
 * What a replay found.
 *
 * @param matches       whether every round and the result matched the log
 * @param roundsChecked rounds confirmed before the end or the first difference
 * @param lines         one line per confirmed round, then the verdict
 * @param verdict       one line: what matched, or the first difference and where
 */
public record ReplayReport(boolean matches, int roundsChecked, List<String> lines, String verdict) {
    public ReplayReport {
        lines = List.copyOf(Objects.requireNonNull(lines, "lines"));
        Objects.requireNonNull(verdict, "verdict");
    }
}
