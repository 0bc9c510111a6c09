package org.precedence.api;

import java.util.List;
import java.util.Objects;

/**
 * The outcome of one round: the turn order and every player's roll behind it.
 *
 * <p>The constructor checks consistency: {@code order} is a permutation of
 * {@code 0..players-1}, {@code rolls.get(i).player() == i}, and each roll's position is where
 * its player stands in {@code order}.
 *
 * @param round  the round number (0-based)
 * @param order  player indices in acting order, first to act first
 * @param rolls  one roll per player, indexed by player ({@code rolls.get(i).player() == i})
 * @param grade  the fairness grade of the set that was rolled
 * @param setId  identifier of the dice set that was rolled
 * @throws NullPointerException     if any argument or element is null
 * @throws IllegalArgumentException if the round is negative or the parts disagree
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
        if (order.isEmpty()) {
            throw new IllegalArgumentException("a round has at least one player");
        }
        if (order.size() != rolls.size()) {
            throw new IllegalArgumentException("order has " + order.size() + " players but rolls has "
                    + rolls.size());
        }
        int n = order.size();
        boolean[] seen = new boolean[n];
        for (int p = 0; p < n; p++) {
            int player = order.get(p);
            if (player < 0 || player >= n || seen[player]) {
                throw new IllegalArgumentException("order must list each player 0.." + (n - 1)
                        + " once, got " + order);
            }
            seen[player] = true;
            PlayerRoll roll = rolls.get(player);
            if (roll.player() != player) {
                throw new IllegalArgumentException("rolls.get(" + player + ") is player " + roll.player());
            }
            if (roll.position() != p) {
                throw new IllegalArgumentException("player " + player + " acts at position " + p
                        + " but its roll says " + roll.position());
            }
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

    /** Returns the index of the player who acts last. */
    public int last() {
        return order.get(order.size() - 1);
    }

    /** Returns where {@code player} acts (0 = first). */
    public int positionOf(int player) {
        return rolls.get(player).position();
    }

    /** Returns the face values, indexed by player. */
    public List<java.math.BigInteger> faceValues() {
        return rolls.stream().map(PlayerRoll::faceValue).toList();
    }
}
