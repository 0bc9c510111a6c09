package org.precedence.game.play;

import java.util.ArrayList;
import java.util.List;
import org.precedence.api.RoundResult;
import org.precedence.api.TurnOrderSource;

/**
 * The one place the game asks for a turn order: where another engine would shuffle its
 * players, it rolls the round once for the live roster and maps the rolled order back to
 * seats. A round with n players is rolled with an order-fair set for n dice, so after a boat
 * leaves the remaining boats still get every order with equal chance.
 */
final class RoundOrder {
    private RoundOrder() {
    }

    /**
     * Rolls game round {@code round} (1-based; the source counts from 0) for {@code roster}.
     *
     * @throws IllegalStateException if the source answers with a result that does not fit the
     *                               roster (a broken provider, never bad input)
     */
    static RoundStart draw(TurnOrderSource source, int round, List<Integer> roster) {
        RoundResult roll = source.roll(round - 1L, roster.size());
        check(roll, round, roster.size());
        List<Integer> order = new ArrayList<>(roster.size());
        for (int index : roll.order()) {
            order.add(roster.get(index));
        }
        return new RoundStart(round, roster, roll, order);
    }

    private static void check(RoundResult roll, int round, int players) {
        // RoundResult checks itself (order is a permutation, rolls agree with it); what it
        // cannot know is whether it answers the question asked.
        if (roll.round() != round - 1L || roll.players() != players) {
            throw new IllegalStateException("the turn-order source answered round " + roll.round() + " for "
                    + roll.players() + " players when asked for round " + (round - 1) + " for " + players);
        }
    }
}
