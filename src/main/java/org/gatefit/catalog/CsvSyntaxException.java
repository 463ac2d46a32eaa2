package org.gatefit.catalog;

import java.io.IOException;

/**
 * CSV text that cannot be split into records, as a typed value: what is wrong ({@link Syntax}) and
 * where (line, cell position). A record reader throws it from {@link CsvRecords#next}; the sheet
 * reader words it with the file's name and the column's header ({@link SheetReader}). Never
 * recognised by its message, which is for stack traces only.
 */
final class CsvSyntaxException extends IOException {
    private static final long serialVersionUID = 1L;

    /** The ways CSV text can be malformed under the settings gatefit reads with (RFC 4180 quoting). */
    enum Syntax {
        /** A quoted cell still open at the end of the input. */
        UNCLOSED_QUOTE,
        /** A character other than whitespace between a closing quote and the next separator or line end. */
        TEXT_AFTER_QUOTE
    }

    private final Syntax syntax;
    private final long line;
    private final int column;

    /**
     * @param line   physical line the record holding the problem starts on (1-based)
     * @param column 1-based position of the cell, or 0 when the reader cannot tell
     * @param cause  the library's own exception, when a library found it
     */
    CsvSyntaxException(Syntax syntax, long line, int column, Throwable cause) {
        super(syntax + " in the record starting on line " + line + (column > 0 ? ", cell " + column : ""), cause);
        this.syntax = syntax;
        this.line = line;
        this.column = column;
    }

    Syntax syntax() {
        return syntax;
    }

    long line() {
        return line;
    }

    int column() {
        return column;
    }
}
