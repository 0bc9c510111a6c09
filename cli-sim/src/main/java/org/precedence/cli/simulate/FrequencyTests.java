package org.precedence.cli.simulate;

import org.apache.commons.math3.distribution.ChiSquaredDistribution;
import org.apache.commons.math3.stat.inference.ChiSquareTest;
import org.apache.commons.math3.stat.inference.GTest;

/**
 * Goodness-of-fit tests of simulated counts against exact fairness, computed with Apache
 * Commons Math 3.
 *
 * <ul>
 *   <li>{@link #pearsonUniform} and {@link #gUniform}: counts of k categories that fair dice
 *       make equally likely (rankings, or first players). Under fairness the counts are
 *       multinomial and both statistics are asymptotically chi-square with k − 1 degrees of
 *       freedom.</li>
 *   <li>{@link #seats}: the player × position matrix. Its rows and columns each sum to the
 *       round count, so it is not a multinomial table: for a uniformly random permutation
 *       matrix the cell covariance is {@code 1/(n−1)} times the projection onto the
 *       {@code (n−1)²}-dimensional space of zero row and column sums, hence the Pearson sum
 *       {@code Σ (O−E)²/E} is asymptotically {@code n/(n−1)·χ²((n−1)²)}. The statistic reported
 *       is that sum times {@code (n−1)/n}. (Derived here; for n = 2 it equals the two-ranking
 *       Pearson statistic exactly, which the tests check.) A plain independence test on the
 *       matrix would overstate the evidence by the factor n/(n−1).</li>
 * </ul>
 * p-values are upper tail probabilities; they are 0 when the tail underflows a double.
 */
final class FrequencyTests {
    private FrequencyTests() {
    }

    /** A test's outcome. */
    record Outcome(double statistic, int degreesOfFreedom, double pValue) {
    }

    /** Pearson's chi-square against equal expected counts. Needs at least 2 categories and 1 count. */
    static Outcome pearsonUniform(long[] observed) {
        double[] expected = uniformExpected(observed);
        ChiSquareTest test = new ChiSquareTest();
        return new Outcome(test.chiSquare(expected, observed), observed.length - 1,
                test.chiSquareTest(expected, observed));
    }

    /** The G-test (likelihood ratio) against equal expected counts. */
    static Outcome gUniform(long[] observed) {
        double[] expected = uniformExpected(observed);
        GTest test = new GTest();
        return new Outcome(test.g(expected, observed), observed.length - 1, test.gTest(expected, observed));
    }

    /** The seat-matrix statistic described in the class comment; {@code seat[player][position]}. */
    static Outcome seats(long[][] seat) {
        int n = seat.length;
        long total = 0;
        for (long[] row : seat) {
            for (long v : row) {
                total += v;
            }
        }
        if (total == 0) {
            throw new IllegalArgumentException("no rounds to test");
        }
        double expected = (double) total / (n * (long) n);
        double sum = 0;
        for (long[] row : seat) {
            for (long v : row) {
                double d = v - expected;
                sum += d * d / expected;
            }
        }
        double statistic = sum * (n - 1) / n;
        int df = (n - 1) * (n - 1);
        return new Outcome(statistic, df, upperTail(statistic, df));
    }

    /** Returns the chi-square statistic above which a fit test of {@code df} degrees rejects at {@code alpha}. */
    static double critical(int df, double alpha) {
        return new ChiSquaredDistribution(null, df).inverseCumulativeProbability(1 - alpha);
    }

    /** Returns P(χ²(df) ≥ statistic). */
    static double upperTail(double statistic, int df) {
        if (statistic <= 0) {
            return 1.0;
        }
        return 1.0 - new ChiSquaredDistribution(null, df).cumulativeProbability(statistic);
    }

    private static double[] uniformExpected(long[] observed) {
        if (observed.length < 2) {
            throw new IllegalArgumentException("a fit test needs at least 2 categories");
        }
        long total = 0;
        for (long v : observed) {
            total += v;
        }
        if (total == 0) {
            throw new IllegalArgumentException("no rounds to test");
        }
        double[] expected = new double[observed.length];
        java.util.Arrays.fill(expected, (double) total / observed.length);
        return expected;
    }
}
