package org.gatefit.physics;

/**
 * Bootstrap supply for a high-side driver: a capacitor charged through a diode (and often a
 * series resistor) from V_DD while the switch node is low, which then feeds the floating high side.
 *
 * <p>Method (plain circuit theory plus common practice; REFERENCES §4):
 * <ul>
 *   <li>Charge drawn per cycle {@code Q = Q_g + I_qbs·t_on,max + Q_ls + I_leak·t_on,max}.</li>
 *   <li>{@code C_boot ≥ Q / ΔV}, with ΔV the droop allowed before the high side drops out:
 *       at most {@code V_DD − V_F − V_UVLO,hs(off)}.</li>
 *   <li>Choose several times the minimum (common practice, no source; {@link
 *       #RECOMMENDED_FACTOR}) rounded up to an IEC 60063 E-series value, and decouple V_DD
 *       with about ten times C_boot (common practice).</li>
 *   <li>Refresh: the capacitor charges only while the switch node is low, so 100 % duty is
 *       impossible; with an n·τ refresh ({@code τ = R_boot·C_boot}),
 *       {@code D_max ≈ 1 − n·τ·f}.</li>
 *   <li>First-charge inrush {@code (V_DD − V_F) / R_boot}.</li>
 *   <li>The diode blocks the bus voltage when the switch node is high, so its reverse rating must
 *       be at least V_bus (plus any switch-node overshoot); use a fast- or ultrafast-recovery
 *       part.</li>
 * </ul>
 */
public final class Bootstrap {

    /** Common practice, no source: choose C_boot about this many times the minimum. */
    public static final double RECOMMENDED_FACTOR = 3;

    /** Common practice, no source: the V_DD decoupling capacitor is about ten times C_boot. */
    public static final double DECOUPLING_FACTOR = 10;

    /** Common practice, no source: the capacitor counts as refreshed after three time constants. */
    public static final double REFRESH_TIME_CONSTANTS = 3;

    private Bootstrap() {
    }

    /**
     * Charge drawn from the bootstrap capacitor per switching cycle,
     * {@code Q = Q_g + (I_qbs + I_leak)·t_on,max + Q_ls}.
     *
     * @param gateCharge Q_g, C (≥ 0)
     * @param iqbs high-side quiescent current, A (≥ 0)
     * @param onTimeMax longest high-side on time, s (≥ 0)
     * @param levelShiftCharge Q_ls, C (≥ 0)
     * @param leakage capacitor and diode leakage, A (≥ 0)
     * @return charge per cycle, C
     */
    public static double chargePerCycle(double gateCharge, double iqbs, double onTimeMax,
            double levelShiftCharge, double leakage) {
        Require.nonNegative("gate charge Q_g", "C", gateCharge);
        Require.nonNegative("high-side quiescent current I_qbs", "A", iqbs);
        Require.nonNegative("maximum on time", "s", onTimeMax);
        Require.nonNegative("level-shift charge Q_ls", "C", levelShiftCharge);
        Require.nonNegative("leakage current", "A", leakage);
        return gateCharge + (iqbs + leakage) * onTimeMax + levelShiftCharge;
    }

    /**
     * The largest droop the high side tolerates, {@code V_DD − V_F − V_UVLO,off}. Zero or
     * negative means the high side starts at or below its UVLO and no capacitor helps.
     *
     * @param vdd supply charging the capacitor, V
     * @param diodeDrop bootstrap diode forward voltage V_F, V (≥ 0)
     * @param uvloOff high-side UVLO falling threshold, V (≥ 0)
     * @return allowed droop, V (may be ≤ 0)
     */
    public static double maxDroop(double vdd, double diodeDrop, double uvloOff) {
        Require.positive("supply V_DD", "V", vdd);
        Require.nonNegative("diode forward voltage V_F", "V", diodeDrop);
        Require.nonNegative("high-side UVLO off", "V", uvloOff);
        return vdd - diodeDrop - uvloOff;
    }

    /** Minimum capacitance {@code C = Q / ΔV}, F; ΔV the allowed droop, V (&gt; 0). */
    public static double minCapacitance(double chargePerCycle, double droop) {
        Require.nonNegative("charge per cycle", "C", chargePerCycle);
        Require.positive("allowed droop ΔV", "V", droop);
        return chargePerCycle / droop;
    }

    /**
     * Recommended capacitance: {@code factor} times the minimum, rounded up to the series.
     *
     * @param minCapacitance from {@link #minCapacitance}, F (&gt; 0)
     * @param factor multiple of the minimum (≥ 1; {@link #RECOMMENDED_FACTOR} is usual)
     * @param series preferred-number series to round to
     * @return recommended capacitance, F
     */
    public static double recommended(double minCapacitance, double factor, ESeries series) {
        Require.positive("minimum capacitance", "F", minCapacitance);
        Require.inRange("safety factor", "", factor, 1, Double.MAX_VALUE);
        return series.roundUp(minCapacitance * factor);
    }

    /** {@link #recommended(double, double, ESeries)} with the default factor and E12. */
    public static double recommended(double minCapacitance) {
        return recommended(minCapacitance, RECOMMENDED_FACTOR, ESeries.E12);
    }

    /** Suggested V_DD decoupling capacitance, {@code 10·C_boot}, F. */
    public static double decoupling(double bootCapacitance) {
        Require.positive("bootstrap capacitance", "F", bootCapacitance);
        return DECOUPLING_FACTOR * bootCapacitance;
    }

    /** Refresh time {@code n·R_boot·C_boot}, s. */
    public static double refreshTime(double resistance, double capacitance,
            double timeConstants) {
        Require.nonNegative("bootstrap resistance", "Ω", resistance);
        Require.positive("bootstrap capacitance", "F", capacitance);
        Require.positive("number of time constants", "", timeConstants);
        return timeConstants * resistance * capacitance;
    }

    /**
     * Largest duty cycle that leaves time to refresh, {@code D_max = 1 − t_refresh·f}, clamped at
     * 0 (never refreshes in time).
     *
     * @param refreshTime time the switch node must stay low, s (≥ 0)
     * @param frequency switching frequency, Hz (&gt; 0)
     * @return maximum high-side duty, 0 … 1
     */
    public static double maxDuty(double refreshTime, double frequency) {
        Require.nonNegative("refresh time", "s", refreshTime);
        Require.positive("switching frequency f", "Hz", frequency);
        return Math.max(0, 1 - refreshTime * frequency);
    }

    /** First-charge inrush {@code (V_DD − V_F) / R_boot}, A; R_boot &gt; 0. */
    public static double inrush(double vdd, double diodeDrop, double resistance) {
        Require.positive("supply V_DD", "V", vdd);
        Require.nonNegative("diode forward voltage V_F", "V", diodeDrop);
        Require.positive("bootstrap resistance", "Ω", resistance);
        return Math.max(0, vdd - diodeDrop) / resistance;
    }

    /**
     * Required diode reverse-voltage rating {@code V_bus + V_overshoot}, V.
     *
     * @param busVoltage bus voltage the switch node swings to, V (≥ 0)
     * @param overshoot allowance for switch-node ringing above the bus, V (≥ 0)
     */
    public static double diodeReverseVoltage(double busVoltage, double overshoot) {
        Require.nonNegative("bus voltage", "V", busVoltage);
        Require.nonNegative("overshoot allowance", "V", overshoot);
        return busVoltage + overshoot;
    }
}
