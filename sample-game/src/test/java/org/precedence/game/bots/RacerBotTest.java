package org.precedence.game.bots;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Collections;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.precedence.api.SessionSeed;
import org.precedence.game.MoveChooser;
import org.precedence.game.rules.Board;
import org.precedence.game.rules.Boat;
import org.precedence.game.rules.GameState;
import org.precedence.game.rules.Move;
import org.precedence.game.rules.Rules;

/** Positions worked by hand on the real board (glow per place as in {@link Board#VEYRA_SHOALS}). */
class RacerBotTest {
    private static final MoveChooser BOT = Bots.racer(Bots.seedFor(SessionSeed.fromText("veyra-dusk")));

    private static GameState position(List<Boat> boats, int... placeSeatPairs) {
        List<Integer> owners = new ArrayList<>(Collections.nCopies(Board.VEYRA_SHOALS.size(), GameState.DARK));
        for (int i = 0; i < placeSeatPairs.length; i += 2) {
            owners.set(placeSeatPairs[i], placeSeatPairs[i + 1]);
        }
        return GameState.of(Board.VEYRA_SHOALS, boats, owners);
    }

    @Test
    void choose_onDarkLanternWithOil_lights() {
        GameState s = position(List.of(new Boat(0, "Saltmoth", 4, 1, true), new Boat(1, "Tidewhistle", 0, 2, true)));
        assertEquals(new Move.Light(), BOT.choose(s, 0, 3));
    }

    @Test
    void choose_emptyHoldAwayFromLight_gathers() {
        GameState s = position(List.of(new Boat(0, "Saltmoth", 4, 0, true), new Boat(1, "Tidewhistle", 0, 2, true)));
        assertEquals(new Move.Gather(), BOT.choose(s, 0, 3));
    }

    @Test
    void choose_cannotReachTheLeader_retires() {
        // Tidewhistle owns everything but Cindermouth (21 - 1 = 20 glow); Saltmoth has 0 and could
        // at best light Cindermouth for 1: 0 + 1 < 20, so it concedes.
        int[] owners = new int[20];
        for (int p = 2, i = 0; p <= 11; p++, i += 2) {
            owners[i] = p;
            owners[i + 1] = 1;
        }
        GameState s = position(List.of(new Boat(0, "Saltmoth", 5, 2, true), new Boat(1, "Tidewhistle", 3, 2, true)),
                owners);
        assertEquals(new Move.Retire(), BOT.choose(s, 0, 8));
        assertNotEquals(new Move.Retire(), BOT.choose(s, 1, 8), "the leader never concedes");
    }

    @Test
    void choose_inHarbour_sailsAndIsAPureFunction() {
        GameState s = GameState.start(Board.VEYRA_SHOALS, List.of("Saltmoth", "Tidewhistle", "Emberkeel", "Brackenhull"));
        Set<Move> seen = new HashSet<>();
        for (int round = 1; round <= 20; round++) {
            for (int seat = 0; seat < 4; seat++) {
                Move m = BOT.choose(s, seat, round);
                assertTrue(m instanceof Move.Sail, m.text());
                assertTrue(Rules.refusal(s, seat, m).isEmpty());
                assertEquals(m, BOT.choose(s, seat, round), "same question, same answer");
                assertEquals(m, Bots.racer(Bots.seedFor(SessionSeed.fromText("veyra-dusk"))).choose(s, seat, round));
                seen.add(m);
            }
        }
        assertTrue(seen.size() >= 2, "boats in the same spot do not all sail alike: " + seen);
    }
}
