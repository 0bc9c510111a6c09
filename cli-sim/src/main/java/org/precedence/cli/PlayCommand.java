package org.precedence.cli;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStreamReader;
import java.io.PrintWriter;
import java.nio.charset.Charset;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.concurrent.Callable;
import java.util.function.Supplier;
import org.precedence.api.RandomnessMode;
import org.precedence.api.SessionSeed;
import org.precedence.api.TurnOrderProvider;
import org.precedence.game.GameSetup;
import org.precedence.game.log.GameLogFile;
import org.precedence.game.log.GameRecord;
import org.precedence.game.log.InvalidLogException;
import org.precedence.game.play.Match;
import org.precedence.game.play.TableListener;
import org.precedence.game.replay.Replay;
import org.precedence.game.replay.ReplayReport;
import org.precedence.game.terminal.HotSeat;
import org.precedence.game.terminal.InputEndedException;
import org.precedence.game.terminal.TableRenderer;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/**
 * {@code precedence play}: a game of Shoal Lights (the sample game) at the terminal, its turn
 * order rolled by the installed provider every round. All bots: the whole game runs and the
 * result is printed. With people at the table ({@code --bots} below {@code --players}) each
 * person's move is read from standard input, one per line.
 */
@Command(name = "play",
        mixinStandardHelpOptions = true,
        description = {
            "Play Shoal Lights, the sample game: 2 to 8 lantern boats race to light the Veyra Shoals;"
                + " every round's turn order is rolled with an order-fair dice set.",
            "Bots play the last --bots seats; people at this terminal play the others (hot seat).",
            "Exit codes: 0 game played or replay matches, 1 replay differs from the log, 2 bad input."
        })
