package org.gatefit.physics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.function.Consumer;

import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Assume;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.Scale;

/**
 * Invariants of the physics functions over generated inputs (jqwik). The physical claims are
 * plain circuit theory unless marked: more loop resistance means less current and slower
 * edges; more gate charge means more power; a larger gate resistor damps gate-loop ringing more
 * but slows the switching edge (common practice, no source; REFERENCES §3).
 */
class PhysicsProperties {

    private static final double NC = 1e-9;
    private static final double NF = 1e-9;
    private static final double NH = 1e-9;

    @Property
    void moreResistanceGivesLessPeakCurrent(@ForAll @DoubleRange(min = 1, max = 30) double swing,
            @ForAll @DoubleRange(min = 0.01, max = 50) double r,
            @ForAll @DoubleRange(min = 0.01, max = 50) double extra,
            @ForAll @DoubleRange(min = 0.1, max = 10) double rated) {
        double less = DriveCurrent.peak(swing, r, 0, 0, rated);
        double more = DriveCurrent.peak(swing, r + extra, 0, 0, rated);
        assertTrue(more <= less, more + " > " + less);
        assertTrue(more <= rated);
        if (swing / r <= rated) {
            assertTrue(more < less, "uncapped current must fall strictly");
        }
    }

    @Property
    void moreResistanceGivesSlowerEdges(@ForAll @DoubleRange(min = 0.1, max = 100) double qgdNc,
            @ForAll @DoubleRange(min = 0.1, max = 20) double cissNf,
            @ForAll @DoubleRange(min = 1, max = 8) double vpl,
            @ForAll @DoubleRange(min = 0.5, max = 15) double headroom,
            @ForAll @DoubleRange(min = -8, max = 0) double voff,
            @ForAll @DoubleRange(min = 0.1, max = 50) double r,
            @ForAll @DoubleRange(min = 0.01, max = 50) double extra) {
        double von = vpl + headroom;
        SwitchingTimes.Times a = SwitchingTimes.estimate(qgdNc * NC, cissNf * NF, vpl, von, voff,
                r, r);
        SwitchingTimes.Times b = SwitchingTimes.estimate(qgdNc * NC, cissNf * NF, vpl, von, voff,
                r + extra, r + extra);
        assertTrue(b.delayOn() > a.delayOn());
        assertTrue(b.plateauOn() > a.plateauOn());
        assertTrue(b.delayOff() > a.delayOff());
        assertTrue(b.plateauOff() > a.plateauOff());
    }

    /** Common practice, no source: a larger gate resistor damps ringing more but slows the edge. */
    @Property
    void largerGateResistorDampsMoreButSlowsTheEdge(
            @ForAll @DoubleRange(min = 1, max = 200) double lNh,
            @ForAll @DoubleRange(min = 0.1, max = 20) double cNf,
            @ForAll @DoubleRange(min = 0, max = 20) double r,
            @ForAll @DoubleRange(min = 0.01, max = 20) double extra) {
        double l = lNh * NH;
        double c = cNf * NF;
        double r2 = r + extra;
        assertTrue(GateLoop.dampingRatio(r2, l, c) > GateLoop.dampingRatio(r, l, c));
        assertTrue(GateLoop.overshoot(GateLoop.dampingRatio(r2, l, c))
                <= GateLoop.overshoot(GateLoop.dampingRatio(r, l, c)));
        assertTrue(GateLoop.ringFrequency(r2, l, c) <= GateLoop.ringFrequency(r, l, c));
        assertTrue(SwitchingTimes.plateauOn(10 * NC, r2 + 1, 12, 4)
                > SwitchingTimes.plateauOn(10 * NC, r + 1, 12, 4));
    }

