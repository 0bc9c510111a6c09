package org.precedence.cli.simulate;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.google.gson.JsonArray;
import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import java.util.stream.Stream;
import javax.xml.parsers.DocumentBuilderFactory;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.precedence.cli.testing.ExplicitTestProvider;
import org.precedence.cli.testing.VerifiedSets;
import org.w3c.dom.Document;

class SimulateCommandTest {
    static final ExplicitTestProvider FAIR = new ExplicitTestProvider(Map.of(
            2, VerifiedSets.orderFair(2), 3, VerifiedSets.orderFair(3), 4, VerifiedSets.orderFair(4)));
    static final ExplicitTestProvider UNFAIR = new ExplicitTestProvider(Map.of(3, VerifiedSets.unfairThree()));

    static CommandRun simulate(ExplicitTestProvider provider, String... args) {
        return CommandRun.of(new SimulateCommand(() -> provider, false), args);
    }

    @Test
    void call_fairSetsPassAtFixedSeeds() {
        // The sets are order-fair by exact count (VerifiedSets); at these fixed seeds the run is
        // deterministic, so the assertion cannot flake.
        for (String seed : new String[] {"meadow", "harbour", "lantern"}) {
            CommandRun run = simulate(FAIR, "--players", "2,3,4", "--sessions", "40", "--rounds", "500",
                    "--seed", seed, "--format", "json", "--quiet");
            assertEquals(0, run.exitCode(), run.err());
            JsonArray results = JsonParser.parseString(run.out()).getAsJsonObject().getAsJsonArray("results");
            for (var r : results) {
                double p = r.getAsJsonObject().get("pValue").getAsDouble();
                assertTrue(p > 1e-4, "fair set flagged at seed " + seed + ": p = " + p);
            }
        }
    }

    @Test
    void call_withoutSeed_drawsOneAndPrintsItSoTheRunRepeats() {
        CommandRun first = simulate(FAIR, "--players", "3", "--sessions", "5", "--rounds", "50",
                "--format", "json", "--quiet");
        assertEquals(0, first.exitCode(), first.err());
        String seed = JsonParser.parseString(first.out()).getAsJsonObject().get("seed").getAsString();
        assertTrue(seed.matches("hex:[0-9a-f]{64}"), seed);
        CommandRun again = simulate(FAIR, "--players", "3", "--sessions", "5", "--rounds", "50",
                "--format", "json", "--quiet", "--seed", seed);
        assertEquals(first.out(), again.out());
    }

    @Test
    void call_unfairSetIsFlagged() {
        CommandRun run = simulate(UNFAIR, "--players", "3", "--sessions", "20", "--rounds", "500",
                "--seed", "meadow", "--format", "json", "--quiet");
        assertEquals(1, run.exitCode(), "a check failed: " + run.err());
        JsonObject o = JsonParser.parseString(run.out()).getAsJsonObject();
        assertTrue(o.get("pValue").getAsDouble() < 1e-6);
        assertTrue(o.get("gTestPValue").getAsDouble() < 1e-6);
        assertTrue(o.get("flagged").getAsBoolean());
    }

