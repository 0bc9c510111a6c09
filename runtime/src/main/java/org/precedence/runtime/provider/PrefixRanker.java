package org.precedence.runtime.provider;

import java.math.BigInteger;
import org.precedence.api.RankingConvention;
import org.precedence.runtime.construction.ConstructedDice;
import org.precedence.runtime.randomness.BlockCursor;
import org.precedence.runtime.randomness.BoundedSampler;
import org.precedence.runtime.randomness.LeadingGroup;
import org.precedence.runtime.randomness.RollGenerator;

/**
 * The fast ranking of a constructed set: the first few digits of every die, drawn as longs
 * lane group by lane group by exactly the rule of {@link
 * org.precedence.runtime.randomness.SeededFaces}, give each die a {@link
 * ConstructedDice#prefixKey prefix key}; distinct keys decide the order. Under an algorithm with
 * {@link RollGenerator#leadingGroups() leading groups} the prefix covers at least the {@link
 * LeadingGroup}, which one block draws for eight dice (for ten players: two blocks a round and
 * nothing else, unless a key ties); otherwise one block serves four dice per digit. From 20
 * players on the key also holds the top bits of the digit after the prefix ({@link
 * PrefixPlan#extraBits}). When two keys are equal (for 10 players about once in 330,000
 * rounds; for 64, with 62-bit keys, practically never) the round is ranked again by {@link
 * LazyRanker}, which draws the same digits and compares to the bottom, so the order is always
 * that of the lazy comparison (tested against {@code DiceSession.rollLazily} under every
 * algorithm).
 *
 * <p>The set's {@link PrefixPlan} is shared; the scratch is not. A ranker made to {@link
 * #PrefixRanker(PrefixPlan, boolean) keep narrow blocks} (one per {@link FastOrders}) keeps the
 * narrow blocks of every digit on stream 0, each of which serves four consecutive rounds; one
 * made for a single {@link DiceSession#roll} keeps none.
 *
 * <p>Not thread-safe: it owns its scratch arrays.
 */
final class PrefixRanker {
    private final ConstructedDice dice;
    private final int players;
    private final int prefix;
    /** The plan's radices (shared, read only). */
    private final long[] radix;
    private final boolean narrowDraws;
    private final LeadingGroup group;
    private final boolean keysOnly;
    private final PrefixPlan plan;
    private final int laneGroups;
    private final long[][] digits;
    private final long[] keys;
    /** Scratch for the extended keys: the top bits of digit {@code prefix} per die, and its words. */
    private final long[] tops;
    private final long[][] bigBlocks;
    private final long[] bigDigitWords;
    private final long[] block = new long[RollGenerator.LANES];
    /** The draw whose leading digits {@code digits[·][0..prefix)} hold (stream −1: none yet). */
    private int drawnStream = -1;
    private long drawnIndex;
    /**
     * Narrow blocks kept per (digit, lane group), or null when none are kept: each serves four
     * consecutive indices, so rounds asked in order draw it once per four rounds. Slots are
     * allocated when first used; {@code narrowC0} is c0 + 1 of the kept block (0: none).
     */
    private final long[][] narrowWords;
    private final long[] narrowC0;
    private final int[] letters;
    private final long[] limbs;

    /**
     * A ranker over {@code plan}'s set; with {@code keepNarrowBlocks} it keeps the narrow blocks
     * of stream 0 between calls (for callers that ask for many rounds, mostly in order).
     */
    PrefixRanker(PrefixPlan plan, boolean keepNarrowBlocks) {
        this.dice = plan.dice;
        this.players = plan.players;
        this.prefix = plan.prefix;
        this.radix = plan.radix;
        this.narrowDraws = plan.narrowDraws;
        this.group = plan.group;
        this.keysOnly = plan.keysOnly;
        this.plan = plan;
        this.tops = plan.extraBits > 0 ? new long[players] : null;
        this.bigBlocks = new long[plan.bigWords][RollGenerator.LANES];
        this.bigDigitWords = new long[plan.bigWords];
        this.laneGroups = plan.laneGroups;
        this.digits = new long[players][radix.length];
        this.keys = new long[players];
        this.narrowWords = keepNarrowBlocks ? new long[radix.length * laneGroups][] : null;
        this.narrowC0 = keepNarrowBlocks ? new long[radix.length * laneGroups] : null;
        this.letters = new int[players];
        this.limbs = new long[dice.faceLimbs()];
    }

