package org.gatefit.match;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.function.Predicate;
import org.gatefit.catalog.Op;
import org.gatefit.catalog.Row;
import org.gatefit.physics.LogicFamily;
import org.junit.jupiter.api.Test;

/**
 * {@link Shortlist#run} over an in-memory catalog ({@link ListParts}). The reference is the rules
 * themselves: every driver evaluated on its own ({@link Rules#evaluate} with the shortlist's
 * question), the failing ones left out unless all are asked for, the rest sorted by the documented
 * order ({@link Shortlist#RANKING}: verdict, score, price with unknown last, part number). The
 * engine must list exactly those, whatever the number of partitions and the {@code top} asked
 * for, and its counts must add up to the full evaluation's — with the prefilter (from
 * {@link Shortlist#PREFILTER_FROM} drivers) the skipped drivers count as failing.
 */
class ShortlistEngineTest {

    /** The full evaluation: every driver's result, by the shortlist's question. */
    private static List<PairResult> full(List<Row> drivers, SwitchPart sw, OperatingPoint op, Predicate<Row> keep) {
        Question q = Question.ofShortlist(sw, op, Margins.DEFAULT);
        List<PairResult> out = new ArrayList<>();
        for (Row r : drivers) {
            if (keep.test(r)) {
                DriverPart d = DriverPart.of(r);
                out.add(Rules.evaluate(d, q).withPrice(d.price()));
            }
        }
        out.sort(Shortlist.RANKING);
        return out;
    }

    private static List<String> names(List<PairResult> rs) {
        return rs.stream().map(PairResult::driver).toList();
    }

    private static long count(List<PairResult> rs, Verdict... vs) {
        return rs.stream().filter(r -> List.of(vs).contains(r.verdict())).count();
    }

    private static List<PairResult> working(List<PairResult> rs) {
        return rs.stream().filter(r -> r.verdict() != Verdict.FAIL).toList();
    }

    private static OperatingPoint highSide48(SwitchPart sw) {
        OperatingPoint.Spec s = Parts.op();
        s.highSide = true;
        s.dutyMax = 0.5;
        s.vDrive = 12.0;
        return s.resolve(sw);
    }

    /**
     * A catalog of {@code n} drivers: a third from the prefilter test's spread (mostly failing), the
     * rest the baseline driver of {@link Parts} with other currents, output resistances, topologies,
     * lifecycles, stock and prices (mostly passing or warning, many with equal scores).
     */
    static List<Row> mixed(int n) {
        List<Row> out = new ArrayList<>(PrefilterTest.spread(n / 3));
        java.util.Random rnd = new java.util.Random(7);
        double[] amps = {1, 2, 4, 6, 9};
        double[] ohms = {1, 2, 4};
        double[] prices = {Double.NaN, 0.5, 1, 2};
        String[] life = {"active", "active", "nrnd", "preview"};
        Topology[] tops = {Topology.HALF_BRIDGE, Topology.ISOLATED, Topology.HIGH_SIDE};
        for (int i = out.size(); i < n; i++) {
            Parts.Dr d = Parts.dr();
            d.pn = String.format("TST-MX%04d", i);
            d.iSource = amps[rnd.nextInt(amps.length)];
            d.iSink = amps[rnd.nextInt(amps.length)];
            d.rSource = ohms[rnd.nextInt(ohms.length)];
            d.rSink = ohms[rnd.nextInt(ohms.length)];
            d.price = prices[rnd.nextInt(prices.length)];
            d.lifecycle = life[rnd.nextInt(life.length)];
            d.stock = rnd.nextBoolean() ? 0 : 1000;
            d.topology = tops[rnd.nextInt(tops.length)];
            if (d.topology == Topology.ISOLATED) {
                d.isolationVrms = 5000;
                d.vIorm = 1000;
                d.cmti = 200e9;
                d.bootstrapDiode = null;
            }
            out.add(ListParts.driverRow(d));
        }
        return out;
    }

