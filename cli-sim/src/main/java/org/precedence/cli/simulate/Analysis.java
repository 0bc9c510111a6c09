package org.precedence.cli.simulate;

import java.util.ArrayList;
import java.util.List;

/** Turns a merged {@link Tally} into a {@link SupplyResult}: tests, band, streaks, spread. */
final class Analysis {
    /** z for a two-sided 95 % normal interval (standard normal table). */
    static final double Z95 = 1.959963984540054;

    private Analysis() {
    }

    /**
     * Analyses a tally.
     *
     * @param independentRounds whether rounds are independent fair draws (so run lengths have
     *                          the textbook geometric expectation)
     * @param expectedThrows    expected throws per round, or NaN
     */
    static SupplyResult of(String label, Tally t, long sessions, long roundsPerSession,
                           boolean independentRounds, double expectedThrows) {
        int n = t.players;
        boolean complete = t.rounds == sessions * roundsPerSession;
        long[][] seat = t.seatCounts();
        long[] leads = t.leads.clone();
        List<String> names = null;
        long[] counts = t.rankingCounts();
        SupplyResult.Test main;
        SupplyResult.Test g;
        SupplyResult.Band band = null;
        SupplyResult.Test seatTest = test("seats", FrequencyTests.seats(seat));
        SupplyResult.Test leadTest = test("first players", FrequencyTests.pearsonUniform(leads));
        if (counts != null) {
            names = new ArrayList<>(counts.length);
            for (int[] ranking : Rankings.lexicographic(n)) {
                names.add(Rankings.name(ranking));
            }
            main = test("rankings", FrequencyTests.pearsonUniform(counts));
            g = test("rankings", FrequencyTests.gUniform(counts));
            band = band(counts, t.rounds);
        } else {
            main = seatTest;
            g = test("first players", FrequencyTests.gUniform(leads));
        }
        return new SupplyResult(label, n, sessions, roundsPerSession, t.rounds, complete, names, counts,
                seat, leads, main, g, seatTest, leadTest, band,
                streaks(t, sessions, roundsPerSession, independentRounds && complete),
                spread(t, roundsPerSession), t.throwsTaken, t.mostThrows, expectedThrows);
    }

    private static SupplyResult.Test test(String on, FrequencyTests.Outcome o) {
        return new SupplyResult.Test(on, o.statistic(), o.degreesOfFreedom(), o.pValue());
    }

    static SupplyResult.Band band(long[] counts, long rounds) {
        double p = 1.0 / counts.length;
        double mean = rounds * p;
        double sd = Math.sqrt(rounds * p * (1 - p));
        double low = mean - Z95 * sd;
        double high = mean + Z95 * sd;
        int outside = 0;
        for (long c : counts) {
            if (c < low || c > high) {
                outside++;
            }
        }
        return new SupplyResult.Band(mean, Math.max(0, low), high, outside);
    }

    private static SupplyResult.Streaks streaks(Tally t, long sessions, long rounds, boolean withExpectation) {
        long[] atLeast = new long[Tally.RUN_CAP + 1];
        long sum = 0;
        for (int k = Tally.RUN_CAP; k >= 1; k--) {
            sum += t.runs[k];
            atLeast[k] = sum;
        }
        double[] expected = null;
        if (withExpectation) {
            // A maximal run of length ≥ k starts at round 0 with probability q^(k−1), and at
            // round j ≥ 1 (j ≤ R−k) with probability (1−q)·q^(k−1), where q = 1/n is the chance
            // that a round repeats the previous first player.
            double q = 1.0 / t.players;
            expected = new double[Tally.RUN_CAP + 1];
            for (int k = 1; k <= Tally.RUN_CAP; k++) {
                expected[k] = rounds < k ? 0
                        : sessions * Math.pow(q, k - 1) * (1 + (rounds - k) * (1 - q));
            }
        }
        double meanLongest = t.sessionsCompleted == 0 ? 0 : (double) t.sumLongestRun / t.sessionsCompleted;
        return new SupplyResult.Streaks(t.longestRun, meanLongest, atLeast, expected);
    }

    /** Only whole sessions are judged, so each has exactly {@code roundsPerSession} rounds. */
    private static SupplyResult.Spread spread(Tally t, long roundsPerSession) {
        long judged = t.sessionsCompleted;
        double denominator = Math.max(1, judged);
        return new SupplyResult.Spread(judged, t.lopsidedSessions / denominator,
                t.doubleShareSessions / denominator, t.sumBusiest / (denominator * roundsPerSession),
                (double) t.worstBusiest / roundsPerSession, 1.0 / t.players);
    }
}
