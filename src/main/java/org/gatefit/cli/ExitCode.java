package org.gatefit.cli;

import org.gatefit.failure.BadInput;
import org.gatefit.failure.EnvironmentProblem;
import org.gatefit.failure.UsageProblem;

/**
 * Exit codes of every command, in one place (DESIGN.md). A failure's code comes with its kind
 * ({@link org.gatefit.failure.Failure}); the constants here name the same numbers.
 */
public final class ExitCode {
    /** Done, and nothing checked failed. */
    public static final int OK = 0;
    /** A checked pair failed. */
    public static final int FAILED = 1;
    /** The command line was wrong (unknown option, bad value, unknown column). */
    public static final int USAGE = UsageProblem.EXIT_CODE;
    /** Input data was bad: a file, column or value (the message names file, line and column). */
    public static final int BAD_DATA = BadInput.EXIT_CODE;
    /** The catalog could not be read or written (locked by another import, another index format, disk or I/O error). */
    public static final int ENVIRONMENT = EnvironmentProblem.EXIT_CODE;
    /**
     * A bug in gatefit (an exception no check expected): EX_SOFTWARE, "internal software error", as
     * BSD's sysexits.h names 70. The message asks for a report.
     */
    public static final int INTERNAL = 70;

    private ExitCode() {
    }
}
