package org.precedence.runtime.construction;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.precedence.runtime.source.SetSources;

/**
 * The family proofs are off the serving path, so this class runs them for every level of every
 * plan the standard source can serve (2 to 64 players), PGL(2,q) up to q = 61 included.
 */
class EveryPlayerCountTest {

    @Test
    void proofs_everyServedPlan_everyLevelCoversItsTupleLength() {
        for (int n = 2; n <= SetSources.MAX_PLAYERS; n++) {
            ConstructedDice dice = new ConstructedDice(Construction.smallest(n));
            assertEquals(dice.construction().levels().size(), dice.proofs().size());
            for (int i = 0; i < dice.proofs().size(); i++) {
                Level level = dice.construction().levels().get(i);
                FamilyProof proof = dice.proofs().get(i);
                assertEquals(level.blocks(), proof.order(), "n=" + n + " level " + i);
                if (!level.isWordSpecific()) {
                    assertTrue(proof.uniformTuples() >= level.liftsTo(), "n=" + n + " level " + i);
                }
            }
            assertEquals(n, dice.subsetDepth());
        }
    }
}
