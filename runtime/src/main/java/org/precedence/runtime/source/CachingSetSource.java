package org.precedence.runtime.source;

import com.github.benmanes.caffeine.cache.Cache;
import com.github.benmanes.caffeine.cache.Caffeine;
import java.util.Arrays;
import java.util.function.Function;
import org.precedence.api.FairnessGrade;
import org.precedence.runtime.dice.MixedRadixDice;

/**
 * A {@link SetSource} holding built sets in a bounded Caffeine cache keyed by (players, grade).
 * Caffeine runs the builder atomically per key, so many concurrent first requests for one key
 * build it once and all receive the same set; input is validated before the cache is touched,
 * so bad requests are never built or cached. A set evicted by the size bound is rebuilt on the
 * next request; the builder is deterministic, so the rebuilt set is the same set (same canonical
 * hash, same faces), as {@link SetSource} promises.
 */
final class CachingSetSource implements SetSource {
    static final String GRADES = "ORDER_FAIR, SEAT_FAIR, LEAD_FAIR";

    private final Cache<SetKey, MixedRadixDice> cache;
    private final Function<SetKey, MixedRadixDice> builder;
    private final int maxPlayers;

    CachingSetSource(Function<SetKey, MixedRadixDice> builder, int maxPlayers, long maximumSize) {
        if (maximumSize < 1) {
            throw new IllegalArgumentException("cache size must be at least 1, got " + maximumSize);
        }
        this.builder = builder;
        this.maxPlayers = maxPlayers;
        this.cache = Caffeine.newBuilder().maximumSize(maximumSize).build();
    }

    @Override
    public MixedRadixDice forPlayers(int players, FairnessGrade grade) {
        if (players < 2 || players > maxPlayers) {
            throw new IllegalArgumentException("players must be in 2.." + maxPlayers + ", got " + players);
        }
        if (grade == null || grade == FairnessGrade.UNFAIR) {
            throw new IllegalArgumentException("grade " + grade + " cannot be served; supported grades: "
                    + GRADES + " (players 2.." + maxPlayers + ")");
        }
        return cache.get(new SetKey(players, grade), builder);
    }

    @Override
    public int maxPlayers() {
        return maxPlayers;
    }

    /** Returns the number of cached sets after pending evictions (for tests). */
    long cachedSets() {
        cache.cleanUp();
        return cache.estimatedSize();
    }

    @Override
    public String toString() {
        return "CachingSetSource[players 2.." + maxPlayers + ", grades " + Arrays.asList(GRADES.split(", ")) + "]";
    }
}
