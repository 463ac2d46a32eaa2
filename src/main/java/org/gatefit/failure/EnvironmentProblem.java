package org.gatefit.failure;

import java.io.IOException;

/**
 * The catalog cannot be used as it is: locked by another import, or written in a layout this version
 * does not read. An {@link IOException}, so the catalog's I/O methods declare it as they declare
 * other I/O problems (which exit with the same code).
 */
public abstract non-sealed class EnvironmentProblem extends IOException implements Failure {
    private static final long serialVersionUID = 1L;
    /** Exit code of a problem with the catalog or the machine. */
    public static final int EXIT_CODE = 4;

    protected EnvironmentProblem(String message) {
        super(message);
    }

    protected EnvironmentProblem(String message, Throwable cause) {
        super(message, cause);
    }

    @Override
    public final int exitCode() {
        return EXIT_CODE;
    }
}
