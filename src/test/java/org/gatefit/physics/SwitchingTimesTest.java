package org.gatefit.physics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.apache.commons.math3.ode.FirstOrderDifferentialEquations;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class SwitchingTimesTest {

    private static final double NS = 1e-9;
    private static final double NC = 1e-9;
    private static final double NF = 1e-9;

    /** Relative tolerance of closed form against the numerical ODE solution. */
    private static final double ODE_REL_TOL = 1e-6;

    @ParameterizedTest(name = "{0}: {1} = {8} ns")
    @CsvSource(textBlock = """
        # source,                                                    quantity,   qgd nC, ciss nF, vpl, von, r, voff, expected ns, tol ns
        'REFERENCES §1 (computed); Mohan et al. 3rd ed., gate drive', plateauOn,  6.9,    3.9,   3.0, 12.0, 6.2, 0.0, 4.753, 0.001
        'REFERENCES §1 (computed); Mohan et al. 3rd ed., gate drive', plateauOff, 6.9,    3.9,   3.0, 12.0, 5.2, 0.0, 11.96, 0.005
        'REFERENCES §1 (computed); plain circuit theory (RC charge)', delayOn,    6.9,    3.9,   3.0, 12.0, 6.2, 0.0, 6.956, 0.001
        'REFERENCES §1 (computed); plain circuit theory (RC charge)', delayOff,   6.9,    3.9,   3.0, 12.0, 5.2, 0.0, 28.11, 0.005
        """)
    void referenceCheckValues(String source, String quantity, double qgd, double ciss, double vpl,
            double von, double r, double voff, double expectedNs, double tolNs) {
        double t = switch (quantity) {
            case "plateauOn" -> SwitchingTimes.plateauOn(qgd * NC, r, von, vpl);
            case "plateauOff" -> SwitchingTimes.plateauOff(qgd * NC, r, vpl, voff);
            case "delayOn" -> SwitchingTimes.delayOn(r, ciss * NF, von, vpl, voff);
            case "delayOff" -> SwitchingTimes.delayOff(r, ciss * NF, von, vpl, voff);
            default -> throw new IllegalArgumentException(quantity);
        };
        assertEquals(expectedNs, t / NS, tolNs, source);
    }

    @Test
    void turnOffIsTheSlowerEdgeWhenThePlateauIsBelowHalfTheDrive() {
        // REFERENCES §1: turn-off is the slower edge whenever V_pl < V_drive / 2 (equal R, V_off 0)
        double qgd = 6.9 * NC;
        for (double vpl = 1.0; vpl < 6.0; vpl += 0.5) {
            assertTrue(SwitchingTimes.plateauOff(qgd, 5, vpl, 0)
                    > SwitchingTimes.plateauOn(qgd, 5, 12, vpl), "V_pl " + vpl);
        }
        assertTrue(SwitchingTimes.plateauOff(qgd, 5, 7, 0)
                < SwitchingTimes.plateauOn(qgd, 5, 12, 7));
    }

    @Test
    void estimateGathersTheFourTimes() {
        // REFERENCES §1 (computed): same check values, through the record
        SwitchingTimes.Times t = SwitchingTimes.estimate(6.9 * NC, 3.9 * NF, 3, 12, 0, 6.2, 5.2);
        assertEquals(6.956 + 4.753, t.turnOn() / NS, 0.002);
        assertEquals(28.11 + 11.96, t.turnOff() / NS, 0.01);
    }

    /**
     * Closed forms against commons-math3's DormandPrince853 on the same circuit:
     * dQ/dt = (V_drive − V_GS(Q)) / R with the piecewise-linear gate curve (C_iss below and above a
     * flat plateau of Q_gd). Event times of Q crossing the plateau edges give the delay and the
     * plateau end. Agreement to a relative 1e-6.
     */
    @ParameterizedTest(name = "V_on {3}, V_off {4}, R_on {5}, R_off {6}")
    @CsvSource(textBlock = """
        # qgd nC, ciss nF, vpl, von,  voff, ron, roff   (source: REFERENCES §1 inputs, then variations)
          6.9,    3.9,     3.0, 12.0,  0.0, 6.2, 5.2
          6.9,    3.9,     3.0, 15.0, -5.0, 6.2, 5.2
          30,     2.0,     5.0, 18.0, -4.0, 10,  2.0
          2.0,    0.5,     2.5,  6.0,  0.0, 1.5, 0.8
        """)
    void closedFormsMatchNumericalGateChargeOde(double qgd, double ciss, double vpl, double von,
            double voff, double ron, double roff) {
        GateWaveform.GateCurve curve =
                GateWaveform.GateCurve.ofInputCapacitance(ciss * NF, vpl, qgd * NC);
        double q1 = curve.plateauStartCharge() / NC;
        double q2 = q1 + qgd;
        SwitchingTimes.Times closed =
                SwitchingTimes.estimate(qgd * NC, ciss * NF, vpl, von, voff, ron, roff);

        FirstOrderDifferentialEquations on = Ode.gateCharge(curve, von, ron);
        double[] qOff = {curve.chargeAt(voff) / NC};
        List<Double> start = Ode.crossings(on, qOff, 10 * closed.turnOn() / NS,
                (t, y) -> y[0] - q1, +1);
        List<Double> end = Ode.crossings(on, qOff, 10 * closed.turnOn() / NS,
                (t, y) -> y[0] - q2, +1);
        assertEquals(closed.delayOn() / NS, start.get(0), ODE_REL_TOL * start.get(0));
        assertEquals(closed.turnOn() / NS, end.get(0), ODE_REL_TOL * end.get(0));

        FirstOrderDifferentialEquations off = Ode.gateCharge(curve, voff, roff);
        double[] qOn = {curve.chargeAt(von) / NC};
        List<Double> offStart = Ode.crossings(off, qOn, 10 * closed.turnOff() / NS,
                (t, y) -> y[0] - q2, -1);
        List<Double> offEnd = Ode.crossings(off, qOn, 10 * closed.turnOff() / NS,
                (t, y) -> y[0] - q1, -1);
        assertEquals(closed.delayOff() / NS, offStart.get(0), ODE_REL_TOL * offStart.get(0));
        assertEquals(closed.turnOff() / NS, offEnd.get(0), ODE_REL_TOL * offEnd.get(0));
    }

    @Test
    void currentRiseAndFallMatchTheRcChargeBetweenThresholdAndPlateau() {
        // plain circuit theory: on an RC charge toward V, the time between levels a and b is
        // τ·ln((V − a)/(V − b)); checked against the sum of the delay split at V_th
        double r = 6.2;
        double c = 3.9 * NF;
        double toTh = r * c * Math.log(12 / (12 - 2.0));
        assertEquals(SwitchingTimes.delayOn(r, c, 12, 3, 0) - toTh,
                SwitchingTimes.currentRise(r, c, 12, 2.0, 3), 1e-15);
        double fromPlToTh = SwitchingTimes.currentFall(r, c, 2.0, 3, 0);
        assertEquals(r * c * Math.log(3 / 2.0), fromPlToTh, 1e-15);
    }

    @Test
    void currentFallToANegativeOffLevelMatchesTheNumericalGateDischarge() {
        // commons-math3 DormandPrince853 on dQ/dt = (V_off − V_GS(Q))/R from the start of the
        // plateau (C_iss 3.9 nF, V_pl 3 V; REFERENCES §1 inputs) toward V_off = −5 V through
        // 5.2 Ω: the time the gate takes to fall to V_th 2 V, to a relative 1e-6
        GateWaveform.GateCurve curve =
                GateWaveform.GateCurve.ofInputCapacitance(3.9 * NF, 3, 6.9 * NC);
        double closed = SwitchingTimes.currentFall(5.2, 3.9 * NF, 2.0, 3, -5);
        double qTh = curve.chargeAt(2.0) / NC;
        List<Double> t = Ode.crossings(Ode.gateCharge(curve, -5, 5.2),
                new double[] {curve.plateauStartCharge() / NC}, 100, (x, y) -> y[0] - qTh, -1);
        assertEquals(t.get(0), closed / NS, ODE_REL_TOL * t.get(0));
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource({"delayOn", "delayOff", "currentRise"})
    void everyGateChargeTimeRejectsADriveLevelAtThePlateau(String quantity) {
        // the on level must exceed the plateau or the gate never leaves it (REFERENCES §1)
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> {
                    switch (quantity) {
                        case "delayOn" -> SwitchingTimes.delayOn(6.2, 3.9 * NF, 3, 3, 0);
                        case "delayOff" -> SwitchingTimes.delayOff(5.2, 3.9 * NF, 2.5, 3, 0);
                        default -> SwitchingTimes.currentRise(6.2, 3.9 * NF, 3, 2, 3);
                    }
                });
        assertTrue(e.getMessage().startsWith("expected on level above the plateau"),
                e.getMessage());
    }

    @Test
    void rejectsADriveLevelAtOrBelowThePlateau() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> SwitchingTimes.plateauOn(6.9 * NC, 6.2, 3, 3));
        assertTrue(e.getMessage().startsWith("expected on level above the plateau"),
                e.getMessage());
        assertTrue(e.getMessage().contains("got 3.0 and 3.0"), e.getMessage());
    }

    @Test
    void rejectsNegativeResistanceAndPositiveOffLevel() {
        assertTrue(assertThrows(IllegalArgumentException.class,
                () -> SwitchingTimes.delayOn(-1, 3.9 * NF, 12, 3, 0)).getMessage()
                .equals("expected turn-on resistance R_on >= 0 Ω, got -1.0"));
        assertTrue(assertThrows(IllegalArgumentException.class,
                () -> SwitchingTimes.plateauOff(1 * NC, 1, 3, 2)).getMessage()
                .equals("expected off level V_off <= 0 V, got 2.0"));
    }
}
