package org.gatefit.failure;

/** Input data cannot be used: a file, column or value; the message names file, line and column. */
public abstract non-sealed class BadInput extends Exception implements Failure {
    private static final long serialVersionUID = 1L;
    /** Exit code of bad input data. */
    public static final int EXIT_CODE = 3;

    protected BadInput(String message) {
        super(message);
    }

    @Override
    public final int exitCode() {
        return EXIT_CODE;
    }

    /** The message as it is: each of its lines starts with the file it is about. */
    @Override
    public String report(String command) {
        return getMessage();
    }
}
