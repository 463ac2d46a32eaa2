package org.gatefit.cli;

import java.io.IOException;
import java.io.Writer;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import org.gatefit.catalog.BadValueException;
import org.gatefit.catalog.Bom;
import org.gatefit.catalog.CatalogDataException;
import org.gatefit.catalog.Kind;
import org.gatefit.catalog.Row;
import org.gatefit.catalog.SheetReader;
import org.gatefit.index.Catalog;
import org.gatefit.index.CatalogParts;
import org.gatefit.match.Margins;
import org.gatefit.match.OperatingPoint;
import org.gatefit.match.Plausibility;
import org.gatefit.match.SwitchPart;
import org.gatefit.match.StageCheck;
import org.gatefit.report.CheckReports;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

@Command(name = "check", mixinStandardHelpOptions = true,
        header = "Check every driver–switch pair of a design (stage sheet, optionally a BOM).",
        description = {"Reads the stage sheet (one row per driver output and the switch it drives; columns in"
            + " catalog-schema/README.md), resolves designators through --bom, and runs every rule on each stage."
            + " Prints a summary and, per stage, the failing and warning rules with what would fix them; half-bridges"
            + " (two stages sharing a driver designator, one high and one low) also get a dead-time note.",
            "",
            "Exit 0 when no stage fails, 1 when one does (so it can gate a CI build), 3 when an input file is bad,"
            + " 4 when the catalog is empty or missing."})
final class CheckCommand extends CatalogCommand implements Callable<Integer> {
    @Parameters(paramLabel = "STAGES.csv", description = "The stage sheet.")
    Path stages;

    @Option(names = "--bom", paramLabel = "BOM.csv",
            description = "BOM to resolve designators (designator and part-number columns; DNP and quantity optional).")
    Path bom;

    @Option(names = "--junit", paramLabel = "FILE", description = "Also write a JUnit-XML report (one test case per stage and rule).")
    Path junit;

    @Option(names = "--network-bom", paramLabel = "FILE", description = "Also write each stage's gate-drive network"
            + " (supply capacitors, gate resistors, diode, pull-down, clamps, bootstrap parts) as a BOM fragment the"
            + " --bom option reads, designators derived from the stage ids.")
    Path networkBom;

    /** Each stage's gate-drive network, in sheet order (filled while the catalog is open, when asked for). */
    private final List<org.gatefit.report.NetworkReports.StageNetwork> networks = new java.util.ArrayList<>();

    @Mixin
    MarginOptions margins;

    @Mixin
    OutputOptions output;

    @Mixin
    SheetOptions sheet;

    /** The report header, made by {@link #run} while the catalog is open. */
    private org.gatefit.report.ReportHeader header;

    CheckCommand(Context ctx) {
        super(ctx);
    }

    @Override
    public Integer call() throws Exception {
        Margins m = margins.margins();
        StageCheck.Report report = run(stages, bom, m);
        for (String n : report.bomNotes()) {
            ctx.err.println("warning: " + n);
        }
        try (Writer w = output.open(ctx)) {
            CheckReports.render(report, output.rendering(ctx, header), w);
            OutputFile.finish(w);
        }
        if (junit != null) {
            try (Writer w = OutputOptions.open(ctx, junit)) {
                CheckReports.junit(report, header, w);
                OutputFile.finish(w);
            }
        }
        if (networkBom != null) {
            try (Writer w = OutputOptions.open(ctx, networkBom)) {
                org.gatefit.report.NetworkReports.bom(networks, w);
                OutputFile.finish(w);
            }
        }
        return report.failed() ? ExitCode.FAILED : ExitCode.OK;
    }

