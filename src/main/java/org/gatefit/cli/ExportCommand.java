package org.gatefit.cli;

import java.io.Writer;
import java.util.List;
import java.util.concurrent.Callable;
import org.gatefit.catalog.Kind;
import org.gatefit.catalog.Row;
import org.gatefit.index.Catalog;
import org.gatefit.index.PartSearch;
import org.gatefit.report.Format;
import org.gatefit.report.PartsReport;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

@Command(name = "export", mixinStandardHelpOptions = true,
        header = "Write all parts of one kind as CSV (importable) or JSON.",
        description = {"CSV has every schema column in schema order, then extra columns, values in the columns' units; importing it gives the same catalog back. Text a spreadsheet would run as a formula (starting with = + - @) is neutralised with a leading apostrophe, which import removes."})
final class ExportCommand extends CatalogCommand implements Callable<Integer> {
    @Option(names = "--kind", required = true, paramLabel = "KIND", converter = KindConverter.class,
            description = "switch or driver.")
    Kind kind;

    @Option(names = "--format", paramLabel = "FORMAT", defaultValue = "csv",
            description = "csv or json (default: ${DEFAULT-VALUE}).")
    Format format;

    @Option(names = "--csv-style", paramLabel = "STYLE", defaultValue = "comma", description = OutputOptions.CSV_STYLE)
    org.gatefit.report.CsvStyle csvStyle;

    @Option(names = {"-o", "--output"}, paramLabel = "FILE", description = "Write to FILE instead of standard output.")
    java.nio.file.Path output;

    ExportCommand(Context ctx) {
        super(ctx);
    }

    @Override
    public Integer call() throws Exception {
        if (format != Format.CSV && format != Format.JSON) {
            throw new UsageException("--format: export writes csv or json, got " + format);
        }
        OutputOptions.checkCsvStyle(format, csvStyle);
        try (Catalog c = openCatalog()) {
            List<Row> rows = PartSearch.find(c, kind, List.of(), List.of(), null, Integer.MAX_VALUE);
            try (Writer w = OutputOptions.open(ctx, output)) {
                if (format == Format.CSV) {
                    PartsReport.csv(kind, rows, csvStyle, w);
                } else {
                    PartsReport.json(rows, w);
                }
                OutputFile.finish(w);
            }
        }
        return ExitCode.OK;
    }
}
