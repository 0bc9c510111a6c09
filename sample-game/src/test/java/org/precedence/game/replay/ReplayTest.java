package org.precedence.game.replay;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.BufferedReader;
import java.io.PrintWriter;
import java.io.StringReader;
import java.io.StringWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.function.UnaryOperator;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.precedence.api.RandomnessMode;
import org.precedence.api.TurnOrderProvider;
import org.precedence.game.GameSetup;
import org.precedence.game.fake.ShuffleProvider;
import org.precedence.game.log.GameLogFile;
import org.precedence.game.log.GameRecord;
import org.precedence.game.log.GameRecord.MoveEntry;
import org.precedence.game.log.GameRecord.ResultEntry;
import org.precedence.game.log.GameRecord.RoundEntry;
import org.precedence.game.log.InvalidLogException;
import org.precedence.game.play.Match;
import org.precedence.game.play.TableListener;
import org.precedence.game.terminal.HotSeat;

class ReplayTest {
    private static final TurnOrderProvider PROVIDER = new ShuffleProvider();

    static GameRecord botGame(TurnOrderProvider provider, int players, String seed, int leaveAfter) {
        GameSetup setup = GameSetup.of(players, players, seed, RandomnessMode.FAST, GameSetup.DEFAULT_MAX_ROUNDS,
                leaveAfter);
        return Match.open(setup, provider, s -> {
            throw new AssertionError("no humans");
        }, TableListener.NONE).play();
    }

    @Test
    void check_fullBotGameSavedAndRead_replaysIdentically(@TempDir Path dir) throws Exception {
        GameRecord game = botGame(PROVIDER, 5, "veyra-dusk", 0);
        Path log = dir.resolve("veyra-dusk.json");
        GameLogFile.write(log, game);
        GameRecord read = GameLogFile.read(log);
        assertEquals(game, read);
        ReplayReport report = Replay.check(read, PROVIDER);
        assertTrue(report.matches(), report.verdict());
        assertEquals(game.rounds().size(), report.roundsChecked());
        assertEquals(game.rounds().size() + 1, report.lines().size());
        // Same seed, fresh run: the very same game, move for move.
        assertEquals(game, botGame(PROVIDER, 5, "veyra-dusk", 0));
    }

    @Test
    void check_everyTableSizeWithAndWithoutDeparture_replays() throws InvalidLogException {
        for (int players = 2; players <= 8; players++) {
            for (int leave : new int[] {0, 3}) {
                GameRecord game = botGame(PROVIDER, players, "ledger-" + players, leave);
                ReplayReport report = Replay.check(game, PROVIDER);
                assertTrue(report.matches(), players + " players: " + report.verdict());
            }
        }
    }

    @Test
    void check_otherSeedGivesAnotherGame() {
        assertFalse(botGame(PROVIDER, 5, "veyra-dusk", 0).rounds()
                .equals(botGame(PROVIDER, 5, "veyra-dawn", 0).rounds()));
    }

    private static GameRecord withRound(GameRecord g, int index, UnaryOperator<RoundEntry> change) {
        List<RoundEntry> rounds = new ArrayList<>(g.rounds());
        rounds.set(index, change.apply(rounds.get(index)));
        return new GameRecord(g.format(), g.seed(), g.seedCommitment(), g.mode(), g.rule(), g.convention(),
                g.provider(), g.maxRounds(), g.leaveAfterRound(), g.seats(), rounds, g.result());
    }

    @Test
    void check_tamperedOrder_reportsTheRound() throws InvalidLogException {
        GameRecord game = botGame(PROVIDER, 4, "veyra-dusk", 0);
        GameRecord tampered = withRound(game, 1, r -> {
            List<Integer> order = new ArrayList<>(r.order());
            Collections.swap(order, 0, 1);
            return new RoundEntry(r.round(), r.roster(), r.setId(), r.grade(), r.rolls(), order, r.moves(),
                    r.departures());
        });
        ReplayReport report = Replay.check(tampered, PROVIDER);
        assertFalse(report.matches());
        assertEquals(1, report.roundsChecked());
        assertTrue(report.verdict().startsWith("MISMATCH: round 2: the provider gives the order "), report.verdict());
    }

