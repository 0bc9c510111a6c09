package org.precedence.cli;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.precedence.runtime.files.AtomicWrite;

/**
 * Output files of the command line: checks a path up front, and writes through the runtime's
 * {@link AtomicWrite} (never half-written), turning failures into one-line input errors.
 */
public final class AtomicFiles {
    private AtomicFiles() {
    }

    /**
     * Checks, before any work is done, that {@code target} can be written: its directory
     * exists and accepts a new file, and the target is not a directory.
     *
     * @throws UserInputException saying what is wrong with the path ({@code what} names the option)
     */
    public static void checkWritable(Path target, String what) {
        Path absolute = target.toAbsolutePath();
        if (Files.isDirectory(absolute)) {
            throw new UserInputException(what + " " + target + " is a directory; give a file name");
        }
        Path dir = absolute.getParent();
        if (dir == null || !Files.isDirectory(dir)) {
            throw new UserInputException(what + " " + target + ": directory " + dir + " does not exist");
        }
        if (Files.exists(absolute) && !Files.isWritable(absolute)) {
            throw new UserInputException(what + " " + target + " exists and is not writable");
        }
        try {
            Path probe = Files.createTempFile(dir, ".precedence-probe-", ".tmp");
            Files.delete(probe);
        } catch (IOException | SecurityException e) {
            throw new UserInputException(what + " " + target + ": cannot create files in " + dir);
        }
    }

    /**
     * Writes {@code text} as UTF-8 to {@code target} atomically.
     *
     * @throws UserInputException if the file cannot be written (the message names the path)
     */
    public static void writeString(Path target, String text, String what) {
        write(target, text.getBytes(StandardCharsets.UTF_8), what);
    }

    /** Writes {@code bytes} to {@code target} atomically; see {@link #writeString}. */
    public static void write(Path target, byte[] bytes, String what) {
        try {
            AtomicWrite.write(target, bytes);
        } catch (IOException | SecurityException e) {
            throw new UserInputException(what + " " + target + ": cannot write (" + e.getMessage() + ")");
        }
    }
}
