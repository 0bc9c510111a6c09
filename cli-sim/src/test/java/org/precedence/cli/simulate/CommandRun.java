package org.precedence.cli.simulate;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.util.concurrent.Callable;
import org.precedence.cli.PrecedenceApplication;
import picocli.CommandLine;

/** Runs one command the way the application does, capturing exit code, stdout and stderr. */
record CommandRun(int exitCode, String out, String err) {

    static CommandRun of(Callable<Integer> command, String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        CommandLine cmd = PrecedenceApplication.configure(new CommandLine(command));
        cmd.setOut(new PrintWriter(out, true));
        cmd.setErr(new PrintWriter(err, true));
        int code = cmd.execute(args);
        return new CommandRun(code, out.toString(), err.toString());
    }
}
