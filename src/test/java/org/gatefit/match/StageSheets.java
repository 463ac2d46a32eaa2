package org.gatefit.match;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.function.Function;
import org.gatefit.catalog.Bom;
import org.gatefit.catalog.CatalogDataException;
import org.gatefit.catalog.Kind;
import org.gatefit.catalog.Row;

/**
 * Builders for the design-check engines' tests ({@link StageCheck}, {@link DeadTimeCheck},
 * {@link PackageCheck}): catalog rows of the {@link Parts} test parts, in the catalog's units, stage
 * rows at {@link Parts#op()}'s baseline point, BOMs and lookups. Invented data, never a check value.
 */
final class StageSheets {
    private StageSheets() {
    }

    /** A catalog switch row holding the figures of {@code s} ({@link ListParts#switchRow}). */
    static Row switchRow(Parts.Sw s) {
        return ListParts.switchRow(s);
    }

    /** A catalog driver row holding the figures of {@code d} ({@link ListParts#driverRow}). */
    static Row driverRow(Parts.Dr d) {
        return ListParts.driverRow(d);
    }

    /**
     * A stage row at {@link Parts#op()}'s baseline (low side, 48 V, 100 kHz, 50 ns, +10 / 0 V,
     * LVCMOS 3.3 V, R_g 2 Ω, 10 nH, hot corner 125 °C, no twin), with {@code changes} as column, value pairs
     * in the sheet's units (a null value removes the column).
     */
    static Row stage(String id, long line, String driver, String sw, Object... changes) {
        Map<String, Object> v = new LinkedHashMap<>();
        v.put("stage", id);
        v.put("driver", driver);
        v.put("switch", sw);
        v.put("side", "low");
        v.put("bus_v", 48.0);
        v.put("f_sw_khz", 100.0);
        v.put("edge_ns", 50.0);
        v.put("v_drive_v", 10.0);
        v.put("v_drive_neg_v", 0.0);
        v.put("logic", "lvcmos-3v3");
        v.put("r_g_ohm", 2.0);
        v.put("loop_nh", 10.0);
        v.put("t_j_c", 125.0);
        v.put("bridge", "no");
        for (int i = 0; i < changes.length; i += 2) {
            v.put((String) changes[i], changes[i + 1]);
        }
        v.values().removeIf(java.util.Objects::isNull);
        return new Row(Kind.STAGE, id, "stages.csv", line, v, Map.of());
    }

    /** A catalog lookup by part number over {@code rows}, as the catalog matches it (case-insensitive). */
    static Function<String, Optional<Row>> lookup(List<Row> rows) {
        return pn -> rows.stream().filter(r -> Row.normaliseKey(r.key()).equals(Row.normaliseKey(pn))).findFirst();
    }

    /** A BOM read from {@code csv} (written to {@code dir}). */
    static Bom bom(Path dir, String csv) throws IOException, CatalogDataException {
        Path p = dir.resolve("bom.csv");
        Files.writeString(p, csv, StandardCharsets.UTF_8);
        return Bom.read(p, "bom.csv");
    }

    /** {@code check} over the stages with these catalog parts and the default margins. */
    static StageCheck.Report run(List<Row> stages, Bom bom, List<Row> drivers, List<Row> switches) {
        return StageCheck.run("stages.csv", stages, bom, lookup(drivers), lookup(switches), Margins.DEFAULT);
    }

    /** The parts as a catalog ({@link PartSource}, {@link ListParts}). */
    static PartSource parts(List<Row> drivers, List<Row> switches) {
        List<Row> all = new java.util.ArrayList<>(drivers);
        all.addAll(switches);
        return new ListParts(all);
    }

    /** The check of {@code rule} of a stage. */
    static Check check(StageCheck.StageResult r, Rule rule) {
        return r.checks().stream().filter(c -> c.rule() == rule).findFirst()
                .orElseThrow(() -> new AssertionError(r.stage() + " has no " + rule + " check: " + r.checks()));
    }

    /** The stage of a report by id. */
    static StageCheck.StageResult stageOf(StageCheck.Report rep, String id) {
        return rep.results().stream().filter(r -> r.stage().equals(id)).findFirst()
                .orElseThrow(() -> new AssertionError("no stage " + id));
    }
}
