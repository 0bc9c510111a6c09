package org.precedence.api;

import java.util.ServiceLoader;

/**
 * Service interface: opens sessions. Found with {@link ServiceLoader}, so an engine depends on
 * this package only and puts an implementation on its class path.
 */
public interface TurnOrderProvider {

    /** Opens a session; the same spec always yields the same rounds. */
    TurnOrderSource open(SessionSpec spec);

    /** Opens a session with {@link SessionSpec#of(SessionSeed) the default spec} for {@code seed}. */
    default TurnOrderSource open(SessionSeed seed) {
        return open(SessionSpec.of(seed));
    }

    /** The largest player count this provider serves. */
    int maxPlayers();

    /** A short name of the implementation and its algorithm id, for logs. */
    String name();

    /**
     * Returns the first provider on the class path.
     *
     * @throws IllegalStateException if none is installed
     */
    static TurnOrderProvider load() {
        return ServiceLoader.load(TurnOrderProvider.class).findFirst()
                .orElseThrow(() -> new IllegalStateException(
                        "no " + TurnOrderProvider.class.getName()
                                + " on the class path; add precedence-runtime to the application"));
    }
}
