package org.gatefit.physics;

import java.util.OptionalDouble;

/**
 * The gate loop as a series R-L-C circuit: loop resistance R (driver + external + internal),
 * loop inductance L (driver output, traces, package) and the gate capacitance C (C_iss).
 *
 * <p>Source: plain circuit theory of the series RLC (second-order step response):
 * {@code f_0 = 1/(2π√(LC))}, {@code ζ = (R/2)·√(C/L)}, critical resistance {@code 2√(L/C)}
 * (ζ = 1), damped ring frequency {@code f_d = f_0·√(1 − ζ²)}, peak overshoot of the capacitor
 * voltage {@code exp(−πζ/√(1 − ζ²))} of the step for ζ &lt; 1. A measured ring frequency gives
 * the loop inductance {@code L = 1/((2πf_R)²·C)} (light damping assumed). Treating C_iss as a
 * fixed capacitor ignores the plateau and the V_DS dependence, so results are estimates.
 * Typical loops are a few nH (tight surface-mount layout) to 10–20 nH (leaded package and wiring)
 * — from memory.
 */
public final class GateLoop {

    private GateLoop() {
    }

    /** Undamped resonance {@code f_0 = 1/(2π√(L·C))}, Hz; L in H (&gt; 0), C in F (&gt; 0). */
    public static double resonance(double inductance, double capacitance) {
        Require.positive("loop inductance L", "H", inductance);
        Require.positive("gate capacitance C", "F", capacitance);
        return 1 / (2 * Math.PI * Math.sqrt(inductance * capacitance));
    }

    /** Damping ratio {@code ζ = (R/2)·√(C/L)}, dimensionless; R in Ω (≥ 0). */
    public static double dampingRatio(double resistance, double inductance, double capacitance) {
        Require.nonNegative("loop resistance R", "Ω", resistance);
        Require.positive("loop inductance L", "H", inductance);
        Require.positive("gate capacitance C", "F", capacitance);
        return resistance / 2 * Math.sqrt(capacitance / inductance);
    }

    /** Critical loop resistance {@code R_crit = 2√(L/C)} (ζ = 1), Ω. */
    public static double criticalResistance(double inductance, double capacitance) {
        Require.positive("loop inductance L", "H", inductance);
        Require.positive("gate capacitance C", "F", capacitance);
        return 2 * Math.sqrt(inductance / capacitance);
    }

    /** Loop inductance from a measured ring frequency, {@code L = 1/((2πf_R)²·C)}, H. */
    public static double inductanceFromRing(double ringFrequency, double capacitance) {
        Require.positive("ring frequency f_R", "Hz", ringFrequency);
        Require.positive("gate capacitance C", "F", capacitance);
        double w = 2 * Math.PI * ringFrequency;
        return 1 / (w * w * capacitance);
    }

    /**
     * Peak overshoot of the step response as a fraction of the step,
     * {@code exp(−πζ/√(1 − ζ²))} for ζ &lt; 1, 0 for ζ ≥ 1.
     */
    public static double overshoot(double dampingRatio) {
        Require.nonNegative("damping ratio ζ", "", dampingRatio);
        if (dampingRatio >= 1) {
            return 0;
        }
        return Math.exp(-Math.PI * dampingRatio / Math.sqrt(1 - dampingRatio * dampingRatio));
    }

    /**
     * The damping ratio whose step response overshoots by the fraction {@code os}: the inverse of
     * {@link #overshoot}, {@code ζ = −ln(os)/√(π² + ln²(os))} (plain circuit theory).
     *
     * @param os allowed overshoot as a fraction of the step (0 &lt; os &lt; 1)
     * @return damping ratio ζ (0 &lt; ζ &lt; 1)
     */
    public static double dampingForOvershoot(double os) {
        Require.inRange("overshoot", "", os, Double.MIN_VALUE, Math.nextDown(1.0));
        double l = Math.log(os);
        return -l / Math.sqrt(Math.PI * Math.PI + l * l);
    }

