package org.precedence.runtime.construction;

import java.math.BigInteger;
import java.util.List;
import org.precedence.api.FairnessGrade;
import org.precedence.runtime.dice.MixedRadixDice;

/**
 * A constructed order-fair set seen as {@link MixedRadixDice}; its word is never written out.
 *
 * <p>Digits, most significant first: digit j is the block index at level {@code L−1−j} (the
 * top level first), radix = that level's block count; when the start word has m > 1 faces per
 * die a last digit (radix m) picks the face in the start set. Every die has the same radices.
 *
 * <p>Comparing dice a and b walks the digits from the top: different block indices decide at
 * once (lower block, lower value); in a shared block the two letters are mapped back through the
 * block's relabelling (letter x of the previous word became σ(x)), and a reversed block flips
 * the outcome of everything below it. At the bottom the letters' positions in the start word
 * decide. Memory: the plan plus a few arrays — independent of the side count; the families are
 * implicit (S_n, A_n, AGL, PGL) or a shared table (M11, M12).
 */
public final class ConstructedDice implements MixedRadixDice {
    private final Construction construction;
    private final int players;
    /** Levels in digit order: element 0 is the top level. */
    private final Level[] byDigit;
    private final BigInteger[] radix;
    /** {@code innerLength[j]}: length of the word one level below digit j's level. */
    private final BigInteger[] innerLength;
    /** Start word position of each face: {@code startPosition[letter][face]}, 0-based. */
    private final int[][] startPosition;
    private final boolean startDigit;
    private volatile List<FamilyProof> proofs;

    /**
     * Builds the view. Levels valid only for their particular word are re-proven here by exact
     * composed counts (the set is refused otherwise); the family proofs of uniform levels are
     * properties of the code, run for every player count by the test suite and on demand by
     * {@link #proofs()}, so they stay off the serving path.
     */
    public ConstructedDice(Construction construction) {
        this.construction = construction;
        this.players = construction.players();
        List<Level> levels = construction.levels();
        int l = levels.size();
        int m = construction.start().sidesPerDie();
        this.startDigit = m > 1;
        this.byDigit = new Level[l];
        this.radix = new BigInteger[l + (startDigit ? 1 : 0)];
        this.innerLength = new BigInteger[l];
        BigInteger length = BigInteger.valueOf((long) players * m);
        for (int i = 0; i < l; i++) {
            int digit = l - 1 - i;
            byDigit[digit] = levels.get(i);
            radix[digit] = levels.get(i).blocks();
            innerLength[digit] = length;
            length = length.multiply(levels.get(i).blocks());
        }
        if (startDigit) {
            radix[l] = BigInteger.valueOf(m);
        }
        int[] letters = construction.start().word().letters();
        this.startPosition = new int[players][m];
        int[] next = new int[players];
        for (int pos = 0; pos < letters.length; pos++) {
            startPosition[letters[pos]][next[letters[pos]]++] = pos;
        }
        if (construction.hasWordSpecificLevels()) {
            ComposedCounts counts = ComposedCounts.of(construction);
            int[] depths = counts.depthAfterLevel();
            for (int i = 0; i < depths.length; i++) {
                if (depths[i] < levels.get(i).liftsTo()) {
                    throw new IllegalStateException(levels.get(i).name() + " reaches depth " + depths[i]
                            + ", not " + levels.get(i).liftsTo() + ", on its word");
                }
            }
            if (!counts.orderFair()) {
                throw new IllegalStateException(construction + " is not order-fair by exact count");
            }
        }
    }

    /** Returns the plan this set follows. */
    public Construction construction() {
        return construction;
    }

    /**
     * Returns what was checked about each level's family, first level first, running each
     * family's proof the first time it is asked for in this process.
     *
     * @throws IllegalStateException if a proof fails (a bug, never bad input)
     */
    public List<FamilyProof> proofs() {
        List<FamilyProof> p = proofs;
        if (p == null) {
            p = List.copyOf(construction.proofs());
            proofs = p;
        }
        return p;
    }

