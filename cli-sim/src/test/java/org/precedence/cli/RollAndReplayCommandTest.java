package org.precedence.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.google.gson.JsonArray;
import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import java.io.IOException;
import java.math.BigInteger;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.precedence.api.SessionSeed;

class RollAndReplayCommandTest {
    @TempDir
    Path dir;

    private static Object[] run(String... args) {
        return PrecedenceApplicationTest.run(args);
    }

    private static JsonObject json(Object[] r) {
        return JsonParser.parseString((String) r[1]).getAsJsonObject();
    }

    @Test
    void roll_jsonHasTheContractFields() {
        Object[] r = run("roll", "--players", "4", "--seed", "copper kettle", "--round", "12", "--format", "json");
        assertEquals(0, r[0], (String) r[2]);
        JsonObject o = json(r);
        assertEquals(12, o.get("round").getAsLong());
        JsonArray order = o.getAsJsonArray("order");
        JsonArray faces = o.getAsJsonArray("faces");
        assertEquals(4, order.size());
        assertEquals(4, faces.size());
        // faces[i] is player i's value; along the order they increase (lowest first).
        for (int p = 1; p < 4; p++) {
            BigInteger before = new BigInteger(faces.get(order.get(p - 1).getAsInt()).getAsString());
            BigInteger after = new BigInteger(faces.get(order.get(p).getAsInt()).getAsString());
            assertTrue(before.compareTo(after) < 0);
        }
        assertEquals("precedence-roll-v3/philox4x64", o.get("algorithm").getAsString());
        assertEquals(SessionSeed.fromText("copper kettle").commitment(), o.get("commitment").getAsString());
        assertEquals("ORDER_FAIR", o.get("grade").getAsString());
        assertTrue(o.has("setId"));
        assertFalse(o.has("seed"), "a given seed is not echoed");
        // Same inputs, same round: deterministic.
        assertEquals(r[1], run("roll", "--players", "4", "--seed", "copper kettle", "--round", "12", "--format", "json")[1]);
    }

    @Test
    void roll_descendingAndSecure() {
        Object[] r = run("roll", "--players", "3", "--seed", "7", "--round", "1000000000", "--mode", "secure",
                "--descending", "--format", "json");
        assertEquals(0, r[0], (String) r[2]);
        JsonObject o = json(r);
        assertEquals("precedence-roll-v1/hmac-sha256", o.get("algorithm").getAsString());
        JsonArray order = o.getAsJsonArray("order");
        JsonArray faces = o.getAsJsonArray("faces");
        for (int p = 1; p < 3; p++) {
            assertTrue(new BigInteger(faces.get(order.get(p - 1).getAsInt()).getAsString())
                    .compareTo(new BigInteger(faces.get(order.get(p).getAsInt()).getAsString())) > 0);
        }
    }

    @Test
    void roll_textNamesEveryPlayer() {
        Object[] r = run("roll", "--players", "2", "--seed", "harbour", "--rule", "balanced-lead");
        assertEquals(0, r[0], (String) r[2]);
        String out = (String) r[1];
        assertTrue(out.contains("balanced-lead") && out.contains("1. player") && out.contains("commitment: "), out);
    }

    @Test
    void roll_badInputExitsTwoWithOneLine() {
        for (String[] args : new String[][] {
            {"roll", "--players", "0", "--seed", "x"},
            {"roll", "--players", "99", "--seed", "x"},
            {"roll", "--players", "3", "--seed", "x", "--round", "-1"},
            {"roll", "--players", "3", "--seed", "hex:12"},
            {"roll", "--players", "3", "--seed", " "},
            {"roll", "--players", "3", "--seed", "x", "--rule", "sideways"},
            {"roll", "--players", "3", "--seed", "x", "--mode", "medium"},
            {"roll", "--players", "three"},
        }) {
            Object[] r = run(args);
            assertEquals(ExitCodes.BAD_INPUT, r[0], String.join(" ", args));
            String err = (String) r[2];
            assertTrue(err.startsWith("precedence"), err);
            assertFalse(err.contains("\tat "), "no stack trace: " + err);
            assertEquals("", r[1]);
        }
    }

    @Test
    void replay_okTamperedAndMalformedExitCodes() throws IOException {
        Path log = dir.resolve("evening.json");
        Object[] r = run("roll", "--players", "3", "--seed", "evening at the mill", "--rounds", "6",
                "--rule", "snake", "--log", log.toString());
        assertEquals(0, r[0], (String) r[2]);
        r = run("replay", log.toString());
        assertEquals(0, r[0], (String) r[2]);
        assertTrue(((String) r[1]).startsWith("replay ok"), (String) r[1]);

        String text = Files.readString(log);
        JsonObject o = JsonParser.parseString(text).getAsJsonObject();
        JsonArray faces = o.getAsJsonArray("rounds").get(2).getAsJsonObject().getAsJsonArray("faces");
        String original = faces.get(1).getAsString();
        faces.set(1, new com.google.gson.JsonPrimitive(new BigInteger(original).add(BigInteger.TWO).toString()));
        Path tampered = dir.resolve("tampered.json");
        Files.writeString(tampered, o.toString());
        r = run("replay", tampered.toString(), "--format", "json");
        assertEquals(ExitCodes.CHECK_FAILED, r[0], (String) r[2]);
        JsonObject m = json(r).getAsJsonObject("mismatch");
        assertEquals(2, m.get("round").getAsLong());
        assertEquals(1, m.get("player").getAsInt());
        assertEquals(original, m.get("expected").getAsString());

        Path broken = dir.resolve("broken.json");
        Files.writeString(broken, text.substring(0, 40));
        for (String file : new String[] {broken.toString(), dir.resolve("missing.json").toString()}) {
            r = run("replay", file);
            assertEquals(ExitCodes.BAD_INPUT, r[0]);
            String err = (String) r[2];
            assertEquals(1, err.strip().lines().count(), err);
        }
    }

    @Test
    void replay_commitOnlyLogNeedsTheSeed() {
        Path log = dir.resolve("published.json");
        assertEquals(0, run("roll", "--players", "4", "--seed", "tidewater", "--rounds", "3", "--log", log.toString(),
                "--commit-only", "--format", "json")[0]);
        assertEquals(ExitCodes.BAD_INPUT, run("replay", log.toString())[0]);
        assertEquals(ExitCodes.OK, run("replay", log.toString(), "--seed", "tidewater")[0]);
        assertEquals(ExitCodes.CHECK_FAILED, run("replay", log.toString(), "--seed", "tidewaters")[0]);
        assertEquals(Set.of(log), Set.copyOf(listDir()));
    }

    private java.util.List<Path> listDir() {
        try (var s = Files.list(dir)) {
            return s.toList();
        } catch (IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
    }
}
