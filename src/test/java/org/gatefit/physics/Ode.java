package org.gatefit.physics;

import java.util.ArrayList;
import java.util.List;
import java.util.function.ToDoubleBiFunction;

import org.apache.commons.math3.ode.FirstOrderDifferentialEquations;
import org.apache.commons.math3.ode.FirstOrderIntegrator;
import org.apache.commons.math3.ode.events.EventHandler;
import org.apache.commons.math3.ode.nonstiff.DormandPrince853Integrator;

/**
 * Numerical solutions of the gate circuits with commons-math3's Dormand–Prince 8(5,3)
 * integrator, as an outside check on the closed forms. Time is in ns, charge in nC, capacitance
 * in nF, inductance in nH: with those units V, A and Ω stay consistent (1 A = 1 nC/ns,
 * 1 nH·A/ns = 1 V), which keeps the integrator's tolerances well scaled.
 */
final class Ode {

    /** Absolute and relative integrator tolerance (state units nC, V, A). */
    static final double TOL = 1e-12;

    private Ode() {
    }

    /** A fresh integrator with tight tolerances. */
    static FirstOrderIntegrator integrator() {
        return new DormandPrince853Integrator(1e-12, 0.05, TOL, TOL);
    }

    /** Integrates from y0 at t=0 to t (ns) and returns the final state. */
    static double[] solve(FirstOrderDifferentialEquations eq, double[] y0, double t) {
        double[] y = y0.clone();
        if (t == 0) {
            return y;
        }
        integrator().integrate(eq, 0, y0, t, y);
        return y;
    }

    /**
     * Times (ns) at which g(t, y) crosses zero in the given direction while integrating from 0 to
     * tEnd (ns); direction +1 rising, −1 falling, 0 both.
     */
    static List<Double> crossings(FirstOrderDifferentialEquations eq, double[] y0, double tEnd,
            ToDoubleBiFunction<Double, double[]> g, int direction) {
        List<Double> times = new ArrayList<>();
        FirstOrderIntegrator integrator = integrator();
        integrator.addEventHandler(new EventHandler() {
            @Override
            public void init(double t0, double[] y, double t) {
            }

            @Override
            public double g(double t, double[] y) {
                return g.applyAsDouble(t, y);
            }

            @Override
            public Action eventOccurred(double t, double[] y, boolean increasing) {
                if (direction == 0 || (direction > 0) == increasing) {
                    times.add(t);
                }
                return Action.CONTINUE;
            }

            @Override
            public void resetState(double t, double[] y) {
            }
        }, 0.01, 1e-12, 1000);
        integrator.integrate(eq, 0, y0.clone(), tEnd, new double[y0.length]);
        return times;
    }

    /** Gate charge (nC) driven through R toward vDrive: dQ/dt = (V_drive − V_GS(Q)) / R. */
    static FirstOrderDifferentialEquations gateCharge(GateWaveform.GateCurve curve,
            double vDrive, double r) {
        return new FirstOrderDifferentialEquations() {
            @Override
            public int getDimension() {
                return 1;
            }

            @Override
            public void computeDerivatives(double t, double[] y, double[] dy) {
                dy[0] = (vDrive - curve.voltageAt(y[0] * 1e-9)) / r;
            }
        };
    }

    /** Series RLC driven by a step: y = {v_C (V), i (A)}, L in nH, C in nF. */
    static FirstOrderDifferentialEquations seriesRlc(double r, double lNh, double cNf,
            double step) {
        return new FirstOrderDifferentialEquations() {
            @Override
            public int getDimension() {
                return 2;
            }

            @Override
            public void computeDerivatives(double t, double[] y, double[] dy) {
                dy[0] = y[1] / cNf;
                dy[1] = (step - r * y[1] - y[0]) / lNh;
            }
        };
    }

    /** Gate node during a drain ramp: C_iss·dv/dt = C_gd·s − v/R; C in nF, s in V/ns. */
    static FirstOrderDifferentialEquations millerNode(double cgdNf, double slewVPerNs, double r,
            double cissNf) {
        return new FirstOrderDifferentialEquations() {
            @Override
            public int getDimension() {
                return 1;
            }

            @Override
            public void computeDerivatives(double t, double[] y, double[] dy) {
                dy[0] = (cgdNf * slewVPerNs - y[0] / r) / cissNf;
            }
        };
    }
}
