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
import org.gatefit.index.CatalogParts;
import org.gatefit.index.Catalog;
import org.gatefit.match.DriverPart;
import org.gatefit.match.GateNetwork;
import org.gatefit.match.OperatingPoint;
import org.gatefit.match.Rules;
import org.gatefit.match.PairResult;
import org.gatefit.match.StageCheck;
import org.gatefit.match.SwitchPart;
import org.gatefit.match.Verdict;
import org.gatefit.report.CompareReports;
import org.gatefit.report.Format;
import org.gatefit.report.GateDrive;
import org.gatefit.report.MatchReports;
import org.gatefit.report.Rendering;
import org.gatefit.report.ReportHeader;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

@Command(name = "explain", mixinStandardHelpOptions = true,
        header = "Show the full calculation sheet of one driver–switch pair.",
        description = {"Every rule with the figures and limits it compared and what would fix it; every computed"
            + " figure with its unit and formula; the recommended gate-resistor range and E24 value, the bootstrap"
            + " capacitor for a high side, driver losses and switching-time estimates; the gate-drive network (supply"
            + " capacitors, gate resistors and their packages, turn-off diode, pull-down, clamps, bootstrap parts), each"
            + " with its rating and why. --format spice writes the gate loop as a SPICE netlist. Exit 1 when the pair"
            + " fails.",
            "",
            "With --driver given two to four times, the drivers are compared with the switch side by side (checks and"
            + " figures in columns, in HTML the gate waveforms overlaid); exit 1 when any of the pairs fails."})
final class ExplainCommand extends CatalogCommand implements Callable<Integer> {
    /** How many drivers one report compares side by side. */
    static final int MAX_COMPARED = 4;

    @Option(names = "--driver", required = true, paramLabel = "PART",
            description = "The gate driver; give it up to four times to compare drivers side by side.")
    List<String> driverPns;

    @Option(names = "--switch", required = true, paramLabel = "PART", description = "The switch.")
    String switchPn;

    @Mixin
    OperatingPointOptions point;

    @Mixin
    StageRowOptions saved;

    @Option(names = "--bom", paramLabel = "BOM.csv",
            description = "BOM to resolve the designators of the --stages sheet, as check --bom does, so that the"
                    + " stage's bridge partner is found among stages named by designator.")
    Path bom;

    @Option(names = "--twin-edge", paramLabel = "NAME=COLD,HOT",
            description = "The turn-on edge of the other switch of the bridge, which the dv-dt rule judges instead of"
                    + " this pair's own: its name and the switch-node dv/dt it makes at 25 °C and at the hot corner,"
                    + " V/ns (e.g. LOW=28.5,26.9; check's JSON gives them as operating_point.twin). Default: the"
                    + " --stage row's bridge partner as check finds it, else this pair itself.")
    String twinEdge;

    @Mixin
    MarginOptions margins;

    @Mixin
    OutputOptions output;

    ExplainCommand(Context ctx) {
        super(ctx);
    }

    @Override
    public Integer call() throws Exception {
        if (driverPns.size() > MAX_COMPARED) {
            throw new UsageException("--driver: at most " + MAX_COMPARED + " drivers compared at once, got "
                    + driverPns.size());
        }
        if (output.format == Format.SPICE && driverPns.size() > 1) {
            throw new UsageException("--format spice: one --driver (a deck models one gate loop), got " + driverPns.size());
        }
        Row row = saved.row(ctx);
        if (bom != null && row == null) {
            throw new UsageException("--bom needs --stages and --stage (the BOM resolves the stage sheet's designators)");
        }
        OperatingPoint.Spec spec = point.spec(row);
        OperatingPoint.Twin given = twinEdge == null ? null : twin(twinEdge);
        List<PairResult> rs = new ArrayList<>();
        List<GateDrive> drives = new ArrayList<>();
        List<GateNetwork> networks = new ArrayList<>();
        ReportHeader header;
        try (Catalog c = openCatalog()) {
            SwitchPart sw = SwitchPart.of(PairSupport.part(c, Kind.SWITCH, switchPn));
            List<DriverPart> drs = new ArrayList<>();
            for (String pn : driverPns) {
                DriverPart dr = DriverPart.of(PairSupport.part(c, Kind.DRIVER, pn));
                if (drs.stream().anyMatch(d -> d.partNumber().equalsIgnoreCase(dr.partNumber()))) {
                    throw new UsageException("--driver " + pn + " is named twice");
                }
                drs.add(dr);
            }
            if (given != null) {
                spec.twin = given;
            } else if (row != null) {
                spec.twin = partnerEdge(c, row);
            }
            OperatingPoint op = PairSupport.resolve(spec, sw);
            PairSupport.warnImplausible(ctx, spec, sw);
            for (DriverPart dr : drs) {
                PairResult r = Rules.evaluate(dr, sw, op, margins.margins());
                rs.add(r);
                drives.add(GateDrive.of(sw, r));
                networks.add(GateNetwork.of(dr, sw, r));
            }
            header = header("explain", c, input(ReportHeader.Role.STAGES, saved.stages), input(ReportHeader.Role.BOM, bom));
        }
        Rendering how = output.rendering(ctx, header);
        try (Writer w = output.open(ctx)) {
            if (rs.size() == 1) {
                try {
                    MatchReports.explain(rs.get(0), drives.get(0), networks.get(0), how, w);
                } catch (IllegalArgumentException e) {
                    if (how.format() != Format.SPICE) {
                        throw e;
                    }
                    // a deck needs C_iss, Q_gd, V_pl: nothing written, a file kept as it was (never finished)
                    throw new UsageException(e.getMessage());
                }
            } else {
                CompareReports.render(rs, drives, how, w);
            }
            OutputFile.finish(w);
        }
        return rs.stream().anyMatch(r -> r.verdict() == Verdict.FAIL) ? ExitCode.FAILED : ExitCode.OK;
    }

