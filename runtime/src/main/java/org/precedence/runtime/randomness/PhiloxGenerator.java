package org.precedence.runtime.randomness;

import org.apache.commons.rng.core.source64.Philox4x64;

/**
 * Fast mode: Philox4x64-10 from Apache Commons RNG, used as a pure block function.
 *
 * <p>The library exposes Philox as a stream whose state is (key, counter) and which increments
 * the counter <em>before</em> computing each block. Constructing it is the cheapest way to
 * jump to an arbitrary counter (there is no public counter setter, and {@code jump(double)}
 * also allocates a copy), so each block constructs one generator seeded with the wanted
 * counter minus one (a 256-bit decrement) and reads its first four words. The JIT removes
 * the generator object but not its 4-word buffer (48 bytes per block, JMH {@code PhiloxBench}).
 * Callers walking rounds in order use {@link #cursor()}, which steps a kept generator instead
 * and allocates nothing.
 */
final class PhiloxGenerator extends RollGenerator {
    /** Which draw layouts an algorithm id uses besides the wide one (docs/roll-spec.md §4). */
    enum Layout {
        /** Every draw a 64-bit word (v1). */
        WIDE,
        /** 16-bit chunks below radix 2^16 (v2). */
        NARROW,
        /** As NARROW, and the leading digits of multi-digit faces from one 32-bit chunk (v3). */
        LEADING_GROUPS
    }

    private final String algorithmId;
    private final Layout layout;
    private final long key0;
    private final long key1;

    /** A block function with the given key words (the algorithm id only names the layout). */
    PhiloxGenerator(long key0, long key1) {
        this(FAST_ID, Layout.LEADING_GROUPS, key0, key1);
    }

    PhiloxGenerator(String algorithmId, Layout layout, long key0, long key1) {
        this.algorithmId = algorithmId;
        this.layout = layout;
        this.key0 = key0;
        this.key1 = key1;
    }

    /** Key words: little-endian 64-bit integers from bytes 0..7 and 8..15 of the derived key. */
    static PhiloxGenerator fromKeyBytes(String algorithmId, Layout layout, byte[] key) {
        return new PhiloxGenerator(algorithmId, layout, Bytes.readLongLE(key, 0), Bytes.readLongLE(key, 8));
    }

    long key0() {
        return key0;
    }

    long key1() {
        return key1;
    }

    @Override
    public String algorithmId() {
        return algorithmId;
    }

    @Override
    public boolean narrowDraws() {
        return layout != Layout.WIDE;
    }

    @Override
    public boolean leadingGroups() {
        return layout == Layout.LEADING_GROUPS;
    }

    @Override
    public BlockCursor cursor() {
        return new PhiloxCursor(this);
    }

    @Override
    public void block(long c0, long c1, long c2, long c3, long[] out) {
        Philox4x64 g = stream(c0, c1, c2, c3);
        out[0] = g.next();
        out[1] = g.next();
        out[2] = g.next();
        out[3] = g.next();
    }

    /** Returns a library generator whose next four words are the block at (c0, c1, c2, c3). */
    Philox4x64 stream(long c0, long c1, long c2, long c3) {
        // 256-bit decrement: borrow into the next word only when the lower one was zero.
        long d0 = c0 - 1;
        long d1 = c0 == 0 ? c1 - 1 : c1;
        long d2 = c0 == 0 && c1 == 0 ? c2 - 1 : c2;
        long d3 = c0 == 0 && c1 == 0 && c2 == 0 ? c3 - 1 : c3;
        return new Philox4x64(new long[] {key0, key1, d0, d1, d2, d3});
    }
}
