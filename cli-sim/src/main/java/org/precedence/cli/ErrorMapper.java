package org.precedence.cli;

import java.io.PrintWriter;
import picocli.CommandLine;
import picocli.CommandLine.IExecutionExceptionHandler;
import picocli.CommandLine.IParameterExceptionHandler;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.ParseResult;

/**
 * The one place where failures become messages and exit codes: bad options and bad input
 * print one line (plus a usage hint) and exit 2; nothing prints a stack trace.
 */
final class ErrorMapper implements IParameterExceptionHandler, IExecutionExceptionHandler {

    @Override
    public int handleParseException(ParameterException ex, String[] args) {
        CommandLine cmd = ex.getCommandLine();
        PrintWriter err = cmd.getErr();
        err.println("precedence: " + ex.getMessage());
        CommandLine.UnmatchedArgumentException.printSuggestions(ex, err);
        err.println("Try '" + cmd.getCommandSpec().qualifiedName() + " --help' for usage.");
        err.flush();
        return ExitCodes.BAD_INPUT;
    }

    @Override
    public int handleExecutionException(Exception ex, CommandLine cmd, ParseResult parseResult) {
        PrintWriter err = cmd.getErr();
        if (ex instanceof UserInputException || ex instanceof IllegalArgumentException) {
            err.println("precedence " + cmd.getCommandName() + ": " + ex.getMessage());
            err.flush();
            return ExitCodes.BAD_INPUT;
        }
        // Not bad input: an internal failure. Still one line, but say it is ours.
        err.println("precedence " + cmd.getCommandName() + ": internal error: " + ex);
        err.flush();
        return 3;
    }
}
