package org.precedence.runtime.randomness;

import org.apache.commons.rng.core.source64.Philox4x64;

/**
 * Fast mode: Philox4x64-10 (Salmon, Moraes, Dror and Shaw, "Parallel random numbers: as easy
 * as 1, 2, 3", SC 2011) as a pure block function.
 *
 * <p>{@link #block} computes the ten rounds directly, without allocating; it is checked
 * against the Random123 known answers and against Apache Commons RNG's {@link Philox4x64}
 * (the reference, reached through {@link #stream}), which exposes Philox only as a stream
 * that increments its counter <em>before</em> each block — so the reference is seeded with
 * the wanted counter minus one (a 256-bit decrement) and its first four words are read.
 */
final class PhiloxGenerator extends RollGenerator {
    private final long key0;
    private final long key1;

    PhiloxGenerator(long key0, long key1) {
        this.key0 = key0;
        this.key1 = key1;
    }

    /** Key words: little-endian 64-bit integers from bytes 0..7 and 8..15 of the derived key. */
    static PhiloxGenerator fromKeyBytes(byte[] key) {
        return new PhiloxGenerator(Bytes.readLongLE(key, 0), Bytes.readLongLE(key, 8));
    }

    long key0() {
        return key0;
    }

    long key1() {
        return key1;
    }

    @Override
    public String algorithmId() {
        return FAST_ID;
    }

    /** Philox4x64 round multipliers and Weyl key increments (constants of the published algorithm). */
    private static final long M0 = 0xD2E7470EE14C6C93L;
    private static final long M1 = 0xCA5A826395121157L;
    private static final long W0 = 0x9E3779B97F4A7C15L;
    private static final long W1 = 0xBB67AE8584CAA73BL;

    @Override
    public void block(long c0, long c1, long c2, long c3, long[] out) {
        long k0 = key0;
        long k1 = key1;
        for (int round = 0; round < 10; round++) {
            long hi0 = unsignedMultiplyHigh(M0, c0);
            long lo0 = M0 * c0;
            long hi1 = unsignedMultiplyHigh(M1, c2);
            long lo1 = M1 * c2;
            c0 = hi1 ^ c1 ^ k0;
            c1 = lo1;
            c2 = hi0 ^ c3 ^ k1;
            c3 = lo0;
            k0 += W0;
            k1 += W1;
        }
        out[0] = c0;
        out[1] = c1;
        out[2] = c2;
        out[3] = c3;
    }

    /** The high 64 bits of the unsigned 128-bit product (Math.unsignedMultiplyHigh needs Java 18). */
    static long unsignedMultiplyHigh(long a, long b) {
        return Math.multiplyHigh(a, b) + ((a >> 63) & b) + ((b >> 63) & a);
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
