package org.gatefit.match;

import java.util.ArrayList;
import java.util.List;
import org.gatefit.match.Check.Comparison;

/**
 * {@code bootstrap}: for a bootstrapped high side, the capacitor sized from the charge per cycle
 * (gate charge, level-shift charge, quiescent current and a leakage allowance) and the allowed
 * droop (V_drive − V_F − the high side's floor; REFERENCES.md §4), derated for its DC bias
 * (boot-cap-bias margin), and the duty limit from the steady-state charge balance of recharging it
 * through the bootstrap resistance while the switch node is low (REFERENCES.md §9).
 *
 * <p>A GaN high side: during dead time the low-side GaN conducts in reverse with no body diode,
 * about {@link #GAN_REVERSE_DROP} plus the magnitude of its off level, pulling the switch node that
 * far below ground, so the capacitor charges to V_DD − V_F + V_SD unless the driver clamps it
 * ({@code boot_clamp_v}); that level is checked against V_GS,max. Advice never raises the drive
 * level past the switch's gate window ({@link GateWindow}); when nothing in the window works the
 * sentence says so and offers a clamp or an isolated supply.
 */
final class BootstrapRule extends PairRule {
    enum Why implements Reason { LOW_SIDE, NO_FLOATING_SUPPLY, ISOLATED_SUPPLY, CANNOT_SIZE, NO_HEADROOM, FULL_DUTY,
        DUTY_TOO_HIGH, NO_DUTY, BELOW_FULL, EXTERNAL_DIODE_NO_BUS, SIZED, GAN_OVERCHARGE, GAN_OVERCHARGE_NEAR;

        @Override
        public String asks() {
            return this == NO_DUTY ? "duty-max" : null;
        }
    }

    /**
     * Reverse-conduction drop of an e-mode GaN switch at 0 V gate during dead time, V: 2–3 V with
     * no body diode (REFERENCES.md §9, from memory); a negative off level adds its magnitude.
     */
    static final double GAN_REVERSE_DROP = 2.5;

    /** The switch node's excursion below ground in dead time (GaN only; 0 otherwise), V. */
    private static double reverseDrop(PairFigures f) {
        return f.s().technology() == Technology.GAN_HEMT ? GAN_REVERSE_DROP - f.op().vDriveNeg() : 0;
    }

    /** The highest level the bootstrapped high side reaches: V_DD − V_F + V_SD, at most the driver's clamp. */
    private static double peakLevel(PairFigures f) {
        double v = f.op().vDrive() - f.op().diodeDrop() + reverseDrop(f);
        double clamp = f.d().ratings().bootClamp();
        return Double.isNaN(clamp) ? v : Math.min(v, clamp);
    }

    /** The highest V_DD the gate window allows for both gates of the leg (the low side's on level and the high side's peak). */
    private static double supplyLimit(PairFigures f) {
        double limit = GateWindow.onLimit(f.s(), f.m());
        double clamp = f.d().ratings().bootClamp();
        double viaHigh = Double.isNaN(clamp) ? limit + f.op().diodeDrop() - reverseDrop(f) : limit;
        return Math.min(limit, viaHigh);
    }

