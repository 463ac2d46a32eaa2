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
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.function.Consumer;
import org.junit.jupiter.api.Test;

/**
 * {@code high-side} at its limits: every boundary just inside, at and just outside, the sub-score at
 * known points, and the numbers the sentence names. Limits are the rule's (DESIGN.md, HighSideRule):
 * a floating offset rating or V_IORM (peak working isolation voltage, IEC 60747-17's definition,
 * REFERENCES §9) at least the bus fails below it and passes at bus·(1 + offset margin 20 %); a
 * one-minute withstand rating (a test level, REFERENCES §9) passes only at or below 60 V (IEC 62368-1
 * ES1, from memory) with the 2× isolation margin; CMTI must reach the switch-node dv/dt and pass at
 * 2× it (margins: common practice, no source). Sub-scores: pass 0.7 + 0.3·excess, warn
 * 0.35 + 0.3·towardPass (Score).
 */
class HighSideRuleTest {

    private static final Consumer<OperatingPoint.Spec> HIGH = o -> o.highSide = true;

    private static Consumer<OperatingPoint.Spec> high(double bus) {
        return o -> {
            o.highSide = true;
            o.bus = bus;
        };
    }

    /** A high side at {@code bus} with the switch node slewing at exactly {@code dvdt} (given, so every edge is it). */
    private static Consumer<OperatingPoint.Spec> high(double bus, double dvdt) {
        return high(bus).andThen(o -> o.dvdt = dvdt);
    }

    private static Check offset(double rating, Consumer<OperatingPoint.Spec> o) {
        return check(Rule.HIGH_SIDE, S0, d -> d.vOffsetMax = rating, o);
    }

    // ------------------------------------------------------------------ low side, topology

    @Test
    void aLowSideNeedsNothingAndScoresFull() {
        Check c = check(Rule.HIGH_SIDE, S0, D0, RuleCase.O0);
        verdict(c, Verdict.PASS, 1.0);
        says(c, "low side: the source sits at ground");
        assertTrue(c.compared().isEmpty(), c.compared()::toString);
    }

    @Test
    void aLowSideDriverCannotFloatWhateverItsRatings() {
        Check c = check(Rule.HIGH_SIDE, S0, d -> {
            d.topology = Topology.LOW_SIDE;
            d.cmti = 1e9; // below any dv/dt: a failure is never replaced
        }, high(100, 4e9));
        verdict(c, Verdict.FAIL, 0);
        says(c, "a low-side driver cannot float", "pick a high-side, half-bridge or isolated driver");
    }

    // ------------------------------------------------------------------ floating offset (bootstrapped)

    /* Bus 100 V, offset margin 20 %: the rating must reach 100 V and passes at 100·1.2 = 120 V. */

    @Test
    void anOffsetRatingJustBelowTheBusFails() {
        Check c = offset(99, high(100));
        verdict(c, Verdict.FAIL, 0);
        says(c, "offset rating 99 V is below the 100 V bus", "pick a driver rated ≥ 120 V");
        compared(c, "floating offset rating", 99, "≥", 120);
    }

    @Test
    void anOffsetRatingAtTheBusWarnsAtTheFailEdge() {
        // towardPass (rating − bus)/(need − bus) = 0 → 0.35
        Check c = offset(100, high(100));
        verdict(c, Verdict.WARN, warn(0));
        says(c, "offset rating 100 V leaves less than 20 % above the 100 V bus", "pick a driver rated ≥ 120 V",
                "or measure the overshoot");
    }

    @Test
    void anOffsetRatingHalfWayWarnsHalfWay() {
        // (110 − 100)/(120 − 100) = 0.5 → 0.35 + 0.15 = 0.5
        Check c = offset(110, high(100));
        verdict(c, Verdict.WARN, warn(0.5));
        compared(c, "floating offset rating", 110, "≥", 120);
    }

    @Test
    void anOffsetRatingAtTheMarginPassesBare() {
        // rating/need − 1 = 120/120 − 1 = 0 → 0.7
        Check c = offset(120, high(100));
        verdict(c, Verdict.PASS, pass(0));
        says(c, "offset rating 120 V covers the 100 V bus with 20 % to spare");
        saysNot(c, "turn-off overshoot", "CMTI");
    }

