package org.gatefit.match;

import java.util.ArrayList;
import java.util.List;
import org.gatefit.match.Check.Comparison;

/**
 * {@code bootstrap}: for a bootstrapped high side, the capacitor sized from the charge per cycle
 * and the allowed droop (V_drive − V_F − the high side's floor; REFERENCES.md §4), and the duty
 * limit from recharging it through the bootstrap resistance while the low side is on.
 */
final class BootstrapRule implements PairRule {
    enum Why implements Reason { LOW_SIDE, NO_FLOATING_SUPPLY, ISOLATED_SUPPLY, CANNOT_SIZE, NO_HEADROOM, FULL_DUTY,
        DUTY_TOO_HIGH, NO_DUTY, BELOW_FULL, EXTERNAL_DIODE_NO_BUS, SIZED }

    @Override
    public void judge(PairFigures f, Outcome out) {
        OperatingPoint op = f.op();
        double duty = op.dutyMax();
        if (!op.highSide()) {
            out.pass(Why.LOW_SIDE, 1);
        } else if (!f.d().topology().floats()) {
            out.fail(Why.NO_FLOATING_SUPPLY);
        } else if (!f.d().topology().bootstrapped()) {
            out.pass(Why.ISOLATED_SUPPLY, 1);
        } else if (Double.isNaN(f.bootDroop())) {
            out.unknown(Why.CANNOT_SIZE);
        } else if (f.bootDroop() <= 0) {
            out.fail(Why.NO_HEADROOM);
        } else if (!Double.isNaN(duty) && duty >= 1) {
            out.fail(Why.FULL_DUTY);
        } else if (!Double.isNaN(duty) && duty > f.bootDutyMax()) {
            out.fail(Why.DUTY_TOO_HIGH);
        } else if (Double.isNaN(duty)) {
            out.unknown(Why.NO_DUTY);
        } else if (f.bootBelowFull()) {
            out.warn(Why.BELOW_FULL, 0.5);
        } else if (Boolean.FALSE.equals(f.d().bootstrapDiode()) && Double.isNaN(op.bus())) {
            out.warn(Why.EXTERNAL_DIODE_NO_BUS, 0.5);
        } else {
            out.pass(Why.SIZED, (f.bootDutyMax() - duty) * 5);
        }
    }

    @Override
    public Worded word(ShownFigures shown, Reason why) {
        PairFigures f = shown.f;
        OperatingPoint op = f.op();
        Why w = (Why) why;
        switch (w) {
            case LOW_SIDE:
                return new Worded("low side: no bootstrap supply needed");
            case NO_FLOATING_SUPPLY:
                return new Worded("a low-side driver has no floating supply to bootstrap — pick a high-side,"
                        + " half-bridge or isolated driver");
            case ISOLATED_SUPPLY:
                return new Worded("isolated output: it needs its own isolated supply of "
                        + Eng.of(op.swing(), "V") + " (no bootstrap, no duty limit)");
            case CANNOT_SIZE:
                return new Worded("cannot size the bootstrap capacitor: gate charge or UVLO unknown");
            default:
                break;
        }
        List<Comparison> cmp = new ArrayList<>();
        cmp.add(new Comparison("allowed droop (V_drive − V_F − UVLO,off)", f.bootDroop(), "≥", 0, "V"));
        if (w == Why.NO_HEADROOM) {
            return new Worded("the bootstrap supply " + Eng.of(op.vDrive() - op.diodeDrop(), "V") + " (V_drive − V_F)"
                    + " is already at or below the high side's " + Eng.of(f.bootFloor(), "V") + " limit, so no capacitor helps"
                    + " — raise V_drive or pick a driver with a lower UVLO", cmp);
        }
        cmp.add(new Comparison("duty cycle", op.dutyMax(), "≤", f.bootDutyMax(), "1"));
        String sizing = "C_boot ≥ " + Eng.of(f.bootCMin(), "F") + " for " + Eng.of(f.bootCharge(), "C") + " per cycle at "
                + Eng.of(f.bootDroop(), "V") + " droop; use " + Eng.of(f.bootCRec(), "F")
                + (op.bootAssumed() ? " (V_F " + Eng.of(op.diodeDrop(), "V") + ", R_boot " + Eng.of(op.rBoot(), "Ω")
                + " assumed)" : "");
        String diode = Boolean.FALSE.equals(f.d().bootstrapDiode()) ? ", with an external fast diode rated ≥ "
                + Eng.of(Double.isNaN(op.bus()) ? Double.NaN : op.bus() * 1.2, "V") : "";
        String msg = switch (w) {
            case LOW_SIDE, NO_FLOATING_SUPPLY, ISOLATED_SUPPLY, CANNOT_SIZE, NO_HEADROOM ->
                    throw new IllegalStateException("worded above");
            case FULL_DUTY -> "100 % duty is impossible with a bootstrap supply (it recharges only while the low"
                    + " side is on) — cap the duty at " + Eng.pct(f.bootDutyMax()) + " or use an isolated supply";
            case DUTY_TOO_HIGH -> "duty " + Eng.pct(op.dutyMax()) + " leaves too little low-side time to recharge "
                    + Eng.of(f.bootCRec(), "F") + " through " + Eng.of(op.rBoot(), "Ω") + " (allowed " + Eng.pct(f.bootDutyMax())
                    + ") — lower the duty, the frequency or the bootstrap resistance";
            case NO_DUTY -> sizing + diode + "; duty not given — the bootstrap allows at most "
                    + Eng.pct(f.bootDutyMax()) + " (give --duty-max or duty_max)";
            case BELOW_FULL -> "the bootstrap gives the high side at most "
                    + Eng.of(op.vDrive() - op.diodeDrop(), "V") + " (V_drive − V_F), below the "
                    + Eng.of(PairFigures.fullEnhancement(f.s()), "V")
                    + " full-enhancement level, so its conduction loss is higher than the low side's; " + sizing
                    + " against UVLO,off " + Eng.of(f.bootFloor(), "V") + diode + " — raise V_drive to ≥ "
                    + Eng.of(PairFigures.fullEnhancement(f.s()) + op.diodeDrop(), "V") + " or use an isolated supply";
            case EXTERNAL_DIODE_NO_BUS -> sizing + ", with an external fast diode rated above the bus (bus not given)";
            case SIZED -> sizing + diode + "; duty " + Eng.pct(op.dutyMax()) + " ≤ " + Eng.pct(f.bootDutyMax()) + " allowed";
        };
        return new Worded(msg, cmp);
    }
}
