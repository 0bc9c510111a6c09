package org.precedence.runtime.service;

import com.google.gson.JsonArray;
import com.google.gson.JsonObject;
import java.util.List;
import java.util.Set;
import java.util.concurrent.Semaphore;
import org.precedence.api.OrderRule;
import org.precedence.api.RandomnessMode;
import org.precedence.api.RankingConvention;
import org.precedence.api.RoundResult;
import org.precedence.api.SessionSeed;
import org.precedence.api.SessionSpec;
import org.precedence.api.TurnOrderSource;
import org.precedence.runtime.dice.DieNames;
import org.precedence.runtime.provider.DiceSession;

/**
 * POST /v1/simulate: rolls rounds 0..R-1 of a session and tallies who leads, who lands where,
 * and (up to {@value #MAX_RANKING_PLAYERS} players) how often each ranking came up, with
 * Pearson's chi-square statistic against the uniform expectation. Bounded by
 * {@link ServiceLimits#maxSimulationRounds()} and {@link ServiceLimits#maxSimulationRolls()}.
 * The seed is returned, so anyone can repeat the run. At most
 * {@link ServiceLimits#maxConcurrentSimulations()} run at once; beyond that, 503 {@code busy}.
 */
final class SimulateEndpoint implements Endpoint {
    static final int MAX_RANKING_PLAYERS = 6;
    private static final Set<String> MEMBERS = JsonFields.names("players", "rounds", "mode", "rule", "convention",
            "seed");
    private static final int MAX_SEED_CHARS = 256;

    private final Backend backend;
    // Simulations are the one costly request; bounding how many run at once keeps the other
    // workers free for round requests.
    private final Semaphore gate;

    SimulateEndpoint(Backend backend) {
        this.backend = backend;
        this.gate = new Semaphore(backend.limits.maxConcurrentSimulations());
    }

    @Override
    public Reply handle(Request request) {
        request.allowQuery(Set.of());
        JsonFields f = new JsonFields(request.bodyObject(), "", MEMBERS);
        int players = backend.players(f.requiredLong("players", Long.MIN_VALUE, Long.MAX_VALUE), "players");
        ServiceLimits limits = backend.limits;
        int rounds = f.requiredInt("rounds", 1, limits.maxSimulationRounds());
        if ((long) rounds * players > limits.maxSimulationRolls()) {
            throw ApiException.badRequest("rounds × players is limited to " + limits.maxSimulationRolls() + ", got "
                    + ((long) rounds * players) + "; at " + players + " players at most "
                    + (limits.maxSimulationRolls() / players) + " rounds");
        }
        SessionSeed seed;
        if (f.has("seed")) {
            try {
                seed = SessionSeed.parse(f.requiredString("seed", MAX_SEED_CHARS));
            } catch (IllegalArgumentException e) {
                throw ApiException.badRequest("\"seed\": " + e.getMessage());
            }
        } else {
            seed = SessionSeed.random();
        }
        SessionSpec spec = new SessionSpec(seed,
                f.optionalEnum("mode", RandomnessMode.class, RandomnessMode.FAST),
                f.optionalEnum("rule", OrderRule.class, OrderRule.FRESH_EACH_ROUND),
                f.optionalEnum("convention", RankingConvention.class, RankingConvention.LOWEST_FIRST));
        backend.set(players, org.precedence.api.FairnessGrade.ORDER_FAIR);
        TurnOrderSource source = backend.provider.open(spec);

        RoundResult first;
        try {
            first = source.roll(0, players);
        } catch (IllegalArgumentException e) {
            throw new ApiException(400, "not_served", e.getMessage());
        }
        long[] lead = new long[players];
        long[][] position = new long[players][players];
        boolean rankings = players <= MAX_RANKING_PLAYERS;
        long[] rankingCounts = rankings ? new long[factorial(players)] : null;
        IntOrders orders = orders(source);
        int[] order = new int[players];
        if (!gate.tryAcquire()) {
            throw new ApiException(503, "busy", "another simulation is running; simulations are limited to "
                    + limits.maxConcurrentSimulations() + " at a time, retry shortly");
        }
        try {
            for (int r = 0; r < rounds; r++) {
                orders.orderInto(r, players, order);
                lead[order[0]]++;
                for (int pos = 0; pos < players; pos++) {
                    position[order[pos]][pos]++;
                }
                if (rankings) {
                    rankingCounts[rankIndex(order)]++;
                }
            }
        } finally {
            gate.release();
        }

        JsonObject body = new JsonObject();
        body.addProperty("players", players);
        body.addProperty("rounds", rounds);
        body.addProperty("seed", seed.toHex());
        body.addProperty("commitment", seed.commitment());
        body.addProperty("mode", Wire.name(spec.mode()));
        body.addProperty("rule", Wire.name(spec.rule()));
        body.addProperty("convention", Wire.name(spec.convention()));
        body.addProperty("setId", first.setId());
        body.addProperty("grade", Wire.name(first.grade()));
        body.add("leadCounts", longs(lead));
        JsonArray pos = new JsonArray();
        for (long[] row : position) {
            pos.add(longs(row));
        }
        body.add("positionCounts", pos);
        JsonObject chi = new JsonObject();
        chi.addProperty("lead", chiSquare(lead, rounds));
        chi.addProperty("leadDegreesOfFreedom", players - 1);
        if (rankings) {
            JsonObject counts = new JsonObject();
            for (int i = 0; i < rankingCounts.length; i++) {
                if (rankingCounts[i] > 0) {
                    counts.addProperty(rankingName(i, players), rankingCounts[i]);
                }
            }
            body.add("rankingCounts", counts);
            chi.addProperty("ranking", chiSquare(rankingCounts, rounds));
            chi.addProperty("rankingDegreesOfFreedom", rankingCounts.length - 1);
        }
        body.add("chiSquare", chi);
        return Reply.ok(body);
    }

