package org.precedence.game.log;

import com.google.gson.Gson;
import com.google.gson.GsonBuilder;
import com.google.gson.JsonParseException;
import java.io.IOException;
import java.io.Writer;
import java.nio.ByteBuffer;
import java.nio.channels.FileChannel;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;

/** Reads and writes game logs as JSON files. */
public final class GameLogFile {
    private static final Gson GSON = new GsonBuilder().setPrettyPrinting().disableHtmlEscaping().create();

    private GameLogFile() {
    }

    /** Returns the record as the log's JSON text. */
    public static String toJson(GameRecord record) {
        return GSON.toJson(record);
    }

    /**
     * Parses the log's JSON text.
     *
     * @throws InvalidLogException if the text is not a complete log of format {@value GameRecord#FORMAT}
     */
    public static GameRecord fromJson(String json, String where) throws InvalidLogException {
        GameRecord record;
        try {
            record = GSON.fromJson(json, GameRecord.class);
        } catch (JsonParseException e) {
            throw new InvalidLogException(where + ": not a valid game log: " + rootMessage(e));
        } catch (RuntimeException e) {
            // The records check their fields in their constructors (missing or unknown values);
            // Gson passes those failures on, wrapped or not.
            throw new InvalidLogException(where + ": not a valid game log: " + rootMessage(e));
        }
        if (record == null) {
            throw new InvalidLogException(where + ": the file is empty");
        }
        if (!GameRecord.FORMAT.equals(record.format())) {
            throw new InvalidLogException(where + ": log format '" + record.format() + "' is not supported, expected '"
                    + GameRecord.FORMAT + "'");
        }
        return record;
    }

    /**
     * Reads a log file.
     *
     * @throws InvalidLogException if the file cannot be read or is not a valid log
     */
    public static GameRecord read(Path path) throws InvalidLogException {
        String json;
        try {
            json = Files.readString(path, StandardCharsets.UTF_8);
        } catch (NoSuchFileException e) {
            throw new InvalidLogException(path + ": no such file");
        } catch (IOException e) {
            throw new InvalidLogException(path + ": cannot read: " + e.getMessage());
        }
        return fromJson(json, path.toString());
    }

    /**
     * Writes the log atomically: to a temporary file in the target's directory, forced to
     * disk, then renamed over the target. Readers see the old file or the new one, never a
     * part; on failure the temporary file is removed.
     */
    public static void write(Path path, GameRecord record) throws IOException {
        Path target = path.toAbsolutePath();
        Path dir = target.getParent();
        Path temp = Files.createTempFile(dir, "." + target.getFileName() + ".", ".tmp");
        try {
            try (FileChannel channel = FileChannel.open(temp, StandardOpenOption.WRITE,
                    StandardOpenOption.TRUNCATE_EXISTING)) {
                ByteBuffer bytes = ByteBuffer.wrap((toJson(record) + "\n").getBytes(StandardCharsets.UTF_8));
                while (bytes.hasRemaining()) {
                    channel.write(bytes);
                }
                channel.force(true);
            }
            try {
                Files.move(temp, target, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
            } catch (AtomicMoveNotSupportedException e) {
                throw new IOException("cannot replace " + target + " atomically on this file system", e);
            }
        } finally {
            Files.deleteIfExists(temp);
        }
    }

    /** Writes the log's JSON to a stream (no atomicity: for printing). */
    public static void write(Writer out, GameRecord record) throws IOException {
        out.write(toJson(record));
        out.write('\n');
        out.flush();
    }

    private static String rootMessage(Throwable e) {
        Throwable t = e;
        while (t.getCause() != null && t.getCause() != t) {
            t = t.getCause();
        }
        String m = t.getMessage();
        if (t instanceof NullPointerException && m != null && m.matches("[A-Za-z]+")) {
            // The records' null checks name the field; an unknown enum value also reads as null.
            return "field '" + m + "' is missing or has an unknown value";
        }
        return m == null ? t.getClass().getSimpleName() : m.lines().findFirst().orElse(m);
    }
}
