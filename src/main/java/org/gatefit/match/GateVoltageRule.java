package org.gatefit.match;

import org.gatefit.catalog.Op;
import java.util.ArrayList;
import java.util.List;
import org.gatefit.match.Check.Comparison;

/**
 * {@code gate-voltage}: the drive levels against the driver's supply range, the on level against
 * the switch's V_GS,max less the gate headroom (room for overshoot: common practice, no source),
 * against V_th,max (the switch must turn on) and against the level R_DS(on) or V_CE(sat) is
 * specified at (full enhancement; datasheet convention).
 */
final class GateVoltageRule extends PairRule {
    enum Why implements Reason { NO_LIMIT, SUPPLY_HIGH, SUPPLY_LOW, OVER_LIMIT, BELOW_THRESHOLD, NEAR_LIMIT, ABOVE_WINDOW,
        NO_FULL_LEVEL, UNDER_ENHANCED, FITS }

    /**
     * Whether a higher on level costs short-circuit ruggedness: IGBTs and SiC MOSFETs are rated for a
     * short circuit at a stated gate voltage, and more drive raises the short-circuit current and
     * shortens the withstand time (REFERENCES.md §9; common practice, no source).
     */
    static boolean shortCircuitRated(SwitchPart s) {
        return s.technology() == Technology.IGBT || s.technology() == Technology.SIC_MOSFET;
    }

    /** Whether the on level is above the top of the switch's recommended range where that matters. */
    private static boolean aboveWindow(PairFigures f) {
        double top = f.s().ratings().vGateOnMax();
        return shortCircuitRated(f.s()) && !Double.isNaN(top) && f.op().vDrive() > top;
    }

    private static double limit(PairFigures f) {
        return f.s().vGsMax() * (1 - f.m().gateHeadroom());
    }

    @Override
    public void judge(PairFigures f, Outcome out) {
        SwitchPart s = f.s();
        double on = f.op().vDrive();
        double swing = f.op().swing();
        if (Double.isNaN(s.vGsMax())) {
            out.unknown(Why.NO_LIMIT);
            return;
        }
        double limit = limit(f);
        double full = PairFigures.fullEnhancement(s);
        if (swing > f.d().vSupplyMax()) {
            out.fail(Why.SUPPLY_HIGH);
        } else if (swing < f.d().vSupplyMin()) {
            out.fail(Why.SUPPLY_LOW);
        } else if (on > s.vGsMax()) {
            out.fail(Why.OVER_LIMIT);
        } else if (!Double.isNaN(s.vThMax()) && on <= s.vThMax()) {
            out.fail(Why.BELOW_THRESHOLD);
        } else if (on > limit) {
            out.warn(Why.NEAR_LIMIT, (s.vGsMax() - on) / (s.vGsMax() - limit));
        } else if (aboveWindow(f)) {
            out.warn(Why.ABOVE_WINDOW, 0.5);
        } else if (Double.isNaN(full)) {
            out.unknown(Why.NO_FULL_LEVEL);
        } else if (on < full) {
            out.warn(Why.UNDER_ENHANCED, Double.isNaN(s.vThMax()) ? 0.5 : (on - s.vThMax()) / (full - s.vThMax()));
        } else {
            out.pass(Why.FITS, 5 * Math.min((limit - on) / limit, (on - full) / Math.max(full, 1)));
        }
    }

