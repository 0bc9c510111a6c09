package org.precedence.cli;

import picocli.CommandLine.Option;

/** The shared {@code --format text|json} option. */
public final class FormatOption {
    @Option(names = "--format", paramLabel = "FORMAT", defaultValue = "text",
            description = "Output format: ${COMPLETION-CANDIDATES} (default: ${DEFAULT-VALUE}).")
    OutputFormat format = OutputFormat.text;

    /** Returns whether JSON output was asked for. */
    public boolean json() {
        return format == OutputFormat.json;
    }
}