    /** Duty headroom below the limit at which the pass sub-score saturates (20 points, common practice, no source). */
    static final double SATURATES = 0.2;

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
        } else if (reverseDrop(f) > 0 && peakLevel(f) > f.s().vGsMax()) {
            out.fail(Why.GAN_OVERCHARGE);
        } else if (!Double.isNaN(duty) && duty >= 1) {
            out.fail(Why.FULL_DUTY);
        } else if (!Double.isNaN(duty) && !f.bootDutyAllows(duty)) {
            out.fail(Why.DUTY_TOO_HIGH);
        } else if (Double.isNaN(duty)) {
            out.unknown(Why.NO_DUTY);
        } else if (reverseDrop(f) > 0 && !GateWindow.allows(f.s(), f.m(), peakLevel(f))) {
            out.warn(Why.GAN_OVERCHARGE_NEAR, (f.s().vGsMax() - peakLevel(f))
                    / (f.s().vGsMax() - GateWindow.onLimit(f.s(), f.m())));
        } else if (f.bootBelowFull()) {
            out.warn(Why.BELOW_FULL, 0.5);
        } else if (Boolean.FALSE.equals(f.d().bootstrapDiode()) && Double.isNaN(op.bus())) {
            out.warn(Why.EXTERNAL_DIODE_NO_BUS, 0.5);
        } else {
            out.pass(Why.SIZED, f.bootDutyHeadroom(duty, SATURATES) / SATURATES);
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
        double peak = peakLevel(f);
        double vddMax = supplyLimit(f);
        String noSupply = "no supply level in the switch's gate window (V_GS,max " + Eng.of(f.s().vGsMax(), "V")
                + " less " + Eng.pct(f.m().gateHeadroom()) + ") works";
        if (w == Why.GAN_OVERCHARGE || w == Why.GAN_OVERCHARGE_NEAR) {
            cmp.add(new Comparison("high-side gate level with reverse conduction", peak, "≤",
                    GateWindow.onLimit(f.s(), f.m()), "V"));
            double full = PairFigures.fullEnhancement(f.s());
            // Lowering V_DD works only if the low side's gate (V_DD itself) still fully enhances
            // and the high side still clears its floor.
            boolean lower = vddMax - op.diodeDrop() >= f.bootFloor() && (Double.isNaN(full) || vddMax >= full);
            return new Worded("in dead time the low-side GaN conducts in reverse (about " + Eng.of(reverseDrop(f), "V")
                    + " with the " + Eng.of(op.vDriveNeg(), "V") + " off level) and pulls the switch node below ground, so"
                    + " the bootstrap charges to about " + Eng.of(peak, "V") + " (V_DD − V_F + V_SD), "
                    + (w == Why.GAN_OVERCHARGE ? "above V_GS,max " + Eng.of(f.s().vGsMax(), "V") : "within "
                    + Eng.pct(f.m().gateHeadroom()) + " of V_GS,max " + Eng.of(f.s().vGsMax(), "V")) + " — "
                    + (lower ? "lower V_DD to ≤ " + Eng.of(vddMax, "V") + " (both gates still fully enhanced), or "
                    : noSupply + " for both gates of the leg: ")
                    + "clamp the bootstrap (a Zener across C_boot, or a driver with a clamped bootstrap, boot_clamp_v)"
                    + " or use an isolated supply", cmp);
        }
        cmp.add(new Comparison("duty cycle", op.dutyMax(), "≤", f.bootDutyMax(), "1"));
        String sizing = "C_boot ≥ " + Eng.of(f.bootCMin(), "F") + " for " + Eng.of(f.bootCharge(), "C") + " per cycle at "
                + Eng.of(f.bootDroop(), "V") + " droop; use " + Eng.of(f.bootCRec(), "F") + " nominal ("
                + Eng.pct(f.m().bootCapBias()) + " left at DC bias)"
                + (op.bootAssumed() ? " (V_F " + Eng.of(op.diodeDrop(), "V") + ", R_boot " + Eng.of(op.rBoot(), "Ω")
                + " assumed)" : "");
        double fullAt = PairFigures.fullEnhancement(f.s()) + op.diodeDrop();
        String diode = Boolean.FALSE.equals(f.d().bootstrapDiode()) ? ", with an external fast diode rated ≥ "
                + Eng.of(Double.isNaN(op.bus()) ? Double.NaN : op.bus() * 1.2, "V") : "";
        String msg = switch (w) {
            case LOW_SIDE, NO_FLOATING_SUPPLY, ISOLATED_SUPPLY, CANNOT_SIZE, NO_HEADROOM, GAN_OVERCHARGE,
                    GAN_OVERCHARGE_NEAR -> throw new IllegalStateException("worded above");
            case FULL_DUTY -> "100 % duty is impossible with a bootstrap supply (it recharges only while the low"
                    + " side is on) — cap the duty at " + Eng.pct(f.bootDutyMax()) + " or use an isolated supply";
            case DUTY_TOO_HIGH -> "duty " + Eng.pct(op.dutyMax()) + " leaves too little low-side time to recharge "
                    + Eng.of(f.bootCRec(), "F") + " (" + Eng.of(f.bootCRec() * f.m().bootCapBias(), "F") + " at DC bias)"
                    + " through " + Eng.of(op.rBoot(), "Ω") + ": by charge balance the high side stays above its "
                    + Eng.of(f.bootFloor(), "V") + " floor up to " + Eng.pct(f.bootDutyMax()) + " duty — lower the duty,"
                    + " the frequency or the bootstrap resistance, or use a larger capacitor";
            case NO_DUTY -> sizing + diode + "; duty not given — the bootstrap allows at most "
                    + Eng.pct(f.bootDutyMax()) + " (give --duty-max or duty_max)";
            case BELOW_FULL -> "the bootstrap gives the high side at most "
                    + Eng.of(op.vDrive() - op.diodeDrop(), "V") + " (V_drive − V_F), below the "
                    + Eng.of(PairFigures.fullEnhancement(f.s()), "V")
                    + " full-enhancement level, so its conduction loss is higher than the low side's; " + sizing
                    + " against UVLO,off " + Eng.of(f.bootFloor(), "V") + diode + " — " + (fullAt <= vddMax
                    ? "raise V_drive to ≥ " + Eng.of(fullAt, "V") + " or use an isolated supply"
                    : noSupply + " for full enhancement through the diode: use an isolated supply or a charge pump");
            case EXTERNAL_DIODE_NO_BUS -> sizing + ", with an external fast diode rated above the bus (bus not given)";
            case SIZED -> sizing + diode + "; duty " + Eng.pct(op.dutyMax()) + " ≤ " + Eng.pct(f.bootDutyMax()) + " allowed";
        };
        return new Worded(msg, cmp);
    }
}
