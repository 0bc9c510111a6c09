package org.precedence.game.terminal;

import java.util.ArrayList;
import java.util.List;
import org.precedence.game.rules.Boat;
import org.precedence.game.rules.GameState;
import org.precedence.game.rules.Island;

/** Draws the board and the boats as text lines. */
final class BoardView {
    private BoardView() {
    }

    /** One line per place: its lantern and the boats lying there. */
    static List<String> board(GameState state) {
        List<String> lines = new ArrayList<>();
        for (Island island : state.board().places()) {
            String lantern;
            if (!island.hasLantern()) {
                lantern = "harbour";
            } else if (state.owner(island.position()) == GameState.DARK) {
                lantern = "glow " + island.glow() + "  dark";
            } else {
                lantern = "glow " + island.glow() + "  lit by " + state.boat(state.owner(island.position())).name();
            }
            List<String> here = new ArrayList<>();
            for (Boat b : state.boats()) {
                if (b.active() && b.position() == island.position()) {
                    here.add(b.name());
                }
            }
            lines.add(String.format("  %2d %-17s %-26s %s", island.position(), island.name(), lantern,
                    here.isEmpty() ? "" : "<- " + String.join(", ", here)).stripTrailing());
        }
        return lines;
    }

    /** One line for one boat: where it lies, its oil and its glow. */
    static String boat(GameState state, int seat) {
        Boat b = state.boat(seat);
        if (!b.active()) {
            return b.name() + " has left the game";
        }
        return b.name() + " at " + state.board().place(b.position()).name() + ", oil " + b.oil() + ", glow "
                + state.score(seat) + " (" + state.lanterns(seat) + " lantern" + (state.lanterns(seat) == 1 ? "" : "s")
                + ")";
    }
}
