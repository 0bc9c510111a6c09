package org.precedence.runtime.replay;

import java.util.List;
import java.util.Objects;

/**
 * One recorded round.
 *
 * @param round     the round number
 * @param roster    the players of the round, in roster order (die i went to roster[i])
 * @param setId     the id of the set rolled
 * @param setSha256 SHA-256 of the set's canonical form
 * @param faces     each player's face value, in decimal, indexed by roster position
 * @param order     player indices in acting order
 */
public record LoggedRound(long round, List<String> roster, String setId, String setSha256, List<String> faces,
        List<Integer> order) {
    public LoggedRound {
        Objects.requireNonNull(setId, "setId");
        Objects.requireNonNull(setSha256, "setSha256");
        roster = List.copyOf(roster);
        faces = List.copyOf(faces);
        order = List.copyOf(order);
    }
}