    @Test
    void aSmallCatalogIsRankedDriverByDriverLikeTheRules() throws Exception {
        List<Row> drivers = mixed(150);
        ListParts parts = new ListParts(drivers);
        SwitchPart sw = Parts.sw().build();
        OperatingPoint op = highSide48(sw);
        List<PairResult> all = full(drivers, sw, op, r -> true);
        List<PairResult> want = working(all);
                assertTrue(count(all, Verdict.PASS) > 10 && count(all, Verdict.WARN) > 10 && count(all, Verdict.FAIL) > 10,
                "a spread of pass, warn and fail");
        for (int threads : new int[] {1, 2, 3}) {
            Shortlist.Result got = Shortlist.run(parts, sw, op, Margins.DEFAULT, 1000, false, threads);
            assertEquals(names(want), names(got.candidates()), "threads " + threads);
            assertEquals(want.stream().map(PairResult::score).toList(),
                    got.candidates().stream().map(PairResult::score).toList());
            assertEquals(count(all, Verdict.PASS), got.passing());
            assertEquals(count(all, Verdict.WARN, Verdict.UNKNOWN), got.warning());
            assertEquals(count(all, Verdict.FAIL), got.failing());
            assertEquals(all.size(), got.evaluated());
            assertEquals(0, got.skipped(), "fewer than " + Shortlist.PREFILTER_FROM + " drivers: no prefilter");
            assertEquals(List.of(), got.prefilter());
            assertEquals(List.of(), got.asked());
            assertEquals(0, got.filteredOut());
            assertEquals(sw, got.switchPart());
            assertEquals(op, got.point());
            assertEquals(Margins.DEFAULT, got.margins());
            // each candidate is worded in full, with its price for ties
            PairResult first = got.candidates().get(0);
            assertEquals(Rules.evaluate(DriverPart.of(parts.get(org.gatefit.catalog.Kind.DRIVER, first.driver())
                    .orElseThrow()), Question.ofShortlist(sw, op, Margins.DEFAULT)).checks(), first.checks());
            assertEquals(DriverPart.of(parts.get(org.gatefit.catalog.Kind.DRIVER, first.driver()).orElseThrow()).price(),
                    first.priceTieBreak());
        }
    }

    @Test
    void topKeepsTheBestOfTheFullRanking() throws Exception {
        List<Row> drivers = mixed(150);
        ListParts parts = new ListParts(drivers);
        SwitchPart sw = Parts.sw().build();
        OperatingPoint op = highSide48(sw);
        List<PairResult> want = working(full(drivers, sw, op, r -> true));
        for (int top : new int[] {1, 2, 7}) {
            for (int threads : new int[] {1, 3}) {
                Shortlist.Result got = Shortlist.run(parts, sw, op, Margins.DEFAULT, top, false, threads);
                assertEquals(names(want.subList(0, top)), names(got.candidates()), "top " + top + ", threads " + threads);
                assertEquals(150, got.evaluated(), "every driver is counted, listed or not");
            }
        }
    }

    @Test
    void allListsTheFailingDriversLast() throws Exception {
        List<Row> drivers = mixed(60);
        ListParts parts = new ListParts(drivers);
        SwitchPart sw = Parts.sw().build();
        OperatingPoint op = highSide48(sw);
        List<PairResult> every = full(drivers, sw, op, r -> true);
        Shortlist.Result got = Shortlist.run(parts, sw, op, Margins.DEFAULT, 1000, true, 2);
        assertEquals(names(every), names(got.candidates()));
        assertEquals(Verdict.FAIL, got.candidates().get(got.candidates().size() - 1).verdict());
        Shortlist.Result ten = Shortlist.run(parts, sw, op, Margins.DEFAULT, 10, true, 2);
        assertEquals(names(every.subList(0, 10)), names(ten.candidates()));
    }

