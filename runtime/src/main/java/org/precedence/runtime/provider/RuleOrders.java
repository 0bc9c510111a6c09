package org.precedence.runtime.provider;

import org.precedence.api.OrderRule;

/**
 * Turns rankings of draws into a round's order, per {@link OrderRule}. Pure: the order of
 * round k depends only on (rule, k, players) and the draws, so any round costs the same.
 */
final class RuleOrders {
    private RuleOrders() {
    }

    /**
     * Writes round {@code round}'s order for {@code players} players into {@code out}.
     *
     * @param scratch at least {@code players} ints, used by BALANCED_LEAD
     */
    static void orderInto(OrderRule rule, long round, int players, Ranker ranker, int[] out, int[] scratch) {
        switch (rule) {
            case FRESH_EACH_ROUND -> ranker.rankInto(Streams.ROUND, round, players, out);
            case FIRST_PLAYER_THEN_SEATING -> {
                ranker.rankInto(Streams.ROUND, 0, players, out);
                int first = out[0];
                for (int p = 0; p < players; p++) {
                    out[p] = (first + p) % players;
                }
            }
            case SNAKE -> {
                ranker.rankInto(Streams.ROUND, 0, players, out);
                if ((round & 1) == 1) {
                    reverse(out, players);
                }
            }
            case BALANCED_LEAD -> {
                ranker.rankInto(Streams.BLOCK, round / players, players, scratch);
                int leader = scratch[(int) (round % players)];
                ranker.rankInto(Streams.ROUND, round, players, out);
                // Move the leader to the front; the others keep their fair relative order.
                int p = 0;
                while (out[p] != leader) {
                    p++;
                }
                System.arraycopy(out, 0, out, 1, p);
                out[0] = leader;
            }
            default -> throw new IllegalStateException("unknown rule " + rule);
        }
    }

    static void reverse(int[] a, int n) {
        for (int i = 0, j = n - 1; i < j; i++, j--) {
            int t = a[i];
            a[i] = a[j];
            a[j] = t;
        }
    }
}