    @Property
    void moreChargeGivesMorePower(@ForAll @DoubleRange(min = 0, max = 1000) double qgNc,
            @ForAll @DoubleRange(min = 0.01, max = 1000) double extraNc,
            @ForAll @DoubleRange(min = 1, max = 30) double swing,
            @ForAll @DoubleRange(min = 1e3, max = 2e6) double f,
            @ForAll @DoubleRange(min = 0.1, max = 20) double rSrc,
            @ForAll @DoubleRange(min = 0.1, max = 20) double rSink,
            @ForAll @DoubleRange(min = 0, max = 20) double rg,
            @ForAll @DoubleRange(min = 0, max = 5) double rgInt) {
        double q1 = qgNc * NC;
        double q2 = (qgNc + extraNc) * NC;
        assertTrue(GatePower.total(q2, swing, f) > GatePower.total(q1, swing, f));
        GatePower.Split s1 = GatePower.split(q1, swing, f, rSrc, rSink, rg, rg, rgInt);
        GatePower.Split s2 = GatePower.split(q2, swing, f, rSrc, rSink, rg, rg, rgInt);
        assertTrue(s2.driver() > s1.driver());
        assertEquals(GatePower.total(q2, swing, f), s2.total(), 1e-12 * s2.total());
        assertTrue(Bootstrap.chargePerCycle(q2, 1e-4, 1e-5, 0, 0)
                > Bootstrap.chargePerCycle(q1, 1e-4, 1e-5, 0, 0));
    }

    @Property
    void noNaNForValidInputs(@ForAll @DoubleRange(min = 0.1, max = 500) double qgNc,
            @ForAll @DoubleRange(min = 0.01, max = 100) double cissNf,
            @ForAll @DoubleRange(min = 0.5, max = 8) double vpl,
            @ForAll @DoubleRange(min = 0.1, max = 20) double headroom,
            @ForAll @DoubleRange(min = -15, max = 0) double voff,
            @ForAll @DoubleRange(min = 0.01, max = 100) double r,
            @ForAll @DoubleRange(min = 0.1, max = 500) double lNh,
            @ForAll @DoubleRange(min = 0, max = 1e-6) @Scale(15) double t) {
        double von = vpl + headroom;
        double qg = qgNc * NC;
        double qgs = qg * 0.3;
        double qgd = qg * 0.4;
        double ciss = cissNf * NF;
        double vspec = von + 1;
        List<Double> values = List.of(
                DriveCurrent.required(qg, 1e-9 + t),
                DriveCurrent.peak(von - voff, r, 0, 0, 4),
                GateCharge.atSwing(qg, qgs, qgd, vspec, vpl, ciss, von, voff).orElseThrow()
                        .coulombs(),
                SwitchingTimes.estimate(qgd, ciss, vpl, von, voff, r, r).turnOn(),
                SwitchingTimes.estimate(qgd, ciss, vpl, von, voff, r, r).turnOff(),
                GateWaveform.turnOn(GateWaveform.GateCurve.fromGateCharge(qg, qgs, qgd, vspec,
                        vpl), von, voff, r).voltage(t),
                GateWaveform.turnOff(GateWaveform.GateCurve.ofInputCapacitance(ciss, vpl, qgd),
                        von, voff, r).current(t),
                GateLoop.stepResponse(r, lNh * NH, ciss, von - voff, t),
                GateLoop.ringing(r, lNh * NH, ciss, von).peak(),
                GatePower.total(qg, von - voff, 1e5),
                DvDt.induced(ciss / 100, 1e10, r, ciss, 400),
                DvDt.allowedRcLimited(ciss / 100, r, ciss, 400, 1.5, voff),
                ESeries.E24.roundNearest(r));
        for (double v : values) {
            assertTrue(!Double.isNaN(v), "NaN in " + values);
        }
    }

    @Property
    void turnOnGateVoltageRisesMonotonically(
            @ForAll @DoubleRange(min = 0.1, max = 20) double cBelowNf,
            @ForAll @DoubleRange(min = 0.1, max = 20) double cAboveNf,
            @ForAll @DoubleRange(min = 1, max = 8) double vpl,
            @ForAll @DoubleRange(min = 0, max = 100) double qgdNc,
            @ForAll @DoubleRange(min = 0.5, max = 50) double r) {
        GateWaveform.Edge on = GateWaveform.turnOn(
                new GateWaveform.GateCurve(cBelowNf * NF, vpl, qgdNc * NC, cAboveNf * NF),
                vpl + 5, -3, r);
        double[] v = on.sample(200).gateVoltage();
        double[] i = on.sample(200).gateCurrent();
        for (int k = 1; k < v.length; k++) {
            assertTrue(v[k] >= v[k - 1], "V_GS fell at sample " + k);
            assertTrue(i[k] <= i[k - 1] + 1e-12, "I_G rose at sample " + k);
        }
    }

