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

    /** A catalog switch row holding the figures of {@code s} (NaN left out, as the importer leaves it out). */
    static Row switchRow(Parts.Sw s) {
        Map<String, Object> v = new LinkedHashMap<>();
        v.put("part_number", s.pn);
        v.put("maker", "Testmaker");
        v.put("package", "PKG");
        v.put("pinout", "PKG");
        v.put("lifecycle", s.lifecycle);
        v.put("stock", s.stock);
        v.put("unit_price", s.price);
        v.put("technology", s.tech.id());
        v.put("channel", s.nChannel ? "n" : "p");
        num(v, "v_block_v", s.vBlock, 1);
        num(v, "i_cont_a", s.iCont, 1);
        num(v, "r_on_mohm", s.rOn, 1e3);
        num(v, "r_on_vgs_v", s.rOnVgs, 1);
        num(v, "v_ce_sat_v", s.vCeSat, 1);
        num(v, "v_th_min_v", s.vThMin, 1);
        num(v, "v_th_max_v", s.vThMax, 1);
        num(v, "v_gs_max_v", s.vGsMax, 1);
        num(v, "v_gs_min_v", s.vGsMin, 1);
        num(v, "v_gate_on_v", s.vGateOn, 1);
        num(v, "v_gate_off_v", s.vGateOff, 1);
        num(v, "q_g_nc", s.qG, 1e9);
        num(v, "q_g_vgs_v", s.qGVgs, 1);
        num(v, "q_gs_nc", s.qGs, 1e9);
        num(v, "q_gd_nc", s.qGd, 1e9);
        num(v, "v_plateau_v", s.vPlateau, 1);
        num(v, "c_iss_pf", s.cIss, 1e12);
        num(v, "c_rss_pf", s.cRss, 1e12);
        num(v, "r_g_int_ohm", s.rGInt, 1);
        num(v, "v_gate_on_max_v", s.vGateOnMax, 1);
        num(v, "v_gate_off_min_v", s.vGateOffMin, 1);
        num(v, "t_sc_us", s.tSc, 1e6);
        num(v, "t_d_off_ns", s.tDOff, 1e9);
        num(v, "t_f_ns", s.tF, 1e9);
        return new Row(Kind.SWITCH, s.pn, "switches.csv", 2, v, Map.of());
    }

    /** A catalog driver row holding the figures of {@code d}. */
    static Row driverRow(Parts.Dr d) {
        Map<String, Object> v = new LinkedHashMap<>();
        v.put("part_number", d.pn);
        v.put("maker", "Testmaker");
        v.put("package", "PKG");
        v.put("pinout", "PKG");
        v.put("lifecycle", d.lifecycle);
        v.put("stock", d.stock);
        v.put("unit_price", d.price);
        v.put("topology", d.topology.id());
        if (d.channels > 0) {
            v.put("channels", (long) d.channels);
        }
        v.put("input_polarity", String.join(";", d.inverting.stream().map(i -> i ? "inverting" : "non-inverting").toList()));
        num(v, "i_source_a", d.iSource, 1);
        num(v, "i_sink_a", d.iSink, 1);
        num(v, "r_source_ohm", d.rSource, 1);
        num(v, "r_sink_ohm", d.rSink, 1);
        num(v, "v_supply_min_v", d.vSupplyMin, 1);
        num(v, "v_supply_max_v", d.vSupplyMax, 1);
        num(v, "uvlo_on_v", d.uvloOn, 1);
        num(v, "uvlo_off_v", d.uvloOff, 1);
        num(v, "v_ih_v", d.vIh, 1);
        num(v, "v_il_v", d.vIl, 1);
        num(v, "v_in_max_v", d.vInMax, 1);
        num(v, "v_offset_max_v", d.vOffsetMax, 1);
        yesNo(v, "bootstrap_diode", d.bootstrapDiode);
        num(v, "i_qbs_ua", d.iQbs, 1e6);
        num(v, "v_neg_min_v", d.vNegMin, 1);
        num(v, "t_prop_ns", d.tProp, 1e9);
        num(v, "t_match_ns", d.tMatch, 1e9);
        yesNo(v, "miller_clamp", d.millerClamp);
        num(v, "isolation_vrms", d.isolationVrms, 1);
        num(v, "p_max_w", d.pMax, 1);
        num(v, "t_prop_max_ns", d.tPropMax, 1e9);
        return new Row(Kind.DRIVER, d.pn, "drivers.csv", 2, v, Map.of());
    }

    private static void num(Map<String, Object> v, String column, double si, double toUnit) {
        if (!Double.isNaN(si)) {
            v.put(column, si * toUnit);
        }
    }

    private static void yesNo(Map<String, Object> v, String column, Boolean b) {
        if (b != null) {
            v.put(column, b ? "yes" : "no");
        }
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

    /** The parts as a catalog ({@link PartSource}) that looks parts up by part number, nothing more. */
    static PartSource parts(List<Row> drivers, List<Row> switches) {
        return new PartSource() {
            @Override
            public Optional<Row> get(Kind kind, String partNumber) {
                return lookup(kind == Kind.DRIVER ? drivers : switches).apply(partNumber);
            }

            @Override
            public int count(Kind kind) {
                return (kind == Kind.DRIVER ? drivers : switches).size();
            }

            @Override
            public boolean isEmpty() {
                return drivers.isEmpty() && switches.isEmpty();
            }

            @Override
            public String describe() {
                return "test parts";
            }

            @Override
            public long scan(Kind kind, Prefilter skip, java.util.function.Consumer<Row> sink) {
                throw new UnsupportedOperationException("not needed by check");
            }

            @Override
            public <S extends java.util.function.Consumer<org.gatefit.catalog.RowCursor>> List<S> scanColumns(Kind kind,
                    Prefilter skip, int threads, java.util.function.Supplier<S> sinks) {
                throw new UnsupportedOperationException("not needed by check");
            }
        };
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
