package org.precedence.runtime.construction;

import java.math.BigInteger;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * Constructions found by {@link LevelSearch} and shipped as data, so that serving them costs
 * no search. Each level is written as the indices of its blocks: index e &lt; n! is the
 * permutation with Lehmer rank e; e ≥ n! is permutation e − n! with the block read backwards.
 * These plans are valid only for their particular words; {@link ConstructedDice} recomposes the
 * exact counts of the whole word before serving one (an invalid plan cannot be served).
 *
 * <p>Reproduce with {@code LevelSearch.search(n, maxOrder, tries)}, parameters beside each plan.
 */
final class SearchedPlans {
    /** n → levels, first level first. */
    private static final Map<Integer, String[]> PLANS = Map.of(
            // LevelSearch.search(3, 120, 3): 6 sides (the least possible for 3 dice).
            3, new String[] {"0,5", "0,3,4"},
            // LevelSearch.search(4, 120, 3): 12 sides (the least possible for 4 dice).
            4, new String[] {"0,23", "0,15,20", "0,21"},
            // LevelSearch.search(5, 120, 3): 1440 sides.
            5, new String[] {"0,119", "0,6,81,87,104,110", "0,111",
                "0,3,4,7,8,11,12,15,16,19,20,23,25,26,29,30,33,34,37,38,41,42,45,46,48,51,52,55,56,59,"
                        + "60,63,64,67,68,71,73,74,77,78,81,82,85,86,89,90,93,94,96,99,100,103,104,107,108,"
                        + "111,112,115,116,119"},
            // LevelSearch.search(6, 60, 3): 5760 sides (about a minute on one core).
            6, new String[] {"0,719",
                "0,55,518,543,657,680",
                "0,2,720,722",
                "0,7,29,42,51,60,89,94,107,116,121,126,147,156,173,186,203,212,233,238,"
                        + "244,259,266,277,304,311,321,326,339,348,362,373,388,403,425,430,435,444,465,470,"
                        + "496,503,514,525,536,543,554,565,576,583,610,621,640,647,650,661,680,687,697,702",
                "0,720"});

    /**
     * Seven dice: after reversal doubling, the Frobenius group F21 = ⟨x ↦ x+1, x ↦ 2x⟩ (mod 7)
     * conjugated by this permutation lifts ABCDEFG GFEDCBA to depth 3 (21 blocks instead of A7's
     * 2520). Found by trying every conjugate (672 of the 5040 work; this is the first in
     * lexicographic order); uniform levels follow, so only patterns up to length 3 are re-counted.
     */
    static final int[] SEVEN_CONJUGATOR = {0, 1, 3, 5, 4, 6, 2};

    /**
     * Nine dice: AGL(1,9) conjugated by this permutation lifts ABCDEFGHI IHGFEDCBA to depth 3
     * (72 blocks instead of PGL(2,8)'s 504). Found by sampling random relabellings (about one in
     * ten works, 2059 of 20000 sampled).
     */
    static final int[] NINE_CONJUGATOR = {7, 6, 0, 4, 3, 2, 1, 8, 5};

    private SearchedPlans() {
    }

    /** Returns word-specific first levels after which the uniform construction continues. */
    static Optional<List<Level>> prefixFor(int n) {
        if (n == 7) {
            return Optional.of(List.of(Level.reversal(7),
                    Level.wordSpecific("F21'", conjugatedFrobenius21(SEVEN_CONJUGATOR), new boolean[21], 3)));
        }
        if (n == 9) {
            return Optional.of(List.of(Level.reversal(9),
                    Level.wordSpecific("AGL(1,9)'", conjugated(Families.affine(9), NINE_CONJUGATOR), new boolean[72], 3)));
        }
        return Optional.empty();
    }

    /** The members of π·F·π⁻¹, in order of their Lehmer rank. */
    static int[][] conjugated(PermutationFamily family, int[] pi) {
        int n = pi.length;
        int[] inverse = new int[n];
        for (int x = 0; x < n; x++) {
            inverse[pi[x]] = x;
        }
        java.util.TreeMap<BigInteger, int[]> members = new java.util.TreeMap<>();
        int[] h = new int[n];
        for (BigInteger i = BigInteger.ZERO; i.compareTo(family.order()) < 0; i = i.add(BigInteger.ONE)) {
            family.member(i, h);
            int[] g = new int[n];
            for (int x = 0; x < n; x++) {
                g[x] = pi[h[inverse[x]]];
            }
            members.put(Lehmer.rank(g), g);
        }
        return members.values().toArray(new int[0][]);
    }

    /** The 21 members of π·F21·π⁻¹, in order of their Lehmer rank. */
    static int[][] conjugatedFrobenius21(int[] pi) {
        int[] inverse = new int[7];
        for (int x = 0; x < 7; x++) {
            inverse[pi[x]] = x;
        }
        java.util.TreeMap<BigInteger, int[]> members = new java.util.TreeMap<>();
        for (int a : new int[] {1, 2, 4}) {
            for (int b = 0; b < 7; b++) {
                int[] g = new int[7];
                for (int x = 0; x < 7; x++) {
                    g[x] = pi[(a * inverse[x] + b) % 7];
                }
                members.put(Lehmer.rank(g), g);
            }
        }
        return members.values().toArray(new int[0][]);
    }

    static Optional<Construction> forPlayers(int n) {
        String[] plan = PLANS.get(n);
        if (plan == null) {
            return Optional.empty();
        }
        List<int[]> levels = new ArrayList<>();
        for (String level : plan) {
            String[] parts = level.split(",");
            int[] elements = new int[parts.length];
            for (int i = 0; i < parts.length; i++) {
                elements[i] = Integer.parseInt(parts[i].strip());
            }
            levels.add(elements);
        }
        return Optional.of(fromElements(n, levels));
    }

    /** Builds the construction whose level i lists the blocks {@code levels.get(i)}. */
    static Construction fromElements(int n, List<int[]> levels) {
        int half = Lehmer.factorial(n).intValueExact();
        SymmetricFamily s = new SymmetricFamily(n);
        List<Level> out = new ArrayList<>();
        int depth = 1;
        for (int[] elements : levels) {
            int[][] relabellings = new int[elements.length][];
            boolean[] reversed = new boolean[elements.length];
            boolean anyReversed = false;
            for (int b = 0; b < elements.length; b++) {
                relabellings[b] = s.member(BigInteger.valueOf(elements[b] % half));
                reversed[b] = elements[b] >= half;
                anyReversed |= reversed[b];
            }
            depth++;
            out.add(Level.wordSpecific("fit" + elements.length + (anyReversed ? "r" : ""), relabellings, reversed, depth));
        }
        return new Construction(StartingWord.letters(n), out);
    }

    /** Writes a plan in the shipped format. */
    static String format(Construction c) {
        StringBuilder sb = new StringBuilder();
        int n = c.players();
        int half = Lehmer.factorial(n).intValueExact();
        for (Level l : c.levels()) {
            sb.append('"');
            int[] sigma = new int[n];
            for (BigInteger b = BigInteger.ZERO; b.compareTo(l.blocks()) < 0; b = b.add(BigInteger.ONE)) {
                if (!l.relabel(b, sigma)) {
                    for (int x = 0; x < n; x++) {
                        sigma[x] = x;
                    }
                }
                int e = Lehmer.rank(sigma).intValueExact() + (l.reversed(b) ? half : 0);
                sb.append(b.signum() == 0 ? "" : ",").append(e);
            }
            sb.append("\",\n");
        }
        return sb.toString();
    }
}