    @Test
    void call_jsonContractFieldsAndCountsAddUp() {
        CommandRun run = simulate(FAIR, "--players", "4", "--sessions", "30", "--rounds", "200",
                "--seed", "contract", "--format", "json", "--quiet", "--compare");
        assertEquals(0, run.exitCode(), run.err());
        JsonObject o = JsonParser.parseString(run.out()).getAsJsonObject();
        assertEquals(4, o.get("players").getAsInt());
        assertEquals(6000, o.get("rounds").getAsLong());
        JsonObject orders = o.getAsJsonObject("orderCounts");
        assertEquals(24, orders.size());
        long sum = orders.entrySet().stream().mapToLong(e -> e.getValue().getAsLong()).sum();
        assertEquals(6000, sum);
        JsonArray seats = o.getAsJsonArray("seatCounts");
        for (var row : seats) {
            long rowSum = 0;
            for (var v : row.getAsJsonArray()) {
                rowSum += v.getAsLong();
            }
            assertEquals(6000, rowSum);
        }
        assertTrue(o.has("chiSquare") && o.has("pValue") && o.has("gTestPValue"));
        assertTrue(o.getAsJsonObject("firstPlayerStreaks").has("longest"));
        assertTrue(o.getAsJsonObject("spread").has("lopsidedFraction"));
        JsonObject balanced = o.getAsJsonObject("balancedLead");
        assertEquals(0.0, balanced.getAsJsonObject("spread").get("lopsidedFraction").getAsDouble());
        JsonArray compare = o.getAsJsonArray("compare");
        assertEquals(2, compare.size());
        assertEquals("shuffle", compare.get(0).getAsJsonObject().get("source").getAsString());
        JsonObject dice = compare.get(1).getAsJsonObject();
        assertEquals("d6 re-roll", dice.get("source").getAsString());
        assertEquals(6000, dice.get("rounds").getAsLong());
        JsonObject throwsTaken = dice.getAsJsonObject("throws");
        assertEquals(3.6, throwsTaken.get("expectedPerRound").getAsDouble(), 1e-12);
        // 6,000 rounds, geometric throws with mean 3.6 and sd sqrt(2.6·3.6) ≈ 3.06: the mean
        // has standard error ≈ 0.04; allow 5 of them.
        assertEquals(3.6, throwsTaken.get("perRound").getAsDouble(), 0.2);
        assertEquals(throwsTaken.get("throws").getAsLong() - 6000, throwsTaken.get("rerolls").getAsLong());
    }

    @Test
    void call_resultIndependentOfThreads() {
        String[] base = {"--players", "3", "--sessions", "64", "--rounds", "100", "--seed", "threads",
            "--format", "json", "--quiet", "--compare"};
        String one = simulate(FAIR, concat(base, "--threads", "1")).out();
        String five = simulate(FAIR, concat(base, "--threads", "5")).out();
        assertEquals(one, five);
    }

    @Test
    void call_textReportSpeaksPlainly() {
        CommandRun run = simulate(FAIR, "--players", "3", "--sessions", "10", "--rounds", "100",
                "--seed", "plain", "--quiet", "--compare");
        assertEquals(0, run.exitCode(), run.err());
        assertTrue(run.out().contains("Nothing suspicious"), run.out());
        assertTrue(run.out().contains("Who acted where"));
        assertTrue(run.out().contains("Balanced lead mode"));
        assertTrue(run.out().contains("re-rolls"));
        assertEquals("", run.err(), "no progress bar without a terminal");
    }

    @Test
    void call_plotIsValidSvgWrittenWhole(@TempDir Path dir) throws Exception {
        Path svg = dir.resolve("fairness.svg");
        CommandRun run = simulate(FAIR, "--players", "3,4", "--sessions", "10", "--rounds", "300",
                "--seed", "picture", "--quiet", "--plot", svg.toString());
        assertEquals(0, run.exitCode(), run.err());
        DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
        f.setNamespaceAware(true);
        Document doc = f.newDocumentBuilder().parse(svg.toFile());
        assertEquals("svg", doc.getDocumentElement().getLocalName());
        assertEquals("http://www.w3.org/2000/svg", doc.getDocumentElement().getNamespaceURI());
        assertTrue(doc.getElementsByTagNameNS("http://www.w3.org/2000/svg", "rect").getLength() > 24 + 6 + 16 + 9);
        try (Stream<Path> files = Files.list(dir)) {
            assertEquals(1, files.count(), "no temporary file left behind");
        }
    }

    @Test
    void call_badInputIsOneLineAndExitTwo(@TempDir Path dir) throws IOException {
        String[][] bad = {
            {"--players", "four", "--seed", "x"},
            {"--players", "1", "--seed", "x"},
            {"--players", "3,3", "--seed", "x"},
            {"--players", "9", "--seed", "x"},
            {"--players", "3", "--seed", "x", "--sessions", "0"},
            {"--players", "3", "--seed", "x", "--rounds", "-5"},
            {"--players", "3", "--seed", "x", "--rounds", "12abc"},
            {"--players", "3", "--seed", "x", "--threads", "0"},
            {"--players", "3", "--seed", "x", "--mode", "turbo"},
            {"--players", "3", "--seed", "x", "--bogus"},
            {"--players", "3", "--seed", "hex:12"},
            {"--players", "4", "--seed", "x", "--compare", "--compare-sides", "3"},
            {"--players", "3", "--seed", "x", "--plot", dir.resolve("missing/dir/p.svg").toString()},
            {"--players", "3", "--seed", "x", "--plot", dir.toString()},
            {"--players", "3", "--seed", "x", "--plot", dir.resolve("p.png").toString()},
        };
        for (String[] args : bad) {
            CommandRun run = simulate(FAIR, args);
            assertEquals(2, run.exitCode(), String.join(" ", args) + " → " + run.err());
            assertEquals("", run.out(), "nothing on stdout for " + String.join(" ", args));
            String first = run.err().lines().findFirst().orElse("");
            assertTrue(first.startsWith("precedence"), first);
            assertFalse(run.err().contains("\tat "), "no stack trace: " + run.err());
        }
        try (Stream<Path> files = Files.list(dir)) {
            assertEquals(0, files.count(), "no file written on bad input");
        }
    }

