package org.precedence.runtime.randomness;

import java.math.BigInteger;
import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.List;
import java.util.Objects;
import org.precedence.api.RandomnessMode;
import org.precedence.api.SessionSeed;

/**
 * A keyed block function from a 256-bit counter to four 64-bit words: the only source of
 * randomness behind a roll.
 *
 * <p>The counter is four 64-bit words {@code (c0, c1, c2, c3)}; see {@link #word} for how a
 * (draw index, stream, player, digit, attempt) tuple is laid out in it. The key is derived
 * from the session seed and the algorithm id:
 * {@code K = SHA-256(UTF-8(algorithmId) || 0x00 || seed)}, so the two modes never share a key
 * and a key exposed by fast-mode output reveals neither the seed nor the secure-mode key.
 *
 * <p>Three word layouts exist. The <em>wide</em> layout ({@link #word}) gives one 64-bit word per
 * draw; every algorithm uses it for digits whose radix is at least {@link #NARROW_LIMIT}. The
 * <em>narrow</em> layout ({@link #chunk}), used by {@link #FAST_ID} and {@link #FAST_V2_ID} for
 * smaller radices, gives a 16-bit chunk per draw, so that one block serves four consecutive draw
 * indices of four players. The <em>leading-group</em> layout ({@link #groupChunk}), used by
 * {@link #FAST_ID} only, gives one 32-bit chunk per die for the leading digits of a multi-digit
 * face drawn together ({@link LeadingGroup}), so that one block serves eight dice.
 * {@link #digit} applies the rule of this generator's algorithm id to a digit outside a
 * leading group.
 *
 * <p>Instances are immutable and thread-safe.
 */
public abstract class RollGenerator {
    /**
     * Algorithm id of the fast mode (16-bit draws for small radices, the leading digits of a
     * multi-digit face drawn together from a 32-bit chunk); recorded in every log.
     */
    public static final String FAST_ID = "precedence-roll-v3/philox4x64";
    /**
     * The second fast algorithm: as {@link #FAST_ID} (same key) but every digit of a multi-digit
     * face drawn on its own; still replayed, no longer the default.
     */
    public static final String FAST_V2_ID = "precedence-roll-v2/philox4x64";
    /** The first fast algorithm (one 64-bit word per draw); still replayed, no longer the default. */
    public static final String FAST_V1_ID = "precedence-roll-v1/philox4x64";
    /** Algorithm id of the secure mode; recorded in every log. */
    public static final String SECURE_ID = "precedence-roll-v1/hmac-sha256";

    /** Players served by one block: the low two bits of the player index pick the word. */
    public static final int LANES = 4;
    /** Radices below this are drawn from 16-bit chunks under {@link #FAST_ID} and {@link #FAST_V2_ID}. */
    public static final int NARROW_LIMIT = 1 << 16;
    /** Dice served by one leading-group block: the low three bits of the die index pick the chunk. */
    public static final int GROUP_LANES = 8;
    /** Every algorithm id this version implements, the default fast one first. */
    public static final List<String> ALGORITHM_IDS = List.of(FAST_ID, FAST_V2_ID, FAST_V1_ID, SECURE_ID);
    private static final long NARROW_FLAG = 1L << 31;
    private static final long GROUP_FLAG = 1L << 30;

    RollGenerator() {
    }

    /** Returns the generator of {@code mode} keyed by {@code seed}. */
    public static RollGenerator of(RandomnessMode mode, SessionSeed seed) {
        Objects.requireNonNull(mode, "mode");
        Objects.requireNonNull(seed, "seed");
        return switch (mode) {
            case FAST -> of(FAST_ID, seed);
            case SECURE -> of(SECURE_ID, seed);
        };
    }

