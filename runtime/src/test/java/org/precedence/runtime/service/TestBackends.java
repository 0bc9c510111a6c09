package org.precedence.runtime.service;

import java.math.BigInteger;
import java.nio.ByteBuffer;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.SplittableRandom;
import java.util.concurrent.ConcurrentHashMap;
import org.precedence.api.FairnessGrade;
import org.precedence.api.PlayerRoll;
import org.precedence.api.RankingConvention;
import org.precedence.api.RoundResult;
import org.precedence.api.SessionSpec;
import org.precedence.api.TurnOrderProvider;
import org.precedence.api.TurnOrderSource;
import org.precedence.runtime.analysis.FairnessAnalysis;
import org.precedence.runtime.analysis.FairnessReport;
import org.precedence.runtime.dice.DieNames;
import org.precedence.runtime.dice.ExplicitDice;
import org.precedence.runtime.dice.MixedRadixDice;
import org.precedence.runtime.dice.Word;
import org.precedence.runtime.source.SetSource;

/**
 * Small stand-ins for the provider and the set source, so the HTTP layer is tested on its own.
 * The set for n players is the word A…N followed by its reverse (two faces per die), graded by
 * the real exact analysis; the source rolls it with a seeded {@link SplittableRandom}, one face
 * bit per player, a pure function of (seed, round, player). Not fair for n ≥ 3 (the analysis
 * says so): a test seam, never served.
 */
final class TestBackends {
    static final int MAX_PLAYERS = 8;

    private TestBackends() {
    }

    static final class Sets implements SetSource {
        private final ConcurrentHashMap<Integer, ExplicitDice> cache = new ConcurrentHashMap<>();

        @Override
        public MixedRadixDice forPlayers(int players, FairnessGrade grade) {
            if (players < 2 || players > MAX_PLAYERS) {
                throw new IllegalArgumentException("test sets serve 2.." + MAX_PLAYERS + " players, got " + players);
            }
            return cache.computeIfAbsent(players, Sets::build);
        }

        private static ExplicitDice build(int n) {
            int[] letters = new int[2 * n];
            for (int i = 0; i < n; i++) {
                letters[i] = i;
                letters[2 * n - 1 - i] = i;
            }
            Word w = Word.of(n, letters);
            FairnessReport report = FairnessAnalysis.analyse(w, RankingConvention.LOWEST_FIRST);
            return new ExplicitDice("test-palindrome-" + n, w.toDiceSet(), report.grade(), report.subsetDepth());
        }

        @Override
        public int maxPlayers() {
            return MAX_PLAYERS;
        }
    }

    static final class Provider implements TurnOrderProvider {
        private final Sets sets = new Sets();

        @Override
        public TurnOrderSource open(SessionSpec spec) {
            return new Source(spec, sets);
        }

        @Override
        public int maxPlayers() {
            return MAX_PLAYERS;
        }

        @Override
        public String name() {
            return "test-provider";
        }
    }

    static final class Source implements TurnOrderSource {
        private final SessionSpec spec;
        private final Sets sets;
        private final long seedBits;

        Source(SessionSpec spec, Sets sets) {
            this.spec = spec;
            this.sets = sets;
            this.seedBits = ByteBuffer.wrap(spec.seed().bytes()).getLong();
        }

        @Override
        public SessionSpec spec() {
            return spec;
        }

        @Override
        public RoundResult roll(long round, int playerCount) {
            if (round < 0) {
                throw new IllegalArgumentException("round must be >= 0, got " + round);
            }
            ExplicitDice dice = (ExplicitDice) sets.forPlayers(playerCount, FairnessGrade.UNFAIR);
            SplittableRandom random = new SplittableRandom(seedBits ^ (round * 0x9E3779B97F4A7C15L));
            int[] face = new int[playerCount];
            List<Integer> order = new ArrayList<>();
            for (int p = 0; p < playerCount; p++) {
                face[p] = random.nextInt(2);
                order.add(p);
            }
            Comparator<Integer> byValue = Comparator.comparingLong(p -> dice.value(p, face[p]));
            order.sort(spec.convention() == RankingConvention.LOWEST_FIRST ? byValue : byValue.reversed());
            List<PlayerRoll> rolls = new ArrayList<>();
            for (int p = 0; p < playerCount; p++) {
                rolls.add(new PlayerRoll(p, DieNames.of(p), BigInteger.valueOf(face[p]),
                        BigInteger.valueOf(dice.value(p, face[p])), order.indexOf(p)));
            }
            return new RoundResult(round, order, rolls, dice.grade(), dice.id());
        }
    }
}
