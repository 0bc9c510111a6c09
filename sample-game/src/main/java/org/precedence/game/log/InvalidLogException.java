package org.precedence.game.log;

/** A file that is not a usable game log; the message names the file and the problem. */
public final class InvalidLogException extends Exception {
    private static final long serialVersionUID = 1L;

    public InvalidLogException(String message) {
        super(message);
    }
}
