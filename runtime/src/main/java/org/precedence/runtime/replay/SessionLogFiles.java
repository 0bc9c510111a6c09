package org.precedence.runtime.replay;

import java.io.IOException;
import java.io.StringReader;
import java.math.BigInteger;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.regex.Pattern;
import com.google.gson.Gson;
import com.google.gson.GsonBuilder;
import com.google.gson.JsonArray;
import com.google.gson.JsonElement;
import com.google.gson.JsonObject;
import com.google.gson.JsonParseException;
import com.google.gson.JsonPrimitive;
import com.google.gson.Strictness;
import com.google.gson.stream.JsonReader;
import com.google.gson.stream.JsonToken;
import org.precedence.api.OrderRule;
import org.precedence.api.RandomnessMode;
import org.precedence.api.RankingConvention;
import org.precedence.api.SessionSeed;
import org.precedence.runtime.files.AtomicWrite;

/**
 * Session logs as JSON files. Writing is atomic: the text goes to a temporary file in the
 * target's directory, is forced to disk, and is renamed over the target in one step, so a
 * reader sees the old log or the new one, never half of one. Reading is strict: the text must
 * be one JSON object with every field of the format, each of the right kind.
 */
public final class SessionLogFiles {
    private static final Gson GSON = new GsonBuilder().setPrettyPrinting().disableHtmlEscaping().create();
    private static final Pattern HEX64 = Pattern.compile("[0-9a-f]{64}");
    private static final Pattern DECIMAL = Pattern.compile("0|[1-9][0-9]*");

    private SessionLogFiles() {
    }

    /** Returns the log as JSON text (format version {@value SessionLog#FORMAT_VERSION}). */
    public static String toJson(SessionLog log) {
        JsonObject o = new JsonObject();
        o.addProperty("format", SessionLog.FORMAT_NAME);
        o.addProperty("formatVersion", log.formatVersion());
        o.addProperty("algorithm", log.algorithm());
        o.addProperty("mode", log.mode().name().toLowerCase(Locale.ROOT));
        o.addProperty("rule", log.rule().name());
        o.addProperty("convention", log.convention().name());
        o.addProperty("commitment", log.commitment());
        log.seed().ifPresent(s -> o.addProperty("seed", s.toHex()));
        JsonArray rounds = new JsonArray();
        for (LoggedRound r : log.rounds()) {
            JsonObject j = new JsonObject();
            j.addProperty("round", r.round());
            JsonArray roster = new JsonArray();
            r.roster().forEach(roster::add);
            j.add("roster", roster);
            j.addProperty("setId", r.setId());
            j.addProperty("setSha256", r.setSha256());
            JsonArray faces = new JsonArray();
            r.faces().forEach(faces::add);
            j.add("faces", faces);
            JsonArray order = new JsonArray();
            r.order().forEach(order::add);
            j.add("order", order);
            rounds.add(j);
        }
        o.add("rounds", rounds);
        return GSON.toJson(o) + "\n";
    }

    /**
     * Parses a log.
     *
     * @throws MalformedLogException naming what is wrong and where
     */
    public static SessionLog fromJson(String text) {
        if (text.isBlank()) {
            throw new MalformedLogException("not a session log: the text is empty");
        }
        JsonElement root;
        try (JsonReader reader = new JsonReader(new StringReader(text))) {
            reader.setStrictness(Strictness.STRICT);
            try {
                root = GSON.getAdapter(JsonElement.class).read(reader);
            } catch (IOException | JsonParseException | IllegalStateException e) {
                throw new MalformedLogException("not a session log: malformed JSON" + position(e.getMessage()), e);
            }
            boolean trailing;
            try {
                trailing = reader.peek() != JsonToken.END_DOCUMENT;
            } catch (IOException | IllegalStateException e) {
                trailing = true;
            }
            if (trailing) {
                throw new MalformedLogException("not a session log: text follows the JSON object");
            }
        } catch (IOException e) {
            throw new MalformedLogException("not a session log: " + e.getMessage(), e);
        }
        if (root == null || !root.isJsonObject()) {
            throw new MalformedLogException("not a session log: the JSON must be an object");
        }
        JsonObject o = root.getAsJsonObject();
        String format = string(o, "format", "log");
        if (!SessionLog.FORMAT_NAME.equals(format)) {
            throw new MalformedLogException("not a session log: format is '" + format + "', expected '"
                    + SessionLog.FORMAT_NAME + "'");
        }
        long version = integer(o, "formatVersion", "log");
        if (version != SessionLog.FORMAT_VERSION) {
            throw new MalformedLogException("log format version " + version + " is not supported (this version reads "
                    + SessionLog.FORMAT_VERSION + ")");
        }
        String algorithm = string(o, "algorithm", "log");
        RandomnessMode mode = enumValue(RandomnessMode.class, string(o, "mode", "log"), "mode");
        OrderRule rule = enumValue(OrderRule.class, string(o, "rule", "log"), "rule");
        RankingConvention convention = enumValue(RankingConvention.class, string(o, "convention", "log"), "convention");
        String commitment = hex64(o, "commitment", "log");
        Optional<SessionSeed> seed = o.has("seed") ? Optional.of(SessionSeed.fromHex(hex64(o, "seed", "log")))
                : Optional.empty();
        List<LoggedRound> rounds = new ArrayList<>();
        JsonArray array = array(o, "rounds", "log");
        for (int i = 0; i < array.size(); i++) {
            String where = "rounds[" + i + "]";
            if (!array.get(i).isJsonObject()) {
                throw new MalformedLogException(where + " must be an object");
            }
            JsonObject r = array.get(i).getAsJsonObject();
            long round = integer(r, "round", where);
            if (round < 0) {
                throw new MalformedLogException(where + ".round must be >= 0, got " + round);
            }
            where = "round " + round;
            List<String> roster = strings(r, "roster", where, null);
            List<String> faces = strings(r, "faces", where, DECIMAL);
            List<Integer> order = new ArrayList<>();
            for (JsonElement e : array(r, "order", where)) {
                order.add((int) integerValue(e, where + ".order", Integer.MAX_VALUE));
            }
            rounds.add(new LoggedRound(round, roster, string(r, "setId", where), hex64(r, "setSha256", where),
                    faces, order));
        }
        return new SessionLog((int) version, algorithm, mode, rule, convention, commitment, seed, rounds);
    }

