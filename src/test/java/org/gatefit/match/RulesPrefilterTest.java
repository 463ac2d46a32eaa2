package org.gatefit.match;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.function.Consumer;
import org.junit.jupiter.api.Test;

/**
 * The conditions each rule declares on a driver's own catalog values ({@link PairRule#certainFailures},
 * collected by {@link Rules#prefilter}): the printed lines at known operating points, and for each
 * numeric declaration that a driver just past its limit fails the rule it names while one at the limit
 * does not (the declaration never skips a driver the rules would not fail). Limits by hand: the plateau
 * need n·Q_gd/t_edge = 15 nC/50 ns = 0.3 A (REFERENCES §8), the swing 10 V (the supply range and UVLO
 * rising against it: REFERENCES §5), LVCMOS 3.3 V at its minimum supply V_OH 2.8 V, V_OL 0.2 V and at its
 * maximum 3.6 V (JESD8C.01, REFERENCES §6 and §9).
 */
class RulesPrefilterTest {

    private static Prefilter prefilter(Consumer<Parts.Sw> s, Consumer<OperatingPoint.Spec> o) {
        Parts.Sw sw = Parts.sw();
        s.accept(sw);
        SwitchPart sp = sw.build();
        OperatingPoint.Spec op = Parts.op();
        o.accept(op);
        return Rules.prefilter(Question.of(sp, op.resolve(sp), Margins.DEFAULT));
    }

    private static Verdict verdict(Rule rule, Consumer<Parts.Sw> s, Consumer<Parts.Dr> d, Consumer<OperatingPoint.Spec> o) {
        return RuleCase.check(rule, s, d, o).verdict();
    }

    @Test
    void theBaselineDeclaresTheLowSidesConditions() {
        assertEquals(List.of("i_source_a >= 0.3", "i_sink_a >= 0.3", "v_supply_max_v >= 10", "v_supply_min_v <= 10",
                "skip uvlo_on_v > 10 (uvlo fails)", "skip v_ih_v > 2.8 and v_il_v known (logic-level fails)",
                "skip v_il_v < 0.2 and v_ih_v known (logic-level fails)",
                "skip v_in_max_v < 3.6 and v_ih_v known and v_il_v known (logic-level fails)",
                "skip input_polarity without a non-inverting channel (polarity fails)",
                "skip lifecycle = obsolete (lifecycle fails)"), prefilter(s -> { }, o -> { }).describe());
    }

    @Test
    void theHighSideAndANegativeOffLevelAddTheirs() {
        // high side on 48 V, −5 V off (≥ V_GS,min −20 V), active-low PWM
        List<String> lines = prefilter(s -> { }, o -> {
            o.highSide = true;
            o.vDriveNeg = -5.0;
            o.activeHigh = false;
        }).describe();
        assertTrue(lines.contains("v_supply_max_v >= 15"), lines::toString);
        assertTrue(lines.contains("topology != low-side"), lines::toString);
        assertTrue(lines.contains("skip topology = high-side and v_offset_max_v < 48 (high-side fails)"), lines::toString);
        assertTrue(lines.contains("skip topology = half-bridge and v_offset_max_v < 48 (high-side fails)"), lines::toString);
        assertTrue(lines.contains("skip topology = isolated and v_iorm_v < 48 (high-side fails)"), lines::toString);
        assertTrue(lines.contains("skip v_neg_min_v > -5 (negative-bias fails)"), lines::toString);
        assertTrue(lines.contains("skip input_polarity without an inverting channel (polarity fails)"), lines::toString);
    }

    @Test
    void aHighSideWithoutABusDeclaresOnlyTheTopology() {
        List<String> lines = prefilter(s -> { }, o -> {
            o.highSide = true;
            o.bus = null;
        }).describe();
        assertTrue(lines.contains("topology != low-side"), lines::toString);
        assertFalse(lines.stream().anyMatch(l -> l.contains("v_offset_max_v") || l.contains("v_iorm_v")), lines::toString);
    }

