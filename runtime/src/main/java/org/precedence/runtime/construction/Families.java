package org.precedence.runtime.construction;

import java.math.BigInteger;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;

/**
 * The permutation families the construction may use, and the choice of the smallest one that is
 * uniform on ordered k-tuples of n points.
 *
 * <p>Offered: S_n (all permutations, any k ≤ n), A_n (k ≤ n−2, n ≥ 4), AGL(1,q) on q points for
 * prime powers q (k ≤ 2), PGL(2,q) on q+1 points (k ≤ 3), M11 on 11 points (k ≤ 4) and M12 on
 * 12 points (k ≤ 5). A family uniform on k-tuples is uniform on shorter tuples too, so a
 * higher-transitivity group may serve a lower level. Families are built once per process and
 * their proofs run once per family.
 */
public final class Families {
    private static final Map<String, PermutationFamily> FAMILIES = new ConcurrentHashMap<>();
    private static final Map<String, FamilyProof> PROOFS = new ConcurrentHashMap<>();

    private Families() {
    }

    /** All n! permutations of n ≥ 2 points. */
    public static PermutationFamily symmetric(int n) {
        return FAMILIES.computeIfAbsent("S" + n, key -> new SymmetricFamily(n));
    }

    /** The n!/2 even permutations of n ≥ 4 points. */
    public static PermutationFamily alternating(int n) {
        return FAMILIES.computeIfAbsent("A" + n, key -> new AlternatingFamily(n));
    }

    /** AGL(1,q) on q points; q must be a prime power. */
    public static PermutationFamily affine(int q) {
        return FAMILIES.computeIfAbsent("AGL(1," + q + ")", key -> new AffineFamily(q));
    }

    /** PGL(2,q) on q+1 points; q must be a prime power. */
    public static PermutationFamily projective(int q) {
        return FAMILIES.computeIfAbsent("PGL(2," + q + ")", key -> new ProjectiveFamily(q));
    }

    /** M11 on 11 points, sharply 4-transitive. */
    public static PermutationFamily mathieu11() {
        return MathieuGroups.m11();
    }

    /** M12 on 12 points, sharply 5-transitive. */
    public static PermutationFamily mathieu12() {
        return MathieuGroups.m12();
    }

    /** Returns whether q is a power of a prime. */
    public static boolean isPrimePower(int q) {
        return GaloisField.characteristic(q) != 0;
    }

    /** Returns every offered family on n points that is uniform on ordered k-tuples, S_n first. */
    public static List<PermutationFamily> uniformOn(int n, int k) {
        if (k < 1 || k > n) {
            throw new IllegalArgumentException("tuple length must be in 1.." + n + ", got " + k);
        }
        List<PermutationFamily> out = new ArrayList<>();
        out.add(symmetric(n));
        if (n >= 4 && k <= n - 2) {
            out.add(alternating(n));
        }
        if (k <= 2 && isPrimePower(n)) {
            out.add(affine(n));
        }
        if (k <= 3 && isPrimePower(n - 1)) {
            out.add(projective(n - 1));
        }
        if (n == 11 && k <= 4) {
            out.add(mathieu11());
        }
        if (n == 12 && k <= 5) {
            out.add(mathieu12());
        }
        return out;
    }

    /**
     * Returns the offered family of least order on n points uniform on ordered k-tuples; on a tie
     * the earlier (simpler) family in {@link #uniformOn} wins.
     */
    public static PermutationFamily smallestUniform(int n, int k) {
        PermutationFamily best = null;
        for (PermutationFamily f : uniformOn(n, k)) {
            if (best == null || f.order().compareTo(best.order()) < 0) {
                best = f;
            }
        }
        return best;
    }

    /** Runs (once per family) and returns the family's proof. */
    public static FamilyProof proofOf(PermutationFamily family) {
        return PROOFS.computeIfAbsent(family.name(), key -> {
            FamilyProof proof = family.prove();
            if (proof.uniformTuples() < family.uniformTuples()
                    || !proof.order().equals(family.order())) {
                throw new IllegalStateException(family.name() + ": proof does not cover the claim");
            }
            return proof;
        });
    }

    /** Returns the order of S_n, for callers comparing with the plain construction. */
    public static BigInteger factorial(int n) {
        return Lehmer.factorial(n);
    }
}
