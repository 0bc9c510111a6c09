package org.precedence.runtime.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import java.math.BigInteger;
import org.apache.commons.rng.UniformRandomProvider;
import org.apache.commons.rng.simple.RandomSource;
import org.junit.jupiter.api.Test;

class RerollExpectationTest {

    @Test
    void of_fourSixSidedDice_isExactlyThreePointSix() {
        // First principles: 6^4 / (6·5·4·3) = 1296/360 = 18/5 = 3.6.
        RerollExpectation e = RerollExpectation.of(4, 6);
        assertEquals(BigInteger.valueOf(18), e.numerator());
        assertEquals(BigInteger.valueOf(5), e.denominator());
        assertEquals("18/5", e.toString());
        assertEquals(0, new BigDecimal("3.6").compareTo(e.toBigDecimal()));
        assertEquals(0, new BigDecimal("0.2777777777777778").compareTo(e.successProbability()));
    }

    @Test
    void of_smallCases_matchHandComputedFractions() {
        assertEquals("6/5", RerollExpectation.of(2, 6).toString()); // 36/30
        assertEquals("9/5", RerollExpectation.of(3, 6).toString()); // 216/120
        assertEquals("2", RerollExpectation.of(2, 2).toString()); // 4/2
        assertEquals("9/2", RerollExpectation.of(3, 3).toString()); // 27/6
        assertEquals("54/5", RerollExpectation.of(5, 6).toString()); // 7776/720
        assertEquals("324/5", RerollExpectation.of(6, 6).toString()); // 46656/720
    }

    @Test
    void of_fewerSidesThanDice_isRejected() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> RerollExpectation.of(7, 6));
        assertTrue(e.getMessage().contains("never all differ"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> RerollExpectation.of(1, 6));
    }

    @Test
    void simulation_fourSixSidedDice_agreesWithTheFormula() {
        // Roll four dice until all differ, many times; compare the mean number of rolls with
        // 3.6. Rolls per trial are geometric with p = 5/18: variance (1−p)/p² = 9.36, so over
        // 200,000 trials the mean has standard error √(9.36/200000) ≈ 0.00684. The tolerance
        // 0.03 is 4.38 standard errors: a correct implementation fails with probability about
        // 1.2·10⁻⁵ for a random seed (normal approximation; the fixed seed makes it repeatable).
        long seed = TestSets.seed("RerollExpectationTest.simulation");
        UniformRandomProvider rng = RandomSource.XO_RO_SHI_RO_128_PP.create(seed);
        int trials = 200_000;
        long rolls = 0;
        int[] faces = new int[4];
        for (int t = 0; t < trials; t++) {
            boolean distinct;
            do {
                rolls++;
                int seen = 0;
                distinct = true;
                for (int d = 0; d < faces.length; d++) {
                    faces[d] = rng.nextInt(6);
                    distinct &= (seen & (1 << faces[d])) == 0;
                    seen |= 1 << faces[d];
                }
            } while (!distinct);
        }
        double mean = (double) rolls / trials;
        double expected = RerollExpectation.of(4, 6).doubleValue();
        System.out.println("mean rolls " + mean + " vs " + expected);
        assertEquals(expected, mean, 0.03);
    }
}
