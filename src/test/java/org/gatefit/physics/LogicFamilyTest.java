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
        NoiseMargins m18 = LogicFamily.LVCMOS_1V8.levels().selfMargins();
        assertEquals(0.18, m18.high(), TOL);
        assertEquals(0.18, m18.low(), TOL);
        NoiseMargins lvttl = LogicFamily.LVTTL_3V3.levels().selfMargins();
        assertEquals(0.4, lvttl.high(), TOL);
        assertEquals(0.4, lvttl.low(), TOL);
        // a TTL-level output into a 5 V CMOS input (V_IH 3.5 V): incompatible
        NoiseMargins ttlIntoCmos = NoiseMargins.of(LogicFamily.TTL_5V.levels(),
                LogicFamily.CMOS_5V.levels().vIh(), LogicFamily.CMOS_5V.levels().vIl());
        assertEquals(-1.1, ttlIntoCmos.high(), TOL);
        assertFalse(ttlIntoCmos.compatible());
        for (LogicFamily f : LogicFamily.values()) {
            assertTrue(f.levels().selfMargins().compatible(), f.id());
        }
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