    /**
     * Returns the generator of algorithm {@code algorithmId} keyed by {@code seed}.
     *
     * @throws IllegalArgumentException if the id is not one of {@link #ALGORITHM_IDS}
     */
    public static RollGenerator of(String algorithmId, SessionSeed seed) {
        Objects.requireNonNull(algorithmId, "algorithmId");
        Objects.requireNonNull(seed, "seed");
        return switch (algorithmId) {
            case FAST_ID -> PhiloxGenerator.fromKeyBytes(FAST_ID, PhiloxGenerator.Layout.LEADING_GROUPS,
                    deriveKey(FAST_ID, seed));
            case FAST_V2_ID -> PhiloxGenerator.fromKeyBytes(FAST_V2_ID, PhiloxGenerator.Layout.NARROW,
                    deriveKey(FAST_V2_ID, seed));
            case FAST_V1_ID -> PhiloxGenerator.fromKeyBytes(FAST_V1_ID, PhiloxGenerator.Layout.WIDE,
                    deriveKey(FAST_V1_ID, seed));
            case SECURE_ID -> new HmacGenerator(deriveKey(SECURE_ID, seed));
            default -> throw new IllegalArgumentException("unknown roll algorithm '" + algorithmId
                    + "'; this version implements " + String.join(", ", ALGORITHM_IDS));
        };
    }

    /** Returns the algorithm id of {@code mode}. */
    public static String algorithmId(RandomnessMode mode) {
        return Objects.requireNonNull(mode, "mode") == RandomnessMode.FAST ? FAST_ID : SECURE_ID;
    }

    /** Returns the mode whose algorithm id is {@code id}, or null if the id is unknown. */
    public static RandomnessMode modeOf(String id) {
        if (FAST_ID.equals(id) || FAST_V2_ID.equals(id) || FAST_V1_ID.equals(id)) {
            return RandomnessMode.FAST;
        }
        return SECURE_ID.equals(id) ? RandomnessMode.SECURE : null;
    }

    /**
     * Returns {@code SHA-256(UTF-8(label) || 0x00 || seed bytes)}; the label is the algorithm id,
     * except that {@link #FAST_ID} uses the key of {@link #FAST_V2_ID}.
     */
    static byte[] deriveKey(String algorithmId, SessionSeed seed) {
        // v3 keeps the v2 key on purpose: a set whose faces have one digit rolls the same under
        // both, and v3's own blocks have counters v2 never uses (bit 30 of c1).
        String label = FAST_ID.equals(algorithmId) ? FAST_V2_ID : algorithmId;
        try {
            MessageDigest sha = MessageDigest.getInstance("SHA-256");
            sha.update(label.getBytes(StandardCharsets.UTF_8));
            sha.update((byte) 0);
            sha.update(seed.bytes());
            return sha.digest();
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("every Java platform must provide SHA-256", e);
        }
    }

    /** Returns this generator's algorithm id. */
    public abstract String algorithmId();

    /**
     * Writes the four words of the block at counter {@code (c0, c1, c2, c3)} into
     * {@code out[0..3]}.
     */
    public abstract void block(long c0, long c1, long c2, long c3, long[] out);

    /**
     * Returns whether digits with a radix below {@link #NARROW_LIMIT} are drawn from 16-bit
     * chunks ({@link #chunk}) rather than 64-bit words ({@link #word}).
     */
    public boolean narrowDraws() {
        return false;
    }

    /**
     * Returns whether the leading digits of a multi-digit face are drawn together from one
     * 32-bit chunk ({@link LeadingGroup}, {@link #groupChunk}) rather than digit by digit.
     */
    public boolean leadingGroups() {
        return false;
    }

    /** Returns a new per-thread cursor over this generator's blocks (same words, maybe cheaper). */
    public BlockCursor cursor() {
        return new BlockCursor.Direct(this);
    }

    /**
     * Returns counter word {@code c1} for a stream and player: the stream in the high 32 bits,
     * the player's lane group ({@code player >>> 2}) in the low 32 bits.
     */
    public static long groupWord(int stream, int player) {
        return ((long) stream << 32) | (player >>> 2);
    }

    /**
     * Returns the word for one draw: word {@code player & 3} of the block at counter
     * {@code (index, groupWord(stream, player), digit, attempt)}.
     *
     * @param index   the draw index (a round, or a block of rounds, depending on the stream)
     * @param stream  which kind of draw (see {@code docs/roll-spec.md}); 0 ≤ stream
     * @param player  the player (die) index, ≥ 0
     * @param digit   the face digit, ≥ 0
     * @param attempt the attempt counter of the rejection sampler, ≥ 0
     */
    public long word(long index, int stream, int player, int digit, long attempt) {
        long[] out = new long[LANES];
        block(index, groupWord(stream, player), digit, attempt, out);
        return out[player & 3];
    }