    @Property
    void eSeriesRoundingBracketsTheValue(@ForAll @DoubleRange(min = -12, max = 9) double exp,
            @ForAll("series") ESeries series) {
        double x = Math.pow(10, exp);
        double up = series.roundUp(x);
        double down = series.roundDown(x);
        double near = series.roundNearest(x);
        assertTrue(up >= x * (1 - 1e-9) && down <= x * (1 + 1e-9));
        assertTrue(near == up || near == down);
        assertTrue(series.contains(up) && series.contains(down));
        // IEC 60063: adjacent E6/E12/E24 values differ by at most 50 % (10→15), 25 % (12→15),
        // 16 % (13→15)
        double step = switch (series) {
            case E6 -> 1.5 + 1e-9;
            case E12 -> 1.25 + 1e-9;
            case E24 -> 1.16;
        };
        assertTrue(up / down <= step, up + " / " + down);
    }

    @Provide
    Arbitrary<ESeries> series() {
        return Arbitraries.of(ESeries.class);
    }

    @Provide
    Arbitrary<Double> invalidNonNegative() {
        return Arbitraries.oneOf(Arbitraries.doubles().ofScale(15).between(-1e6, -1e-12),
                Arbitraries.of(Double.NaN, Double.NEGATIVE_INFINITY, Double.POSITIVE_INFINITY));
    }

    @Provide
    Arbitrary<Double> invalidPositive() {
        return Arbitraries.oneOf(Arbitraries.doubles().ofScale(15).between(-1e6, 0),
                Arbitraries.of(0.0, -0.0, Double.NaN, Double.POSITIVE_INFINITY));
    }

    @Property
    void invalidResistanceIsRejectedClearly(@ForAll("invalidNonNegative") double r) {
        List<Consumer<Double>> calls = List.of(
                x -> DriveCurrent.peak(12, x, 0, 0, 2),
                x -> DriveCurrent.peak(12, 1, x, 0, 2),
                x -> DriveCurrent.totalResistance(1, 1, x),
                x -> SwitchingTimes.plateauOn(1e-9, x, 12, 3),
                x -> SwitchingTimes.delayOff(x, 1e-9, 12, 3, 0),
                x -> GateLoop.dampingRatio(x, 1e-8, 1e-9),
                x -> GatePower.split(1e-8, 10, 1e5, x, 1, 1, 1, 1),
                x -> DvDt.inducedBound(1e-11, 1e10, x));
        for (Consumer<Double> call : calls) {
            assertExpectedGot(() -> call.accept(r));
        }
    }

    @Property
    void invalidTimesCapacitancesAndFrequenciesAreRejectedClearly(
            @ForAll("invalidPositive") double x) {
        assertExpectedGot(() -> DriveCurrent.required(1e-9, x));
        assertExpectedGot(() -> GateLoop.resonance(x, 1e-9));
        assertExpectedGot(() -> GateLoop.criticalResistance(1e-8, x));
        assertExpectedGot(() -> Bootstrap.maxDuty(1e-7, x));
        assertExpectedGot(() -> Bootstrap.minCapacitance(1e-8, x));
        assertExpectedGot(() -> ESeries.E12.roundUp(x));
        assertExpectedGot(() -> GateWaveform.GateCurve.ofInputCapacitance(x, 3, 1e-9));
    }

    @Property
    void positiveOffLevelsAreRejected(@ForAll @DoubleRange(min = 1e-6, max = 50) @Scale(8) double voff) {
        Assume.that(voff > 0);
        assertExpectedGot(() -> SwitchingTimes.delayOn(1, 1e-9, 12, 3, voff));
        assertExpectedGot(() -> DvDt.allowedBound(1e-11, 6, 1.8, voff));
        assertExpectedGot(() -> GateCharge.atSwing(1e-8, 1e-9, 1e-9, 10, 3, 1e-9, 12, voff));
    }

    private static void assertExpectedGot(org.junit.jupiter.api.function.Executable call) {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, call);
        assertTrue(e.getMessage().startsWith("expected ") && e.getMessage().contains(", got "),
                e.getMessage());
    }
}
