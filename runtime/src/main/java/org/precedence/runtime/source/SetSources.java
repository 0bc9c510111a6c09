package org.precedence.runtime.source;

import java.util.Optional;
import java.util.function.IntFunction;
import org.precedence.runtime.dice.MixedRadixDice;

/**
 * Factories for the standard {@link SetSource}: catalog first, the layered construction as
 * fallback, cached per (players, grade) and built at most once per key.
 *
 * <p>Supported: 2 to {@value #MAX_PLAYERS} players; grades ORDER_FAIR, SEAT_FAIR and LEAD_FAIR
 * (an order-fair set satisfies all three). Anything else is an {@link IllegalArgumentException}
 * naming the supported range.
 */
public final class SetSources {
    /** The largest player count served. */
    public static final int MAX_PLAYERS = 64;
    /** How many built sets the standard source keeps. */
    public static final long DEFAULT_CACHE_SIZE = 32;

    private SetSources() {
    }

    /**
     * The standard source. The shipped catalog is not yet part of this build, so every player
     * count is served by the construction; once the catalog lands, pass its lookup to
     * {@link #withCatalog(IntFunction)} here.
     */
    public static SetSource standard() {
        return withCatalog(players -> Optional.empty());
    }

    /** A source consulting {@code catalog} first (it may return empty for any count). */
    public static SetSource withCatalog(IntFunction<Optional<MixedRadixDice>> catalog) {
        return withCatalog(catalog, DEFAULT_CACHE_SIZE);
    }

    /** As {@link #withCatalog(IntFunction)}, keeping at most {@code maximumSize} sets. */
    public static SetSource withCatalog(IntFunction<Optional<MixedRadixDice>> catalog, long maximumSize) {
        return new CachingSetSource(new CatalogFirstBuilder(catalog), MAX_PLAYERS, maximumSize);
    }
}
