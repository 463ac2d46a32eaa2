package org.gatefit.catalog;

/**
 * A single cell or command-line value that does not fit its column; the message says what was
 * expected. The reader wraps it with file, line and column into a {@link Problem}.
 */
public final class BadValueException extends Exception {
    private static final long serialVersionUID = 1L;

    public BadValueException(String message) {
        super(message);
    }
}
