package org.precedence.runtime.dice.io;

/** A 1-based line and column in the input. */
record Position(int line, int column) {

    SetFormatException error(String problem) {
        return new SetFormatException(line, column, problem);
    }
}
