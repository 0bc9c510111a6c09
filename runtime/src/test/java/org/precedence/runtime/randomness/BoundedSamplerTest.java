package org.precedence.runtime.randomness;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigInteger;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

class BoundedSamplerTest {
    private static final BigInteger TWO_64 = BigInteger.ONE.shiftLeft(64);

    // Exhaustive: an 8-bit toy generator enumerated completely. Every value in [0, r) must be
    // accepted for exactly floor(256 / r) of the 256 words: exact uniformity, no modulo bias.
    @Test
    void lemireNarrow_isExactlyUniformOnEveryEightBitWord() {
        for (int bits : new int[] {4, 8}) {
            int words = 1 << bits;
            for (long r = 1; r < 1L << (bits - 1); r++) {
                long[] hits = new long[(int) r];
                for (long x = 0; x < words; x++) {
                    long v = BoundedSampler.lemireNarrow(x, r, bits);
                    if (v != BoundedSampler.REJECTED) {
                        hits[(int) v]++;
                    }
                }
                for (int v = 0; v < r; v++) {
                    assertEquals(words / r, hits[v], "bits " + bits + ", radix " + r + ", value " + v);
                }
            }
        }
    }

    // Lemire's method on 32-bit chunks, the leading-group rule: the same arithmetic as the toy
    // rule at width 32 (proven exactly uniform at widths 4, 8 and 16 above and below), at every
    // boundary of the chunk and of the product, for radices of every size below 2^32.
    @Test
    void lemire32_agreesWithTheRuleAtWidth32() {
        SplittableRandom random = new SplittableRandom(3232L); // fixed seed: inputs only
        long[] radices = {1, 2, 3, 5, 6, 7, 12, 720, 20160, 14515200, (1L << 24) - 1, 1L << 31, (1L << 31) + 1,
            3_000_000_000L, (1L << 32) - 1};
        for (long r : radices) {
            for (int i = 0; i < 20_000; i++) {
                long x = i < 4 ? new long[] {0, 1, (1L << 32) - 2, (1L << 32) - 1}[i] : random.nextLong() >>> 32;
                assertEquals(BoundedSampler.lemireNarrow(x, r, 32), BoundedSampler.lemire32(x, r),
                        "radix " + r + ", chunk " + x);
            }
        }
    }

    // Exhaustive over all 2^32 chunks for the radix the ten-player set's leading group uses
    // (2 · 10! · 2 = 14,515,200; 10! = 3,628,800, OEIS A000142): every value is accepted for
    // exactly floor(2^32 / r) = 295 chunks and 2^32 mod r = 12,983,296 chunks are rejected.
    @Test
    void lemire32_isExactlyUniformOnEveryChunkForTheTenPlayerGroup() {
        long r = 2L * 3_628_800L * 2L;
        int[] hits = new int[(int) r];
        long rejected = 0;
        for (long x = 0; x < 1L << 32; x++) {
            long v = BoundedSampler.lemire32(x, r);
            if (v == BoundedSampler.REJECTED) {
                rejected++;
            } else {
                hits[(int) v]++;
            }
        }
        assertEquals((1L << 32) % r, rejected);
        assertEquals(12_983_296L, rejected);
        for (int v = 0; v < r; v++) {
            if (hits[v] != 295) {
                assertEquals(295, hits[v], "value " + v);
            }
        }
    }

    // Exhaustive over all 2^16 chunks (Lemire, ACM TOMACS 29(1), 2019: each value is accepted
    // for exactly floor(2^16 / r) chunks): every radix up to 600, the catalog's side counts and
    // radices near 2^16, where rejection is likeliest (43691 rejects a third of the chunks).
    @Test
    void lemire16_isExactlyUniformOnEverySixteenBitChunk() {
        java.util.List<Integer> radices = new java.util.ArrayList<>();
        for (int r = 1; r <= 600; r++) {
            radices.add(r);
        }
        radices.addAll(java.util.List.of(1152, 32767, 32768, 32769, 43690, 43691, 65534, 65535));
        for (int r : radices) {
            long[] hits = new long[r];
            int rejected = 0;
            for (int x = 0; x < 1 << 16; x++) {
                int v = BoundedSampler.lemire16(x, r);
                assertEquals(BoundedSampler.lemireNarrow(x, r, 16), v, "radix " + r + ", chunk " + x);
                if (v == BoundedSampler.REJECTED) {
                    rejected++;
                } else {
                    hits[v]++;
                }
            }
            for (int v = 0; v < r; v++) {
                assertEquals((1 << 16) / r, hits[v], "radix " + r + ", value " + v);
            }
            assertEquals((1 << 16) % r, rejected, "radix " + r);
        }
    }

