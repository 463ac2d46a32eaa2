package org.gatefit.cli;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.List;
import org.gatefit.catalog.BadValueException;
import org.gatefit.catalog.Bom;
import org.gatefit.catalog.CatalogDataException;
import org.gatefit.catalog.Row;
import org.gatefit.index.Catalog;
import org.gatefit.index.CatalogParts;
import org.gatefit.match.Margins;
import org.gatefit.match.OperatingPoint;
import org.gatefit.match.StageCheck;
import picocli.CommandLine.Option;

/**
 * Whose turn-on edge the dv-dt rule judges for a bridge stage, as {@code check} judges it:
 * {@code --twin-edge} gives it; else the {@code --stages}/{@code --stage} row's bridge partner,
 * found and computed as check finds it ({@link StageCheck#partner}, with {@code --bom} for a sheet
 * of designators); else the pair itself. One place for {@code explain} and {@code shortlist}.
 */
final class PartnerOptions {
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

    /**
     * The twin for the operating point: the given edge, the stage row's partner, or null (the pair
     * stands in for its twin).
     */
    OperatingPoint.Twin twin(Context ctx, Catalog c, StageRowOptions.Selected saved, Margins m) throws IOException,
            CatalogDataException, UsageException, BadValueException {
        if (bom != null && saved == null) {
            throw new UsageException("--bom needs --stages and --stage (the BOM resolves the stage sheet's designators)");
        }
        if (twinEdge != null) {
            return twin(twinEdge);
        }
        return saved == null ? null : partnerEdge(ctx, c, saved, m);
    }

    /**
     * The turn-on edge of the --stage row's bridge partner, found and computed as {@code check} does
     * ({@link StageCheck#partner}); null (the pair stands in for its twin) when there is none, with a
     * warning when a partner may have been missed or its edge cannot be computed.
     */
    private OperatingPoint.Twin partnerEdge(Context ctx, Catalog c, StageRowOptions.Selected saved, Margins m)
            throws IOException, CatalogDataException, UsageException {
        Row self = saved.row();
        Bom b = null;
        if (bom != null) {
            if (!Files.isRegularFile(ctx.path(bom))) {
                throw new NoSuchFileException(bom.toString());
            }
            b = Bom.read(ctx.path(bom), bom.toString(), saved.options().forBom());
        }
        StageCheck.Partner p = StageCheck.partner(saved.rows(), self, b, new CatalogParts(c), m);
        if (p.partner() != null && p.twin() == null) {
            ctx.err.println("warning: --stage " + self.key() + ": the turn-on edge of its bridge partner " + p.partner()
                    + " cannot be estimated, so the dv-dt rule judges this pair's own edge (as check does)");
        } else if (p.partner() == null && !p.unresolved().isEmpty()) {
            List<String> u = p.unresolved();
            ctx.err.println("warning: --stage " + self.key() + ": " + u.size() + (u.size() == 1 ? " stage" : " stages")
                    + " of " + saved.file() + " could not be resolved as check resolves them (" + String.join(", ",
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
