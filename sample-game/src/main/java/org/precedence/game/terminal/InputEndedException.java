package org.precedence.game.terminal;

/** The terminal's input ended while a person was to move; the game cannot go on. */
public final class InputEndedException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    public InputEndedException(String message) {
        super(message);
    }
}
