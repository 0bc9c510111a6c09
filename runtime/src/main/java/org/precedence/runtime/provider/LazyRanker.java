package org.precedence.runtime.provider;

import org.precedence.api.RankingConvention;
import org.precedence.runtime.dice.MixedRadixDice;
import org.precedence.runtime.randomness.BlockCursor;
import org.precedence.runtime.randomness.RollGenerator;
import org.precedence.runtime.randomness.SeededFaces;

/**
 * The general ranking: any {@link MixedRadixDice}, digits drawn lazily through {@link
 * MixedRadixDice#compare} (a comparison needs only as many digits as tell two faces apart).
 * Insertion sort: n is small and the comparisons are the cost.
 */
final class LazyRanker {
    private LazyRanker() {
    }

    /** Draws (stream, index) of {@code dice} and writes the players in acting order. */
    static SeededFaces rankInto(RollGenerator generator, MixedRadixDice dice, RankingConvention convention,
            int stream, long index, int[] out) {
        return rankInto(generator, null, dice, convention, stream, index, out);
    }

    /** As above, taking blocks through a per-thread {@code cursor} (may be null). */
    static SeededFaces rankInto(RollGenerator generator, BlockCursor cursor, MixedRadixDice dice,
            RankingConvention convention, int stream, long index, int[] out) {
        SeededFaces faces = new SeededFaces(generator, cursor, dice, index, stream);
        rankInto(dice, faces, convention, out);
        return faces;
    }

    /** Ranks already-prepared faces: lowest value first, reversed for HIGHEST_FIRST. */
    static void rankInto(MixedRadixDice dice, SeededFaces faces, RankingConvention convention, int[] out) {
        int n = dice.players();
        for (int i = 0; i < n; i++) {
            int d = i;
            int j = i - 1;
            while (j >= 0 && dice.compare(out[j], d, faces) > 0) {
                out[j + 1] = out[j];
                j--;
            }
            out[j + 1] = d;
        }
        if (convention == RankingConvention.HIGHEST_FIRST) {
            RuleOrders.reverse(out, n);
        }
    }
}
