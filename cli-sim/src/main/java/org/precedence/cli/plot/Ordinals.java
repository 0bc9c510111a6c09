package org.precedence.cli.plot;

/** English ordinals for positions: 1st, 2nd, 3rd, 4th, …, 11th, 12th, 13th, 21st. */
public final class Ordinals {
    private Ordinals() {
    }

    /** Returns the ordinal of {@code k ≥ 1}. */
    public static String of(int k) {
        int mod100 = k % 100;
        String suffix = mod100 >= 11 && mod100 <= 13 ? "th"
                : switch (k % 10) {
                    case 1 -> "st";
                    case 2 -> "nd";
                    case 3 -> "rd";
                    default -> "th";
                };
        return k + suffix;
    }
}
