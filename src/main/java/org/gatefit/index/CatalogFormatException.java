package org.gatefit.index;

import java.io.IOException;

/** The catalog directory holds an index in a layout this version does not read (exit 4, like other I/O). */
public final class CatalogFormatException extends IOException {
    private static final long serialVersionUID = 1L;

    public CatalogFormatException(String message) {
        super(message);
    }
}
