package org.precedence.game.terminal;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.precedence.api.RandomnessMode;
import org.precedence.game.GameSetup;
import org.precedence.game.fake.ShuffleProvider;
import org.precedence.game.log.GameRecord;
import org.precedence.game.log.GameRecord.RollEntry;
import org.precedence.game.log.GameRecord.RoundEntry;
import org.precedence.game.play.Match;

class TableRendererTest {

    @Test
    void roundStarted_showsEveryRollBeforeTheRoundsMoves() {
        StringWriter text = new StringWriter();
        GameSetup setup = GameSetup.of(4, 4, "veyra-dusk", RandomnessMode.FAST, 12, 0);
        GameRecord game = Match.open(setup, new ShuffleProvider(), s -> null,
                new TableRenderer(new PrintWriter(text), true)).play();
        String out = text.toString();
        RoundEntry first = game.rounds().get(0);
        int header = out.indexOf("== Round 1 of at most 12: 4 boats roll set test-4 (ORDER_FAIR), lowest face acts first ==");
        assertTrue(header >= 0, out);
        for (RollEntry r : first.rolls()) {
            String name = game.seats().get(r.seat()).name();
            int faceWidth = first.rolls().stream().mapToInt(x -> x.faceValue().toString().length()).max().getAsInt();
            String line = String.format("   %-11s  die %-2s  face %" + faceWidth + "s  -> acts %s", name, r.die(),
                    r.faceValue(), Ordinals.of(r.position()));
            int at = out.indexOf(line, header);
            assertTrue(at > header, "missing roll line '" + line + "'\n" + out);
            assertTrue(at < out.indexOf(" sails ", header) || !out.substring(header).contains(" sails "));
        }
        assertTrue(out.contains("Result after " + game.rounds().size() + " rounds"), out);
        assertTrue(out.contains(game.result().winnerName() + " wins with"), out);
    }

    @Test
    void ordinals_englishSuffixes() {
        assertEquals(List.of("1st", "2nd", "3rd", "4th", "11th", "12th", "13th", "21st"),
                List.of(Ordinals.of(0), Ordinals.of(1), Ordinals.of(2), Ordinals.of(3), Ordinals.of(10),
                        Ordinals.of(11), Ordinals.of(12), Ordinals.of(20)));
    }
}
