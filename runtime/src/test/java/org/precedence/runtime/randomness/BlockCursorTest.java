package org.precedence.runtime.randomness;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;

import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.precedence.api.RandomnessMode;
import org.precedence.api.SessionSeed;

class BlockCursorTest {
    // Cursors only change the cost: any sequence of requests gives the generator's own words,
    // whether counters step forward, repeat, jump, wrap past 2^64 or interleave lanes.
    @Test
    void cursor_givesTheGeneratorsWordsForAnyRequestSequence() {
        for (RandomnessMode mode : RandomnessMode.values()) {
            RollGenerator g = RollGenerator.of(mode, SessionSeed.fromText("cursor"));
            BlockCursor cursor = g.cursor();
            SplittableRandom random = new SplittableRandom(7);
            long c0 = -3;
            long[] expected = new long[4];
            long[] actual = new long[4];
            for (int i = 0; i < 20_000; i++) {
                int kind = random.nextInt(6);
                c0 = switch (kind) {
                    case 0, 1, 2 -> c0 + 1;
                    case 3 -> c0;
                    case 4 -> random.nextLong();
                    default -> -1 - random.nextInt(2);
                };
                long c1 = RollGenerator.groupWord(random.nextInt(2), 4 * random.nextInt(12));
                long c2 = random.nextInt(3);
                long c3 = random.nextInt(10) == 0 ? 1 : 0;
                g.block(c0, c1, c2, c3, expected);
                cursor.block(c0, c1, c2, c3, actual);
                assertArrayEquals(expected, actual, mode + " request " + i);
            }
        }
    }
}
