package org.precedence.runtime.service;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.channels.FileChannel;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.nio.file.attribute.FileAttribute;
import java.nio.file.attribute.PosixFileAttributeView;
import java.nio.file.attribute.PosixFilePermission;
import java.nio.file.attribute.PosixFilePermissions;
import java.security.SecureRandom;
import java.util.ArrayList;
import java.util.Base64;
import java.util.List;
import java.util.Set;

/**
 * Reads, creates and rotates key rings.
 *
 * <p>Text form, the same in a key file and in the {@value #ENVIRONMENT_VARIABLE} environment
 * variable: entries {@code <id>:<key>}, where {@code id} is a positive decimal integer and
 * {@code key} is 32 bytes in unpadded base64url (RFC 4648 §5); in a file one entry per line,
 * {@code #} starts a comment line; in the variable entries are separated by commas or white
 * space. Entries are listed oldest first, so the last one seals new tokens.
 *
 * <p>Files are written atomically and owner-only: a temporary file in the same directory with
 * permissions {@code rw-------}, forced to disk, then moved into place, then the directory is
 * forced. A key file that group or others may read is refused, as ssh does with private keys.
 */
public final class KeyFiles {
    /** The environment variable that may carry the key ring instead of a file. */
    public static final String ENVIRONMENT_VARIABLE = "PRECEDENCE_SERVICE_KEYS";

    private static final SecureRandom RANDOM = new SecureRandom();
    private static final Set<PosixFilePermission> OWNER_ONLY_FILE = PosixFilePermissions.fromString("rw-------");
    private static final Set<PosixFilePermission> OWNER_ONLY_DIR = PosixFilePermissions.fromString("rwx------");

    private KeyFiles() {
    }

    /**
     * Parses the text form.
     *
     * @param origin where the text came from, for error messages (a path or the variable name)
     * @throws IllegalArgumentException naming the origin and entry at fault
     */
    public static KeyRing parse(String text, String origin) {
        List<ServiceKey> keys = new ArrayList<>();
        String[] lines = text.split("\\R", -1);
        for (int line = 0; line < lines.length; line++) {
            String content = lines[line].strip();
            if (content.isEmpty() || content.startsWith("#")) {
                continue;
            }
            for (String entry : content.split("[,\\s]+")) {
                if (!entry.isEmpty()) {
                    String where = origin + (lines.length > 1 ? " line " + (line + 1) : "");
                    keys.add(parseEntry(entry, where));
                }
            }
        }
        if (keys.isEmpty()) {
            throw new IllegalArgumentException(origin + " holds no keys; expected entries <id>:<base64url key>");
        }
        try {
            return new KeyRing(keys);
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException(origin + ": " + e.getMessage(), e);
        }
    }

    private static ServiceKey parseEntry(String entry, String where) {
        int colon = entry.indexOf(':');
        if (colon <= 0) {
            throw new IllegalArgumentException(where + ": expected <id>:<base64url key>, got an entry without an id");
        }
        int id;
        try {
            id = Integer.parseInt(entry.substring(0, colon));
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException(where + ": key id must be a positive decimal integer, got '"
                    + entry.substring(0, colon) + "'", e);
        }
        if (id < 1) {
            throw new IllegalArgumentException(where + ": key id must be a positive decimal integer, got " + id);
        }
        byte[] material;
        try {
            material = Base64.getUrlDecoder().decode(entry.substring(colon + 1));
        } catch (IllegalArgumentException e) {
            throw new IllegalArgumentException(where + ": key " + id + " is not valid base64url", e);
        }
        if (material.length != ServiceKey.BYTES) {
            throw new IllegalArgumentException(where + ": key " + id + " must decode to " + ServiceKey.BYTES
                    + " bytes, got " + material.length);
        }
        return new ServiceKey(id, material);
    }

    /** Returns the file text for a ring, oldest key first. */
    public static String format(KeyRing ring) {
        StringBuilder sb = new StringBuilder();
        sb.append("# Precedence service keys: keep secret, owner-only. ")
                .append("Oldest first; the last key seals new sessions.\n");
        for (ServiceKey k : ring.keys()) {
            sb.append(k.id()).append(':')
                    .append(Base64.getUrlEncoder().withoutPadding().encodeToString(k.material())).append('\n');
        }
        return sb.toString();
    }

    /** Returns a new key with fresh material from {@link SecureRandom}. */
    public static ServiceKey generate(int id) {
        byte[] material = new byte[ServiceKey.BYTES];
        RANDOM.nextBytes(material);
        return new ServiceKey(id, material);
    }

