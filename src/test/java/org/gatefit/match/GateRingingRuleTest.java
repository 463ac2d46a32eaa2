package org.gatefit.match;

import static org.gatefit.match.RuleCase.D0;
import static org.gatefit.match.RuleCase.O0;
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
 * {@code gate-ringing} at its limits. The gate loop is a series R-L-C (plain circuit theory,
 * REFERENCES §3 and §8): ζ = (R/2)·√(C/L), and a step overshoots by exp(−πζ/√(1−ζ²)) of the swing
 * (ζ = 0.5 → 16.3 %, REFERENCES §8). A loop of 16 nH into C_iss 4 nF has √(L/C) = 2 Ω, so a 2 Ω
 * loop (driver 2 Ω, no R_g, no R_g,int) has ζ = 0.5 exactly, and a 4 Ω one ζ = 1 (critical, R_crit =
 * 2√(L/C), REFERENCES §3). Stepping 0 → 10 V the gate peaks at 10 + 10·0.16303 = 11.630 V and dips to
 * −1.630 V. The room under V_GS,max is (V_GS,max − peak)/V_GS,max, over V_GS,min (trough − V_GS,min)/−V_GS,min;
 * with the 10 % gate headroom (common practice, no source) a room under 0.1 warns (sub-score 0.35 +
 * 0.3·room/0.1), at or above it passes (0.7 + 0.3·(room − 0.1)/0.1), below 0 fails (Score).
 */
class GateRingingRuleTest {

    /** ζ = 0.5 for an overshoot of 16.303 % (REFERENCES §8). */
    private static final double OS = Math.exp(-Math.PI * 0.5 / Math.sqrt(1 - 0.25));
    private static final double PEAK = 10 + 10 * OS;
    private static final double TROUGH = -10 * OS;

    /** The ζ = 0.5 loop: 16 nH, 4 nF, 2 Ω on and off. */
    private static final Consumer<Parts.Sw> LOOP_S = s -> {
        s.cIss = 4e-9;
        s.rGInt = 0;
    };
    private static final Consumer<Parts.Dr> LOOP_D = d -> {
        d.rSource = 2;
        d.rSink = 2;
    };
    private static final Consumer<OperatingPoint.Spec> LOOP_O = o -> {
        o.rG = 0.0;
        o.loop = 16e-9;
    };

    private static Check ring(double vGsMin, double vGsMax) {
        return check(Rule.GATE_RINGING, LOOP_S.andThen(s -> {
            s.vGsMin = vGsMin;
            s.vGsMax = vGsMax;
        }), LOOP_D, LOOP_O);
    }

    @Test
    void theBaselineLoopIsOverdampedAndScoresFull() {
        // baseline: R_on 2 + 2 + 1 = 5 Ω, R_off 1 + 2 + 1 = 4 Ω, 10 nH, 3 nF: √(C/L) = 0.5477;
        // ζ 2.5·0.5477 = 1.37 on, 2·0.5477 = 1.10 off: no overshoot either way
        Check c = check(Rule.GATE_RINGING, S0, D0, O0);
        verdict(c, Verdict.PASS, 1.0);
        says(c, "at 25 °C the gate loop (10 nH, 3 nF) has ζ 1.37 on and 1.1 off: the gate does not overshoot on"
                + " turn-on and does not undershoot on turn-off");
        saysNot(c, "against V_GS");
    }

    @Test
    void aCriticallyDampedLoopIsDampedNotJudgedAgainstTheLimits() {
        // 4 Ω into √(L/C) = 2 Ω: ζ = (4/2)·0.5 = 1 exactly both ways — no overshoot (ζ ≥ 1)
        Check c = check(Rule.GATE_RINGING, LOOP_S, d -> {
            d.rSource = 4;
            d.rSink = 4;
        }, LOOP_O);
        verdict(c, Verdict.PASS, 1.0);
        says(c, "has ζ 1 on and 1 off: the gate does not overshoot on turn-on and does not undershoot on turn-off");
        saysNot(c, "against V_GS");
    }

