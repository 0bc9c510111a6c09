package org.precedence.runtime.randomness;

import com.google.gson.GsonBuilder;
import com.google.gson.JsonArray;
import com.google.gson.JsonObject;
import java.io.IOException;
import java.math.BigInteger;
import java.nio.file.Path;
import java.util.HexFormat;
import java.util.List;
import org.precedence.api.FairnessGrade;
import org.precedence.api.OrderRule;
import org.precedence.api.PlayerRoll;
import org.precedence.api.RandomnessMode;
import org.precedence.api.RankingConvention;
import org.precedence.api.RoundResult;
import org.precedence.api.SessionSeed;
import org.precedence.api.SessionSpec;
import org.precedence.runtime.dice.ExplicitDice;
import org.precedence.runtime.dice.MixedRadixDice;
import org.precedence.runtime.dice.Word;
import org.precedence.runtime.provider.DiceSession;
import org.precedence.runtime.provider.TestSets;
import org.precedence.runtime.replay.SessionLogFiles;
import org.precedence.runtime.source.SetSource;

/**
 * Computes the golden vectors. Run once per algorithm generation to create its committed file
 * (never to "fix" one: the committed vectors are a promise, and changing them needs a new
 * algorithm id):
 * {@code java -cp ... org.precedence.runtime.randomness.GoldenVectors v1|v2|v3 runtime/src/test/resources/.../FILE}.
 * {@link #V1} ({@code golden-vectors.json}) pins {@code precedence-roll-v1/philox4x64} and the
 * secure mode; {@link #V2} ({@code golden-vectors-v2.json}) pins
 * {@code precedence-roll-v2/philox4x64}, with the secure mode again so that it stands alone;
 * {@link #V3} ({@code golden-vectors-v3.json}) pins {@code precedence-roll-v3/philox4x64}, again
 * with the secure mode, and adds leading-group blocks, group values and whole rounds of the
 * constructed sets for 7 and 10 players.
 */
public final class GoldenVectors {
    /** One generation of vectors: its file, its fast algorithm id and what it samples. */
    record Generation(String resource, String fastId, long[][] counters, BigInteger[] radices, int digitCount) {
        boolean leadingGroups() {
            return fastId.equals(RollGenerator.FAST_ID);
        }
    }

    static final String RESOURCE = "golden-vectors.json";
    static final HexFormat HEX = HexFormat.of();
    static final List<SessionSeed> SEEDS = List.of(SessionSeed.fromText("golden vectors one"),
            SessionSeed.fromHex("000102030405060708090a0b0c0d0e0f101112131415161718191a1b1c1d1e1f"));
    static final long[] ROUNDS = {0, 1, 2, 3, 4, 5, 7, 1_000_000_000L, 1L << 62};
    static final long[][] COUNTERS = {{0, 0, 0, 0}, {1, 0, 0, 0}, {1_000_000_000L, (1L << 32) | 2, 1, 3},
        {-1, -1, -1, -1}};
    static final BigInteger[] RADICES = {BigInteger.valueOf(6), BigInteger.valueOf(1152),
        BigInteger.ONE.shiftLeft(62).add(BigInteger.valueOf(3)), BigInteger.ONE.shiftLeft(100).add(BigInteger.ONE)};
    static final Generation V1 = new Generation(RESOURCE, RollGenerator.FAST_V1_ID, COUNTERS, RADICES, 2 * 2 * 4 * 2);
    /**
     * v2 adds a narrow-layout counter (the block of rounds 0–3 of players 0–3) and radices at
     * both sides of 2^16, among them 43691, whose 16-bit draws are rejected a third of the time.
     */
    static final Generation V2 = new Generation("golden-vectors-v2.json", RollGenerator.FAST_V2_ID,
        new long[][] {{0, 0, 0, 0}, {0, 1L << 31, 0, 0}, {1, 1L << 31, 0, 0}, {1_000_000_000L, (1L << 32) | 2, 1, 3},
            {-1, -1, -1, -1}},
        new BigInteger[] {BigInteger.TWO, BigInteger.valueOf(6), BigInteger.valueOf(120), BigInteger.valueOf(1152),
            BigInteger.valueOf(43691), BigInteger.valueOf(65535), BigInteger.valueOf(65536),
            BigInteger.ONE.shiftLeft(62).add(BigInteger.valueOf(3)), BigInteger.ONE.shiftLeft(100).add(BigInteger.ONE)},
        2 * 2 * 9 * 2);

