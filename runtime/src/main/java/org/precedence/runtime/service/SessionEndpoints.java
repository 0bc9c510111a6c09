package org.precedence.runtime.service;

import com.google.gson.JsonObject;
import java.time.Instant;
import java.util.Set;
import org.precedence.api.FairnessGrade;
import org.precedence.api.OrderRule;
import org.precedence.api.RandomnessMode;
import org.precedence.api.RankingConvention;
import org.precedence.api.RoundResult;
import org.precedence.api.SessionSeed;
import org.precedence.runtime.dice.MixedRadixDice;

/**
 * Session lifecycle: create (seal a fresh seed into a token and publish its commitment),
 * describe, roll round k, and reveal the seed. Nothing is stored; every call opens the token.
 */
final class SessionEndpoints {
    static final RandomnessMode DEFAULT_MODE = RandomnessMode.SECURE;
    private static final Set<String> CREATE_MEMBERS = JsonFields.names("players", "mode", "rule", "convention");
    private static final Set<String> ROUND_QUERY = Set.of("players");
    private static final int MAX_ROUND_DIGITS = 19;

    private final Backend backend;

    SessionEndpoints(Backend backend) {
        this.backend = backend;
    }

    /** POST /v1/sessions. */
    Reply create(Request request) {
        request.allowQuery(Set.of());
        JsonFields f = new JsonFields(request.bodyObject(), "", CREATE_MEMBERS);
        int players = backend.players(f.requiredLong("players", Long.MIN_VALUE, Long.MAX_VALUE), "players");
        RandomnessMode mode = f.optionalEnum("mode", RandomnessMode.class, DEFAULT_MODE);
        OrderRule rule = f.optionalEnum("rule", OrderRule.class, OrderRule.FRESH_EACH_ROUND);
        RankingConvention convention = f.optionalEnum("convention", RankingConvention.class,
                RankingConvention.LOWEST_FIRST);
        MixedRadixDice set = backend.set(players, FairnessGrade.ORDER_FAIR);
        SessionClaims claims = new SessionClaims(SessionSeed.random(), players, mode, rule, convention,
                backend.clock.instant());
        String token = backend.sessions.seal(claims);
        JsonObject body = new JsonObject();
        body.addProperty("token", token);
        body.addProperty("keyId", backend.sessions.sealingKeyId());
        Shapes.session(claims, backend.sessions).entrySet().forEach(e -> body.add(e.getKey(), e.getValue()));
        body.add("set", Shapes.setSummary(set));
        return Reply.created(body, "/v1/sessions/" + token);
    }

    /** GET /v1/sessions/{token}. */
    Reply describe(Request request) {
        request.allowQuery(Set.of());
        SessionClaims claims = backend.sessions.open(request.path("token")).claims();
        return Reply.ok(Shapes.session(claims, backend.sessions));
    }

    /** GET /v1/sessions/{token}/rounds/{round}[?players=m]. */
    Reply round(Request request) {
        request.allowQuery(ROUND_QUERY);
        long round = parseRound(request.path("round"));
        Sessions.OpenSession session = backend.sessions.open(request.path("token"));
        int players = session.claims().players();
        String p = request.query().get("players");
        if (p != null) {
            players = backend.players(parseCount(p), "players");
        }
        RoundResult result;
        try {
            result = session.source().roll(round, players);
        } catch (IllegalArgumentException e) {
            throw new ApiException(400, "not_served", e.getMessage());
        }
        return Reply.okJson(Shapes.roundJson(result));
    }

    /** POST /v1/sessions/{token}/reveal. */
    Reply reveal(Request request) {
        request.allowQuery(Set.of());
        new JsonFields(request.optionalBodyObject(), "", Set.of());
        SessionClaims claims = backend.sessions.open(request.path("token")).claims();
        JsonObject body = new JsonObject();
        body.addProperty("seed", claims.seed().toHex());
        Shapes.session(claims, backend.sessions).entrySet().forEach(e -> body.add(e.getKey(), e.getValue()));
        body.addProperty("revealedAt", Instant.ofEpochSecond(backend.clock.instant().getEpochSecond()).toString());
        return Reply.ok(body);
    }

    static long parseRound(String text) {
        if (text.isEmpty() || text.length() > MAX_ROUND_DIGITS || !text.chars().allMatch(c -> c >= '0' && c <= '9')) {
            throw ApiException.badRequest("the round in the path must be a decimal integer 0.." + Long.MAX_VALUE
                    + ", got \"" + JsonFields.abbreviate(text) + "\"");
        }
        try {
            return Long.parseLong(text);
        } catch (NumberFormatException e) {
            throw ApiException.badRequest("the round in the path must be 0.." + Long.MAX_VALUE + ", got " + text);
        }
    }

    /** Parses a decimal count from the path or query; out-of-range values are checked by the caller. */
    static long parseCount(String text) {
        if (text.isEmpty() || text.length() > 9 || !text.chars().allMatch(c -> c >= '0' && c <= '9')) {
            throw ApiException.badRequest("a player count must be a decimal integer, got \""
                    + JsonFields.abbreviate(text) + "\"");
        }
        return Long.parseLong(text);
    }
}