    /**
     * Peak gate voltage of a step from {@code from} to {@code to} through the series RLC: the step
     * plus its overshoot, {@code to + (to − from)·exp(−πζ/√(1 − ζ²))}. For a falling step (turn-off)
     * it is the undershoot below {@code to}. Plain circuit theory (second-order step response;
     * REFERENCES.md §3 and §8: ζ 0.2 → 52.7 %, 0.5 → 16.3 %, 0.7 → 4.6 %).
     *
     * @param resistance loop resistance R_driver + R_g + R_g,int, Ω (≥ 0)
     * @param inductance loop inductance, H (&gt; 0)
     * @param capacitance gate capacitance (C_iss of the switches on the output), F (&gt; 0)
     * @param from level before the step, V
     * @param to level the driver steps to, V
     * @return the extreme gate voltage of the first swing, V
     */
    public static double extreme(double resistance, double inductance, double capacitance, double from, double to) {
        return extreme(dampingRatio(resistance, inductance, capacitance), from, to);
    }

    /** {@link #extreme} of a loop whose damping ratio ζ is already known ({@link #dampingRatio}). */
    public static double extreme(double dampingRatio, double from, double to) {
        Require.finite("level before the step", "V", from);
        Require.finite("level after the step", "V", to);
        return to + (to - from) * overshoot(dampingRatio);
    }

    /**
     * Damped ring frequency {@code f_d = f_0·√(1 − ζ²)}, Hz; 0 when ζ ≥ 1 (no ringing).
     */
    public static double ringFrequency(double resistance, double inductance,
            double capacitance) {
        double z = dampingRatio(resistance, inductance, capacitance);
        if (z >= 1) {
            return 0;
        }
        return resonance(inductance, capacitance) * Math.sqrt(1 - z * z);
    }

    /**
     * Capacitor (gate) voltage of the series RLC at time t after a step of {@code step} volts,
     * starting from rest; closed form for under-, critically and over-damped loops.
     *
     * @param step step amplitude, V (finite)
     * @param t time after the step, s (≥ 0)
     * @return gate voltage, V
     */
    public static double stepResponse(double resistance, double inductance, double capacitance,
            double step, double t) {
        Require.finite("step amplitude", "V", step);
        Require.nonNegative("time", "s", t);
        double z = dampingRatio(resistance, inductance, capacitance);
        double w0 = 2 * Math.PI * resonance(inductance, capacitance);
        if (Math.abs(z - 1) < 1e-9) {
            return step * (1 - Math.exp(-w0 * t) * (1 + w0 * t));
        }
        if (z < 1) {
            double root = Math.sqrt(1 - z * z);
            double wd = w0 * root;
            return step * (1 - Math.exp(-z * w0 * t)
                    * (Math.cos(wd * t) + z / root * Math.sin(wd * t)));
        }
        double root = Math.sqrt(z * z - 1);
        double s1 = -w0 * (z - root);
        double s2 = -w0 * (z + root);
        return step * (1 + (s2 * Math.exp(s1 * t) - s1 * Math.exp(s2 * t)) / (s1 - s2));
    }

    /**
     * Summary of the loop's step response.
     *
     * @param step step amplitude, V
     * @return resonance, damping, overshoot, peak voltage and ring frequency
     */
    public static Ringing ringing(double resistance, double inductance, double capacitance,
            double step) {
        Require.finite("step amplitude", "V", step);
        double z = dampingRatio(resistance, inductance, capacitance);
        double os = overshoot(z);
        return new Ringing(resonance(inductance, capacitance), z, os, step * (1 + os),
                ringFrequency(resistance, inductance, capacitance));
    }

