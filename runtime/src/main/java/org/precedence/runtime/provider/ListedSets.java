package org.precedence.runtime.provider;

import java.math.BigInteger;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.concurrent.ConcurrentHashMap;
import org.precedence.api.FairnessGrade;
import org.precedence.runtime.dice.DiceSet;
import org.precedence.runtime.dice.ExplicitDice;
import org.precedence.runtime.dice.MixedRadixDice;
import org.precedence.runtime.source.SetSource;

/**
 * Serves the sets of another source, listing every small one as explicit dice: a set with at
 * most {@value #MAX_LISTED_FACES} faces in all is rolled as its list of faces (one digit per
 * die, the face index), the cheapest roll there is; larger sets are rolled digit by digit.
 * Listing changes how a set is rolled, not which set it is: the faces and their values are the
 * same, so its fairness is the source's. The listed set's id is the source's id followed by
 * {@value #LISTED_SUFFIX}, so logs say which way it was rolled.
 */
final class ListedSets implements SetSource {
    static final int MAX_LISTED_FACES = 1 << 16;
    static final String LISTED_SUFFIX = "/listed";

    private final SetSource source;
    private final Map<Long, MixedRadixDice> cache = new ConcurrentHashMap<>();

    ListedSets(SetSource source) {
        this.source = Objects.requireNonNull(source, "source");
    }

    @Override
    public MixedRadixDice forPlayers(int players, FairnessGrade grade) {
        MixedRadixDice dice = source.forPlayers(players, grade);
        if (dice instanceof ExplicitDice) {
            return dice;
        }
        long key = ((long) players << 8) | grade.ordinal();
        return cache.computeIfAbsent(key, k -> listedOrSelf(dice));
    }

    @Override
    public int maxPlayers() {
        return source.maxPlayers();
    }

    /** Lists {@code dice} when its faces are few enough, otherwise returns it unchanged. */
    static MixedRadixDice listedOrSelf(MixedRadixDice dice) {
        BigInteger total = BigInteger.ZERO;
        for (int d = 0; d < dice.players(); d++) {
            total = total.add(dice.sides(d));
        }
        if (total.compareTo(BigInteger.valueOf(MAX_LISTED_FACES)) > 0) {
            return dice;
        }
        List<long[]> faces = new ArrayList<>();
        for (int d = 0; d < dice.players(); d++) {
            int sides = dice.sides(d).intValueExact();
            long[] values = new long[sides];
            BigInteger[] digits = new BigInteger[dice.digits()];
            for (int f = 0; f < sides; f++) {
                // Face index f as mixed-radix digits, most significant first.
                int rest = f;
                for (int j = dice.digits() - 1; j >= 0; j--) {
                    int radix = dice.radix(d, j).intValueExact();
                    digits[j] = BigInteger.valueOf(rest % radix);
                    rest /= radix;
                }
                values[f] = dice.faceValue(d, digits).longValueExact();
            }
            faces.add(values);
        }
        return new ExplicitDice(dice.id() + LISTED_SUFFIX, DiceSet.of(faces, null), dice.grade(), dice.subsetDepth());
    }
}
