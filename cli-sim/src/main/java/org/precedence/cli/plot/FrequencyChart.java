package org.precedence.cli.plot;

import java.util.Locale;

/** Draws the bar chart of one panel: bars, the even-luck line and the 95 % band. */
final class FrequencyChart {
    static final double HEIGHT = 260;
    private static final int MAX_LABELLED_BARS = 30;

    private FrequencyChart() {
    }

    /** Draws at (x, y) within {@code width}; returns the height used, captions included. */
    static double draw(Svg svg, PlotPanel p, double x, double y, double width) {
        long[] counts = p.barCounts();
        int bars = counts.length;
        String subject = p.barsAreOrders() ? "turn order" : "first player";
        svg.text(x, y + 16, p.barsAreOrders()
                ? "How often each turn order came up"
                : "How often each player went first", 16, "start", "font-weight=\"bold\"");
        double top = y + 30;
        double left = x + 70;
        double plotWidth = width - 80;
        long min = Long.MAX_VALUE;
        long max = 0;
        for (long c : counts) {
            min = Math.min(min, c);
            max = Math.max(max, c);
        }
        double yMax = Math.max(max, p.high()) * 1.04 + 1;
        double lowest = Math.min(min, p.low());
        // Start at zero unless that would squash the band into a hairline.
        boolean fromZero = (yMax - lowest) / yMax > 0.25;
        double yMin = fromZero ? 0 : Math.max(0, lowest - 0.5 * (yMax - lowest));
        double scale = HEIGHT / (yMax - yMin);
        double bottom = top + HEIGHT;

        double bandTop = bottom - (p.high() - yMin) * scale;
        double bandBottom = bottom - (Math.max(p.low(), yMin) - yMin) * scale;
        svg.rect(left, bandTop, plotWidth, bandBottom - bandTop, "#f2c75c", "fill-opacity=\"0.45\"");

        double slot = plotWidth / bars;
        double barWidth = Math.max(0.5, slot * 0.8);
        int outside = 0;
        for (int i = 0; i < bars; i++) {
            boolean out = counts[i] < p.low() || counts[i] > p.high();
            outside += out ? 1 : 0;
            double h = (counts[i] - yMin) * scale;
            svg.rect(left + i * slot + (slot - barWidth) / 2, bottom - h, barWidth, h,
                    out ? "#b5452f" : "#3f6fa8", "");
            if (bars <= MAX_LABELLED_BARS) {
                double cx = left + i * slot + slot / 2;
                svg.text(cx, bottom + 12, p.barLabels().get(i), bars > 12 ? 8 : 11, "end",
                        "transform=\"rotate(-60 " + Svg.num(cx) + ' ' + Svg.num(bottom + 12) + ")\"");
            }
        }
        double expectedY = bottom - (p.expected() - yMin) * scale;
        svg.line(left, expectedY, left + plotWidth, expectedY, "#000000", "stroke-width=\"1.5\" stroke-dasharray=\"6 4\"");
        svg.text(left + plotWidth - 4, expectedY - 5, "even luck: " + whole(p.expected()), 12, "end",
                "font-weight=\"bold\" stroke=\"#ffffff\" stroke-width=\"3\" paint-order=\"stroke\"");

        svg.line(left, top, left, bottom, "#555555", "");
        svg.line(left, bottom, left + plotWidth, bottom, "#555555", "");
        for (int t = 0; t <= 4; t++) {
            double v = yMin + (yMax - yMin) * t / 4;
            double ty = bottom - (v - yMin) * scale;
            svg.line(left - 4, ty, left, ty, "#555555", "");
            svg.text(left - 6, ty + 4, whole(v), 10, "end", "");
        }
        double used = HEIGHT + 30 + (bars <= MAX_LABELLED_BARS ? 48 : 14);
        if (bars > MAX_LABELLED_BARS) {
            svg.text(left + plotWidth / 2, bottom + 12, bars + " bars, one per " + subject
                    + ", in alphabetical order", 10, "middle", "");
        }
        String caption = (p.barsAreOrders()
                ? "Each bar counts one turn order (letters: players in acting order). "
                : "Each bar counts how often one player acted first. ")
                + "The dashed line is where every bar would stand if luck were perfectly even; the "
                + "yellow band is the ordinary wobble of chance: with fair dice about 19 bars in 20 end "
                + "inside it, and a few outside are normal. Here " + (bars - outside) + " of " + bars
                + " are inside (bars outside are drawn red)."
                + (fromZero ? "" : " The scale starts at " + whole(yMin)
                        + ", not at zero, so that the band can be seen; the bars differ less than they seem.");
        used += svg.paragraph(x, y + used + 6, caption, 12, 120) + 10;
        return used;
    }

    static String whole(double v) {
        return String.format(Locale.ROOT, "%,.0f", v);
    }
}
