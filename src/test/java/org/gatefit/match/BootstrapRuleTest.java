package org.gatefit.match;

import static org.gatefit.match.RuleCase.S0;
import static org.gatefit.match.RuleCase.check;
import static org.gatefit.match.RuleCase.compared;
import static org.gatefit.match.RuleCase.says;
import static org.gatefit.match.RuleCase.saysNot;
import static org.gatefit.match.RuleCase.verdict;
import static org.gatefit.match.RuleCase.warn;

import java.util.function.Consumer;
import org.junit.jupiter.api.Test;

/**
 * {@code bootstrap} at its limits. The allowed droop is V_drive − V_F − the high side's floor (the larger
 * of UVLO,off and full enhancement; UVLO,off alone when the bootstrap cannot reach full enhancement:
 * REFERENCES §4, ΔV ≤ V_DD − V_F − V_UVLO,off). A GaN high side charges to V_DD − V_F + V_SD, with V_SD
 * about 2.5 V plus the off level's magnitude (REFERENCES §9, from memory), judged against V_GS,max and its
 * 10 % headroom (common practice, no source): fail above V_GS,max, warn above the headroom limit with
 * 0.35 + 0.3·(V_GS,max − peak)/(V_GS,max − limit) (Score). A sized bootstrap with duty headroom of at
 * least 20 points scores 1; warnings without a margin score 0.5.
 */
class BootstrapRuleTest {

    /** High side, 50 % duty, +12 V (12 − 0.7 V ≥ the 10 V full-enhancement level). */
    private static final Consumer<OperatingPoint.Spec> HIGH = o -> {
        o.highSide = true;
        o.dutyMax = 0.5;
        o.vDrive = 12.0;
    };

    private static Check boot(Consumer<Parts.Sw> s, Consumer<Parts.Dr> d, Consumer<OperatingPoint.Spec> o) {
        return check(Rule.BOOTSTRAP, s, d, HIGH.andThen(o));
    }

    /** An e-mode GaN switch with round figures: +5 V full enhancement, V_th 1–2.5 V, plateau 3 V. */
    private static Consumer<Parts.Sw> gan(double vGsMax) {
        return s -> {
            s.tech = Technology.GAN_HEMT;
            s.vGsMax = vGsMax;
            s.vGsMin = -10;
            s.vThMin = 1;
            s.vThMax = 2.5;
            s.rOnVgs = 5;
            s.vGateOn = 5;
            s.qG = 5e-9;
            s.qGVgs = 5;
            s.qGs = 1.5e-9;
            s.qGd = 1.5e-9;
            s.vPlateau = 3;
            s.cIss = 0.5e-9;
        };
    }

    /** A GaN-ready driver (UVLO 4/3.5 V) at +6 V, V_F 0.5 V: the high side peaks at 6 − 0.5 + 2.5 = 8 V. */
    private static Check gan(double vGsMax, double vNeg) {
        return boot(gan(vGsMax), d -> {
            d.uvloOn = 4;
            d.uvloOff = 3.5;
            d.vNegMin = -5;
        }, o -> {
            o.vDrive = 6.0;
            o.diodeDrop = 0.5;
            o.vDriveNeg = vNeg;
        });
    }

    @Test
    void aSizedBootstrapWithDutyHeadroomScoresFull() {
        // droop 12 − 0.7 − 10 = 1.3 V
        Check c = boot(S0, RuleCase.D0, RuleCase.O0);
        verdict(c, Verdict.PASS, 1.0);
        says(c, "at 1.3 V droop; use ", "(50 % left at DC bias)", "; duty 50 % ≤ ");
        compared(c, "allowed droop (V_drive − V_F − UVLO,off)", 1.3, "≥", 0);
        saysNot(c, "external fast diode");
    }

    @Test
    void anExternalDiodeIsRatedAboveTheBus() {
        // reverse rating ≥ the bus (REFERENCES §4) with 20 % (common practice, no source): 48·1.2 = 57.6 V
        Check c = boot(S0, d -> d.bootstrapDiode = false, RuleCase.O0);
        verdict(c, Verdict.PASS, 1.0);
        says(c, ", with an external fast diode rated ≥ 57.6 V; duty 50 %");
        Check noBus = boot(S0, d -> d.bootstrapDiode = false, o -> o.bus = null);
        verdict(noBus, Verdict.WARN, warn(0.5));
        says(noBus, ", with an external fast diode rated above the bus (bus not given)");
    }

    @Test
    void aDutyTooHighNamesTheCapacitanceLeftAtDcBias() {
        // 99.9 % duty leaves 10 ns a cycle to recharge; the capacitor is derated to 50 % at its DC bias (boot-cap-bias)
        Check c = boot(S0, RuleCase.D0, o -> o.dutyMax = 0.999);
        verdict(c, Verdict.FAIL, 0);
        java.util.regex.Matcher m = java.util.regex.Pattern.compile("recharge ([0-9.]+) nF \\(([0-9.]+) nF at DC bias\\)")
                .matcher(c.message());
        org.junit.jupiter.api.Assertions.assertTrue(m.find(), c.message());
        org.junit.jupiter.api.Assertions.assertEquals(Double.parseDouble(m.group(1)) / 2, Double.parseDouble(m.group(2)),
                Double.parseDouble(m.group(1)) * 0.01, c.message());
    }

