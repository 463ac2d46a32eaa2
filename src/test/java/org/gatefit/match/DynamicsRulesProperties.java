package org.gatefit.match;

import static org.junit.jupiter.api.Assertions.assertTrue;

import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;

/**
 * The directions the dynamics rules must move in, over the baseline pair of {@link Parts} put in a
 * bridge (plain circuit theory, REFERENCES.md §3, §7 and §8): a larger turn-on resistor slows the
 * twin's edge and so lowers the Miller-induced voltage and lengthens the plateau; a larger gate-loop
 * inductance rings higher and never judges {@code gate-ringing} better; a hotter junction raises the
 * driver's output resistance and never judges {@code drive-current} better.
 */
class DynamicsRulesProperties {

    private static PairResult eval(double rg, double rgOff, double loop, double tj, double cIss) {
        Parts.Sw s = Parts.sw();
        s.cIss = cIss;
        OperatingPoint.Spec o = Parts.op();
        o.bridge = true;
        o.rG = rg;
        o.rGOff = rgOff;
        o.loop = loop;
        o.tj = tj;
        return Parts.eval(s, Parts.dr(), o);
    }

    private static double figure(PairResult p, String name) {
        return p.figure(name).map(Figure::value).orElse(Double.NaN);
    }

    /** Worse verdicts rank higher: pass 0, warn 1, unknown 1, fail 2. */
    private static int badness(PairResult p, Rule r) {
        Verdict v = p.check(r).orElseThrow().verdict();
        return v == Verdict.FAIL ? 2 : v == Verdict.PASS ? 0 : 1;
    }

    @Property(tries = 200)
    void moreTurnOnResistanceSlowsTheEdgeAndInjectsLess(@ForAll @DoubleRange(min = 0, max = 40) double rg,
                                                        @ForAll @DoubleRange(min = 0.01, max = 20) double more,
                                                        @ForAll @DoubleRange(min = 0, max = 5) double rgOff) {
        PairResult a = eval(rg, rgOff, 10e-9, 125, 3e-9);
        PairResult b = eval(rg + more, rgOff, 10e-9, 125, 3e-9);
        assertTrue(figure(b, "plateau-time-on") > figure(a, "plateau-time-on"), rg + " → " + (rg + more));
        assertTrue(figure(b, "miller-induced-voltage") <= figure(a, "miller-induced-voltage") + 1e-12,
                figure(a, "miller-induced-voltage") + " → " + figure(b, "miller-induced-voltage"));
        assertTrue(badness(b, Rule.DV_DT) <= badness(a, Rule.DV_DT), "dv-dt never worse with a slower edge");
    }

    @Property(tries = 200)
    void moreLoopInductanceRingsHigherAndNeverJudgesRingingBetter(
            @ForAll @DoubleRange(min = 0.5, max = 50) double loopNh, @ForAll @DoubleRange(min = 0.01, max = 4) double factor,
            @ForAll @DoubleRange(min = 100, max = 3000) double cIssPf) {
        PairResult a = eval(2, 2, loopNh * 1e-9, 125, cIssPf * 1e-12);
        PairResult b = eval(2, 2, loopNh * 1e-9 * (1 + factor), 125, cIssPf * 1e-12);
        assertTrue(figure(b, "gate-peak-on") >= figure(a, "gate-peak-on") - 1e-12,
                figure(a, "gate-peak-on") + " → " + figure(b, "gate-peak-on"));
        assertTrue(figure(b, "gate-trough-off") <= figure(a, "gate-trough-off") + 1e-12);
        assertTrue(badness(b, Rule.GATE_RINGING) >= badness(a, Rule.GATE_RINGING), "more inductance, never better");
    }

    @Property(tries = 200)
    void aHotterJunctionNeverJudgesTheDriveCurrentBetter(@ForAll @DoubleRange(min = 25, max = 150) double tj,
                                                         @ForAll @DoubleRange(min = 0.1, max = 50) double hotter,
                                                         @ForAll @DoubleRange(min = 0, max = 20) double rg) {
        PairResult a = eval(rg, 2, 10e-9, tj, 3e-9);
        PairResult b = eval(rg, 2, 10e-9, tj + hotter, 3e-9);
        assertTrue(figure(b, "gate-current-plateau-on") < figure(a, "gate-current-plateau-on")
                || figure(a, "gate-current-plateau-on") == Parts.dr().iSource, "hotter, less current");
        assertTrue(badness(b, Rule.DRIVE_CURRENT) >= badness(a, Rule.DRIVE_CURRENT), "hotter, never better");
    }
}
