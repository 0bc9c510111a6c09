package org.precedence.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.math.BigInteger;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;

class VerifyCommandTest {
    /** The examples shipped in docs/examples (tests run with the module as working directory). */
    private static final Path EXAMPLES = Path.of("..", "docs", "examples");

    /** Three order-fair 6-sided dice (word ABCCBABACCABCBAABC, found by the runtime tests' search). */
    private static final String FAIR_TEXT = "# fair\nA: 1 6 8 11 15 16\nB: 2 5 7 12 14 17\nC: 3 4 9 10 13 18\n";

    record Run(int exit, String out, String err) {
    }

    private static Run run(String stdin, String... args) {
        CommandLine cmd = PrecedenceApplication.commandLine();
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        cmd.setOut(new PrintWriter(out));
        cmd.setErr(new PrintWriter(err));
        InputStream saved = System.in;
        try {
            if (stdin != null) {
                System.setIn(new ByteArrayInputStream(stdin.getBytes(StandardCharsets.UTF_8)));
            }
            int exit = cmd.execute(args);
            return new Run(exit, out.toString(), err.toString());
        } finally {
            System.setIn(saved);
        }
    }

    private static void assertOneLineError(Run r, String contains) {
        assertEquals(ExitCodes.BAD_INPUT, r.exit(), r.err());
        assertEquals("", r.out());
        assertTrue(r.err().contains(contains), r.err());
        assertEquals(1, r.err().strip().lines().count(), "one line: " + r.err());
        assertFalse(r.err().contains("Exception") || r.err().contains("\tat "), r.err());
    }

    @Test
    void verify_orderFairTextFile_exitsZeroWithFullTable(@TempDir Path dir) throws IOException {
        Path file = dir.resolve("fair.txt");
        Files.writeString(file, FAIR_TEXT);
        Run r = run(null, "verify", file.toString());
        assertEquals(ExitCodes.OK, r.exit(), r.err());
        assertTrue(r.out().contains("Players:      3 dice"), r.out());
        assertTrue(r.out().contains("Sides:        6 6 6 (18 faces)"), r.out());
        assertTrue(r.out().contains("Outcomes:     216 equally likely"), r.out());
        assertTrue(r.out().contains("Grade:        order-fair (order-fair: yes, seat-fair: yes, lead-fair: yes)"));
        assertTrue(r.out().contains("Subset depth: 3"), r.out());
        assertTrue(r.out().contains("Convention:   lowest value acts first"), r.out());
        for (String ranking : new String[] {"ABC", "ACB", "BAC", "BCA", "CAB", "CBA"}) {
            assertTrue(r.out().contains("  " + ranking + "         36  16.667%"), r.out());
        }
        assertTrue(r.out().contains("  A      72    72    72"), r.out());
        assertTrue(r.out().contains("Verdict: order-fair"), r.out());
    }

    @Test
    void verify_jsonFormat_hasTheContractFields() {
        Run r = run(FAIR_TEXT, "verify", "--format", "json");
        assertEquals(ExitCodes.OK, r.exit(), r.err());
        JsonObject o = JsonParser.parseString(r.out()).getAsJsonObject();
        assertEquals(3, o.get("players").getAsInt());
        assertEquals("[6,6,6]", o.get("sides").toString());
        assertTrue(o.get("orderFair").getAsBoolean());
        assertTrue(o.get("seatFair").getAsBoolean());
        assertTrue(o.get("leadFair").getAsBoolean());
        assertEquals(3, o.get("subsetDepth").getAsInt());
        assertEquals("36", o.get("minCount").getAsString());
        assertEquals("36", o.get("maxCount").getAsString());
        JsonObject counts = o.getAsJsonObject("orderCounts");
        assertEquals(6, counts.size());
        for (Map.Entry<String, com.google.gson.JsonElement> e : counts.entrySet()) {
            assertTrue(e.getValue().getAsJsonPrimitive().isString(), "counts are decimal strings");
            assertEquals("36", e.getValue().getAsString(), e.getKey());
        }
        assertEquals("order-fair", o.get("grade").getAsString());
        assertEquals("lowest-first", o.get("convention").getAsString());
        assertEquals(64, o.get("sha256").getAsString().length());
        assertTrue(o.get("worstRanking").isJsonNull());
        assertEquals(0, o.get("totalVariation").getAsBigDecimal().signum());
        assertEquals("[[\"72\",\"72\",\"72\"],[\"72\",\"72\",\"72\"],[\"72\",\"72\",\"72\"]]",
                o.get("seatCounts").toString());
    }

    @Test
    void verify_unfairSet_exitsOneWithExtremes() {
        // ABC: A always lowest. Counts by hand: ABC gets the single outcome.
        Run r = run("{\"dice\": [[1], [2], [3]]}", "verify", "--format", "json");
        assertEquals(ExitCodes.CHECK_FAILED, r.exit(), r.err());
        JsonObject o = JsonParser.parseString(r.out()).getAsJsonObject();
        assertFalse(o.get("orderFair").getAsBoolean());
        assertFalse(o.get("leadFair").getAsBoolean());
        assertEquals("unfair", o.get("grade").getAsString());
        assertEquals("1", o.getAsJsonObject("orderCounts").get("ABC").getAsString());
        assertEquals("0", o.getAsJsonObject("orderCounts").get("CBA").getAsString());
        assertEquals("ABC", o.get("worstRanking").getAsString());
        assertEquals(1, o.get("subsetDepth").getAsInt());
        Run t = run("{\"dice\": [[1], [2], [3]]}", "verify");
        assertEquals(ExitCodes.CHECK_FAILED, t.exit());
        assertTrue(t.out().contains("worst ranking:   ABC"), t.out());
        assertTrue(t.out().contains("Verdict: not order-fair."), t.out());
    }

