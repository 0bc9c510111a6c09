package org.precedence.cli.simulate;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

class FrequencyTestsTest {

    @Test
    void critical_matchesHandbookTable() {
        // NIST/SEMATECH e-Handbook of Statistical Methods, 1.3.6.7.4 (upper critical values of
        // the chi-square distribution), alpha = 0.05: df 1 → 3.841, df 3 → 7.815, df 23 → 35.172.
        assertEquals(3.841, FrequencyTests.critical(1, 0.05), 5e-4);
        assertEquals(7.815, FrequencyTests.critical(3, 0.05), 5e-4);
        assertEquals(35.172, FrequencyTests.critical(23, 0.05), 5e-4);
    }

    @Test
    void pearsonUniform_handWorkedExample() {
        // Counts 10, 20, 30 against 20 each: (100 + 0 + 100) / 20 = 10 on 2 df; P(χ²₂ ≥ 10) = e^(−5)
        // (the chi-square upper tail with 2 df is exp(−x/2): textbook closed form).
        FrequencyTests.Outcome o = FrequencyTests.pearsonUniform(new long[] {10, 20, 30});
        assertEquals(10.0, o.statistic(), 1e-12);
        assertEquals(2, o.degreesOfFreedom());
        assertEquals(Math.exp(-5), o.pValue(), 1e-12);
    }

    @Test
    void gUniform_handWorkedExample() {
        // G = 2 Σ O ln(O/E) = 2 (10 ln 0.5 + 30 ln 1.5) (definition of the G-test).
        FrequencyTests.Outcome o = FrequencyTests.gUniform(new long[] {10, 20, 30});
        assertEquals(2 * (10 * Math.log(0.5) + 30 * Math.log(1.5)), o.statistic(), 1e-9);
        assertEquals(Math.exp(-o.statistic() / 2), o.pValue(), 1e-12);
    }

    @Test
    void seats_twoPlayersEqualsRankingTest() {
        // With 2 players the seat matrix is [[a, N−a], [N−a, a]] where a counts ranking AB: the
        // corrected seat statistic must equal the two-ranking Pearson statistic exactly.
        long a = 5_230;
        long n = 10_000;
        FrequencyTests.Outcome seats = FrequencyTests.seats(new long[][] {{a, n - a}, {n - a, a}});
        FrequencyTests.Outcome rankings = FrequencyTests.pearsonUniform(new long[] {a, n - a});
        assertEquals(rankings.statistic(), seats.statistic(), 1e-9);
        assertEquals(1, seats.degreesOfFreedom());
        assertEquals(rankings.pValue(), seats.pValue(), 1e-12);
    }

    @Test
    void seats_meanUnderFairnessIsDegreesOfFreedom() {
        // Calibration of the n/(n−1) correction: for uniformly random permutations (JDK
        // SplittableRandom Fisher–Yates, fixed seed 20261202) the corrected statistic of 4 × 4
        // seat matrices must average (n−1)² = 9. Without the correction it would average 12.
        // 2,000 matrices: the mean has standard error sqrt(2·9·(4/3)²/2000)… ≈ 0.13; allow 0.6.
        SplittableRandom rng = new SplittableRandom(20261202);
        int n = 4;
        double sum = 0;
        int matrices = 2000;
        for (int m = 0; m < matrices; m++) {
            long[][] seat = new long[n][n];
            int[] order = new int[n];
            for (int round = 0; round < 200; round++) {
                for (int i = 0; i < n; i++) {
                    order[i] = i;
                }
                for (int i = n - 1; i > 0; i--) {
                    int j = rng.nextInt(i + 1);
                    int t = order[i];
                    order[i] = order[j];
                    order[j] = t;
                }
                for (int pos = 0; pos < n; pos++) {
                    seat[order[pos]][pos]++;
                }
            }
            sum += FrequencyTests.seats(seat).statistic();
        }
        double mean = sum / matrices;
        assertTrue(Math.abs(mean - 9) < 0.6, "mean corrected seat statistic " + mean);
    }
}
