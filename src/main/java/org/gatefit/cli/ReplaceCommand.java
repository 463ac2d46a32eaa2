package org.gatefit.cli;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.io.Writer;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.Callable;
import org.gatefit.catalog.Bom;
import org.gatefit.catalog.Kind;
import org.gatefit.catalog.Row;
import org.gatefit.index.Catalog;
import org.gatefit.index.CatalogParts;
import org.gatefit.match.Margins;
import org.gatefit.match.Replacement;
import org.gatefit.report.Rendering;
import org.gatefit.report.ReplaceReports;
import org.gatefit.report.ReportHeader;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

@Command(name = "replace", mixinStandardHelpOptions = true,
        header = "Rank substitutes for a switch or driver: drop-in, pin-compatible or functional.",
        description = {"Compares every catalog part of the same kind with PART, parameter by parameter (the README"
            + " lists which must be equal, which may be better and which need re-verification outside a window),"
            + " and grades it: drop-in (same pinout, nothing worse, nothing to re-verify, every pairing still passes),"
            + " pin-compatible (same pinout, something to re-verify) or functional (other pinout, electrically fit)."
            + " A part with a worse essential rating (blocking voltage, gate window, offset or isolation rating,"
            + " technology, channel type, topology, channel count, input polarity) is not offered.",
            "",
            "With --stages, the candidate takes PART's place in every stage that uses it and all rules run with"
            + " that stage's counterpart and operating point. Obsolete parts are left out unless asked for."})
final class ReplaceCommand extends CatalogCommand implements Callable<Integer> {
    @Parameters(paramLabel = "PART", description = "The part to replace.")
    String part;

    @Option(names = "--kind", paramLabel = "KIND", converter = KindConverter.class,
            description = "switch or driver, when both kinds have this part number.")
    Kind kind;

    @Option(names = "--stages", paramLabel = "STAGES.csv", description = "Re-check the stages that use PART.")
    Path stages;

    @Option(names = "--stage", paramLabel = "ID",
            description = "Re-check only this stage-sheet row (it must use PART).")
    String stage;

    @Option(names = "--bom", paramLabel = "BOM.csv", description = "BOM to resolve the stage sheet's designators.")
    Path bom;

    @Option(names = "--top", paramLabel = "N", defaultValue = "10", description = "How many substitutes to list (default: ${DEFAULT-VALUE}).")
    int top;

    @Option(names = "--include-obsolete", description = "Also consider obsolete parts.")
    boolean includeObsolete;

    @Option(names = "--all", description = "Compare every part of the kind and list each one not offered with the"
            + " reason.")
    boolean all;

    @Mixin
    MarginOptions margins;

    @Mixin
    OutputOptions output;

    /** How the stage sheet of --stages is read (as check reads its sheet). */
    @Mixin
    SheetOptions sheet;

    ReplaceCommand(Context ctx) {
        super(ctx);
    }

    @Override
    public Integer call() throws Exception {
        if (top < 1) {
            throw new UsageException("--top: expected at least 1, got " + top);
        }
        if (bom != null && stages == null) {
            throw new UsageException("--bom needs --stages (the BOM resolves the stage sheet's designators)");
        }
        if (stage != null && stages == null) {
            throw new UsageException("--stage " + stage + " needs --stages FILE, the stage sheet it is a row of");
        }
        Margins m = margins.margins();
        List<Row> stageRows = List.of();
        Bom b = null;
        if (stages != null) {
            // The stage sheet is read as check reads it: the same reading options (--map, --map-file,
            // --encoding, --header-row, --sheet); the BOM has headings of its own, so only the encoding applies to it.
            org.gatefit.catalog.SheetReader.Options options = sheet == null
                    ? new org.gatefit.catalog.SheetReader.Options(null, 0, null, null, ctx.err::println) : sheet.options(ctx);
            stageRows = CheckCommand.readStages(ctx.path(stages), stages.toString(), options);
            if (stage != null) {
                stageRows = List.of(StageRowOptions.find(stageRows, stages.toString(), stage));
            }
            if (bom != null) {
                if (!Files.isRegularFile(ctx.path(bom))) {
                    throw new NoSuchFileException(bom.toString());
                }
                b = Bom.read(ctx.path(bom), bom.toString(),
                        options.forBom());
            }
        }
        Replacement.Result r;
        ReportHeader header;
        try (Catalog c = openCatalog()) {
            List<Row> found = kind == null ? c.lookup(part) : c.get(kind, part).map(List::of).orElse(List.of());
            if (found.isEmpty()) {
                throw PairSupport.notFound(c, kind, part);
            }
            if (found.size() > 1) {
                throw new UsageException("'" + part + "' is both a switch and a driver; add --kind switch or --kind driver");
            }
            Row original = found.get(0);
            r = Replacement.search(new CatalogParts(c), original, top, includeObsolete, all,
                    stages == null ? "" : stages.toString(), stageRows, b, m);
            if (stage != null && r.stagesUsing().isEmpty()) {
                throw new UsageException("--stage " + stage + ": that row of " + stages + " does not use " + part
                        + "; name a stage it sits in");
            }
            header = header("replace", c, input(ReportHeader.Role.STAGES, stages), input(ReportHeader.Role.BOM, bom),
                    input(ReportHeader.Role.MAP_FILE, sheet == null || stages == null ? null : sheet.mapFile));
        }
        Rendering how = output.rendering(ctx, header);
        try (Writer w = output.open(ctx)) {
            ReplaceReports.render(r, how, w);
            OutputFile.finish(w);
        }
        return ExitCode.OK;
    }

}
