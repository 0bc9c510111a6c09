package org.precedence.runtime.service;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.precedence.runtime.service.ServiceClient.error;
import static org.precedence.runtime.service.ServiceClient.ok;

import com.google.gson.JsonArray;
import com.google.gson.JsonElement;
import com.google.gson.JsonObject;
import java.io.ByteArrayInputStream;
import java.io.InputStream;
import java.io.OutputStream;
import java.net.InetAddress;
import java.net.InetSocketAddress;
import java.net.Socket;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.time.Duration;
import java.time.Instant;
import java.util.ArrayList;
import java.util.Base64;
import java.util.HexFormat;
import java.util.List;
import java.util.concurrent.Callable;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.precedence.api.OrderRule;
import org.precedence.api.RandomnessMode;
import org.precedence.api.RankingConvention;
import org.precedence.api.RoundResult;
import org.precedence.api.SessionSeed;
import org.precedence.api.SessionSpec;
import org.precedence.api.TurnOrderSource;

/**
 * The service over real HTTP: started on an ephemeral loopback port with the test provider and
 * set source ({@link TestBackends}), driven by {@code java.net.http}.
 */
class RandomizerServiceTest {
    static final ServiceLimits LIMITS = ServiceLimits.defaults().withMaxBodyBytes(4096).withSimulation(5000, 20_000)
            .withThreads(4).withMaxSessionAge(Duration.ofHours(2)).withMaxLogRounds(50)
            .withTimeouts(Duration.ofSeconds(2), Duration.ofSeconds(5), Duration.ofSeconds(10));
    static final TestBackends.Provider PROVIDER = new TestBackends.Provider();
    static MutableClock clock;
    static RandomizerService service;
    static ServiceClient client;

    @BeforeAll
    static void start() {
        clock = new MutableClock(Instant.parse("2026-05-01T19:00:00Z"));
        service = RandomizerService.builder()
                .keys(KeyRing.of(TokenSealerTest.key(4, 0x44)))
                .provider(PROVIDER).sets(new TestBackends.Sets()).limits(LIMITS).clock(clock)
                .start();
        client = new ServiceClient(service);
    }

    @AfterAll
    static void stop() {
        service.close();
    }

    static JsonObject createSession(String body) {
        return ok(client.post("/v1/sessions", body), 201);
    }

    @Test
    void start_defaultAddress_isLoopbackEphemeralPort() {
        assertTrue(service.address().getAddress().isLoopbackAddress());
        assertTrue(service.address().getPort() > 0);
        assertTrue(service.baseUri().toString().endsWith("/v1/"));
    }

    @Test
    void health_get_reportsProviderAndLimits() {
        JsonObject h = ok(client.get("/v1/health"), 200);
        assertEquals("ok", h.get("status").getAsString());
        assertEquals("test-provider", h.get("provider").getAsString());
        assertEquals(8, h.getAsJsonObject("limits").get("maxPlayers").getAsInt());
        assertEquals(4096, h.getAsJsonObject("limits").get("maxBodyBytes").getAsInt());
    }

    @Test
    void sets_players_describesTheServedSet() {
        JsonObject s = ok(client.get("/v1/sets/2"), 200);
        assertEquals(2, s.get("players").getAsInt());
        assertEquals("test-palindrome-2", s.get("id").getAsString());
        // ABBA: A has faces 1 and 4, B has 2 and 3; two dice of two sides, order-fair.
        assertEquals("order_fair", s.get("grade").getAsString());
        assertEquals("[[1,4],[2,3]]", s.get("faces").toString());
        assertEquals("2", s.getAsJsonArray("dice").get(1).getAsJsonObject().get("sides").getAsString());
        assertEquals(64, s.get("sha256").getAsString().length());
    }

    @ParameterizedTest
    @ValueSource(strings = {"/v1/sets/1", "/v1/sets/9", "/v1/sets/0", "/v1/sets/abc", "/v1/sets/-3",
        "/v1/sets/99999999999", "/v1/sets/4?grade=best", "/v1/sets/4?color=red", "/v1/sets/4?grade=a&grade=b"})
    void sets_badCountOrQuery_is400(String path) {
        error(client.get(path), 400, path.contains("color") ? "unknown_parameter" : "bad_request");
    }

