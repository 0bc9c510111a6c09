package org.precedence.cli;

import com.google.gson.stream.JsonWriter;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.UncheckedIOException;
import java.math.BigDecimal;
import java.math.BigInteger;
import java.math.MathContext;
import java.math.RoundingMode;
import java.util.Locale;
import java.util.Map;
import org.precedence.api.FairnessGrade;
import org.precedence.api.RankingConvention;
import org.precedence.runtime.analysis.FairnessReport;
import org.precedence.runtime.dice.DiceSet;
import org.precedence.runtime.dice.DieNames;

/** Prints a {@link FairnessReport} for people (text) or for tools (one JSON object). */
final class VerifyReport {
    /** Up to this many dice the text report lists every ranking (6! = 720 lines). */
    static final int FULL_TABLE_MAX = 6;
    /** Up to this many dice the text report shows the seat matrix. */
    static final int SEAT_MATRIX_MAX = 10;
    /** Up to this many dice the rankings holding the extremes are named (9! = 362,880 to scan). */
    static final int NAME_EXTREMES_MAX = 9;

    private VerifyReport() {
    }

    static String grade(FairnessGrade g) {
        return g.name().toLowerCase(Locale.ROOT).replace('_', '-');
    }

    static String convention(RankingConvention c) {
        return c == RankingConvention.LOWEST_FIRST ? "lowest-first" : "highest-first";
    }

    private static String conventionText(RankingConvention c) {
        return c == RankingConvention.LOWEST_FIRST ? "lowest value acts first"
                : "highest value acts first (--descending)";
    }

    private static String yesNo(boolean b) {
        return b ? "yes" : "no";
    }

    static void text(DiceSet set, FairnessReport r, PrintWriter out) {
        int n = r.players();
        int[] sides = r.sides();
        StringBuilder sideList = new StringBuilder();
        for (int s : sides) {
            sideList.append(sideList.length() > 0 ? " " : "").append(s);
        }
        out.printf("Players:      %d dice%n", n);
        out.printf("Sides:        %s (%d faces)%n", sideList, set.totalFaces());
        out.printf("Outcomes:     %s equally likely%n", r.outcomes());
        out.printf("Convention:   %s%n", conventionText(r.convention()));
        out.printf("Grade:        %s (order-fair: %s, seat-fair: %s, lead-fair: %s)%n",
                grade(r.grade()), yesNo(r.orderFair()), yesNo(r.seatFair()), yesNo(r.leadFair()));
        out.printf("Subset depth: %d (%s)%n", r.subsetDepth(), depthText(r.subsetDepth(), n));
        out.printf("SHA-256:      %s%n", set.sha256());
        if (!set.hasDefaultNames()) {
            out.println();
            out.println("Dice (rankings below use the letters):");
            for (int d = 0; d < n; d++) {
                out.printf("  %-3s %s (%d sides)%n", DieNames.of(d), set.names().get(d), sides[d]);
            }
        }
        BigInteger factorial = factorial(n);
        out.println();
        if (n <= FULL_TABLE_MAX) {
            out.printf("Rankings (%s; a fair share is %s outcomes, %s):%n", factorial,
                    fairShare(r.outcomes(), factorial), percent(BigInteger.ONE, factorial));
            int width = Math.max(7, n);
            int countWidth = Math.max(5, r.maxCount().toString().length());
            out.printf("  %-" + width + "s  %" + countWidth + "s  %s%n", "ranking", "count", "share");
            for (Map.Entry<String, BigInteger> e : r.orderCounts().entrySet()) {
                out.printf("  %-" + width + "s  %" + countWidth + "s  %s%n", e.getKey(), e.getValue(),
                        percent(e.getValue(), r.outcomes()));
            }
        } else {
            out.printf("Rankings: %s (full table shown up to %d dice)%n", factorial, FULL_TABLE_MAX);
        }
        out.println();
        out.println("Extremes:");
        String[] holders = n <= NAME_EXTREMES_MAX ? extremeHolders(r) : null;
        out.printf("  min count:       %s%s%n", r.minCount(), holders == null ? "" : " (" + holders[0] + ")");
        out.printf("  max count:       %s%s%n", r.maxCount(), holders == null ? "" : " (" + holders[1] + ")");
        out.printf("  worst ranking:   %s%n", r.orderFair() ? "none (every ranking is equally likely)"
                : r.worstRanking() + " (farthest from the fair share)");
        out.printf("  total variation: %s%n", r.orderFair() ? "0" : r.totalVariation().round(
                new MathContext(6, RoundingMode.HALF_EVEN)).toPlainString());
        if (n <= SEAT_MATRIX_MAX) {
            out.println();
            out.println("Seats (outcomes with each die at each acting position; 1 acts first):");
            BigInteger[][] seat = r.seatCounts();
            int w = 4;
            for (BigInteger[] row : seat) {
                for (BigInteger v : row) {
                    w = Math.max(w, v.toString().length());
                }
            }
            StringBuilder head = new StringBuilder("  die");
            for (int p = 0; p < n; p++) {
                head.append(String.format("  %" + w + "d", p + 1));
            }
            out.println(head);
            for (int d = 0; d < n; d++) {
                StringBuilder row = new StringBuilder(String.format("  %-3s", DieNames.of(d)));
                for (int p = 0; p < n; p++) {
                    row.append(String.format("  %" + w + "s", seat[d][p]));
                }
                out.println(row);
            }
        }
        out.println();
        out.println(r.orderFair() ? "Verdict: order-fair - every ranking is exactly equally likely."
                : "Verdict: not order-fair.");
    }

