package org.precedence.runtime.construction;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigInteger;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.precedence.runtime.dice.MixedRadixDice;

class ConstructedDiceTest {

    @Test
    void faceValues_spellTheWordByDefinition() {
        for (Construction c : List.of(Construction.smallest(2), Construction.smallest(3),
                Construction.smallest(4), Construction.smallestUniform(4), Construction.plain(3))) {
            assertEquals(Materialise.byDefinition(c), Materialise.byFaceValues(new ConstructedDice(c)), c.toString());
        }
    }

    @Test
    void bruteForce_twoToFourDice_everyRankingEquallyLikely() {
        // Enumerate every outcome (s^n of them) and rank the dice with compare() alone.
        for (Construction c : List.of(Construction.smallest(2), Construction.smallest(3),
                Construction.smallestUniform(3), Construction.smallest(4))) {
            int n = c.players();
            ConstructedDice dice = new ConstructedDice(c);
            int sides = dice.sides(0).intValueExact();
            Map<String, Integer> counts = new HashMap<>();
            int outcomes = (int) Math.pow(sides, n);
            for (int o = 0; o < outcomes; o++) {
                BigInteger[][] digits = new BigInteger[n][];
                int rest = o;
                for (int d = 0; d < n; d++) {
                    digits[d] = Materialise.digitsOf(dice, d, rest % sides);
                    rest /= sides;
                }
                List<Integer> order = new ArrayList<>();
                for (int d = 0; d < n; d++) {
                    order.add(d);
                }
                order.sort((a, b) -> dice.compare(a, b, (die, j) -> digits[die][j]));
                counts.merge(order.toString(), 1, Integer::sum);
            }
            assertEquals(Families.factorial(n).intValueExact(), counts.size());
            int expected = outcomes / counts.size();
            for (int count : counts.values()) {
                assertEquals(expected, count, "n=" + n);
            }
        }
    }

    /**
     * The long face path and the prefix keys against the BigInteger definition: same value for
     * random digits, and keys that order faces exactly as their values whenever they differ.
     */
    @Test
    void faceValueOnLongs_andPrefixKeys_agreeWithBigIntegerFaceValue() {
        SplittableRandom random = new SplittableRandom(6012L); // fixed seed: inputs only
        int served = 0;
        for (int n : new int[] {2, 3, 4, 5, 6, 7, 10, 11, 12, 13, 33, 64}) {
            ConstructedDice dice = new ConstructedDice(Construction.smallest(n));
            int prefix = dice.prefixDigits(24);
            for (int trial = 0; trial < 300; trial++) {
                int a = random.nextInt(n);
                int b = (a + 1 + random.nextInt(n - 1)) % n;
                BigInteger[] da = randomDigits(dice, random);
                BigInteger[] db = randomDigits(dice, random);
                System.arraycopy(da, 0, db, 0, random.nextInt(dice.digits() + 1));
                BigInteger va = dice.faceValue(a, da);
                BigInteger vb = dice.faceValue(b, db);
                if (dice.hasLongDigits()) {
                    served++;
                    assertEquals(va, dice.faceValue(a, longs(da), new int[n], new long[dice.faceLimbs()]), "n=" + n);
                    assertEquals(vb, dice.faceValue(b, longs(db), new int[n], new long[dice.faceLimbs()]), "n=" + n);
                }
                long[] la = longs(java.util.Arrays.copyOf(da, prefix));
                long[] lb = longs(java.util.Arrays.copyOf(db, prefix));
                long ka = dice.prefixKey(la, prefix);
                long kb = dice.prefixKey(lb, prefix);
                if (ka != kb) {
                    assertEquals(Long.signum(ka - kb), va.compareTo(vb), "n=" + n + " trial " + trial);
                }
            }
        }
        assertTrue(served >= 300 * 6, "the long path served too few sets: " + served);
    }

