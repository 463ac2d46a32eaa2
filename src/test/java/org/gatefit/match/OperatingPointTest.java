package org.gatefit.match;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.function.Consumer;
import org.gatefit.catalog.Kind;
import org.gatefit.catalog.Row;
import org.gatefit.physics.LogicFamily;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * {@link OperatingPoint.Spec#resolve}: which default stands in for each value not given, and the
 * line it prints. Defaults checked here: the technology's edge and typical on level (Technology's
 * javadoc, common practice), 3.3 V LVCMOS levels at the minimum supply 3.0 V (JEDEC JESD8C.01:
 * V_OH = V_DD − 0.2 V = 2.8 V, V_OL 0.2 V, V_DD up to 3.6 V; REFERENCES.md §6 and §9), 5 V CMOS
 * V_OH 4.4 V / V_OL 0.1 V / V_CC up to 5.5 V (REFERENCES.md §6), gate loop 10 nH (REFERENCES.md §3,
 * from memory), bootstrap diode 0.7 V and 2.2 Ω (REFERENCES.md §4), hot corner 125 °C (common
 * practice). The record's checks at their edges, and a stage-sheet row read in SI units (kHz, ns,
 * nH: SI Brochure, table 7).
 */
class OperatingPointTest {
    private static final double TOL = 1e-12;

    private static OperatingPoint.Spec bare(double fSw) {
        OperatingPoint.Spec s = new OperatingPoint.Spec();
        s.fSw = fSw;
        return s;
    }

    @Test
    void everyDefaultIsAppliedAndSaid() {
        Parts.Sw sw = Parts.sw();
        sw.tech = Technology.SIC_MOSFET;
        sw.vGateOn = 18;
        sw.vGateOff = -4;
        sw.rGInt = Double.NaN;
        OperatingPoint op = bare(100e3).resolve(sw.build());
        assertFalse(op.highSide());
        assertTrue(Double.isNaN(op.bus()));
        assertEquals(100e3, op.fSw());
        assertEquals(30e-9, op.edge(), "SiC: 30 ns (Technology)");
        assertEquals(18, op.vDrive(), "the switch's recommended on level");
        assertEquals(-4, op.vDriveNeg(), "the switch's recommended off level");
        assertEquals(22, op.swing(), TOL, "18 − (−4) = 22 V");
        assertEquals(LogicFamily.LVCMOS_3V3, op.logic());
        assertEquals(2.8, op.vOh(), TOL, "3.0 V − 0.2 V (JESD8C.01 at the minimum supply)");
        assertEquals(0.2, op.vOl(), TOL);
        assertEquals(3.6, op.vOhMax(), TOL, "top of the 3.0–3.6 V supply range");
        assertTrue(op.activeHigh());
        assertEquals(0, op.rG());
        assertEquals(0, op.rGOff());
        assertTrue(Double.isNaN(op.dutyMax()));
        assertEquals(1, op.parallel());
        assertEquals(10e-9, op.loop());
        assertEquals(0.7, op.diodeDrop());
        assertEquals(2.2, op.rBoot());
        assertTrue(Double.isNaN(op.dvdt()));
        assertTrue(op.bootAssumed());
        assertEquals(0, op.channelsUsed());
        assertTrue(op.bridge(), "assumed in a bridge");
        assertNull(op.twin());
        assertTrue(Double.isNaN(op.powerLoop()));
        assertTrue(Double.isNaN(op.iLoad()));
        assertEquals(125, op.tj());
        assertEquals(List.of(
                "edge: 30 ns assumed for a " + Technology.SIC_MOSFET + " (common practice; give --edge or edge_ns)",
                "on level: 18 V, the switch's recommended level (give --drive or v_drive_v)",
                "off level: -4 V, the switch's recommended level (give --drive-neg)",
                "controller: lvcmos-3v3 assumed (give --logic or logic)",
                "external gate resistor: 0 Ω assumed (give --rg or r_g_ohm)",
                "gate loop: 10 nH assumed (give --loop or loop_nh)",
                "hot corner: junction 125 °C assumed (give --tj or t_j_c)",
                "bridge: another switch assumed to turn on against this one (dv-dt; give --bridge no or bridge = no"
                        + " for a single-switch stage)",
                "internal gate resistance of TST-S1 unknown: 0 Ω used (currents are upper bounds)"), op.assumed());
    }

