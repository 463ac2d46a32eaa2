package org.gatefit.physics;

/**
 * Gate-drive power and where it is dissipated.
 *
 * <p>Charging a gate by Q_g over a swing ΔV and discharging it again takes
 * {@code P_G = Q_g·ΔV·f} from the supply, whatever the resistances (plain circuit theory: the
 * energy Q·ΔV per cycle, with Q_g measured over the same swing, is all dissipated in the loop
 * resistances and none stays in the gate). Each edge dissipates half, and within an edge the
 * resistances in series share it in proportion to their values (driver source or sink
 * resistance, external resistor, internal gate resistance). The driver also draws quiescent power
 * {@code V_DD·I_DD}, the high side {@code V·I_qbs}, and a level shifter {@code V·Q_ls·f}.
 * Treating the driver output as a resistor is an approximation (outputs partly act as current
 * sources), so the split is an estimate; the total is not.
 */
public final class GatePower {

    private GatePower() {
    }

    /**
     * Total gate-drive power {@code P_G = Q_g·ΔV·f}.
     *
     * @param gateCharge Q_g over the swing, C (≥ 0)
     * @param swing full gate swing ΔV = V_on − V_off, V (≥ 0)
     * @param frequency switching frequency, Hz (≥ 0)
     * @return power, W
     */
    public static double total(double gateCharge, double swing, double frequency) {
        Require.nonNegative("gate charge Q_g", "C", gateCharge);
        Require.nonNegative("gate swing ΔV", "V", swing);
        Require.nonNegative("switching frequency f", "Hz", frequency);
        return gateCharge * swing * frequency;
    }

    /**
     * Split of {@link #total} between driver, external resistors and internal gate resistance.
     * Half the power goes to each edge; the turn-on half divides in the ratio
     * R_source : R_g,on : R_g,int, the turn-off half in R_sink : R_g,off : R_g,int.
     *
     * @param gateCharge Q_g, C
     * @param swing ΔV, V
     * @param frequency f, Hz
     * @param rSource driver source (pull-up) resistance, Ω (≥ 0)
     * @param rSink driver sink (pull-down) resistance, Ω (≥ 0)
     * @param rGateOn external turn-on resistor, Ω (≥ 0)
     * @param rGateOff external turn-off resistor, Ω (≥ 0)
     * @param rGateInternal internal gate resistance, Ω (≥ 0)
     * @return the split, W
     * @throws IllegalArgumentException if an edge has zero total resistance
     */
    public static Split split(double gateCharge, double swing, double frequency, double rSource,
            double rSink, double rGateOn, double rGateOff, double rGateInternal) {
        double half = total(gateCharge, swing, frequency) / 2;
        double on = loop("turn-on loop resistance", rSource, rGateOn, rGateInternal);
        double off = loop("turn-off loop resistance", rSink, rGateOff, rGateInternal);
        return new Split(driverShare(gateCharge, swing, frequency, rSource, rSink, rGateOn, rGateOff, rGateInternal),
                half * (rGateOn / on + rGateOff / off),
                half * rGateInternal * (1 / on + 1 / off));
    }

    /**
     * {@link Split#driver()} alone, without the split's object: the driver's share of the gate
     * power, {@code ½·Q_g·ΔV·f·(R_source/R_on + R_sink/R_off)}, W. Ranking computes it for every
     * candidate; {@link #split} uses it, so both give the same bits. Same arguments and checks.
     */
    public static double driverShare(double gateCharge, double swing, double frequency, double rSource,
            double rSink, double rGateOn, double rGateOff, double rGateInternal) {
        double half = total(gateCharge, swing, frequency) / 2;
        double share = half * (rSource / loop("turn-on loop resistance", rSource, rGateOn, rGateInternal)
                + rSink / loop("turn-off loop resistance", rSink, rGateOff, rGateInternal));
        Require.nonNegative("driver power", "W", share);
        return share;
    }

    /** The resistance round one edge's loop, which must not be zero. */
    private static double loop(String what, double rDriver, double rGate, double rGateInternal) {
        double r = DriveCurrent.totalResistance(rDriver, rGate, rGateInternal);
        Require.positive(what, "Ω", r);
        return r;
    }

