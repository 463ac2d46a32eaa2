package org.gatefit.match;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * What a choice costs the design and the asker's open questions (issue 19), on the test parts of
 * {@link Parts}: the README's "Score" paragraph states the factor (×0.9 for a high side whose driver
 * needs its own isolated supply; a judgement, common practice, no source) and that an unknown waiting
 * only for an operating-point value scores a bare pass (0.7) and does not lower the rank. The
 * expected scores are recomputed here from the checks' sub-scores with the README's weights.
 */
class OpenQuestionTest {

    /** README "Score": drive-current and gate-voltage 3, uvlo and high-side 2, dead-time, design, lifecycle 0, others 1. */
    private static int weight(Rule r) {
        return switch (r.id()) {
            case "drive-current", "gate-voltage" -> 3;
            case "uvlo", "high-side" -> 2;
            case "dead-time", "design", "lifecycle" -> 0;
            default -> 1;
        };
    }

    private static double weightedMean(PairResult p) {
        double sum = 0;
        double w = 0;
        for (Check c : p.checks()) {
            sum += weight(c.rule()) * c.score();
            w += weight(c.rule());
        }
        return sum / w;
    }

    private static OperatingPoint.Spec highSide() {
        OperatingPoint.Spec o = Parts.op();
        o.highSide = true;
        o.dutyMax = 0.5;
        o.vDrive = 12.0; // the bootstrap then reaches full enhancement (12 V − V_F ≥ 10 V)
        return o;
    }

    private static Parts.Dr isolated() {
        Parts.Dr d = Parts.dr();
        d.topology = Topology.ISOLATED;
        d.isolationVrms = 5000;
        d.vIorm = 1000;
        d.cmti = 200e9;
        d.bootstrapDiode = null;
        return d;
    }

    @Test
    void anIsolatedDriverOnTheHighSideCostsItsSupplyAndNowhereElse() {
        PairResult iso = Parts.eval(Parts.sw(), isolated(), highSide());
        assertTrue(iso.verdict() != Verdict.FAIL, iso.checks().toString());
        assertEquals(weightedMean(iso) * 0.9, iso.score(), 1e-12, "×0.9 on the high side");
        OperatingPoint.Spec low = Parts.op();
        PairResult isoLow = Parts.eval(Parts.sw(), isolated(), low);
        assertEquals(weightedMean(isoLow), isoLow.score(), 1e-12, "the low side's isolated output can share the ground supply");
        PairResult boot = Parts.eval(Parts.sw(), Parts.dr(), highSide());
        assertEquals(Verdict.PASS, boot.verdict(), boot.checks().toString());
        assertEquals(weightedMean(boot), boot.score(), 1e-12, "a bootstrapped high side needs a capacitor and a diode");
        for (Topology t : Topology.values()) {
            Parts.Dr d = Parts.dr();
            d.topology = t;
            OperatingPoint op = highSide().resolve(Parts.sw().build());
            assertEquals(t == Topology.ISOLATED ? Score.ISOLATED_SUPPLY : 1.0, Score.supplyCost(op, d.build()), t.id());
            assertEquals(1.0, Score.supplyCost(Parts.op().resolve(Parts.sw().build()), d.build()), "low side, " + t.id());
        }
    }

    @Test
    void withoutTheDutyTheBootstrapIsAnOpenQuestionThatDoesNotLowerTheRank() {
        OperatingPoint.Spec o = highSide();
        o.dutyMax = null;
        PairResult p = Parts.eval(Parts.sw(), Parts.dr(), o);
        Check boot = p.check(Rule.BOOTSTRAP).orElseThrow();
        assertEquals(Verdict.UNKNOWN, boot.verdict(), "never pass without the duty");
        assertEquals("duty-max", boot.notGiven());
        assertEquals(Score.OPEN, boot.score(), 1e-12, "a bare pass");
        assertEquals(Verdict.WARN, p.verdict(), "the pair shows its unknown");
        assertEquals(Verdict.PASS, p.rankVerdict(), "and ranks on its other checks");
        // The ranking loop agrees with the full evaluation.
        Rules.Ranking r = new Rules.Ranking(Question.of(Parts.sw().build(), o.resolve(Parts.sw().build()), Margins.DEFAULT));
        r.rank(Parts.dr().build());
        assertEquals(p.verdict(), r.verdict());
        assertEquals(Verdict.PASS, r.rankVerdict());
        assertEquals(p.score(), r.score(), 1e-12);

        // A part's own unknown still lowers the rank: the same driver without its input thresholds.
        Parts.Dr noThresholds = Parts.dr();
        noThresholds.vIh = Double.NaN;
        noThresholds.vIl = Double.NaN;
        PairResult own = Parts.eval(Parts.sw(), noThresholds, o);
        assertTrue(own.checks().stream().anyMatch(c -> c.verdict() == Verdict.UNKNOWN && c.notGiven() == null),
                own.checks().toString());
        assertEquals(Verdict.WARN, own.rankVerdict());
        Rules.Ranking ownRanked = new Rules.Ranking(Question.of(Parts.sw().build(), o.resolve(Parts.sw().build()),
                Margins.DEFAULT));
        ownRanked.rank(noThresholds.build());
        assertEquals(Verdict.WARN, ownRanked.rankVerdict(), "the ranking loop lowers it too");
    }

    @Test
    void availabilityAndSupplyCostMultiply() {
        // README "Score": nrnd 0.8 for the driver, ltb 0.7 and out of stock ×0.8 for the switch, ×0.9 supply.
        Parts.Dr d = isolated();
        d.lifecycle = "nrnd";
        Parts.Sw sw = Parts.sw();
        sw.lifecycle = "ltb";
        sw.stock = 0;
        PairResult p = Parts.eval(sw, d, highSide());
        assertTrue(p.verdict() != Verdict.FAIL, p.checks().toString());
        assertEquals(weightedMean(p) * 0.8 * 0.7 * 0.8 * 0.9, p.score(), 1e-12);
    }

    @Test
    void withTheDutyGivenNothingIsOpenAndTheRankIsTheVerdict() {
        PairResult p = Parts.eval(Parts.sw(), Parts.dr(), highSide());
        assertTrue(p.checks().stream().allMatch(c -> c.notGiven() == null), p.checks().toString());
        assertEquals(p.verdict(), p.rankVerdict());
    }

    @Test
    void withoutTheBusTheBusChecksAreOpen() {
        OperatingPoint.Spec o = highSide();
        o.bus = null;
        o.bridge = true;
        PairResult p = Parts.eval(Parts.sw(), Parts.dr(), o);
        assertEquals("bus", p.check(Rule.HIGH_SIDE).orElseThrow().notGiven(), p.checks().toString());
        assertEquals("bus", p.check(Rule.DV_DT).orElseThrow().notGiven(), p.checks().toString());
        assertNull(p.check(Rule.BOOTSTRAP).orElseThrow().notGiven(), "the duty was given");
    }

    @Test
    void onlyAnUnknownCanWaitForAValue() {
        assertThrows(IllegalArgumentException.class, () -> new Check(Rule.BOOTSTRAP, Verdict.PASS, "x", List.of(), 1,
                "duty-max"));
        assertNull(new Check(Rule.BOOTSTRAP, Verdict.PASS, "x", List.of(), 1).notGiven());
    }
}
