package org.precedence.game.rules;

import java.util.Locale;

/**
 * Reads a typed move: {@code sail 1}, {@code sail 2}, {@code sail 3}, {@code light},
 * {@code gather} or {@code retire}, in any case, with any spacing.
 */
public final class MoveParser {
    /** What the parser accepts, for messages and help. */
    public static final String ALLOWED = "sail 1|2|3, light, gather or retire";

    private MoveParser() {
    }

    /**
     * Parses one move.
     *
     * @throws MalformedMoveException naming the text and the allowed moves
     */
    public static Move parse(String text) throws MalformedMoveException {
        if (text == null || text.isBlank()) {
            throw new MalformedMoveException("empty move: type " + ALLOWED);
        }
        String[] words = text.trim().toLowerCase(Locale.ROOT).split("\\s+");
        String verb = words[0];
        switch (verb) {
            case "sail":
                return parseSail(text, words);
            case "light":
            case "gather":
            case "retire":
                if (words.length != 1) {
                    throw new MalformedMoveException("'" + verb + "' takes no argument, got '" + text.trim() + "'");
                }
                return verb.equals("light") ? new Move.Light()
                        : verb.equals("gather") ? new Move.Gather() : new Move.Retire();
            default:
                throw new MalformedMoveException("unknown move '" + text.trim() + "': type " + ALLOWED);
        }
    }

    private static Move parseSail(String text, String[] words) throws MalformedMoveException {
        if (words.length != 2) {
            throw new MalformedMoveException("'sail' needs one distance from " + Move.Sail.MIN + " to "
                    + Move.Sail.MAX + ", e.g. 'sail 2', got '" + text.trim() + "'");
        }
        int distance;
        try {
            distance = Integer.parseInt(words[1]);
        } catch (NumberFormatException e) {
            throw new MalformedMoveException("sail distance must be a number from " + Move.Sail.MIN + " to "
                    + Move.Sail.MAX + ", got '" + words[1] + "'");
        }
        if (distance < Move.Sail.MIN || distance > Move.Sail.MAX) {
            throw new MalformedMoveException("a boat sails " + Move.Sail.MIN + " to " + Move.Sail.MAX
                    + " places, got " + distance);
        }
        return new Move.Sail(distance);
    }
}
