package org.precedence.runtime.dice.io;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.io.ByteArrayInputStream;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.precedence.runtime.dice.DiceSet;

class DiceSetReaderTest {

    private static String jsonError(String json) {
        return assertThrows(SetFormatException.class, () -> DiceSetReader.read(json, DiceSetFormat.JSON))
                .getMessage();
    }

    private static String textError(String text) {
        return assertThrows(SetFormatException.class, () -> DiceSetReader.read(text, DiceSetFormat.TEXT))
                .getMessage();
    }

    @Test
    void readJson_plainLists() {
        DiceSet set = DiceSetReader.read("{\"dice\": [[1, 6], [2, 5], [3, 4]]}");
        assertEquals(3, set.players());
        assertEquals(List.of("A", "B", "C"), set.names());
        assertArrayEquals(new long[] {2, 5}, set.faces(1));
    }

    @Test
    void readJson_namesMemberAndDieObjects() {
        DiceSet a = DiceSetReader.read("{\"names\": [\"Ash\", \"Birch\"], \"dice\": [[1, 4], [2, 3]]}");
        DiceSet b = DiceSetReader.read("{\"dice\": [{\"name\": \"Ash\", \"faces\": [1, 4]},"
                + " {\"faces\": [2, 3], \"name\": \"Birch\"}]}");
        assertEquals(List.of("Ash", "Birch"), a.names());
        assertEquals(a, b);
        DiceSet c = DiceSetReader.read("{\"id\": \"x\", \"dice\": [{\"faces\": [1, 4]}, [2, 3]],"
                + " \"note\": {\"any\": [true, null]}}");
        assertEquals(List.of("A", "B"), c.names(), "unnamed objects and other members are fine");
        assertEquals(List.of("A", "B"), DiceSetReader.read("\uFEFF{\"dice\": [[1], [2]]}").names(),
                "a byte-order mark is skipped");
        DiceSet d = DiceSetReader.read("{\"dice\": [[-9223372036854775808, 9223372036854775807], [0]]}");
        assertEquals(Long.MIN_VALUE, d.face(0, 0));
    }

    @Test
    void readJson_valueProblems_havePositions() {
        assertEquals("line 2, column 12: value 9223372036854775808 out of range (faces must lie in"
                + " -9223372036854775808..9223372036854775807)",
                jsonError("{\"dice\": [\n  [1, 2], [9223372036854775808, 4]]}"));
        assertEquals("line 1, column 15: '1.5' is not a face value (faces are integers)",
                jsonError("{\"dice\": [[1, 1.5], [2]]}"));
        assertEquals("line 1, column 15: '1e3' is not a face value (faces are integers)",
                jsonError("{\"dice\": [[1, 1e3], [2]]}"));
        assertEquals("line 1, column 15: expected a face value (an integer) but found a string",
                jsonError("{\"dice\": [[1, \"2\"], [3]]}"));
        assertEquals("line 1, column 25: duplicate value 17 on dice B and D",
                jsonError("{\"dice\": [[1],[17],[3],[17]]}"));
        assertEquals("line 1, column 21: die C is empty", jsonError("{\"dice\": [[1], [2], [], [3]]}"));
    }

    @Test
    void readJson_structureProblems_havePositions() {
        assertEquals("line 1, column 1: expected a JSON object such as {\"dice\": [[1, 4], [2, 3]]}"
                + " but found a list", jsonError("[[1, 2], [3]]"));
        assertEquals("line 1, column 12: missing member \"dice\" (a list of dice, each a list of face"
                + " values)", jsonError("{\"die\": [1]}"));
        assertEquals("line 1, column 11: a set needs at least 2 dice, got 1", jsonError("{\"dice\": [[1]]}"));
        assertEquals("line 1, column 11: expected a die (a list of face values, or {\"name\": …,"
                + " \"faces\": […]}) but found a number", jsonError("{\"dice\": [1, 2]}"));
        assertEquals("line 1, column 17: unknown member \"face\" in die 2 (allowed: \"name\", \"faces\")",
                jsonError("{\"dice\": [[1], {\"face\": [2]}]}"));
        assertEquals("line 1, column 16: die 2 has no \"faces\"", jsonError("{\"dice\": [[1], {\"name\": \"x\"}]}"));
        assertEquals("line 1, column 22: member \"dice\" appears twice",
                jsonError("{\"dice\": [[1], [2]], \"dice\": []}"));
        assertEquals("line 1, column 22: unexpected content after the set's closing '}'",
                jsonError("{\"dice\": [[1], [2]]} {}"));
        assertEquals("empty input: expected a dice set such as {\"dice\": [[1, 4], [2, 3]]}", jsonError("  \n "));
    }

