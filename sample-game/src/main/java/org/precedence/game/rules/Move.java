package org.precedence.game.rules;

/**
 * One action on a boat's turn. {@link #text()} is the move as a person types it and as the
 * game log stores it; {@link MoveParser#parse} reads it back.
 */
public sealed interface Move {

    /** Returns the canonical text of the move, e.g. {@code "sail 2"}. */
    String text();

    /** Sail 1 to 3 places clockwise. */
    record Sail(int distance) implements Move {
        /** Shortest sail. */
        public static final int MIN = 1;
        /** Longest sail. */
        public static final int MAX = 3;

        public Sail {
            if (distance < MIN || distance > MAX) {
                throw new IllegalArgumentException("a boat sails " + MIN + " to " + MAX + " places, got " + distance);
            }
        }

        @Override
        public String text() {
            return "sail " + distance;
        }
    }

    /** Light the dark lantern where the boat lies, for 1 oil. */
    record Light() implements Move {
        @Override
        public String text() {
            return "light";
        }
    }

    /** Take on 1 oil. */
    record Gather() implements Move {
        @Override
        public String text() {
            return "gather";
        }
    }

    /** Leave the game; the boat's lanterns go dark. */
    record Retire() implements Move {
        @Override
        public String text() {
            return "retire";
        }
    }
}
