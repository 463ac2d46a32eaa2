package org.gatefit.physics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class LogicFamilyTest {

    private static final double TOL = 1e-12;

    @ParameterizedTest(name = "{0} at {2} V: {3}/{4}/{5}/{6}")
    @CsvSource(textBlock = """
        # source (levels from memory, REFERENCES §6),        id,          supply, voh,  vol,  vih,  vil
        'from memory: 5 V TTL',                               ttl-5v,      5.0,    2.4,  0.4,  2.0,  0.8
        'from memory: 5 V CMOS, 0.7/0.3 V_CC',                cmos-5v,     5.0,    4.4,  0.1,  3.5,  1.5
        'from memory: JEDEC JESD8C.01 LVTTL',                 lvttl-3v3,   3.3,    2.4,  0.4,  2.0,  0.8
        'from memory: JEDEC JESD8C.01 LVCMOS, V_DD − 0.2',    lvcmos-3v3,  3.3,    3.1,  0.2,  2.0,  0.8
        'from memory: JEDEC JESD8C.01 LVCMOS at 3.0 V',       lvcmos-3v3,  3.0,    2.8,  0.2,  2.0,  0.8
        'from memory: JEDEC JESD8-5',                         lvcmos-2v5,  2.5,    2.0,  0.4,  1.7,  0.7
        'from memory: JEDEC JESD8-7, V_DD − 0.45, 0.65/0.35', lvcmos-1v8,  1.8,    1.35, 0.45, 1.17, 0.63
        'from memory: JEDEC JESD8-7 at 1.65 V',               lvcmos-1v8,  1.65,   1.2,  0.45, 1.0725, 0.5775
        """)
    void levelsFollowTheStandards(String source, String id, double supply, double voh,
            double vol, double vih, double vil) {
        LogicFamily.Levels l = LogicFamily.fromId(id).levels(supply);
        assertEquals(voh, l.vOh(), TOL, source);
        assertEquals(vol, l.vOl(), TOL, source);
        assertEquals(vih, l.vIh(), TOL, source);
        assertEquals(vil, l.vIl(), TOL, source);
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(textBlock = """
        # source,                                                    voh, vol,  vih, vil,  nmh,  nml
        'REFERENCES §6 (from memory): 1.8 V at V_DD 1.8, JESD8-7',    1.35, 0.45, 1.17, 0.63, 0.18, 0.18
        'REFERENCES §6 (from memory): LVTTL, JESD8C.01',             2.4, 0.4,  2.0, 0.8,  0.4,  0.4
        'REFERENCES §6: 2.4 V output into a 3.5 V threshold',        2.4, 0.4,  3.5, 1.5, -1.1,  1.1
        """)
    void noiseMarginsAreOutputMinusThreshold(String source, double voh, double vol, double vih,
            double vil, double nmh, double nml) {
        NoiseMargins m = NoiseMargins.of(voh, vol, vih, vil);
        assertEquals(nmh, m.high(), TOL, source);
        assertEquals(nml, m.low(), TOL, source);
        assertEquals(nmh >= 0 && nml >= 0, m.compatible(), source);
    }

    @Test
    void familyMarginsAtNominalSupplyMatchTheReferenceChecks() {
        // REFERENCES §6 checks, through the enum at its nominal supply
        NoiseMargins m18 = LogicFamily.LVCMOS_1V8.levels(1.8).selfMargins();
        assertEquals(0.18, m18.high(), TOL);
        assertEquals(0.18, m18.low(), TOL);
        NoiseMargins lvttl = LogicFamily.LVTTL_3V3.levels().selfMargins();
        assertEquals(0.4, lvttl.high(), TOL);
        assertEquals(0.4, lvttl.low(), TOL);
        // a TTL-level output into a 5 V CMOS input (V_IH 3.5 V): incompatible
        NoiseMargins ttlIntoCmos = NoiseMargins.of(LogicFamily.TTL_5V.levels(),
                LogicFamily.CMOS_5V.levels(5.0).vIh(), LogicFamily.CMOS_5V.levels(5.0).vIl());
        assertEquals(-1.1, ttlIntoCmos.high(), TOL);
        assertFalse(ttlIntoCmos.compatible());
        for (LogicFamily f : LogicFamily.values()) {
            assertTrue(f.levels().selfMargins().compatible(), f.id());
        }
    }

    @Test
    void aControllerIsJudgedAtTheBottomOfItsSupplyRange() {
        // REFERENCES §9: LVCMOS 3.3 V, V_DD 3.0–3.6 V in JESD8C.01's normal range, V_OH ≥ V_DD − 0.2 V
        // → 2.8 V at the minimum supply; JESD8-7 (from memory): 1.65 − 0.45 = 1.2 V.
        assertEquals(2.8, LogicFamily.LVCMOS_3V3.levels().vOh(), TOL);
        assertEquals(3.0, LogicFamily.LVCMOS_3V3.minSupply(), TOL);
        assertEquals(1.2, LogicFamily.LVCMOS_1V8.levels().vOh(), TOL);
        for (LogicFamily f : LogicFamily.values()) {
            assertEquals(f.levels(f.minSupply()), f.levels(), f.id());
        }
    }

    @Test
    void aZeroMarginIsStillCompatible() {
        // NM = output level − threshold (REFERENCES §6): a guaranteed V_OH equal to the V_IH a
        // receiver needs is still guaranteed to read high. From memory (REFERENCES §6): a JESD8-5
        // 2.5 V output (V_OH 2.0 V) into an LVTTL input (V_IH 2.0 V) → NM_H 0, NM_L 0.8 − 0.4 V
        NoiseMargins m = NoiseMargins.of(LogicFamily.LVCMOS_2V5.levels(),
                LogicFamily.LVTTL_3V3.levels().vIh(), LogicFamily.LVTTL_3V3.levels().vIl());
        assertEquals(0.0, m.high(), TOL);
        assertEquals(0.4, m.low(), TOL);
        assertTrue(m.compatible());
        assertTrue(new NoiseMargins(0.4, 0.0).compatible());
        assertFalse(new NoiseMargins(0.4, -0.05).compatible());
    }

    @Test
    void theWorstMarginIsTheSmallerOne() {
        // REFERENCES §6: a 2.4 V output into a 3.5 V threshold → NM_H −1.1 V, NM_L 1.1 V
        NoiseMargins m = NoiseMargins.of(2.4, 0.4, 3.5, 1.5);
        assertEquals(-1.1, m.worst(), TOL);
        // REFERENCES §6 (from memory): 1.8 V at V_DD 1.8 → both 0.18 V
        assertEquals(0.18, LogicFamily.LVCMOS_1V8.levels(1.8).selfMargins().worst(), TOL);
        // NM_L = V_IL − V_OL, LVTTL (JESD8C.01, from memory): 0.8 − 0.4 V
        assertEquals(0.4, NoiseMargins.low(0.8, 0.4).orElseThrow(), TOL);
        assertTrue(NoiseMargins.low(0.8, Double.NaN).isEmpty());
    }

    @Test
    void theSupplyRangeIsWhatTheLevelsAccept() {
        // each family's nominal supply is the one its id names (3v3 → 3.3 V) and lies in the range
        // levels() accepts; the range holds the standard's (from memory, REFERENCES §6 and §9):
        // JESD8C.01 3.0–3.6 V, JESD8-5 2.3–2.7 V, JESD8-7 1.65–1.95 V, 5 V parts 4.5–5.5 V
        double[][] standard = {{4.5, 5.5}, {4.5, 5.5}, {3.0, 3.6}, {3.0, 3.6}, {2.3, 2.7},
            {1.65, 1.95}};
        LogicFamily[] families = LogicFamily.values();
        for (int k = 0; k < families.length; k++) {
            LogicFamily f = families[k];
            String named = f.id().substring(f.id().indexOf('-') + 1).replace("v", ".");
            assertEquals(Double.parseDouble(named.endsWith(".") ? named + "0" : named),
                    f.nominalSupply(), TOL, f.id());
            assertTrue(f.minSupply() <= standard[k][0] && f.maxSupply() >= standard[k][1], f.id());
            assertTrue(f.minSupply() < f.nominalSupply() && f.nominalSupply() < f.maxSupply());
            f.levels(f.minSupply());
            f.levels(f.maxSupply());
            assertThrows(IllegalArgumentException.class,
                    () -> f.levels(Math.nextDown(f.minSupply())), f.id());
            assertThrows(IllegalArgumentException.class,
                    () -> f.levels(Math.nextUp(f.maxSupply())), f.id());
        }
    }

    @Test
    void levelsMustPutHighAboveLow() {
        assertEquals("expected V_OH above V_OL (V_OH, V_OL), got 0.4 and 2.4",
                assertThrows(IllegalArgumentException.class,
                        () -> new LogicFamily.Levels(0.4, 2.4, 2.0, 0.8)).getMessage());
        assertEquals("expected V_IH above V_IL (V_IH, V_IL), got 0.8 and 0.8",
                assertThrows(IllegalArgumentException.class,
                        () -> new LogicFamily.Levels(2.4, 0.4, 0.8, 0.8)).getMessage());
    }

    @Test
    void marginsAreUnknownWhenAThresholdIsNotGiven() {
        assertTrue(NoiseMargins.high(3.1, Double.NaN).isEmpty());
        assertTrue(NoiseMargins.low(Double.NaN, 0.2).isEmpty());
        assertEquals(1.1, NoiseMargins.high(3.1, 2.0).orElseThrow(), TOL);
    }

    @Test
    void idsAreTheDesignDocumentIds() {
        // DESIGN.md, stage sheet `logic` column
        String[] ids = {"ttl-5v", "cmos-5v", "lvttl-3v3", "lvcmos-3v3", "lvcmos-2v5", "lvcmos-1v8"};
        assertEquals(ids.length, LogicFamily.values().length);
        for (String id : ids) {
            assertEquals(id, LogicFamily.fromId(id).id());
        }
        assertEquals(LogicFamily.LVCMOS_3V3, LogicFamily.fromId(" LVCMOS-3V3 "));
    }

    @Test
    void rejectsUnknownIdsAndSuppliesOutsideTheRange() {
        assertEquals("expected a logic family (ttl-5v, cmos-5v, lvttl-3v3, lvcmos-3v3, "
                + "lvcmos-2v5, lvcmos-1v8), got 'ecl'",
                assertThrows(IllegalArgumentException.class, () -> LogicFamily.fromId("ecl"))
                        .getMessage());
        assertEquals("expected supply for lvcmos-1v8 in [1.65, 1.95] V, got 3.3",
                assertThrows(IllegalArgumentException.class,
                        () -> LogicFamily.LVCMOS_1V8.levels(3.3)).getMessage());
    }
}
