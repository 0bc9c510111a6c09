package org.precedence.api;

/**
 * How a session turns the fair draw into each round's turn order. Every rule is built on the
 * same order-fair roll; they differ in what they keep from round to round.
 *
 * <p>Each round is a pure function of (spec, round, player count): nothing is remembered
 * between calls. A round with n players rolls the order-fair set for n dice, die i going to
 * roster index i. When the count changes, the round is computed by the new count's schedule,
 * exactly as if the whole session had been played with that count; the guarantees below that
 * span several rounds hold among rounds played with the same count. The faces a round reports
 * are those of the roll its order comes from (round k's own roll, or round 0's).
 */
public enum OrderRule {
    /**
     * Every round is a fresh fair ranking of round k's roll: each of the n! orders has
     * probability exactly 1/n!, independently of every other round.
     */
    FRESH_EACH_ROUND,
    /**
     * The first player is the first of round 0's fair ranking; every round, the others follow
     * in seating (roster) order, wrapping around: the order of every round is
     * {@code f, f+1, …, n-1, 0, …, f-1}. Each player starts with probability exactly 1/n; the
     * order is then the same every round (for a given count).
     */
    FIRST_PLAYER_THEN_SEATING,
    /**
     * Round 0's fair ranking is played in even rounds and reversed in odd rounds, so the last
     * to act in one round acts first in the next. In every round each of the n! orders has
     * probability exactly 1/n! (so each player holds each seat with probability 1/n).
     */
    SNAKE,
    /**
     * Rounds come in blocks of n (block b is rounds bn … bn+n−1, n = players). One fair ranking
     * per block, drawn separately from the rounds' rolls, says who leads which round of the
     * block, so each player acts first exactly once per block and the block's lead order is
     * each of the n! orders with probability 1/n!. The rest of round k's order is the others'
     * order in round k's own roll, which is a fair ranking of them: overall, each round's order
     * has probability exactly 1/n!. If the count changes inside a block, rounds with the new
     * count follow the new count's blocks (block ⌊k/n⌋ for count n); "exactly once" then holds
     * for every block played entirely at one count.
     */
    BALANCED_LEAD
}
