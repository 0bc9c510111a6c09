package org.precedence.runtime.source;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigInteger;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.precedence.api.RoundResult;
import org.precedence.api.SessionSeed;
import org.precedence.api.SessionSpec;
import org.precedence.runtime.provider.DiceSession;

/**
 * The provider's roller against constructed sets: every round's order must be the players
 * sorted by the face values it reports (lowest first), and those values must lie in 1..total.
 */
class ServedSetsRollTest {

    @Test
    void roll_constructedSets_orderMatchesFaceValues() {
        SetSource source = SetSources.standard();
        DiceSession session = DiceSession.open(SessionSpec.of(SessionSeed.fromNumber(20261202L)), source);
        for (int n : new int[] {2, 3, 5, 6, 7, 10, 12, 64}) {
            BigInteger total = BigInteger.ZERO;
            for (int d = 0; d < n; d++) {
                // Catalog sets may mix side counts; face values run over 1..total faces.
                total = total.add(source.forPlayers(n).sides(d));
            }
            for (long round = 1; round <= 30; round++) {
                RoundResult r = session.roll(round, n);
                List<BigInteger> values = r.faceValues();
                List<Integer> byValue = new ArrayList<>();
                for (int p = 0; p < n; p++) {
                    byValue.add(p);
                    assertTrue(values.get(p).signum() > 0 && values.get(p).compareTo(total) <= 0);
                }
                byValue.sort(Comparator.comparing(values::get));
                assertEquals(byValue, r.order(), "n=" + n + " round " + round);
            }
        }
    }
}