    @Test
    void create_validBody_returnsTokenCommitmentAndParameters() {
        HttpResponse<String> r = client.post("/v1/sessions", "{\"players\":4,\"rule\":\"snake\"}");
        JsonObject s = ok(r, 201);
        String token = s.get("token").getAsString();
        assertEquals(TokenSealer.TOKEN_CHARS, token.length());
        assertEquals("/v1/sessions/" + token, r.headers().firstValue("Location").orElseThrow());
        assertEquals("no-store", r.headers().firstValue("Cache-Control").orElseThrow());
        assertTrue(s.get("commitment").getAsString().matches("[0-9a-f]{64}"));
        assertEquals(4, s.get("keyId").getAsInt());
        assertEquals("secure", s.get("mode").getAsString());
        assertEquals("snake", s.get("rule").getAsString());
        assertEquals("lowest_first", s.get("convention").getAsString());
        assertEquals(clock.instant().toString(), s.get("createdAt").getAsString());
        assertEquals("test-palindrome-4", s.getAsJsonObject("set").get("id").getAsString());
        assertFalse(r.body().contains("\"seed\""), "the seed stays sealed");

        JsonObject described = ok(client.get("/v1/sessions/" + token), 200);
        assertEquals(s.get("commitment"), described.get("commitment"));
        assertEquals("snake", described.get("rule").getAsString());
    }

    @ParameterizedTest
    @ValueSource(strings = {"{}", "{\"players\":\"4\"}", "{\"players\":4.5}", "{\"players\":1}", "{\"players\":9}",
        "{\"players\":1e400}", "{\"players\":-1e-9999}", "{\"players\":null}", "{\"players\":4,\"mode\":\"quick\"}",
        "{\"players\":4,\"mode\":3}", "{\"players\":4,\"rule\":[]}"})
    void create_invalidMember_is400(String body) {
        error(client.post("/v1/sessions", body), 400, "bad_request");
    }

    @ParameterizedTest
    @ValueSource(strings = {"", "{", "[4]", "{\"players\":4}{}", "{\"players\":4,\"players\":5}", "{players:4}"})
    void create_malformedJson_is400(String body) {
        error(client.post("/v1/sessions", body), 400, "malformed_json");
    }

    @Test
    void create_unknownMember_is400NamingIt() {
        JsonObject e = error(client.post("/v1/sessions", "{\"players\":4,\"plaeyrs\":4}"), 400, "unknown_field");
        assertTrue(e.get("detail").getAsString().contains("plaeyrs"));
    }

    @Test
    void create_invalidUtf8_is400() {
        byte[] body = {'{', '"', 'a', '"', ':', '"', (byte) 0xC3, (byte) 0x28, '"', '}'};
        error(client.send(HttpRequest.newBuilder(client.uri("/v1/sessions")).header("Content-Type", "application/json")
                .POST(HttpRequest.BodyPublishers.ofByteArray(body))), 400, "malformed_json");
    }

    @Test
    void create_wrongContentType_is415() {
        error(client.send(HttpRequest.newBuilder(client.uri("/v1/sessions")).header("Content-Type", "text/plain")
                .POST(HttpRequest.BodyPublishers.ofString("{\"players\":4}"))), 415, "unsupported_media_type");
    }

    @Test
    void create_oversizedBodyWithLength_is413() {
        String big = "{\"players\":4,\"pad\":\"" + "x".repeat(10_000) + "\"}";
        error(client.post("/v1/sessions", big), 413, "body_too_large");
    }

    @Test
    void create_oversizedChunkedBody_is413() {
        byte[] big = ("{\"players\":4,\"pad\":\"" + "x".repeat(10_000) + "\"}").getBytes(StandardCharsets.UTF_8);
        HttpResponse<String> r = client.send(HttpRequest.newBuilder(client.uri("/v1/sessions"))
                .header("Content-Type", "application/json")
                .POST(HttpRequest.BodyPublishers.ofInputStream(() -> new ByteArrayInputStream(big))));
        error(r, 413, "body_too_large");
    }

