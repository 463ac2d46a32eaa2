package org.gatefit.match;

import java.util.List;
import org.gatefit.match.Check.Comparison;

/**
 * {@code dv-dt}: the gate voltage the switch-node slew induces through C_gd into the off switch's
 * sink path (REFERENCES.md §6, RC-limited), plus the off level, against V_th,min with the dv/dt
 * margin (common practice, no source). A Miller clamp turns a failure into a warning to verify.
 */
final class DvDtRule implements PairRule {
    enum Why implements Reason { NO_SWITCH_DATA, NO_SLEW, CLAMP_HOLDS, FALSE_TURN_ON, THIN, LOW }

    private static double seen(PairFigures f) {
        return f.vInduced() + f.op().vDriveNeg();
    }

    @Override
    public void judge(PairFigures f, Outcome out) {
        SwitchPart s = f.s();
        if (Double.isNaN(s.cRss()) || Double.isNaN(s.vThMin())) {
            out.unknown(Why.NO_SWITCH_DATA);
            return;
        }
        if (Double.isNaN(f.slew())) {
            out.unknown(Why.NO_SLEW);
            return;
        }
        double limit = s.vThMin() * f.m().dvdt();
        double seen = seen(f);
        if (seen >= s.vThMin()) {
            if (Boolean.TRUE.equals(f.d().millerClamp())) {
                out.warn(Why.CLAMP_HOLDS, 0.3);
            } else {
                out.fail(Why.FALSE_TURN_ON);
            }
        } else if (seen > limit) {
            out.warn(Why.THIN, (s.vThMin() - seen) / (s.vThMin() - limit));
        } else {
            out.pass(Why.LOW, (limit - seen) / limit);
        }
    }

    @Override
    public Worded word(ShownFigures shown, Reason why) {
        PairFigures f = shown.f;
        SwitchPart s = f.s();
        Why w = (Why) why;
        switch (w) {
            case NO_SWITCH_DATA:
                return new Worded("C_rss or V_th,min of the switch unknown, so Miller-induced turn-on cannot be judged");
            case NO_SLEW:
                return new Worded("switch-node dv/dt unknown (give --bus, or --dvdt, and the switch's Q_gd and plateau)");
            default:
                break;
        }
        double limit = s.vThMin() * f.m().dvdt();
        double seen = seen(f);
        boolean clamp = Boolean.TRUE.equals(f.d().millerClamp());
        List<Comparison> cmp = List.of(new Comparison("induced gate voltage + off level", seen, "≤", limit, "V"));
        String what = "at " + Eng.of(f.slew() * 1e-9, "V") + "/ns the Miller current lifts the off gate to " + Eng.of(seen, "V")
                + " (through " + Eng.of(f.rOffPath(), "Ω") + ") against V_th,min " + Eng.of(s.vThMin(), "V");
        String msg = switch (w) {
            case NO_SWITCH_DATA, NO_SLEW -> throw new IllegalStateException("worded above");
            case CLAMP_HOLDS -> what + "; this driver's Miller clamp should hold it — verify on the bench";
            case FALSE_TURN_ON -> what + ", so it may turn on falsely — lower R_g,off, add a negative off level or use a driver"
                    + " with a Miller clamp (allowed " + Eng.of(shown.dvdtAllowed * 1e-9, "V") + "/ns as is)";
            case THIN -> what + ", less than " + Eng.pct(1 - f.m().dvdt()) + " below it — lower R_g,off"
                    + " or add negative bias" + (clamp ? " (the Miller clamp helps)" : "");
            case LOW -> what + ", well below it";
        };
        return new Worded(msg, cmp);
    }
}
