package org.gatefit.cli;

import org.gatefit.catalog.Op;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.time.Clock;
import java.util.ArrayList;
import java.util.List;
import org.gatefit.catalog.Kind;
import org.gatefit.index.Catalog;
import org.gatefit.index.CatalogParts;
import org.gatefit.index.Importer;
import org.gatefit.match.DriverPart;
import org.gatefit.match.Margins;
import org.gatefit.match.OperatingPoint;
import org.gatefit.match.Prefilter;
import org.gatefit.match.Question;
import org.gatefit.match.Rules;
import org.gatefit.match.PairResult;
import org.gatefit.match.Shortlist;
import org.gatefit.match.SwitchPart;
import org.gatefit.match.Verdict;
import org.gatefit.synth.SyntheticCatalog;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The shortlist's prefilter skips only drivers the rules fail: over a synthetic catalog (every
 * topology and technology, generated data as input only) and several operating points, the
 * shortlist with the prefilter lists exactly the working drivers, in the same order, that a full
 * evaluation of every driver without any prefilter finds, and its pass / warn / fail counts plus
 * the skipped drivers add up to the full evaluation's. The reference is the rules themselves
 * ({@code Rules.evaluate} on every pair), so this checks the prefilter, not the rules.
 */
class ShortlistPrefilterTest {
    private static final int DRIVERS = 3_000;
    private static final int SWITCHES = 24;

    @TempDir
    static Path tmp;
    static Path dir;

    @BeforeAll
    static void catalog() throws Exception {
        dir = tmp.resolve("catalog");
        Path d = tmp.resolve("drivers.csv");
        Path s = tmp.resolve("switches.csv");
        SyntheticCatalog.writeDrivers(d, DRIVERS);
        SyntheticCatalog.writeSwitches(s, SWITCHES);
        new Importer(dir, Clock.systemUTC()).run(List.of(d, s), List.of(d.toString(), s.toString()),
                new Importer.Options(null, false, null), n -> { });
    }

    private static List<OperatingPoint.Spec> questions() {
        List<OperatingPoint.Spec> out = new ArrayList<>();
        // {high side, bus V, on V, off V, duty max}
        double[][] q = {{1, 48, 12, 0, 0.6}, {0, 48, 12, 0, Double.NaN}, {1, 400, 15, -5, 0.9}, {1, 800, 18, -4, 0.5},
            {0, 24, 5, 0, Double.NaN}, {1, 12, 10, -3, 1.0}};
        for (double[] x : q) {
            OperatingPoint.Spec s = new OperatingPoint.Spec();
            s.highSide = x[0] == 1;
            s.bus = x[1];
            s.vDrive = x[2];
            s.vDriveNeg = x[3];
            s.dutyMax = Double.isNaN(x[4]) ? null : x[4];
            s.fSw = 100e3;
            s.rG = 2.2;
            out.add(s);
        }
        // Active-low PWM (inverting inputs wanted) from 5 V logic (input maximum), and 1.8 V logic (V_IH).
        OperatingPoint.Spec low = out.get(0).copy();
        low.activeHigh = false;
        low.logic = org.gatefit.physics.LogicFamily.CMOS_5V;
        out.add(low);
        OperatingPoint.Spec weak = out.get(1).copy();
        weak.logic = org.gatefit.physics.LogicFamily.LVCMOS_1V8;
        out.add(weak);
        return out;
    }

    @Test
    void thePrefilterSkipsOnlyDriversThatFail() throws Exception {
        int skippedSomewhere = 0;
        try (Catalog c = Catalog.open(dir)) {
            List<DriverPart> every = new ArrayList<>();
            c.scan(Kind.DRIVER, null, r -> every.add(DriverPart.of(r)));
            assertEquals(DRIVERS, every.size());
            for (int i = 0; i < SWITCHES; i += 5) {
                SwitchPart sw = SwitchPart.of(c.get(Kind.SWITCH, SyntheticCatalog.switchNumber(i)).orElseThrow());
                for (OperatingPoint.Spec spec : questions()) {
                    OperatingPoint op = spec.copy().resolve(sw);
                    String what = sw.partNumber() + " " + sw.technology() + " at " + op;
                    List<PairResult> full = new ArrayList<>();
                    int pass = 0;
                    int warn = 0;
                    int fail = 0;
                    for (DriverPart d : every) {
                        // The shortlist's question: the switch's own lifecycle is said once, apart from the pairs.
                        PairResult r = Rules.evaluate(d, org.gatefit.match.Question.ofShortlist(sw, op, Margins.DEFAULT))
                                .withPrice(d.price());
                        switch (r.verdict()) {
                            case PASS -> pass++;
                            case WARN, UNKNOWN -> warn++;
                            case FAIL -> fail++;
                        }
                        if (r.verdict() != Verdict.FAIL) {
                            full.add(r);
                        }
                    }
                    full.sort(Shortlist.RANKING);
                    for (int threads : new int[] {1, 2}) {
                        Shortlist.Result got = Shortlist.run(new CatalogParts(c), sw, op, Margins.DEFAULT, DRIVERS, false, threads);
                        same(full.stream().map(PairResult::driver).toList(),
                                got.candidates().stream().map(PairResult::driver).toList(), what);
                        assertEquals(full.stream().map(PairResult::score).toList(),
                                got.candidates().stream().map(PairResult::score).toList(), what);
                        assertEquals(pass, got.passing(), what);
                        assertEquals(warn, got.warning(), what);
                        assertEquals(fail, got.failing() + got.skipped(), what + ": fails = evaluated fails + skipped");
                        assertEquals(DRIVERS, got.evaluated() + got.skipped(), what);
                        skippedSomewhere += got.skipped();
                    }
                    // Top 10: the first ten of the full ranking.
                    Shortlist.Result ten = Shortlist.run(new CatalogParts(c), sw, op, Margins.DEFAULT, 10, false, 1);
                    same(full.stream().limit(10).map(PairResult::driver).toList(),
                            ten.candidates().stream().map(PairResult::driver).toList(), what);
                }
            }
        }
        assertTrue(skippedSomewhere > DRIVERS, "the prefilter must actually skip drivers in these questions");
    }

