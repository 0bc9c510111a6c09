package org.precedence.runtime.service;

import com.google.gson.JsonArray;
import com.google.gson.JsonElement;
import com.google.gson.JsonNull;
import com.google.gson.JsonObject;
import com.google.gson.JsonPrimitive;
import com.google.gson.Strictness;
import com.google.gson.stream.JsonReader;
import com.google.gson.stream.JsonToken;
import com.google.gson.stream.MalformedJsonException;
import java.io.EOFException;
import java.io.IOException;
import java.io.StringReader;
import java.math.BigDecimal;

/**
 * Parses request bodies as strict JSON (RFC 8259): one value, no comments, no trailing data, no
 * duplicate member names (RFC 8259 §4 leaves their meaning open, so we refuse them), at most
 * {@value #MAX_DEPTH} levels of nesting. Numbers stay exact ({@link BigDecimal}).
 */
final class StrictJson {
    static final int MAX_DEPTH = 16;

    private StrictJson() {
    }

    /** Parses a body that must be one JSON object. */
    static JsonObject parseObject(String text) {
        if (text.isBlank()) {
            throw ApiException.badJson("the request body is empty; a JSON object is required");
        }
        try (JsonReader reader = new JsonReader(new StringReader(text))) {
            reader.setStrictness(Strictness.STRICT);
            if (reader.peek() != JsonToken.BEGIN_OBJECT) {
                throw ApiException.badJson("the request body must be a JSON object, got " + describe(reader.peek()));
            }
            JsonElement value = read(reader, 0);
            if (reader.peek() != JsonToken.END_DOCUMENT) {
                throw ApiException.badJson("unexpected data after the JSON object at " + reader.getPath());
            }
            return value.getAsJsonObject();
        } catch (MalformedJsonException | EOFException | IllegalStateException | NumberFormatException e) {
            throw ApiException.badJson("the request body is not valid JSON: " + firstLine(e.getMessage()));
        } catch (IOException e) {
            throw ApiException.badJson("the request body could not be read as JSON: " + firstLine(e.getMessage()));
        }
    }

    private static JsonElement read(JsonReader reader, int depth) throws IOException {
        if (depth > MAX_DEPTH) {
            throw ApiException.badJson("JSON nested deeper than " + MAX_DEPTH + " levels at " + reader.getPath());
        }
        switch (reader.peek()) {
            case BEGIN_OBJECT: {
                JsonObject obj = new JsonObject();
                reader.beginObject();
                while (reader.hasNext()) {
                    String name = reader.nextName();
                    if (obj.has(name)) {
                        throw ApiException.badJson("duplicate member \"" + name + "\" at " + reader.getPath());
                    }
                    obj.add(name, read(reader, depth + 1));
                }
                reader.endObject();
                return obj;
            }
            case BEGIN_ARRAY: {
                JsonArray arr = new JsonArray();
                reader.beginArray();
                while (reader.hasNext()) {
                    arr.add(read(reader, depth + 1));
                }
                reader.endArray();
                return arr;
            }
            case STRING:
                return new JsonPrimitive(reader.nextString());
            case NUMBER:
                return new JsonPrimitive(new BigDecimal(reader.nextString()));
            case BOOLEAN:
                return new JsonPrimitive(reader.nextBoolean());
            case NULL:
                reader.nextNull();
                return JsonNull.INSTANCE;
            default:
                throw ApiException.badJson("unexpected " + describe(reader.peek()) + " at " + reader.getPath());
        }
    }

    private static String describe(JsonToken token) {
        switch (token) {
            case BEGIN_ARRAY:
                return "an array";
            case STRING:
                return "a string";
            case NUMBER:
                return "a number";
            case BOOLEAN:
                return "a boolean";
            case NULL:
                return "null";
            case END_DOCUMENT:
                return "nothing";
            default:
                return token.name().toLowerCase(java.util.Locale.ROOT);
        }
    }

    private static String firstLine(String message) {
        if (message == null) {
            return "unexpected end of input";
        }
        int nl = message.indexOf('\n');
        String line = nl < 0 ? message : message.substring(0, nl);
        // Gson appends a link to its troubleshooting page; the client needs only the position.
        int see = line.indexOf("\nSee ");
        return see < 0 ? line : line.substring(0, see);
    }
}
