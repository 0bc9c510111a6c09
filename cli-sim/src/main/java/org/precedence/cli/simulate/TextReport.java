package org.precedence.cli.simulate;

import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;

/** Prints a {@link SimulationReport} for people: figures first, each with a plain-words line. */
final class TextReport {
    /** Rankings are listed in full up to this many; beyond, the extremes. */
    static final int LIST_ALL_UP_TO = 24;

    private TextReport() {
    }

    static void print(SimulationReport report, PrintWriter out) {
        out.printf(Locale.ROOT, "Simulated %s sessions x %s rounds per player count (seed \"%s\", %s mode).%n",
                Format.count(report.sessions()), Format.count(report.roundsPerSession()), report.seed(), report.mode());
        if (!report.complete()) {
            out.println("INTERRUPTED: the figures below cover only the rounds simulated before the stop.");
        }
        for (SimulationReport.PlayerCount pc : report.counts()) {
            out.println();
            printCount(pc, out);
        }
        out.flush();
    }

    private static void printCount(SimulationReport.PlayerCount pc, PrintWriter out) {
        SupplyResult r = pc.main();
        int n = r.players();
        out.printf(Locale.ROOT, "== %d players: %s rounds%s ==%n", n, Format.count(r.rounds()),
                r.complete() ? "" : " (partial)");
        out.println(Verdict.of(r));
        if (r.rankingsCounted()) {
            printRankings(r, out);
        }
        printSeats(r, out);
        out.printf(Locale.ROOT, "Tests: Pearson chi-square %s on %d df (%s), p = %s; G-test p = %s; "
                        + "seats p = %s; first players p = %s.%n",
                Format.fixed(r.main().statistic(), 2), r.main().degreesOfFreedom(), r.main().on(),
                Format.p(r.main().pValue()), Format.p(r.gTest().pValue()), Format.p(r.seatTest().pValue()),
                Format.p(r.leadTest().pValue()));
        printStreaks(r, out);
        printSpread(r, out);
        if (pc.balanced() != null) {
            SupplyResult b = pc.balanced();
            SupplyResult.Spread s = b.spread();
            out.printf(Locale.ROOT, "Balanced lead mode (every player leads once in each block of %d rounds): "
                            + "%s of sessions lopsided; busiest leader %s of the leads on average, at worst %s; "
                            + "longest first-player streak %d; turn orders p = %s.%n",
                    n, Format.pct(s.lopsidedFraction()), Format.pct(s.meanBusiestShare()),
                    Format.pct(s.worstBusiestShare()), b.streaks().longest(), Format.p(b.main().pValue()));
        }
        if (!pc.peers().isEmpty()) {
            printComparison(pc, out);
        }
    }

    private static void printRankings(SupplyResult r, PrintWriter out) {
        SupplyResult.Band band = r.band();
        int k = r.rankingNames().size();
        out.printf(Locale.ROOT, "Turn orders: %d possible; even luck gives %s each; 95%% of counts should fall "
                        + "within %s..%s (%d of %d fell outside; about %s expected by chance).%n",
                k, Format.fixed(band.expected(), 1), Format.fixed(band.low(), 0), Format.fixed(band.high(), 0),
                band.outside(), k, Format.fixed(0.05 * k, 1));
        List<Integer> shown = new ArrayList<>();
        if (k <= LIST_ALL_UP_TO) {
            for (int i = 0; i < k; i++) {
                shown.add(i);
            }
        } else {
            List<Integer> all = new ArrayList<>();
            for (int i = 0; i < k; i++) {
                all.add(i);
            }
            all.sort(Comparator.comparingLong((Integer i) -> r.rankingCounts()[i]).thenComparing(i -> i));
            shown.addAll(all.subList(0, 4));
            shown.addAll(all.subList(k - 4, k));
            out.println("  (rarest four and commonest four shown; --format json lists all)");
        }
        StringBuilder line = new StringBuilder();
        for (int j = 0; j < shown.size(); j++) {
            int i = shown.get(j);
            line.append(String.format(Locale.ROOT, "  %-" + (r.players() + 1) + "s%12s", r.rankingNames().get(i),
                    Format.count(r.rankingCounts()[i])));
            if (j % 4 == 3 || j == shown.size() - 1) {
                out.println(line);
                line.setLength(0);
            }
        }
    }

