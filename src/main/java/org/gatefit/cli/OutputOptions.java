package org.gatefit.cli;

import java.io.FilterWriter;
import java.io.IOException;
import java.io.Writer;
import java.nio.file.Path;
import org.gatefit.report.CsvStyle;
import org.gatefit.report.Format;
import org.gatefit.report.Rendering;
import org.gatefit.report.ReportHeader;
import picocli.CommandLine.Option;

/** {@code --format}, {@code --csv-style} and {@code --output}, shared by every command that prints results. */
final class OutputOptions {
    @Option(names = "--format", paramLabel = "FORMAT", defaultValue = "text",
            description = "Output format: ${COMPLETION-CANDIDATES} (default: ${DEFAULT-VALUE}).")
    Format format = Format.TEXT;

    @Option(names = "--csv-style", paramLabel = "STYLE", defaultValue = "comma", description = CSV_STYLE)
    CsvStyle csvStyle = CsvStyle.COMMA;

    @Option(names = {"-o", "--output"}, paramLabel = "FILE",
            description = "Write results to FILE instead of standard output.")
    Path output;

    /** The help of {@code --csv-style}, shared with {@code export}. */
    static final String CSV_STYLE = "CSV for a spreadsheet's locale: comma (comma separators, decimal points) or"
            + " semicolon (semicolon separators, decimal commas and a UTF-8 byte-order mark, as spreadsheets in"
            + " decimal-comma locales open it) (default: ${DEFAULT-VALUE}).";

    /**
     * How to render: colour as {@link #colour}; the header whole except in text on standard output,
     * where it is one line.
     */
    Rendering rendering(Context ctx, ReportHeader header) throws UsageException {
        checkCsvStyle(format, csvStyle);
        return new Rendering(format, colour(ctx), header, format == Format.TEXT && output == null, csvStyle);
    }

    /** --csv-style other than the default is a usage error with any format but CSV: it would do nothing. */
    static void checkCsvStyle(Format format, CsvStyle style) throws UsageException {
        if (style != CsvStyle.COMMA && format != Format.CSV) {
            throw new UsageException("--csv-style " + style + " applies to --format csv only, got --format " + format);
        }
    }

    /** Whether text verdicts get ANSI colour: text to standard output on a terminal, NO_COLOR unset. */
    boolean colour(Context ctx) {
        return format == Format.TEXT && output == null && ctx.colour();
    }

    /** Where results go; closing it closes the file but never standard output. */
    Writer open(Context ctx) throws IOException {
        return open(ctx, output);
    }

    /**
     * Standard output when {@code output} is null, else the file (parent folders created), which
     * takes the place of an earlier file of that name only when written completely
     * ({@link OutputFile}).
     */
    static Writer open(Context ctx, Path given) throws IOException {
        Path output = ctx.path(given);
        if (output == null) {
            return new FilterWriter(ctx.out) {
                @Override
                public void close() throws IOException {
                    flush();
                }
            };
        }
        return OutputFile.open(output, given.toString());
    }
}
