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

    @Mixin
    SheetOptions sheet;

    @Option(names = "--suggest-map",
            description = "Instead of the report, print a mapping file of the headings read (heading → column, \"\" for an extra attribute, and the nearest headings of each required column not found), to edit and give to --map-file.")
    boolean suggestMap;

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
        SheetReader.Options options = sheet.options(ctx);
        List<SheetReader.Summary> results = new ArrayList<>();
        for (Path f : files) {
            if (!Files.isRegularFile(ctx.path(f))) {
                throw new NoSuchFileException(f.toString());
            }
            results.add(SheetReader.read(ctx.path(f), f.toString(), k, new SheetReader.Sink() {
                @Override
                public void accept(Row row) {
                }
            }, options));
        }
        if (suggestMap) {
            java.util.Map<String, String> headings = new java.util.LinkedHashMap<>();
            java.util.Map<String, List<String>> missing = new java.util.LinkedHashMap<>();
            for (SheetReader.Summary s : results) {
                s.headings().forEach(headings::putIfAbsent);
                s.missing().forEach(missing::putIfAbsent);
            }
            if (output.format != org.gatefit.report.Format.TEXT && output.format != org.gatefit.report.Format.JSON) {
                throw new UsageException("--suggest-map writes JSON (expected --format text or json, got " + output.format + ")");
            }
            try (Writer w = output.open(ctx)) {
                w.write(org.gatefit.catalog.Mapping.json(headings, missing));
                OutputFile.finish(w);
            }
            if (!missing.isEmpty()) {
                ctx.err.println("note: no heading names the required column" + (missing.size() > 1 ? "s " : " ")
                        + String.join(", ", missing.keySet()) + "; the mapping lists the nearest headings under \"missing\":"
                        + " map one of them under \"headings\"");
            }
            return ExitCode.OK;
        }
        try (Writer w = output.open(ctx)) {
            CatalogReports.validation(results, output.rendering(ctx, null), w);
            OutputFile.finish(w);
        }
        return results.stream().allMatch(SheetReader.Summary::clean) ? ExitCode.OK : ExitCode.BAD_DATA;
    }
}
