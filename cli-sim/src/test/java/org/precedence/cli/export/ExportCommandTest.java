package org.precedence.cli.export;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.math.BigInteger;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.stream.Stream;
import javax.xml.parsers.DocumentBuilderFactory;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.precedence.api.FairnessGrade;
import org.precedence.cli.PrecedenceApplication;
import org.precedence.cli.testing.ExplicitTestProvider;
import org.precedence.cli.testing.VerifiedSets;
import org.precedence.runtime.analysis.FairnessAnalysis;
import org.precedence.runtime.dice.DiceSet;
import org.precedence.runtime.dice.MixedRadixDice;
import org.precedence.runtime.source.SetSource;
import org.w3c.dom.Document;
import picocli.CommandLine;

class ExportCommandTest {
    static final ExplicitTestProvider SETS = new ExplicitTestProvider(Map.of(
            2, VerifiedSets.orderFair(2), 3, VerifiedSets.orderFair(3)));

    record Run(int code, String out, String err) {
    }

    static Run export(SetSource sets, String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        CommandLine cmd = PrecedenceApplication.configure(new CommandLine(new ExportCommand(() -> sets)));
        cmd.setOut(new PrintWriter(out, true));
        cmd.setErr(new PrintWriter(err, true));
        return new Run(cmd.execute(args), out.toString(), err.toString());
    }

    @Test
    void call_csvListsEveryFaceOnceAndIsTheServedSet() {
        Run run = export(SETS, "--players", "3", "--format", "csv");
        assertEquals(0, run.code(), run.err());
        List<String> lines = run.out().lines().toList();
        assertEquals("die,face,value", lines.get(0));
        assertTrue(run.out().contains("\r\n"), "RFC 4180 line ends");
        List<List<Long>> faces = List.of(new ArrayList<>(), new ArrayList<>(), new ArrayList<>());
        Set<Long> values = new HashSet<>();
        for (String line : lines.subList(1, lines.size())) {
            String[] f = line.split(",");
            long v = Long.parseLong(f[2]);
            faces.get(f[0].charAt(0) - 'A').add(v);
            assertTrue(values.add(v), "value " + v + " printed twice");
        }
        assertEquals(108, values.size());
        // Rebuild the dice from the printed list and check them exactly: what is printed is order-fair.
        long[][] dice = new long[3][];
        for (int d = 0; d < 3; d++) {
            dice[d] = faces.get(d).stream().mapToLong(Long::longValue).toArray();
            assertEquals(36, dice[d].length);
        }
        assertTrue(FairnessAnalysis.analyse(DiceSet.of(dice)).orderFair());
    }

    @Test
    void call_markdownNamesEveryDie() {
        Run run = export(SETS, "--players", "2", "--format", "md");
        assertEquals(0, run.code(), run.err());
        assertTrue(run.out().startsWith("# Order-fair dice for 2 players"));
        assertTrue(run.out().contains("| A | 2 | 1, 4 |"), run.out());
        assertTrue(run.out().contains("| B | 2 | 2, 3 |"));
        assertTrue(run.out().contains("lowest number acts first"));
    }

    @Test
    void call_svgSheetParsesAndHasOneLabelPerFace(@TempDir Path dir) throws Exception {
        Path file = dir.resolve("labels.svg");
        Run run = export(SETS, "--players", "3", "--format", "svg", "--output", file.toString());
        assertEquals(0, run.code(), run.err());
        assertEquals("", run.out());
        DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
        f.setNamespaceAware(true);
        Document doc = f.newDocumentBuilder().parse(file.toFile());
        assertEquals("svg", doc.getDocumentElement().getLocalName());
        assertEquals(108, doc.getElementsByTagNameNS("http://www.w3.org/2000/svg", "rect").getLength());
        try (Stream<Path> files = Files.list(dir)) {
            assertEquals(1, files.count());
        }
    }

    @Test
    void misreadUpsideDown_onlyNumbersThatTurnIntoOthers() {
        // Common practice on dice, no source: mark a number that reads as another one when the
        // die lies upside down.
        for (long v : new long[] {6, 9, 16, 19, 61, 66, 68, 86, 89, 98, 99, 106}) {
            assertTrue(FaceSheets.misreadUpsideDown(v), v + " turns into another number");
        }
        for (long v : new long[] {1, 8, 11, 69, 88, 96, 10, 60, 26, 36, 7, 12, 101}) {
            assertFalse(FaceSheets.misreadUpsideDown(v), v + " cannot be misread");
        }
    }

    @Test
    void call_constructedSetIsRefusedWithExitTwo() {
        SetSource constructed = new SetSource() {
            @Override
            public MixedRadixDice forPlayers(int players, FairnessGrade grade) {
                return new HugeDice(players);
            }

            @Override
            public int maxPlayers() {
                return 10;
            }
        };
        Run run = export(constructed, "--players", "7", "--format", "csv");
        assertEquals(2, run.code());
        assertEquals("", run.out());
        assertEquals(1, run.err().lines().count(), run.err());
        assertTrue(run.err().contains("constructed") && run.err().contains("only catalog sets"), run.err());
    }

    @Test
    void call_badInputExitsTwoWithoutFiles(@TempDir Path dir) throws Exception {
        String[][] bad = {
            {"--players", "1", "--format", "csv"},
            {"--players", "5", "--format", "csv"},
            {"--players", "x", "--format", "csv"},
            {"--players", "3", "--format", "pdf"},
            {"--players", "3"},
            {"--players", "3", "--format", "csv", "--output", dir.resolve("no/such/dir.csv").toString()},
            {"--players", "3", "--format", "csv", "--output", dir.toString()},
        };
        for (String[] args : bad) {
            Run run = export(SETS, args);
            assertEquals(2, run.code(), String.join(" ", args) + ": " + run.err());
            assertEquals("", run.out());
            assertFalse(run.err().contains("\tat "), run.err());
        }
        try (Stream<Path> files = Files.list(dir)) {
            assertEquals(0, files.count());
        }
    }

    /** A stand-in for a constructed set: two digits per face, 10^30 faces per die. */
    private record HugeDice(int players) implements MixedRadixDice {
        @Override
        public String id() {
            return "constructed-test";
        }

        @Override
        public String sha256() {
            return "0".repeat(64);
        }

        @Override
        public int digits() {
            return 2;
        }

        @Override
        public BigInteger radix(int die, int digit) {
            return BigInteger.TEN.pow(15);
        }

        @Override
        public int compare(int a, int b, FaceDigits faces) {
            return Integer.compare(a, b);
        }

        @Override
        public BigInteger faceValue(int die, BigInteger[] digits) {
            return BigInteger.ONE;
        }

        @Override
        public FairnessGrade grade() {
            return FairnessGrade.ORDER_FAIR;
        }

        @Override
        public int subsetDepth() {
            return players;
        }
    }
}
