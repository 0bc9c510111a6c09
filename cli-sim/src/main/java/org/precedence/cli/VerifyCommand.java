package org.precedence.cli;

import java.io.IOException;
import java.io.InputStream;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import org.precedence.api.RankingConvention;
import org.precedence.runtime.analysis.FairnessAnalysis;
import org.precedence.runtime.analysis.FairnessReport;
import org.precedence.runtime.dice.DiceSet;
import org.precedence.runtime.dice.io.DiceSetFormat;
import org.precedence.runtime.dice.io.DiceSetReader;
import org.precedence.runtime.dice.io.SetFormatException;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;
import picocli.CommandLine.Model.CommandSpec;

/**
 * {@code precedence verify [FILE|-]}: reads a dice set and proves, by exact counting, how fair
 * it is. Exit 0 when order-fair, 1 when not, 2 on bad input.
 */
@Command(name = "verify",
        mixinStandardHelpOptions = true,
        description = {
            "Proves exactly how fair a dice set is: counts the outcomes of every ranking.",
            "Reads JSON ({\"dice\": [[1, 8, 11], ...]}) or text (one die per line, "
                    + "optional 'name:' first, # comments).",
            "Exit status: 0 order-fair, 1 not order-fair, 2 bad input."
        })
final class VerifyCommand implements Callable<Integer> {

    /** How the input is written. */
    enum InputForm {
        auto, json, text
    }

    @Parameters(index = "0", arity = "0..1", paramLabel = "FILE",
            description = "The set to verify; '-' or nothing reads standard input.")
    String file;

    @Option(names = "--input", paramLabel = "FORM", defaultValue = "auto",
            description = "Input form: ${COMPLETION-CANDIDATES} (default: ${DEFAULT-VALUE}: "
                    + "'{' or '[' first means JSON).")
    InputForm input = InputForm.auto;

    @Option(names = "--descending",
            description = "The highest value acts first (default: the lowest value acts first).")
    boolean descending;

    @Mixin
    FormatOption format;

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        DiceSet set = readSet();
        RankingConvention convention = descending ? RankingConvention.HIGHEST_FIRST
                : RankingConvention.LOWEST_FIRST;
        FairnessReport report;
        try {
            report = FairnessAnalysis.analyse(set, convention);
        } catch (OutOfMemoryError e) {
            throw new UserInputException("not enough memory to analyse " + set.players()
                    + " dice exactly; give Java more (e.g. PRECEDENCE_JAVA_OPTS=-Xmx8g)");
        }
        PrintWriter out = spec.commandLine().getOut();
        if (format.json()) {
            VerifyReport.json(set, report, out);
        } else {
            VerifyReport.text(set, report, out);
        }
        out.flush();
        return report.orderFair() ? ExitCodes.OK : ExitCodes.CHECK_FAILED;
    }

    private DiceSet readSet() {
        DiceSetFormat form = switch (input) {
            case auto -> null;
            case json -> DiceSetFormat.JSON;
            case text -> DiceSetFormat.TEXT;
        };
        boolean stdin = file == null || file.equals("-");
        String source = stdin ? "standard input" : file;
        try {
            if (stdin) {
                InputStream in = System.in;
                return DiceSetReader.read(in, form);
            }
            Path path = Path.of(file);
            if (Files.isDirectory(path)) {
                throw new UserInputException("'" + file + "' is a directory, not a set file");
            }
            return DiceSetReader.read(path, form);
        } catch (SetFormatException e) {
            throw new UserInputException(source + ": " + e.getMessage(), e);
        } catch (NoSuchFileException e) {
            throw new UserInputException("cannot read '" + file + "': no such file", e);
        } catch (IOException e) {
            throw new UserInputException("cannot read " + source + ": " + e.getMessage(), e);
        } catch (java.nio.file.InvalidPathException e) {
            throw new UserInputException("'" + file + "' is not a valid path", e);
        }
    }
}
