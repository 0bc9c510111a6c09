package org.precedence.runtime.dice.io;

import org.precedence.runtime.dice.DiceSet;

/**
 * Our plain text form: one die per line, an optional name before a colon, face values
 * separated by spaces and/or commas; {@code #} starts a comment; blank lines are ignored.
 *
 * <pre>
 * # three dice
 * Ash:   1 6 8
 * Birch: 2 4 9
 * Cedar: 3 5 7
 * </pre>
 */
final class TextSetFormat {
    private TextSetFormat() {
    }

    static DiceSet read(String text) {
        SetBuilder b = new SetBuilder();
        String[] lines = text.split("\r\n|\r|\n", -1);
        int lastLine = 1;
        int lastColumn = 1;
        for (int li = 0; li < lines.length; li++) {
            String line = lines[li];
            int lineNo = li + 1;
            if (li == 0 && line.startsWith("\uFEFF")) {
                line = " " + line.substring(1); // keep the columns of a line with a byte-order mark
            }
            int hash = line.indexOf('#');
            String content = hash >= 0 ? line.substring(0, hash) : line;
            if (content.isBlank()) {
                continue;
            }
            int start = firstNonBlank(content, 0);
            b.startDie(new Position(lineNo, start + 1));
            int colon = content.indexOf(':');
            int facesFrom = start;
            if (colon >= 0) {
                String name = content.substring(start, colon).strip();
                if (name.isEmpty()) {
                    throw new Position(lineNo, colon + 1).error("empty die name before ':'");
                }
                b.name(name, new Position(lineNo, start + 1));
                facesFrom = colon + 1;
            }
            int i = facesFrom;
            while (true) {
                i = skipSeparators(content, i);
                if (i >= content.length()) {
                    break;
                }
                int end = i;
                while (end < content.length() && !isSeparator(content.charAt(end))) {
                    end++;
                }
                String token = content.substring(i, end);
                Position at = new Position(lineNo, i + 1);
                if (token.contains(":")) {
                    throw new Position(lineNo, i + token.indexOf(':') + 1)
                            .error("a second ':' on one line (a die line is 'name: faces…')");
                }
                b.face(token, at);
                i = end;
            }
            lastLine = lineNo;
            lastColumn = content.length() + 1;
        }
        if (b.diceSoFar() == 0) {
            throw new SetFormatException("no dice in the input: expected one die per line,"
                    + " e.g. 'A: 1 4' then 'B: 2 3'");
        }
        return b.build(new Position(lastLine, lastColumn));
    }

    private static boolean isSeparator(char c) {
        return c == ',' || Character.isWhitespace(c);
    }

    private static int skipSeparators(String s, int i) {
        while (i < s.length() && isSeparator(s.charAt(i))) {
            i++;
        }
        return i;
    }

    private static int firstNonBlank(String s, int i) {
        while (i < s.length() && Character.isWhitespace(s.charAt(i))) {
            i++;
        }
        return i;
    }
}
