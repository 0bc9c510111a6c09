package org.precedence.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import java.io.BufferedReader;
import java.io.PrintWriter;
import java.io.StringReader;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.precedence.game.fake.ShuffleProvider;
import picocli.CommandLine;

class PlayCommandTest {

    /** Output, error text and exit code of one run. */
    record Run(int exit, String out, String err) {
    }

    static Run run(String stdin, String... args) {
        ErrorMapper errors = new ErrorMapper();
        CommandLine cmd = new CommandLine(new PlayCommand(() -> new BufferedReader(new StringReader(stdin)),
                ShuffleProvider::new))
                .setParameterExceptionHandler(errors)
                .setExecutionExceptionHandler(errors)
                .setCaseInsensitiveEnumValuesAllowed(true);
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        cmd.setOut(new PrintWriter(out, true));
        cmd.setErr(new PrintWriter(err, true));
        int exit = cmd.execute(args);
        return new Run(exit, out.toString(), err.toString());
    }

    @Test
    void application_listsPlay() {
        assertTrue(PrecedenceApplication.commandLine().getSubcommands().containsKey("play"));
    }

    @Test
    void play_allBots_runsTheWholeGameAndPrintsTheResult() {
        Run r = run("", "--players", "5", "--bots", "5", "--seed", "veyra-dusk");
        assertEquals(0, r.exit(), r.err());
        assertTrue(r.out().contains("== Round 1 of at most 12: 5 boats roll set test-5 (ORDER_FAIR)"), r.out());
        assertTrue(r.out().matches("(?s).*\\nResult after \\d+ rounds? \\(.*\\): \\w+ wins with \\d+ glow\\..*"), r.out());
        assertEquals("", r.err());
        assertEquals(r.out(), run("", "--players", "5", "--bots", "5", "--seed", "veyra-dusk").out());
    }

    @Test
    void play_quiet_printsOnlyOpeningAndResult() {
        Run r = run("", "--players", "3", "--seed", "veyra-dusk", "--quiet");
        assertEquals(0, r.exit(), r.err());
        assertFalse(r.out().contains("== Round"), r.out());
        assertTrue(r.out().contains("Result after"), r.out());
    }

    @Test
    void play_saveThenReplay_matches(@TempDir Path dir) throws Exception {
        Path log = dir.resolve("veyra-dusk.json");
        Run played = run("", "--players", "5", "--bots", "5", "--seed", "veyra-dusk", "--save", log.toString(),
                "--leave-after", "3", "--mode", "secure");
        assertEquals(0, played.exit(), played.err());
        assertTrue(played.out().contains("leaves the table after round 3"), played.out());
        assertTrue(Files.exists(log));
        try (Stream<Path> files = Files.list(dir)) {
            assertEquals(1, files.count(), "no temporary file left beside the log");
        }
        Run replayed = run("", "--replay", log.toString());
        assertEquals(0, replayed.exit(), replayed.err());
        assertTrue(replayed.out().startsWith("round 1: order "), replayed.out());
        assertTrue(replayed.out().contains("replay matches: "), replayed.out());
    }

    @Test
    void replay_tamperedLog_exitOneWithTheRound(@TempDir Path dir) throws Exception {
        Path log = dir.resolve("game.json");
        assertEquals(0, run("", "--players", "4", "--seed", "veyra-dusk", "--save", log.toString()).exit());
        JsonObject json = JsonParser.parseString(Files.readString(log)).getAsJsonObject();
        JsonObject round2 = json.getAsJsonArray("rounds").get(1).getAsJsonObject();
        var order = round2.getAsJsonArray("order");
        var first = order.get(0);
        order.set(0, order.get(1));
        order.set(1, first);
        Files.writeString(log, json.toString());
        Run r = run("", "--replay", log.toString());
        assertEquals(1, r.exit(), r.out() + r.err());
        assertTrue(r.out().contains("MISMATCH: round 2: the provider gives the order"), r.out());
    }

    @Test
    void replay_json_reportsVerdict(@TempDir Path dir) throws Exception {
        Path log = dir.resolve("game.json");
        assertEquals(0, run("", "--players", "3", "--seed", "veyra-dusk", "--save", log.toString()).exit());
        Run r = run("", "--replay", log.toString(), "--format", "json");
        assertEquals(0, r.exit(), r.err());
        JsonObject json = JsonParser.parseString(r.out()).getAsJsonObject();
        assertTrue(json.get("matches").getAsBoolean());
        assertTrue(json.get("verdict").getAsString().startsWith("replay matches"));
    }

