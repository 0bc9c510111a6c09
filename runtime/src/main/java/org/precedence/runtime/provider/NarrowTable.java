package org.precedence.runtime.provider;

import org.precedence.runtime.dice.ExplicitDice;
import org.precedence.runtime.randomness.RollGenerator;

/**
 * An explicit set flattened for 16-bit draws: per die its side count, its Lemire rejection
 * threshold {@code 2^16 mod sides} (precomputed, so the hot loop never divides) and its face
 * values in one array. Exists only for sets whose dice all have fewer than 2^16 sides.
 */
final class NarrowTable {
    final int players;
    final int[] sides;
    final int[] thresholds;
    final int[] offsets;
    final long[] values;

    private NarrowTable(ExplicitDice dice) {
        players = dice.players();
        sides = new int[players];
        thresholds = new int[players];
        offsets = new int[players];
        int total = 0;
        for (int d = 0; d < players; d++) {
            sides[d] = dice.sideCount(d);
            // (2^16 - s) mod s = 2^16 mod s: the number of chunks rejected (roll spec §5).
            thresholds[d] = RollGenerator.NARROW_LIMIT % sides[d];
            offsets[d] = total;
            total += sides[d];
        }
        values = new long[total];
        for (int d = 0; d < players; d++) {
            for (int f = 0; f < sides[d]; f++) {
                values[offsets[d] + f] = dice.value(d, f);
            }
        }
    }

    /** Returns the table of {@code dice}, or null if a die has 2^16 sides or more. */
    static NarrowTable of(ExplicitDice dice) {
        for (int d = 0; d < dice.players(); d++) {
            if (dice.sideCount(d) >= RollGenerator.NARROW_LIMIT) {
                return null;
            }
        }
        return new NarrowTable(dice);
    }
}
