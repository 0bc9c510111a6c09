package org.precedence.game;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Objects;
import org.precedence.api.RandomnessMode;
import org.precedence.api.SessionSeed;
import org.precedence.api.SessionSpec;

/**
 * Everything that fixes a game of Shoal Lights apart from the moves people type: with the same
 * setup and the same moves, a game plays out the same on every machine.
 *
 * @param seats           the seats in table order; humans (if any) sit first
 * @param seedText        the session seed as given ({@code hex:} + 64 digits, or any phrase);
 *                        it fixes every round's dice and every bot's choices
 * @param mode            which generator the provider rolls with
 * @param maxRounds       the game ends after this many rounds at the latest
 * @param leaveAfterRound after this round (1-based) the weakest bot leaves the table;
 *                        0 means nobody is made to leave
 */
public record GameSetup(List<Seat> seats, String seedText, RandomnessMode mode, int maxRounds, int leaveAfterRound) {

    /** Fewest boats at the table. */
    public static final int MIN_PLAYERS = 2;
    /** Most boats at the table. */
    public static final int MAX_PLAYERS = 8;
    /** Rounds a game lasts at most unless the setup says otherwise. */
    public static final int DEFAULT_MAX_ROUNDS = 12;
    /** Longest game a setup may ask for. */
    public static final int MAX_ROUNDS_LIMIT = 99;

    /** Boat names handed out in seat order; invented for this game. */
    static final List<String> BOAT_NAMES = List.of(
            "Saltmoth", "Tidewhistle", "Emberkeel", "Brackenhull",
            "Mistrunner", "Copperfin", "Wickwander", "Lowlantern");

    public GameSetup {
        Objects.requireNonNull(seats, "seats");
        Objects.requireNonNull(seedText, "seedText");
        Objects.requireNonNull(mode, "mode");
        seats = List.copyOf(seats);
        if (seats.size() < MIN_PLAYERS || seats.size() > MAX_PLAYERS) {
            throw new IllegalArgumentException("a table seats " + MIN_PLAYERS + " to " + MAX_PLAYERS
                    + " boats, got " + seats.size());
        }
        HashSet<String> names = new HashSet<>();
        for (int i = 0; i < seats.size(); i++) {
            Seat s = seats.get(i);
            if (s.index() != i) {
                throw new IllegalArgumentException("seat " + i + " has index " + s.index());
            }
            if (!names.add(s.name())) {
                throw new IllegalArgumentException("two seats are named " + s.name());
            }
        }
        // Parsing here rejects a bad seed before the first round, with the seed's own message.
        SessionSeed.parse(seedText);
        if (maxRounds < 1 || maxRounds > MAX_ROUNDS_LIMIT) {
            throw new IllegalArgumentException("a game lasts 1 to " + MAX_ROUNDS_LIMIT
                    + " rounds, got " + maxRounds);
        }
        if (leaveAfterRound < 0 || leaveAfterRound >= maxRounds) {
            throw new IllegalArgumentException("a bot can leave after round 1 to " + (maxRounds - 1)
                    + " (0 for never), got " + leaveAfterRound);
        }
        if (leaveAfterRound > 0 && seats.stream().noneMatch(Seat::bot)) {
            throw new IllegalArgumentException("a bot can only be made to leave when bots sit in");
        }
    }

    /**
     * Seats {@code players} boats, the last {@code bots} of them played by bots, with the
     * invented boat names in seat order.
     *
     * @throws IllegalArgumentException naming the allowed range when a count is out of range
     */
    public static GameSetup of(int players, int bots, String seedText, RandomnessMode mode,
            int maxRounds, int leaveAfterRound) {
        if (players < MIN_PLAYERS || players > MAX_PLAYERS) {
            throw new IllegalArgumentException("a table seats " + MIN_PLAYERS + " to " + MAX_PLAYERS
                    + " boats, got " + players);
        }
        if (bots < 0 || bots > players) {
            throw new IllegalArgumentException("bots must be 0 to " + players + " (the player count), got " + bots);
        }
        List<Seat> seats = new ArrayList<>(players);
        int humans = players - bots;
        for (int i = 0; i < players; i++) {
            seats.add(new Seat(i, BOAT_NAMES.get(i), i >= humans));
        }
        return new GameSetup(seats, seedText, mode, maxRounds, leaveAfterRound);
    }

    /** Returns the number of seats. */
    public int players() {
        return seats.size();
    }

    /** Returns the session the provider opens for this game: a fresh fair order every round. */
    public SessionSpec sessionSpec() {
        return SessionSpec.of(SessionSeed.parse(seedText)).withMode(mode);
    }
}
