package org.precedence.runtime.randomness;

import java.math.BigInteger;
import java.util.Objects;
import org.precedence.runtime.dice.MixedRadixDice;

/**
 * The faces of one draw (one index on one stream) of a set: digit j of die d is drawn, the
 * first time it is asked for, by {@link BoundedSampler#draw} from the words
 * {@code generator.word(index, stream, d, j, attempt)}, and remembered. Because every digit is
 * a pure function of its coordinates, the faces do not depend on which digits are asked for
 * first, or whether they are asked for at all.
 *
 * <p>Not thread-safe (it memoises); create one per draw.
 */
public final class SeededFaces implements MixedRadixDice.FaceDigits {
    private final RollGenerator generator;
    private final BlockCursor cursor;
    private final MixedRadixDice dice;
    private final long index;
    private final int stream;
    private final BigInteger[][] memo;
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
        this.memo = new BigInteger[dice.players()][dice.digits()];
    }

    @Override
    public BigInteger digit(int die, int digit) {
        BigInteger d = memo[die][digit];
        if (d == null) {
            BigInteger radix = dice.radix(die, digit);
            if (radix.bitLength() < 63 && radix.signum() > 0) {
                // The common case without a lambda or BigInteger arithmetic; same rule and
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

    /** The word for (die, digit, attempt); remembers the last block, which serves four dice. */
    private long word(int die, int digit, long attempt) {
        long g = RollGenerator.groupWord(stream, die);
        if (!blockValid || c0 != index || c1 != g || c2 != digit || c3 != attempt) {
            if (cursor != null) {
                cursor.block(index, g, digit, attempt, block);
            } else {
                generator.block(index, g, digit, attempt, block);
            }
            c0 = index;
            c1 = g;
            c2 = digit;
            c3 = attempt;
            blockValid = true;
        }
        return block[die & 3];
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
