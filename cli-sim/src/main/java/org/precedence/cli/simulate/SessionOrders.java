package org.precedence.cli.simulate;

/**
 * The turn orders of one session for one player count. Not thread-safe: each worker opens its
 * own. Rounds are asked for in increasing order starting at 0, which lets sequential peers
 * (a plain shuffle) take part; counter-based sources may be asked in any order.
 */
interface SessionOrders {

    /**
     * Writes round {@code round}'s acting order (player indices, first to act first) into
     * {@code out[0..players)}.
     *
     * @return how many throws the round took: 1, unless ties forced re-rolls
     */
    int orderInto(long round, int[] out);
}
