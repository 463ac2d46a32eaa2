package org.gatefit.cli;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import org.gatefit.catalog.Kind;
import org.gatefit.catalog.SheetReader;
import org.gatefit.index.Importer;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

@Command(name = "import", mixinStandardHelpOptions = true,
        header = "Import switch and driver catalogs (CSV) into the catalog, in one commit.",
        description = {"Reads each FILE (CSV: UTF-8, UTF-16 or Windows-1252, comma, semicolon or tab separated; or an .xlsx workbook; headings as people write them, e.g. 'Vds (V)', 'Qg (nC)', mapped with --map; the kind is told from the columns) and upserts its parts by part number. All files go in one commit: if any row of any file is bad, nothing is written and every problem is listed with file, line and column (exit 3). Columns the schema does not know are kept as extra attributes. See catalog-schema/README.md for the columns and units."})
final class ImportCommand extends CatalogCommand implements Callable<Integer> {
    @Parameters(paramLabel = "FILE", arity = "1..*", description = "CSV files to import.")
    List<Path> files;

    @Option(names = "--kind", paramLabel = "KIND", converter = KindConverter.class,
            description = "Read every file as switch or driver instead of telling from the columns.")
    Kind kind;

    @Option(names = "--replace", description = "Drop the imported kinds' previous parts (same commit).")
    boolean replace;

    @Option(names = "--skip-invalid", paramLabel = "REJECTS.csv",
            description = "Import the good rows and write the rejected rows, with their reasons, to REJECTS.csv (it imports again once fixed).")
    Path rejects;

    @picocli.CommandLine.Mixin
    SheetOptions sheet;

    ImportCommand(Context ctx) {
        super(ctx);
    }

    @Override
    public Integer call() throws Exception {
        Path dir = catalogDir();
        if (rejects != null) {
            checkRejectsFolder();
        }
        List<String> names = new ArrayList<>();
        List<Path> paths = new ArrayList<>();
        for (Path f : files) {
            names.add(f.toString());
            paths.add(ctx.path(f));
        }
        long lines = ctx.terminal ? Progress.dataLines(paths) : 0;
        Importer.Result r;
        try (Progress bar = ctx.progress("rows imported", lines >= Progress.LONG_IMPORT ? lines : 0)) {
            r = new Importer(dir, ctx.clock).run(paths, names, new Importer.Options(kind, replace, ctx.path(rejects),
                    sheet.options(ctx)),
                    bar::update);
        }
        for (SheetReader.Summary s : r.files()) {
            if (!s.unknownColumns().isEmpty()) {
                ctx.err.println("note: " + s.file() + ": columns not in the " + s.kind() + " schema, kept as extra"
                        + " attributes: " + String.join(", ", s.unknownColumns()));
            }
            ctx.out.printf("%s: %d %s rows imported%s (sha256 %s)%n", s.file(), s.rows(), s.kind(),
                    s.rejected() > 0 ? ", " + s.rejected() + " rejected" : "", s.sha256().substring(0, 12));
        }
        for (var removed : r.removed().entrySet()) {
            ctx.err.println("note: --replace removed the " + removed.getValue() + " " + removed.getKey()
                    + (removed.getValue() == 1 ? " part" : " parts") + " the catalog held before this import");
        }
        if (r.rejected() > 0) {
            ctx.err.println("note: " + r.rejected() + " rejected rows written to " + rejects + " with their reasons");
        }
        ctx.out.println("catalog: " + dir + (replace ? " (replaced the imported kinds)" : ""));
        ctx.out.flush();
        return ExitCode.OK;
    }

    /**
     * The rejects file's folder must exist and be writable, checked before the import (the import
     * writes the rejects beside it under a temporary name, which no message should show).
     */
    private void checkRejectsFolder() throws UsageException, WriteFailedException {
        Path folder = ctx.path(rejects).toAbsolutePath().getParent();
        String shown = rejects.getParent() != null ? rejects.getParent().toString() : String.valueOf(folder);
        if (folder != null && !Files.isDirectory(folder)) {
            throw new UsageException("--skip-invalid " + rejects + ": the folder " + shown + " does not exist (create it,"
                    + " or name a file in an existing folder); nothing was imported");
        }
        if (folder != null && !Files.isWritable(folder)) {
            throw new WriteFailedException("--skip-invalid " + rejects, "the folder " + shown + " is not writable;"
                    + " nothing was imported");
        }
    }
}
