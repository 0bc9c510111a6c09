package org.precedence.cli;

import com.google.gson.Gson;
import com.google.gson.GsonBuilder;
import com.google.gson.JsonObject;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;
import java.util.concurrent.Callable;
import org.precedence.api.SessionSeed;
import org.precedence.runtime.provider.FairDiceProvider;
import org.precedence.runtime.replay.Mismatch;
import org.precedence.runtime.replay.ReplayReport;
import org.precedence.runtime.replay.Replayer;
import org.precedence.runtime.replay.SessionLog;
import org.precedence.runtime.replay.SessionLogFiles;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code precedence replay}: check a session log's commitment and recompute every round. */
@Command(name = "replay", mixinStandardHelpOptions = true,
        description = {"Verify a session log: the revealed seed against the commitment, then every round recomputed.",
            "Exit 0 when everything matches, 1 at the first mismatch (printed), 2 when the log cannot be read."})
public final class ReplayCommand implements Callable<Integer> {
    private static final Gson GSON = new GsonBuilder().disableHtmlEscaping().create();

    @Spec
    CommandSpec spec;

    @Mixin
    FormatOption format = new FormatOption();

    @Parameters(index = "0", paramLabel = "LOG", description = "The session log (JSON).")
    Path logFile;

    @Option(names = "--seed", paramLabel = "S",
            description = "The revealed seed, for a log that holds only the commitment (text, number or hex:<64 hex>).")
    String seed;

    @Override
    public Integer call() {
        SessionLog log;
        try {
            log = SessionLogFiles.read(logFile);
        } catch (IOException e) {
            throw new UserInputException("cannot read " + logFile + ": "
                    + (Files.exists(logFile) ? e.getMessage() : "no such file"), e);
        }
        Optional<SessionSeed> revealed = seed == null ? Optional.empty() : Optional.of(SessionSeed.parse(seed));
        ReplayReport report = new Replayer(FairDiceProvider.standardSets()).verify(log, revealed);
        PrintWriter out = spec.commandLine().getOut();
        if (format.json()) {
            JsonObject o = new JsonObject();
            o.addProperty("ok", report.ok());
            o.addProperty("roundsChecked", report.roundsChecked());
            o.addProperty("rounds", log.rounds().size());
            o.addProperty("algorithm", log.algorithm());
            o.addProperty("commitment", log.commitment());
            report.mismatch().ifPresent(m -> o.add("mismatch", json(m)));
            out.println(GSON.toJson(o));
        } else if (report.ok()) {
            out.printf("replay ok: commitment matches the seed and all %d rounds match (%s)%n",
                    report.roundsChecked(), log.algorithm());
        } else {
            out.printf("replay FAILED after %d matching rounds: %s%n", report.roundsChecked(),
                    report.mismatch().get().describe());
        }
        out.flush();
        return report.ok() ? ExitCodes.OK : ExitCodes.CHECK_FAILED;
    }

    private static JsonObject json(Mismatch m) {
        JsonObject o = new JsonObject();
        o.addProperty("round", m.round());
        o.addProperty("field", m.field());
        o.addProperty("player", m.player());
        o.addProperty("position", m.position());
        o.addProperty("expected", m.expected());
        o.addProperty("found", m.found());
        o.addProperty("message", m.describe());
        return o;
    }
}
