package org.gatefit.match;

import org.gatefit.catalog.Op;
import java.util.ArrayList;
import java.util.List;
import org.gatefit.match.Check.Comparison;

/**
 * {@code uvlo}: the driver's undervoltage lockout against the supply (it must start, with the UVLO
 * headroom for tolerance and droop: common practice) and the gate level just before lock-out
 * against the switch's plateau or threshold (a sagging supply must not leave the switch half-on),
 * with the uvlo-plateau margin above it (the plateau rises with current and temperature).
 *
 * <p>What the thresholds monitor decides the gate level at lock-out ({@code uvlo_monitors}): a
 * UVLO on the positive rail against the source/emitter locks out when the on level itself falls to
 * UVLO falling; a UVLO on the total supply (positive minus negative rail) locks out with the on
 * level at UVLO falling plus the (negative) off level. When the catalog does not say, both readings
 * are judged; they agree whenever there is no negative rail, and when they disagree the check warns.
 */
final class UvloRule extends PairRule {
    enum Why implements Reason { NO_UVLO, NEVER_STARTS, HALF_ON, NEAR_PLATEAU, NEAR_START, NO_SWITCH_LEVELS, SAFE,
        READINGS_DISAGREE }

    /** The falling threshold, or the rising one when the falling one is unknown. */
    private static double offUvlo(DriverPart d) {
        return Double.isNaN(d.uvloOff()) ? d.uvloOn() : d.uvloOff();
    }

    /** The monitored supply: the total swing, or the on level when the UVLO watches the positive rail. */
    private static double monitored(PairFigures f, boolean total) {
        return total ? f.op().swing() : f.op().vDrive();
    }

    /** The gate level just before lock-out under one reading. */
    private static double gateAtUvlo(PairFigures f, boolean total) {
        return offUvlo(f.d()) + (total ? f.op().vDriveNeg() : 0);
    }

    /** What the gate must keep: the plateau (or V_th,max when higher or the plateau is unknown). */
    private static double need(SwitchPart s) {
        return Double.isNaN(s.vPlateau()) ? s.vThMax() : Math.max(s.vPlateau(), Double.isNaN(s.vThMax()) ? 0 : s.vThMax());
    }

    /** The gate level at lock-out that passes: the need with the uvlo-plateau margin. */
    private static double needWithMargin(PairFigures f) {
        return need(f.s()) * (1 + f.m().uvloPlateau());
    }

    /** The reading the catalog gives, or null when it does not say. */
    private static Boolean reference(PairFigures f) {
        return f.d().ratings().uvloTotal();
    }

    /** The judgement under one reading (the UVLO known). */
    private static Why reading(PairFigures f, boolean total) {
        DriverPart d = f.d();
        double supply = monitored(f, total);
        double need = need(f.s());
        double gate = gateAtUvlo(f, total);
        if (supply < d.uvloOn()) {
            return Why.NEVER_STARTS;
        } else if (!Double.isNaN(need) && gate < need) {
            return Why.HALF_ON;
        } else if (supply < d.uvloOn() + f.m().uvloHeadroom()) {
            return Why.NEAR_START;
        } else if (!Double.isNaN(need) && gate < needWithMargin(f)) {
            return Why.NEAR_PLATEAU;
        } else if (Double.isNaN(need) && Double.isNaN(PairFigures.fullEnhancement(f.s()))) {
            return Why.NO_SWITCH_LEVELS;
        }
        return Why.SAFE;
    }

    private static Verdict verdictOf(Why w) {
        return switch (w) {
            case NEVER_STARTS, HALF_ON -> Verdict.FAIL;
            case NEAR_START, NEAR_PLATEAU, READINGS_DISAGREE -> Verdict.WARN;
            case NO_UVLO, NO_SWITCH_LEVELS -> Verdict.UNKNOWN;
            case SAFE -> Verdict.PASS;
        };
    }

