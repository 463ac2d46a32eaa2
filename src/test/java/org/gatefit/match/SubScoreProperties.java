package org.gatefit.match;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.function.BiConsumer;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import org.junit.jupiter.api.Test;

/**
 * The sub-scores follow the README's definition ("Score"): each rule's sub-score comes from its
 * margin — a pass 0.7 to 1.0 rising with the margin beyond the limit, a warning 0.35 to 0.65, an
 * unknown 0.4, a failure 0. So for every rule, more margin never lowers its verdict or its
 * sub-score, and every sub-score lies in its verdict's band. Parts are {@link Parts}' invented
 * baseline with one quantity moved (inputs only).
 */
class SubScoreProperties {

    /** The rule's check with one quantity set to {@code x}. */
    private static Check checkAt(Rule rule, double x, BiConsumer<Setup, Double> set) {
        Setup s = new Setup();
        set.accept(s, x);
        PairResult r = Parts.eval(s.sw, s.dr, s.op);
        for (Check c : r.checks()) {
            inBand(c);
        }
        return r.check(rule).orElseThrow();
    }

    /** A baseline pair and operating point to move one quantity of. */
    static final class Setup {
        final Parts.Sw sw = Parts.sw();
        final Parts.Dr dr = Parts.dr();
        final OperatingPoint.Spec op = Parts.op();
    }

    private static void inBand(Check c) {
        double s = c.score();
        switch (c.verdict()) {
            case PASS -> assertTrue(s >= 0.7 && s <= 1, c.rule() + " pass scored " + s);
            case WARN -> assertTrue(s >= 0.35 && s <= 0.65, c.rule() + " warning scored " + s);
            case UNKNOWN -> assertEquals(0.4, s, 0.0, c.rule() + " unknown");
            case FAIL -> assertEquals(0.0, s, 0.0, c.rule() + " failure");
        }
    }

    /** With {@code better} the quantity that gives more margin, the rule's verdict and sub-score do not drop. */
    private static void neverWorse(Rule rule, double worse, double better, BiConsumer<Setup, Double> set) {
        Check a = checkAt(rule, worse, set);
        Check b = checkAt(rule, better, set);
        String what = rule + " at " + worse + " (" + a.verdict() + " " + a.score() + ") and " + better + " ("
                + b.verdict() + " " + b.score() + ")";
        assertTrue(b.verdict().ordinal() <= a.verdict().ordinal(), what);
        if (a.verdict() == b.verdict()) {
            assertTrue(b.score() >= a.score(), what);
        }
    }

    @Property(tries = 200)
    void aSlowerEdgeNeverLowersDriveCurrent(@ForAll @DoubleRange(min = 2, max = 400) double ns,
                                           @ForAll @DoubleRange(min = 0, max = 200) double more) {
        neverWorse(Rule.DRIVE_CURRENT, ns * 1e-9, (ns + more) * 1e-9, (s, x) -> s.op.edge = x);
    }

    @Property(tries = 200)
    void aStrongerDriverNeverLowersDriveCurrent(@ForAll @DoubleRange(min = 0.1, max = 8) double amps,
                                               @ForAll @DoubleRange(min = 0, max = 8) double more) {
        neverWorse(Rule.DRIVE_CURRENT, amps, amps + more, (s, x) -> {
            s.dr.iSource = x;
            s.dr.iSink = x;
            s.dr.rSource = Double.NaN; // output resistance follows the rating (V / I_peak)
            s.dr.rSink = Double.NaN;
        });
    }

    @Property(tries = 200)
    void aHigherOffsetRatingNeverLowersHighSide(@ForAll @DoubleRange(min = 10, max = 200) double volts,
                                               @ForAll @DoubleRange(min = 0, max = 200) double more) {
        neverWorse(Rule.HIGH_SIDE, volts, volts + more, (s, x) -> {
            s.op.highSide = true;
            s.op.dutyMax = 0.5;
            s.dr.vOffsetMax = x;
        });
    }

    @Property(tries = 200)
    void aLargerPackageLimitNeverLowersDriverPower(@ForAll @DoubleRange(min = 0.01, max = 2) double watts,
                                                  @ForAll @DoubleRange(min = 0, max = 2) double more) {
        neverWorse(Rule.DRIVER_POWER, watts, watts + more, (s, x) -> {
            s.op.fSw = 1e6; // enough gate power that the limit matters
            s.dr.pMax = x;
        });
    }