    /** Reads the stage sheet and BOM and checks every stage against the catalog. */
    StageCheck.Report run(Path stagesFile, Path bomFile, Margins m) throws IOException, CatalogDataException,
            BadValueException, UsageException {
        if (!Files.isRegularFile(ctx.path(stagesFile))) {
            throw new NoSuchFileException(stagesFile.toString());
        }
        SheetReader.Options options = sheet == null ? SheetReader.Options.DEFAULT : sheet.options(ctx);
        List<Row> rows = readStages(ctx.path(stagesFile), stagesFile.toString(), options);
        Bom b = null;
        if (bomFile != null) {
            if (!Files.isRegularFile(ctx.path(bomFile))) {
                throw new NoSuchFileException(bomFile.toString());
            }
            // The BOM has headings of its own: only the encoding and the notes apply to it.
            b = Bom.read(ctx.path(bomFile), bomFile.toString(), options.forBom());
        }
        try (Catalog c = openCatalog()) {
            if (c.isEmpty()) {
                // Not a failed pair (exit 1): the environment is not set up (exit 4), so CI can tell them apart.
                throw new NoCatalogException("the catalog in " + c.directory() + (java.nio.file.Files.isDirectory(
                        c.directory()) ? " is empty" : " does not exist") + "; import the parts first ('gatefit"
                        + " --catalog " + c.directory() + " import FILE...'), or name the catalog with --catalog or"
                        + " GATEFIT_CATALOG");
            }
            StageCheck.Report report;
            try (Progress bar = ctx.progress("stages checked", rows.size() >= Progress.LONG_CHECK ? rows.size() : 0)) {
                report = StageCheck.run(stagesFile.toString(), rows, b, new CatalogParts(c), m, bar::update);
            }
            warnImplausible(stagesFile.toString(), rows, report, c);
            if (networkBom != null) {
                networks(report, c);
            }
            header = header("check", c, input(org.gatefit.report.ReportHeader.Role.STAGES, stagesFile),
                    input(org.gatefit.report.ReportHeader.Role.BOM, bomFile),
                    input(org.gatefit.report.ReportHeader.Role.MAP_FILE, sheet == null ? null : sheet.mapFile));
            return report;
        }
    }

    /** Each resolved stage's gate-drive network, from its parts and its figures (GateNetwork, one place). */
    private void networks(StageCheck.Report report, Catalog c) throws IOException {
        for (StageCheck.StageResult s : report.results()) {
            if (s.point() == null) {
                continue;
            }
            java.util.Optional<Row> d = c.get(Kind.DRIVER, s.driver());
            java.util.Optional<Row> sw = c.get(Kind.SWITCH, s.switchPart());
            if (d.isEmpty() || sw.isEmpty()) {
                continue;
            }
            org.gatefit.match.PairResult pair = new org.gatefit.match.PairResult(s.driver(), s.switchPart(), s.verdict(),
                    s.score(), s.checks(), s.figures(), s.point(), report.margins(), Double.NaN);
            networks.add(new org.gatefit.report.NetworkReports.StageNetwork(s.stage(), s.switchRef(), s.line(),
                    org.gatefit.match.GateNetwork.of(org.gatefit.match.DriverPart.of(d.get()), SwitchPart.of(sw.get()),
                    pair)));
        }
    }

    /**
     * Warns of every stage value far outside what its switch's technology uses ({@link Plausibility}),
     * naming the stage, its line and the column.
     */
    private void warnImplausible(String file, List<Row> rows, StageCheck.Report report, Catalog c) throws IOException {
        java.util.Map<Long, Row> byLine = new java.util.HashMap<>();
        for (Row r : rows) {
            byLine.put(r.line(), r);
        }
        for (StageCheck.StageResult s : report.results()) {
            Row row = byLine.get(s.line());
            if (row == null || s.switchPart() == null || s.point() == null) {
                continue;
            }
            java.util.Optional<Row> sw = c.get(Kind.SWITCH, s.switchPart());
            if (sw.isEmpty()) {
                continue;
            }
            for (Plausibility.Finding f : Plausibility.check(OperatingPoint.Spec.fromStage(row),
                    SwitchPart.of(sw.get()).technology())) {
                ctx.err.println("warning: stage " + s.stage() + " (" + file + " line " + s.line() + "): "
                        + f.word(f.quantity().column()));
            }
        }
    }

    /** An empty or missing catalog for {@code check}: exit 4 (environment), with the message alone. */
    static final class NoCatalogException extends IOException {
        private static final long serialVersionUID = 1L;

        NoCatalogException(String message) {
            super(message);
        }

        @Override
        public String toString() {
            return getMessage();
        }
    }

    /** The stage sheet's rows; any problem is bad input (exit 3). */
    static List<Row> readStages(Path file, String name) throws IOException, CatalogDataException {
        return readStages(file, name, SheetReader.Options.DEFAULT);
    }

    /** The stage sheet's rows read with {@code options} (its notes, e.g. a misspelt column, go to them). */
    static List<Row> readStages(Path file, String name, SheetReader.Options options) throws IOException, CatalogDataException {
        if (!Files.isRegularFile(file)) {
            throw new NoSuchFileException(name);
        }
        List<Row> rows = new ArrayList<>();
        SheetReader.Summary s = SheetReader.read(file, name, Kind.STAGE, new SheetReader.Sink() {
            @Override
            public void accept(Row row) {
                rows.add(row);
            }
        }, options);
        if (!s.clean()) {
            throw new CatalogDataException(s.problems(), s.problemCount());
        }
        return rows;
    }

}