    @Override
    public Worded word(ShownFigures shown, Reason why) {
        PairFigures f = shown.f;
        SwitchPart s = f.s();
        OperatingPoint op = f.op();
        double on = op.vDrive();
        double swing = op.swing();
        Why w = (Why) why;
        if (w == Why.NO_LIMIT) {
            return new Worded("the switch's V_GS,max (v_gs_max_v) is unknown, so the " + Eng.of(on, "V")
                    + " on level cannot be checked against it — look up the absolute gate limit in the datasheet");
        }
        double limit = limit(f);
        double full = PairFigures.fullEnhancement(s);
        List<Comparison> cmp = new ArrayList<>();
        cmp.add(new Comparison("driver supply (on − off level)", swing, "≥", f.d().vSupplyMin(), "V"));
        cmp.add(new Comparison("driver supply (on − off level)", swing, "≤", f.d().vSupplyMax(), "V"));
        cmp.add(new Comparison("on level", on, "≤", limit, "V"));
        if (!Double.isNaN(full)) {
            cmp.add(new Comparison("on level (full enhancement)", on, "≥", full, "V"));
        }
        if (!Double.isNaN(s.vThMax())) {
            cmp.add(new Comparison("on level (above threshold)", on, "≥", s.vThMax(), "V"));
        }
        if (shortCircuitRated(s) && !Double.isNaN(s.ratings().vGateOnMax())) {
            cmp.add(new Comparison("on level (recommended range)", on, "≤", s.ratings().vGateOnMax(), "V"));
        }
        String msg = switch (w) {
            case NO_LIMIT -> throw new IllegalStateException("worded above");
            case SUPPLY_HIGH -> "the " + Eng.of(swing, "V") + " supply (on " + Eng.of(on, "V") + ", off "
                    + Eng.of(op.vDriveNeg(), "V") + ") exceeds this driver's " + Eng.of(f.d().vSupplyMax(), "V")
                    + " maximum — lower the drive levels or pick a driver rated ≥ " + Eng.of(swing, "V");
            case SUPPLY_LOW -> "the " + Eng.of(swing, "V") + " supply is below this driver's "
                    + Eng.of(f.d().vSupplyMin(), "V") + " minimum — "
                    + (GateWindow.allows(s, f.m(), on + f.d().vSupplyMin() - swing) ? "raise the supply or " : "")
                    + "pick a driver that runs from " + Eng.of(swing, "V");
            case OVER_LIMIT -> "on level " + Eng.of(on, "V") + " exceeds the switch's V_GS,max of "
                    + Eng.of(s.vGsMax(), "V") + " and will damage the gate — drive at " + Eng.of(limit, "V")
                    + " or less" + (Double.isNaN(s.vGateOn()) ? "" : " (recommended " + Eng.of(s.vGateOn(), "V") + ")");
            case BELOW_THRESHOLD -> "on level " + Eng.of(on, "V") + " does not exceed V_th,max "
                    + Eng.of(s.vThMax(), "V") + ", so the switch may not turn on — drive at "
                    + Eng.of(Double.isNaN(full) ? s.vThMax() * 2 : full, "V") + " or more";
            case NEAR_LIMIT -> "on level " + Eng.of(on, "V") + " is within "
                    + Eng.pct(f.m().gateHeadroom()) + " of V_GS,max " + Eng.of(s.vGsMax(), "V")
                    + ", leaving little room for overshoot — drive at " + Eng.of(limit, "V") + " or less, or damp the gate loop";
            case ABOVE_WINDOW -> "on level " + Eng.of(on, "V") + " is above the " + Eng.of(s.ratings().vGateOnMax(), "V")
                    + " top of the switch's recommended range: more gate drive raises the short-circuit current and"
                    + " shortens the withstand time it is rated for — drive at " + Eng.of(s.ratings().vGateOnMax(), "V")
                    + " or less, or check the short-circuit rating at " + Eng.of(on, "V");
            case NO_FULL_LEVEL -> "on level " + Eng.of(on, "V") + " is within the limits,"
                    + " but the level R_on is specified at (r_on_vgs_v) is unknown — check full enhancement in the datasheet";
            case UNDER_ENHANCED -> "on level " + Eng.of(on, "V") + " is below the "
                    + Eng.of(full, "V") + " that " + (s.technology() == Technology.IGBT ? "V_CE(sat)" : "R_DS(on)")
                    + " is specified at, so conduction loss will be higher than the datasheet figure — drive at "
                    + Eng.of(full, "V") + " or more";
            case FITS -> "on level " + Eng.of(on, "V") + " fully enhances the switch (≥ "
                    + Eng.of(full, "V") + ") and stays below " + Eng.of(limit, "V") + " (V_GS,max " + Eng.of(s.vGsMax(), "V")
                    + " less " + Eng.pct(f.m().gateHeadroom()) + "); the driver runs from " + Eng.of(f.d().vSupplyMin(), "V")
                    + " to " + Eng.of(f.d().vSupplyMax(), "V");
        };
        return new Worded(msg, cmp);
    }

    /** A driver whose supply range does not hold the swing fails (supply limits are required columns). */
    @Override
    public void certainFailures(Question q, Prefilter.Builder b) {
        if (!Double.isNaN(q.s.vGsMax())) {
            b.require(Prefilter.Condition.of("v_supply_max_v", Op.GE, q.op.swing()));
            b.require(Prefilter.Condition.of("v_supply_min_v", Op.LE, q.op.swing()));
        }
    }
}
