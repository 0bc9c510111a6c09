package org.precedence.runtime.construction;

import java.math.BigInteger;
import java.util.Objects;

/**
 * What was checked about one level's family of relabellings.
 *
 * @param family        family name (as in {@link PermutationFamily#name()}, or {@code reversal})
 * @param points        number of points (dice)
 * @param order         number of members (blocks per level)
 * @param uniformTuples the family is uniform on ordered tuples of up to this length
 * @param evidence      one sentence saying what was computed (orbit and stabiliser counts,
 *                      or the counting identity used)
 */
public record FamilyProof(String family, int points, BigInteger order, int uniformTuples,
                          String evidence) {
    public FamilyProof {
        Objects.requireNonNull(family, "family");
        Objects.requireNonNull(order, "order");
        Objects.requireNonNull(evidence, "evidence");
    }
}
