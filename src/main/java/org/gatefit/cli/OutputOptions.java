package org.gatefit.cli;

import java.io.FilterWriter;
import java.io.IOException;
import java.io.Writer;
import java.nio.file.Path;
import org.gatefit.report.Format;
import picocli.CommandLine.Option;

/** {@code --format} and {@code --output}, shared by every command that prints results. */
final class OutputOptions {
    @Option(names = "--format", paramLabel = "FORMAT", defaultValue = "text",
            description = "Output format: ${COMPLETION-CANDIDATES} (default: ${DEFAULT-VALUE}).")
    Format format = Format.TEXT;

    @Option(names = {"-o", "--output"}, paramLabel = "FILE",
            description = "Write results to FILE instead of standard output.")
    Path output;

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
