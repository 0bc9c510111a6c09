package org.precedence.runtime.provider;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigInteger;
import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import org.junit.jupiter.api.Test;
import org.precedence.api.FairnessGrade;
import org.precedence.api.OrderRule;
import org.precedence.api.PlayerRoll;
import org.precedence.api.RandomnessMode;
import org.precedence.api.RankingConvention;
import org.precedence.api.RoundResult;
import org.precedence.api.SessionSeed;
import org.precedence.api.SessionSpec;
import org.precedence.runtime.construction.ConstructedDice;
import org.precedence.runtime.construction.Construction;
import org.precedence.runtime.dice.MixedRadixDice;
import org.precedence.runtime.randomness.RollGenerator;
import org.precedence.runtime.source.SetSource;

/**
 * {@link DiceSession#roll} ranks constructed sets by prefix keys and computes their faces on
 * long digits; the reference is the general path ({@code rollLazily}: the digit-by-digit
 * comparison and the BigInteger faces of {@code SeededFaces}, which draws digit by digit as
 * {@code docs/roll-spec.md} lays the draws out). Every field of the result must agree, face
 * indices included. (The committed golden vectors pin some of these rounds too, through
 * {@code GoldenVectorsTest}.)
 */
class ConstructedRollTest {
    private static final SessionSeed SEED = SessionSeed.fromText("constructed roll tests");
    /** Counts whose standard sets are constructed: one to three leading-group blocks, and 64 (no long digits). */
    private static final int[] COUNTS = {7, 8, 10, 12, 64};
    /**
     * Rounds at both ends of the counter: the first narrow block (0..3) and the next, 10^9 and
     * 2^62 with their neighbours (c0 carries there for nothing but the narrow index / 4), the last.
     */
    private static final long[] ROUNDS = {0, 1, 3, 4, 1_000_000_000L, 1_000_000_001L, 1L << 62, (1L << 62) + 1,
        Long.MAX_VALUE};

    private static DiceSession session(String algorithm, OrderRule rule, RankingConvention convention,
            SetSource sets) {
        return DiceSession.open(new SessionSpec(SEED, RollGenerator.modeOf(algorithm), rule, convention), sets,
                algorithm);
    }

    @Test
    void roll_constructedStandardSetsEqualTheGeneralPathUnderEveryAlgorithmRuleAndConvention() {
        SplittableRandom random = new SplittableRandom(71012); // fixed: round numbers only
        for (String algorithm : RollGenerator.ALGORITHM_IDS) {
            for (OrderRule rule : OrderRule.values()) {
                for (RankingConvention convention : RankingConvention.values()) {
                    DiceSession s = session(algorithm, rule, convention, FairDiceProvider.standardSets());
                    for (int n : COUNTS) {
                        assertTrue(s.setFor(n) instanceof ConstructedDice, "n=" + n);
                        List<Long> rounds = new ArrayList<>();
                        for (long k : ROUNDS) {
                            rounds.add(k);
                        }
                        int extra = n == 64 ? 0 : 3;
                        for (int i = 0; i < extra; i++) {
                            rounds.add(random.nextLong(Long.MAX_VALUE));
                        }
                        for (long k : n == 64 ? rounds.subList(4, 7) : rounds) {
                            String where = algorithm + " " + rule + " " + convention + " n=" + n + " round " + k;
                            assertEquals(s.rollLazily(k, n), s.roll(k, n), where);
                        }
                    }
                }
            }
        }
    }

    /**
     * The face index is the mixed-radix number of the face's digits (positional notation with
     * mixed radices: Knuth, TAOCP vol. 2, §4.1, from memory): reading it back into digits by
     * repeated division and evaluating the construction's BigInteger definition of a face value
     * on them must give the reported value, and the index must be below the side count.
     */
    @Test
    void roll_faceIndicesSpellTheReportedFaceValues() {
        for (String algorithm : List.of(RollGenerator.FAST_ID, RollGenerator.FAST_V1_ID)) {
            DiceSession s = session(algorithm, OrderRule.BALANCED_LEAD, RankingConvention.HIGHEST_FIRST,
                    FairDiceProvider.standardSets());
            for (int n : new int[] {7, 10, 12}) {
                MixedRadixDice dice = s.setFor(n);
                for (long k : ROUNDS) {
                    for (PlayerRoll roll : s.roll(k, n).rolls()) {
                        int d = roll.player();
                        assertTrue(roll.faceIndex().compareTo(dice.sides(d)) < 0);
                        BigInteger[] digits = new BigInteger[dice.digits()];
                        BigInteger rest = roll.faceIndex();
                        for (int j = digits.length - 1; j >= 0; j--) {
                            BigInteger[] qr = rest.divideAndRemainder(dice.radix(d, j));
                            digits[j] = qr[1];
                            rest = qr[0];
                        }
                        assertEquals(BigInteger.ZERO, rest);
                        assertEquals(dice.faceValue(d, digits), roll.faceValue(),
                                algorithm + " n=" + n + " round " + k + " die " + d);
                    }
                }
            }
        }
    }

