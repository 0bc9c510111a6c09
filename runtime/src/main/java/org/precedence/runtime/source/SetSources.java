package org.precedence.runtime.source;

import java.util.Comparator;
import java.util.Optional;
import java.util.function.IntFunction;
import org.precedence.api.FairnessGrade;
import org.precedence.runtime.catalog.Catalog;
import org.precedence.runtime.catalog.CatalogEntry;
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
     * The standard source: the shipped catalog's smallest order-fair set of n <em>equal</em>
     * dice where it has one, the implicit construction for every other n. Served sets have
     * equal side counts so that every player at the table rolls the same kind of die and
     * "sides per die" means one number; the catalog's mixed-side sets stay available by id.
     */
    public static SetSource standard() {
        return withCatalog(SetSources::equalSidedCatalogSet);
    }

    static Optional<MixedRadixDice> equalSidedCatalogSet(int players) {
        return Catalog.shipped().entries(players).stream()
                .filter(e -> e.grade() == FairnessGrade.ORDER_FAIR && e.sides().stream().distinct().count() == 1)
                .min(Comparator.comparingInt(CatalogEntry::totalFaces).thenComparing(CatalogEntry::id))
                .map(CatalogEntry::toDice);
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
