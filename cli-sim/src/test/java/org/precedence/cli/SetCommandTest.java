package org.precedence.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import org.junit.jupiter.api.Test;

class SetCommandTest {

    @Test
    void json_fourPlayers_exactCountAndContractFields() {
        Object[] r = PrecedenceApplicationTest.run("set", "--players", "4", "--format", "json");
        assertEquals(ExitCodes.OK, r[0], (String) r[2]);
        JsonObject o = JsonParser.parseString((String) r[1]).getAsJsonObject();
        assertEquals(4, o.get("players").getAsInt());
        // Served from the shipped catalog: the smallest order-fair set of four equal dice.
        assertEquals("catalog", o.get("source").getAsString());
        assertEquals("catalog entry d4-12x4", o.get("method").getAsString());
        // 12 sides: the least possible for 4 dice (fact of the trade, common practice, no source).
        assertEquals("12", o.get("sidesPerDie").getAsString());
        assertEquals(4, o.get("subsetDepth").getAsInt());
        JsonObject v = o.getAsJsonObject("verification");
        assertEquals("exact count", v.get("kind").getAsString());
        assertTrue(v.get("allEqual").getAsBoolean());
        // 12^4 / 4! = 864 outcomes per ranking.
        assertEquals("864", v.get("countPerRanking").getAsString());
        assertEquals(64, o.get("sha256").getAsString().length());
        assertTrue(o.has("buildMs"));
    }

    @Test
    void json_tenPlayers_familyProof() {
        Object[] r = PrecedenceApplicationTest.run("set", "--players", "10", "--format", "json");
        assertEquals(ExitCodes.OK, r[0], (String) r[2]);
        JsonObject o = JsonParser.parseString((String) r[1]).getAsJsonObject();
        assertEquals("construction", o.get("source").getAsString());
        assertEquals("family proof", o.getAsJsonObject("verification").get("kind").getAsString());
        assertTrue(o.has("levels") && o.has("families"), o.toString());
        assertEquals("411008404246511546841295749120000000000000", o.get("sidesPerDie").getAsString());
    }

    @Test
    void text_isReadable() {
        Object[] r = PrecedenceApplicationTest.run("set", "--players", "3");
        assertEquals(ExitCodes.OK, r[0]);
        String out = (String) r[1];
        assertTrue(out.contains("Order-fair set for 3 players (catalog)"), out);
        assertTrue(out.contains("sides per die  6"), out);
    }

    @Test
    void badPlayers_exitTwoWithOneLine() {
        for (String bad : new String[] {"1", "65", "-3"}) {
            Object[] r = PrecedenceApplicationTest.run("set", "--players", bad);
            assertEquals(ExitCodes.BAD_INPUT, r[0]);
            String err = (String) r[2];
            assertTrue(err.contains("2..64"), err);
            assertFalse(err.contains("\tat "), err);
        }
        Object[] r = PrecedenceApplicationTest.run("set", "--players", "many");
        assertEquals(ExitCodes.BAD_INPUT, r[0]);
        Object[] missing = PrecedenceApplicationTest.run("set");
        assertEquals(ExitCodes.BAD_INPUT, missing[0]);
    }
}