    /** Gson's messages span lines and name its own options; keep only where it failed. */
    private static String position(String message) {
        java.util.regex.Matcher m = message == null ? null
                : Pattern.compile("line (\\d+) column (\\d+)").matcher(message);
        return m != null && m.find() ? " at line " + m.group(1) + " column " + m.group(2) : "";
    }

    /** Writes {@code log} to {@code path} atomically (temp file, fsync, atomic rename). */
    public static void write(Path path, SessionLog log) throws IOException {
        writeAtomically(path, toJson(log));
    }

    /** Reads a log; I/O failures stay {@link IOException}s, bad content is malformed. */
    public static SessionLog read(Path path) throws IOException {
        return fromJson(Files.readString(path, StandardCharsets.UTF_8));
    }

    /** Writes {@code text} as UTF-8 to {@code path} atomically (see {@link AtomicWrite}). */
    public static void writeAtomically(Path path, String text) throws IOException {
        AtomicWrite.writeString(path, text);
    }



    private static JsonElement field(JsonObject o, String name, String where) {
        JsonElement e = o.get(name);
        if (e == null || e.isJsonNull()) {
            throw new MalformedLogException(where + ": missing field '" + name + "'");
        }
        return e;
    }

    private static String string(JsonObject o, String name, String where) {
        JsonElement e = field(o, name, where);
        if (!e.isJsonPrimitive() || !e.getAsJsonPrimitive().isString()) {
            throw new MalformedLogException(where + ": field '" + name + "' must be a string");
        }
        return e.getAsString();
    }

    private static String hex64(JsonObject o, String name, String where) {
        String s = string(o, name, where);
        if (!HEX64.matcher(s).matches()) {
            throw new MalformedLogException(where + ": field '" + name + "' must be 64 lowercase hex digits");
        }
        return s;
    }

    private static long integer(JsonObject o, String name, String where) {
        return integerValue(field(o, name, where), where + "." + name, Long.MAX_VALUE);
    }

    private static long integerValue(JsonElement e, String where, long max) {
        if (e.isJsonPrimitive() && e.getAsJsonPrimitive().isNumber()) {
            JsonPrimitive p = e.getAsJsonPrimitive();
            try {
                BigInteger v = p.getAsBigDecimal().toBigIntegerExact();
                if (v.signum() >= 0 && v.compareTo(BigInteger.valueOf(max)) <= 0) {
                    return v.longValueExact();
                }
            } catch (ArithmeticException | NumberFormatException ignored) {
                // falls through to the message below
            }
        }
        throw new MalformedLogException(where + " must be a whole number from 0 to " + max + ", got " + e);
    }

    private static JsonArray array(JsonObject o, String name, String where) {
        JsonElement e = field(o, name, where);
        if (!e.isJsonArray()) {
            throw new MalformedLogException(where + ": field '" + name + "' must be an array");
        }
        return e.getAsJsonArray();
    }

    private static List<String> strings(JsonObject o, String name, String where, Pattern pattern) {
        List<String> out = new ArrayList<>();
        for (JsonElement e : array(o, name, where)) {
            if (!e.isJsonPrimitive() || !e.getAsJsonPrimitive().isString()) {
                throw new MalformedLogException(where + ": every entry of '" + name + "' must be a string");
            }
            String s = e.getAsString();
            if (pattern != null && !pattern.matcher(s).matches()) {
                throw new MalformedLogException(where + ": '" + name + "' entry '" + s + "' must be a decimal number");
            }
            out.add(s);
        }
        return out;
    }

    private static <E extends Enum<E>> E enumValue(Class<E> type, String text, String field) {
        for (E e : type.getEnumConstants()) {
            if (e.name().equalsIgnoreCase(text)) {
                return e;
            }
        }
        throw new MalformedLogException("log: field '" + field + "' is '" + text + "'; allowed: "
                + java.util.Arrays.toString(type.getEnumConstants()).toLowerCase(Locale.ROOT));
    }
}