    @Test
    void rounds_anyRound_matchTheLibraryAfterReveal() {
        String token = createSession("{\"players\":5,\"mode\":\"fast\",\"convention\":\"highest_first\"}")
                .get("token").getAsString();
        long[] rounds = {0, 1, 2, 17, 1_000_000_000L, Long.MAX_VALUE};
        List<JsonObject> served = new ArrayList<>();
        for (long k : rounds) {
            served.add(ok(client.get("/v1/sessions/" + token + "/rounds/" + k), 200));
        }
        JsonObject smaller = ok(client.get("/v1/sessions/" + token + "/rounds/3?players=3"), 200);

        JsonObject revealed = ok(client.post("/v1/sessions/" + token + "/reveal", ""), 200);
        SessionSeed seed = SessionSeed.fromHex(revealed.get("seed").getAsString());
        TurnOrderSource library = PROVIDER.open(new SessionSpec(seed, RandomnessMode.FAST,
                OrderRule.FRESH_EACH_ROUND, RankingConvention.HIGHEST_FIRST));
        for (int i = 0; i < rounds.length; i++) {
            assertEquals(Shapes.round(library.roll(rounds[i], 5)), served.get(i), "round " + rounds[i]);
        }
        assertEquals(Shapes.round(library.roll(3, 3)), smaller);
    }

    @Test
    void reveal_seed_hashesToTheCommitment() throws Exception {
        JsonObject s = createSession("{\"players\":3}");
        JsonObject r = ok(client.post("/v1/sessions/" + s.get("token").getAsString() + "/reveal", "{}"), 200);
        byte[] seed = HexFormat.of().parseHex(r.get("seed").getAsString());
        // The commitment is SHA-256 (FIPS 180-4) of the 32 seed bytes, recomputed here
        // independently of SessionSeed with the JDK's MessageDigest.
        byte[] digest = MessageDigest.getInstance("SHA-256").digest(seed);
        assertEquals(s.get("commitment").getAsString(), HexFormat.of().formatHex(digest));
        assertEquals(s.get("commitment"), r.get("commitment"));
    }

    @ParameterizedTest
    @ValueSource(strings = {"-1", "1.0", "abc", "9223372036854775808", "99999999999999999999", "+5", "0x10"})
    void rounds_badRoundNumber_is400(String round) {
        String token = createSession("{\"players\":3}").get("token").getAsString();
        error(client.get("/v1/sessions/" + token + "/rounds/" + round), 400, "bad_request");
    }

    @Test
    void rounds_badPlayersQuery_is400() {
        String token = createSession("{\"players\":3}").get("token").getAsString();
        error(client.get("/v1/sessions/" + token + "/rounds/1?players=1"), 400, "bad_request");
        error(client.get("/v1/sessions/" + token + "/rounds/1?players=x"), 400, "bad_request");
        error(client.get("/v1/sessions/" + token + "/rounds/1?seats=3"), 400, "unknown_parameter");
    }

    @Test
    void tokens_forgedOrAltered_are400() {
        String token = createSession("{\"players\":3}").get("token").getAsString();
        byte[] raw = Base64.getUrlDecoder().decode(token);
        raw[40] ^= 0x10;
        String altered = Base64.getUrlEncoder().withoutPadding().encodeToString(raw);
        String foreign;
        try (RandomizerService other = RandomizerService.builder().keys(KeyRing.of(TokenSealerTest.key(4, 0x45)))
                .provider(PROVIDER).sets(new TestBackends.Sets()).limits(LIMITS).clock(clock).start()) {
            foreign = ok(new ServiceClient(other).post("/v1/sessions", "{\"players\":3}"), 201).get("token").getAsString();
        }
        String random = "A".repeat(TokenSealer.TOKEN_CHARS);
        for (String bad : List.of(altered, foreign, random, token.substring(1), token + "x", "not-a-token")) {
            error(client.get("/v1/sessions/" + bad + "/rounds/0"), 400, "invalid_token");
            error(client.get("/v1/sessions/" + bad), 400, "invalid_token");
            error(client.post("/v1/sessions/" + bad + "/reveal", ""), 400, "invalid_token");
        }
    }

