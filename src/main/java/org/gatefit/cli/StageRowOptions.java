package org.gatefit.cli;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import org.gatefit.catalog.BadValueException;
import org.gatefit.catalog.CatalogDataException;
import org.gatefit.catalog.Row;
import org.gatefit.catalog.SheetReader;
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

    /**
     * The --stages sheet as read (once, with the reading options given) and the row --stage names.
     *
     * @param file    the sheet as typed, for messages
     * @param rows    every row of it
     * @param row     the row named
     * @param options how it was read ({@link SheetReader.Options#forBom} for a BOM beside it)
     */
    record Selected(String file, List<Row> rows, Row row, SheetReader.Options options) {
    }

    /** The sheet and the row named, or null when neither option is given. */
    Selected select(Context ctx) throws IOException, CatalogDataException, UsageException, BadValueException {
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
        SheetReader.Options options = sheet == null ? SheetReader.Options.DEFAULT : sheet.options(ctx);
        List<Row> rows = CheckCommand.readStages(ctx.path(stages), stages.toString(), options);
        return new Selected(stages.toString(), rows, find(rows, stages.toString(), stage), options);
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
