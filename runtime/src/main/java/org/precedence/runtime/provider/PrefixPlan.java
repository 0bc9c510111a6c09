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
    /**
     * When the prefix digits alone give fewer key bits than wanted (from 20 players on, where
     * the next digit, n!, no longer fits beside them in a long): how many low key bits hold the
     * top bits of digit {@code prefix}; 0 when the key is the prefix key alone.
     */
    final int extraBits;
    /** The right shift that leaves the top {@link #extraBits} of digit {@code prefix}. */
    final int extraShift;
    /**
     * For an extra digit of radix 2^63 or more (drawn by masked rejection): its bit length
     * bitLength(R − 1), the words per attempt, and R as big-endian words; 0, 0, null otherwise.
     */
    final int bigBits;
    final int bigWords;
    final long[] bigRadix;
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
        this.radix = new long[dice.digits()];
        for (int j = 0; j < radix.length; j++) {
            BigInteger r = dice.radix(0, j);
            radix[j] = r.bitLength() < 63 ? r.longValue() : 0;
        }
        BigInteger product = BigInteger.ONE;
        for (int j = 0; j < prefix; j++) {
            product = product.multiply(dice.radix(0, j));
        }
        int keyBits = product.subtract(BigInteger.ONE).bitLength();
        if (keyBits < pairBits + SPARE_KEY_BITS && prefix < radix.length) {
            // Keys below 2^62 keep differences exact: the prefix key (below 2^keyBits) shifted
            // left, then the top bits of the next digit.
            BigInteger next = dice.radix(0, prefix);
            int nextBits = next.subtract(BigInteger.ONE).bitLength();
            this.extraBits = 62 - keyBits;
            this.extraShift = Math.max(0, nextBits - extraBits);
            boolean big = radix[prefix] == 0;
            this.bigBits = big ? nextBits : 0;
            this.bigWords = big ? (nextBits + 63) / 64 : 0;
            this.bigRadix = big ? new long[bigWords] : null;
            for (int i = 0; i < bigWords; i++) {
                bigRadix[i] = next.shiftRight(64 * (bigWords - 1 - i)).longValue();
            }
        } else {
            this.extraBits = 0;
            this.extraShift = 0;
            this.bigBits = 0;
            this.bigWords = 0;
            this.bigRadix = null;
        }
        this.keysOnly = group != null && prefix == group.digits() && extraBits == 0;
        this.narrowDraws = generator.narrowDraws();
        this.laneGroups = (players + RollGenerator.LANES - 1) / RollGenerator.LANES;
    }

    /** Returns whether this plan was made for exactly {@code set} (the same instance). */
    boolean isFor(ConstructedDice set) {
        return dice == set;
    }
}
