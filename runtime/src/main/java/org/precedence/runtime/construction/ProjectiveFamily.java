package org.precedence.runtime.construction;

import java.math.BigInteger;
import java.util.List;

/**
 * PGL(2,q): the maps x ↦ (a·x + b)/(c·x + d) with ad − bc ≠ 0 on the q+1 points of the
 * projective line over the field with q elements (points 0..q−1 are field elements, point q is
 * ∞), (q+1)q(q−1) of them, sharply 3-transitive. Member {@code i} is the map sending
 * (0, 1, 2) to the ordered triple of rank i, built from cross-ratio matrices on demand.
 */
final class ProjectiveFamily implements PermutationFamily {
    private final GaloisField field;
    private final int q;
    private final int infinity;
    /**
     * {@code inverse[i·(q+1) + y]}: the point member i sends to y, built on first use (about
     * 10^4 entries for the served fields); racy but safe, each thread builds the same table.
     */
    private volatile byte[] inverse;
    /** The cross-ratio matrix sending the base (0, 1, 2) to (∞, 0, 1). */
    private final int[] baseToStandard;

    ProjectiveFamily(int q) {
        this.field = GaloisField.of(q);
        this.q = q;
        this.infinity = q;
        this.baseToStandard = toStandard(0, 1, 2);
    }

    @Override
    public String name() {
        return "PGL(2," + q + ")";
    }

    @Override
    public int points() {
        return q + 1;
    }

    @Override
    public BigInteger order() {
        return BigInteger.valueOf((long) (q + 1) * q * (q - 1));
    }

    @Override
    public int uniformTuples() {
        return 3;
    }

    @Override
    public void member(BigInteger index, int[] out) {
        long i = index.longValueExact();
        if (i < 0 || i >= order().longValueExact()) {
            throw new IndexOutOfBoundsException("member " + index + " of " + name());
        }
        int[] y = new int[3];
        FamilySamples.tupleOf((int) i, 3, q + 1, y);
        // f = C_y⁻¹ ∘ C_base, where C_t sends t to (∞, 0, 1); the adjugate inverts up to scalar.
        int[] m = multiply(adjugate(toStandard(y[0], y[1], y[2])), baseToStandard);
        for (int x = 0; x <= q; x++) {
            out[x] = apply(m, x);
        }
    }

    @Override
    public int preimage(long index, int letter, int[] scratch) {
        int points = q + 1;
        if (points > 128 || (long) points * points * q > 1 << 20) {
            return PermutationFamily.super.preimage(index, letter, scratch);
        }
        long count = (long) points * q * (q - 1);
        if (index < 0 || index >= count) {
            throw new IndexOutOfBoundsException("member " + index + " of " + name());
        }
        if (letter < 0 || letter >= points) {
            throw new IllegalArgumentException("point " + letter + " is not below " + points);
        }
        byte[] table = inverse;
        if (table == null) {
            table = new byte[(int) count * points];
            int[] image = new int[points];
            for (int i = 0; i < count; i++) {
                member(BigInteger.valueOf(i), image);
                for (int x = 0; x < points; x++) {
                    table[i * points + image[x]] = (byte) x;
                }
            }
            inverse = table;
        }
        return table[(int) index * points + letter];
    }

    /** Returns [a, b, c, d] of the map sending y0 → ∞, y1 → 0, y2 → 1. */
    private int[] toStandard(int y0, int y1, int y2) {
        GaloisField f = field;
        if (y0 == infinity) {
            return new int[] {1, f.neg(y1), 0, f.sub(y2, y1)};
        }
        if (y1 == infinity) {
            return new int[] {0, f.sub(y2, y0), 1, f.neg(y0)};
        }
        if (y2 == infinity) {
            return new int[] {1, f.neg(y1), 1, f.neg(y0)};
        }
        int u = f.sub(y2, y0);
        int v = f.sub(y2, y1);
        return new int[] {u, f.neg(f.mul(y1, u)), v, f.neg(f.mul(y0, v))};
    }

    private int[] adjugate(int[] m) {
        return new int[] {m[3], field.neg(m[1]), field.neg(m[2]), m[0]};
    }

    private int[] multiply(int[] l, int[] r) {
        GaloisField f = field;
        return new int[] {
            f.add(f.mul(l[0], r[0]), f.mul(l[1], r[2])),
            f.add(f.mul(l[0], r[1]), f.mul(l[1], r[3])),
            f.add(f.mul(l[2], r[0]), f.mul(l[3], r[2])),
            f.add(f.mul(l[2], r[1]), f.mul(l[3], r[3])),
        };
    }

    private int apply(int[] m, int x) {
        GaloisField f = field;
        int num;
        int den;
        if (x == infinity) {
            num = m[0];
            den = m[2];
        } else {
            num = f.add(f.mul(m[0], x), m[1]);
            den = f.add(f.mul(m[2], x), m[3]);
        }
        return den == 0 ? infinity : f.mul(num, f.inv(den));
    }

    @Override
    public FamilyProof prove() {
        int[] shift = new int[q + 1];
        int[] scale = new int[q + 1];
        int[] flip = new int[q + 1];
        for (int x = 0; x < q; x++) {
            shift[x] = field.add(x, 1);
            scale[x] = field.mul(field.primitive(), x);
            flip[x] = x == 0 ? infinity : field.inv(x);
        }
        shift[q] = infinity;
        scale[q] = infinity;
        flip[q] = 0;
        String how = SharplyTransitiveCheck.prove(this, 3, List.of(shift, scale, flip));
        return new FamilyProof(name(), q + 1, order(), 3, how + "; generators x+1, "
                + field.primitive() + "·x and 1/x");
    }
}