    @Test
    void aDroopOfExactlyZeroLeavesNoHeadroom() {
        // +7.5 V, V_F 1 V: 6.5 V ≤ full enhancement 10 V, so the floor is UVLO,off 6.5 V: droop 0
        Check c = boot(S0, RuleCase.D0, o -> {
            o.vDrive = 7.5;
            o.diodeDrop = 1.0;
        });
        verdict(c, Verdict.FAIL, 0);
        says(c, "the bootstrap supply 6.5 V (V_drive − V_F) is already at or below the high side's 6.5 V limit");
    }

    @Test
    void aSiliconHighSideAboveTheHeadroomIsNotAGanOvercharge() {
        // Si, +19 V, V_F 0.5 V: the high side reaches 18.5 V > 20·0.9 = 18 V — only GaN pulls the node below ground
        Check c = boot(S0, RuleCase.D0, o -> {
            o.vDrive = 19.0;
            o.diodeDrop = 0.5;
        });
        verdict(c, Verdict.PASS, 1.0);
        saysNot(c, "reverse");
        // and above V_GS,max itself (20.5 V): still gate-voltage's question, not the bootstrap's
        Check over = boot(S0, RuleCase.D0, o -> {
            o.vDrive = 21.0;
            o.diodeDrop = 0.5;
        });
        saysNot(over, "reverse");
    }

    @Test
    void aGanPeakAtVgsMaxWarnsAtTheFailEdge() {
        // peak 8 V = V_GS,max: (8 − 8)/(8 − 7.2) = 0. Lowering V_DD to the window's 7.2 − 2.5 + 0.5 = 5.2 V would leave
        // 4.7 V on the high side, below the 5 V floor: no supply in the window works
        Check c = gan(8, 0);
        verdict(c, Verdict.WARN, warn(0));
        says(c, "in dead time the low-side GaN conducts in reverse (about 2.5 V with the 0 V off level) and pulls the"
                + " switch node below ground, so the bootstrap charges to about 8 V (V_DD − V_F + V_SD), within 10 % of"
                + " V_GS,max 8 V — no supply level in the switch's gate window (V_GS,max 8 V less 10 %) works for both"
                + " gates of the leg: clamp the bootstrap");
        compared(c, "high-side gate level with reverse conduction", 8, "≤", 7.2);
    }

    @Test
    void aGanPeakInsideTheHeadroomWarnsByHowFarAndAdvisesALowerSupply() {
        // V_GS,max 8.4 V: limit 7.56 V; (8.4 − 8)/(8.4 − 7.56) = 0.476. V_DD ≤ 7.56 − 2.5 + 0.5 = 5.56 V keeps the
        // high side at 5.06 V ≥ the 5 V floor and the low side at ≥ 5 V
        Check c = gan(8.4, 0);
        verdict(c, Verdict.WARN, warn(0.4 / 0.84));
        says(c, "lower V_DD to ≤ 5.56 V (both gates still fully enhanced), or clamp the bootstrap");
    }

    @Test
    void aGanPeakAboveVgsMaxFails() {
        Check c = gan(7.9, 0);
        verdict(c, Verdict.FAIL, 0);
        says(c, "charges to about 8 V (V_DD − V_F + V_SD), above V_GS,max 7.9 V");
    }

    @Test
    void aNegativeOffLevelDeepensTheGanReverseDrop() {
        // −1 V off: V_SD 2.5 + 1 = 3.5 V; the high side peaks at 6 − 0.5 + 3.5 = 9 V > 8.9 V
        Check c = gan(8.9, -1);
        verdict(c, Verdict.FAIL, 0);
        says(c, "(about 3.5 V with the -1 V off level)", "charges to about 9 V");
    }

    @Test
    void belowFullEnhancementAdvisesTheLevelThatReachesIt() {
        // +11 V, V_F 1 V: 10 V ≤ the 10.25 V full-enhancement level; 10.25 + 1 = 11.25 V is exactly the
        // window's 12.5·0.9 = 11.25 V, so raising V_drive is still advised
        Check c = boot(s -> {
            s.vGsMax = 12.5;
            s.rOnVgs = 10.25;
        }, RuleCase.D0, o -> {
            o.vDrive = 11.0;
            o.diodeDrop = 1.0;
        });
        verdict(c, Verdict.WARN, warn(0.5));
        says(c, "the bootstrap gives the high side at most 10 V (V_drive − V_F), below the 10.3 V full-enhancement level",
                "against UVLO,off 6.5 V", "raise V_drive to ≥ 11.3 V or use an isolated supply");
    }

    @Test
    void belowFullEnhancementOutsideTheWindowSaysNothingInItWorks() {
        // V_GS,max 12 V: window 10.8 V < 11.25 V
        Check c = boot(s -> {
            s.vGsMax = 12;
            s.rOnVgs = 10.25;
        }, RuleCase.D0, o -> {
            o.vDrive = 11.0;
            o.diodeDrop = 1.0;
        });
        says(c, "no supply level in the switch's gate window (V_GS,max 12 V less 10 %) works for full enhancement through"
                + " the diode");
    }
}
