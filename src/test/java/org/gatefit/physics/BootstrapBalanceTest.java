package org.gatefit.physics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.ode.FirstOrderDifferentialEquations;
import org.junit.jupiter.api.Test;

/**
 * The bootstrap charge balance (REFERENCES.md §9) against a cycle-by-cycle simulation: the
 * capacitor loses Q_g + Q_ls at each turn-on and the drain I over the on time, and while the
 * switch node is low charges through R_boot and an ideal diode (V_F taken off the supply) with the
 * drain still drawn — integrated numerically with commons-math3's Dormand–Prince 8(5,3) for
 * thousands of cycles until it repeats. The closed form's fixed point and duty limit must agree
 * with it.
 */
class BootstrapBalanceTest {

    /** REFERENCES §4's charge check values: 44 nC + 2.5 nC level shift, 100 µA, V_DD 12 V, V_F 0.7 V, R 2.2 Ω, C 100 nF. */
    private static final double VS = 12 - 0.7;
    private static final double R = 2.2;
    private static final double C = 100e-9;
    private static final double QFIXED = 44e-9 + 2.5e-9;
    private static final double I = 100e-6;
    private static final double F = 100e3;

    /** The simulated lowest voltage (just before the refresh) once the cycles repeat, V. */
    static double simulatedLowest(double duty) {
        double cNf = C * 1e9;
        double tOnNs = duty / F * 1e9;
        double tOffNs = (1 - duty) / F * 1e9;
        FirstOrderDifferentialEquations off = new FirstOrderDifferentialEquations() {
            @Override
            public int getDimension() {
                return 1;
            }

            @Override
            public void computeDerivatives(double t, double[] y, double[] dy) {
                double charge = Math.max(0, VS - y[0]) / R; // ideal diode: conducts only toward the supply
                dy[0] = (charge - I) / cNf; // A / nF = V/ns
            }
        };
        double v = VS;
        double low = Double.NaN;
        for (int cycle = 0; cycle < 4000; cycle++) {
            v -= QFIXED / C; // turn-on: the gate and the level shifter take their charge
            v -= I * tOnNs * 1e-9 / C; // the drain over the on time
            double before = low;
            low = v;
            v = Ode.solve(off, new double[] {v}, tOffNs)[0];
            if (Math.abs(low - before) < 1e-12) {
                break;
            }
        }
        return low;
    }

    @Test
    void theClosedFormLowestVoltageIsTheSimulatedSteadyState() {
        // Closed form by hand: k = e^(−0.5 µs / 0.22 µs) = 0.10303; Q_on = 46.5 nC + 100 µA·9.5 µs = 47.45 nC;
        // V_lo = 11.3 − 100 µA·2.2 Ω − 47.45 nC / (100 nF·0.89697) = 10.7708 V (computed, REFERENCES §9 balance).
        double closed = Bootstrap.steadyLowest(VS, R, C, QFIXED + I * 0.95 / F, I, 0.05 / F);
        assertEquals(10.7708, closed, 1e-4);
        assertEquals(simulatedLowest(0.95), closed, 1e-6);
        for (double d : new double[] {0.2, 0.5, 0.8, 0.97, 0.99}) {
            assertEquals(simulatedLowest(d), Bootstrap.steadyLowest(VS, R, C, QFIXED + I * d / F, I, (1 - d) / F), 1e-6,
                    "duty " + d);
        }
    }

    @Test
    void theDutyLimitIsWhereTheSimulatedLowestVoltageMeetsTheFloor() {
        double floor = 10.8;
        double dMax = Bootstrap.maxDutyChargeBalance(VS, floor, R, C, QFIXED, I, F);
        assertTrue(dMax > 0.5 && dMax < 0.95, "duty limit " + dMax);
        assertTrue(simulatedLowest(dMax - 0.002) >= floor, "just below the limit the high side stays up");
        assertTrue(simulatedLowest(dMax + 0.002) < floor, "just above the limit it sags below the floor");
        // Far more lenient than three time constants of the same capacitor (REFERENCES §4 rule of thumb): 1 − 3·0.22 µs·100 kHz = 0.934.
        assertTrue(dMax > Bootstrap.maxDuty(Bootstrap.refreshTime(R, C, 3), F));
    }

