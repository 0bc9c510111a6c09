package org.precedence.game.rules;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.precedence.game.rules.Positions.boat;
import static org.precedence.game.rules.Positions.gone;
import static org.precedence.game.rules.Positions.position;

import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * The winner on small positions worked by hand. Glow per place on the board: 1 Cindermouth 1,
 * 2 Gullstair 2, 3 Brinehollow 1, 4 Saltkeel 3, 5 Mosslantern 2, 6 Tallowmere 1, 7 Wickfen 3,
 * 8 Emberquay 2, 9 Driftmoor 1, 10 Smokecairn 3, 11 Glimmerstrand 2.
 */
class OutcomeTest {

    @Test
    void decide_mostGlowWins() {
        // Saltmoth: Saltkeel 3 + Cindermouth 1 = 4; Tidewhistle: Wickfen 3 + Gullstair 2 = 5;
        // Emberkeel: Smokecairn 3 = 3. Tidewhistle wins although it acted last.
        GameState s = position(List.of(boat(0, "Saltmoth", 0, 1), boat(1, "Tidewhistle", 0, 1),
                boat(2, "Emberkeel", 0, 1)), 4, 0, 1, 0, 7, 1, 2, 1, 10, 2);
        Outcome o = Outcome.decide(s, Ending.ROUNDS_OUT, List.of(0, 2, 1));
        assertEquals(1, o.winner());
        assertEquals(List.of(1, 0, 2), o.standings().stream().map(Standing::seat).toList());
        assertEquals(5, o.winning().score());
        assertEquals(2, o.winning().lanterns());
    }

    @Test
    void decide_equalGlow_moreLanternsWins() {
        // Saltmoth: Saltkeel 3 + Gullstair 2 = 5 in 2; Tidewhistle: Wickfen 3 + Cindermouth 1 +
        // Brinehollow 1 = 5 in 3. Tidewhistle wins on lanterns.
        GameState s = position(List.of(boat(0, "Saltmoth", 0, 3), boat(1, "Tidewhistle", 0, 0)),
                4, 0, 2, 0, 7, 1, 1, 1, 3, 1);
        assertEquals(1, Outcome.decide(s, Ending.ALL_LIT, List.of(0, 1)).winner());
    }

    @Test
    void decide_equalGlowAndLanterns_moreOilWins() {
        // Saltkeel 3 vs Wickfen 3, one lantern each; oil 1 against 2.
        GameState s = position(List.of(boat(0, "Saltmoth", 0, 1), boat(1, "Tidewhistle", 0, 2)), 4, 0, 7, 1);
        assertEquals(1, Outcome.decide(s, Ending.ROUNDS_OUT, List.of(0, 1)).winner());
    }

    @Test
    void decide_fullTie_earliestInFinalRoundWins() {
        // Mosslantern 2 vs Emberquay 2, same oil: the final round's die roll decides.
        GameState s = position(List.of(boat(0, "Saltmoth", 0, 1), boat(1, "Tidewhistle", 0, 1),
                boat(2, "Emberkeel", 0, 1)), 5, 0, 8, 1);
        assertEquals(1, Outcome.decide(s, Ending.ROUNDS_OUT, List.of(2, 1, 0)).winner());
        assertEquals(0, Outcome.decide(s, Ending.ROUNDS_OUT, List.of(0, 2, 1)).winner());
    }

    @Test
    void decide_boatThatLeft_cannotWinAndComesLast() {
        // Emberkeel left with full oil; the two still in have no lanterns: the earlier one wins.
        GameState s = position(List.of(gone(0, "Emberkeel"), boat(1, "Saltmoth", 0, 0), boat(2, "Tidewhistle", 0, 0)));
        Outcome o = Outcome.decide(s, Ending.ROUNDS_OUT, List.of(2, 1));
        assertEquals(2, o.winner());
        assertEquals(List.of(2, 1, 0), o.standings().stream().map(Standing::seat).toList());
    }

    @Test
    void decide_activeBoatMissingFromOrder_rejected() {
        GameState s = position(List.of(boat(0, "Saltmoth", 0, 1), boat(1, "Tidewhistle", 0, 1)));
        assertThrows(IllegalArgumentException.class, () -> Outcome.decide(s, Ending.ROUNDS_OUT, List.of(0)));
    }
}
