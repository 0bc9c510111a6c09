package org.precedence.runtime.analysis;

import java.math.BigDecimal;
import java.math.BigInteger;
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
 * @param orderCounts    outcomes per ranking, rankings written as die names in acting order,
 *                       in lexicographic order of the rankings
 * @param seatCounts     {@code seatCounts[d][p]}: outcomes in which die d acts at position p
 * @param orderFair      all rankings equally likely
 * @param seatFair       each die equally likely at each position
 * @param leadFair       each die equally likely to act first
 * @param subsetDepth    largest k such that every k dice alone are order-fair (at least 1)
 * @param minCount       fewest outcomes of any ranking
 * @param maxCount       most outcomes of any ranking
 * @param worstRanking   a ranking whose count is farthest from the mean (first such)
 * @param totalVariation total variation distance between the ranking distribution and uniform
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
        orderCounts = Map.copyOf(orderCounts);
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
}
