package org.precedence.runtime.randomness;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigInteger;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.precedence.api.RandomnessMode;
import org.precedence.api.RankingConvention;
import org.precedence.api.SessionSeed;
import org.precedence.runtime.analysis.FairnessAnalysis;
import org.precedence.runtime.dice.Word;

class SeededFacesTest {
    private static final RollGenerator GENERATOR = RollGenerator.of(RandomnessMode.FAST, SessionSeed.fromText("faces"));
    /** Draws every digit on its own, so laziness shows digit by digit. */
    private static final RollGenerator DIGIT_BY_DIGIT = RollGenerator.of(RollGenerator.FAST_V2_ID,
            SessionSeed.fromText("faces"));

    static TwoLevelDice threeDiceAllRelabelings() {
        List<int[]> perms = new ArrayList<>();
        int[][] all = {{0, 1, 2}, {0, 2, 1}, {1, 0, 2}, {1, 2, 0}, {2, 0, 1}, {2, 1, 0}};
        for (int[] p : all) {
            perms.add(p);
        }
        return new TwoLevelDice(Word.parse("ABCCBA"), perms);
    }

    @Test
    void twoLevelTestSet_isOrderFair() {
        // The set used below is proven exactly, not assumed.
        assertTrue(FairnessAnalysis.analyse(threeDiceAllRelabelings().word(), RankingConvention.LOWEST_FIRST)
                .orderFair());
    }

    @Test
    void digits_doNotDependOnEvaluationOrder() {
        TwoLevelDice dice = threeDiceAllRelabelings();
        for (long index = 0; index < 200; index++) {
            SeededFaces forward = new SeededFaces(GENERATOR, dice, index, 0);
            SeededFaces backward = new SeededFaces(GENERATOR, dice, index, 0);
            BigInteger[][] f = new BigInteger[3][2];
            for (int d = 0; d < 3; d++) {
                for (int j = 0; j < 2; j++) {
                    f[d][j] = forward.digit(d, j);
                }
            }
            for (int d = 2; d >= 0; d--) {
                for (int j = 1; j >= 0; j--) {
                    assertEquals(f[d][j], backward.digit(d, j));
                }
            }
        }
    }

    @Test
    void compare_drawsOnlyTheDigitsItNeeds() {
        TwoLevelDice dice = threeDiceAllRelabelings();
        int lazyCompares = 0;
        for (long index = 0; index < 500; index++) {
            SeededFaces faces = new SeededFaces(DIGIT_BY_DIGIT, dice, index, 0);
            int c = dice.compare(0, 1, faces);
            boolean sameBlock = faces.digit(0, 0).equals(faces.digit(1, 0));
            assertEquals(sameBlock ? 4 : 2, faces.digitsDrawn(), "round " + index);
            lazyCompares += sameBlock ? 0 : 1;
            // The lazy answer agrees with comparing the full face values.
            assertEquals(Integer.signum(faces.faceValue(0).compareTo(faces.faceValue(1))), Integer.signum(c));
        }
        assertTrue(lazyCompares > 300, "most comparisons are settled by the block digit");
    }

    @Test
    void leadingGroup_isDrawnTogetherFromItsOwnChunk() {
        TwoLevelDice dice = threeDiceAllRelabelings();
        for (long index = 0; index < 300; index++) {
            SeededFaces faces = new SeededFaces(GENERATOR, dice, index, 0);
            faces.digit(1, 1);
            // Both digits (radices 6 and 2: product 12 < 2^24) come with the group, nothing else.
            assertEquals(2, faces.digitsDrawn());
            long key = GENERATOR.groupValue(index, 0, 1, 12);
            // TwoLevelDice numbers leading strings plainly: key = 2·block + position.
            assertEquals(BigInteger.valueOf(key / 2), faces.digit(1, 0));
            assertEquals(BigInteger.valueOf(key % 2), faces.digit(1, 1));
            SeededFaces again = new SeededFaces(GENERATOR, dice, index, 0);
            assertEquals(faces.faceValue(1), again.faceValue(1));
        }
    }

    @Test
    void faceIndex_isMixedRadixNumber() {
        TwoLevelDice dice = threeDiceAllRelabelings();
        SeededFaces faces = new SeededFaces(GENERATOR, dice, 42, 0);
        BigInteger expected = faces.digit(2, 0).multiply(BigInteger.valueOf(2)).add(faces.digit(2, 1));
        assertEquals(expected, faces.faceIndex(2));
    }

    @Test
    void constructor_rejectsNegativeCoordinates() {
        TwoLevelDice dice = threeDiceAllRelabelings();
        assertThrows(IllegalArgumentException.class, () -> new SeededFaces(GENERATOR, dice, -1, 0));
        assertThrows(IllegalArgumentException.class, () -> new SeededFaces(GENERATOR, dice, 0, -1));
    }
}
