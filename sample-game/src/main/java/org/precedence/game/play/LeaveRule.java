package org.precedence.game.play;

import java.util.Comparator;
import java.util.List;
import java.util.Optional;
import org.precedence.game.GameSetup;
import org.precedence.game.Seat;
import org.precedence.game.rules.GameState;

/**
 * Who is made to leave when the setup asks for a departure: after the chosen round, the bot
 * still in with the least glow (then the fewest lanterns, then the highest seat) leaves the
 * table, as a player who drops out mid-game would. Nobody leaves if no bot is still in or if
 * only two boats are left, so at least two boats always play on.
 */
final class LeaveRule {
    private LeaveRule() {
    }

    static Optional<Integer> whoLeaves(GameSetup setup, GameState state, int roundJustPlayed) {
        if (setup.leaveAfterRound() == 0 || roundJustPlayed != setup.leaveAfterRound()) {
            return Optional.empty();
        }
        List<Integer> active = state.activeSeats();
        if (active.size() <= 2) {
            return Optional.empty();
        }
        List<Seat> seats = setup.seats();
        return active.stream()
                .filter(s -> seats.get(s).bot())
                .min(Comparator.<Integer>comparingInt(state::score)
                        .thenComparingInt(state::lanterns)
                        .thenComparing(Comparator.<Integer>reverseOrder()));
    }
}
