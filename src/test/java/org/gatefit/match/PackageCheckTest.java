package org.gatefit.match;

import static org.gatefit.match.StageSheets.check;
import static org.gatefit.match.StageSheets.stage;
import static org.gatefit.match.StageSheets.stageOf;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.gatefit.catalog.Bom;
import org.gatefit.catalog.Row;
import org.gatefit.match.StageCheck.Report;
import org.gatefit.match.StageCheck.StageResult;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The checks across the stages of one driver package ({@link PackageCheck}): the package dissipation
 * ({@code driver-power}, every channel added up against p_max_w and the 70 % margin of
 * {@link Margins#DEFAULT}, common practice, no source) and the {@code design} rule (channels, a
 * single-channel driver on both sides of a leg, one bus and frequency per leg within
 * {@link PackageCheck#SAME_POINT}).
 *
 * <p>{@link PackageCheck#power} and {@link PackageCheck#design} are called with stage results built here
 * (a channel's dissipation given as its figure, so the sums are exact in binary and the limits can be
 * met exactly); {@link PackageCheck#apply} through the check engine with a BOM, where the channel
 * dissipation is REFERENCES.md §2's: P_G = Q_g·ΔV·f, each edge's half split between the resistances in
 * proportion.
 */
class PackageCheckTest {

    /** A stage on designator {@code ref} (TST-D1), with a channel dissipation (W; NaN: no figure). */
    private static StageResult result(String id, String ref, boolean high, double bus, double fSw, double watts) {
        OperatingPoint.Spec o = Parts.op();
        o.highSide = high;
        o.bus = Double.isNaN(bus) ? null : bus;
        o.fSw = fSw;
        OperatingPoint p = o.resolve(Parts.sw().build());
        List<Figure> f = Double.isNaN(watts) ? List.of() : List.of(new Figure("driver-power", watts, "W", "driver", false));
        return new StageResult(id, 2, ref, "TST-D1", "Q1", "TST-S1", Verdict.PASS, 1, List.of(), f, p, List.of());
    }

    private static StageResult result(String id, boolean high, double watts) {
        return result(id, "U1", high, 48, 100e3, watts);
    }

    private static DriverPart driver(int channels, Topology t, double pMax) {
        Parts.Dr d = Parts.dr();
        d.channels = channels;
        d.topology = t;
        d.pMax = pMax;
        return d.build();
    }

    private static final DriverPart DUAL = driver(2, Topology.HALF_BRIDGE, 1.0);

    private static void contains(Check c, String... parts) {
        for (String p : parts) {
            assertTrue(c.message().contains(p), () -> "expected '" + p + "' in: " + c.message());
        }
    }

    // ------------------------------------------------------------------ package dissipation

    @Test
    void aPackageWellWithinItsLimitPassesWithItsExcess() {
        // 0.2 + 0.3 = 0.5 W against 0.7 × 1 W = 0.7 W: excess 0.7 / 0.5 − 1 = 0.4
        Check c = PackageCheck.power(List.of(result("HS", true, 0.2), result("LS", false, 0.3)), DUAL, Margins.DEFAULT);
        assertEquals(Verdict.PASS, c.verdict(), c.message());
        assertEquals(Rule.DRIVER_POWER, c.rule());
        assertEquals("package U1 (TST-D1, 2 channels used): HS 200 mW + LS 300 mW = 500 mW, within 70 % of its 1 W limit",
                c.message());
        assertEquals(new Check.Comparison("package dissipation", 0.5, "≤", 0.7, "W"), c.compared().get(0));
        assertEquals(Score.pass(0.4), c.score(), 1e-12);
    }

    @Test
    void exactlyAtTheMarginStillPasses() {
        // 0.35 + 0.35 = 0.7 W exactly (0.35 doubled is the double nearest 0.7), the allowed 0.7 W: "≤" holds.
        Check c = PackageCheck.power(List.of(result("HS", true, 0.35), result("LS", false, 0.35)), DUAL, Margins.DEFAULT);
        assertEquals(Verdict.PASS, c.verdict(), c.message());
        assertEquals(Score.pass(0), c.score(), 1e-12);
    }

    @Test
    void aboveTheMarginWarnsWithItsShareOfTheHeadroom() {
        // 0.4 + 0.4 = 0.8 W: above 0.7 W, below 1 W; (1 − 0.8) / (1 − 0.7) = 2/3 of the way back to the pass edge
        Check c = PackageCheck.power(List.of(result("HS", true, 0.4), result("LS", false, 0.4)), DUAL, Margins.DEFAULT);
        assertEquals(Verdict.WARN, c.verdict(), c.message());
        contains(c, "package U1 (TST-D1, 2 channels used): HS 400 mW + LS 400 mW = 800 mW uses more than 70 % of its 1 W"
                + " limit — check the temperature rise");
        assertEquals(Score.warn(2.0 / 3), c.score(), 1e-9);
    }

    @Test
    void exactlyAtTheLimitWarnsAndAboveItFails() {
        // 0.5 + 0.5 = 1.0 W, the package limit itself: not above it
        Check at = PackageCheck.power(List.of(result("HS", true, 0.5), result("LS", false, 0.5)), DUAL, Margins.DEFAULT);
        assertEquals(Verdict.WARN, at.verdict(), at.message());
        assertEquals(Score.warn(0), at.score(), 1e-12);
        // 0.5 + 0.55 = 1.05 W
        Check over = PackageCheck.power(List.of(result("HS", true, 0.5), result("LS", false, 0.55)), DUAL, Margins.DEFAULT);
        assertEquals(Verdict.FAIL, over.verdict(), over.message());
        assertEquals(0.0, over.score());
        contains(over, "= 1.05 W exceeds its 1 W limit — add external gate resistance");
        assertEquals(1.05, over.compared().get(0).value(), 1e-12);
    }

    @Test
    void everyChannelOfThePackageIsAddedUp() {
        // 0.1 + 0.2 + 0.3 = 0.6 W on three channels
        Check c = PackageCheck.power(List.of(result("A", true, 0.1), result("B", false, 0.2), result("C", false, 0.3)),
                driver(4, Topology.LOW_SIDE, 1.0), Margins.DEFAULT);
        contains(c, "(TST-D1, 3 channels used): A 100 mW + B 200 mW + C 300 mW = 600 mW, within 70 %");
        assertEquals(0.6, c.compared().get(0).value(), 1e-12);
    }

    @Test
    void anUnknownChannelOrLimitLeavesThePackageUnknown() {
        Check channel = PackageCheck.power(List.of(result("HS", true, 0.2), result("LS", false, Double.NaN)), DUAL,
                Margins.DEFAULT);
        assertEquals(Verdict.UNKNOWN, channel.verdict(), channel.message());
        contains(channel, "a channel's dissipation is unknown");
        assertEquals(Score.UNKNOWN, channel.score());

        Check limit = PackageCheck.power(List.of(result("HS", true, 0.2), result("LS", false, 0.3)),
                driver(2, Topology.HALF_BRIDGE, Double.NaN), Margins.DEFAULT);
        assertEquals(Verdict.UNKNOWN, limit.verdict(), limit.message());
        contains(limit, "= 500 mW; the package limit (p_max_w) is unknown");
    }

    // ------------------------------------------------------------------ design: channels

    @Test
    void moreStagesThanChannelsFail() {
        Check c = PackageCheck.design(List.of(result("HS", true, 0), result("LS", false, 0), result("X", false, 0)), DUAL);
        assertEquals(Verdict.FAIL, c.verdict(), c.message());
        assertEquals(Rule.DESIGN, c.rule());
        contains(c, "U1 (TST-D1) has 2 channels but drives 3 stages (HS high, LS low, X low) — give each stage its own"
                + " channel");
        assertEquals(new Check.Comparison("stages on the package", 3, "≤", 2, "1"), c.compared().get(0));
        assertEquals(0.0, c.score());

        Check one = PackageCheck.design(List.of(result("L1", false, 0), result("L2", false, 0)),
                driver(1, Topology.LOW_SIDE, 1.0));
        contains(one, "has 1 channel but drives 2 stages (L1 low, L2 low)");
    }

    @Test
    void asManyStagesAsChannelsPass() {
        Check c = PackageCheck.design(List.of(result("HS", true, 0), result("LS", false, 0)), DUAL);
        assertEquals(Verdict.PASS, c.verdict(), c.message());
        assertEquals("U1 (TST-D1) drives 2 stages (HS high, LS low) on its 2 channels, one leg at one bus and frequency",
                c.message());
        assertEquals(1.0, c.score());
    }

    @Test
    void oneStageOnAPackageOfUnknownOrOneChannel() {
        Check unknown = PackageCheck.design(List.of(result("LS", false, 0)), driver(0, Topology.LOW_SIDE, 1.0));
        assertEquals(Verdict.PASS, unknown.verdict(), unknown.message());
        assertEquals("U1 (TST-D1) drives one stage (LS low)", unknown.message());
        Check one = PackageCheck.design(List.of(result("HS", true, 0)), driver(1, Topology.HIGH_SIDE, 1.0));
        assertEquals("U1 (TST-D1) drives one stage (HS high) on its 1 channel", one.message());
    }

    @Test
    void aSingleChannelDriverCannotDriveBothSidesOfALeg() {
        // channels unknown, low-side topology: taken as one channel
        Check c = PackageCheck.design(List.of(result("HS", true, 0), result("LS", false, 0)),
                driver(0, Topology.LOW_SIDE, 1.0));
        assertEquals(Verdict.FAIL, c.verdict(), c.message());
        contains(c, "U1 (TST-D1) is a single-channel low-side driver but drives a high and a low stage (HS high, LS low)"
                + " — a half-bridge needs a half-bridge driver");
        // a half-bridge driver of unknown channel count, or a two-channel low-side part, is not refused for it
        assertEquals(Verdict.PASS, PackageCheck.design(List.of(result("HS", true, 0), result("LS", false, 0)),
                driver(0, Topology.HALF_BRIDGE, 1.0)).verdict());
        assertEquals(Verdict.PASS, PackageCheck.design(List.of(result("HS", true, 0), result("LS", false, 0)),
                driver(2, Topology.LOW_SIDE, 1.0)).verdict());
    }

    @Test
    void twoStagesOfOneSideAreNoLeg() {
        Check c = PackageCheck.design(List.of(result("H1", "U1", true, 48, 100e3, 0), result("H2", "U1", true, 400,
                200e3, 0)), DUAL);
        assertEquals(Verdict.PASS, c.verdict(), c.message());
        assertEquals("U1 (TST-D1) drives 2 stages (H1 high, H2 high) on its 2 channels", c.message());
    }

    // ------------------------------------------------------------------ design: one bus and frequency per leg

    @Test
    void aLegAtTwoBusesFailsNamingBoth() {
        Check c = PackageCheck.design(List.of(result("HS", "U1", true, 48, 100e3, 0), result("LS", "U1", false, 400,
                100e3, 0)), DUAL);
        assertEquals(Verdict.FAIL, c.verdict(), c.message());
        contains(c, "U1 (TST-D1) drives the half-bridge HS / LS, but the stage sheet gives them different operating"
                + " points (bus 48 V / 400 V, 100 kHz / 100 kHz)");
        assertEquals(new Check.Comparison("bus, high vs low", 48, "=", 400, "V"), c.compared().get(0));
        assertEquals(new Check.Comparison("frequency, high vs low", 100e3, "=", 100e3, "Hz"), c.compared().get(1));
    }

    @Test
    void aLegAtTwoFrequenciesFails() {
        Check c = PackageCheck.design(List.of(result("HS", "U1", true, 48, 100e3, 0), result("LS", "U1", false, 48,
                102e3, 0)), DUAL);
        assertEquals(Verdict.FAIL, c.verdict(), c.message());
        contains(c, "(bus 48 V / 48 V, 100 kHz / 102 kHz)");
    }

    @Test
    void oneUnknownBusDiffersFromAKnownOneButTwoUnknownAgree() {
        Check one = PackageCheck.design(List.of(result("HS", "U1", true, Double.NaN, 100e3, 0), result("LS", "U1", false,
                48, 100e3, 0)), DUAL);
        assertEquals(Verdict.FAIL, one.verdict(), one.message());
        contains(one, "(bus unknown / 48 V,");
        Check two = PackageCheck.design(List.of(result("HS", "U1", true, Double.NaN, 100e3, 0), result("LS", "U1", false,
                Double.NaN, 100e3, 0)), DUAL);
        assertEquals(Verdict.PASS, two.verdict(), two.message());
    }

    @Test
    void roundingWithinOnePercentIsTheSamePoint() {
        // SAME_POINT 1 %: 100 V / 99 V differ by 1 V = 1 % of 100 V exactly (not more): the same bus;
        // 100 V / 98.9 V by 1.1 V: different. Frequencies alike: 100 / 99 kHz the same, 100 / 98.9 kHz not.
        assertEquals(Verdict.PASS, leg(100, 99, 100e3, 100e3).verdict());
        assertEquals(Verdict.PASS, leg(99, 100, 100e3, 100e3).verdict());
        assertEquals(Verdict.FAIL, leg(100, 98.9, 100e3, 100e3).verdict());
        assertEquals(Verdict.PASS, leg(48, 48, 100e3, 99e3).verdict());
        assertEquals(Verdict.FAIL, leg(48, 48, 100e3, 98.9e3).verdict());
        assertEquals(Verdict.PASS, leg(48, 48, 100e3, 100e3).verdict());
    }

    private static Check leg(double busH, double busL, double fH, double fL) {
        return PackageCheck.design(List.of(result("HS", "U1", true, busH, fH, 0), result("LS", "U1", false, busL, fL, 0)),
                driver(4, Topology.HALF_BRIDGE, 1.0));
    }

    @Test
    void theFirstStageOfEachSideFormsTheLeg() {
        // H1 and L1 agree; H2 and L2 are at 400 V. The leg is H1 / L1, so the bus check passes.
        Check same = PackageCheck.design(List.of(result("H1", "U1", true, 48, 100e3, 0), result("L1", "U1", false, 48,
                100e3, 0), result("H2", "U1", true, 400, 100e3, 0), result("L2", "U1", false, 400, 100e3, 0)),
                driver(4, Topology.HALF_BRIDGE, 1.0));
        assertEquals(Verdict.PASS, same.verdict(), same.message());
        // H1 at 48 V, H2 and L1 at 400 V: the leg H1 / L1 disagrees.
        Check differ = PackageCheck.design(List.of(result("H1", "U1", true, 48, 100e3, 0), result("H2", "U1", true, 400,
                100e3, 0), result("L1", "U1", false, 400, 100e3, 0)), driver(4, Topology.HALF_BRIDGE, 1.0));
        assertEquals(Verdict.FAIL, differ.verdict(), differ.message());
        contains(differ, "drives the half-bridge H1 / L1", "(bus 48 V / 400 V");
        // L1 at 48 V, L2 and H1 at 400 V: the leg H1 / L1 disagrees.
        Check low = PackageCheck.design(List.of(result("L1", "U1", false, 48, 100e3, 0), result("L2", "U1", false, 400,
                100e3, 0), result("H1", "U1", true, 400, 100e3, 0)), driver(4, Topology.HALF_BRIDGE, 1.0));
        assertEquals(Verdict.FAIL, low.verdict(), low.message());
        contains(low, "drives the half-bridge H1 / L1", "(bus 400 V / 48 V");
    }

    // ------------------------------------------------------------------ rescored

    @Test
    void rescoredFormsTheVerdictAndScoreAsTheRulesDo() {
        // An isolated driver on a high side (its own supply costs the design, Score.ISOLATED_SUPPLY): the
        // stage rescored with the pair's own checks scores exactly as Rules.evaluate scored the pair.
        Parts.Dr d = Parts.dr();
        d.topology = Topology.ISOLATED;
        d.isolationVrms = 2500;
        DriverPart dp = d.build();
        SwitchPart sp = Parts.sw().build();
        OperatingPoint.Spec o = Parts.op();
        o.highSide = true;
        OperatingPoint op = o.resolve(sp);
        PairResult pr = Rules.evaluate(dp, sp, op, Margins.DEFAULT);
        StageResult r = new StageResult("HS", 2, "U1", dp.partNumber(), "Q1", sp.partNumber(), Verdict.FAIL, 0, List.of(),
                pr.figures(), op, List.of());
        StageResult x = PackageCheck.rescored(r, pr.checks(), dp, sp);
        assertTrue(pr.score() > 0 && pr.score() < Score.ISOLATED_SUPPLY, "the supply cost applies: " + pr.score());
        assertEquals(pr.verdict(), x.verdict());
        assertEquals(pr.score(), x.score(), 1e-12);
        assertEquals(pr.checks(), x.checks());

        // one failing check more fails the stage and caps its score
        List<Check> more = new ArrayList<>(pr.checks());
        more.add(new Check(Rule.DESIGN, Verdict.FAIL, "x", List.of(), 0));
        StageResult failed = PackageCheck.rescored(r, more, dp, sp);
        assertEquals(Verdict.FAIL, failed.verdict());
        assertTrue(failed.score() <= Score.FAIL_CAP);
    }

    // ------------------------------------------------------------------ apply, through the check engine

    /*
     * Channel dissipation (REFERENCES.md §2): Q_g 50 nC over 0–10 V at 100 kHz, P_G = 50 nC·10 V·100 kHz
     * = 50 mW; the driver's share ½·50 mW·(R_src/R_on + R_sink/R_off) = 25 mW·(2/5 + 1/4) = 16.25 mW (R_on =
     * 2 + 2 + 1 Ω, R_off = 1 + 2 + 1 Ω); the high side adds V·I_qbs = 10 V·50 µA = 0.5 mW → 16.75 mW.
     * Package U1: 16.75 + 16.25 = 33.0 mW against 0.7 × 1 W.
     */

    private static Report onBom(Path dir, Parts.Dr d, Row... stages) throws Exception {
        Bom bom = StageSheets.bom(dir, "Designator,MPN,Qty\nU1,TST-D1,1\nU2,TST-D1,1\nQ1,TST-S1,1\nQ2,TST-S1,1\n");
        return StageSheets.run(List.of(stages), bom, List.of(StageSheets.driverRow(d)),
                List.of(StageSheets.switchRow(Parts.sw())));
    }

    @Test
    void theStagesOfOneDesignatorShareThePackageDissipation(@TempDir Path dir) throws Exception {
        Report rep = onBom(dir, Parts.dr(), stage("HS", 2, "U1", "Q1", "side", "high", "leg", "A"),
                stage("LS", 3, "u1", "Q2", "leg", "A"));
        for (String id : List.of("HS", "LS")) {
            StageResult r = stageOf(rep, id);
            Check p = check(r, Rule.DRIVER_POWER);
            assertEquals(Verdict.PASS, p.verdict(), p.message());
            assertTrue(p.message().startsWith("package U1 (TST-D1, 2 channels used): HS "), p.message());
            contains(p, "= 33 mW, within 70 % of its 1 W limit");
            assertEquals(0.033, p.compared().get(0).value(), 1e-9);
            assertEquals(1, r.checks().stream().filter(c -> c.rule() == Rule.DRIVER_POWER).count());
            assertEquals("U1 (TST-D1) drives 2 stages (HS high, LS low) on its 2 channels, one leg at one bus and frequency",
                    check(r, Rule.DESIGN).message());
        }
        assertEquals(16.75e-3, stageOf(rep, "HS").figure("driver-power").orElseThrow().value(), 1e-9);
        assertEquals(16.25e-3, stageOf(rep, "LS").figure("driver-power").orElseThrow().value(), 1e-9);
    }

    @Test
    void aStageAloneOnItsDesignatorKeepsItsOwnChannelFigure(@TempDir Path dir) throws Exception {
        Report rep = onBom(dir, Parts.dr(), stage("LS", 2, "U1", "Q1"), stage("X", 3, "U2", "Q2"));
        StageResult r = stageOf(rep, "LS");
        Check p = check(r, Rule.DRIVER_POWER);
        assertFalse(p.message().startsWith("package"), p.message());
        assertEquals("U1 (TST-D1) drives one stage (LS low) on its 2 channels", check(r, Rule.DESIGN).message());
    }

    @Test
    void aPartNumberInTheDriverCellIsNoPackage() {
        Report rep = StageSheets.run(List.of(stage("HS", 2, "TST-D1", "TST-S1", "side", "high"),
                stage("LS", 3, "TST-D1", "TST-S1")), null, List.of(StageSheets.driverRow(Parts.dr())),
                List.of(StageSheets.switchRow(Parts.sw())));
        for (StageResult r : rep.results()) {
            assertTrue(r.checks().stream().noneMatch(c -> c.rule() == Rule.DESIGN), r.stage() + ": " + r.checks());
            assertFalse(check(r, Rule.DRIVER_POWER).message().startsWith("package"));
        }
    }

    @Test
    void tooManyStagesFailEveryStageOfThePackage(@TempDir Path dir) throws Exception {
        Report rep = onBom(dir, Parts.dr(), stage("A", 2, "U1", "Q1"), stage("B", 3, "U1", "Q1"),
                stage("C", 4, "U1", "Q2"), stage("D", 5, "U2", "Q2"));
        for (String id : List.of("A", "B", "C")) {
            StageResult r = stageOf(rep, id);
            assertEquals(Verdict.FAIL, r.verdict(), id);
            assertTrue(r.score() <= Score.FAIL_CAP, id + " " + r.score());
            contains(check(r, Rule.DESIGN), "has 2 channels but drives 3 stages (A low, B low, C low)");
            contains(check(r, Rule.DRIVER_POWER), "3 channels used");
        }
        assertEquals(Verdict.PASS, check(stageOf(rep, "D"), Rule.DESIGN).verdict());
        assertEquals(3L, rep.count(Verdict.FAIL), () -> "A, B and C fail: " + stageOf(rep, "D").checks());
    }

    @Test
    void aStageThatCannotBeResolvedIsNotOnThePackage(@TempDir Path dir) throws Exception {
        // LS's operating point has no frequency: it fails on its own and does not count on U1.
        Report rep = onBom(dir, Parts.dr(), stage("HS", 2, "U1", "Q1", "side", "high"),
                stage("LS", 3, "U1", "Q2", "f_sw_khz", null));
        assertEquals("U1 (TST-D1) drives one stage (HS high) on its 2 channels", check(stageOf(rep, "HS"), Rule.DESIGN)
                .message());
        assertEquals(List.of(Rule.CATALOG), stageOf(rep, "LS").checks().stream().map(Check::rule).toList());
    }
}
