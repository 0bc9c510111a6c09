package org.precedence.runtime.construction;

import java.math.BigInteger;
import java.util.ArrayDeque;
import java.util.Arrays;
import java.util.List;

/**
 * Proves that a family indexed by the images of the base tuple (0, 1, …, k−1) is a group acting
 * regularly on ordered k-tuples, hence uniform on them (exactly one member maps any k-tuple onto
 * any other).
 *
 * <p>Three counts, all exhaustive: (1) member i is a permutation sending the base tuple to the
 * tuple of rank i, so F has (n)_k members, one per tuple; (2) F·s ⊆ F for each generator s and
 * the identity is in F, so the group H = ⟨S⟩ lies inside F; (3) the orbit of the base tuple
 * under the generators is all (n)_k tuples, so |H| ≥ (n)_k = |F| by orbit–stabiliser. Hence
 * H = F: F is a group whose stabiliser of the base tuple is trivial.
 */
final class SharplyTransitiveCheck {
    private SharplyTransitiveCheck() {
    }

    static String prove(PermutationFamily family, int k, List<int[]> generators) {
        int n = family.points();
        int tuples = Lehmer.falling(n, k).intValueExact();
        if (!family.order().equals(BigInteger.valueOf(tuples))) {
            throw new IllegalStateException(family.name() + ": order " + family.order() + " is not (" + n
                    + ")_" + k + " = " + tuples);
        }
        int[] p = new int[n];
        int[] q = new int[n];
        int[] r = new int[n];
        for (int i = 0; i < tuples; i++) {
            family.member(BigInteger.valueOf(i), p);
            FamilySamples.requirePermutation(p, family.name());
            if (FamilySamples.tupleRank(p, k, n) != i) {
                throw new IllegalStateException(family.name() + ": member " + i + " misses its base image");
            }
            if (i == 0) {
                for (int x = 0; x < n; x++) {
                    if (p[x] != x) {
                        throw new IllegalStateException(family.name() + ": member 0 is not the identity");
                    }
                }
            }
            for (int[] s : generators) {
                for (int x = 0; x < n; x++) {
                    q[x] = p[s[x]];
                }
                family.member(BigInteger.valueOf(FamilySamples.tupleRank(q, k, n)), r);
                if (!Arrays.equals(q, r)) {
                    throw new IllegalStateException(family.name() + ": member " + i + " times a generator"
                            + " leaves the family");
                }
            }
        }
        boolean[] seen = new boolean[tuples];
        ArrayDeque<Integer> queue = new ArrayDeque<>();
        seen[0] = true;
        queue.add(0);
        int reached = 1;
        int[] t = new int[k];
        int[] u = new int[k];
        while (!queue.isEmpty()) {
            FamilySamples.tupleOf(queue.poll(), k, n, t);
            for (int[] s : generators) {
                for (int j = 0; j < k; j++) {
                    u[j] = s[t[j]];
                }
                int rank = FamilySamples.tupleRank(u, k, n);
                if (!seen[rank]) {
                    seen[rank] = true;
                    reached++;
                    queue.add(rank);
                }
            }
        }
        if (reached != tuples) {
            throw new IllegalStateException(family.name() + ": orbit of the base " + k + "-tuple has "
                    + reached + " of " + tuples + " tuples");
        }
        return "all " + tuples + " members checked: each maps (0,…," + (k - 1) + ") to its own " + k
                + "-tuple and stays in the family when multiplied by each of " + generators.size()
                + " generators; the generators' orbit of that tuple has all " + tuples
                + " tuples, so |" + family.name() + "| = " + tuples + " · 1 (trivial stabiliser)";
    }
}