    /** Pearson's statistic, sum of (observed − expected)² / expected, with equal expected counts. */
    static double chiSquare(long[] observed, long total) {
        double expected = (double) total / observed.length;
        double sum = 0;
        for (long o : observed) {
            double d = o - expected;
            sum += d * d / expected;
        }
        return sum;
    }

    /** Orders into a caller's array; the provider's allocation-free path when it has one. */
    @FunctionalInterface
    interface IntOrders {
        void orderInto(long round, int players, int[] out);
    }

    static IntOrders orders(TurnOrderSource source) {
        if (source instanceof DiceSession dice) {
            return dice.fastOrders()::orderInto;
        }
        return (round, players, out) -> System.arraycopy(source.orderIndices(round, players), 0, out, 0, players);
    }

    /** Lehmer code of a permutation: its index among all n! in lexicographic order. */
    static int rankIndex(List<Integer> order) {
        return rankIndex(order.stream().mapToInt(Integer::intValue).toArray());
    }

    /** Lehmer code of {@code order}: its index among all n! in lexicographic order. */
    static int rankIndex(int[] order) {
        int n = order.length;
        int index = 0;
        boolean[] used = new boolean[n];
        for (int i = 0; i < n; i++) {
            int v = order[i];
            int smaller = 0;
            for (int u = 0; u < v; u++) {
                if (!used[u]) {
                    smaller++;
                }
            }
            used[v] = true;
            index = index * (n - i) + smaller;
        }
        return index;
    }

    /** The ranking with this Lehmer index, as die letters first to last ("CAB"). */
    static String rankingName(int index, int n) {
        int[] digits = new int[n];
        for (int i = n - 1; i >= 0; i--) {
            int radix = n - i;
            digits[i] = index % radix;
            index /= radix;
        }
        boolean[] used = new boolean[n];
        StringBuilder sb = new StringBuilder();
        for (int i = 0; i < n; i++) {
            int skip = digits[i];
            for (int v = 0; v < n; v++) {
                if (!used[v] && skip-- == 0) {
                    used[v] = true;
                    sb.append(DieNames.of(v));
                    break;
                }
            }
        }
        return sb.toString();
    }

    static int factorial(int n) {
        int f = 1;
        for (int i = 2; i <= n; i++) {
            f *= i;
        }
        return f;
    }

    private static JsonArray longs(long[] values) {
        JsonArray a = new JsonArray();
        for (long v : values) {
            a.add(v);
        }
        return a;
    }
}
