package org.precedence.runtime.search;

import java.time.Duration;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.precedence.api.RankingConvention;
import org.precedence.runtime.analysis.FairnessAnalysis;
import org.precedence.runtime.dice.Word;

/**
 * Structured search for sizes beyond exhaustive reach: it grows depth by joining renamed copies
 * of a searched word (see {@link BalancedRelabeling}) and by adding a die to a searched word
 * ({@link DieInsertion}). Every word it returns has been checked with the exact analysis.
 *
 * <p>Deterministic: candidates are visited in a fixed order (class representatives sorted,
 * renamings in lexicographic order), so the same call returns the same words.
 */
public final class StructuredSearch {
    private StructuredSearch() {
    }

    /** A word together with the steps that produced it, for provenance. */
    public record Construction(Word word, List<String> steps) {
        public Construction {
            steps = List.copyOf(steps);
        }
    }

    /**
     * Returns the class representatives (renaming and reversal) of the words made of {@code
     * blocks} renamed copies of {@code word} that have subset depth one more than {@code word}
     * (which must have equal sides and depth {@code level - 1}). Copies start with {@code word}
     * itself; every balancing multiset of renamings is tried in every distinct order.
     */
    public static List<Word> raise(Word word, int level, int blocks, int limit) {
        BalancedRelabeling relabeling = new BalancedRelabeling(word.players());
        SymmetryGroup group = new SymmetryGroup(word.sides());
        Map<String, Word> out = new java.util.TreeMap<>();
        SearchControl control = new SearchControl(Long.MAX_VALUE);
        for (int[] multiset : relabeling.find(word, level, blocks, Integer.MAX_VALUE, control)) {
            for (int[] order : relabeling.ordersIdentityFirst(multiset)) {
                Word joined = relabeling.join(word, order);
                Word canonical = toWord(word.players(), group.canonical(toBytes(joined)));
                out.putIfAbsent(canonical.toString(), canonical);
                if (out.size() >= limit) {
                    return verified(new ArrayList<>(out.values()), level);
                }
            }
        }
        return verified(new ArrayList<>(out.values()), level);
    }

    /**
     * Returns the class representatives of every way to add a die with {@code sides} faces to
     * {@code base} such that the result has subset depth at least {@code depth} (the base must
     * already have depth {@code min(depth, base players)}).
     */
    public static List<Word> addDie(Word base, int sides, int depth) {
        int n = base.players() + 1;
        int[] all = Arrays.copyOf(base.sides(), n);
        all[n - 1] = sides;
        if (SideBounds.violation(all, depth).isPresent()) {
            return List.of();
        }
        DieInsertion insertion = new DieInsertion(all, depth);
        SymmetryGroup group = new SymmetryGroup(all);
        Map<String, Word> out = new java.util.TreeMap<>();
        insertion.extend(toBytes(base), w -> {
            Word canonical = toWord(n, group.canonical(w));
            out.putIfAbsent(canonical.toString(), canonical);
        }, new SearchControl(Long.MAX_VALUE));
        return verified(new ArrayList<>(out.values()), depth);
    }

    /**
     * Order-fair sets of {@code players} dice with {@code sides} sides each, made by raising
     * every class of sets with {@code sides / blocks} sides and depth {@code players - 1}
     * (found exhaustively) with {@code blocks} renamed copies, for each block count 2..6
     * dividing {@code sides}. Finds some solutions, usually not all.
     */
    public static List<Word> orderFairByRaising(int players, int sides, Duration limit) {
        Map<String, Word> out = new java.util.TreeMap<>();
        for (int blocks = 2; blocks <= 6; blocks++) {
            if (sides % blocks != 0) {
                continue;
            }
            int[] baseSides = new int[players];
            Arrays.fill(baseSides, sides / blocks);
            SearchRequest request = new SearchRequest(baseSides, players - 1, limit, 1, 0, null);
            if (SideBounds.violation(baseSides, players - 1).isPresent()) {
                continue;
            }
            for (Word base : FairSetSearch.run(request).words()) {
                for (Word w : raise(base, players, blocks, Integer.MAX_VALUE)) {
                    out.putIfAbsent(w.toString(), w);
                }
            }
        }
        return new ArrayList<>(out.values());
    }

