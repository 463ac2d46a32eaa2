package org.gatefit.cli;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import org.gatefit.catalog.CatalogDataException;
import org.gatefit.catalog.Row;
import picocli.CommandLine.Option;

/**
 * A saved operating point: {@code --stages FILE --stage ID} takes the operating point of
 * {@code shortlist} and {@code explain} from one row of a stage sheet; the operating-point options
 * given on the command line override the row's cells. The sheet is read as {@code check} reads its
 * own: the same reading options ({@link SheetOptions}: --map, --map-file, --encoding, --header-row,
 * --sheet).
 */
final class StageRowOptions {
    @picocli.CommandLine.Mixin
    SheetOptions sheet;

    @Option(names = "--stages", paramLabel = "STAGES.csv",
            description = "Stage sheet to take the operating point from (with --stage).")
    Path stages;

    @Option(names = "--stage", paramLabel = "ID",
            description = "The stage-sheet row whose operating point to use; options given here override its cells.")
    String stage;

    /** The row named, or null when neither option is given. */
    Row row(Context ctx) throws IOException, CatalogDataException, UsageException, org.gatefit.catalog.BadValueException {
        if (stages == null && stage == null) {
            return null;
        }
        if (stage == null) {
            throw new UsageException("--stages " + stages + ": name the row to take the operating point from with"
                    + " --stage ID");
        }
        if (stages == null) {
            throw new UsageException("--stage " + stage + " needs --stages FILE, the stage sheet it is a row of");
        }
        return find(rows(ctx), stages.toString(), stage);
    }

    /** Every row of the --stages sheet, read with the reading options given. */
    List<Row> rows(Context ctx) throws IOException, CatalogDataException, UsageException,
            org.gatefit.catalog.BadValueException {
        return CheckCommand.readStages(ctx.path(stages), stages.toString(), sheet == null
                ? org.gatefit.catalog.SheetReader.Options.DEFAULT : sheet.options(ctx));
    }

    /** How a BOM given with the sheet is read: the sheet's encoding and notes (its headings are its own). */
    org.gatefit.catalog.SheetReader.Options bomOptions(Context ctx) throws IOException, UsageException,
            org.gatefit.catalog.BadValueException {
        org.gatefit.catalog.SheetReader.Options o = sheet == null
                ? new org.gatefit.catalog.SheetReader.Options(null, 0, null, null, ctx.err::println) : sheet.options(ctx);
        return new org.gatefit.catalog.SheetReader.Options(o.encoding(), 0, null, null, o.notes());
    }

    /** The row of {@code rows} whose stage id is {@code id} (case ignored), or a usage error listing the ids. */
    static Row find(List<Row> rows, String file, String id) throws UsageException {
        for (Row r : rows) {
            if (r.key() != null && r.key().equalsIgnoreCase(id.strip())) {
                return r;
            }
        }
        List<String> ids = rows.stream().map(Row::key).toList();
        throw new UsageException("--stage: no stage '" + id + "' in " + file + "; its stages: "
                + (ids.size() <= 20 ? String.join(", ", ids) : String.join(", ", ids.subList(0, 20)) + ", …"));
    }
}
