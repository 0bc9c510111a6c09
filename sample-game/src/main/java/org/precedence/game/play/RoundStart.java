package org.precedence.game.play;

import java.util.List;
import java.util.Objects;
import org.precedence.api.RoundResult;

/**
 * A round as it opens, before anyone moves.
 *
 * @param round  the round number, 1-based
 * @param roster the seats in the round, in seat order; die i of the roll belongs to roster[i]
 * @param roll   what the turn-order source returned (indices into {@code roster})
 * @param order  the seats in acting order
 */
public record RoundStart(int round, List<Integer> roster, RoundResult roll, List<Integer> order) {
    public RoundStart {
        roster = List.copyOf(Objects.requireNonNull(roster, "roster"));
        Objects.requireNonNull(roll, "roll");
        order = List.copyOf(Objects.requireNonNull(order, "order"));
    }
}
