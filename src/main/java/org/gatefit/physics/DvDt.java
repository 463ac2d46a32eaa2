package org.gatefit.physics;

/**
 * Gate voltage induced by a drain-voltage edge through the Miller capacitance (dv/dt-induced,
 * or "parasitic", turn-on of an off switch).
 *
 * <p>While the drain of an off switch rises at a rate s = dv/dt, the current C_gd·s flows through
 * C_gd into the gate node, which is held down through R_off = R_sink + R_g,off + R_g,int and
 * loaded by C_gs. Plain circuit theory on that RC node
 * ({@code C_iss·dv_g/dt = C_gd·s − v_g/R}, with C_iss ≈ C_gs + C_gd) gives
 * <ul>
 *   <li>the simple bound {@code V_ind = C_gd·s·R} (the steady state of the ramp);</li>
 *   <li>the RC-limited peak {@code V_pk = C_gd·s·R·(1 − e^(−T/(R·C_iss)))}, T = ΔV/s, the end
 *       of a ramp of height ΔV; for R → ∞ it tends to the capacitive divider ΔV·C_gd/C_iss.</li>
 * </ul>
 * The switch risks turning on when {@code V_pk + V_off ≥ V_th,min} (V_off ≤ 0 is the off level).
 * Remedies: lower sink resistance, a Miller clamp, negative bias. Constant capacitances are
 * assumed (C_gd falls steeply with V_DS, so the bound is pessimistic at high voltage).
 */
public final class DvDt {

    private DvDt() {
    }

    /**
     * Simple bound {@code V_ind = C_gd·(dv/dt)·R_off}.
     *
     * @param cgd gate-drain capacitance C_gd (C_rss), F (≥ 0)
     * @param slewRate drain dv/dt, V/s (≥ 0)
     * @param rOff total turn-off loop resistance, Ω (≥ 0)
     * @return induced gate voltage, V
     */
    public static double inducedBound(double cgd, double slewRate, double rOff) {
        Require.nonNegative("gate-drain capacitance C_gd", "F", cgd);
        Require.nonNegative("slew rate dv/dt", "V/s", slewRate);
        Require.nonNegative("turn-off resistance R_off", "Ω", rOff);
        return cgd * slewRate * rOff;
    }

    /**
     * RC-limited peak {@code V_pk = C_gd·s·R·(1 − e^(−ΔV/(s·R·C_iss)))}.
     *
     * @param cgd C_gd, F (≥ 0)
     * @param slewRate dv/dt, V/s (&gt; 0)
     * @param rOff total turn-off loop resistance, Ω (≥ 0)
     * @param ciss input capacitance, F (&gt; 0)
     * @param swing drain voltage step ΔV, V (≥ 0)
     * @return peak induced gate voltage, V
     */
    public static double induced(double cgd, double slewRate, double rOff, double ciss,
            double swing) {
        Require.nonNegative("gate-drain capacitance C_gd", "F", cgd);
        Require.positive("slew rate dv/dt", "V/s", slewRate);
        Require.nonNegative("turn-off resistance R_off", "Ω", rOff);
        Require.positive("input capacitance C_iss", "F", ciss);
        Require.nonNegative("drain voltage step ΔV", "V", swing);
        if (rOff == 0) {
            return 0;
        }
        double tau = rOff * ciss;
        double ramp = swing / slewRate;
        return cgd * slewRate * rOff * Decay.oneMinusExp(ramp / tau);
    }

    /**
     * C_gd averaged over the drain swing, from the gate-drain charge: {@code C_gd,avg = Q_gd / ΔV}.
     * C_gd falls steeply with V_DS, so C_rss at one test voltage misstates the charge the switch
     * node actually moves through the gate; Q_gd is that charge (REFERENCES.md §8, charge-consistent
     * Miller injection). With this C_gd the RC-limited form {@link #induced} is the current
     * I_M = Q_gd / t over the transition time t = ΔV / (dv/dt).
     *
     * @param qgd gate-drain charge Q_gd, C (≥ 0)
     * @param swing drain swing ΔV (the bus), V (&gt; 0)
     * @return average C_gd, F
     */
    public static double averageCgd(double qgd, double swing) {
        Require.nonNegative("gate-drain charge Q_gd", "C", qgd);
        Require.positive("drain swing", "V", swing);
        return qgd / swing;
    }

    /**
     * The gate voltage induced in the switch that stays off while its twin turns on, charge-consistent
     * (REFERENCES.md §8): the switch node moves ΔV at {@code slew}, the off switch's C_gd averaged
     * over the swing is Q_gd / ΔV, so the Miller current is (Q_gd / ΔV)·slew over t = ΔV / slew; the
     * gate node, held through {@code rHold} and loaded by C_iss, reaches the RC-limited
     * {@link #induced} peak, never more than the capacitive divider {@link #divider} with
     * C_gs = C_iss − C_rss (C_iss alone when C_rss is unknown). Without C_iss the RC filtering is
     * left out (I_M·R, an upper bound).
     *
     * @param qgd   the off switch's gate-drain charge Q_gd, C (≥ 0)
     * @param swing the switch-node step ΔV (the bus), V (&gt; 0)
     * @param slew  the switch-node dv/dt, V/s (&gt; 0)
     * @param rHold resistance holding the off gate (sink + R_g,off + R_g,int, or the clamp path), Ω (≥ 0)
     * @param ciss  input capacitance, F (&gt; 0), or NaN when unknown
     * @param crss  reverse transfer capacitance, F (≥ 0), or NaN when unknown
     * @return the peak induced gate voltage above the off level, V
     */
    public static double millerInjected(double qgd, double swing, double slew, double rHold, double ciss, double crss) {
        return millerInjected(offSwitch(qgd, swing, ciss, crss), slew, rHold);
    }