    /**
     * The turn-on edge of the --stage row's bridge partner, found and computed as {@code check} does
     * ({@link StageCheck#partner}); null (the pair stands in for its twin) when there is none, with a
     * warning when a partner may have been missed or its edge cannot be computed.
     */
    private OperatingPoint.Twin partnerEdge(Catalog c, Row row) throws IOException, CatalogDataException,
            UsageException {
        List<Row> rows = CheckCommand.readStages(ctx.path(saved.stages), saved.stages.toString());
        Row self = rows.stream().filter(r -> r.line() == row.line()).findFirst().orElseThrow();
        Bom b = null;
        if (bom != null) {
            if (!Files.isRegularFile(ctx.path(bom))) {
                throw new NoSuchFileException(bom.toString());
            }
            b = Bom.read(ctx.path(bom), bom.toString(), new SheetReader.Options(null, 0, null, null, ctx.err::println));
        }
        StageCheck.Partner p = StageCheck.partner(rows, self, b, new CatalogParts(c), margins.margins());
        if (p.partner() != null && p.twin() == null) {
            ctx.err.println("warning: --stage " + self.key() + ": the turn-on edge of its bridge partner " + p.partner()
                    + " cannot be estimated, so the dv-dt rule judges this pair's own edge (as check does)");
        } else if (p.partner() == null && !p.unresolved().isEmpty()) {
            List<String> u = p.unresolved();
            ctx.err.println("warning: --stage " + self.key() + ": " + u.size() + (u.size() == 1 ? " stage" : " stages")
                    + " of " + saved.stages + " could not be resolved as check resolves them (" + String.join(", ",
                    u.size() <= 5 ? u : u.subList(0, 5)) + (u.size() > 5 ? ", …" : "") + (bom == null ? "; give --bom for"
                    + " designators" : "") + "), so a bridge partner among them is not known: the dv-dt rule judges"
                    + " this pair's own turn-on edge");
        }
        return p.twin();
    }

    /** {@code --twin-edge NAME=COLD,HOT} (V/ns) as a twin, or a bad value naming the option. */
    static OperatingPoint.Twin twin(String typed) throws BadValueException {
        int eq = typed.lastIndexOf('=');
        String[] v = eq < 0 ? new String[0] : typed.substring(eq + 1).split(",", -1);
        String bad = "--twin-edge: '" + typed + "' is not NAME=COLD,HOT (the other switch's name and its switch-node"
                + " dv/dt at 25 °C and at the hot corner, V/ns, both above 0; e.g. LOW=28.5,26.9)";
        if (eq <= 0 || typed.substring(0, eq).isBlank() || v.length != 2) {
            throw new BadValueException(bad);
        }
        try {
            double cold = Double.parseDouble(v[0].strip());
            double hot = Double.parseDouble(v[1].strip());
            if (!(cold > 0) || !(hot > 0) || Double.isInfinite(cold) || Double.isInfinite(hot)) {
                throw new BadValueException(bad);
            }
            return new OperatingPoint.Twin(typed.substring(0, eq).strip(), cold * 1e9, hot * 1e9);
        } catch (NumberFormatException e) {
            throw new BadValueException(bad);
        }
    }
}
