package org.precedence.cli.simulate;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

class ExpectedThrowsTest {

    @Test
    void mean_fourSixSidedDice() {
        // First principles: 6^4 / (6·5·4·3) = 1296 / 360 = 3.6.
        assertEquals(3.6, ExpectedThrows.mean(4, 6), 1e-12);
    }

    @Test
    void mean_bruteForceSmallCases() {
        // Brute force: count all s^n outcomes with distinct values.
        for (int n = 1; n <= 4; n++) {
            for (int s = n; s <= 8; s++) {
                long total = 1;
                for (int i = 0; i < n; i++) {
                    total *= s;
                }
                long distinct = 0;
                int[] v = new int[n];
                for (long code = 0; code < total; code++) {
                    long c = code;
                    for (int i = 0; i < n; i++) {
                        v[i] = (int) (c % s);
                        c /= s;
                    }
                    boolean ok = true;
                    for (int i = 0; i < n && ok; i++) {
                        for (int j = 0; j < i && ok; j++) {
                            ok = v[i] != v[j];
                        }
                    }
                    distinct += ok ? 1 : 0;
                }
                assertEquals((double) total / distinct, ExpectedThrows.mean(n, s), 1e-12, n + " dice, " + s + " sides");
            }
        }
    }

    @Test
    void mean_morePlayersThanSidesNeverEnds() {
        assertEquals(Double.POSITIVE_INFINITY, ExpectedThrows.mean(7, 6));
    }
}
