package org.precedence.runtime.dice.io;

import com.google.gson.Strictness;
import com.google.gson.stream.JsonReader;
import com.google.gson.stream.JsonToken;
import com.google.gson.stream.MalformedJsonException;
import java.io.EOFException;
import java.io.IOException;
import java.io.StringReader;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.precedence.runtime.dice.DiceSet;

/**
 * The JSON form, read with Gson's streaming reader in strict mode so that every problem has a
 * position. Grammar (see docs/analysis.md):
 *
 * <pre>
 * set  = { "dice": [ die, die, … ] (, "names": [ string, … ])? (, other members ignored) }
 * die  = [ integer, … ]  |  { "faces": [ integer, … ] (, "name": string)? }
 * </pre>
 */
final class JsonSetFormat {
    /** Gson appends " at line L column C path P" to its messages; this recovers L and C. */
    private static final Pattern LOCATION = Pattern.compile(" at line (\\d+) column (\\d+) path (\\S*)");

    private final String text;
    /** Offsets at which each line starts, to turn Gson's line and column back into offsets. */
    private final int[] lineStarts;

    private JsonSetFormat(String text) {
        this.text = text;
        List<Integer> starts = new ArrayList<>();
        starts.add(0);
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            if (c == '\n' || c == '\r' && (i + 1 >= text.length() || text.charAt(i + 1) != '\n')) {
                starts.add(i + 1);
            }
        }
        this.lineStarts = starts.stream().mapToInt(Integer::intValue).toArray();
    }

    static DiceSet read(String text) {
        return new JsonSetFormat(text).parse();
    }

    private DiceSet parse() {
        if (text.replace("\uFEFF", "").isBlank()) {
            throw new SetFormatException("empty input: expected a dice set such as {\"dice\": [[1, 4], [2, 3]]}");
        }
        JsonReader r = new JsonReader(new StringReader(text));
        r.setStrictness(Strictness.STRICT);
        try {
            return readSet(r);
        } catch (MalformedJsonException | EOFException e) {
            throw malformed(e, r);
        } catch (IOException e) {
            throw new SetFormatException("cannot read the input: " + e.getMessage());
        }
    }

    private DiceSet readSet(JsonReader r) throws IOException {
        SetBuilder b = new SetBuilder();
        expect(r, JsonToken.BEGIN_OBJECT, "a JSON object such as {\"dice\": [[1, 4], [2, 3]]}");
        r.beginObject();
        Set<String> seen = new HashSet<>();
        boolean hasDice = false;
        while (r.hasNext()) {
            Position at = tokenStart(r);
            String key = r.nextName();
            if (!seen.add(key)) {
                throw at.error("member \"" + SetBuilder.shorten(key) + "\" appears twice");
            }
            switch (key) {
                case "dice" -> {
                    readDice(r, b);
                    hasDice = true;
                }
                case "names" -> readNames(r, b);
                default -> r.skipValue(); // metadata such as "id" or "sha256": not ours to judge
            }
        }
        Position end = tokenStart(r);
        r.endObject();
        if (!hasDice) {
            throw end.error("missing member \"dice\" (a list of dice, each a list of face values)");
        }
        Position after = position(r);
        try {
            if (r.peek() != JsonToken.END_DOCUMENT) {
                throw tokenStart(r).error("unexpected content after the set's closing '}'");
            }
        } catch (MalformedJsonException e) {
            // Strict readers refuse a second top-level value outright; say what it means here.
            SetFormatException m = malformedAt(e, after);
            throw m.problem().startsWith("malformed JSON (")
                    ? m.withProblem("unexpected content after the set's closing '}'") : m;
        }
        return b.build(end);
    }

    private void readDice(JsonReader r, SetBuilder b) throws IOException {
        expect(r, JsonToken.BEGIN_ARRAY, "a list of dice");
        r.beginArray();
        while (r.hasNext()) {
            JsonToken t = r.peek();
            Position at = tokenStart(r);
            b.startDie(at);
            if (t == JsonToken.BEGIN_ARRAY) {
                readFaces(r, b);
            } else if (t == JsonToken.BEGIN_OBJECT) {
                readDieObject(r, b, b.diceSoFar(), at);
            } else {
                throw at.error("expected a die (a list of face values, or {\"name\": …, \"faces\": […]})"
                        + " but found " + describe(t));
            }
        }
        r.endArray();
    }

    private void readDieObject(JsonReader r, SetBuilder b, int number, Position start)
            throws IOException {
        r.beginObject();
        boolean hasFaces = false;
        boolean hasName = false;
        while (r.hasNext()) {
            Position at = tokenStart(r);
            String key = r.nextName();
            switch (key) {
                case "faces" -> {
                    if (hasFaces) {
                        throw at.error("member \"faces\" appears twice in die " + number);
                    }
                    readFaces(r, b);
                    hasFaces = true;
                }
                case "name" -> {
                    if (hasName) {
                        throw at.error("member \"name\" appears twice in die " + number);
                    }
                    expect(r, JsonToken.STRING, "the die's name (a string)");
                    Position nameAt = tokenStart(r);
                    b.name(r.nextString(), nameAt);
                    hasName = true;
                }
                default -> throw at.error("unknown member \"" + SetBuilder.shorten(key) + "\" in die "
                        + number + " (allowed: \"name\", \"faces\")");
            }
        }
        r.endObject();
        if (!hasFaces) {
            throw start.error("die " + number + " has no \"faces\"");
        }
    }

    private void readFaces(JsonReader r, SetBuilder b) throws IOException {
        expect(r, JsonToken.BEGIN_ARRAY, "a list of face values");
        r.beginArray();
        while (r.hasNext()) {
            Position at = tokenStart(r);
            JsonToken t = r.peek();
            if (t != JsonToken.NUMBER) {
                throw at.error("expected a face value (an integer) but found " + describe(t));
            }
            b.face(r.nextString(), at);
        }
        r.endArray();
    }

    private void readNames(JsonReader r, SetBuilder b) throws IOException {
        Position start = tokenStart(r);
        expect(r, JsonToken.BEGIN_ARRAY, "a list of die names");
        r.beginArray();
        List<String> names = new ArrayList<>();
        List<Position> at = new ArrayList<>();
        while (r.hasNext()) {
            expect(r, JsonToken.STRING, "a die name (a string)");
            at.add(tokenStart(r));
            names.add(r.nextString());
        }
        r.endArray();
        b.names(names, at, start);
    }

    private void expect(JsonReader r, JsonToken wanted, String what) throws IOException {
        JsonToken t = r.peek();
        if (t != wanted) {
            throw tokenStart(r).error("expected " + what + " but found " + describe(t));
        }
    }

    private static String describe(JsonToken t) {
        return switch (t) {
            case BEGIN_ARRAY -> "a list";
            case BEGIN_OBJECT -> "an object";
            case STRING -> "a string";
            case NUMBER -> "a number";
            case BOOLEAN -> "true/false";
            case NULL -> "null";
            case END_DOCUMENT -> "the end of the input";
            case END_ARRAY -> "the end of the list";
            case END_OBJECT -> "the end of the object";
            case NAME -> "a member name";
        };
    }

    /**
     * Where the reader stands: after {@code peek()} that is the start of the next token (for
     * strings, just past the opening quote). Gson exposes it only in its {@code toString()}.
     */
    static Position position(JsonReader r) {
        Matcher m = LOCATION.matcher(r.toString());
        return m.find() ? new Position(Integer.parseInt(m.group(1)), Integer.parseInt(m.group(2)))
                : new Position(1, 1);
    }

    /**
     * Where the next token starts. {@code peek()} has already consumed the first character of
     * brackets, braces and quoted strings or names, and all of a number that fits in a long
     * (but none of a longer number), so the column is moved back accordingly.
     */
    private Position tokenStart(JsonReader r) throws IOException {
        JsonToken t = r.peek();
        Position p = position(r);
        switch (t) {
            case BEGIN_ARRAY, BEGIN_OBJECT, END_ARRAY, END_OBJECT, STRING, NAME -> {
                return new Position(p.line(), Math.max(1, p.column() - 1));
            }
            case NUMBER -> {
                if (p.line() > lineStarts.length) {
                    return p;
                }
                int lineStart = lineStarts[p.line() - 1];
                int offset = Math.min(text.length(), lineStart + p.column() - 1);
                while (offset > lineStart && isNumberChar(text.charAt(offset - 1))) {
                    offset--;
                }
                return new Position(p.line(), offset - lineStart + 1);
            }
            default -> {
                return p;
            }
        }
    }

    private static boolean isNumberChar(char c) {
        return c >= '0' && c <= '9' || c == '-' || c == '+' || c == '.' || c == 'e' || c == 'E';
    }

    private static SetFormatException malformed(IOException e, JsonReader r) {
        return malformedAt(e, position(r));
    }

    private static SetFormatException malformedAt(IOException e, Position fallback) {
        String message = e.getMessage() == null ? "" : e.getMessage().lines().findFirst().orElse("");
        Matcher m = LOCATION.matcher(message);
        boolean located = m.find();
        Position at = located
                ? new Position(Integer.parseInt(m.group(1)), Integer.parseInt(m.group(2)))
                : fallback;
        String what = located ? message.substring(0, m.start()) : message;
        if (e instanceof EOFException || what.startsWith("End of input")) {
            return at.error("the input ends before the set is complete");
        }
        // Gson reports syntax errors just past the offending character; point at it.
        at = new Position(at.line(), Math.max(1, at.column() - 1));
        if (what.startsWith("Use JsonReader.setStrictness")) {
            what = "malformed JSON (comments, single quotes, unquoted names, trailing commas and"
                    + " bare words are not allowed)";
        } else if (what.isEmpty()) {
            what = "malformed JSON";
        } else {
            what = "malformed JSON: " + Character.toLowerCase(what.charAt(0)) + what.substring(1);
        }
        return at.error(what);
    }
}