    @Property(tries = 200)
    void aLowerInputThresholdNeverLowersLogicLevel(@ForAll @DoubleRange(min = 0.9, max = 3.4) double vih,
                                                  @ForAll @DoubleRange(min = 0, max = 2) double less) {
        neverWorse(Rule.LOGIC_LEVEL, vih, Math.max(0.85, vih - less), (s, x) -> s.dr.vIh = x);
    }

    @Property(tries = 200)
    void aHigherThresholdNeverLowersDvDt(@ForAll @DoubleRange(min = 0.3, max = 3.9) double vth,
                                        @ForAll @DoubleRange(min = 0, max = 3) double more) {
        neverWorse(Rule.DV_DT, vth, Math.min(3.95, vth + more), (s, x) -> {
            s.op.bus = 400.0;
            s.op.rGOff = 20.0;
            s.sw.vThMin = x;
        });
    }

    @Property(tries = 200)
    void aLowerDutyNeverLowersBootstrap(@ForAll @DoubleRange(min = 0, max = 0.99) double duty,
                                       @ForAll @DoubleRange(min = 0, max = 0.99) double less) {
        neverWorse(Rule.BOOTSTRAP, duty, Math.max(0, duty - less), (s, x) -> {
            s.op.highSide = true;
            s.op.fSw = 500e3;
            s.op.rBoot = 20.0;
            s.op.dutyMax = x;
        });
    }

    @Property(tries = 200)
    void moreSupplyAboveUvloNeverLowersUvlo(@ForAll @DoubleRange(min = 7, max = 8.5) double drive,
                                           @ForAll @DoubleRange(min = 0, max = 8) double more) {
        neverWorse(Rule.UVLO, drive, drive + more, (s, x) -> s.op.vDrive = x);
    }

    @Test
    void aWarningWithNoMarginToMeasureScoresTheMiddleOfTheWarningBand() {
        // The switch recommends a negative off level, the stage gives 0 V and the driver has no
        // Miller clamp: a warning whose distance to the limits is not a number, so the README's band
        // (0.35–0.65) gives its middle, 0.5. (The old engine's ranking copy of this score could
        // drift from the worded one unseen.)
        Setup s = new Setup();
        s.sw.vGateOff = -5;
        PairResult r = Parts.eval(s.sw, s.dr, s.op);
        Check c = r.check(Rule.NEGATIVE_BIAS).orElseThrow();
        assertEquals(Verdict.WARN, c.verdict(), c.message());
        assertEquals(0.5, c.score(), 1e-12);
        Rules.Ranking ranking = new Rules.Ranking(Question.of(s.sw.build(), s.op.resolve(s.sw.build()), Margins.DEFAULT));
        ranking.rank(s.dr.build());
        assertEquals(r.score(), ranking.score(), 0.0, "the ranking scores what the check says");
    }

    @Test
    void aPChannelSwitchIsUnknownOnEveryElectricalRuleAndJudgedOnLifecycle() {
        // The rules model n-channel gate drive only (DESIGN.md: unknown, never pass, when a rule
        // cannot judge); the lifecycle rule needs the parts alone.
        Setup s = new Setup();
        s.sw.nChannel = false;
        s.dr.lifecycle = "nrnd";
        PairResult r = Parts.eval(s.sw, s.dr, s.op);
        for (Check c : r.checks()) {
            if (c.rule() == Rule.LIFECYCLE) {
                assertEquals(Verdict.WARN, c.verdict(), c.message());
                assertTrue(c.message().contains("not recommended for new designs"), c.message());
            } else {
                assertEquals(Verdict.UNKNOWN, c.verdict(), c.rule() + ": " + c.message());
                assertTrue(c.message().contains("p-channel"), c.message());
            }
        }
        assertEquals(Verdict.WARN, r.verdict());
        assertTrue(r.figures().isEmpty());
        Rules.Ranking ranking = new Rules.Ranking(Question.of(s.sw.build(), s.op.resolve(s.sw.build()), Margins.DEFAULT));
        ranking.rank(s.dr.build());
        assertEquals(r.score(), ranking.score(), 0.0);
    }
}
