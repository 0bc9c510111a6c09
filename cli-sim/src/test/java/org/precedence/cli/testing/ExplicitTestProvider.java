package org.precedence.cli.testing;

import java.math.BigInteger;
import java.nio.ByteBuffer;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.SplittableRandom;
import org.precedence.api.OrderRule;
import org.precedence.api.PlayerRoll;
import org.precedence.api.RankingConvention;
import org.precedence.api.RoundResult;
import org.precedence.api.SessionSpec;
import org.precedence.api.TurnOrderProvider;
import org.precedence.api.TurnOrderSource;
import org.precedence.runtime.dice.DieNames;
import org.precedence.runtime.dice.ExplicitDice;
import org.precedence.runtime.source.SetSource;

/**
 * A test-only provider over explicit sets: each face is drawn with the JDK's {@link
 * SplittableRandom} (unbiased bounded draws) seeded by a hash of (seed, round, player, tag), so
 * every round is a pure function of its inputs, like the real provider. Implements the fresh
 * rule and balanced lead (a block ranking fixes each round's leader; the rest of the round is
 * the fresh ranking with the leader removed). Not the production algorithm.
 */
public final class ExplicitTestProvider implements TurnOrderProvider, SetSource {
    private final Map<Integer, ExplicitDice> sets;

    public ExplicitTestProvider(Map<Integer, ExplicitDice> sets) {
        this.sets = Map.copyOf(sets);
    }

    @Override
    public TurnOrderSource open(SessionSpec spec) {
        long seed = ByteBuffer.wrap(spec.seed().bytes()).getLong();
        return new TurnOrderSource() {
            @Override
            public SessionSpec spec() {
                return spec;
            }

            @Override
            public RoundResult roll(long round, int playerCount) {
                ExplicitDice dice = forPlayers(playerCount, org.precedence.api.FairnessGrade.UNFAIR);
                int[] faces = new int[playerCount];
                int[] fresh = rank(dice, seed, round, 0, faces);
                int[] order = fresh;
                if (spec.rule() == OrderRule.BALANCED_LEAD) {
                    long block = round / playerCount;
                    int[] blockOrder = rank(dice, seed, block, 1, new int[playerCount]);
                    int leader = blockOrder[(int) (round % playerCount)];
                    order = new int[playerCount];
                    order[0] = leader;
                    int k = 1;
                    for (int p : fresh) {
                        if (p != leader) {
                            order[k++] = p;
                        }
                    }
                } else if (spec.rule() != OrderRule.FRESH_EACH_ROUND) {
                    throw new UnsupportedOperationException("test provider: " + spec.rule());
                }
                if (spec.convention() == RankingConvention.HIGHEST_FIRST) {
                    throw new UnsupportedOperationException("test provider: lowest first only");
                }
                List<Integer> orderList = new ArrayList<>();
                int[] position = new int[playerCount];
                for (int i = 0; i < playerCount; i++) {
                    orderList.add(order[i]);
                    position[order[i]] = i;
                }
                List<PlayerRoll> rolls = new ArrayList<>();
                for (int p = 0; p < playerCount; p++) {
                    rolls.add(new PlayerRoll(p, DieNames.of(p), BigInteger.valueOf(faces[p]),
                            BigInteger.valueOf(dice.value(p, faces[p])), position[p]));
                }
                return new RoundResult(round, orderList, rolls, dice.grade(), dice.id());
            }
        };
    }

    /** Rolls every die for (seed, key, tag) and returns the players by increasing face value. */
    private static int[] rank(ExplicitDice dice, long seed, long key, int tag, int[] faces) {
        int n = dice.players();
        long[] value = new long[n];
        Integer[] idx = new Integer[n];
        for (int p = 0; p < n; p++) {
            SplittableRandom r = new SplittableRandom(mix(seed ^ mix(key * 0x9E3779B97F4A7C15L + p * 31L + tag)));
            faces[p] = r.nextInt(dice.sideCount(p));
            value[p] = dice.value(p, faces[p]);
            idx[p] = p;
        }
        java.util.Arrays.sort(idx, (a, b) -> Long.compare(value[a], value[b]));
        int[] order = new int[n];
        for (int i = 0; i < n; i++) {
            order[i] = idx[i];
        }
        return order;
    }

    /** The SplitMix64 finaliser (public-domain mixing function). */
    private static long mix(long z) {
        z = (z ^ (z >>> 30)) * 0xBF58476D1CE4E5B9L;
        z = (z ^ (z >>> 27)) * 0x94D049BB133111EBL;
        return z ^ (z >>> 31);
    }

    @Override
    public int maxPlayers() {
        return sets.keySet().stream().mapToInt(Integer::intValue).max().orElse(0);
    }

    @Override
    public String name() {
        return "explicit-test-provider";
    }

    @Override
    public ExplicitDice forPlayers(int players, org.precedence.api.FairnessGrade grade) {
        ExplicitDice d = sets.get(players);
        if (d == null) {
            throw new IllegalArgumentException("test provider serves " + sets.keySet() + " players, not " + players);
        }
        return d;
    }
}
