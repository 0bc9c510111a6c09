package org.precedence.api;

import java.math.BigInteger;
import java.util.Objects;

/**
 * One player's roll in one round, for the table's display.
 *
 * @param player    the player's index in the round's roster (0-based)
 * @param die       the die the player rolled, as a letter name ("A", "B", …, "Z", "AA", …)
 * @param faceIndex which face came up, 0-based among the die's faces
 * @param faceValue the value printed on that face; values are distinct across the whole set
 * @param position  where the player acts in this round (0 = first)
 */
public record PlayerRoll(int player, String die, BigInteger faceIndex, BigInteger faceValue, int position) {
    public PlayerRoll {
        Objects.requireNonNull(die, "die");
        Objects.requireNonNull(faceIndex, "faceIndex");
        Objects.requireNonNull(faceValue, "faceValue");
        if (player < 0 || position < 0) {
            throw new IllegalArgumentException("player and position must be >= 0");
        }
        if (faceIndex.signum() < 0) {
            throw new IllegalArgumentException("faceIndex must be >= 0");
        }
    }
}
