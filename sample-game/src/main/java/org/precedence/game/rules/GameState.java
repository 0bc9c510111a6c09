package org.precedence.game.rules;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Objects;

/**
 * The whole position of a game between two moves: where every boat lies, its oil, whether it
 * is still in, and who owns which lantern. Immutable: moves make new states.
 */
public final class GameState {
    /** Owner value of a dark lantern. */
    public static final int DARK = -1;

    private final Board board;
    private final List<Boat> boats;
    private final List<Integer> owners;

    GameState(Board board, List<Boat> boats, List<Integer> owners) {
        this.board = Objects.requireNonNull(board, "board");
        this.boats = List.copyOf(boats);
        this.owners = List.copyOf(owners);
        if (this.owners.size() != board.size()) {
            throw new IllegalArgumentException("one owner entry per place expected");
        }
        for (int i = 0; i < this.boats.size(); i++) {
            if (this.boats.get(i).seat() != i) {
                throw new IllegalArgumentException("boat " + i + " sits in seat " + this.boats.get(i).seat());
            }
        }
    }

    /** The opening position: every boat in the harbour with the starting oil, every lantern dark. */
    public static GameState start(Board board, List<String> boatNames) {
        List<Boat> boats = new ArrayList<>(boatNames.size());
        for (int i = 0; i < boatNames.size(); i++) {
            boats.add(new Boat(i, boatNames.get(i), 0, Rules.START_OIL, true));
        }
        return new GameState(board, boats, Collections.nCopies(board.size(), DARK));
    }

    /**
     * A position given in full, for tests and worked examples.
     *
     * @param owners per place, the owning seat or {@link #DARK}
     */
    public static GameState of(Board board, List<Boat> boats, List<Integer> owners) {
        for (int p = 0; p < owners.size(); p++) {
            int owner = owners.get(p);
            if (owner != DARK && (owner < 0 || owner >= boats.size() || !board.place(p).hasLantern())) {
                throw new IllegalArgumentException("place " + p + " cannot be owned by " + owner);
            }
        }
        return new GameState(board, boats, owners);
    }

    /** Returns the board. */
    public Board board() {
        return board;
    }

    /** Returns every boat, indexed by seat, including those that left. */
    public List<Boat> boats() {
        return boats;
    }

    /** Returns the boat of {@code seat}. */
    public Boat boat(int seat) {
        return boats.get(seat);
    }

    /** Returns the seat owning the lantern at {@code position}, or {@link #DARK}. */
    public int owner(int position) {
        return owners.get(position);
    }

    /** Returns the seats still in the game, in seat order: the roster of the next round. */
    public List<Integer> activeSeats() {
        List<Integer> seats = new ArrayList<>();
        for (Boat b : boats) {
            if (b.active()) {
                seats.add(b.seat());
            }
        }
        return List.copyOf(seats);
    }

    /** Returns the glow {@code seat} has scored: the sum over the lanterns it owns. */
    public int score(int seat) {
        int sum = 0;
        for (int p = 0; p < owners.size(); p++) {
            if (owners.get(p) == seat) {
                sum += board.place(p).glow();
            }
        }
        return sum;
    }

    /** Returns how many lanterns {@code seat} owns. */
    public int lanterns(int seat) {
        return (int) owners.stream().filter(o -> o == seat).count();
    }

    /** Returns the glow of all lanterns still dark. */
    public int darkGlow() {
        int sum = 0;
        for (int p = 0; p < owners.size(); p++) {
            if (owners.get(p) == DARK) {
                sum += board.place(p).glow();
            }
        }
        return sum;
    }

    /** Returns whether every lantern on the board is lit. */
    public boolean allLit() {
        return darkGlow() == 0;
    }

    GameState withBoat(Boat boat) {
        List<Boat> next = new ArrayList<>(boats);
        next.set(boat.seat(), boat);
        return new GameState(board, next, owners);
    }

    GameState withOwner(int position, int seat) {
        List<Integer> next = new ArrayList<>(owners);
        next.set(position, seat);
        return new GameState(board, boats, next);
    }

    GameState darkenAllOf(int seat) {
        List<Integer> next = new ArrayList<>(owners);
        next.replaceAll(o -> o == seat ? DARK : o);
        return new GameState(board, boats, next);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof GameState other && board == other.board
                && boats.equals(other.boats) && owners.equals(other.owners);
    }

    @Override
    public int hashCode() {
        return Objects.hash(boats, owners);
    }

    @Override
    public String toString() {
        return "GameState[boats=" + boats + ", owners=" + owners + "]";
    }
}
