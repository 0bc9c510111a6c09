package org.precedence.runtime.randomness;

import java.math.BigInteger;
import java.util.List;
import org.precedence.api.FairnessGrade;
import org.precedence.runtime.dice.DiceSet;
import org.precedence.runtime.dice.MixedRadixDice;
import org.precedence.runtime.dice.Word;

/**
 * A two-digit test set: the word W written once under each relabeling in {@code perms}, one
 * block after another. Digit 0 of a face is its block, digit 1 its face within the block (in
 * block b, die d owns the faces of die perm_b⁻¹(d) of W). W must have equal side counts so that
 * the radix of digit 1 does not depend on digit 0. Compares lazily: block first.
 */
public final class TwoLevelDice implements MixedRadixDice {
    private final Word base;
    private final List<int[]> perms;
    private final int[][] inverse;
    private final long[][] baseValues;
    private final int sides;

    public TwoLevelDice(Word base, List<int[]> perms) {
        this.base = base;
        this.perms = List.copyOf(perms);
        DiceSet set = base.toDiceSet();
        int n = base.players();
        this.baseValues = new long[n][];
        for (int d = 0; d < n; d++) {
            baseValues[d] = set.faces(d);
        }
        this.sides = baseValues[0].length;
        this.inverse = new int[perms.size()][n];
        for (int b = 0; b < perms.size(); b++) {
            for (int d = 0; d < n; d++) {
                inverse[b][perms.get(b)[d]] = d;
            }
        }
    }

    /** The whole word, for exact analysis of the same set. */
    public Word word() {
        Word w = null;
        for (int[] p : perms) {
            w = w == null ? base.relabel(p) : w.concat(base.relabel(p));
        }
        return w;
    }

    @Override
    public String id() {
        return "test-two-level-" + base.players() + "x" + sides * perms.size();
    }

    @Override
    public String sha256() {
        return word().sha256();
    }

    @Override
    public int players() {
        return base.players();
    }

    @Override
    public int digits() {
        return 2;
    }

    @Override
    public BigInteger radix(int die, int digit) {
        return BigInteger.valueOf(digit == 0 ? perms.size() : sides);
    }

    private long inner(int die, int block, int face) {
        return baseValues[inverse[block][die]][face];
    }

    @Override
    public int compare(int a, int b, FaceDigits faces) {
        int c = faces.digit(a, 0).compareTo(faces.digit(b, 0));
        if (c != 0) {
            return c;
        }
        int block = faces.digit(a, 0).intValueExact();
        return Long.compare(inner(a, block, faces.digit(a, 1).intValueExact()),
                inner(b, block, faces.digit(b, 1).intValueExact()));
    }

    @Override
    public BigInteger faceValue(int die, BigInteger[] digits) {
        int block = digits[0].intValueExact();
        return BigInteger.valueOf((long) block * base.length() + inner(die, block, digits[1].intValueExact()));
    }

    @Override
    public FairnessGrade grade() {
        return FairnessGrade.ORDER_FAIR;
    }

    @Override
    public int subsetDepth() {
        return base.players();
    }
}
