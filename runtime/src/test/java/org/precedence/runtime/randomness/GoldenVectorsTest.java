package org.precedence.runtime.randomness;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.google.gson.JsonArray;
import com.google.gson.JsonElement;
import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.math.BigInteger;
import java.nio.charset.StandardCharsets;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.precedence.api.OrderRule;
import org.precedence.api.RankingConvention;
import org.precedence.api.SessionSeed;

/**
 * The committed golden vectors, recomputed entry by entry: key derivation, raw blocks, sampled
 * digits (including rejection-prone and multi-word radices) and whole rounds under every rule
 * and convention. Passing on JDK 17 and JDK 25 shows the results do not depend on the JDK.
 */
class GoldenVectorsTest {

    static JsonObject load() throws IOException {
        return load(GoldenVectors.V1);
    }

    static JsonObject load(GoldenVectors.Generation gen) throws IOException {
        try (InputStream in = GoldenVectorsTest.class.getResourceAsStream(gen.resource())) {
            assertTrue(in != null, "golden vectors are on the test class path");
            return JsonParser.parseReader(new InputStreamReader(in, StandardCharsets.UTF_8)).getAsJsonObject();
        }
    }

    private static long[] words(JsonArray a) {
        long[] w = new long[a.size()];
        for (int i = 0; i < w.length; i++) {
            w[i] = Long.parseUnsignedLong(a.get(i).getAsString(), 16);
        }
        return w;
    }

    static Stream<GoldenVectors.Generation> generations() {
        return Stream.of(GoldenVectors.V1, GoldenVectors.V2, GoldenVectors.V3);
    }

    @ParameterizedTest
    @MethodSource("generations")
    void keys_matchTheFile(GoldenVectors.Generation gen) throws IOException {
        for (JsonElement e : load(gen).getAsJsonArray("keys")) {
            JsonObject k = e.getAsJsonObject();
            SessionSeed seed = SessionSeed.fromHex(k.get("seed").getAsString());
            assertEquals(k.get("commitment").getAsString(), seed.commitment());
            assertEquals(k.get("fastKey").getAsString(),
                    GoldenVectors.HEX.formatHex(RollGenerator.deriveKey(gen.fastId(), seed)));
            assertEquals(k.get("secureKey").getAsString(),
                    GoldenVectors.HEX.formatHex(RollGenerator.deriveKey(RollGenerator.SECURE_ID, seed)));
        }
    }

    @ParameterizedTest
    @MethodSource("generations")
    void blocksAndDigits_matchTheFile(GoldenVectors.Generation gen) throws IOException {
        JsonObject file = load(gen);
        int n = 0;
        for (JsonElement e : file.getAsJsonArray("blocks")) {
            JsonObject b = e.getAsJsonObject();
            RollGenerator g = RollGenerator.of(b.get("algorithm").getAsString(),
                    SessionSeed.fromHex(b.get("seed").getAsString()));
            long[] c = words(b.getAsJsonArray("counter"));
            long[] out = new long[4];
            g.block(c[0], c[1], c[2], c[3], out);
            assertEquals(b.getAsJsonArray("words"), GoldenVectors.hexWords(out), b.toString());
            n++;
        }
        for (JsonElement e : file.getAsJsonArray("digits")) {
            JsonObject d = e.getAsJsonObject();
            RollGenerator g = RollGenerator.of(d.get("algorithm").getAsString(),
                    SessionSeed.fromHex(d.get("seed").getAsString()));
            long index = d.get("index").getAsLong();
            int stream = d.get("stream").getAsInt();
            int player = d.get("player").getAsInt();
            int digit = d.get("digit").getAsInt();
            BigInteger value = g.digit(index, stream, player, digit, new BigInteger(d.get("radix").getAsString()));
            assertEquals(d.get("value").getAsString(), value.toString(), d.toString());
            n++;
        }
        assertEquals(gen.counters().length * 4 + gen.digitCount(), n);
    }