    @Test
    void aCriticallyDampedTurnOnLeavesTheTurnOffToDecide() {
        // ζ_on = 1 (4 Ω): no peak; V_GS,max 10.5 V would leave only (10.5 − 10)/10.5 = 4.8 % if a peak at the
        // on level were counted. ζ_off = 0.5: trough −1.630 V against −20 V: room (−1.630 + 20)/20 = 0.918
        Check c = check(Rule.GATE_RINGING, LOOP_S.andThen(s -> s.vGsMax = 10.5), LOOP_D.andThen(d -> d.rSource = 4), LOOP_O);
        verdict(c, Verdict.PASS, 1.0);
        says(c, "ζ 1 on and 0.5 off: the gate does not overshoot on turn-on and dips to -1.63 V against V_GS -20 V / 10.5 V");
    }

    @Test
    void aCriticallyDampedTurnOffHasNoUndershootEvenNearTheLimit() {
        // ζ_off = 1 (4 Ω sink): the gate settles at the −5.5 V off level, which is negative-bias's question (within
        // 10 % of −6 V); ζ_on = 0.5: peak 10 + 15.5·0.163 = 12.53 V, room (20 − 12.53)/20 = 0.37 ≥ 0.1
        Check c = check(Rule.GATE_RINGING, LOOP_S.andThen(s -> s.vGsMin = -6), LOOP_D.andThen(d -> d.rSink = 4),
                LOOP_O.andThen(o -> o.vDriveNeg = -5.5));
        verdict(c, Verdict.PASS, 1.0);
        says(c, "ζ 0.5 on and 1 off", "does not undershoot on turn-off");
    }

    @Test
    void withoutHeadroomAPeakAtTheLimitStillPasses() {
        // gate headroom 0: the peak exactly at V_GS,max leaves room 0 = the headroom: a pass, scored 1 (nothing to scale)
        Margins m = new Margins(1.5, 0, 1.0, 0.1, 0.20, 2.0, 0.7, 0.7, 2.0, 0.15, 0.5, 100, 0.25);
        Check c = check(Rule.GATE_RINGING, m, LOOP_S.andThen(s -> s.vGsMax = PEAK), LOOP_D, LOOP_O);
        verdict(c, Verdict.PASS, 1.0);
    }

    @Test
    void aTieBetweenPeakAndTroughNamesTheTurnOnResistor() {
        // ±5 V against ±7 V: the peak 5 + 10·0.163 and the trough −5 − 10·0.163 leave the same room
        // (7 − 6.63)/7 = 0.053; the turn-on side is named first
        Check c = check(Rule.GATE_RINGING, LOOP_S.andThen(s -> {
            s.vGsMax = 7;
            s.vGsMin = -7;
        }), LOOP_D, LOOP_O.andThen(o -> {
            o.vDrive = 5.0;
            o.vDriveNeg = -5.0;
        }));
        verdict(c, Verdict.WARN, warn((7 - (5 + 10 * OS)) / 7 / 0.1));
        says(c, "— raise R_g to ≥ ");
        saysNot(c, "R_g,off");
    }

    @Test
    void anOnLevelAtTheLimitIsLeftToGateVoltage() {
        // V_GS,max 10 V = the on level: the peak's room is gate-voltage's question; the trough's 0.918 decides
        verdict(ring(-20, 10), Verdict.PASS, 1.0);
    }

    @Test
    void anOffLevelAtTheLimitIsLeftToNegativeBias() {
        // V_GS,min 0 V = the off level; the peak decides: (20 − 11.630)/20 = 0.418 ≥ 0.1, saturated
        Check c = ring(0, 20);
        verdict(c, Verdict.PASS, 1.0);
        says(c, "against V_GS 0 V / 20 V");
    }

