package org.gatefit.physics;

/**
 * Switching-time estimates for a gate driven through a resistance from a stiff source, with a
 * constant Miller plateau.
 *
 * <p>Model (plain circuit theory on the gate RC; the plateau treatment follows the gate-drive
 * chapter of Mohan, Undeland, Robbins, <i>Power Electronics</i>, 3rd ed.):
 * <ul>
 *   <li>Outside the plateau the gate is a capacitor C_iss charged through R, so the gate voltage
 *       moves exponentially toward the drive level with time constant R·C_iss.</li>
 *   <li>On the plateau the gate voltage is held at V_plateau while Q_gd flows; the current is
 *       constant, (V_on − V_plateau)/R_on at turn-on and (V_plateau − V_off)/R_off at
 *       turn-off, so the plateau lasts Q_gd·R / ΔV. The drain voltage swings during this time,
 *       so it is the voltage edge.</li>
 * </ul>
 * Resistances are loop totals (driver + external + internal). Assumes a constant C_iss and a flat
 * plateau; real C_iss varies with V_DS, so treat results as estimates. Turn-off is the slower edge
 * whenever V_plateau &lt; V_on / 2 (with V_off = 0 and equal resistances).
 */
public final class SwitchingTimes {

    private SwitchingTimes() {
    }

    /**
     * Plateau (drain-voltage transition) time at a given plateau current: {@code t = Q_gd / I}.
     * With the plateau current of {@link DriveCurrent#plateau} this is {@link #plateauOn} /
     * {@link #plateauOff} where the driver is resistive, and longer where its rated peak caps the
     * current (REFERENCES.md §8: Q_gd 120 nC at 1.277 A → 94.0 ns).
     *
     * @param qgd Miller charge Q_gd, C (≥ 0)
     * @param current gate current on the plateau, A (&gt; 0)
     * @return plateau time, s
     */
    public static double plateauTime(double qgd, double current) {
        Require.nonNegative("gate-drain charge Q_gd", "C", qgd);
        Require.positive("plateau gate current", "A", current);
        return qgd / current;
    }

    /**
     * Turn-on plateau (voltage-fall) time {@code t = Q_gd·R_on / (V_on − V_plateau)}.
     *
     * @param qgd Miller charge Q_gd, C (≥ 0)
     * @param rOn total turn-on loop resistance, Ω (≥ 0)
     * @param vOn on level, V (must exceed V_plateau)
     * @param vPlateau plateau voltage, V (&gt; 0)
     * @return plateau time, s
     */
    public static double plateauOn(double qgd, double rOn, double vOn, double vPlateau) {
        Require.nonNegative("gate-drain charge Q_gd", "C", qgd);
        Require.nonNegative("turn-on resistance R_on", "Ω", rOn);
        levelsOn(vOn, vPlateau);
        return qgd * rOn / (vOn - vPlateau);
    }

    /**
     * Turn-off plateau (voltage-rise) time {@code t = Q_gd·R_off / (V_plateau − V_off)}.
     *
     * @param qgd Miller charge Q_gd, C (≥ 0)
     * @param rOff total turn-off loop resistance, Ω (≥ 0)
     * @param vPlateau plateau voltage, V (&gt; 0)
     * @param vOff off level, V (≤ 0)
     * @return plateau time, s
     */
    public static double plateauOff(double qgd, double rOff, double vPlateau, double vOff) {
        Require.nonNegative("gate-drain charge Q_gd", "C", qgd);
        Require.nonNegative("turn-off resistance R_off", "Ω", rOff);
        Require.positive("plateau voltage V_plateau", "V", vPlateau);
        Require.nonPositive("off level V_off", "V", vOff);
        return qgd * rOff / (vPlateau - vOff);
    }

    /**
     * Turn-on delay from the off level to the plateau,
     * {@code t_d(on) = R_on·C_iss·ln((V_on − V_off) / (V_on − V_plateau))}; with V_off = 0 this is
     * R·C_iss·ln(V_on / (V_on − V_plateau)).
     *
     * @return delay to plateau, s
     */
    public static double delayOn(double rOn, double cIss, double vOn, double vPlateau,
            double vOff) {
        Require.nonNegative("turn-on resistance R_on", "Ω", rOn);
        Require.nonNegative("input capacitance C_iss", "F", cIss);
        levelsOn(vOn, vPlateau);
        Require.nonPositive("off level V_off", "V", vOff);
        return rOn * cIss * Math.log((vOn - vOff) / (vOn - vPlateau));
    }