    /**
     * Returns counter word {@code c1} of the narrow layout: {@link #groupWord} with bit 31 set,
     * so narrow and wide blocks never share a counter.
     */
    public static long narrowGroupWord(int stream, int player) {
        return groupWord(stream, player) | NARROW_FLAG;
    }

    /**
     * Returns the 16-bit chunk of a narrow block for a draw index and player: bits
     * {@code 16·(player & 3)} to {@code 16·(player & 3) + 15} of word {@code index & 3}.
     */
    public static int chunkOf(long[] block, long index, int player) {
        return (int) (block[(int) (index & 3)] >>> ((player & 3) << 4)) & 0xFFFF;
    }

    /**
     * Returns the 16-bit chunk for one draw: {@link #chunkOf} of the block at counter
     * {@code (index >>> 2, narrowGroupWord(stream, player), digit, attempt)}.
     */
    public int chunk(long index, int stream, int player, int digit, long attempt) {
        long[] out = new long[LANES];
        block(index >>> 2, narrowGroupWord(stream, player), digit, attempt, out);
        return chunkOf(out, index, player);
    }

    /**
     * Returns counter word {@code c1} of the leading-group layout: the stream in the high 32
     * bits, bit 30 set, the die's group of eight ({@code player >>> 3}) in the low bits. Bit 30
     * is never set in the other layouts (their lane groups stay below 2^30).
     */
    public static long leadingGroupWord(int stream, int player) {
        return ((long) stream << 32) | GROUP_FLAG | (player >>> 3);
    }

    /**
     * Returns the 32-bit chunk of a leading-group block for a die: bits {@code 32·(player & 1)}
     * to {@code 32·(player & 1) + 31} of word {@code (player & 7) >>> 1}.
     */
    public static long groupChunkOf(long[] block, int player) {
        return (block[(player & 7) >>> 1] >>> ((player & 1) << 5)) & 0xFFFF_FFFFL;
    }

    /**
     * Returns the 32-bit chunk for one leading-group draw: {@link #groupChunkOf} of the block at
     * counter {@code (index, leadingGroupWord(stream, player), 0, attempt)}.
     */
    public long groupChunk(long index, int stream, int player, long attempt) {
        long[] out = new long[LANES];
        block(index, leadingGroupWord(stream, player), 0, attempt, out);
        return groupChunkOf(out, player);
    }

    /**
     * Returns the value in {@code [0, product)} of a die's leading group, 2 ≤ product &lt;
     * {@link LeadingGroup#LIMIT}, drawn from chunks by {@link BoundedSampler#lemire32}, attempts
     * 0, 1, 2, …
     */
    public long groupValue(long index, int stream, int player, long product) {
        for (long attempt = 0; ; attempt++) {
            long v = BoundedSampler.lemire32(groupChunk(index, stream, player, attempt), product);
            if (v != BoundedSampler.REJECTED) {
                return v;
            }
        }
    }

    /**
     * Returns the digit in {@code [0, radix)} with 2 ≤ radix &lt; 2^16 drawn from chunks by
     * {@link BoundedSampler#lemire16}, attempts 0, 1, 2, …
     */
    public int narrowDigit(long index, int stream, int player, int digit, int radix) {
        for (long attempt = 0; ; attempt++) {
            int v = BoundedSampler.lemire16(chunk(index, stream, player, digit, attempt), radix);
            if (v != BoundedSampler.REJECTED) {
                return v;
            }
        }
    }

    /**
     * Returns digit {@code digit} of {@code player} in draw (index, stream), for a digit outside
     * any leading group (every digit unless {@link #leadingGroups()}): exactly uniform in
     * {@code [0, radix)} by this algorithm's rule (narrow chunks when {@link #narrowDraws()} and
     * the radix is below {@link #NARROW_LIMIT}, otherwise {@link BoundedSampler#draw} on
     * {@link #word}).
     *
     * @throws IllegalArgumentException if {@code radix < 1}
     */
    public BigInteger digit(long index, int stream, int player, int digit, BigInteger radix) {
        Objects.requireNonNull(radix, "radix");
        if (narrowDraws() && radix.signum() > 0 && radix.bitLength() <= 16) {
            int r = radix.intValue();
            return r == 1 ? BigInteger.ZERO : BigInteger.valueOf(narrowDigit(index, stream, player, digit, r));
        }
        return BoundedSampler.draw(radix, attempt -> word(index, stream, player, digit, attempt));
    }
}
