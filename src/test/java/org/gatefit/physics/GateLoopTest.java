package org.gatefit.physics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.apache.commons.math3.ode.FirstOrderDifferentialEquations;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class GateLoopTest {

    private static final double NH = 1e-9;
    private static final double NF = 1e-9;
    private static final double NS = 1e-9;

    /** Relative tolerance of closed forms against the numerical series-RLC solution. */
    private static final double ODE_REL_TOL = 1e-6;

    @ParameterizedTest(name = "{0}: {1}")
    @CsvSource(textBlock = """
        # source,                      quantity,      L nH,  C nF, R or f,  expected,  tol
        'REFERENCES §3 (computed)',   criticalR,     20,    3.9,  0,       4.53,      0.005
        'REFERENCES §3 (computed)',   resonanceMHz,  20,    3.9,  0,       18.02,     0.005
        'REFERENCES §3 (computed)',   zeta,          20,    3.9,  6.2,     1.369,     0.0005
        'REFERENCES §3 (computed)',   criticalR,     214.9, 9.25, 0,       9.64,      0.005
        'REFERENCES §3 (computed)',   inductanceNh,  0,     9.25, 3.57e6,  214.9,     0.05
        """)
    void referenceCheckValues(String source, String quantity, double l, double c, double x,
            double expected, double tol) {
        double v = switch (quantity) {
            case "criticalR" -> GateLoop.criticalResistance(l * NH, c * NF);
            case "resonanceMHz" -> GateLoop.resonance(l * NH, c * NF) / 1e6;
            case "zeta" -> GateLoop.dampingRatio(x, l * NH, c * NF);
            case "inductanceNh" -> GateLoop.inductanceFromRing(x, c * NF) / NH;
            default -> throw new IllegalArgumentException(quantity);
        };
        assertEquals(expected, v, tol, source);
    }

    @Test
    void criticalResistanceGivesUnitDamping() {
        // plain circuit theory: ζ = 1 at R = 2√(L/C); no overshoot and no ringing there
        double r = GateLoop.criticalResistance(20 * NH, 3.9 * NF);
        assertEquals(1.0, GateLoop.dampingRatio(r, 20 * NH, 3.9 * NF), 1e-12);
        assertEquals(0.0, GateLoop.overshoot(1.0), 0);
        assertEquals(0.0, GateLoop.ringFrequency(r * 1.01, 20 * NH, 3.9 * NF), 0);
    }

    /**
     * Overshoot and ring frequency of the closed forms against commons-math3 DormandPrince853 on
     * the series RLC (L di/dt = V − R i − v, C dv/dt = i). The loop current crosses zero at each
     * extremum of the gate voltage: the first falling crossing is the peak, the spacing of
     * successive crossings is half a ring period. Agreement to a relative 1e-6.
     */
    @ParameterizedTest(name = "R {0} Ω, L {1} nH, C {2} nF")
    @CsvSource(textBlock = """
        # R ohm, L nH,  C nF  (REFERENCES §3 loops, lightly damped)
          1.0,   20,    3.9
          0.5,   214.9, 9.25
          3.0,   10,    2.0
          0.2,   5,     1.0
        """)
    void overshootAndRingFrequencyMatchNumericalRlc(double r, double l, double c) {
        double step = 15;
        GateLoop.Ringing closed = GateLoop.ringing(r, l * NH, c * NF, step);
        assertTrue(closed.dampingRatio() < 1);
        FirstOrderDifferentialEquations eq = Ode.seriesRlc(r, l, c, step);
        double period = 1 / closed.ringFrequency() / NS;
        List<Double> zeros = Ode.crossings(eq, new double[] {0, 0}, 2.2 * period,
                (t, y) -> y[1], 0);
        assertTrue(zeros.size() >= 3, "crossings " + zeros);
        double tPeak = zeros.get(0);
        double vPeak = Ode.solve(eq, new double[] {0, 0}, tPeak)[0];
        assertEquals(closed.peak(), vPeak, ODE_REL_TOL * vPeak);
        assertEquals(closed.overshoot(), vPeak / step - 1, ODE_REL_TOL);
        double fNumeric = 1 / (2 * (zeros.get(1) - zeros.get(0)) * NS);
        assertEquals(closed.ringFrequency(), fNumeric, ODE_REL_TOL * fNumeric);
    }

    @ParameterizedTest(name = "R {0} Ω")
    @CsvSource(textBlock = """
        # R ohm (L 20 nH, C 3.9 nF): under-, critically and over-damped
          0.9
          4.5291081
          12.0
        """)
    void stepResponseMatchesNumericalRlc(double r) {
        double l = 20;
        double c = 3.9;
        if (Math.abs(r - 4.5291081) < 1e-6) {
            r = GateLoop.criticalResistance(l * NH, c * NF);
        }
        FirstOrderDifferentialEquations eq = Ode.seriesRlc(r, l, c, 12);
        for (int k = 0; k <= 30; k++) {
            double tNs = k * 5.0;
            double v = Ode.solve(eq, new double[] {0, 0}, tNs)[0];
            assertEquals(v, GateLoop.stepResponse(r, l * NH, c * NF, 12, tNs * NS), 1e-6,
                    "t = " + tNs + " ns");
        }
    }

    @Test
    void resistorRangeMeetsBothTheDampingAndTheEdgeTarget() {
        // REFERENCES §3: R_ext ≥ ζ·R_crit − R_driver − R_g,int (4.53 − 2 − 1.2 = 1.33 Ω);
        // REFERENCES §1 plateau time: R_total ≤ t·(V − V_pl)/Q_gd = 10 ns·9 V/6.9 nC = 13.04 Ω
        GateLoop.ResistorRange range = GateLoop.resistorRange(20 * NH, 3.9 * NF, 1.0, 3.2,
                6.9e-9, 9, 10 * NS);
        assertEquals(1.33, range.min(), 0.005);
        assertEquals(9.84, range.max(), 0.005);
        assertTrue(range.feasible());
        // IEC 60063 E12: the smallest value at or above 1.33 Ω is 1.5 Ω
        assertEquals(1.5, range.pick(ESeries.E12).orElseThrow(), 1e-12);
        double r = 3.2 + range.min();
        assertEquals(1.0, GateLoop.dampingRatio(r, 20 * NH, 3.9 * NF), 1e-3);
        assertEquals(10 * NS, SwitchingTimes.plateauOn(6.9e-9, 3.2 + range.max(), 12, 3), 1e-12);
    }

    @Test
    void resistorRangeIsEmptyWhenTheEdgeTargetIsTooFast() {
        // plain circuit theory: 2 ns·9 V/6.9 nC = 2.61 Ω total is less than the fixed 3.2 Ω
        GateLoop.ResistorRange range = GateLoop.resistorRange(20 * NH, 3.9 * NF, 1.0, 3.2,
                6.9e-9, 9, 2 * NS);
        assertFalse(range.feasible());
        assertTrue(range.pick(ESeries.E24).isEmpty());
    }

    @Test
    void aFixedResistanceThatAlreadyDampsNeedsNoResistor() {
        // REFERENCES §3 (computed): R_crit 4.53 Ω for 20 nH and 3.9 nF, so a fixed 6.2 Ω already
        // gives ζ 1.369 > 1: the smallest external resistor is 0 Ω (a link), which pick returns
        GateLoop.ResistorRange range = GateLoop.resistorRange(20 * NH, 3.9 * NF, 1.0, 6.2,
                6.9e-9, 9, 20 * NS);
        assertEquals(0.0, range.min(), 0);
        assertEquals(0.0, range.pick(ESeries.E12).orElseThrow(), 0);
    }

    @Test
    void bothEndsOfTheResistorRangeAreAllowed() {
        // the range is R_min ≤ R_ext ≤ R_max (REFERENCES §3 damping target, §1 plateau time):
        // a single value meets both targets, and an E12 value (IEC 60063) landing on R_max counts
        GateLoop.ResistorRange single = new GateLoop.ResistorRange(10, 10);
        assertTrue(single.feasible());
        assertEquals(10, single.pick(ESeries.E12).orElseThrow(), 0);
        // IEC 60063 E12: 9.0 Ω rounds up to 10 Ω, the top of the range
        assertEquals(10, new GateLoop.ResistorRange(9.0, 10).pick(ESeries.E12).orElseThrow(), 0);
        // ... and to nothing when the top is below the next E12 value
        assertTrue(new GateLoop.ResistorRange(9.0, 9.9).pick(ESeries.E12).isEmpty());
    }

    @Test
    void rejectsInvalidLoops() {
        assertEquals("expected loop inductance L > 0 H, got 0.0",
                assertThrows(IllegalArgumentException.class,
                        () -> GateLoop.resonance(0, 1e-9)).getMessage());
        assertEquals("expected loop resistance R >= 0 Ω, got -2.0",
                assertThrows(IllegalArgumentException.class,
                        () -> GateLoop.dampingRatio(-2, 1e-9, 1e-9)).getMessage());
        assertEquals("expected gate capacitance C to be a finite number of F, got NaN",
                assertThrows(IllegalArgumentException.class,
                        () -> GateLoop.criticalResistance(1e-9, Double.NaN)).getMessage());
    }
}
