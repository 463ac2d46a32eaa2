package org.gatefit.index;

import org.gatefit.failure.EnvironmentProblem;

/** Another process holds the catalog's write lock (an import is running); exits 4. */
public final class CatalogBusyException extends EnvironmentProblem {
    private static final long serialVersionUID = 1L;

    public CatalogBusyException(String message, Throwable cause) {
        super(message, cause);
    }
}
