package org.precedence.cli.simulate;

import com.google.gson.Gson;
import com.google.gson.GsonBuilder;
import com.google.gson.JsonArray;
import com.google.gson.JsonObject;
import java.io.PrintWriter;

/**
 * Writes a {@link SimulationReport} as one JSON document.
 *
 * <p>Shape: when one player count was asked for, the document is that count's result object;
 * when several were, it is {@code {"seed", "mode", "sessions", "roundsPerSession", "complete",
 * "results": [...]}} (an interrupted run may list fewer results than were asked for).
 * A result object carries the contract fields {@code players}, {@code rounds} (total),
 * {@code orderCounts} (ranking → count, rankings as player letters in acting order, absent
 * beyond 6 players), {@code seatCounts} ({@code [player][position]}), {@code chiSquare} and
 * {@code pValue} (rankings up to 6 players, seats beyond), and more: {@code gTest},
 * {@code gTestPValue}, {@code seatTest}, {@code leadTest}, {@code band95},
 * {@code firstPlayerStreaks}, {@code spread}, {@code balancedLead} and {@code compare}.
 */
final class JsonReport {
    private static final Gson GSON = new GsonBuilder().setPrettyPrinting().disableHtmlEscaping()
            .serializeSpecialFloatingPointValues().create();

    private JsonReport() {
    }

    static void print(SimulationReport report, PrintWriter out) {
        out.println(GSON.toJson(toJson(report)));
        out.flush();
    }

    static JsonObject toJson(SimulationReport report) {
        if (report.requestedPlayers().size() == 1 && report.counts().size() == 1) {
            JsonObject single = new JsonObject();
            header(report, single);
            JsonObject r = count(report.counts().get(0));
            r.entrySet().forEach(e -> single.add(e.getKey(), e.getValue()));
            return single;
        }
        JsonObject root = new JsonObject();
        header(report, root);
        JsonArray asked = new JsonArray();
        report.requestedPlayers().forEach(asked::add);
        root.add("playerCounts", asked);
        JsonArray results = new JsonArray();
        report.counts().forEach(c -> results.add(count(c)));
        root.add("results", results);
        return root;
    }

    private static void header(SimulationReport report, JsonObject o) {
        o.addProperty("seed", report.seed());
        o.addProperty("mode", report.mode());
        o.addProperty("sessions", report.sessions());
        o.addProperty("roundsPerSession", report.roundsPerSession());
        o.addProperty("complete", report.complete());
        o.addProperty("flagBelow", SimulationReport.FLAG_BELOW);
    }

    private static JsonObject count(SimulationReport.PlayerCount pc) {
        JsonObject o = supply(pc.main());
        o.addProperty("verdict", Verdict.of(pc.main()));
        o.addProperty("flagged", pc.main().main().pValue() < SimulationReport.FLAG_BELOW);
        if (pc.balanced() != null) {
            o.add("balancedLead", supply(pc.balanced()));
        }
        if (!pc.peers().isEmpty()) {
            JsonArray peers = new JsonArray();
            pc.peers().forEach(p -> peers.add(supply(p)));
            o.add("compare", peers);
        }
        return o;
    }

    static JsonObject supply(SupplyResult r) {
        JsonObject o = new JsonObject();
        o.addProperty("source", r.label());
        o.addProperty("players", r.players());
        o.addProperty("rounds", r.rounds());
        o.addProperty("requestedRounds", r.sessions() * r.roundsPerSession());
        o.addProperty("complete", r.complete());
        if (r.rankingsCounted()) {
            JsonObject orders = new JsonObject();
            for (int i = 0; i < r.rankingCounts().length; i++) {
                orders.addProperty(r.rankingNames().get(i), r.rankingCounts()[i]);
            }
            o.add("orderCounts", orders);
        }
        o.add("seatCounts", matrix(r.seatCounts()));
        o.add("leadCounts", array(r.leadCounts()));
        o.addProperty("chiSquare", r.main().statistic());
        o.addProperty("degreesOfFreedom", r.main().degreesOfFreedom());
        o.addProperty("pValue", r.main().pValue());
        o.addProperty("testedOn", r.main().on());
        o.add("gTest", test(r.gTest()));
        o.addProperty("gTestPValue", r.gTest().pValue());
        o.add("seatTest", test(r.seatTest()));
        o.add("leadTest", test(r.leadTest()));
        if (r.band() != null) {
            JsonObject band = new JsonObject();
            band.addProperty("expected", r.band().expected());
            band.addProperty("low", r.band().low());
            band.addProperty("high", r.band().high());
            band.addProperty("outside", r.band().outside());
            o.add("band95", band);
        }
        o.add("firstPlayerStreaks", streaks(r.streaks()));
        o.add("spread", spread(r.spread()));
        JsonObject throwsTaken = new JsonObject();
        throwsTaken.addProperty("throws", r.throwsTaken());
        throwsTaken.addProperty("rerolls", r.rerolls());
        throwsTaken.addProperty("perRound", r.rounds() == 0 ? 0 : (double) r.throwsTaken() / r.rounds());
        throwsTaken.addProperty("expectedPerRound", Double.isNaN(r.expectedThrows()) ? 1.0 : r.expectedThrows());
        throwsTaken.addProperty("mostInOneRound", r.mostThrows());
        o.add("throws", throwsTaken);
        return o;
    }

    private static JsonObject test(SupplyResult.Test t) {
        JsonObject o = new JsonObject();
        o.addProperty("on", t.on());
        o.addProperty("statistic", t.statistic());
        o.addProperty("degreesOfFreedom", t.degreesOfFreedom());
        o.addProperty("pValue", t.pValue());
        return o;
    }

    private static JsonObject streaks(SupplyResult.Streaks s) {
        JsonObject o = new JsonObject();
        o.addProperty("longest", s.longest());
        o.addProperty("meanLongestPerSession", s.meanLongest());
        JsonObject atLeast = new JsonObject();
        JsonObject expected = s.expected() == null ? null : new JsonObject();
        for (int k = 2; k < s.atLeast().length; k++) {
            atLeast.addProperty(Integer.toString(k), s.atLeast()[k]);
            if (expected != null) {
                expected.addProperty(Integer.toString(k), s.expected()[k]);
            }
        }
        o.add("runsAtLeast", atLeast);
        if (expected != null) {
            o.add("expectedRunsAtLeast", expected);
        }
        return o;
    }

    private static JsonObject spread(SupplyResult.Spread s) {
        JsonObject o = new JsonObject();
        o.addProperty("sessionsJudged", s.sessionsJudged());
        o.addProperty("lopsidedFraction", s.lopsidedFraction());
        o.addProperty("lopsidedAlpha", SimulationRunner.LOPSIDED_ALPHA);
        o.addProperty("doubleShareFraction", s.doubleShareFraction());
        o.addProperty("meanMaxLeadShare", s.meanBusiestShare());
        o.addProperty("maxLeadShare", s.worstBusiestShare());
        o.addProperty("fairShare", s.fairShare());
        return o;
    }

    private static JsonArray matrix(long[][] m) {
        JsonArray a = new JsonArray();
        for (long[] row : m) {
            a.add(array(row));
        }
        return a;
    }

    private static JsonArray array(long[] v) {
        JsonArray a = new JsonArray();
        for (long x : v) {
            a.add(x);
        }
        return a;
    }
}
