package org.precedence.cli;

import java.util.concurrent.Callable;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.HelpCommand;

/**
 * Entry point of the {@code precedence} command: wiring only. Each verb is its own class.
 */
@Command(name = "precedence",
        mixinStandardHelpOptions = true,
        versionProvider = VersionProvider.class,
        description = "Exactly fair, tie-free, replayable turn orders for tabletop games.",
        subcommands = {
            HelpCommand.class,
            VerifyCommand.class,
            SearchCommand.class,
            CatalogCommand.class,
            SetCommand.class,
            RollCommand.class,
            org.precedence.cli.simulate.SimulateCommand.class,
            ReplayCommand.class,
            org.precedence.cli.export.ExportCommand.class,
            ServeCommand.class,
            PlayCommand.class,
        })
public final class PrecedenceApplication implements Callable<Integer> {

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    /** Without a subcommand, print the usage (listing the subcommands) and exit 2. */
    @Override
    public Integer call() {
        spec.commandLine().getErr().println("precedence: a subcommand is required");
        spec.commandLine().usage(spec.commandLine().getErr());
        return ExitCodes.BAD_INPUT;
    }

    /** Builds the command line with the shared error handling; tests call this too. */
    public static CommandLine commandLine() {
        return configure(new CommandLine(new PrecedenceApplication()));
    }

    /**
     * Applies the shared error handling and parsing settings to {@code cmd}; tests use it to run
     * one subcommand built with test collaborators exactly as the application would.
     */
    public static CommandLine configure(CommandLine cmd) {
        ErrorMapper errors = new ErrorMapper();
        return cmd.setParameterExceptionHandler(errors)
                .setExecutionExceptionHandler(errors)
                .setCaseInsensitiveEnumValuesAllowed(true);
    }

    public static void main(String[] args) {
        System.exit(commandLine().execute(args));
    }
}
