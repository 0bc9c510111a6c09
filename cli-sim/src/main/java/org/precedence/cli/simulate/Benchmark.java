package org.precedence.cli.simulate;

import com.google.gson.GsonBuilder;
import com.google.gson.JsonArray;
import com.google.gson.JsonObject;
import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.atomic.LongAdder;

/**
 * {@code simulate --benchmark}: the provider against two plain shuffles — {@link
 * java.util.Collections#shuffle(java.util.List, java.util.Random)} with a seeded {@code
 * Random} (what engines call) and Fisher–Yates over xoroshiro128++ from Apache Commons RNG (the
 * fastest plain shuffle we know of) — all through the same simulation loop and tally, in the
 * same process, taking turns, so machine load and JIT state hit them alike. Reports the median
 * of {@value #REPETITIONS} timed repetitions after {@value #WARMUPS} untimed ones, in rounds
 * per second, and the provider's ratio to each peer.
 */
final class Benchmark {
    static final int WARMUPS = 2;
    static final int REPETITIONS = 5;

    private Benchmark() {
    }

    /** Medians for one player count. */
    record Row(int players, long roundsPerRepetition, double precedencePerSecond, double jdkShufflePerSecond,
               double shufflePerSecond) {
        double ratio() {
            return precedencePerSecond / shufflePerSecond;
        }

        double jdkRatio() {
            return precedencePerSecond / jdkShufflePerSecond;
        }
    }

    record Result(int threads, List<Row> rows) {
    }

    static Result run(OrderSupply precedence, OrderSupply jdkShuffle, OrderSupply shuffle, List<Integer> players,
                      long sessions, long rounds, int threads) {
        List<Row> rows = new ArrayList<>();
        for (int n : players) {
            double[] a = new double[REPETITIONS];
            double[] b = new double[REPETITIONS];
            double[] c = new double[REPETITIONS];
            for (int rep = -WARMUPS; rep < REPETITIONS; rep++) {
                double pa = timed(precedence, n, sessions, rounds, threads);
                double pb = timed(jdkShuffle, n, sessions, rounds, threads);
                double pc = timed(shuffle, n, sessions, rounds, threads);
                if (rep >= 0) {
                    a[rep] = pa;
                    b[rep] = pb;
                    c[rep] = pc;
                }
            }
            rows.add(new Row(n, sessions * rounds, median(a), median(b), median(c)));
        }
        return new Result(threads, rows);
    }

    private static double timed(OrderSupply supply, int players, long sessions, long rounds, int threads) {
        SimulationRunner runner = new SimulationRunner(threads, new Cancellation(), new LongAdder());
        long start = System.nanoTime();
        Tally t = runner.run(supply, players, sessions, rounds);
        long elapsed = System.nanoTime() - start;
        if (t.rounds != sessions * rounds) {
            throw new IllegalStateException("benchmark run lost rounds");
        }
        return t.rounds / (elapsed / 1e9);
    }

    static double median(double[] v) {
        double[] s = v.clone();
        Arrays.sort(s);
        return s.length % 2 == 1 ? s[s.length / 2] : (s[s.length / 2 - 1] + s[s.length / 2]) / 2;
    }

    static void print(Result result, boolean json, PrintWriter out) {
        if (json) {
            JsonObject o = new JsonObject();
            o.addProperty("threads", result.threads());
            o.addProperty("repetitions", REPETITIONS);
            o.addProperty("warmups", WARMUPS);
            JsonArray rows = new JsonArray();
            for (Row r : result.rows()) {
                JsonObject row = new JsonObject();
                row.addProperty("players", r.players());
                row.addProperty("roundsPerRepetition", r.roundsPerRepetition());
                row.addProperty("precedenceRoundsPerSecond", r.precedencePerSecond());
                row.addProperty("collectionsShuffleRoundsPerSecond", r.jdkShufflePerSecond());
                row.addProperty("fisherYatesXoroshiroRoundsPerSecond", r.shufflePerSecond());
                row.addProperty("ratioToCollectionsShuffle", r.jdkRatio());
                row.addProperty("ratioToFisherYatesXoroshiro", r.ratio());
                rows.add(row);
            }
            o.add("results", rows);
            out.println(new GsonBuilder().setPrettyPrinting().create().toJson(o));
        } else {
            out.printf(Locale.ROOT, "Benchmark: median of %d runs after %d warm-ups, %d threads, same loop and tally%n",
                    REPETITIONS, WARMUPS, result.threads());
            out.printf(Locale.ROOT, "  %-8s %14s %16s %22s %22s%n", "players", "rounds/run", "precedence/s",
                    "Collections.shuffle/s", "Fisher-Yates xoro/s");
            for (Row r : result.rows()) {
                out.printf(Locale.ROOT, "  %-8d %14s %16s %15s (%.2fx) %15s (%.2fx)%n", r.players(),
                        Format.count(r.roundsPerRepetition()), Format.fixed(r.precedencePerSecond(), 0),
                        Format.fixed(r.jdkShufflePerSecond(), 0), r.jdkRatio(),
                        Format.fixed(r.shufflePerSecond(), 0), r.ratio());
            }
            out.println("  (x: precedence rounds per second divided by the peer's; above 1 means precedence is faster)");
        }
        out.flush();
    }
}
