package org.precedence.cli;

import com.google.gson.Gson;
import com.google.gson.GsonBuilder;
import com.google.gson.JsonArray;
import com.google.gson.JsonObject;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.precedence.api.OrderRule;
import org.precedence.api.PlayerRoll;
import org.precedence.api.RandomnessMode;
import org.precedence.api.RankingConvention;
import org.precedence.api.RoundResult;
import org.precedence.api.SessionSeed;
import org.precedence.api.SessionSpec;
import org.precedence.runtime.dice.MixedRadixDice;
import org.precedence.runtime.provider.DiceSession;
import org.precedence.runtime.provider.FairDiceProvider;
import org.precedence.runtime.replay.SessionLogFiles;
import org.precedence.runtime.replay.SessionRecorder;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code precedence roll}: the seeded roll of one round (or several), optionally logged. */
@Command(name = "roll", mixinStandardHelpOptions = true,
        description = {"Roll order-fair virtual dice for one round of a seeded session and print the turn order.",
            "faces[i] is player i's face value; under the default lowest-first convention faces increase along order."})
public final class RollCommand implements Callable<Integer> {
    private static final Gson GSON = new GsonBuilder().disableHtmlEscaping().create();

    @Spec
    CommandSpec spec;

    @Mixin
    FormatOption format = new FormatOption();

    @Option(names = "--players", required = true, paramLabel = "N", description = "Number of players.")
    int players;

    @Option(names = "--seed", paramLabel = "S",
            description = "Session seed: any text or decimal number, or hex:<64 hex digits>. Default: a fresh random seed (printed).")
    String seed;

    @Option(names = "--round", paramLabel = "K", defaultValue = "0", description = "Round number, >= 0 (default: ${DEFAULT-VALUE}).")
    long round;

    @Option(names = "--rounds", paramLabel = "M", defaultValue = "1",
            description = "Roll rounds K..K+M-1 (default: ${DEFAULT-VALUE}); JSON prints one object per line.")
    int rounds;

    @Option(names = "--mode", paramLabel = "MODE", defaultValue = "fast",
            description = "Randomness: fast (Philox4x64) or secure (HMAC-SHA256) (default: ${DEFAULT-VALUE}).")
    RandomnessMode mode;

    @Option(names = "--rule", paramLabel = "RULE", defaultValue = "fresh-each-round", converter = RuleNames.class,
            description = "Order rule: " + RuleNames.ALLOWED + " (default: ${DEFAULT-VALUE}).")
    OrderRule rule;

    @Option(names = "--descending", description = "Highest face acts first (default: lowest first).")
    boolean descending;

    @Option(names = "--log", paramLabel = "FILE", description = "Also write the rolled rounds as a session log (atomically).")
    Path log;

    @Option(names = "--commit-only", description = "With --log: write only the seed's commitment, not the seed.")
    boolean commitOnly;

    @Override
    public Integer call() throws IOException {
        if (rounds < 1) {
            throw new UserInputException("--rounds must be >= 1, got " + rounds);
        }
        if (round < 0) {
            throw new UserInputException("--round must be >= 0, got " + round);
        }
        if (round > Long.MAX_VALUE - rounds + 1) {
            throw new UserInputException("--round plus --rounds must stay below 2^63");
        }
        if (commitOnly && log == null) {
            throw new UserInputException("--commit-only needs --log FILE");
        }
        FairDiceProvider provider = new FairDiceProvider();
        if (players < 2 || players > provider.maxPlayers()) {
            throw new UserInputException("--players must be between 2 and " + provider.maxPlayers() + ", got " + players);
        }
        boolean randomSeed = seed == null;
        SessionSeed sessionSeed = randomSeed ? SessionSeed.random() : SessionSeed.parse(seed);
        RankingConvention convention = descending ? RankingConvention.HIGHEST_FIRST : RankingConvention.LOWEST_FIRST;
        DiceSession session = provider.open(new SessionSpec(sessionSeed, mode, rule, convention));
        SessionRecorder recorder = new SessionRecorder(session);
        List<String> roster = new ArrayList<>();
        for (int i = 0; i < players; i++) {
            roster.add("player-" + i);
        }
        PrintWriter out = spec.commandLine().getOut();
        MixedRadixDice set = session.setFor(players);
        for (long k = round; k < round + rounds; k++) {
            RoundResult r = recorder.play(k, roster);
            if (format.json()) {
                out.println(GSON.toJson(json(r, session, set, randomSeed ? sessionSeed : null)));
            } else {
                printText(out, r, session, set, k == round && randomSeed ? sessionSeed : null);
            }
        }
        if (log != null) {
            SessionLogFiles.write(log, recorder.log(!commitOnly));
            if (!format.json()) {
                out.println("log written to " + log + (commitOnly ? " (commitment only)" : ""));
            }
        }
        out.flush();
        return ExitCodes.OK;
    }

    private JsonObject json(RoundResult r, DiceSession session, MixedRadixDice set, SessionSeed shownSeed) {
        JsonObject o = new JsonObject();
        o.addProperty("round", r.round());
        JsonArray order = new JsonArray();
        r.order().forEach(order::add);
        o.add("order", order);
        JsonArray faces = new JsonArray();
        r.faceValues().forEach(v -> faces.add(v.toString()));
        o.add("faces", faces);
        JsonArray dice = new JsonArray();
        JsonArray faceIndices = new JsonArray();
        for (PlayerRoll roll : r.rolls()) {
            dice.add(roll.die());
            faceIndices.add(roll.faceIndex().toString());
        }
        o.add("dice", dice);
        o.add("faceIndices", faceIndices);
        o.addProperty("players", r.players());
        o.addProperty("setId", r.setId());
        o.addProperty("setSha256", set.sha256());
        o.addProperty("grade", r.grade().name());
        o.addProperty("algorithm", session.algorithmId());
        o.addProperty("mode", session.spec().mode().name().toLowerCase(Locale.ROOT));
        o.addProperty("rule", RuleNames.display(session.spec().rule()));
        o.addProperty("convention", session.spec().convention().name());
        o.addProperty("commitment", session.spec().seed().commitment());
        if (shownSeed != null) {
            o.addProperty("seed", "hex:" + shownSeed.toHex());
        }
        return o;
    }

    private static void printText(PrintWriter out, RoundResult r, DiceSession session, MixedRadixDice set,
            SessionSeed shownSeed) {
        if (shownSeed != null) {
            out.println("seed: hex:" + shownSeed.toHex() + " (random; pass it with --seed to repeat)");
        }
        out.printf("round %d, %d players, %s, %s first, set %s (%s), %s%n", r.round(), r.players(),
                RuleNames.display(session.spec().rule()),
                session.spec().convention() == RankingConvention.LOWEST_FIRST ? "lowest" : "highest",
                r.setId(), r.grade(), session.algorithmId());
        for (int p = 0; p < r.players(); p++) {
            PlayerRoll roll = r.rolls().get(r.order().get(p));
            out.printf("  %d. player %d  die %s  face %s%n", p + 1, roll.player(), roll.die(), roll.faceValue());
        }
        out.println("commitment: " + session.spec().seed().commitment());
    }
}
