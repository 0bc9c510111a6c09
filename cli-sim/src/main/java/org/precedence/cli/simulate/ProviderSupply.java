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

/**
 * Turn orders from a {@link TurnOrderProvider} through the engine-facing {@link
 * TurnOrderSource#roll} call: exactly what an engine gets, one session per session seed.
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
        return (round, out) -> {
            List<Integer> order = source.roll(round, players).order();
            for (int p = 0; p < players; p++) {
                out[p] = order.get(p);
            }
            return 1;
        };
    }
}
