package org.precedence.runtime.dice;

/**
 * Default die names: A, B, …, Z, then AA, AB, … (bijective base 26, like spreadsheet columns),
 * so a ranking of any number of dice can be written as letters.
 */
public final class DieNames {
    private DieNames() {
    }

    /** Returns the default name of die {@code index} (0 gives "A"). */
    public static String of(int index) {
        if (index < 0) {
            throw new IllegalArgumentException("die index must be >= 0, got " + index);
        }
        StringBuilder sb = new StringBuilder();
        int n = index + 1;
        while (n > 0) {
            int r = (n - 1) % 26;
            sb.append((char) ('A' + r));
            n = (n - 1) / 26;
        }
        return sb.reverse().toString();
    }

    /** Returns the index named by {@code name} ("A" gives 0), or -1 if it is not such a name. */
    public static int indexOf(String name) {
        if (name == null || name.isEmpty() || name.length() > 6) {
            return -1;
        }
        int n = 0;
        for (int i = 0; i < name.length(); i++) {
            char c = name.charAt(i);
            if (c < 'A' || c > 'Z') {
                return -1;
            }
            n = n * 26 + (c - 'A' + 1);
        }
        return n - 1;
    }

    /**
     * Writes a ranking (die indices in acting order) as concatenated names when every die has
     * a one-letter name ("BAC"), otherwise joined by hyphens ("AA-B-C").
     */
    public static String ranking(int[] dice) {
        boolean single = true;
        for (int d : dice) {
            single &= d < 26;
        }
        StringBuilder sb = new StringBuilder();
        for (int i = 0; i < dice.length; i++) {
            if (!single && i > 0) {
                sb.append('-');
            }
            sb.append(of(dice[i]));
        }
        return sb.toString();
    }
}
