package org.precedence.cli.simulate;

import java.io.Console;
import java.lang.reflect.Method;

/** Whether the process talks to a person at a terminal (so a progress bar makes sense). */
final class Terminal {
    private Terminal() {
    }

    /**
     * Returns true when a console is attached and, on JDK 22 and later, when it really is a
     * terminal: from JDK 22 {@link System#console()} may return a console for redirected
     * streams, and {@code Console.isTerminal()} (looked up reflectively, since the code is
     * compiled for Java 17) tells the two apart.
     */
    static boolean attached() {
        Console console = System.console();
        if (console == null) {
            return false;
        }
        try {
            Method isTerminal = Console.class.getMethod("isTerminal");
            return (Boolean) isTerminal.invoke(console);
        } catch (NoSuchMethodException e) {
            return true;
        } catch (ReflectiveOperationException | RuntimeException e) {
            return false;
        }
    }
}
