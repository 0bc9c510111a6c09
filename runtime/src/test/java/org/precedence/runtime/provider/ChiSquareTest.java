package org.precedence.runtime.provider;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.HashMap;
import java.util.Map;
import org.apache.commons.math3.distribution.ChiSquaredDistribution;
import org.junit.jupiter.api.Test;
import org.precedence.api.OrderRule;
import org.precedence.api.RandomnessMode;
import org.precedence.api.RankingConvention;
import org.precedence.api.SessionSeed;
import org.precedence.api.SessionSpec;

/**
 * Goodness of fit of the rolled orders to the uniform distribution over all n! orders, at fixed
 * seeds (so each run is deterministic). Critical values are the upper 0.1% points of the
 * chi-square distribution from the NIST/SEMATECH e-Handbook of Statistical Methods, section
 * 1.3.6.7.4 ("Critical Values of the Chi-Square Distribution"): 20.515 for 5 degrees of
 * freedom, 49.728 for 23. A correct generator would fail a given seed with probability 0.001.
 * The table values are cross-checked against Commons Math's chi-square quantile.
 */
class ChiSquareTest {
    private static final double CRITICAL_DF5 = 20.515;
    private static final double CRITICAL_DF23 = 49.728;

    private static double statistic(RandomnessMode mode, String seed, int n, int rounds) {
        DiceSession s = DiceSession.open(new SessionSpec(SessionSeed.fromText(seed), mode,
                OrderRule.FRESH_EACH_ROUND, RankingConvention.LOWEST_FIRST), TestSets.INSTANCE);
        FastOrders fast = s.fastOrders();
        Map<String, Integer> counts = new HashMap<>();
        int[] out = new int[n];
        for (long k = 0; k < rounds; k++) {
            fast.orderInto(k, n, out);
            counts.merge(java.util.Arrays.toString(out), 1, Integer::sum);
        }
        int cells = DiceSessionTest.factorial(n);
        assertEquals(cells, counts.size());
        double expected = (double) rounds / cells;
        double chi = 0;
        for (int c : counts.values()) {
            chi += (c - expected) * (c - expected) / expected;
        }
        System.out.printf("chi-square %s seed '%s' n=%d rounds=%d: %.3f%n", mode, seed, n, rounds, chi);
        return chi;
    }

    @Test
    void criticalValues_matchTheQuantileFunction() {
        assertEquals(CRITICAL_DF5, new ChiSquaredDistribution(5).inverseCumulativeProbability(0.999), 5e-4);
        assertEquals(CRITICAL_DF23, new ChiSquaredDistribution(23).inverseCumulativeProbability(0.999), 5e-4);
    }

    @Test
    void fastMode_ordersFitUniform() {
        assertTrue(statistic(RandomnessMode.FAST, "chi-square three", 3, 60_000) < CRITICAL_DF5);
        assertTrue(statistic(RandomnessMode.FAST, "chi-square four", 4, 96_000) < CRITICAL_DF23);
    }

    @Test
    void secureMode_ordersFitUniform() {
        assertTrue(statistic(RandomnessMode.SECURE, "chi-square three", 3, 30_000) < CRITICAL_DF5);
        assertTrue(statistic(RandomnessMode.SECURE, "chi-square four", 4, 48_000) < CRITICAL_DF23);
    }
}
