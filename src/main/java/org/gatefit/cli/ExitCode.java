package org.gatefit.cli;

/** Exit codes of every command, in one place (DESIGN.md). */
public final class ExitCode {
    /** Done, and nothing checked failed. */
    public static final int OK = 0;
    /** A checked pair failed. */
    public static final int FAILED = 1;
    /** The command line was wrong (unknown option, bad value, unknown column). */
    public static final int USAGE = 2;
    /** Input data was bad: a file, column or value (the message names file, line and column). */
    public static final int BAD_DATA = 3;
    /** The catalog could not be read or written (locked by another import, disk or I/O error, internal error). */
    public static final int ENVIRONMENT = 4;

    private ExitCode() {
    }
}
