package org.gatefit.report;

import java.util.Locale;
import org.gatefit.catalog.Numbers;

/**
 * How CSV output is laid out for the spreadsheet that opens it. {@link #COMMA} is RFC 4180: comma
 * separators, decimal points, no byte-order mark (what scripts and English-locale spreadsheets
 * read). {@link #SEMICOLON} is what spreadsheets set to a decimal-comma locale (German, French,
 * Italian, Spanish, …) open with a double click: semicolon separators, decimal commas, plain
 * decimals (never {@code 1E-9}), and a UTF-8 byte-order mark first so that µ, Ω and accented makers
 * are read as UTF-8. {@code import} reads both back (a semicolon file's numbers as decimal commas).
 */
public enum CsvStyle {
    COMMA(','),
    SEMICOLON(';');

    /** The UTF-8 byte-order mark, as the one character U+FEFF (bytes EF BB BF in UTF-8). */
    static final char BOM = '\uFEFF';

    final char delimiter;

    CsvStyle(char delimiter) {
        this.delimiter = delimiter;
    }

    /**
     * A number for a cell: {@link #COMMA} as Java writes a double ({@code 2.2E-8}), {@link #SEMICOLON}
     * as a plain decimal with a comma ({@code 0,000000022}); empty when not finite (unknown).
     */
    String number(double v) {
        if (!Double.isFinite(v)) {
            return "";
        }
        return switch (this) {
            case COMMA -> Double.toString(v);
            case SEMICOLON -> decimal(Numbers.format(v));
        };
    }

    /** A number already written with a decimal point ({@link Numbers#format}), in this style's decimal mark. */
    String decimal(String plain) {
        return switch (this) {
            case COMMA -> plain;
            case SEMICOLON -> plain.replace('.', ',');
        };
    }

    @Override
    public String toString() {
        return name().toLowerCase(Locale.ROOT);
    }
}
