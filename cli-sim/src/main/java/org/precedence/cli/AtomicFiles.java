package org.precedence.cli;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.channels.FileChannel;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.nio.file.attribute.PosixFileAttributeView;
import java.nio.file.attribute.PosixFilePermission;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.Set;

/**
 * Writes output files so that readers see either the old file or the whole new one, never
 * a part: a temporary file in the target's own directory, forced to disk, then renamed over
 * the target in one atomic step. A failure removes the temporary file.
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
        Path absolute = target.toAbsolutePath();
        Path dir = absolute.getParent();
        Path temp = null;
        try {
            temp = Files.createTempFile(dir, "." + absolute.getFileName() + ".", ".tmp");
            try (FileChannel ch = FileChannel.open(temp, StandardOpenOption.WRITE,
                    StandardOpenOption.TRUNCATE_EXISTING)) {
                ByteBuffer buf = ByteBuffer.wrap(bytes);
                while (buf.hasRemaining()) {
                    ch.write(buf);
                }
                ch.force(true);
            }
            keepPermissions(temp, absolute);
            try {
                Files.move(temp, absolute, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
            } catch (AtomicMoveNotSupportedException e) {
                throw new UserInputException(what + " " + target
                        + ": the file system cannot replace files atomically");
            }
            temp = null;
            forceDirectory(dir);
        } catch (IOException | SecurityException e) {
            throw new UserInputException(what + " " + target + ": cannot write (" + e.getMessage() + ")");
        } finally {
            if (temp != null) {
                try {
                    Files.deleteIfExists(temp);
                } catch (IOException ignored) {
                    // Best effort: the write already failed and says so.
                }
            }
        }
    }

    /**
     * Gives the new file the old file's permissions, or rw-r--r-- for a new file, since temporary
     * files are created readable by their owner only.
     */
    private static void keepPermissions(Path temp, Path target) throws IOException {
        if (!Files.getFileStore(temp).supportsFileAttributeView(PosixFileAttributeView.class)) {
            return;
        }
        Set<PosixFilePermission> perms = Files.exists(target)
                ? Files.getPosixFilePermissions(target)
                : PosixFilePermissions.fromString("rw-r--r--");
        Files.setPosixFilePermissions(temp, perms);
    }

    /** Makes the rename durable where the platform allows syncing a directory (not on Windows). */
    private static void forceDirectory(Path dir) {
        try (FileChannel ch = FileChannel.open(dir, StandardOpenOption.READ)) {
            ch.force(true);
        } catch (IOException | UnsupportedOperationException e) {
            // Not every platform can open a directory; the file itself is already on disk.
        }
    }
}
