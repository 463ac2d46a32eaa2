package org.gatefit.cli;

import java.io.IOException;
import java.nio.charset.Charset;
import java.nio.charset.IllegalCharsetNameException;
import java.nio.charset.UnsupportedCharsetException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.gatefit.catalog.BadValueException;
import org.gatefit.catalog.Mapping;
import org.gatefit.catalog.SheetReader;
import picocli.CommandLine.Option;

/**
 * How to read people's sheets, shared by {@code import}, {@code validate} and {@code check}:
 * headings mapped to columns, the text encoding, the header row, the sheet of a workbook.
 */
final class SheetOptions {
    @Option(names = "--map", paramLabel = "HEADING=column",
            description = "Read the column headed HEADING as the schema column (repeatable); an empty column keeps it as an extra attribute.")
    List<String> map = new ArrayList<>();

    @Option(names = "--map-file", paramLabel = "FILE",
            description = "A mapping file of headings to columns (JSON, catalog-schema/mapping.schema.json; 'validate --suggest-map' writes one).")
    Path mapFile;

    @Option(names = "--encoding", paramLabel = "NAME",
            description = "Text encoding of the files (e.g. windows-1252, ISO-8859-15, UTF-16LE); default: a byte-order mark, else UTF-8, else Windows-1252 with a note.")
    String encoding;

    @Option(names = "--header-row", paramLabel = "N",
            description = "The header is on line (workbook row) N; default: the first row whose headings name the required columns.")
    Long headerRow;

    @Option(names = "--sheet", paramLabel = "NAME", description = "The sheet of an .xlsx workbook to read (default: the first).")
    String sheet;

    /** The reader's options, notes printed on standard error as they come. */
    SheetReader.Options options(Context ctx) throws BadValueException, IOException, UsageException {
        Charset cs = null;
        if (encoding != null) {
            try {
                cs = Charset.forName(encoding.strip());
            } catch (IllegalCharsetNameException | UnsupportedCharsetException e) {
                throw new UsageException("--encoding " + encoding + ": unknown encoding (expected a name such as UTF-8,"
                        + " windows-1252, ISO-8859-15 or UTF-16LE)");
            }
        }
        if (headerRow != null && headerRow < 1) {
            throw new UsageException("--header-row: expected a line number of 1 or more, got " + headerRow);
        }
        Path file = ctx.path(mapFile);
        if (file != null && !Files.isRegularFile(file)) {
            throw new NoSuchFileException(mapFile.toString());
        }
        Mapping m = Mapping.of(file, mapFile == null ? null : mapFile.toString(), map);
        return new SheetReader.Options(cs, headerRow == null ? 0 : headerRow, sheet, m, ctx.err::println);
    }
}
