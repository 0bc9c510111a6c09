package org.precedence.runtime.replay;

/** The log cannot be read: not JSON, wrong format, or a field missing or of the wrong kind. */
public final class MalformedLogException extends IllegalArgumentException {
    private static final long serialVersionUID = 1L;

    public MalformedLogException(String message) {
        super(message);
    }

    public MalformedLogException(String message, Throwable cause) {
        super(message, cause);
    }
}
