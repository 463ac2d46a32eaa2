package org.gatefit.match;

import org.gatefit.physics.Bootstrap;
import org.gatefit.physics.DriveCurrent;
import org.gatefit.physics.DvDt;
import org.gatefit.physics.GatePower;
import org.gatefit.physics.SwitchingTimes;

/**
 * The figures the rules rule on, for one driver–switch pair at one operating point, computed
 * from {@code org.gatefit.physics} by one method, {@link #compute}, which assigns every field on
 * every call (NaN: not known or not computed). Rules read them through accessors only.
 *
 * <p>A pair's figures for the full evaluation are a value nobody changes ({@link #of}). A ranking
 * thread computes driver after driver into one {@link #scratch()} instance instead, so ranking a
 * million drivers allocates nothing per driver (one object per ranked driver was 45–66 MB per
 * million-driver shortlist and two to four times slower warm; docs/PERFORMANCE.md). There is no
 * reset to forget: {@code compute} computes every figure into locals and assigns all of them at
 * its end, or throws before assigning any, and {@code PairFiguresTest} checks reflectively that a
 * scratch computed for one pair and then another holds exactly the second pair's figures.
 *
 * <p>Only what some rule judges is here; figures that are only shown (delay times, the resistor
 * range, the gate-loop damping, the split of gate power outside the driver, the bootstrap inrush,
 * the allowed dv/dt) are {@link ShownFigures}, computed from these for the pairs that are shown, so
 * a display figure can never change a verdict and ranking never computes one. Conventions:
 * {@code r_g_ohm} is the resistor of each switch when several are in parallel (their gates then
 * share the driver's output resistance); an unknown internal gate resistance is taken as 0 Ω,
 * which makes currents upper bounds (the operating point prints the assumption).
 */
final class PairFigures {
    private Question q;
    private DriverPart d;
    private double rSrc;
    private double rSnk;
    private boolean rSrcEstimated;
    private boolean rSnkEstimated;
    private double rOnTot;
    private double rOffTot;
    private double iPkSrc;
    private double iPkSnk;
    private double plateauOn;
    private double plateauOff;
    private double pDriver;
    private double bootCharge;
    private double bootDroop;
    private double bootFloor;
    private boolean bootBelowFull;
    private double bootCMin;
    private double bootCRec;
    private double bootDutyMax;
    private double nmHigh;
    private double nmLow;
    private double slew;
    private double rOffPath;
    private double vInduced;

    private PairFigures() {
    }

    /** The figures of one pair, as a value: nothing computes into it again. */
    static PairFigures of(Question q, DriverPart d) {
        PairFigures f = new PairFigures();
        f.compute(q, d);
        return f;
    }

    /** An instance a ranking thread computes driver after driver into ({@link #compute}); never handed out. */
    static PairFigures scratch() {
        return new PairFigures();
    }

