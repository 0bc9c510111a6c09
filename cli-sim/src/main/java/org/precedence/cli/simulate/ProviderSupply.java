package org.precedence.cli.simulate;

import java.util.List;
import java.util.Objects;
import org.precedence.api.OrderRule;
import org.precedence.api.RandomnessMode;
import org.precedence.api.RankingConvention;
import org.precedence.api.SessionSeed;
import org.precedence.api.SessionSpec;
import org.precedence.api.TurnOrderProvider;
import org.precedence.api.TurnOrderSource;
import org.precedence.runtime.provider.DiceSession;
import org.precedence.runtime.provider.FastOrders;

/**
 * Turn orders from a {@link TurnOrderProvider}: exactly what an engine gets, one session per
 * session seed. When the provider's sessions are the runtime's {@link DiceSession}s, the
 * allocation-free {@link FastOrders} path is used (the runtime tests that it gives the same
 * orders as {@link TurnOrderSource#roll}); any other provider goes through {@code roll}.
 */
final class ProviderSupply implements OrderSupply {
    private final TurnOrderProvider provider;
    private final SessionSeed master;
    private final RandomnessMode mode;
    private final OrderRule rule;

    ProviderSupply(TurnOrderProvider provider, SessionSeed master, RandomnessMode mode, OrderRule rule) {
        this.provider = Objects.requireNonNull(provider, "provider");
        this.master = Objects.requireNonNull(master, "master");
        this.mode = Objects.requireNonNull(mode, "mode");
        this.rule = Objects.requireNonNull(rule, "rule");
    }

    @Override
    public String label() {
        return "precedence";
    }

    @Override
    public SessionOrders open(long session, int players) {
        SessionSpec spec = new SessionSpec(SessionSeeds.of(master, session), mode, rule,
                RankingConvention.LOWEST_FIRST);
        TurnOrderSource source = provider.open(spec);
        if (source instanceof DiceSession dice) {
            FastOrders fast = dice.fastOrders();
            return (round, out) -> {
                fast.orderInto(round, players, out);
                return 1;
            };
        }
        return (round, out) -> {
            List<Integer> order = source.roll(round, players).order();
            for (int p = 0; p < players; p++) {
                out[p] = order.get(p);
            }
            return 1;
        };
    }
}
