package org.precedence.runtime.dice.io;

/**
 * A dice set could not be read. The message reads {@code line L, column C: what is wrong}
 * (without the position when the problem is the input as a whole).
 */
public final class SetFormatException extends IllegalArgumentException {
    private static final long serialVersionUID = 1L;

    private final int line;
    private final int column;
    private final String problem;

    /** A problem at 1-based {@code line} and {@code column}. */
    public SetFormatException(int line, int column, String problem) {
        super("line " + line + ", column " + column + ": " + problem);
        this.line = line;
        this.column = column;
        this.problem = problem;
    }

    /** A problem with the input as a whole (line and column are 0). */
    public SetFormatException(String problem) {
        super(problem);
        this.line = 0;
        this.column = 0;
        this.problem = problem;
    }

    /** Returns the same position with another problem text. */
    SetFormatException withProblem(String other) {
        return line == 0 ? new SetFormatException(other) : new SetFormatException(line, column, other);
    }

    /** Returns the 1-based line of the problem, or 0 when it has no position. */
    public int line() {
        return line;
    }

    /** Returns the 1-based column of the problem, or 0 when it has no position. */
    public int column() {
        return column;
    }

    /** Returns the message without the position. */
    public String problem() {
        return problem;
    }
}