    /**
     * v3 adds leading-group counters (bit 30 of c1: dice 0–7 and 8–15 of round 0, and stream 1)
     * to the v2 sections, group values for the products of the served constructions, and whole
     * rounds of the constructed sets for 7 and 10 players.
     */
    static final Generation V3 = new Generation("golden-vectors-v3.json", RollGenerator.FAST_ID,
        new long[][] {{0, 0, 0, 0}, {0, 1L << 31, 0, 0}, {1, 1L << 31, 0, 0}, {0, 1L << 30, 0, 0},
            {0, (1L << 30) | 1, 0, 0}, {9, (1L << 32) | (1L << 30), 0, 1}, {1_000_000_000L, (1L << 32) | 2, 1, 3},
            {-1, -1, -1, -1}},
        V2.radices(), V2.digitCount());
    /** Leading-group products: a toy one, the 7-, 8- and 10-player groups, and the largest allowed. */
    static final long[] GROUP_PRODUCTS = {12, 20_160, 161_280, 14_515_200, (1L << 24) - 1};
    /** Player counts whose standard (constructed) sets get whole rounds in the v3 file. */
    static final int[] CONSTRUCTED_PLAYERS = {7, 10};
    static final long[] CONSTRUCTED_ROUNDS = {0, 1, 2, 3, 7, 1_000_000_000L, 1L << 62};

    private GoldenVectors() {
    }

    static SetSource single(MixedRadixDice dice) {
        return new SetSource() {
            @Override
            public MixedRadixDice forPlayers(int players, FairnessGrade grade) {
                if (players != dice.players()) {
                    throw new IllegalArgumentException("this source serves " + dice.players() + " players");
                }
                return dice;
            }

            @Override
            public int maxPlayers() {
                return dice.players();
            }
        };
    }

    static ExplicitDice diceOf(String id, String word) {
        return new ExplicitDice(id, Word.parse(word).toDiceSet(), FairnessGrade.ORDER_FAIR, Word.parse(word).players());
    }

    static JsonObject roll(String algorithmId, SessionSeed seed, String setId, String word, OrderRule rule,
            RankingConvention convention, long round) {
        ExplicitDice dice = diceOf(setId, word);
        RandomnessMode mode = RollGenerator.modeOf(algorithmId);
        DiceSession s = DiceSession.open(new SessionSpec(seed, mode, rule, convention), single(dice), algorithmId);
        RoundResult r = s.roll(round, dice.players());
        JsonObject o = new JsonObject();
        o.addProperty("algorithm", algorithmId);
        o.addProperty("seed", seed.toHex());
        o.addProperty("set", setId);
        addOutcome(o, rule, convention, round, r, true);
        return o;
    }

    /** A whole round of the standard set for {@code players} (constructed for 7 and more). */
    static JsonObject constructedRoll(String algorithmId, SessionSeed seed, int players, OrderRule rule,
            RankingConvention convention, long round) {
        RandomnessMode mode = RollGenerator.modeOf(algorithmId);
        DiceSession s = DiceSession.open(new SessionSpec(seed, mode, rule, convention),
                org.precedence.runtime.provider.FairDiceProvider.standardSets(), algorithmId);
        MixedRadixDice dice = s.setFor(players);
        RoundResult r = s.roll(round, players);
        JsonObject o = new JsonObject();
        o.addProperty("algorithm", algorithmId);
        o.addProperty("seed", seed.toHex());
        o.addProperty("players", players);
        o.addProperty("set", dice.id());
        o.addProperty("setSha256", dice.sha256());
        addOutcome(o, rule, convention, round, r, false);
        return o;
    }

    /** Adds rule, convention, round, (face indices,) faces and order, in the files' key order. */
    private static void addOutcome(JsonObject o, OrderRule rule, RankingConvention convention, long round,
            RoundResult r, boolean withIndices) {
        o.addProperty("rule", rule.name());
        o.addProperty("convention", convention.name());
        o.addProperty("round", round);
        JsonArray faceIndices = new JsonArray();
        JsonArray faces = new JsonArray();
        for (PlayerRoll p : r.rolls()) {
            faceIndices.add(p.faceIndex().toString());
            faces.add(p.faceValue().toString());
        }
        if (withIndices) {
            o.add("faceIndices", faceIndices);
        }
        o.add("faces", faces);
        JsonArray order = new JsonArray();
        r.order().forEach(order::add);
        o.add("order", order);
    }

