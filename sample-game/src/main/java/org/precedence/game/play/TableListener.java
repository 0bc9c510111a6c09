package org.precedence.game.play;

import org.precedence.game.GameSetup;
import org.precedence.game.rules.GameState;
import org.precedence.game.rules.Move;
import org.precedence.game.rules.Outcome;

/**
 * Hears what happens at the table, in order. The terminal renders it; tests and the replay
 * check it. Every method has a do-nothing default.
 */
public interface TableListener {

    /** The game is about to start in {@code state}. */
    default void gameStarted(GameSetup setup, String providerName, GameState state) {
    }

    /** A round's dice are rolled and its order is fixed; nobody has moved yet. */
    default void roundStarted(RoundStart start, GameState state) {
    }

    /** {@code seat} made {@code move}, turning {@code before} into {@code after}. */
    default void moved(int round, int seat, Move move, GameState before, GameState after) {
    }

    /** {@code seat} was made to leave after round {@code round}. */
    default void departed(int round, int seat, GameState after) {
    }

    /** The game is over. */
    default void gameEnded(Outcome outcome, GameState state, int rounds) {
    }

    /** A listener that hears nothing. */
    TableListener NONE = new TableListener() {
    };
}
