package org.precedence.game;

import java.util.Objects;

/**
 * One seat at the table.
 *
 * @param index the seat number, 0-based; the roster of every round lists seats in this order
 * @param name  the boat's name, unique at the table
 * @param bot   whether a bot plays this seat (otherwise a person at the terminal)
 */
public record Seat(int index, String name, boolean bot) {
    public Seat {
        Objects.requireNonNull(name, "name");
        if (index < 0) {
            throw new IllegalArgumentException("seat index must be >= 0, got " + index);
        }
        if (name.isBlank()) {
            throw new IllegalArgumentException("seat name must not be blank");
        }
    }
}
