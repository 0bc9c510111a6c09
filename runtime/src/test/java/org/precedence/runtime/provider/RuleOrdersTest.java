package org.precedence.runtime.provider;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.precedence.api.OrderRule;

/**
 * The guarantees written on {@link OrderRule}, checked exactly: every ranking a draw can give
 * is enumerated (an order-fair set makes them equally likely), so the counts below are exact
 * probabilities, not samples.
 */
class RuleOrdersTest {

    /** Counts round {@code round}'s orders over every combination of the draws it uses. */
    private static Map<String, Integer> orderCounts(OrderRule rule, long round, int n) {
        List<int[]> perms = RelabelingSets.permutations(n);
        Map<String, Integer> counts = new HashMap<>();
        // The rule may use up to two draws (a block draw and a round draw): enumerate both.
        for (int[] blockDraw : perms) {
            for (int[] roundDraw : perms) {
                Ranker ranker = (stream, index, players, out) ->
                        System.arraycopy(stream == Streams.BLOCK ? blockDraw : roundDraw, 0, out, 0, players);
                int[] out = new int[n];
                RuleOrders.orderInto(rule, round, n, ranker, out, new int[n]);
                counts.merge(Arrays.toString(out), 1, Integer::sum);
            }
        }
        return counts;
    }

    @Test
    void everyRule_givesEachRoundAUniformOrderOrAUniformLead() {
        for (int n = 2; n <= 4; n++) {
            int f = DiceSessionTest.factorial(n);
            for (long round = 0; round < 2L * n; round++) {
                for (OrderRule rule : new OrderRule[] {OrderRule.FRESH_EACH_ROUND, OrderRule.SNAKE, OrderRule.BALANCED_LEAD}) {
                    Map<String, Integer> c = orderCounts(rule, round, n);
                    assertEquals(f, c.size(), rule + " reaches every order, n=" + n);
                    for (int v : c.values()) {
                        assertEquals(f, v, rule + " uniform, n=" + n);
                    }
                }
                // Seating order: n rotations, each exactly 1/n.
                Map<String, Integer> c = orderCounts(OrderRule.FIRST_PLAYER_THEN_SEATING, round, n);
                assertEquals(n, c.size());
                for (int v : c.values()) {
                    assertEquals(f * f / n, v);
                }
            }
        }
    }

    @Test
    void balancedLead_blockLeadersAreAPermutationForEveryDraw() {
        int n = 4;
        for (int[] blockDraw : RelabelingSets.permutations(n)) {
            for (int[] roundDraw : RelabelingSets.permutations(n)) {
                boolean[] led = new boolean[n];
                for (int i = 0; i < n; i++) {
                    Ranker ranker = (stream, index, players, out) ->
                            System.arraycopy(stream == Streams.BLOCK ? blockDraw : roundDraw, 0, out, 0, players);
                    int[] out = new int[n];
                    RuleOrders.orderInto(OrderRule.BALANCED_LEAD, 4L * 7 + i, n, ranker, out, new int[n]);
                    assertEquals(false, led[out[0]]);
                    led[out[0]] = true;
                }
            }
        }
    }
}
