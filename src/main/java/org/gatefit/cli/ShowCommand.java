package org.gatefit.cli;

import java.io.Writer;
import java.util.List;
import java.util.concurrent.Callable;
import org.gatefit.catalog.Kind;
import org.gatefit.catalog.Row;
import org.gatefit.index.Catalog;
import org.gatefit.report.PartsReport;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

@Command(name = "show", mixinStandardHelpOptions = true,
        header = "Show every column of one part.",
        description = "Prints each column of the part with its value, unit and meaning; 'unknown' marks empty cells.")
final class ShowCommand extends CatalogCommand implements Callable<Integer> {
    @Parameters(paramLabel = "PART", description = "Part number (case does not matter).")
    String part;

    @Option(names = "--kind", paramLabel = "KIND", converter = KindConverter.class,
            description = "switch or driver, when both kinds have this part number.")
    Kind kind;

    @Mixin
    OutputOptions output;

    ShowCommand(Context ctx) {
        super(ctx);
    }

    @Override
    public Integer call() throws Exception {
        try (Catalog c = openCatalog()) {
            List<Row> found = kind == null ? c.lookup(part) : c.get(kind, part).map(List::of).orElse(List.of());
            if (found.isEmpty()) {
                throw PairSupport.notFound(c, kind, part);
            }
            if (found.size() > 1) {
                throw new UsageException("'" + part + "' is both a switch and a driver; add --kind switch or --kind driver");
            }
            try (Writer w = output.open(ctx)) {
                PartsReport.sheet(found.get(0), output.rendering(ctx, null), w);
                OutputFile.finish(w);
            }
        }
        return ExitCode.OK;
    }
}
