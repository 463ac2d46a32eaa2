package org.gatefit.match;

import java.util.List;
import org.gatefit.match.Check.Comparison;

/**
 * {@code dv-dt}: Miller turn-on of the switch that stays off while its twin turns on, charge-consistent
 * (REFERENCES.md §7 and §8). The switch node moves the bus in the twin's turn-on plateau time (the
 * same pair, or {@code --dvdt}); the off switch's C_gd averaged over the swing, Q_gd / V_bus, carries
 * the Miller current into the gate node, which is held through the sink path (n·R_sink + R_g,off +
 * R_g,int; with a Miller clamp the clamp, taken as strong as the sink, bypasses R_g,off — from
 * memory) and loaded by C_iss: the RC-limited peak, never above the capacitive divider. That plus the
 * off level is compared with V_th,min at each corner (25 °C: faster edge, higher threshold; the
 * junction temperature: lower threshold, weaker sink) and the corner nearer to turning on decides:
 * fail at V_th,min, warn above the dv-dt margin's fraction of it (common practice, no source).
 */
final class DvDtRule extends PairRule {
    enum Why implements Reason { NO_TWIN, NO_THRESHOLD, NO_CHARGE, NO_BUS, NO_SLEW, FALSE_TURN_ON, THIN, LOW;

        @Override
        public String asks() {
            return this == NO_BUS ? "bus" : null;
        }
    }

    private static double seen(PairFigures f) {
        return f.vInduced() + f.op().vDriveNeg();
    }

    @Override
    public void judge(PairFigures f, Outcome out) {
        SwitchPart s = f.s();
        if (!f.op().bridge() && Double.isNaN(f.op().dvdt())) {
            out.pass(Why.NO_TWIN, 1);
            return;
        }
        if (Double.isNaN(s.vThMin())) {
            out.unknown(Why.NO_THRESHOLD);
            return;
        }
        if (Double.isNaN(s.qGd())) {
            out.unknown(Why.NO_CHARGE);
            return;
        }
        if (!(f.op().bus() > 0)) {
            out.unknown(Why.NO_BUS);
            return;
        }
        if (Double.isNaN(f.slew()) || Double.isNaN(f.vInduced())) {
            out.unknown(Why.NO_SLEW);
            return;
        }
        double th = f.vThSeen();
        double limit = th * f.m().dvdt();
        double seen = seen(f);
        if (th <= 0 || seen >= th) {
            out.fail(Why.FALSE_TURN_ON);
        } else if (seen > limit) {
            out.warn(Why.THIN, (th - seen) / (th - limit));
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
            case NO_TWIN:
                return new Worded("no other switch turns on against this one (bridge: no), so its drain moves only on its"
                        + " own edges, while its gate is driven — no Miller turn-on to judge (give --dvdt if something"
                        + " else slews its drain)");
            case NO_THRESHOLD:
                return new Worded("V_th,min of the switch unknown, so Miller-induced turn-on cannot be judged");
            case NO_CHARGE:
                return new Worded("Q_gd of the switch unknown, so the charge the switch node pushes into the off gate cannot"
                        + " be computed (C_rss at one test voltage understates it at low drain voltage)");
            case NO_BUS:
                return new Worded("bus voltage unknown, so the Miller current into the off gate cannot be computed (give --bus"
                        + " or bus_v)");
            case NO_SLEW:
                return new Worded("switch-node dv/dt unknown (give --dvdt, or the switch's plateau voltage so it can be"
                        + " estimated)");
            default:
                break;
        }
        double th = f.vThSeen();
        double limit = th * f.m().dvdt();
        double seen = seen(f);
        boolean clamp = Boolean.TRUE.equals(f.d().millerClamp());
        List<Comparison> cmp = List.of(new Comparison("induced gate voltage + off level at " + Eng.num(f.dvdtCornerC())
                + " °C", seen, "≤", limit, "V"));
        String slew = Eng.slew(f.slew()) + (!Double.isNaN(f.op().dvdt()) ? " (as given)"
                : f.op().twin() != null ? " (" + f.op().twin().name() + "'s turn-on)" : " (the twin's turn-on)");
        String what = "at " + Eng.num(f.dvdtCornerC()) + " °C the switch node slews at " + slew + " and the Miller current"
                + " (Q_gd " + Eng.of(s.qGd(), "C") + " over " + Eng.of(f.op().bus(), "V") + ") lifts the off gate to "
                + Eng.of(seen, "V") + " through " + Eng.of(f.rOffPath(), "Ω")
                + (clamp ? " (the Miller clamp's path)" : " (sink + R_g,off + R_g,int)")
                + " against V_th,min " + Eng.of(th, "V");
        String msg = switch (w) {
            case NO_TWIN, NO_THRESHOLD, NO_CHARGE, NO_BUS, NO_SLEW -> throw new IllegalStateException("worded above");
            case FALSE_TURN_ON -> what + ", so it may turn on with its twin (shoot-through) — " + shown.dvdtFix()
                    + (Double.isFinite(shown.dvdtAllowed) ? " (allowed " + Eng.slew(shown.dvdtAllowed)
                    + " as is)" : "");
            case THIN -> what + ", within " + Eng.pct(1 - f.m().dvdt()) + " of it — " + shown.dvdtFix();
            case LOW -> what + ", well below it";
        };
        return new Worded(msg, cmp);
    }
}
