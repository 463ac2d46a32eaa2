package org.gatefit.physics;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertNotSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.commons.math3.ode.FirstOrderDifferentialEquations;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class GateWaveformTest {

    private static final double NS = 1e-9;
    private static final double NC = 1e-9;
    private static final double NF = 1e-9;

    /** Absolute tolerance of V_GS, closed form against the ODE solution, V. */
    private static final double V_TOL = 1e-6;

    /**
     * V_GS(t) of the closed form against commons-math3 DormandPrince853 on
     * dQ/dt = (V_drive − V_GS(Q))/R, with different capacitances below and above the plateau
     * (the curve through datasheet-style Q_g, Q_gs, Q_gd points), at 40 times across the edge;
     * agreement to 1 µV. Source of the method: plain circuit theory.
     */
    @ParameterizedTest(name = "rising={0}, V_on {6}, V_off {7}, R {8}")
    @CsvSource(textBlock = """
        # rising, qg nC, qgs nC, qgd nC, vspec, vpl, von,  voff, r
          true,   44,    10,     14,     10,    4.0, 12.0,  0.0, 6.2
          false,  44,    10,     14,     10,    4.0, 12.0,  0.0, 5.2
          true,   130,   30,     50,     10,    5.5, 15.0, -5.0, 3.3
          false,  130,   30,     50,     10,    5.5, 15.0, -5.0, 1.0
        """)
    void closedFormMatchesNumericalSolution(boolean rising, double qg, double qgs, double qgd,
            double vspec, double vpl, double von, double voff, double r) {
        GateWaveform.GateCurve curve = GateWaveform.GateCurve.fromGateCharge(
                qg * NC, qgs * NC, qgd * NC, vspec, vpl);
        GateWaveform.Edge edge = rising
                ? GateWaveform.turnOn(curve, von, voff, r)
                : GateWaveform.turnOff(curve, von, voff, r);
        double vDrive = rising ? von : voff;
        double q0 = curve.chargeAt(rising ? voff : von) / NC;
        FirstOrderDifferentialEquations eq = Ode.gateCharge(curve, vDrive, r);
        double end = 1.5 * edge.plateauEnd();
        for (int k = 0; k <= 40; k++) {
            double t = end * k / 40;
            double q = Ode.solve(eq, new double[] {q0}, t / NS)[0];
            double vNumeric = curve.voltageAt(q * NC);
            assertEquals(vNumeric, edge.voltage(t), V_TOL, "t = " + t);
        }
    }

    @Test
    void currentStartsAtTheFullSwingOverTheLoopResistance() {
        // plain circuit theory (Ohm's law at t = 0, gate still at the opposite level); equals the
        // uncapped peak of DriveCurrent
        GateWaveform.GateCurve curve = GateWaveform.GateCurve.ofInputCapacitance(3.9 * NF, 3,
                6.9 * NC);
        GateWaveform.Edge on = GateWaveform.turnOn(curve, 12, -3, 6.2);
        assertEquals(15 / 6.2, on.current(0), 1e-12);
        assertEquals(DriveCurrent.peak(15, 2, 3, 1.2, 100), on.current(0), 1e-12);
        GateWaveform.Edge off = GateWaveform.turnOff(curve, 12, -3, 5.2);
        assertEquals(-15 / 5.2, off.current(0), 1e-12);
    }

    @Test
    void plateauHoldsTheVoltageAndCurrentConstant() {
        // REFERENCES §1 inputs: plateau from 6.956 ns for 4.753 ns at (12 − 3)/6.2 A
        GateWaveform.GateCurve curve = GateWaveform.GateCurve.ofInputCapacitance(3.9 * NF, 3,
                6.9 * NC);
        GateWaveform.Edge on = GateWaveform.turnOn(curve, 12, 0, 6.2);
        assertEquals(6.956, on.plateauStart() / NS, 0.001);
        assertEquals(4.753, on.plateauDuration() / NS, 0.001);
        double mid = on.plateauStart() + on.plateauDuration() / 2;
        assertEquals(3.0, on.voltage(mid), 1e-12);
        assertEquals(9 / 6.2, on.current(mid), 1e-12);
    }

    @Test
    void sampledCurrentIntegratesToTheChargeMoved() {
        // plain circuit theory (charge conservation): ∫ I_G dt = Q(V_GS(t_end)) − Q(V_GS(0));
        // trapezoidal integral of 20 001 samples, to 0.01 %
        GateWaveform.GateCurve curve = GateWaveform.GateCurve.fromGateCharge(44 * NC, 10 * NC,
                14 * NC, 10, 4);
        GateWaveform.Edge on = GateWaveform.turnOn(curve, 12, -5, 4.0);
        GateWaveform.Waveform w = on.sample(20_001);
        double[] t = w.time();
        double[] i = w.gateCurrent();
        double q = 0;
        for (int k = 1; k < t.length; k++) {
            q += 0.5 * (i[k] + i[k - 1]) * (t[k] - t[k - 1]);
        }
        double[] v = w.gateVoltage();
        double moved = curve.chargeAt(v[v.length - 1]) - curve.chargeAt(-5);
        assertEquals(moved, q, 1e-4 * moved);
        assertEquals(-5, v[0], 1e-12);
        assertEquals(12, v[v.length - 1], 0.01 * 17);
    }

    @Test
    void thePlateauEndsAfterTheDelayPlusThePlateauTime() {
        // REFERENCES §1 (computed): t_d(on) 6.956 ns + plateau 4.753 ns = 11.709 ns
        GateWaveform.GateCurve curve = GateWaveform.GateCurve.ofInputCapacitance(3.9 * NF, 3,
                6.9 * NC);
        assertEquals(11.709, GateWaveform.turnOn(curve, 12, 0, 6.2).plateauEnd() / NS, 0.002);
    }

    @Test
    void theDefaultSamplingEndsFiveTimeConstantsAfterThePlateau() {
        // plain circuit theory (RC charge): 5 τ after leaving the plateau the gate is within
        // (V_on − V_pl)·e^−5 of V_on. REFERENCES §1 inputs: τ = 6.2 Ω · 3.9 nF = 24.18 ns, plateau
        // end 11.709 ns, so the last sample is at 11.709 + 120.9 = 132.6 ns
        GateWaveform.GateCurve curve = GateWaveform.GateCurve.ofInputCapacitance(3.9 * NF, 3,
                6.9 * NC);
        GateWaveform.Waveform w = GateWaveform.turnOn(curve, 12, 0, 6.2).sample(11);
        double[] t = w.time();
        assertEquals(11, w.size());
        assertEquals(132.6, t[10] / NS, 0.1);
        assertEquals(12 - 9 * Math.exp(-5), w.gateVoltage()[10], 1e-9);
        assertEquals(9 * Math.exp(-5) / 6.2, w.gateCurrent()[10], 1e-9);
    }

    @Test
    void twoSamplesAreTheStartAndTheEnd() {
        // plain circuit theory: at t = 0 the gate is at V_off and draws (V_on − V_off)/R
        // (Ohm's law); long after the edge it sits at V_on and draws nothing
        GateWaveform.GateCurve curve = GateWaveform.GateCurve.ofInputCapacitance(3.9 * NF, 3,
                6.9 * NC);
        GateWaveform.Waveform w = GateWaveform.turnOn(curve, 12, -3, 6.2).sample(2e-6, 2);
        assertArrayEquals(new double[] {0, 2e-6}, w.time(), 0);
        assertEquals(-3, w.gateVoltage()[0], 1e-12);
        assertEquals(15 / 6.2, w.gateCurrent()[0], 1e-12);
        assertEquals(12, w.gateVoltage()[1], 1e-9);
        assertEquals(0, w.gateCurrent()[1], 1e-9);
    }

    @Test
    void theChargeAtThePlateauVoltageIsQgs() {
        // JEDEC JESD24-2 gate-charge curve: Q_gs is the charge from 0 V to the start of the
        // plateau, so the curve through Q_g 44, Q_gs 10, Q_gd 14 nC gives 10 nC at V_pl = 4 V
        GateWaveform.GateCurve curve = GateWaveform.GateCurve.fromGateCharge(44 * NC, 10 * NC,
                14 * NC, 10, 4);
        assertEquals(10, curve.chargeAt(4) / NC, 1e-9);
        assertEquals(10, curve.plateauStartCharge() / NC, 1e-9);
        // and Q_g at V_spec = 10 V (the same definition)
        assertEquals(44, curve.chargeAt(10) / NC, 1e-9);
    }

    @Test
    void waveformsAreEqualByTheirSamples() {
        // value semantics (common practice, no source): equal samples, equal waveforms and
        // hashes; a difference in any one of the three series makes them differ
        double[] t = {0, 1e-9, 2e-9};
        double[] v = {0, 5, 10};
        double[] i = {2, 1, 0};
        GateWaveform.Waveform w = new GateWaveform.Waveform(t, v, i);
        GateWaveform.Waveform same = new GateWaveform.Waveform(t.clone(), v.clone(), i.clone());
        assertEquals(w, same);
        assertEquals(w.hashCode(), same.hashCode());
        assertEquals("Waveform[3 samples]", w.toString());
        GateWaveform.Waveform[] others = {
            new GateWaveform.Waveform(new double[] {0, 1e-9, 3e-9}, v, i),
            new GateWaveform.Waveform(t, new double[] {0, 5, 11}, i),
            new GateWaveform.Waveform(t, v, new double[] {2, 1, 0.5}),
        };
        java.util.Set<Integer> hashes = new java.util.HashSet<>(java.util.List.of(w.hashCode()));
        for (GateWaveform.Waveform o : others) {
            assertNotEquals(w, o);
            assertNotEquals(o, w);
            assertTrue(hashes.add(o.hashCode()), "hash of " + o + " repeats another");
        }
        assertNotEquals(w, (Object) "Waveform[3 samples]");
    }

    @Test
    void waveformArraysAreCopies() {
        double[] t = {0, 1};
        GateWaveform.Waveform w = new GateWaveform.Waveform(t, new double[] {0, 1},
                new double[] {1, 0});
        t[1] = 99;
        assertArrayEquals(new double[] {0, 1}, w.time());
        assertNotSame(w.time(), w.time());
        assertEquals(2, w.size());
    }

    @Test
    void rejectsBadSamplingAndLevels() {
        GateWaveform.GateCurve curve = GateWaveform.GateCurve.ofInputCapacitance(1 * NF, 3,
                1 * NC);
        GateWaveform.Edge on = GateWaveform.turnOn(curve, 12, 0, 1);
        assertEquals("expected at least 2 samples, got 1",
                assertThrows(IllegalArgumentException.class, () -> on.sample(1e-9, 1))
                        .getMessage());
        assertTrue(assertThrows(IllegalArgumentException.class,
                () -> GateWaveform.turnOn(curve, 2, 0, 1)).getMessage()
                .startsWith("expected on level above the plateau"));
        assertEquals("expected gate loop resistance > 0 Ω, got 0.0",
                assertThrows(IllegalArgumentException.class,
                        () -> GateWaveform.turnOff(curve, 12, 0, 0)).getMessage());
        assertEquals("expected capacitance below the plateau to be a finite number of F, got NaN",
                assertThrows(IllegalArgumentException.class,
                        () -> new GateWaveform.GateCurve(Double.NaN, 3, 1e-9, 1e-9))
                        .getMessage());
    }
}
