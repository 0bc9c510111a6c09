package org.precedence.runtime.service;

import java.time.Instant;
import java.util.List;
import java.util.Objects;
import org.precedence.api.OrderRule;
import org.precedence.api.RandomnessMode;
import org.precedence.api.RankingConvention;
import org.precedence.api.SessionSeed;
import org.precedence.api.SessionSpec;

/**
 * What a session token seals: the seed and every parameter that fixes the session's rounds.
 *
 * @param seed       the session secret
 * @param players    the roster size the session was created for
 * @param mode       randomness mode
 * @param rule       order rule
 * @param convention ranking convention
 * @param createdAt  creation time, whole seconds
 */
record SessionClaims(SessionSeed seed, int players, RandomnessMode mode, OrderRule rule,
        RankingConvention convention, Instant createdAt) {

    /*
     * Wire codes in the token are fixed here, one list per enum, code = index + 1; they never
     * follow the enums' declaration order, so reordering an enum cannot change old tokens.
     * New constants are appended.
     */
    static final List<RandomnessMode> MODE_CODES = List.of(RandomnessMode.FAST, RandomnessMode.SECURE);
    static final List<OrderRule> RULE_CODES = List.of(OrderRule.FRESH_EACH_ROUND,
            OrderRule.FIRST_PLAYER_THEN_SEATING, OrderRule.SNAKE, OrderRule.BALANCED_LEAD);
    static final List<RankingConvention> CONVENTION_CODES = List.of(RankingConvention.LOWEST_FIRST,
            RankingConvention.HIGHEST_FIRST);

    SessionClaims {
        Objects.requireNonNull(seed, "seed");
        Objects.requireNonNull(mode, "mode");
        Objects.requireNonNull(rule, "rule");
        Objects.requireNonNull(convention, "convention");
        Objects.requireNonNull(createdAt, "createdAt");
        if (players < 1 || players > 0xFFFF) {
            throw new IllegalArgumentException("players must be 1..65535, got " + players);
        }
        createdAt = Instant.ofEpochSecond(createdAt.getEpochSecond());
    }

    /** Returns the spec the provider opens for this session. */
    SessionSpec spec() {
        return new SessionSpec(seed, mode, rule, convention);
    }
}
