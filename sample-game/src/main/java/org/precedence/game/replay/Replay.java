package org.precedence.game.replay;

import java.util.ArrayList;
import java.util.List;
import java.util.stream.Collectors;
import org.precedence.api.OrderRule;
import org.precedence.api.PlayerRoll;
import org.precedence.api.RankingConvention;
import org.precedence.api.SessionSpec;
import org.precedence.api.TurnOrderProvider;
import org.precedence.game.GameSetup;
import org.precedence.game.MoveChooser;
import org.precedence.game.Seat;
import org.precedence.game.bots.Bots;
import org.precedence.game.log.GameRecord;
import org.precedence.game.log.GameRecord.RollEntry;
import org.precedence.game.log.GameRecord.RoundEntry;
import org.precedence.game.log.InvalidLogException;
import org.precedence.game.play.Match;
import org.precedence.game.play.RefusedMoveException;
import org.precedence.game.play.RoundStart;
import org.precedence.game.play.TableListener;
import org.precedence.game.rules.GameState;

/** Confirms a logged game against a fresh run. */
public final class Replay {
    private Replay() {
    }

    /**
     * Re-runs {@code log} with {@code provider} and compares.
     *
     * @throws InvalidLogException if the log's table or seed cannot be set up at all (bad
     *                             input, not a mismatch)
     */
    public static ReplayReport check(GameRecord log, TurnOrderProvider provider) throws InvalidLogException {
        GameSetup setup = setupOf(log);
        SessionSpec spec = setup.sessionSpec();
        List<String> lines = new ArrayList<>();
        int[] checked = {0};
        try {
            if (!spec.seed().matchesCommitment(log.seedCommitment())) {
                throw new Mismatch("the seed does not match the log's seed commitment " + log.seedCommitment());
            }
            if (log.rule() != OrderRule.FRESH_EACH_ROUND || log.convention() != RankingConvention.LOWEST_FIRST) {
                throw new Mismatch("the log's session (" + log.rule() + ", " + log.convention()
                        + ") is not the game's (FRESH_EACH_ROUND, LOWEST_FIRST)");
            }
            if (log.mode() != spec.mode()) {
                throw new Mismatch("the log's mode " + log.mode() + " is not the session's " + spec.mode());
            }
            MoveChooser bot = Bots.racer(Bots.seedFor(spec.seed()));
            ScriptedSeats script = new ScriptedSeats(log, bot);
            List<MoveChooser> choosers = new ArrayList<>();
            for (int i = 0; i < setup.players(); i++) {
                choosers.add(script);
            }
            TableListener checker = new TableListener() {
                @Override
                public void roundStarted(RoundStart start, GameState state) {
                    if (start.round() > 1 && !script.usedAll(start.round() - 1)) {
                        throw new Mismatch("round " + (start.round() - 1) + ": the log has more moves than the game");
                    }
                    compareStart(log, start, state);
                    checked[0] = start.round();
                    lines.add("round " + start.round() + ": order " + names(state, start.order()) + " matches");
                }
            };
            Match match = new Match(setup, provider.open(spec), provider.name(), choosers, checker);
            GameRecord again = match.play();
            compareEnd(log, again);
        } catch (Mismatch | RefusedMoveException e) {
            String verdict = "MISMATCH: " + e.getMessage();
            lines.add(verdict);
            return new ReplayReport(false, checked[0], lines, verdict);
        }
        GameRecord.ResultEntry r = log.result();
        String verdict = "replay matches: " + log.rounds().size() + " rounds, every order, roll and move; "
                + r.winnerName() + " wins (" + r.ending().description() + ")";
        lines.add(verdict);
        return new ReplayReport(true, checked[0], lines, verdict);
    }

    private static GameSetup setupOf(GameRecord log) throws InvalidLogException {
        try {
            List<Seat> seats = log.seats().stream().map(s -> new Seat(s.seat(), s.name(), s.bot())).toList();
            return new GameSetup(seats, log.seed(), log.mode(), log.maxRounds(), log.leaveAfterRound());
        } catch (IllegalArgumentException | NullPointerException e) {
            throw new InvalidLogException("the log's table cannot be set up: " + e.getMessage());
        }
    }

    private static void compareStart(GameRecord log, RoundStart start, GameState state) {
        int round = start.round();
        if (round > log.rounds().size()) {
            throw new Mismatch("round " + round + ": the game goes on, but the log ends after round "
                    + log.rounds().size());
        }
        RoundEntry logged = log.rounds().get(round - 1);
        if (logged.round() != round) {
            throw new Mismatch("round " + round + ": the log's entry is numbered " + logged.round());
        }
        if (!logged.roster().equals(start.roster())) {
            throw new Mismatch("round " + round + ": the boats in are " + names(state, start.roster())
                    + ", the log has " + logged.roster());
        }
        if (!logged.order().equals(start.order())) {
            throw new Mismatch("round " + round + ": the provider gives the order " + names(state, start.order())
                    + ", the log has " + names(state, logged.order()));
        }
        List<RollEntry> rolls = new ArrayList<>();
        for (PlayerRoll r : start.roll().rolls()) {
            rolls.add(new RollEntry(start.roster().get(r.player()), r.die(), r.faceIndex(), r.faceValue(), r.position()));
        }
        if (!logged.rolls().equals(rolls)) {
            throw new Mismatch("round " + round + ": the dice rolls differ from the log's");
        }
        if (!logged.setId().equals(start.roll().setId()) || logged.grade() != start.roll().grade()) {
            throw new Mismatch("round " + round + ": the provider rolls set " + start.roll().setId() + " ("
                    + start.roll().grade() + "), the log has " + logged.setId() + " (" + logged.grade() + ")");
        }
    }

    private static void compareEnd(GameRecord log, GameRecord again) {
        if (again.rounds().size() != log.rounds().size()) {
            throw new Mismatch("the game ends after round " + again.rounds().size() + ", the log goes on to round "
                    + log.rounds().size());
        }
        for (int i = 0; i < log.rounds().size(); i++) {
            RoundEntry a = again.rounds().get(i);
            RoundEntry b = log.rounds().get(i);
            if (!a.moves().equals(b.moves())) {
                throw new Mismatch("round " + (i + 1) + ": the log has more moves than the game");
            }
            if (!a.departures().equals(b.departures())) {
                throw new Mismatch("round " + (i + 1) + ": seats " + a.departures() + " leave, the log has "
                        + b.departures());
            }
        }
        if (!again.result().equals(log.result())) {
            throw new Mismatch("the result is " + again.result().winnerName() + " winning ("
                    + again.result().ending().description() + "), the log has " + log.result().winnerName()
                    + " winning (" + log.result().ending().description() + ")"
                    + (again.result().winner() == log.result().winner() ? " with other standings" : ""));
        }
    }

    private static String names(GameState state, List<Integer> seats) {
        return seats.stream().map(s -> s >= 0 && s < state.boats().size() ? state.boat(s).name() : "seat " + s)
                .collect(Collectors.joining(", "));
    }
}
