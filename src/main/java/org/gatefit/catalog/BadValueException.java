package org.gatefit.catalog;

import org.gatefit.failure.UsageProblem;

/**
 * A single cell or command-line value that does not fit its column; the message says what was
 * expected. The reader wraps it with file, line and column into a {@link Problem}; one that reaches
 * the command line is a value given there, so it exits 2 ({@link UsageProblem}).
 */
public final class BadValueException extends UsageProblem {
    private static final long serialVersionUID = 1L;

    public BadValueException(String message) {
        super(message);
    }
}
