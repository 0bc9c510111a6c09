package org.precedence.cli;

import com.google.gson.GsonBuilder;
import java.io.PrintWriter;
import java.time.Duration;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.Callable;
import org.precedence.runtime.dice.Word;
import org.precedence.runtime.search.FairSetSearch;
import org.precedence.runtime.search.SearchRequest;
import org.precedence.runtime.search.SearchResult;
import org.precedence.runtime.search.SideBounds;
import org.precedence.runtime.search.StructuredSearch;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/** {@code precedence search}: finds order-fair sets for given side counts, or proves none exist. */
@Command(name = "search", mixinStandardHelpOptions = true,
        description = {"Search for order-fair dice sets with the given side counts.",
            "The exhaustive method finds every set and counts them (labelled, and up to renaming "
                + "equal dice and reversing the word), or proves that none exist; the structured "
                + "method joins renamed copies of smaller searched sets and finds some."})
final class SearchCommand implements Callable<Integer> {
    /** Class representatives printed without --all. */
    static final int DEFAULT_SHOWN = 10;

    enum Method { exhaustive, structured }

    @Spec
    CommandSpec spec;

    @Mixin
    FormatOption format;

    @Option(names = "--players", required = true, paramLabel = "N",
            description = "Number of dice (2.." + SearchRequest.MAX_PLAYERS + ").")
    int players;

    @Option(names = "--sides", paramLabel = "S", description = "Side count of every die.")
    Integer sides;

    @Option(names = "--sides-list", paramLabel = "a,b,c", split = ",",
            description = "Side count of each die, in die order (instead of --sides).")
    int[] sidesList;

    @Option(names = "--depth", paramLabel = "D",
            description = "Required subset depth: every D dice order-fair (default: all dice).")
    Integer depth;

    @Option(names = "--all", description = "List every class representative found "
            + "(default: the first " + DEFAULT_SHOWN + ").")
    boolean all;

    @Option(names = "--time-limit", paramLabel = "SECONDS",
            description = "Stop after this many seconds; the result is then incomplete.")
    Double timeLimit;

    @Option(names = "--threads", paramLabel = "T",
            description = "Worker threads (default: available processors).")
    Integer threads;

    @Option(names = "--stop-after", paramLabel = "K",
            description = "Stop once K classes are found (depth-first; result incomplete).")
    long stopAfter;

    @Option(names = "--method", paramLabel = "METHOD", defaultValue = "exhaustive",
            description = "exhaustive or structured (default: ${DEFAULT-VALUE}).")
    Method method;

    @Override
    public Integer call() {
        SearchRequest request = request();
        SearchResult result;
        String methodText;
        if (method == Method.structured) {
            result = structured(request);
            methodText = "structured (renamed copies of searched sets; finds some, not all)";
        } else {
            PrintWriter err = spec.commandLine().getErr();
            result = FairSetSearch.run(request.withProgress(line -> {
                err.println(line);
                err.flush();
            }));
            methodText = "exhaustive";
        }
        PrintWriter out = spec.commandLine().getOut();
        if (format.json()) {
            out.println(json(result, methodText));
        } else {
            text(out, result, methodText);
        }
        out.flush();
        return ExitCodes.OK;
    }