    private static String depthText(int depth, int n) {
        if (depth == n) {
            return "the set and every subset of it are order-fair";
        }
        if (depth < 2) {
            return "some pair of dice is not fair";
        }
        return "every " + depth + " of the " + n + " dice are order-fair";
    }

    /** The lexicographically first rankings holding the minimum and the maximum count. */
    private static String[] extremeHolders(FairnessReport r) {
        String min = null;
        String max = null;
        for (Map.Entry<String, BigInteger> e : r.orderCounts().entrySet()) {
            if (min == null && e.getValue().equals(r.minCount())) {
                min = e.getKey();
            }
            if (max == null && e.getValue().equals(r.maxCount())) {
                max = e.getKey();
            }
            if (min != null && max != null) {
                break;
            }
        }
        return new String[] {min, max};
    }

    private static String fairShare(BigInteger outcomes, BigInteger factorial) {
        BigInteger[] qr = outcomes.divideAndRemainder(factorial);
        return qr[1].signum() == 0 ? qr[0].toString()
                : new BigDecimal(outcomes).divide(new BigDecimal(factorial), new MathContext(6))
                        .toPlainString() + " (not a whole number, so no numbering of these dice is order-fair)";
    }

    private static String percent(BigInteger part, BigInteger whole) {
        BigDecimal p = new BigDecimal(part).multiply(BigDecimal.valueOf(100))
                .divide(new BigDecimal(whole), 3, RoundingMode.HALF_EVEN);
        return p.toPlainString() + "%";
    }

    static BigInteger factorial(int n) {
        BigInteger f = BigInteger.ONE;
        for (int i = 2; i <= n; i++) {
            f = f.multiply(BigInteger.valueOf(i));
        }
        return f;
    }

    /**
     * One JSON object. Counts are decimal strings (they can exceed what a JSON number holds
     * exactly); {@code worstRanking} is null for an order-fair set.
     */
    static void json(DiceSet set, FairnessReport r, PrintWriter out) {
        try {
            JsonWriter w = new JsonWriter(out);
            w.setIndent("  ");
            w.beginObject();
            w.name("players").value(r.players());
            w.name("sides").beginArray();
            for (int s : r.sides()) {
                w.value(s);
            }
            w.endArray();
            w.name("names").beginArray();
            for (String name : set.names()) {
                w.value(name);
            }
            w.endArray();
            w.name("outcomes").value(r.outcomes().toString());
            w.name("convention").value(convention(r.convention()));
            w.name("grade").value(grade(r.grade()));
            w.name("orderFair").value(r.orderFair());
            w.name("seatFair").value(r.seatFair());
            w.name("leadFair").value(r.leadFair());
            w.name("subsetDepth").value(r.subsetDepth());
            w.name("minCount").value(r.minCount().toString());
            w.name("maxCount").value(r.maxCount().toString());
            w.name("worstRanking");
            if (r.orderFair()) {
                w.nullValue();
            } else {
                w.value(r.worstRanking());
            }
            w.name("totalVariation").value(r.orderFair() ? BigDecimal.ZERO : r.totalVariation());
            w.name("sha256").value(set.sha256());
            w.name("orderCounts").beginObject();
            for (Map.Entry<String, BigInteger> e : r.orderCounts().entrySet()) {
                w.name(e.getKey()).value(e.getValue().toString());
            }
            w.endObject();
            w.name("seatCounts").beginArray();
            for (BigInteger[] row : r.seatCounts()) {
                w.beginArray();
                for (BigInteger v : row) {
                    w.value(v.toString());
                }
                w.endArray();
            }
            w.endArray();
            w.endObject();
            w.flush();
            out.println();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
