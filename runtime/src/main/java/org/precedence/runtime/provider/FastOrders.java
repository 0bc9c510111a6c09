package org.precedence.runtime.provider;

import java.math.BigInteger;
import org.precedence.api.OrderRule;
import org.precedence.api.RankingConvention;
import org.precedence.runtime.construction.ConstructedDice;
import org.precedence.runtime.dice.ExplicitDice;
import org.precedence.runtime.dice.MixedRadixDice;
import org.precedence.runtime.randomness.BlockCursor;
import org.precedence.runtime.randomness.BoundedSampler;
import org.precedence.runtime.randomness.RollGenerator;
import org.precedence.runtime.randomness.SeededFaces;

/**
 * A session's orders for simulations: {@link #orderInto} gives exactly the
 * order of {@link DiceSession#roll} (tested), skipping the faces and result objects.
 *
 * <p>For explicit sets the roll is drawn directly. Under the fast algorithm (16-bit draws, every
 * die below 2^16 sides) one generator block (through a {@link BlockCursor}) holds the attempt-0
 * chunks of four players for four consecutive rounds; it is kept, so rounds asked in order
 * cost a quarter of a block per group of four players. Otherwise one block yields the
 * attempt-0 words of four players for one round. Each face is taken by Lemire's method, and
 * the players are ranked by counting lower faces (branch-free; insertion sort above 16
 * players); a rejected chunk or word falls back to the general draw of the next attempts.
 * Constructed sets are ranked by {@link PrefixRanker}: a key per die from its leading digits
 * (under the current fast algorithm, the leading key itself, eight dice per block) decides the
 * order unless two dice tie on it.
 *
 * <p>Allocation: none for explicit sets in fast mode when rounds are asked in increasing order
 * (the usual simulation loop: the Philox generator of each lane is stepped); a jump to another
 * block builds one library generator (48 bytes); secure mode allocates the JDK's 32-byte MAC
 * result per block; constructed sets allocate what their blocks' library generators need (two
 * blocks per 10-player round under the current fast algorithm), the lazy comparison's memo when
 * two dice tie on their keys, and one BigInteger per exact face.
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
    /** Per player count: the set's table if it is explicit, narrow-drawn and below 2^16 sides. */
    private final NarrowTable[] narrow;
    /** Per player count: the ranker of a constructed set. */
    private final PrefixRanker[] prefix;
    /**
     * Narrow blocks kept per (stream, group) slot: words, draw index / 4 and counter word c1.
     * A narrow c1 always has bit 31 set, so the initial 0 never matches.
     */
    private final long[][] cached = new long[8][RollGenerator.LANES];
    private final long[] cachedIndex = new long[8];
    private final long[] cachedGroup = new long[8];
    /** The 4-player narrow table when the rule is FRESH_EACH_ROUND and it has been served. */
    private NarrowTable freshFour;
    /** The narrow block of stream 0, group 0 (the simulation loop's), and its index / 4. */
    private final long[] hot = new long[RollGenerator.LANES];
    private long hotIndex = -1;
    private long[] keys = new long[0];
    private int[] scratch = new int[0];

    FastOrders(DiceSession session) {
        this.session = session;
        this.generator = session.generator();
        this.cursor = generator.cursor();
        this.convention = session.spec().convention();
        this.rule = session.spec().rule();
        this.sets = new MixedRadixDice[session.maxPlayers() + 1];
        this.narrow = new NarrowTable[sets.length];
        this.prefix = new PrefixRanker[sets.length];
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
        NarrowTable four = freshFour;
        if (players == RollGenerator.LANES && four != null && round >= 0 && out.length >= players) {
            // The simulation loop's case (4 players, FRESH_EACH_ROUND, a narrow explicit set,
            // already served once): the faces go straight into the caller's array.
            rankFourNarrow(four, Streams.ROUND, round, faces, out);
            return;
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

    /**
     * Like {@link #orderInto(long, int, int[])}, and also writes the exact face values of the
     * roll behind the order ({@code faces[i]} for player i, as {@link DiceSession#roll} reports
     * them) for any set, explicit or constructed.
     *
     * @throws IllegalArgumentException as above, or if {@code faces} is too short or a single
     *                                  player is asked for
     */
    public void orderInto(long round, int players, int[] out, BigInteger[] faces) {
        if (faces.length < players) {
            throw new IllegalArgumentException("faces has " + faces.length + " slots for " + players + " players");
        }
        orderInto(round, players, out);
        if (players == 1) {
            throw new IllegalArgumentException("a single player rolls no die");
        }
        PrefixRanker ranker = prefix[players];
        if (ranker != null) {
            ranker.facesInto(generator, Streams.ROUND, Streams.facesIndex(rule, round), faces, null);
            return;
        }
        if (sets[players] instanceof ExplicitDice) {
            // Every rule ranks the draw whose faces it reports last, so the keys hold exactly those.
            for (int d = 0; d < players; d++) {
                faces[d] = BigInteger.valueOf(keys[d]);
            }
            return;
        }
        SeededFaces shown = new SeededFaces(generator, cursor, sets[players], Streams.facesIndex(rule, round),
                Streams.ROUND);
        for (int d = 0; d < players; d++) {
            faces[d] = shown.faceValue(d);
        }
    }

    @Override
    public void rankInto(int stream, long index, int players, int[] out) {
        MixedRadixDice dice = sets[players];
        if (dice == null) {
            dice = session.setFor(players);
            sets[players] = dice;
            if (generator.narrowDraws() && dice instanceof ExplicitDice e) {
                narrow[players] = NarrowTable.of(e);
                if (players == RollGenerator.LANES && rule == OrderRule.FRESH_EACH_ROUND) {
                    freshFour = narrow[players];
                }
            } else if (dice instanceof ConstructedDice c) {
                prefix[players] = new PrefixRanker(session.prefixPlan(c), true);
            }
        }
        if (dice instanceof ExplicitDice explicit) {
            rankExplicit(explicit, stream, index, players, out);
        } else if (prefix[players] != null) {
            prefix[players].rankInto(generator, cursor, convention, stream, index, out);
        } else {
            LazyRanker.rankInto(generator, cursor, dice, convention, stream, index, out);
        }
    }

    private void rankExplicit(ExplicitDice dice, int stream, long index, int n, int[] out) {
        long[] k = keys;
        NarrowTable table = narrow[n];
        if (table != null && n == RollGenerator.LANES) {
            rankFourNarrow(table, stream, index, k, out);
            return;
        } else if (table != null && n < RollGenerator.LANES) {
            drawNarrowOneGroup(table, stream, index, k);
        } else if (table != null) {
            drawNarrow(dice, stream, index, n, k);
        } else {
            drawWide(dice, stream, index, n, k);
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

    /**
     * Narrow layout: the block at (index / 4, narrow group word, 0, 0) holds attempt 0 of four
     * consecutive indices of four players; it is kept per (stream, group), so rounds asked in
     * order cost one block per four rounds per group of four players.
     */
    private void drawNarrow(ExplicitDice dice, int stream, long index, int n, long[] k) {
        long blockIndex = index >>> 2;
        for (int g = 0; g < n; g += RollGenerator.LANES) {
            long c1 = RollGenerator.narrowGroupWord(stream, g);
            int slot = ((stream & 1) << 2) | ((g >>> 2) & 3);
            long[] words = cached[slot];
            if (cachedIndex[slot] != blockIndex || cachedGroup[slot] != c1) {
                cursor.block(blockIndex, c1, 0, 0, words);
                cachedIndex[slot] = blockIndex;
                cachedGroup[slot] = c1;
            }
            long word = words[(int) (index & 3)];
            int end = Math.min(n, g + RollGenerator.LANES);
            for (int d = g; d < end; d++) {
                int sides = dice.sideCount(d);
                int face = BoundedSampler.lemire16((int) (word >>> ((d & 3) << 4)) & 0xFFFF, sides);
                if (face == BoundedSampler.REJECTED) {
                    // Attempt 0 again, then 1, 2, …: the general rule, rarely reached.
                    face = generator.narrowDigit(index, stream, d, 0, sides);
                }
                k[d] = dice.value(d, face);
            }
        }
    }

    /**
     * The narrow layout for at most four players (one lane group): the kept block of the
     * stream gives this round's word, and each die's face is one multiply, one compare
     * against its precomputed threshold and one table read.
     */
    private void drawNarrowOneGroup(NarrowTable t, int stream, long index, long[] k) {
        long word = cachedWord(stream, index);
        int[] sides = t.sides;
        int[] thresholds = t.thresholds;
        int[] offsets = t.offsets;
        long[] values = t.values;
        for (int d = 0; d < t.players; d++) {
            int m = ((int) (word >>> (d << 4)) & 0xFFFF) * sides[d];
            int face = (m & 0xFFFF) < thresholds[d]
                    ? generator.narrowDigit(index, stream, d, 0, sides[d]) // attempt 0 again, then 1, 2, …
                    : m >>> 16;
            k[d] = values[offsets[d] + face];
        }
    }

    /** Word {@code index & 3} of the narrow block of lane group 0, kept per stream. */
    private long cachedWord(int stream, long index) {
        long blockIndex = index >>> 2;
        long c1 = RollGenerator.narrowGroupWord(stream, 0);
        int slot = (stream & 1) << 2;
        long[] words = cached[slot];
        if (cachedIndex[slot] != blockIndex || cachedGroup[slot] != c1) {
            generator.block(blockIndex, c1, 0, 0, words);
            cachedIndex[slot] = blockIndex;
            cachedGroup[slot] = c1;
        }
        return words[(int) (index & 3)];
    }

    /**
     * Four players, narrow: {@link #drawNarrowOneGroup} and the rank by counting, unrolled in
     * locals (each place is the number of lower faces; distinct faces below 2^62 make the sign
     * of a difference exact).
     */
    private void rankFourNarrow(NarrowTable t, int stream, long index, long[] k, int[] out) {
        long word;
        if (stream == Streams.ROUND) {
            long blockIndex = index >>> 2;
            if (hotIndex != blockIndex) {
                generator.block(blockIndex, RollGenerator.narrowGroupWord(Streams.ROUND, 0), 0, 0, hot);
                hotIndex = blockIndex;
            }
            word = hot[(int) (index & 3)];
        } else {
            word = cachedWord(stream, index);
        }
        int[] sides = t.sides;
        int[] thresholds = t.thresholds;
        int[] offsets = t.offsets;
        long[] values = t.values;
        int m0 = ((int) word & 0xFFFF) * sides[0];
        int m1 = ((int) (word >>> 16) & 0xFFFF) * sides[1];
        int m2 = ((int) (word >>> 32) & 0xFFFF) * sides[2];
        int m3 = ((int) (word >>> 48) & 0xFFFF) * sides[3];
        // One branch for the four rejection tests (all false but about once in 16 rounds at
        // most for the catalog's side counts).
        boolean rejected = (m0 & 0xFFFF) < thresholds[0] | (m1 & 0xFFFF) < thresholds[1]
                | (m2 & 0xFFFF) < thresholds[2] | (m3 & 0xFFFF) < thresholds[3];
        long a;
        long b;
        long c;
        long d;
        if (rejected) {
            drawNarrowOneGroup(t, stream, index, k);
            a = k[0];
            b = k[1];
            c = k[2];
            d = k[3];
        } else {
            a = values[offsets[0] + (m0 >>> 16)];
            b = values[offsets[1] + (m1 >>> 16)];
            c = values[offsets[2] + (m2 >>> 16)];
            d = values[offsets[3] + (m3 >>> 16)];
            k[0] = a;
            k[1] = b;
            k[2] = c;
            k[3] = d;
        }
        int ra = (int) (((b - a) >>> 63) + ((c - a) >>> 63) + ((d - a) >>> 63));
        int rb = (int) (((a - b) >>> 63) + ((c - b) >>> 63) + ((d - b) >>> 63));
        int rc = (int) (((a - c) >>> 63) + ((b - c) >>> 63) + ((d - c) >>> 63));
        int rd = (int) (((a - d) >>> 63) + ((b - d) >>> 63) + ((c - d) >>> 63));
        if (convention == RankingConvention.HIGHEST_FIRST) {
            ra = 3 - ra;
            rb = 3 - rb;
            rc = 3 - rc;
            rd = 3 - rd;
        }
        out[ra] = 0;
        out[rb] = 1;
        out[rc] = 2;
        out[rd] = 3;
    }

    /** Wide layout (64-bit words; v1 and secure mode, or sets with 2^16 sides or more). */
    private void drawWide(ExplicitDice dice, int stream, long index, int n, long[] k) {
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
