package org.precedence.runtime.service;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.precedence.runtime.service.ServiceClient.ok;

import com.google.gson.JsonArray;
import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import com.google.gson.JsonPrimitive;
import java.math.BigInteger;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.precedence.api.OrderRule;
import org.precedence.api.RandomnessMode;
import org.precedence.api.RankingConvention;
import org.precedence.api.RoundResult;
import org.precedence.api.SessionSeed;
import org.precedence.api.SessionSpec;
import org.precedence.api.TurnOrderSource;
import org.precedence.runtime.provider.FairDiceProvider;
import org.precedence.runtime.replay.SessionLogFiles;
import org.precedence.runtime.replay.SessionRecorder;

/**
 * The service wired to the real provider: for every mode, rule and convention, the rounds served
 * over HTTP are exactly the library's rounds for the same session once its seed is revealed.
 */
class ServiceWithProviderTest {
    static final FairDiceProvider PROVIDER = new FairDiceProvider();
    static RandomizerService service;
    static ServiceClient client;

    @BeforeAll
    static void start() {
        service = RandomizerService.builder().keys(KeyRing.of(KeyFiles.generate(1)))
                .provider(PROVIDER).sets(PROVIDER.sets()).start();
        client = new ServiceClient(service);
    }

    @AfterAll
    static void stop() {
        service.close();
    }

    @Test
    void rounds_everySpec_equalTheLibrarysRounds() {
        long[] rounds = {0, 1, 2, 3, 4, 5, 6, 7, 41, 1L << 40, Long.MAX_VALUE};
        int players = Math.min(4, PROVIDER.maxPlayers());
        for (RandomnessMode mode : RandomnessMode.values()) {
            for (OrderRule rule : OrderRule.values()) {
                for (RankingConvention convention : RankingConvention.values()) {
                    String body = String.format(Locale.ROOT, "{\"players\":%d,\"mode\":\"%s\",\"rule\":\"%s\","
                            + "\"convention\":\"%s\"}", players, Wire.name(mode), Wire.name(rule), Wire.name(convention));
                    String token = ok(client.post("/v1/sessions", body), 201).get("token").getAsString();
                    List<JsonObject> served = new ArrayList<>();
                    for (long k : rounds) {
                        served.add(ok(client.get("/v1/sessions/" + token + "/rounds/" + k), 200));
                    }
                    JsonObject twoPlayers = ok(client.get("/v1/sessions/" + token + "/rounds/9?players=2"), 200);
                    String seed = ok(client.post("/v1/sessions/" + token + "/reveal", ""), 200)
                            .get("seed").getAsString();

                    TurnOrderSource library = PROVIDER.open(
                            new SessionSpec(SessionSeed.fromHex(seed), mode, rule, convention));
                    for (int i = 0; i < rounds.length; i++) {
                        RoundResult expected = library.roll(rounds[i], players);
                        JsonObject got = served.get(i);
                        String where = mode + " " + rule + " " + convention + " round " + rounds[i];
                        assertEquals(Shapes.ints(expected.order()), got.get("order"), where);
                        assertEquals(Shapes.round(expected), got, where);
                    }
                    assertEquals(Shapes.round(library.roll(9, 2)), twoPlayers);
                }
            }
        }
    }

    /** A log written by the library's recorder verifies over HTTP exactly as the library replays it. */
    @Test
    void verify_libraryLog_validUntilAltered() {
        SessionSpec spec = new SessionSpec(SessionSeed.fromText("tidepool-market"), RandomnessMode.SECURE,
                OrderRule.SNAKE, RankingConvention.LOWEST_FIRST);
        SessionRecorder recorder = new SessionRecorder(PROVIDER.open(spec));
        for (long k = 0; k < 5; k++) {
            recorder.play(k, k == 3 ? List.of("heron", "otter") : List.of("heron", "otter", "lynx"));
        }
        String revealed = SessionLogFiles.toJson(recorder.log(true));
        JsonObject v = ok(client.post("/v1/verify", "{\"log\":" + revealed + "}"), 200);
        assertTrue(v.get("valid").getAsBoolean(), v.toString());
        assertEquals(5, v.get("roundsChecked").getAsInt());
        assertTrue(v.get("mismatch").isJsonNull());

        String committed = SessionLogFiles.toJson(recorder.log(false));
        ServiceClient.error(client.post("/v1/verify", "{\"log\":" + committed + "}"), 400, "malformed_log");
        v = ok(client.post("/v1/verify", "{\"log\":" + committed + ",\"seed\":\"" + spec.seed().toHex() + "\"}"), 200);
        assertTrue(v.get("valid").getAsBoolean(), v.toString());

        JsonObject altered = JsonParser.parseString(revealed).getAsJsonObject();
        JsonObject round2 = altered.getAsJsonArray("rounds").get(2).getAsJsonObject();
        JsonArray faces = round2.getAsJsonArray("faces");
        faces.set(0, new JsonPrimitive(new BigInteger(faces.get(0).getAsString()).add(BigInteger.ONE).toString()));
        JsonObject body = new JsonObject();
        body.add("log", altered);
        v = ok(client.post("/v1/verify", body.toString()), 200);
        assertFalse(v.get("valid").getAsBoolean());
        assertEquals(2, v.getAsJsonObject("mismatch").get("round").getAsLong());
        assertEquals(2, v.get("roundsChecked").getAsInt());

        ServiceClient.error(client.post("/v1/verify", "{\"log\":{\"format\":\"something-else\"}}"), 400,
                "malformed_log");
        ServiceClient.error(client.post("/v1/verify", "{\"log\":" + revealed + ",\"rounds\":[]}"), 400,
                "bad_request");
    }

    @Test
    void set_served_isTheProvidersSet() {
        JsonObject set = ok(client.get("/v1/sets/3"), 200);
        assertEquals(PROVIDER.sets().forPlayers(3).id(), set.get("id").getAsString());
        assertEquals(PROVIDER.sets().forPlayers(3).sha256(), set.get("sha256").getAsString());
        assertEquals("order_fair", set.get("grade").getAsString());
    }
}
