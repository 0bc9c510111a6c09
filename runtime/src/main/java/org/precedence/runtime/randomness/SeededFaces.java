package org.precedence.runtime.randomness;

import java.math.BigInteger;
import java.util.Objects;
import org.precedence.runtime.dice.MixedRadixDice;

/**
 * The faces of one draw (one index on one stream) of a set: digit j of die d is drawn, the
 * first time it is asked for, exactly as {@link RollGenerator#digit} draws it (16-bit chunks
 * or 64-bit words, by the algorithm and the radix), and remembered; under an algorithm with
 * {@link RollGenerator#leadingGroups() leading groups}, a digit of the die's {@link
 * LeadingGroup} is drawn with the rest of the group by {@link RollGenerator#groupValue}.
 * Because every digit is a pure function of its coordinates, the faces do not depend on which
 * digits are asked for first, or whether they are asked for at all.
 *
 * <p>Not thread-safe (it memoises); create one per draw.
 */
public final class SeededFaces implements MixedRadixDice.FaceDigits {
    private final RollGenerator generator;
    private final BlockCursor cursor;
    private final MixedRadixDice dice;
    private final long index;
    private final int stream;
    private final boolean narrow;
    private final BigInteger[][] memo;
    /** Per die, its leading group (null: the algorithm draws every digit on its own). */
    private final LeadingGroup[] groups;
    private final long[] block = new long[RollGenerator.LANES];
    private long c0;
    private long c1;
    private long c2;
    private long c3;
    private boolean blockValid;
    private int digitsDrawn;

    /**
     * Prepares the draw at {@code index} on {@code stream}; nothing is drawn yet.
     *
     * @throws IllegalArgumentException if {@code index} or {@code stream} is negative
     */
    public SeededFaces(RollGenerator generator, MixedRadixDice dice, long index, int stream) {
        this(generator, null, dice, index, stream);
    }

    /**
     * As above, taking blocks through {@code cursor} (a per-thread cursor of the same
     * generator, which makes consecutive draws cheaper); the faces are the same.
     */
    public SeededFaces(RollGenerator generator, BlockCursor cursor, MixedRadixDice dice, long index, int stream) {
        this.generator = Objects.requireNonNull(generator, "generator");
        this.cursor = cursor;
        this.dice = Objects.requireNonNull(dice, "dice");
        if (index < 0) {
            throw new IllegalArgumentException("draw index must be >= 0, got " + index);
        }
        if (stream < 0) {
            throw new IllegalArgumentException("stream must be >= 0, got " + stream);
        }
        this.index = index;
        this.stream = stream;
        this.narrow = generator.narrowDraws();
        this.memo = new BigInteger[dice.players()][dice.digits()];
        if (generator.leadingGroups() && dice.digits() > 1) {
            this.groups = new LeadingGroup[dice.players()];
            for (int d = 0; d < groups.length; d++) {
                groups[d] = LeadingGroup.of(dice, d);
            }
        } else {
            this.groups = null;
        }
    }

    @Override
    public BigInteger digit(int die, int digit) {
        BigInteger d = memo[die][digit];
        if (d == null && groups != null && digit < groups[die].digits()) {
            drawGroup(die);
            return memo[die][digit];
        }
        if (d == null) {
            BigInteger radix = dice.radix(die, digit);
            if (narrow && radix.signum() > 0 && radix.bitLength() <= 16) {
                // Radices below 2^16 under a narrow algorithm: 16-bit chunks, the rule of
                // RollGenerator.digit (radix 1 reads nothing).
                int r = radix.intValue();
                int v = 0;
                if (r > 1) {
                    for (long attempt = 0; ; attempt++) {
                        long[] b = block(index >>> 2, RollGenerator.narrowGroupWord(stream, die), digit, attempt);
                        v = BoundedSampler.lemire16(RollGenerator.chunkOf(b, index, die), r);
                        if (v != BoundedSampler.REJECTED) {
                            break;
                        }
                    }
                }
                d = BigInteger.valueOf(v);
            } else if (radix.bitLength() < 63 && radix.signum() > 0) {
                // The common wide case without a lambda or BigInteger arithmetic; same rule and
                // words as BoundedSampler.draw (radix 1 reads no word there, and gives 0 here
                // before any word is read).
                long r = radix.longValue();
                long v = 0;
                if (r > 1) {
                    for (long attempt = 0; ; attempt++) {
                        v = BoundedSampler.lemire64(word(die, digit, attempt), r);
                        if (v != BoundedSampler.REJECTED) {
                            break;
                        }
                    }
                }
                d = BigInteger.valueOf(v);
            } else {
                d = BoundedSampler.draw(radix, attempt -> word(die, digit, attempt));
            }
            memo[die][digit] = d;
            digitsDrawn++;
        }
        return d;
    }

    /** Draws die {@code die}'s leading group and remembers each of its digits. */
    private void drawGroup(int die) {
        LeadingGroup group = groups[die];
        long product = group.product();
        long value = 0;
        if (product > 1) {
            // The rule of RollGenerator.groupValue, through this draw's block memo.
            for (long attempt = 0; ; attempt++) {
                long[] b = block(index, RollGenerator.leadingGroupWord(stream, die), 0, attempt);
                value = BoundedSampler.lemire32(RollGenerator.groupChunkOf(b, die), product);
                if (value != BoundedSampler.REJECTED) {
                    break;
                }
            }
        }
        long[] split = new long[group.digits()];
        dice.leadingDigits(die, value, split.length, split);
        for (int j = 0; j < split.length; j++) {
            memo[die][j] = BigInteger.valueOf(split[j]);
        }
        digitsDrawn += split.length;
    }

    /** The wide word for (die, digit, attempt): word {@code die & 3} of its block. */
    private long word(int die, int digit, long attempt) {
        return block(index, RollGenerator.groupWord(stream, die), digit, attempt)[die & 3];
    }

    /** The block at a counter; remembers the last one, which serves four dice (eight for groups). */
    private long[] block(long a, long b, long c, long e) {
        if (!blockValid || c0 != a || c1 != b || c2 != c || c3 != e) {
            if (cursor != null) {
                cursor.block(a, b, c, e, block);
            } else {
                generator.block(a, b, c, e, block);
            }
            c0 = a;
            c1 = b;
            c2 = c;
            c3 = e;
            blockValid = true;
        }
        return block;
    }

    /** Returns all digits of die {@code die}'s face, most significant first (drawing the rest). */
    public BigInteger[] digits(int die) {
        BigInteger[] all = new BigInteger[dice.digits()];
        for (int j = 0; j < all.length; j++) {
            all[j] = digit(die, j);
        }
        return all;
    }

    /** Returns the face index: the mixed-radix number the digits spell, 0 ≤ index &lt; sides. */
    public BigInteger faceIndex(int die) {
        BigInteger index = BigInteger.ZERO;
        for (int j = 0; j < dice.digits(); j++) {
            index = index.multiply(dice.radix(die, j)).add(digit(die, j));
        }
        return index;
    }

    /** Returns the face value (1..total faces of the set). */
    public BigInteger faceValue(int die) {
        return dice.faceValue(die, digits(die));
    }

    /** Returns how many digits have been drawn so far (for checks of laziness). */
    public int digitsDrawn() {
        return digitsDrawn;
    }
}
