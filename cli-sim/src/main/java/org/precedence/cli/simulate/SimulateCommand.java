package org.precedence.cli.simulate;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Objects;
import java.util.Set;
import java.util.concurrent.Callable;
import java.util.concurrent.atomic.LongAdder;
import java.util.function.Consumer;
import java.util.function.Supplier;
import org.precedence.api.OrderRule;
import org.precedence.api.RandomnessMode;
import org.precedence.api.SessionSeed;
import org.precedence.api.TurnOrderProvider;
import org.precedence.cli.AtomicFiles;
import org.precedence.cli.ExitCodes;
import org.precedence.cli.FormatOption;
import org.precedence.cli.UserInputException;
import org.precedence.runtime.analysis.RerollExpectation;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/**
 * {@code precedence simulate}: many sessions through the provider an engine uses, with the
 * balanced-lead mode beside it and, on request, a plain shuffle and ordinary dice.
 * Exit code 0 when nothing is flagged, 1 when a p-value is below 10^-6, 2 on bad input.
 */
@Command(name = "simulate", mixinStandardHelpOptions = true,
        description = {
            "Rolls many sessions with the dice an engine would get and shows how evenly the turn orders came out: "
                    + "every ranking's count (up to 6 players), who acted where, first-player streaks, "
                    + "chi-square and G-test p-values, and how lopsided single short sessions look, "
                    + "beside the balanced-lead mode.",
            "Exit codes: 0 nothing suspicious, 1 a p-value below 0.000001 (unfair), 2 bad input."})
public final class SimulateCommand implements Callable<Integer> {
    static final long MAX_SESSIONS = 1_000_000_000L;
    static final long MAX_TOTAL_ROUNDS = 1_000_000_000_000_000L;
    static final int MAX_THREADS = 1024;
    static final int MAX_COMPARE_SIDES = 1_000_000;

    @Spec
    CommandSpec spec;

    @Mixin
    FormatOption format = new FormatOption();

    @Option(names = "--players", required = true, split = ",", paramLabel = "N",
            description = "Player counts to simulate, e.g. 4 or 3,4,5.")
    List<Integer> players;

    @Option(names = "--sessions", paramLabel = "S", defaultValue = "1000",
            description = "Sessions per player count, each with its own seed (default: ${DEFAULT-VALUE}).")
    long sessions;

    @Option(names = "--rounds", paramLabel = "R", defaultValue = "100",
            description = "Rounds per session (default: ${DEFAULT-VALUE}).")
    long rounds;

    @Option(names = "--seed", paramLabel = "X",
            description = "Simulation seed: any text, or hex: and 64 hex digits. Session 0 uses it as is. "
                    + "Default: a fresh random seed, printed in the report so the run can be repeated.")
    String seed;

    @Option(names = "--mode", paramLabel = "MODE", defaultValue = "fast",
            description = "Randomness: fast or secure (default: ${DEFAULT-VALUE}).")
    RandomnessMode mode;

    @Option(names = "--plot", paramLabel = "FILE.svg",
            description = "Also draw the result as an SVG picture (written atomically).")
    Path plot;

    @Option(names = "--compare",
            description = "Run the same rounds through a plain shuffle and ordinary dice with re-rolls on ties.")
    boolean compare;

    @Option(names = "--compare-sides", paramLabel = "S", defaultValue = "6",
            description = "Sides of the ordinary dice in --compare (default: ${DEFAULT-VALUE}).")
    int compareSides;

    @Option(names = "--quiet", description = "No progress bar.")
    boolean quiet;

    @Option(names = "--threads", paramLabel = "T",
            description = "Worker threads (default: all cores). Results do not depend on it.")
    Integer threads;

    @Option(names = "--benchmark",
            description = "Instead of a report: time the provider against two plain shuffles "
                    + "(Collections.shuffle, and Fisher-Yates over xoroshiro128++) in this process, same "
                    + "sessions and rounds, and print rounds per second and the ratios.")
    boolean benchmark;

