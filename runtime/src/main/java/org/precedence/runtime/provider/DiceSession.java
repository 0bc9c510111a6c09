package org.precedence.runtime.provider;

import java.math.BigInteger;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.concurrent.ConcurrentHashMap;
import org.precedence.api.FairnessGrade;
import org.precedence.api.PlayerRoll;
import org.precedence.api.RoundResult;
import org.precedence.api.SessionSpec;
import org.precedence.api.TurnOrderSource;
import org.precedence.runtime.construction.ConstructedDice;
import org.precedence.runtime.dice.DieNames;
import org.precedence.runtime.dice.MixedRadixDice;
import org.precedence.runtime.randomness.RollGenerator;
import org.precedence.runtime.randomness.SeededFaces;
import org.precedence.runtime.source.SetSource;

/**
 * A session: every round rolled with order-fair dice from a {@link SetSource}, the words from
 * the spec's {@link org.precedence.api.RandomnessMode}, the order by the spec's rule.
 *
 * <p><b>Roster changes.</b> A round with n players rolls the order-fair set served for n; die
 * i goes to the player at roster index i. Rounds do not remember earlier rounds, so players
 * may join or leave between any two rounds; what a rule guarantees across rounds holds among
 * the rounds played with the same count (see {@link org.precedence.api.OrderRule}).
 *
 * <p>Immutable in all it returns, and thread-safe: the only state it keeps is a concurrent cache
 * of per-set {@link PrefixPlan}s, which are immutable and depend only on the set and the
 * algorithm.
 */
public final class DiceSession implements TurnOrderSource {
    private final SessionSpec spec;
    private final SetSource sets;
    private final RollGenerator generator;
    /** Per player count, the prefix plan of the constructed set last served for it. */
    private final Map<Integer, PrefixPlan> prefixPlans = new ConcurrentHashMap<>();

    DiceSession(SessionSpec spec, SetSource sets) {
        this(spec, sets, RollGenerator.algorithmId(Objects.requireNonNull(spec, "spec").mode()));
    }

    private DiceSession(SessionSpec spec, SetSource sets, String algorithmId) {
        this.spec = Objects.requireNonNull(spec, "spec");
        this.sets = Objects.requireNonNull(sets, "sets");
        this.generator = RollGenerator.of(algorithmId, spec.seed());
        if (RollGenerator.modeOf(algorithmId) != spec.mode()) {
            throw new IllegalArgumentException("algorithm " + algorithmId + " is not of mode " + spec.mode());
        }
    }

    /**
     * Opens a session over {@code sets} directly (the provider does this for engines), with the
     * current algorithm of the spec's mode.
     */
    public static DiceSession open(SessionSpec spec, SetSource sets) {
        return new DiceSession(spec, sets);
    }

    /**
     * Opens a session that rolls with algorithm {@code algorithmId} (one of {@link
     * RollGenerator#ALGORITHM_IDS}), e.g. to replay a log written under an earlier algorithm.
     *
     * @throws IllegalArgumentException if the id is unknown or not of the spec's mode
     */
    public static DiceSession open(SessionSpec spec, SetSource sets, String algorithmId) {
        return new DiceSession(spec, sets, Objects.requireNonNull(algorithmId, "algorithmId"));
    }

    @Override
    public SessionSpec spec() {
        return spec;
    }

    /** Returns the id of the algorithm that turns the seed into words (recorded in logs). */
    public String algorithmId() {
        return generator.algorithmId();
    }

    /** Returns the source of the sets this session rolls. */
    public SetSource sets() {
        return sets;
    }

    /** Returns the largest player count served. */
    public int maxPlayers() {
        return sets.maxPlayers();
    }

    RollGenerator generator() {
        return generator;
    }

    /**
     * Returns the order-fair set that {@code players} players roll.
     *
     * @throws IllegalArgumentException if the count is outside 2..{@link #maxPlayers()}
     */
    public MixedRadixDice setFor(int players) {
        Validation.requireServedCount(players, sets.maxPlayers());
        MixedRadixDice dice = sets.forPlayers(players, FairnessGrade.ORDER_FAIR);
        if (dice.players() != players || !dice.grade().atLeast(FairnessGrade.ORDER_FAIR)) {
            throw new IllegalStateException("set source served " + dice.id() + " (" + dice.players()
                    + " dice, " + dice.grade() + ") when asked for " + players + " order-fair dice");
        }
        return dice;
    }

