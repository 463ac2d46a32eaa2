package org.gatefit.index;

/** Another process holds the catalog's write lock (an import is running). */
public final class CatalogBusyException extends Exception {
    private static final long serialVersionUID = 1L;

    public CatalogBusyException(String message, Throwable cause) {
        super(message, cause);
    }
}
