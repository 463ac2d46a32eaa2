package org.gatefit.match;

import static org.gatefit.match.RuleCase.check;
import static org.gatefit.match.RuleCase.compared;
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
 * {@code protection} at its limits: an IGBT or SiC stage above the 100 V protection bus (common
 * practice, no source) should detect desaturation within the switch's short-circuit withstand time
 * (REFERENCES §9: a few µs at a stated gate voltage). A detection time not shorter than the withstand
 * warns at 0.3 of the way (0.44); a pass scores 0.7 + 0.3·(1 − t_desat/t_sc) (Score).
 */
class ProtectionRuleTest {

    private static Check igbt(double bus, Consumer<Parts.Dr> d) {
        return check(Rule.PROTECTION, s -> {
            s.tech = Technology.IGBT;
            s.tSc = 4e-6;
        }, d, o -> o.bus = bus);
    }

    private static Consumer<Parts.Dr> desat(double t, Boolean softOff) {
        return d -> {
            d.desat = true;
            d.tDesat = t;
            d.softOff = softOff;
        };
    }

    @Test
    void aBusAtTheProtectionLimitNeedsNoDetection() {
        Check c = igbt(100, d -> { });
        verdict(c, Verdict.PASS, 1.0);
        says(c, "an igbt on 100 V, at or below the 100 V above which short-circuit detection is expected");
    }

    @Test
    void aDetectionWellInsideTheWithstandScoresItsShare() {
        // 1 µs of 4 µs: 1 − 0.25 = 0.75
        Check c = igbt(400, desat(1e-6, true));
        verdict(c, Verdict.PASS, pass(0.75));
        says(c, "this driver detects desaturation within 1 µs, with soft turn-off, inside the switch's 4 µs withstand time");
        compared(c, "detection time", 1e-6, "<", 4e-6);
    }

    @Test
    void aDetectionAtTheWithstandTimeIsTooSlow() {
        Check c = igbt(400, desat(4e-6, false));
        verdict(c, Verdict.WARN, warn(0.3));
        says(c, "this driver detects desaturation after 4 µs, without soft turn-off (a hard turn-off of a short-circuit"
                + " current overshoots the collector), not before the switch's 4 µs short-circuit withstand time");
    }

    @Test
    void missingTimesAreUnknownAndNotCompared() {
        Check c = igbt(400, desat(Double.NaN, null));
        verdict(c, Verdict.UNKNOWN, Score.UNKNOWN);
        says(c, "this driver detects desaturation, but its detection time (t_desat_ns)");
        saysNot(c, "soft turn-off");
        assertTrue(c.compared().isEmpty(), c.compared()::toString);
        Check noSc = check(Rule.PROTECTION, s -> s.tech = Technology.SIC_MOSFET, desat(1e-6, null), o -> o.bus = 400.0);
        verdict(noSc, Verdict.UNKNOWN, Score.UNKNOWN);
        assertTrue(noSc.compared().isEmpty(), noSc.compared()::toString);
    }

    @Test
    void onlyAMissingBusIsTheAskersQuestion() {
        Check c = check(Rule.PROTECTION, s -> s.tech = Technology.IGBT, d -> { }, o -> o.bus = null);
        verdict(c, Verdict.UNKNOWN, Score.OPEN);
        assertEquals("bus", c.notGiven());
        Check noData = igbt(400, d -> { });
        verdict(noData, Verdict.UNKNOWN, Score.UNKNOWN);
        assertNull(noData.notGiven());
        says(noData, "does not say whether this driver detects desaturation (desat)");
    }

    @Test
    void aDriverWithoutDetectionWarns() {
        Check c = igbt(400, d -> d.desat = false);
        verdict(c, Verdict.WARN, warn(0.3));
        says(c, "an igbt on 400 V should be protected against short circuits, but this driver has no desaturation");
    }
}
