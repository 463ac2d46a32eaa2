package org.gatefit.catalog;

import java.util.Objects;

/**
 * One thing wrong with input data, located as an editor shows it.
 *
 * @param file    file name as given by the user
 * @param line    physical line number, 1-based (0 when the problem concerns the whole file)
 * @param column  column name, or null when the problem concerns the whole line or file
 * @param columnNumber 1-based column position, or 0 when unknown
 * @param text    the offending text, or null
 * @param message what is wrong and what was expected, as one sentence
 */
public record Problem(String file, long line, String column, int columnNumber, String text, String message) {

    public Problem {
        Objects.requireNonNull(file, "file");
        Objects.requireNonNull(message, "message");
        if (line < 0) {
            throw new IllegalArgumentException("expected a line number ≥ 0, got " + line);
        }
    }

    /** A problem of a whole line. */
    public static Problem ofLine(String file, long line, String message) {
        return new Problem(file, line, null, 0, null, message);
    }

    /** {@code switches.csv line 14, column q_g_nc (21): '13O' is not a number (...)} */
    @Override
    public String toString() {
        StringBuilder sb = new StringBuilder(file);
        if (line > 0) {
            sb.append(" line ").append(line);
        }
        if (column != null) {
            sb.append(", column ").append(column);
            if (columnNumber > 0) {
                sb.append(" (").append(columnNumber).append(')');
            }
        }
        return sb.append(": ").append(message).toString();
    }
}
