package org.gatefit.cli;

import java.io.Writer;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.gatefit.catalog.Kind;
import org.gatefit.catalog.Op;
import org.gatefit.index.Catalog;
import org.gatefit.index.CatalogParts;
import org.gatefit.match.Margins;
import org.gatefit.match.OperatingPoint;
import org.gatefit.match.Prefilter;
import org.gatefit.match.Topology;
import org.gatefit.match.Shortlist;
import org.gatefit.match.SwitchPart;
import org.gatefit.report.MatchReports;
import org.gatefit.report.Rendering;
import org.gatefit.report.ReportHeader;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;

@Command(name = "shortlist", mixinStandardHelpOptions = true,
        header = "Rank the catalog's gate drivers for one switch at an operating point.",
        description = {"Checks every driver of the catalog against the switch with every rule (drive current, gate"
            + " voltage, negative bias, UVLO, logic levels, polarity, high side, bootstrap, driver power, dv/dt,"
            + " lifecycle) and lists the best, best first: passing before warning, then by score (a high side that"
            + " needs an isolated supply costs ×0.9), then by price. A check unknown only for a value not given"
            + " (--duty-max, --bus) shows unknown but does not lower the rank; it is named once above the table."
            + " Drivers are skipped up front only when their topology or supply range makes them certain to fail."
            + " Defaults that were assumed are printed with the result. --topology, --in-stock, --max-price and"
            + " --maker narrow the drivers considered and are printed as what was asked; the switch's own lifecycle"
            + " and stock are said once above the table."},
        footer = {"", "Example:", "  gatefit shortlist --switch NVS-4810N --freq 100 --bus 48 --side high --duty-max 0.9 --rg 4R7"})
public final class ShortlistCommand extends CatalogCommand implements Callable<Integer> {
    @Option(names = "--switch", required = true, paramLabel = "PART", description = "The switch to find drivers for.")
    String switchPn;

    @Option(names = "--top", paramLabel = "N", defaultValue = "10", description = "How many drivers to list (default: ${DEFAULT-VALUE}).")
    int top;

    @Option(names = "--all", description = "Also list failing drivers, with the reasons they fail.")
    boolean all;

    @Option(names = "--topology", paramLabel = "TOPOLOGY",
            description = "Only drivers of this topology: low-side, high-side, half-bridge or isolated.")
    String topology;

    @Option(names = "--in-stock", description = "Only drivers with stock above 0 (unknown stock is left out).")
    boolean inStock;

    @Option(names = "--max-price", paramLabel = "PRICE",
            description = "Only drivers at or below this unit price (unknown price is left out).")
    String maxPrice;

    @Option(names = "--maker", paramLabel = "MAKER", description = "Only drivers of this maker (case does not matter).")
    String maker;

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

    ShortlistCommand(Context ctx) {
        super(ctx);
    }

    @Override
    public Integer call() throws Exception {
        if (top < 1) {
            throw new UsageException("--top: expected at least 1, got " + top);
        }
        StageRowOptions.Selected row = saved.select(ctx);
        OperatingPoint.Spec spec = point.spec(row == null ? null : row.row());
        Margins m = margins.margins();
        List<Prefilter.Condition> asked = filters();
        try (Catalog c = openCatalog()) {
            SwitchPart sw = SwitchPart.of(PairSupport.part(c, Kind.SWITCH, switchPn));
            // The other half of a bridge is fixed whichever driver is chosen here: its edge is judged as check judges it.
            spec.twin = partner.twin(ctx, c, row, m);
            OperatingPoint op = PairSupport.resolve(spec, sw);
            PairSupport.warnImplausible(ctx, spec, sw);
            Shortlist.Result r = Shortlist.run(new CatalogParts(c), sw, op, m, top, all,
                    Runtime.getRuntime().availableProcessors(), asked);
            Rendering how = output.rendering(ctx, header("shortlist", c, input(ReportHeader.Role.STAGES, saved.stages),
                    input(ReportHeader.Role.BOM, partner.bom)));
            try (Writer w = output.open(ctx)) {
                MatchReports.shortlist(r, how, w);
                OutputFile.finish(w);
            }
        }
        return ExitCode.OK;
    }

    /** The filters asked for, as catalog conditions. */
    private List<Prefilter.Condition> filters() throws UsageException {
        List<Prefilter.Condition> out = new ArrayList<>();
        if (topology != null) {
            String t = topology.strip().toLowerCase(Locale.ROOT);
            if (Arrays.stream(Topology.values()).noneMatch(x -> x.id().equals(t))) {
                throw new UsageException("--topology: expected one of " + String.join(", ",
                        Arrays.stream(Topology.values()).map(Topology::id).toList()) + ", got '" + topology + "'");
            }
            out.add(Prefilter.Condition.is("topology", Op.EQ, t));
        }
        if (inStock) {
            out.add(Prefilter.Condition.of("stock", Op.GT, 0));
        }
        if (maxPrice != null) {
            double p;
            try {
                p = Double.parseDouble(maxPrice.strip());
            } catch (NumberFormatException e) {
                p = Double.NaN;
            }
            if (!(p >= 0) || Double.isInfinite(p)) {
                throw new UsageException("--max-price: expected a price of 0 or more in the catalog's currency"
                        + " (a plain number with a decimal point, e.g. 2.5), got '" + maxPrice + "'");
            }
            out.add(Prefilter.Condition.of("unit_price", Op.LE, p));
        }
        if (maker != null) {
            if (maker.isBlank()) {
                throw new UsageException("--maker: expected a maker's name, got an empty one");
            }
            out.add(Prefilter.Condition.is("maker", Op.EQ, maker.strip()));
        }
        return out;
    }
}
