package org.precedence.runtime.service;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class KeyFilesTest {
    @TempDir
    Path dir;

    @Test
    void parse_formatted_roundTrips() {
        KeyRing ring = KeyRing.of(KeyFiles.generate(3), KeyFiles.generate(9));
        KeyRing back = KeyFiles.parse(KeyFiles.format(ring), "test");
        assertEquals(ring.keys(), back.keys());
        assertEquals(9, back.sealingKey().id());
    }

    @Test
    void parse_environmentForm_acceptsCommasAndSpaces() {
        String a = "1:" + "A".repeat(43);
        String b = "2:" + "B".repeat(43);
        KeyRing ring = KeyFiles.parse(a + ", " + b, KeyFiles.ENVIRONMENT_VARIABLE);
        assertEquals(2, ring.sealingKey().id());
        assertEquals(2, ring.keys().size());
    }

    @Test
    void parse_badEntries_nameTheProblem() {
        assertMessage("no keys", () -> KeyFiles.parse("# nothing\n", "f"));
        assertMessage("without an id", () -> KeyFiles.parse("AAAA", "f"));
        assertMessage("positive decimal", () -> KeyFiles.parse("x:" + "A".repeat(43), "f"));
        assertMessage("positive decimal", () -> KeyFiles.parse("0:" + "A".repeat(43), "f"));
        assertMessage("32 bytes", () -> KeyFiles.parse("1:AAAA", "f"));
        assertMessage("base64url", () -> KeyFiles.parse("1:" + "*".repeat(43), "f"));
        assertMessage("appears twice", () -> KeyFiles.parse("1:" + "A".repeat(43) + "\n1:" + "B".repeat(43), "f"));
        assertMessage("f line 2", () -> KeyFiles.parse("1:" + "A".repeat(43) + "\n2:AA", "f"));
    }

    @Test
    void loadOrCreate_missingFile_createsOwnerOnlyFileAndReusesIt() throws Exception {
        Path file = dir.resolve("nested/keys");
        KeyRing first = KeyFiles.loadOrCreate(file);
        assertEquals(1, first.keys().size());
        assertEquals("rw-------", PosixFilePermissions.toString(Files.getPosixFilePermissions(file)));
        assertEquals("rwx------", PosixFilePermissions.toString(Files.getPosixFilePermissions(file.getParent())));
        assertEquals(first.keys(), KeyFiles.loadOrCreate(file).keys());
        try (var listing = Files.list(file.getParent())) {
            assertEquals(List.of(file), listing.toList(), "no temporary file left behind");
        }
    }

    @Test
    void loadOrCreate_concurrentStarts_allLoadTheSameRing() throws Exception {
        Path file = dir.resolve("shared.keys");
        ExecutorService pool = Executors.newFixedThreadPool(8);
        try {
            List<Callable<KeyRing>> starts = new ArrayList<>();
            for (int i = 0; i < 8; i++) {
                starts.add(() -> KeyFiles.loadOrCreate(file));
            }
            List<Future<KeyRing>> rings = pool.invokeAll(starts);
            KeyRing onDisk = KeyFiles.load(file);
            for (Future<KeyRing> r : rings) {
                assertEquals(onDisk.keys(), r.get().keys());
            }
        } finally {
            pool.shutdownNow();
        }
    }

    @Test
    void load_groupReadableFile_isRefused() throws Exception {
        Path file = dir.resolve("keys");
        KeyFiles.loadOrCreate(file);
        Files.setPosixFilePermissions(file, PosixFilePermissions.fromString("rw-r-----"));
        assertMessage("owner-only", () -> KeyFiles.load(file));
    }

    @Test
    void load_missingFile_saysSo() {
        assertMessage("does not exist", () -> KeyFiles.load(dir.resolve("absent")));
    }

    @Test
    void addKey_appendsNewestKeyAndKeepsOldOnes() throws Exception {
        Path file = dir.resolve("keys");
        KeyRing before = KeyFiles.loadOrCreate(file);
        KeyRing after = KeyFiles.addKey(file);
        assertEquals(2, after.keys().size());
        assertEquals(before.keys().get(0), after.keys().get(0));
        assertEquals(2, after.sealingKey().id());
        assertNotEquals(before.sealingKey(), after.sealingKey());
        assertEquals(after.keys(), KeyFiles.load(file).keys());
        assertEquals("rw-------", PosixFilePermissions.toString(Files.getPosixFilePermissions(file)));
    }

    private static void assertMessage(String fragment, org.junit.jupiter.api.function.Executable call) {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, call);
        assertTrue(e.getMessage().contains(fragment), e.getMessage());
    }
}
