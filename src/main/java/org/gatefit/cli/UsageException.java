package org.gatefit.cli;

/** A command-line value that cannot be used; exits with {@link ExitCode#USAGE}. */
final class UsageException extends Exception {
    private static final long serialVersionUID = 1L;

    UsageException(String message) {
        super(message);
    }
}