    /**
     * Turn-off delay from the on level down to the plateau,
     * {@code t_d(off) = R_off·C_iss·ln((V_on − V_off) / (V_plateau − V_off))}; with V_off = 0
     * this is R·C_iss·ln(V_on / V_plateau).
     *
     * @return delay to plateau, s
     */
    public static double delayOff(double rOff, double cIss, double vOn, double vPlateau,
            double vOff) {
        Require.nonNegative("turn-off resistance R_off", "Ω", rOff);
        Require.nonNegative("input capacitance C_iss", "F", cIss);
        levelsOn(vOn, vPlateau);
        Require.nonPositive("off level V_off", "V", vOff);
        return rOff * cIss * Math.log((vOn - vOff) / (vPlateau - vOff));
    }

    /**
     * Current-rise time at turn-on, from threshold to plateau (the drain current rises while the
     * gate climbs from V_th to V_plateau): {@code R_on·C_iss·ln((V_on − V_th)/(V_on − V_plateau))}.
     *
     * @param vTh threshold voltage, V (0 &lt; V_th ≤ V_plateau)
     * @return current-rise time, s
     */
    public static double currentRise(double rOn, double cIss, double vOn, double vTh,
            double vPlateau) {
        Require.nonNegative("turn-on resistance R_on", "Ω", rOn);
        Require.nonNegative("input capacitance C_iss", "F", cIss);
        levelsOn(vOn, vPlateau);
        Require.inRange("threshold V_th", "V", vTh, 0, vPlateau);
        return rOn * cIss * Math.log((vOn - vTh) / (vOn - vPlateau));
    }

    /**
     * Current-fall time at turn-off, from plateau down to threshold:
     * {@code R_off·C_iss·ln((V_plateau − V_off)/(V_th − V_off))}.
     *
     * @param vTh threshold voltage, V (0 &lt; V_th ≤ V_plateau)
     * @return current-fall time, s
     */
    public static double currentFall(double rOff, double cIss, double vTh, double vPlateau,
            double vOff) {
        Require.nonNegative("turn-off resistance R_off", "Ω", rOff);
        Require.nonNegative("input capacitance C_iss", "F", cIss);
        Require.positive("plateau voltage V_plateau", "V", vPlateau);
        Require.nonPositive("off level V_off", "V", vOff);
        Require.inRange("threshold V_th", "V", vTh, Double.MIN_VALUE, vPlateau);
        return rOff * cIss * Math.log((vPlateau - vOff) / (vTh - vOff));
    }

    /**
     * All four estimates at once.
     *
     * @param qgd Miller charge, C
     * @param cIss input capacitance, F
     * @param vPlateau plateau voltage, V
     * @param vOn on level, V
     * @param vOff off level, V (≤ 0)
     * @param rOn total turn-on loop resistance, Ω
     * @param rOff total turn-off loop resistance, Ω
     * @return delays and plateau times
     */
    public static Times estimate(double qgd, double cIss, double vPlateau, double vOn,
            double vOff, double rOn, double rOff) {
        return new Times(delayOn(rOn, cIss, vOn, vPlateau, vOff),
                plateauOn(qgd, rOn, vOn, vPlateau),
                delayOff(rOff, cIss, vOn, vPlateau, vOff),
                plateauOff(qgd, rOff, vPlateau, vOff));
    }

    private static void levelsOn(double vOn, double vPlateau) {
        Require.positive("plateau voltage V_plateau", "V", vPlateau);
        Require.finite("on level V_on", "V", vOn);
        Require.greater("on level above the plateau (V_on, V_plateau)", vOn, vPlateau);
    }

    /**
     * Switching-time estimates, s.
     *
     * @param delayOn delay from off level to plateau at turn-on
     * @param plateauOn plateau (drain-voltage fall) time at turn-on
     * @param delayOff delay from on level to plateau at turn-off
     * @param plateauOff plateau (drain-voltage rise) time at turn-off
     */
    public record Times(double delayOn, double plateauOn, double delayOff, double plateauOff) {
        public Times {
            Require.nonNegative("turn-on delay", "s", delayOn);
            Require.nonNegative("turn-on plateau time", "s", plateauOn);
            Require.nonNegative("turn-off delay", "s", delayOff);
            Require.nonNegative("turn-off plateau time", "s", plateauOff);
        }

        /** Delay plus plateau at turn-on, s. */
        public double turnOn() {
            return delayOn + plateauOn;
        }

        /** Delay plus plateau at turn-off, s. */
        public double turnOff() {
            return delayOff + plateauOff;
        }
    }
}
