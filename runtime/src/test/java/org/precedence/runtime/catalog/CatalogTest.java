package org.precedence.runtime.catalog;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.precedence.api.FairnessGrade;
import org.precedence.runtime.analysis.FairnessAnalysis;
import org.precedence.runtime.analysis.FairnessReport;
import org.precedence.runtime.dice.DiceSet;
import org.precedence.runtime.dice.ExplicitDice;

class CatalogTest {

    private static String shippedText() throws IOException {
        try (InputStream in = Catalog.class.getResourceAsStream(Catalog.RESOURCE)) {
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        }
    }

    @Test
    void shipped_isLoadedOnce() {
        assertSame(Catalog.shipped(), Catalog.shipped());
    }

    @Test
    void shipped_everyEntryReverifiedExactly() {
        for (CatalogEntry e : Catalog.shipped().entries()) {
            DiceSet set = e.toDiceSet();
            FairnessReport r = FairnessAnalysis.analyse(set);
            assertEquals(e.grade(), r.grade(), e.id());
            assertEquals(e.subsetDepth(), r.subsetDepth(), e.id());
            assertEquals(e.sha256(), set.word().sha256(), e.id());
            assertEquals(e.players(), set.players(), e.id());
            assertEquals(e.sides(), Stream.of(set.sides()).flatMapToInt(java.util.Arrays::stream)
                    .boxed().toList(), e.id());
        }
    }

    @Test
    void shipped_everySubsetOfAnOrderFairEntryIsOrderFair() {
        for (CatalogEntry e : Catalog.shipped().entries()) {
            if (e.grade() != FairnessGrade.ORDER_FAIR) {
                continue;
            }
            DiceSet set = e.toDiceSet();
            int n = set.players();
            for (int mask = 1; mask < (1 << n); mask++) {
                if (Integer.bitCount(mask) < 2) {
                    continue;
                }
                List<Integer> dice = new ArrayList<>();
                for (int d = 0; d < n; d++) {
                    if ((mask & (1 << d)) != 0) {
                        dice.add(d);
                    }
                }
                DiceSet sub = set.subset(dice.stream().mapToInt(Integer::intValue).toArray());
                assertTrue(FairnessAnalysis.analyse(sub).orderFair(), e.id() + " subset " + dice);
            }
        }
    }

    @Test
    void shipped_holdsTheRequiredSizes() {
        Catalog c = Catalog.shipped();
        // Common practice, no source: 2 dice need 2 sides, 3 dice 6, 4 dice 12 (least equal sides).
        assertTrue(c.byId("d2-2x2").isPresent());
        assertTrue(c.byId("d3-6x3").isPresent());
        assertTrue(c.byId("d4-12x4").isPresent());
        // OEIS A362634: three dice with 2, 4 and 6 sides can be order-fair.
        assertTrue(c.byId("d3-2-4-6").isPresent());
        // Published bound (American Mathematical Monthly 2024): five dice with at most 120 sides.
        CatalogEntry five = c.forPlayers(5).orElseThrow();
        assertTrue(five.sides().stream().allMatch(s -> s <= 120), five.id());
        assertEquals(FairnessGrade.ORDER_FAIR, five.grade());
    }

    @Test
    void forPlayers_picksFewestTotalFaces() {
        Catalog c = Catalog.shipped();
        for (int n = 2; n <= 5; n++) {
            CatalogEntry best = c.forPlayers(n).orElseThrow();
            assertEquals(n, best.players());
            for (CatalogEntry e : c.entries(n)) {
                if (e.grade() == FairnessGrade.ORDER_FAIR) {
                    assertTrue(best.totalFaces() <= e.totalFaces(), e.id());
                }
            }
        }
        assertEquals("d3-2-4-6", c.forPlayers(3).orElseThrow().id());
        assertTrue(c.forPlayers(6).isEmpty());
        assertTrue(c.forPlayers(1).isEmpty());
    }

    @Test
    void toDice_carriesIdGradeAndDepth() {
        ExplicitDice dice = Catalog.shipped().forPlayers(3).map(CatalogEntry::toDice).orElseThrow();
        CatalogEntry e = Catalog.shipped().forPlayers(3).orElseThrow();
        assertEquals(e.id(), dice.id());
        assertEquals(FairnessGrade.ORDER_FAIR, dice.grade());
        assertEquals(3, dice.subsetDepth());
        assertEquals(e.sha256(), dice.sha256());
        assertEquals(3, dice.players());
    }

    @Test
    void parse_tamperedFace_failsLoudly() throws IOException {
        String text = shippedText();
        // Swap two faces between dice of the first entry: still a valid set, different word.
        String tampered = text.replaceFirst("\\[1,4\\],\\s*\\[2,3\\]", "[1,3],\n        [2,4]");
        assertFalse(tampered.equals(text), "the test must change something");
        CatalogIntegrityException ex = assertThrows(CatalogIntegrityException.class,
                () -> Catalog.parse(tampered, "test"));
        assertTrue(ex.getMessage().contains("d2-2x2") && ex.getMessage().contains("SHA-256"),
                ex.getMessage());
    }

    @Test
    void parse_tamperedHashOrShape_failsLoudly() throws IOException {
        String text = shippedText();
        String badHash = text.replaceFirst("\"sha256\": \"9", "\"sha256\": \"8");
        assertThrows(CatalogIntegrityException.class, () -> Catalog.parse(badHash, "test"));
        String badSides = text.replaceFirst("\"sides\": \\[2,2\\]", "\"sides\": [2,3]");
        assertThrows(CatalogIntegrityException.class, () -> Catalog.parse(badSides, "test"));
        assertThrows(CatalogIntegrityException.class, () -> Catalog.parse("[]", "test"));
        assertThrows(CatalogIntegrityException.class, () -> Catalog.parse("{\"format\":\"x\"}", "test"));
    }

    @Test
    void writeAtomically_replacesFileAndLeavesNoTemporary(@TempDir Path dir) throws IOException {
        Path file = dir.resolve("catalog.json");
        Files.writeString(file, "old");
        CatalogGenerator.writeAtomically(file, "new content\n");
        assertEquals("new content\n", Files.readString(file));
        try (Stream<Path> files = Files.list(dir)) {
            assertEquals(List.of(file), files.toList());
        }
        assertThrows(IOException.class,
                () -> CatalogGenerator.writeAtomically(dir.resolve("missing/c.json"), "x"));
    }

    @Test
    void json_roundTrip_preservesEntries() {
        List<CatalogEntry> entries = Catalog.shipped().entries();
        String written = CatalogJson.write(entries, "test");
        assertEquals(entries, Catalog.parse(written, "round trip").entries());
    }
}
