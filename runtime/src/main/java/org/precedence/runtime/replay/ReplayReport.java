package org.precedence.runtime.replay;

import java.util.Optional;

/**
 * The outcome of a replay.
 *
 * @param roundsChecked rounds recomputed and found equal before the first mismatch (all, if none)
 * @param mismatch      the first mismatch, if any
 */
public record ReplayReport(int roundsChecked, Optional<Mismatch> mismatch) {
    /** Returns whether the commitment and every round matched. */
    public boolean ok() {
        return mismatch.isEmpty();
    }
}