public final class PlayCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Mixin
    FormatOption format = new FormatOption();

    @Option(names = "--players", paramLabel = "N", description = "Boats at the table, 2 to 8 (default: 4).")
    Integer players;

    @Option(names = "--bots", paramLabel = "N", description = "How many of them bots play (default: all).")
    Integer bots;

    @Option(names = "--seed", paramLabel = "SEED",
            description = "Session seed: a phrase, or hex: and 64 hex digits (default: a fresh random seed).")
    String seed;

    @Option(names = "--mode", paramLabel = "MODE", description = "Generator: fast or secure (default: fast).")
    RandomnessMode mode;

    @Option(names = "--rounds", paramLabel = "N", description = "Last round, 1 to 99 (default: 12).")
    Integer rounds;

    @Option(names = "--leave-after", paramLabel = "ROUND",
            description = "After this round the bot with the least glow leaves the table.")
    Integer leaveAfter;

    @Option(names = "--save", paramLabel = "LOG", description = "Write the game's log (JSON) to this file.")
    Path save;

    @Option(names = "--replay", paramLabel = "LOG",
            description = "Re-run the logged game and confirm every round's order, the moves and the result.")
    Path replay;

    @Option(names = "--quiet", description = "Print only the result, not every round (bot tables only).")
    boolean quiet;

    private final Supplier<BufferedReader> input;
    private final Supplier<TurnOrderProvider> providers;

    /** The command as the application runs it: moves from standard input, provider from the class path. */
    public PlayCommand() {
        this(() -> new BufferedReader(new InputStreamReader(System.in, Charset.defaultCharset())),
                TurnOrderProvider::load);
    }

    /** For tests: moves from {@code input}, turn orders from {@code providers}. */
    PlayCommand(Supplier<BufferedReader> input, Supplier<TurnOrderProvider> providers) {
        this.input = Objects.requireNonNull(input, "input");
        this.providers = Objects.requireNonNull(providers, "providers");
    }

    @Override
    public Integer call() throws IOException {
        return replay != null ? replay() : play();
    }

    private int replay() throws IOException {
        List<String> extra = new ArrayList<>();
        addIf(extra, players != null, "--players");
        addIf(extra, bots != null, "--bots");
        addIf(extra, seed != null, "--seed");
        addIf(extra, mode != null, "--mode");
        addIf(extra, rounds != null, "--rounds");
        addIf(extra, leaveAfter != null, "--leave-after");
        addIf(extra, save != null, "--save");
        if (!extra.isEmpty()) {
            throw new UserInputException("--replay takes the table, seed and moves from the log; drop "
                    + String.join(", ", extra));
        }
        ReplayReport report;
        try {
            report = Replay.check(GameLogFile.read(replay), providers.get());
        } catch (InvalidLogException e) {
            throw new UserInputException("--replay " + e.getMessage());
        }
        PrintWriter out = spec.commandLine().getOut();
        if (format.json()) {
            out.println(ReplayJson.of(replay.toString(), report));
        } else {
            if (!quiet) {
                report.lines().subList(0, report.lines().size() - 1).forEach(out::println);
            }
            out.println(report.verdict());
        }
        out.flush();
        return report.matches() ? ExitCodes.OK : ExitCodes.CHECK_FAILED;
    }

    private int play() throws IOException {
        int seats = players == null ? 4 : players;
        if (seats < GameSetup.MIN_PLAYERS || seats > GameSetup.MAX_PLAYERS) {
            throw new UserInputException("--players must be " + GameSetup.MIN_PLAYERS + " to " + GameSetup.MAX_PLAYERS
                    + ", got " + seats);
        }
        int botSeats = bots == null ? seats : bots;
        if (botSeats < 0 || botSeats > seats) {
            throw new UserInputException("--bots must be 0 to " + seats + " (the number of players), got " + botSeats);
        }
        int lastRound = rounds == null ? GameSetup.DEFAULT_MAX_ROUNDS : rounds;
        if (lastRound < 1 || lastRound > GameSetup.MAX_ROUNDS_LIMIT) {
            throw new UserInputException("--rounds must be 1 to " + GameSetup.MAX_ROUNDS_LIMIT + ", got " + lastRound);
        }
        if (leaveAfter != null && (leaveAfter < 1 || leaveAfter >= lastRound)) {
            throw new UserInputException("--leave-after must be a round from 1 to " + (lastRound - 1)
                    + " (the game has " + lastRound + " rounds), got " + leaveAfter);
        }
        if (leaveAfter != null && botSeats == 0) {
            throw new UserInputException("--leave-after makes a bot leave, but --bots is 0");
        }
        boolean humans = botSeats < seats;
        if (humans && format.json()) {
            throw new UserInputException("--format json needs a table of bots only (--bots " + seats + ")");
        }
        if (save != null) {
            Path dir = save.toAbsolutePath().getParent();
            if (dir == null || !Files.isDirectory(dir)) {
                throw new UserInputException("--save " + save + ": directory " + dir + " does not exist");
            }
            if (Files.isDirectory(save)) {
                throw new UserInputException("--save " + save + " is a directory, not a file");
            }
        }
        String seedText = seed != null ? seed : "hex:" + SessionSeed.random().toHex();
        GameSetup setup;
        try {
            setup = GameSetup.of(seats, botSeats, seedText, mode == null ? RandomnessMode.FAST : mode, lastRound,
                    leaveAfter == null ? 0 : leaveAfter);
        } catch (IllegalArgumentException e) {
            throw new UserInputException((seed != null ? "--seed: " : "") + e.getMessage());
        }
        PrintWriter out = spec.commandLine().getOut();
        TableListener table = format.json() ? TableListener.NONE : new TableRenderer(out, humans || !quiet);
        TurnOrderProvider provider = providers.get();
        // One reader for all people: several buffered readers over one stream would steal lines.
        HotSeat people = humans ? new HotSeat(input.get(), out) : null;
        Match match;
        try {
            match = Match.open(setup, provider, seat -> people, table);
        } catch (IllegalArgumentException e) {
            throw new UserInputException("--players " + seats + ": " + e.getMessage());
        }
        GameRecord record;
        try {
            record = match.play();
        } catch (InputEndedException e) {
            throw new UserInputException(e.getMessage() + "; the game was not finished"
                    + (save != null ? " and not saved" : ""));
        }
        if (save != null) {
            GameLogFile.write(save, record);
        }
        if (format.json()) {
            GameLogFile.write(out, record);
        } else {
            if (seed == null) {
                out.println("Seed: " + seedText);
            }
            if (save != null) {
                out.println("Saved the log to " + save + "; check it with: precedence play --replay " + save);
            }
        }
        out.flush();
        return ExitCodes.OK;
    }

    private static void addIf(List<String> list, boolean condition, String option) {
        if (condition) {
            list.add(option);
        }
    }
}
