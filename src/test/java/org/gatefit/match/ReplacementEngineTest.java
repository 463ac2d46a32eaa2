package org.gatefit.match;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.gatefit.catalog.Kind;
import org.gatefit.catalog.Row;
import org.junit.jupiter.api.Test;

/**
 * {@link Replacement#search} over an in-memory catalog ({@link ListParts}): the prefilter, the
 * grades and the reasons worded for each, the 10 % tolerance on essential ratings at its edge, the
 * score, {@code top}, obsolete parts, {@code --all}'s list of parts not offered, and the stage
 * re-checks with a candidate in place. Expectations follow the class's javadoc and the README's
 * replace section (grades; ±20 % and ±0.5 V windows and the 10 % rating tolerance, common practice,
 * no source); scores are the documented product availability × max(0.2, 1 − 0.05 per re-verify −
 * 0.1 per worse rating) × stage score, worked by hand below (Lifecycle: active 1.0, out of stock
 * × 0.8, common practice, no source).
 */
class ReplacementEngineTest {

    /** The original switch of {@link ReplacementTest} with {@code changes}. */
    private static Row sw(String pn, Map<String, Object> changes) {
        return ReplacementTest.sw(pn, changes);
    }

    private static Replacement.Result search(List<Row> catalog, Row original, int top, boolean obsolete,
                                             boolean listAll) throws Exception {
        List<Row> all = new ArrayList<>(catalog);
        all.add(original);
        return Replacement.search(new ListParts(all), original, top, obsolete, listAll, "", List.of(), null,
                Margins.DEFAULT);
    }

    private static Replacement.Candidate find(Replacement.Result r, String pn) {
        return r.candidates().stream().filter(c -> c.partNumber().equals(pn)).findFirst()
                .orElseThrow(() -> new AssertionError(pn + " not offered: " + r.notOfferedParts()));
    }

    private static boolean offered(Replacement.Result r, String pn) {
        return r.candidates().stream().anyMatch(c -> c.partNumber().equals(pn));
    }

    private static String reason(Replacement.Result r, String pn) {
        return r.notOfferedParts().stream().filter(n -> n.partNumber().equals(pn)).map(Replacement.NotOffered::reason)
                .findFirst().orElseThrow(() -> new AssertionError(pn + " not listed: " + r.notOfferedParts()));
    }

    @Test
    void thePrefilterRequiresTheRequiredEssentialsWithinTheTolerance() {
        // switch: technology, blocking voltage and both V_GS limits are essential and required columns
        Row s = sw("TST-O", Map.of());
        // 100 V − 10 % = 90 V; +20 V − 10 % of 20 = 18 V; −20 V + 10 % of 20 = −18 V
        assertEquals(List.of("technology = si-mosfet", "v_block_v >= 90", "v_gs_max_v >= 18", "v_gs_min_v <= -18",
                "lifecycle != obsolete"), Replacement.prefilter(s, false).describe());
        assertEquals(List.of("technology = si-mosfet", "v_block_v >= 90", "v_gs_max_v >= 18", "v_gs_min_v <= -18"),
                Replacement.prefilter(s, true).describe());
        // driver: topology and input polarity (channel count, offset and isolation are not required columns)
        Row d = ListParts.driverRow(Parts.dr());
        assertEquals(List.of("topology = half-bridge", "input_polarity = non-inverting", "lifecycle != obsolete"),
                Replacement.prefilter(d, false).describe());
    }

    @Test
    void theToleranceIsTenPercentOfTheMagnitude() {
        assertEquals(90.0, Replacement.tolerated(org.gatefit.catalog.Column.Compare.HIGHER, 100), 1e-12);
        assertEquals(-18.0, Replacement.tolerated(org.gatefit.catalog.Column.Compare.LOWER, -20), 1e-12);
        assertEquals(-22.0, Replacement.tolerated(org.gatefit.catalog.Column.Compare.HIGHER, -20), 1e-12);
        assertEquals(5.5, Replacement.tolerated(org.gatefit.catalog.Column.Compare.LOWER, 5), 1e-12);
    }

