package org.gatefit.match;

import org.gatefit.catalog.Op;
import java.util.ArrayList;
import java.util.List;
import org.gatefit.match.Check.Comparison;

/**
 * {@code negative-bias}: the off level against the switch's V_GS,min less the gate headroom, the
 * driver's negative rail, and the off level the switch recommends (datasheet limits; the headroom
 * for undershoot is common practice, no source).
 */
final class NegativeBiasRule extends PairRule {
    enum Why implements Reason { NO_LIMIT, BELOW_LIMIT, NO_RAIL, BEYOND_RAIL, NEAR_LIMIT, BELOW_WINDOW, CLAMP_HOLDS,
        LESS_NEGATIVE, FITS }

    private static double limit(PairFigures f) {
        return f.s().vGsMin() * (1 - f.m().gateHeadroom());
    }

    @Override
    public void judge(PairFigures f, Outcome out) {
        SwitchPart s = f.s();
        DriverPart d = f.d();
        double off = f.op().vDriveNeg();
        if (Double.isNaN(s.vGsMin())) {
            out.unknown(Why.NO_LIMIT);
        } else if (off < s.vGsMin()) {
            out.fail(Why.BELOW_LIMIT);
        } else if (off < 0 && (Double.isNaN(d.vNegMin()) || d.vNegMin() == 0)) {
            out.fail(Why.NO_RAIL);
        } else if (off < 0 && off < d.vNegMin()) {
            out.fail(Why.BEYOND_RAIL);
        } else if (off < limit(f)) {
            out.warn(Why.NEAR_LIMIT, 0.5);
        } else if (!Double.isNaN(s.ratings().vGateOffMin()) && off < s.ratings().vGateOffMin()) {
            out.warn(Why.BELOW_WINDOW, 0.5);
        } else if (!Double.isNaN(s.vGateOff()) && s.vGateOff() < 0 && off > s.vGateOff()) {
            if (Boolean.TRUE.equals(d.millerClamp())) {
                out.pass(Why.CLAMP_HOLDS, 0);
            } else {
                out.warn(Why.LESS_NEGATIVE, 0.5);
            }
        } else {
            out.pass(Why.FITS, 1);
        }
    }

    @Override
    public Worded word(ShownFigures shown, Reason why) {
        PairFigures f = shown.f;
        SwitchPart s = f.s();
        DriverPart d = f.d();
        double off = f.op().vDriveNeg();
        Why w = (Why) why;
        if (w == Why.NO_LIMIT) {
            return new Worded("the switch's V_GS,min (v_gs_min_v) is unknown, so the " + Eng.of(off, "V")
                    + " off level cannot be checked against it — look up the negative gate limit in the datasheet");
        }
        double limit = limit(f);
        List<Comparison> cmp = new ArrayList<>();
        cmp.add(new Comparison("off level", off, "≥", limit, "V"));
        if (off < 0) {
            cmp.add(new Comparison("off level (driver's negative rail)", off, "≥",
                    Double.isNaN(d.vNegMin()) ? 0 : d.vNegMin(), "V"));
        }
        if (!Double.isNaN(s.vGateOff())) {
            cmp.add(new Comparison("off level (switch's recommendation)", off, "≤", s.vGateOff(), "V"));
        }
        if (!Double.isNaN(s.ratings().vGateOffMin())) {
            cmp.add(new Comparison("off level (recommended range)", off, "≥", s.ratings().vGateOffMin(), "V"));
        }
        String msg = switch (w) {
            case NO_LIMIT -> throw new IllegalStateException("worded above");
            case BELOW_LIMIT -> "off level " + Eng.of(off, "V") + " is below the switch's V_GS,min "
                    + Eng.of(s.vGsMin(), "V") + " and will damage the gate — use " + Eng.of(limit, "V") + " or less negative";
            case NO_RAIL -> "the stage asks for " + Eng.of(off, "V") + " off, but this driver has no"
                    + " negative output rail — pick a driver with a negative rail (v_neg_min_v ≤ " + Eng.of(off, "V")
                    + ") or turn off at 0 V with a Miller clamp";
            case BEYOND_RAIL -> "off level " + Eng.of(off, "V") + " is below the " + Eng.of(d.vNegMin(), "V")
                    + " this driver's negative rail supports — use " + Eng.of(d.vNegMin(), "V") + " or pick a driver rated for "
                    + Eng.of(off, "V");
            case NEAR_LIMIT -> "off level " + Eng.of(off, "V") + " is within "
                    + Eng.pct(f.m().gateHeadroom()) + " of V_GS,min " + Eng.of(s.vGsMin(), "V") + " — undershoot may exceed it;"
                    + " use " + Eng.of(limit, "V") + " or less negative";
            case BELOW_WINDOW -> "off level " + Eng.of(off, "V") + " is more negative than the "
                    + Eng.of(s.ratings().vGateOffMin(), "V") + " the switch recommends at most"
                    + (s.technology() == Technology.SIC_MOSFET ? " (a SiC gate threshold drifts under deeper negative bias;"
                    + " from memory of published reliability studies)" : "") + " — turn off at "
                    + Eng.of(s.ratings().vGateOffMin(), "V") + " or less negative";
            case CLAMP_HOLDS -> "the switch recommends " + Eng.of(s.vGateOff(), "V") + " off but the stage gives "
                    + Eng.of(off, "V") + "; this driver's Miller clamp holds the gate low, so verify turn-off on the bench";
            case LESS_NEGATIVE -> "the switch recommends " + Eng.of(s.vGateOff(), "V") + " off but the stage gives "
                    + Eng.of(off, "V") + " — add a negative rail or use a driver with a Miller clamp, or dv/dt and noise may"
                    + " turn it on";
            case FITS -> "off level " + Eng.of(off, "V") + " is within the switch's limit "
                    + Eng.of(s.vGsMin(), "V") + (off < 0 ? " and the driver's negative rail " + Eng.of(d.vNegMin(), "V") : "")
                    + (Double.isNaN(s.vGateOff()) ? "" : " and meets its recommended " + Eng.of(s.vGateOff(), "V"));
        };
        return new Worded(msg, cmp);
    }

    /** A negative off level beyond a driver's known negative rail fails (BEYOND_RAIL). */
    @Override
    public void certainFailures(Question q, Prefilter.Builder b) {
        double off = q.op.vDriveNeg();
        if (off < 0 && !Double.isNaN(q.s.vGsMin()) && off >= q.s.vGsMin()) {
            b.skip(Rule.NEGATIVE_BIAS, Prefilter.Condition.of("v_neg_min_v", Op.GT, off));
        }
    }
}
