package org.precedence.runtime.provider;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.HashSet;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.precedence.api.RoundResult;
import org.precedence.api.SessionSeed;
import org.precedence.api.SessionSpec;
import org.precedence.api.TurnOrderProvider;
import org.precedence.api.TurnOrderSource;

/**
 * The README's embedding example, line for line, so the README stays true: it must compile
 * against the api alone and behave as the README says.
 */
class ReadmeExampleTest {

    @Test
    void readmeSnippet_compilesAndBehavesAsDescribed() {
        TurnOrderProvider provider = TurnOrderProvider.load();
        SessionSeed seed = SessionSeed.fromText("lantern-market-7");
        String commitment = seed.commitment();
        TurnOrderSource turns = provider.open(SessionSpec.of(seed));

        List<String> players = List.of("red", "green", "blue", "gold");
        for (long round = 0; round < 10; round++) {
            RoundResult result = turns.roll(round, players.size());
            List<String> order = turns.order(round, players);
            // order() is roll()'s order applied to the list: every player exactly once.
            assertEquals(players.size(), new HashSet<>(order).size());
            for (int i = 0; i < order.size(); i++) {
                assertEquals(players.get(result.order().get(i)), order.get(i));
            }
        }
        assertTrue(seed.matchesCommitment(commitment));
        // "turns.roll(1_000_000_000L, 4) costs what round 0 costs": at least, it is served
        // directly, and the same call gives the same round again.
        assertEquals(turns.roll(1_000_000_000L, 4), turns.roll(1_000_000_000L, 4));
    }
}