    private final Supplier<TurnOrderProvider> providers;
    private final boolean handleInterrupt;
    private final Consumer<Cancellation> onStart;

    /** The command as the application runs it: the provider on the class path, Ctrl-C handled. */
    public SimulateCommand() {
        this(TurnOrderProvider::load, true, c -> { });
    }

    /** For tests: a given provider, and no shutdown hook. */
    SimulateCommand(Supplier<TurnOrderProvider> providers, boolean handleInterrupt) {
        this(providers, handleInterrupt, c -> { });
    }

    /** For tests: also hands over the run's cancellation, as a Ctrl-C would use it. */
    SimulateCommand(Supplier<TurnOrderProvider> providers, boolean handleInterrupt, Consumer<Cancellation> onStart) {
        this.providers = Objects.requireNonNull(providers, "providers");
        this.handleInterrupt = handleInterrupt;
        this.onStart = Objects.requireNonNull(onStart, "onStart");
    }

    @Override
    public Integer call() {
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        SessionSeed master = parseSeed();
        int threadCount = validate();
        if (plot != null) {
            if (!plot.getFileName().toString().toLowerCase(Locale.ROOT).endsWith(".svg")) {
                throw new UserInputException("--plot " + plot + ": the file name must end in .svg");
            }
            AtomicFiles.checkWritable(plot, "--plot");
        }
        TurnOrderProvider provider;
        try {
            provider = providers.get();
        } catch (IllegalStateException e) {
            err.println("precedence simulate: " + e.getMessage());
            err.flush();
            return 3;
        }
        for (int n : players) {
            if (n > provider.maxPlayers()) {
                throw new UserInputException("--players: " + n + " is more than the provider serves (2.."
                        + provider.maxPlayers() + ")");
            }
        }
        OrderSupply precedence = new ProviderSupply(provider, master, mode, OrderRule.FRESH_EACH_ROUND);
        if (benchmark) {
            Benchmark.Result b = Benchmark.run(precedence, new JdkShuffleSupply(master), new ShuffleSupply(master),
                    players, sessions, rounds, threadCount);
            Benchmark.print(b, format.json(), out);
            return ExitCodes.OK;
        }

        Cancellation cancellation = new Cancellation();
        if (handleInterrupt) {
            cancellation.installOnInterrupt();
        }
        onStart.accept(cancellation);
        try {
            SimulationReport report = simulate(provider, master, threadCount, cancellation, err);
            if (format.json()) {
                JsonReport.print(report, out);
            } else {
                TextReport.print(report, out);
            }
            if (plot != null) {
                AtomicFiles.writeString(plot, PlotBuilder.svg(report), "--plot");
                if (!format.json()) {
                    out.println();
                    out.println("Picture written to " + plot);
                    out.flush();
                }
            }
            return report.flagged() ? ExitCodes.CHECK_FAILED : ExitCodes.OK;
        } finally {
            cancellation.finished();
        }
    }