    @Test
    void call_moreThanSixPlayersReportsSeatsAndLeads(@TempDir Path dir) throws Exception {
        // 7 dice: "ABCDEFG" followed by its reverse (2 faces per die; any 7-dice set will do
        // here, this tests the summary path, not fairness).
        int[] letters = new int[14];
        for (int i = 0; i < 7; i++) {
            letters[i] = i;
            letters[13 - i] = i;
        }
        org.precedence.runtime.dice.Word w = org.precedence.runtime.dice.Word.of(7, letters);
        var report = org.precedence.runtime.analysis.FairnessAnalysis.analyse(w.toDiceSet());
        ExplicitTestProvider seven = new ExplicitTestProvider(Map.of(7, new org.precedence.runtime.dice.ExplicitDice(
                "test-7", w.toDiceSet(), report.grade(), report.subsetDepth())));
        Path svg = dir.resolve("seven.svg");
        CommandRun run = simulate(seven, "--players", "7", "--sessions", "10", "--rounds", "700",
                "--seed", "seven", "--format", "json", "--quiet", "--plot", svg.toString());
        assertTrue(run.exitCode() == 0 || run.exitCode() == 1, run.err());
        JsonObject o = JsonParser.parseString(run.out()).getAsJsonObject();
        assertFalse(o.has("orderCounts"), "5,040 rankings are summarised, not listed");
        assertEquals("seats", o.get("testedOn").getAsString());
        assertEquals(36, o.get("degreesOfFreedom").getAsInt());
        assertEquals("first players", o.getAsJsonObject("gTest").get("on").getAsString());
        long leads = 0;
        for (var v : o.getAsJsonArray("leadCounts")) {
            leads += v.getAsLong();
        }
        assertEquals(7000, leads);
        DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
        f.setNamespaceAware(true);
        assertEquals("svg", f.newDocumentBuilder().parse(svg.toFile()).getDocumentElement().getLocalName());
    }

    @Test
    void call_fivePlayersListsTheExtremesInTextAndAllInJson() {
        // "ABCDE" followed by its reverse: 2 faces per die, not order-fair (tests the listing only).
        org.precedence.runtime.dice.Word w = org.precedence.runtime.dice.Word.parse("ABCDEEDCBA");
        var report = org.precedence.runtime.analysis.FairnessAnalysis.analyse(w.toDiceSet());
        ExplicitTestProvider five = new ExplicitTestProvider(Map.of(5, new org.precedence.runtime.dice.ExplicitDice(
                "test-5", w.toDiceSet(), report.grade(), report.subsetDepth())));
        CommandRun text = simulate(five, "--players", "5", "--sessions", "4", "--rounds", "300", "--seed", "five", "--quiet");
        assertTrue(text.out().contains("rarest four and commonest four shown"), text.out());
        CommandRun json = simulate(five, "--players", "5", "--sessions", "4", "--rounds", "300", "--seed", "five",
                "--quiet", "--format", "json");
        JsonObject orders = JsonParser.parseString(json.out()).getAsJsonObject().getAsJsonObject("orderCounts");
        assertEquals(120, orders.size());
        // Only 2^5 = 32 outcomes exist, so at most 32 rankings can ever appear.
        assertTrue(orders.entrySet().stream().filter(e -> e.getValue().getAsLong() > 0).count() <= 32);
        assertEquals(text.exitCode(), json.exitCode());
    }

