package org.precedence.runtime.construction;

import java.math.BigInteger;
import org.precedence.runtime.dice.MixedRadixDice;
import org.precedence.runtime.dice.Word;

/** Test helpers that do write small constructed words out, two independent ways. */
final class Materialise {
    private Materialise() {
    }

    /** The word by definition: relabel, reverse and concatenate with {@link Word}'s own operations. */
    static Word byDefinition(Construction c) {
        Word w = c.start().word();
        int n = c.players();
        for (Level level : c.levels()) {
            Word next = null;
            for (BigInteger b = BigInteger.ZERO; b.compareTo(level.blocks()) < 0; b = b.add(BigInteger.ONE)) {
                Word block = w;
                int[] sigma = new int[n];
                if (level.relabel(b, sigma)) {
                    block = block.relabel(sigma);
                }
                if (level.reversed(b)) {
                    block = block.reversed();
                }
                next = next == null ? block : next.concat(block);
            }
            w = next;
        }
        return w;
    }

    /** The word read back from the served view: every face of every die placed by faceValue. */
    static Word byFaceValues(MixedRadixDice dice) {
        int n = dice.players();
        int sides = dice.sides(0).intValueExact();
        int[] letters = new int[n * sides];
        java.util.Arrays.fill(letters, -1);
        for (int d = 0; d < n; d++) {
            for (int f = 0; f < sides; f++) {
                int v = dice.faceValue(d, digitsOf(dice, d, f)).intValueExact();
                if (letters[v - 1] != -1) {
                    throw new AssertionError("value " + v + " used twice");
                }
                letters[v - 1] = d;
            }
        }
        return Word.of(n, letters);
    }

    /** Digits of face index {@code f} (mixed radix, most significant first). */
    static BigInteger[] digitsOf(MixedRadixDice dice, int die, long f) {
        BigInteger[] digits = new BigInteger[dice.digits()];
        BigInteger rest = BigInteger.valueOf(f);
        for (int j = dice.digits() - 1; j >= 0; j--) {
            BigInteger[] qr = rest.divideAndRemainder(dice.radix(die, j));
            digits[j] = qr[1];
            rest = qr[0];
        }
        return digits;
    }
}
