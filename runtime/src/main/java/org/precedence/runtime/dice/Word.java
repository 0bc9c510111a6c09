package org.precedence.runtime.dice;

import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.Arrays;
import java.util.HexFormat;

/**
 * The word of a dice set: every face value in increasing order, each replaced by the index of
 * its die. A set and its word are the same object up to renumbering the faces 1..total.
 *
 * <p>Immutable. Letters are die indices {@code 0..players-1}; every die occurs at least once.
 */
public final class Word {
    private final int players;
    private final int[] letters;

    private Word(int players, int[] letters) {
        this.players = players;
        this.letters = letters;
    }

    /**
     * Creates a word over {@code players} letters.
     *
     * @throws InvalidDiceSetException if a letter is out of range or some die never occurs
     */
    public static Word of(int players, int... letters) {
        if (players < 2) {
            throw new InvalidDiceSetException("a set needs at least 2 dice, got " + players);
        }
        int[] copy = letters.clone();
        int[] seen = new int[players];
        for (int i = 0; i < copy.length; i++) {
            int l = copy[i];
            if (l < 0 || l >= players) {
                throw new InvalidDiceSetException("letter " + l + " at position " + (i + 1)
                        + " is outside 0.." + (players - 1));
            }
            seen[l]++;
        }
        for (int d = 0; d < players; d++) {
            if (seen[d] == 0) {
                throw new InvalidDiceSetException("die " + DieNames.of(d) + " is empty");
            }
        }
        return new Word(players, copy);
    }

    /**
     * Parses letters written with die names: "ABCCBA" when all dice have one-letter names,
     * or names separated by spaces, commas or hyphens ("AA B C").
     */
    public static Word parse(String text) {
        String trimmed = text.strip();
        String[] tokens = trimmed.contains(" ") || trimmed.contains(",") || trimmed.contains("-")
                ? trimmed.split("[\\s,\\-]+")
                : trimmed.split("");
        int[] letters = new int[tokens.length];
        int max = -1;
        for (int i = 0; i < tokens.length; i++) {
            int idx = DieNames.indexOf(tokens[i]);
            if (idx < 0) {
                throw new InvalidDiceSetException("'" + tokens[i] + "' at letter " + (i + 1)
                        + " is not a die name (A..Z, AA..)");
            }
            letters[i] = idx;
            max = Math.max(max, idx);
        }
        return of(max + 1, letters);
    }

    /** Returns the number of dice. */
    public int players() {
        return players;
    }

    /** Returns the number of letters (total faces of the set). */
    public int length() {
        return letters.length;
    }

    /** Returns the die at position {@code i} (0-based). */
    public int letterAt(int i) {
        return letters[i];
    }

    /** Returns a copy of the letters. */
    public int[] letters() {
        return letters.clone();
    }

    /** Returns the word read backwards (the set with every face value negated). */
    public Word reversed() {
        int[] r = new int[letters.length];
        for (int i = 0; i < r.length; i++) {
            r[i] = letters[letters.length - 1 - i];
        }
        return new Word(players, r);
    }

    /** Returns this word followed by {@code other} (same number of dice). */
    public Word concat(Word other) {
        if (other.players != players) {
            throw new IllegalArgumentException("cannot join words over " + players + " and "
                    + other.players + " dice");
        }
        int[] r = Arrays.copyOf(letters, letters.length + other.letters.length);
        System.arraycopy(other.letters, 0, r, letters.length, other.letters.length);
        return new Word(players, r);
    }

    /** Returns the word with each letter {@code l} replaced by {@code relabel[l]} (a permutation). */
    public Word relabel(int[] relabel) {
        int[] r = new int[letters.length];
        for (int i = 0; i < r.length; i++) {
            r[i] = relabel[letters[i]];
        }
        return new Word(players, r);
    }

    /** Returns the number of faces of each die. */
    public int[] sides() {
        int[] s = new int[players];
        for (int l : letters) {
            s[l]++;
        }
        return s;
    }

    /** Returns the set with faces numbered 1..length in word order. */
    public DiceSet toDiceSet() {
        int[] sides = sides();
        long[][] faces = new long[players][];
        for (int d = 0; d < players; d++) {
            faces[d] = new long[sides[d]];
        }
        int[] next = new int[players];
        for (int i = 0; i < letters.length; i++) {
            int d = letters[i];
            faces[d][next[d]++] = i + 1;
        }
        return DiceSet.of(faces);
    }

    /**
     * Returns the canonical text of the set: {@code precedence-word-v1:} followed by the
     * letters as decimal die indices joined by commas. Two sets have the same canonical text
     * exactly when they have the same word.
     */
    public String canonicalText() {
        StringBuilder sb = new StringBuilder(16 + 3 * letters.length).append("precedence-word-v1:");
        for (int i = 0; i < letters.length; i++) {
            if (i > 0) {
                sb.append(',');
            }
            sb.append(letters[i]);
        }
        return sb.toString();
    }

    /** Returns SHA-256 (FIPS 180-4) of the UTF-8 {@link #canonicalText()}, as lowercase hex. */
    public String sha256() {
        try {
            byte[] digest = MessageDigest.getInstance("SHA-256")
                    .digest(canonicalText().getBytes(StandardCharsets.UTF_8));
            return HexFormat.of().formatHex(digest);
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("every Java platform must provide SHA-256", e);
        }
    }

    /** Returns the word written with die names (see {@link DieNames#ranking}). */
    @Override
    public String toString() {
        return DieNames.ranking(letters);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Word w && w.players == players && Arrays.equals(w.letters, letters);
    }

    @Override
    public int hashCode() {
        return 31 * players + Arrays.hashCode(letters);
    }
}