    @Override
    public void judge(PairFigures f, Outcome out) {
        if (Double.isNaN(f.d().uvloOn())) {
            out.unknown(Why.NO_UVLO);
            return;
        }
        Boolean ref = reference(f);
        boolean total = ref == null || ref;
        Why w = reading(f, total);
        if (ref == null) {
            Why rail = reading(f, false);
            if (verdictOf(rail) != verdictOf(w)) {
                out.warn(Why.READINGS_DISAGREE, 0.5);
                return;
            }
        }
        DriverPart d = f.d();
        double supply = monitored(f, total);
        switch (w) {
            case NEVER_STARTS, HALF_ON -> out.fail(w);
            case NEAR_START -> out.warn(w, (supply - d.uvloOn()) / f.m().uvloHeadroom());
            case NEAR_PLATEAU -> {
                double need = need(f.s());
                out.warn(w, (gateAtUvlo(f, total) - need) / (needWithMargin(f) - need));
            }
            case NO_SWITCH_LEVELS -> out.unknown(w);
            case SAFE -> out.pass(w, (supply - d.uvloOn() - f.m().uvloHeadroom()) / Math.max(1, supply));
            case NO_UVLO, READINGS_DISAGREE -> throw new IllegalStateException("not a reading's judgement: " + w);
        }
    }

