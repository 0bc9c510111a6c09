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
     * The five-dice recipe: every class of four dice with 6 sides and depth 3 (exhaustive),
     * raised to order-fair four dice of 12 sides with two renamed copies; a fifth die of 12
     * sides added in every way that keeps depth 4; then, per candidate, first an attempt to
     * finish with five renamed copies (60 sides), then with a renamed copy appended (same
     * depth, 24 sides… counted as the pair W·σ(W)) followed by five copies (120 sides).
     * Returns the first order-fair result in the fixed visiting order.
     */
    public static Optional<Construction> fiveDice() {
        List<String> steps = new ArrayList<>();
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
                    String prefix = "exhaustive search: 4 dice x 6 sides, depth 3, class " + baseIndex
                            + " of " + depthThree.classes() + " (" + base + ")";
                    String raised = "joined with 1 renamed copy: order-fair 4 dice x 12 sides, class "
                            + fourIndex + " (" + four + ")";
                    String added = "added die E (12 sides) keeping depth 4: class " + candidateIndex
                            + " (" + candidate + ")";
                    List<int[]> direct = five.find(candidate, 5, 5, 1, control);
                    if (!direct.isEmpty()) {
                        Word result = five.join(candidate, direct.get(0));
                        return Optional.of(new Construction(result, List.of(prefix, raised, added,
                                "joined 5 renamed copies " + describe(perms, direct.get(0))
                                        + ": order-fair 5 dice x 60 sides")));
                    }
                    for (int s = 0; s < perms.length; s++) {
                        Word doubled = candidate.concat(candidate.relabel(perms[s]));
                        List<int[]> f = five.find(doubled, 5, 5, 1, control);
                        if (!f.isEmpty()) {
                            Word result = five.join(doubled, f.get(0));
                            if (FairnessAnalysis.analyse(result, RankingConvention.LOWEST_FIRST)
                                    .orderFair()) {
                                steps.add(prefix);
                                steps.add(raised);
                                steps.add(added);
                                steps.add("appended the copy renamed by " + name(perms[s])
                                        + ": depth 4, 24 sides");
                                steps.add("joined 5 renamed copies " + describe(perms, f.get(0))
                                        + ": order-fair 5 dice x 120 sides");
                                return Optional.of(new Construction(result, steps));
                            }
                        }
                    }
                }
            }
        }
        return Optional.empty();
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
