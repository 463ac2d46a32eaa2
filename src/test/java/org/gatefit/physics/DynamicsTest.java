package org.gatefit.physics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import org.junit.jupiter.api.Test;

/**
 * The switching-dynamics formulas of issue 16 against REFERENCES.md §8 check values (each named
 * beside it) and the properties an engineer expects of them: more resistance → a slower drain edge
 * and less Miller current; more loop inductance → more overshoot; hotter → lower V_th.
 */
class DynamicsTest {

    @Test
    void plateauCurrentIsTheDriveLevelsExcessOverThePlateauCappedAtTheRatedPeak() {
        // REFERENCES §8 (computed): Q_gd 120 nC, 15 V on, V_pl 9.0 V, R_on 2.2 + 1.0 + 1.5 = 4.7 Ω → 1.277 A, 94.0 ns.
        double i = DriveCurrent.plateau(15 - 9.0, 4.7, 4);
        assertEquals(1.277, i, 1e-3);
        assertEquals(94.0e-9, SwitchingTimes.plateauTime(120e-9, i), 0.1e-9);
        // Capped: a 1 A driver gives 1 A whatever the loop; no resistance → the rated peak.
        assertEquals(1.0, DriveCurrent.plateau(6, 4.7, 1.0), 0);
        assertEquals(2.0, DriveCurrent.plateau(6, 0, 2.0), 0);
        // Not the full-swing current: 23 V / 4.7 Ω = 4.89 A is what the start of the edge sees.
        assertTrue(DriveCurrent.peak(23, 2.2, 1.0, 1.5, 10) > 3 * i);
        // Uncapped, Q_gd / I equals the resistive plateau time of REFERENCES §1 (4.753 ns).
        assertEquals(4.753e-9, SwitchingTimes.plateauTime(6.9e-9, DriveCurrent.plateau(12 - 3, 6.2, 4)), 1e-12);
        assertThrows(IllegalArgumentException.class, () -> SwitchingTimes.plateauTime(1e-9, 0));
    }

    @Test
    void thresholdFallsAndDriverResistanceRisesWithTemperature() {
        // From memory (REFERENCES §8: −4 to −7 mV/K for Si; driver resistance +30–50 % from 25 to 125 °C).
        assertEquals(2.0 - 0.6, JunctionTemperature.threshold(2.0, JunctionTemperature.THRESHOLD_TC_SI, 125), 1e-12);
        assertEquals(2.0, JunctionTemperature.threshold(2.0, JunctionTemperature.THRESHOLD_TC_SI, 25), 0);
        assertEquals(1.4, JunctionTemperature.driverResistanceFactor(125), 1e-12);
        assertTrue(JunctionTemperature.driverResistanceFactor(125) >= 1.3 && JunctionTemperature.driverResistanceFactor(125) <= 1.5);
        assertTrue(JunctionTemperature.THRESHOLD_TC_SI >= -7e-3 && JunctionTemperature.THRESHOLD_TC_SI <= -4e-3);
        assertThrows(IllegalArgumentException.class, () -> JunctionTemperature.driverResistanceFactor(250));
        assertThrows(IllegalArgumentException.class, () -> JunctionTemperature.threshold(2, 0.001, 100));
    }

    @Test
    void overshootAndItsInverseMatchTheSecondOrderStepResponse() {
        // REFERENCES §8 (plain circuit theory): ζ 0.2 → 52.7 %, 6 V step peaks at 9.16 V; ζ 0.5 → 16.3 %; ζ 0.7 → 4.6 %.
        assertEquals(0.527, GateLoop.overshoot(0.2), 1e-3);
        assertEquals(0.2, GateLoop.dampingForOvershoot(GateLoop.overshoot(0.2)), 1e-12);
        assertEquals(0.5, GateLoop.dampingForOvershoot(0.163), 2e-3);
        assertEquals(0.7, GateLoop.dampingForOvershoot(0.046), 2e-3);
        // ζ 0.2 with L 100 nH, C 4 nF: R = 0.4·√(L/C) = 2 Ω; a 0 → 6 V step peaks at 9.16 V.
        assertEquals(9.16, GateLoop.extreme(2, 100e-9, 4e-9, 0, 6), 0.01);
        // The falling step undershoots the off level by the same fraction of the swing: 6 → −5 V, 11 V swing.
        assertEquals(-5 - 11 * 0.527, GateLoop.extreme(2, 100e-9, 4e-9, 6, -5), 0.01);
        // The peak is the maximum of the closed-form step response (a second form of the same theory).
        double peak = 0;
        for (int k = 0; k < 20000; k++) {
            peak = Math.max(peak, GateLoop.stepResponse(2, 100e-9, 4e-9, 6, k * 1e-11));
        }
        assertEquals(GateLoop.extreme(2, 100e-9, 4e-9, 0, 6), peak, 1e-3);
        assertThrows(IllegalArgumentException.class, () -> GateLoop.dampingForOvershoot(1));
    }

