package org.precedence.game.rules;

import java.util.Objects;

/**
 * One boat's final line.
 *
 * @param seat      the seat (0-based)
 * @param name      the boat's name
 * @param score     glow scored (lanterns still owned at the end)
 * @param lanterns  lanterns owned at the end
 * @param oil       oil left in the hold
 * @param active    false if the boat left before the end (it cannot win)
 */
public record Standing(int seat, String name, int score, int lanterns, int oil, boolean active) {
    public Standing {
        Objects.requireNonNull(name, "name");
    }
}
