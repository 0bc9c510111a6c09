package org.precedence.cli;

/** How a command prints its result. */
public enum OutputFormat {
    /** Readable report for people. */
    text,
    /** One JSON document for other tools. */
    json
}
