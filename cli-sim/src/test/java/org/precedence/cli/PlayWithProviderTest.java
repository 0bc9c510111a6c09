package org.precedence.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.precedence.api.TurnOrderProvider;
import picocli.CommandLine;

/** {@code precedence play} as shipped: the application's wiring and the provider on the class path. */
class PlayWithProviderTest {

    private static String[] run(String... args) {
        CommandLine cmd = PrecedenceApplication.commandLine();
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        cmd.setOut(new PrintWriter(out, true));
        cmd.setErr(new PrintWriter(err, true));
        int code = cmd.execute(args);
        return new String[] {Integer.toString(code), out.toString(), err.toString()};
    }

    @Test
    void play_botGameSavedAndReplayed_matches(@TempDir Path dir) throws Exception {
        int players = Math.min(5, TurnOrderProvider.load().maxPlayers());
        Path log = dir.resolve("veyra-dusk.json");
        String[] played = run("play", "--players", String.valueOf(players), "--bots", String.valueOf(players),
                "--seed", "veyra-dusk", "--leave-after", "2", "--save", log.toString());
        assertEquals("0", played[0], played[2]);
        assertTrue(played[1].contains("== Round 1 of at most 12: " + players + " boats roll set "), played[1]);
        assertTrue(played[1].contains("(ORDER_FAIR), lowest face acts first =="), played[1]);
        assertTrue(played[1].contains("== Round 3 of at most 12: " + (players - 1) + " boats roll set "), played[1]);
        assertTrue(Files.readString(log).contains("\"format\": \"shoal-lights-log/1\""));
        String[] replayed = run("play", "--replay", log.toString());
        assertEquals("0", replayed[0], replayed[2]);
        assertTrue(replayed[1].contains("replay matches: "), replayed[1]);
    }

    @Test
    void play_moreBoatsThanTheGameSeats_exitTwo() {
        // The provider serves up to 64 players; the game's own rules seat 2 to 8.
        assertTrue(TurnOrderProvider.load().maxPlayers() >= 8);
        String[] r = run("play", "--players", "9", "--seed", "veyra-dusk");
        assertEquals("2", r[0]);
        assertEquals("precedence play: --players must be 2 to 8, got 9\n", r[2]);
    }
}
