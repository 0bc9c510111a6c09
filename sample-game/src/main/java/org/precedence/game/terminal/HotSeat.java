package org.precedence.game.terminal;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.UncheckedIOException;
import java.util.Locale;
import java.util.Objects;
import java.util.Optional;
import org.precedence.game.MoveChooser;
import org.precedence.game.rules.GameState;
import org.precedence.game.rules.MalformedMoveException;
import org.precedence.game.rules.Move;
import org.precedence.game.rules.MoveParser;
import org.precedence.game.rules.Rules;

/**
 * People taking turns at one terminal. Each prompt names the boat to move; {@code help} lists
 * the moves, {@code board} shows the board; anything malformed or refused by the rules gets a
 * one-line reason and the same prompt again, and the game is left as it was.
 */
public final class HotSeat implements MoveChooser {
    private final BufferedReader in;
    private final PrintWriter out;
    private final TableRenderer table;

    /**
     * @param in  where moves are read from, one per line
     * @param out where prompts and reasons go
     */
    public HotSeat(BufferedReader in, PrintWriter out) {
        this.in = Objects.requireNonNull(in, "in");
        this.out = Objects.requireNonNull(out, "out");
        this.table = new TableRenderer(out, true);
    }

    @Override
    public Move choose(GameState state, int seat, int round) {
        while (true) {
            out.print(BoardView.boat(state, seat) + ". Your move (help lists them)> ");
            out.flush();
            String line = readLine();
            if (line == null) {
                throw new InputEndedException("input ended in round " + round + " while " + state.boat(seat).name()
                        + " was to move");
            }
            String word = line.trim().toLowerCase(Locale.ROOT);
            if (word.equals("help")) {
                out.println("  sail N  sail N places clockwise (N = 1, 2 or 3)");
                out.println("  light   light the dark lantern where you lie (costs " + Rules.LIGHT_COST
                        + " oil, scores its glow)");
                out.println("  gather  take on 1 oil (hold: at most " + Rules.MAX_OIL + ")");
                out.println("  retire  leave the game; your lanterns go dark");
                out.println("  board   show the board and every boat");
                continue;
            }
            if (word.equals("board")) {
                table.showBoard(state);
                continue;
            }
            Move move;
            try {
                move = MoveParser.parse(line);
            } catch (MalformedMoveException e) {
                out.println("  " + e.getMessage());
                continue;
            }
            Optional<String> refusal = Rules.refusal(state, seat, move);
            if (refusal.isPresent()) {
                out.println("  not allowed: " + refusal.get());
                continue;
            }
            return move;
        }
    }

    private String readLine() {
        try {
            return in.readLine();
        } catch (IOException e) {
            throw new UncheckedIOException("cannot read the next move", e);
        }
    }
}
