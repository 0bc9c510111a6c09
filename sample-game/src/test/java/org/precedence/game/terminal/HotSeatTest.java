package org.precedence.game.terminal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.BufferedReader;
import java.io.PrintWriter;
import java.io.StringReader;
import java.io.StringWriter;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.precedence.game.rules.Board;
import org.precedence.game.rules.GameState;
import org.precedence.game.rules.Move;

class HotSeatTest {

    private static final GameState START = GameState.start(Board.VEYRA_SHOALS, List.of("Saltmoth", "Tidewhistle"));

    private static String[] play(String typed, Move expected) {
        StringWriter text = new StringWriter();
        HotSeat seat = new HotSeat(new BufferedReader(new StringReader(typed)), new PrintWriter(text, true));
        GameState before = START;
        assertEquals(expected, seat.choose(START, 0, 1));
        assertEquals(before, START);
        return text.toString().split("\n");
    }

    @Test
    void choose_malformedAndIllegalInput_reasonThenSamePromptAgain() {
        String[] lines = play("jump\nsail 9\nlight\n\nsail 2\n", new Move.Sail(2));
        String prompt = "Saltmoth at Lowmarket Harbour, oil 2, glow 0 (0 lanterns). Your move (help lists them)> ";
        assertEquals(prompt + "  unknown move 'jump': type sail 1|2|3, light, gather or retire", lines[0]);
        assertEquals(prompt + "  a boat sails 1 to 3 places, got 9", lines[1]);
        assertEquals(prompt + "  not allowed: Lowmarket Harbour has no lantern to light", lines[2]);
        assertEquals(prompt + "  empty move: type sail 1|2|3, light, gather or retire", lines[3]);
        assertEquals(prompt, lines[4]);
        assertEquals(5, lines.length);
    }

    @Test
    void choose_helpAndBoard_showAndReprompt() {
        String[] lines = play("help\nboard\nGATHER\n", new Move.Gather());
        String all = String.join("\n", lines);
        assertTrue(all.contains("sail N  sail N places clockwise (N = 1, 2 or 3)"), all);
        assertTrue(all.contains(" 4 Saltkeel          glow 3  dark"), all);
        assertTrue(all.contains("Tidewhistle at Lowmarket Harbour, oil 2, glow 0 (0 lanterns)"), all);
    }

    @Test
    void choose_inputEnds_stopsWithRoundAndBoat() {
        HotSeat seat = new HotSeat(new BufferedReader(new StringReader("jump\n")), new PrintWriter(new StringWriter()));
        InputEndedException e = assertThrows(InputEndedException.class, () -> seat.choose(START, 1, 4));
        assertEquals("input ended in round 4 while Tidewhistle was to move", e.getMessage());
    }
}
