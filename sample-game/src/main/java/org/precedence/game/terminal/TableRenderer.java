package org.precedence.game.terminal;

import java.io.PrintWriter;
import java.util.List;
import java.util.Objects;
import java.util.stream.Collectors;
import org.precedence.api.PlayerRoll;
import org.precedence.api.RankingConvention;
import org.precedence.game.GameSetup;
import org.precedence.game.play.RoundStart;
import org.precedence.game.play.TableListener;
import org.precedence.game.rules.GameState;
import org.precedence.game.rules.Move;
import org.precedence.game.rules.Outcome;
import org.precedence.game.rules.Standing;

/**
 * Prints the table. With {@code verbose} off it prints only the opening lines and the result.
 * Rounds are always shown with their die rolls first, because the table's promise is that
 * everyone sees why the order is what it is before anyone moves.
 */
public final class TableRenderer implements TableListener {
    private final PrintWriter out;
    private final boolean verbose;
    private RankingConvention convention = RankingConvention.LOWEST_FIRST;
    private int maxRounds;

    /**
     * @param out     where to print
     * @param verbose whether to print every round (rolls, moves, board) or just the result
     */
    public TableRenderer(PrintWriter out, boolean verbose) {
        this.out = Objects.requireNonNull(out, "out");
        this.verbose = verbose;
    }

    @Override
    public void gameStarted(GameSetup setup, String providerName, GameState state) {
        convention = setup.sessionSpec().convention();
        maxRounds = setup.maxRounds();
        String table = setup.seats().stream().map(s -> s.name() + (s.bot() ? " (bot)" : " (you)"))
                .collect(Collectors.joining(", "));
        out.println("Shoal Lights: " + setup.players() + " boats leave Lowmarket Harbour to light the Veyra Shoals.");
        out.println("Table: " + table);
        out.println("Session: seed commitment " + setup.sessionSpec().seed().commitment() + ", "
                + setup.mode().name().toLowerCase(java.util.Locale.ROOT) + " mode, turn order by " + providerName);
        if (verbose) {
            BoardView.board(state).forEach(out::println);
        }
        out.flush();
    }

    @Override
    public void roundStarted(RoundStart start, GameState state) {
        if (!verbose) {
            return;
        }
        out.println();
        out.println("== Round " + start.round() + " of at most " + maxRounds + ": " + start.roster().size()
                + " boats roll set " + start.roll().setId() + " (" + start.roll().grade() + "), "
                + (convention == RankingConvention.LOWEST_FIRST ? "lowest" : "highest") + " face acts first ==");
        int width = start.roster().stream().mapToInt(s -> state.boat(s).name().length()).max().orElse(8);
        int faceWidth = start.roll().rolls().stream().mapToInt(r -> r.faceValue().toString().length()).max().orElse(1);
        for (PlayerRoll r : start.roll().rolls()) {
            String name = state.boat(start.roster().get(r.player())).name();
            out.printf("   %-" + width + "s  die %-2s  face %" + faceWidth + "s  -> acts %s%n", name, r.die(),
                    r.faceValue(), Ordinals.of(r.position()));
        }
        out.println("   Order: " + names(state, start.order()));
        out.flush();
    }

    @Override
    public void moved(int round, int seat, Move move, GameState before, GameState after) {
        if (!verbose) {
            return;
        }
        String name = before.boat(seat).name();
        String here = after.board().place(after.boat(seat).position()).name();
        String line;
        if (move instanceof Move.Sail sail) {
            line = name + " sails " + sail.distance() + " to " + here + ".";
        } else if (move instanceof Move.Light) {
            line = name + " lights " + here + " (+" + after.board().place(after.boat(seat).position()).glow()
                    + " glow, now " + after.score(seat) + ").";
        } else if (move instanceof Move.Gather) {
            line = name + " gathers oil at " + here + " (oil " + after.boat(seat).oil() + ").";
        } else {
            line = name + " retires; its lanterns go dark.";
        }
        out.println("   " + line);
        out.flush();
    }

    @Override
    public void departed(int round, int seat, GameState after) {
        if (!verbose) {
            return;
        }
        out.println("   " + after.boat(seat).name() + " leaves the table after round " + round
                + "; its lanterns go dark and the next round is rolled for " + after.activeSeats().size() + " boats.");
        out.flush();
    }

    @Override
    public void gameEnded(Outcome outcome, GameState state, int rounds) {
        if (verbose) {
            out.println();
            BoardView.board(state).forEach(out::println);
        }
        out.println();
        Standing w = outcome.winning();
        out.println("Result after " + rounds + " round" + (rounds == 1 ? "" : "s") + " (" + outcome.ending().description()
                + "): " + w.name() + " wins with " + w.score() + " glow.");
        int place = 1;
        for (Standing s : outcome.standings()) {
            if (s.active()) {
                out.printf("  %d. %-12s %2d glow  %d lantern%s  %d oil%n", place++, s.name(), s.score(), s.lanterns(),
                        s.lanterns() == 1 ? " " : "s", s.oil());
            } else {
                out.printf("  -  %-12s left the game%n", s.name());
            }
        }
        out.flush();
    }

    /** Prints the board and every boat's line (for the hot-seat "board" command). */
    void showBoard(GameState state) {
        BoardView.board(state).forEach(out::println);
        for (int seat = 0; seat < state.boats().size(); seat++) {
            out.println("  " + BoardView.boat(state, seat));
        }
        out.flush();
    }

    private static String names(GameState state, List<Integer> seats) {
        return seats.stream().map(s -> state.boat(s).name()).collect(Collectors.joining(" > "));
    }
}