    @Test
    void play_json_printsTheLog() {
        Run r = run("", "--players", "3", "--seed", "veyra-dusk", "--format", "json");
        assertEquals(0, r.exit(), r.err());
        JsonObject json = JsonParser.parseString(r.out()).getAsJsonObject();
        assertEquals("shoal-lights-log/1", json.get("format").getAsString());
        assertEquals("veyra-dusk", json.get("seed").getAsString());
    }

    @Test
    void play_noSeed_printsTheRandomSeedForReplay() {
        Run r = run("", "--players", "2", "--quiet");
        assertEquals(0, r.exit(), r.err());
        assertTrue(r.out().matches("(?s).*\\nSeed: hex:[0-9a-f]{64}\\n.*"), r.out());
    }

    @Test
    void play_withHuman_readsMovesAndRepromptsOnBadInput() {
        String typed = "jump\nlight\nsail 1\n" + "gather\nsail 1\n".repeat(6);
        Run r = run(typed, "--players", "2", "--bots", "1", "--seed", "veyra-dusk", "--rounds", "4");
        assertEquals(0, r.exit(), r.err());
        assertTrue(r.out().contains("unknown move 'jump': type sail 1|2|3, light, gather or retire"), r.out());
        assertTrue(r.out().contains("not allowed: Lowmarket Harbour has no lantern to light"), r.out());
        assertTrue(r.out().contains("Saltmoth sails 1 to Cindermouth."), r.out());
        assertTrue(r.out().contains("Result after 4 rounds"), r.out());
    }

    @Test
    void play_inputEndsBeforeTheEnd_exitTwo() {
        Run r = run("sail 1\n", "--players", "2", "--bots", "1", "--seed", "veyra-dusk");
        assertEquals(2, r.exit());
        assertEquals("precedence play: input ended in round 2 while Saltmoth was to move; the game was not finished\n",
                r.err());
    }

    @ParameterizedTest
    @CsvSource(delimiter = '#', value = {
        "--players 9                     # precedence play: --players must be 2 to 8, got 9",
        "--players 1                     # precedence play: --players must be 2 to 8, got 1",
        "--players 5 --bots 6            # precedence play: --bots must be 0 to 5 (the number of players), got 6",
        "--players 3 --bots -1           # precedence play: --bots must be 0 to 3 (the number of players), got -1",
        "--rounds 0                      # precedence play: --rounds must be 1 to 99, got 0",
        "--leave-after 12                # precedence play: --leave-after must be a round from 1 to 11 (the game has 12 rounds), got 12",
        "--bots 0 --leave-after 2        # precedence play: --leave-after makes a bot leave, but --bots is 0",
        "--players 3 --bots 2 --format json # precedence play: --format json needs a table of bots only (--bots 3)",
        "--replay x.json --players 3     # precedence play: --replay takes the table, seed and moves from the log; drop --players",
        "--seed hex:12                   # precedence play: --seed: a hex seed has exactly 64 hexadecimal digits, got 2",
        "--replay /nonexistent/x.json    # precedence play: --replay /nonexistent/x.json: no such file",
        "--save /nonexistent/x.json      # precedence play: --save /nonexistent/x.json: directory /nonexistent does not exist",
    })
    void play_badArguments_exitTwoWithOneLine(String args, String message) {
        Run r = run("", args.trim().split("\\s+"));
        assertEquals(2, r.exit(), r.err());
        assertEquals(message + "\n", r.err());
        assertEquals("", r.out());
    }

    @Test
    void play_unknownOptionOrBadMode_exitTwo() {
        Run unknown = run("", "--players", "3", "--colour", "red");
        assertEquals(2, unknown.exit());
        assertTrue(unknown.err().startsWith("precedence: Unknown options: '--colour', 'red'"), unknown.err());
        Run mode = run("", "--mode", "turbo");
        assertEquals(2, mode.exit());
        assertTrue(mode.err().contains("--mode"), mode.err());
        Run notNumber = run("", "--players", "five");
        assertEquals(2, notNumber.exit());
        assertTrue(notNumber.err().contains("'five' is not an int"), notNumber.err());
    }

    @Test
    void replay_notALog_exitTwo(@TempDir Path dir) throws Exception {
        Path log = dir.resolve("broken.json");
        Files.writeString(log, "{ \"format\": \"shoal-lights-log/1\", ");
        Run r = run("", "--replay", log.toString());
        assertEquals(2, r.exit());
        assertTrue(r.err().startsWith("precedence play: --replay " + log + ": not a valid game log: "), r.err());
        assertEquals(1, r.err().lines().count());
    }
}
