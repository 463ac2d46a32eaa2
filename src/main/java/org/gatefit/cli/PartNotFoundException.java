package org.gatefit.cli;

/**
 * A part number that is not in the catalog: a usage error (exit 2) like any other value that cannot
 * be used, told apart only so that the web API can answer it as "not found" (HTTP 404).
 */
final class PartNotFoundException extends UsageException {
    private static final long serialVersionUID = 1L;

    PartNotFoundException(String message) {
        super(message);
    }
}
