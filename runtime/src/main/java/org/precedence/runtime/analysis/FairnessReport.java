package org.precedence.runtime.analysis;

import java.math.BigDecimal;
import java.math.BigInteger;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Objects;
import org.precedence.api.FairnessGrade;
import org.precedence.api.RankingConvention;

/**
 * The exact fairness of one explicit set.
 *
 * @param players        number of dice
 * @param sides          side count of each die
 * @param outcomes       total number of equally likely outcomes (product of the side counts)
 * @param convention     which end acts first; seat and lead figures follow it
 * @param orderCounts    outcomes per ranking, rankings written as default die names (A, B, …)
 *                       in acting order, iterated in lexicographic order of the rankings
 * @param seatCounts     {@code seatCounts[d][p]}: outcomes in which die d acts at position p
 *                       (0 = acts first)
 * @param orderFair      all rankings equally likely
 * @param seatFair       each die equally likely at each position
 * @param leadFair       each die equally likely to act first
 * @param subsetDepth    largest k such that every k dice alone are order-fair (at least 1)
 * @param minCount       fewest outcomes of any ranking
 * @param maxCount       most outcomes of any ranking
 * @param worstRanking   a ranking whose count is farthest from the mean (the lexicographically
 *                       first such; for an order-fair set every ranking qualifies, so "A…")
 * @param totalVariation total variation distance between the ranking distribution and uniform,
 *                       to 16 significant digits (exactly 0 for an order-fair set)
 */
public record FairnessReport(
        int players,
        int[] sides,
        BigInteger outcomes,
        RankingConvention convention,
        Map<String, BigInteger> orderCounts,
        BigInteger[][] seatCounts,
        boolean orderFair,
        boolean seatFair,
        boolean leadFair,
        int subsetDepth,
        BigInteger minCount,
        BigInteger maxCount,
        String worstRanking,
        BigDecimal totalVariation) {

    public FairnessReport {
        Objects.requireNonNull(convention, "convention");
        sides = sides.clone();
        // The analysis hands over an immutable view backed by the pattern table; anything else
        // is copied, keeping its iteration order.
        if (!(orderCounts instanceof RankingCounts)) {
            orderCounts = Collections.unmodifiableMap(new LinkedHashMap<>(orderCounts));
        }
        seatCounts = deepCopy(seatCounts);
    }

    /** Returns the strongest grade that holds. */
    public FairnessGrade grade() {
        if (orderFair) {
            return FairnessGrade.ORDER_FAIR;
        }
        if (seatFair) {
            return FairnessGrade.SEAT_FAIR;
        }
        return leadFair ? FairnessGrade.LEAD_FAIR : FairnessGrade.UNFAIR;
    }

    @Override
    public int[] sides() {
        return sides.clone();
    }

    @Override
    public BigInteger[][] seatCounts() {
        return deepCopy(seatCounts);
    }

    private static BigInteger[][] deepCopy(BigInteger[][] m) {
        BigInteger[][] c = new BigInteger[m.length][];
        for (int i = 0; i < m.length; i++) {
            c[i] = m[i].clone();
        }
        return c;
    }
}
