package org.gatefit.match;

import static org.gatefit.match.RuleCase.S0;
import static org.gatefit.match.RuleCase.check;
import static org.gatefit.match.RuleCase.compared;
import static org.gatefit.match.RuleCase.pass;
import static org.gatefit.match.RuleCase.says;
import static org.gatefit.match.RuleCase.saysNot;
import static org.gatefit.match.RuleCase.verdict;
import static org.gatefit.match.RuleCase.warn;

import java.util.function.Consumer;
import org.junit.jupiter.api.Test;

/**
 * {@code drive-current} at its limits. The plateau-limited gate current (REFERENCES §8):
 * I_on = (V_on − V_pl)/R_on,total and I_off = (V_pl − V_off)/R_off,total, each capped at the rated peak,
 * against the current the drain edge needs, n·Q_gd/t_edge (C·dv/dt = i on the plateau charge), with a
 * margin (common practice, no source). Most rows judge at 25 °C ({@code --tj 25}) so the driver's
 * datasheet resistances hold, with a 2× margin so the limits fall on round numbers: Q_gd 15 nC over
 * 30 ns needs 0.5 A, 1.0 A with the margin. Sub-scores: pass 0.7 + 0.3·(ratio − m)/m, warn
 * 0.35 + 0.3·(ratio − 1)/(m − 1), where ratio is the weaker plateau current over the need (Score).
 */
class DriveCurrentRuleTest {

    /** The defaults with a 2× drive-current margin. */
    private static final Margins M2 = new Margins(2, 0.10, 1.0, 0.1, 0.20, 2.0, 0.7, 0.7, 2.0, 0.15, 0.5, 100, 0.25);

    /** 25 °C, both sides 5 V across 5 Ω: R_on 2 + 2 + 1, R_off 2 + 2 + 1 → 1 A each (a tie: turn-on is named). */
    private static final Consumer<Parts.Dr> EVEN = d -> d.rSink = 2;

    private static Check at(double edge) {
        return check(Rule.DRIVE_CURRENT, M2, S0, EVEN, o -> {
            o.tj = 25.0;
            o.edge = edge;
        });
    }

    @Test
    void exactlyTheNeedWarnsAtTheFailEdge() {
        // 15 nC / 15 ns = 1 A = the plateau current: ratio 1 → (1 − 1)/(2 − 1) = 0
        Check c = at(15e-9);
        verdict(c, Verdict.WARN, warn(0));
        says(c, "the drain edge needs 2 A on the Miller plateau for 15 ns with 2× margin (Q_gd 15 nC)",
                "at 25 °C this driver drives 1 A into the turn-on plateau (5 V above the plateau through 5 Ω), less"
                        + " margin than asked");
        compared(c, "plateau current, turn-on", 1, "≥", 2);
        compared(c, "plateau current, turn-off", 1, "≥", 2);
    }

    @Test
    void justUnderTheNeedFails() {
        // 15 nC / 14 ns = 1.071 A > 1 A
        verdict(at(14e-9), Verdict.FAIL, 0);
    }

    @Test
    void halfWayToTheMarginWarnsHalfWay() {
        // 15 nC / 22.5 ns = 0.667 A: ratio 1.5 → (1.5 − 1)/(2 − 1) = 0.5
        verdict(at(22.5e-9), Verdict.WARN, warn(0.5));
    }

    @Test
    void exactlyTheMarginPassesBare() {
        // 15 nC / 30 ns = 0.5 A: ratio 2 = the margin → excess 0
        Check c = at(30e-9);
        verdict(c, Verdict.PASS, pass(0));
        says(c, "the drain edge needs 1 A on the Miller plateau for 30 ns with 2× margin (Q_gd 15 nC); at 25 °C this"
                + " driver drives 1 A into the turn-on plateau (5 V above the plateau through 5 Ω)");
        saysNot(c, "less margin", " — ");
    }

    @Test
    void aboveTheMarginScoresItsExcess() {
        // 15 nC / 45 ns = 0.333 A: ratio 3 → (3 − 2)/2 = 0.5
        verdict(at(45e-9), Verdict.PASS, pass(0.5));
    }

    @Test
    void theHotCornerNamesItsLoopResistance() {
        // 125 °C: R_on = 1.4·2 + 2 + 1 = 5.8 Ω (driver resistance +40 % over 100 K, REFERENCES §8, from memory)
        // → 5/5.8 = 862 mA; need 15 nC/50 ns·1.5 = 450 mA; ratio 2.874 → (2.874 − 1.5)/1.5 = 0.916
        Check c = check(Rule.DRIVE_CURRENT, S0, RuleCase.D0, RuleCase.O0);
        verdict(c, Verdict.PASS, pass((5 / 5.8 / 0.3 - 1.5) / 1.5));
        says(c, "at 125 °C this driver drives 862 mA into the turn-on plateau (5 V above the plateau through 5.8 Ω)");
    }

    @Test
    void parallelSwitchesNeedTheirWholePlateauCharge() {
        // two switches: n·Q_gd = 30 nC over 50 ns = 0.6 A, 0.9 A with 1.5×; R_on = 1.4·2 + (2 + 1)/2 = 4.3 Ω
        Check c = check(Rule.DRIVE_CURRENT, S0, RuleCase.D0, o -> o.parallel = 2);
        says(c, "the drain edge needs 900 mA", "(Q_gd 30 nC)", "through 4.3 Ω");
    }

