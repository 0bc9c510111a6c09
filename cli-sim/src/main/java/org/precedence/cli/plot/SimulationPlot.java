package org.precedence.cli.plot;

import java.util.List;

/** Lays out the panels of a simulation plot, one player count under the other. */
public final class SimulationPlot {
    static final double WIDTH = 960;
    private static final double MARGIN = 30;

    private SimulationPlot() {
    }

    /**
     * Returns the SVG document.
     *
     * @param heading  first line of the picture (what was simulated)
     * @param summary  a plain-words sentence under it (the verdict)
     * @param panels   one panel per player count, drawn in order
     */
    public static String svg(String heading, String summary, List<PlotPanel> panels) {
        Svg svg = new Svg();
        double y = MARGIN;
        svg.text(MARGIN, y + 18, heading, 20, "start", "font-weight=\"bold\"");
        y += 30;
        y += svg.paragraph(MARGIN, y + 14, summary, 13, 120) + 16;
        double inner = WIDTH - 2 * MARGIN;
        for (PlotPanel p : panels) {
            svg.text(MARGIN, y + 18, p.title(), 18, "start", "font-weight=\"bold\" fill=\"#1d3557\"");
            y += 32;
            y += FrequencyChart.draw(svg, p, MARGIN, y, inner);
            y += SeatHeatMap.draw(svg, p, MARGIN, y, inner);
            svg.line(MARGIN, y, WIDTH - MARGIN, y, "#cccccc", "");
            y += 20;
        }
        return svg.document(WIDTH, y + MARGIN, heading, summary);
    }
}
