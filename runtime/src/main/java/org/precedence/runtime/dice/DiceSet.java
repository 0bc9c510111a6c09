package org.precedence.runtime.dice;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * An explicit set of n ≥ 2 dice: each die a list of face values, each face equally likely, all
 * values distinct across the set. Side counts may differ between dice. Immutable.
 *
 * <p>Only the relative order of the values matters for fairness; {@link #word()} and
 * {@link #renumbered()} expose that.
 */
public final class DiceSet {
    private final long[][] faces;
    private final List<String> names;

    private DiceSet(long[][] faces, List<String> names) {
        this.faces = faces;
        this.names = names;
    }

    /** Creates a set with the default names A, B, C, …. */
    public static DiceSet of(long[]... faces) {
        return of(Arrays.asList(faces), null);
    }

    /** Creates a set from int faces with the default names. */
    public static DiceSet ofInts(int[]... faces) {
        long[][] f = new long[faces.length][];
        for (int d = 0; d < faces.length; d++) {
            f[d] = Arrays.stream(faces[d]).asLongStream().toArray();
        }
        return of(f);
    }

    /**
     * Creates a set, validating it.
     *
     * @param faces face values per die (copied)
     * @param names die names, or null for A, B, C, …; names must be distinct and non-blank
     * @throws InvalidDiceSetException naming the die and value at fault
     */
    public static DiceSet of(List<long[]> faces, List<String> names) {
        if (faces == null || faces.size() < 2) {
            throw new InvalidDiceSetException("a set needs at least 2 dice, got "
                    + (faces == null ? 0 : faces.size()));
        }
        int n = faces.size();
        List<String> resolved = new ArrayList<>(n);
        if (names == null) {
            for (int d = 0; d < n; d++) {
                resolved.add(DieNames.of(d));
            }
        } else {
            if (names.size() != n) {
                throw new InvalidDiceSetException(n + " dice but " + names.size() + " names");
            }
            Map<String, Integer> seenNames = new HashMap<>();
            for (int d = 0; d < n; d++) {
                String name = names.get(d);
                checkName(d, name);
                Integer prior = seenNames.putIfAbsent(name, d);
                if (prior != null) {
                    throw new InvalidDiceSetException("dice " + DieNames.of(prior) + " and "
                            + DieNames.of(d) + " share the name '" + name + "'");
                }
                resolved.add(name);
            }
        }
        long[][] copy = new long[n][];
        Map<Long, Integer> owner = new HashMap<>();
        for (int d = 0; d < n; d++) {
            long[] die = faces.get(d);
            if (die == null || die.length == 0) {
                throw new InvalidDiceSetException("die " + resolved.get(d) + " is empty");
            }
            copy[d] = die.clone();
            for (long v : die) {
                Integer prior = owner.putIfAbsent(v, d);
                if (prior != null) {
                    throw new InvalidDiceSetException(prior == d
                            ? "duplicate value " + v + " on die " + resolved.get(d)
                            : "duplicate value " + v + " on dice " + resolved.get(prior)
                                    + " and " + resolved.get(d));
                }
            }
        }
        return new DiceSet(copy, List.copyOf(resolved));
    }

    /** Longest die name accepted. */
    public static final int MAX_NAME_LENGTH = 64;

    /**
     * Names must be non-blank, at most {@link #MAX_NAME_LENGTH} characters, without leading or
     * trailing white space and without control characters, so they print on one line.
     *
     * @param d    index of the die (for the message)
     * @param name the proposed name
     * @throws InvalidDiceSetException saying what is wrong with the name
     */
    public static void checkName(int d, String name) {
        String die = "die " + DieNames.of(d);
        if (name == null || name.isBlank()) {
            throw new InvalidDiceSetException(die + " has a blank name");
        }
        if (name.length() > MAX_NAME_LENGTH) {
            throw new InvalidDiceSetException("name of " + die + " is " + name.length()
                    + " characters long; at most " + MAX_NAME_LENGTH + " are allowed");
        }
        if (!name.strip().equals(name)) {
            throw new InvalidDiceSetException("name of " + die + " ('" + name
                    + "') starts or ends with white space");
        }
        for (int i = 0; i < name.length(); i++) {
            if (Character.isISOControl(name.charAt(i))) {
                throw new InvalidDiceSetException("name of " + die + " contains control character U+"
                        + String.format("%04X", (int) name.charAt(i)) + " at character " + (i + 1));
            }
        }
    }

    /** Returns whether the dice carry the default names A, B, C, … in order. */
    public boolean hasDefaultNames() {
        for (int d = 0; d < names.size(); d++) {
            if (!names.get(d).equals(DieNames.of(d))) {
                return false;
            }
        }
        return true;
    }

    /** Returns the number of dice. */
    public int players() {
        return faces.length;
    }

    /** Returns the side count of each die. */
    public int[] sides() {
        int[] s = new int[faces.length];
        for (int d = 0; d < s.length; d++) {
            s[d] = faces[d].length;
        }
        return s;
    }

    /** Returns the total number of faces. */
    public int totalFaces() {
        int t = 0;
        for (long[] f : faces) {
            t += f.length;
        }
        return t;
    }

    /** Returns a copy of die {@code d}'s faces, in the order given. */
    public long[] faces(int d) {
        return faces[d].clone();
    }

    /** Returns face {@code i} of die {@code d}. */
    public long face(int d, int i) {
        return faces[d][i];
    }

    /** Returns the die names. */
    public List<String> names() {
        return names;
    }

    /** Returns whether every die has the same number of sides. */
    public boolean equalSides() {
        for (long[] f : faces) {
            if (f.length != faces[0].length) {
                return false;
            }
        }
        return true;
    }

    /** Returns the word: all values in increasing order, each replaced by its die. */
    public Word word() {
        int total = totalFaces();
        long[] keys = new long[total];
        int[] die = new int[total];
        Integer[] idx = new Integer[total];
        int k = 0;
        for (int d = 0; d < faces.length; d++) {
            for (long v : faces[d]) {
                keys[k] = v;
                die[k] = d;
                idx[k] = k;
                k++;
            }
        }
        Arrays.sort(idx, (a, b) -> Long.compare(keys[a], keys[b]));
        int[] letters = new int[total];
        for (int i = 0; i < total; i++) {
            letters[i] = die[idx[i]];
        }
        return Word.of(faces.length, letters);
    }

    /** Returns the same set with faces renumbered 1..total, each die's faces ascending, names kept. */
    public DiceSet renumbered() {
        DiceSet plain = word().toDiceSet();
        return new DiceSet(plain.faces, names);
    }

    /** Returns the subset of the given dice (in the order given), values and names kept. */
    public DiceSet subset(int... dice) {
        boolean[] taken = new boolean[faces.length];
        for (int d : dice) {
            if (d < 0 || d >= faces.length) {
                throw new IllegalArgumentException("die index " + d + " outside 0.." + (faces.length - 1));
            }
            if (taken[d]) {
                throw new IllegalArgumentException("die " + names.get(d) + " chosen twice");
            }
            taken[d] = true;
        }
        List<long[]> f = new ArrayList<>();
        List<String> n = new ArrayList<>();
        for (int d : dice) {
            f.add(faces[d]);
            n.add(names.get(d));
        }
        return of(f, n);
    }

    /** Returns SHA-256 of the canonical form (the word); see {@link Word#sha256()}. */
    public String sha256() {
        return word().sha256();
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof DiceSet s && Arrays.deepEquals(s.faces, faces) && s.names.equals(names);
    }

    @Override
    public int hashCode() {
        return 31 * Arrays.deepHashCode(faces) + names.hashCode();
    }

    @Override
    public String toString() {
        StringBuilder sb = new StringBuilder("DiceSet[");
        for (int d = 0; d < faces.length; d++) {
            if (d > 0) {
                sb.append("; ");
            }
            sb.append(names.get(d)).append('=').append(Arrays.toString(faces[d]));
        }
        return sb.append(']').toString();
    }
}
