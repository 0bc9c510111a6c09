package org.precedence.runtime.service;

import java.time.Clock;
import org.precedence.api.FairnessGrade;
import org.precedence.api.TurnOrderProvider;
import org.precedence.runtime.dice.MixedRadixDice;
import org.precedence.runtime.source.SetSource;

/** What the endpoints share: the provider, the set source, the limits, sessions and the clock. */
final class Backend {
    final TurnOrderProvider provider;
    final SetSource sets;
    final ServiceLimits limits;
    final Sessions sessions;
    final Clock clock;

    Backend(TurnOrderProvider provider, SetSource sets, ServiceLimits limits, Sessions sessions, Clock clock) {
        this.provider = provider;
        this.sets = sets;
        this.limits = limits;
        this.sessions = sessions;
        this.clock = clock;
    }

    /** The largest player count every part of the service can serve. */
    int maxPlayers() {
        return Math.min(limits.maxPlayers(), Math.min(provider.maxPlayers(), sets.maxPlayers()));
    }

    /** Checks a player count from member or parameter {@code name}. */
    int players(long value, String name) {
        int max = maxPlayers();
        if (value < 2 || value > max) {
            throw ApiException.badRequest("\"" + name + "\" must be 2.." + max + ", got " + value);
        }
        return (int) value;
    }

    /** Returns the served set, turning the source's refusal into a 400. */
    MixedRadixDice set(int players, FairnessGrade grade) {
        try {
            return sets.forPlayers(players, grade);
        } catch (IllegalArgumentException e) {
            throw new ApiException(400, "not_served", e.getMessage());
        }
    }
}
