package org.precedence.cli.plot;

import java.util.Locale;

/**
 * Draws the player × position heat map. Colour shows how far a square is from an even share
 * in units of chance's usual spread (its binomial standard deviation): white within about
 * one spread, deepening up to four spreads; blue for more often, orange for less often.
 */
final class SeatHeatMap {
    private SeatHeatMap() {
    }

    static double draw(Svg svg, PlotPanel p, double x, double y, double width) {
        int n = p.players();
        long[][] seat = p.seatCounts();
        svg.text(x, y + 16, "Who acted in which position", 16, "start", "font-weight=\"bold\"");
        double cell = Math.max(14, Math.min(64, (width - 120) / n));
        double left = x + 80;
        double top = y + 46;
        int labelSize = cell >= 40 ? 12 : 8;
        double share = 1.0 / n;
        double expected = p.rounds() * share;
        double sd = Math.sqrt(p.rounds() * share * (1 - share));
        for (int pos = 0; pos < n; pos++) {
            svg.text(left + pos * cell + cell / 2, top - 6, Ordinals.of(pos + 1), labelSize, "middle", "");
        }
        for (int player = 0; player < n; player++) {
            svg.text(left - 8, top + player * cell + cell / 2 + 4, "player " + letter(player), labelSize, "end", "");
            for (int pos = 0; pos < n; pos++) {
                long c = seat[player][pos];
                double z = sd > 0 ? (c - expected) / sd : 0;
                svg.rect(left + pos * cell, top + player * cell, cell, cell, colour(z),
                        "stroke=\"#ffffff\" stroke-width=\"1\"");
                if (cell >= 30) {
                    double pct = p.rounds() == 0 ? 0 : 100.0 * c / p.rounds();
                    svg.text(left + pos * cell + cell / 2, top + player * cell + cell / 2 + 4,
                            String.format(Locale.ROOT, "%.1f%%", pct), labelSize, "middle", "");
                }
            }
        }
        svg.text(left + n * cell / 2, top + n * cell + 16, "position in the turn (1st acts first)", 11, "middle", "");
        double used = 46 + n * cell + 26;
        String caption = "Each square is the share of rounds in which a player acted in that position. "
                + String.format(Locale.ROOT, "With fair dice every square is close to %.1f%%. ", 100 * share)
                + "A square stays white while the difference is no bigger than chance usually makes; it turns "
                + "blue (more often than fair) or orange (less often) only as the difference grows beyond that.";
        used += svg.paragraph(x, y + used + 6, caption, 12, 120) + 10;
        return used;
    }

    /** White at |z| ≤ 1, full colour at |z| ≥ 4. */
    static String colour(double z) {
        double t = Math.max(0, Math.min(1, (Math.abs(z) - 1) / 3));
        int[] full = z > 0 ? new int[] {47, 95, 170} : new int[] {222, 120, 40};
        int r = (int) Math.round(255 + (full[0] - 255) * t);
        int g = (int) Math.round(255 + (full[1] - 255) * t);
        int b = (int) Math.round(255 + (full[2] - 255) * t);
        return String.format(Locale.ROOT, "#%02x%02x%02x", r, g, b);
    }

    private static String letter(int player) {
        return org.precedence.runtime.dice.DieNames.of(player);
    }
}
