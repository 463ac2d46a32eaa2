package org.gatefit.match;

import static org.gatefit.match.RuleCase.D0;
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
 * {@code gate-voltage} at its limits, with the datasheet-convention definitions (REFERENCES §5): the
 * on level at most V_GS,max (less the 10 % gate headroom for overshoot, common practice, no source),
 * above V_th,max at all, and at least the V_GS R_DS(on) or V_CE(sat) is specified at (full enhancement);
 * the swing within the driver's supply range; for IGBT and SiC not above the top of the recommended
 * range (REFERENCES §9). Baseline: +10/0 V, V_GS,max 20 V (limit 18 V), V_th,max 4 V, R_DS(on) at 10 V,
 * supply 8–20 V. Sub-scores (Score): near the limit 0.35 + 0.3·(V_GS,max − on)/(V_GS,max − limit); under-
 * enhanced 0.35 + 0.3·(on − V_th,max)/(full − V_th,max); a fit 0.7 + 0.3·5·min((limit − on)/limit,
 * (on − full)/max(full, 1 V)).
 */
class GateVoltageRuleTest {

    private static Check on(double vDrive) {
        return check(Rule.GATE_VOLTAGE, S0, D0, o -> o.vDrive = vDrive);
    }

    private static final Consumer<Parts.Sw> SIC_18 = s -> {
        s.tech = Technology.SIC_MOSFET;
        s.vGsMax = 25;
        s.vGateOnMax = 18;
    };

    @Test
    void theBaselineFitsAtFullEnhancementExactly() {
        // min((18 − 10)/18, (10 − 10)/10) = 0
        Check c = on(10);
        verdict(c, Verdict.PASS, pass(0));
        says(c, "on level 10 V fully enhances the switch (≥ 10 V) and stays below 18 V (V_GS,max 20 V less 10 %); the"
                + " driver runs from 8 V to 20 V");
        compared(c, "driver supply (on − off level)", 10, "≥", 8);
        compared(c, "driver supply (on − off level)", 10, "≤", 20);
        compared(c, "on level", 10, "≤", 18);
        compared(c, "on level (full enhancement)", 10, "≥", 10);
        compared(c, "on level (above threshold)", 10, "≥", 4);
        notCompared(c, "on level (recommended range)");
    }

    @Test
    void aFitJustAboveFullEnhancementScoresItsEnhancementMargin() {
        // min((18 − 10.5)/18 = 0.417, (10.5 − 10)/10 = 0.05) = 0.05 → 5·0.05 = 0.25
        verdict(on(10.5), Verdict.PASS, pass(0.25));
    }

    @Test
    void aFitJustBelowTheLimitScoresItsHeadroom() {
        // min((18 − 17)/18 = 0.0556, (17 − 10)/10 = 0.7) → 5/18 = 0.278
        verdict(on(17), Verdict.PASS, pass(5.0 / 18));
    }

    @Test
    void anOnLevelAtTheHeadroomLimitFits() {
        // 18 V = 20·0.9: not above the limit; min(0, 0.8) = 0
        verdict(on(18), Verdict.PASS, pass(0));
    }

    @Test
    void anOnLevelInsideTheHeadroomWarnsByHowFarItGot() {
        // 19 V: (20 − 19)/(20 − 18) = 0.5
        Check c = on(19);
        verdict(c, Verdict.WARN, warn(0.5));
        says(c, "on level 19 V is within 10 % of V_GS,max 20 V, leaving little room for overshoot — drive at 18 V or less");
    }

    @Test
    void anOnLevelAtVgsMaxWarnsAtTheFailEdge() {
        // 20 V = V_GS,max: not above it; (20 − 20)/2 = 0
        verdict(on(20), Verdict.WARN, warn(0));
    }

    @Test
    void anOnLevelPastVgsMaxFailsAndNamesTheRecommendedLevel() {
        Check c = check(Rule.GATE_VOLTAGE, S0, d -> d.vSupplyMax = 30, o -> o.vDrive = 20.5);
        verdict(c, Verdict.FAIL, 0);
        says(c, "on level 20.5 V exceeds the switch's V_GS,max of 20 V and will damage the gate — drive at 18 V or less"
                + " (recommended 10 V)");
        Check none = check(Rule.GATE_VOLTAGE, s -> s.vGateOn = Double.NaN, d -> d.vSupplyMax = 30, o -> o.vDrive = 20.5);
        saysNot(none, "recommended");
    }

    @Test
    void anUnderEnhancedOnLevelScoresItsWayFromTheThreshold() {
        // 8 V: (8 − 4)/(10 − 4) = 2/3
        Check c = on(8);
        verdict(c, Verdict.WARN, warn(2.0 / 3));
        says(c, "on level 8 V is below the 10 V that R_DS(on) is specified at, so conduction loss will be higher than the"
                + " datasheet figure — drive at 10 V or more");
    }

