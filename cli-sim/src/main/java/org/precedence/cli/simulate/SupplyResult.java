package org.precedence.cli.simulate;

import java.util.List;

/**
 * What one order supply produced for one player count, with every statistic the reports show.
 *
 * @param label            the supply ("precedence", "balanced lead", "shuffle", "d6 re-roll")
 * @param players          players per round
 * @param sessions         sessions asked for
 * @param roundsPerSession rounds per session asked for
 * @param rounds           rounds actually simulated (sessions × rounds unless interrupted)
 * @param complete         whether every asked-for round was simulated
 * @param rankingNames     every ranking in lexicographic order, or null beyond 6 players
 * @param rankingCounts    counts parallel to {@code rankingNames}, or null
 * @param seatCounts       {@code seatCounts[player][position]}
 * @param leadCounts       how often each player acted first
 * @param main             Pearson test on rankings (≤ 6 players) or on seats (more)
 * @param gTest            G-test on rankings (≤ 6 players) or on first players (more)
 * @param seatTest         the seat-matrix test of {@link FrequencyTests#seats}
 * @param leadTest         Pearson test on first players
 * @param band             expected count per ranking and its 95 % band, or null beyond 6
 * @param streaks          runs of the same first player
 * @param spread           how single sessions looked on their own
 * @param throwsTaken      throws behind the rounds (more than rounds only with re-rolls)
 * @param mostThrows       most throws one round took
 * @param expectedThrows   expected throws per round from first principles, or NaN when not a dice peer
 */
record SupplyResult(
        String label,
        int players,
        long sessions,
        long roundsPerSession,
        long rounds,
        boolean complete,
        List<String> rankingNames,
        long[] rankingCounts,
        long[][] seatCounts,
        long[] leadCounts,
        Test main,
        Test gTest,
        Test seatTest,
        Test leadTest,
        Band band,
        Streaks streaks,
        Spread spread,
        long throwsTaken,
        long mostThrows,
        double expectedThrows) {

    /** A test outcome and what it was run on ("rankings", "seats", "first players"). */
    record Test(String on, double statistic, int degreesOfFreedom, double pValue) {
    }

    /**
     * The level a ranking's count should sit at and the range holding it 95 % of the time
     * (normal approximation to the binomial: mean ± 1.96 standard deviations).
     *
     * @param outside how many rankings fell outside; about 5 % of them by chance alone
     */
    record Band(double expected, double low, double high, int outside) {
    }

    /**
     * Runs of the same first player.
     *
     * @param longest      longest run in any session
     * @param meanLongest  mean over whole sessions of each session's longest run
     * @param atLeast      {@code atLeast[k]}: runs of k rounds or more (index 0 and 1 unused)
     * @param expected     expected values of {@code atLeast} if rounds are independent and
     *                     fair, or null when the rule links rounds (balanced lead)
     */
    record Streaks(long longest, double meanLongest, long[] atLeast, double[] expected) {
    }

    /**
     * Single sessions judged on their own lead counts.
     *
     * @param sessionsJudged       whole sessions simulated
     * @param lopsidedFraction     fraction whose lead counts fail a 5 % chi-square test
     * @param doubleShareFraction  fraction where one player led at least twice the fair share
     * @param meanBusiestShare     mean over sessions of the busiest leader's share of rounds
     * @param worstBusiestShare    largest such share in any session
     * @param fairShare            1 / players
     */
    record Spread(long sessionsJudged, double lopsidedFraction, double doubleShareFraction,
                  double meanBusiestShare, double worstBusiestShare, double fairShare) {
    }

    /** Returns whether the ranking counts are listed one by one. */
    boolean rankingsCounted() {
        return rankingCounts != null;
    }

    /** Returns re-rolls: throws beyond one per round. */
    long rerolls() {
        return throwsTaken - rounds;
    }
}
