package org.gatefit.cli;

import java.io.Writer;
import java.util.concurrent.Callable;
import org.gatefit.catalog.Kind;
import org.gatefit.index.Catalog;
import org.gatefit.match.DriverPart;
import org.gatefit.match.OperatingPoint;
import org.gatefit.match.Rules;
import org.gatefit.match.PairResult;
import org.gatefit.match.SwitchPart;
import org.gatefit.match.Verdict;
import org.gatefit.report.GateDrive;
import org.gatefit.report.MatchReports;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

@Command(name = "explain", mixinStandardHelpOptions = true,
        header = "Show the full calculation sheet of one driver–switch pair.",
        description = {"Every rule with the figures and limits it compared and what would fix it; every computed"
            + " figure with its unit and formula; the recommended gate-resistor range and E24 value, the bootstrap"
            + " capacitor for a high side, driver losses and switching-time estimates. Exit 1 when the pair fails."})
final class ExplainCommand extends CatalogCommand implements Callable<Integer> {
    @Option(names = "--driver", required = true, paramLabel = "PART", description = "The gate driver.")
    String driverPn;

    @Option(names = "--switch", required = true, paramLabel = "PART", description = "The switch.")
    String switchPn;

    @Mixin
    OperatingPointOptions point;

    @Mixin
    StageRowOptions saved;

    @Mixin
    MarginOptions margins;

    @Mixin
    OutputOptions output;

    ExplainCommand(Context ctx) {
        super(ctx);
    }

    @Override
    public Integer call() throws Exception {
        OperatingPoint.Spec spec = point.spec(saved.row(ctx));
        PairResult r;
        GateDrive drive;
        try (Catalog c = Catalog.open(catalogDir())) {
            SwitchPart sw = SwitchPart.of(PairSupport.part(c, Kind.SWITCH, switchPn));
            DriverPart dr = DriverPart.of(PairSupport.part(c, Kind.DRIVER, driverPn));
            OperatingPoint op = PairSupport.resolve(spec, sw);
            PairSupport.warnImplausible(ctx, spec, sw);
            r = Rules.evaluate(dr, sw, op, margins.margins());
            drive = GateDrive.of(sw, r);
        }
        try (Writer w = output.open(ctx)) {
            MatchReports.explain(r, drive, output.format, output.colour(ctx), w);
        }
        return r.verdict() == Verdict.FAIL ? ExitCode.FAILED : ExitCode.OK;
    }
}