    /**
     * The face index on longs is the mixed-radix number of the digits (positional notation with
     * mixed radices, Knuth, TAOCP vol. 2, §4.1, from memory): reading it back digit by digit
     * with BigInteger division must give the digits, whatever their size, extremes included.
     */
    @Test
    void faceIndexOnLongs_isTheMixedRadixNumberOfTheDigits() {
        SplittableRandom random = new SplittableRandom(4012L); // fixed seed: inputs only
        for (int n : new int[] {2, 3, 5, 7, 8, 10, 12, 13, 19}) {
            ConstructedDice dice = new ConstructedDice(Construction.smallest(n));
            assertTrue(dice.hasLongDigits(), "n=" + n);
            long[] limbs = new long[dice.faceLimbs()];
            for (int trial = 0; trial < 200; trial++) {
                BigInteger[] digits = randomDigits(dice, random);
                if (trial < 2) {
                    for (int j = 0; j < digits.length; j++) {
                        digits[j] = trial == 0 ? BigInteger.ZERO : dice.radix(0, j).subtract(BigInteger.ONE);
                    }
                }
                BigInteger index = dice.faceIndex(longs(digits), limbs);
                BigInteger[] read = new BigInteger[digits.length];
                BigInteger rest = index;
                for (int j = digits.length - 1; j >= 0; j--) {
                    BigInteger[] qr = rest.divideAndRemainder(dice.radix(0, j));
                    read[j] = qr[1];
                    rest = qr[0];
                }
                assertEquals(BigInteger.ZERO, rest, "n=" + n + " trial " + trial);
                assertEquals(java.util.Arrays.asList(digits), java.util.Arrays.asList(read), "n=" + n + " trial " + trial);
                if (trial == 1) {
                    assertEquals(dice.sides(0).subtract(BigInteger.ONE), index, "n=" + n);
                }
            }
        }
        ConstructedDice ten = new ConstructedDice(Construction.smallest(10));
        long[] bad = new long[ten.digits()];
        bad[1] = ten.radix(0, 1).longValueExact();
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> ten.faceIndex(bad, new long[ten.faceLimbs()]));
        assertEquals("digit 1 must be in 0.." + (bad[1] - 1) + ", got " + bad[1], e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> ten.faceIndex(new long[3], new long[ten.faceLimbs()]));
        assertEquals("a face has " + ten.digits() + " digits, got 3", e.getMessage());
    }

    private static long[] longs(BigInteger[] digits) {
        long[] out = new long[digits.length];
        for (int j = 0; j < digits.length; j++) {
            out[j] = digits[j].longValueExact();
        }
        return out;
    }

    @Test
    void compare_agreesWithFaceValues_uptoSixtyFourDice() {
        long seed = 20261202L;
        SplittableRandom random = new SplittableRandom(seed);
        for (int n : new int[] {4, 5, 6, 7, 10, 11, 12, 13, 33, 64}) {
            MixedRadixDice dice = new ConstructedDice(Construction.smallest(n));
            for (int trial = 0; trial < 200; trial++) {
                int a = random.nextInt(n);
                int b = (a + 1 + random.nextInt(n - 1)) % n;
                BigInteger[] da = randomDigits(dice, random);
                BigInteger[] db = randomDigits(dice, random);
                int shared = random.nextInt(dice.digits() + 1);
                System.arraycopy(da, 0, db, 0, shared);
                BigInteger va = dice.faceValue(a, da);
                BigInteger vb = dice.faceValue(b, db);
                BigInteger total = dice.sides(0).multiply(BigInteger.valueOf(n));
                assertTrue(va.signum() > 0 && va.compareTo(total) <= 0);
                int expected = va.compareTo(vb);
                int got = dice.compare(a, b, (die, j) -> die == a ? da[j] : db[j]);
                assertEquals(Integer.signum(expected), Integer.signum(got), "n=" + n + " seed=" + seed);
                assertTrue(got != 0);
            }
        }
    }

    @Test
    void compare_sameDieIsRejected() {
        MixedRadixDice dice = new ConstructedDice(Construction.smallest(5));
        assertThrows(IllegalArgumentException.class, () -> dice.compare(1, 1, (d, j) -> BigInteger.ZERO));
    }

    @Test
    void sha256_differsBetweenMethods() {
        assertTrue(!new ConstructedDice(Construction.plain(4)).sha256()
                .equals(new ConstructedDice(Construction.smallest(4)).sha256()));
        assertEquals(64, new ConstructedDice(Construction.smallest(9)).sha256().length());
    }

    private static BigInteger[] randomDigits(MixedRadixDice dice, SplittableRandom random) {
        BigInteger[] d = new BigInteger[dice.digits()];
        for (int j = 0; j < d.length; j++) {
            BigInteger r = dice.radix(0, j);
            d[j] = new BigInteger(r.bitLength() + 16, new java.util.Random(random.nextLong())).mod(r);
        }
        return d;
    }
}
