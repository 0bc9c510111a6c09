package org.precedence.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import org.junit.jupiter.api.Test;
import org.precedence.api.RankingConvention;
import org.precedence.runtime.analysis.FairnessAnalysis;
import org.precedence.runtime.dice.Word;

class SearchCommandTest {

    private static JsonObject json(CliRun run) {
        assertEquals(0, run.exit(), run.err());
        return JsonParser.parseString(run.out()).getAsJsonObject();
    }

    @Test
    void search_threeDiceSixSides_jsonHasContractFields() {
        JsonObject o = json(CliRun.of("search", "--players", "3", "--sides", "6", "--format", "json"));
        assertEquals(3, o.get("players").getAsInt());
        assertEquals("[6,6,6]", o.get("sides").toString());
        assertTrue(o.get("complete").getAsBoolean());
        // Fact of the trade (common practice, no source): six classes.
        assertEquals(6, o.get("classes").getAsInt());
        assertEquals(6, o.getAsJsonArray("words").size());
        assertTrue(o.get("solutions").getAsLong() > 6);
        for (var w : o.getAsJsonArray("words")) {
            assertTrue(FairnessAnalysis.analyse(Word.parse(w.getAsString()),
                    RankingConvention.LOWEST_FIRST).orderFair());
        }
    }

    @Test
    void search_sidesList246_findsThreeClasses() {
        // OEIS A362634: three dice with 2, 4 and 6 sides can be order-fair.
        JsonObject o = json(CliRun.of("search", "--players", "3", "--sides-list", "2,4,6",
                "--format", "json", "--all"));
        assertEquals("[2,4,6]", o.get("sides").toString());
        assertEquals(3, o.get("classes").getAsInt());
    }

    @Test
    void search_impossible_answersAtOnceWithReason() {
        JsonObject o = json(CliRun.of("search", "--players", "3", "--sides", "4", "--format", "json"));
        assertTrue(o.get("complete").getAsBoolean());
        assertEquals(0, o.get("solutions").getAsInt());
        assertEquals(0, o.get("classes").getAsInt());
        assertTrue(o.get("reason").getAsString().contains("not divisible by 3! = 6"),
                o.get("reason").getAsString());
    }

    @Test
    void search_fourDiceSixSides_textSaysNone() {
        CliRun run = CliRun.of("search", "--players", "4", "--sides", "6");
        assertEquals(0, run.exit(), run.err());
        assertTrue(run.out().contains("complete: yes — 0 labelled sets, 0 classes"), run.out());
    }

    @Test
    void search_structuredFourDiceTwelveSides_findsSomeIncomplete() {
        JsonObject o = json(CliRun.of("search", "--players", "4", "--sides", "12",
                "--method", "structured", "--format", "json"));
        assertFalse(o.get("complete").getAsBoolean());
        assertFalse(o.has("solutions"));
        assertTrue(o.getAsJsonArray("words").size() > 0);
        for (var w : o.getAsJsonArray("words")) {
            assertTrue(FairnessAnalysis.analyse(Word.parse(w.getAsString()),
                    RankingConvention.LOWEST_FIRST).orderFair());
        }
    }

    @Test
    void search_timeLimit_reportsIncomplete() {
        JsonObject o = json(CliRun.of("search", "--players", "3", "--sides", "12",
                "--time-limit", "0.3", "--threads", "1", "--format", "json"));
        assertFalse(o.get("complete").getAsBoolean());
        assertEquals("time limit reached", o.get("reason").getAsString());
    }

    @Test
    void search_badArguments_exitTwoWithOneLine() {
        String[][] bad = {
            {"search", "--players", "1", "--sides", "2"},
            {"search", "--players", "9", "--sides", "2"},
            {"search", "--players", "3", "--sides", "0"},
            {"search", "--players", "3"},
            {"search", "--players", "3", "--sides", "6", "--sides-list", "6,6,6"},
            {"search", "--players", "3", "--sides-list", "6,6"},
            {"search", "--players", "3", "--sides", "6", "--threads", "0"},
            {"search", "--players", "3", "--sides", "6", "--time-limit", "-1"},
            {"search", "--players", "3", "--sides-list", "2,4,6", "--method", "structured"},
            {"search", "--players", "x", "--sides", "6"},
        };
        for (String[] args : bad) {
            CliRun run = CliRun.of(args);
            assertEquals(ExitCodes.BAD_INPUT, run.exit(), String.join(" ", args) + ": " + run.err());
            assertTrue(run.err().startsWith("precedence"), run.err());
            assertFalse(run.err().contains("Exception"), run.err());
        }
    }
}
