package org.precedence.cli.plot;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/** A minimal SVG writer: elements appended in order, every attribute and text escaped. */
final class Svg {
    private final StringBuilder body = new StringBuilder(1 << 16);

    Svg rect(double x, double y, double w, double h, String fill, String extra) {
        body.append("<rect x=\"").append(num(x)).append("\" y=\"").append(num(y))
                .append("\" width=\"").append(num(Math.max(0, w))).append("\" height=\"")
                .append(num(Math.max(0, h))).append("\" fill=\"").append(escape(fill)).append('"');
        if (!extra.isEmpty()) {
            body.append(' ').append(extra);
        }
        body.append("/>\n");
        return this;
    }

    Svg line(double x1, double y1, double x2, double y2, String stroke, String extra) {
        body.append("<line x1=\"").append(num(x1)).append("\" y1=\"").append(num(y1))
                .append("\" x2=\"").append(num(x2)).append("\" y2=\"").append(num(y2))
                .append("\" stroke=\"").append(escape(stroke)).append('"');
        if (!extra.isEmpty()) {
            body.append(' ').append(extra);
        }
        body.append("/>\n");
        return this;
    }

    /** Text at (x, y); {@code anchor} is start, middle or end. */
    Svg text(double x, double y, String text, int size, String anchor, String extra) {
        body.append("<text x=\"").append(num(x)).append("\" y=\"").append(num(y))
                .append("\" font-size=\"").append(size).append("\" text-anchor=\"").append(anchor).append('"');
        if (!extra.isEmpty()) {
            body.append(' ').append(extra);
        }
        body.append('>').append(escape(text)).append("</text>\n");
        return this;
    }

    /** Writes {@code text} wrapped at {@code columns} characters; returns the height used. */
    double paragraph(double x, double y, String text, int size, int columns) {
        List<String> lines = wrap(text, columns);
        double lineHeight = size * 1.35;
        for (int i = 0; i < lines.size(); i++) {
            text(x, y + i * lineHeight, lines.get(i), size, "start", "fill=\"#333\"");
        }
        return lines.size() * lineHeight;
    }

    /** Returns the whole document with the given size, title and description. */
    String document(double width, double height, String title, String description) {
        return "<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n"
                + "<svg xmlns=\"http://www.w3.org/2000/svg\" version=\"1.1\" width=\"" + num(width)
                + "\" height=\"" + num(height) + "\" viewBox=\"0 0 " + num(width) + ' ' + num(height)
                + "\" font-family=\"Helvetica, Arial, sans-serif\">\n"
                + "<title>" + escape(title) + "</title>\n<desc>" + escape(description) + "</desc>\n"
                + "<rect x=\"0\" y=\"0\" width=\"" + num(width) + "\" height=\"" + num(height)
                + "\" fill=\"#ffffff\"/>\n" + body + "</svg>\n";
    }

    static List<String> wrap(String text, int columns) {
        List<String> lines = new ArrayList<>();
        StringBuilder line = new StringBuilder();
        for (String word : text.split(" ")) {
            if (line.length() > 0 && line.length() + 1 + word.length() > columns) {
                lines.add(line.toString());
                line.setLength(0);
            }
            if (line.length() > 0) {
                line.append(' ');
            }
            line.append(word);
        }
        if (line.length() > 0) {
            lines.add(line.toString());
        }
        return lines;
    }

    static String num(double v) {
        if (v == Math.rint(v) && Math.abs(v) < 1e15) {
            return Long.toString((long) v);
        }
        return String.format(Locale.ROOT, "%.2f", v);
    }

    /** Escapes the five XML special characters and drops characters XML 1.0 forbids. */
    static String escape(String s) {
        StringBuilder sb = new StringBuilder(s.length());
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            switch (c) {
                case '&' -> sb.append("&amp;");
                case '<' -> sb.append("&lt;");
                case '>' -> sb.append("&gt;");
                case '"' -> sb.append("&quot;");
                case '\'' -> sb.append("&apos;");
                default -> {
                    if (c >= 0x20 || c == '\t' || c == '\n' || c == '\r') {
                        sb.append(c);
                    }
                }
            }
        }
        return sb.toString();
    }
}
