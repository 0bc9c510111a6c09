package org.precedence.runtime.construction;

import java.lang.invoke.MethodHandles;
import java.lang.invoke.VarHandle;
import java.math.BigInteger;
import java.nio.ByteOrder;
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
    private static final VarHandle BIG_ENDIAN_LONGS = MethodHandles.byteArrayViewVarHandle(long[].class,
            ByteOrder.BIG_ENDIAN);
    private final Construction construction;
    private final int players;
    /** Made once: every round reports it, and the construction never changes. */
    private final String id;
    /** Levels in digit order: element 0 is the top level. */
    private final Level[] byDigit;
    private final BigInteger[] radix;
    /** {@code innerLength[j]}: length of the word one level below digit j's level. */
    private final BigInteger[] innerLength;
    /** Start word position of each face: {@code startPosition[letter][face]}, 0-based. */
    private final int[][] startPosition;
    private final boolean startDigit;
    /** Each radix as a long, or 0 when it is 2^63 or more (prefix keys never reach those). */
    private final long[] radixLong;
    /**
     * {@link Level#reversed(long)} unrolled for the prefix keys, which the fast ranking computes
     * for every die every round: per digit, whether every nonzero block is reversed, else the
     * listed flags (or null: never reversed).
     */
    private final boolean[] nonZeroReversed;
    private final boolean[][] listedReversed;
    /** Radices as longs when every one is below 2^62, else null (no long face path). */
    private final long[] longRadix;
    /** {@code flushBefore[j]}: the long face path starts a new 62-bit chunk at digit j. */
    private final boolean[] flushBefore;
    /** As {@link #flushBefore} for the face index, over every digit (the start digit too). */
    private final boolean[] indexFlushBefore;
    /** Limbs (64-bit, least significant first) enough for any face value. */
    private final int limbs;
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
        this.id = "construction-" + players + ":" + construction.method().replace(" · ", "+");
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
        long[] lr = new long[radix.length];
        boolean fits = true;
        for (int j = 0; j < radix.length; j++) {
            fits &= radix[j].bitLength() < 62;
            lr[j] = radix[j].longValue();
        }
        this.longRadix = fits ? lr : null;
        this.radixLong = new long[radix.length];
        for (int j = 0; j < radix.length; j++) {
            radixLong[j] = radix[j].bitLength() < 63 ? radix[j].longValue() : 0;
        }
        this.nonZeroReversed = new boolean[l];
        this.listedReversed = new boolean[l][];
        for (int j = 0; j < l; j++) {
            nonZeroReversed[j] = byDigit[j].reversesAllButFirst();
            listedReversed[j] = byDigit[j].listedReversals();
        }
        this.flushBefore = new boolean[l];
        long chunkProduct = 1;
        for (int j = 0; j < l && fits; j++) {
            if (Long.MAX_VALUE / lr[j] <= chunkProduct) {
                flushBefore[j] = true;
                chunkProduct = 1;
            }
            chunkProduct *= lr[j];
        }
        this.indexFlushBefore = new boolean[radix.length];
        chunkProduct = 1;
        for (int j = 0; j < radix.length && fits; j++) {
            if (Long.MAX_VALUE / lr[j] <= chunkProduct) {
                indexFlushBefore[j] = true;
                chunkProduct = 1;
            }
            chunkProduct *= lr[j];
        }
        this.limbs = construction.sidesPerDie().multiply(BigInteger.valueOf(players)).bitLength() / 64 + 1;
        int[] letters = construction.start().word().letters();
        this.startPosition = new int[players][m];
        int[] next = new int[players];
        for (int pos = 0; pos < letters.length; pos++) {
            startPosition[letters[pos]][next[letters[pos]]++] = pos;
        }
        if (construction.hasWordSpecificLevels()) {
            // Compose exact counts through the last word-specific level, patterns up to the
            // depth it claims; the uniform levels after it are covered by their family proofs.
            int last = 0;
            for (int i = 0; i < l; i++) {
                if (levels.get(i).isWordSpecific()) {
                    last = i;
                }
            }
            int claimed = levels.get(last).liftsTo();
            ComposedCounts counts = ComposedCounts.of(construction, last + 1, claimed);
            int[] depths = counts.depthAfterLevel();
            for (int i = 0; i <= last; i++) {
                if (depths[i] < levels.get(i).liftsTo()) {
                    throw new IllegalStateException(levels.get(i).name() + " reaches depth " + depths[i]
                            + ", not " + levels.get(i).liftsTo() + ", on its word");
                }
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
        return id;
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

    /**
     * Returns how many leading digits the fast ranking draws for every die: the fewest whose
     * radices multiply to at least 2^{@code minBits} (or as many as keep the product below
     * 2^62, if fewer), at least one.
     */
    public int prefixDigits(int minBits) {
        BigInteger limit = BigInteger.ONE.shiftLeft(62);
        BigInteger wanted = BigInteger.ONE.shiftLeft(minBits);
        BigInteger product = BigInteger.ONE;
        int k = 0;
        while (k < byDigit.length) {
            BigInteger next = product.multiply(radix[k]);
            if (next.compareTo(limit) >= 0) {
                break;
            }
            product = next;
            k++;
            if (product.compareTo(wanted) >= 0) {
                break;
            }
        }
        return Math.max(k, 1);
    }

    /**
     * Returns the prefix key of a face's first {@code k} digits ({@code k ≤ }{@link
     * #prefixDigits}): the rank, in value order, of the sub-block of the word those digits
     * select. Faces with different keys compare as their keys do ({@link #compare} would
     * decide them within these digits, since relabelling only matters at the bottom); equal
     * keys leave the comparison to the later digits.
     */
    public long prefixKey(long[] digits, int k) {
        long key = 0;
        // All ones while an odd number of enclosing blocks is reversed. Branch-free: the digits
        // are random, so a branch on them would mispredict about every other die.
        long negative = 0;
        for (int j = 0; j < k; j++) {
            long r = radixLong[j];
            long d = digits[j];
            // A reversed enclosing block reads its sub-blocks from the last to the first.
            key = key * r + d + ((r - 1 - 2 * d) & negative);
            negative = flipAfter(j, d, negative);
        }
        return key;
    }

    /**
     * Returns whether an odd number of the blocks that the first {@code k} digits select are
     * reversed, i.e. whether digit k is read backwards ({@code d ↦ radix − 1 − d}) in value order.
     */
    public boolean readsBackwardsAfter(long[] digits, int k) {
        long negative = 0;
        for (int j = 0; j < k; j++) {
            negative = flipAfter(j, digits[j], negative);
        }
        return negative != 0;
    }

    /** The reversal mask below digit j's block d: {@code negative} flipped if that block is reversed. */
    private long flipAfter(int j, long d, long negative) {
        if (nonZeroReversed[j]) {
            return negative ^ ((d | -d) >> 63); // d ≥ 0: all ones exactly when d ≠ 0
        }
        boolean[] listed = listedReversed[j];
        return listed != null && listed[(int) d] ? ~negative : negative;
    }

    /**
     * {@inheritDoc}
     *
     * <p>Here the key is the {@link #prefixKey prefix key}, the rank of the sub-block in value
     * order: its mixed-radix digits t_j, each read backwards (d_j = R_j − 1 − t_j) while an odd
     * number of the enclosing blocks (the digits above j) are reversed.
     */
    @Override
    public void leadingDigits(int die, long key, int k, long[] out) {
        checkDie(die);
        long v = key;
        for (int j = k - 1; j >= 0; j--) {
            out[j] = v % radixLong[j];
            v /= radixLong[j];
        }
        long negative = 0;
        for (int j = 0; j < k; j++) {
            long r = radixLong[j];
            long d = out[j] + ((r - 1 - 2 * out[j]) & negative);
            out[j] = d;
            negative = flipAfter(j, d, negative);
        }
    }

    /** Returns whether {@link #faceValue(int, long[], int[], long[])} serves this set (every radix below 2^62). */
    public boolean hasLongDigits() {
        return longRadix != null;
    }

    /** Returns how many longs the {@code limbs} scratch of the long face path needs. */
    public int faceLimbs() {
        return limbs;
    }

    /**
     * Returns what {@link #faceValue(int, BigInteger[])} returns for the same digits, computed
     * on longs: the value is the mixed-radix number of the digits with every digit below a
     * reversed block read backwards (d ↦ radix − 1 − d), times the start word's length, plus
     * the letter's position in the start word (also read backwards under an odd number of
     * reversals), plus one. Scratch: {@code letters} of at least {@link #players()} ints,
     * {@code limbs} of at least {@link #faceLimbs()} longs.
     *
     * @throws IllegalStateException if the set has a radix of 2^62 or more ({@link #hasLongDigits()})
     */
    public BigInteger faceValue(int die, long[] digits, int[] letters, long[] limbs) {
        checkDie(die);
        if (longRadix == null) {
            throw new IllegalStateException(id() + " has digits of 2^62 or more");
        }
        java.util.Arrays.fill(limbs, 0, this.limbs, 0);
        boolean negative = false;
        int letter = die;
        int l = byDigit.length;
        long chunk = 0;
        long chunkRadix = 1;
        for (int j = 0; j < l; j++) {
            long r = longRadix[j];
            long d = digits[j];
            if (d < 0 || d >= r) {
                throw new IllegalArgumentException("digit " + j + " must be in 0.." + (r - 1) + ", got " + d);
            }
            if (flushBefore[j]) {
                mulAdd(limbs, chunkRadix, chunk);
                chunk = 0;
                chunkRadix = 1;
            }
            chunk = chunk * r + (negative ? r - 1 - d : d);
            chunkRadix *= r;
            Level level = byDigit[j];
            if (level.reversed(d)) {
                negative = !negative;
            }
            letter = level.preimage(d, letter, letters);
        }
        mulAdd(limbs, chunkRadix, chunk);
        int m = startPosition[0].length;
        int face = startDigit ? Math.toIntExact(digits[l]) : 0;
        if (face < 0 || face >= m) {
            throw new IllegalArgumentException("digit " + l + " must be in 0.." + (m - 1) + ", got " + face);
        }
        long length = (long) players * m;
        long inner = startPosition[letter][face];
        mulAdd(limbs, length, (negative ? length - 1 - inner : inner) + 1);
        return toBigInteger(limbs);
    }

    /**
     * Returns the face index of a face given by its digits (most significant first): the
     * mixed-radix number they spell, {@code Σ digits[j] · R_{j+1} · … · R_{m−1}} (the face
     * index of {@link MixedRadixDice}), computed on 64-bit limbs ({@code limbs}: scratch of at
     * least {@link #faceLimbs()} longs).
     *
     * @throws IllegalStateException    if the set has a radix of 2^62 or more ({@link #hasLongDigits()})
     * @throws IllegalArgumentException if there are too few digits or one is outside its radix
     */
    public BigInteger faceIndex(long[] digits, long[] limbs) {
        if (longRadix == null) {
            throw new IllegalStateException(id() + " has digits of 2^62 or more");
        }
        if (digits.length < longRadix.length) {
            throw new IllegalArgumentException("a face has " + longRadix.length + " digits, got " + digits.length);
        }
        java.util.Arrays.fill(limbs, 0, this.limbs, 0);
        long chunk = 0;
        long chunkRadix = 1;
        for (int j = 0; j < longRadix.length; j++) {
            long r = longRadix[j];
            long d = digits[j];
            if (d < 0 || d >= r) {
                throw new IllegalArgumentException("digit " + j + " must be in 0.." + (r - 1) + ", got " + d);
            }
            if (indexFlushBefore[j]) {
                mulAdd(limbs, chunkRadix, chunk);
                chunk = 0;
                chunkRadix = 1;
            }
            chunk = chunk * r + d;
            chunkRadix *= r;
        }
        mulAdd(limbs, chunkRadix, chunk);
        return toBigInteger(limbs);
    }

    /** The non-negative number whose unsigned 64-bit limbs, least significant first, are {@code x[0..limbs)}. */
    private BigInteger toBigInteger(long[] x) {
        int top = limbs - 1;
        while (top > 0 && x[top] == 0) {
            top--;
        }
        if (top == 0 && x[0] >= 0) {
            return BigInteger.valueOf(x[0]);
        }
        // Only the limbs in use, each written big-endian by one store: the BigInteger
        // constructor's cost grows with the length of the magnitude it is given.
        byte[] bytes = new byte[(top + 1) * Long.BYTES];
        for (int i = 0; i <= top; i++) {
            BIG_ENDIAN_LONGS.set(bytes, (top - i) * Long.BYTES, x[i]);
        }
        return new BigInteger(1, bytes);
    }

    /** {@code limbs ← limbs · factor + addend} on unsigned 64-bit limbs (factor, addend ≥ 0). */
    private void mulAdd(long[] x, long factor, long addend) {
        long carry = addend;
        for (int i = 0; i < limbs; i++) {
            long lo = x[i] * factor;
            long hi = Math.multiplyHigh(x[i], factor) + ((x[i] >> 63) & factor);
            long sum = lo + carry;
            hi += Long.compareUnsigned(sum, lo) < 0 ? 1 : 0;
            x[i] = sum;
            carry = hi;
        }
        if (carry != 0) {
            throw new IllegalStateException("face value overflows " + limbs + " limbs");
        }
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
