package org.precedence.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.google.gson.JsonArray;
import com.google.gson.JsonElement;
import com.google.gson.JsonObject;
import com.google.gson.JsonParser;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.precedence.runtime.catalog.Catalog;

class CatalogCommandTest {

    @Test
    void catalog_json_isArrayWithContractFields() {
        CliRun run = CliRun.of("catalog", "--format", "json");
        assertEquals(0, run.exit(), run.err());
        JsonArray a = JsonParser.parseString(run.out()).getAsJsonArray();
        assertEquals(Catalog.shipped().entries().size(), a.size());
        for (JsonElement e : a) {
            JsonObject o = e.getAsJsonObject();
            for (String field : new String[] {"players", "sides", "grade", "subsetDepth", "dice"}) {
                assertTrue(o.has(field), field);
            }
            assertEquals(o.get("players").getAsInt(), o.getAsJsonArray("dice").size());
        }
    }

    @Test
    void catalog_playersFilter_listsOnlyThoseDice() {
        CliRun run = CliRun.of("catalog", "--players", "3", "--format", "json");
        JsonArray a = JsonParser.parseString(run.out()).getAsJsonArray();
        assertTrue(a.size() >= 2);
        for (JsonElement e : a) {
            assertEquals(3, e.getAsJsonObject().get("players").getAsInt());
        }
        CliRun text = CliRun.of("catalog", "--players", "3");
        assertTrue(text.out().contains("d3-6x3") && text.out().contains("order-fair"), text.out());
    }

    @Test
    void catalog_badArguments_exitTwo(@TempDir Path dir) {
        assertEquals(ExitCodes.BAD_INPUT, CliRun.of("catalog", "--players", "1").exit());
        CliRun run = CliRun.of("catalog", "--regenerate", dir.resolve("nope/catalog.json").toString());
        assertEquals(ExitCodes.BAD_INPUT, run.exit());
        assertTrue(run.err().contains("does not exist"), run.err());
        assertEquals(ExitCodes.BAD_INPUT, CliRun.of("catalog", "--regenerate", dir.toString()).exit());
    }
}
