package org.precedence.cli.export;

/** What {@code export} writes. */
enum ExportFormat {
    /** RFC 4180 CSV, one row per face: die, face, value. */
    csv,
    /** A Markdown sheet: how to use the dice, then each die's values. */
    md,
    /** An SVG sheet of square face labels, in millimetres, to cut out and stick on blank dice. */
    svg
}
