package org.precedence.game.rules;

/** A well-formed move that the rules refuse in the current state; the message says why. */
public final class IllegalMoveException extends Exception {
    private static final long serialVersionUID = 1L;

    public IllegalMoveException(String message) {
        super(message);
    }
}
