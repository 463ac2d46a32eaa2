package org.gatefit.synth;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.StringWriter;
import java.util.ArrayList;
import java.nio.file.Path;
import java.time.Clock;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.gatefit.catalog.Kind;
import org.gatefit.catalog.Row;
import org.gatefit.catalog.SheetReader;
import org.gatefit.index.Catalog;
import org.gatefit.index.Importer;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class SyntheticCatalogTest {
    private static final int N = 2_000;

    @Test
    void sameSeedGivesTheSameBytesAndAPrefixIsTheSmallerCatalog() throws Exception {
        StringWriter a = new StringWriter();
        StringWriter b = new StringWriter();
        SyntheticCatalog.writeDrivers(a, 500);
        SyntheticCatalog.writeDrivers(b, 1000);
        assertTrue(b.toString().startsWith(a.toString()));
        StringWriter c = new StringWriter();
        SyntheticCatalog.writeDrivers(c, 500);
        assertEquals(a.toString(), c.toString());
    }

    @Test
    void switchesKeepDatasheetRelations() {
        Set<String> tech = new HashSet<>();
        for (long i = 0; i < N; i++) {
            Map<String, String> r = new HashMap<>();
            SyntheticCatalog.switchRow(i, r);
            tech.add(r.get("technology"));
            assertTrue(r.get("part_number").startsWith("TST-"));
            assertEquals("Testmaker", r.get("maker"));
            double qg = d(r, "q_g_nc");
            assertTrue(d(r, "q_gd_nc") + d(r, "q_gs_nc") < qg, r.toString());
            assertTrue(d(r, "v_th_min_v") < d(r, "v_th_max_v"), r.toString());
            assertTrue(d(r, "v_th_max_v") < d(r, "v_plateau_v"), r.toString());
            assertTrue(d(r, "v_plateau_v") < d(r, "v_gate_on_v"), r.toString());
            assertTrue(d(r, "v_gate_on_v") < d(r, "v_gs_max_v"), r.toString());
            assertTrue(d(r, "v_gate_off_v") > d(r, "v_gs_min_v"), r.toString());
        }
        assertEquals(Set.of("si-mosfet", "sic-mosfet", "gan-hemt", "igbt"), tech);
    }

    @Test
    void driversKeepDatasheetRelations() {
        Set<String> topo = new HashSet<>();
        for (long i = 0; i < N; i++) {
            Map<String, String> r = new HashMap<>();
            SyntheticCatalog.driverRow(i, r);
            topo.add(r.get("topology"));
            assertTrue(d(r, "uvlo_off_v") < d(r, "uvlo_on_v"), r.toString());
            assertTrue(d(r, "uvlo_on_v") < d(r, "v_supply_min_v"), r.toString());
            assertTrue(d(r, "v_supply_min_v") < d(r, "v_supply_max_v"), r.toString());
            assertTrue(d(r, "v_il_v") < d(r, "v_ih_v"), r.toString());
            assertTrue(d(r, "v_ih_v") < d(r, "v_in_max_v"), r.toString());
            assertTrue(d(r, "i_sink_a") >= d(r, "i_source_a"), r.toString());
        }
        assertEquals(Set.of("low-side", "high-side", "half-bridge", "isolated"), topo);
    }

    @Test
    void everyRowImportsWithoutAProblem(@TempDir Path tmp) throws Exception {
        Path sw = tmp.resolve("switches.csv");
        Path drv = tmp.resolve("drivers.csv");
        SyntheticCatalog.writeSwitches(sw, N);
        SyntheticCatalog.writeDrivers(drv, N);
        Path stages = tmp.resolve("stages.csv");
        SyntheticCatalog.writeStages(stages, 100, N, N);
        Importer.Result r = new Importer(tmp.resolve("catalog"), Clock.systemUTC()).run(List.of(sw, drv),
                List.of("switches.csv", "drivers.csv"), new Importer.Options(null, false, null), x -> { });
        assertEquals(2L * N, r.written());
        assertEquals(0, r.rejected());
        for (SheetReader.Summary s : r.files()) {
            assertTrue(s.clean() && !s.fatal() && s.rows() == N, s.toString());
        }
        // The stage sheet reads without a problem, and every part it names is in the catalog.
        List<Row> stageRows = new ArrayList<>();
        SheetReader.Summary s = SheetReader.read(stages, "stages.csv", Kind.STAGE, stageRows::add);
        assertTrue(s.clean() && !s.fatal(), s.problems().toString());
        assertEquals(100, stageRows.size());
        try (Catalog c = Catalog.open(tmp.resolve("catalog"))) {
            for (Row st : stageRows) {
                String driver = String.valueOf(st.values().get("driver"));
                String part = String.valueOf(st.values().get("switch"));
                assertTrue(c.get(Kind.DRIVER, driver).isPresent(), st.key() + ": driver " + driver);
                assertTrue(c.get(Kind.SWITCH, part).isPresent(), st.key() + ": switch " + part);
            }
        }
    }

    private static double d(Map<String, String> r, String c) {
        return Double.parseDouble(r.get(c));
    }
}
