package org.precedence.runtime.randomness;

import org.apache.commons.rng.core.source64.Philox4x64;

/**
 * Philox blocks for callers that walk c0 upwards (rounds in order). The library's generator,
 * after emitting the block at (c0, c1, c2, c3), emits the block at (c0 + 1, c1, c2, c3) next,
 * because it increments its counter before each block. So a request for the counter right
 * after the last one served on the same (c1, c2, c3) is four {@code next()} calls on a kept
 * generator: no allocation. Any other request constructs a generator there (the library's
 * 4-word buffer is then allocated; JMH {@code PhiloxBench}) and keeps it. A few slots keep
 * lanes (player groups, streams) apart.
 */
final class PhiloxCursor extends BlockCursor {
    private static final int SLOTS = 8;

    private final PhiloxGenerator generator;
    private final Philox4x64[] streams = new Philox4x64[SLOTS];
    private final long[] next = new long[SLOTS];
    private final long[] c1 = new long[SLOTS];
    private final long[] c2 = new long[SLOTS];
    private final long[] c3 = new long[SLOTS];
    private int used;
    private int victim;
    private int last;

    PhiloxCursor(PhiloxGenerator generator) {
        this.generator = generator;
    }

    @Override
    public void block(long a, long b, long c, long d, long[] out) {
        int slot = last;
        // The usual caller walks one lane: try the slot served last before searching.
        if (slot >= used || c1[slot] != b || c2[slot] != c || c3[slot] != d) {
            slot = find(b, c, d);
        }
        Philox4x64 g = streams[slot];
        // next[slot] == 0 after a wrap of c0: the kept stream would carry into c1, so rebuild.
        if (g == null || next[slot] != a || a == 0) {
            g = generator.stream(a, b, c, d);
            streams[slot] = g;
        }
        out[0] = g.next();
        out[1] = g.next();
        out[2] = g.next();
        out[3] = g.next();
        next[slot] = a + 1;
        last = slot;
    }

    private int find(long b, long c, long d) {
        int slot = -1;
        for (int i = 0; i < used; i++) {
            if (c1[i] == b && c2[i] == c && c3[i] == d) {
                slot = i;
                break;
            }
        }
        if (slot < 0) {
            // Round-robin eviction; the index stays in range however many requests come.
            slot = used < SLOTS ? used++ : (victim = (victim + 1) % SLOTS);
            c1[slot] = b;
            c2[slot] = c;
            c3[slot] = d;
            streams[slot] = null;
        }
        return slot;
    }
}