    /**
     * Small constructions tie on their prefix keys often (a few dozen sub-blocks), so the
     * lazy fallback inside the prefix path runs for many of these rounds.
     */
    @Test
    void roll_smallConstructionsWithFrequentPrefixTiesEqualTheGeneralPath() {
        for (int n = 3; n <= 5; n++) {
            SetSource source = only(new ConstructedDice(Construction.smallest(n)));
            for (String algorithm : RollGenerator.ALGORITHM_IDS) {
                for (OrderRule rule : OrderRule.values()) {
                    DiceSession s = session(algorithm, rule, RankingConvention.LOWEST_FIRST, source);
                    for (long k = 0; k < 40; k++) {
                        assertEquals(s.rollLazily(k, n), s.roll(k, n), algorithm + " " + rule + " n=" + n + " round " + k);
                    }
                }
            }
        }
    }

    /**
     * A source may serve another set for the same count later (a cache evicts and rebuilds):
     * the session must not keep ranking with the plan of the set it served before.
     */
    @Test
    void roll_followsTheSetTheSourceServesNow() {
        ConstructedDice plain = new ConstructedDice(Construction.plain(7));
        ConstructedDice smallest = new ConstructedDice(Construction.smallest(7));
        assertTrue(plain.digits() != smallest.digits() || !plain.radix(0, 0).equals(smallest.radix(0, 0)));
        boolean[] servePlain = {true};
        SetSource alternating = new SetSource() {
            @Override
            public MixedRadixDice forPlayers(int players, FairnessGrade grade) {
                return servePlain[0] ? plain : smallest;
            }

            @Override
            public int maxPlayers() {
                return 7;
            }
        };
        DiceSession s = session(RollGenerator.FAST_ID, OrderRule.FRESH_EACH_ROUND, RankingConvention.LOWEST_FIRST,
                alternating);
        for (long k = 0; k < 12; k++) {
            servePlain[0] = k % 3 != 2;
            RoundResult r = s.roll(k, 7);
            assertEquals(servePlain[0] ? plain.id() : smallest.id(), r.setId());
            assertEquals(s.rollLazily(k, 7), r, "round " + k);
        }
    }

    @Test
    void roll_constructedSetsFromSeveralThreadsEqualOneThread() throws Exception {
        DiceSession s = session(RollGenerator.FAST_ID, OrderRule.BALANCED_LEAD, RankingConvention.LOWEST_FIRST,
                FairDiceProvider.standardSets());
        List<RoundResult> alone = new ArrayList<>();
        for (long k = 0; k < 48; k++) {
            alone.add(s.rollLazily(k, 7 + (int) (k % 6)));
        }
        // A fresh session, so that the threads race to make its plans.
        DiceSession shared = session(RollGenerator.FAST_ID, OrderRule.BALANCED_LEAD, RankingConvention.LOWEST_FIRST,
                FairDiceProvider.standardSets());
        ExecutorService pool = Executors.newFixedThreadPool(4);
        try {
            List<Future<RoundResult>> results = new ArrayList<>();
            for (long k = 0; k < 48; k++) {
                long round = k;
                results.add(pool.submit(() -> shared.roll(round, 7 + (int) (round % 6))));
            }
            for (int i = 0; i < 48; i++) {
                assertEquals(alone.get(i), results.get(i).get(), "round " + i);
            }
        } finally {
            pool.shutdown();
        }
    }

    /**
     * FastOrders keeps the narrow blocks of every digit on stream 0 (each serves four rounds):
     * walking rounds in order, then jumping back and far ahead, its orders and faces must stay
     * those of the general path.
     */
    @Test
    void fastOrders_walkingRoundsInOrderWithKeptNarrowBlocksEqualsTheGeneralPath() {
        for (String algorithm : List.of(RollGenerator.FAST_ID, RollGenerator.FAST_V2_ID)) {
            for (OrderRule rule : new OrderRule[] {OrderRule.FRESH_EACH_ROUND, OrderRule.BALANCED_LEAD}) {
                DiceSession s = session(algorithm, rule, RankingConvention.LOWEST_FIRST, FairDiceProvider.standardSets());
                FastOrders fast = s.fastOrders();
                List<Long> rounds = new ArrayList<>();
                for (long k = 0; k < 24; k++) {
                    rounds.add(k);
                }
                for (long k = 0; k < 9; k++) {
                    rounds.add(k % 3 == 0 ? 5 : (1L << 62) + k);
                }
                for (int n : new int[] {7, 10, 12}) {
                    int[] out = new int[n];
                    BigInteger[] faces = new BigInteger[n];
                    for (long k : rounds) {
                        RoundResult r = s.rollLazily(k, n);
                        fast.orderInto(k, n, out, faces);
                        String where = algorithm + " " + rule + " n=" + n + " round " + k;
                        assertEquals(r.order(), java.util.Arrays.stream(out).boxed().toList(), where);
                        assertEquals(r.faceValues(), List.of(faces), where);
                    }
                }
            }
        }
    }

    private static SetSource only(MixedRadixDice dice) {
        return new SetSource() {
            @Override
            public MixedRadixDice forPlayers(int players, FairnessGrade grade) {
                return dice;
            }

            @Override
            public int maxPlayers() {
                return dice.players();
            }
        };
    }
}