    private static void printSeats(SupplyResult r, PrintWriter out) {
        int n = r.players();
        out.printf(Locale.ROOT, "Who acted where (share of rounds; fair dice: %s everywhere):%n",
                Format.pct(1.0 / n));
        StringBuilder head = new StringBuilder("            ");
        for (int pos = 1; pos <= n; pos++) {
            head.append(String.format(Locale.ROOT, "%8s", org.precedence.cli.plot.Ordinals.of(pos)));
        }
        out.println(head);
        for (int player = 0; player < n; player++) {
            StringBuilder row = new StringBuilder(String.format(Locale.ROOT, "  player %-3s",
                    org.precedence.runtime.dice.DieNames.of(player)));
            for (int pos = 0; pos < n; pos++) {
                row.append(String.format(Locale.ROOT, "%8s",
                        Format.pct(r.rounds() == 0 ? 0 : (double) r.seatCounts()[player][pos] / r.rounds())));
            }
            out.println(row);
        }
    }

    private static void printStreaks(SupplyResult r, PrintWriter out) {
        SupplyResult.Streaks s = r.streaks();
        int k = 3;
        String expected = s.expected() == null ? ""
                : " (fair dice: about " + Format.fixed(s.expected()[k], 0) + ")";
        out.printf(Locale.ROOT, "First-player streaks: longest %d rounds in a row (a session's longest: %s on "
                        + "average); the same player went first %d or more rounds running %s times%s.%n",
                s.longest(), Format.fixed(s.meanLongest(), 1), k, Format.count(s.atLeast()[k]), expected);
    }

    private static void printSpread(SupplyResult r, PrintWriter out) {
        SupplyResult.Spread s = r.spread();
        if (s.sessionsJudged() == 0) {
            return;
        }
        out.printf(Locale.ROOT, "Single sessions of %s rounds, judged alone: %s looked lopsided (who went first "
                        + "failed a 5%% test; pure luck does that to about 5%%); the busiest leader had %s of the "
                        + "leads on average (fair share %s), at worst %s; one player led at least twice their "
                        + "share in %s of sessions.%n",
                Format.count(r.roundsPerSession()), Format.pct(s.lopsidedFraction()), Format.pct(s.meanBusiestShare()),
                Format.pct(s.fairShare()), Format.pct(s.worstBusiestShare()), Format.pct(s.doubleShareFraction()));
    }

    private static void printComparison(SimulationReport.PlayerCount pc, PrintWriter out) {
        List<SupplyResult> cols = new ArrayList<>();
        cols.add(pc.main());
        cols.addAll(pc.peers());
        out.println("Side by side (same sessions and rounds):");
        row(out, "", cols, c -> c.label());
        row(out, "rounds", cols, c -> Format.count(c.rounds()));
        row(out, "chi-square p", cols, c -> Format.p(c.main().pValue()));
        row(out, "G-test p", cols, c -> Format.p(c.gTest().pValue()));
        row(out, "lopsided sessions", cols, c -> Format.pct(c.spread().lopsidedFraction()));
        row(out, "busiest leader (mean)", cols, c -> Format.pct(c.spread().meanBusiestShare()));
        row(out, "longest streak", cols, c -> Long.toString(c.streaks().longest()));
        row(out, "throws per round", cols, c -> Format.fixed((double) c.throwsTaken() / Math.max(1, c.rounds()), 3));
        row(out, "  expected", cols, c -> Double.isNaN(c.expectedThrows()) ? "1" : Format.fixed(c.expectedThrows(), 3));
        row(out, "re-rolls", cols, c -> Format.count(c.rerolls()));
        row(out, "most throws in a round", cols, c -> Long.toString(c.mostThrows()));
    }

    private static void row(PrintWriter out, String name, List<SupplyResult> cols,
                            java.util.function.Function<SupplyResult, String> cell) {
        StringBuilder sb = new StringBuilder(String.format(Locale.ROOT, "  %-24s", name));
        for (SupplyResult c : cols) {
            sb.append(String.format(Locale.ROOT, "%16s", cell.apply(c)));
        }
        out.println(sb);
    }
}
