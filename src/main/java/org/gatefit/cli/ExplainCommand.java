package org.gatefit.cli;

import java.io.Writer;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import org.gatefit.catalog.Kind;
import org.gatefit.index.Catalog;
import org.gatefit.match.DriverPart;
import org.gatefit.match.GateNetwork;
import org.gatefit.match.OperatingPoint;
import org.gatefit.match.Rules;
import org.gatefit.match.PairResult;
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

    @Mixin
    PartnerOptions partner;

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
        StageRowOptions.Selected row = saved.select(ctx);
        OperatingPoint.Spec spec = point.spec(row == null ? null : row.row());
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
            spec.twin = partner.twin(ctx, c, row, margins.margins());
            OperatingPoint op = PairSupport.resolve(spec, sw);
            PairSupport.warnImplausible(ctx, spec, sw);
            for (DriverPart dr : drs) {
                PairResult r = Rules.evaluate(dr, sw, op, margins.margins());
                rs.add(r);
                drives.add(GateDrive.of(sw, r));
                networks.add(GateNetwork.of(dr, sw, r));
            }
            header = header("explain", c, input(ReportHeader.Role.STAGES, saved.stages), input(ReportHeader.Role.BOM, partner.bom));
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

}
