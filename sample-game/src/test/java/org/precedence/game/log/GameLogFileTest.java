package org.precedence.game.log;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.precedence.api.RandomnessMode;
import org.precedence.game.GameSetup;
import org.precedence.game.fake.ShuffleProvider;
import org.precedence.game.play.Match;
import org.precedence.game.play.TableListener;

class GameLogFileTest {

    private static GameRecord game() {
        GameSetup setup = GameSetup.of(3, 3, "veyra-dusk", RandomnessMode.SECURE, 5, 2);
        return Match.open(setup, new ShuffleProvider(), s -> null, TableListener.NONE).play();
    }

    @Test
    void write_thenRead_sameRecordAndNoTemporaryFileLeft(@TempDir Path dir) throws Exception {
        GameRecord g = game();
        Path log = dir.resolve("game.json");
        Files.writeString(log, "old content");
        GameLogFile.write(log, g);
        assertEquals(g, GameLogFile.read(log));
        try (Stream<Path> files = Files.list(dir)) {
            assertEquals(List.of(log), files.toList());
        }
    }

    @Test
    void toJson_usesTheDocumentedFieldNames() {
        JsonObject json = JsonParser.parseString(GameLogFile.toJson(game())).getAsJsonObject();
        for (String field : List.of("format", "seed", "seedCommitment", "mode", "rule", "convention", "provider",
                "maxRounds", "leaveAfterRound", "seats", "rounds", "result")) {
            assertTrue(json.has(field), field);
        }
        assertEquals(GameRecord.FORMAT, json.get("format").getAsString());
        assertEquals("SECURE", json.get("mode").getAsString());
        JsonObject round = json.getAsJsonArray("rounds").get(0).getAsJsonObject();
        for (String field : List.of("round", "roster", "setId", "grade", "rolls", "order", "moves", "departures")) {
            assertTrue(round.has(field), field);
        }
        JsonObject roll = round.getAsJsonArray("rolls").get(0).getAsJsonObject();
        for (String field : List.of("seat", "die", "faceIndex", "faceValue", "position")) {
            assertTrue(roll.has(field), field);
        }
    }

    @Test
    void read_missingFile_oneLineError(@TempDir Path dir) {
        Path log = dir.resolve("none.json");
        InvalidLogException e = assertThrows(InvalidLogException.class, () -> GameLogFile.read(log));
        assertEquals(log + ": no such file", e.getMessage());
    }

    @Test
    void fromJson_notJson_rejected() {
        InvalidLogException e = assertThrows(InvalidLogException.class,
                () -> GameLogFile.fromJson("{ \"format\": ", "game.json"));
        assertTrue(e.getMessage().startsWith("game.json: not a valid game log: "), e.getMessage());
        assertEquals(1, e.getMessage().lines().count());
    }

    @Test
    void fromJson_missingField_rejectedNamingIt() {
        JsonObject json = JsonParser.parseString(GameLogFile.toJson(game())).getAsJsonObject();
        json.remove("seed");
        InvalidLogException e = assertThrows(InvalidLogException.class,
                () -> GameLogFile.fromJson(json.toString(), "game.json"));
        assertEquals("game.json: not a valid game log: field 'seed' is missing or has an unknown value", e.getMessage());
    }

    @Test
    void fromJson_unknownMode_rejected() {
        JsonObject json = JsonParser.parseString(GameLogFile.toJson(game())).getAsJsonObject();
        json.addProperty("mode", "TURBO");
        InvalidLogException e = assertThrows(InvalidLogException.class,
                () -> GameLogFile.fromJson(json.toString(), "game.json"));
        assertEquals("game.json: not a valid game log: field 'mode' is missing or has an unknown value", e.getMessage());
    }

    @Test
    void fromJson_otherFormat_rejected() {
        JsonObject json = JsonParser.parseString(GameLogFile.toJson(game())).getAsJsonObject();
        json.addProperty("format", "shoal-lights-log/0");
        InvalidLogException e = assertThrows(InvalidLogException.class,
                () -> GameLogFile.fromJson(json.toString(), "game.json"));
        assertEquals("game.json: log format 'shoal-lights-log/0' is not supported, expected 'shoal-lights-log/1'",
                e.getMessage());
    }

    @Test
    void fromJson_emptyFile_rejected(@TempDir Path dir) throws Exception {
        Path log = dir.resolve("empty.json");
        Files.write(log, new byte[0]);
        InvalidLogException e = assertThrows(InvalidLogException.class, () -> GameLogFile.read(log));
        assertEquals(log + ": the file is empty", e.getMessage());
        assertEquals("", new String(Files.readAllBytes(log), StandardCharsets.UTF_8));
    }
}
