package org.precedence.runtime.replay;

import java.util.List;
import java.util.Objects;
import java.util.Optional;
import org.precedence.api.OrderRule;
import org.precedence.api.RandomnessMode;
import org.precedence.api.RankingConvention;
import org.precedence.api.SessionSeed;

/**
 * A session log: enough to recompute and check every recorded round once the seed is known.
 *
 * @param formatVersion the log format version ({@link #FORMAT_VERSION})
 * @param algorithm     the roll algorithm id (see {@code docs/roll-spec.md})
 * @param mode          the randomness mode (must agree with the algorithm id)
 * @param rule          the order rule
 * @param convention    the ranking convention
 * @param commitment    SHA-256 of the seed bytes, published before play (64 hex digits)
 * @param seed          the revealed seed, or empty while only the commitment is published
 * @param rounds        the recorded rounds, in play order
 */
public record SessionLog(int formatVersion, String algorithm, RandomnessMode mode, OrderRule rule,
        RankingConvention convention, String commitment, Optional<SessionSeed> seed, List<LoggedRound> rounds) {
    /** The format written by this version. */
    public static final int FORMAT_VERSION = 1;
    /** The value of the {@code format} field that marks a Precedence session log. */
    public static final String FORMAT_NAME = "precedence-session-log";

    public SessionLog {
        Objects.requireNonNull(algorithm, "algorithm");
        Objects.requireNonNull(mode, "mode");
        Objects.requireNonNull(rule, "rule");
        Objects.requireNonNull(convention, "convention");
        Objects.requireNonNull(commitment, "commitment");
        Objects.requireNonNull(seed, "seed");
        rounds = List.copyOf(rounds);
    }

    /** Returns this log with the seed revealed. */
    public SessionLog reveal(SessionSeed revealed) {
        return new SessionLog(formatVersion, algorithm, mode, rule, convention, commitment,
                Optional.of(revealed), rounds);
    }

    /** Returns this log with only the commitment (for publishing before the reveal). */
    public SessionLog commitmentOnly() {
        return new SessionLog(formatVersion, algorithm, mode, rule, convention, commitment, Optional.empty(), rounds);
    }
}
