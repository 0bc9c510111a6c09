package org.precedence.runtime.service;

import com.google.gson.JsonArray;
import com.google.gson.JsonObject;
import com.google.gson.stream.JsonWriter;
import java.io.IOException;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.math.BigInteger;
import org.precedence.api.PlayerRoll;
import org.precedence.api.RoundResult;
import org.precedence.runtime.dice.DieNames;
import org.precedence.runtime.dice.ExplicitDice;
import org.precedence.runtime.dice.MixedRadixDice;

/**
 * The JSON shapes of responses. Side counts, face indices and face values are decimal strings,
 * since constructed sets exceed what a double (and so a JavaScript number) holds exactly.
 */
final class Shapes {
    /** Explicit sets with at most this many faces in total list their faces. */
    static final int MAX_LISTED_FACES = 4096;

    private Shapes() {
    }

    static JsonObject set(MixedRadixDice set) {
        JsonObject o = new JsonObject();
        o.addProperty("players", set.players());
        o.addProperty("id", set.id());
        o.addProperty("sha256", set.sha256());
        o.addProperty("grade", Wire.name(set.grade()));
        o.addProperty("subsetDepth", set.subsetDepth());
        o.addProperty("digits", set.digits());
        JsonArray dice = new JsonArray();
        for (int d = 0; d < set.players(); d++) {
            JsonObject die = new JsonObject();
            die.addProperty("die", DieNames.of(d));
            die.addProperty("sides", set.sides(d).toString());
            JsonArray radices = new JsonArray();
            for (int j = 0; j < set.digits(); j++) {
                radices.add(set.radix(d, j).toString());
            }
            die.add("radices", radices);
            dice.add(die);
        }
        o.add("dice", dice);
        if (set instanceof ExplicitDice explicit && explicit.set().totalFaces() <= MAX_LISTED_FACES) {
            JsonArray faces = new JsonArray();
            for (int d = 0; d < set.players(); d++) {
                JsonArray f = new JsonArray();
                for (long v : explicit.set().faces(d)) {
                    f.add(v);
                }
                faces.add(f);
            }
            o.add("faces", faces);
        }
        return o;
    }

    static JsonObject setSummary(MixedRadixDice set) {
        JsonObject o = new JsonObject();
        o.addProperty("id", set.id());
        o.addProperty("sha256", set.sha256());
        o.addProperty("grade", Wire.name(set.grade()));
        return o;
    }

    static JsonObject round(RoundResult r) {
        JsonObject o = new JsonObject();
        o.addProperty("round", r.round());
        o.addProperty("players", r.players());
        o.add("order", ints(r.order()));
        JsonArray rolls = new JsonArray();
        for (PlayerRoll p : r.rolls()) {
            JsonObject roll = new JsonObject();
            roll.addProperty("player", p.player());
            roll.addProperty("die", p.die());
            roll.addProperty("faceIndex", p.faceIndex().toString());
            roll.addProperty("faceValue", p.faceValue().toString());
            roll.addProperty("position", p.position());
            rolls.add(roll);
        }
        o.add("rolls", rolls);
        o.addProperty("grade", Wire.name(r.grade()));
        o.addProperty("setId", r.setId());
        return o;
    }

    /**
     * The same document as {@link #round}, streamed with Gson's {@link JsonWriter} without
     * building a tree: round requests are the hot path.
     */
    static String roundJson(RoundResult r) {
        StringWriter text = new StringWriter(160 + 96 * r.players());
        try (JsonWriter w = new JsonWriter(text)) {
            w.setHtmlSafe(false);
            w.beginObject();
            w.name("round").value(r.round());
            w.name("players").value(r.players());
            w.name("order").beginArray();
            for (int p : r.order()) {
                w.value(p);
            }
            w.endArray();
            w.name("rolls").beginArray();
            for (PlayerRoll p : r.rolls()) {
                w.beginObject();
                w.name("player").value(p.player());
                w.name("die").value(p.die());
                w.name("faceIndex").value(p.faceIndex().toString());
                w.name("faceValue").value(p.faceValue().toString());
                w.name("position").value(p.position());
                w.endObject();
            }
            w.endArray();
            w.name("grade").value(Wire.name(r.grade()));
            w.name("setId").value(r.setId());
            w.endObject();
        } catch (IOException e) {
            throw new UncheckedIOException("a StringWriter does not fail", e);
        }
        return text.toString();
    }

    /** The public description of a session: everything but the seed. */
    static JsonObject session(SessionClaims c, Sessions sessions) {
        JsonObject o = new JsonObject();
        o.addProperty("commitment", c.seed().commitment());
        o.addProperty("players", c.players());
        o.addProperty("mode", Wire.name(c.mode()));
        o.addProperty("rule", Wire.name(c.rule()));
        o.addProperty("convention", Wire.name(c.convention()));
        o.addProperty("createdAt", c.createdAt().toString());
        o.addProperty("expiresAt", sessions.expiresAt(c).toString());
        return o;
    }

    static JsonArray ints(Iterable<Integer> values) {
        JsonArray a = new JsonArray();
        for (Integer v : values) {
            a.add(v);
        }
        return a;
    }

    static JsonArray strings(Iterable<BigInteger> values) {
        JsonArray a = new JsonArray();
        for (BigInteger v : values) {
            a.add(v.toString());
        }
        return a;
    }
}