    /** A catalog around the original TST-O with one change each, and what the README's rules make of it. */
    private static List<Row> catalog() {
        return List.of(
                sw("TST-SAME", Map.of()),
                sw("TST-BETTER", Map.of("r_on_mohm", 2.5, "v_block_v", 120.0)),
                sw("TST-RON", Map.of("r_on_mohm", 3.5)),
                sw("TST-RON-ICONT", Map.of("r_on_mohm", 3.5, "i_cont_a", 150.0)),
                sw("TST-QG", Map.of("q_g_nc", 130.0)),
                sw("TST-QG-CISS", Map.of("q_g_nc", 130.0, "c_iss_pf", 9000.0)),
                sw("TST-VB90", Map.of("v_block_v", 90.0)),
                sw("TST-VB89", Map.of("v_block_v", 89.9)),
                sw("TST-GS18", Map.of("v_gs_min_v", -18.0)),
                sw("TST-GS17", Map.of("v_gs_min_v", -17.9)),
                sw("TST-SIC", Map.of("technology", "sic-mosfet")),
                sw("TST-OTHER", Map.of("pinout", "TP7")),
                sw("TST-OTHER-RON", Map.of("pinout", "TP7", "r_on_mohm", 3.5)),
                sw("TST-OTHER-VB95", Map.of("pinout", "TP7", "v_block_v", 95.0)),
                sw("TST-OTHER-OLD", Map.of("pinout", "TP7", "lifecycle", "obsolete")),
                sw("TST-OLD", Map.of("lifecycle", "obsolete")),
                sw("TST-NOSTOCK", Map.of("stock", 0L)),
                sw("TST-MANY", Map.of("r_on_mohm", 3.5, "i_cont_a", 150.0, "r_on_vgs_v", 12.0, "q_g_nc", 130.0,
                        "c_iss_pf", 9000.0, "v_th_min_v", 3.0, "v_th_max_v", 5.0)));
    }

