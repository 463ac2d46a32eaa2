package org.gatefit.match;

import java.util.ArrayList;
import java.util.List;
import org.gatefit.match.Check.Comparison;
import org.gatefit.physics.ESeries;
import org.gatefit.physics.GateLoop;

/**
 * {@code gate-ringing}: the gate loop as a series R-L-C (loop resistance with the chosen resistor and
 * R_g,int, the loop inductance, C_iss of the switches on the output) stepped from the off level to the
 * on level and back (REFERENCES.md §3 and §8: the first peak overshoots by exp(−πζ/√(1−ζ²)) of the
 * swing; cross-checked against ngspice in {@code NgspiceCrossCheckTest}). The turn-on peak is judged
 * against V_GS,max and the turn-off undershoot against V_GS,min at the fast corner (least resistance,
 * least damping): fail past a limit, warn inside the gate headroom of it (common practice, no
 * source). A loop with ζ ≥ 1 does not overshoot. Limits: C_iss is taken as a fixed capacitor (the
 * plateau and its V_DS dependence damp the real loop more), and the gate voltage at the pins, not
 * behind R_g,int, is what a probe sees.
 */
final class GateRingingRule extends PairRule {
    enum Why implements Reason { NO_CAPACITANCE, NO_LIMIT, OVER, UNDER, NEAR, CLEAR, DAMPED }

    /** Room left under V_GS,max by the peak and over V_GS,min by the trough, as a fraction of each limit (NaN: unknown). */
    private static double roomOn(PairFigures f) {
        double max = f.s().vGsMax();
        if (f.ringZetaOn() >= 1 || f.op().vDrive() >= max) {
            return Double.POSITIVE_INFINITY; // no overshoot, or the on level itself past the limit: gate-voltage's
        }
        return Double.isNaN(max) || !(max > 0) ? Double.NaN : (max - f.ringPeak()) / max;
    }

    private static double roomOff(PairFigures f) {
        double min = f.s().vGsMin();
        if (f.ringZetaOff() >= 1 || f.op().vDriveNeg() <= min) {
            return Double.POSITIVE_INFINITY; // no undershoot, or the off level itself past the limit: negative-bias's
        }
        return Double.isNaN(min) || !(min < 0) ? Double.NaN : (f.ringTrough() - min) / -min;
    }

    @Override
    public void judge(PairFigures f, Outcome out) {
        if (Double.isNaN(f.ringPeak())) {
            out.unknown(Why.NO_CAPACITANCE);
            return;
        }
        if (f.ringZetaOn() >= 1 && f.ringZetaOff() >= 1) {
            out.pass(Why.DAMPED, 1); // no overshoot: the levels themselves are gate-voltage's and negative-bias's
            return;
        }
        double on = roomOn(f);
        double off = roomOff(f);
        if (on < 0) {
            out.fail(Why.OVER);
            return;
        }
        if (off < 0) {
            out.fail(Why.UNDER);
            return;
        }
        if (Double.isNaN(on) || Double.isNaN(off)) {
            out.unknown(Why.NO_LIMIT);
            return;
        }
        double h = f.m().gateHeadroom();
        double room = Math.min(on, off);
        if (room < h) {
            out.warn(Why.NEAR, h > 0 ? room / h : 0);
        } else {
            out.pass(Why.CLEAR, h > 0 ? (room - h) / h : 1);
        }
    }