    /** Identical drivers apart from part number and price: ties go to the lower price, unknown last, then the part number. */
    @Test
    void tiesAreBrokenByPriceThenPartNumber() throws Exception {
        List<Row> rows = new ArrayList<>();
        String[][] pnPrice = {{"TST-TB", "2"}, {"TST-TA", "2"}, {"TST-TC", "1"}, {"TST-TD", "NaN"}, {"TST-TE", "0.5"},
            {"TST-TF", "NaN"}};
        for (String[] x : pnPrice) {
            Parts.Dr d = Parts.dr();
            d.pn = x[0];
            d.price = Double.parseDouble(x[1]);
            rows.add(ListParts.driverRow(d));
        }
        Parts.Dr weaker = Parts.dr(); // same everything, a smaller current: a lower drive-current score
        weaker.pn = "TST-T0";
        weaker.iSource = 0.6;
        weaker.iSink = 0.6;
        weaker.price = 0.1;
        rows.add(ListParts.driverRow(weaker));
        ListParts parts = new ListParts(rows);
        SwitchPart sw = Parts.sw().build();
        OperatingPoint op = Parts.op().resolve(sw);
        List<PairResult> want = full(rows, sw, op, r -> true);
        assertEquals(List.of("TST-TE", "TST-TC", "TST-TA", "TST-TB", "TST-TD", "TST-TF", "TST-T0"), names(want),
                "the documented order, by hand");
        for (int threads : new int[] {1, 2, 3}) {
            for (int top = 1; top <= rows.size(); top++) {
                Shortlist.Result got = Shortlist.run(parts, sw, op, Margins.DEFAULT, top, false, threads);
                assertEquals(names(want.subList(0, top)), names(got.candidates()), "top " + top + ", threads " + threads);
            }
        }
    }

    @Test
    void aLargeCatalogIsPrefilteredAndTheSkippedDriversCountAsFailing() throws Exception {
        List<Row> drivers = PrefilterTest.spread(Shortlist.PREFILTER_FROM);
        ListParts parts = new ListParts(drivers);
        List<PrefilterTest.Q> qs = PrefilterTest.questions();
        // Si at 48 V from 5 V CMOS active-low, SiC at 800 V bipolar, GaN at 400 V (each skips by other rules)
        for (PrefilterTest.Q q : List.of(qs.get(1), qs.get(4), qs.get(7))) {
            List<PairResult> all = full(drivers, q.sw(), q.op(), r -> true);
            List<PairResult> want = working(all);
            Question question = Question.ofShortlist(q.sw(), q.op(), Margins.DEFAULT);
            Shortlist.Result got = Shortlist.run(parts, q.sw(), q.op(), Margins.DEFAULT, 100_000, false, 2);
            assertEquals(names(want), names(got.candidates()), q.what());
            assertEquals(count(all, Verdict.PASS), got.passing(), q.what());
            assertEquals(count(all, Verdict.WARN, Verdict.UNKNOWN), got.warning(), q.what());
            assertEquals(count(all, Verdict.FAIL), got.failing() + got.skipped(), q.what());
            assertEquals(drivers.size(), got.evaluated() + got.skipped(), q.what());
            assertTrue(got.skipped() > 0, q.what());
            assertEquals(Shortlist.prefilter(question).describe(), got.prefilter(), q.what());
            long notSkipped = drivers.stream().filter(r -> ListParts.keeps(Shortlist.prefilter(question), r)).count();
            assertEquals(notSkipped, got.evaluated(), q.what());
            // with --all nothing is skipped
            Shortlist.Result every = Shortlist.run(parts, q.sw(), q.op(), Margins.DEFAULT, 3, true, 1);
            assertEquals(0, every.skipped(), q.what());
            assertEquals(drivers.size(), every.evaluated(), q.what());
            assertEquals(List.of(), every.prefilter());
            assertEquals(names(all.subList(0, 3)), names(every.candidates()), q.what());
        }
    }

    @Test
    void oneDriverFewerThanThePrefilterSizeIsEvaluatedInFull() throws Exception {
        List<Row> drivers = PrefilterTest.spread(Shortlist.PREFILTER_FROM - 1);
        SwitchPart sw = Parts.sw().build();
        Shortlist.Result got = Shortlist.run(new ListParts(drivers), sw, highSide48(sw), Margins.DEFAULT, 5, false, 1);
        assertEquals(0, got.skipped());
        assertEquals(drivers.size(), got.evaluated());
        assertEquals(List.of(), got.prefilter());
    }

    private static final Prefilter.Condition IN_STOCK = Prefilter.Condition.of("stock", Op.GT, 0);

    private static boolean inStock(Row r) {
        Object s = r.values().get("stock");
        return s != null && ((Number) s).doubleValue() > 0;
    }