    @Test
    void tokens_afterMaxAge_are410() {
        String token = createSession("{\"players\":3}").get("token").getAsString();
        ok(client.get("/v1/sessions/" + token + "/rounds/0"), 200);
        clock.advance(Duration.ofHours(3));
        try {
            error(client.get("/v1/sessions/" + token + "/rounds/0"), 410, "session_expired");
        } finally {
            clock.advance(Duration.ofHours(-3));
        }
    }

    @Test
    void verify_byTokenAndBySeed_acceptsTheServedLogAndFlagsChanges() {
        JsonObject s = createSession("{\"players\":4,\"mode\":\"fast\"}");
        String token = s.get("token").getAsString();
        JsonArray log = new JsonArray();
        for (int k = 0; k < 6; k++) {
            JsonObject round = ok(client.get("/v1/sessions/" + token + "/rounds/" + k), 200);
            JsonObject entry = new JsonObject();
            entry.addProperty("round", k);
            entry.add("order", round.get("order"));
            JsonArray faces = new JsonArray();
            for (JsonElement roll : round.getAsJsonArray("rolls")) {
                faces.add(roll.getAsJsonObject().get("faceValue"));
            }
            entry.add("faceValues", faces);
            log.add(entry);
        }
        JsonObject byToken = new JsonObject();
        byToken.addProperty("token", token);
        byToken.add("rounds", log);
        JsonObject v = ok(client.post("/v1/verify", byToken.toString()), 200);
        assertTrue(v.get("valid").getAsBoolean(), v.toString());
        assertEquals(6, v.get("roundsChecked").getAsInt());
        assertTrue(v.get("commitmentMatches").isJsonNull(), "no commitment submitted: " + v);

        String seed = ok(client.post("/v1/sessions/" + token + "/reveal", ""), 200).get("seed").getAsString();
        JsonObject bySeed = new JsonObject();
        bySeed.addProperty("seed", seed);
        bySeed.addProperty("commitment", s.get("commitment").getAsString());
        bySeed.addProperty("mode", "fast");
        bySeed.add("rounds", log);
        v = ok(client.post("/v1/verify", bySeed.toString()), 200);
        assertTrue(v.get("valid").getAsBoolean(), v.toString());
        assertTrue(v.get("commitmentMatches").getAsBoolean());

        // Swap the first two players of round 2: one order mismatch, reported with both orders.
        JsonArray order = log.get(2).getAsJsonObject().getAsJsonArray("order");
        JsonElement first = order.get(0);
        order.set(0, order.get(1));
        order.set(1, first);
        v = ok(client.post("/v1/verify", bySeed.toString()), 200);
        assertFalse(v.get("valid").getAsBoolean());
        assertEquals(1, v.get("mismatchCount").getAsInt());
        JsonObject m = v.getAsJsonArray("mismatches").get(0).getAsJsonObject();
        assertEquals(2, m.get("round").getAsInt());
        assertEquals("order", m.get("field").getAsString());
        assertEquals(order, m.get("submitted"));

        bySeed.addProperty("commitment", "0".repeat(64));
        v = ok(client.post("/v1/verify", bySeed.toString()), 200);
        assertFalse(v.get("commitmentMatches").getAsBoolean());
        assertFalse(v.get("valid").getAsBoolean());
    }

    @ParameterizedTest
    @ValueSource(strings = {"{\"rounds\":[]}", "{\"seed\":\"abc\",\"rounds\":[]}",
        "{\"seed\":\"" + "0000000000000000000000000000000000000000000000000000000000000000"
                + "\",\"token\":\"x\",\"rounds\":[]}",
        "{\"seed\":\"" + "0000000000000000000000000000000000000000000000000000000000000000" + "\"}",
        "{\"seed\":\"" + "0000000000000000000000000000000000000000000000000000000000000000"
                + "\",\"rounds\":[{\"round\":0,\"order\":[0]}]}",
        "{\"seed\":\"" + "0000000000000000000000000000000000000000000000000000000000000000"
                + "\",\"rounds\":[{\"round\":-1,\"order\":[0,1]}]}",
        "{\"seed\":\"" + "0000000000000000000000000000000000000000000000000000000000000000"
                + "\",\"rounds\":[{\"round\":0,\"order\":[0,1],\"faceValues\":[\"1\"]}]}",
        "{\"seed\":\"" + "0000000000000000000000000000000000000000000000000000000000000000"
                + "\",\"rounds\":[5]}",
        "{\"seed\":\"" + "0000000000000000000000000000000000000000000000000000000000000000"
                + "\",\"commitment\":\"xyz\",\"rounds\":[]}"})
    void verify_malformedLog_is400(String body) {
        error(client.post("/v1/verify", body), 400, "bad_request");
    }

