package org.precedence.runtime.dice;

import java.math.BigInteger;
import java.util.Objects;
import org.precedence.api.FairnessGrade;

/**
 * An explicit {@link DiceSet} seen as {@link MixedRadixDice}: one digit per face, the face index
 * itself. Face values are the set's renumbered values 1..total, so every served set reports
 * values on the same footing.
 */
public final class ExplicitDice implements MixedRadixDice {
    private final String id;
    private final DiceSet set;
    private final long[][] values;
    private final BigInteger[] radix;
    private final FairnessGrade grade;
    private final int subsetDepth;
    private final String sha256;

    /**
     * Wraps a set whose grade and depth have been proven by the caller (catalog or analysis).
     */
    public ExplicitDice(String id, DiceSet set, FairnessGrade grade, int subsetDepth) {
        this.id = Objects.requireNonNull(id, "id");
        this.set = Objects.requireNonNull(set, "set").renumbered();
        this.grade = Objects.requireNonNull(grade, "grade");
        this.subsetDepth = subsetDepth;
        int n = this.set.players();
        this.values = new long[n][];
        this.radix = new BigInteger[n];
        for (int d = 0; d < n; d++) {
            values[d] = this.set.faces(d);
            radix[d] = BigInteger.valueOf(values[d].length);
        }
        this.sha256 = this.set.sha256();
    }

    /** Returns the renumbered set. */
    public DiceSet set() {
        return set;
    }

    /** Returns face value {@code face} of die {@code die} without boxing (the fast path). */
    public long value(int die, int face) {
        return values[die][face];
    }

    /** Returns the side count of die {@code die} as an int. */
    public int sideCount(int die) {
        return values[die].length;
    }

    @Override
    public String id() {
        return id;
    }

    @Override
    public String sha256() {
        return sha256;
    }

    @Override
    public int players() {
        return values.length;
    }

    @Override
    public int digits() {
        return 1;
    }

    @Override
    public BigInteger radix(int die, int digit) {
        if (digit != 0) {
            throw new IndexOutOfBoundsException("explicit dice have one digit, asked for " + digit);
        }
        return radix[die];
    }

    @Override
    public int compare(int a, int b, FaceDigits faces) {
        return Long.compare(values[a][faces.digit(a, 0).intValueExact()],
                values[b][faces.digit(b, 0).intValueExact()]);
    }

    @Override
    public BigInteger faceValue(int die, BigInteger[] digits) {
        return BigInteger.valueOf(values[die][digits[0].intValueExact()]);
    }

    @Override
    public FairnessGrade grade() {
        return grade;
    }

    @Override
    public int subsetDepth() {
        return subsetDepth;
    }
}