    @Test
    void anUnderEnhancedOnLevelWithoutThresholdWarnsHalfWay() {
        Check c = check(Rule.GATE_VOLTAGE, s -> s.vThMax = Double.NaN, D0, o -> o.vDrive = 8.0);
        verdict(c, Verdict.WARN, warn(0.5));
        notCompared(c, "on level (above threshold)");
    }

    @Test
    void anIgbtIsSpecifiedByItsSaturationVoltage() {
        Check c = check(Rule.GATE_VOLTAGE, s -> {
            s.tech = Technology.IGBT;
            s.rOnVgs = 15;
            s.vGateOn = 15;
        }, D0, o -> o.vDrive = 12.0);
        says(c, "below the 15 V that V_CE(sat) is specified at");
    }

    @Test
    void anOnLevelAtTheThresholdFailsAndWithoutFullLevelDoublesIt() {
        // 4 V ≤ V_th,max 4 V; with no full-enhancement level the advice is 2·V_th,max = 8 V (common practice, no source)
        Check c = check(Rule.GATE_VOLTAGE, s -> {
            s.rOnVgs = Double.NaN;
            s.vGateOn = Double.NaN;
        }, d -> d.vSupplyMin = 3, o -> o.vDrive = 4.0);
        verdict(c, Verdict.FAIL, 0);
        says(c, "on level 4 V does not exceed V_th,max 4 V, so the switch may not turn on — drive at 8 V or more");
        notCompared(c, "on level (full enhancement)");
    }

    @Test
    void aSwingAtEitherSupplyLimitIsAccepted() {
        // 10 V swing = the driver's maximum, and = its minimum
        verdict(check(Rule.GATE_VOLTAGE, S0, d -> d.vSupplyMax = 10, RuleCase.O0), Verdict.PASS, pass(0));
        verdict(check(Rule.GATE_VOLTAGE, S0, d -> d.vSupplyMin = 10, RuleCase.O0), Verdict.PASS, pass(0));
    }

    @Test
    void aSwingAboveTheSupplyMaximumNamesBothLevels() {
        // +10/−5 V: 15 V > 14 V
        Check c = check(Rule.GATE_VOLTAGE, S0, d -> d.vSupplyMax = 14, o -> o.vDriveNeg = -5.0);
        verdict(c, Verdict.FAIL, 0);
        says(c, "the 15 V supply (on 10 V, off -5 V) exceeds this driver's 14 V maximum — lower the drive levels or pick a"
                + " driver rated ≥ 15 V");
    }

    @Test
    void aSwingBelowTheSupplyMinimumSaysWhetherRaisingItFits() {
        // 10 V swing, driver from 12 V: raising the on level to 10 + 12 − 10 = 12 V stays under 18 V
        Check c = check(Rule.GATE_VOLTAGE, S0, d -> d.vSupplyMin = 12, RuleCase.O0);
        verdict(c, Verdict.FAIL, 0);
        says(c, "the 10 V supply is below this driver's 12 V minimum — raise the supply or pick a driver that runs from 10 V");
    }

    @Test
    void anOnLevelAtTheTopOfTheRecommendedRangeFits() {
        // SiC, 18 V = the top of its range (v_gate_on_max_v): not above; limit 25·0.9 = 22.5 V;
        // min((22.5 − 18)/22.5 = 0.2, (18 − 10)/10 = 0.8) → 5·0.2 = 1
        Check c = check(Rule.GATE_VOLTAGE, SIC_18, D0, o -> o.vDrive = 18.0);
        verdict(c, Verdict.PASS, 1.0);
        compared(c, "on level (recommended range)", 18, "≤", 18);
    }

    @Test
    void anOnLevelAboveTheRecommendedRangeWarns() {
        Check c = check(Rule.GATE_VOLTAGE, SIC_18, D0, o -> o.vDrive = 19.0);
        verdict(c, Verdict.WARN, warn(0.5));
        says(c, "on level 19 V is above the 18 V top of the switch's recommended range", "drive at 18 V or less, or check"
                + " the short-circuit rating at 19 V");
    }

    @Test
    void aSiMosfetsRecommendedRangeIsNotCompared() {
        Check c = check(Rule.GATE_VOLTAGE, s -> s.vGateOnMax = 18, D0, RuleCase.O0);
        notCompared(c, "on level (recommended range)");
    }

    @Test
    void anUnknownFullLevelIsUnknown() {
        Check c = check(Rule.GATE_VOLTAGE, s -> {
            s.rOnVgs = Double.NaN;
            s.vGateOn = Double.NaN;
        }, D0, RuleCase.O0);
        verdict(c, Verdict.UNKNOWN, Score.UNKNOWN);
        says(c, "on level 10 V is within the limits, but the level R_on is specified at (r_on_vgs_v) is unknown");
    }

    @Test
    void anUnknownLimitIsUnknown() {
        Check c = check(Rule.GATE_VOLTAGE, s -> s.vGsMax = Double.NaN, D0, RuleCase.O0);
        verdict(c, Verdict.UNKNOWN, Score.UNKNOWN);
        says(c, "the switch's V_GS,max (v_gs_max_v) is unknown, so the 10 V on level cannot be checked against it");
    }
}
