package org.precedence.runtime.analysis;

import java.math.BigInteger;

/**
 * Divisibility bounds every order-fair set obeys: the n! rankings split the product of the
 * side counts into equal parts, so n! must divide that product. Necessary, not sufficient
 * (four 6-sided dice pass the test, yet no such order-fair set exists).
 */
public final class LowerBounds {
    private LowerBounds() {
    }

    /**
     * Returns the least side count s for which s^n is divisible by n!, i.e. the product of the
     * primes up to n (each such prime must divide s, and their product suffices because every
     * prime's exponent in n!, below n/(p−1), is at most n).
     */
    public static BigInteger leastEqualSides(int n) {
        checkPlayers(n);
        BigInteger s = BigInteger.ONE;
        for (int p = 2; p <= n; p++) {
            if (isPrime(p)) {
                s = s.multiply(BigInteger.valueOf(p));
            }
        }
        return s;
    }

    /** Returns whether equal side count {@code s} passes the bound for {@code n} dice. */
    public static boolean equalSidesAllowed(int n, long s) {
        checkPlayers(n);
        if (s < 1) {
            throw new IllegalArgumentException("a die needs at least 1 side, got " + s);
        }
        return BigInteger.valueOf(s).pow(n).mod(FairnessAnalysis.factorial(n)).signum() == 0;
    }

    /** Returns whether mixed side counts pass the bound (their product divisible by n!). */
    public static boolean sidesAllowed(int... sides) {
        checkPlayers(sides.length);
        BigInteger p = BigInteger.ONE;
        for (int s : sides) {
            if (s < 1) {
                throw new IllegalArgumentException("a die needs at least 1 side, got " + s);
            }
            p = p.multiply(BigInteger.valueOf(s));
        }
        return p.mod(FairnessAnalysis.factorial(sides.length)).signum() == 0;
    }

    private static boolean isPrime(int p) {
        for (int d = 2; d * d <= p; d++) {
            if (p % d == 0) {
                return false;
            }
        }
        return p >= 2;
    }

    private static void checkPlayers(int n) {
        if (n < 2) {
            throw new IllegalArgumentException("a set needs at least 2 dice, got " + n);
        }
    }
}
