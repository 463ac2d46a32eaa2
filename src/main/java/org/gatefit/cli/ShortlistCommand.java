package org.gatefit.cli;

import java.io.Writer;
import java.util.concurrent.Callable;
import org.gatefit.catalog.Kind;
import org.gatefit.index.Catalog;
import org.gatefit.index.CatalogParts;
import org.gatefit.match.Margins;
import org.gatefit.match.OperatingPoint;
import org.gatefit.match.Shortlist;
import org.gatefit.match.SwitchPart;
import org.gatefit.report.MatchReports;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

@Command(name = "shortlist", mixinStandardHelpOptions = true,
        header = "Rank the catalog's gate drivers for one switch at an operating point.",
        description = {"Checks every driver of the catalog against the switch with every rule (drive current, gate"
            + " voltage, negative bias, UVLO, logic levels, polarity, high side, bootstrap, driver power, dv/dt,"
            + " lifecycle) and lists the best, best first: passing before warning, then by score, then by price."
            + " Drivers are skipped up front only when their topology or supply range makes them certain to fail."
            + " Defaults that were assumed are printed with the result."},
        footer = {"", "Example:", "  gatefit shortlist --switch NVS-4810N --freq 100 --bus 48 --side high --duty-max 0.9 --rg 4R7"})
public final class ShortlistCommand extends CatalogCommand implements Callable<Integer> {
    @Option(names = "--switch", required = true, paramLabel = "PART", description = "The switch to find drivers for.")
    String switchPn;

    @Option(names = "--top", paramLabel = "N", defaultValue = "10", description = "How many drivers to list (default: ${DEFAULT-VALUE}).")
    int top;

    @Option(names = "--all", description = "Also list failing drivers, with the reasons they fail.")
    boolean all;

    @Mixin
    OperatingPointOptions point;

    @Mixin
    MarginOptions margins;

    @Mixin
    OutputOptions output;

    ShortlistCommand(Context ctx) {
        super(ctx);
    }

    @Override
    public Integer call() throws Exception {
        if (top < 1) {
            throw new UsageException("--top: expected at least 1, got " + top);
        }
        OperatingPoint.Spec spec = point.spec();
        Margins m = margins.margins();
        try (Catalog c = Catalog.open(catalogDir())) {
            SwitchPart sw = SwitchPart.of(PairSupport.part(c, Kind.SWITCH, switchPn));
            OperatingPoint op = PairSupport.resolve(spec, sw);
            PairSupport.warnImplausible(ctx, spec, sw);
            Shortlist.Result r = Shortlist.run(new CatalogParts(c), sw, op, m, top, all,
                    Runtime.getRuntime().availableProcessors());
            try (Writer w = output.open(ctx)) {
                MatchReports.shortlist(r, output.format, output.colour(ctx), w);
            }
        }
        return ExitCode.OK;
    }

}