    /** A spread where a third of the drivers are out of stock and a third have no stock figure. */
    private static List<Row> stocked(int n) {
        List<Row> out = new ArrayList<>();
        int i = 0;
        for (Row r : PrefilterTest.spread(n)) {
            java.util.Map<String, Object> v = new java.util.LinkedHashMap<>(r.values());
            switch (i++ % 3) {
                case 0 -> v.put("stock", 0L);
                case 1 -> v.remove("stock");
                default -> v.put("stock", 500L);
            }
            out.add(new Row(r.kind(), r.key(), r.file(), r.line(), v, java.util.Map.of()));
        }
        return out;
    }

    @Test
    void askedFiltersLeaveOutDriversWithoutTheValueAndAreCounted() throws Exception {
        for (int n : new int[] {90, Shortlist.PREFILTER_FROM}) {
            List<Row> drivers = stocked(n);
            ListParts parts = new ListParts(drivers);
            SwitchPart sw = Parts.sw().build();
            OperatingPoint op = highSide48(sw);
            List<PairResult> all = full(drivers, sw, op, ShortlistEngineTest::inStock);
            long inStock = drivers.stream().filter(ShortlistEngineTest::inStock).count();
            assertEquals(n / 3, inStock);
            Shortlist.Result got = Shortlist.run(parts, sw, op, Margins.DEFAULT, 100_000, false, 2, List.of(IN_STOCK));
            assertEquals(names(working(all)), names(got.candidates()), n + " drivers");
            assertEquals(List.of("stock > 0"), got.asked());
            assertEquals(n - inStock, got.filteredOut(), "out of stock or unknown: left out and counted");
            assertEquals(count(all, Verdict.FAIL), got.failing() + got.skipped());
            assertEquals(inStock, got.evaluated() + got.skipped());
            assertEquals(count(all, Verdict.PASS), got.passing());
        }
    }

    @Test
    void anOpenQuestionIsSaidOnceAboveTheTable() throws Exception {
        List<Row> rows = new ArrayList<>();
        for (int i = 0; i < 3; i++) {
            Parts.Dr d = Parts.dr(); // bootstrap half-bridge: without the duty cycle its bootstrap check waits
            d.pn = "TST-N" + i;
            rows.add(ListParts.driverRow(d));
        }
        Parts.Dr iso = Parts.dr();
        iso.pn = "TST-NISO";
        iso.topology = Topology.ISOLATED;
        iso.isolationVrms = 5000;
        iso.vIorm = 1000;
        iso.cmti = 200e9;
        iso.bootstrapDiode = null;
        rows.add(ListParts.driverRow(iso));
        SwitchPart sw = Parts.sw().build();
        OperatingPoint.Spec s = Parts.op();
        s.highSide = true;
        s.vDrive = 12.0;
        OperatingPoint op = s.resolve(sw);
        Shortlist.Result got = Shortlist.run(new ListParts(rows), sw, op, Margins.DEFAULT, 10, false, 1);
        long waiting = got.candidates().stream().filter(p -> p.check(Rule.BOOTSTRAP).orElseThrow().notGiven() != null)
                .count();
        assertTrue(waiting >= 3, got.candidates().toString());
        assertEquals(List.of("--duty-max: bootstrap (" + waiting + " of the " + got.candidates().size() + " listed)"
                + " unknown without it — said once here, and those drivers are ranked on their other checks; give"
                + " --duty-max to settle it"), got.notGiven());
        s.dutyMax = 0.5;
        assertEquals(List.of(), Shortlist.run(new ListParts(rows), sw, s.resolve(sw), Margins.DEFAULT, 10, false, 1)
                .notGiven());
    }

    @Test
    void theSwitchsOwnStatusIsSaidOnce() throws Exception {
        List<Row> rows = PrefilterTest.spread(20);
        Parts.Sw old = Parts.sw();
        old.lifecycle = "obsolete";
        SwitchPart sw = old.build();
        Shortlist.Result got = Shortlist.run(new ListParts(rows), sw, Parts.op().resolve(sw), Margins.DEFAULT, 5, false, 1);
        assertTrue(got.switchStatus().startsWith("TST-S1 is obsolete — find a replacement ('gatefit replace TST-S1')"),
                got.switchStatus());
        // and the drivers are judged on their own lifecycle, not the switch's
        for (PairResult p : got.candidates()) {
            assertTrue(p.check(Rule.LIFECYCLE).orElseThrow().verdict() != Verdict.FAIL, p.toString());
        }
        SwitchPart fine = Parts.sw().build();
        assertNull(Shortlist.run(new ListParts(rows), fine, Parts.op().resolve(fine), Margins.DEFAULT, 5, false, 1)
                .switchStatus());
    }

