package org.precedence.runtime.catalog;

import com.google.gson.Gson;
import com.google.gson.GsonBuilder;
import com.google.gson.JsonArray;
import com.google.gson.JsonElement;
import com.google.gson.JsonObject;
import com.google.gson.JsonParseException;
import com.google.gson.JsonParser;
import java.util.ArrayList;
import java.util.List;
import org.precedence.runtime.catalog.CatalogEntry.Provenance;

/**
 * Reads and writes the catalog document. The writer puts one die per line so that a
 * regenerated catalog diffs readably; the reader is strict about every field.
 */
final class CatalogJson {
    static final String FORMAT = "precedence-catalog-v1";
    private static final Gson GSON = new GsonBuilder().disableHtmlEscaping().create();

    private CatalogJson() {
    }

    static String write(List<CatalogEntry> entries, String generatedBy) {
        StringBuilder sb = new StringBuilder();
        sb.append("{\n  \"format\": ").append(q(FORMAT)).append(",\n");
        sb.append("  \"generatedBy\": ").append(q(generatedBy)).append(",\n");
        sb.append("  \"entries\": [");
        for (int i = 0; i < entries.size(); i++) {
            CatalogEntry e = entries.get(i);
            sb.append(i == 0 ? "\n" : ",\n").append("    {\n");
            sb.append("      \"id\": ").append(q(e.id())).append(",\n");
            sb.append("      \"players\": ").append(e.players()).append(",\n");
            sb.append("      \"sides\": ").append(GSON.toJson(e.sides())).append(",\n");
            sb.append("      \"grade\": ").append(q(GradeNames.text(e.grade()))).append(",\n");
            sb.append("      \"subsetDepth\": ").append(e.subsetDepth()).append(",\n");
            sb.append("      \"sha256\": ").append(q(e.sha256())).append(",\n");
            sb.append("      \"dice\": [\n");
            for (int d = 0; d < e.dice().size(); d++) {
                sb.append("        ").append(GSON.toJson(e.dice().get(d)))
                        .append(d + 1 < e.dice().size() ? ",\n" : "\n");
            }
            sb.append("      ],\n");
            Provenance p = e.provenance();
            sb.append("      \"provenance\": {\n");
            sb.append("        \"method\": ").append(q(p.method())).append(",\n");
            sb.append("        \"parameters\": ").append(q(p.parameters())).append(",\n");
            sb.append("        \"steps\": [");
            for (int s = 0; s < p.steps().size(); s++) {
                sb.append(s == 0 ? "\n" : ",\n").append("          ").append(q(p.steps().get(s)));
            }
            sb.append(p.steps().isEmpty() ? "]\n" : "\n        ]\n");
            sb.append("      }\n    }");
        }
        sb.append("\n  ]\n}\n");
        return sb.toString();
    }

    private static String q(String s) {
        return GSON.toJson(s);
    }

    /** Parses the document; structural problems raise {@link CatalogIntegrityException}. */
    static List<CatalogEntry> read(String json, String source) {
        JsonObject root;
        try {
            root = JsonParser.parseString(json).getAsJsonObject();
        } catch (JsonParseException | IllegalStateException e) {
            throw new CatalogIntegrityException(source + ": not a JSON object: " + e.getMessage(), e);
        }
        String format = string(root, "format", source);
        if (!FORMAT.equals(format)) {
            throw new CatalogIntegrityException(source + ": format is '" + format + "', expected '"
                    + FORMAT + "'");
        }
        List<CatalogEntry> out = new ArrayList<>();
        JsonArray entries = array(root, "entries", source);
        for (int i = 0; i < entries.size(); i++) {
            String where = source + " entry " + (i + 1);
            try {
                out.add(entry(entries.get(i).getAsJsonObject(), where));
            } catch (IllegalStateException | UnsupportedOperationException | NumberFormatException
                     | ClassCastException e) {
                if (e instanceof CatalogIntegrityException cie) {
                    throw cie;
                }
                throw new CatalogIntegrityException(where + ": malformed: " + e.getMessage(), e);
            }
        }
        return out;
    }

    private static CatalogEntry entry(JsonObject o, String where) {
        String id = string(o, "id", where);
        String at = where + " (" + id + ")";
        int players = o.get("players").getAsInt();
        List<Integer> sides = new ArrayList<>();
        for (JsonElement s : array(o, "sides", at)) {
            sides.add(s.getAsInt());
        }
        List<List<Long>> dice = new ArrayList<>();
        for (JsonElement die : array(o, "dice", at)) {
            List<Long> faces = new ArrayList<>();
            for (JsonElement f : die.getAsJsonArray()) {
                faces.add(f.getAsLong());
            }
            dice.add(faces);
        }
        JsonObject p = o.getAsJsonObject("provenance");
        if (p == null) {
            throw new CatalogIntegrityException(at + ": missing 'provenance'");
        }
        List<String> steps = new ArrayList<>();
        for (JsonElement s : array(p, "steps", at)) {
            steps.add(s.getAsString());
        }
        Provenance provenance = new Provenance(string(p, "method", at),
                string(p, "parameters", at), steps);
        try {
            return new CatalogEntry(id, players, sides, GradeNames.parse(string(o, "grade", at)),
                    o.get("subsetDepth").getAsInt(), dice, string(o, "sha256", at), provenance);
        } catch (IllegalArgumentException e) {
            throw new CatalogIntegrityException(at + ": " + e.getMessage(), e);
        }
    }

    private static String string(JsonObject o, String field, String where) {
        JsonElement e = o.get(field);
        if (e == null || !e.isJsonPrimitive()) {
            throw new CatalogIntegrityException(where + ": missing text field '" + field + "'");
        }
        return e.getAsString();
    }

    private static JsonArray array(JsonObject o, String field, String where) {
        JsonElement e = o.get(field);
        if (e == null || !e.isJsonArray()) {
            throw new CatalogIntegrityException(where + ": missing array field '" + field + "'");
        }
        return e.getAsJsonArray();
    }
}
