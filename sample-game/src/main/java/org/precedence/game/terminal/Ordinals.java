package org.precedence.game.terminal;

/** English ordinals for places in the order. */
final class Ordinals {
    private Ordinals() {
    }

    /** Returns "1st", "2nd", "3rd", "4th", … for a 0-based position. */
    static String of(int position) {
        int n = position + 1;
        String suffix = (n % 100 >= 11 && n % 100 <= 13) ? "th"
                : switch (n % 10) {
                    case 1 -> "st";
                    case 2 -> "nd";
                    case 3 -> "rd";
                    default -> "th";
                };
        return n + suffix;
    }
}