    @Test
    void anOffsetRatingAboveTheMarginScoresItsExcess() {
        // 150/120 − 1 = 0.25 → 0.7 + 0.075; spare 150/100 − 1 = 50 %
        Check c = offset(150, high(100));
        verdict(c, Verdict.PASS, pass(0.25));
        says(c, "offset rating 150 V covers the 100 V bus with 50 % to spare");
    }

    @Test
    void anUnknownOffsetRatingIsUnknownAndNotAnOpenQuestion() {
        Check c = offset(Double.NaN, high(100));
        verdict(c, Verdict.UNKNOWN, Score.UNKNOWN);
        assertNull(c.notGiven());
        says(c, "floating offset rating (v_offset_max_v) is unknown");
    }

    @Test
    void aMissingBusIsTheAskersOpenQuestion() {
        Check c = offset(200, HIGH.andThen(o -> o.bus = null));
        verdict(c, Verdict.UNKNOWN, Score.OPEN);
        assertEquals("bus", c.notGiven());
        says(c, "give --bus or bus_v to check the 200 V offset rating");
    }

    /*
     * Switch-node overshoot at turn-off, v = L·di/dt (plain circuit theory) with the current falling as
     * the gate discharges from the 5 V plateau to V_th,max 4 V through R = 1 (sink, 25 °C) + 2 (R_g)
     * + 1 (R_g,int) Ω into C_iss 3 nF: t_fall = R·C·ln(5/4) = 2.6777 ns (REFERENCES §1's RC form);
     * 2 nH · 10 A / 2.6777 ns = 7.469 V; need (100 + 7.469)·1.2 = 128.96 V.
     */
    private static final double T_FALL = 4 * 3e-9 * Math.log(5.0 / 4.0);
    private static final double OVERSHOOT = 2e-9 * 10 / T_FALL;
    private static final double NEED_OS = (100 + OVERSHOOT) * 1.2;

    private static final Consumer<OperatingPoint.Spec> LOOP = high(100).andThen(o -> {
        o.powerLoop = 2e-9;
        o.iLoad = 10.0;
    });

    @Test
    void theEstimatedOvershootRaisesTheNeedAndIsNamed() {
        Check c = offset(200, LOOP);
        // 200/128.96 − 1 = 0.5508
        verdict(c, Verdict.PASS, pass(200 / NEED_OS - 1));
        compared(c, "floating offset rating", 200, "≥", NEED_OS);
        says(c, "offset rating 200 V covers the 100 V bus with 100 % to spare",
                "(the 100 V bus plus 7.47 V turn-off overshoot (L·I/t_fall) with 20 % margin: 129 V)");
    }

    @Test
    void anOffsetShortOfTheOvershootWarnsAndSaysShortenTheLoop() {
        Check c = offset(120, LOOP);
        // (120 − 100)/(128.96 − 100) = 0.6906
        verdict(c, Verdict.WARN, warn((120 - 100) / (NEED_OS - 100)));
        says(c, "offset rating 120 V is short of the 100 V bus plus 7.47 V turn-off overshoot (L·I/t_fall) with 20 %"
                + " margin (129 V) — pick a driver rated ≥ 129 V, or shorten the power loop");
    }

    // ------------------------------------------------------------------ isolated: V_IORM

    /** Isolated, CMTI 150 V/ns far above the 4 V/ns given, so only the voltage decides. */
    private static Check working(double iorm, double bus) {
        return check(Rule.HIGH_SIDE, S0, d -> {
            d.topology = Topology.ISOLATED;
            d.vIorm = iorm;
            d.isolationVrms = 5000; // the working rating decides when both are known
            d.cmti = 150e9;
        }, high(bus, 4e9));
    }

    @Test
    void aWorkingVoltageJustBelowTheBusFails() {
        Check c = working(99, 100);
        verdict(c, Verdict.FAIL, 0);
        says(c, "working isolation voltage 99 V peak is below the 100 V bus — pick a driver with V_IORM ≥ 120 V peak");
        compared(c, "working isolation voltage (peak)", 99, "≥", 120);
        notCompared(c, "isolation rating (rms, 1 min)");
    }

