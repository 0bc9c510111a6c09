package org.precedence.game.rules;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.precedence.game.rules.Positions.boat;
import static org.precedence.game.rules.Positions.gone;
import static org.precedence.game.rules.Positions.position;

import java.util.List;
import java.util.Optional;
import org.junit.jupiter.api.Test;

/** Worked by hand on the printed board (place numbers and glow as in {@link Board#VEYRA_SHOALS}). */
class RulesTest {

    private static final Board B = Board.VEYRA_SHOALS;

    @Test
    void board_threeNeighbouringIslandsFromGullstair_holdSixGlow() {
        for (int start = 2; start + 2 < B.size(); start++) {
            int sum = B.place(start).glow() + B.place(start + 1).glow() + B.place(start + 2).glow();
            assertEquals(6, sum, "islands " + start + ".." + (start + 2));
        }
        assertEquals(21, B.totalGlow());
        assertFalse(B.place(0).hasLantern());
    }

    @Test
    void start_everyBoatInHarbourWithStartingOil() {
        GameState s = GameState.start(B, List.of("Saltmoth", "Tidewhistle"));
        assertEquals(List.of(0, 1), s.activeSeats());
        assertEquals(0, s.boat(1).position());
        assertEquals(Rules.START_OIL, s.boat(1).oil());
        assertEquals(21, s.darkGlow());
    }

    @Test
    void apply_light_scoresGlowAndCostsOil() throws IllegalMoveException {
        GameState s = position(List.of(boat(0, "Saltmoth", 4, 2), boat(1, "Tidewhistle", 4, 2)));
        GameState next = Rules.apply(s, 0, new Move.Light());
        assertEquals(0, next.owner(4));
        assertEquals(3, next.score(0)); // Saltkeel glows 3
        assertEquals(1, next.boat(0).oil());
        assertEquals(18, next.darkGlow());
        // The second boat at the same island comes too late: first to act wins the race.
        IllegalMoveException late = assertThrows(IllegalMoveException.class, () -> Rules.apply(next, 1, new Move.Light()));
        assertEquals("Saltkeel is already lit by Saltmoth", late.getMessage());
    }

    @Test
    void apply_illegalMoves_refusedWithReasonAndStateUnchanged() {
        GameState s = position(List.of(boat(0, "Saltmoth", 4, 0), boat(1, "Tidewhistle", 0, 3),
                boat(2, "Emberkeel", 7, 1), gone(3, "Brackenhull")), 7, 2);
        GameState copy = position(List.of(boat(0, "Saltmoth", 4, 0), boat(1, "Tidewhistle", 0, 3),
                boat(2, "Emberkeel", 7, 1), gone(3, "Brackenhull")), 7, 2);
        assertRefused(s, 0, new Move.Light(), "no oil left to light Saltkeel: gather first");
        assertRefused(s, 1, new Move.Light(), "Lowmarket Harbour has no lantern to light");
        assertRefused(s, 1, new Move.Gather(), "the hold is full (3 oil)");
        assertRefused(s, 2, new Move.Light(), "Wickfen is already your light");
        assertRefused(s, 3, new Move.Sail(1), "Brackenhull has left the game");
        assertRefused(s, 4, new Move.Sail(1), "there is no seat 4");
        assertEquals(copy, s);
    }

    private static void assertRefused(GameState s, int seat, Move move, String reason) {
        assertEquals(Optional.of(reason), Rules.refusal(s, seat, move));
        IllegalMoveException e = assertThrows(IllegalMoveException.class, () -> Rules.apply(s, seat, move));
        assertEquals(reason, e.getMessage());
    }

    @Test
    void apply_sail_wrapsAroundTheRing() throws IllegalMoveException {
        GameState s = position(List.of(boat(0, "Saltmoth", 11, 1), boat(1, "Tidewhistle", 0, 1)));
        assertEquals(2, Rules.apply(s, 0, new Move.Sail(3)).boat(0).position()); // 11 -> 0 -> 1 -> 2
        assertEquals(1, Rules.apply(s, 1, new Move.Sail(1)).boat(1).position());
    }

    @Test
    void apply_gather_addsOneOil() throws IllegalMoveException {
        GameState s = position(List.of(boat(0, "Saltmoth", 3, 2), boat(1, "Tidewhistle", 0, 1)));
        assertEquals(3, Rules.apply(s, 0, new Move.Gather()).boat(0).oil());
    }

    @Test
    void apply_retire_darkensTheBoatsLanterns() throws IllegalMoveException {
        GameState s = position(List.of(boat(0, "Saltmoth", 3, 2), boat(1, "Tidewhistle", 0, 1),
                boat(2, "Emberkeel", 5, 1)), 4, 0, 10, 0, 7, 1);
        GameState next = Rules.apply(s, 0, new Move.Retire());
        assertFalse(next.boat(0).active());
        assertEquals(List.of(1, 2), next.activeSeats());
        assertEquals(GameState.DARK, next.owner(4));
        assertEquals(GameState.DARK, next.owner(10));
        assertEquals(1, next.owner(7));
        assertEquals(0, next.score(0));
        assertEquals(21 - 3, next.darkGlow()); // only Wickfen (3) stays lit
    }

    @Test
    void apply_retireOfLastBoat_refused() throws IllegalMoveException {
        GameState s = position(List.of(boat(0, "Saltmoth", 3, 2), boat(1, "Tidewhistle", 0, 1)));
        GameState one = Rules.apply(s, 0, new Move.Retire());
        assertRefused(one, 1, new Move.Retire(), "the last boat in the game cannot retire");
    }

    @Test
    void ending_eachReason() {
        GameState open = position(List.of(boat(0, "Saltmoth", 3, 2), boat(1, "Tidewhistle", 0, 1)));
        assertEquals(Optional.empty(), Rules.ending(open, 3, 12));
        assertEquals(Optional.of(Ending.ROUNDS_OUT), Rules.ending(open, 12, 12));
        GameState lit = position(List.of(boat(0, "Saltmoth", 3, 2), boat(1, "Tidewhistle", 0, 1)),
                1, 0, 2, 0, 3, 0, 4, 0, 5, 0, 6, 1, 7, 1, 8, 1, 9, 1, 10, 1, 11, 1);
        assertTrue(lit.allLit());
        assertEquals(Optional.of(Ending.ALL_LIT), Rules.ending(lit, 5, 12));
        GameState alone = position(List.of(boat(0, "Saltmoth", 3, 2), gone(1, "Tidewhistle")));
        assertEquals(Optional.of(Ending.LAST_BOAT), Rules.ending(alone, 5, 12));
    }

    @Test
    void apply_returnsNewStateAndKeepsTheOld() throws IllegalMoveException {
        GameState s = position(List.of(boat(0, "Saltmoth", 3, 2), boat(1, "Tidewhistle", 0, 1)));
        GameState before = s;
        Rules.apply(s, 0, new Move.Sail(2));
        assertSame(before, s);
        assertEquals(3, s.boat(0).position());
    }
}
