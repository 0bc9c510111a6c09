package org.precedence.cli;

import java.math.BigInteger;
import java.nio.ByteBuffer;
import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import org.precedence.api.FairnessGrade;
import org.precedence.api.PlayerRoll;
import org.precedence.api.RoundResult;
import org.precedence.api.SessionSpec;
import org.precedence.api.TurnOrderProvider;
import org.precedence.api.TurnOrderSource;

/**
 * Test-only stand-in (a copy of the sample game's test provider) for the real provider: a seeded Fisher-Yates shuffle per (seed, round,
 * player count), with made-up dice whose face values agree with the order (lowest first). It
 * makes no fairness claim; it only gives the game deterministic, well-formed rounds.
 */
final class TestShuffleProvider implements TurnOrderProvider {
    private final int maxPlayers;

    TestShuffleProvider() {
        this(8);
    }

    TestShuffleProvider(int maxPlayers) {
        this.maxPlayers = maxPlayers;
    }

    @Override
    public TurnOrderSource open(SessionSpec spec) {
        long seed = ByteBuffer.wrap(spec.seed().bytes()).getLong() ^ spec.mode().ordinal();
        return new Source(spec, seed, maxPlayers);
    }

    @Override
    public int maxPlayers() {
        return maxPlayers;
    }

    @Override
    public String name() {
        return "test-shuffle";
    }

    /** The source; public so Mockito can spy on it. */
    static final class Source implements TurnOrderSource {
        private final SessionSpec spec;
        private final long seed;
        private final int maxPlayers;

        Source(SessionSpec spec, long seed, int maxPlayers) {
            this.spec = spec;
            this.seed = seed;
            this.maxPlayers = maxPlayers;
        }

        @Override
        public SessionSpec spec() {
            return spec;
        }

        @Override
        public RoundResult roll(long round, int playerCount) {
            if (round < 0 || playerCount < 1 || playerCount > maxPlayers) {
                throw new IllegalArgumentException("round " + round + " for " + playerCount + " players not served");
            }
            SplittableRandom random = new SplittableRandom(seed ^ (round * 0x9E3779B97F4A7C15L) ^ playerCount);
            int[] order = new int[playerCount];
            for (int i = 0; i < playerCount; i++) {
                order[i] = i;
            }
            for (int i = playerCount - 1; i > 0; i--) {
                int j = random.nextInt(i + 1);
                int t = order[i];
                order[i] = order[j];
                order[j] = t;
            }
            int[] position = new int[playerCount];
            List<Integer> orderList = new ArrayList<>();
            for (int p = 0; p < playerCount; p++) {
                position[order[p]] = p;
                orderList.add(order[p]);
            }
            List<PlayerRoll> rolls = new ArrayList<>();
            for (int player = 0; player < playerCount; player++) {
                // Values p*n + player + 1 are distinct and rank like the positions.
                long value = (long) position[player] * playerCount + player + 1;
                rolls.add(new PlayerRoll(player, String.valueOf((char) ('A' + player)),
                        BigInteger.valueOf(position[player]), BigInteger.valueOf(value), position[player]));
            }
            return new RoundResult(round, orderList, rolls, FairnessGrade.ORDER_FAIR, "test-" + playerCount);
        }
    }
}
