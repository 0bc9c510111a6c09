package org.precedence.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import org.junit.jupiter.api.Test;
import picocli.CommandLine;

class PrecedenceApplicationTest {

    /** Runs the command line with captured writers; returns {exit code, out, err}. */
    static Object[] run(String... args) {
        CommandLine cmd = PrecedenceApplication.commandLine();
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        cmd.setOut(new PrintWriter(out, true));
        cmd.setErr(new PrintWriter(err, true));
        int code = cmd.execute(args);
        return new Object[] {code, out.toString(), err.toString()};
    }

    @Test
    void help_listsCommandsAndExitsZero() {
        Object[] r = run("--help");
        assertEquals(0, r[0]);
        assertTrue(((String) r[1]).contains("Commands:"), (String) r[1]);
    }

    @Test
    void unknownSubcommand_exitsTwoWithShortMessage() {
        Object[] r = run("frobnicate");
        assertEquals(ExitCodes.BAD_INPUT, r[0]);
        String err = (String) r[2];
        assertTrue(err.startsWith("precedence: "), err);
        assertFalse(err.contains("\tat "), "no stack trace: " + err);
    }

    @Test
    void unknownOption_exitsTwo() {
        Object[] r = run("--no-such-option");
        assertEquals(ExitCodes.BAD_INPUT, r[0]);
    }

    @Test
    void noSubcommand_printsUsageAndExitsTwo() {
        Object[] r = run();
        assertEquals(ExitCodes.BAD_INPUT, r[0]);
        assertTrue(((String) r[2]).contains("a subcommand is required"));
    }
}