    @Test
    void verify_tooManyRounds_is400() {
        JsonObject e = error(client.post("/v1/verify", log(LIMITS.maxLogRounds() + 1)), 400, "bad_request");
        assertTrue(e.get("detail").getAsString().contains("at most 50"), e.toString());
        ok(client.post("/v1/verify", log(LIMITS.maxLogRounds())), 200);
    }

    /** An oversized body is read to its end before the 413, so the answer always arrives. */
    @Test
    void verify_oversizedLog_is413AndConnectionSurvives() {
        for (int i = 0; i < 5; i++) {
            error(client.post("/v1/verify", log(5_000)), 413, "body_too_large");
        }
        ok(client.get("/v1/health"), 200);
    }

    private static String log(int rounds) {
        StringBuilder sb = new StringBuilder("{\"seed\":\"" + "1".repeat(64) + "\",\"rounds\":[");
        for (int i = 0; i < rounds; i++) {
            sb.append(i == 0 ? "" : ",").append("{\"round\":").append(i).append(",\"order\":[0,1]}");
        }
        return sb.append("]}").toString();
    }

    @Test
    void simulate_seeded_isReproducibleAndConsistent() {
        String body = "{\"players\":3,\"rounds\":3000,\"seed\":\"lantern-festival\"}";
        JsonObject a = ok(client.post("/v1/simulate", body), 200);
        JsonObject b = ok(client.post("/v1/simulate", body), 200);
        assertEquals(a, b);
        assertEquals(SessionSeed.fromText("lantern-festival").toHex(), a.get("seed").getAsString());

        long[] lead = longs(a.getAsJsonArray("leadCounts"));
        assertEquals(3000, sum(lead));
        for (JsonElement row : a.getAsJsonArray("positionCounts")) {
            assertEquals(3000, sum(longs(row.getAsJsonArray())));
        }
        long[] rankings = new long[6];
        int i = 0;
        for (String name : List.of("ABC", "ACB", "BAC", "BCA", "CAB", "CBA")) {
            JsonElement c = a.getAsJsonObject("rankingCounts").get(name);
            rankings[i++] = c == null ? 0 : c.getAsLong();
        }
        assertEquals(3000, sum(rankings));
        assertEquals(SimulateEndpoint.chiSquare(rankings, 3000),
                a.getAsJsonObject("chiSquare").get("ranking").getAsDouble(), 1e-9);
        assertEquals(5, a.getAsJsonObject("chiSquare").get("rankingDegreesOfFreedom").getAsInt());

        // Tallies agree with the library's own rolls of the same seed.
        TurnOrderSource library = PROVIDER.open(SessionSpec.of(SessionSeed.fromText("lantern-festival")));
        long[] expectedLead = new long[3];
        for (int r = 0; r < 3000; r++) {
            RoundResult rr = library.roll(r, 3);
            expectedLead[rr.first()]++;
        }
        assertArrayEquals(expectedLead, lead);
    }

    @ParameterizedTest
    @ValueSource(strings = {"{\"players\":3,\"rounds\":5001}", "{\"players\":8,\"rounds\":5000}",
        "{\"players\":3,\"rounds\":0}", "{\"players\":3}", "{\"players\":3,\"rounds\":10,\"seed\":\"   \"}",
        "{\"players\":3,\"rounds\":10,\"seed\":\"hex:12\"}"})
    void simulate_beyondLimitsOrInvalid_is400(String body) {
        error(client.post("/v1/simulate", body), 400, "bad_request");
    }

