package org.precedence.cli.simulate;

import org.apache.commons.rng.UniformRandomProvider;
import org.apache.commons.rng.simple.RandomSource;
import org.precedence.api.SessionSeed;

/**
 * The plain-shuffle peer: what an engine does without Precedence. Each session seeds one
 * xoroshiro128++ generator (Apache Commons RNG) from its session seed and shuffles the players
 * with Fisher–Yates every round, drawing bounded integers with the library's unbiased method.
 * Rounds must be asked for in order (the generator is a stream).
 */
final class ShuffleSupply implements OrderSupply {
    private final SessionSeed master;

    ShuffleSupply(SessionSeed master) {
        this.master = master;
    }

    @Override
    public String label() {
        return "shuffle";
    }

    @Override
    public SessionOrders open(long session, int players) {
        UniformRandomProvider rng = RandomSource.XO_RO_SHI_RO_128_PP.create(
                SessionSeeds.twoLongs(SessionSeeds.of(master, session)));
        return (round, out) -> {
            for (int p = 0; p < players; p++) {
                out[p] = p;
            }
            // Fisher–Yates (Knuth, TAOCP vol. 2, Algorithm 3.4.2 P): each of n! orders equally likely.
            for (int i = players - 1; i > 0; i--) {
                int j = rng.nextInt(i + 1);
                int t = out[i];
                out[i] = out[j];
                out[j] = t;
            }
            return 1;
        };
    }
}
