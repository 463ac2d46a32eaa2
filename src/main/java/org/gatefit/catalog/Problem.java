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
 * @param sheetRows whether {@code line} is a spreadsheet's row (an {@code .xlsx} sheet): shown as
 *                  "row 14, column D (q_g_nc)"
 */
public record Problem(String file, long line, String column, int columnNumber, String text, String message,
                      boolean sheetRows) {

    /** A problem of a text file (lines). */
    public Problem(String file, long line, String column, int columnNumber, String text, String message) {
        this(file, line, column, columnNumber, text, message, false);
    }

    /** This problem in a spreadsheet's rows and lettered columns. */
    public Problem inSheetRows() {
        return sheetRows ? this : new Problem(file, line, column, columnNumber, text, message, true);
    }

    public Problem {
        Objects.requireNonNull(file, "file");
        Objects.requireNonNull(message, "message");
        if (line < 0) {
            throw new IllegalArgumentException("expected a line number ≥ 0, got " + line);
        }
        column = excerpt(column);
        text = excerpt(text); // a megabyte cell is not kept (up to 200 problems per file) nor reported whole
    }

    /** Characters of a cell that messages and reports quote, at most. */
    public static final int QUOTED = 80;

    /**
     * {@code s} when it is at most {@link #QUOTED} characters long, else its first {@link #QUOTED}
     * characters (never half a surrogate pair), an ellipsis and its length: {@code 1234…
     * (1,000,000 characters)}. Null stays null.
     */
    public static String excerpt(String s) {
        if (s == null || s.length() <= QUOTED) {
            return s;
        }
        int end = Character.isHighSurrogate(s.charAt(QUOTED - 1)) ? QUOTED - 1 : QUOTED;
        return s.substring(0, end) + "… (" + String.format(java.util.Locale.ROOT, "%,d", s.length()) + " characters)";
    }

    /** Text from a cell for a message: {@code 'text'}, or {@code 'first 80 characters…' (N characters)}. */
    public static String quote(String s) {
        if (s == null || s.length() <= QUOTED) {
            return "'" + s + "'";
        }
        String e = excerpt(s);
        int paren = e.lastIndexOf(" (");
        return "'" + e.substring(0, paren) + "'" + e.substring(paren);
    }

    /** Names for a message, each {@link #excerpt excerpted}, the first 20 of them: {@code a, b, c … and 7 more}. */
    public static String names(java.util.List<String> names) {
        StringBuilder sb = new StringBuilder();
        int n = 0;
        for (String name : names) {
            if (n == 20) {
                return sb.append(" … and ").append(names.size() - n).append(" more").toString();
            }
            if (n++ > 0) {
                sb.append(", ");
            }
            sb.append(excerpt(name));
        }
        return sb.toString();
    }

    /** A problem of a whole line. */
    public static Problem ofLine(String file, long line, String message) {
        return new Problem(file, line, null, 0, null, message);
    }

    /** {@code switches.csv line 14, column q_g_nc (21): '13O' is not a number (...)} */
    @Override
    public String toString() {
        StringBuilder sb = new StringBuilder(file);
        if (sheetRows) {
            if (line > 0) {
                sb.append(" row ").append(line);
            }
            if (columnNumber > 0) {
                sb.append(", column ").append(XlsxRecords.letters(columnNumber));
                if (column != null) {
                    sb.append(" (").append(column).append(')');
                }
            } else if (column != null) {
                sb.append(", column ").append(column);
            }
            return sb.append(": ").append(message).toString();
        }
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
