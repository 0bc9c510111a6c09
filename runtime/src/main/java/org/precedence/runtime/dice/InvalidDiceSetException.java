package org.precedence.runtime.dice;

/** Thrown when faces do not form a valid dice set; the message says what and where. */
public final class InvalidDiceSetException extends IllegalArgumentException {
    private static final long serialVersionUID = 1L;

    public InvalidDiceSetException(String message) {
        super(message);
    }
}
