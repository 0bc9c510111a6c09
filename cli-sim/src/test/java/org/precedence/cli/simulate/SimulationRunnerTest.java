package org.precedence.cli.simulate;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Map;
import java.util.concurrent.atomic.LongAdder;
import org.junit.jupiter.api.Test;
import org.precedence.api.OrderRule;
import org.precedence.api.RandomnessMode;
import org.precedence.api.SessionSeed;
import org.precedence.cli.testing.ExplicitTestProvider;
import org.precedence.cli.testing.VerifiedSets;

class SimulationRunnerTest {
    static final ExplicitTestProvider PROVIDER = new ExplicitTestProvider(Map.of(
            2, VerifiedSets.orderFair(2), 3, VerifiedSets.orderFair(3)));
    static final SessionSeed SEED = SessionSeed.fromText("runner-test");

    private static Tally run(OrderSupply supply, int players, long sessions, long rounds, int threads) {
        return new SimulationRunner(threads, new Cancellation(), new LongAdder()).run(supply, players, sessions, rounds);
    }

    private static OrderSupply fresh() {
        return new ProviderSupply(PROVIDER, SEED, RandomnessMode.FAST, OrderRule.FRESH_EACH_ROUND);
    }

    @Test
    void run_countsAddUpToSessionsTimesRounds() {
        Tally t = run(fresh(), 3, 37, 111, 2);
        assertEquals(37 * 111, t.rounds);
        long[] counts = t.rankingCounts();
        assertEquals(6, counts.length);
        assertEquals(37 * 111, java.util.Arrays.stream(counts).sum());
        assertEquals(37 * 111, java.util.Arrays.stream(t.leads).sum());
        long[][] seat = t.seatCounts();
        for (int i = 0; i < 3; i++) {
            long row = 0;
            long col = 0;
            for (int j = 0; j < 3; j++) {
                row += seat[i][j];
                col += seat[j][i];
            }
            assertEquals(37 * 111, row, "every player has a seat every round");
            assertEquals(37 * 111, col, "every seat is taken every round");
        }
        assertEquals(37, t.sessionsCompleted);
        long runRounds = 0;
        for (int k = 1; k < Tally.RUN_CAP; k++) {
            runRounds += k * t.runs[k];
        }
        assertTrue(runRounds <= 37 * 111);
        assertEquals(37 * 111, t.throwsTaken, "fair dice never re-roll");
    }

    @Test
    void run_resultDoesNotDependOnThreadCount() {
        Tally one = run(fresh(), 3, 300, 50, 1);
        for (int threads : new int[] {2, 3, 8}) {
            Tally many = run(fresh(), 3, 300, 50, threads);
            assertArrayEquals(one.packed, many.packed, threads + " threads");
            assertArrayEquals(one.leads, many.leads);
            assertArrayEquals(one.runs, many.runs);
            assertEquals(one.lopsidedSessions, many.lopsidedSessions);
            assertEquals(one.sumBusiest, many.sumBusiest);
            assertEquals(one.worstBusiest, many.worstBusiest);
            assertEquals(one.sumLongestRun, many.sumLongestRun);
        }
        Tally shuffleOne = run(new ShuffleSupply(SEED), 4, 300, 50, 1);
        Tally shuffleMany = run(new ShuffleSupply(SEED), 4, 300, 50, 3);
        assertArrayEquals(shuffleOne.packed, shuffleMany.packed);
    }

    @Test
    void run_cancelledBeforeStartSimulatesNothing() {
        Cancellation c = new Cancellation();
        c.request();
        Tally t = new SimulationRunner(2, c, new LongAdder()).run(fresh(), 3, 10, 10);
        assertEquals(0, t.rounds);
        assertEquals(0, t.sessionsCompleted);
    }

    @Test
    void run_cancelledMidwayKeepsWholeRoundsOnly() {
        Cancellation c = new Cancellation();
        LongAdder done = new LongAdder();
        // Cancel from inside the supply after 10,000 rounds: the loop notices at its next check point.
        OrderSupply inner = new ShuffleSupply(SEED);
        OrderSupply stopping = new OrderSupply() {
            @Override
            public String label() {
                return "stopping";
            }

            @Override
            public SessionOrders open(long session, int players) {
                SessionOrders o = inner.open(session, players);
                return (round, out) -> {
                    if (round == 10_000) {
                        c.request();
                    }
                    return o.orderInto(round, out);
                };
            }
        };
        Tally t = new SimulationRunner(1, c, done).run(stopping, 3, 4, 100_000);
        assertTrue(t.rounds > 10_000 && t.rounds < 100_000, "stopped part-way: " + t.rounds);
        assertEquals(t.rounds, java.util.Arrays.stream(t.rankingCounts()).sum());
        assertEquals(t.rounds, done.sum());
        assertEquals(0, t.sessionsCompleted, "an interrupted session is not judged");
    }

    @Test
    void run_balancedLeadGivesEveryPlayerEqualLeads() {
        OrderSupply balanced = new ProviderSupply(PROVIDER, SEED, RandomnessMode.FAST, OrderRule.BALANCED_LEAD);
        Tally t = run(balanced, 3, 50, 30, 2);
        assertArrayEquals(new long[] {500, 500, 500}, t.leads);
        assertEquals(0, t.lopsidedSessions);
        assertEquals(10, t.worstBusiest, "30 rounds: each player leads 10");
    }

    @Test
    void run_plainShufflePeersAreUniform() {
        // Both peers shuffle fairly; at this fixed seed the Pearson test on 24 rankings must not
        // reject (deterministic: fixed seed, so this cannot flake).
        for (OrderSupply peer : new OrderSupply[] {new ShuffleSupply(SEED), new JdkShuffleSupply(SEED),
            new RerollDiceSupply(SEED, 6)}) {
            Tally t = run(peer, 4, 20, 2400, 2);
            assertEquals(48_000, java.util.Arrays.stream(t.rankingCounts()).sum());
            double p = FrequencyTests.pearsonUniform(t.rankingCounts()).pValue();
            assertTrue(p > 1e-3, peer.label() + ": p = " + p);
        }
    }

    @Test
    void run_moreThanSixPlayersKeepsSeatsOnly() {
        Tally t = run(new ShuffleSupply(SEED), 8, 5, 1000, 2);
        assertEquals(null, t.rankingCounts());
        long total = 0;
        for (long v : t.seatCounts()[3]) {
            total += v;
        }
        assertEquals(5000, total);
    }
}