    @Test
    void givenValuesAreKeptAndNothingIsSaid() {
        OperatingPoint.Spec s = bare(250e3);
        s.highSide = true;
        s.bus = 400.0;
        s.edge = 20e-9;
        s.vDrive = 15.0;
        s.vDriveNeg = -5.0;
        s.logic = LogicFamily.CMOS_5V;
        s.activeHigh = false;
        s.rG = 3.3;
        s.rGOff = 1.5;
        s.dutyMax = 0.9;
        s.parallel = 2;
        s.loop = 5e-9;
        s.diodeDrop = 1.0;
        s.rBoot = 4.7;
        s.dvdt = 50e9;
        s.channelsUsed = 1;
        s.tj = 150.0;
        s.bridge = false;
        s.twin = new OperatingPoint.Twin("LEG-B", 20e9, 18e9);
        s.powerLoop = 12e-9;
        s.iLoad = 30.0;
        OperatingPoint op = s.resolve(Parts.sw().build());
        assertEquals(List.of(), op.assumed());
        assertTrue(op.highSide());
        assertEquals(400, op.bus());
        assertEquals(250e3, op.fSw());
        assertEquals(20e-9, op.edge());
        assertEquals(15, op.vDrive());
        assertEquals(-5, op.vDriveNeg());
        assertEquals(LogicFamily.CMOS_5V, op.logic());
        assertEquals(4.4, op.vOh(), TOL, "5 V CMOS V_OH");
        assertEquals(0.1, op.vOl(), TOL, "5 V CMOS V_OL");
        assertEquals(5.5, op.vOhMax(), TOL, "V_CC up to 5.5 V");
        assertFalse(op.activeHigh());
        assertEquals(3.3, op.rG());
        assertEquals(1.5, op.rGOff());
        assertEquals(0.9, op.dutyMax());
        assertEquals(2, op.parallel());
        assertEquals(5e-9, op.loop());
        assertEquals(1.0, op.diodeDrop());
        assertEquals(4.7, op.rBoot());
        assertEquals(50e9, op.dvdt());
        assertFalse(op.bootAssumed());
        assertEquals(1, op.channelsUsed());
        assertEquals(150, op.tj());
        assertFalse(op.bridge());
        assertEquals("LEG-B", op.twin().name());
        assertEquals(12e-9, op.powerLoop());
        assertEquals(30, op.iLoad());
        // a copy resolves to the same point, so one spec can serve many switches
        assertEquals(op, s.copy().resolve(Parts.sw().build()));
    }

    @Test
    void theOnLevelFallsBackFromRecommendedToRonLevelToTypical() {
        Parts.Sw sw = Parts.sw();
        sw.vGateOn = 0; // not a recommendation: R_on is specified at 10 V
        sw.rOnVgs = 4.5;
        OperatingPoint op = bare(100e3).resolve(sw.build());
        assertEquals(4.5, op.vDrive());
        assertTrue(op.assumed().contains("on level: 4.5 V, the level R_on is specified at (give --drive)"), op.assumed()::toString);
        sw.rOnVgs = 0;
        op = bare(100e3).resolve(sw.build());
        assertEquals(12, op.vDrive(), "Si MOSFET typical 12 V (REFERENCES.md §5: 10–12 V)");
        assertTrue(op.assumed().contains("on level: 12 V, typical for a " + Technology.SI_MOSFET + " (give --drive)"),
                op.assumed()::toString);
        sw.rOnVgs = Double.NaN;
        sw.vGateOn = Double.NaN;
        sw.tech = Technology.IGBT;
        assertEquals(15, bare(100e3).resolve(sw.build()).vDrive(), "IGBT +15 V (REFERENCES.md §5)");
    }

    @Test
    void anOnLevelGivenMeansAnOffLevelOfZeroUnlessGiven() {
        Parts.Sw sw = Parts.sw();
        sw.vGateOff = -5;
        OperatingPoint.Spec s = bare(100e3);
        s.vDrive = 12.0;
        OperatingPoint op = s.resolve(sw.build());
        assertEquals(0, op.vDriveNeg(), "the switch's off level goes with its on level, not with one given");
        assertTrue(op.assumed().stream().noneMatch(a -> a.startsWith("off level")));
        sw.vGateOff = Double.NaN;
        assertEquals(0, bare(100e3).resolve(sw.build()).vDriveNeg());
    }