    @Test
    void gradesAndReasonsFollowTheDocumentedRules() throws Exception {
        Row original = sw("TST-O", Map.of());
        Replacement.Result r = search(catalog(), original, 100, false, true);
        assertEquals("TST-O", r.part());
        assertEquals(Kind.SWITCH, r.kind());
        assertTrue(r.listed());
        // drop-in: same pinout, nothing worse, nothing to re-verify
        assertEquals(Replacement.Grade.DROP_IN, find(r, "TST-SAME").grade());
        assertEquals(List.of(), find(r, "TST-SAME").reasons());
        assertEquals(1.0, find(r, "TST-SAME").score(), 1e-12, "1.0 × max(0.2, 1) = 1");
        assertEquals(Replacement.Grade.DROP_IN, find(r, "TST-BETTER").grade());
        // pin-compatible: one or more worse ratings
        Replacement.Candidate ron = find(r, "TST-RON");
        assertEquals(Replacement.Grade.PIN_COMPATIBLE, ron.grade());
        assertEquals(List.of("1 rating is worse than the original's"), ron.reasons());
        assertEquals(0.9, ron.score(), 1e-12, "1 − 0.1·1 = 0.9");
        assertEquals(List.of("2 ratings are worse than the original's"), find(r, "TST-RON-ICONT").reasons());
        assertEquals(0.8, find(r, "TST-RON-ICONT").score(), 1e-12, "1 − 0.1·2 = 0.8");
        // pin-compatible: outside a window (Q_g 130 nC against 100 nC ± 20 %)
        assertEquals(List.of("1 parameter outside the re-verify window"), find(r, "TST-QG").reasons());
        assertEquals(0.95, find(r, "TST-QG").score(), 1e-12, "1 − 0.05·1 = 0.95");
        assertEquals(List.of("2 parameters outside the re-verify window"), find(r, "TST-QG-CISS").reasons());
        assertEquals(0.9, find(r, "TST-QG-CISS").score(), 1e-12, "1 − 0.05·2 = 0.9");
        // many differences: 3 worse (R_on, I_cont, R_on V_GS) and 4 re-verify → 1 − 0.3 − 0.2 = 0.5
        assertEquals(0.5, find(r, "TST-MANY").score(), 1e-12);
        // out of stock: availability 1.0 × 0.8
        Replacement.Candidate none = find(r, "TST-NOSTOCK");
        assertEquals(Replacement.Grade.DROP_IN, none.grade());
        assertEquals(0.8, none.score(), 1e-12);
        assertEquals(0L, none.stock());
        // an essential rating short by no more than 10 %: re-verify, pin-compatible at best
        Replacement.Candidate vb90 = find(r, "TST-VB90");
        assertEquals(Replacement.Grade.PIN_COMPATIBLE, vb90.grade());
        assertEquals(List.of("blocking voltage 100 → 90 V falls short of the original's rating by less than the 10 %"
                + " tolerance: re-verify that the design does not need it"), vb90.reasons());
        assertEquals(0.95, vb90.score(), 1e-12, "one re-verify");
        assertEquals(Replacement.Grade.PIN_COMPATIBLE, find(r, "TST-GS18").grade());
        // just past it: not offered, and why
        assertFalse(offered(r, "TST-VB89"));
        assertEquals("blocking voltage 89.9 V against 100 V: short by more than the 10 % tolerance (must be equal or"
                + " higher)", reason(r, "TST-VB89"));
        assertFalse(offered(r, "TST-GS17"));
        assertEquals("V_GS min -17.9 V against -20 V: short by more than the 10 % tolerance (must be equal or lower)",
                reason(r, "TST-GS17"));
        assertEquals("technology sic-mosfet, not si-mosfet (must be equal)", reason(r, "TST-SIC"));
        // functional: another pinout, nothing worse
        Replacement.Candidate other = find(r, "TST-OTHER");
        assertEquals(Replacement.Grade.FUNCTIONAL, other.grade());
        assertEquals(List.of("other pinout (TP7): new footprint or layout"), other.reasons());
        assertEquals("other pinout (TP7) and a worse rating: R_DS(on) 3 → 3.5 mΩ", reason(r, "TST-OTHER-RON"));
        assertEquals("other pinout (TP7) and a rating short of the original's: blocking voltage 100 → 95 V",
                reason(r, "TST-OTHER-VB95"));
        // obsolete parts are left out unless asked for
        assertEquals("obsolete (--include-obsolete considers it)", reason(r, "TST-OLD"));
        assertEquals("obsolete (--include-obsolete considers it)", reason(r, "TST-OTHER-OLD"));
        // counts: the catalog's 19 switches less the original, which is not its own candidate; 11 offered
        assertEquals(18, r.considered());
        assertEquals(11, r.candidates().size());
        assertEquals(7, r.notOffered());
        assertEquals(r.notOffered(), r.notOfferedParts().size(), "--all lists every part not offered");
        assertFalse(offered(r, "TST-O"));
        // the list of parts not offered is in part-number order
        List<String> listed = r.notOfferedParts().stream().map(Replacement.NotOffered::partNumber).toList();
        assertEquals(listed.stream().sorted().toList(), listed);
        // best first: grade, then score, then price, then part number
        assertEquals(List.of("TST-BETTER", "TST-SAME", "TST-NOSTOCK"),
                r.candidates().subList(0, 3).stream().map(Replacement.Candidate::partNumber).toList());
        assertEquals(Replacement.Grade.FUNCTIONAL, r.candidates().get(r.candidates().size() - 1).grade());
    }

