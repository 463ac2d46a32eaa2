package org.gatefit.failure;

/** The command line asked for something that cannot be done: unknown option, bad value, unknown column. */
public abstract non-sealed class UsageProblem extends Exception implements Failure {
    private static final long serialVersionUID = 1L;
    /** Exit code of a usage problem (as picocli's own usage errors). */
    public static final int EXIT_CODE = 2;

    protected UsageProblem(String message) {
        super(message);
    }

    @Override
    public final int exitCode() {
        return EXIT_CODE;
    }
}
