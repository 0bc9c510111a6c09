package org.precedence.game.rules;

import java.util.Objects;

/**
 * One player's boat. Score and lit islands are not stored here: they follow from which
 * lanterns the boat owns on the board, so they cannot drift apart.
 *
 * @param seat     the seat that sails it (0-based)
 * @param name     the boat's name
 * @param position where it lies on the ring
 * @param oil      oil in its hold, 0 to {@link Rules#MAX_OIL}
 * @param active   false once the boat has left the game
 */
public record Boat(int seat, String name, int position, int oil, boolean active) {
    public Boat {
        Objects.requireNonNull(name, "name");
        if (seat < 0 || position < 0 || oil < 0 || oil > Rules.MAX_OIL) {
            throw new IllegalArgumentException("invalid boat: seat " + seat + ", position " + position + ", oil " + oil);
        }
    }

    Boat at(int newPosition) {
        return new Boat(seat, name, newPosition, oil, active);
    }

    Boat withOil(int newOil) {
        return new Boat(seat, name, position, newOil, active);
    }

    Boat retired() {
        return new Boat(seat, name, position, oil, false);
    }
}
