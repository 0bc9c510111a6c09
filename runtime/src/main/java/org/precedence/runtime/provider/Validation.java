package org.precedence.runtime.provider;

/** The argument checks shared by sessions and the fast path, with one wording. */
final class Validation {
    private Validation() {
    }

    static void requireRound(long round) {
        if (round < 0) {
            throw new IllegalArgumentException("round must be >= 0, got " + round);
        }
    }

    static void requireServedCount(int players, int max) {
        if (players < 2 || players > max) {
            throw new IllegalArgumentException("player count must be between 2 and " + max
                    + " to roll dice, got " + players);
        }
    }
}
