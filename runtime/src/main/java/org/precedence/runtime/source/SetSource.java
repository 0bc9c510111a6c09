package org.precedence.runtime.source;

import org.precedence.api.FairnessGrade;
import org.precedence.runtime.dice.MixedRadixDice;

/**
 * Supplies the dice set that {@code players} players roll. Implementations are thread-safe and
 * return the same set for the same arguments for the life of the process.
 */
public interface SetSource {

    /**
     * Returns a set for {@code players} dice whose proven grade is at least {@code grade}.
     *
     * @throws IllegalArgumentException naming the supported range when the count or grade
     *                                  cannot be served
     */
    MixedRadixDice forPlayers(int players, FairnessGrade grade);

    /** Returns an order-fair set for {@code players} dice. */
    default MixedRadixDice forPlayers(int players) {
        return forPlayers(players, FairnessGrade.ORDER_FAIR);
    }

    /** Returns the largest player count served. */
    int maxPlayers();
}
