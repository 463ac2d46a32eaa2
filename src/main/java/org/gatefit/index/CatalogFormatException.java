package org.gatefit.index;

import org.gatefit.failure.EnvironmentProblem;

/** The catalog directory holds an index in a layout this version does not read (exit 4, like other I/O). */
public final class CatalogFormatException extends EnvironmentProblem {
    private static final long serialVersionUID = 1L;

    public CatalogFormatException(String message) {
        super(message);
    }
}