    private SimulationReport simulate(TurnOrderProvider provider, SessionSeed master, int threadCount,
                                      Cancellation cancellation, PrintWriter err) {
        long perRun = sessions * rounds;
        long runs = players.size() * (2L + (compare ? 2 : 0));
        LongAdder done = new LongAdder();
        SimulationRunner runner = new SimulationRunner(threadCount, cancellation, done);
        boolean showProgress = !quiet && Terminal.attached();
        List<SimulationReport.PlayerCount> counts = new ArrayList<>();
        ProgressBar bar = new ProgressBar(err, done, safeMultiply(perRun, runs), showProgress, 1000).start();
        try {
            OrderSupply fresh = new ProviderSupply(provider, master, mode, OrderRule.FRESH_EACH_ROUND);
            OrderSupply balanced = new ProviderSupply(provider, master, mode, OrderRule.BALANCED_LEAD);
            for (int n : players) {
                if (cancellation.requested()) {
                    break;
                }
                SupplyResult main = Analysis.of(fresh.label(), runner.run(fresh, n, sessions, rounds),
                        sessions, rounds, true, Double.NaN);
                SupplyResult bal = null;
                List<SupplyResult> peers = new ArrayList<>();
                if (!cancellation.requested()) {
                    bal = Analysis.of("balanced lead", runner.run(balanced, n, sessions, rounds),
                            sessions, rounds, false, Double.NaN);
                }
                if (compare && !cancellation.requested()) {
                    ShuffleSupply shuffle = new ShuffleSupply(master);
                    peers.add(Analysis.of(shuffle.label(), runner.run(shuffle, n, sessions, rounds),
                            sessions, rounds, true, Double.NaN));
                }
                if (compare && !cancellation.requested()) {
                    RerollDiceSupply dice = new RerollDiceSupply(master, compareSides);
                    peers.add(Analysis.of(dice.label(), runner.run(dice, n, sessions, rounds),
                            sessions, rounds, true, RerollExpectation.of(n, compareSides).doubleValue()));
                }
                counts.add(new SimulationReport.PlayerCount(main, bal, peers));
            }
        } finally {
            bar.close();
        }
        boolean complete = !cancellation.requested() && counts.size() == players.size();
        return new SimulationReport(seed, mode.name().toLowerCase(Locale.ROOT), sessions, rounds, complete,
                List.copyOf(players), counts);
    }

    private SessionSeed parseSeed() {
        if (seed == null) {
            // No seed given: draw one, and keep it in the hex form the report prints, so that
            // passing it back as --seed repeats the run exactly.
            seed = "hex:" + SessionSeed.random().toHex();
        }
        try {
            return SessionSeed.parse(seed);
        } catch (IllegalArgumentException e) {
            throw new UserInputException("--seed: " + e.getMessage());
        }
    }

    /** Checks every number; returns the thread count to use. */
    private int validate() {
        Set<Integer> seen = new HashSet<>();
        for (int n : players) {
            if (n < 2) {
                throw new UserInputException("--players: " + n + " is out of range; a round needs at least 2 players");
            }
            if (!seen.add(n)) {
                throw new UserInputException("--players: " + n + " is listed twice");
            }
        }
        if (sessions < 1 || sessions > MAX_SESSIONS) {
            throw new UserInputException("--sessions: " + sessions + " is out of range; allowed 1.." + MAX_SESSIONS);
        }
        if (rounds < 1 || rounds > MAX_TOTAL_ROUNDS) {
            throw new UserInputException("--rounds: " + rounds + " is out of range; allowed 1.." + MAX_TOTAL_ROUNDS);
        }
        if (safeMultiply(sessions, rounds) > MAX_TOTAL_ROUNDS) {
            throw new UserInputException("--sessions x --rounds: " + sessions + " x " + rounds
                    + " is more than " + MAX_TOTAL_ROUNDS + " rounds");
        }
        if (compareSides < 2 || compareSides > MAX_COMPARE_SIDES) {
            throw new UserInputException("--compare-sides: " + compareSides + " is out of range; allowed 2.."
                    + MAX_COMPARE_SIDES);
        }
        if (compare) {
            for (int n : players) {
                if (n > compareSides) {
                    throw new UserInputException("--compare-sides: " + n + " players cannot all throw different "
                            + "values on " + compareSides + "-sided dice; use at least " + n + " sides");
                }
            }
        }
        int t = threads == null ? Runtime.getRuntime().availableProcessors() : threads;
        if (t < 1 || t > MAX_THREADS) {
            throw new UserInputException("--threads: " + t + " is out of range; allowed 1.." + MAX_THREADS);
        }
        return t;
    }

    private static long safeMultiply(long a, long b) {
        try {
            return Math.multiplyExact(a, b);
        } catch (ArithmeticException e) {
            return Long.MAX_VALUE;
        }
    }
}