    private SearchRequest request() {
        if (players < 2 || players > SearchRequest.MAX_PLAYERS) {
            throw new UserInputException("--players must be 2.." + SearchRequest.MAX_PLAYERS
                    + ", got " + players);
        }
        int[] s;
        if ((sides == null) == (sidesList == null)) {
            throw new UserInputException("give exactly one of --sides S or --sides-list a,b,c");
        }
        if (sides != null) {
            s = new int[players];
            Arrays.fill(s, sides);
        } else {
            s = sidesList;
            if (s.length != players) {
                throw new UserInputException("--sides-list has " + s.length + " side counts but "
                        + "--players is " + players);
            }
        }
        for (int d = 0; d < s.length; d++) {
            if (s[d] < 1 || s[d] > SearchRequest.MAX_SIDES) {
                throw new UserInputException("side count " + s[d] + " of die " + (d + 1)
                        + " is outside 1.." + SearchRequest.MAX_SIDES);
            }
        }
        int d = depth == null ? players : depth;
        if (d < 2 || d > players) {
            throw new UserInputException("--depth must be 2.." + players + ", got " + d);
        }
        if (threads != null && (threads < 1 || threads > 256)) {
            throw new UserInputException("--threads must be 1..256, got " + threads);
        }
        if (timeLimit != null && !(timeLimit > 0 && timeLimit <= 1e7)) {
            throw new UserInputException("--time-limit must be a positive number of seconds, got "
                    + timeLimit);
        }
        if (stopAfter < 0) {
            throw new UserInputException("--stop-after must be >= 0, got " + stopAfter);
        }
        Duration limit = timeLimit == null ? null : Duration.ofMillis(Math.max(1, Math.round(timeLimit * 1000)));
        int t = threads == null ? Runtime.getRuntime().availableProcessors() : threads;
        return new SearchRequest(s, d, limit, t, stopAfter, null);
    }

    private static SearchResult structured(SearchRequest request) {
        int[] s = request.sides();
        if (Arrays.stream(s).distinct().count() != 1 || request.depth() != s.length) {
            throw new UserInputException("--method structured needs equal sides (--sides S) and "
                    + "full depth");
        }
        long start = System.nanoTime();
        var violation = SideBounds.violation(s, request.depth());
        if (violation.isPresent()) {
            return new SearchResult(s, request.depth(), true, java.math.BigInteger.ZERO, 0,
                    List.of(), violation.get(), 0, 0);
        }
        List<Word> words = StructuredSearch.orderFairByRaising(s.length, s[0], request.timeLimit());
        return new SearchResult(s, request.depth(), false, java.math.BigInteger.ZERO, words.size(),
                words, "structured search finds some sets, not all",
                (System.nanoTime() - start) / 1_000_000, 0);
    }

    private List<Word> shown(SearchResult r) {
        return all ? r.words() : r.words().subList(0, Math.min(DEFAULT_SHOWN, r.words().size()));
    }

    private String json(SearchResult r, String methodText) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("players", r.players());
        m.put("sides", r.sides());
        m.put("depth", r.depth());
        m.put("complete", r.complete());
        if (r.complete()) {
            m.put("solutions", r.solutions());
            m.put("classes", r.classes());
        } else {
            m.put("classesFound", r.classes());
        }
        List<Word> shown = shown(r);
        m.put("words", shown.stream().map(Word::toString).toList());
        m.put("wordsOmitted", r.classes() - shown.size());
        m.put("method", methodText);
        if (r.reason() != null) {
            m.put("reason", r.reason());
        }
        m.put("elapsedMs", r.elapsedMs());
        m.put("nodes", r.nodes());
        return new GsonBuilder().setPrettyPrinting().disableHtmlEscaping().create().toJson(m);
    }

    private void text(PrintWriter out, SearchResult r, String methodText) {
        out.printf("search: %d dice, sides %s, %s%n", r.players(), join(r.sides()),
                r.depth() == r.players() ? "order-fair" : "subset depth " + r.depth());
        out.println("method: " + methodText);
        if (r.complete()) {
            out.printf("complete: yes — %s labelled sets, %d classes up to renaming equal dice "
                    + "and reversal%n", r.solutions(), r.classes());
        } else {
            out.printf("complete: no — %d classes found so far%n", r.classes());
        }
        if (r.reason() != null) {
            out.println((r.complete() ? "none possible: " : "stopped: ") + r.reason());
        }
        out.printf("time: %d ms%n", r.elapsedMs());
        List<Word> shown = shown(r);
        if (!shown.isEmpty()) {
            out.printf("class representatives (%d of %d):%n", shown.size(), r.classes());
            for (Word w : shown) {
                out.println("  " + w);
            }
        }
    }

    private static String join(int[] s) {
        StringBuilder sb = new StringBuilder();
        for (int i = 0; i < s.length; i++) {
            sb.append(i == 0 ? "" : ",").append(s[i]);
        }
        return sb.toString();
    }
}
