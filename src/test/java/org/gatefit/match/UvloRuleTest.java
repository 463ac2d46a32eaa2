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
 * {@code uvlo} at its limits, with the datasheet-convention definitions (REFERENCES §5): UVLO rising
 * above the monitored supply → the driver never leaves lock-out; UVLO falling below the plateau (or
 * V_th,max) → a sagging supply leaves the switch half-on. Margins (common practice, no source): the
 * supply must clear UVLO rising by the 1 V headroom (warn inside it, sub-score 0.35 + 0.3·(supply −
 * UVLO rising)/1 V), and the gate at lock-out must clear the plateau by 15 % (warn inside it,
 * 0.35 + 0.3·(gate − plateau)/(0.15·plateau)); a pass scores 0.7 + 0.3·(supply − UVLO rising − 1 V)/supply
 * (Score). Baseline: 10 V supply, plateau 5 V (→ 5.75 V with margin), V_th,max 4 V, full enhancement 10 V.
 */
class UvloRuleTest {

    private static Check uvlo(double on, double off) {
        return check(Rule.UVLO, S0, d -> {
            d.uvloOn = on;
            d.uvloOff = off;
        }, RuleCase.O0);
    }

    /** The UVLO on the total supply (true), the positive rail (false) or unknown (null), with an off level. */
    private static Check uvlo(Boolean total, double vNeg, double on, double off) {
        return uvlo(total, vNeg, on, off, S0, o -> { });
    }

    private static Check uvlo(Boolean total, double vNeg, double on, double off, Consumer<Parts.Sw> s,
            Consumer<OperatingPoint.Spec> o) {
        return check(Rule.UVLO, s, d -> {
            d.uvloOn = on;
            d.uvloOff = off;
            d.uvloTotal = total;
            d.vNegMin = -10;
        }, o.andThen(p -> p.vDriveNeg = vNeg));
    }

    // ------------------------------------------------------------------ starting: supply against UVLO rising

    @Test
    void aUvloJustAboveTheSupplyNeverStarts() {
        Check c = uvlo(10.01, 9);
        verdict(c, Verdict.FAIL, 0);
        // starting needs 10.01 + 1 = 11.01 V; the gate window (20 V less 10 % = 18 V) allows it
        says(c, "the 10 V supply never reaches this driver's UVLO rising threshold 10 V", "raise the supply above 11 V");
        compared(c, "supply above UVLO rising", 10, "≥", 11.01);
        notCompared(c, "on level just before lock-out");
        notCompared(c, "on level just before lock-out (full enhancement)");
    }

    @Test
    void aUvloAtTheSupplyStartsButWarnsAtTheFailEdge() {
        // (10 − 10)/1 V = 0
        Check c = uvlo(10, 9);
        verdict(c, Verdict.WARN, warn(0));
        says(c, "the 10 V supply is within 1 V of UVLO rising 10 V, so supply tolerance or droop may lock the driver"
                + " out — raise the supply or pick a lower UVLO");
        compared(c, "supply above UVLO rising", 10, "≥", 11);
        compared(c, "on level just before lock-out", 9, "≥", 5.75);
        compared(c, "on level just before lock-out (full enhancement)", 9, "≥", 10);
    }

    @Test
    void aUvloHalfAHeadroomBelowTheSupplyWarnsHalfWay() {
        verdict(uvlo(9.5, 9), Verdict.WARN, warn(0.5));
    }

    @Test
    void aTwoVoltHeadroomScalesTheWarning() {
        // uvlo-headroom 2 V: 10 V against UVLO rising 9 V → (10 − 9)/2 = 0.5
        Margins m = new Margins(1.5, 0.10, 2.0, 0.1, 0.20, 2.0, 0.7, 0.7, 2.0, 0.15, 0.5, 100, 0.25);
        Check c = check(Rule.UVLO, m, S0, d -> {
            d.uvloOn = 9;
            d.uvloOff = 8.5;
        }, RuleCase.O0);
        verdict(c, Verdict.WARN, warn(0.5));
        says(c, "the 10 V supply is within 2 V of UVLO rising 9 V");
    }

    @Test
    void aUvloOneHeadroomBelowTheSupplyPassesBare() {
        // (10 − 9 − 1)/10 = 0
        Check c = uvlo(9, 8.5);
        verdict(c, Verdict.PASS, pass(0));
        says(c, "the driver starts at 9 V (10 V supply) and locks out at 8.5 V, before the gate falls below the 5.75 V"
                + " plateau with margin; between 8.5 V and full enhancement 10 V a sagging supply only raises conduction loss");
    }

    @Test
    void theBaselinePassesWithItsExcess() {
        // (10 − 7 − 1)/10 = 0.2
        verdict(uvlo(7, 6.5), Verdict.PASS, pass(0.2));
    }