    @ParameterizedTest
    @MethodSource("generations")
    void rolls_matchTheFile(GoldenVectors.Generation gen) throws IOException {
        JsonObject file = load(gen);
        JsonObject sets = file.getAsJsonObject("sets");
        int n = 0;
        for (JsonElement e : file.getAsJsonArray("rolls")) {
            JsonObject r = e.getAsJsonObject();
            String setId = r.get("set").getAsString();
            JsonObject again = GoldenVectors.roll(r.get("algorithm").getAsString(),
                    SessionSeed.fromHex(r.get("seed").getAsString()), setId, sets.get(setId).getAsString(),
                    OrderRule.valueOf(r.get("rule").getAsString()),
                    RankingConvention.valueOf(r.get("convention").getAsString()), r.get("round").getAsLong());
            assertEquals(r, again);
            n++;
        }
        assertTrue(n > 500, "rolls checked: " + n);
    }

    @Test
    void v3_groupValuesAndConstructedRolls_matchTheFile() throws IOException {
        JsonObject file = load(GoldenVectors.V3);
        int values = 0;
        for (JsonElement e : file.getAsJsonArray("groupValues")) {
            JsonObject v = e.getAsJsonObject();
            RollGenerator g = RollGenerator.of(v.get("algorithm").getAsString(),
                    SessionSeed.fromHex(v.get("seed").getAsString()));
            assertEquals(v.get("value").getAsLong(), g.groupValue(v.get("index").getAsLong(),
                    v.get("stream").getAsInt(), v.get("player").getAsInt(), v.get("product").getAsLong()), v.toString());
            values++;
        }
        assertEquals(GoldenVectors.SEEDS.size() * GoldenVectors.GROUP_PRODUCTS.length * 3, values);
        int rounds = 0;
        for (JsonElement e : file.getAsJsonArray("constructedRolls")) {
            JsonObject r = e.getAsJsonObject();
            JsonObject again = GoldenVectors.constructedRoll(r.get("algorithm").getAsString(),
                    SessionSeed.fromHex(r.get("seed").getAsString()), r.get("players").getAsInt(),
                    OrderRule.valueOf(r.get("rule").getAsString()),
                    RankingConvention.valueOf(r.get("convention").getAsString()), r.get("round").getAsLong());
            // Set id and hash included: the construction itself is pinned as well.
            assertEquals(r, again);
            rounds++;
        }
        assertTrue(rounds >= 100, "constructed rounds checked: " + rounds);
    }

    @Test
    void v3_rollsSingleDigitSetsExactlyAsV2() throws IOException {
        // The v3 promise about single-digit faces (same key, same layouts): the explicit sets'
        // rounds in both files differ only in the algorithm id.
        JsonArray v2 = load(GoldenVectors.V2).getAsJsonArray("rolls");
        JsonArray v3 = load(GoldenVectors.V3).getAsJsonArray("rolls");
        assertEquals(v2.size(), v3.size());
        int fast = 0;
        for (int i = 0; i < v2.size(); i++) {
            JsonObject a = v2.get(i).getAsJsonObject().deepCopy();
            JsonObject b = v3.get(i).getAsJsonObject().deepCopy();
            if (a.get("algorithm").getAsString().equals(RollGenerator.FAST_V2_ID)) {
                assertEquals(RollGenerator.FAST_ID, b.get("algorithm").getAsString());
                a.remove("algorithm");
                b.remove("algorithm");
                fast++;
            }
            assertEquals(a, b);
        }
        assertTrue(fast > 250, "fast rounds compared: " + fast);
    }

    @ParameterizedTest
    @MethodSource("generations")
    void generator_reproducesTheCommittedFileByteForByte(GoldenVectors.Generation gen) throws IOException {
        // The promise of every generation: the retained implementation of its algorithm ids
        // still computes exactly its committed file.
        try (InputStream in = GoldenVectorsTest.class.getResourceAsStream(gen.resource())) {
            assertTrue(in != null, gen.resource() + " is on the test class path");
            assertEquals(new String(in.readAllBytes(), StandardCharsets.UTF_8), GoldenVectors.text(gen));
        }
    }
}
