package org.precedence.game.replay;

/** Thrown inside a replay at the first difference from the log; never leaves the package. */
final class Mismatch extends RuntimeException {
    private static final long serialVersionUID = 1L;

    Mismatch(String message) {
        super(message, null, false, false);
    }
}