    static JsonObject generate(Generation gen) {
        JsonObject root = new JsonObject();
        root.addProperty("about", "Precedence roll golden vectors: our own, computed by the reference implementation."
                + " They never change without a new algorithm id. See docs/roll-spec.md.");
        JsonObject sets = new JsonObject();
        sets.addProperty("test-2x2", ((ExplicitDice) TestSets.INSTANCE.forPlayers(2)).set().word().toString());
        sets.addProperty("test-3x6", ((ExplicitDice) TestSets.INSTANCE.forPlayers(3)).set().word().toString());
        sets.addProperty("test-4x1152", ((ExplicitDice) TestSets.INSTANCE.forPlayers(4)).set().word().toString());
        root.add("sets", sets);

        JsonArray keys = new JsonArray();
        JsonArray blocks = new JsonArray();
        JsonArray digits = new JsonArray();
        JsonArray rolls = new JsonArray();
        for (SessionSeed seed : SEEDS) {
            JsonObject k = new JsonObject();
            k.addProperty("seed", seed.toHex());
            k.addProperty("commitment", seed.commitment());
            k.addProperty("fastKey", HEX.formatHex(RollGenerator.deriveKey(gen.fastId(), seed)));
            k.addProperty("secureKey", HEX.formatHex(RollGenerator.deriveKey(RollGenerator.SECURE_ID, seed)));
            keys.add(k);
            for (String id : new String[] {gen.fastId(), RollGenerator.SECURE_ID}) {
                RollGenerator g = RollGenerator.of(id, seed);
                for (long[] c : gen.counters()) {
                    long[] out = new long[4];
                    g.block(c[0], c[1], c[2], c[3], out);
                    JsonObject b = new JsonObject();
                    b.addProperty("algorithm", g.algorithmId());
                    b.addProperty("seed", seed.toHex());
                    b.add("counter", hexWords(c));
                    b.add("words", hexWords(out));
                    blocks.add(b);
                }
                for (BigInteger radix : gen.radices()) {
                    for (int player = 0; player < 6; player += 5) {
                        final int p = player;
                        JsonObject d = drawAt(g, seed, p);
                        d.addProperty("digit", 2);
                        d.addProperty("radix", radix.toString());
                        d.addProperty("value", g.digit(9, 1, p, 2, radix).toString());
                        digits.add(d);
                    }
                }
                for (String setId : new String[] {"test-2x2", "test-3x6", "test-4x1152"}) {
                    String word = sets.get(setId).getAsString();
                    for (OrderRule rule : OrderRule.values()) {
                        for (RankingConvention convention : RankingConvention.values()) {
                            boolean full = setId.equals("test-3x6") || rule == OrderRule.FRESH_EACH_ROUND;
                            if (!full && convention == RankingConvention.HIGHEST_FIRST) {
                                continue;
                            }
                            for (long round : ROUNDS) {
                                rolls.add(roll(id, seed, setId, word, rule, convention, round));
                            }
                        }
                    }
                }
            }
        }
        root.add("keys", keys);
        root.add("blocks", blocks);
        root.add("digits", digits);
        root.add("rolls", rolls);
        if (gen.leadingGroups()) {
            addLeadingGroups(gen, root);
        }
        return root;
    }

    /** v3's sections: leading keys for each product, and whole rounds of constructed sets. */
    private static void addLeadingGroups(Generation gen, JsonObject root) {
        JsonArray groupValues = new JsonArray();
        JsonArray constructed = new JsonArray();
        for (SessionSeed seed : SEEDS) {
            RollGenerator g = RollGenerator.of(gen.fastId(), seed);
            for (long product : GROUP_PRODUCTS) {
                for (int player : new int[] {0, 5, 9}) {
                    JsonObject v = drawAt(g, seed, player);
                    v.addProperty("product", product);
                    v.addProperty("value", g.groupValue(9, 1, player, product));
                    groupValues.add(v);
                }
            }
            for (int players : CONSTRUCTED_PLAYERS) {
                for (OrderRule rule : OrderRule.values()) {
                    for (RankingConvention convention : RankingConvention.values()) {
                        if (rule != OrderRule.FRESH_EACH_ROUND && convention == RankingConvention.HIGHEST_FIRST) {
                            continue;
                        }
                        for (long round : CONSTRUCTED_ROUNDS) {
                            constructed.add(constructedRoll(gen.fastId(), seed, players, rule, convention, round));
                        }
                    }
                }
            }
        }
        root.add("groupValues", groupValues);
        root.add("constructedRolls", constructed);
    }

    /** The coordinates every sampled draw in the files is taken at: index 9, stream 1. */
    private static JsonObject drawAt(RollGenerator g, SessionSeed seed, int player) {
        JsonObject o = new JsonObject();
        o.addProperty("algorithm", g.algorithmId());
        o.addProperty("seed", seed.toHex());
        o.addProperty("index", 9);
        o.addProperty("stream", 1);
        o.addProperty("player", player);
        return o;
    }

    static JsonArray hexWords(long[] words) {
        JsonArray a = new JsonArray();
        for (long w : words) {
            a.add(String.format("%016x", w));
        }
        return a;
    }

    static String text(Generation gen) {
        return new GsonBuilder().setPrettyPrinting().disableHtmlEscaping().create().toJson(generate(gen)) + "\n";
    }

    public static void main(String[] args) throws IOException {
        Generation gen = switch (args[0]) {
            case "v1" -> V1;
            case "v2" -> V2;
            case "v3" -> V3;
            default -> throw new IllegalArgumentException("generation must be v1, v2 or v3, got " + args[0]);
        };
        SessionLogFiles.writeAtomically(Path.of(args[1]), text(gen));
    }
}
