package org.precedence.game;

import org.precedence.game.rules.GameState;
import org.precedence.game.rules.Move;

/** Whoever plays a seat: a bot, a person at the terminal, or a replayed log. */
public interface MoveChooser {

    /**
     * Returns the move {@code seat} makes in {@code state}. The loop checks the move against
     * the rules and stops the game with a refused-move error if it is refused, so a
     * chooser that talks to a person should validate and re-ask itself.
     *
     * @param state the position before the move
     * @param seat  the seat to move
     * @param round the round number, 1-based
     */
    Move choose(GameState state, int seat, int round);
}
