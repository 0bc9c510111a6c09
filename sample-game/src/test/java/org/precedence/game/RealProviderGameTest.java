package org.precedence.game;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.mockito.ArgumentMatchers.anyInt;
import static org.mockito.ArgumentMatchers.anyList;
import static org.mockito.ArgumentMatchers.anyLong;
import static org.mockito.Mockito.inOrder;
import static org.mockito.Mockito.mock;
import static org.mockito.Mockito.never;
import static org.mockito.Mockito.times;
import static org.mockito.Mockito.verify;
import static org.mockito.Mockito.when;

import java.nio.file.Path;
import java.util.Comparator;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.mockito.InOrder;
import org.precedence.api.FairnessGrade;
import org.precedence.api.RandomnessMode;
import org.precedence.api.TurnOrderProvider;
import org.precedence.api.TurnOrderSource;
import org.precedence.game.log.GameLogFile;
import org.precedence.game.log.GameRecord;
import org.precedence.game.log.GameRecord.RollEntry;
import org.precedence.game.log.GameRecord.RoundEntry;
import org.precedence.game.play.Match;
import org.precedence.game.play.TableListener;
import org.precedence.game.replay.Replay;
import org.precedence.game.replay.ReplayReport;

/**
 * The sample game against the real provider, found the way an engine finds it: with
 * {@link TurnOrderProvider#load()} (the runtime is on the class path in runtime scope only).
 */
class RealProviderGameTest {
    private static TurnOrderProvider provider;
    /** The largest table the provider serves, capped at the game's 8. */
    private static int table;

    @BeforeAll
    static void load() {
        provider = TurnOrderProvider.load();
        table = Math.min(GameSetup.MAX_PLAYERS, provider.maxPlayers());
    }

    private static GameRecord botGame(TurnOrderProvider p, int players, String seed, RandomnessMode mode, int leave) {
        GameSetup setup = GameSetup.of(players, players, seed, mode, GameSetup.DEFAULT_MAX_ROUNDS, leave);
        return Match.open(setup, p, s -> {
            throw new AssertionError("no humans");
        }, TableListener.NONE).play();
    }

    @Test
    void load_findsTheRuntimeProviderNotATestOne() {
        assertNotEquals("test-shuffle", provider.name());
        assertTrue(table >= 3, "the provider serves at least 3 players, got " + provider.maxPlayers());
    }

    @Test
    void fullBotGame_savedReadAndReplayed_identical(@TempDir Path dir) throws Exception {
        for (RandomnessMode mode : RandomnessMode.values()) {
            GameRecord game = botGame(provider, table, "veyra-dusk", mode, 3);
            Path log = dir.resolve("game-" + mode + ".json");
            GameLogFile.write(log, game);
            GameRecord read = GameLogFile.read(log);
            assertEquals(game, read);
            ReplayReport report = Replay.check(read, TurnOrderProvider.load());
            assertTrue(report.matches(), mode + ": " + report.verdict());
            assertEquals(game, botGame(TurnOrderProvider.load(), table, "veyra-dusk", mode, 3));
        }
    }

    @Test
    void everyServedTableSize_playsAndReplays() throws Exception {
        for (int players = 2; players <= table; players++) {
            GameRecord game = botGame(provider, players, "ledger-" + players, RandomnessMode.FAST, 0);
            assertTrue(Replay.check(game, provider).matches(), players + " players");
        }
    }

    @Test
    void play_rollsTheRealSourceOncePerRoundWithTheLiveRoster() {
        GameSetup setup = GameSetup.of(table, table, "veyra-dusk", RandomnessMode.FAST, 12, 2);
        TurnOrderSource real = provider.open(setup.sessionSpec());
        TurnOrderSource source = mock(TurnOrderSource.class);
        when(source.roll(anyLong(), anyInt())).thenAnswer(c -> real.roll(c.getArgument(0), c.getArgument(1)));
        List<MoveChooser> bots = Match.choosers(setup, setup.sessionSpec().seed(), s -> null);
        GameRecord game = new Match(setup, source, provider.name(), bots, TableListener.NONE).play();

        InOrder inOrder = inOrder(source);
        for (RoundEntry r : game.rounds()) {
            inOrder.verify(source).roll(r.round() - 1L, r.roster().size());
        }
        verify(source, times(game.rounds().size())).roll(anyLong(), anyInt());
        verify(source, never()).order(anyLong(), anyList());
        // After round 2 a bot leaves: round 3 is rolled for one boat fewer.
        assertEquals(table, game.rounds().get(1).roster().size());
        assertEquals(1, game.rounds().get(1).departures().size());
        assertEquals(table - 1, game.rounds().get(2).roster().size());
        verify(source).roll(2L, table - 1);
    }

    @Test
    void rolls_lowestFaceActsFirstAndEveryRoundOrderFairForItsCount() {
        GameRecord game = botGame(provider, table, "veyra-dusk", RandomnessMode.SECURE, 2);
        Map<Integer, String> setByCount = new HashMap<>();
        for (RoundEntry r : game.rounds()) {
            // Ranking convention of the brief: lowest face value acts first.
            List<Integer> byFace = r.rolls().stream().sorted(Comparator.comparing(RollEntry::faceValue))
                    .map(RollEntry::seat).toList();
            assertEquals(r.order(), byFace, "round " + r.round());
            assertEquals(r.roster().size(), r.rolls().stream().map(RollEntry::faceValue).distinct().count());
            assertTrue(r.rolls().stream().allMatch(x -> x.faceIndex().signum() >= 0));
            assertEquals(FairnessGrade.ORDER_FAIR, r.grade(), "round " + r.round());
            // One set per player count: the set for the count now at the table.
            String before = setByCount.putIfAbsent(r.roster().size(), r.setId());
            assertEquals(before == null ? r.setId() : before, r.setId());
        }
        assertTrue(setByCount.size() >= 2, "a bot left, so two player counts were rolled: " + setByCount);
        assertEquals(1, setByCount.values().stream().filter(v -> v.equals(setByCount.get(table))).count());
    }
}
