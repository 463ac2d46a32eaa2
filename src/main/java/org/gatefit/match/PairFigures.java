package org.gatefit.match;

import org.gatefit.physics.Bootstrap;
import org.gatefit.physics.DriveCurrent;
import org.gatefit.physics.DvDt;
import org.gatefit.physics.GateLoop;
import org.gatefit.physics.GatePower;
import org.gatefit.physics.JunctionTemperature;
import org.gatefit.physics.SwitchNode;
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
    /** What the duty limit is solved from (NaN when the capacitor cannot be sized): C at its DC bias, Q_g + Q_ls, the drain. */
    private double bootCEff;
    private double bootQFixed;
    private double bootDrain;
    private double nmHigh;
    private double nmLow;
    private double kHot;
    private double iPlOn;
    private double iPlOff;
    private double driveCornerC;
    private double slew;
    private double slewMax;
    private double rOffPath;
    private double vInduced;
    private double vThSeen;
    private double dvdtCornerC;
    private double ringPeak;
    private double ringTrough;
    private double ringZetaOn;
    private double ringZetaOff;
    private double ringCornerC;
    private double nodeOvershoot;

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
        double rOnTot = loopOn(q, rSrc);
        double rOffTot = loopOff(q, rSnk);
        // Q_g is a required column, but a part built elsewhere may lack it: every figure that
        // needs it stays unknown (NaN) and the rules that use them say unknown.
        boolean qKnown = !Double.isNaN(qTotal);

        // Two corners: 25 °C, where datasheets specify, and the junction temperature asked for. The
        // driver's output resistance scales by kHot there (JunctionTemperature); the slow corner has
        // the larger resistance, the fast corner the smaller.
        double tHot = op.tj();
        double kHot = q.cornersKnown ? q.kHot : JunctionTemperature.driverResistanceFactor(tHot);
        double kSlow = Math.max(1, kHot);
        double kFast = Math.min(1, kHot);
        double slowC = kHot >= 1 ? tHot : JunctionTemperature.DATASHEET_C;
        double fastC = kHot >= 1 ? JunctionTemperature.DATASHEET_C : tHot;

        // The drain-voltage edge is the Miller plateau; the gate current on it sets the edge
        // (REFERENCES.md §8), judged at the slow corner.
        boolean edges = q.plateau;
        double iPlOn = edges ? plateauCurrentOn(q, d, kSlow * rSrc, op.rG()) : Double.NaN;
        double iPlOff = edges ? DriveCurrent.plateau(s.vPlateau() - op.vDriveNeg(), loopOff(q, kSlow * rSnk),
                d.iSink()) : Double.NaN;
        double plateauOn = edges ? SwitchingTimes.plateauTime(n * s.qGd(), iPlOn) : Double.NaN;
        double plateauOff = edges ? SwitchingTimes.plateauTime(n * s.qGd(), iPlOff) : Double.NaN;

        // Miller turn-on of the switch that stays off while its twin (the same pair) turns on, at
        // both corners; the corner nearer to (or further past) V_th,min decides.
        double sl = Double.NaN;
        double vi = Double.NaN;
        double vThSeen = Double.NaN;
        double hold = Double.NaN;
        double dvdtC = Double.NaN;
        double worst = Double.NEGATIVE_INFINITY;
        double slMax = Double.NaN;
        for (int c = 0; c < 2; c++) {
            double k = c == 0 ? 1 : kHot;
            double t = c == 0 ? JunctionTemperature.DATASHEET_C : tHot;
            // At the slow corner the plateau currents are the drive-current rule's, computed above.
            boolean slow = k == kSlow;
            double onEdge = slewAt(q, d, k * rSrc, op.rG(), slow ? iPlOn : Double.NaN);
            double slewC = op.twin() != null && Double.isNaN(op.dvdt()) ? (c == 0 ? op.twin().slewCold()
                    : op.twin().slewHot()) : onEdge;
            if (Double.isNaN(slewC)) {
                continue;
            }
            double offEdge = edges && Double.isNaN(op.dvdt()) ? slewFrom(q, slow ? iPlOff : DriveCurrent.plateau(
                    s.vPlateau() - op.vDriveNeg(), loopOff(q, k * rSnk), d.iSink())) : slewC;
            // Every edge the switch node makes: the twin's turn-on, this switch's own turn-on and turn-off.
            double ownOn = onEdge;
            double fastest = Math.max(slewC, Math.max(offEdge, Double.isNaN(ownOn) ? slewC : ownOn));
            slMax = Double.isNaN(slMax) ? fastest : Math.max(slMax, fastest);
            double holdC = holdPath(q, d, k * rSnk);
            double viC = millerKnown(q) && (op.bridge() || !Double.isNaN(op.dvdt())) ? inducedAt(q, slewC, holdC)
                    : Double.NaN;
            double th = q.cornersKnown ? (c == 0 ? q.thCold : q.thHot) : thresholdAt(s, t);
            double badness = Double.isNaN(viC) || Double.isNaN(th) ? Double.NaN
                    : th <= 0 ? Double.POSITIVE_INFINITY : (viC + op.vDriveNeg()) / th;
            if (Double.isNaN(dvdtC) || badness > worst) {
                worst = Double.isNaN(badness) ? worst : badness;
                sl = slewC;
                vi = viC;
                vThSeen = th;
                hold = holdC;
                dvdtC = t;
            }
            if (tHot == JunctionTemperature.DATASHEET_C) {
                break;
            }
        }

        // Switch-node overshoot at turn-off: the load current through the power loop, L·I/t_fall, with the
        // fastest fall — the fast corner's sink and the threshold nearest the plateau (V_th,max) — or an
        // IGBT's datasheet fall time (its tail) where given.
        double nodeOs = Double.NaN;
        if (op.powerLoop() >= 0 && op.iLoad() >= 0 && q.plateau && !Double.isNaN(s.cIss())) {
            double vTh = !Double.isNaN(s.vThMax()) ? s.vThMax() : s.vThMin();
            double fall = Double.NaN;
            if (s.technology() == Technology.IGBT && !Double.isNaN(s.ratings().tF())) {
                fall = s.ratings().tF();
            } else if (vTh > op.vDriveNeg() && vTh < s.vPlateau()) {
                fall = SwitchingTimes.currentFall(loopOff(q, kFast * rSnk), n * s.cIss(), vTh,
                        s.vPlateau(), op.vDriveNeg());
            }
            nodeOs = fall > 0 ? SwitchNode.overshoot(op.powerLoop(), op.iLoad(), fall) : Double.NaN;
        }

        // Gate ringing: the series R-L-C step at the fast corner (least damping).
        double zOn = Double.NaN;
        double zOff = Double.NaN;
        double peak = Double.NaN;
        double trough = Double.NaN;
        if (!Double.isNaN(s.cIss()) && s.cIss() > 0 && op.loop() > 0) {
            double cg = n * s.cIss();
            double rOnFast = loopOn(q, kFast * rSrc);
            double rOffFast = loopOff(q, kFast * rSnk);
            zOn = GateLoop.dampingRatio(rOnFast, op.loop(), cg);
            zOff = GateLoop.dampingRatio(rOffFast, op.loop(), cg);
            peak = GateLoop.extreme(zOn, op.vDriveNeg(), op.vDrive());
            trough = GateLoop.extreme(zOff, op.vDrive(), op.vDriveNeg());
        }

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
        double bCEff = Double.NaN;
        double bQFixed = Double.NaN;
        double bDrain = Double.NaN;
        if (op.highSide() && d.topology().bootstrapped()) {
            double uv = Double.isNaN(d.uvloOff()) ? d.uvloOn() : d.uvloOff();
            double full = q.fullOn;
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
                    bCEff = bCRec * q.m.bootCapBias();
                    bQFixed = qTotal + qLs;
                    bDrain = drain;
                }
            }
        }

        // Every field, every call: nothing of an earlier pair can remain.
        if (this.q != q) {
            this.q = q; // a ranking's scratch sees one question: no reference store (and G1 write barrier) per driver
        }
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
        this.bootCEff = bCEff;
        this.bootQFixed = bQFixed;
        this.bootDrain = bDrain;
        this.nmHigh = Double.isNaN(d.vIh()) ? Double.NaN : op.vOh() - d.vIh();
        this.nmLow = Double.isNaN(d.vIl()) ? Double.NaN : d.vIl() - op.vOl();
        this.kHot = kHot;
        this.iPlOn = iPlOn;
        this.iPlOff = iPlOff;
        this.driveCornerC = edges ? slowC : Double.NaN;
        this.slew = sl;
        this.slewMax = slMax;
        this.rOffPath = hold;
        this.vInduced = vi;
        this.vThSeen = vThSeen;
        this.dvdtCornerC = dvdtC;
        this.ringPeak = peak;
        this.ringTrough = trough;
        this.ringZetaOn = zOn;
        this.ringZetaOff = zOff;
        this.ringCornerC = Double.isNaN(peak) ? Double.NaN : fastC;
        this.nodeOvershoot = nodeOs;
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

    /**
     * A gate loop's resistance as the switch sees it: the driver's output resistance (already at its
     * corner) plus the external resistor and R_g,int of the n switches in parallel, R_drv + (R_g + R_g,int)/n.
     * The one definition every loop total of the rules uses.
     */
    static double loop(Question q, double rDriverAt, double rGate) {
        return rDriverAt + gateSide(rGate, q.rInt, q.n);
    }

    /** The gate side of a loop per switch: the resistor and R_g,int of n switches in parallel, (R_g + R_g,int)/n, Ω. */
    static double gateSide(double rGate, double rInt, int n) {
        return (rGate + rInt) / n;
    }

    /** {@link #loop} of the turn-on edge (R_g), its gate side computed once per question. */
    static double loopOn(Question q, double rDriverAt) {
        return rDriverAt + q.gateOn;
    }

    /** {@link #loop} of the turn-off edge (R_g,off), its gate side computed once per question. */
    static double loopOff(Question q, double rDriverAt) {
        return rDriverAt + q.gateOff;
    }

    /**
     * The gate current on the turn-on plateau, capped at the rated peak, with a driver source
     * resistance {@code rSrcAt} (already at its corner) and turn-on resistor {@code rG} per switch, A.
     */
    static double plateauCurrentOn(Question q, DriverPart d, double rSrcAt, double rG) {
        return DriveCurrent.plateau(q.op.vDrive() - q.s.vPlateau(), loop(q, rSrcAt, rG), d.iSource());
    }

    /**
     * The switch-node dv/dt while the twin (the same pair) turns on: as given, else the bus over the
     * turn-on plateau time with the source resistance {@code rSrcAt} and resistor {@code rG}, V/s;
     * NaN without a bus or a plateau.
     */
    static double slewAt(Question q, DriverPart d, double rSrcAt, double rG) {
        return slewAt(q, d, rSrcAt, rG, Double.NaN);
    }

    /** {@link #slewAt} with the turn-on plateau current already known ({@code iPlateau}; NaN: compute it). */
    private static double slewAt(Question q, DriverPart d, double rSrcAt, double rG, double iPlateau) {
        OperatingPoint op = q.op;
        if (!Double.isNaN(op.dvdt())) {
            return op.dvdt();
        }
        if (!q.plateau || !(op.bus() > 0)) {
            return Double.NaN;
        }
        return slewFrom(q, Double.isNaN(iPlateau) ? plateauCurrentOn(q, d, rSrcAt, rG) : iPlateau);
    }

    /** The switch-node dv/dt a plateau current makes: the bus over the plateau time, bus·I / (n·Q_gd), V/s. */
    private static double slewFrom(Question q, double iPlateau) {
        return q.op.bus() * iPlateau / (q.n * q.s.qGd());
    }

    /**
     * The resistance holding an off gate, per switch: the sink (shared by the n switches, so n times
     * it) plus R_g,off and R_g,int — or, with a Miller clamp, the clamp, taken as strong as the sink
     * (from memory; the clamp pin bypasses R_g,off), plus R_g,int.
     */
    static double holdPath(Question q, DriverPart d, double rSnkAt) {
        boolean clamp = Boolean.TRUE.equals(d.millerClamp());
        return q.n * rSnkAt + (clamp ? 0 : q.op.rGOff()) + q.rInt;
    }

    /**
     * The gate voltage the switch-node edge {@code slew} induces in this switch held through
     * {@code hold} ({@link DvDt#millerInjected} with the switch's charges and the bus), V: the one
     * call the dv-dt rule and the resistor range's dv-dt floor share.
     */
    static double inducedAt(Question q, double slew, double hold) {
        return q.offSwitch != null ? DvDt.millerInjected(q.offSwitch, slew, hold)
                : DvDt.millerInjected(q.s.qGd(), q.op.bus(), slew, hold, q.s.cIss(), q.s.cRss());
    }

    /** Whether the charge-consistent Miller injection can be computed: a bus and the switch's Q_gd (a twin or a given dv/dt is checked apart). */
    static boolean millerKnown(Question q) {
        return q.op.bus() > 0 && !Double.isNaN(q.s.qGd());
    }

    /** V_th,min of the switch at a junction temperature, V; NaN when unknown. */
    static double thresholdAt(SwitchPart s, double tj) {
        return Double.isNaN(s.vThMin()) ? Double.NaN
                : JunctionTemperature.threshold(s.vThMin(), s.technology().thresholdTc(), tj);
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

    /**
     * The largest duty the bootstrap allows by charge balance ({@link Bootstrap#maxDutyChargeBalance},
     * REFERENCES §9); NaN when the capacitor cannot be sized. Solved when asked (a root), not for
     * every driver ranked: the ranking asks {@link #bootDutyAllows} and {@link #bootDutyHeadroom}.
     */
    double bootDutyMax() {
        return Double.isNaN(bootCEff) ? Double.NaN : Bootstrap.maxDutyChargeBalance(q.op.vDrive() - q.op.diodeDrop(), bootFloor,
                q.op.rBoot(), bootCEff, bootQFixed, bootDrain, q.op.fSw());
    }

    /** The capacitor's lowest steady-state voltage at {@code duty} (REFERENCES §9), V. */
    private double bootLowestAt(double duty) {
        double period = 1 / q.op.fSw();
        return Bootstrap.steadyLowest(q.op.vDrive() - q.op.diodeDrop(), q.op.rBoot(), bootCEff,
                bootQFixed + bootDrain * duty * period, bootDrain, (1 - duty) * period);
    }

    /**
     * Whether the bootstrap holds the high side at or above its floor at {@code duty} (0 ≤ duty &lt; 1):
     * duty ≤ {@link #bootDutyMax} without solving for the limit (the lowest voltage falls as the
     * duty rises). False when the capacitor cannot be sized.
     */
    boolean bootDutyAllows(double duty) {
        return !Double.isNaN(bootCEff) && bootLowestAt(duty) >= bootFloor;
    }

    /**
     * {@code min(enough, bootDutyMax − duty)} for a duty the bootstrap allows: the limit is solved
     * only when the headroom is less than {@code enough} (a rule's score saturates there).
     */
    double bootDutyHeadroom(double duty, double enough) {
        if (duty + enough < 1 && bootDutyAllows(duty + enough)) {
            return enough;
        }
        return Math.min(enough, bootDutyMax() - duty);
    }

    double nmHigh() {
        return nmHigh;
    }

    double nmLow() {
        return nmLow;
    }

    /** Factor on the driver's 25 °C output resistance at the hot corner. */
    double kHot() {
        return kHot;
    }

    /** Gate current on the turn-on plateau at the slow corner, A (NaN without a plateau). */
    double iPlOn() {
        return iPlOn;
    }

    /** Gate current on the turn-off plateau at the slow corner, A (NaN without a plateau). */
    double iPlOff() {
        return iPlOff;
    }

    /** Junction temperature of the slow corner the drive current was judged at, °C. */
    double driveCornerC() {
        return driveCornerC;
    }

    /** Switch-node dv/dt at the corner that decided the dv-dt rule, V/s. */
    double slew() {
        return slew;
    }

    /** Fastest switch-node dv/dt of either edge at either corner, V/s (for CMTI). */
    double slewMax() {
        return slewMax;
    }

    /** V_th,min at the corner that decided the dv-dt rule, V. */
    double vThSeen() {
        return vThSeen;
    }

    /** Junction temperature of the corner that decided the dv-dt rule, °C. */
    double dvdtCornerC() {
        return dvdtCornerC;
    }

    /** Peak gate voltage of the turn-on step (fast corner), V. */
    double ringPeak() {
        return ringPeak;
    }

    /** Lowest gate voltage of the turn-off step (fast corner), V. */
    double ringTrough() {
        return ringTrough;
    }

    double ringZetaOn() {
        return ringZetaOn;
    }

    double ringZetaOff() {
        return ringZetaOff;
    }

    /** Switch-node overshoot above the bus at turn-off, V (NaN: not estimated). */
    double nodeOvershoot() {
        return nodeOvershoot;
    }

    /** Junction temperature of the fast corner the ringing was judged at, °C. */
    double ringCornerC() {
        return ringCornerC;
    }

    double rOffPath() {
        return rOffPath;
    }

    double vInduced() {
        return vInduced;
    }
}
