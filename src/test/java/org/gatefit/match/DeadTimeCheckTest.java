package org.gatefit.match;

import static org.gatefit.match.StageSheets.check;
import static org.gatefit.match.StageSheets.stage;
import static org.gatefit.match.StageSheets.stageOf;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import java.util.function.Consumer;
import java.util.stream.Stream;
import org.gatefit.catalog.Row;
import org.gatefit.match.StageCheck.Report;
import org.gatefit.match.StageCheck.StageResult;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * The {@code dead-time} rule of {@code check} ({@link DeadTimeCheck}), called through the check engine
 * with a stage sheet of two stages (one high, one low) of one half-bridge, built from the {@link Parts}
 * test parts.
 *
 * <p>Method (REFERENCES.md §9 and §8 "Dead time (plain timing)"): t_dead,min = t_d(off),out +
 * t_plateau,off,out + t_fall,out − t_on→V_th,in + skew. Each segment is a first-order RC charge
 * (plain circuit theory, REFERENCES.md §1: t = R·C·ln((V_target − V_from)/(V_target − V_to))); the
 * plateau lasts n·Q_gd / I with I = (V_pl − V_off)/R_off (REFERENCES.md §1 and §8). Loop resistance
 * R = k·R_drv + (R_g + R_g,int)/n, with the driver's output resistance 1.4× at the 125 °C hot corner and
 * V_th,min falling 6 mV/K for a Si MOSFET, 11 mV/K for an IGBT (REFERENCES.md §8, from memory).
 *
 * <p>Baseline hand calculation (TST-S1 / TST-D1 at 48 V, 100 kHz, +10 / 0 V, R_g 2 Ω, 125 °C):
 * <ul>
 *   <li>outgoing, at 125 °C: R_off = 1.4·1 + (2 + 1) = 4.4 Ω; C above the plateau (50 − 15 − 15) nC /
 *       (10 − 5) V = 4 nF; delay 4.4·4 nF·ln(10/5) = 12.199 ns; plateau current 5 V / 4.4 Ω = 1.136 A,
 *       15 nC / 1.136 A = 13.200 ns; V_th,min 2 − 0.006·100 = 1.4 V, fall 4.4·3 nF·ln(5/1.4) = 16.803 ns;
 *       turn-off 42.203 ns;</li>
 *   <li>incoming: 25 °C R = 2 + 3 = 5 Ω, 5·3 nF·ln(10/8) = 3.347 ns; 125 °C R = 2.8 + 3 = 5.8 Ω,
 *       5.8·3 nF·ln(10/8.6) = 2.624 ns; the shorter, 2.624 ns;</li>
 *   <li>without the drivers' skew: 42.203 − 2.624 = 39.578 ns, a lower bound.</li>
 * </ul>
 * The four RC segments confirmed a second way with ngspice (a transient of each R–C with its initial
 * voltage, {@code .tran 1p 100n UIC} and {@code .meas tran ... WHEN v(x)=level}; run by hand for this
 * test): 4.4 Ω / 4 nF from 10 V to 5 V 12.1994 ns, 4.4 Ω / 3 nF from 5 V to 1.4 V 16.8031 ns, from 0 V
 * toward 10 V through 5.8 Ω / 3 nF to 1.4 V 2.62432 ns and through 5 Ω / 3 nF to 2 V 3.34715 ns.
 * The margin is {@link Margins#DEFAULT}'s 25 % (common practice, no source).
 */
class DeadTimeCheckTest {
    private static final double NS = 1e-9;
    /** Relative tolerance of a hand-calculated value (rounded to 5 digits in the comments). */
    private static final double REL = 1e-4;

    /** A half-bridge HS (high) / LS (low) on leg A, both on TST-D1 and TST-S1 named by part number. */
    private static Report bridge(Consumer<Parts.Sw> s, Consumer<Parts.Dr> d, Object[] hs, Object[] ls) {
        Parts.Sw sw = Parts.sw();
        Parts.Dr dr = Parts.dr();
        s.accept(sw);
        d.accept(dr);
        Row a = stage("HS", 2, "TST-D1", "TST-S1", concat(new Object[] {"side", "high", "leg", "A"}, hs));
        Row b = stage("LS", 3, "TST-D1", "TST-S1", concat(new Object[] {"leg", "A"}, ls));
        return StageSheets.run(List.of(a, b), null, List.of(StageSheets.driverRow(dr)), List.of(StageSheets.switchRow(sw)));
    }

    private static Object[] concat(Object[] a, Object[] b) {
        Object[] out = java.util.Arrays.copyOf(a, a.length + b.length);
        System.arraycopy(b, 0, out, a.length, b.length);
        return out;
    }

    private static Object[] dead(double ns) {
        return new Object[] {"dead_time_ns", ns};
    }

    private static double minimum(StageResult r) {
        return r.figure("dead-time-min").orElseThrow(() -> new AssertionError("no dead-time-min for " + r.stage()))
                .value();
    }

    private static void contains(Check c, String... parts) {
        for (String p : parts) {
            assertTrue(c.message().contains(p), () -> "expected '" + p + "' in: " + c.message());
        }
    }

    // ------------------------------------------------------------------ the skew unknown: a lower bound

    @Test
    void withoutTheDriversSkewTheMinimumIsALowerBoundThatNeverPasses() {
        // Baseline (class comment): 39.578 ns lower bound; LS at 39 ns is below it, HS at 45 ns above.
        Report rep = bridge(s -> { }, d -> { }, dead(45), dead(39));
        StageResult ls = stageOf(rep, "LS");
        StageResult hs = stageOf(rep, "HS");
        assertEquals(39.578 * NS, minimum(ls), 39.578 * NS * REL);
        assertEquals(39.578 * NS, minimum(hs), 39.578 * NS * REL);

        Check fail = check(ls, Rule.DEAD_TIME);
        assertEquals(Verdict.FAIL, fail.verdict(), fail.message());
        assertEquals(0.0, fail.score());
        assertEquals(Verdict.FAIL, ls.verdict(), "a failing dead time fails the stage");
        contains(fail, "half-bridge with HS: dead time 39 ns before LS turns on against ≥ 39.6 ns",
                "turn-off of HS 42.2 ns (delay 12.2 ns, plateau 13.2 ns, fall to V_th,min 16.8 ns)",
                "less the delay of LS to V_th,min 2.62 ns", "so 39.6 ns is a lower bound", "shoot-through",
                // 39.578 ns × 1.25 = 49.47 ns, rounded up to the next whole ns
                "raise the dead time to ≥ 50 ns");
        Check.Comparison cmp = fail.compared().get(0);
        assertEquals(39 * NS, cmp.value(), 1e-15);
        assertEquals("≥", cmp.relation());
        assertEquals(49.473 * NS, cmp.limit(), 49.473 * NS * REL);

        Check warn = check(hs, Rule.DEAD_TIME);
        assertEquals(Verdict.WARN, warn.verdict(), warn.message());
        contains(warn, "dead time 45 ns before HS turns on against ≥ 39.6 ns", "turn-off of LS 42.2 ns",
                "but that is a lower bound", "maximum propagation delay");
        assertEquals(Score.warn(0.5), warn.score(), 1e-12);
    }

    @Test
    void aDeadTimeWellAboveTheLowerBoundStillOnlyWarns() {
        // 500 ns against 39.6 ns: with the skew unknown the check never passes.
        Report rep = bridge(s -> { }, d -> { }, dead(500), dead(500));
        Check c = check(stageOf(rep, "LS"), Rule.DEAD_TIME);
        assertEquals(Verdict.WARN, c.verdict(), c.message());
        contains(c, "lower bound");
    }

    // ------------------------------------------------------------------ the skew from the propagation delays

    /*
     * t_prop 20 ns, t_prop,max 30 ns: t_prop,min = 2·20 − 30 = 10 ns (a spread symmetric about the typical,
     * common practice, no source), skew 30 − 10 = 20 ns; minimum 39.578 + 20 = 59.578 ns; with the 25 %
     * margin 74.473 ns.
     */

    @Test
    void belowTheMinimumWithTheSkewKnownFails() {
        Report rep = bridge(s -> { }, d -> d.tPropMax = 30 * NS, dead(60), dead(59));
        StageResult ls = stageOf(rep, "LS");
        assertEquals(59.578 * NS, minimum(ls), 59.578 * NS * REL);
        Check c = check(ls, Rule.DEAD_TIME);
        assertEquals(Verdict.FAIL, c.verdict(), c.message());
        contains(c, "dead time 59 ns before LS turns on against ≥ 59.6 ns",
                "driver skew 20 ns (t_prop,max 30 ns less t_prop,min 10 ns)", "− delay of LS to V_th,min 2.62 ns = 59.6 ns",
                "raise the dead time to ≥ 75 ns");
        assertEquals(74.473 * NS, c.compared().get(0).limit(), 74.473 * NS * REL);
    }

    @Test
    void aboveTheMinimumWithinTheMarginWarnsWithItsShareOfTheMargin() {
        Report rep = bridge(s -> { }, d -> d.tPropMax = 30 * NS, dead(60), dead(60));
        Check c = check(stageOf(rep, "HS"), Rule.DEAD_TIME);
        assertEquals(Verdict.WARN, c.verdict(), c.message());
        contains(c, "dead time 60 ns before HS turns on against ≥ 59.6 ns", "with less than the 25 % margin",
                "raise it to ≥ 75 ns");
        // (60 − 59.578) / (74.473 − 59.578) = 0.02834 of the way from the minimum to the margin
        assertEquals(Score.warn(0.02834), c.score(), 1e-4);
    }

    @Test
    void aboveTheMarginPassesWithItsExcess() {
        Report rep = bridge(s -> { }, d -> d.tPropMax = 30 * NS, dead(75), dead(100));
        Check hs = check(stageOf(rep, "HS"), Rule.DEAD_TIME);
        assertEquals(Verdict.PASS, hs.verdict(), hs.message());
        contains(hs, "dead time 75 ns before HS turns on against ≥ 59.6 ns");
        assertFalse(hs.message().contains(" — "), "a pass says nothing to do: " + hs.message());
        // 75 / 74.473 − 1 = 0.00708 excess
        assertEquals(Score.pass(0.00708), hs.score(), 1e-4);
        Check ls = check(stageOf(rep, "LS"), Rule.DEAD_TIME);
        // 100 / 74.473 − 1 = 0.3428
        assertEquals(Score.pass(0.3428), ls.score(), 1e-4);
    }

    @Test
    void exactlyAtTheMinimumIsNotAShootThroughAndExactlyAtTheMarginPasses() {
        // The rule's relation is "≥" (its comparison says so): the edges may just meet. The dead time is
        // set to the computed minimum (and to the minimum with margin) to the last bit.
        Report probe = bridge(s -> { }, d -> d.tPropMax = 30 * NS, dead(100), dead(100));
        double min = minimum(stageOf(probe, "LS"));
        double want = check(stageOf(probe, "LS"), Rule.DEAD_TIME).compared().get(0).limit();
        Report rep = bridge(s -> { }, d -> d.tPropMax = 30 * NS, dead(nsReadingAs(want)), dead(nsReadingAs(min)));
        Check atMin = check(stageOf(rep, "LS"), Rule.DEAD_TIME);
        assertEquals(min, atMin.compared().get(0).value(), 0.0);
        assertEquals(Verdict.WARN, atMin.verdict(), atMin.message());
        assertEquals(Score.warn(0), atMin.score(), 1e-12);
        Check atWant = check(stageOf(rep, "HS"), Rule.DEAD_TIME);
        assertEquals(want, atWant.compared().get(0).value(), 0.0);
        assertEquals(Verdict.PASS, atWant.verdict(), atWant.message());
        assertEquals(Score.pass(0), atWant.score(), 1e-12);
    }

    /** A dead_time_ns cell that the sheet reads as exactly {@code seconds}. */
    private static double nsReadingAs(double seconds) {
        double ns = seconds / NS;
        for (double x : new double[] {ns, Math.nextUp(ns), Math.nextDown(ns), Math.nextUp(Math.nextUp(ns)),
            Math.nextDown(Math.nextDown(ns))}) {
            if (stage("X", 2, "d", "s", "dead_time_ns", x).si("dead_time_ns") == seconds) {
                return x;
            }
        }
        throw new AssertionError("no ns value reads as " + seconds + " s");
    }

    // ------------------------------------------------------------------ delay matching of one package

    @Test
    void twoStagesOnOneDesignatorTakeThePackagesDelayMatching(@TempDir Path dir) throws Exception {
        // One package U1 (a designator, not a part number): the skew is t_match = 5 ns, not the 20 ns
        // part-to-part spread; 39.578 + 5 = 44.578 ns.
        Parts.Dr d = Parts.dr();
        d.tMatch = 5 * NS;
        d.tPropMax = 30 * NS;
        Report rep = onDesignators(dir, d, "U1", "u1");
        StageResult ls = stageOf(rep, "LS");
        assertEquals(44.578 * NS, minimum(ls), 44.578 * NS * REL);
        contains(check(ls, Rule.DEAD_TIME), "delay matching 5 ns", "= 44.6 ns");
    }

    @Test
    void twoPackagesOfOnePartTakeThePartToPartSpreadNotTheMatching(@TempDir Path dir) throws Exception {
        // U1 and U2 are two packages of TST-D1: their channels are not matched to each other, so the
        // skew is the spread, 20 ns; 59.578 ns.
        Parts.Dr d = Parts.dr();
        d.tMatch = 5 * NS;
        d.tPropMax = 30 * NS;
        Report rep = onDesignators(dir, d, "U1", "U2");
        assertEquals(59.578 * NS, minimum(stageOf(rep, "LS")), 59.578 * NS * REL);
        contains(check(stageOf(rep, "LS"), Rule.DEAD_TIME), "driver skew 20 ns");
    }

    @Test
    void aPartNumberIsNotAPackageSoItsMatchingIsNotUsed() {
        // Both stages name TST-D1 without a BOM: nothing says they share a package; 59.578 ns.
        Report rep = bridge(s -> { }, d -> {
            d.tMatch = 5 * NS;
            d.tPropMax = 30 * NS;
        }, dead(100), dead(100));
        assertEquals(59.578 * NS, minimum(stageOf(rep, "LS")), 59.578 * NS * REL);
    }

    @Test
    void onePackageWithoutItsMatchingTakesTheSpread(@TempDir Path dir) throws Exception {
        Parts.Dr d = Parts.dr();
        d.tPropMax = 30 * NS;
        Report rep = onDesignators(dir, d, "U1", "U1");
        assertEquals(59.578 * NS, minimum(stageOf(rep, "HS")), 59.578 * NS * REL);
    }

    @Test
    void theSpreadNeedsBothDriversFigures() {
        // HS on TST-D1 (t_prop,max 30 ns), LS on TST-D2 (none), one leg: judging LS after HS the
        // incoming t_prop,min is unknown, judging HS after LS the outgoing t_prop,max: both lower bounds.
        Parts.Dr d1 = Parts.dr();
        d1.tPropMax = 30 * NS;
        Parts.Dr d2 = Parts.dr();
        d2.pn = "TST-D2";
        Row a = stage("HS", 2, "TST-D1", "TST-S1", "side", "high", "leg", "A", "dead_time_ns", 100.0);
        Row b = stage("LS", 3, "TST-D2", "TST-S1", "leg", "A", "dead_time_ns", 100.0);
        Report rep = StageSheets.run(List.of(a, b), null, List.of(StageSheets.driverRow(d1), StageSheets.driverRow(d2)),
                List.of(StageSheets.switchRow(Parts.sw())));
        for (String id : List.of("HS", "LS")) {
            Check c = check(stageOf(rep, id), Rule.DEAD_TIME);
            assertEquals(Verdict.WARN, c.verdict(), c.message());
            contains(c, "39.6 ns is a lower bound");
        }
    }

    @Test
    void theIncomingDriversOwnTypicalDelayIsNeeded() {
        // t_prop unknown on the incoming side (t_prop,max given on both): no t_prop,min, a lower bound.
        Report rep = bridge(s -> { }, d -> {
            d.tPropMax = 30 * NS;
            d.tProp = Double.NaN;
        }, dead(100), dead(100));
        contains(check(stageOf(rep, "LS"), Rule.DEAD_TIME), "39.6 ns is a lower bound");
    }

    private static Report onDesignators(Path dir, Parts.Dr d, String hsRef, String lsRef) throws Exception {
        var bom = StageSheets.bom(dir, "Designator,MPN,Qty\nU1,TST-D1,1\nU2,TST-D1,1\nQ1,TST-S1,1\nQ2,TST-S1,1\n");
        Row a = stage("HS", 2, hsRef, "Q1", "side", "high", "leg", "A", "dead_time_ns", 100.0);
        Row b = stage("LS", 3, lsRef, "Q2", "leg", "A", "dead_time_ns", 100.0);
        return StageSheets.run(List.of(a, b), bom, List.of(StageSheets.driverRow(d)), List.of(StageSheets.switchRow(Parts.sw())));
    }

    // ------------------------------------------------------------------ the minimum's terms

    /** One row: a change from the baseline bridge, the expected terms (ns) and the lower bound (ns). */
    record Terms(String why, Consumer<Parts.Sw> s, Consumer<Parts.Dr> d, Object[] stage, double delay, double plateau,
                 double fall, double on, double min) {
        @Override
        public String toString() {
            return why;
        }
    }

    static Stream<Terms> terms() {
        return Stream.of(
                new Terms("baseline (class comment)", s -> { }, d -> { }, new Object[0], 12.199, 13.200, 16.803, 2.6243,
                        39.578),
                // datasheet t_d(off) 30 ns is longer than the 12.199 ns RC delay and replaces it: 30 + 13.2 +
                // 16.803 − 2.624 = 57.379 ns
                new Terms("datasheet turn-off delay when longer", s -> s.tDOff = 30 * NS, d -> { }, new Object[0], 30,
                        13.200, 16.803, 2.6243, 57.379),
                // datasheet t_d(off) 5 ns is shorter: the RC delay stays
                new Terms("datasheet turn-off delay when shorter", s -> s.tDOff = 5 * NS, d -> { }, new Object[0],
                        12.199, 13.200, 16.803, 2.6243, 39.578),
                // datasheet t_f 40 ns is longer than the 16.803 ns RC fall: 12.199 + 13.2 + 40 − 2.624 = 62.775 ns
                new Terms("datasheet fall time when longer", s -> s.tF = 40 * NS, d -> { }, new Object[0], 12.199, 13.200,
                        40, 2.6243, 62.775),
                // IGBT with t_f 200 ns (its tail): V_th,min at 125 °C 2 − 0.011·100 = 0.9 V; incoming
                // 5.8·3 nF·ln(10/9.1) = 1.641 ns; 12.199 + 13.2 + 200 − 1.641 = 223.758 ns
                new Terms("IGBT with its datasheet fall time", s -> {
                    s.tech = Technology.IGBT;
                    s.tF = 200 * NS;
                }, d -> { }, new Object[0], 12.199, 13.200, 200, 1.6410, 223.758),
                // two switches in parallel: R_off = 1.4 + 3/2 = 2.9 Ω, C above 2·4 nF: 2.9·8 nF·ln 2 = 16.081 ns;
                // plateau 30 nC / (5/2.9 A) = 17.4 ns; fall 2.9·6 nF·ln(5/1.4) = 22.1496 ns; incoming 25 °C
                // (2 + 1.5)·6 nF·ln(10/8) = 4.686 ns, 125 °C (2.8 + 1.5)·6 nF·ln(10/8.6) = 3.891 ns;
                // 55.631 − 3.891 = 51.739 ns
                new Terms("two switches in parallel", s -> { }, d -> { }, new Object[] {"parallel", 2.0}, 16.081, 17.400,
                        22.1496, 3.8912, 51.739),
                // R_sink 0.5 Ω: R_off = 0.7 + 3 = 3.7 Ω: 3.7·4 nF·ln 2 = 10.259 ns; 15 nC/(5/3.7 A) = 11.1 ns;
                // 3.7·3 nF·ln(5/1.4) = 14.130 ns; 35.488 − 2.624 = 32.864 ns
                new Terms("a stronger sink", s -> { }, d -> d.rSink = 0.5, new Object[0], 10.259, 11.100, 14.130, 2.6243,
                        32.864),
                // hot corner 0 °C, below 25 °C: the turn-off is judged at 25 °C (R_off 1 + 3 = 4 Ω, V_th 2 V):
                // 4·4 nF·ln 2 = 11.090 ns; 15 nC/1.25 A = 12 ns; 4·3 nF·ln(5/2) = 10.995 ns; incoming 25 °C
                // 3.347 ns, 0 °C (0.9·2 + 3)·3 nF·ln(10/7.85) = 3.486 ns → 3.347 ns; 34.086 − 3.347 = 30.739 ns
                new Terms("a hot corner below 25 °C", s -> { }, d -> { }, new Object[] {"t_j_c", 0.0}, 11.090, 12.000,
                        10.995, 3.3472, 30.739));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("terms")
    void theMinimumAddsTheTurnOffTermsLessTheIncomingDelay(Terms t) {
        Report rep = bridge(t.s(), t.d(), concat(t.stage(), dead(1000)), concat(t.stage(), dead(1000)));
        StageResult ls = stageOf(rep, "LS");
        assertEquals(t.min() * NS, minimum(ls), t.min() * NS * REL);
        Check c = check(ls, Rule.DEAD_TIME);
        double off = t.delay() + t.plateau() + t.fall();
        contains(c, "turn-off of HS " + Eng.of(off * NS, "s") + " (delay " + Eng.of(t.delay() * NS, "s") + ", plateau "
                + Eng.of(t.plateau() * NS, "s") + ", fall to V_th,min " + Eng.of(t.fall() * NS, "s") + ")",
                "delay of LS to V_th,min " + Eng.of(t.on() * NS, "s"));
    }

    // ------------------------------------------------------------------ no dead time needed

    @Test
    void anIncomingSwitchSlowerThanTheOutgoingNeedsNoDeadTime() {
        // HS turns on through 100 Ω and off through 0 Ω; t_prop,max = t_prop = 20 ns, so the skew is 0.
        // HS after LS: LS's turn-off 42.203 ns; HS's delay to V_th,min 25 °C (2 + 101)·3 nF·ln(10/8) =
        // 68.95 ns, 125 °C (2.8 + 101)·3 nF·ln(10/8.6) = 46.966 ns; 42.203 − 46.966 < 0 → 0 ns needed, and a
        // dead time of 0 passes. LS after HS: R_off = 1.4 + (0 + 1) = 2.4 Ω: 2.4·4 nF·ln 2 = 6.654 ns,
        // 15 nC/(5/2.4 A) = 7.2 ns, 2.4·3 nF·ln(5/1.4) = 9.165 ns → 23.020 − 2.624 = 20.395 ns: 0 fails.
        Report rep = bridge(s -> { }, d -> d.tPropMax = 20 * NS,
                new Object[] {"r_g_ohm", 100.0, "r_g_off_ohm", 0.0, "dead_time_ns", 0.0}, dead(0));
        StageResult hs = stageOf(rep, "HS");
        assertEquals(0.0, minimum(hs), 0.0);
        Check c = check(hs, Rule.DEAD_TIME);
        assertEquals(Verdict.PASS, c.verdict(), c.message());
        contains(c, "dead time 0 s before HS turns on against ≥ 0 s", "delay of HS to V_th,min 47 ns = 0 s");
        assertEquals(Score.pass(1), c.score(), 1e-12, "no minimum: full credit");

        StageResult ls = stageOf(rep, "LS");
        assertEquals(20.395 * NS, minimum(ls), 20.395 * NS * REL);
        assertEquals(Verdict.FAIL, check(ls, Rule.DEAD_TIME).verdict());
    }

    // ------------------------------------------------------------------ unknowns

    @Test
    void withoutTheStagesDeadTimeTheRuleSaysWhatIsNeeded() {
        Report rep = bridge(s -> { }, d -> { }, new Object[0], new Object[0]);
        Check c = check(stageOf(rep, "LS"), Rule.DEAD_TIME);
        assertEquals(Verdict.UNKNOWN, c.verdict(), c.message());
        assertEquals(Score.UNKNOWN, c.score());
        contains(c, "half-bridge with HS: needs ≥ 39.6 ns of dead time before LS turns on (turn-off of HS 42.2 ns",
                "give the stage's dead_time_ns");
        assertEquals(39.578 * NS, minimum(stageOf(rep, "LS")), 39.578 * NS * REL);
    }

    @Test
    void anIgbtWithoutItsFallTimeHasNoMinimum() {
        Report rep = bridge(s -> s.tech = Technology.IGBT, d -> { }, dead(1000), dead(1000));
        StageResult ls = stageOf(rep, "LS");
        Check c = check(ls, Rule.DEAD_TIME);
        assertEquals(Verdict.UNKNOWN, c.verdict(), c.message());
        contains(c, "half-bridge with HS: TST-S1 is an IGBT without the datasheet's fall time (t_f_ns)");
        assertTrue(ls.figure("dead-time-min").isEmpty(), "no minimum figure when it is unknown");
        assertTrue(c.compared().isEmpty());
    }

    @Test
    void aThresholdAtOrBelowTheOffLevelWhenHotIsNeverAPass() {
        // V_th,min 0.5 V at 25 °C falls 6 mV/K (REFERENCES.md §8, from memory) to 0.5 − 0.006·100 = −0.1 V
        // at the 125 °C hot corner, below the 0 V off level: the driver does not hold the switch off, so
        // no dead time is enough, not even 1 µs. Before, the fall to V_th,min was taken as 0 and the
        // dead time passed.
        Report rep = bridge(s -> s.vThMin = 0.5, d -> { }, dead(1000), dead(1000));
        StageResult ls = stageOf(rep, "LS");
        Check c = check(ls, Rule.DEAD_TIME);
        assertEquals(Verdict.UNKNOWN, c.verdict(), c.message());
        contains(c, "the turn-off of HS cannot be estimated: V_th,min of TST-S1 at 125 °C (-100 mV) is at or below"
                + " the off level (0 V), so the switch is not held off and no dead time is enough");
        assertTrue(ls.figure("dead-time-min").isEmpty(), "no minimum figure when the switch is not held off");
    }

    @Test
    void withoutAPlateauTheTurnOffCannotBeEstimated() {
        // Q_gd 0: no Miller plateau to time.
        Report rep = bridge(s -> s.qGd = 0, d -> { }, dead(1000), dead(1000));
        Check c = check(stageOf(rep, "LS"), Rule.DEAD_TIME);
        assertEquals(Verdict.UNKNOWN, c.verdict(), c.message());
        contains(c, "the turn-off of HS cannot be estimated: the plateau voltage or Q_gd of TST-S1 is unknown");
    }

    @Test
    void withoutTheIncomingThresholdItsDelayCannotBeEstimated() {
        // LS's switch TST-S2 has no V_th,min. LS after HS: unknown. HS after LS: LS's turn-off has no
        // fall to a threshold, 12.199 + 13.2 = 25.399 ns, less HS's 2.624 ns = 22.775 ns.
        Parts.Sw s2 = Parts.sw();
        s2.pn = "TST-S2";
        s2.vThMin = Double.NaN;
        Row a = stage("HS", 2, "TST-D1", "TST-S1", "side", "high", "leg", "A", "dead_time_ns", 100.0);
        Row b = stage("LS", 3, "TST-D1", "TST-S2", "leg", "A", "dead_time_ns", 100.0);
        Report rep = StageSheets.run(List.of(a, b), null, List.of(StageSheets.driverRow(Parts.dr())),
                List.of(StageSheets.switchRow(Parts.sw()), StageSheets.switchRow(s2)));
        Check ls = check(stageOf(rep, "LS"), Rule.DEAD_TIME);
        assertEquals(Verdict.UNKNOWN, ls.verdict(), ls.message());
        contains(ls, "the turn-on delay of LS cannot be estimated: V_th,min of TST-S2 is unknown");
        assertEquals(22.775 * NS, minimum(stageOf(rep, "HS")), 22.775 * NS * REL);
    }

    // ------------------------------------------------------------------ which stages form a bridge

    @Test
    void aLegIsFoundByItsNameWhateverTheCaseAndSpaces() {
        Row a = stage("HS", 2, "TST-D1", "TST-S1", "side", "high", "leg", " a ", "dead_time_ns", 100.0);
        Row b = stage("LS", 3, "TST-D2", "TST-S1", "leg", "A", "dead_time_ns", 100.0);
        Parts.Dr d2 = Parts.dr();
        d2.pn = "TST-D2";
        Report rep = StageSheets.run(List.of(a, b), null, List.of(StageSheets.driverRow(Parts.dr()),
                StageSheets.driverRow(d2)), List.of(StageSheets.switchRow(Parts.sw())));
        assertTrue(check(stageOf(rep, "HS"), Rule.DEAD_TIME).message().startsWith("half-bridge with LS: "));
        assertTrue(check(stageOf(rep, "LS"), Rule.DEAD_TIME).message().startsWith("half-bridge with HS: "));
    }

    @Test
    void withoutALegTheStagesOfOneDriverCellFormTheBridge() {
        // No leg column: HS and LS both name TST-D1 (cells "TST-D1" and "tst-d1"), X names TST-D2.
        Parts.Dr d2 = Parts.dr();
        d2.pn = "TST-D2";
        Row a = stage("HS", 2, "TST-D1", "TST-S1", "side", "high", "dead_time_ns", 100.0);
        Row b = stage("LS", 3, "tst-d1", "TST-S1", "dead_time_ns", 100.0);
        Row x = stage("X", 4, "TST-D2", "TST-S1", "dead_time_ns", 100.0);
        Report rep = StageSheets.run(List.of(a, b, x), null, List.of(StageSheets.driverRow(Parts.dr()),
                StageSheets.driverRow(d2)), List.of(StageSheets.switchRow(Parts.sw())));
        assertTrue(check(stageOf(rep, "LS"), Rule.DEAD_TIME).message().startsWith("half-bridge with HS: "));
        assertFalse(hasDeadTime(stageOf(rep, "X")));
    }

    @Test
    void threeStagesOrTwoOfOneSideAreNoBridge() {
        Row a = stage("HS", 2, "TST-D1", "TST-S1", "side", "high", "leg", "A", "dead_time_ns", 100.0);
        Row b = stage("LS", 3, "TST-D1", "TST-S1", "leg", "A", "dead_time_ns", 100.0);
        Row c = stage("LS2", 4, "TST-D1", "TST-S1", "leg", "A", "dead_time_ns", 100.0);
        Row d = stage("L1", 5, "TST-D1", "TST-S1", "leg", "B", "dead_time_ns", 100.0);
        Row e = stage("L2", 6, "TST-D1", "TST-S1", "leg", "B", "dead_time_ns", 100.0);
        Report rep = StageSheets.run(List.of(a, b, c, d, e), null, List.of(StageSheets.driverRow(Parts.dr())),
                List.of(StageSheets.switchRow(Parts.sw())));
        for (StageResult r : rep.results()) {
            assertFalse(hasDeadTime(r), r.stage() + " is in no bridge: " + r.checks());
            assertTrue(r.figure("dead-time-min").isEmpty());
        }
    }

    @Test
    void aStageWhosePartsAreMissingIsNoOnesPartner() {
        Row a = stage("HS", 2, "TST-D1", "TST-S1", "side", "high", "leg", "A", "dead_time_ns", 100.0);
        Row b = stage("LS", 3, "TST-D1", "TST-S9", "leg", "A", "dead_time_ns", 100.0);
        Report rep = StageSheets.run(List.of(a, b), null, List.of(StageSheets.driverRow(Parts.dr())),
                List.of(StageSheets.switchRow(Parts.sw())));
        assertFalse(hasDeadTime(stageOf(rep, "HS")));
        assertEquals(Verdict.FAIL, stageOf(rep, "LS").verdict());
    }

    @Test
    void bridgesPairsTheIndicesOfOneHighAndOneLowStage() {
        Row a = stage("L1", 2, "TST-D1", "TST-S1", "leg", "B");
        Row b = stage("HS", 3, "TST-D1", "TST-S1", "side", "high", "leg", "A");
        Row c = stage("H1", 4, "TST-D1", "TST-S1", "side", "high", "leg", "B");
        Row d = stage("LS", 5, "TST-D1", "TST-S1", "leg", "A");
        List<Row> rows = List.of(a, b, c, d);
        Report rep = StageSheets.run(rows, null, List.of(StageSheets.driverRow(Parts.dr())),
                List.of(StageSheets.switchRow(Parts.sw())));
        List<int[]> g = DeadTimeCheck.bridges(rep.results(), rows);
        assertEquals(2, g.size());
        assertEquals(List.of(0, 2), List.of(g.get(0)[0], g.get(0)[1]), "leg B first, as the sheet first names it");
        assertEquals(List.of(1, 3), List.of(g.get(1)[0], g.get(1)[1]));
    }

    private static boolean hasDeadTime(StageResult r) {
        return r.checks().stream().anyMatch(c -> c.rule() == Rule.DEAD_TIME);
    }
}