    @Override
    public Worded word(ShownFigures shown, Reason why) {
        PairFigures f = shown.f;
        Why w = (Why) why;
        if (w == Why.NO_CAPACITANCE) {
            return new Worded("C_iss of the switch unknown, so the gate loop's ringing cannot be judged");
        }
        SwitchPart s = f.s();
        OperatingPoint op = f.op();
        List<Comparison> cmp = new ArrayList<>();
        if (!Double.isNaN(s.vGsMax())) {
            cmp.add(new Comparison("turn-on peak", f.ringPeak(), "≤", s.vGsMax(), "V"));
        }
        if (!Double.isNaN(s.vGsMin())) {
            cmp.add(new Comparison("turn-off trough", f.ringTrough(), "≥", s.vGsMin(), "V"));
        }
        String loop = "at " + Eng.num(f.ringCornerC()) + " °C the gate loop (" + Eng.of(op.loop(), "H") + ", "
                + Eng.of(f.q().n * s.cIss(), "F") + ") has ζ " + Eng.num(f.ringZetaOn()) + " on and "
                + Eng.num(f.ringZetaOff()) + " off: the gate " + (f.ringZetaOn() < 1 ? "peaks at " + Eng.of(f.ringPeak(), "V")
                : "does not overshoot on turn-on") + " and " + (f.ringZetaOff() < 1 ? "dips to " + Eng.of(f.ringTrough(), "V")
                : "does not undershoot on turn-off");
        String limits = " against V_GS " + Eng.of(s.vGsMin(), "V") + " / " + Eng.of(s.vGsMax(), "V");
        return switch (w) {
            case NO_CAPACITANCE -> throw new IllegalStateException("worded above");
            case NO_LIMIT -> new Worded(loop + ", but V_GS,max or V_GS,min of the switch is unknown — look it up", cmp);
            case DAMPED -> new Worded(loop, cmp);
            case CLEAR -> new Worded(loop + limits, cmp);
            case NEAR -> new Worded(loop + limits + ", inside the " + Eng.pct(f.m().gateHeadroom()) + " headroom — "
                    + fix(f), cmp);
            case OVER -> new Worded(loop + ", past V_GS,max " + Eng.of(s.vGsMax(), "V") + " — " + fix(f), cmp);
            case UNDER -> new Worded(loop + ", past V_GS,min " + Eng.of(s.vGsMin(), "V") + " — " + fix(f), cmp);
        };
    }

    /**
     * The resistor (turn-on or turn-off, per switch) or the loop inductance that brings the worse side
     * inside the headroom: the damping ratio whose overshoot leaves the headroom
     * ({@link GateLoop#dampingForOvershoot}), as a loop resistance 2ζ√(L/C) or an inductance (R/2ζ)²·C.
     */
    private static String fix(PairFigures f) {
        SwitchPart s = f.s();
        OperatingPoint op = f.op();
        Question q = f.q();
        double h = f.m().gateHeadroom();
        double swing = op.swing();
        double on = roomOn(f);
        double off = roomOff(f);
        boolean onWorse = Double.isNaN(off) || (!Double.isNaN(on) && on <= off);
        double allowed = onWorse ? (s.vGsMax() * (1 - h) - op.vDrive()) / swing
                : (op.vDriveNeg() - s.vGsMin() * (1 - h)) / swing;
        if (!(allowed > 0)) {
            return onWorse ? "the on level itself leaves no headroom under V_GS,max (see gate-voltage)"
                    : "the off level itself leaves no headroom over V_GS,min (see negative-bias)";
        }
        if (allowed >= 1) {
            allowed = Math.nextDown(1.0);
        }
        double zeta = GateLoop.dampingForOvershoot(allowed);
        double cg = q.n * s.cIss();
        double kFast = Math.min(1, f.kHot());
        double rDrv = kFast * (onWorse ? f.rSrc() : f.rSnk());
        double rTotal = 2 * zeta * Math.sqrt(op.loop() / cg);
        double rg = q.n * (rTotal - rDrv) - q.rInt;
        double rNow = PairFigures.loop(q, rDrv, onWorse ? op.rG() : op.rGOff());
        double lMax = Math.pow(rNow / (2 * zeta), 2) * cg;
        String res = rg > 1e-3 && rg <= 1e6 ? "raise " + (onWorse ? "R_g" : "R_g,off") + " to ≥ "
                + Eng.of(ESeries.E24.roundUp(rg), "Ω") + " per switch or " : "";
        return res + (Double.isFinite(lMax) ? "cut the gate-loop inductance to ≤ " + Eng.of(lMax, "H") : "damp the gate loop")
                + " (ζ ≥ " + Eng.num(zeta) + ")";
    }
}
