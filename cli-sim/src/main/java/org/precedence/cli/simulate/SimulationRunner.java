package org.precedence.cli.simulate;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.concurrent.atomic.AtomicReference;
import java.util.concurrent.atomic.LongAdder;

/**
 * Runs sessions × rounds through an {@link OrderSupply} on several threads.
 *
 * <p>Determinism: the sessions are cut into at most {@value #MAX_CHUNKS} chunks of consecutive
 * sessions, fixed by the session count alone; threads take chunks in any order, but every
 * session is computed the same way whoever runs it (its rounds come from its own seed), and
 * a tally holds only integers that are added up, so the merged result never depends on the
 * thread count or on scheduling. Each worker keeps one tally, so memory is threads × tally.
 */
final class SimulationRunner {
    /** Rounds between two looks at the cancellation flag (and two progress updates). */
    static final int CHECK_EVERY = 4096;
    static final int MAX_CHUNKS = 256;
    /** Significance level at which a single session's lead counts are called lopsided. */
    static final double LOPSIDED_ALPHA = 0.05;

    private final int threads;
    private final Cancellation cancellation;
    private final LongAdder progress;

    SimulationRunner(int threads, Cancellation cancellation, LongAdder progress) {
        if (threads < 1) {
            throw new IllegalArgumentException("threads must be >= 1, got " + threads);
        }
        this.threads = threads;
        this.cancellation = Objects.requireNonNull(cancellation, "cancellation");
        this.progress = Objects.requireNonNull(progress, "progress");
    }

    /** Simulates {@code sessions} sessions of {@code rounds} rounds each; stops early when cancelled. */
    Tally run(OrderSupply supply, int players, long sessions, long rounds) {
        int chunks = (int) Math.min(sessions, MAX_CHUNKS);
        int workers = Math.min(threads, chunks);
        Tally[] tallies = new Tally[workers];
        double critical = FrequencyTests.critical(players - 1, LOPSIDED_ALPHA);
        AtomicInteger nextChunk = new AtomicInteger();
        AtomicReference<RuntimeException> failure = new AtomicReference<>();
        for (int w = 0; w < workers; w++) {
            tallies[w] = new Tally(players);
        }
        List<Runnable> jobs = new ArrayList<>(workers);
        for (int w = 0; w < workers; w++) {
            Tally t = tallies[w];
            jobs.add(() -> {
                int c;
                while (!cancellation.requested() && (c = nextChunk.getAndIncrement()) < chunks) {
                    long from = sessions * c / chunks;
                    long to = sessions * (c + 1) / chunks;
                    try {
                        for (long s = from; s < to && !cancellation.requested(); s++) {
                            runSession(supply.open(s, players), rounds, t, critical);
                        }
                    } catch (RuntimeException e) {
                        failure.compareAndSet(null, e);
                        cancellation.request();
                    }
                }
            });
        }
        if (workers == 1) {
            jobs.get(0).run();
        } else {
            List<Thread> started = new ArrayList<>(workers);
            for (int w = 0; w < workers; w++) {
                Thread thread = new Thread(jobs.get(w), "precedence-simulate-" + w);
                thread.start();
                started.add(thread);
            }
            for (Thread thread : started) {
                joinUninterruptibly(thread);
            }
        }
        if (failure.get() != null) {
            throw failure.get();
        }
        Tally total = new Tally(players);
        for (Tally t : tallies) {
            total.add(t);
        }
        return total;
    }

    /** The hot loop: one session's rounds into the chunk's tally. */
    private void runSession(SessionOrders orders, long rounds, Tally t, double critical) {
        int n = t.players;
        int[] out = new int[n];
        long[] sessionLeads = new long[n];
        long[] packed = t.packed;
        long[][] seat = t.seat;
        long throwsTaken = 0;
        long mostThrows = t.mostThrows;
        int previous = -1;
        long run = 0;
        long longestInSession = 0;
        long r = 0;
        boolean complete = true;
        while (r < rounds) {
            long start = r;
            long stop = Math.min(rounds, r + CHECK_EVERY);
            for (; r < stop; r++) {
                int taken = orders.orderInto(r, out);
                throwsTaken += taken;
                if (taken > mostThrows) {
                    mostThrows = taken;
                }
                if (packed != null) {
                    int idx = 0;
                    for (int p = 0; p < n; p++) {
                        idx = idx * n + out[p];
                    }
                    packed[idx]++;
                } else {
                    for (int p = 0; p < n; p++) {
                        seat[out[p]][p]++;
                    }
                }
                int lead = out[0];
                sessionLeads[lead]++;
                if (lead == previous) {
                    run++;
                } else {
                    if (run > 0) {
                        closeRun(t, run);
                        longestInSession = Math.max(longestInSession, run);
                    }
                    previous = lead;
                    run = 1;
                }
            }
            progress.add(stop - start);
            if (r < rounds && cancellation.requested()) {
                complete = false;
                break;
            }
        }
        if (run > 0) {
            closeRun(t, run);
            longestInSession = Math.max(longestInSession, run);
        }
        t.rounds += r;
        t.throwsTaken += throwsTaken;
        t.mostThrows = mostThrows;
        long busiest = 0;
        for (int p = 0; p < n; p++) {
            t.leads[p] += sessionLeads[p];
            busiest = Math.max(busiest, sessionLeads[p]);
        }
        if (!complete || r == 0) {
            return;
        }
        // A whole session: judge it on its own, as a player at that table would.
        double expected = (double) r / n;
        double statistic = 0;
        for (int p = 0; p < n; p++) {
            double d = sessionLeads[p] - expected;
            statistic += d * d / expected;
        }
        t.sessionsCompleted++;
        if (statistic > critical) {
            t.lopsidedSessions++;
        }
        if (busiest >= 2 * expected) {
            t.doubleShareSessions++;
        }
        t.sumBusiest += busiest;
        t.worstBusiest = Math.max(t.worstBusiest, busiest);
        t.sumLongestRun += longestInSession;
    }

    private static void closeRun(Tally t, long run) {
        t.runs[(int) Math.min(run, Tally.RUN_CAP)]++;
        t.longestRun = Math.max(t.longestRun, run);
    }

    private static void joinUninterruptibly(Thread thread) {
        boolean interrupted = false;
        while (true) {
            try {
                thread.join();
                break;
            } catch (InterruptedException e) {
                interrupted = true;
            }
        }
        if (interrupted) {
            Thread.currentThread().interrupt();
        }
    }
}
