package org.precedence.api;

/**
 * How a session turns the fair draw into each round's turn order. Every rule is built on the
 * same order-fair roll; they differ in what they keep from round to round.
 */
public enum OrderRule {
    /** Every round is a fresh fair ranking: each of the n! orders equally likely, every round. */
    FRESH_EACH_ROUND,
    /**
     * The first player is drawn fairly once per session (from round 0's roll); the others
     * follow in seating order (roster order, wrapping around). Each player is equally likely
     * to start; the order is then fixed.
     */
    FIRST_PLAYER_THEN_SEATING,
    /**
     * A fair ranking is drawn once (round 0); odd rounds play it reversed, so the last to act
     * in one round acts first in the next. Each player is equally likely to hold each seat.
     */
    SNAKE,
    /**
     * Rounds come in blocks of n (n = players). One fair ranking per block fixes who leads in
     * which round of the block, so each player acts first exactly once per block; the rest of
     * each round's order is a fresh fair ranking of the remaining players.
     */
    BALANCED_LEAD
}
