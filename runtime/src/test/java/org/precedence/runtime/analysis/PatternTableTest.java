package org.precedence.runtime.analysis;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigInteger;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.precedence.runtime.dice.DiceSet;
import org.precedence.runtime.dice.Word;

class PatternTableTest {

    @Test
    void stateCount_matchesOeisA000522() {
        // OEIS A000522, "total number of arrangements of a set with n elements":
        // 1, 2, 5, 16, 65, 326, 1957, 13700, 109601, 986410, 9864101, 108505112
        // (values from memory; they also follow from a(n) = n·a(n−1) + 1, checked below).
        long[] a000522 = {1, 2, 5, 16, 65, 326, 1957, 13700, 109601, 986410, 9864101, 108505112};
        for (int n = 0; n < a000522.length; n++) {
            assertEquals(a000522[n], PatternTable.stateCount(n), "n = " + n);
            if (n > 0) {
                assertEquals(n * a000522[n - 1] + 1, a000522[n]);
            }
        }
    }

    @Test
    void count_randomSmallSets_everyPatternMatchesBruteForce() {
        SplittableRandom rnd = new SplittableRandom(TestSets.seed("PatternTableTest.count_random"));
        for (int trial = 0; trial < 120; trial++) {
            int n = 2 + rnd.nextInt(4);
            int[] sides = TestSets.randomSides(rnd, n, rnd.nextBoolean(), 4000);
            FairnessChecks.assertPatternTableExact(TestSets.randomSet(rnd, sides));
        }
    }

    @Test
    void count_bigIntegerPath_agreesWithLongPath() {
        SplittableRandom rnd = new SplittableRandom(TestSets.seed("PatternTableTest.count_big"));
        for (int trial = 0; trial < 60; trial++) {
            int n = 2 + rnd.nextInt(5);
            Word w = TestSets.randomSet(rnd, TestSets.randomSides(rnd, n, false, 1 << 20)).word();
            PatternTable plain = PatternTable.count(w);
            PatternTable big = PatternTable.count(w, true);
            assertTrue(plain.fitsLong());
            assertFalse(big.fitsLong());
            for (int s = 0; s < plain.size(); s++) {
                assertEquals(plain.count(s), big.count(s), w + " state " + s);
            }
        }
    }

    @Test
    void count_productBeyondLong_usesExactBigIntegers() {
        // 7 dice of 512 sides: 512^7 = 2^63 outcomes, one more than a long holds.
        int n = 7;
        int sides = 512;
        int[] letters = new int[n * sides];
        SplittableRandom rnd = new SplittableRandom(TestSets.seed("PatternTableTest.count_beyond"));
        for (int i = 0; i < letters.length; i++) {
            letters[i] = i % n;
        }
        for (int i = letters.length - 1; i > 0; i--) {
            int j = rnd.nextInt(i + 1);
            int t = letters[i];
            letters[i] = letters[j];
            letters[j] = t;
        }
        PatternTable table = PatternTable.count(Word.of(n, letters));
        assertFalse(table.fitsLong());
        assertThrows(ArithmeticException.class, () -> table.countLong(0));
        BigInteger all = BigInteger.ZERO;
        for (int s = table.firstOfLength(n); s < table.endOfLength(n); s++) {
            all = all.add(table.count(s));
        }
        assertEquals(BigInteger.TWO.pow(63), all, "the rankings share out every outcome");
        for (int x = 0; x < n; x++) {
            for (int y = 0; y < n; y++) {
                if (x != y) {
                    assertEquals(BigInteger.valueOf(sides * sides),
                            table.countOf(x, y).add(table.countOf(y, x)), "pair " + x + "," + y);
                }
            }
        }
    }

    @Test
    void indexOf_andPattern_areInverse() {
        for (int n = 2; n <= 7; n++) {
            int[] letters = new int[n];
            for (int d = 0; d < n; d++) {
                letters[d] = d;
            }
            PatternTable table = PatternTable.count(Word.of(n, letters));
            int expected = 0;
            for (int k = 0; k <= n; k++) {
                assertEquals(expected, table.firstOfLength(k));
                int[] seen = {table.firstOfLength(k)};
                int kk = k;
                table.forEachOfLength(k, (p, s) -> {
                    assertEquals(seen[0]++, s);
                    assertEquals(kk, table.length(s));
                    assertArrayEquals(p, table.pattern(s));
                    assertEquals(s, table.indexOf(p));
                });
                assertEquals(table.endOfLength(k), seen[0]);
                expected = table.endOfLength(k);
            }
            assertEquals(table.size(), expected);
        }
    }

    @Test
    void indexOf_repeatedOrForeignLetter_isMinusOne() {
        PatternTable table = PatternTable.count(Word.parse("ABCCBA"));
        assertEquals(-1, table.indexOf(0, 0));
        assertEquals(-1, table.indexOf(3));
        assertEquals(-1, table.indexOf(-1));
        assertEquals(-1, table.indexOf(0, 1, 2, 0));
        assertThrows(IllegalArgumentException.class, () -> table.countOf(1, 1));
        assertThrows(IndexOutOfBoundsException.class, () -> table.count(table.size()));
    }

    @Test
    void count_handWorkedWord_givesKnownCounts() {
        // ABCCBA, positions A1 B2 C3 C4 B5 A6, counted by hand: AB = A1·{B2,B5} = 2,
        // BA = {B2,B5}·A6 = 2; ABC = A1 B2 {C3,C4} = 2; ACB = A1 {C3,C4} B5 = 2;
        // BCA = B2 {C3,C4} A6 = 2; CBA = {C3,C4} B5 A6 = 2; BAC and CAB need a letter after A6: 0.
        PatternTable t = PatternTable.count(Word.parse("ABCCBA"));
        assertEquals(BigInteger.TWO, t.countOf(0, 1));
        assertEquals(BigInteger.TWO, t.countOf(1, 0));
        assertEquals(BigInteger.TWO, t.countOf(0, 1, 2));
        assertEquals(BigInteger.TWO, t.countOf(0, 2, 1));
        assertEquals(BigInteger.ZERO, t.countOf(1, 0, 2));
        assertEquals(BigInteger.TWO, t.countOf(1, 2, 0));
        assertEquals(BigInteger.ZERO, t.countOf(2, 0, 1));
        assertEquals(BigInteger.TWO, t.countOf(2, 1, 0));
    }

    @Test
    void count_tooManyDice_isRejectedWithTheLimit() {
        int[] letters = new int[12];
        for (int d = 0; d < 12; d++) {
            letters[d] = d;
        }
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> PatternTable.count(Word.of(12, letters)));
        assertTrue(e.getMessage().contains("at most 11 dice"), e.getMessage());
    }

    @Test
    void count_eightDiceSet_sumsToOutcomes() {
        SplittableRandom rnd = new SplittableRandom(TestSets.seed("PatternTableTest.count_eight"));
        DiceSet set = TestSets.randomSet(rnd, new int[] {9, 10, 11, 12, 13, 14, 15, 16});
        PatternTable table = PatternTable.count(set.word());
        long sum = 0;
        for (int s = table.firstOfLength(8); s < table.endOfLength(8); s++) {
            sum += table.countLong(s);
        }
        assertEquals(9L * 10 * 11 * 12 * 13 * 14 * 15 * 16, sum);
    }
}
