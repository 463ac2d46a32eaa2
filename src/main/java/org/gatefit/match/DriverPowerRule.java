package org.gatefit.match;

import java.util.List;
import org.gatefit.match.Check.Comparison;

/**
 * {@code driver-power}: per package, not per channel: each channel that switches (all of the
 * driver's unless {@code --channels-used} says fewer; one per stage in {@code check}, where the
 * stages on one designator are then added up) adds the share of the gate-drive power Q_g·ΔV·f
 * dissipated in the driver (its output resistance against the external and internal gate
 * resistance; REFERENCES.md §2), the high side's quiescent power, the output-side quiescent power
 * (supply × {@code i_q_out_ma}) and a high side's level-shifter loss ({@code q_ls_nc} × bus × f),
 * against the package limit derated by the driver-power margin.
 */
final class DriverPowerRule extends PairRule {
    enum Why implements Reason { NO_CHARGE, NO_LIMIT, OVER_LIMIT, HOT, COOL }

    @Override
    public void judge(PairFigures f, Outcome out) {
        double pMax = f.d().pMax();
        double allowed = pMax * f.m().driverPower();
        if (Double.isNaN(f.pDriver())) {
            out.unknown(Why.NO_CHARGE);
        } else if (Double.isNaN(pMax)) {
            out.unknown(Why.NO_LIMIT);
        } else if (f.pDriver() > pMax) {
            out.fail(Why.OVER_LIMIT);
        } else if (f.pDriver() > allowed) {
            out.warn(Why.HOT, (pMax - f.pDriver()) / (pMax - allowed));
        } else {
            out.pass(Why.COOL, allowed / Math.max(f.pDriver(), 1e-12) - 1);
        }
    }

    @Override
    public Worded word(ShownFigures shown, Reason why) {
        PairFigures f = shown.f;
        Why w = (Why) why;
        if (w == Why.NO_CHARGE) {
            return new Worded("gate charge unknown, so driver dissipation cannot be estimated");
        }
        double pMax = f.d().pMax();
        double allowed = pMax * f.m().driverPower();
        int ch = PairFigures.channelsUsed(f.d(), f.op());
        String est = Eng.of(f.pDriver(), "W") + " in the driver package (" + (ch == 1 ? "1 channel" : ch + " channels alike")
                + " switching, each " + Eng.of(shown.pGate, "W") + " gate-drive power at " + Eng.of(f.op().fSw(), "Hz")
                + (f.rSrcEstimated() || f.rSnkEstimated() ? ", output resistance estimated as V/I_peak" : "") + ")";
        List<Comparison> cmp = List.of(new Comparison("driver dissipation", f.pDriver(), "≤", allowed, "W"));
        return switch (w) {
            case NO_CHARGE -> throw new IllegalStateException("worded above");
            case NO_LIMIT -> new Worded(est + "; the package limit (p_max_w) is unknown — check it against the datasheet");
            case OVER_LIMIT -> new Worded(est + " exceeds its " + Eng.of(pMax, "W") + " package limit — add external gate"
                    + " resistance to move loss out of the driver, lower the frequency, or add a buffer stage", cmp);
            case HOT -> new Worded(est + " uses more than " + Eng.pct(f.m().driverPower()) + " of its "
                    + Eng.of(pMax, "W") + " limit — check the temperature rise at your ambient", cmp);
            case COOL -> new Worded(est + ", within " + Eng.pct(f.m().driverPower()) + " of its " + Eng.of(pMax, "W") + " limit",
                    cmp);
        };
    }
}