    @Test
    void theScoreNeverFallsBelowItsFloor() throws Exception {
        Map<String, Object> rich = new LinkedHashMap<>();
        rich.put("q_gs_nc", 30.0);
        rich.put("q_gd_nc", 30.0);
        rich.put("v_plateau_v", 5.0);
        rich.put("c_rss_pf", 100.0);
        rich.put("r_g_int_ohm", 1.0);
        rich.put("v_gate_on_v", 10.0);
        rich.put("v_gate_off_v", 0.0);
        Row original = sw("TST-O", rich);
        Map<String, Object> all = new LinkedHashMap<>();
        // 3 worse ratings (I_cont, R_on, its V_GS) and 11 windows left (Q_g, Q_gs, Q_gd, C_iss, C_rss, R_g,int,
        // V_th min and max, plateau, on and off levels)
        all.putAll(Map.of("i_cont_a", 150.0, "r_on_mohm", 3.5, "r_on_vgs_v", 12.0, "q_g_nc", 130.0, "q_gs_nc", 40.0,
                "q_gd_nc", 40.0, "c_iss_pf", 9000.0, "c_rss_pf", 150.0, "r_g_int_ohm", 2.0, "v_th_min_v", 3.0));
        all.putAll(Map.of("v_th_max_v", 5.0, "v_plateau_v", 6.0, "v_gate_on_v", 12.0, "v_gate_off_v", -5.0));
        Map<String, Object> worst = new LinkedHashMap<>(rich);
        worst.putAll(all);
        Map<String, Object> near = new LinkedHashMap<>(rich);
        near.putAll(all);
        near.put("v_gate_off_v", 0.0); // 10 windows: 1 − 0.3 − 0.5 = 0.2 exactly
        Replacement.Result r = search(List.of(sw("TST-WORST", worst), sw("TST-NEAR", near)), original, 10, false, false);
        assertEquals(List.of("3 ratings are worse than the original's", "11 parameters outside the re-verify window"),
                find(r, "TST-WORST").reasons());
        assertEquals(0.2, find(r, "TST-WORST").score(), 1e-12, "1 − 0.1·3 − 0.05·11 = 0.15, held at 0.2");
        assertEquals(0.2, find(r, "TST-NEAR").score(), 1e-12, "1 − 0.1·3 − 0.05·10 = 0.2");
    }

    @Test
    void obsoletePartsWhenAskedForArePinCompatibleAtBest() throws Exception {
        Row original = sw("TST-O", Map.of());
        Replacement.Result r = search(catalog(), original, 100, true, true);
        Replacement.Candidate old = find(r, "TST-OLD");
        assertEquals(Replacement.Grade.PIN_COMPATIBLE, old.grade());
        assertEquals(List.of("it is obsolete"), old.reasons());
        assertEquals(0.3, old.score(), 1e-12, "obsolete availability 0.3");
        assertEquals("other pinout (TP7) and obsolete", reason(r, "TST-OTHER-OLD"));
        assertEquals("obsolete", old.lifecycle());
    }

    @Test
    void theDifferencesNameEachParameterOnce() throws Exception {
        Row original = sw("TST-O", Map.of());
        Map<String, Object> noQg = new LinkedHashMap<>();
        noQg.put("q_g_nc", null);
        noQg.put("pinout", "TP7");
        Replacement.Result r = search(List.of(sw("TST-RON", Map.of("r_on_mohm", 3.5)), sw("TST-NOQG", noQg)), original,
                10, false, false);
        List<Replacement.Difference> d = find(r, "TST-RON").differences();
        assertEquals(new Replacement.Difference("pinout", "pinout", "TP8", "TP8", "", "equal"), d.get(0));
        assertTrue(d.contains(new Replacement.Difference("r_on_mohm", "R_DS(on)", "3", "3.5", "mΩ", "worse")), d::toString);
        assertTrue(d.contains(new Replacement.Difference("v_block_v", "blocking voltage", "100", "100", "V", "equal")),
                d::toString);
        // a value the original lacks is not compared
        assertTrue(d.stream().noneMatch(x -> x.parameter().equals("q_gd_nc")), d::toString);
        Replacement.Candidate noqg = find(r, "TST-NOQG");
        assertEquals(new Replacement.Difference("pinout", "pinout", "TP8", "TP7", "", "re-verify"),
                noqg.differences().get(0));
        assertTrue(noqg.differences().contains(new Replacement.Difference("q_g_nc", "gate charge Q_g", "100", "unknown",
                "nC", "re-verify")), noqg.differences()::toString);
        assertEquals(Replacement.Grade.FUNCTIONAL, noqg.grade(), "an unknown is re-verified, not worse");
        assertEquals("TP7", noqg.pinout());
        assertEquals("Testmaker", noqg.maker());
        assertEquals(2.0, noqg.price());
        assertEquals(1000L, noqg.stock());
        assertEquals("active", noqg.lifecycle());
    }

