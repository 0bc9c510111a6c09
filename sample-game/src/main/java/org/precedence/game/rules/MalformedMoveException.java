package org.precedence.game.rules;

/** Text that is not a move at all; the message says what was typed and what is allowed. */
public final class MalformedMoveException extends Exception {
    private static final long serialVersionUID = 1L;

    public MalformedMoveException(String message) {
        super(message);
    }
}
