package org.gatefit.match;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.gatefit.catalog.Kind;
import org.gatefit.catalog.Row;
import org.gatefit.catalog.RowCursor;
import org.junit.jupiter.api.Test;

/**
 * {@link DriverPart} read from a catalog row: each column in its catalog unit becomes SI. The
 * factors are the SI prefixes (SI Brochure, 9th ed., table 7: µ = 10⁻⁶, m = 10⁻³, n = 10⁻⁹,
 * k = 10³) and 1 kV/µs = 10³ V / 10⁻⁶ s = 10⁹ V/s; the choice columns as DESIGN.md words them.
 */
class DriverPartTest {
    private static final double TOL = 1e-12; // relative: the conversions are one multiplication

    private static Row row(Map<String, Object> changes) {
        Map<String, Object> v = new LinkedHashMap<>();
        v.put("part_number", "TST-DP1");
        v.put("maker", "Testmaker");
        v.put("package", "TSTPAK-8");
        v.put("pinout", "TP8");
        v.put("lifecycle", "nrnd");
        v.put("stock", 250L);
        v.put("unit_price", 1.25);
        v.put("topology", "isolated");
        v.put("channels", 2L);
        v.put("input_polarity", "non-inverting;inverting");
        v.put("i_source_a", 4.0);
        v.put("i_sink_a", 6.0);
        v.put("r_source_ohm", 2.5);
        v.put("r_sink_ohm", 1.5);
        v.put("v_supply_min_v", 13.0);
        v.put("v_supply_max_v", 30.0);
        v.put("uvlo_on_v", 12.0);
        v.put("uvlo_off_v", 11.0);
        v.put("v_ih_v", 2.0);
        v.put("v_il_v", 0.8);
        v.put("v_in_max_v", 5.5);
        v.put("v_offset_max_v", 1200.0);
        v.put("bootstrap_diode", "no");
        v.put("i_qbs_ua", 50.0);
        v.put("v_neg_min_v", -8.0);
        v.put("t_prop_ns", 70.0);
        v.put("t_match_ns", 5.0);
        v.put("miller_clamp", "yes");
        v.put("isolation_vrms", 5000.0);
        v.put("p_max_w", 0.8);
        v.put("v_iorm_v", 1500.0);
        v.put("cmti_kv_us", 150.0);
        v.put("uvlo_monitors", "total-supply");
        v.put("i_q_out_ma", 2.0);
        v.put("q_ls_nc", 3.0);
        v.put("desat", "yes");
        v.put("t_desat_ns", 200.0);
        v.put("soft_off", "no");
        v.put("boot_clamp_v", 15.0);
        v.put("t_prop_max_ns", 90.0);
        v.putAll(changes);
        v.values().removeIf(java.util.Objects::isNull);
        return new Row(Kind.DRIVER, (String) v.getOrDefault("part_number", "TST-DP1"), "test", 2, v, Map.of());
    }

    private static void near(double expected, double actual, String what) {
        assertEquals(expected, actual, Math.abs(expected) * TOL, what);
    }

    @Test
    void everyColumnIsReadInSiUnits() {
        DriverPart d = DriverPart.of(row(Map.of()));
        assertEquals("TST-DP1", d.partNumber());
        assertEquals("Testmaker", d.maker());
        assertEquals("TP8", d.pinout());
        assertEquals("TSTPAK-8", d.packageName());
        assertEquals(Topology.ISOLATED, d.topology());
        assertEquals(2, d.channels());
        assertEquals(List.of(false, true), d.inverting());
        near(4.0, d.iSource(), "A stays A");
        near(6.0, d.iSink(), "i_sink");
        near(2.5, d.rSource(), "r_source");
        near(1.5, d.rSink(), "r_sink");
        near(13.0, d.vSupplyMin(), "supply min");
        near(30.0, d.vSupplyMax(), "supply max");
        near(12.0, d.uvloOn(), "uvlo on");
        near(11.0, d.uvloOff(), "uvlo off");
        near(2.0, d.vIh(), "v_ih");
        near(0.8, d.vIl(), "v_il");
        near(5.5, d.vInMax(), "v_in_max");
        near(1200.0, d.vOffsetMax(), "offset");
        assertEquals(Boolean.FALSE, d.bootstrapDiode());
        near(50e-6, d.iQbs(), "50 µA = 50·10⁻⁶ A");
        near(-8.0, d.vNegMin(), "negative rail");
        near(70e-9, d.tProp(), "70 ns = 70·10⁻⁹ s");
        near(5e-9, d.tMatch(), "5 ns");
        assertEquals(Boolean.TRUE, d.millerClamp());
        near(5000.0, d.isolationVrms(), "isolation");
        near(0.8, d.pMax(), "p_max");
        assertEquals(Lifecycle.NRND, d.lifecycle());
        assertEquals(250L, d.stock());
        near(1.25, d.price(), "price");
        DriverRatings r = d.ratings();
        near(1500.0, r.vIorm(), "v_iorm");
        near(150e9, r.cmti(), "150 kV/µs = 150·10⁹ V/s");
        assertEquals(Boolean.TRUE, r.uvloTotal());
        near(2e-3, r.iQOut(), "2 mA = 2·10⁻³ A");
        near(3e-9, r.qLs(), "3 nC = 3·10⁻⁹ C");
        assertEquals(Boolean.TRUE, r.desat());
        near(200e-9, r.tDesat(), "200 ns");
        assertEquals(Boolean.FALSE, r.softOff());
        near(15.0, r.bootClamp(), "boot clamp");
        near(90e-9, r.tPropMax(), "90 ns");
    }

