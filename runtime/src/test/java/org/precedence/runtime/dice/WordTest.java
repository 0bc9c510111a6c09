package org.precedence.runtime.dice;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

class WordTest {

    @Test
    void parse_lettersAndSeparatedNames() {
        assertEquals("ABBA", Word.parse("ABBA").toString());
        assertEquals("ABBA", Word.parse("A, B B-A").toString());
        assertEquals("die C is empty",
                assertThrows(InvalidDiceSetException.class, () -> Word.parse("A D B")).getMessage());
    }

    @Test
    void of_rejectsLettersOutOfRangeAndMissingDice() {
        assertEquals("letter 2 at position 3 is outside 0..1",
                assertThrows(InvalidDiceSetException.class, () -> Word.of(2, 0, 1, 2)).getMessage());
        assertEquals("die B is empty",
                assertThrows(InvalidDiceSetException.class, () -> Word.of(3, 0, 2)).getMessage());
        assertEquals("'a' at letter 2 is not a die name (A..Z, AA..)",
                assertThrows(InvalidDiceSetException.class, () -> Word.parse("Aa")).getMessage());
    }

    @Test
    void toDiceSet_andBack_isIdentity() {
        Word w = Word.parse("CABCBAC");
        DiceSet s = w.toDiceSet();
        assertArrayEquals(new long[] {2, 6}, s.faces(0));
        assertArrayEquals(new long[] {3, 5}, s.faces(1));
        assertArrayEquals(new long[] {1, 4, 7}, s.faces(2));
        assertEquals(w, s.word());
    }

    @Test
    void reversedConcatRelabel_doWhatTheySay() {
        Word w = Word.parse("ABC");
        assertEquals("CBA", w.reversed().toString());
        assertEquals("ABCCBA", w.concat(w.reversed()).toString());
        assertEquals("BCA", w.relabel(new int[] {1, 2, 0}).toString());
        assertArrayEquals(new int[] {1, 1, 1}, w.sides());
    }

    @Test
    void dieNames_bijectiveBase26() {
        assertEquals("A", DieNames.of(0));
        assertEquals("Z", DieNames.of(25));
        assertEquals("AA", DieNames.of(26));
        assertEquals("AZ", DieNames.of(51));
        assertEquals("BA", DieNames.of(52));
        for (int i = 0; i < 2000; i++) {
            assertEquals(i, DieNames.indexOf(DieNames.of(i)));
        }
        assertEquals(-1, DieNames.indexOf("a"));
        assertEquals("A-AA-B", DieNames.ranking(new int[] {0, 26, 1}));
        assertEquals("BAC", DieNames.ranking(new int[] {1, 0, 2}));
    }
}