    /**
     * The off switch's side of {@link #millerInjected}, the same whatever drives it: C_gd averaged over
     * the swing, C_iss, the swing and the capacitive divider's bound (NaN without C_iss).
     */
    public record OffSwitch(double cgd, double ciss, double swing, double dividerBound) {
    }

    /** {@link OffSwitch} from the switch's charges (arguments as {@link #millerInjected}). */
    public static OffSwitch offSwitch(double qgd, double swing, double ciss, double crss) {
        double cgd = averageCgd(qgd, swing);
        if (Double.isNaN(ciss)) {
            return new OffSwitch(cgd, Double.NaN, swing, Double.NaN);
        }
        double cgs = Math.max(0, Double.isNaN(crss) ? ciss : ciss - crss);
        return new OffSwitch(cgd, ciss, swing, divider(cgd, cgs, swing));
    }

    /**
     * {@link #millerInjected} with the off switch's side computed once ({@link #offSwitch}), as a
     * ranking computes it once per question and this per driver.
     */
    public static double millerInjected(OffSwitch off, double slew, double rHold) {
        if (Double.isNaN(off.ciss())) {
            return inducedBound(off.cgd(), slew, rHold);
        }
        return Math.min(induced(off.cgd(), slew, rHold, off.ciss(), off.swing()), off.dividerBound());
    }

    /**
     * The capacitive divider that bounds any induced gate voltage, whatever the resistance:
     * {@code ΔV·C_gd / (C_gd + C_gs)} (plain circuit theory: an open gate takes this share of the
     * drain step).
     *
     * @param cgd gate-drain capacitance (average over the swing), F (≥ 0)
     * @param cgs gate-source capacitance, F (≥ 0; C_gd + C_gs &gt; 0)
     * @param swing drain step ΔV, V (≥ 0)
     * @return the divider's share of the step, V
     */
    public static double divider(double cgd, double cgs, double swing) {
        Require.nonNegative("gate-drain capacitance C_gd", "F", cgd);
        Require.nonNegative("gate-source capacitance C_gs", "F", cgs);
        Require.positive("gate capacitance C_gd + C_gs", "F", cgd + cgs);
        Require.nonNegative("drain voltage step ΔV", "V", swing);
        return swing * cgd / (cgd + cgs);
    }

    /**
     * The dv/dt the simple bound allows before the gate reaches threshold,
     * {@code (V_th,min − V_off) / (C_gd·R_off)}.
     *
     * @param cgd C_gd, F (&gt; 0)
     * @param rOff total turn-off loop resistance, Ω (&gt; 0)
     * @param vThMin minimum threshold voltage, V (&gt; 0)
     * @param vOff off level, V (≤ 0)
     * @return allowed dv/dt, V/s
     */
    public static double allowedBound(double cgd, double rOff, double vThMin, double vOff) {
        Require.positive("gate-drain capacitance C_gd", "F", cgd);
        Require.positive("turn-off resistance R_off", "Ω", rOff);
        Require.positive("threshold V_th,min", "V", vThMin);
        Require.nonPositive("off level V_off", "V", vOff);
        return (vThMin - vOff) / (cgd * rOff);
    }

    /**
     * The dv/dt the RC-limited form allows, found by bisection (V_pk rises monotonically with
     * dv/dt). {@code +∞} when even an instantaneous step stays below threshold, i.e. the
     * capacitive divider ΔV·C_gd/C_iss is below V_th,min − V_off.
     *
     * @return allowed dv/dt, V/s (possibly +∞)
     */
    public static double allowedRcLimited(double cgd, double rOff, double ciss, double swing,
            double vThMin, double vOff) {
        double limit = vThMin - vOff;
        double simple = allowedBound(cgd, rOff, vThMin, vOff);
        Require.positive("input capacitance C_iss", "F", ciss);
        Require.positive("drain voltage step ΔV", "V", swing);
        if (swing * cgd / ciss <= limit) {
            return Double.POSITIVE_INFINITY;
        }
        double lo = simple;
        double hi = simple * 2;
        while (induced(cgd, hi, rOff, ciss, swing) < limit) {
            lo = hi;
            hi *= 2;
        }
        for (int k = 0; k < 200 && hi - lo > 1e-12 * hi; k++) {
            double mid = 0.5 * (lo + hi);
            if (induced(cgd, mid, rOff, ciss, swing) < limit) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        return 0.5 * (lo + hi);
    }

    /** True when {@code V_induced + V_off ≥ V_th,min}: risk of parasitic turn-on. */
    public static boolean turnOnRisk(double inducedVoltage, double vOff, double vThMin) {
        Require.nonNegative("induced gate voltage", "V", inducedVoltage);
        Require.nonPositive("off level V_off", "V", vOff);
        Require.positive("threshold V_th,min", "V", vThMin);
        return inducedVoltage + vOff >= vThMin;
    }
}