    @ParameterizedTest
    @ValueSource(strings = {"/", "/v1", "/v1/", "/v2/health", "/v1/sets", "/v1/sets/", "/v1/sessions/x/rounds",
        "/v1/sessions/x/rounds/1/2", "/v1/healthz", "/v1/sets/4/extra"})
    void unknownPath_is404(String path) {
        error(client.get(path), 404, "not_found");
    }

    @Test
    void wrongMethod_is405WithAllow() {
        HttpResponse<String> r = client.get("/v1/sessions");
        error(r, 405, "method_not_allowed");
        assertEquals("POST", r.headers().firstValue("Allow").orElseThrow());
        r = client.post("/v1/sets/4", "{}");
        error(r, 405, "method_not_allowed");
        assertEquals("GET", r.headers().firstValue("Allow").orElseThrow());
        error(client.send(HttpRequest.newBuilder(client.uri("/v1/health")).DELETE()), 405, "method_not_allowed");
        error(client.send(HttpRequest.newBuilder(client.uri("/v1/verify"))
                .method("PUT", HttpRequest.BodyPublishers.ofString("{}"))), 405, "method_not_allowed");
    }

    @Test
    void concurrentClients_allServedCorrectly() throws Exception {
        String token = createSession("{\"players\":6,\"mode\":\"fast\"}").get("token").getAsString();
        ExecutorService pool = Executors.newFixedThreadPool(16);
        try {
            List<Callable<List<JsonObject>>> jobs = new ArrayList<>();
            for (int t = 0; t < 16; t++) {
                int offset = t;
                jobs.add(() -> {
                    List<JsonObject> got = new ArrayList<>();
                    for (int k = 0; k < 25; k++) {
                        got.add(ok(client.get("/v1/sessions/" + token + "/rounds/" + (offset * 25 + k)), 200));
                    }
                    error(client.post("/v1/sessions", "{\"players\":0}"), 400, "bad_request");
                    return got;
                });
            }
            List<Future<List<JsonObject>>> results = pool.invokeAll(jobs);
            String seed = ok(client.post("/v1/sessions/" + token + "/reveal", ""), 200).get("seed").getAsString();
            TurnOrderSource library = PROVIDER.open(SessionSpec.of(SessionSeed.fromHex(seed)));
            for (int t = 0; t < 16; t++) {
                List<JsonObject> got = results.get(t).get();
                for (int k = 0; k < 25; k++) {
                    assertEquals(Shapes.round(library.roll(t * 25 + k, 6)), got.get(k));
                }
            }
        } finally {
            pool.shutdownNow();
        }
    }

    /** A client that sends half a request and stalls is disconnected after the request timeout. */
    @Test
    void slowClient_isDisconnected() throws Exception {
        long timeoutMillis = Long.getLong("sun.net.httpserver.maxReqTime") * 1000;
        try (Socket s = new Socket()) {
            s.connect(new InetSocketAddress(InetAddress.getLoopbackAddress(), service.address().getPort()));
            s.setSoTimeout((int) timeoutMillis + 15_000);
            OutputStream out = s.getOutputStream();
            out.write("POST /v1/sessions HTTP/1.1\r\nHost: x\r\nContent-Length: 100\r\n\r\n{\"pla"
                    .getBytes(StandardCharsets.US_ASCII));
            out.flush();
            long start = System.nanoTime();
            InputStream in = s.getInputStream();
            int read;
            try {
                while ((read = in.read()) >= 0) {
                    // The server may answer (a 4xx) before closing; keep reading to the end.
                    assertTrue(read >= 0);
                }
            } catch (java.net.SocketException reset) {
                // a reset also closes the connection
            }
            long elapsed = (System.nanoTime() - start) / 1_000_000;
            // The JDK server checks its timers once a second (sun.net.httpserver.timerMillis).
            assertTrue(elapsed >= timeoutMillis - 1000 && elapsed < timeoutMillis + 4000,
                    "closed after " + elapsed + " ms, request timeout " + timeoutMillis + " ms");
        }
    }

    private static long[] longs(JsonArray a) {
        long[] r = new long[a.size()];
        for (int i = 0; i < r.length; i++) {
            r[i] = a.get(i).getAsLong();
        }
        return r;
    }

    private static long sum(long[] values) {
        long s = 0;
        for (long v : values) {
            s += v;
        }
        return s;
    }
}
