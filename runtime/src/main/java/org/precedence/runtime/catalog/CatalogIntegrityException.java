package org.precedence.runtime.catalog;

/** The catalog resource is malformed or an entry does not match its recorded hash. */
public final class CatalogIntegrityException extends IllegalStateException {
    private static final long serialVersionUID = 1L;

    public CatalogIntegrityException(String message) {
        super(message);
    }

    public CatalogIntegrityException(String message, Throwable cause) {
        super(message, cause);
    }
}