    @Test
    void withoutResistanceTheCapacitorRefreshesFullyAndNeverRefreshedIsMinusInfinity() {
        assertEquals(VS - QFIXED / C, Bootstrap.steadyLowest(VS, 0, C, QFIXED, I, 1e-6), 1e-12);
        assertEquals(Double.NEGATIVE_INFINITY, Bootstrap.steadyLowest(VS, R, C, QFIXED, I, 0));
        assertEquals(0, Bootstrap.maxDutyChargeBalance(VS, VS, R, C, QFIXED, I, F));
    }

    /** The duty at which the steady lowest voltage meets the floor, by commons-math3's Brent solver (the reference). */
    private static double brentLimit(double vs, double floor, double r, double c, double q, double i, double f) {
        return new BrentSolver(1e-13, 1e-13).solve(500, d -> Bootstrap.steadyLowest(vs, r, c, q + i * d / f, i, (1 - d) / f)
                - floor, 0, 1 - 1e-12);
    }

    @Test
    void theDutyLimitIsBrentsRootOfTheBalance() {
        // The §9 values above at three floors, and a slow refresh (R_boot 20 Ω, 47 nF) that limits hard.
        double[][] cases = {{10.8, R, C}, {10.5, R, C}, {10.2, R, C}, {10.0, 20, 47e-9}, {9.0, 20, 47e-9}};
        for (double[] k : cases) {
            double newton = Bootstrap.maxDutyChargeBalance(VS, k[0], k[1], k[2], QFIXED, I, F);
            assertEquals(brentLimit(VS, k[0], k[1], k[2], QFIXED, I, F), newton, 1e-9, "floor " + k[0] + " V, R " + k[1]);
            assertTrue(Bootstrap.steadyLowest(VS, k[1], k[2], QFIXED + I * (newton - 1e-9) / F, I, (1 - newton + 1e-9) / F)
                    >= k[0], "just below the limit the high side stays up");
        }
        // Without resistance the balance is linear: d = (H·C − Q) / (I·T) with H = V_S − floor.
        assertEquals(((VS - 10.8) * C - QFIXED) / (1e-3 / F), Bootstrap.maxDutyChargeBalance(VS, 10.8, 0, C, QFIXED, 1e-3, F),
                1e-12);
    }

    @Property(tries = 300)
    void newtonFindsTheSameLimitAsBrent(@ForAll @DoubleRange(min = 0.1, max = 47) double rOhm,
            @ForAll @DoubleRange(min = 10, max = 2200) double cNf, @ForAll @DoubleRange(min = 1, max = 500) double qNc,
            @ForAll @DoubleRange(min = 0, max = 5) double iMa, @ForAll @DoubleRange(min = 5, max = 1000) double fKhz,
            @ForAll @DoubleRange(min = 0.05, max = 0.95) double floorShare) {
        double vs = 11.3;
        double floor = vs * floorShare;
        double c = cNf * 1e-9;
        double q = qNc * 1e-9;
        double i = iMa * 1e-3;
        double f = fKhz * 1e3;
        double newton = Bootstrap.maxDutyChargeBalance(vs, floor, rOhm, c, q, i, f);
        if (Bootstrap.steadyLowest(vs, rOhm, c, q, i, 1 / f) < floor) {
            assertEquals(0, newton);
            return;
        }
        double low = Bootstrap.steadyLowest(vs, rOhm, c, q + i * (1 - 1e-12) / f, i, 1e-12 / f);
        if (low >= floor) {
            assertEquals(1 - 1e-9, newton, 1e-9, "nothing limits the duty");
            return;
        }
        assertEquals(brentLimit(vs, floor, rOhm, c, q, i, f), newton, 1e-8);
    }
}
