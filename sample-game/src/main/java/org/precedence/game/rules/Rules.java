package org.precedence.game.rules;

import java.util.Optional;

/**
 * What a move may do and what it does. Every check a move can fail has its own one-line
 * reason, worded for the person at the table.
 */
public final class Rules {
    /** Oil every boat starts with. */
    public static final int START_OIL = 2;
    /** Most oil a hold takes. */
    public static final int MAX_OIL = 3;
    /** Oil one lighting costs. */
    public static final int LIGHT_COST = 1;

    private Rules() {
    }

    /** Returns why {@code seat} may not make {@code move} now, or empty if it may. */
    public static Optional<String> refusal(GameState state, int seat, Move move) {
        if (seat < 0 || seat >= state.boats().size()) {
            return Optional.of("there is no seat " + seat);
        }
        Boat boat = state.boat(seat);
        if (!boat.active()) {
            return Optional.of(boat.name() + " has left the game");
        }
        Island here = state.board().place(boat.position());
        if (move instanceof Move.Light) {
            if (!here.hasLantern()) {
                return Optional.of(here.name() + " has no lantern to light");
            }
            int owner = state.owner(here.position());
            if (owner == seat) {
                return Optional.of(here.name() + " is already your light");
            }
            if (owner != GameState.DARK) {
                return Optional.of(here.name() + " is already lit by " + state.boat(owner).name());
            }
            if (boat.oil() < LIGHT_COST) {
                return Optional.of("no oil left to light " + here.name() + ": gather first");
            }
        } else if (move instanceof Move.Gather) {
            if (boat.oil() >= MAX_OIL) {
                return Optional.of("the hold is full (" + MAX_OIL + " oil)");
            }
        } else if (move instanceof Move.Retire) {
            if (state.activeSeats().size() <= 1) {
                return Optional.of("the last boat in the game cannot retire");
            }
        }
        // Sailing 1 to 3 places is always allowed; Move.Sail cannot hold another distance.
        return Optional.empty();
    }

    /**
     * Returns the state after {@code seat} makes {@code move}.
     *
     * @throws IllegalMoveException with the {@link #refusal} reason; {@code state} is unchanged
     *                              (it is immutable)
     */
    public static GameState apply(GameState state, int seat, Move move) throws IllegalMoveException {
        Optional<String> refusal = refusal(state, seat, move);
        if (refusal.isPresent()) {
            throw new IllegalMoveException(refusal.get());
        }
        Boat boat = state.boat(seat);
        if (move instanceof Move.Sail sail) {
            return state.withBoat(boat.at(state.board().sail(boat.position(), sail.distance())));
        }
        if (move instanceof Move.Light) {
            return state.withBoat(boat.withOil(boat.oil() - LIGHT_COST)).withOwner(boat.position(), seat);
        }
        if (move instanceof Move.Gather) {
            return state.withBoat(boat.withOil(boat.oil() + 1));
        }
        return retire(state, seat);
    }

    /** Takes {@code seat} out of the game; its lanterns go dark for the others to light. */
    static GameState retire(GameState state, int seat) {
        return state.withBoat(state.boat(seat).retired()).darkenAllOf(seat);
    }

    /**
     * Returns why the game is over after a round, or empty if another round is played.
     *
     * @param roundsPlayed rounds completed so far
     * @param maxRounds    the game's last round
     */
    public static Optional<Ending> ending(GameState state, int roundsPlayed, int maxRounds) {
        if (state.activeSeats().size() < 2) {
            return Optional.of(Ending.LAST_BOAT);
        }
        if (state.allLit()) {
            return Optional.of(Ending.ALL_LIT);
        }
        if (roundsPlayed >= maxRounds) {
            return Optional.of(Ending.ROUNDS_OUT);
        }
        return Optional.empty();
    }
}