    @Test
    void controllerLevelsGivenInPartAreCompletedFromTheFamily() {
        OperatingPoint.Spec s = bare(100e3);
        s.vOh = 3.1;
        OperatingPoint op = s.resolve(Parts.sw().build());
        assertEquals(3.1, op.vOh());
        assertEquals(0.2, op.vOl(), TOL, "LVCMOS V_OL");
        assertEquals(3.1, op.vOhMax(), "no family: the output reaches its own V_OH");
        assertNull(op.logic());
        assertTrue(op.assumed().contains("controller levels: V_OL 200 mV taken from lvcmos-3v3"), op.assumed()::toString);

        s = bare(100e3);
        s.vOl = 0.3;
        s.logic = LogicFamily.CMOS_5V;
        op = s.resolve(Parts.sw().build());
        assertEquals(4.4, op.vOh(), TOL);
        assertEquals(0.3, op.vOl());
        assertEquals(5.5, op.vOhMax(), TOL, "the family's top supply above V_OH");
        assertTrue(op.assumed().contains("controller levels: V_OH 4.4 V taken from cmos-5v"), op.assumed()::toString);

        s.vOh = 6.0; // above the family's supply: the output's own level is the higher
        op = s.resolve(Parts.sw().build());
        assertEquals(6.0, op.vOhMax());
        assertTrue(op.assumed().stream().noneMatch(a -> a.startsWith("controller")), op.assumed()::toString);
    }

    @Test
    void theTurnOffResistorFollowsTheTurnOnResistor() {
        OperatingPoint.Spec s = bare(100e3);
        s.rG = 4.7;
        OperatingPoint op = s.resolve(Parts.sw().build());
        assertEquals(4.7, op.rGOff());
        assertTrue(op.assumed().stream().noneMatch(a -> a.startsWith("external gate resistor")));
        s.diodeDrop = 0.5; // only one of the two bootstrap values: still assumed
        assertTrue(s.resolve(Parts.sw().build()).bootAssumed());
        s.diodeDrop = null;
        s.rBoot = 1.0;
        assertTrue(s.resolve(Parts.sw().build()).bootAssumed());
    }

