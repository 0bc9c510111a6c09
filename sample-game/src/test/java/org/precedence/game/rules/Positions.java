package org.precedence.game.rules;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;

/** Small hand-made positions on the real board, for worked examples. */
final class Positions {
    private Positions() {
    }

    static Boat boat(int seat, String name, int position, int oil) {
        return new Boat(seat, name, position, oil, true);
    }

    static Boat gone(int seat, String name) {
        return new Boat(seat, name, 0, 0, false);
    }

    /** Owners: pairs of (place, seat); every other lantern dark. */
    static GameState position(List<Boat> boats, int... placeSeatPairs) {
        List<Integer> owners = new ArrayList<>(Collections.nCopies(Board.VEYRA_SHOALS.size(), GameState.DARK));
        for (int i = 0; i < placeSeatPairs.length; i += 2) {
            owners.set(placeSeatPairs[i], placeSeatPairs[i + 1]);
        }
        return GameState.of(Board.VEYRA_SHOALS, boats, owners);
    }
}