    @Test
    void call_interruptedRunPrintsThePartialResult() {
        // What Ctrl-C does (through the shutdown hook): request cancellation while the run is
        // going. Here it is requested from inside the provider after 20,000 rolls.
        java.util.concurrent.atomic.AtomicReference<Cancellation> cancel = new java.util.concurrent.atomic.AtomicReference<>();
        java.util.concurrent.atomic.AtomicLong rolls = new java.util.concurrent.atomic.AtomicLong();
        org.precedence.api.TurnOrderProvider stopping = new org.precedence.api.TurnOrderProvider() {
            @Override
            public org.precedence.api.TurnOrderSource open(org.precedence.api.SessionSpec spec) {
                org.precedence.api.TurnOrderSource inner = FAIR.open(spec);
                return new org.precedence.api.TurnOrderSource() {
                    @Override
                    public org.precedence.api.SessionSpec spec() {
                        return spec;
                    }

                    @Override
                    public org.precedence.api.RoundResult roll(long round, int playerCount) {
                        if (rolls.incrementAndGet() == 20_000) {
                            cancel.get().request();
                        }
                        return inner.roll(round, playerCount);
                    }
                };
            }

            @Override
            public int maxPlayers() {
                return FAIR.maxPlayers();
            }

            @Override
            public String name() {
                return "stopping";
            }
        };
        String[] args = {"--players", "3,4", "--sessions", "10", "--rounds", "10000", "--seed", "stop",
            "--quiet", "--threads", "2"};
        CommandRun json = CommandRun.of(new SimulateCommand(() -> stopping, false, cancel::set),
                concat(args, "--format", "json"));
        assertEquals(0, json.exitCode(), json.err());
        JsonObject root = JsonParser.parseString(json.out()).getAsJsonObject();
        assertFalse(root.get("complete").getAsBoolean());
        assertEquals(2, root.getAsJsonArray("playerCounts").size(), "the shape follows what was asked for");
        assertEquals(1, root.getAsJsonArray("results").size(), "stopped during the first player count");
        JsonObject o = root.getAsJsonArray("results").get(0).getAsJsonObject();
        assertFalse(o.get("complete").getAsBoolean());
        assertEquals(3, o.get("players").getAsInt());
        long rounds = o.get("rounds").getAsLong();
        assertTrue(rounds >= 20_000 - 2 && rounds < 100_000, "partial: " + rounds);
        long sum = o.getAsJsonObject("orderCounts").entrySet().stream().mapToLong(e -> e.getValue().getAsLong()).sum();
        assertEquals(rounds, sum, "counts add up to the rounds simulated");

        rolls.set(0);
        CommandRun text = CommandRun.of(new SimulateCommand(() -> stopping, false, cancel::set), args);
        assertTrue(text.out().contains("INTERRUPTED"), text.out());
        assertTrue(text.out().contains("(partial)"));
    }

    @Test
    void call_benchmarkReportsBothPeersAndRatios() {
        CommandRun run = simulate(FAIR, "--players", "3", "--sessions", "4", "--rounds", "2000",
                "--seed", "bench", "--benchmark", "--format", "json");
        assertEquals(0, run.exitCode(), run.err());
        JsonObject row = JsonParser.parseString(run.out()).getAsJsonObject().getAsJsonArray("results")
                .get(0).getAsJsonObject();
        assertEquals(3, row.get("players").getAsInt());
        assertEquals(8000, row.get("roundsPerRepetition").getAsLong());
        double precedence = row.get("precedenceRoundsPerSecond").getAsDouble();
        double jdk = row.get("collectionsShuffleRoundsPerSecond").getAsDouble();
        double xoro = row.get("fisherYatesXoroshiroRoundsPerSecond").getAsDouble();
        assertTrue(precedence > 0 && jdk > 0 && xoro > 0);
        assertEquals(precedence / jdk, row.get("ratioToCollectionsShuffle").getAsDouble(), 1e-9);
        assertEquals(precedence / xoro, row.get("ratioToFisherYatesXoroshiro").getAsDouble(), 1e-9);
    }

    private static String[] concat(String[] a, String... b) {
        String[] r = java.util.Arrays.copyOf(a, a.length + b.length);
        System.arraycopy(b, 0, r, a.length, b.length);
        return r;
    }
}
