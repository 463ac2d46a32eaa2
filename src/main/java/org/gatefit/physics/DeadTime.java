package org.gatefit.physics;

/**
 * Minimum dead time between the two switches of a half bridge (common practice, no source): the
 * outgoing switch must finish turning off before the incoming one starts to conduct, with the
 * worst-case spread of both and of the driver channels,
 * {@code t_dead > t_d(off),max + t_f,max − t_d(on),min + t_mismatch}.
 */
public final class DeadTime {

    private DeadTime() {
    }

    /**
     * Minimum dead time, clamped at zero (a negative result means the delays alone already
     * separate the edges).
     *
     * @param turnOffDelayMax longest turn-off delay of the outgoing switch, s (≥ 0)
     * @param fallTimeMax longest current-fall time of the outgoing switch, s (≥ 0)
     * @param turnOnDelayMin shortest turn-on delay of the incoming switch, s (≥ 0)
     * @param driverMismatch driver propagation-delay mismatch between channels, s (≥ 0)
     * @return minimum dead time, s
     */
    public static double minimum(double turnOffDelayMax, double fallTimeMax,
            double turnOnDelayMin, double driverMismatch) {
        Require.nonNegative("turn-off delay", "s", turnOffDelayMax);
        Require.nonNegative("fall time", "s", fallTimeMax);
        Require.nonNegative("turn-on delay", "s", turnOnDelayMin);
        Require.nonNegative("delay mismatch", "s", driverMismatch);
        return Math.max(0, turnOffDelayMax + fallTimeMax - turnOnDelayMin + driverMismatch);
    }

    /**
     * Gate capacitance above the Miller plateau, from the gate-charge curve:
     * {@code C_above = (Q_g − Q_gs − Q_gd) / (V_spec − V_plateau)}, the slope of the curve's last
     * segment (REFERENCES.md §8). Once the channel is formed the oxide capacitance dominates, so this
     * exceeds C_iss; a turn-off delay computed with C_iss is too short.
     *
     * @param qg total gate charge at V_spec, C (&gt; 0)
     * @param qgs gate-source charge (to the plateau), C (≥ 0)
     * @param qgd gate-drain charge (the plateau), C (≥ 0)
     * @param vSpec gate voltage Q_g is specified at, V (above the plateau)
     * @param vPlateau plateau voltage, V (&gt; 0)
     * @return capacitance above the plateau, F
     */
    public static double capacitanceAbovePlateau(double qg, double qgs, double qgd, double vSpec, double vPlateau) {
        Require.positive("gate charge Q_g", "C", qg);
        Require.nonNegative("gate-source charge Q_gs", "C", qgs);
        Require.nonNegative("gate-drain charge Q_gd", "C", qgd);
        Require.positive("plateau voltage V_plateau", "V", vPlateau);
        Require.finite("gate voltage of Q_g", "V", vSpec);
        Require.greater("Q_g's gate voltage above the plateau (V_spec, V_plateau)", vSpec, vPlateau);
        Require.positive("charge above the plateau Q_g − Q_gs − Q_gd", "C", qg - qgs - qgd);
        return (qg - qgs - qgd) / (vSpec - vPlateau);
    }

    /**
     * Time for a gate driven through R toward {@code target} to move from {@code from} to
     * {@code to} with capacitance C: {@code R·C·ln((target − from)/(target − to))} (plain circuit
     * theory, first-order RC). Used for the turn-off delay (on level down to the plateau, C above the
     * plateau), the current fall (plateau down to V_th, C below it) and the incoming switch's delay
     * to V_th.
     *
     * @param r loop resistance, Ω (≥ 0)
     * @param c gate capacitance over the segment, F (≥ 0)
     * @param target level the driver pulls toward, V
     * @param from gate voltage at the start, V
     * @param to gate voltage at the end, V (strictly between from and target, or equal to from)
     * @return time, s
     */
    public static double rcSegment(double r, double c, double target, double from, double to) {
        Require.nonNegative("loop resistance", "Ω", r);
        Require.nonNegative("gate capacitance", "F", c);
        Require.finite("drive level", "V", target);
        Require.finite("start voltage", "V", from);
        Require.finite("end voltage", "V", to);
        double a = target - from;
        double b = target - to;
        if (a == 0 || b == 0 || Math.signum(a) != Math.signum(b) || Math.abs(b) > Math.abs(a)) {
            throw new IllegalArgumentException("expected the gate to move from " + from + " V toward " + target
                    + " V and reach " + to + " V on the way, got a segment it never completes");
        }
        return r * c * Math.log(a / b);
    }
}