    @Test
    void millerInjectionIsChargeConsistentAndBoundedByTheDivider() {
        // REFERENCES §8: C_gd averaged over the swing is Q_gd / V_bus: 4 nC over 400 V = 10 pF.
        assertEquals(10e-12, DvDt.averageCgd(4e-9, 400), 1e-24);
        // With it, the RC-limited form is I_M = Q_gd / t through R: §7's check 2.21 V (50 V/ns, 6 Ω, 1 nF, 400 V).
        double t = 400 / 50e9;
        double im = 4e-9 / t;
        assertEquals(im * 6 * (1 - Math.exp(-t / (6 * 1e-9))), DvDt.induced(10e-12, 50e9, 6, 1e-9, 400), 1e-12);
        assertEquals(2.21, DvDt.induced(10e-12, 50e9, 6, 1e-9, 400), 0.005);
        // Divider (plain circuit theory): 400 V · 10 pF / (10 pF + 990 pF) = 4 V.
        assertEquals(4.0, DvDt.divider(10e-12, 990e-12, 400), 1e-12);
        assertThrows(IllegalArgumentException.class, () -> DvDt.divider(0, 0, 400));
    }

    @Test
    void capacitanceAboveThePlateauComesFromTheGateChargeCurveAndExceedsCiss() {
        // (Q_g − Q_gs − Q_gd) / (V_spec − V_pl): (44 − 10 − 6.9) nC / (12 − 3) V = 3.01 nF (REFERENCES §1's part, §8's formula).
        assertEquals(27.1e-9 / 9, DeadTime.capacitanceAbovePlateau(44e-9, 10e-9, 6.9e-9, 12, 3), 1e-15);
        assertThrows(IllegalArgumentException.class, () -> DeadTime.capacitanceAbovePlateau(10e-9, 6e-9, 5e-9, 10, 4));
        // RC segment, plain circuit theory: from 12 V toward 0 V, down to 3 V: R·C·ln(12/3).
        assertEquals(6.2 * 3.9e-9 * Math.log(12.0 / 3), DeadTime.rcSegment(6.2, 3.9e-9, 0, 12, 3), 1e-18);
        // REFERENCES §1: t_d(on) = R·C_iss·ln(V/(V − V_pl)) = 6.956 ns.
        assertEquals(6.956e-9, DeadTime.rcSegment(6.2, 3.9e-9, 12, 0, 3), 1e-12);
        assertThrows(IllegalArgumentException.class, () -> DeadTime.rcSegment(1, 1e-9, 0, 12, -1));
    }

    @Property
    void moreResistanceGivesASlowerDrainEdgeAndLessMillerCurrent(
            @ForAll @DoubleRange(min = 1, max = 200) double qgdNc,
            @ForAll @DoubleRange(min = 0.5, max = 15) double across,
            @ForAll @DoubleRange(min = 0.1, max = 50) double r,
            @ForAll @DoubleRange(min = 0.01, max = 50) double extra,
            @ForAll @DoubleRange(min = 0.1, max = 20) double rated,
            @ForAll @DoubleRange(min = 12, max = 1000) double bus,
            @ForAll @DoubleRange(min = 0.5, max = 20) double rOff,
            @ForAll @DoubleRange(min = 0.2, max = 20) double cissNf) {
        double qgd = qgdNc * 1e-9;
        double fast = SwitchingTimes.plateauTime(qgd, DriveCurrent.plateau(across, r, rated));
        double slow = SwitchingTimes.plateauTime(qgd, DriveCurrent.plateau(across, r + extra, rated));
        assertTrue(slow >= fast, slow + " < " + fast);
        double cgd = DvDt.averageCgd(qgd, bus);
        double vFast = DvDt.induced(cgd, bus / fast, rOff, cissNf * 1e-9, bus);
        double vSlow = DvDt.induced(cgd, bus / slow, rOff, cissNf * 1e-9, bus);
        assertTrue(vSlow <= vFast * (1 + 1e-12), vSlow + " > " + vFast);
        // The injected current is the Miller charge over the transition: less when the edge is slower.
        assertTrue(qgd / slow <= qgd / fast);
    }

    @Property
    void moreLoopInductanceGivesMoreOvershoot(@ForAll @DoubleRange(min = 0.1, max = 20) double r,
            @ForAll @DoubleRange(min = 0.5, max = 200) double lNh,
            @ForAll @DoubleRange(min = 0.1, max = 100) double extraNh,
            @ForAll @DoubleRange(min = 0.2, max = 20) double cNf,
            @ForAll @DoubleRange(min = 1, max = 20) double von) {
        double a = GateLoop.extreme(r, lNh * 1e-9, cNf * 1e-9, 0, von);
        double b = GateLoop.extreme(r, (lNh + extraNh) * 1e-9, cNf * 1e-9, 0, von);
        assertTrue(b >= a, b + " < " + a);
        assertTrue(a >= von);
    }

    @Property
    void hotterGivesALowerThreshold(@ForAll @DoubleRange(min = 0.5, max = 8) double vth,
            @ForAll @DoubleRange(min = -55, max = 199) double t,
            @ForAll @DoubleRange(min = 0.01, max = 1) double dt) {
        for (double tc : new double[] {JunctionTemperature.THRESHOLD_TC_SI, JunctionTemperature.THRESHOLD_TC_SIC,
            JunctionTemperature.THRESHOLD_TC_GAN, JunctionTemperature.THRESHOLD_TC_IGBT}) {
            assertTrue(JunctionTemperature.threshold(vth, tc, t + dt) < JunctionTemperature.threshold(vth, tc, t));
        }
        assertTrue(JunctionTemperature.driverResistanceFactor(t + dt) > JunctionTemperature.driverResistanceFactor(t));
    }
}