    @Test
    void emptyCellsStayUnknown() {
        Map<String, Object> none = new LinkedHashMap<>();
        for (String c : List.of("maker", "package", "pinout", "lifecycle", "stock", "unit_price", "channels",
                "bootstrap_diode", "miller_clamp", "uvlo_monitors", "desat", "soft_off", "i_qbs_ua", "t_prop_ns",
                "cmti_kv_us", "r_source_ohm")) {
            none.put(c, null);
        }
        DriverPart d = DriverPart.of(row(none));
        assertNull(d.maker());
        assertNull(d.pinout());
        assertEquals(0, d.channels(), "unknown channel count reads 0");
        assertEquals(-1L, d.stock(), "unknown stock is −1 (the record's documented mark)");
        assertTrue(Double.isNaN(d.price()));
        assertEquals(Lifecycle.UNKNOWN, d.lifecycle());
        assertNull(d.bootstrapDiode());
        assertNull(d.millerClamp());
        assertNull(d.ratings().uvloTotal());
        assertNull(d.ratings().desat());
        assertNull(d.ratings().softOff());
        assertTrue(Double.isNaN(d.iQbs()));
        assertTrue(Double.isNaN(d.tProp()));
        assertTrue(Double.isNaN(d.ratings().cmti()));
        assertTrue(Double.isNaN(d.rSource()));
        // positive-rail is the other documented uvlo_monitors value
        assertEquals(Boolean.FALSE, DriverPart.of(row(Map.of("uvlo_monitors", "positive-rail"))).ratings().uvloTotal());
        assertEquals(0L, DriverPart.of(row(Map.of("stock", 0L))).stock(), "0 in stock is known, not −1");
    }

    @Test
    void polaritiesAreReadPerChannel() {
        assertEquals(List.of(true), DriverPart.of(row(Map.of("input_polarity", "inverting"))).inverting());
        assertEquals(List.of(false, false, true),
                DriverPart.of(row(Map.of("input_polarity", "non-inverting; non-inverting ;inverting"))).inverting());
        assertTrue(DriverPart.offers("non-inverting;inverting", true));
        assertTrue(DriverPart.offers("non-inverting;inverting", false));
        assertFalse(DriverPart.offers("non-inverting", true));
        assertFalse(DriverPart.offers("inverting", false));
        DriverPart one = DriverPart.of(row(Map.of("input_polarity", "inverting")));
        assertTrue(one.offers(true));
        assertFalse(one.offers(false));
    }

    @Test
    void aPolarityListIsReadTheSameFirstTimeAndAfter() {
        // A text no other test reads (the decoded lists are kept once per distinct text), read twice:
        // the first reading decodes it, the second finds it kept.
        String fresh = "inverting;" + " ".repeat(1 + (int) (System.nanoTime() % 500)) + "non-inverting";
        DriverPart first = DriverPart.of(row(Map.of("input_polarity", fresh)));
        DriverPart again = DriverPart.of(row(Map.of("input_polarity", fresh)));
        assertEquals(List.of(true, false), first.inverting());
        assertEquals(List.of(true, false), again.inverting());
        assertTrue(DriverPart.offers(fresh + ";inverting", false));
    }

    @Test
    void aCursorWithoutAPartNumberGivesNoDriver() {
        Map<String, Object> v = new LinkedHashMap<>();
        v.put("part_number", null);
        Row r = row(v);
        RowCursor plain = RowCursor.of(r);
        assertNull(DriverPart.of(plain));
        // with a part number the cursor reads the same driver as the row
        Row full = row(Map.of());
        assertEquals(DriverPart.of(full), DriverPart.of(RowCursor.of(full)));
    }

    @Test
    void aRowOfAnotherKindIsRefused() {
        Row sw = new Row(Kind.SWITCH, "TST-S", "test", 2, Map.of("part_number", "TST-S"), Map.of());
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> DriverPart.of(sw));
        assertTrue(e.getMessage().contains("expected a driver row"), e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> DriverPart.of(RowCursor.of(sw)));
    }

    @Test
    void theRecordRefusesAMissingPolarity() {
        Parts.Dr d = Parts.dr();
        d.inverting = List.of();
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, d::build);
        assertTrue(e.getMessage().contains("TST-D1"), e.getMessage());
    }

    @Test
    void theTestBuildersRowReadsBackAsTheBuildersDriver() {
        // ListParts.driverRow writes a Parts.Dr in catalog units; read back it is the same driver.
        Parts.Dr d = Parts.dr();
        d.cmti = 100e9;
        d.iQOut = 1e-3;
        DriverPart want = d.build();
        DriverPart got = DriverPart.of(ListParts.driverRow(d));
        assertEquals(want.partNumber(), got.partNumber());
        near(want.iQbs(), got.iQbs(), "iQbs");
        near(want.tProp(), got.tProp(), "tProp");
        near(want.ratings().cmti(), got.ratings().cmti(), "cmti");
        near(want.ratings().iQOut(), got.ratings().iQOut(), "iQOut");
        assertEquals(want.topology(), got.topology());
        assertEquals(want.inverting(), got.inverting());
    }

    @Test
    void aSwitchRowsStockIsReadAndAMissingOneIsUnknown() {
        // The catalog's stock column (catalog-schema: an integer count; absent = unknown, -1 in SwitchPart).
        Parts.Sw sw = Parts.sw();
        sw.stock = 7;
        assertEquals(7, SwitchPart.of(ListParts.switchRow(sw)).stock());
        sw.stock = -1;
        assertEquals(-1, SwitchPart.of(ListParts.switchRow(sw)).stock());
    }
}