    /** A limit below which drivers are skipped ({@code x < limit}), as printed. */
    private static String down(double x) {
        return Prefilter.Condition.of("v_ih_v", Op.LT, x).value();
    }

    /** A limit above which drivers are skipped ({@code x > limit}), as printed. */
    private static String up(double x) {
        return Prefilter.Condition.of("v_ih_v", Op.GT, x).value();
    }

    @Test
    void limitsArePrintedShortAndRoundedTowardsSkippingFewer() {
        // A limit below which drivers are skipped is rounded down, one above which they are skipped up.
        assertEquals("0.22", down(0.22000000000000003));
        assertEquals("0.2201", up(0.22000000000000003));
        assertEquals("3.1", up(3.0999999999999996));
        assertEquals("3.099", down(3.0999999999999996));
        assertEquals("48", down(48));
        assertEquals("-5", up(-5));
        assertEquals("4.6", down(4.6), "a short number stays as written (it reads back exactly)");
        assertEquals("1.356", down(1.3563628691983125));
        for (double x : new double[] {0.22000000000000003, 3.0999999999999996, 1.3563628691983125, -4.2, 1e-7}) {
            assertTrue(Double.parseDouble(down(x)) <= x && Double.parseDouble(up(x)) >= x, "" + x);
        }
        assertEquals("i_sink_a >= 1.356", Prefilter.Condition.of("i_sink_a", Op.GE, 1.3563628691983125).toString());
        assertEquals("v_in_max_v <= 3.301", Prefilter.Condition.of("v_in_max_v", Op.LE, 3.3000000000000003).toString());
    }

    /** Lists equal, or a failure naming the first difference (not thousands of part numbers). */
    private static void same(List<String> expected, List<String> actual, String what) {
        for (int i = 0; i < Math.min(expected.size(), actual.size()); i++) {
            assertEquals(expected.get(i), actual.get(i), "rank " + (i + 1) + " of " + what);
        }
        assertEquals(expected.size(), actual.size(), "working drivers for " + what);
    }

    @Test
    void rankersOfSeveralPartitionsMergeToTheOneRankerResult() throws Exception {
        try (Catalog c = Catalog.open(dir)) {
            List<DriverPart> every = new ArrayList<>();
            c.scan(Kind.DRIVER, null, r -> every.add(DriverPart.of(r)));
            SwitchPart sw = SwitchPart.of(c.get(Kind.SWITCH, SyntheticCatalog.switchNumber(3)).orElseThrow());
            OperatingPoint op = questions().get(0).resolve(sw);
            Question p = Question.of(sw, op, Margins.DEFAULT);
            Shortlist.Ranker one = new Shortlist.Ranker(p, 25, true, List.of(), 0);
            every.forEach(one::accept);
            Shortlist.Ranker a = new Shortlist.Ranker(p, 25, true, List.of(), 0);
            Shortlist.Ranker b = a.sibling();
            Shortlist.Ranker d = a.sibling();
            for (int i = 0; i < every.size(); i++) {
                (i % 3 == 0 ? a : i % 3 == 1 ? b : d).accept(every.get(i));
            }
            Shortlist.Result x = one.result();
            Shortlist.Result y = Shortlist.Ranker.merge(List.of(d, a, b), 0).result();
            assertEquals(x.candidates().stream().map(PairResult::driver).toList(),
                    y.candidates().stream().map(PairResult::driver).toList());
            assertEquals(List.of(x.passing(), x.warning(), x.failing()), List.of(y.passing(), y.warning(), y.failing()));
        }
    }
}