    @Override
    public String id() {
        return "construction-" + players + ":" + construction.method().replace(" · ", "+");
    }

    @Override
    public String sha256() {
        return construction.sha256();
    }

    @Override
    public int players() {
        return players;
    }

    @Override
    public int digits() {
        return radix.length;
    }

    @Override
    public BigInteger radix(int die, int digit) {
        checkDie(die);
        return radix[digit];
    }

    @Override
    public BigInteger sides(int die) {
        checkDie(die);
        return construction.sidesPerDie();
    }

    @Override
    public int compare(int a, int b, FaceDigits faces) {
        checkDie(a);
        checkDie(b);
        if (a == b) {
            throw new IllegalArgumentException("compare needs two different dice, got " + a + " twice");
        }
        int la = a;
        int lb = b;
        boolean flipped = false;
        int[] sigma = null;
        for (int j = 0; j < byDigit.length; j++) {
            BigInteger da = faces.digit(a, j);
            BigInteger db = faces.digit(b, j);
            int c = da.compareTo(db);
            if (c != 0) {
                return flipped ? -c : c;
            }
            Level level = byDigit[j];
            if (level.reversed(da)) {
                flipped = !flipped;
            }
            if (sigma == null) {
                sigma = new int[players];
            }
            if (level.relabel(da, sigma)) {
                la = preimage(sigma, la);
                lb = preimage(sigma, lb);
            }
        }
        int c;
        if (startDigit) {
            int fa = faces.digit(a, byDigit.length).intValueExact();
            int fb = faces.digit(b, byDigit.length).intValueExact();
            c = Integer.compare(startPosition[la][fa], startPosition[lb][fb]);
        } else {
            c = Integer.compare(startPosition[la][0], startPosition[lb][0]);
        }
        return flipped ? -c : c;
    }

    @Override
    public BigInteger faceValue(int die, BigInteger[] digits) {
        checkDie(die);
        if (digits.length != radix.length) {
            throw new IllegalArgumentException("a face has " + radix.length + " digits, got " + digits.length);
        }
        // Position = offset + sign · (position inside the current block's inner word).
        BigInteger offset = BigInteger.ZERO;
        boolean negative = false;
        int letter = die;
        int[] sigma = new int[players];
        for (int j = 0; j < byDigit.length; j++) {
            BigInteger block = digits[j];
            if (block.signum() < 0 || block.compareTo(radix[j]) >= 0) {
                throw new IllegalArgumentException("digit " + j + " must be in 0.." + radix[j].subtract(BigInteger.ONE)
                        + ", got " + block);
            }
            Level level = byDigit[j];
            BigInteger start = block.multiply(innerLength[j]);
            if (level.reversed(block)) {
                BigInteger last = start.add(innerLength[j]).subtract(BigInteger.ONE);
                offset = negative ? offset.subtract(last) : offset.add(last);
                negative = !negative;
            } else {
                offset = negative ? offset.subtract(start) : offset.add(start);
            }
            if (level.relabel(block, sigma)) {
                letter = preimage(sigma, letter);
            }
        }
        int face = startDigit ? digits[byDigit.length].intValueExact() : 0;
        BigInteger inner = BigInteger.valueOf(startPosition[letter][face]);
        BigInteger position = negative ? offset.subtract(inner) : offset.add(inner);
        return position.add(BigInteger.ONE);
    }

    @Override
    public FairnessGrade grade() {
        return FairnessGrade.ORDER_FAIR;
    }

    @Override
    public int subsetDepth() {
        return players;
    }

    private static int preimage(int[] sigma, int letter) {
        for (int x = 0; x < sigma.length; x++) {
            if (sigma[x] == letter) {
                return x;
            }
        }
        throw new IllegalStateException("relabelling is not a permutation");
    }

    private void checkDie(int die) {
        if (die < 0 || die >= players) {
            throw new IndexOutOfBoundsException("die " + die + " of " + players);
        }
    }

    @Override
    public String toString() {
        return "ConstructedDice[" + construction + "]";
    }
}
