package org.precedence.runtime.provider;

import java.util.Objects;
import org.precedence.api.SessionSpec;
import org.precedence.api.TurnOrderProvider;
import org.precedence.runtime.randomness.RollGenerator;
import org.precedence.runtime.source.SetSource;

/**
 * The runtime's {@link TurnOrderProvider}, registered for {@link java.util.ServiceLoader}: opens
 * {@link DiceSession}s over the standard served sets, or over a given {@link SetSource}.
 */
public final class FairDiceProvider implements TurnOrderProvider {
    private final SetSource sets;

    /** The provider over the standard served sets (what {@link TurnOrderProvider#load()} finds). */
    public FairDiceProvider() {
        this(DefaultSets.get());
    }

    /** A provider over {@code sets}. */
    public FairDiceProvider(SetSource sets) {
        this.sets = Objects.requireNonNull(sets, "sets");
    }

    /** Returns the standard served sets (what the no-argument constructor uses). */
    public static SetSource standardSets() {
        return DefaultSets.get();
    }

    /** Returns the sets this provider rolls (so a service can describe exactly those). */
    public SetSource sets() {
        return sets;
    }

    @Override
    public DiceSession open(SessionSpec spec) {
        return new DiceSession(Objects.requireNonNull(spec, "spec"), sets);
    }

    @Override
    public int maxPlayers() {
        return sets.maxPlayers();
    }

    @Override
    public String name() {
        return "precedence fair dice (" + RollGenerator.FAST_ID + ", " + RollGenerator.SECURE_ID + ")";
    }
}
