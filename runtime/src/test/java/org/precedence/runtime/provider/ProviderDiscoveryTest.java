package org.precedence.runtime.provider;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;
import org.precedence.api.SessionSeed;
import org.precedence.api.SessionSpec;
import org.precedence.api.TurnOrderProvider;
import org.precedence.api.TurnOrderSource;

class ProviderDiscoveryTest {
    @Test
    void load_findsTheFairDiceProvider() {
        TurnOrderProvider provider = TurnOrderProvider.load();
        assertInstanceOf(FairDiceProvider.class, provider);
        assertTrue(provider.name().contains("precedence-roll-v1/philox4x64"));
        assertTrue(provider.maxPlayers() >= 4);
        TurnOrderSource source = provider.open(SessionSpec.of(SessionSeed.fromText("discovery")));
        List<String> order = source.order(0, List.of("fen", "moss", "reed", "sedge"));
        assertEquals(4, order.size());
        assertEquals(source.order(0, List.of("fen", "moss", "reed", "sedge")), order);
    }

    @Test
    void builtInSets_areProvenOrderFair() {
        BuiltInSets sets = new BuiltInSets();
        for (int n = 2; n <= 4; n++) {
            assertEquals(n, sets.forPlayers(n).players());
            assertEquals(n, sets.forPlayers(n).subsetDepth());
        }
        assertEquals(1152, sets.forPlayers(4).sides(0).intValueExact());
    }
}
