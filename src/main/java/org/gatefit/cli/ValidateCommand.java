package org.gatefit.cli;

import java.io.Writer;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import org.gatefit.catalog.Kind;
import org.gatefit.catalog.Row;
import org.gatefit.catalog.SheetReader;
import org.gatefit.report.CatalogReports;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

@Command(name = "validate", mixinStandardHelpOptions = true,
        header = "Check catalog and stage-sheet files as import would, without writing anything.",
        description = {"Runs every import check on each FILE (switch or driver catalogs, stage sheets) and lists all problems with file, line and column. Exit 0 when every file is clean, 3 otherwise."})
final class ValidateCommand extends CatalogCommand implements Callable<Integer> {
    @Parameters(paramLabel = "FILE", arity = "1..*", description = "CSV files to check.")
    List<Path> files;

    @Option(names = "--kind", paramLabel = "KIND",
            description = "Read every file as switch, driver or stage instead of telling from the columns.")
    String kind;

    @Mixin
    OutputOptions output;

    ValidateCommand(Context ctx) {
        super(ctx);
    }

    @Override
    public Integer call() throws Exception {
        Kind k = null;
        if (kind != null) {
            try {
                k = Kind.fromId(kind);
            } catch (IllegalArgumentException e) {
                throw new UsageException("--kind: " + e.getMessage());
            }
        }
        List<SheetReader.Summary> results = new ArrayList<>();
        for (Path f : files) {
            if (!Files.isRegularFile(ctx.path(f))) {
                throw new NoSuchFileException(f.toString());
            }
            results.add(SheetReader.read(ctx.path(f), f.toString(), k, new SheetReader.Sink() {
                @Override
                public void accept(Row row) {
                }
            }));
        }
        try (Writer w = output.open(ctx)) {
            CatalogReports.validation(results, output.format, w);
        }
        return results.stream().allMatch(SheetReader.Summary::clean) ? ExitCode.OK : ExitCode.BAD_DATA;
    }
}
