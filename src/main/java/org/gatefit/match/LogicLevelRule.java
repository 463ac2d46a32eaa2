package org.gatefit.match;

import org.gatefit.catalog.Op;
import java.util.ArrayList;
import java.util.List;
import org.gatefit.match.Check.Comparison;

/**
 * {@code logic-level}: the controller's output levels against the driver's input thresholds
 * (noise margins V_OH − V_IH and V_IL − V_OL, JEDEC JESD8 definitions) and its input maximum;
 * the smallest margin that passes is the logic-noise margin (common practice).
 */
final class LogicLevelRule extends PairRule {
    enum Why implements Reason { NO_THRESHOLDS, OVER_INPUT_MAX, HIGH_MISSED, LOW_MISSED, THIN, CLEAR }

    @Override
    public void judge(PairFigures f, Outcome out) {
        DriverPart d = f.d();
        double noise = f.m().logicNoise();
        if (Double.isNaN(d.vIh()) || Double.isNaN(d.vIl())) {
            out.unknown(Why.NO_THRESHOLDS);
        } else if (!Double.isNaN(d.vInMax()) && f.op().vOhMax() > d.vInMax()) {
            out.fail(Why.OVER_INPUT_MAX);
        } else if (f.nmHigh() < 0) {
            out.fail(Why.HIGH_MISSED);
        } else if (f.nmLow() < 0) {
            out.fail(Why.LOW_MISSED);
        } else {
            double worst = Math.min(f.nmHigh(), f.nmLow());
            if (worst < noise) {
                out.warn(Why.THIN, worst / noise);
            } else {
                out.pass(Why.CLEAR, worst / 0.8);
            }
        }
    }

    @Override
    public Worded word(ShownFigures shown, Reason why) {
        PairFigures f = shown.f;
        DriverPart d = f.d();
        OperatingPoint op = f.op();
        double noise = f.m().logicNoise();
        String from = op.logic() == null ? "the controller" : "the " + op.logic().id() + " controller";
        Why w = (Why) why;
        if (w == Why.NO_THRESHOLDS) {
            return new Worded("this driver's input thresholds (v_ih_v, v_il_v) are unknown — check that "
                    + from + " (V_OH " + Eng.of(op.vOh(), "V") + ", V_OL " + Eng.of(op.vOl(), "V") + ") drives it");
        }
        List<Comparison> cmp = new ArrayList<>();
        cmp.add(new Comparison("noise margin high (V_OH − V_IH)", f.nmHigh(), "≥", noise, "V"));
        cmp.add(new Comparison("noise margin low (V_IL − V_OL)", f.nmLow(), "≥", noise, "V"));
        if (!Double.isNaN(d.vInMax())) {
            cmp.add(new Comparison("controller output high", op.vOhMax(), "≤", d.vInMax(), "V"));
        }
        String margins = "noise margins " + Eng.of(f.nmHigh(), "V") + " high, " + Eng.of(f.nmLow(), "V") + " low";
        String msg = switch (w) {
            case NO_THRESHOLDS -> throw new IllegalStateException("worded above");
            case OVER_INPUT_MAX -> from + " drives up to " + Eng.of(op.vOhMax(), "V") + ", above this driver's "
                    + Eng.of(d.vInMax(), "V") + " input maximum — add a level shifter or pick a driver with a higher input rating";
            case HIGH_MISSED -> from + " gives V_OH " + Eng.of(op.vOh(), "V") + " but this driver needs V_IH "
                    + Eng.of(d.vIh(), "V") + " (margin " + Eng.of(f.nmHigh(), "V") + "), so a high may not register — pick a driver"
                    + " with V_IH ≤ " + Eng.of(op.vOh() - noise, "V") + " or add a level shifter";
            case LOW_MISSED -> from + " gives V_OL " + Eng.of(op.vOl(), "V") + " but this driver needs V_IL "
                    + Eng.of(d.vIl(), "V") + " (margin " + Eng.of(f.nmLow(), "V") + "), so a low may not register — pick a driver"
                    + " with V_IL ≥ " + Eng.of(op.vOl() + noise, "V");
            case THIN -> from + " into V_IH " + Eng.of(d.vIh(), "V") + " / V_IL "
                    + Eng.of(d.vIl(), "V") + ": " + margins + ", under the " + Eng.of(noise, "V")
                    + " asked for — keep the input trace short or pick a driver with lower thresholds";
            case CLEAR -> from + " into V_IH " + Eng.of(d.vIh(), "V") + " / V_IL " + Eng.of(d.vIl(), "V") + ": " + margins;
        };
        return new Worded(msg, cmp);
    }

    /** With both thresholds known, a negative noise margin or an input maximum below the controller's high level fails. */
    @Override
    public void certainFailures(Question q, Prefilter.Builder b) {
        OperatingPoint op = q.op;
        if (Double.isFinite(op.vOh())) {
            b.skipKnown(Rule.LOGIC_LEVEL, Prefilter.Condition.of("v_ih_v", Op.GT, op.vOh()), "v_il_v");
        }
        if (Double.isFinite(op.vOl())) {
            b.skipKnown(Rule.LOGIC_LEVEL, Prefilter.Condition.of("v_il_v", Op.LT, op.vOl()), "v_ih_v");
        }
        if (Double.isFinite(op.vOhMax())) {
            b.skipKnown(Rule.LOGIC_LEVEL, Prefilter.Condition.of("v_in_max_v", Op.LT, op.vOhMax()),
                    "v_ih_v", "v_il_v");
        }
    }
}