    /** Ranks draw (stream, index) into {@code out}, first to act first. */
    void rankInto(RollGenerator generator, BlockCursor cursor, RankingConvention convention, int stream,
            long index, int[] out) {
        int n = players;
        long[] k = keys;
        if (keysOnly) {
            // The leading keys are the prefix keys: nothing else to draw or compute.
            drawGroups(generator, stream, index, false);
        } else {
            int first = 0;
            if (group != null) {
                drawGroups(generator, stream, index, true);
                first = group.digits();
            }
            for (int j = first; j < prefix; j++) {
                drawDigit(generator, stream, index, j);
            }
            for (int d = 0; d < n; d++) {
                k[d] = dice.prefixKey(digits[d], prefix);
            }
            if (tops != null) {
                extendKeys(generator, stream, index);
            }
        }
        drawnStream = stream;
        drawnIndex = index;
        boolean lowestFirst = convention == RankingConvention.LOWEST_FIRST;
        long places = 0;
        for (int i = 0; i < n; i++) {
            long key = k[i];
            int lower = 0;
            for (int j = 0; j < n; j++) {
                // Keys are below 2^62, so the sign of the difference is exact.
                lower += (int) ((k[j] - key) >>> 63);
            }
            places |= 1L << lower;
            out[lowestFirst ? lower : n - 1 - lower] = i;
        }
        // Distinct keys take every place 0..n−1; two equal keys take the same place.
        if (places != (n == 64 ? -1L : (1L << n) - 1)) {
            // Two dice share a sub-block: let the full comparison decide (same digits).
            LazyRanker.rankInto(generator, cursor, dice, convention, stream, index, out);
        }
    }

    /**
     * Writes the exact face values of draw (stream, index) into {@code faces} and, unless
     * {@code indices} is null, the face indices into {@code indices}: every digit drawn as here,
     * the values evaluated by {@link ConstructedDice#faceValue}, the indices (the mixed-radix
     * numbers the digits spell) by {@link ConstructedDice#faceIndex}.
     */
    void facesInto(RollGenerator generator, int stream, long index, BigInteger[] faces, BigInteger[] indices) {
        int m = radix.length;
        // The leading digits are kept from the ranking of the same draw (the usual case).
        int first = drawnStream == stream && drawnIndex == index ? prefix : 0;
        if (first == prefix && keysOnly) {
            // The ranking kept only the keys: spell their digits now.
            for (int d = 0; d < players; d++) {
                dice.leadingDigits(d, keys[d], prefix, digits[d]);
            }
        } else if (first == 0 && group != null) {
            drawGroups(generator, stream, index, true);
            first = group.digits();
        }
        for (int j = first; j < m; j++) {
            if (radix[j] == 0) {
                // A digit of 2^63 or more: the general draw below.
                for (int d = 0; d < players; d++) {
                    digits[d][j] = -1;
                }
            } else {
                drawDigit(generator, stream, index, j);
            }
        }
        if (dice.hasLongDigits()) {
            for (int d = 0; d < players; d++) {
                faces[d] = dice.faceValue(d, digits[d], letters, limbs);
                if (indices != null) {
                    indices[d] = dice.faceIndex(digits[d], limbs);
                }
            }
            return;
        }
        BigInteger[] spelled = new BigInteger[m];
        for (int d = 0; d < players; d++) {
            BigInteger faceIndex = BigInteger.ZERO;
            for (int j = 0; j < m; j++) {
                spelled[j] = radix[j] == 0
                        ? generator.digit(index, stream, d, j, dice.radix(d, j))
                        : BigInteger.valueOf(digits[d][j]);
                faceIndex = faceIndex.multiply(dice.radix(d, j)).add(spelled[j]);
            }
            faces[d] = dice.faceValue(d, spelled);
            if (indices != null) {
                indices[d] = faceIndex;
            }
        }
    }

    /**
     * Appends to every key the top {@code extraBits} of digit {@code prefix}, read backwards
     * ({@code t ↦ 2^extraBits − 1 − t}) where the enclosing block is reversed: monotone in that
     * digit's value order, so different keys still order dice exactly as their faces, and equal
     * ones fall back to the full comparison.
     */
    private void extendKeys(RollGenerator generator, int stream, long index) {
        int n = players;
        if (plan.bigWords > 0) {
            drawBigTops(generator, stream, index);
        } else {
            drawDigit(generator, stream, index, prefix);
            for (int d = 0; d < n; d++) {
                tops[d] = digits[d][prefix] >>> plan.extraShift;
            }
        }
        int bits = plan.extraBits;
        long all = (1L << bits) - 1;
        for (int d = 0; d < n; d++) {
            long t = dice.readsBackwardsAfter(digits[d], prefix) ? all - tops[d] : tops[d];
            keys[d] = (keys[d] << bits) | t;
        }
    }

    /**
     * The top bits of a digit of radix 2^63 or more, drawn for every die by the masked rule of
     * {@link BoundedSampler#draw} (attempt a reads words a·w … a·w+w−1, big-endian, low L bits,
     * accepted below R): attempt 0 takes w blocks per lane group, rejected dice retry alone.
     */
    private void drawBigTops(RollGenerator generator, int stream, long index) {
        int w = plan.bigWords;
        int j = prefix;
        for (int g = 0; g < players; g += RollGenerator.LANES) {
            for (int i = 0; i < w; i++) {
                generator.block(index, RollGenerator.groupWord(stream, g), j, i, bigBlocks[i]);
            }
            int end = Math.min(players, g + RollGenerator.LANES);
            for (int d = g; d < end; d++) {
                for (int i = 0; i < w; i++) {
                    bigDigitWords[i] = bigBlocks[i][d & 3];
                }
                long top = acceptedTop();
                for (long attempt = 1; top < 0; attempt++) {
                    for (int i = 0; i < w; i++) {
                        bigDigitWords[i] = generator.word(index, stream, d, j, attempt * w + i);
                    }
                    top = acceptedTop();
                }
                tops[d] = top;
            }
        }
    }

