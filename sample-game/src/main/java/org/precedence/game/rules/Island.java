package org.precedence.game.rules;

import java.util.Objects;

/**
 * One place on the ring.
 *
 * @param position the place's index on the ring (0 is the harbour)
 * @param name     the place's name
 * @param glow     what lighting its lantern scores; 0 for the harbour, which has no lantern
 */
public record Island(int position, String name, int glow) {
    public Island {
        Objects.requireNonNull(name, "name");
        if (position < 0 || glow < 0) {
            throw new IllegalArgumentException("position and glow must be >= 0");
        }
    }

    /** Returns whether this place has a lantern that can be lit. */
    public boolean hasLantern() {
        return glow > 0;
    }
}
