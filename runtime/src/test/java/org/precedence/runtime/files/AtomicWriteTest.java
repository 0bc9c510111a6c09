package org.precedence.runtime.files;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class AtomicWriteTest {

    @Test
    void writeString_newFile_hasContentReadablePermissionsAndNoTempLeft(@TempDir Path dir) throws IOException {
        Path file = dir.resolve("set.json");
        AtomicWrite.writeString(file, "{\"dice\": []}");
        assertEquals("{\"dice\": []}", Files.readString(file, StandardCharsets.UTF_8));
        if (Files.getFileStore(file).supportsFileAttributeView("posix")) {
            // Temporary files start owner-only; a written file must not keep that.
            assertEquals("rw-r--r--", PosixFilePermissions.toString(Files.getPosixFilePermissions(file)));
        }
        assertOnlyFile(dir, file);
    }

    @Test
    void writeString_existingFile_replacedAndKeepsItsPermissions(@TempDir Path dir) throws IOException {
        Path file = dir.resolve("log.json");
        Files.writeString(file, "old");
        boolean posix = Files.getFileStore(file).supportsFileAttributeView("posix");
        if (posix) {
            Files.setPosixFilePermissions(file, PosixFilePermissions.fromString("rw-rw----"));
        }
        AtomicWrite.writeString(file, "new");
        assertEquals("new", Files.readString(file));
        if (posix) {
            assertEquals("rw-rw----", PosixFilePermissions.toString(Files.getPosixFilePermissions(file)));
        }
        assertOnlyFile(dir, file);
    }

    @Test
    void write_missingDirectory_namesItAndWritesNothing(@TempDir Path dir) {
        Path file = dir.resolve("absent/x.json");
        IOException e = assertThrows(IOException.class, () -> AtomicWrite.writeString(file, "x"));
        assertTrue(e.getMessage().contains("does not exist"), e.getMessage());
        assertTrue(Files.notExists(dir.resolve("absent")));
    }

    @Test
    void write_targetIsADirectory_failsAndLeavesNoTemporaryFile(@TempDir Path dir) throws IOException {
        Path target = Files.createDirectory(dir.resolve("taken"));
        Files.writeString(target.resolve("inside"), "kept");
        assertThrows(IOException.class, () -> AtomicWrite.writeString(target, "x"));
        assertEquals("kept", Files.readString(target.resolve("inside")));
        assertOnlyFile(dir, target);
    }

    private static void assertOnlyFile(Path dir, Path expected) throws IOException {
        try (Stream<Path> files = Files.list(dir)) {
            assertEquals(java.util.List.of(expected), files.toList());
        }
    }
}