    /**
     * The external gate-resistor range that meets both a damping target and an edge-time
     * target.
     *
     * <p>Damping: the loop total must reach {@code ζ_target·R_crit}, so
     * {@code R_ext ≥ ζ_target·2√(L/C) − R_fixed}. Edge: the drain-voltage edge is the Miller
     * plateau, lasting {@code Q_gd·R_total / ΔV_plateau}, so
     * {@code R_ext ≤ t_edge·ΔV_plateau / Q_gd − R_fixed}. ΔV_plateau is the voltage across the
     * loop on the plateau: V_on − V_plateau for turn-on, V_plateau − V_off for turn-off. A larger
     * resistor damps more and slows the edge, so the range may be empty ({@link
     * ResistorRange#feasible()} false). Sources: plain circuit theory; REFERENCES §1 and §3.
     *
     * @param inductance loop inductance, H
     * @param capacitance gate capacitance (C_iss), F
     * @param dampingTarget required ζ (&gt; 0; 0.7–1 is usual)
     * @param fixedResistance driver output plus internal gate resistance, Ω (≥ 0)
     * @param qgd Miller charge, C (&gt; 0)
     * @param plateauDrive voltage across the loop on the plateau, V (&gt; 0)
     * @param edgeTime longest acceptable plateau (edge) time, s (&gt; 0)
     * @return the external-resistor range, Ω
     */
    public static ResistorRange resistorRange(double inductance, double capacitance,
            double dampingTarget, double fixedResistance, double qgd, double plateauDrive,
            double edgeTime) {
        Require.positive("damping target ζ", "", dampingTarget);
        Require.nonNegative("fixed loop resistance", "Ω", fixedResistance);
        Require.positive("gate-drain charge Q_gd", "C", qgd);
        Require.positive("plateau drive voltage", "V", plateauDrive);
        Require.positive("edge time target", "s", edgeTime);
        double min = Math.max(0,
                dampingTarget * criticalResistance(inductance, capacitance) - fixedResistance);
        double max = edgeTime * plateauDrive / qgd - fixedResistance;
        return new ResistorRange(min, max);
    }

    /**
     * Step-response summary.
     *
     * @param resonance undamped f_0, Hz
     * @param dampingRatio ζ
     * @param overshoot peak overshoot as a fraction of the step (0 when ζ ≥ 1)
     * @param peak peak gate voltage, V
     * @param ringFrequency damped ring frequency, Hz (0 when ζ ≥ 1)
     */
    public record Ringing(double resonance, double dampingRatio, double overshoot, double peak,
            double ringFrequency) {
        public Ringing {
            Require.positive("resonance", "Hz", resonance);
            Require.nonNegative("damping ratio", "", dampingRatio);
            Require.inRange("overshoot", "", overshoot, 0, 1);
            Require.finite("peak voltage", "V", peak);
            Require.nonNegative("ring frequency", "Hz", ringFrequency);
        }
    }

    /**
     * A range of external gate resistance, Ω. {@code max} may be below {@code min} (even
     * negative) when no resistor meets both targets.
     *
     * @param min smallest resistor meeting the damping target, Ω (≥ 0)
     * @param max largest resistor meeting the edge target, Ω
     */
    public record ResistorRange(double min, double max) {
        public ResistorRange {
            Require.nonNegative("minimum resistance", "Ω", min);
            Require.finite("maximum resistance", "Ω", max);
        }

        /** True when some resistance meets both targets. */
        public boolean feasible() {
            return max >= min;
        }

        /**
         * The smallest value of the series inside the range (fastest edge that still damps
         * enough); 0 when the fixed resistance already damps enough (no resistor or a 0 Ω
         * link); empty when the series has no value in the range.
         */
        public OptionalDouble pick(ESeries series) {
            if (!feasible()) {
                return OptionalDouble.empty();
            }
            if (min == 0) {
                return OptionalDouble.of(0);
            }
            double v = series.roundUp(min);
            return v <= max ? OptionalDouble.of(v) : OptionalDouble.empty();
        }
    }
}
