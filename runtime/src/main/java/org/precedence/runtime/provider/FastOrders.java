package org.precedence.runtime.provider;

import org.precedence.api.OrderRule;
import org.precedence.api.RankingConvention;
import org.precedence.runtime.dice.ExplicitDice;
import org.precedence.runtime.dice.MixedRadixDice;
import org.precedence.runtime.randomness.BlockCursor;
import org.precedence.runtime.randomness.BoundedSampler;
import org.precedence.runtime.randomness.RollGenerator;

/**
 * A session's orders for simulations: {@link #orderInto} gives exactly the
 * order of {@link DiceSession#roll} (tested), skipping the faces and result objects.
 *
 * <p>For explicit sets the roll is drawn directly: one generator block (through a {@link
 * BlockCursor}) yields the attempt-0 words of four players, each face is taken by Lemire's method on a {@code long}, and the
 * players are insertion-sorted by face value; a rejected word (probability below
 * sides/2^64) falls back to the general draw of the next attempts. Constructed sets take the
 * general lazy path.
 *
 * <p>Allocation: none for explicit sets in fast mode when rounds are asked in increasing order
 * (the usual simulation loop: the Philox generator of each lane is stepped); a jump to another
 * round builds one library generator (48 bytes); secure mode allocates the JDK's 32-byte MAC
 * result per block; constructed sets allocate their lazily drawn digits.
 *
 * <p>Not thread-safe: it owns scratch arrays. Create one per thread ({@link
 * DiceSession#fastOrders()} is cheap).
 */
public final class FastOrders implements Ranker {
    /** Up to this many players, ranks are counted (O(n²), branch-free); above, insertion sort. */
    private static final int RANK_BY_COUNTING = 16;
    private final DiceSession session;
    private final RollGenerator generator;
    private final BlockCursor cursor;
    private final RankingConvention convention;
    private final OrderRule rule;
    private final MixedRadixDice[] sets;
    private final long[] block = new long[RollGenerator.LANES];
    private long[] keys = new long[0];
    private int[] scratch = new int[0];

    FastOrders(DiceSession session) {
        this.session = session;
        this.generator = session.generator();
        this.cursor = generator.cursor();
        this.convention = session.spec().convention();
        this.rule = session.spec().rule();
        this.sets = new MixedRadixDice[session.maxPlayers() + 1];
    }

    /**
     * Writes round {@code round}'s order for {@code players} players into {@code out[0..players)}.
     *
     * @throws IllegalArgumentException if {@code round < 0}, the count is not served, or
     *                                  {@code out} is too short
     */
    public void orderInto(long round, int players, int[] out) {
        Validation.requireRound(round);
        if (out.length < players) {
            throw new IllegalArgumentException("out has " + out.length + " slots for " + players + " players");
        }
        if (players == 1) {
            out[0] = 0;
            return;
        }
        Validation.requireServedCount(players, sets.length - 1);
        if (scratch.length < players) {
            scratch = new int[players];
            keys = new long[players];
        }
        if (rule == OrderRule.FRESH_EACH_ROUND) {
            rankInto(Streams.ROUND, round, players, out);
        } else {
            RuleOrders.orderInto(rule, round, players, this, out, scratch);
        }
    }

    /**
     * Like {@link #orderInto(long, int, int[])}, and also writes the face values of the roll
     * behind the order ({@code faces[i]} for player i, as in {@link DiceSession#roll}).
     *
     * @throws IllegalArgumentException as above, if {@code faces} is too short, or if the set
     *                                  is not explicit (constructed faces need not fit a long)
     */
    public void orderInto(long round, int players, int[] out, long[] faces) {
        if (faces.length < players) {
            throw new IllegalArgumentException("faces has " + faces.length + " slots for " + players + " players");
        }
        orderInto(round, players, out);
        if (players == 1) {
            throw new IllegalArgumentException("a single player rolls no die");
        }
        if (!(sets[players] instanceof ExplicitDice)) {
            throw new IllegalArgumentException("set " + sets[players].id()
                    + " is constructed; its faces need DiceSession.roll");
        }
        // Every rule ranks the draw whose faces it reports last, so the keys hold exactly those.
        System.arraycopy(keys, 0, faces, 0, players);
    }

    @Override
    public void rankInto(int stream, long index, int players, int[] out) {
        MixedRadixDice dice = sets[players];
        if (dice == null) {
            dice = session.setFor(players);
            sets[players] = dice;
        }
        if (dice instanceof ExplicitDice explicit) {
            rankExplicit(explicit, stream, index, players, out);
        } else {
            LazyRanker.rankInto(generator, cursor, dice, convention, stream, index, out);
        }
    }

    private void rankExplicit(ExplicitDice dice, int stream, long index, int n, int[] out) {
        long[] k = keys;
        for (int g = 0; g < n; g += RollGenerator.LANES) {
            cursor.block(index, RollGenerator.groupWord(stream, g), 0, 0, block);
            int end = Math.min(n, g + RollGenerator.LANES);
            for (int d = g; d < end; d++) {
                long sides = dice.sideCount(d);
                long face = BoundedSampler.lemire64(block[d - g], sides);
                if (face == BoundedSampler.REJECTED) {
                    face = redraw(stream, index, d, sides);
                }
                k[d] = dice.value(d, (int) face);
            }
        }
        if (n <= RANK_BY_COUNTING) {
            // Branch-free: player i's place is the number of lower faces. Faces are distinct
            // and below 2^62, so the sign of k[j] - k[i] is exact; random keys would make a
            // comparison sort mispredict about every other branch.
            boolean lowestFirst = convention == RankingConvention.LOWEST_FIRST;
            for (int i = 0; i < n; i++) {
                long key = k[i];
                int lower = 0;
                for (int j = 0; j < n; j++) {
                    lower += (int) ((k[j] - key) >>> 63);
                }
                out[lowestFirst ? lower : n - 1 - lower] = i;
            }
            return;
        }
        for (int i = 0; i < n; i++) {
            long key = k[i];
            int j = i - 1;
            while (j >= 0 && k[out[j]] > key) {
                out[j + 1] = out[j];
                j--;
            }
            out[j + 1] = i;
        }
        if (convention == RankingConvention.HIGHEST_FIRST) {
            RuleOrders.reverse(out, n);
        }
    }

    /** Attempts 1, 2, … of digit 0: the same words the general sampler uses. */
    private long redraw(int stream, long index, int die, long sides) {
        for (long attempt = 1; ; attempt++) {
            long face = BoundedSampler.lemire64(generator.word(index, stream, die, 0, attempt), sides);
            if (face != BoundedSampler.REJECTED) {
                return face;
            }
        }
    }
}
