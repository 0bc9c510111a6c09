package org.precedence.cli.simulate;

/**
 * How many throws ordinary dice need until n players all show different values, from first
 * principles: one throw succeeds with probability {@code s(s−1)…(s−n+1) / s^n}, and throws are
 * independent, so the count is geometric with mean {@code s^n / (s(s−1)…(s−n+1))}.
 * Example (first principles): four six-sided dice need 6^4/(6·5·4·3) = 3.6 throws on average.
 */
final class ExpectedThrows {
    private ExpectedThrows() {
    }

    /** Returns the mean number of throws, or infinity when {@code players > sides}. */
    static double mean(int players, int sides) {
        if (players < 1 || sides < 1) {
            throw new IllegalArgumentException("players and sides must be >= 1");
        }
        if (players > sides) {
            return Double.POSITIVE_INFINITY;
        }
        double mean = 1;
        for (int k = 0; k < players; k++) {
            mean *= (double) sides / (sides - k);
        }
        return mean;
    }
}
