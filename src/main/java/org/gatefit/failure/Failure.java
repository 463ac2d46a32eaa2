package org.gatefit.failure;

/**
 * Everything gatefit tells its user instead of a result: each failure is one of three kinds, and the
 * kind carries the exit code. The set is closed ({@code sealed}); the command line prints a failure's
 * {@link #report} and exits with its {@link #exitCode}, without looking at which class it is.
 *
 * <p>This package depends on nothing and every other package may depend on it (DEVELOPERS.md,
 * Layout). The kinds are abstract classes, so a failure is an exception that can be thrown and
 * caught by its kind; {@link EnvironmentProblem} is an {@link java.io.IOException}, as the catalog's
 * I/O methods declare.
 */
public sealed interface Failure permits UsageProblem, BadInput, EnvironmentProblem {

    /** The process exit code of this kind of failure. */
    int exitCode();

    /** What is wrong and what was expected (the exception's message). */
    String getMessage();

    /**
     * The message as the command line prints it: after {@code gatefit COMMAND: }, unless the message
     * names its own file and line (bad input data).
     */
    default String report(String command) {
        return "gatefit " + command + ": " + getMessage();
    }
}
