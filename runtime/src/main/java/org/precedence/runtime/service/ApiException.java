package org.precedence.runtime.service;

/**
 * A request the service refuses: the HTTP status, a stable machine-readable {@code error} code
 * and a one-line {@code detail} saying what was wrong, where, and what is allowed. Thrown
 * anywhere below a handler and turned into the JSON error body in one place.
 */
class ApiException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    private final int status;
    private final String error;

    ApiException(int status, String error, String detail) {
        super(detail, null, false, false);
        this.status = status;
        this.error = error;
    }

    static ApiException badRequest(String detail) {
        return new ApiException(400, "bad_request", detail);
    }

    static ApiException badJson(String detail) {
        return new ApiException(400, "malformed_json", detail);
    }

    static ApiException invalidToken(String detail) {
        return new ApiException(400, "invalid_token", detail);
    }

    int status() {
        return status;
    }

    String error() {
        return error;
    }

    String detail() {
        return getMessage();
    }
}
