package org.precedence.runtime.catalog;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;
import java.util.function.Consumer;
import org.precedence.api.RankingConvention;
import org.precedence.runtime.analysis.FairnessAnalysis;
import org.precedence.runtime.analysis.FairnessReport;
import org.precedence.runtime.catalog.CatalogEntry.Provenance;
import org.precedence.runtime.dice.DiceSet;
import org.precedence.runtime.dice.Word;
import org.precedence.runtime.files.AtomicWrite;
import org.precedence.runtime.search.FairSetSearch;
import org.precedence.runtime.search.SearchRequest;
import org.precedence.runtime.search.SearchResult;
import org.precedence.runtime.search.SideBounds;
import org.precedence.runtime.search.StructuredSearch;

/**
 * Builds the catalog from the search — the only writer of the catalog resource.
 *
 * <p>Deterministic: exhaustive searches are complete (their least class representative is
 * taken), and the structured search visits candidates in a fixed order, so two runs write
 * the same file. Every entry's grade and subset depth come from {@link FairnessAnalysis}.
 *
 * <p>Contents:
 * <ul>
 *   <li>for 2, 3 and 4 dice, the side lists (each die at least 2 sides, sorted) of the least
 *       total that has an order-fair set, scanning totals upwards exhaustively;</li>
 *   <li>the least equal-sided order-fair sets: 2 dice of 2 sides and 3 of 6 (exhaustive),
 *       4 of 12 and 5 dice (structured, see {@link StructuredSearch}).</li>
 * </ul>
 */
public final class CatalogGenerator {
    /** The command that regenerates the shipped catalog, recorded in the file. */
    public static final String COMMAND =
            "./precedence catalog --regenerate runtime/src/main/resources/org/precedence/runtime/catalog/catalog.json";

    private CatalogGenerator() {
    }

    /** Runs every search and returns the entries, in catalog order. */
    public static List<CatalogEntry> generate(Consumer<String> log) {
        List<CatalogEntry> out = new ArrayList<>();
        out.add(exhaustive(new int[] {2, 2}, log));
        out.addAll(leastTotal(3, log));
        out.add(exhaustive(new int[] {6, 6, 6}, log));
        out.addAll(leastTotal(4, log));
        out.add(raised(4, 12, log));
        out.add(fiveDice(log));
        return out;
    }

    /** Generates the catalog and writes it to {@code file} atomically. */
    public static List<CatalogEntry> regenerate(Path file, Consumer<String> log) throws IOException {
        List<CatalogEntry> entries = generate(log);
        String json = CatalogJson.write(entries, COMMAND);
        Catalog.parse(json, "generated catalog");
        writeAtomically(file, json);
        log.accept("wrote " + entries.size() + " entries to " + file);
        return entries;
    }

    /** Writes the catalog atomically through the project's one writer. */
    static void writeAtomically(Path file, String content) throws IOException {
        AtomicWrite.writeString(file, content);
    }

    private static CatalogEntry exhaustive(int[] sides, Consumer<String> log) {
        SearchResult r = FairSetSearch.run(SearchRequest.orderFair(sides));
        if (!r.complete() || r.words().isEmpty()) {
            throw new IllegalStateException("no order-fair set with sides " + Arrays.toString(sides));
        }
        log.accept("exhaustive " + Arrays.toString(sides) + ": " + r.solutions() + " sets, "
                + r.classes() + " classes, " + r.elapsedMs() + " ms");
        return entry(r.words().get(0), new Provenance("exhaustive search",
                "sides=" + join(sides) + " depth=" + sides.length,
                List.of("complete: " + r.solutions() + " labelled sets in " + r.classes()
                        + " classes up to renaming equal dice and reversal",
                        "entry is the least word of class 1 of " + r.classes())));
    }

