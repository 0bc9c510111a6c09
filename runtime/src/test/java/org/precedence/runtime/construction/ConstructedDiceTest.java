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
