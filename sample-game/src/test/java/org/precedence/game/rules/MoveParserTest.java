package org.precedence.game.rules;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class MoveParserTest {

    @Test
    void parse_everyMoveText_roundTrips() throws MalformedMoveException {
        for (Move m : new Move[] {new Move.Sail(1), new Move.Sail(2), new Move.Sail(3), new Move.Light(),
                new Move.Gather(), new Move.Retire()}) {
            assertEquals(m, MoveParser.parse(m.text()));
        }
    }

    @Test
    void parse_caseAndSpacing_ignored() throws MalformedMoveException {
        assertEquals(new Move.Sail(3), MoveParser.parse("  SAIL\t 3 "));
        assertEquals(new Move.Light(), MoveParser.parse("Light"));
    }

    @ParameterizedTest
    @CsvSource(delimiter = '#', value = {
        "jump          # unknown move 'jump': type sail 1|2|3, light, gather or retire",
        "sail          # 'sail' needs one distance from 1 to 3, e.g. 'sail 2', got 'sail'",
        "sail 4        # a boat sails 1 to 3 places, got 4",
        "sail 0        # a boat sails 1 to 3 places, got 0",
        "sail two      # sail distance must be a number from 1 to 3, got 'two'",
        "sail 1 2      # 'sail' needs one distance from 1 to 3, e.g. 'sail 2', got 'sail 1 2'",
        "light now     # 'light' takes no argument, got 'light now'",
        "'   '         # empty move: type sail 1|2|3, light, gather or retire",
    })
    void parse_malformed_rejectedWithReason(String text, String message) {
        MalformedMoveException e = assertThrows(MalformedMoveException.class, () -> MoveParser.parse(text));
        assertEquals(message, e.getMessage());
    }

    @Test
    void parse_null_rejected() {
        assertThrows(MalformedMoveException.class, () -> MoveParser.parse(null));
    }
}