    @Test
    void withoutListingThePrefilterSkipsOnlyPartsThatWouldNotBeOffered() throws Exception {
        Row original = sw("TST-O", Map.of());
        Replacement.Result listed = search(catalog(), original, 100, false, true);
        List<Row> all = new ArrayList<>(catalog());
        all.add(original);
        ListParts parts = new ListParts(all);
        Replacement.Result r = Replacement.search(parts, original, 100, false, "", List.of(), null, Margins.DEFAULT);
        assertEquals(listed.candidates(), r.candidates());
        assertEquals(listed.notOffered(), r.notOffered());
        assertEquals(listed.considered(), r.considered());
        assertFalse(r.listed());
        assertEquals(List.of(), r.notOfferedParts());
        // the prefilter did skip: the technology, the short ratings past the tolerance and the obsolete parts
        for (String pn : List.of("TST-SIC", "TST-VB89", "TST-GS17", "TST-OLD", "TST-OTHER-OLD")) {
            assertFalse(parts.scanned.contains(pn), pn + " scanned");
        }
        assertTrue(parts.scanned.contains("TST-VB90"), "at the tolerance: scanned");
        assertTrue(parts.scanned.contains("TST-GS18"), "at the tolerance: scanned");
    }

    @Test
    void topKeepsTheBestCandidatesAndCountsTheRest() throws Exception {
        Row original = sw("TST-O", Map.of());
        Replacement.Result all = search(catalog(), original, 100, false, false);
        for (int top : new int[] {1, 2, 5}) {
            Replacement.Result r = search(catalog(), original, top, false, false);
            assertEquals(all.candidates().subList(0, top), r.candidates(), "top " + top);
            assertEquals(all.notOffered(), r.notOffered(), "offered counts every part offered, listed or not");
        }
        Replacement.Result none = search(catalog(), original, 0, false, false);
        assertEquals(List.of(), none.candidates());
        assertEquals(all.notOffered(), none.notOffered());
    }

    @Test
    void anEmptyCatalogConsidersNothing() throws Exception {
        Row original = sw("TST-O", Map.of());
        Replacement.Result r = Replacement.search(new ListParts(List.of()), original, 5, false, "", List.of(), null,
                Margins.DEFAULT);
        assertEquals(0, r.considered());
        assertEquals(0, r.notOffered());
        assertEquals(List.of(), r.candidates());
    }

    // ---------------------------------------------------------------- stages

    private static Row stage(String id, String driver, String sw) {
        Map<String, Object> v = new LinkedHashMap<>();
        v.put("stage", id);
        v.put("driver", driver);
        v.put("switch", sw);
        v.put("side", "low");
        v.put("bus_v", 48.0);
        v.put("f_sw_khz", 100.0);
        v.put("edge_ns", 50.0);
        v.put("v_drive_v", 10.0);
        v.put("v_drive_neg_v", 0.0);
        v.put("logic", "lvcmos-3v3");
        v.put("r_g_ohm", 2.0);
        v.put("loop_nh", 10.0);
        v.put("bridge", "no");
        return new Row(Kind.STAGE, id, "stages.csv", 2, v, Map.of());
    }

    private static Row driver(String pn, java.util.function.Consumer<Parts.Dr> change) {
        Parts.Dr d = Parts.dr();
        d.pn = pn;
        change.accept(d);
        return ListParts.driverRow(d);
    }