    @Test
    void aPeakWellUnderTheLimitPassesWithItsExcess() {
        // (13.5 − 11.630)/13.5 = 0.1385; excess (0.1385 − 0.1)/0.1 = 0.385
        Check c = ring(-20, 13.5);
        double room = (13.5 - PEAK) / 13.5;
        verdict(c, Verdict.PASS, pass((room - 0.1) / 0.1));
        says(c, "at 25 °C the gate loop (16 nH, 4 nF) has ζ 0.5 on and 0.5 off: the gate peaks at 11.6 V and dips to"
                + " -1.63 V against V_GS -20 V / 13.5 V");
        compared(c, "turn-on peak", PEAK, "≤", 13.5);
        compared(c, "turn-off trough", TROUGH, "≥", -20);
    }

    @Test
    void aPeakInsideTheHeadroomWarnsAndNamesTheFix() {
        // (12.5 − 11.630)/12.5 = 0.0696 → towardPass 0.696.
        // Fix: the overshoot allowed is (12.5·0.9 − 10)/10 = 0.125; ζ = −ln 0.125/√(π² + ln² 0.125) = 0.5519
        // (inverse of the overshoot formula); R = 2ζ√(L/C) = 2.208 Ω, less the 2 Ω driver: R_g ≥ 0.208 Ω → E24
        // (IEC 60062) 220 mΩ; or L ≤ (R/(2ζ))²·C = (2/1.1039)²·4 nF = 13.1 nH.
        // (R_g,off 1 Ω changes only the turn-off side: ζ_off 0.75; the inductance bound uses the turn-on loop's 2 Ω)
        Check c = check(Rule.GATE_RINGING, LOOP_S.andThen(s -> s.vGsMax = 12.5), LOOP_D, LOOP_O.andThen(o -> o.rGOff = 1.0));
        verdict(c, Verdict.WARN, warn((12.5 - PEAK) / 12.5 / 0.1));
        says(c, "against V_GS -20 V / 12.5 V, inside the 10 % headroom — raise R_g to ≥ 220 mΩ per switch or cut the"
                + " gate-loop inductance to ≤ 13.1 nH (ζ ≥ 0.552)");
    }

    @Test
    void aPeakExactlyAtTheLimitWarnsAtTheFailEdge() {
        Check c = ring(-20, PEAK);
        verdict(c, Verdict.WARN, warn(0));
    }

    @Test
    void aPeakPastTheLimitFails() {
        // 11.630 V > 11.5 V
        Check c = ring(-20, 11.5);
        verdict(c, Verdict.FAIL, 0);
        says(c, "the gate peaks at 11.6 V", ", past V_GS,max 11.5 V — raise R_g to ≥ ");
        saysNot(c, "R_g,off");
    }

    @Test
    void anOnLevelWithNoHeadroomSaysSoInsteadOfAResistor() {
        // V_GS,max 11 V less 10 % = 9.9 V < the 10 V on level: no overshoot is allowed at all
        Check c = ring(-20, 11);
        verdict(c, Verdict.FAIL, 0);
        says(c, "past V_GS,max 11 V — the on level itself leaves no headroom under V_GS,max (see gate-voltage)");
    }

    @Test
    void anOnLevelExactlyAtTheHeadroomLimitLeavesNoOvershoot() {
        // +9 V, V_GS,max 10 V: 10·0.9 = 9 V, no overshoot allowed; the peak 9 + 9·0.163 = 10.47 V is past 10 V
        Check c = check(Rule.GATE_RINGING, LOOP_S.andThen(s -> s.vGsMax = 10), LOOP_D, LOOP_O.andThen(o -> o.vDrive = 9.0));
        verdict(c, Verdict.FAIL, 0);
        says(c, "peaks at 10.5 V", "past V_GS,max 10 V — the on level itself leaves no headroom under V_GS,max");
    }

    @Test
    void aTroughPastTheLimitFailsAndNamesTheTurnOffResistor() {
        // −1.630 V < −1.5 V
        Check c = ring(-1.5, 20);
        verdict(c, Verdict.FAIL, 0);
        says(c, "dips to -1.63 V", ", past V_GS,min -1.5 V — raise R_g,off to ≥ ");
    }

