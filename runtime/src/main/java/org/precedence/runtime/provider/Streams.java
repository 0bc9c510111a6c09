package org.precedence.runtime.provider;

import org.precedence.api.OrderRule;

/**
 * The draws behind each rule: which (stream, index) pairs are rolled for a round. Stream 0 is
 * indexed by round, stream 1 by block of rounds (BALANCED_LEAD only).
 */
final class Streams {
    /** Per-round rolls: index = round. */
    static final int ROUND = 0;
    /** BALANCED_LEAD block rankings: index = round / players. */
    static final int BLOCK = 1;

    private Streams() {
    }

    /** Returns the stream-0 index whose faces a round reports (the roll behind its order). */
    static long facesIndex(OrderRule rule, long round) {
        return switch (rule) {
            case FRESH_EACH_ROUND, BALANCED_LEAD -> round;
            case FIRST_PLAYER_THEN_SEATING, SNAKE -> 0;
        };
    }
}