    @Test
    void anOffLevelPastVgsMinIsLeftToTheSwitchsOwnFailure() {
        // −25 V < V_GS,min −20 V: every driver fails on the switch's limit, so no rail condition is declared
        List<String> lines = prefilter(s -> { }, o -> o.vDriveNeg = -25.0).describe();
        assertFalse(lines.stream().anyMatch(l -> l.contains("v_neg_min_v")), lines::toString);
        // at V_GS,min exactly the rail still decides
        List<String> at = prefilter(s -> { }, o -> o.vDriveNeg = -20.0).describe();
        assertTrue(at.contains("skip v_neg_min_v > -20 (negative-bias fails)"), at::toString);
        List<String> unknown = prefilter(s -> s.vGsMin = Double.NaN, o -> o.vDriveNeg = -5.0).describe();
        assertFalse(unknown.stream().anyMatch(l -> l.contains("v_neg_min_v")), unknown::toString);
    }

    @Test
    void withoutAPlateauOrALimitNothingIsRequired() {
        List<String> lines = prefilter(s -> {
            s.qGd = Double.NaN;
            s.vGsMax = Double.NaN;
        }, o -> { }).describe();
        assertFalse(lines.stream().anyMatch(l -> l.startsWith("i_s") || l.startsWith("v_supply")), lines::toString);
    }

    @Test
    void aPChannelSwitchDeclaresNothing() {
        assertSame(Prefilter.NONE, prefilter(s -> s.nChannel = false, o -> { }));
    }

    @Test
    void thePolarityTestReadsTheColumnAsWritten() {
        Prefilter.TextTest high = prefilter(s -> { }, o -> { }).exclude().stream()
                .filter(e -> e.rule() == Rule.POLARITY).findFirst().orElseThrow().text();
        assertEquals("input_polarity", high.column());
        assertTrue(high.test().test("inverting"), "an inverting-only driver fails an active-high PWM");
        assertFalse(high.test().test("non-inverting"));
        Prefilter.TextTest low = prefilter(s -> { }, o -> o.activeHigh = false).exclude().stream()
                .filter(e -> e.rule() == Rule.POLARITY).findFirst().orElseThrow().text();
        assertTrue(low.test().test("non-inverting"));
        assertFalse(low.test().test("inverting"));
    }

    // ------------------------------------------------------------------ each limit against the rule it names

    @Test
    void aDriverRatedJustBelowThePlateauNeedFailsDriveCurrent() {
        assertEquals(Verdict.FAIL, verdict(Rule.DRIVE_CURRENT, s -> { }, d -> {
            d.iSource = 0.29;
        }, o -> o.rG = 0.0));
        // at 0.3 A exactly the plateau current is the need: a warning, not a failure
        assertEquals(Verdict.WARN, verdict(Rule.DRIVE_CURRENT, s -> { }, d -> d.iSource = 0.3, o -> o.rG = 0.0));
    }

    @Test
    void aUvloRisingJustAboveTheSwingFailsAndAtItDoesNot() {
        assertEquals(Verdict.FAIL, verdict(Rule.UVLO, s -> { }, d -> {
            d.uvloOn = 10.01;
            d.uvloOff = 9;
        }, o -> { }));
        assertEquals(Verdict.WARN, verdict(Rule.UVLO, s -> { }, d -> {
            d.uvloOn = 10;
            d.uvloOff = 9;
        }, o -> { }));
    }

    @Test
    void aRailJustShortOfTheOffLevelFailsAndAtItDoesNot() {
        assertEquals(Verdict.FAIL, verdict(Rule.NEGATIVE_BIAS, s -> { }, d -> d.vNegMin = -4.99, o -> o.vDriveNeg = -5.0));
        assertEquals(Verdict.PASS, verdict(Rule.NEGATIVE_BIAS, s -> { }, d -> d.vNegMin = -5, o -> o.vDriveNeg = -5.0));
    }

    @Test
    void anOffsetJustBelowTheBusFailsAndAtItDoesNot() {
        Consumer<OperatingPoint.Spec> high = o -> o.highSide = true;
        assertEquals(Verdict.FAIL, verdict(Rule.HIGH_SIDE, s -> { }, d -> d.vOffsetMax = 47.9, high));
        assertEquals(Verdict.WARN, verdict(Rule.HIGH_SIDE, s -> { }, d -> d.vOffsetMax = 48, high));
    }
}
