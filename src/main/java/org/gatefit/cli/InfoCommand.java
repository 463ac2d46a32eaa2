package org.gatefit.cli;

import java.io.Writer;
import java.util.concurrent.Callable;
import org.gatefit.index.Catalog;
import org.gatefit.report.CatalogReports;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;

@Command(name = "info", mixinStandardHelpOptions = true,
        header = "Show what the catalog holds and where it came from.",
        description = "Prints the catalog directory, the number of switches and drivers, and the import history"
                + " (file, SHA-256, rows, time, mode).")
final class InfoCommand extends CatalogCommand implements Callable<Integer> {
    @Mixin
    OutputOptions output;

    InfoCommand(Context ctx) {
        super(ctx);
    }

    @Override
    public Integer call() throws Exception {
        try (Catalog c = Catalog.openIfPresent(catalogDir()); Writer w = output.open(ctx)) {
            CatalogReports.info(c.directory(), c.contentSha256(), c.counts(), c.history(), output.rendering(ctx, null), w);
            OutputFile.finish(w);
        }
        return ExitCode.OK;
    }
}
