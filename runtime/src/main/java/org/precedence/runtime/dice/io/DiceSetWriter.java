package org.precedence.runtime.dice.io;

import java.io.IOException;
import java.nio.file.Path;
import java.util.Map;
import org.precedence.runtime.dice.DiceSet;
import org.precedence.runtime.files.AtomicWrite;

/**
 * Writes dice sets in the forms {@link DiceSetReader} reads. Faces are written in the order
 * the set holds them; names only when they are not the defaults A, B, C, ….
 */
public final class DiceSetWriter {
    private DiceSetWriter() {
    }

    /**
     * Returns the JSON form: an optional header of string members first (metadata such as
     * {@code "id"} or {@code "sha256"}, which readers ignore), then {@code "names"} when the
     * names are not the defaults, then {@code "dice"} with one die per line. Ends with a newline.
     */
    public static String toJson(DiceSet set, Map<String, String> header) {
        StringBuilder sb = new StringBuilder("{\n");
        for (Map.Entry<String, String> e : header.entrySet()) {
            if (e.getKey().equals("dice") || e.getKey().equals("names")) {
                throw new IllegalArgumentException("header member \"" + e.getKey() + "\" is reserved");
            }
            sb.append("  ").append(quote(e.getKey())).append(": ").append(quote(e.getValue())).append(",\n");
        }
        if (!set.hasDefaultNames()) {
            sb.append("  \"names\": [");
            for (int d = 0; d < set.players(); d++) {
                sb.append(d > 0 ? ", " : "").append(quote(set.names().get(d)));
            }
            sb.append("],\n");
        }
        sb.append("  \"dice\": [\n");
        for (int d = 0; d < set.players(); d++) {
            sb.append("    [");
            long[] faces = set.faces(d);
            for (int i = 0; i < faces.length; i++) {
                sb.append(i > 0 ? ", " : "").append(faces[i]);
            }
            sb.append(d + 1 < set.players() ? "],\n" : "]\n");
        }
        return sb.append("  ]\n}\n").toString();
    }

    /** Returns the JSON form without header. */
    public static String toJson(DiceSet set) {
        return toJson(set, Map.of());
    }

    /**
     * Returns the text form: one line per die, {@code name: faces…} when the names are not
     * the defaults, otherwise only the faces; {@code comment} lines (may be empty) first, each
     * prefixed with {@code # }.
     *
     * @throws IllegalArgumentException if a name contains ':' or '#', which the text form
     *                                  cannot carry (use JSON)
     */
    public static String toText(DiceSet set, String... comment) {
        StringBuilder sb = new StringBuilder();
        for (String c : comment) {
            c.lines().forEach(l -> sb.append("# ").append(l).append('\n'));
        }
        boolean named = !set.hasDefaultNames();
        for (int d = 0; d < set.players(); d++) {
            if (named) {
                String name = set.names().get(d);
                if (name.contains(":") || name.contains("#")) {
                    throw new IllegalArgumentException("die name '" + name
                            + "' contains ':' or '#', which the text form cannot hold; use JSON");
                }
                sb.append(name).append(": ");
            }
            long[] faces = set.faces(d);
            for (int i = 0; i < faces.length; i++) {
                sb.append(i > 0 ? " " : "").append(faces[i]);
            }
            sb.append('\n');
        }
        return sb.toString();
    }

    /**
     * Writes {@code content} to {@code target} atomically (see {@link AtomicWrite}): on failure
     * the target is untouched and the temporary file removed.
     */
    public static void writeAtomically(Path target, String content) throws IOException {
        AtomicWrite.writeString(target, content);
    }

    /** JSON string literal: quotes, backslashes and control characters escaped. */
    static String quote(String s) {
        StringBuilder sb = new StringBuilder(s.length() + 2).append('"');
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            switch (c) {
                case '"' -> sb.append("\\\"");
                case '\\' -> sb.append("\\\\");
                case '\n' -> sb.append("\\n");
                case '\r' -> sb.append("\\r");
                case '\t' -> sb.append("\\t");
                default -> {
                    if (c < 0x20 || c == 0x2028 || c == 0x2029) {
                        sb.append(String.format("\\u%04x", (int) c));
                    } else {
                        sb.append(c);
                    }
                }
            }
        }
        return sb.append('"').toString();
    }
}