    @Test
    void stagesAreReCheckedWithTheCandidateInPlace() throws Exception {
        Row original = driver("TST-D1", d -> { });
        List<Row> parts = new ArrayList<>(List.of(original, ListParts.switchRow(Parts.sw()),
                driver("TST-DSAME", d -> { }),
                // V_IH 2.75 V against LVCMOS V_OH 2.8 V: a noise margin of 0.05 V, under the 0.1 V margin
                // (REFERENCES.md §6, JESD8C.01 at V_DD 3.0 V); V_IH is a rating, lower is better
                driver("TST-DVIH", d -> d.vIh = 2.75),
                // 0.2 A: a window parameter outside ±20 %, and the drive current fails
                driver("TST-DWEAK", d -> {
                    d.iSource = 0.02;
                    d.iSink = 0.02;
                }),
                driver("TST-DNRND", d -> d.lifecycle = "nrnd")));
        Row fast = stage("ST3", "TST-D1", "TST-S1");
        Map<String, Object> fv = new LinkedHashMap<>(fast.values());
        fv.put("f_sw_khz", 400.0);
        fv.put("edge_ns", 20.0);
        fast = new Row(Kind.STAGE, "ST3", "stages.csv", 4, fv, Map.of());
        List<Row> stages = List.of(stage("ST1", "TST-D1", "TST-S1"), stage("ST2", "TST-D9", "TST-S1"), fast);
        Replacement.Result r = Replacement.search(new ListParts(parts), original, 10, false, true, "stages.csv", stages,
                null, Margins.DEFAULT);
        assertEquals(List.of("ST1", "ST3"), r.stagesUsing(), "the stage with another driver is not re-checked");
        StageCheck.Report base = StageCheck.run("stages.csv", List.of(stages.get(0), stages.get(2)), null,
                pn -> new ListParts(parts).get(Kind.DRIVER, pn), pn -> new ListParts(parts).get(Kind.SWITCH, pn),
                Margins.DEFAULT);
        StageCheck.StageResult was = base.results().get(0);
        StageCheck.StageResult was3 = base.results().get(1);
        assertTrue(was.score() != was3.score(), "two stages of different scores");
        assertEquals(was.checks().stream().filter(c -> c.verdict() != Verdict.PASS).count()
                + was3.checks().stream().filter(c -> c.verdict() != Verdict.PASS).count(), r.standing().size());

        Replacement.Candidate same = find(r, "TST-DSAME");
        assertEquals(Replacement.Grade.DROP_IN, same.grade());
        assertEquals(List.of(new Replacement.StageOutcome("ST1", was.verdict(), was.verdict(), Replacement.Change.UNCHANGED),
                new Replacement.StageOutcome("ST3", was3.verdict(), was3.verdict(), Replacement.Change.UNCHANGED)),
                same.stages());
        assertEquals(List.of(), same.checks());
        assertEquals((was.score() + was3.score()) / 2, same.score(), 1e-12, "1.0 × 1 × the mean of the stages' scores");

        Replacement.Candidate vih = find(r, "TST-DVIH");
        assertEquals(Replacement.Grade.PIN_COMPATIBLE, vih.grade());
        assertEquals(List.of("1 rating is worse than the original's",
                "a stage check gets a worse verdict with it in place"), vih.reasons());
        Replacement.StageNote n = vih.checks().get(0);
        assertEquals("ST1", n.stage());
        assertEquals("logic-level", n.rule());
        assertEquals(Verdict.WARN, n.verdict());
        assertEquals(Verdict.PASS, n.was());
        assertEquals(Replacement.Change.WORSE, vih.stages().get(0).change());

        Replacement.Candidate weak = find(r, "TST-DWEAK");
        assertEquals(Replacement.Grade.PIN_COMPATIBLE, weak.grade());
        assertTrue(weak.reasons().contains("a stage fails with it in place"), weak.reasons()::toString);
        assertEquals(Verdict.FAIL, weak.stages().get(0).verdict());
        assertTrue(weak.checks().stream().anyMatch(c -> c.rule().equals("drive-current") && c.verdict() == Verdict.FAIL),
                weak.checks()::toString);

        // a worse lifecycle is said and makes the stage worse, but it is the candidate's own status, not a stage
        // check that got worse: still drop-in on its ratings
        Replacement.Candidate nrnd = find(r, "TST-DNRND");
        assertEquals(Replacement.Change.WORSE, nrnd.stages().get(0).change());
        assertEquals(List.of("ST1 lifecycle", "ST3 lifecycle"),
                nrnd.checks().stream().map(x -> x.stage() + " " + x.rule()).toList());
        assertEquals(Replacement.Grade.DROP_IN, nrnd.grade());
    }

