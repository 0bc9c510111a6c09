package org.precedence.runtime.source;

import java.util.List;
import java.util.Optional;
import java.util.function.Function;
import java.util.function.IntFunction;
import org.precedence.runtime.construction.ConstructedDice;
import org.precedence.runtime.construction.Construction;
import org.precedence.runtime.construction.StartingWord;
import org.precedence.runtime.dice.ExplicitDice;
import org.precedence.runtime.dice.MixedRadixDice;

/**
 * Builds the set for one key: the catalog's set when it is for the right number of players and
 * its proven grade is high enough; otherwise the smallest construction, started from the
 * catalog's set when that is an explicit set with equal sides and a proven depth of at least 2
 * and it makes the result smaller.
 */
final class CatalogFirstBuilder implements Function<SetKey, MixedRadixDice> {
    private final IntFunction<Optional<MixedRadixDice>> catalog;

    CatalogFirstBuilder(IntFunction<Optional<MixedRadixDice>> catalog) {
        this.catalog = catalog;
    }

    @Override
    public MixedRadixDice apply(SetKey key) {
        int n = key.players();
        Optional<MixedRadixDice> listed = catalog.apply(n).filter(d -> d.players() == n);
        if (listed.isPresent() && listed.get().grade().atLeast(key.grade())) {
            return listed.get();
        }
        List<StartingWord> starts = listed.flatMap(CatalogFirstBuilder::asStart)
                .map(List::of)
                .orElse(List.of());
        return new ConstructedDice(Construction.smallest(n, starts));
    }

    /**
     * Returns the catalog set as a starting word when it can be one: listed faces, equal sides,
     * a claimed depth of at least 2 that its exact counts confirm, and few enough dice for the
     * exact count. A set that fails any of these is simply not used as a start.
     */
    private static Optional<StartingWord> asStart(MixedRadixDice d) {
        if (!(d instanceof ExplicitDice explicit) || d.subsetDepth() < 2 || d.players() > MAX_START_PLAYERS
                || !explicit.set().equalSides()) {
            return Optional.empty();
        }
        try {
            return Optional.of(StartingWord.of(d));
        } catch (IllegalStateException | IllegalArgumentException e) {
            return Optional.empty();
        }
    }

    /** Starting words are re-counted exactly, which the pattern table offers up to this size. */
    static final int MAX_START_PLAYERS = 8;
}
