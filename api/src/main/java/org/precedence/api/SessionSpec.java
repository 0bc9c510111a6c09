package org.precedence.api;

import java.util.Objects;

/**
 * Everything that fixes a session's rounds: with the same spec, every round is the same on
 * every machine.
 *
 * @param seed       the session secret
 * @param mode       which generator turns the seed into bits
 * @param rule       how rolls become turn orders
 * @param convention which end of the rolled values acts first
 */
public record SessionSpec(SessionSeed seed, RandomnessMode mode, OrderRule rule, RankingConvention convention) {
    public SessionSpec {
        Objects.requireNonNull(seed, "seed");
        Objects.requireNonNull(mode, "mode");
        Objects.requireNonNull(rule, "rule");
        Objects.requireNonNull(convention, "convention");
    }

    /** A fresh order every round, fast mode, lowest value first. */
    public static SessionSpec of(SessionSeed seed) {
        return new SessionSpec(seed, RandomnessMode.FAST, OrderRule.FRESH_EACH_ROUND, RankingConvention.LOWEST_FIRST);
    }

    /** Returns a copy with another mode. */
    public SessionSpec withMode(RandomnessMode newMode) {
        return new SessionSpec(seed, newMode, rule, convention);
    }

    /** Returns a copy with another rule. */
    public SessionSpec withRule(OrderRule newRule) {
        return new SessionSpec(seed, mode, newRule, convention);
    }

    /** Returns a copy with another convention. */
    public SessionSpec withConvention(RankingConvention newConvention) {
        return new SessionSpec(seed, mode, rule, newConvention);
    }
}