    /**
     * Computes every figure of the pair {@code d} with the question {@code q}, all into locals, then
     * assigns every field. May throw {@link IllegalArgumentException} or {@link ArithmeticException}
     * when a physics model refuses the pair's values, before any field is assigned.
     */
    void compute(Question q, DriverPart d) {
        SwitchPart s = q.s;
        OperatingPoint op = q.op;
        int n = q.n;
        double rInt = q.rInt;
        double swing = op.swing();
        double qTotal = q.qTotal;
        double rSrc = DriveCurrent.outputOhms(d.rSource(), swing, d.iSource());
        double rSnk = DriveCurrent.outputOhms(d.rSink(), swing, d.iSink());
        double rOnTot = rSrc + (op.rG() + rInt) / n;
        double rOffTot = rSnk + (op.rGOff() + rInt) / n;
        // Q_g is a required column, but a part built elsewhere may lack it: every figure that
        // needs it stays unknown (NaN) and the rules that use them say unknown.
        boolean qKnown = !Double.isNaN(qTotal);

        boolean edges = edges(q, rOnTot, rOffTot);
        double plateauOn = edges ? SwitchingTimes.plateauOn(n * s.qGd(), rOnTot, op.vDrive(), s.vPlateau()) : Double.NaN;
        double plateauOff = edges ? SwitchingTimes.plateauOff(n * s.qGd(), rOffTot, s.vPlateau(), op.vDriveNeg())
                : Double.NaN;

        // Only the driver's share is ruled on (driver-power); the split's other shares are shown figures.
        // Per package: each channel that switches at this point adds its share, quiescent and level-shift loss.
        double pDriver = gatePowerKnown(q, rOnTot, rOffTot)
                ? channelsUsed(d, op) * (GatePower.driverShare(qTotal, swing, op.fSw(), rSrc, rSnk, op.rG() / n,
                        op.rGOff() / n, rInt / n) + highSideQuiescent(d, op) + channelExtras(d, op)) : Double.NaN;

        double bCharge = Double.NaN;
        double bDroop = Double.NaN;
        double bFloor = Double.NaN;
        boolean bBelow = false;
        double bCMin = Double.NaN;
        double bCRec = Double.NaN;
        double bDuty = Double.NaN;
        if (op.highSide() && d.topology().bootstrapped()) {
            double uv = Double.isNaN(d.uvloOff()) ? d.uvloOn() : d.uvloOff();
            double full = fullEnhancement(s);
            bFloor = Math.max(Double.isNaN(uv) ? 0 : uv, Double.isNaN(full) ? 0 : full);
            if (!Double.isNaN(uv) && !Double.isNaN(full) && op.vDrive() - op.diodeDrop() <= full) {
                // The bootstrap never reaches full enhancement, whatever the capacitor: size it to the
                // UVLO as REFERENCES §4 does (ΔV ≤ V_DD − V_F − V_UVLO,off) and let the rule warn.
                bFloor = uv;
                bBelow = true;
            }
            if (qKnown && (!Double.isNaN(uv) || !Double.isNaN(full))) {
                double tOn = (Double.isNaN(op.dutyMax()) ? 1 : op.dutyMax()) / op.fSw();
                double drain = (Double.isNaN(d.iQbs()) ? 0 : d.iQbs()) + Bootstrap.LEAKAGE_ALLOWANCE;
                double qLs = Double.isNaN(d.ratings().qLs()) ? 0 : d.ratings().qLs();
                bCharge = Bootstrap.chargePerCycle(qTotal, drain, tOn, qLs, 0);
                bDroop = op.vDrive() - op.diodeDrop() - bFloor;
                if (bDroop > 0) {
                    // Sized so that the capacitance left at its DC bias (boot-cap-bias) is still the
                    // recommended multiple of the minimum; the duty limit is the charge balance of
                    // that derated capacitance (REFERENCES §9), not a count of time constants.
                    bCMin = Bootstrap.minCapacitance(bCharge, bDroop);
                    bCRec = Bootstrap.recommended(bCMin / q.m.bootCapBias());
                    bDuty = Bootstrap.maxDutyChargeBalance(op.vDrive() - op.diodeDrop(), bFloor, op.rBoot(),
                            bCRec * q.m.bootCapBias(), qTotal + qLs, drain, op.fSw());
                }
            }
        }

        double rOffPath = rSnk * n + op.rGOff() + rInt;
        double sl = Double.NaN;
        if (!Double.isNaN(op.dvdt())) {
            sl = op.dvdt();
        } else if (!Double.isNaN(op.bus()) && op.bus() > 0 && !Double.isNaN(plateauOn) && plateauOn > 0) {
            sl = op.bus() / plateauOn;
        }
        double vi = Double.NaN;
        if (!Double.isNaN(sl) && !Double.isNaN(s.cRss()) && !Double.isNaN(s.cIss()) && sl > 0) {
            vi = rOffPath > 0 ? DvDt.induced(s.cRss(), sl, rOffPath, s.cIss(), millerStep(op, sl)) : 0;
        } else if (!Double.isNaN(sl) && !Double.isNaN(s.cRss())) {
            vi = DvDt.inducedBound(s.cRss(), sl, rOffPath);
        }

        // Every field, every call: nothing of an earlier pair can remain.
        this.q = q;
        this.d = d;
        this.rSrc = rSrc;
        this.rSnk = rSnk;
        this.rSrcEstimated = Double.isNaN(d.rSource());
        this.rSnkEstimated = Double.isNaN(d.rSink());
        this.rOnTot = rOnTot;
        this.rOffTot = rOffTot;
        this.iPkSrc = rOnTot > 0 ? Math.min(d.iSource(), swing / rOnTot) : d.iSource();
        this.iPkSnk = rOffTot > 0 ? Math.min(d.iSink(), swing / rOffTot) : d.iSink();
        this.plateauOn = plateauOn;
        this.plateauOff = plateauOff;
        this.pDriver = pDriver;
        this.bootCharge = bCharge;
        this.bootDroop = bDroop;
        this.bootFloor = bFloor;
        this.bootBelowFull = bBelow;
        this.bootCMin = bCMin;
        this.bootCRec = bCRec;
        this.bootDutyMax = bDuty;
        this.nmHigh = Double.isNaN(d.vIh()) ? Double.NaN : op.vOh() - d.vIh();
        this.nmLow = Double.isNaN(d.vIl()) ? Double.NaN : d.vIl() - op.vOl();
        this.slew = sl;
        this.rOffPath = rOffPath;
        this.vInduced = vi;
    }