    // Exhaustive for the multi-word rule: 4-bit words, radices from 8 (the narrow Lemire limit)
    // up to 2^10, every tuple of words enumerated: each value accepted exactly once per tuple set.
    @Test
    void maskedRejection_isExactlyUniformOnEveryFourBitTuple() {
        for (int r = 8; r <= 1 << 10; r += r < 80 ? 1 : 37) {
            BigInteger radix = BigInteger.valueOf(r);
            int length = radix.subtract(BigInteger.ONE).bitLength();
            int per = (length + 3) / 4;
            int tuples = 1 << (4 * per);
            int[] hits = new int[r];
            int accepted = 0;
            for (int t = 0; t < tuples; t++) {
                final int tuple = t;
                // Attempt 0 reads the tuple's words, most significant first; any later word means
                // the sampler rejected attempt 0.
                BoundedSampler.AttemptWords words = a -> {
                    if (a >= per) {
                        throw new RejectedSignal();
                    }
                    return (tuple >>> (4 * (per - 1 - (int) a))) & 0xF;
                };
                try {
                    int v = BoundedSampler.draw(radix, words, 4).intValueExact();
                    hits[v]++;
                    accepted++;
                } catch (RejectedSignal expected) {
                    // rejected: counted by its absence
                }
            }
            int copies = tuples >>> length;
            for (int v = 0; v < r; v++) {
                assertEquals(copies, hits[v], "radix " + r + ", value " + v);
            }
            assertTrue(2L * accepted > tuples, "acceptance above 1/2 for radix " + r);
        }
    }

    private static final class RejectedSignal extends RuntimeException {
        private static final long serialVersionUID = 1L;
    }

    // The 64-bit code against the same rule computed exactly with BigInteger.
    @Test
    void lemire64_followsTheExactRule() {
        SplittableRandom random = new SplittableRandom(20261202L);
        long[] radices = {1, 2, 3, 6, 7, 12, 1152, 13824, (1L << 32) + 1, (1L << 62) + 3, Long.MAX_VALUE};
        for (long r : radices) {
            BigInteger big = BigInteger.valueOf(r);
            BigInteger threshold = TWO_64.subtract(big).mod(big);
            for (int i = 0; i < 20_000; i++) {
                long x = i < 4 ? new long[] {0, -1, 1, Long.MIN_VALUE}[i] : random.nextLong();
                BigInteger m = new BigInteger(Long.toUnsignedString(x)).multiply(big);
                boolean reject = m.mod(TWO_64).compareTo(threshold) < 0;
                long expected = reject ? BoundedSampler.REJECTED : m.shiftRight(64).longValueExact();
                assertEquals(expected, BoundedSampler.lemire64(x, r), "word " + x + ", radix " + r);
            }
        }
    }

    @Test
    void draw_rejectsUntilAccepted() {
        // Radix 3: word 0 gives low product 0 < threshold (2^64 - 3) mod 3 = 1, so it is rejected.
        long[] words = {0, 0, -1};
        assertEquals(BigInteger.TWO, BoundedSampler.draw(BigInteger.valueOf(3), a -> words[(int) a]));
        assertEquals(BigInteger.ZERO, BoundedSampler.draw(BigInteger.ONE, a -> {
            throw new AssertionError("radix 1 consumes no word");
        }));
    }

    @Test
    void draw_hugeRadixUsesWholeWordsMostSignificantFirst() {
        BigInteger radix = BigInteger.ONE.shiftLeft(100).add(BigInteger.ONE); // 101 bits, 2 words
        long hi = 0x1FL;   // low 37 bits of word 0 kept: 0x1F
        long lo = 0x1234L;
        BigInteger v = BoundedSampler.draw(radix, a -> a == 0 ? hi | (1L << 40) : lo);
        assertEquals(BigInteger.valueOf(0x1F).shiftLeft(64).add(BigInteger.valueOf(0x1234)), v);
    }

    @Test
    void draw_badRadix() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> BoundedSampler.draw(BigInteger.ZERO, a -> 0));
        assertTrue(e.getMessage().contains(">= 1"));
    }
}
