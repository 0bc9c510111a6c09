package org.precedence.cli;

/** Bad input detected by a command; its message is printed as is, and the exit code is 2. */
public final class UserInputException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    public UserInputException(String message) {
        super(message);
    }

    public UserInputException(String message, Throwable cause) {
        super(message, cause);
    }
}
