package org.precedence.runtime.service;

import com.google.gson.JsonArray;
import com.google.gson.JsonElement;
import com.google.gson.JsonObject;
import java.math.BigInteger;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import org.precedence.api.OrderRule;
import org.precedence.api.PlayerRoll;
import org.precedence.api.RandomnessMode;
import org.precedence.api.RankingConvention;
import org.precedence.api.RoundResult;
import org.precedence.api.SessionSeed;
import org.precedence.api.SessionSpec;
import org.precedence.api.TurnOrderSource;

/**
 * POST /v1/verify: recomputes every round of a submitted log and reports each difference. The
 * session is named either by its token, or (after the reveal, by anyone) by the revealed seed
 * and the parameters; a given commitment is checked against the seed. A log that does not
 * verify is a successful request with {@code "valid": false}; only a malformed log is a 400.
 * A session log in the library's own format ({@code org.precedence.runtime.replay}) may be
 * submitted instead, as member {@code log} (see {@link LogVerification}).
 */
final class VerifyEndpoint implements Endpoint {
    static final int MAX_REPORTED_MISMATCHES = 20;
    private static final Set<String> MEMBERS = JsonFields.names("token", "seed", "commitment", "mode", "rule",
            "convention", "rounds", "log");
    private static final Set<String> ROUND_MEMBERS = JsonFields.names("round", "order", "faceValues");
    private static final int MAX_FACE_VALUE_CHARS = 4096;

    private final Backend backend;

    VerifyEndpoint(Backend backend) {
        this.backend = backend;
    }

    @Override
    public Reply handle(Request request) {
        request.allowQuery(Set.of());
        JsonFields f = new JsonFields(request.bodyObject(), "", MEMBERS);
        if (f.has("log")) {
            return LogVerification.verify(f, backend);
        }
        SessionSpec spec = spec(f);
        TurnOrderSource source = backend.provider.open(spec);
        Boolean commitmentMatches = null;
        if (f.has("commitment")) {
            String c = f.requiredString("commitment", 64);
            if (!c.matches("[0-9a-fA-F]{64}")) {
                throw ApiException.badRequest("\"commitment\" must be 64 hexadecimal digits (a SHA-256 value)");
            }
            commitmentMatches = spec.seed().matchesCommitment(c);
        }
        JsonArray rounds = f.requiredArray("rounds", backend.limits.maxLogRounds());
        long rolls = 0;
        int mismatchCount = 0;
        JsonArray mismatches = new JsonArray();
        for (int i = 0; i < rounds.size(); i++) {
            String where = "rounds[" + i + "].";
            JsonObject entry = JsonFields.asObject(rounds.get(i), "rounds[" + i + "]");
            JsonFields r = new JsonFields(entry, where, ROUND_MEMBERS);
            long round = r.requiredLong("round", 0, Long.MAX_VALUE);
            List<Integer> order = order(r.requiredArray("order", backend.maxPlayers()), where + "order");
            int players = backend.players(order.size(), where + "order (its length)");
            rolls += players;
            if (rolls > backend.limits.maxSimulationRolls()) {
                throw ApiException.badRequest("the log holds more than " + backend.limits.maxSimulationRolls()
                        + " player rolls in total; submit it in parts");
            }
            RoundResult expected = source.roll(round, players);
            if (!expected.order().equals(order)) {
                mismatchCount++;
                report(mismatches, round, "order", Shapes.ints(expected.order()), Shapes.ints(order));
            }
            if (r.has("faceValues")) {
                List<BigInteger> submitted = faceValues(r.requiredArray("faceValues", players), where + "faceValues",
                        players);
                List<BigInteger> values = new ArrayList<>();
                for (PlayerRoll p : expected.rolls()) {
                    values.add(p.faceValue());
                }
                if (!values.equals(submitted)) {
                    mismatchCount++;
                    report(mismatches, round, "faceValues", Shapes.strings(values), Shapes.strings(submitted));
                }
            }
        }
        JsonObject body = new JsonObject();
        body.addProperty("valid", mismatchCount == 0 && !Boolean.FALSE.equals(commitmentMatches));
        body.addProperty("commitment", spec.seed().commitment());
        if (commitmentMatches == null) {
            body.add("commitmentMatches", com.google.gson.JsonNull.INSTANCE);
        } else {
            body.addProperty("commitmentMatches", commitmentMatches);
        }
        body.addProperty("roundsChecked", rounds.size());
        body.addProperty("mismatchCount", mismatchCount);
        body.add("mismatches", mismatches);
        return Reply.ok(body);
    }

    private SessionSpec spec(JsonFields f) {
        if (f.has("token")) {
            for (String other : List.of("seed", "mode", "rule", "convention")) {
                if (f.has(other)) {
                    throw ApiException.badRequest("give either \"token\" or \"seed\" with its parameters, not both (\""
                            + other + "\" was given with \"token\")");
                }
            }
            String token = f.requiredString("token", 4 * TokenSealer.TOKEN_CHARS);
            return backend.sessions.open(token).claims().spec();
        }
        if (!f.has("seed")) {
            throw ApiException.badRequest("missing required member \"token\" or \"seed\"");
        }
        String hex = f.requiredString("seed", 64);
        SessionSeed seed;
        try {
            seed = SessionSeed.fromHex(hex);
        } catch (IllegalArgumentException e) {
            throw ApiException.badRequest("\"seed\" must be the revealed seed, 64 hexadecimal digits");
        }
        return new SessionSpec(seed,
                f.optionalEnum("mode", RandomnessMode.class, SessionEndpoints.DEFAULT_MODE),
                f.optionalEnum("rule", OrderRule.class, OrderRule.FRESH_EACH_ROUND),
                f.optionalEnum("convention", RankingConvention.class, RankingConvention.LOWEST_FIRST));
    }

    private static List<Integer> order(JsonArray a, String name) {
        List<Integer> order = new ArrayList<>(a.size());
        for (int i = 0; i < a.size(); i++) {
            order.add((int) JsonFields.integer(a.get(i), name + "[" + i + "]", 0, 0xFFFF));
        }
        return order;
    }

    private static List<BigInteger> faceValues(JsonArray a, String name, int players) {
        if (a.size() != players) {
            throw ApiException.badRequest("\"" + name + "\" must hold one value per player (" + players
                    + "), got " + a.size());
        }
        List<BigInteger> values = new ArrayList<>(a.size());
        for (int i = 0; i < a.size(); i++) {
            JsonElement e = a.get(i);
            String text = e.isJsonPrimitive() ? e.getAsString() : "";
            if (text.isEmpty() || text.length() > MAX_FACE_VALUE_CHARS || !text.chars().allMatch(Character::isDigit)
                    || !text.chars().allMatch(c -> c < 128)) {
                throw ApiException.badRequest("\"" + name + "[" + i + "]\" must be a face value, a positive decimal "
                        + "integer (string or number), got " + JsonFields.kind(e));
            }
            values.add(new BigInteger(text));
        }
        return values;
    }

    private static void report(JsonArray mismatches, long round, String field, JsonArray expected, JsonArray got) {
        if (mismatches.size() >= MAX_REPORTED_MISMATCHES) {
            return;
        }
        JsonObject m = new JsonObject();
        m.addProperty("round", round);
        m.addProperty("field", field);
        m.add("expected", expected);
        m.add("submitted", got);
        mismatches.add(m);
    }
}
