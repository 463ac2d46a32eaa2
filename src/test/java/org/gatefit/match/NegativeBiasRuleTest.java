package org.gatefit.match;

import static org.gatefit.match.RuleCase.S0;
import static org.gatefit.match.RuleCase.check;
import static org.gatefit.match.RuleCase.compared;
import static org.gatefit.match.RuleCase.notCompared;
import static org.gatefit.match.RuleCase.pass;
import static org.gatefit.match.RuleCase.says;
import static org.gatefit.match.RuleCase.saysNot;
import static org.gatefit.match.RuleCase.verdict;
import static org.gatefit.match.RuleCase.warn;

import java.util.function.Consumer;
import org.junit.jupiter.api.Test;

/**
 * {@code negative-bias} at its limits, with the datasheet-convention definitions (REFERENCES §5): the
 * off level at least V_GS,min (less the 10 % gate headroom for undershoot, common practice, no source:
 * −20 V → −18 V), within the driver's negative rail, not below the switch's recommended range
 * (REFERENCES §9) and at least as negative as the off level the switch recommends. Every warning
 * scores 0.5 of the way (0.5), a clamp that stands in for a negative rail a bare pass (0.7), a fit 1.
 */
class NegativeBiasRuleTest {

    private static Check off(double vNeg, double rail, Consumer<Parts.Sw> s) {
        return check(Rule.NEGATIVE_BIAS, s, d -> {
            d.vNegMin = rail;
            d.vSupplyMax = 40;
        }, o -> o.vDriveNeg = vNeg);
    }

    @Test
    void anOffLevelAtVgsMinIsNearTheLimitNotPastIt() {
        Check c = off(-20, -20, S0);
        verdict(c, Verdict.WARN, warn(0.5));
        says(c, "off level -20 V is within 10 % of V_GS,min -20 V — undershoot may exceed it; use -18 V or less negative");
        compared(c, "off level", -20, "≥", -18);
        compared(c, "off level (driver's negative rail)", -20, "≥", -20);
    }

    @Test
    void anOffLevelJustPastVgsMinFails() {
        Check c = off(-20.5, -30, S0);
        verdict(c, Verdict.FAIL, 0);
        says(c, "off level -20.5 V is below the switch's V_GS,min -20 V and will damage the gate — use -18 V or less negative");
    }

    @Test
    void anOffLevelAtTheHeadroomLimitFits() {
        // −18 V = −20·0.9; the switch recommends 0 V and −18 V is below it
        Check c = off(-18, -20, S0);
        verdict(c, Verdict.PASS, 1.0);
        says(c, "off level -18 V is within the switch's limit -20 V and the driver's negative rail -20 V and meets its"
                + " recommended 0 V");
        compared(c, "off level (switch's recommendation)", -18, "≤", 0);
    }

    @Test
    void anOffLevelAtTheRailIsWithinIt() {
        verdict(off(-5, -5, S0), Verdict.PASS, 1.0);
    }

    @Test
    void anOffLevelJustBeyondTheRailFails() {
        Check c = off(-5.5, -5, S0);
        verdict(c, Verdict.FAIL, 0);
        says(c, "off level -5.5 V is below the -5 V this driver's negative rail supports — use -5 V or pick a driver rated"
                + " for -5.5 V");
    }

    @Test
    void aDriverWithAnUnknownRailHasNone() {
        Check c = off(-4, Double.NaN, S0);
        verdict(c, Verdict.FAIL, 0);
        says(c, "the stage asks for -4 V off, but this driver has no negative output rail — pick a driver with a negative"
                + " rail (v_neg_min_v ≤ -4 V) or turn off at 0 V with a Miller clamp");
        compared(c, "off level (driver's negative rail)", -4, "≥", 0);
    }

    @Test
    void anOffLevelAtTheRecommendedRangeBottomFits() {
        // SiC recommends at most −5 V (v_gate_off_min_v): −5 V is not below it
        Check c = off(-5, -10, s -> s.vGateOffMin = -5);
        verdict(c, Verdict.PASS, 1.0);
        compared(c, "off level (recommended range)", -5, "≥", -5);
    }

    @Test
    void anOffLevelBelowTheRecommendedRangeWarns() {
        Check c = off(-6, -10, s -> s.vGateOffMin = -5);
        verdict(c, Verdict.WARN, warn(0.5));
        says(c, "off level -6 V is more negative than the -5 V the switch recommends at most — turn off at -5 V or less"
                + " negative");
        saysNot(c, "SiC gate threshold drifts");
    }

    @Test
    void anOffLevelAtTheRecommendedLevelMeetsIt() {
        Check c = off(-4, -10, s -> s.vGateOff = -4);
        verdict(c, Verdict.PASS, 1.0);
        says(c, "and meets its recommended -4 V");
    }

    @Test
    void anOffLevelShallowerThanRecommendedWarnsWithoutAClamp() {
        Check c = off(-3, -10, s -> s.vGateOff = -4);
        verdict(c, Verdict.WARN, warn(0.5));
        says(c, "the switch recommends -4 V off but the stage gives -3 V — add a negative rail or use a driver with a"
                + " Miller clamp");
    }

    @Test
    void aMillerClampHoldsAShallowerOffLevelAsABarePass() {
        Check c = check(Rule.NEGATIVE_BIAS, s -> s.vGateOff = -4, d -> d.millerClamp = true, RuleCase.O0);
        verdict(c, Verdict.PASS, pass(0));
        says(c, "the switch recommends -4 V off but the stage gives 0 V; this driver's Miller clamp holds the gate low, so"
                + " verify turn-off on the bench");
    }

    @Test
    void aZeroOffLevelNamesNoRail() {
        Check c = check(Rule.NEGATIVE_BIAS, S0, RuleCase.D0, RuleCase.O0);
        verdict(c, Verdict.PASS, 1.0);
        says(c, "off level 0 V is within the switch's limit -20 V and meets its recommended 0 V");
        saysNot(c, "negative rail");
        notCompared(c, "off level (driver's negative rail)");
        notCompared(c, "off level (recommended range)");
        Check none = check(Rule.NEGATIVE_BIAS, s -> s.vGateOff = Double.NaN, RuleCase.D0, RuleCase.O0);
        saysNot(none, "recommended");
        notCompared(none, "off level (switch's recommendation)");
    }
}
