package org.gatefit.physics;

import java.util.Arrays;

/**
 * Gate waveform model V_GS(t), I_G(t) for one turn-on or turn-off edge, for reports to plot.
 *
 * <p>The gate is a piecewise-linear charge curve ({@link GateCurve}) driven from a stiff source
 * through a total loop resistance R (driver + external + internal); loop inductance is ignored
 * (see {@link GateLoop} for ringing). Charge flows as {@code dQ/dt = (V_drive − V_GS(Q)) / R},
 * which has a closed-form solution piece by piece:
 * <ol>
 *   <li>before the plateau, an exponential toward the drive level with τ = R·C of that piece;</li>
 *   <li>on the plateau, V_GS = V_plateau and a constant current |V_drive − V_plateau| / R for
 *       Q_gd·R / |V_drive − V_plateau|;</li>
 *   <li>after the plateau, an exponential toward the drive level with τ = R·C of the next
 *       piece.</li>
 * </ol>
 * Source: plain circuit theory; the three-phase picture is the one in the gate-drive chapter of
 * Mohan, Undeland, Robbins, <i>Power Electronics</i>, 3rd ed. Current is positive into the gate
 * (sourced) and negative out of it (sunk).
 */
public final class GateWaveform {

    private GateWaveform() {
    }

    /**
     * The turn-on edge: the gate starts at {@code vOff} and is driven toward {@code vOn}.
     *
     * @param curve gate-charge curve
     * @param vOn on level, V (above the plateau)
     * @param vOff off level, V (≤ 0)
     * @param resistance total turn-on loop resistance, Ω (&gt; 0)
     */
    public static Edge turnOn(GateCurve curve, double vOn, double vOff, double resistance) {
        return new Edge(curve, true, vOn, vOff, resistance);
    }

    /**
     * The turn-off edge: the gate starts at {@code vOn} and is driven toward {@code vOff}.
     *
     * @param resistance total turn-off loop resistance, Ω (&gt; 0)
     */
    public static Edge turnOff(GateCurve curve, double vOn, double vOff, double resistance) {
        return new Edge(curve, false, vOn, vOff, resistance);
    }

    /**
     * A piecewise-linear gate-charge curve: capacitance {@code cBelow} from the off level up to the
     * plateau, a plateau of {@code qgd} at {@code vPlateau}, capacitance {@code cAbove} above it.
     *
     * @param cBelow incremental gate capacitance below the plateau, F (&gt; 0)
     * @param vPlateau Miller plateau voltage, V (&gt; 0)
     * @param qgd Miller charge, C (≥ 0)
     * @param cAbove incremental gate capacitance above the plateau, F (&gt; 0)
     */
    public record GateCurve(double cBelow, double vPlateau, double qgd, double cAbove) {
        public GateCurve {
            Require.positive("capacitance below the plateau", "F", cBelow);
            Require.positive("plateau voltage V_plateau", "V", vPlateau);
            Require.nonNegative("gate-drain charge Q_gd", "C", qgd);
            Require.positive("capacitance above the plateau", "F", cAbove);
        }

        /**
         * The curve with C_iss on both sides of the plateau, matching the delay formulas of
         * {@link SwitchingTimes}.
         */
        public static GateCurve ofInputCapacitance(double cIss, double vPlateau, double qgd) {
            return new GateCurve(cIss, vPlateau, qgd, cIss);
        }

        /**
         * The curve through the datasheet gate-charge points: C_below = Q_gs / V_plateau,
         * C_above = (Q_g − Q_gs − Q_gd) / (V_spec − V_plateau).
         */
        public static GateCurve fromGateCharge(double qg, double qgs, double qgd, double vSpec,
                double vPlateau) {
            double above = GateCharge.aboveSlope(qg, qgs, qgd, vSpec, vPlateau);
            Require.positive("gate-source charge Q_gs", "C", qgs);
            return new GateCurve(qgs / vPlateau, vPlateau, qgd, above);
        }

        /** Charge at the start of the plateau, measured from V_GS = 0, C. */
        public double plateauStartCharge() {
            return cBelow * vPlateau;
        }

        /**
         * Gate voltage for a gate charge measured from V_GS = 0 (negative charge below 0 V):
         * the inverse of the curve, continuous and non-decreasing.
         *
         * @param charge gate charge, C (finite)
         * @return V_GS, V
         */
        public double voltageAt(double charge) {
            Require.finite("gate charge", "C", charge);
            double q1 = plateauStartCharge();
            if (charge <= q1) {
                return charge / cBelow;
            }
            if (charge <= q1 + qgd) {
                return vPlateau;
            }
            return vPlateau + (charge - q1 - qgd) / cAbove;
        }

        /**
         * Gate charge at a gate voltage off the plateau (measured from V_GS = 0); at exactly
         * V_plateau returns the charge at the start of the plateau.
         */
        public double chargeAt(double voltage) {
            Require.finite("gate voltage", "V", voltage);
            if (voltage <= vPlateau) {
                return voltage * cBelow;
            }
            return plateauStartCharge() + qgd + (voltage - vPlateau) * cAbove;
        }
    }