    @Test
    void check_tamperedBotMove_reportsTheBot() throws InvalidLogException {
        GameRecord game = botGame(PROVIDER, 3, "veyra-dusk", 0);
        GameRecord tampered = withRound(game, 0, r -> {
            List<MoveEntry> moves = new ArrayList<>(r.moves());
            MoveEntry first = moves.get(0);
            moves.set(0, new MoveEntry(first.seat(), first.move().equals("gather") ? "sail 1" : "gather"));
            return new RoundEntry(r.round(), r.roster(), r.setId(), r.grade(), r.rolls(), r.order(), moves,
                    r.departures());
        });
        ReplayReport report = Replay.check(tampered, PROVIDER);
        assertFalse(report.matches());
        assertTrue(report.verdict().contains("round 1: ") && report.verdict().contains("is a bot and plays"),
                report.verdict());
    }

    @Test
    void check_tamperedResult_reportsTheResult() throws InvalidLogException {
        GameRecord g = botGame(PROVIDER, 3, "veyra-dusk", 0);
        ResultEntry r = g.result();
        int other = r.standings().get(1).seat();
        GameRecord tampered = new GameRecord(g.format(), g.seed(), g.seedCommitment(), g.mode(), g.rule(),
                g.convention(), g.provider(), g.maxRounds(), g.leaveAfterRound(), g.seats(), g.rounds(),
                new ResultEntry(other, r.standings().get(1).name(), r.ending(), r.rounds(), r.standings()));
        ReplayReport report = Replay.check(tampered, PROVIDER);
        assertFalse(report.matches());
        assertTrue(report.verdict().startsWith("MISMATCH: the result is " + r.winnerName() + " winning"),
                report.verdict());
    }

    @Test
    void check_seedNotMatchingCommitment_mismatch() throws InvalidLogException {
        GameRecord g = botGame(PROVIDER, 3, "veyra-dusk", 0);
        GameRecord tampered = new GameRecord(g.format(), "veyra-dawn", g.seedCommitment(), g.mode(), g.rule(),
                g.convention(), g.provider(), g.maxRounds(), g.leaveAfterRound(), g.seats(), g.rounds(), g.result());
        ReplayReport report = Replay.check(tampered, PROVIDER);
        assertFalse(report.matches());
        assertTrue(report.verdict().contains("seed commitment"), report.verdict());
    }

    @Test
    void check_truncatedLog_mismatch() throws InvalidLogException {
        GameRecord g = botGame(PROVIDER, 4, "veyra-dusk", 0);
        GameRecord cut = new GameRecord(g.format(), g.seed(), g.seedCommitment(), g.mode(), g.rule(), g.convention(),
                g.provider(), g.maxRounds(), g.leaveAfterRound(), g.seats(),
                g.rounds().subList(0, g.rounds().size() - 1), g.result());
        ReplayReport report = Replay.check(cut, PROVIDER);
        assertFalse(report.matches());
        assertTrue(report.verdict().contains("the log ends after round"), report.verdict());
    }

    @Test
    void check_logWithImpossibleTable_isInvalidInput() {
        GameRecord g = botGame(PROVIDER, 2, "veyra-dusk", 0);
        GameRecord bad = new GameRecord(g.format(), g.seed(), g.seedCommitment(), g.mode(), g.rule(), g.convention(),
                g.provider(), 0, g.leaveAfterRound(), g.seats(), g.rounds(), g.result());
        InvalidLogException e = assertThrows(InvalidLogException.class, () -> Replay.check(bad, PROVIDER));
        assertEquals("the log's table cannot be set up: a game lasts 1 to 99 rounds, got 0", e.getMessage());
    }

    @Test
    void check_hotSeatGame_replaysFromTheLoggedMoves() throws InvalidLogException {
        GameSetup setup = GameSetup.of(3, 2, "veyra-dusk", RandomnessMode.FAST, 6, 0);
        String typed = "sail 2\nlight\nsail 2\nlight\ngather\nsail 3\nlight\nsail 1\n".repeat(2);
        PrintWriter out = new PrintWriter(new StringWriter());
        HotSeat person = new HotSeat(new BufferedReader(new StringReader(typed)), out);
        GameRecord game = Match.open(setup, PROVIDER, s -> person, TableListener.NONE).play();
        assertEquals("sail 2", game.rounds().get(0).moves().stream().filter(m -> m.seat() == 0).findFirst()
                .orElseThrow().move());
        ReplayReport report = Replay.check(game, PROVIDER);
        assertTrue(report.matches(), report.verdict());
    }
}
