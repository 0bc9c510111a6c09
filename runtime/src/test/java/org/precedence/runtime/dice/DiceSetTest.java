package org.precedence.runtime.dice;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.List;
import org.junit.jupiter.api.Test;

class DiceSetTest {

    private static String rejection(List<long[]> faces, List<String> names) {
        return assertThrows(InvalidDiceSetException.class, () -> DiceSet.of(faces, names)).getMessage();
    }

    @Test
    void of_duplicateValueOnTwoDice_namesBothDice() {
        List<long[]> faces = List.of(new long[] {1, 2}, new long[] {17, 3}, new long[] {4, 5},
                new long[] {6, 17});
        assertEquals("duplicate value 17 on dice B and D", rejection(faces, null));
    }

    @Test
    void of_duplicateValueOnOneDie_namesTheDie() {
        assertEquals("duplicate value 4 on die Birch",
                rejection(List.of(new long[] {1, 2}, new long[] {4, 4}), List.of("Ash", "Birch")));
    }

    @Test
    void of_emptyDie_namesIt() {
        assertEquals("die C is empty", rejection(
                List.of(new long[] {1}, new long[] {2}, new long[0]), null));
        assertEquals("die C is empty", rejection(
                Arrays.asList(new long[] {1}, new long[] {2}, null), null));
    }

    @Test
    void of_tooFewDice_saysHowMany() {
        assertEquals("a set needs at least 2 dice, got 1", rejection(List.of(new long[] {1}), null));
        assertEquals("a set needs at least 2 dice, got 0", rejection(List.of(), null));
    }

    @Test
    void of_badNames_areRejectedPrecisely() {
        List<long[]> two = List.of(new long[] {1}, new long[] {2});
        assertEquals("2 dice but 3 names", rejection(two, List.of("x", "y", "z")));
        assertEquals("die B has a blank name", rejection(two, List.of("x", " ")));
        assertEquals("dice A and B share the name 'x'", rejection(two, List.of("x", "x")));
        assertEquals("name of die A (' x') starts or ends with white space",
                rejection(two, List.of(" x", "y")));
        assertEquals("name of die B contains control character U+000A at character 2",
                rejection(two, List.of("x", "y\nz")));
        assertTrue(rejection(two, List.of("x", "y".repeat(65))).contains("at most 64"));
        assertEquals("die B has a blank name", rejection(two, Arrays.asList("x", null)));
    }

    @Test
    void of_copiesItsInput() {
        long[] a = {3, 1};
        DiceSet set = DiceSet.of(a, new long[] {2});
        a[0] = 2;
        assertEquals(3, set.face(0, 0));
        set.faces(0)[0] = 99;
        assertEquals(3, set.face(0, 0));
    }

    @Test
    void word_ordersByValue_negativeAndHugeValuesToo() {
        DiceSet set = DiceSet.of(new long[] {Long.MAX_VALUE, -5}, new long[] {Long.MIN_VALUE, 0});
        assertEquals("BABA", set.word().toString());
        assertArrayEquals(new int[] {2, 2}, set.sides());
        assertEquals(4, set.totalFaces());
        assertTrue(set.equalSides());
        assertFalse(DiceSet.ofInts(new int[] {1}, new int[] {2, 3}).equalSides());
    }

    @Test
    void renumbered_keepsWordAndNames_facesAscending() {
        DiceSet set = DiceSet.of(List.of(new long[] {40, 10}, new long[] {25, -3}), List.of("Ash", "Birch"));
        DiceSet r = set.renumbered();
        assertEquals(set.word(), r.word());
        assertEquals(List.of("Ash", "Birch"), r.names());
        assertArrayEquals(new long[] {2, 4}, r.faces(0));
        assertArrayEquals(new long[] {1, 3}, r.faces(1));
        assertEquals(set.sha256(), r.sha256(), "only the relative order matters");
    }

    @Test
    void sha256_isStableAndDependsOnTheWordOnly() {
        // Our own golden value: SHA-256 (FIPS 180-4, via the JDK) of "precedence-word-v1:0,1,1,0".
        // Changing it means a new canonical-form version.
        assertEquals("precedence-word-v1:0,1,1,0", Word.parse("ABBA").canonicalText());
        String abba = Word.parse("ABBA").sha256();
        // Cross-checked with coreutils sha256sum on the same text.
        assertEquals("9241396f0d4ab07d608ade5357a53fd317a72a674ca6ca7f7519b264ae355bfd", abba);
        assertEquals(abba, DiceSet.ofInts(new int[] {10, 40}, new int[] {20, 30}).sha256());
        assertNotEquals(abba, Word.parse("BAAB").sha256());
    }

    @Test
    void subset_keepsValuesAndNames_rejectsRepeats() {
        DiceSet set = DiceSet.of(List.of(new long[] {1, 6}, new long[] {2, 5}, new long[] {3, 4}),
                List.of("Ash", "Birch", "Cedar"));
        DiceSet sub = set.subset(2, 0);
        assertEquals(List.of("Cedar", "Ash"), sub.names());
        assertArrayEquals(new long[] {3, 4}, sub.faces(0));
        assertEquals("die Ash chosen twice",
                assertThrows(IllegalArgumentException.class, () -> set.subset(0, 0)).getMessage());
        assertThrows(IllegalArgumentException.class, () -> set.subset(0, 3));
    }

    @Test
    void hasDefaultNames_onlyForABC() {
        assertTrue(DiceSet.ofInts(new int[] {1}, new int[] {2}).hasDefaultNames());
        assertFalse(DiceSet.of(List.of(new long[] {1}, new long[] {2}), List.of("B", "A")).hasDefaultNames());
        assertTrue(DiceSet.of(List.of(new long[] {1}, new long[] {2}), List.of("A", "B")).hasDefaultNames());
    }
}