    @Test
    void aFrequencyIsRequired() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new OperatingPoint.Spec().resolve(Parts.sw().build()));
        assertEquals("expected a switching frequency (--freq or f_sw_khz), got none", e.getMessage());
    }

    /** The resolved baseline point with one value changed (ok: whether it is accepted). */
    private static void check(boolean ok, Consumer<OperatingPoint.Spec> change) {
        OperatingPoint.Spec s = Parts.op();
        change.accept(s);
        if (ok) {
            s.resolve(Parts.sw().build());
        } else {
            assertThrows(IllegalArgumentException.class, () -> s.resolve(Parts.sw().build()));
        }
    }

    @Test
    void theRecordsChecksAtTheirEdges() {
        check(false, s -> s.fSw = 0.0);
        check(false, s -> s.fSw = Double.POSITIVE_INFINITY);
        check(false, s -> s.fSw = Double.NaN);
        check(true, s -> s.fSw = 1e-3);
        check(false, s -> s.edge = 0.0);
        check(false, s -> s.edge = -1e-9);
        check(false, s -> s.vDrive = 0.0);
        check(true, s -> s.vDriveNeg = 0.0);
        check(false, s -> s.vDriveNeg = 0.1);
        check(false, s -> s.vDriveNeg = Double.NaN);
        check(true, s -> s.parallel = 1);
        check(false, s -> s.parallel = 0);
        check(true, s -> s.dutyMax = 0.0);
        check(true, s -> s.dutyMax = 1.0);
        check(false, s -> s.dutyMax = -0.01);
        check(false, s -> s.dutyMax = 1.01);
        check(true, s -> s.channelsUsed = 0);
        check(false, s -> s.channelsUsed = -1);
        // junction temperature from −55 to 200 °C (JunctionTemperature's range), ends included
        check(true, s -> s.tj = -55.0);
        check(true, s -> s.tj = 200.0);
        check(false, s -> s.tj = -55.1);
        check(false, s -> s.tj = 200.1);
        check(true, s -> s.rG = 0.0);
        check(false, s -> s.rG = -0.1);
        check(false, s -> s.rGOff = -0.1);
        check(false, s -> s.rGOff = Double.NaN);
    }

    @Test
    void theTwinsEdgeMustBeKnownAndPositive() {
        assertThrows(NullPointerException.class, () -> new OperatingPoint.Twin(null, 1e9, 1e9));
        assertThrows(IllegalArgumentException.class, () -> new OperatingPoint.Twin("B", 0, 1e9));
        assertThrows(IllegalArgumentException.class, () -> new OperatingPoint.Twin("B", 1e9, 0));
        assertThrows(IllegalArgumentException.class, () -> new OperatingPoint.Twin("B", Double.NaN, 1e9));
        assertEquals(1e-3, new OperatingPoint.Twin("B", 1e-3, 1e-3).slewHot());
    }

    private static Row stage(Map<String, Object> v) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put("stage", "ST1");
        m.put("driver", "TST-D1");
        m.put("switch", "TST-S1");
        m.putAll(v);
        return new Row(Kind.STAGE, "ST1", "stages.csv", 2, m, Map.of());
    }

    @Test
    void aStageRowIsReadInSiUnits() {
        Map<String, Object> v = new LinkedHashMap<>();
        v.put("side", "high");
        v.put("bus_v", 400.0);
        v.put("f_sw_khz", 100.0);     // 100 kHz = 100·10³ Hz
        v.put("edge_ns", 25.0);       // 25·10⁻⁹ s
        v.put("v_drive_v", 15.0);
        v.put("v_drive_neg_v", -4.0);
        v.put("logic", "cmos-5v");
        v.put("v_oh_v", 4.5);
        v.put("v_ol_v", 0.05);
        v.put("pwm_sense", "active-low");
        v.put("r_g_ohm", 2.2);
        v.put("r_g_off_ohm", 1.0);
        v.put("duty_max", 0.8);
        v.put("parallel", 2L);
        v.put("loop_nh", 8.0);        // 8·10⁻⁹ H
        v.put("v_f_boot_v", 0.9);
        v.put("r_boot_ohm", 3.3);
        v.put("t_j_c", 110.0);
        v.put("power_loop_nh", 15.0);
        v.put("i_load_a", 20.0);
        v.put("bridge", "no");
        OperatingPoint.Spec s = OperatingPoint.Spec.fromStage(stage(v));
        assertEquals(Boolean.TRUE, s.highSide);
        assertEquals(400.0, s.bus);
        assertEquals(100e3, s.fSw, 100e3 * TOL);
        assertEquals(25e-9, s.edge, 25e-9 * 1e-9);
        assertEquals(15.0, s.vDrive);
        assertEquals(-4.0, s.vDriveNeg);
        assertEquals(LogicFamily.CMOS_5V, s.logic);
        assertEquals(4.5, s.vOh);
        assertEquals(0.05, s.vOl);
        assertEquals(Boolean.FALSE, s.activeHigh);
        assertEquals(2.2, s.rG);
        assertEquals(1.0, s.rGOff);
        assertEquals(0.8, s.dutyMax);
        assertEquals(2, s.parallel);
        assertEquals(8e-9, s.loop, 8e-9 * 1e-9);
        assertEquals(0.9, s.diodeDrop);
        assertEquals(3.3, s.rBoot);
        assertEquals(110.0, s.tj);
        assertEquals(15e-9, s.powerLoop, 15e-9 * 1e-9);
        assertEquals(20.0, s.iLoad);
        assertEquals(Boolean.FALSE, s.bridge);

        // the other words of the choice columns
        OperatingPoint.Spec t = OperatingPoint.Spec.fromStage(stage(Map.of("side", "low", "pwm_sense", "active-high",
                "bridge", "yes", "f_sw_khz", 50.0)));
        assertEquals(Boolean.FALSE, t.highSide);
        assertEquals(Boolean.TRUE, t.activeHigh);
        assertEquals(Boolean.TRUE, t.bridge);
        // empty cells stay null, so resolve applies (and says) the defaults
        assertNull(t.bus);
        assertNull(t.edge);
        assertNull(t.logic);
        assertNull(t.parallel);
        assertNull(t.tj);
        assertNull(t.vDrive);
    }

    @ParameterizedTest
    @CsvSource({"1.4, 1", "1.5, 2", "2.0, 2"})
    void aParallelCountIsRoundedToAWholeSwitch(double cell, int expected) {
        // the stage schema types parallel as an integer; a number read from it rounds half up (Math.round)
        assertEquals(expected, OperatingPoint.Spec.fromStage(stage(Map.of("parallel", cell))).parallel);
    }
}
