package org.precedence.api;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Objects;

/**
 * A session's turn orders: call it where an engine would call a shuffle.
 *
 * <p>Every round is a pure function of the session and the round number, so any round can be
 * asked for in any order, from any thread, as often as wanted, at the same cost. The roster
 * may change between rounds (players join or leave): a round with n players is rolled with an
 * order-fair set of n dice, and each die goes to the player at the same index in the list.
 *
 * <p>Implementations must be thread-safe.
 */
public interface TurnOrderSource {

    /** Returns the spec this session was opened with. */
    SessionSpec spec();

    /**
     * Rolls round {@code round} for {@code playerCount} players.
     *
     * @throws IllegalArgumentException if {@code round < 0} or the player count is not served
     */
    RoundResult roll(long round, int playerCount);

    /**
     * Returns round {@code round}'s order as player indices, first to act first: the order of
     * {@link #roll}, without the faces. A single player is always {@code [0]}.
     *
     * @throws IllegalArgumentException if {@code round < 0} or the player count is not served
     */
    default int[] orderIndices(long round, int playerCount) {
        if (round < 0) {
            throw new IllegalArgumentException("round must be >= 0, got " + round);
        }
        if (playerCount == 1) {
            return new int[] {0};
        }
        return roll(round, playerCount).order().stream().mapToInt(Integer::intValue).toArray();
    }

    /**
     * Returns this round's players in acting order: the drop-in replacement for
     * {@code Collections.shuffle(players)}. The list is not modified.
     *
     * @throws NullPointerException     if the list or any player is null
     * @throws IllegalArgumentException if the list is empty, has duplicates, or {@code round < 0}
     */
    default <T> List<T> order(long round, List<T> players) {
        Objects.requireNonNull(players, "players");
        if (players.isEmpty()) {
            throw new IllegalArgumentException("players must not be empty");
        }
        HashSet<T> seen = new HashSet<>();
        for (int i = 0; i < players.size(); i++) {
            T p = Objects.requireNonNull(players.get(i), "player at index " + i);
            if (!seen.add(p)) {
                throw new IllegalArgumentException("duplicate player at index " + i + ": " + p);
            }
        }
        if (players.size() == 1) {
            if (round < 0) {
                throw new IllegalArgumentException("round must be >= 0, got " + round);
            }
            return List.of(players.get(0));
        }
        RoundResult result = roll(round, players.size());
        List<T> ordered = new ArrayList<>(players.size());
        for (int index : result.order()) {
            ordered.add(players.get(index));
        }
        return List.copyOf(ordered);
    }
}