    /** Whether the edges' plateau times are computed: a plateau to cross and positive resistances on and off. */
    static boolean edges(Question q, double rOnTot, double rOffTot) {
        return q.plateau && rOnTot > 0 && rOffTot > 0;
    }

    /** Whether the gate power is computed: a known gate charge and positive resistances on and off. */
    static boolean gatePowerKnown(Question q, double rOnTot, double rOffTot) {
        return !Double.isNaN(q.qTotal) && rOnTot > 0 && rOffTot > 0;
    }

    /** The high side's quiescent draw from the bootstrap, W (0 where there is none or it is unknown). */
    private static double highSideQuiescent(DriverPart d, OperatingPoint op) {
        return op.highSide() && d.topology().bootstrapped() && !Double.isNaN(d.iQbs())
                ? GatePower.highSideQuiescent(op.vDrive(), d.iQbs()) : 0;
    }

    /** Channels of the package switching at this point: as asked, else all of the driver's (at least 1). */
    static int channelsUsed(DriverPart d, OperatingPoint op) {
        return op.channelsUsed() > 0 ? op.channelsUsed() : Math.max(1, d.channels());
    }

    /**
     * A channel's output-side quiescent power (supply × i_q_out_ma) and, on the high side, its
     * level-shifter loss (q_ls_nc × bus × f; REFERENCES.md §2), W; 0 where unknown.
     */
    static double channelExtras(DriverPart d, OperatingPoint op) {
        double iq = d.ratings().iQOut();
        double p = Double.isNaN(iq) ? 0 : op.swing() * iq;
        double qLs = d.ratings().qLs();
        if (op.highSide() && !Double.isNaN(qLs) && !Double.isNaN(op.bus())) {
            p += GatePower.levelShift(op.bus(), qLs, op.fSw());
        }
        return p;
    }

    /** The voltage step of the switch node that the Miller current integrates over: the bus, or 1 µs of the slew without one. */
    double millerStep() {
        return millerStep(q.op, slew);
    }

    private static double millerStep(OperatingPoint op, double slew) {
        return Double.isNaN(op.bus()) ? slew * 1e-6 : op.bus();
    }

    /** The on level for full enhancement: where R_DS(on) / V_CE(sat) is specified, else the recommended level. */
    static double fullEnhancement(SwitchPart s) {
        if (!Double.isNaN(s.rOnVgs()) && s.rOnVgs() > 0) {
            return s.rOnVgs();
        }
        return s.vGateOn();
    }

    // The figures, read-only to the rules.

    Question q() {
        return q;
    }

    DriverPart d() {
        return d;
    }

    SwitchPart s() {
        return q.s;
    }

    OperatingPoint op() {
        return q.op;
    }

    Margins m() {
        return q.m;
    }

    double rSrc() {
        return rSrc;
    }

    double rSnk() {
        return rSnk;
    }

    boolean rSrcEstimated() {
        return rSrcEstimated;
    }

    boolean rSnkEstimated() {
        return rSnkEstimated;
    }

    double rOnTot() {
        return rOnTot;
    }

    double rOffTot() {
        return rOffTot;
    }

    double iPkSrc() {
        return iPkSrc;
    }

    double iPkSnk() {
        return iPkSnk;
    }

    double plateauOn() {
        return plateauOn;
    }

    double plateauOff() {
        return plateauOff;
    }

    double pDriver() {
        return pDriver;
    }

    double bootCharge() {
        return bootCharge;
    }

    double bootDroop() {
        return bootDroop;
    }

    double bootFloor() {
        return bootFloor;
    }

    boolean bootBelowFull() {
        return bootBelowFull;
    }

    double bootCMin() {
        return bootCMin;
    }

    double bootCRec() {
        return bootCRec;
    }

    double bootDutyMax() {
        return bootDutyMax;
    }

    double nmHigh() {
        return nmHigh;
    }

    double nmLow() {
        return nmLow;
    }

    double slew() {
        return slew;
    }

    double rOffPath() {
        return rOffPath;
    }

    double vInduced() {
        return vInduced;
    }
}