    @Test
    void aBetterLifecycleIsABetterStageButNotANote() throws Exception {
        Row original = driver("TST-D1", d -> d.lifecycle = "nrnd");
        Row other = driver("TST-DOK", d -> d.pn = "TST-DOK");
        Map<String, Object> pin = new LinkedHashMap<>(other.values());
        pin.put("pinout", "PKG2");
        Row otherPinWeak = driver("TST-DPIN", d -> {
            d.iSource = 0.02;
            d.iSink = 0.02;
        });
        Map<String, Object> wp = new LinkedHashMap<>(otherPinWeak.values());
        wp.put("pinout", "PKG2");
        List<Row> parts = List.of(original, other, ListParts.switchRow(Parts.sw()),
                new Row(Kind.DRIVER, "TST-DPIN", "test", 2, wp, Map.of()));
        Replacement.Result r = Replacement.search(new ListParts(parts), original, 10, false, true, "stages.csv",
                List.of(stage("ST1", "TST-D1", "TST-S1")), null, Margins.DEFAULT);
        Replacement.Candidate ok = find(r, "TST-DOK");
        assertEquals(Replacement.Change.BETTER, ok.stages().get(0).change());
        assertEquals(List.of(), ok.checks(), "the lifecycle that improved is the candidate's own, shown in its row");
        assertEquals(Replacement.Grade.DROP_IN, ok.grade());
        assertTrue(r.standing().stream().anyMatch(s -> s.rule().equals("lifecycle") && s.verdict() == Verdict.WARN),
                r.standing()::toString);
        assertEquals("other pinout (PKG2) and stage ST1 fails with it in place", reason(r, "TST-DPIN"));
    }

    @Test
    void aSwitchIsReCheckedInItsStagesToo() throws Exception {
        Row original = ListParts.switchRow(Parts.sw());
        Parts.Sw same = Parts.sw();
        same.pn = "TST-SSAME";
        Parts.Sw heavy = Parts.sw();
        heavy.pn = "TST-SHEAVY";
        // Q_gd 300 nC moved in the 50 ns edge needs 300 nC / 50 ns = 6 A on the plateau (REFERENCES.md §1,
        // I = Q / t), more than the 4 A driver gives: the drive-current check fails
        heavy.qGd = 300e-9;
        heavy.qG = 50e-9 * 1.1;
        List<Row> parts = List.of(original, ListParts.switchRow(same), ListParts.switchRow(heavy),
                ListParts.driverRow(Parts.dr()));
        Replacement.Result r = Replacement.search(new ListParts(parts), original, 10, false, false, "stages.csv",
                List.of(stage("ST1", "TST-D1", "TST-S1")), null, Margins.DEFAULT);
        assertEquals(List.of("ST1"), r.stagesUsing());
        Replacement.Candidate s = find(r, "TST-SSAME");
        assertEquals(Replacement.Grade.DROP_IN, s.grade());
        assertEquals(Replacement.Change.UNCHANGED, s.stages().get(0).change());
        Replacement.Candidate h = find(r, "TST-SHEAVY");
        assertEquals(Verdict.FAIL, h.stages().get(0).verdict());
        assertEquals(Replacement.Change.WORSE, h.stages().get(0).change());
        assertTrue(h.reasons().contains("a stage fails with it in place"), h.reasons()::toString);
        assertTrue(h.checks().stream().anyMatch(c -> c.rule().equals("drive-current") && c.verdict() == Verdict.FAIL),
                h.checks()::toString);
    }

    @Test
    void equalCandidatesAreRankedByPriceUnknownLastThenPartNumber() throws Exception {
        Row original = sw("TST-O", Map.of());
        Map<String, Object> unknown = new LinkedHashMap<>();
        unknown.put("unit_price", null);
        Replacement.Result r = search(List.of(sw("TST-P1", Map.of("unit_price", 1.5)), sw("TST-P2", unknown),
                sw("TST-P4", Map.of("unit_price", 1.0)), sw("TST-P3", Map.of("unit_price", 1.0))), original, 10, false,
                false);
        assertEquals(List.of("TST-P3", "TST-P4", "TST-P1", "TST-P2"),
                r.candidates().stream().map(Replacement.Candidate::partNumber).toList());
    }