    @Test
    void aCappedTurnOffIsNamedAtItsRatedPeak() {
        // sink rated 0.5 A: 5 V/(1 + 2 + 1) Ω = 1.25 A is capped at 0.5 A < the 1 A turn-on; 0.5/0.3 = 1.667 ≥ 1.5
        Check c = check(Rule.DRIVE_CURRENT, S0, d -> d.iSink = 0.5, o -> o.tj = 25.0);
        verdict(c, Verdict.PASS, pass((0.5 / 0.3 - 1.5) / 1.5));
        says(c, "at 25 °C this driver pulls 500 mA out of the turn-off plateau (its rated peak)");
    }

    @Test
    void aThinTurnOffAsksForASmallerTurnOffResistor() {
        // +10/−2 V at 25 °C, R_g 0.5 Ω on, 2 Ω off, sink 6 Ω: I_off = (5 + 2)/(6 + 2 + 1) = 778 mA; I_on = 5/(2 + 0.5
        // + 1) = 1.43 A capped at the 0.8 A source rating. Edge 25 ns: 15 nC/25 ns = 0.6 A, 0.9 A with 1.5×: ratio 1.296 →
        // (1.296 − 1)/0.5. R_g,off ≤ 7/0.9 − 6 − 1 = 0.778 Ω → E24 (IEC 60062) 750 mΩ; the 6 A sink allows it.
        Check c = check(Rule.DRIVE_CURRENT, S0, d -> {
            d.iSource = 0.8;
            d.rSink = 6;
            d.vNegMin = -10;
        }, o -> {
            o.tj = 25.0;
            o.edge = 25e-9;
            o.vDriveNeg = -2.0;
            o.rG = 0.5;
            o.rGOff = 2.0;
        });
        verdict(c, Verdict.WARN, warn((7.0 / 9 / 0.6 - 1) / 0.5));
        says(c, "at 25 °C this driver pulls 778 mA out of the turn-off plateau (7 V above the off level through 9 Ω), less"
                + " margin than asked — lower R_g,off to 750 mΩ or pick a driver rated ≥ 900 mA");
    }

    @Test
    void aShortTurnOffBeyondTheSinkRatingAsksForAnotherDriverOrASlowerEdge() {
        // sink rated 0.25 A < 0.3 A: pick ≥ 0.45 A (rounded up to 500 mA) or relax the edge to 50 ns·0.45/0.25 = 90 ns
        Check c = check(Rule.DRIVE_CURRENT, S0, d -> d.iSink = 0.25, o -> o.tj = 25.0);
        verdict(c, Verdict.FAIL, 0);
        says(c, "pulls 250 mA out of the turn-off plateau (its rated peak) — pick a driver rated ≥ 500 mA or relax the"
                + " edge to 90 ns");
    }

    @Test
    void aRatingExactlyAtTheNeedStillAllowsASmallerResistor() {
        // 2× margin, edge 30 ns: need 1 A; source rated exactly 1 A, R_g 3 Ω: 5/(2 + 3 + 1) = 833 mA (ratio 1.667,
        // warn); R_g ≤ 5/1 − 2 − 1 = 2 Ω (E24 2 Ω). The turn-off, 5/(1 + 3 + 1) = 1 A, is the stronger.
        Check c = check(Rule.DRIVE_CURRENT, M2, S0, d -> d.iSource = 1.0, o -> {
            o.tj = 25.0;
            o.edge = 30e-9;
            o.rG = 3.0;
        });
        verdict(c, Verdict.WARN, warn(5.0 / 6 / 0.5 - 1));
        says(c, "drives 833 mA into the turn-on plateau (5 V above the plateau through 6 Ω)", "— lower R_g to 2 Ω or pick"
                + " a driver rated ≥ 1 A");
    }

    @Test
    void withoutQgdTheEdgeIsUnknownButTheWholeChargeIsShown() {
        // Q_g 50 nC over the 0–10 V it is specified over / 50 ns = 1 A (I = Q/t, REFERENCES §1); the peak
        // at 25 °C: min(10 V/(2 + 2 + 1) Ω, 10 V/(1 + 2 + 1) Ω) = 2 A (REFERENCES §1: I_pk = V/R, capped)
        Check c = check(Rule.DRIVE_CURRENT, s -> s.qGd = Double.NaN, RuleCase.D0, RuleCase.O0);
        verdict(c, Verdict.UNKNOWN, Score.UNKNOWN);
        says(c, "Q_gd or the plateau voltage of the switch unknown, so the drain edge cannot be judged; for orientation"
                + " only, the whole charge over the edge is 1 A against a peak of 2 A");
    }

    @Test
    void withoutQgTheOrientationIsLeftOut() {
        Check c = check(Rule.DRIVE_CURRENT, s -> {
            s.qGd = Double.NaN;
            s.qG = Double.NaN;
        }, RuleCase.D0, RuleCase.O0);
        verdict(c, Verdict.UNKNOWN, Score.UNKNOWN);
        saysNot(c, "for orientation");
    }

    @Test
    void levelsThatDoNotStraddleThePlateauSaySo() {
        Check c = check(Rule.DRIVE_CURRENT, s -> s.vPlateau = 11, RuleCase.D0, RuleCase.O0);
        verdict(c, Verdict.UNKNOWN, Score.UNKNOWN);
        says(c, "the drive levels 0 V / 10 V do not straddle the switch's 11 V Miller plateau, so the drain edge is not"
                + " driven; for orientation only");
    }
}
