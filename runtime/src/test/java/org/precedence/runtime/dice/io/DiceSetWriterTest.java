package org.precedence.runtime.dice.io;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.SplittableRandom;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.precedence.runtime.dice.DiceSet;

class DiceSetWriterTest {

    private static DiceSet randomSet(SplittableRandom rnd, boolean named) {
        int n = 2 + rnd.nextInt(5);
        List<long[]> faces = new ArrayList<>();
        java.util.Set<Long> used = new java.util.HashSet<>();
        for (int d = 0; d < n; d++) {
            long[] f = new long[1 + rnd.nextInt(6)];
            for (int i = 0; i < f.length; i++) {
                long v;
                do {
                    v = rnd.nextInt(4) == 0 ? rnd.nextLong() : rnd.nextLong(-50, 50);
                } while (!used.add(v));
                f[i] = v;
            }
            faces.add(f);
        }
        List<String> names = null;
        if (named) {
            names = new ArrayList<>();
            for (int d = 0; d < n; d++) {
                names.add("die \"" + d + "\" \\ é");
            }
        }
        return DiceSet.of(faces, names);
    }

    @Test
    void toJson_readsBackEqual_withAndWithoutNames() {
        long seed = 20_261_202L;
        System.out.println("DiceSetWriterTest: seed " + seed);
        SplittableRandom rnd = new SplittableRandom(seed);
        for (int trial = 0; trial < 200; trial++) {
            DiceSet set = randomSet(rnd, trial % 2 == 0);
            Map<String, String> header = new LinkedHashMap<>();
            header.put("sha256", set.sha256());
            String json = DiceSetWriter.toJson(set, header);
            assertEquals(set, DiceSetReader.read(json));
            assertEquals(set, DiceSetReader.read(json, DiceSetFormat.JSON));
        }
    }

    @Test
    void toText_readsBackEqual() {
        SplittableRandom rnd = new SplittableRandom(7);
        for (int trial = 0; trial < 200; trial++) {
            DiceSet set = randomSet(rnd, false);
            String text = DiceSetWriter.toText(set, "a comment\nover two lines");
            assertEquals(set, DiceSetReader.read(text));
        }
        DiceSet named = DiceSet.of(List.of(new long[] {1, 4}, new long[] {2, 3}), List.of("Red Die", "Blue"));
        assertEquals("Red Die: 1 4\nBlue: 2 3\n", DiceSetWriter.toText(named));
        assertEquals(named, DiceSetReader.read(DiceSetWriter.toText(named)));
    }

    @Test
    void toJson_layout_isOneDiePerLine() {
        DiceSet set = DiceSet.of(List.of(new long[] {1, 4}, new long[] {2, 3}), List.of("Ash", "Birch"));
        assertEquals("{\n  \"names\": [\"Ash\", \"Birch\"],\n  \"dice\": [\n    [1, 4],\n    [2, 3]\n  ]\n}\n",
                DiceSetWriter.toJson(set));
        assertEquals("{\n  \"dice\": [\n    [1, 4],\n    [2, 3]\n  ]\n}\n",
                DiceSetWriter.toJson(DiceSet.ofInts(new int[] {1, 4}, new int[] {2, 3})));
    }

    @Test
    void toText_nameWithColon_isRefused() {
        DiceSet set = DiceSet.of(List.of(new long[] {1}, new long[] {2}), List.of("a:b", "c"));
        assertThrows(IllegalArgumentException.class, () -> DiceSetWriter.toText(set));
        assertEquals(set, DiceSetReader.read(DiceSetWriter.toJson(set)), "JSON carries any name");
    }

    @Test
    void writeAtomically_replacesTheTargetAndLeavesNoTemporaryFile(@TempDir Path dir) throws IOException {
        Path target = dir.resolve("set.json");
        Files.writeString(target, "old");
        DiceSet set = DiceSet.ofInts(new int[] {1, 4}, new int[] {2, 3});
        DiceSetWriter.writeAtomically(target, DiceSetWriter.toJson(set));
        assertEquals(set, DiceSetReader.read(Files.readString(target, StandardCharsets.UTF_8)));
        try (Stream<Path> files = Files.list(dir)) {
            assertEquals(List.of(target), files.toList());
        }
    }

    @Test
    void writeAtomically_missingDirectory_failsWithoutWriting(@TempDir Path dir) {
        Path target = dir.resolve("missing").resolve("set.json");
        assertThrows(IOException.class, () -> DiceSetWriter.writeAtomically(target, "{}"));
        assertTrue(Files.notExists(target));
    }
}
