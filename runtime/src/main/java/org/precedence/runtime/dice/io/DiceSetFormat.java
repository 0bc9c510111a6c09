package org.precedence.runtime.dice.io;

/** The two written forms of a dice set. */
public enum DiceSetFormat {
    /** {@code {"dice": [[1, 8, 11], …]}}, optionally with names. */
    JSON,
    /** One die per line: {@code [name:] value value …}, {@code #} comments. */
    TEXT;

    /**
     * Guesses the form from the first character that is not white space (or a byte-order
     * mark): {@code {} or {@code [} means JSON, anything else text.
     */
    public static DiceSetFormat detect(String text) {
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            if (c == '\uFEFF' || Character.isWhitespace(c)) {
                continue;
            }
            return c == '{' || c == '[' ? JSON : TEXT;
        }
        return TEXT;
    }
}