    /** Quiescent power {@code V_DD·I_DD}, W. */
    public static double quiescent(double supply, double current) {
        Require.nonNegative("supply V_DD", "V", supply);
        Require.nonNegative("quiescent current I_DD", "A", current);
        return supply * current;
    }

    /** High-side quiescent power {@code V_boot·I_qbs}, W. */
    public static double highSideQuiescent(double supply, double iqbs) {
        Require.nonNegative("high-side supply", "V", supply);
        Require.nonNegative("high-side quiescent current I_qbs", "A", iqbs);
        return supply * iqbs;
    }

    /** Level-shift power {@code V·Q_ls·f}, W; V is the voltage the level shifter spans. */
    public static double levelShift(double voltage, double levelShiftCharge, double frequency) {
        Require.nonNegative("level-shift voltage", "V", voltage);
        Require.nonNegative("level-shift charge Q_ls", "C", levelShiftCharge);
        Require.nonNegative("switching frequency f", "Hz", frequency);
        return voltage * levelShiftCharge * frequency;
    }

    /**
     * Power dissipated in the driver package: its share of the gate power plus the quiescent
     * and level-shift terms whose inputs are given. A term with any input NaN ("not given") is
     * left out and {@link DriverPower#complete()} is false.
     *
     * @param gateShare the driver's share of the gate power ({@link Split#driver()}), W
     * @param vdd low-side supply, V, or NaN
     * @param idd low-side quiescent current, A, or NaN
     * @param vBoot high-side supply, V, or NaN
     * @param iqbs high-side quiescent current, A, or NaN
     * @param vShift voltage spanned by the level shifter (bus), V, or NaN
     * @param qls level-shift charge per cycle, C, or NaN
     * @param frequency switching frequency, Hz
     * @return the terms and their total, W
     */
    public static DriverPower driverPower(double gateShare, double vdd, double idd, double vBoot,
            double iqbs, double vShift, double qls, double frequency) {
        Require.nonNegative("driver share of gate power", "W", gateShare);
        Require.nonNegative("switching frequency f", "Hz", frequency);
        boolean complete = true;
        double q = 0;
        if (Require.given(vdd) && Require.given(idd)) {
            q = quiescent(vdd, idd);
        } else {
            complete = false;
        }
        double hs = 0;
        if (Require.given(vBoot) && Require.given(iqbs)) {
            hs = highSideQuiescent(vBoot, iqbs);
        } else {
            complete = false;
        }
        double ls = 0;
        if (Require.given(vShift) && Require.given(qls)) {
            ls = levelShift(vShift, qls, frequency);
        } else {
            complete = false;
        }
        return new DriverPower(gateShare, q, hs, ls, complete);
    }

    /**
     * Where the gate power goes, W.
     *
     * @param driver dissipated in the driver output stage
     * @param external dissipated in the external gate resistors
     * @param internal dissipated in the switch's internal gate resistance
     */
    public record Split(double driver, double external, double internal) {
        public Split {
            Require.nonNegative("driver power", "W", driver);
            Require.nonNegative("external resistor power", "W", external);
            Require.nonNegative("internal gate resistance power", "W", internal);
        }

        /** Sum of the three parts (equals {@link GatePower#total}), W. */
        public double total() {
            return driver + external + internal;
        }
    }

    /**
     * Driver package dissipation terms, W.
     *
     * @param gate share of the gate-drive power
     * @param quiescent V_DD·I_DD (0 when not given)
     * @param highSide V·I_qbs (0 when not given)
     * @param levelShift V·Q_ls·f (0 when not given)
     * @param complete false when some term was left out for missing inputs
     */
    public record DriverPower(double gate, double quiescent, double highSide, double levelShift,
            boolean complete) {
        public DriverPower {
            Require.nonNegative("gate power share", "W", gate);
            Require.nonNegative("quiescent power", "W", quiescent);
            Require.nonNegative("high-side quiescent power", "W", highSide);
            Require.nonNegative("level-shift power", "W", levelShift);
        }

        /** Sum of the terms, W. */
        public double total() {
            return gate + quiescent + highSide + levelShift;
        }
    }
}