    @Test
    void partsNotOfferedAreListedInPartNumberOrderWhateverOrderTheyCome() {
        Row original = sw("TST-O", Map.of());
        Replacement.Search s = new Replacement.Search(original, 5, false, "", List.of(), null, pn -> Optional.empty(),
                pn -> Optional.empty(), Margins.DEFAULT, true);
        for (String pn : List.of("TST-Z", "TST-M", "TST-A")) {
            s.accept(sw(pn, Map.of("technology", "gan-hemt")));
        }
        s.accept(sw("TST-B", Map.of("lifecycle", "obsolete")));
        Replacement.Result r = s.result(5);
        assertEquals(List.of("TST-A", "TST-B", "TST-M", "TST-Z"),
                r.notOfferedParts().stream().map(Replacement.NotOffered::partNumber).toList());
        assertEquals(4, r.notOffered());
    }

    @Test
    void changesAndGradesAreSaidInTheReadmesWords() {
        assertEquals(List.of("unchanged", "better", "worse"),
                java.util.Arrays.stream(Replacement.Change.values()).map(Replacement.Change::id).toList());
        assertEquals(List.of("drop-in", "pin-compatible", "functional"),
                java.util.Arrays.stream(Replacement.Grade.values()).map(Replacement.Grade::id).toList());
    }

    // ---------------------------------------------------------------- the parameter table

    @Test
    void theParameterTableSaysEachSense() {
        Map<String, String> s = new LinkedHashMap<>();
        Replacement.parameterTable(Kind.SWITCH).forEach(e -> s.put(e.getKey(), e.getValue()));
        assertEquals("must be equal", s.get("technology"));
        assertEquals("must be equal or higher", s.get("v_block_v"));
        assertEquals("must be equal or lower", s.get("v_gs_min_v"));
        assertEquals("higher is better", s.get("i_cont_a"));
        assertEquals("lower is better", s.get("r_on_mohm"));
        assertEquals("re-verify outside ±20 %", s.get("q_g_nc"));
        assertEquals("re-verify outside ±50 %", s.get("r_g_int_ohm"));
        assertEquals("re-verify outside ±0.5 V", s.get("v_th_min_v"));
        // essentials first, then ratings, then windows
        List<String> order = List.copyOf(s.keySet());
        assertEquals(List.of("technology", "channel", "v_block_v", "v_gs_max_v", "v_gs_min_v"), order.subList(0, 5));
        Map<String, String> d = new LinkedHashMap<>();
        Replacement.parameterTable(Kind.DRIVER).forEach(e -> d.put(e.getKey(), e.getValue()));
        assertEquals("yes is better", d.get("bootstrap_diode"));
        assertEquals("must be equal", d.get("channels"));

        String md = Replacement.parameterMarkdown();
        assertTrue(md.startsWith("| switch parameter | class | rule |\n| --- | --- | --- |\n| `technology` | essential |"
                + " must be equal |\n"), md);
        assertTrue(md.contains("| `i_cont_a` | rating | higher is better |\n"), md);
        assertTrue(md.contains("| `q_g_nc` | window | re-verify outside ±20 % |\n"), md);
        assertTrue(md.contains("| `v_th_min_v` | window | re-verify outside ±0.5 V |\n"), md);
        assertTrue(md.contains("\n\n| driver parameter | class | rule |\n"), md);
        assertTrue(md.contains("| `bootstrap_diode` | rating | yes is better |\n"), md);
    }

    @Test
    void aCatalogLookupFindsPartsByKind() {
        Row s = sw("TST-O", Map.of());
        ListParts parts = new ListParts(List.of(s));
        assertEquals(Optional.of(s), Replacement.lookup(parts, Kind.SWITCH, "tst-o"));
        assertEquals(Optional.empty(), Replacement.lookup(parts, Kind.DRIVER, "TST-O"));
    }
}
