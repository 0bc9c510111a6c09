package org.precedence.cli.export;

import java.util.Locale;
import org.precedence.runtime.dice.DieNames;

/** Renders a {@link PrintableSet} as CSV, Markdown or an SVG label sheet. */
final class FaceSheets {
    /** Label square side and gap, in millimetres: twelve to a row on A4, fits a 14 mm die face. */
    static final double LABEL_MM = 13;
    static final double GAP_MM = 2;
    static final double PAGE_WIDTH_MM = 210;
    static final double MARGIN_MM = 12;
    private static final String[] COLOURS = {
        "#1f77b4", "#d62728", "#2ca02c", "#9467bd", "#ff7f0e", "#8c564b", "#e377c2", "#17becf",
        "#7f7f7f", "#bcbd22"};

    private FaceSheets() {
    }

    static String render(PrintableSet set, ExportFormat format) {
        return switch (format) {
            case csv -> csv(set);
            case md -> markdown(set);
            case svg -> svg(set);
        };
    }

    /** RFC 4180: CRLF line ends, a header row, fields that need no quoting. */
    static String csv(PrintableSet set) {
        StringBuilder sb = new StringBuilder("die,face,value\r\n");
        for (int d = 0; d < set.players(); d++) {
            long[] f = set.faces().get(d);
            for (int i = 0; i < f.length; i++) {
                sb.append(DieNames.of(d)).append(',').append(i + 1).append(',').append(f[i]).append("\r\n");
            }
        }
        return sb.toString();
    }

    static String markdown(PrintableSet set) {
        StringBuilder sb = new StringBuilder();
        sb.append("# Order-fair dice for ").append(set.players()).append(" players\n\n");
        sb.append("Set `").append(set.id()).append("`, SHA-256 `").append(set.sha256()).append("`, proven ")
                .append(set.grade().name().toLowerCase(Locale.ROOT).replace('_', '-'))
                .append(", subset depth ").append(set.subsetDepth()).append(".\n\n");
        sb.append("How to play with them: each player takes one die and all roll together. The lowest number "
                + "acts first, the next lowest second, and so on. No number appears twice in the set, so ties "
                + "cannot happen, and every order of the players is exactly equally likely.\n\n");
        sb.append("| Die | Faces | Numbers to write on the faces |\n|---|---:|---|\n");
        for (int d = 0; d < set.players(); d++) {
            long[] f = set.faces().get(d);
            StringBuilder values = new StringBuilder();
            for (int i = 0; i < f.length; i++) {
                values.append(i == 0 ? "" : ", ").append(f[i]);
            }
            sb.append("| ").append(DieNames.of(d)).append(" | ").append(f.length).append(" | ")
                    .append(values).append(" |\n");
        }
        sb.append("\nNumbers run from 1 to ").append(set.totalFaces())
                .append(" across the whole set; only their order matters.\n");
        return sb.toString();
    }

    /** One row block per die: coloured square labels with the value, the die's letter in a corner. */
    static String svg(PrintableSet set) {
        double usable = PAGE_WIDTH_MM - 2 * MARGIN_MM;
        int perRow = (int) Math.floor((usable + GAP_MM) / (LABEL_MM + GAP_MM));
        StringBuilder body = new StringBuilder();
        double y = MARGIN_MM;
        body.append(text(MARGIN_MM, y + 5, 6, "start", "bold",
                "Face labels for " + set.players() + " order-fair dice"));
        y += 9;
        body.append(text(MARGIN_MM, y + 3, 3.2, "start", "normal",
                "Set " + set.id() + ". Lowest number acts first; no number repeats, so ties cannot happen."));
        y += 5;
        body.append(text(MARGIN_MM, y + 3, 3.2, "start", "normal",
                "Cut along the outlines and stick one label on each face of a blank die of the right size."));
        y += 5;
        body.append(text(MARGIN_MM, y + 3, 3.2, "start", "normal",
                "Underlined numbers would read as another number upside down (6 and 9, 16 and 91, ...)."));
        y += 8;
        for (int d = 0; d < set.players(); d++) {
            long[] f = set.faces().get(d);
            String colour = COLOURS[d % COLOURS.length];
            body.append(text(MARGIN_MM, y + 4, 4.2, "start", "bold",
                    "Die " + DieNames.of(d) + " (" + f.length + " faces)"));
            y += 6;
            for (int i = 0; i < f.length; i++) {
                double x = MARGIN_MM + (i % perRow) * (LABEL_MM + GAP_MM);
                double top = y + (i / perRow) * (LABEL_MM + GAP_MM);
                body.append(String.format(Locale.ROOT,
                        "<rect x=\"%.2f\" y=\"%.2f\" width=\"%.2f\" height=\"%.2f\" fill=\"#ffffff\" "
                                + "stroke=\"%s\" stroke-width=\"0.4\"/>\n", x, top, LABEL_MM, LABEL_MM, colour));
                body.append(text(x + LABEL_MM / 2, top + LABEL_MM / 2 + 2.2, 6, "middle", "bold",
                        Long.toString(f[i])));
                body.append(text(x + 1.2, top + 3, 2.4, "start", "normal", DieNames.of(d)));
                if (misreadUpsideDown(f[i])) {
                    body.append(String.format(Locale.ROOT, "<line x1=\"%.2f\" y1=\"%.2f\" x2=\"%.2f\" y2=\"%.2f\" "
                                    + "stroke=\"#000000\" stroke-width=\"0.4\"/>\n",
                            x + LABEL_MM / 2 - 2.5, top + LABEL_MM / 2 + 3.4, x + LABEL_MM / 2 + 2.5,
                            top + LABEL_MM / 2 + 3.4));
                }
            }
            y += ((f.length + perRow - 1) / perRow) * (LABEL_MM + GAP_MM) + 4;
        }
        double height = y + MARGIN_MM;
        return String.format(Locale.ROOT, "<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n"
                + "<svg xmlns=\"http://www.w3.org/2000/svg\" version=\"1.1\" width=\"%.0fmm\" height=\"%.1fmm\" "
                + "viewBox=\"0 0 %.0f %.1f\" font-family=\"Helvetica, Arial, sans-serif\">\n"
                + "<title>Face labels for %d order-fair dice</title>\n", PAGE_WIDTH_MM, height, PAGE_WIDTH_MM, height,
                set.players()) + body + "</svg>\n";
    }

    /**
     * Returns whether {@code value}, turned upside down, reads as a different number: every digit
     * must still be a digit when turned (0, 1, 8 stay, 6 and 9 swap), the turned number must
     * not start with 0, and it must differ from the value. Such labels are underlined (common
     * practice on dice, no source).
     */
    static boolean misreadUpsideDown(long value) {
        String digits = Long.toString(value);
        StringBuilder turned = new StringBuilder(digits.length());
        for (int i = digits.length() - 1; i >= 0; i--) {
            char c = digits.charAt(i);
            switch (c) {
                case '0', '1', '8' -> turned.append(c);
                case '6' -> turned.append('9');
                case '9' -> turned.append('6');
                default -> {
                    return false;
                }
            }
        }
        return turned.charAt(0) != '0' && !turned.toString().equals(digits);
    }

    private static String text(double x, double y, double size, String anchor, String weight, String text) {
        return String.format(Locale.ROOT, "<text x=\"%.2f\" y=\"%.2f\" font-size=\"%.1f\" text-anchor=\"%s\" "
                + "font-weight=\"%s\">%s</text>\n", x, y, size, anchor, weight, escape(text));
    }

    static String escape(String s) {
        return s.replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;").replace("\"", "&quot;");
    }
}
