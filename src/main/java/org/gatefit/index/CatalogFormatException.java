package org.gatefit.index;

import org.gatefit.failure.EnvironmentProblem;

/**
 * The catalog path holds no catalog this version reads: an index in another layout, no catalog yet,
 * a file, or a folder of other files (exit 4, like other I/O). The message names the path and what
 * to do; nothing was changed.
 */
public final class CatalogFormatException extends EnvironmentProblem {
    private static final long serialVersionUID = 1L;

    public CatalogFormatException(String message) {
        super(message);
    }
}
