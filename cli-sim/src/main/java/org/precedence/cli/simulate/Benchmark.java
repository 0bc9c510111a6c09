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
 * {@code simulate --benchmark}: the provider against a plain shuffle, both through the same
 * simulation loop and tally, in the same process, alternating, so that machine load and JIT
 * state hit both alike. Reports the median of {@value #REPETITIONS} timed repetitions after
 * {@value #WARMUPS} untimed ones, in rounds per second, and the ratio provider / shuffle.
 */
final class Benchmark {
    static final int WARMUPS = 2;
    static final int REPETITIONS = 5;

    private Benchmark() {
    }

    /** Medians for one player count. */
    record Row(int players, long roundsPerRepetition, double precedencePerSecond, double shufflePerSecond) {
        double ratio() {
            return precedencePerSecond / shufflePerSecond;
        }
    }

    record Result(int threads, List<Row> rows) {
    }

    static Result run(OrderSupply precedence, OrderSupply shuffle, List<Integer> players, long sessions,
                      long rounds, int threads) {
        List<Row> rows = new ArrayList<>();
        for (int n : players) {
            double[] a = new double[REPETITIONS];
            double[] b = new double[REPETITIONS];
            for (int rep = -WARMUPS; rep < REPETITIONS; rep++) {
                double pa = timed(precedence, n, sessions, rounds, threads);
                double pb = timed(shuffle, n, sessions, rounds, threads);
                if (rep >= 0) {
                    a[rep] = pa;
                    b[rep] = pb;
                }
            }
            rows.add(new Row(n, sessions * rounds, median(a), median(b)));
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
                row.addProperty("shuffleRoundsPerSecond", r.shufflePerSecond());
                row.addProperty("ratio", r.ratio());
                rows.add(row);
            }
            o.add("results", rows);
            out.println(new GsonBuilder().setPrettyPrinting().create().toJson(o));
        } else {
            out.printf(Locale.ROOT, "Benchmark: median of %d runs after %d warm-ups, %d threads, same loop and tally%n",
                    REPETITIONS, WARMUPS, result.threads());
            out.printf(Locale.ROOT, "  %-8s %14s %22s %22s %8s%n", "players", "rounds/run", "precedence rounds/s",
                    "shuffle rounds/s", "ratio");
            for (Row r : result.rows()) {
                out.printf(Locale.ROOT, "  %-8d %14s %22s %22s %8.2f%n", r.players(), Format.count(r.roundsPerRepetition()),
                        Format.fixed(r.precedencePerSecond(), 0), Format.fixed(r.shufflePerSecond(), 0), r.ratio());
            }
        }
        out.flush();
    }
}
