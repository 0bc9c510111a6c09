package org.precedence.game.replay;

import java.util.List;
import org.precedence.game.MoveChooser;
import org.precedence.game.log.GameRecord;
import org.precedence.game.log.GameRecord.MoveEntry;
import org.precedence.game.log.GameRecord.RoundEntry;
import org.precedence.game.rules.GameState;
import org.precedence.game.rules.MalformedMoveException;
import org.precedence.game.rules.Move;
import org.precedence.game.rules.MoveParser;

/**
 * Plays every seat from the log, in the logged sequence. A seat that a bot played is also
 * asked of the bot, which must give the logged move: a bot game is then confirmed from its
 * seed alone.
 */
final class ScriptedSeats implements MoveChooser {
    private final GameRecord log;
    private final MoveChooser bot;
    private int round;
    private int cursor;

    ScriptedSeats(GameRecord log, MoveChooser bot) {
        this.log = log;
        this.bot = bot;
    }

    @Override
    public Move choose(GameState state, int seat, int round) {
        if (round != this.round) {
            this.round = round;
            cursor = 0;
        }
        RoundEntry entry = log.rounds().get(round - 1); // the listener has checked the round exists
        List<MoveEntry> moves = entry.moves();
        String name = state.boat(seat).name();
        if (cursor >= moves.size()) {
            throw new Mismatch("round " + round + ": " + name + " is to move, but the log has no more moves in this round");
        }
        MoveEntry logged = moves.get(cursor++);
        if (logged.seat() != seat) {
            throw new Mismatch("round " + round + ": " + name + " is to move, but the log has seat "
                    + logged.seat() + " moving");
        }
        Move move;
        try {
            move = MoveParser.parse(logged.move());
        } catch (MalformedMoveException e) {
            throw new Mismatch("round " + round + ": the log's move for " + name + " is not a move: " + e.getMessage());
        }
        if (log.seats().get(seat).bot()) {
            Move botMove = bot.choose(state, seat, round);
            if (!botMove.equals(move)) {
                throw new Mismatch("round " + round + ": " + name + " is a bot and plays '" + botMove.text()
                        + "', the log says '" + logged.move() + "'");
            }
        }
        return move;
    }

    /** Returns whether the round's logged moves were all used. */
    boolean usedAll(int roundNumber) {
        return roundNumber != round || cursor == log.rounds().get(roundNumber - 1).moves().size();
    }
}