    /** The masked number in {@code bigDigitWords}: its top bits if it is below the radix, else −1. */
    private long acceptedTop() {
        int w = plan.bigWords;
        long[] x = bigDigitWords;
        int firstBits = plan.bigBits - 64 * (w - 1);
        if (firstBits < 64) {
            x[0] &= (1L << firstBits) - 1;
        }
        long[] r = plan.bigRadix;
        int i = 0;
        while (i < w && x[i] == r[i]) {
            i++;
        }
        if (i == w || Long.compareUnsigned(x[i], r[i]) > 0) {
            return -1;
        }
        int shift = plan.extraShift;
        int word = w - 1 - (shift >>> 6);
        int offset = shift & 63;
        long v = x[word] >>> offset;
        if (offset != 0 && word > 0) {
            v |= x[word - 1] << (64 - offset);
        }
        return v & ((1L << plan.extraBits) - 1);
    }

    /**
     * Draws the leading key of every die into {@code keys[d]}, one block per eight dice by the
     * rule of {@link RollGenerator#groupValue}, and if asked spells each key's digits into
     * {@code digits[d][0..P)}.
     */
    private void drawGroups(RollGenerator generator, int stream, long index, boolean spell) {
        long product = group.product();
        int n = players;
        long[] k = keys;
        for (int g = 0; g < n; g += RollGenerator.GROUP_LANES) {
            if (product > 1) {
                generator.block(index, RollGenerator.leadingGroupWord(stream, g), 0, 0, block);
            }
            int end = Math.min(n, g + RollGenerator.GROUP_LANES);
            for (int d = g; d < end; d++) {
                long v = 0;
                if (product > 1) {
                    v = BoundedSampler.lemire32(RollGenerator.groupChunkOf(block, d), product);
                    if (v == BoundedSampler.REJECTED) {
                        v = generator.groupValue(index, stream, d, product); // attempt 0 again, then 1, 2, …
                    }
                }
                k[d] = v;
                if (spell) {
                    dice.leadingDigits(d, v, group.digits(), digits[d]);
                }
            }
        }
    }

    /**
     * Draws digit {@code j} of every die into {@code digits[d][j]}, one block per lane group,
     * straight from the generator (measured faster here than stepping a cursor's kept streams).
     */
    private void drawDigit(RollGenerator generator, int stream, long index, int j) {
        long r = radix[j];
        int n = players;
        if (r == 1) {
            for (int d = 0; d < n; d++) {
                digits[d][j] = 0;
            }
        } else if (narrowDraws && r < RollGenerator.NARROW_LIMIT) {
            int ri = (int) r;
            for (int g = 0; g < n; g += RollGenerator.LANES) {
                long[] words = narrowBlock(generator, stream, index, g, j);
                int end = Math.min(n, g + RollGenerator.LANES);
                for (int d = g; d < end; d++) {
                    int v = BoundedSampler.lemire16(RollGenerator.chunkOf(words, index, d), ri);
                    if (v == BoundedSampler.REJECTED) {
                        v = generator.narrowDigit(index, stream, d, j, ri); // attempt 0 again, then 1, 2, …
                    }
                    digits[d][j] = v;
                }
            }
        } else {
            for (int g = 0; g < n; g += RollGenerator.LANES) {
                generator.block(index, RollGenerator.groupWord(stream, g), j, 0, block);
                int end = Math.min(n, g + RollGenerator.LANES);
                for (int d = g; d < end; d++) {
                    long v = BoundedSampler.lemire64(block[d & 3], r);
                    for (long attempt = 1; v == BoundedSampler.REJECTED; attempt++) {
                        v = BoundedSampler.lemire64(generator.word(index, stream, d, j, attempt), r);
                    }
                    digits[d][j] = v;
                }
            }
        }
    }

    /**
     * The narrow block of lane group {@code g} for digit {@code j}; when this ranker keeps
     * blocks, those of stream 0 are kept per (digit, group) and reused while c0 = index / 4
     * stays the same.
     */
    private long[] narrowBlock(RollGenerator generator, int stream, long index, int g, int j) {
        long c0 = index >>> 2;
        long c1 = RollGenerator.narrowGroupWord(stream, g);
        if (narrowWords == null || stream != Streams.ROUND) {
            generator.block(c0, c1, j, 0, block);
            return block;
        }
        int kept = j * laneGroups + (g >>> 2);
        long[] words = narrowWords[kept];
        if (words == null) {
            words = new long[RollGenerator.LANES];
            narrowWords[kept] = words;
        }
        if (narrowC0[kept] != c0 + 1) {
            generator.block(c0, c1, j, 0, words);
            narrowC0[kept] = c0 + 1;
        }
        return words;
    }
}
