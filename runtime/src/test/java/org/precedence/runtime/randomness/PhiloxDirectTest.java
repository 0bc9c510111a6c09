package org.precedence.runtime.randomness;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.math.BigInteger;
import java.util.SplittableRandom;
import org.apache.commons.rng.core.source64.Philox4x64;
import org.junit.jupiter.api.Test;

class PhiloxDirectTest {

    // Reference library: Apache Commons RNG's Philox4x64 (Maven Central, test scope here),
    // positioned at each counter via PhiloxGenerator.stream. Random keys and counters from
    // SplittableRandom with fixed seed 7, plus counters near word borrows.
    @Test
    void block_equalsLibraryOnRandomKeysAndCounters() {
        SplittableRandom r = new SplittableRandom(7);
        long[] ours = new long[4];
        for (int i = 0; i < 20_000; i++) {
            PhiloxGenerator g = new PhiloxGenerator(r.nextLong(), r.nextLong());
            long c0 = i < 8 ? i - 4 : r.nextLong();
            long c1 = i % 3 == 0 ? 0 : r.nextLong();
            long c2 = r.nextLong();
            long c3 = r.nextLong();
            g.block(c0, c1, c2, c3, ours);
            Philox4x64 lib = g.stream(c0, c1, c2, c3);
            assertArrayEquals(new long[] {lib.next(), lib.next(), lib.next(), lib.next()}, ours, "block " + i);
        }
    }

    @Test
    void unsignedMultiplyHigh_equalsBigIntegerProduct() {
        SplittableRandom r = new SplittableRandom(11);
        BigInteger mask = BigInteger.ONE.shiftLeft(64).subtract(BigInteger.ONE);
        for (int i = 0; i < 10_000; i++) {
            long a = r.nextLong();
            long b = i == 0 ? -1 : r.nextLong();
            BigInteger p = new BigInteger(Long.toUnsignedString(a)).multiply(new BigInteger(Long.toUnsignedString(b)));
            assertEquals(p.shiftRight(64).and(mask).longValue(), PhiloxGenerator.unsignedMultiplyHigh(a, b));
        }
    }
}