    @Test
    void aTroughInsideTheHeadroomWarnsOnTheTurnOffSide() {
        // (−1.630 + 1.75)/1.75 = 0.0684 < 0.1; the peak's room (20 − 11.63)/20 = 0.418 is the larger.
        // Fix: allowed (0 + 1.75·0.9)/10 = 0.1575 → ζ = −ln 0.1575/√(π² + ln² 0.1575) = 0.5070
        // (inverse of the overshoot formula): R = 2·0.5070·2 = 2.028 Ω, R_g,off ≥ 0.028 Ω → E24 30 mΩ.
        Check c = ring(-1.75, 20);
        double room = (TROUGH + 1.75) / 1.75;
        verdict(c, Verdict.WARN, warn(room / 0.1));
        says(c, "inside the 10 % headroom — raise R_g,off to ≥ 30 mΩ per switch", "(ζ ≥ 0.507)");
    }

    @Test
    void aTroughExactlyAtTheLimitWarnsAtTheFailEdge() {
        verdict(ring(TROUGH, 20), Verdict.WARN, warn(0));
    }

    @Test
    void theOffLevelWithNoHeadroomSaysSo() {
        // off −5 V, V_GS,min −5.5 V less 10 % = −4.95 V: above the off level. Swing 15 V, trough −5 − 15·0.163 = −7.45 V
        Check c = check(Rule.GATE_RINGING, LOOP_S.andThen(s -> s.vGsMin = -5.5), LOOP_D,
                LOOP_O.andThen(o -> o.vDriveNeg = -5.0));
        verdict(c, Verdict.FAIL, 0);
        says(c, "dips to -7.45 V", "past V_GS,min -5.5 V — the off level itself leaves no headroom over V_GS,min"
                + " (see negative-bias)");
    }

    @Test
    void anUnknownLimitIsUnknown() {
        Check max = ring(-20, Double.NaN);
        verdict(max, Verdict.UNKNOWN, Score.UNKNOWN);
        says(max, "the gate peaks at 11.6 V", ", but V_GS,max or V_GS,min of the switch is unknown");
        notCompared(max, "turn-on peak");
        compared(max, "turn-off trough", TROUGH, "≥", -20);
        Check min = ring(Double.NaN, 20);
        verdict(min, Verdict.UNKNOWN, Score.UNKNOWN);
        notCompared(min, "turn-off trough");
        compared(min, "turn-on peak", PEAK, "≤", 20);
    }

    @Test
    void anUnknownCapacitanceIsUnknown() {
        Check c = check(Rule.GATE_RINGING, s -> s.cIss = Double.NaN, D0, O0);
        verdict(c, Verdict.UNKNOWN, Score.UNKNOWN);
        says(c, "C_iss of the switch unknown");
    }

    @Test
    void aColdJunctionIsTheFastCorner() {
        // tj −40 °C: the driver's resistance factor 1 + 0.004·(−40 − 25) = 0.74 (JunctionTemperature, from memory)
        // makes −40 °C the least-damped corner: ζ_on = (0.74·2/2)·0.5 = 0.37
        Check c = check(Rule.GATE_RINGING, LOOP_S, LOOP_D, LOOP_O.andThen(o -> o.tj = -40.0));
        says(c, "at -40 °C the gate loop (16 nH, 4 nF) has ζ 0.37 on and 0.37 off");
    }

    @Test
    void parallelSwitchesAddTheirCapacitance() {
        // two switches: C = 8 nF, R = 2 Ω (driver) + 0: ζ = 1·√(8/16) = 0.707 (REFERENCES §8: 0.7 → 4.6 %)
        Check c = check(Rule.GATE_RINGING, LOOP_S, LOOP_D, LOOP_O.andThen(o -> o.parallel = 2));
        says(c, "the gate loop (16 nH, 8 nF) has ζ 0.707 on and 0.707 off");
    }
}
