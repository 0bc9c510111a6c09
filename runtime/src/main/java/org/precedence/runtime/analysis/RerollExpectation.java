package org.precedence.runtime.analysis;

import java.math.BigDecimal;
import java.math.BigInteger;
import java.math.MathContext;

/**
 * The expected number of rolls when n ordinary s-sided dice (faces 1..s) are rolled together
 * and all of them are re-rolled whenever any two show the same value, until all differ.
 *
 * <p>First principles: one roll succeeds with probability {@code s·(s−1)···(s−n+1) / s^n}
 * (ordered choices of distinct faces over all outcomes); the number of rolls is geometric, so
 * its mean is the reciprocal {@code s^n / (s·(s−1)···(s−n+1))}. Held as a reduced fraction.
 *
 * @param numerator   numerator of the reduced fraction
 * @param denominator denominator of the reduced fraction (positive)
 */
public record RerollExpectation(BigInteger numerator, BigInteger denominator) {

    public RerollExpectation {
        if (denominator.signum() <= 0) {
            throw new IllegalArgumentException("denominator must be positive, got " + denominator);
        }
        BigInteger g = numerator.gcd(denominator);
        if (!g.equals(BigInteger.ONE) && g.signum() != 0) {
            numerator = numerator.divide(g);
            denominator = denominator.divide(g);
        }
    }

    /**
     * Returns the expected rolls for {@code players} dice of {@code sides} sides each.
     *
     * @throws IllegalArgumentException if {@code players < 2} or {@code sides < players} (then
     *                                  the dice can never all differ)
     */
    public static RerollExpectation of(int players, int sides) {
        if (players < 2) {
            throw new IllegalArgumentException("re-rolling needs at least 2 dice, got " + players);
        }
        if (sides < players) {
            throw new IllegalArgumentException(players + " dice of " + sides
                    + " sides can never all differ; need at least " + players + " sides");
        }
        BigInteger falling = BigInteger.ONE;
        for (int i = 0; i < players; i++) {
            falling = falling.multiply(BigInteger.valueOf(sides - i));
        }
        return new RerollExpectation(BigInteger.valueOf(sides).pow(players), falling);
    }

    /** Returns the probability that one roll shows all different values, as a decimal. */
    public BigDecimal successProbability() {
        return new BigDecimal(denominator).divide(new BigDecimal(numerator), MathContext.DECIMAL64);
    }

    /** Returns the expectation as a decimal with 16 significant digits. */
    public BigDecimal toBigDecimal() {
        return new BigDecimal(numerator).divide(new BigDecimal(denominator), MathContext.DECIMAL64);
    }

    /** Returns the expectation as a double. */
    public double doubleValue() {
        return toBigDecimal().doubleValue();
    }

    /** Returns "p/q" (or "p" when q is 1). */
    @Override
    public String toString() {
        return denominator.equals(BigInteger.ONE) ? numerator.toString() : numerator + "/" + denominator;
    }
}
