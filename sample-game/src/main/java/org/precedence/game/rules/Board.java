package org.precedence.game.rules;

import java.util.List;

/**
 * The Veyra Shoals: a ring of twelve places, sailed clockwise. Place 0 is Lowmarket Harbour,
 * where every boat starts and which has no lantern. The board is the same in every game. From
 * Gullstair on, every three neighbouring islands hold exactly 6 glow, so once out of the
 * harbour no sailing distance is better than another in general: the race decides.
 */
public final class Board {
    /** The one board of the game. */
    public static final Board VEYRA_SHOALS = new Board(List.of(
            new Island(0, "Lowmarket Harbour", 0),
            new Island(1, "Cindermouth", 1),
            new Island(2, "Gullstair", 2),
            new Island(3, "Brinehollow", 1),
            new Island(4, "Saltkeel", 3),
            new Island(5, "Mosslantern", 2),
            new Island(6, "Tallowmere", 1),
            new Island(7, "Wickfen", 3),
            new Island(8, "Emberquay", 2),
            new Island(9, "Driftmoor", 1),
            new Island(10, "Smokecairn", 3),
            new Island(11, "Glimmerstrand", 2)));

    private final List<Island> places;

    Board(List<Island> places) {
        this.places = List.copyOf(places);
        for (int i = 0; i < this.places.size(); i++) {
            if (this.places.get(i).position() != i) {
                throw new IllegalArgumentException("place " + i + " has position " + this.places.get(i).position());
            }
        }
    }

    /** Returns the number of places on the ring. */
    public int size() {
        return places.size();
    }

    /** Returns the place at {@code position}. */
    public Island place(int position) {
        return places.get(position);
    }

    /** Returns all places in ring order. */
    public List<Island> places() {
        return places;
    }

    /** Returns the position reached by sailing {@code distance} places clockwise from {@code from}. */
    public int sail(int from, int distance) {
        return Math.floorMod(from + distance, places.size());
    }

    /** Returns the sum of the glow of every lantern on the board. */
    public int totalGlow() {
        return places.stream().mapToInt(Island::glow).sum();
    }
}