    @Test
    void aGateAtFullEnhancementAtLockOutSaysNothingMore() {
        // +12 V: UVLO 10/10 V, the gate keeps 10 V = the full-enhancement level; (12 − 10 − 1)/12
        Check c = check(Rule.UVLO, S0, d -> {
            d.uvloOn = 10;
            d.uvloOff = 10;
        }, o -> o.vDrive = 12.0);
        verdict(c, Verdict.PASS, pass(1.0 / 12));
        says(c, "locks out at 10 V, before the gate falls below the 5.75 V plateau with margin");
        saysNot(c, "between");
    }

    @Test
    void aStartThatTheGateWindowCannotReachSaysSo() {
        // +18 V, UVLO 17.5 V rising: within 1 V; raising the on level to 17.5 + 1 = 18.5 V would pass 20 V less 10 %
        Check c = check(Rule.UVLO, S0, d -> {
            d.uvloOn = 17.5;
            d.uvloOff = 17;
        }, o -> o.vDrive = 18.0);
        verdict(c, Verdict.WARN, warn(0.5));
        says(c, "the 18 V supply is within 1 V of UVLO rising 17.5 V", "the gate window leaves no room to raise it: pick a"
                + " driver with a lower UVLO");
    }

    // ------------------------------------------------------------------ lock-out: gate against the plateau

    @Test
    void aUvloFallingJustBelowThePlateauLeavesTheSwitchHalfOn() {
        Check c = uvlo(7, 4.99);
        verdict(c, Verdict.FAIL, 0);
        says(c, "the driver keeps switching down to 4.99 V (UVLO falling), where the gate gets only 4.99 V, below the 5 V"
                + " plateau/threshold", "pick a driver with UVLO falling ≥ 5.75 V");
        saysNot(c, "negative rail", "desaturates");
    }

    @Test
    void aUvloFallingAtThePlateauWarnsAtTheFailEdge() {
        // (5 − 5)/(5.75 − 5) = 0
        Check c = uvlo(7, 5);
        verdict(c, Verdict.WARN, warn(0));
        says(c, "the driver locks out at 5 V with 5 V on the gate, less than 15 % above the 5 V plateau",
                "pick a driver with UVLO falling ≥ 5.75 V");
    }

    @Test
    void aUvloFallingHalfWayToTheMarginWarnsHalfWay() {
        // (5.375 − 5)/0.75 = 0.5
        verdict(uvlo(7, 5.375), Verdict.WARN, warn(0.5));
    }

    @Test
    void aUvloFallingAtThePlateauWithMarginPasses() {
        // 5.75 V = 5·1.15: not less than the plateau with margin
        verdict(uvlo(7, 5.75), Verdict.PASS, pass(0.2));
    }

    @Test
    void aMissingFallingThresholdIsTakenAsTheRisingOne() {
        Check c = uvlo(7, Double.NaN);
        verdict(c, Verdict.PASS, pass(0.2));
        says(c, "the driver starts at 7 V (10 V supply) and locks out at 7 V");
    }

    @Test
    void withoutAPlateauTheThresholdIsTheNeed() {
        // V_th,max 4 V with 15 %: 4.6 V; 4.2 V at lock-out → (4.2 − 4)/(4.6 − 4) = 1/3
        Check c = check(Rule.UVLO, s -> s.vPlateau = Double.NaN, d -> d.uvloOff = 4.2, RuleCase.O0);
        verdict(c, Verdict.WARN, warn(1.0 / 3));
        says(c, "with 4.2 V on the gate, less than 15 % above the 4 V plateau", "UVLO falling ≥ 4.6 V");
    }

    @Test
    void aThresholdAboveThePlateauIsTheNeed() {
        // V_th,max 5.5 V above the 5 V plateau: 5.2 V at lock-out is below it
        Check c = check(Rule.UVLO, s -> s.vThMax = 5.5, d -> d.uvloOff = 5.2, RuleCase.O0);
        verdict(c, Verdict.FAIL, 0);
        says(c, "below the 5.5 V plateau/threshold");
    }

    @Test
    void withoutPlateauOrThresholdFullEnhancementIsNamed() {
        Check c = check(Rule.UVLO, s -> {
            s.vPlateau = Double.NaN;
            s.vThMax = Double.NaN;
        }, RuleCase.D0, RuleCase.O0);
        verdict(c, Verdict.PASS, pass(0.2));
        says(c, "before the gate falls below the 10 V full-enhancement level; between 6.5 V and full enhancement 10 V");
        notCompared(c, "on level just before lock-out");
        compared(c, "on level just before lock-out (full enhancement)", 6.5, "≥", 10);
    }

    @Test
    void withoutFullEnhancementItIsNotCompared() {
        Check c = check(Rule.UVLO, s -> {
            s.rOnVgs = Double.NaN;
            s.vGateOn = Double.NaN;
        }, RuleCase.D0, RuleCase.O0);
        verdict(c, Verdict.PASS, pass(0.2));
        notCompared(c, "on level just before lock-out (full enhancement)");
        saysNot(c, "between");
    }

    // ------------------------------------------------------------------ what the UVLO monitors