    @Test
    void verify_descending_flipsTheActingOrder() {
        Run r = run("1\n2\n3\n", "verify", "--descending", "--format", "json");
        assertEquals(ExitCodes.CHECK_FAILED, r.exit());
        JsonObject o = JsonParser.parseString(r.out()).getAsJsonObject();
        assertEquals("highest-first", o.get("convention").getAsString());
        assertEquals("1", o.getAsJsonObject("orderCounts").get("CBA").getAsString());
        assertEquals("CBA", o.get("worstRanking").getAsString());
        assertEquals("1", o.getAsJsonArray("seatCounts").get(2).getAsJsonArray().get(0).getAsString(),
                "C, the highest, acts first");
        Run t = run("1\n2\n3\n", "verify", "--descending");
        assertTrue(t.out().contains("Convention:   highest value acts first (--descending)"), t.out());
    }

    @Test
    void verify_stdinWithDashOrNoArgument_andForcedInputForm() {
        assertEquals(ExitCodes.OK, run(FAIR_TEXT, "verify", "-").exit());
        assertEquals(ExitCodes.OK, run(FAIR_TEXT, "verify").exit());
        assertEquals(ExitCodes.OK, run(FAIR_TEXT, "verify", "--input", "text").exit());
        assertOneLineError(run("{\"dice\": [[1, 4], [2, 3]]}", "verify", "--input", "text"),
                "standard input: line 1, column 10: '[[1' is not a face value");
        assertOneLineError(run(FAIR_TEXT, "verify", "--input", "json"),
                "standard input: line 1, column 1: malformed JSON");
    }

    @Test
    void verify_badInput_exitsTwoWithOneLineAndPosition(@TempDir Path dir) throws IOException {
        assertOneLineError(run("{\"dice\": [\n  [1, 2],\n  [3, 4,]\n]}", "verify"),
                "precedence verify: standard input: line 3, column 9: malformed JSON");
        assertOneLineError(run("{\"dice\": [[1, 2], [3, 99999999999999999999]]}", "verify"),
                "line 1, column 23: value 99999999999999999999 out of range");
        assertOneLineError(run("A: 1\nB: 2 17\nC: 4\nD: 5 17\n", "verify"),
                "line 4, column 6: duplicate value 17 on dice B and D");
        assertOneLineError(run("{\"dice\": [[1], [2], []]}", "verify"), "line 1, column 21: die C is empty");
        assertOneLineError(run("", "verify"), "no dice in the input");
        assertOneLineError(run(null, "verify", dir.resolve("missing.json").toString()), "no such file");
        assertOneLineError(run(null, "verify", dir.toString()), "is a directory");
        Path bad = dir.resolve("bad.txt");
        Files.writeString(bad, "A: 1 2\nB: 3 x\n");
        assertOneLineError(run(null, "verify", bad.toString()), bad + ": line 2, column 6: 'x' is not a face value");
        assertEquals(ExitCodes.BAD_INPUT, run(null, "verify", "--input", "yaml").exit());
    }

    @Test
    void verify_twelveDice_isRefusedWithTheLimit() {
        StringBuilder s = new StringBuilder();
        for (int d = 0; d < 12; d++) {
            s.append(d + 1).append('\n');
        }
        assertOneLineError(run(s.toString(), "verify"), "at most 11 dice");
    }

    @Test
    void verify_sevenDice_showsExtremesInsteadOfTheTable() {
        StringBuilder s = new StringBuilder();
        for (int d = 0; d < 7; d++) {
            s.append(d + 1).append(' ').append(14 - d).append('\n'); // each die i: i+1 and 14-i
        }
        Run r = run(s.toString(), "verify");
        assertEquals(ExitCodes.CHECK_FAILED, r.exit(), r.err());
        assertTrue(r.out().contains("Rankings: 5040 (full table shown up to 6 dice)"), r.out());
        assertFalse(r.out().contains("ranking  count"), r.out());
        assertTrue(r.out().contains("min count:"), r.out());
        assertTrue(r.out().contains("total variation:"), r.out());
        assertTrue(r.out().contains("Seats"), r.out());
        // A word followed by its reverse has subset depth 2 (brief §5).
        assertTrue(r.out().contains("Subset depth: 2"), r.out());
        JsonObject o = JsonParser.parseString(run(s.toString(), "verify", "--format", "json").out())
                .getAsJsonObject();
        assertEquals(5040, o.getAsJsonObject("orderCounts").size());
        BigInteger sum = BigInteger.ZERO;
        for (var e : o.getAsJsonObject("orderCounts").entrySet()) {
            sum = sum.add(e.getValue().getAsBigInteger());
        }
        assertEquals(BigInteger.valueOf(128), sum, "2^7 outcomes shared out");
    }

    @Test
    void verify_shippedExamples_haveTheClaimedVerdicts() {
        Run wardens = run(null, "verify", EXAMPLES.resolve("three-wardens.txt").toString());
        assertEquals(ExitCodes.OK, wardens.exit(), wardens.err());
        assertTrue(wardens.out().contains("Subset depth: 3"));
        Run mixed = run(null, "verify", EXAMPLES.resolve("mixed-246.json").toString(), "--format", "json");
        assertEquals(ExitCodes.OK, mixed.exit(), mixed.err());
        assertEquals("[2,4,6]", JsonParser.parseString(mixed.out()).getAsJsonObject().get("sides").toString());
        Run robin = run(null, "verify", EXAMPLES.resolve("round-robin-four.json").toString());
        assertEquals(ExitCodes.CHECK_FAILED, robin.exit(), robin.err());
        assertTrue(robin.out().contains("Amber"), robin.out());
    }
}
