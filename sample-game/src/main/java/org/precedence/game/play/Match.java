package org.precedence.game.play;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import java.util.function.IntFunction;
import org.precedence.api.PlayerRoll;
import org.precedence.api.SessionSeed;
import org.precedence.api.SessionSpec;
import org.precedence.api.TurnOrderProvider;
import org.precedence.api.TurnOrderSource;
import org.precedence.game.GameSetup;
import org.precedence.game.MoveChooser;
import org.precedence.game.Seat;
import org.precedence.game.bots.Bots;
import org.precedence.game.log.GameRecord;
import org.precedence.game.log.GameRecord.MoveEntry;
import org.precedence.game.log.GameRecord.ResultEntry;
import org.precedence.game.log.GameRecord.RollEntry;
import org.precedence.game.log.GameRecord.RoundEntry;
import org.precedence.game.log.GameRecord.SeatEntry;
import org.precedence.game.rules.Board;
import org.precedence.game.rules.Ending;
import org.precedence.game.rules.GameState;
import org.precedence.game.rules.IllegalMoveException;
import org.precedence.game.rules.Move;
import org.precedence.game.rules.Outcome;
import org.precedence.game.rules.Rules;

/**
 * One game of Shoal Lights from the first round to the result.
 *
 * <p>Each round: take the roster of boats still in; roll the round once with the turn-order
 * source; tell the listener the rolls; let each boat in acting order make one move (boats that
 * retire during the round are skipped); apply the setup's departure if this is its round; stop
 * when the rules say the game is over.
 */
public final class Match {
    private final GameSetup setup;
    private final TurnOrderSource source;
    private final String providerName;
    private final List<MoveChooser> choosers;
    private final TableListener listener;

    /**
     * @param setup        the table
     * @param source       the session's turn orders, opened with {@link GameSetup#sessionSpec()}
     * @param providerName the provider's name, for the log
     * @param choosers     one chooser per seat
     * @param listener     hears every event
     */
    public Match(GameSetup setup, TurnOrderSource source, String providerName, List<MoveChooser> choosers,
            TableListener listener) {
        this.setup = Objects.requireNonNull(setup, "setup");
        this.source = Objects.requireNonNull(source, "source");
        this.providerName = Objects.requireNonNull(providerName, "providerName");
        this.choosers = List.copyOf(choosers);
        this.listener = Objects.requireNonNull(listener, "listener");
        if (this.choosers.size() != setup.players()) {
            throw new IllegalArgumentException("one chooser per seat expected: " + setup.players()
                    + " seats, " + this.choosers.size() + " choosers");
        }
    }

    /**
     * Sets up a game the usual way: opens the session with {@code provider}, seats a bot
     * (seeded from the session seed) at every bot seat and asks {@code humanSeat} for the
     * chooser of every other seat.
     *
     * @throws IllegalArgumentException if the provider cannot serve the table's size
     */
    public static Match open(GameSetup setup, TurnOrderProvider provider, IntFunction<MoveChooser> humanSeat,
            TableListener listener) {
        if (setup.players() > provider.maxPlayers()) {
            throw new IllegalArgumentException("the turn-order provider " + provider.name() + " serves at most "
                    + provider.maxPlayers() + " players, the table has " + setup.players());
        }
        SessionSpec spec = setup.sessionSpec();
        return new Match(setup, provider.open(spec), provider.name(), choosers(setup, spec.seed(), humanSeat),
                listener);
    }

    /** Returns one chooser per seat: the seeded bot for bot seats, {@code humanSeat} for the others. */
    public static List<MoveChooser> choosers(GameSetup setup, SessionSeed seed, IntFunction<MoveChooser> humanSeat) {
        MoveChooser bot = Bots.racer(Bots.seedFor(seed));
        List<MoveChooser> list = new ArrayList<>();
        for (Seat s : setup.seats()) {
            list.add(s.bot() ? bot : humanSeat.apply(s.index()));
        }
        return list;
    }

    /**
     * Plays the game to the end.
     *
     * @throws RefusedMoveException if a chooser hands in a move the rules refuse
     */
    public GameRecord play() {
        GameState state = GameState.start(Board.VEYRA_SHOALS, setup.seats().stream().map(Seat::name).toList());
        listener.gameStarted(setup, providerName, state);
        List<RoundEntry> rounds = new ArrayList<>();
        Optional<Ending> ending = Optional.empty();
        List<Integer> lastOrder = List.of();
        int round = 0;
        while (ending.isEmpty()) {
            round++;
            RoundStart start = RoundOrder.draw(source, round, state.activeSeats());
            listener.roundStarted(start, state);
            List<MoveEntry> moves = new ArrayList<>();
            for (int seat : start.order()) {
                if (!state.boat(seat).active()) {
                    continue; // retired earlier this round
                }
                Move move = choosers.get(seat).choose(state, seat, round);
                GameState next = apply(state, seat, move, round);
                listener.moved(round, seat, move, state, next);
                moves.add(new MoveEntry(seat, move.text()));
                state = next;
            }
            List<Integer> departures = new ArrayList<>();
            Optional<Integer> leaving = LeaveRule.whoLeaves(setup, state, round);
            if (leaving.isPresent()) {
                state = apply(state, leaving.get(), new Move.Retire(), round);
                departures.add(leaving.get());
                listener.departed(round, leaving.get(), state);
            }
            rounds.add(entry(start, moves, departures));
            lastOrder = start.order();
            ending = Rules.ending(state, round, setup.maxRounds());
        }
        Outcome outcome = Outcome.decide(state, ending.get(), lastOrder);
        listener.gameEnded(outcome, state, round);
        return record(rounds, new ResultEntry(outcome.winner(), outcome.winning().name(), outcome.ending(), round,
                outcome.standings()));
    }

    private GameState apply(GameState state, int seat, Move move, int round) {
        try {
            return Rules.apply(state, seat, move);
        } catch (IllegalMoveException e) {
            throw new RefusedMoveException("round " + round + ": " + state.boat(seat).name() + "'s move '"
                    + move.text() + "' is refused: " + e.getMessage());
        }
    }

    private static RoundEntry entry(RoundStart start, List<MoveEntry> moves, List<Integer> departures) {
        List<RollEntry> rolls = new ArrayList<>();
        for (PlayerRoll r : start.roll().rolls()) {
            rolls.add(new RollEntry(start.roster().get(r.player()), r.die(), r.faceIndex(), r.faceValue(),
                    r.position()));
        }
        return new RoundEntry(start.round(), start.roster(), start.roll().setId(), start.roll().grade(), rolls,
                start.order(), moves, departures);
    }

    private GameRecord record(List<RoundEntry> rounds, ResultEntry result) {
        SessionSpec spec = setup.sessionSpec();
        List<SeatEntry> seats = setup.seats().stream().map(s -> new SeatEntry(s.index(), s.name(), s.bot())).toList();
        return new GameRecord(GameRecord.FORMAT, setup.seedText(), spec.seed().commitment(), spec.mode(), spec.rule(),
                spec.convention(), providerName, setup.maxRounds(), setup.leaveAfterRound(), seats, rounds, result);
    }
}
