package org.precedence.runtime.provider;

import java.math.BigInteger;
import org.precedence.runtime.construction.ConstructedDice;
import org.precedence.runtime.randomness.LeadingGroup;
import org.precedence.runtime.randomness.RollGenerator;

/**
 * What the prefix ranking of one constructed set draws under one generator's layout: how many
 * leading digits make a die's prefix key, whether they are one {@link LeadingGroup}, and every
 * radix as a long. It depends only on the set and the algorithm, so a session works it out once
 * per set and shares it; each {@link PrefixRanker} adds its own scratch.
 *
 * <p>Immutable and thread-safe (the radix array is never written after construction).
 */
final class PrefixPlan {
    /** Prefix keys span at least 2^(2·log2(n) + this) sub-blocks: ties come about once in 2^13 rounds or less. */
    private static final int SPARE_KEY_BITS = 12;
    final ConstructedDice dice;
    final int players;
    final int prefix;
    /** Radices of every digit as longs; 0 when a radix does not fit (faces then use BigInteger). */
    final long[] radix;
    final boolean narrowDraws;
    /** The dice's leading group (the same for every die of a construction); null if none is drawn. */
    final LeadingGroup group;
    /** Whether the prefix is exactly the leading group, so that the drawn keys rank the dice. */
    final boolean keysOnly;
    /** Lane groups of {@link RollGenerator#LANES} dice. */
    final int laneGroups;

    PrefixPlan(ConstructedDice dice, RollGenerator generator) {
        this.dice = dice;
        this.players = dice.players();
        int pairBits = 2 * (32 - Integer.numberOfLeadingZeros(players - 1));
        LeadingGroup leading = generator.leadingGroups() ? LeadingGroup.of(dice, 0) : null;
        this.group = leading == null || leading.digits() == 0 ? null : leading;
        // The group's digits come together, so the prefix takes all of them (their product is
        // below 2^24, so the key still fits a long).
        this.prefix = Math.max(dice.prefixDigits(pairBits + SPARE_KEY_BITS), group == null ? 0 : group.digits());
        this.keysOnly = group != null && prefix == group.digits();
        this.radix = new long[dice.digits()];
        for (int j = 0; j < radix.length; j++) {
            BigInteger r = dice.radix(0, j);
            radix[j] = r.bitLength() < 63 ? r.longValue() : 0;
        }
        this.narrowDraws = generator.narrowDraws();
        this.laneGroups = (players + RollGenerator.LANES - 1) / RollGenerator.LANES;
    }

    /** Returns whether this plan was made for exactly {@code set} (the same instance). */
    boolean isFor(ConstructedDice set) {
        return dice == set;
    }
}