    @Test
    void aWorkingVoltageAtTheBusWarnsAtTheFailEdge() {
        Check c = working(100, 100);
        verdict(c, Verdict.WARN, warn(0));
        says(c, "working isolation voltage 100 V peak does not cover the 100 V bus with 20 % for overshoot (120 V)",
                "pick a driver with V_IORM ≥ 120 V");
    }

    @Test
    void aWorkingVoltageHalfWayWarnsHalfWay() {
        verdict(working(110, 100), Verdict.WARN, warn(0.5));
    }

    @Test
    void aWorkingVoltageAtTheMarginPassesBare() {
        Check c = working(120, 100);
        verdict(c, Verdict.PASS, pass(0));
        says(c, "working isolation voltage 120 V peak covers the 100 V bus with 20 % for overshoot; CMTI 150 V/ns"
                + " against the 4 V/ns switch node; confirm creepage");
        // CMTI 150 V/ns against 2 × 4 V/ns
        compared(c, "CMTI", 150, "≥", 8);
    }

    @Test
    void aWorkingVoltageAboveTheMarginScoresItsExcess() {
        verdict(working(150, 100), Verdict.PASS, pass(0.25));
    }

    @Test
    void theIsolatedBusQuestionNamesTheKnownRating() {
        Check c = check(Rule.HIGH_SIDE, S0, d -> {
            d.topology = Topology.ISOLATED;
            d.vIorm = 1500;
        }, HIGH.andThen(o -> o.bus = null));
        verdict(c, Verdict.UNKNOWN, Score.OPEN);
        assertEquals("bus", c.notGiven());
        says(c, "give --bus or bus_v to check the isolation (1.5 kV peak working)");
        Check w = check(Rule.HIGH_SIDE, S0, d -> {
            d.topology = Topology.ISOLATED;
            d.isolationVrms = 5000;
        }, HIGH.andThen(o -> o.bus = null));
        says(w, "(5 kV rms withstand)");
    }

    @Test
    void anIsolatedDriverWithoutRatingsIsUnknown() {
        Check c = check(Rule.HIGH_SIDE, S0, d -> d.topology = Topology.ISOLATED, high(100));
        verdict(c, Verdict.UNKNOWN, Score.UNKNOWN);
        assertNull(c.notGiven());
        says(c, "check its working voltage against the 100 V bus");
        Check noBus = check(Rule.HIGH_SIDE, S0, d -> d.topology = Topology.ISOLATED, HIGH.andThen(o -> o.bus = null));
        verdict(noBus, Verdict.UNKNOWN, Score.UNKNOWN);
        says(noBus, "check its working voltage against the bus");
    }

    // ------------------------------------------------------------------ isolated: withstand only

    /** Isolated with a one-minute withstand rating only, CMTI far above the 4 V/ns given. */
    private static Check withstand(double vrms, double bus) {
        return check(Rule.HIGH_SIDE, S0, d -> {
            d.topology = Topology.ISOLATED;
            d.isolationVrms = vrms;
            d.cmti = 150e9;
        }, high(bus, 4e9));
    }

    /* Bus 48 V (≤ 60 V): the withstand must reach the bus and passes at 2 × 48 = 96 V. */

    @Test
    void aWithstandJustBelowTheBusFails() {
        Check c = withstand(47, 48);
        verdict(c, Verdict.FAIL, 0);
        // need 48·1.2 = 57.6 V peak
        says(c, "isolation withstand 47 V rms is below the 48 V bus — pick a driver whose working isolation voltage"
                + " (V_IORM) is ≥ 57.6 V peak");
        compared(c, "isolation rating (rms, 1 min)", 47, "≥", 96);
    }

    @Test
    void aWithstandAtTheBusWarnsAtTheFailEdge() {
        // (iso − bus)/(bus·(2 − 1)) = 0
        Check c = withstand(48, 48);
        verdict(c, Verdict.WARN, warn(0));
        says(c, "isolation 48 V rms is less than 2× the 48 V bus", "; CMTI 150 V/ns against the 4 V/ns switch node");
    }

