package org.gatefit.match;

import org.gatefit.catalog.Op;
import java.util.ArrayList;
import java.util.List;
import org.gatefit.match.Check.Comparison;

/**
 * {@code uvlo}: the driver's undervoltage lockout against the supply (it must start, with the UVLO
 * headroom for tolerance and droop: common practice) and the gate level just before lock-out
 * against the switch's plateau or threshold (a sagging supply must not leave the switch half-on).
 */
final class UvloRule implements PairRule {
    enum Why implements Reason { NO_UVLO, NEVER_STARTS, HALF_ON, NEAR_START, NO_SWITCH_LEVELS, SAFE }

    /** The falling threshold, or the rising one when the falling one is unknown. */
    private static double offUvlo(DriverPart d) {
        return Double.isNaN(d.uvloOff()) ? d.uvloOn() : d.uvloOff();
    }

    /** The gate level just before lock-out: the falling threshold plus the (negative) off level. */
    private static double gateAtUvlo(PairFigures f) {
        return offUvlo(f.d()) + f.op().vDriveNeg();
    }

    /** What the gate must keep: the plateau (or V_th,max when higher or the plateau is unknown). */
    private static double need(SwitchPart s) {
        return Double.isNaN(s.vPlateau()) ? s.vThMax() : Math.max(s.vPlateau(), Double.isNaN(s.vThMax()) ? 0 : s.vThMax());
    }

    @Override
    public void judge(PairFigures f, Outcome out) {
        DriverPart d = f.d();
        double supply = f.op().swing();
        double need = need(f.s());
        if (Double.isNaN(d.uvloOn())) {
            out.unknown(Why.NO_UVLO);
        } else if (supply < d.uvloOn()) {
            out.fail(Why.NEVER_STARTS);
        } else if (!Double.isNaN(need) && gateAtUvlo(f) < need) {
            out.fail(Why.HALF_ON);
        } else if (supply < d.uvloOn() + f.m().uvloHeadroom()) {
            out.warn(Why.NEAR_START, (supply - d.uvloOn()) / f.m().uvloHeadroom());
        } else if (Double.isNaN(need) && Double.isNaN(PairFigures.fullEnhancement(f.s()))) {
            out.unknown(Why.NO_SWITCH_LEVELS);
        } else {
            out.pass(Why.SAFE, (supply - d.uvloOn() - f.m().uvloHeadroom()) / Math.max(1, supply));
        }
    }

    @Override
    public Worded word(ShownFigures shown, Reason why) {
        PairFigures f = shown.f;
        DriverPart d = f.d();
        double supply = f.op().swing();
        double vNeg = f.op().vDriveNeg();
        Why w = (Why) why;
        double full = PairFigures.fullEnhancement(f.s());
        double need = need(f.s());
        double offUvlo = offUvlo(d);
        double gate = gateAtUvlo(f);
        switch (w) {
            case NO_UVLO:
                return new Worded("this driver's UVLO thresholds are unknown (uvlo_on_v) — check that it starts at "
                        + Eng.of(supply, "V") + " and what its outputs do when the supply sags");
            case NO_SWITCH_LEVELS:
                return new Worded("the driver starts at " + Eng.of(d.uvloOn(), "V") + ", but the switch's threshold"
                        + " and plateau are unknown, so the gate level at lock-out cannot be judged");
            default:
                break;
        }
        List<Comparison> cmp = new ArrayList<>();
        cmp.add(new Comparison("supply above UVLO rising", supply, "≥", d.uvloOn() + f.m().uvloHeadroom(), "V"));
        if (w != Why.NEVER_STARTS) {
            if (!Double.isNaN(need)) {
                cmp.add(new Comparison("on level just before lock-out", gate, "≥", need, "V"));
            }
            if (!Double.isNaN(full)) {
                cmp.add(new Comparison("on level just before lock-out (full enhancement)", gate, "≥", full, "V"));
            }
        }
        String msg = switch (w) {
            case NO_UVLO, NO_SWITCH_LEVELS -> throw new IllegalStateException("worded above");
            case NEVER_STARTS -> "the " + Eng.of(supply, "V") + " supply never reaches this driver's UVLO rising threshold "
                    + Eng.of(d.uvloOn(), "V") + ", so it stays locked out — raise the supply above " + Eng.of(d.uvloOn()
                    + f.m().uvloHeadroom(), "V") + " or pick a driver with a lower UVLO";
            case HALF_ON -> "the driver keeps switching down to " + Eng.of(offUvlo, "V") + " (UVLO falling), where the"
                    + " gate gets only " + Eng.of(gate, "V") + ", below the " + Eng.of(need, "V")
                    + " plateau/threshold, so a sagging supply leaves the switch half-on — pick a driver with UVLO falling ≥ "
                    + Eng.of(need - vNeg, "V") + (vNeg < 0 ? " (the plateau plus the "
                    + Eng.of(-vNeg, "V") + " negative rail)" : "");
            case NEAR_START -> "the " + Eng.of(supply, "V") + " supply is within "
                    + Eng.of(f.m().uvloHeadroom(), "V") + " of UVLO rising " + Eng.of(d.uvloOn(), "V")
                    + ", so supply tolerance or droop may lock the driver out — raise the supply or pick a lower UVLO";
            case SAFE -> "the driver starts at " + Eng.of(d.uvloOn(), "V") + " (supply "
                    + Eng.of(supply, "V") + ") and locks out at " + Eng.of(offUvlo, "V") + ", before the gate falls below the "
                    + Eng.of(Double.isNaN(need) ? full : need, "V") + (Double.isNaN(need) ? " full-enhancement level" : " plateau")
                    + (!Double.isNaN(full) && gate < full ? "; between " + Eng.of(gate, "V") + " and full enhancement "
                    + Eng.of(full, "V") + " a sagging supply only raises conduction loss" : "");
        };
        return new Worded(msg, cmp);
    }

    /** A driver whose UVLO rising threshold is above the supply never starts (NEVER_STARTS). */
    @Override
    public void certainFailures(Question q, Prefilter.Builder b) {
        b.skip(Rule.UVLO, Prefilter.Condition.of("uvlo_on_v", Op.GT, q.op.swing()));
    }
}