    /**
     * {@inheritDoc}
     *
     * <p>The rolls reported are those of the stream-0 draw behind the order (round k for
     * FRESH_EACH_ROUND and BALANCED_LEAD, round 0 for FIRST_PLAYER_THEN_SEATING and SNAKE);
     * each roll's position is the player's place in this round's order.
     *
     * <p>A constructed set is ranked by its dice's prefix keys and its faces are computed on
     * long digits ({@link PrefixRanker}); any other set by the lazy digit-by-digit comparison
     * (the general path). Both give the same round for the same set (tested).
     *
     * @throws IllegalArgumentException if {@code round < 0} or the count is outside
     *                                  2..{@link #maxPlayers()}
     */
    @Override
    public RoundResult roll(long round, int playerCount) {
        Validation.requireRound(round);
        MixedRadixDice dice = setFor(playerCount);
        return dice instanceof ConstructedDice constructed ? rollByPrefixKeys(round, constructed)
                : rollLazily(round, dice);
    }

    /**
     * Returns round {@code round} as {@link #roll} does, by the general path whatever the set:
     * ranked by {@link LazyRanker}, faces from its {@link SeededFaces}. For tests, which pin the
     * prefix path of constructed sets to it.
     */
    RoundResult rollLazily(long round, int playerCount) {
        Validation.requireRound(round);
        return rollLazily(round, setFor(playerCount));
    }

    private RoundResult rollLazily(long round, MixedRadixDice dice) {
        int n = dice.players();
        long shownIndex = Streams.facesIndex(spec.rule(), round);
        SeededFaces[] shown = new SeededFaces[1];
        Ranker ranker = (stream, index, players, out) -> {
            SeededFaces f = LazyRanker.rankInto(generator, dice, spec.convention(), stream, index, out);
            if (stream == Streams.ROUND && index == shownIndex) {
                shown[0] = f;
            }
        };
        int[] order = new int[n];
        RuleOrders.orderInto(spec.rule(), round, n, ranker, order, new int[n]);
        SeededFaces faces = shown[0];
        BigInteger[] indices = new BigInteger[n];
        BigInteger[] values = new BigInteger[n];
        for (int d = 0; d < n; d++) {
            indices[d] = faces.faceIndex(d);
            values[d] = faces.faceValue(d);
        }
        return result(round, dice, order, indices, values);
    }

    /** The constructed sets' path: a {@link PrefixRanker} for this call over the set's shared plan. */
    private RoundResult rollByPrefixKeys(long round, ConstructedDice dice) {
        int n = dice.players();
        PrefixRanker prefix = new PrefixRanker(prefixPlan(dice), false);
        Ranker ranker = (stream, index, players, out) -> prefix.rankInto(generator, null, spec.convention(),
                stream, index, out);
        int[] order = new int[n];
        RuleOrders.orderInto(spec.rule(), round, n, ranker, order, new int[n]);
        BigInteger[] indices = new BigInteger[n];
        BigInteger[] values = new BigInteger[n];
        // Every rule ranks the draw whose faces it reports last, so its leading digits are kept.
        prefix.facesInto(generator, Streams.ROUND, Streams.facesIndex(spec.rule(), round), values, indices);
        return result(round, dice, order, indices, values);
    }

    private static RoundResult result(long round, MixedRadixDice dice, int[] order, BigInteger[] indices,
            BigInteger[] values) {
        int n = order.length;
        int[] position = new int[n];
        List<Integer> orderList = new ArrayList<>(n);
        for (int p = 0; p < n; p++) {
            position[order[p]] = p;
            orderList.add(order[p]);
        }
        List<PlayerRoll> rolls = new ArrayList<>(n);
        for (int d = 0; d < n; d++) {
            rolls.add(new PlayerRoll(d, DieNames.of(d), indices[d], values[d], position[d]));
        }
        return new RoundResult(round, orderList, rolls, dice.grade(), dice.id());
    }

    /**
     * Returns the prefix plan of {@code dice} under this session's algorithm, made once per
     * player count and shared by every caller (remade if the source serves another instance).
     */
    PrefixPlan prefixPlan(ConstructedDice dice) {
        Integer players = dice.players();
        PrefixPlan plan = prefixPlans.get(players);
        if (plan == null || !plan.isFor(dice)) {
            plan = new PrefixPlan(dice, generator);
            prefixPlans.put(players, plan);
        }
        return plan;
    }

    /** Returns round {@code round}'s order as player indices (through {@link FastOrders}). */
    @Override
    public int[] orderIndices(long round, int players) {
        if (players < 1) {
            throw new IllegalArgumentException("player count must be >= 1, got " + players);
        }
        int[] out = new int[players];
        fastOrders().orderInto(round, players, out);
        return out;
    }

    /** Returns a new fast orderer with this session's orders (one per thread; see {@link FastOrders}). */
    public FastOrders fastOrders() {
        return new FastOrders(this);
    }
}