    @Test
    void onTheTotalSupplyTheSwingStartsIt() {
        // +10/−3 V: the total 13 V against UVLO rising 11.5 V: (13 − 11.5 − 1)/13; the gate keeps 11 − 3 = 8 V ≥ 5.75 V
        Check c = uvlo(true, -3, 11.5, 11);
        verdict(c, Verdict.PASS, pass(0.5 / 13));
        says(c, "the driver starts at 11.5 V (13 V supply) and locks out at 11 V, before the gate falls below the 5.75 V"
                + " plateau with margin; between 8 V and full enhancement 10 V");
        compared(c, "supply above UVLO rising", 13, "≥", 12.5);
        compared(c, "on level just before lock-out", 8, "≥", 5.75);
    }

    @Test
    void onThePositiveRailTheOnLevelStartsIt() {
        // the same driver watching the +10 V rail: 10 V < 11.5 V never starts; 11.5 + 1 = 12.5 V would
        Check c = uvlo(false, -3, 11.5, 11);
        verdict(c, Verdict.FAIL, 0);
        says(c, "the 10 V positive rail never reaches this driver's UVLO rising threshold 11.5 V",
                "raise the supply above 12.5 V");
        compared(c, "positive rail above UVLO rising", 10, "≥", 12.5);
    }

    @Test
    void aTotalSupplyThatNeverStartsNamesTheSupplyThatWould() {
        // +10/−3 V, UVLO rising 14 V on the total supply: it starts at 14 + 1 = 15 V total (on level 12 V ≤ 18 V)
        Check c = uvlo(true, -3, 14, 13);
        verdict(c, Verdict.FAIL, 0);
        says(c, "the 13 V supply never reaches this driver's UVLO rising threshold 14 V", "raise the supply above 15 V");
    }

    @Test
    void halfOnOnThePositiveRailSaysWhichRail() {
        Check c = uvlo(false, 0, 7, 4.5);
        verdict(c, Verdict.FAIL, 0);
        says(c, "(UVLO falling of the positive rail), where the gate gets only 4.5 V", "UVLO falling ≥ 5.75 V");
        saysNot(c, "negative rail)");
    }

    @Test
    void halfOnOnTheTotalSupplyAddsTheNegativeRail() {
        // +10/−3 V: 6.5 − 3 = 3.5 V < 5 V; needs 5.75 + 3 = 8.75 V
        Check c = uvlo(true, -3, 7, 6.5);
        says(c, "(UVLO falling of the total supply), where the gate gets only 3.5 V",
                "UVLO falling ≥ 8.75 V (the plateau with margin plus the 3 V negative rail)");
    }

    @Test
    void nearThePlateauOnTheTotalSupplyAddsTheNegativeRail() {
        // +10/−3 V, UVLO 9/8.5 V total: the gate keeps 5.5 V: (5.5 − 5)/0.75 = 2/3; needs 5.75 + 3 = 8.75 V falling
        Check c = uvlo(true, -3, 9, 8.5);
        verdict(c, Verdict.WARN, warn(2.0 / 3));
        says(c, "the driver locks out at 8.5 V with 5.5 V on the gate", "pick a driver with UVLO falling ≥ 8.75 V");
    }

    @Test
    void readingsThatDisagreeWarnHalfWay() {
        // unknown reference, +10/−3 V: positive rail 6.5 V (safe), total 3.5 V (half on)
        Check c = uvlo(null, -3, 7, 6.5);
        verdict(c, Verdict.WARN, warn(0.5));
        says(c, "on the positive rail it locks out with 6.5 V on the gate (safe), on the total 13 V supply with 3.5 V"
                + " (half on), against the 5 V plateau");
        compared(c, "on level at lock-out (UVLO on the positive rail)", 6.5, "≥", 5.75);
        compared(c, "on level at lock-out (UVLO on the total supply)", 3.5, "≥", 5.75);
    }

    @Test
    void readingsThatAgreeAreNotAQuestion() {
        // unknown reference, 0 V off: both readings are the same
        Check c = uvlo(null, 0, 7, 4.5);
        verdict(c, Verdict.FAIL, 0);
        says(c, "(UVLO falling), where the gate gets only 4.5 V");
    }

    @Test
    void anIgbtNearItsPlateauDesaturates() {
        // IGBT plateau 9 V (+15 V): 9·1.15 = 10.35 V; UVLO falling 9.5 V → (9.5 − 9)/1.35
        Check c = check(Rule.UVLO, s -> {
            s.tech = Technology.IGBT;
            s.vPlateau = 9;
            s.vThMin = 5;
            s.vThMax = 6.5;
            s.rOnVgs = 15;
            s.vGateOn = 15;
            s.qGVgs = 15;
        }, d -> {
            d.uvloOn = 12;
            d.uvloOff = 9.5;
        }, o -> o.vDrive = 15.0);
        verdict(c, Verdict.WARN, warn(0.5 / 1.35));
        says(c, "near its plateau an IGBT at rated current comes out of saturation (desaturates)", "UVLO falling ≥ 10.4 V");
    }
}