    @Test
    void anEmptyCatalogGivesAnEmptyList() throws Exception {
        SwitchPart sw = Parts.sw().build();
        Shortlist.Result got = Shortlist.run(new ListParts(List.of()), sw, Parts.op().resolve(sw), Margins.DEFAULT, 5,
                false, 2, List.of(IN_STOCK));
        assertEquals(List.of(), got.candidates());
        assertEquals(0, got.evaluated());
        assertEquals(0, got.filteredOut());
        assertEquals(List.of("stock > 0"), got.asked());
    }

    @Test
    void rankersRefuseWhatCannotBeRanked() {
        SwitchPart sw = Parts.sw().build();
        Question q = Question.ofShortlist(sw, Parts.op().resolve(sw), Margins.DEFAULT);
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> new Shortlist.Ranker(q, 0, false, List.of(), 0));
        assertEquals("expected --top of at least 1, got 0", e.getMessage());
        new Shortlist.Ranker(q, 1, false, List.of(), 0);
        assertThrows(IllegalArgumentException.class, () -> Shortlist.Ranker.merge(List.of(), 0));
    }

    @Test
    void mergedRankersKeepTheirSettingsAndCounts() {
        SwitchPart sw = Parts.sw().build();
        Question q = Question.ofShortlist(sw, Parts.op().resolve(sw), Margins.DEFAULT);
        Shortlist.Ranker a = new Shortlist.Ranker(q, 2, false, List.of("x >= 1"), 0);
        Shortlist.Ranker b = a.sibling();
        Parts.Dr good = Parts.dr();
        good.pn = "TST-MA";
        Parts.Dr cheap = Parts.dr();
        cheap.pn = "TST-MB";
        cheap.price = 0.5;
        Parts.Dr bad = Parts.dr();
        bad.pn = "TST-MC";
        bad.lifecycle = "obsolete";
        a.accept(good.build());
        a.accept(bad.build());
        b.accept(cheap.build());
        assertEquals(2, a.evaluated());
        assertEquals(1, b.evaluated());
        Shortlist.Result r = Shortlist.Ranker.merge(List.of(a, b), 7).result();
        assertEquals(List.of("TST-MB", "TST-MA"), names(r.candidates()));
        assertEquals(3, r.evaluated());
        assertEquals(2, r.passing());
        assertEquals(0, r.warning());
        assertEquals(1, r.failing());
        assertEquals(7, r.skipped());
        assertEquals(List.of("x >= 1"), r.prefilter());
    }

    @Test
    void theRankingIsVerdictThenScoreThenPriceThenPartNumber() {
        SwitchPart sw = Parts.sw().build();
        OperatingPoint op = Parts.op().resolve(sw);
        PairResult warn = new PairResult("TST-W", "S", Verdict.WARN, 0.99, List.of(), List.of(), op, Margins.DEFAULT, 0.1);
        PairResult pass = new PairResult("TST-P", "S", Verdict.PASS, 0.5, List.of(), List.of(), op, Margins.DEFAULT, 9);
        PairResult passHigh = new PairResult("TST-Q", "S", Verdict.PASS, 0.6, List.of(), List.of(), op, Margins.DEFAULT, 9);
        PairResult passCheap = new PairResult("TST-R", "S", Verdict.PASS, 0.5, List.of(), List.of(), op, Margins.DEFAULT, 1);
        PairResult passUnknown = new PairResult("TST-A", "S", Verdict.PASS, 0.5, List.of(), List.of(), op, Margins.DEFAULT,
                Double.NaN);
        PairResult passSame = new PairResult("TST-O", "S", Verdict.PASS, 0.5, List.of(), List.of(), op, Margins.DEFAULT, 9);
        List<PairResult> l = new ArrayList<>(List.of(warn, passUnknown, pass, passSame, passCheap, passHigh));
        l.sort(Shortlist.RANKING);
        assertEquals(List.of("TST-Q", "TST-R", "TST-O", "TST-P", "TST-A", "TST-W"), names(l));
    }
}
