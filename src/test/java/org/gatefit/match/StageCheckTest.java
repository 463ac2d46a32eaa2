package org.gatefit.match;

import static org.gatefit.match.StageSheets.check;
import static org.gatefit.match.StageSheets.stage;
import static org.gatefit.match.StageSheets.stageOf;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
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
 * The {@code check} engine ({@link StageCheck}) called directly with stage rows, catalog rows and BOMs
 * built here ({@link StageSheets}, from the {@link Parts} test parts): how a stage's parts are found
 * (the {@code catalog} rule and its wording), that a found pair is judged exactly as
 * {@link Rules#evaluate} judges it, the report's counts, and the two stages of a half-bridge judged on
 * each other's edge ({@link StageCheck#partner}).
 *
 * <p>Check values: the channel dissipation of REFERENCES.md §2 (P_G = Q_g·ΔV·f, split in proportion to
 * the resistances) and the switch-node dv/dt of a turn-on, V_bus over the plateau time Q_gd / I with
 * I = (V_on − V_pl)/R_on,total (REFERENCES.md §8).
 */
class StageCheckTest {
    private static final List<Row> DRIVERS = List.of(StageSheets.driverRow(Parts.dr()));
    private static final List<Row> SWITCHES = List.of(StageSheets.switchRow(Parts.sw()));

    private static Report run(Bom bom, Row... stages) {
        return StageSheets.run(List.of(stages), bom, DRIVERS, SWITCHES);
    }

    // ------------------------------------------------------------------ a found pair

    @Test
    void aStageWithItsPartsFoundIsJudgedAsThePairIs() {
        Row row = stage("LS", 7, "TST-D1", "TST-S1");
        Report rep = run(null, row);
        StageResult r = rep.results().get(0);
        assertEquals("LS", r.stage());
        assertEquals(7, r.line());
        assertEquals("TST-D1", r.driver());
        assertEquals("TST-S1", r.switchPart());
        Check catalog = r.checks().get(0);
        assertEquals(Rule.CATALOG, catalog.rule());
        assertEquals(Verdict.PASS, catalog.verdict());
        assertEquals("driver TST-D1 and switch TST-S1 are in the catalog", catalog.message());

        // the same pair (as the catalog rows read) at the row's point, one channel of the package switching
        OperatingPoint.Spec o = OperatingPoint.Spec.fromStage(row);
        o.channelsUsed = 1;
        SwitchPart sp = SwitchPart.of(SWITCHES.get(0));
        OperatingPoint op = o.resolve(sp);
        PairResult pr = Rules.evaluate(DriverPart.of(DRIVERS.get(0)), sp, op, Margins.DEFAULT);
        assertEquals(Verdict.PASS, pr.verdict(), "the baseline pair passes every rule (Parts)");
        assertEquals(pr.verdict(), r.verdict());
        assertEquals(pr.score(), r.score(), 1e-12);
        assertEquals(pr.checks(), r.checks().subList(1, r.checks().size()));
        assertEquals(op, r.point());
        assertEquals(pr.figures(), r.figures());
        assertTrue(r.notes().isEmpty());

        // REFERENCES.md §2: 50 nC · 10 V · 100 kHz = 50 mW; driver 25 mW·(2/5 + 1/4) = 16.25 mW
        assertEquals(16.25e-3, r.figure("driver-power").orElseThrow().value(), 1e-9);
        assertTrue(r.figure("no-such-figure").isEmpty());

        assertFalse(rep.failed());
        assertEquals(1, rep.count(Verdict.PASS));
        assertEquals(0, rep.count(Verdict.FAIL));
        assertEquals("stages.csv", rep.file());
        assertTrue(rep.bomNotes().isEmpty());
        assertEquals(Margins.DEFAULT, rep.margins());
    }

    @Test
    void theCatalogOverloadFindsTheSameParts() {
        Row s = stage("LS", 2, "TST-D1", "TST-S1");
        List<Integer> done = new ArrayList<>();
        Report viaParts = StageCheck.run("stages.csv", List.of(s, stage("X", 3, "TST-D1", "TST-S1")), null,
                StageSheets.parts(DRIVERS, SWITCHES), Margins.DEFAULT, done::add);
        Report viaLookup = StageSheets.run(List.of(s, stage("X", 3, "TST-D1", "TST-S1")), null, DRIVERS, SWITCHES);
        assertEquals(viaLookup, viaParts);
        assertEquals(Verdict.PASS, viaParts.results().get(0).verdict());
        assertEquals(List.of(1, 2), done, "progress after each stage");
    }

    @Test
    void progressCountsTheStagesDone() {
        List<Integer> done = new ArrayList<>();
        StageCheck.run("stages.csv", List.of(stage("A", 2, "TST-D1", "TST-S1"), stage("B", 3, "TST-D9", "TST-S1"),
                stage("C", 4, "TST-D1", "TST-S1")), null, StageSheets.lookup(DRIVERS), StageSheets.lookup(SWITCHES),
                Margins.DEFAULT, done::add);
        assertEquals(List.of(1, 2, 3), done);
    }

    // ------------------------------------------------------------------ parts not found

    private static void missing(StageResult r, String message) {
        assertEquals(Verdict.FAIL, r.verdict());
        assertEquals(0.0, r.score());
        assertEquals(1, r.checks().size(), "only the catalog check when a part is missing");
        Check c = r.checks().get(0);
        assertEquals(Rule.CATALOG, c.rule());
        assertEquals(Verdict.FAIL, c.verdict());
        assertEquals(message, c.message());
        assertTrue(r.figures().isEmpty());
        assertNull(r.point());
    }

    @Test
    void aPartNotInTheCatalogIsNamed() {
        Report rep = run(null, stage("A", 2, "TST-D9", "TST-S1"), stage("B", 3, "TST-D1", "TST-S9"),
                stage("C", 4, "U7", "Q3"));
        missing(stageOf(rep, "A"), "driver 'TST-D9' is not in the catalog — import it, or check the part number");
        assertNull(stageOf(rep, "A").driver());
        assertEquals("TST-S1", stageOf(rep, "A").switchPart());
        missing(stageOf(rep, "B"), "switch 'TST-S9' is not in the catalog — import it, or check the part number");
        missing(stageOf(rep, "C"), "driver 'U7' is not in the catalog (it looks like a designator: give the BOM with"
                + " --bom); switch 'Q3' is not in the catalog (it looks like a designator: give the BOM with --bom)");
        assertTrue(rep.failed());
        assertEquals(3, rep.count(Verdict.FAIL));
        assertEquals(0, rep.count(Verdict.PASS));
    }

    @Test
    void aBomResolvesDesignatorsAndSaysWhatIsWrongWithThem(@TempDir Path dir) throws Exception {
        Bom bom = StageSheets.bom(dir, "Designator,MPN,Qty,DNP\nU1,TST-D1,1,\nU3,TST-D1,1,yes\nU4,TST-D9,1,\n"
                + "Q1,TST-S1,1,\nQ2,TST-S1,2,\n");
        Report rep = run(bom, stage("OK", 2, "U1", "Q1"), stage("PN", 3, "U1", "TST-S1"), stage("DNP", 4, "U3", "Q1"),
                stage("GONE", 5, "U4", "Q1"), stage("NONE", 6, "U1", "Q9"));
        StageResult ok = stageOf(rep, "OK");
        assertEquals("driver U1 (TST-D1) and switch Q1 (TST-S1) are in the catalog", ok.checks().get(0).message());
        assertEquals("TST-D1", ok.driver());
        assertEquals("U1", ok.driverRef());
        assertEquals("TST-S1", ok.switchPart());
        assertEquals("driver U1 (TST-D1) and switch TST-S1 are in the catalog",
                stageOf(rep, "PN").checks().get(0).message(), "a part number beside a BOM is found in the catalog");
        missing(stageOf(rep, "DNP"), "driver U3 is marked do-not-place in bom.csv (line 3) — fit it, or point the stage"
                + " at the part that is placed");
        missing(stageOf(rep, "GONE"), "driver U4 is TST-D9 in bom.csv, which is not in the catalog — import its datasheet"
                + " values, or correct the BOM");
        missing(stageOf(rep, "NONE"), "switch 'Q9' is neither a designator in bom.csv nor a part in the catalog — add it"
                + " to the BOM or correct the stage sheet");
        assertEquals(List.of("bom.csv line 6: quantity 2 but 1 designators (Q2)"), rep.bomNotes());
    }

    @Test
    void aDesignatorMatchingAPartNumberCaseBlindReadsAsThePart() {
        // "tst-s1" is the catalog's TST-S1: the catalog sentence names the cell once, as the catalog found it
        Report rep = run(null, stage("LS", 2, "tst-d1", "tst-s1"));
        assertEquals("driver tst-d1 and switch tst-s1 are in the catalog", rep.results().get(0).checks().get(0).message());
    }

    @Test
    void anOperatingPointThatCannotBeUsedFailsTheStage() {
        Report rep = run(null, stage("LS", 2, "TST-D1", "TST-S1", "f_sw_khz", null));
        StageResult r = rep.results().get(0);
        missing(r, "the stage's operating point cannot be used: expected a switching frequency (--freq or f_sw_khz),"
                + " got none");
        assertEquals("TST-D1", r.driver());
        assertEquals("TST-S1", r.switchPart());
    }

    // ------------------------------------------------------------------ a half-bridge judged as built

    /*
     * TST-D3 is TST-D1 with R_source 0.5 Ω. Turn-on plateau current (REFERENCES.md §8): 25 °C
     * (10 − 5) V / (0.5 + 2 + 1) Ω = 1.4286 A, 125 °C 5 / (0.7 + 3) = 1.3514 A; the switch node moves
     * 48 V in 15 nC / I: 48·1.4286 / 15 nC = 4.571 V/ns and 48·1.3514 / 15 nC = 4.324 V/ns. TST-D1 on
     * the same switch: 5/5 = 1 A → 3.2 V/ns, 5/5.8 = 0.862 A → 2.759 V/ns.
     */

    private static Parts.Dr strongSource() {
        Parts.Dr d = Parts.dr();
        d.pn = "TST-D3";
        d.rSource = 0.5;
        return d;
    }

    private static List<Row> unlikeHalves() {
        return List.of(stage("HS", 2, "TST-D3", "TST-S1", "side", "high", "leg", "A", "bridge", "yes"),
                stage("LS", 3, "TST-D1", "TST-S1", "leg", "A", "bridge", "yes"), stage("X", 4, "TST-D1", "TST-S1"));
    }

    @Test
    void eachStageOfABridgeIsJudgedOnItsPartnersTurnOn() {
        Report rep = StageSheets.run(unlikeHalves(), null, List.of(DRIVERS.get(0), StageSheets.driverRow(strongSource())),
                SWITCHES);
        Check ls = check(stageOf(rep, "LS"), Rule.DV_DT);
        assertTrue(ls.message().startsWith("at 125 °C the switch node slews at 4.32 V/ns (HS's turn-on)"), ls.message());
        assertEquals("HS", stageOf(rep, "LS").point().twin().name());
        assertEquals(4.571e9, stageOf(rep, "LS").point().twin().slewCold(), 4.571e9 * 1e-3);
        assertEquals(4.324e9, stageOf(rep, "LS").point().twin().slewHot(), 4.324e9 * 1e-3);
        Check hs = check(stageOf(rep, "HS"), Rule.DV_DT);
        assertTrue(hs.message().contains("slews at 2.76 V/ns (LS's turn-on)"), hs.message());
        assertEquals(3.2e9, stageOf(rep, "HS").point().twin().slewCold(), 3.2e9 * 1e-3);
        assertEquals(2.759e9, stageOf(rep, "HS").point().twin().slewHot(), 2.759e9 * 1e-3);
        assertNull(stageOf(rep, "X").point().twin(), "X is in no bridge");
    }

    @Test
    void partnerFindsTheBridgeAsCheckDoes() {
        List<Row> rows = unlikeHalves();
        PartSource parts = StageSheets.parts(List.of(DRIVERS.get(0), StageSheets.driverRow(strongSource())), SWITCHES);
        StageCheck.Partner p = StageCheck.partner(rows, rows.get(1), null, parts, Margins.DEFAULT);
        assertEquals("HS", p.partner());
        assertEquals("HS", p.twin().name());
        assertEquals(4.571e9, p.twin().slewCold(), 4.571e9 * 1e-3);
        assertEquals(4.324e9, p.twin().slewHot(), 4.324e9 * 1e-3);
        assertTrue(p.unresolved().isEmpty());

        StageCheck.Partner q = StageCheck.partner(rows, rows.get(0), null, parts, Margins.DEFAULT);
        assertEquals("LS", q.partner());
        assertEquals(3.2e9, q.twin().slewCold(), 3.2e9 * 1e-3);
        assertEquals(2.759e9, q.twin().slewHot(), 2.759e9 * 1e-3);

        StageCheck.Partner none = StageCheck.partner(rows, rows.get(2), null, parts, Margins.DEFAULT);
        assertEquals(new StageCheck.Partner(null, null, List.of()), none);
    }

    @Test
    void aPartnerWithoutABusHasNoEdgeAndAnUnresolvedStageIsNoPartner() {
        PartSource parts = StageSheets.parts(DRIVERS, SWITCHES);
        List<Row> rows = List.of(stage("HS", 2, "TST-D1", "TST-S1", "side", "high", "leg", "A", "bus_v", null),
                stage("LS", 3, "TST-D1", "TST-S1", "leg", "A"), stage("H2", 4, "TST-D1", "TST-S9", "side", "high",
                        "leg", "B"), stage("L2", 5, "TST-D1", "TST-S1", "leg", "B"));
        StageCheck.Partner p = StageCheck.partner(rows, rows.get(1), null, parts, Margins.DEFAULT);
        assertEquals("HS", p.partner());
        assertNull(p.twin(), "no bus, no dv/dt: the stage keeps its own pair as the twin");
        assertEquals(List.of("H2"), p.unresolved());
        StageCheck.Partner q = StageCheck.partner(rows, rows.get(3), null, parts, Margins.DEFAULT);
        assertNull(q.partner());
        assertNull(q.twin());
    }

    @Test
    void partnerWantsARowOfTheSheet() {
        List<Row> rows = List.of(stage("LS", 2, "TST-D1", "TST-S1"));
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> StageCheck.partner(rows,
                stage("LS", 9, "TST-D1", "TST-S1", "bus_v", 12.0), null, StageSheets.parts(DRIVERS, SWITCHES),
                Margins.DEFAULT));
        assertEquals("expected a row of the stage sheet, got line 9", e.getMessage());
    }
}
