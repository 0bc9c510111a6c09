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
        assertTrue(provider.name().contains("precedence-roll-v3/philox4x64"));
        assertTrue(provider.maxPlayers() >= 4);
        TurnOrderSource source = provider.open(SessionSpec.of(SessionSeed.fromText("discovery")));
        List<String> order = source.order(0, List.of("fen", "moss", "reed", "sedge"));
        assertEquals(4, order.size());
        assertEquals(source.order(0, List.of("fen", "moss", "reed", "sedge")), order);
    }

    @Test
    void relabelingSets_areProvenOrderFair() {
        RelabelingSets sets = new RelabelingSets();
        for (int n = 2; n <= 4; n++) {
            assertEquals(n, sets.forPlayers(n).players());
            assertEquals(n, sets.forPlayers(n).subsetDepth());
        }
        assertEquals(1152, sets.forPlayers(4).sides(0).intValueExact());
    }

    // Listing a constructed set must not change the set: the listed word is proven order-fair
    // here by exact counting, and the listed dice have the construction's side counts.
    @Test
    void standardSets_smallOnesAreListedAndStillOrderFair() {
        org.precedence.runtime.source.SetSource standard = FairDiceProvider.standardSets();
        for (int n = 2; n <= 5; n++) {
            var dice = standard.forPlayers(n);
            assertInstanceOf(org.precedence.runtime.dice.ExplicitDice.class, dice, "n=" + n);
            var source = org.precedence.runtime.source.SetSources.standard().forPlayers(n);
            // Catalog sets are explicit already and served as they are; constructed ones are listed.
            assertEquals(source instanceof org.precedence.runtime.dice.ExplicitDice,
                    !dice.id().endsWith(ListedSets.LISTED_SUFFIX), "n=" + n + ": " + dice.id());
            var word = ((org.precedence.runtime.dice.ExplicitDice) dice).set().word();
            assertTrue(org.precedence.runtime.analysis.FairnessAnalysis
                    .analyse(word, org.precedence.api.RankingConvention.LOWEST_FIRST).orderFair(), "n=" + n);
            var constructed = org.precedence.runtime.source.SetSources.standard().forPlayers(n);
            for (int d = 0; d < n; d++) {
                assertEquals(constructed.sides(d), dice.sides(d));
            }
        }
        assertTrue(standard.forPlayers(10).digits() > 1, "10 dice are too many faces to list");
        assertEquals(64, standard.maxPlayers());
    }

    // A listed set has the same faces: comparing the constructed digits lazily and comparing
    // the listed values agree on every pair of faces of the 3-dice set.
    @Test
    void listedSet_hasTheConstructedFaceValues() {
        var constructed = org.precedence.runtime.source.SetSources.standard().forPlayers(3);
        var listed = (org.precedence.runtime.dice.ExplicitDice) ListedSets.listedOrSelf(constructed);
        int[] sides = {listed.sideCount(0), listed.sideCount(1), listed.sideCount(2)};
        for (int d = 0; d < 3; d++) {
            for (int f = 0; f < sides[d]; f++) {
                java.math.BigInteger[] digits = new java.math.BigInteger[constructed.digits()];
                int rest = f;
                for (int j = constructed.digits() - 1; j >= 0; j--) {
                    int r = constructed.radix(d, j).intValueExact();
                    digits[j] = java.math.BigInteger.valueOf(rest % r);
                    rest /= r;
                }
                assertEquals(constructed.faceValue(d, digits).longValueExact(), listed.value(d, f));
            }
        }
    }

    // The served 10-player set is constructed (too many faces to list): the fast path takes the
    // lazy digit-by-digit comparison and must agree with the full roll, whose faces it orders.
    @Test
    void tenPlayers_constructedSetFastPathEqualsFullRoll() {
        FairDiceProvider provider = new FairDiceProvider();
        DiceSession s = provider.open(SessionSpec.of(SessionSeed.fromText("ten at the long table")));
        FastOrders fast = s.fastOrders();
        int[] out = new int[10];
        for (long k = 0; k < 40; k++) {
            fast.orderInto(k, 10, out);
            var r = s.roll(k, 10);
            assertEquals(r.order(), java.util.Arrays.stream(out).boxed().toList());
            for (int p = 1; p < 10; p++) {
                assertTrue(r.rolls().get(out[p - 1]).faceValue().compareTo(r.rolls().get(out[p]).faceValue()) < 0);
            }
        }
    }
}
