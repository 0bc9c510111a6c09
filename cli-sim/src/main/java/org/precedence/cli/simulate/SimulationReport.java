package org.precedence.cli.simulate;

import java.util.List;

/**
 * Everything one {@code simulate} run found.
 *
 * @param seed             the seed as given
 * @param mode             "fast" or "secure"
 * @param sessions         sessions per player count
 * @param roundsPerSession rounds per session
 * @param complete         false when the run was interrupted
 * @param requestedPlayers the player counts asked for
 * @param counts           one entry per player count simulated, in the order asked for (fewer
 *                         than asked when the run was interrupted)
 */
record SimulationReport(String seed, String mode, long sessions, long roundsPerSession, boolean complete,
                        List<Integer> requestedPlayers, List<PlayerCount> counts) {

    /**
     * Results for one player count.
     *
     * @param main     the provider with a fresh fair order every round
     * @param balanced the provider in balanced-lead mode, or null if the run stopped before it
     * @param peers    plain shuffle and ordinary dice (only with {@code --compare})
     */
    record PlayerCount(SupplyResult main, SupplyResult balanced, List<SupplyResult> peers) {
    }

    /** p-values below this flag a set as unfair (exit code 1). */
    static final double FLAG_BELOW = 1e-6;

    /** Returns whether any player count's main test is below {@link #FLAG_BELOW}. */
    boolean flagged() {
        return counts.stream().anyMatch(c -> c.main().main().pValue() < FLAG_BELOW);
    }
}
