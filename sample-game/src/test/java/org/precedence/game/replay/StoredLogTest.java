package org.precedence.game.replay;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import org.junit.jupiter.api.Test;
import org.precedence.game.fake.ShuffleProvider;
import org.precedence.game.log.GameLogFile;
import org.precedence.game.log.GameRecord;
import org.precedence.game.log.InvalidLogException;

/**
 * A log written by an earlier build (5 bots, seed "veyra-dusk", the test provider, a bot made to
 * leave after round 4) must keep replaying: a change to the rules or the bots that alters old
 * games shows up here. Our own demo data. If the change is intended, the log format or bot
 * seed version must change with it, and this file is regenerated.
 */
class StoredLogTest {

    private static GameRecord stored() throws IOException, InvalidLogException {
        try (InputStream in = StoredLogTest.class.getResourceAsStream("veyra-dusk-5-bots.json")) {
            return GameLogFile.fromJson(new String(in.readAllBytes(), StandardCharsets.UTF_8), "veyra-dusk-5-bots.json");
        }
    }

    @Test
    void check_logFromEarlierBuild_stillReplays() throws Exception {
        GameRecord log = stored();
        ReplayReport report = Replay.check(log, new ShuffleProvider());
        assertTrue(report.matches(), report.verdict());
        assertEquals(12, report.roundsChecked());
        assertEquals("Tidewhistle", log.result().winnerName());
        assertEquals(1, log.rounds().get(3).departures().size(), "a bot left after round 4");
        assertEquals(4, log.rounds().get(4).roster().size());
    }
}