    @Test
    void readJson_nameProblems_havePositions() {
        assertEquals("line 1, column 11: 2 dice but 1 names", jsonError("{\"names\": [\"x\"], \"dice\": [[1], [2]]}"));
        assertEquals("line 1, column 17: dice A and B share the name 'x'",
                jsonError("{\"names\": [\"x\", \"x\"], \"dice\": [[1], [2]]}"));
        assertEquals("line 3, column 2: die 2 has no name but others do; name every die or none",
                jsonError("{\"dice\": [\n{\"name\": \"x\", \"faces\": [1]},\n [2]]}"));
        assertEquals("line 1, column 41: die names given twice, in \"names\" and in a die's \"name\";"
                + " use one or the other",
                jsonError("{\"names\": [\"x\", \"y\"], \"dice\": [{\"name\": \"x\", \"faces\": [1]}, [2]]}"));
        assertEquals("line 1, column 17: name of die B (' y') starts or ends with white space",
                jsonError("{\"names\": [\"x\", \" y\"], \"dice\": [[1], [2]]}"));
    }

    @Test
    void readJson_malformed_reportsLineAndColumn() {
        SetFormatException e = assertThrows(SetFormatException.class,
                () -> DiceSetReader.read("{\"dice\": [\n  [1, 2],\n  [3, 4,]\n]}"));
        assertEquals(3, e.line());
        assertEquals(e.getMessage(), "line " + e.line() + ", column " + e.column() + ": " + e.problem());
        assertEquals("line 1, column 13: the input ends before the set is complete",
                jsonError("{\"dice\": [[1"));
        String comment = jsonError("{\"dice\": [[1], [2]] // two dice\n}");
        assertEquals("line 1, column 21: malformed JSON (comments, single quotes, unquoted names,"
                + " trailing commas and bare words are not allowed)", comment);
        String unquoted = jsonError("{dice: [[1], [2]]}");
        assertEquals("line 1, column 2: malformed JSON (comments, single quotes, unquoted names,"
                + " trailing commas and bare words are not allowed)", unquoted);
        assertEquals("line 3, column 9: malformed JSON (comments, single quotes, unquoted names,"
                + " trailing commas and bare words are not allowed)", e.getMessage());
    }

    @Test
    void readText_namesCommentsBlankLinesAndCommas() {
        String text = "# a small set\n\nAsh: 1, 6 # lowest and highest\r\nBirch:2 5\n   Cedar :  3,4\n";
        DiceSet set = DiceSetReader.read(text);
        assertEquals(List.of("Ash", "Birch", "Cedar"), set.names());
        assertArrayEquals(new long[] {3, 4}, set.faces(2));
        DiceSet plain = DiceSetReader.read("\uFEFF1 4\n2 3\n");
        assertEquals(List.of("A", "B"), plain.names());
        assertEquals(DiceSetFormat.TEXT, DiceSetFormat.detect("# {\n1 2"));
        assertEquals(DiceSetFormat.JSON, DiceSetFormat.detect(" \n {"));
        assertEquals(DiceSet.of(List.of(new long[] {1, 6}, new long[] {2, 5}, new long[] {3, 4}),
                List.of("Red Die", "B", "C")),
                DiceSetReader.read("Red Die: 1 6\nB: 2 5\nC: 3 4"), "names may hold spaces");
    }

    @Test
    void readText_problems_haveLineAndColumn() {
        assertEquals("line 2, column 5: 'x' is not a face value (faces are integers)", textError("1 2\n3 4 x\n"));
        assertEquals("line 2, column 3: value -9223372036854775809 out of range (faces must lie in"
                + " -9223372036854775808..9223372036854775807)", textError("1\n5 -9223372036854775809"));
        assertEquals("line 4, column 3: duplicate value 17 on dice B and D", textError("1\n17\n3\n  17\n"));
        assertEquals("line 2, column 1: empty die name before ':'", textError("A: 1\n: 2\n"));
        assertEquals("line 1, column 7: a second ':' on one line (a die line is 'name: faces…')",
                textError("A: 1 2:3\nB: 4"));
        assertEquals("line 2, column 1: die 2 has no name but others do; name every die or none",
                textError("A: 1\n2\n"));
        assertEquals("line 2, column 1: die B is empty", textError("A: 1\nB:  # nothing\nC: 2"));
        assertEquals("line 1, column 1: a set needs at least 2 dice, got 1", textError("1 2 3"));
        assertEquals("no dice in the input: expected one die per line, e.g. 'A: 1 4' then 'B: 2 3'",
                textError("# only a comment\n\n"));
        assertEquals("line 2, column 1: dice A and B share the name 'x'", textError("x: 1\nx: 2"));
    }

    @Test
    void readStream_invalidUtf8_isRejected() {
        byte[] bad = {'1', ' ', (byte) 0xC3, '\n', '2'};
        SetFormatException e = assertThrows(SetFormatException.class,
                () -> DiceSetReader.read(new ByteArrayInputStream(bad), null));
        assertEquals("the input is not valid UTF-8 text", e.getMessage());
    }
}
