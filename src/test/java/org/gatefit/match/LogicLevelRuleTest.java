package org.gatefit.match;

import static org.gatefit.match.RuleCase.S0;
import static org.gatefit.match.RuleCase.check;
import static org.gatefit.match.RuleCase.compared;
import static org.gatefit.match.RuleCase.notCompared;
import static org.gatefit.match.RuleCase.pass;
import static org.gatefit.match.RuleCase.says;
import static org.gatefit.match.RuleCase.verdict;
import static org.gatefit.match.RuleCase.warn;

import java.util.List;
import java.util.function.Consumer;
import org.junit.jupiter.api.Test;

/**
 * {@code logic-level} and {@code polarity} at their limits. Noise margins NM_H = V_OH − V_IH and NM_L =
 * V_IL − V_OL (JEDEC JESD8 definitions, REFERENCES §6): negative fails, under the logic-noise margin
 * (0.1 V default, common practice) warns with 0.35 + 0.3·NM/noise, else passes with 0.7 + 0.3·NM/0.8 V
 * (Score). The controller levels are given as V_OH 3.0 V and V_OL 0.5 V so the margins are exact; the
 * controller family (LVCMOS 3.3 V) still sets the highest output, its 3.6 V maximum supply (JESD8C.01,
 * REFERENCES §9).
 */
class LogicLevelRuleTest {

    private static final Consumer<OperatingPoint.Spec> LEVELS = o -> {
        o.vOh = 3.0;
        o.vOl = 0.5;
    };

    private static Check logic(double vIh, double vIl) {
        return check(Rule.LOGIC_LEVEL, S0, d -> {
            d.vIh = vIh;
            d.vIl = vIl;
        }, LEVELS);
    }

    @Test
    void zeroMarginHighWarnsAtTheFailEdge() {
        Check c = logic(3.0, 0.8);
        verdict(c, Verdict.WARN, warn(0));
        says(c, "into V_IH 3 V / V_IL 800 mV: noise margins 0 V high, 300 mV low, under the 100 mV asked for");
        compared(c, "noise margin high (V_OH − V_IH)", 0, "≥", 0.1);
        compared(c, "noise margin low (V_IL − V_OL)", 0.3, "≥", 0.1);
    }

    @Test
    void zeroMarginLowWarnsAtTheFailEdge() {
        verdict(logic(2.0, 0.5), Verdict.WARN, warn(0));
    }

    @Test
    void aMarginHalfTheNoiseWarnsHalfWay() {
        // NM_H 3.0 − 2.95 = 0.05 V = half of 0.1 V
        verdict(logic(2.95, 0.8), Verdict.WARN, warn(0.5));
    }

    @Test
    void aMarginExactlyTheNoiseMarginPasses() {
        // noise margin 0.25 V: NM_H 3.0 − 2.75 = 0.25 V → pass, 0.25/0.8
        Margins m = new Margins(1.5, 0.10, 1.0, 0.25, 0.20, 2.0, 0.7, 0.7, 2.0, 0.15, 0.5, 100, 0.25);
        Check c = check(Rule.LOGIC_LEVEL, m, S0, d -> d.vIh = 2.75, LEVELS);
        verdict(c, Verdict.PASS, pass(0.25 / 0.8));
    }

    @Test
    void aClearPassScoresTheSmallerMargin() {
        // NM_H 1.0 V, NM_L 0.3 V → 0.3/0.8
        Check c = logic(2.0, 0.8);
        verdict(c, Verdict.PASS, pass(0.3 / 0.8));
        says(c, "into V_IH 2 V / V_IL 800 mV: noise margins 1 V high, 300 mV low");
        compared(c, "controller output high", 3.6, "≤", 20);
    }

    @Test
    void negativeMarginsFail() {
        verdict(logic(3.01, 0.8), Verdict.FAIL, 0);
        verdict(logic(2.0, 0.49), Verdict.FAIL, 0);
    }

    @Test
    void anInputMaximumAtTheControllersHighestOutputIsAccepted() {
        // LVCMOS 3.3 V reaches 3.6 V at its maximum supply: an input maximum of 3.6 V is not exceeded
        verdict(check(Rule.LOGIC_LEVEL, S0, d -> d.vInMax = 3.6, LEVELS), Verdict.PASS, pass(0.3 / 0.8));
        Check over = check(Rule.LOGIC_LEVEL, S0, d -> d.vInMax = 3.5, LEVELS);
        verdict(over, Verdict.FAIL, 0);
        says(over, "drives up to 3.6 V, above this driver's 3.5 V input maximum");
        Check none = check(Rule.LOGIC_LEVEL, S0, d -> d.vInMax = Double.NaN, LEVELS);
        notCompared(none, "controller output high");
    }

    @Test
    void theControllerIsNamedByItsFamilyWhenKnown() {
        Check named = check(Rule.LOGIC_LEVEL, S0, d -> d.vIh = Double.NaN, RuleCase.O0);
        verdict(named, Verdict.UNKNOWN, Score.UNKNOWN);
        says(named, "check that the lvcmos-3v3 controller (V_OH 2.8 V, V_OL 200 mV) drives it");
        Check bare = check(Rule.LOGIC_LEVEL, S0, d -> d.vIh = Double.NaN, LEVELS.andThen(o -> o.logic = null));
        says(bare, "check that the controller (V_OH 3 V, V_OL 500 mV) drives it");
    }

    @Test
    void aDriverWithBothSensesNamesTheChannelForAnActiveHighPwm() {
        Check c = check(Rule.POLARITY, S0, d -> d.inverting = List.of(false, true), RuleCase.O0);
        verdict(c, Verdict.PASS, 1.0);
        says(c, "use channel 1 (non-inverting) for the active-high PWM");
        Check low = check(Rule.POLARITY, S0, d -> d.inverting = List.of(false, true), o -> o.activeHigh = false);
        says(low, "use channel 2 (inverting) for the active-low PWM");
    }
}
