package org.gatefit.match;

import static org.gatefit.match.RuleCase.check;
import static org.gatefit.match.RuleCase.compared;
import static org.gatefit.match.RuleCase.pass;
import static org.gatefit.match.RuleCase.says;
import static org.gatefit.match.RuleCase.saysNot;
import static org.gatefit.match.RuleCase.verdict;
import static org.gatefit.match.RuleCase.warn;
import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/**
 * {@code dv-dt} at its limits. Miller-induced turn-on (REFERENCES §7): V_ind ≈ C_gd·(dv/dt)·R_off with
 * R_off = R_sink + R_g,off + R_g,int, C_gd averaged over the swing as Q_gd/V_bus (REFERENCES §8); without
 * C_iss the rule takes this bound itself. Rows: Q_gd 10 nC over a 100 V bus → C_gd 100 pF; dv/dt given
 * 5 V/ns; R_off 1 + 2 + 1 = 4 Ω: V_ind = 100 pF·5 V/ns·4 Ω = 2 V (C·dv/dt = i, v = i·R). Judged at 25 °C
 * ({@code --tj 25}) so V_th,min is the datasheet's. The induced voltage plus the off level fails at
 * V_th,min, warns above the dv-dt margin's fraction of it (here 0.5, so the limits fall on round
 * numbers; the default 0.7 is common practice, no source), with sub-scores warn 0.35 + 0.3·(V_th − seen)/
 * (V_th − limit) and pass 0.7 + 0.3·(limit − seen)/limit (Score).
 */
class DvDtRuleTest {

    /** The defaults with a dv-dt margin of 0.5. */
    private static final Margins HALF = new Margins(1.5, 0.10, 1.0, 0.1, 0.20, 2.0, 0.7, 0.5, 2.0, 0.15, 0.5, 100, 0.25);

    /** V_ind = 2 V by hand (class comment). */
    private static final double SEEN = 10e-9 / 100 * 5e9 * 4;

    private static Check dvdt(Margins m, double vThMin, double vNeg) {
        return check(Rule.DV_DT, m, s -> {
            s.qGd = 10e-9;
            s.cIss = Double.NaN;
            s.vThMin = vThMin;
            s.vThMax = Math.max(vThMin, 4);
        }, d -> d.vNegMin = -10, o -> {
            o.bus = 100.0;
            o.dvdt = 5e9;
            o.tj = 25.0;
            o.vDriveNeg = vNeg;
        });
    }

    /** The induced voltage the rule computed (the first comparison's value). */
    private static double seen(Check c) {
        return c.compared().get(0).value();
    }

    @Test
    void theInducedVoltageIsTheBoundByHand() {
        // V_th,min 8 V: limit 4 V, seen 2 V → (4 − 2)/4 = 0.5
        Check c = dvdt(HALF, 8, 0);
        assertEquals(2.0, seen(c), 1e-9);
        verdict(c, Verdict.PASS, pass(0.5));
        says(c, "at 25 °C the switch node slews at 5 V/ns (as given) and the Miller current (Q_gd 10 nC over 100 V) lifts"
                + " the off gate to 2 V through 4 Ω (sink + R_g,off + R_g,int) against V_th,min 8 V, well below it");
        compared(c, "induced gate voltage + off level at 25 °C", SEEN, "≤", 4);
    }

    @Test
    void anInducedVoltageAtTheMarginPassesBare() {
        // V_th,min = 2·seen: the limit is exactly the induced voltage
        double seen = seen(dvdt(HALF, 8, 0));
        verdict(dvdt(HALF, 2 * seen, 0), Verdict.PASS, pass(0));
    }

    @Test
    void anInducedVoltageBetweenTheMarginAndTheThresholdWarns() {
        // V_th,min 2.5 V: limit 1.25 V; (2.5 − 2)/(2.5 − 1.25) = 0.4
        Check c = dvdt(HALF, 2.5, 0);
        verdict(c, Verdict.WARN, warn(0.4));
        says(c, "lifts the off gate to 2 V", "against V_th,min 2.5 V, within 50 % of it — ");
    }

    @Test
    void anInducedVoltageAtTheThresholdFails() {
        double seen = seen(dvdt(HALF, 8, 0));
        Check c = dvdt(HALF, seen, 0);
        verdict(c, Verdict.FAIL, 0);
        // the bound is linear in dv/dt: it reaches V_th,min at exactly the 5 V/ns given
        says(c, "so it may turn on with its twin (shoot-through) — ", "(allowed 5 V/ns as is)");
    }

    @Test
    void anInducedVoltageAboveTheThresholdFailsAndNamesTheSlewAllowed() {
        // V_th,min 1.5 V: allowed dv/dt = 1.5 V/(100 pF·4 Ω) = 3.75 V/ns (REFERENCES §7 inverted)
        Check c = dvdt(Margins.DEFAULT, 1.5, 0);
        verdict(c, Verdict.FAIL, 0);
        says(c, "(allowed 3.75 V/ns as is)");
    }

    @Test
    void aNegativeOffLevelIsAddedToTheInducedVoltage() {
        // −1 V off: seen 2 − 1 = 1 V; V_th,min 2.5 V, default margin 0.7: limit 1.75 V → (1.75 − 1)/1.75
        Check c = dvdt(Margins.DEFAULT, 2.5, -1);
        verdict(c, Verdict.PASS, pass(0.75 / 1.75));
        says(c, "lifts the off gate to 1 V");
        compared(c, "induced gate voltage + off level at 25 °C", SEEN - 1, "≤", 1.75);
    }

    @Test
    void theDefaultMarginsThinWarningNamesThirtyPercent() {
        // V_th,min 2.5 V, limit 1.75 V: (2.5 − 2)/(2.5 − 1.75) = 2/3
        Check c = dvdt(Margins.DEFAULT, 2.5, 0);
        verdict(c, Verdict.WARN, warn(2.0 / 3));
        says(c, "within 30 % of it");
    }

    @Test
    void aThresholdAtOrBelowZeroFailsEvenUnderANegativeOffLevel() {
        // V_th,min 0 V: the switch is on at 0 V whatever the off level; −5 V off puts the gate at −3 V
        Check c = dvdt(Margins.DEFAULT, 0, -5);
        verdict(c, Verdict.FAIL, 0);
        saysNot(c, "allowed");
    }

    @Test
    void aZeroBusIsTheAskersOpenQuestion() {
        Check c = check(Rule.DV_DT, s -> { }, d -> { }, o -> {
            o.bridge = true;
            o.bus = 0.0;
        });
        verdict(c, Verdict.UNKNOWN, Score.OPEN);
        assertEquals("bus", c.notGiven());
    }

    @Test
    void aClampHoldsTheGateThroughItsOwnPath() {
        // with a Miller clamp the path skips R_g,off: 1 + 1 = 2 Ω → 1 V
        Check c = check(Rule.DV_DT, HALF, s -> {
            s.qGd = 10e-9;
            s.cIss = Double.NaN;
            s.vThMin = 8;
            s.vThMax = 8;
        }, d -> d.millerClamp = true, o -> {
            o.bus = 100.0;
            o.dvdt = 5e9;
            o.tj = 25.0;
        });
        verdict(c, Verdict.PASS, pass(0.75));
        says(c, "lifts the off gate to 1 V through 2 Ω (the Miller clamp's path)");
    }
}
