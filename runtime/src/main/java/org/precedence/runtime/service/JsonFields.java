package org.precedence.runtime.service;

import com.google.gson.JsonArray;
import com.google.gson.JsonElement;
import com.google.gson.JsonObject;
import com.google.gson.JsonPrimitive;
import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.TreeSet;

/**
 * Typed, bounded access to the members of one request object. Every failure is a 400 that
 * names the member, says what it got, and what is allowed; unknown members are refused so that
 * a misspelt option never silently falls back to a default.
 */
final class JsonFields {
    private final JsonObject obj;
    private final String where;

    /**
     * @param where   how to name this object in messages ("" for the body, "rounds[3]." inside)
     * @param allowed the member names this object may have
     */
    JsonFields(JsonObject obj, String where, Set<String> allowed) {
        this.obj = obj;
        this.where = where;
        for (String name : obj.keySet()) {
            if (!allowed.contains(name)) {
                throw new ApiException(400, "unknown_field", "unknown member \"" + where + name
                        + "\"; allowed members: " + String.join(", ", new TreeSet<>(allowed)));
            }
        }
    }

    /** Returns the element viewed as an object, or a 400 naming it. */
    static JsonObject asObject(JsonElement e, String name) {
        if (e == null || !e.isJsonObject()) {
            throw ApiException.badRequest("\"" + name + "\" must be a JSON object, got " + kind(e));
        }
        return e.getAsJsonObject();
    }

    boolean has(String name) {
        return obj.has(name) && !obj.get(name).isJsonNull();
    }

    int requiredInt(String name, int min, int max) {
        return (int) requiredLong(name, min, max);
    }

    int optionalInt(String name, int min, int max, int fallback) {
        return has(name) ? requiredInt(name, min, max) : fallback;
    }

    long requiredLong(String name, long min, long max) {
        return integer(require(name), where + name, min, max);
    }

    /** Reads an integer element bounded to [min, max]; {@code name} is the full path. */
    static long integer(JsonElement e, String name, long min, long max) {
        if (e == null || !e.isJsonPrimitive() || !e.getAsJsonPrimitive().isNumber()) {
            throw ApiException.badRequest("\"" + name + "\" must be an integer " + min + ".." + max
                    + ", got " + kind(e));
        }
        BigDecimal v = e.getAsBigDecimal();
        BigDecimal stripped = v.signum() == 0 ? BigDecimal.ZERO : v.stripTrailingZeros();
        if (stripped.scale() > 0) {
            throw ApiException.badRequest("\"" + name + "\" must be an integer " + min + ".." + max
                    + ", got " + abbreviate(v.toString()));
        }
        // Checked before any conversion: "1e999999999" must not make a billion-digit integer.
        BigDecimal integral = stripped;
        if (stripped.precision() - stripped.scale() > 19
                || integral.compareTo(BigDecimal.valueOf(min)) < 0 || integral.compareTo(BigDecimal.valueOf(max)) > 0) {
            throw ApiException.badRequest("\"" + name + "\" must be " + min + ".." + max
                    + ", got " + abbreviate(v.toString()));
        }
        return integral.longValueExact();
    }

    String requiredString(String name, int maxLength) {
        JsonElement e = require(name);
        if (!e.isJsonPrimitive() || !e.getAsJsonPrimitive().isString()) {
            throw ApiException.badRequest("\"" + where + name + "\" must be a string, got " + kind(e));
        }
        String s = e.getAsString();
        if (s.length() > maxLength) {
            throw ApiException.badRequest("\"" + where + name + "\" must have at most " + maxLength
                    + " characters, got " + s.length());
        }
        return s;
    }

    <E extends Enum<E>> E optionalEnum(String name, Class<E> type, E fallback) {
        if (!has(name)) {
            return fallback;
        }
        JsonElement e = obj.get(name);
        List<String> allowed = new ArrayList<>();
        for (E c : type.getEnumConstants()) {
            allowed.add(Wire.name(c));
        }
        if (e.isJsonPrimitive() && e.getAsJsonPrimitive().isString()) {
            String s = e.getAsString();
            for (E c : type.getEnumConstants()) {
                if (Wire.name(c).equals(s.toLowerCase(Locale.ROOT))) {
                    return c;
                }
            }
            throw ApiException.badRequest("\"" + where + name + "\" must be one of " + String.join(", ", allowed)
                    + "; got \"" + abbreviate(s) + "\"");
        }
        throw ApiException.badRequest("\"" + where + name + "\" must be one of " + String.join(", ", allowed)
                + "; got " + kind(e));
    }

    JsonArray requiredArray(String name, int maxSize) {
        JsonElement e = require(name);
        if (!e.isJsonArray()) {
            throw ApiException.badRequest("\"" + where + name + "\" must be an array, got " + kind(e));
        }
        JsonArray a = e.getAsJsonArray();
        if (a.size() > maxSize) {
            throw ApiException.badRequest("\"" + where + name + "\" may hold at most " + maxSize
                    + " entries, got " + a.size());
        }
        return a;
    }

    JsonElement get(String name) {
        return obj.get(name);
    }

    private JsonElement require(String name) {
        if (!has(name)) {
            throw ApiException.badRequest("missing required member \"" + where + name + "\"");
        }
        return obj.get(name);
    }

    static Set<String> names(String... names) {
        return Set.copyOf(Arrays.asList(names));
    }

    static String kind(JsonElement e) {
        if (e == null || e.isJsonNull()) {
            return "null";
        }
        if (e.isJsonObject()) {
            return "an object";
        }
        if (e.isJsonArray()) {
            return "an array";
        }
        JsonPrimitive p = e.getAsJsonPrimitive();
        if (p.isBoolean()) {
            return p.getAsString();
        }
        if (p.isNumber()) {
            return p.getAsBigDecimal().toPlainString();
        }
        return "\"" + abbreviate(p.getAsString()) + "\"";
    }

    static String abbreviate(String s) {
        return s.length() <= 40 ? s : s.substring(0, 40) + "…";
    }
}