    @Test
    void aWithstandHalfWayWarnsHalfWay() {
        // (72 − 48)/48 = 0.5
        verdict(withstand(72, 48), Verdict.WARN, warn(0.5));
    }

    @Test
    void aWithstandAtTwiceTheBusPassesBare() {
        // 96/96 − 1 = 0
        Check c = withstand(96, 48);
        verdict(c, Verdict.PASS, pass(0));
        says(c, "isolated output, 96 V rms withstand against a 48 V bus (at or below 60 V)");
    }

    @Test
    void aThreefoldIsolationMarginScalesTheWarning() {
        // isolation margin 3×: want 144 V; 96 V withstand on 48 V → (96 − 48)/(48·(3 − 1)) = 0.5
        Margins m = new Margins(1.5, 0.10, 1.0, 0.1, 0.20, 3.0, 0.7, 0.7, 2.0, 0.15, 0.5, 100, 0.25);
        Check c = check(Rule.HIGH_SIDE, m, S0, d -> {
            d.topology = Topology.ISOLATED;
            d.isolationVrms = 96;
            d.cmti = 150e9;
        }, high(48, 4e9));
        verdict(c, Verdict.WARN, warn(0.5));
        says(c, "isolation 96 V rms is less than 3× the 48 V bus");
    }

    @Test
    void aThreefoldCmtiMarginScalesTheWarning() {
        // CMTI margin 3×: 8 V/ns against 4 V/ns → (8 − 4)/(4·(3 − 1)) = 0.5; pick ≥ 12 V/ns
        Margins m = new Margins(1.5, 0.10, 1.0, 0.1, 0.20, 2.0, 0.7, 0.7, 3.0, 0.15, 0.5, 100, 0.25);
        Check c = check(Rule.HIGH_SIDE, m, S0, d -> d.cmti = 8e9, high(48, 4e9));
        verdict(c, Verdict.WARN, warn(0.5));
        says(c, "CMTI 8 V/ns is less than 3× the 4 V/ns switch-node slew", "CMTI ≥ 12 V/ns");
    }

    @Test
    void aWithstandAboveTwiceTheBusScoresItsExcess() {
        // 120/96 − 1 = 0.25
        verdict(withstand(120, 48), Verdict.PASS, pass(0.25));
    }

    @Test
    void aWithstandAloneStillPassesAtSixtyVolts() {
        // 60 V is the highest bus the withstand alone may pass; 5000/120 − 1 saturates
        Check c = withstand(5000, 60);
        verdict(c, Verdict.PASS, 1.0);
        says(c, "5 kV rms withstand against a 60 V bus (at or below 60 V)");
    }

    @Test
    void aWithstandAloneAboveSixtyVoltsAsksForTheWorkingVoltage() {
        Check c = withstand(5000, 61);
        verdict(c, Verdict.WARN, warn(0.5));
        // need 61·1.2 = 73.2 V
        says(c, "only the one-minute withstand rating (5 kV rms) is known", "unknown for the 61 V bus",
                "it must be ≥ 73.2 V peak; CMTI 150 V/ns against the 4 V/ns switch node");
    }

    // ------------------------------------------------------------------ CMTI

    /* A half-bridge driver rated 200 V on a 48 V bus (a pass: 200/57.6 − 1 saturates), dv/dt given 4 V/ns; pass at 8 V/ns. */

    private static Check cmti(double cmti) {
        return check(Rule.HIGH_SIDE, S0, d -> d.cmti = cmti, high(48, 4e9));
    }

    @Test
    void aCmtiJustBelowTheSlewFails() {
        Check c = cmti(3.99e9);
        verdict(c, Verdict.FAIL, 0);
        says(c, "the switch node slews at 4 V/ns, faster than this driver's CMTI 3.99 V/ns",
                "pick a driver with CMTI ≥ 8 V/ns or slow the edge");
        saysNot(c, "estimated");
        compared(c, "CMTI", 3.99, "≥", 8);
    }

