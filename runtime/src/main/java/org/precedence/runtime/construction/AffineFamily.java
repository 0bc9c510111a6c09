package org.precedence.runtime.construction;

import java.math.BigInteger;
import java.util.List;

/**
 * AGL(1,q): the maps x ↦ a·x + b (a ≠ 0) of the field with q elements, q(q−1) of them, sharply
 * 2-transitive. Member {@code i} is the map sending (0, 1) to the ordered pair of rank i, i.e.
 * b = image of 0 and a = image of 1 − b. Computed on demand from the field tables.
 */
final class AffineFamily implements PermutationFamily {
    private final GaloisField field;
    private final int q;

    AffineFamily(int q) {
        this.field = GaloisField.of(q);
        this.q = q;
    }

    @Override
    public String name() {
        return "AGL(1," + q + ")";
    }

    @Override
    public int points() {
        return q;
    }

    @Override
    public BigInteger order() {
        return BigInteger.valueOf((long) q * (q - 1));
    }

    @Override
    public int uniformTuples() {
        return 2;
    }

    @Override
    public void member(BigInteger index, int[] out) {
        int i = index.intValueExact();
        if (i < 0 || i >= q * (q - 1)) {
            throw new IndexOutOfBoundsException("member " + index + " of " + name());
        }
        int[] pair = new int[2];
        FamilySamples.tupleOf(i, 2, q, pair);
        int b = pair[0];
        int a = field.sub(pair[1], b);
        for (int x = 0; x < q; x++) {
            out[x] = field.add(field.mul(a, x), b);
        }
    }

    @Override
    public FamilyProof prove() {
        int[] shift = new int[q];
        int[] scale = new int[q];
        for (int x = 0; x < q; x++) {
            shift[x] = field.add(x, 1);
            scale[x] = field.mul(field.primitive(), x);
        }
        String how = SharplyTransitiveCheck.prove(this, 2, List.of(shift, scale));
        return new FamilyProof(name(), q, order(), 2, how + "; generators x+1 and "
                + field.primitive() + "·x");
    }
}
