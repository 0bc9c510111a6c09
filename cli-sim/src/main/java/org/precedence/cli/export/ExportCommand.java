package org.precedence.cli.export;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.Objects;
import java.util.concurrent.Callable;
import java.util.function.Supplier;
import org.precedence.cli.AtomicFiles;
import org.precedence.cli.ExitCodes;
import org.precedence.runtime.source.SetSource;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code precedence export}: face lists and label sheets for making the served dice by hand. */
@Command(name = "export", mixinStandardHelpOptions = true,
        description = {
            "Writes the order-fair set served for N players in a form for making physical dice: "
                    + "csv (one row per face), md (a printable sheet) or svg (face labels for blank dice).",
            "Only catalog sets can be exported; constructed sets have far too many faces.",
            "Exit codes: 0 written, 2 bad input or a set that cannot be listed."})
public final class ExportCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Option(names = "--players", required = true, paramLabel = "N", description = "Number of players (dice).")
    int players;

    @Option(names = "--format", required = true, paramLabel = "FORMAT",
            description = "csv, md or svg.")
    ExportFormat format;

    @Option(names = "--output", paramLabel = "FILE",
            description = "Write to FILE (atomically) instead of standard output.")
    Path output;

    private final Supplier<SetSource> sets;

    /** The command as the application runs it: the served sets found on the class path. */
    public ExportCommand() {
        this(ServedSets::discover);
    }

    /** For tests: a given set source. */
    ExportCommand(Supplier<SetSource> sets) {
        this.sets = Objects.requireNonNull(sets, "sets");
    }

    @Override
    public Integer call() {
        if (output != null) {
            AtomicFiles.checkWritable(output, "--output");
        }
        SetSource source;
        try {
            source = sets.get();
        } catch (IllegalStateException e) {
            PrintWriter err = spec.commandLine().getErr();
            err.println("precedence export: " + e.getMessage());
            err.flush();
            return 3;
        }
        String text = FaceSheets.render(ServedSets.printable(source, players), format);
        if (output != null) {
            AtomicFiles.writeString(output, text, "--output");
        } else {
            PrintWriter out = spec.commandLine().getOut();
            out.print(text);
            out.flush();
        }
        return ExitCodes.OK;
    }
}
