package org.precedence.game.play;

/** A chooser handed the loop a move the rules refuse; the game cannot go on. */
public final class RefusedMoveException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    public RefusedMoveException(String message) {
        super(message);
    }
}
