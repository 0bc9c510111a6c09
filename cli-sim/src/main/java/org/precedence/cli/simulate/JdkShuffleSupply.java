package org.precedence.cli.simulate;

import java.nio.ByteBuffer;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Random;
import org.precedence.api.SessionSeed;

/**
 * The shuffle most engines call: {@link Collections#shuffle(List, Random)} on a list of the
 * players, with one seeded {@link Random} per session. A benchmark peer (see {@link Benchmark});
 * rounds must be asked for in order.
 */
final class JdkShuffleSupply implements OrderSupply {
    private final SessionSeed master;

    JdkShuffleSupply(SessionSeed master) {
        this.master = master;
    }

    @Override
    public String label() {
        return "Collections.shuffle";
    }

    @Override
    public SessionOrders open(long session, int players) {
        Random random = new Random(ByteBuffer.wrap(SessionSeeds.of(master, session).bytes()).getLong());
        List<Integer> list = new ArrayList<>(players);
        for (int p = 0; p < players; p++) {
            list.add(p);
        }
        return (round, out) -> {
            Collections.shuffle(list, random);
            for (int p = 0; p < players; p++) {
                out[p] = list.get(p);
            }
            return 1;
        };
    }
}