    /**
     * One edge of the gate waveform, solved in closed form.
     *
     * @param curve gate-charge curve
     * @param rising true for turn-on (off level → on level), false for turn-off
     * @param vOn on level, V (above the plateau)
     * @param vOff off level, V (≤ 0)
     * @param resistance total loop resistance for this edge, Ω (&gt; 0)
     */
    public record Edge(GateCurve curve, boolean rising, double vOn, double vOff,
            double resistance) {
        public Edge {
            if (curve == null) {
                throw new IllegalArgumentException("expected a gate curve, got null");
            }
            Require.finite("on level V_on", "V", vOn);
            Require.nonPositive("off level V_off", "V", vOff);
            Require.greater("on level above the plateau (V_on, V_plateau)", vOn, curve.vPlateau());
            Require.positive("gate loop resistance", "Ω", resistance);
        }

        private double tauBefore() {
            return resistance * (rising ? curve.cBelow() : curve.cAbove());
        }

        private double tauAfter() {
            return resistance * (rising ? curve.cAbove() : curve.cBelow());
        }

        private double target() {
            return rising ? vOn : vOff;
        }

        private double initial() {
            return rising ? vOff : vOn;
        }

        /** Time at which the gate reaches the plateau (the delay), s. */
        public double plateauStart() {
            double vp = curve.vPlateau();
            return tauBefore() * Math.log((target() - initial()) / (target() - vp));
        }

        /** Duration of the plateau, s. */
        public double plateauDuration() {
            return curve.qgd() * resistance / Math.abs(target() - curve.vPlateau());
        }

        /** Time at which the gate leaves the plateau, s. */
        public double plateauEnd() {
            return plateauStart() + plateauDuration();
        }

        /**
         * Gate-source voltage at time t after the edge starts.
         *
         * @param t time, s (≥ 0)
         * @return V_GS, V
         */
        public double voltage(double t) {
            Require.nonNegative("time", "s", t);
            double vp = curve.vPlateau();
            double t1 = plateauStart();
            if (t < t1) {
                return target() - (target() - initial()) * Math.exp(-t / tauBefore());
            }
            double t2 = t1 + plateauDuration();
            if (t < t2) {
                return vp;
            }
            return target() - (target() - vp) * Math.exp(-(t - t2) / tauAfter());
        }

        /**
         * Gate current at time t, {@code (V_drive − V_GS(t)) / R}; positive into the gate.
         *
         * @param t time, s (≥ 0)
         * @return I_G, A
         */
        public double current(double t) {
            return (target() - voltage(t)) / resistance;
        }

        /**
         * The edge sampled at {@code samples} evenly spaced times from 0 to {@code duration}.
         *
         * @param duration last sample time, s (&gt; 0)
         * @param samples number of samples (≥ 2)
         * @return sampled time, V_GS and I_G series
         */
        public Waveform sample(double duration, int samples) {
            Require.positive("waveform duration", "s", duration);
            if (samples < 2) {
                throw new IllegalArgumentException("expected at least 2 samples, got " + samples);
            }
            double[] t = new double[samples];
            double[] v = new double[samples];
            double[] i = new double[samples];
            for (int k = 0; k < samples; k++) {
                t[k] = duration * k / (samples - 1);
                v[k] = voltage(t[k]);
                i[k] = (target() - v[k]) / resistance;
            }
            return new Waveform(t, v, i);
        }

        /** The edge sampled over a duration long enough to settle (plateau end + 5 τ). */
        public Waveform sample(int samples) {
            return sample(plateauEnd() + 5 * tauAfter(), samples);
        }
    }

    /**
     * A sampled gate waveform. The arrays are copied in and out.
     *
     * @param time sample times, s
     * @param gateVoltage V_GS at each time, V
     * @param gateCurrent I_G at each time, A (positive into the gate)
     */
    public record Waveform(double[] time, double[] gateVoltage, double[] gateCurrent) {
        public Waveform {
            if (time == null || gateVoltage == null || gateCurrent == null) {
                throw new IllegalArgumentException("expected three sample arrays, got null");
            }
            if (time.length != gateVoltage.length || time.length != gateCurrent.length) {
                throw new IllegalArgumentException("expected arrays of equal length, got "
                        + time.length + ", " + gateVoltage.length + ", " + gateCurrent.length);
            }
            time = time.clone();
            gateVoltage = gateVoltage.clone();
            gateCurrent = gateCurrent.clone();
        }

        @Override
        public double[] time() {
            return time.clone();
        }

        @Override
        public double[] gateVoltage() {
            return gateVoltage.clone();
        }

        @Override
        public double[] gateCurrent() {
            return gateCurrent.clone();
        }

        /** Number of samples. */
        public int size() {
            return time.length;
        }

        @Override
        public boolean equals(Object o) {
            return o instanceof Waveform w && Arrays.equals(time, w.time)
                    && Arrays.equals(gateVoltage, w.gateVoltage)
                    && Arrays.equals(gateCurrent, w.gateCurrent);
        }

        @Override
        public int hashCode() {
            return 31 * (31 * Arrays.hashCode(time) + Arrays.hashCode(gateVoltage))
                    + Arrays.hashCode(gateCurrent);
        }

        @Override
        public String toString() {
            return "Waveform[" + time.length + " samples]";
        }
    }
}