    /** Scans sorted side lists by increasing total; returns one entry per list at the least total. */
    private static List<CatalogEntry> leastTotal(int players, Consumer<String> log) {
        for (int total = 2 * players; ; total++) {
            List<CatalogEntry> found = new ArrayList<>();
            int scanned = 0;
            for (int[] sides : sideLists(players, total)) {
                if (SideBounds.violation(sides, players).isPresent()) {
                    continue;
                }
                scanned++;
                SearchResult r = FairSetSearch.run(SearchRequest.orderFair(sides));
                if (!r.complete()) {
                    throw new IllegalStateException("search for " + Arrays.toString(sides)
                            + " did not complete");
                }
                if (!r.words().isEmpty()) {
                    log.accept("least total for " + players + " dice: " + Arrays.toString(sides)
                            + ", " + r.solutions() + " sets, " + r.classes() + " classes");
                    found.add(entry(r.words().get(0), new Provenance("exhaustive search",
                            "sides=" + join(sides) + " depth=" + players,
                            List.of("scanned every sorted side list (each die >= 2 sides) with total "
                                            + "below " + total + ": none has an order-fair set",
                                    "complete: " + r.solutions() + " labelled sets in "
                                            + r.classes() + " classes",
                                    "entry is the least word of class 1 of " + r.classes()))));
                }
            }
            log.accept("total " + total + " for " + players + " dice: " + scanned
                    + " side lists searched, " + found.size() + " with sets");
            if (!found.isEmpty()) {
                return found;
            }
        }
    }

    private static List<int[]> sideLists(int players, int total) {
        List<int[]> out = new ArrayList<>();
        fill(new int[players], 0, 2, total, out);
        return out;
    }

    private static void fill(int[] cur, int pos, int min, int left, List<int[]> out) {
        if (pos == cur.length - 1) {
            if (left >= min) {
                cur[pos] = left;
                out.add(cur.clone());
            }
            return;
        }
        for (int s = min; s * (cur.length - pos) <= left; s++) {
            cur[pos] = s;
            fill(cur, pos + 1, s, left - s, out);
        }
    }

    private static CatalogEntry raised(int players, int sides, Consumer<String> log) {
        List<Word> words = StructuredSearch.orderFairByRaising(players, sides, null);
        if (words.isEmpty()) {
            throw new IllegalStateException("structured search found no " + players + "x" + sides);
        }
        log.accept("structured " + players + "x" + sides + ": " + words.size() + " classes");
        return entry(words.get(0), new Provenance("structured search",
                "players=" + players + " sides=" + sides + " method=raise-by-renamed-copies",
                List.of("exhaustive search: every class of " + players + " dice with "
                                + sides / 2 + " sides and depth " + (players - 1),
                        "each joined with one renamed copy of itself wherever that evens out the "
                                + players + "-dice rankings: " + words.size() + " classes",
                        "entry is the least of them")));
    }

    private static CatalogEntry fiveDice(Consumer<String> log) {
        Optional<StructuredSearch.Construction> c = StructuredSearch.fiveDice();
        if (c.isEmpty()) {
            throw new IllegalStateException("the five-dice recipe found nothing");
        }
        Word w = c.get().word();
        log.accept("structured 5 dice: sides " + Arrays.toString(w.sides()));
        return entry(w, new Provenance("structured search", "players=5 recipe=five-dice",
                c.get().steps()));
    }

    private static CatalogEntry entry(Word word, Provenance provenance) {
        FairnessReport report = FairnessAnalysis.analyse(word, RankingConvention.LOWEST_FIRST);
        DiceSet set = word.toDiceSet();
        int[] sides = word.sides();
        List<Integer> sideList = new ArrayList<>();
        List<List<Long>> dice = new ArrayList<>();
        for (int d = 0; d < set.players(); d++) {
            sideList.add(sides[d]);
            List<Long> faces = new ArrayList<>();
            for (long v : set.faces(d)) {
                faces.add(v);
            }
            dice.add(faces);
        }
        boolean equal = Arrays.stream(sides).distinct().count() == 1;
        String id = "d" + word.players() + "-" + (equal ? sides[0] + "x" + sides.length : join(sides));
        return new CatalogEntry(id, word.players(), sideList, report.grade(), report.subsetDepth(),
                dice, word.sha256(), provenance);
    }

    private static String join(int[] sides) {
        StringBuilder sb = new StringBuilder();
        for (int i = 0; i < sides.length; i++) {
            sb.append(i == 0 ? "" : "-").append(sides[i]);
        }
        return sb.toString();
    }
}