    @Override
    public Worded word(ShownFigures shown, Reason why) {
        PairFigures f = shown.f;
        DriverPart d = f.d();
        Why w = (Why) why;
        if (w == Why.NO_UVLO) {
            return new Worded("this driver's UVLO thresholds are unknown (uvlo_on_v) — check that it starts at "
                    + Eng.of(f.op().swing(), "V") + " and what its outputs do when the supply sags");
        }
        if (w == Why.NO_SWITCH_LEVELS) {
            return new Worded("the driver starts at " + Eng.of(d.uvloOn(), "V") + ", but the switch's threshold"
                    + " and plateau are unknown, so the gate level at lock-out cannot be judged");
        }
        Boolean ref = reference(f);
        if (w == Why.READINGS_DISAGREE) {
            List<Comparison> cmp = new ArrayList<>();
            cmp.add(new Comparison("on level at lock-out (UVLO on the positive rail)", gateAtUvlo(f, false), "≥",
                    needWithMargin(f), "V"));
            cmp.add(new Comparison("on level at lock-out (UVLO on the total supply)", gateAtUvlo(f, true), "≥",
                    needWithMargin(f), "V"));
            return new Worded("the catalog does not say what this driver's UVLO monitors (uvlo_monitors): on the positive"
                    + " rail it locks out with " + Eng.of(gateAtUvlo(f, false), "V") + " on the gate ("
                    + reading(f, false).name().toLowerCase(java.util.Locale.ROOT).replace('_', ' ') + "), on the total "
                    + Eng.of(f.op().swing(), "V") + " supply with " + Eng.of(gateAtUvlo(f, true), "V") + " ("
                    + reading(f, true).name().toLowerCase(java.util.Locale.ROOT).replace('_', ' ') + "), against the "
                    + Eng.of(need(f.s()), "V") + " plateau — look up the UVLO reference in the datasheet", cmp);
        }
        boolean total = ref == null || ref;
        double supply = monitored(f, total);
        String supplyName = total || ref == null ? "the " + Eng.of(supply, "V") + " supply" : "the " + Eng.of(supply, "V") + " positive rail";
        double vNeg = f.op().vDriveNeg();
        double full = PairFigures.fullEnhancement(f.s());
        double need = need(f.s());
        double needM = needWithMargin(f);
        double offUvlo = offUvlo(d);
        double gate = gateAtUvlo(f, total);
        boolean igbt = f.s().technology() == Technology.IGBT;
        String igbtNear = igbt ? ": near its plateau an IGBT at rated current comes out of saturation (desaturates),"
                + " its V_CE and dissipation rising steeply" : "";
        List<Comparison> cmp = new ArrayList<>();
        cmp.add(new Comparison(total ? "supply above UVLO rising" : "positive rail above UVLO rising", supply, "≥",
                d.uvloOn() + f.m().uvloHeadroom(), "V"));
        if (w != Why.NEVER_STARTS) {
            if (!Double.isNaN(need)) {
                cmp.add(new Comparison("on level just before lock-out", gate, "≥", needM, "V"));
            }
            if (!Double.isNaN(full)) {
                cmp.add(new Comparison("on level just before lock-out (full enhancement)", gate, "≥", full, "V"));
            }
        }
        double startOn = d.uvloOn() + f.m().uvloHeadroom() + (total ? vNeg : 0); // the on level that starts it
        String msg = switch (w) {
            case NO_UVLO, NO_SWITCH_LEVELS, READINGS_DISAGREE -> throw new IllegalStateException("worded above");
            case NEVER_STARTS -> supplyName + " never reaches this driver's UVLO rising threshold "
                    + Eng.of(d.uvloOn(), "V") + ", so it stays locked out — " + (GateWindow.allows(f.s(), f.m(), startOn)
                    ? "raise the supply above " + Eng.of(supply - f.op().vDrive() + startOn, "V") + " or pick a driver"
                    + " with a lower UVLO" : "no on level within the switch's gate window (≤ "
                    + Eng.of(GateWindow.onLimit(f.s(), f.m()), "V") + ") starts it: pick a driver with a lower UVLO");
            case HALF_ON -> "the driver keeps switching down to " + Eng.of(offUvlo, "V") + " (UVLO falling"
                    + (ref == null ? "" : total ? " of the total supply" : " of the positive rail") + "), where the gate gets only "
                    + Eng.of(gate, "V") + ", below the " + Eng.of(need, "V") + " plateau/threshold, so a sagging supply"
                    + " leaves the switch half-on" + igbtNear + " — pick a driver with UVLO falling ≥ "
                    + Eng.of(needM - (total ? vNeg : 0), "V") + (total && vNeg < 0 ? " (the plateau with margin plus the "
                    + Eng.of(-vNeg, "V") + " negative rail)" : "");
            case NEAR_PLATEAU -> "the driver locks out at " + Eng.of(offUvlo, "V") + " with " + Eng.of(gate, "V")
                    + " on the gate, less than " + Eng.pct(f.m().uvloPlateau()) + " above the " + Eng.of(need, "V")
                    + " plateau (which rises with current and temperature)" + igbtNear
                    + " — pick a driver with UVLO falling ≥ " + Eng.of(needM - (total ? vNeg : 0), "V");
            case NEAR_START -> supplyName + " is within " + Eng.of(f.m().uvloHeadroom(), "V") + " of UVLO rising "
                    + Eng.of(d.uvloOn(), "V") + ", so supply tolerance or droop may lock the driver out — "
                    + (GateWindow.allows(f.s(), f.m(), startOn) ? "raise the supply or pick a lower UVLO"
                    : "the gate window leaves no room to raise it: pick a driver with a lower UVLO");
            case SAFE -> "the driver starts at " + Eng.of(d.uvloOn(), "V") + " (" + supplyName.substring(4)
                    + ") and locks out at " + Eng.of(offUvlo, "V") + ", before the gate falls below the "
                    + Eng.of(Double.isNaN(need) ? full : needM, "V") + (Double.isNaN(need) ? " full-enhancement level"
                    : " plateau with margin") + (!Double.isNaN(full) && gate < full ? "; between " + Eng.of(gate, "V")
                    + " and full enhancement " + Eng.of(full, "V") + (igbt ? " a sagging supply can desaturate the IGBT"
                    + " at rated current (V_CE and dissipation rise steeply) — desaturation protection covers it"
                    : " a sagging supply only raises conduction loss") : "");
        };
        return new Worded(msg, cmp);
    }

    /** A driver whose UVLO rising threshold is above the whole swing never starts under either reading (NEVER_STARTS). */
    @Override
    public void certainFailures(Question q, Prefilter.Builder b) {
        b.skip(Rule.UVLO, Prefilter.Condition.of("uvlo_on_v", Op.GT, q.op.swing()));
    }
}
