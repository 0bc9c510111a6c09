package org.precedence.runtime.search;

import java.util.Optional;
import org.precedence.runtime.analysis.LowerBounds;

/**
 * Necessary conditions checked before any search: every subset of the dice that must be
 * order-fair (all subsets of at most {@code depth} dice) must pass the divisibility bound,
 * i.e. the product of its side counts must be divisible by the factorial of its size.
 */
public final class SideBounds {
    private SideBounds() {
    }

    /**
     * Returns why no set with these side counts can have subset depth {@code depth}, or empty
     * when the bound is passed (which does not prove that a set exists).
     */
    public static Optional<String> violation(int[] sides, int depth) {
        int n = sides.length;
        String best = null;
        int bestSize = Integer.MAX_VALUE;
        for (int mask = 1; mask < (1 << n); mask++) {
            int size = Integer.bitCount(mask);
            if (size < 2 || size > depth || size >= bestSize) {
                continue;
            }
            int[] subset = new int[size];
            StringBuilder names = new StringBuilder();
            for (int d = 0, j = 0; d < n; d++) {
                if ((mask & (1 << d)) != 0) {
                    subset[j++] = sides[d];
                    names.append(names.length() == 0 ? "" : "×").append(sides[d]);
                }
            }
            if (!LowerBounds.sidesAllowed(subset)) {
                best = size + " dice with sides " + names + ": the product "
                        + product(subset) + " is not divisible by " + size + "! = "
                        + DieInsertion.factorial(size) + ", so the " + DieInsertion.factorial(size)
                        + " rankings cannot be equally likely";
                bestSize = size;
            }
        }
        return Optional.ofNullable(best);
    }

    private static long product(int[] sides) {
        long p = 1;
        for (int s : sides) {
            p *= s;
        }
        return p;
    }
}
