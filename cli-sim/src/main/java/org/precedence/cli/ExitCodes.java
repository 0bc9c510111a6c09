package org.precedence.cli;

/** Exit codes shared by every subcommand. */
public final class ExitCodes {
    /** The command did its job and every check passed. */
    public static final int OK = 0;
    /** The command ran but a check failed (for example: the set is not order-fair). */
    public static final int CHECK_FAILED = 1;
    /** The input was invalid; nothing was done. */
    public static final int BAD_INPUT = 2;

    private ExitCodes() {
    }
}
