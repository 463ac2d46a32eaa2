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
 *       {@code D_max ≈ 1 − n·τ·f} (a rule of thumb, kept for comparison).</li>
 *   <li>Steady-state charge balance (REFERENCES §9; plain circuit theory): each cycle the
 *       capacitor gives {@code Q_on = Q_g + Q_ls + I·t_on} and, while the switch node is low,
 *       charges through R_boot and the diode toward {@code V_S − I·R_boot} ({@code V_S = V_DD − V_F},
 *       I the steady drain) with {@code k = e^(−t_off/(R_boot·C))}; the fixed point of
 *       {@code V_hi = V_S' − (V_S' − V_lo)·k}, {@code V_lo = V_hi − Q_on/C} is the lowest voltage
 *       {@code V_lo = V_S − I·R_boot − Q_on / (C·(1 − k))} ({@link #steadyLowest}); the largest duty
 *       keeping it at or above the high side's floor is {@link #maxDutyChargeBalance}. A
 *       cycle-by-cycle integration confirms it ({@code BootstrapTest}).</li>
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

    /**
     * Steady leakage drawn from the bootstrap capacitor besides the driver's quiescent current:
     * a fast-recovery bootstrap diode's reverse current when hot, tens of µA (from memory; MLCC
     * leakage is negligible beside it), A.
     */
    public static final double LEAKAGE_ALLOWANCE = 50e-6;

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

    /**
     * Lowest capacitor voltage in steady state, {@code V_S − I·R − Q_on / (C·(1 − e^(−t_off/(R·C))))}
     * (the class comment's charge balance); {@code R = 0} refreshes fully, {@code V_S − Q_on/C}.
     *
     * @param vCharge what the capacitor charges toward, V_DD − V_F, V
     * @param resistance bootstrap resistance R_boot, Ω (≥ 0)
     * @param capacitance effective capacitance at its DC bias, F (&gt; 0)
     * @param chargeOn charge taken while the high side is on, Q_g + Q_ls + I·t_on, C (≥ 0)
     * @param drain steady drain (quiescent plus leakage), A (≥ 0)
     * @param offTime time the switch node is low, s (≥ 0)
     * @return lowest voltage, V (−∞ when the capacitor is never refreshed)
     */
    public static double steadyLowest(double vCharge, double resistance, double capacitance, double chargeOn,
            double drain, double offTime) {
        Require.finite("charging voltage V_DD − V_F", "V", vCharge);
        Require.nonNegative("bootstrap resistance", "Ω", resistance);
        Require.positive("bootstrap capacitance", "F", capacitance);
        Require.nonNegative("charge per cycle", "C", chargeOn);
        Require.nonNegative("drain current", "A", drain);
        Require.nonNegative("off time", "s", offTime);
        double refreshed = resistance == 0 ? (offTime > 0 ? 1 : 0)
                : Decay.oneMinusExp(offTime / (resistance * capacitance));
        if (refreshed <= 0) {
            return Double.NEGATIVE_INFINITY;
        }
        return vCharge - drain * resistance - chargeOn / (capacitance * refreshed);
    }

    /**
     * The largest high-side duty whose steady-state lowest voltage ({@link #steadyLowest}) stays at
     * or above {@code floor}. With {@code H = V_S − I·R − floor}, {@code T = 1/f} and
     * {@code a = T/(R·C)} that is the root of
     * {@code g(d) = Q_fixed + I·T·d − H·C·(1 − e^(−a(1−d)))}, which is increasing and convex on
     * [0, 1] ({@code g' = I·T + H·C·a·e^(−a(1−d)) > 0}, {@code g'' = H·C·a²·e^(−a(1−d)) > 0}); Newton's
     * method started at d = 1, right of the root, therefore falls to it monotonically without
     * overshooting (a textbook property of convex increasing functions), in a handful of steps —
     * the ranking calls this for every bootstrapped driver. Without resistance g is linear and the
     * root is exact. 0 when even a vanishing duty fails; just below 1 when nothing limits it.
     * {@code BootstrapBalanceTest} holds the root to commons-math3's Brent solver and to a
     * cycle-by-cycle simulation.
     *
     * @param vCharge V_DD − V_F, V
     * @param floor the high side's floor (UVLO falling, full enhancement), V
     * @param resistance R_boot, Ω
     * @param capacitance effective capacitance, F
     * @param chargeFixed charge taken at each turn-on, Q_g + Q_ls, C
     * @param drain steady drain, A
     * @param frequency switching frequency, Hz
     * @return maximum duty, 0 … 1 (exclusive of 1)
     */
    public static double maxDutyChargeBalance(double vCharge, double floor, double resistance, double capacitance,
            double chargeFixed, double drain, double frequency) {
        Require.positive("switching frequency f", "Hz", frequency);
        Require.finite("floor", "V", floor);
        double period = 1 / frequency;
        if (steadyLowest(vCharge, resistance, capacitance, chargeFixed, drain, period) < floor) {
            return 0; // validates the other arguments too
        }
        double headroomCharge = (vCharge - drain * resistance - floor) * capacitance; // H·C > 0 here
        double slope = drain * period; // I·T
        if (resistance == 0) {
            return slope > 0 ? Math.min(ALMOST_FULL, (headroomCharge - chargeFixed) / slope) : ALMOST_FULL;
        }
        double a = period / (resistance * capacitance);
        double d = 1;
        for (int i = 0; i < 100; i++) {
            double e = Math.exp(-a * (1 - d));
            double g = chargeFixed + slope * d - headroomCharge * (1 - e);
            double step = g / (slope + headroomCharge * a * e);
            if (!(step > 1e-15)) {
                break; // g(d) ≤ 0 to rounding: at the root
            }
            d -= step;
        }
        return Math.max(0, Math.min(ALMOST_FULL, d));
    }

    /** The duty limit returned when nothing short of 100 % limits it (the switch node must fall to refresh), 1 − 1e-9. */
    static final double ALMOST_FULL = 1 - 1e-9;
}