    /**
     * Reads a key file.
     *
     * @throws IllegalArgumentException if it cannot be read, is readable by others, or is malformed
     */
    public static KeyRing load(Path file) {
        checkOwnerOnly(file);
        String text;
        try {
            text = Files.readString(file, StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new IllegalArgumentException("cannot read key file " + file + ": " + describe(e), e);
        }
        return parse(text, "key file " + file);
    }

    /**
     * Reads the key file, or, when it does not exist, creates it with one fresh key. When several
     * replicas start at once on a shared file, exactly one file wins and all of them load it.
     */
    public static KeyRing loadOrCreate(Path file) {
        if (Files.exists(file)) {
            return load(file);
        }
        KeyRing fresh = KeyRing.of(generate(1));
        try {
            Path dir = parentOf(file);
            createOwnerOnlyDirectories(dir);
            Path temp = writeTemp(dir, file, format(fresh));
            try {
                publishIfAbsent(temp, file);
            } finally {
                Files.deleteIfExists(temp);
            }
            forceDirectory(dir);
        } catch (FileAlreadyExistsException raced) {
            return load(file);
        } catch (IOException e) {
            throw new IllegalArgumentException("cannot create key file " + file + ": " + describe(e), e);
        }
        return load(file);
    }

    /**
     * Appends a freshly generated key (the new sealing key) to an existing key file, atomically.
     * Run it in one place and copy the file to the replicas.
     *
     * @return the new ring
     */
    public static KeyRing addKey(Path file) {
        KeyRing existing = load(file);
        KeyRing ring = existing.with(generate(existing.nextId()));
        write(file, ring);
        return ring;
    }

    /** Writes a ring to a file atomically (temp file, force, atomic rename, force directory). */
    public static void write(Path file, KeyRing ring) {
        try {
            Path dir = parentOf(file);
            createOwnerOnlyDirectories(dir);
            Path temp = writeTemp(dir, file, format(ring));
            try {
                try {
                    Files.move(temp, file, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
                } catch (AtomicMoveNotSupportedException e) {
                    throw new IOException("the file system cannot rename atomically in " + dir, e);
                }
            } finally {
                Files.deleteIfExists(temp);
            }
            forceDirectory(dir);
        } catch (IOException e) {
            throw new IllegalArgumentException("cannot write key file " + file + ": " + describe(e), e);
        }
    }

    private static Path parentOf(Path file) {
        Path parent = file.toAbsolutePath().getParent();
        if (parent == null) {
            throw new IllegalArgumentException("key file " + file + " has no parent directory");
        }
        return parent;
    }

    private static Path writeTemp(Path dir, Path file, String text) throws IOException {
        Path temp = posix(dir)
                ? Files.createTempFile(dir, "." + file.getFileName() + ".", ".tmp",
                        PosixFilePermissions.asFileAttribute(OWNER_ONLY_FILE))
                : Files.createTempFile(dir, "." + file.getFileName() + ".", ".tmp");
        try (FileChannel ch = FileChannel.open(temp, StandardOpenOption.WRITE, StandardOpenOption.TRUNCATE_EXISTING)) {
            ByteBuffer buf = ByteBuffer.wrap(text.getBytes(StandardCharsets.UTF_8));
            while (buf.hasRemaining()) {
                ch.write(buf);
            }
            ch.force(true);
        } catch (IOException e) {
            Files.deleteIfExists(temp);
            throw e;
        }
        return temp;
    }

    /*
     * Publishing a new file without overwriting one that another process published meanwhile:
     * a hard link from the finished temporary file fails atomically if the name exists (the
     * link(2) semantics; common practice, no source). Where links are unsupported, fall back
     * to an atomic rename.
     */
    private static void publishIfAbsent(Path temp, Path file) throws IOException {
        try {
            Files.createLink(file, temp);
        } catch (UnsupportedOperationException | SecurityException e) {
            Files.move(temp, file, StandardCopyOption.ATOMIC_MOVE);
        } catch (FileAlreadyExistsException e) {
            throw e;
        } catch (IOException e) {
            if (Files.exists(file)) {
                throw new FileAlreadyExistsException(file.toString());
            }
            Files.move(temp, file, StandardCopyOption.ATOMIC_MOVE);
        }
    }

    private static void createOwnerOnlyDirectories(Path dir) throws IOException {
        if (Files.isDirectory(dir)) {
            return;
        }
        Path parent = dir.getParent();
        if (parent != null) {
            createOwnerOnlyDirectories(parent);
        }
        FileAttribute<?>[] attrs = posix(parent == null ? dir : parent)
                ? new FileAttribute<?>[] {PosixFilePermissions.asFileAttribute(OWNER_ONLY_DIR)}
                : new FileAttribute<?>[0];
        try {
            Files.createDirectory(dir, attrs);
        } catch (FileAlreadyExistsException e) {
            // created meanwhile by another process: fine
        }
    }

    private static void forceDirectory(Path dir) {
        // Makes the rename itself durable on Linux; other platforms may refuse to open a
        // directory, in which case the rename is as durable as the platform makes it.
        try (FileChannel ch = FileChannel.open(dir, StandardOpenOption.READ)) {
            ch.force(true);
        } catch (IOException | UnsupportedOperationException e) {
            // best effort, see above
        }
    }

    private static void checkOwnerOnly(Path file) {
        if (!Files.exists(file)) {
            throw new IllegalArgumentException("key file " + file + " does not exist");
        }
        PosixFileAttributeView view = Files.getFileAttributeView(file, PosixFileAttributeView.class);
        if (view == null) {
            return;
        }
        Set<PosixFilePermission> perms;
        try {
            perms = view.readAttributes().permissions();
        } catch (IOException e) {
            throw new IllegalArgumentException("cannot read the permissions of key file " + file + ": "
                    + describe(e), e);
        }
        for (PosixFilePermission p : perms) {
            if (!p.name().startsWith("OWNER_")) {
                throw new IllegalArgumentException("key file " + file + " is accessible by group or others ("
                        + PosixFilePermissions.toString(perms) + "); allowed is owner-only, e.g. chmod 600");
            }
        }
    }

    private static boolean posix(Path dir) {
        Path probe = dir;
        while (probe != null && !Files.exists(probe)) {
            probe = probe.getParent();
        }
        return probe != null && Files.getFileAttributeView(probe, PosixFileAttributeView.class) != null;
    }

    private static String describe(IOException e) {
        String m = e.getMessage();
        return e.getClass().getSimpleName() + (m == null ? "" : " " + m);
    }
}
