package org.precedence.api;

import java.util.List;
import java.util.Objects;

/**
 * The outcome of one round: the turn order and every player's roll behind it.
 *
 * @param round  the round number (0-based)
 * @param order  player indices in acting order, first to act first
 * @param rolls  one roll per player, indexed by player ({@code rolls.get(i).player() == i})
 * @param grade  the fairness grade of the set that was rolled
 * @param setId  identifier of the dice set that was rolled
 */
public record RoundResult(long round, List<Integer> order, List<PlayerRoll> rolls, FairnessGrade grade, String setId) {
    public RoundResult {
        Objects.requireNonNull(order, "order");
        Objects.requireNonNull(rolls, "rolls");
        Objects.requireNonNull(grade, "grade");
        Objects.requireNonNull(setId, "setId");
        if (round < 0) {
            throw new IllegalArgumentException("round must be >= 0, got " + round);
        }
        order = List.copyOf(order);
        rolls = List.copyOf(rolls);
        if (order.size() != rolls.size()) {
            throw new IllegalArgumentException("order and rolls must have the same size");
        }
    }

    /** Returns the number of players in this round. */
    public int players() {
        return order.size();
    }

    /** Returns the index of the player who acts first. */
    public int first() {
        return order.get(0);
    }
}
