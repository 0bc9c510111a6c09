package org.precedence.runtime.service;

import static org.junit.jupiter.api.Assertions.assertEquals;

import com.google.gson.JsonParser;
import org.junit.jupiter.api.Test;
import org.precedence.api.OrderRule;
import org.precedence.api.RandomnessMode;
import org.precedence.api.RankingConvention;
import org.precedence.api.SessionSeed;
import org.precedence.api.SessionSpec;
import org.precedence.api.TurnOrderSource;
import org.precedence.runtime.provider.FairDiceProvider;

class ShapesTest {
    @Test
    void roundJson_streamed_equalsTheTreeShape() {
        FairDiceProvider provider = new FairDiceProvider();
        TurnOrderSource s = provider.open(new SessionSpec(SessionSeed.fromText("quarry-lights"), RandomnessMode.SECURE,
                OrderRule.BALANCED_LEAD, RankingConvention.HIGHEST_FIRST));
        for (int n = 2; n <= provider.maxPlayers(); n++) {
            for (long k : new long[] {0, 1, 5, 99, Long.MAX_VALUE}) {
                var r = s.roll(k, n);
                assertEquals(Shapes.round(r), JsonParser.parseString(Shapes.roundJson(r)).getAsJsonObject());
            }
        }
    }

    @Test
    void rankingName_inversesRankIndex() {
        for (int i = 0; i < 24; i++) {
            String name = SimulateEndpoint.rankingName(i, 4);
            java.util.List<Integer> order = name.chars().map(c -> c - 'A').boxed().toList();
            assertEquals(i, SimulateEndpoint.rankIndex(order));
        }
        assertEquals("ABCD", SimulateEndpoint.rankingName(0, 4));
        assertEquals("DCBA", SimulateEndpoint.rankingName(23, 4));
    }
}
