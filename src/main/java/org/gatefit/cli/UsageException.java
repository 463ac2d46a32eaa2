package org.gatefit.cli;

import org.gatefit.failure.UsageProblem;

/** A command-line value that cannot be used; exits with {@link ExitCode#USAGE}. */
class UsageException extends UsageProblem {
    private static final long serialVersionUID = 1L;

    UsageException(String message) {
        super(message);
    }
}