    @Test
    void aCmtiAtTheSlewWarnsAtTheFailEdge() {
        // (cmti − slew)/(slew·(2 − 1)) = 0
        Check c = cmti(4e9);
        verdict(c, Verdict.WARN, warn(0));
        says(c, "CMTI 4 V/ns is less than 2× the 4 V/ns switch-node slew", "pick a driver with CMTI ≥ 8 V/ns");
    }

    @Test
    void aCmtiHalfWayWarnsHalfWay() {
        // (6 − 4)/4 = 0.5
        verdict(cmti(6e9), Verdict.WARN, warn(0.5));
    }

    @Test
    void aCmtiAtTwiceTheSlewLeavesTheOffsetPass() {
        Check c = cmti(8e9);
        verdict(c, Verdict.PASS, 1.0);
        // spare 200/48 − 1 = 317 %
        says(c, "offset rating 200 V covers the 48 V bus with 317 % to spare; CMTI 8 V/ns against the 4 V/ns switch node");
    }

    @Test
    void theEstimatedSlewIsTheFastestEdgeAndSaysSo() {
        // Without --dvdt: the fastest edge is this switch's turn-off at 25 °C, I = 5 V/(1 + 2 + 1) Ω = 1.25 A on the
        // plateau (REFERENCES §8), moving 48 V in Q_gd/I = 15 nC/1.25 A = 12 ns → 4 V/ns (C·dv/dt = i).
        Check c = check(Rule.HIGH_SIDE, S0, d -> d.cmti = 6e9, high(48));
        verdict(c, Verdict.WARN, warn(0.5));
        says(c, "the 4 V/ns (estimated, fastest edge and corner) switch-node slew");
    }

    @Test
    void aThinCmtiDoesNotReplaceAThinOffset() {
        // offset 110 V on 100 V: warn 0.5; CMTI 6 V/ns would warn 0.5 too, but only over a pass
        Check c = check(Rule.HIGH_SIDE, S0, d -> {
            d.vOffsetMax = 105;
            d.cmti = 6e9;
        }, high(100, 4e9));
        // (105 − 100)/20 = 0.25
        verdict(c, Verdict.WARN, warn(0.25));
        says(c, "offset rating 105 V leaves less than 20 %");
    }

    @Test
    void aCmtiBelowTheSlewFailsEvenOverAThinOffset() {
        Check c = check(Rule.HIGH_SIDE, S0, d -> {
            d.vOffsetMax = 105;
            d.cmti = 2e9;
        }, high(100, 4e9));
        verdict(c, Verdict.FAIL, 0);
        says(c, "faster than this driver's CMTI 2 V/ns");
    }

    @Test
    void aFailingOffsetIsNotReworded() {
        Check c = check(Rule.HIGH_SIDE, S0, d -> {
            d.vOffsetMax = 90;
            d.cmti = 2e9;
        }, high(100, 4e9));
        verdict(c, Verdict.FAIL, 0);
        says(c, "offset rating 90 V is below the 100 V bus");
    }

    @Test
    void anIsolatedDriverWithoutCmtiIsUnknownOnlyOverAPass() {
        Check pass = check(Rule.HIGH_SIDE, S0, d -> {
            d.topology = Topology.ISOLATED;
            d.vIorm = 1500;
        }, high(100, 4e9));
        verdict(pass, Verdict.UNKNOWN, Score.UNKNOWN);
        says(pass, "isolation is adequate, but this isolated driver's CMTI (cmti_kv_us) is unknown against the 4 V/ns"
                + " switch node — look it up; it must be ≥ 8 V/ns");
        notCompared(pass, "CMTI");
        Check thin = check(Rule.HIGH_SIDE, S0, d -> {
            d.topology = Topology.ISOLATED;
            d.vIorm = 110;
        }, high(100, 4e9));
        verdict(thin, Verdict.WARN, warn(0.5));
    }

    @Test
    void aBootstrappedDriverWithoutCmtiKeepsItsPass() {
        Check c = offset(150, high(100, 4e9));
        verdict(c, Verdict.PASS, pass(0.25));
        saysNot(c, "CMTI");
        notCompared(c, "CMTI");
    }
}
