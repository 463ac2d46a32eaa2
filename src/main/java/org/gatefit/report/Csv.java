package org.gatefit.report;

import java.io.IOException;
import java.io.Writer;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;
import org.gatefit.catalog.Cells;
import org.gatefit.catalog.Numbers;

/**
 * CSV records in a {@link CsvStyle} with RFC 4180 quoting: text that a spreadsheet would run as a
 * formula is neutralised, numbers are written in the style's decimal mark. The one place report
 * CSV is written.
 */
final class Csv {
    private final CSVPrinter printer;
    private final CsvStyle style;

    private Csv(Writer out, CsvStyle style) throws IOException {
        this.style = style;
        this.printer = new CSVPrinter(out, CSVFormat.DEFAULT.builder().setDelimiter(style.delimiter)
                .setRecordSeparator('\n').get());
    }

    /** Starts CSV on {@code out}: the byte-order mark first in the {@link CsvStyle#SEMICOLON} style. */
    static Csv start(Writer out, CsvStyle style) throws IOException {
        if (style == CsvStyle.SEMICOLON) {
            out.write(CsvStyle.BOM);
        }
        return new Csv(out, style);
    }

    /** A catalog value for a cell: written shortest and plain ({@link Numbers#format}), as an export writes it. */
    record Plain(double value) {
    }

    /**
     * One record: a {@link Double} in the style's number form (empty when not finite), a
     * {@link Plain} as a plain decimal in the style's mark, another number as written, null as
     * empty, anything else as neutralised text (so a number must not be passed as a string: a
     * negative one would be taken for a formula).
     */
    Csv row(Object... cells) throws IOException {
        Object[] safe = new Object[cells.length];
        for (int i = 0; i < cells.length; i++) {
            Object c = cells[i];
            safe[i] = c == null ? "" : c instanceof Double d ? style.number(d)
                    : c instanceof Plain p ? style.decimal(Numbers.format(p.value()))
                    : c instanceof Number ? c.toString() : Cells.neutraliseText(c.toString());
        }
        printer.printRecord(safe);
        return this;
    }

    /** One record of the cells of {@code cells}, as {@link #row(Object...)}. */
    Csv row(java.util.List<?> cells) throws IOException {
        return row(cells.toArray());
    }

    /** An empty line (between the blocks of a mixed list). */
    void blankLine() throws IOException {
        printer.println();
    }

    void flush() throws IOException {
        printer.flush();
    }
}