    /**
     * The five-dice recipe. Steps, each one searched exhaustively within its own space:
     * <ol>
     *   <li>every class of four 6-sided dice of depth 3 (every three of them order-fair);</li>
     *   <li>each raised to order-fair four 12-sided dice by one renamed copy ({@link #raise});</li>
     *   <li>a fifth 12-sided die added in every way that keeps depth 4 ({@link #addDie});</li>
     *   <li>per candidate W: first five renamed copies of W (60 sides); failing that, for each
     *       renaming σ in order, the pair W·σ(W) (still depth 4, 24 sides) joined as five
     *       renamed copies (120 sides).</li>
     * </ol>
     * Returns the first order-fair result in this fixed visiting order, with its steps.
     */
    public static Optional<Construction> fiveDice() {
        SearchResult depthThree = FairSetSearch.run(
                new SearchRequest(new int[] {6, 6, 6, 6}, 3, null, 1, 0, null));
        BalancedRelabeling five = new BalancedRelabeling(5);
        int[][] perms = five.permutations();
        SearchControl control = new SearchControl(Long.MAX_VALUE);
        int baseIndex = 0;
        for (Word base : depthThree.words()) {
            baseIndex++;
            int fourIndex = 0;
            for (Word four : raise(base, 4, 2, Integer.MAX_VALUE)) {
                fourIndex++;
                int candidateIndex = 0;
                for (Word candidate : addDie(four, 12, 4)) {
                    candidateIndex++;
                    List<String> steps = new ArrayList<>(List.of(
                            "exhaustive search: 4 dice x 6 sides with depth 3, class " + baseIndex
                                    + " of " + depthThree.classes() + ": " + base,
                            "joined with one renamed copy: order-fair 4 dice x 12 sides, class "
                                    + fourIndex + ": " + four,
                            "added die E with 12 sides keeping depth 4, class " + candidateIndex
                                    + ": " + candidate));
                    List<int[]> direct = five.find(candidate, 5, 5, 1, control);
                    if (!direct.isEmpty()) {
                        steps.add("joined 5 renamed copies " + describe(perms, direct.get(0))
                                + ": order-fair 5 dice x 60 sides");
                        return checked(five.join(candidate, direct.get(0)), steps);
                    }
                    for (int s = 0; s < perms.length; s++) {
                        Word doubled = candidate.concat(candidate.relabel(perms[s]));
                        List<int[]> f = five.find(doubled, 5, 5, 1, control);
                        if (!f.isEmpty()) {
                            steps.add("appended the copy renamed by " + name(perms[s])
                                    + ": depth 4, 24 sides");
                            steps.add("joined 5 renamed copies " + describe(perms, f.get(0))
                                    + ": order-fair 5 dice x 120 sides");
                            return checked(five.join(doubled, f.get(0)), steps);
                        }
                    }
                }
            }
        }
        return Optional.empty();
    }

    private static Optional<Construction> checked(Word word, List<String> steps) {
        verified(List.of(word), word.players());
        return Optional.of(new Construction(word, steps));
    }

    private static String describe(int[][] perms, int[] order) {
        StringBuilder sb = new StringBuilder("[");
        for (int i = 0; i < order.length; i++) {
            sb.append(i == 0 ? "" : ", ").append(name(perms[order[i]]));
        }
        return sb.append(']').toString();
    }

    /** Writes a renaming as the images of A, B, C, … ("BACDE" swaps A and B). */
    static String name(int[] perm) {
        StringBuilder sb = new StringBuilder();
        for (int x : perm) {
            sb.append((char) ('A' + x));
        }
        return sb.toString();
    }

    private static List<Word> verified(List<Word> words, int depth) {
        for (Word w : words) {
            int got = FairnessAnalysis.analyse(w, RankingConvention.LOWEST_FIRST).subsetDepth();
            if (got < depth) {
                throw new IllegalStateException("structured search produced " + w
                        + " with depth " + got + " < " + depth);
            }
        }
        return words;
    }

    static byte[] toBytes(Word w) {
        byte[] b = new byte[w.length()];
        for (int i = 0; i < b.length; i++) {
            b[i] = (byte) w.letterAt(i);
        }
        return b;
    }

    static Word toWord(int players, byte[] b) {
        int[] letters = new int[b.length];
        for (int i = 0; i < b.length; i++) {
            letters[i] = b[i];
        }
        return Word.of(players, letters);
    }
}
