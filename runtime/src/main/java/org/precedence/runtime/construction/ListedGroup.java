package org.precedence.runtime.construction;

import java.math.BigInteger;
import java.util.List;

/**
 * A sharply k-transitive group held as a table: member i is the element sending the base tuple
 * (0, …, k−1) to the ordered k-tuple of rank i, {@code points} bytes per member. Used for the
 * Mathieu groups, whose elements have no short formula; the table is built once per process
 * and shared by every set that uses the group.
 */
final class ListedGroup implements PermutationFamily {
    private final String name;
    private final int points;
    private final int k;
    private final byte[] table;
    private final List<int[]> generators;
    private final String origin;

    ListedGroup(String name, int points, int k, byte[] table, List<int[]> generators, String origin) {
        this.name = name;
        this.points = points;
        this.k = k;
        this.table = table;
        this.generators = List.copyOf(generators);
        this.origin = origin;
    }

    @Override
    public String name() {
        return name;
    }

    @Override
    public int points() {
        return points;
    }

    @Override
    public BigInteger order() {
        return BigInteger.valueOf(table.length / points);
    }

    @Override
    public int uniformTuples() {
        return k;
    }

    @Override
    public void member(BigInteger index, int[] out) {
        int i = index.intValueExact();
        if (i < 0 || i >= table.length / points) {
            throw new IndexOutOfBoundsException("member " + index + " of " + name);
        }
        for (int x = 0; x < points; x++) {
            out[x] = table[i * points + x];
        }
    }

    @Override
    public FamilyProof prove() {
        String how = SharplyTransitiveCheck.prove(this, k, generators);
        return new FamilyProof(name, points, order(), k, origin + "; " + how);
    }
}
