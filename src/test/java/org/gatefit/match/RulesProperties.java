package org.gatefit.match;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Random;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Combinators;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;

/**
 * Invariants over random valid pairs (invented, physically plausible figures, some left unknown):
 * the evaluator never throws, scores stay in [0,1] with failures capped at 0.25, and
 * {@link Shortlist#RANKING} is a total order that gives the same list whatever order it is fed.
 */
class RulesProperties {

    private static Arbitrary<Double> maybe(Arbitrary<Double> a) {
        return Arbitraries.oneOf(a, a, a, Arbitraries.just(Double.NaN));
    }

    @Provide
    Arbitrary<SwitchPart> switches() {
        Arbitrary<Technology> tech = Arbitraries.of(Technology.class);
        Arbitrary<Double> qg = Arbitraries.doubles().between(1, 400).map(x -> x * 1e-9);
        Arbitrary<Double> frac = Arbitraries.doubles().between(0.05, 0.45);
        Arbitrary<Double> vth = Arbitraries.doubles().between(0.7, 6);
        Arbitrary<Double> vgsMax = Arbitraries.doubles().between(6, 30);
        Arbitrary<Double> cIss = maybe(Arbitraries.doubles().between(50, 10000).map(x -> x * 1e-12));
        Arbitrary<Double> rInt = maybe(Arbitraries.doubles().between(0, 10));
        Arbitrary<String> life = Arbitraries.of("active", "nrnd", "ltb", "obsolete", "preview", "unknown");
        return Combinators.combine(tech, qg, frac, vth, vgsMax, cIss, rInt, life).as((t, q, f, th, gmax, ciss, ri, l) -> {
            double plateau = th + 1;
            double spec = Math.max(plateau + 1, Math.min(gmax, t.typicalOn()));
            return new SwitchPart("TST-S", "Testmaker", "P", "P", t, true, 600, 20, 0.05, spec, Double.NaN, th,
                    th + 1, gmax, -Math.min(gmax, 10), spec, 0, q, spec, q * f, q * f, plateau, ciss,
                    Double.isNaN(ciss) ? Double.NaN : ciss / 30, ri, Lifecycle.of(l), 100, 2);
        });
    }

    @Provide
    Arbitrary<DriverPart> drivers() {
        Arbitrary<Topology> topo = Arbitraries.of(Topology.class);
        Arbitrary<Double> amps = Arbitraries.doubles().between(0.2, 12);
        Arbitrary<Double> vmin = Arbitraries.doubles().between(3, 15);
        Arbitrary<Double> span = Arbitraries.doubles().between(2, 25);
        Arbitrary<Double> uvlo = maybe(Arbitraries.doubles().between(0.5, 0.95));
        Arbitrary<Double> vih = maybe(Arbitraries.doubles().between(1.2, 3.6));
        Arbitrary<Double> neg = maybe(Arbitraries.doubles().between(-15, 0));
        Arbitrary<Double> rating = maybe(Arbitraries.doubles().between(50, 6000));
        Arbitrary<Boolean> inv = Arbitraries.of(true, false);
        Arbitrary<Integer> id = Arbitraries.integers().between(0, 999_999);
        return Combinators.combine(topo, amps, vmin, span, uvlo, vih, neg, rating).as((t, i, lo, sp, u, ih, ng, rt) ->
                new Object[] {t, i, lo, sp, u, ih, ng, rt}).flatMap(a -> Combinators.combine(inv, id, Arbitraries.of(
                        "active", "nrnd", "obsolete", "unknown")).as((iv, n, life) -> {
                            Topology t = (Topology) a[0];
                            double i = (double) a[1];
                            double lo = (double) a[2];
                            double u = (double) a[4];
                            double ih = (double) a[5];
                            double rt = (double) a[7];
                            return new DriverPart(String.format("TST-D%06d", n), "Testmaker", "P", "P", t, 1,
                                    List.of(iv), i, i * 1.5, Double.NaN, 1, lo, lo + (double) a[3],
                                    Double.isNaN(u) ? u : lo * u + 0.3, Double.isNaN(u) ? u : lo * u, ih,
                                    Double.isNaN(ih) ? 0.8 : ih * 0.4, 5.5, t == Topology.ISOLATED ? Double.NaN : rt,
                                    t.bootstrapped() ? Boolean.TRUE : null, 60e-6, (double) a[6], 50e-9, Double.NaN,
                                    iv, t == Topology.ISOLATED ? rt : Double.NaN, 0.8, Lifecycle.of(life), n % 3 == 0 ? 0 : 10, 1);
                        }));
    }

    @Provide
    Arbitrary<OperatingPoint.Spec> points() {
        Arbitrary<Boolean> high = Arbitraries.of(true, false);
        Arbitrary<Double> bus = maybe(Arbitraries.doubles().between(12, 1000));
        Arbitrary<Double> f = Arbitraries.doubles().between(1e3, 1e6);
        Arbitrary<Double> edge = Arbitraries.doubles().between(5, 500).map(x -> x * 1e-9);
        Arbitrary<Double> on = Arbitraries.doubles().between(4, 22);
        Arbitrary<Double> off = Arbitraries.doubles().between(-10, 0);
        Arbitrary<Double> rg = Arbitraries.doubles().between(0, 20);
        Arbitrary<Double> duty = maybe(Arbitraries.doubles().between(0, 1));
        return Combinators.combine(high, bus, f, edge, on, off, rg, duty).as((h, b, fr, e, v, vn, r, d) -> {
            OperatingPoint.Spec s = new OperatingPoint.Spec();
            s.highSide = h;
            s.bus = Double.isNaN(b) ? null : b;
            s.fSw = fr;
            s.edge = e;
            s.vDrive = v;
            s.vDriveNeg = vn;
            s.rG = r;
            s.dutyMax = Double.isNaN(d) ? null : d;
            return s;
        });
    }

    @Property(tries = 500)
    void randomValidPairsNeverThrowAndScoreWithinRange(@ForAll("drivers") DriverPart d, @ForAll("switches") SwitchPart s,
                                                       @ForAll("points") OperatingPoint.Spec spec) {
        PairResult r = Rules.evaluate(d, s, spec.resolve(s), Margins.DEFAULT);
        assertTrue(r.score() >= 0 && r.score() <= 1, "score " + r.score());
        assertEquals(13, r.checks().size());
        Verdict worst = Verdict.PASS;
        for (Check c : r.checks()) {
            worst = worst.and(c.verdict());
            assertTrue(!c.message().isBlank() && !c.message().contains("NaN"), c.rule() + ": " + c.message());
        }
        assertEquals(worst.forPair(), r.verdict(), "fail if any fails; warn if any warns or is unknown");
        if (r.verdict() == Verdict.FAIL) {
            assertTrue(r.score() <= 0.25, "failing pair scored " + r.score());
        }
    }

    @Property(tries = 3000)
    void rankingModeGivesTheSameVerdictsAndScoresAsTheFullEvaluation(@ForAll("drivers") DriverPart d,
            @ForAll("switches") SwitchPart s, @ForAll("points") OperatingPoint.Spec spec) {
        // The shortlist ranks with Rules.Ranking (no sentences, figures nobody rules on left out) and
        // words only the pairs it shows; the two must agree on everything that decides the order.
        OperatingPoint op = spec.resolve(s);
        PairResult full = Rules.evaluate(d, s, op, Margins.DEFAULT);
        Rules.Ranking bare = new Rules.Ranking(Question.of(s, op, Margins.DEFAULT));
        bare.rank(d);
        assertEquals(full.verdict(), bare.verdict(), "verdict while ranking");
        assertEquals(full.score(), bare.score(), 0.0, "score while ranking");
        // A shortlist that lists no failing driver stops at the first failing rule: the same
        // verdict, and the same score for every driver it can list.
        Rules.Ranking counting = new Rules.Ranking(Question.of(s, op, Margins.DEFAULT), false);
        counting.rank(d);
        assertEquals(full.verdict(), counting.verdict(), "verdict when failing drivers are only counted");
        if (full.verdict() == Verdict.FAIL) {
            assertTrue(Double.isNaN(counting.score()), "a failing driver is not scored: " + counting.score());
        } else {
            assertEquals(full.score(), counting.score(), 0.0, "score of a driver that can be listed");
        }
    }

    @Property(tries = 500)
    void aRankingReusedForAnotherDriverRanksItAsAFreshOne(@ForAll("drivers") DriverPart first, @ForAll("drivers") DriverPart d,
            @ForAll("switches") SwitchPart s, @ForAll("points") OperatingPoint.Spec spec) {
        // A ranking thread judges driver after driver with one Outcome: nothing of the previous
        // driver may survive into the next one's verdict or score.
        OperatingPoint op = spec.resolve(s);
        Question q = Question.of(s, op, Margins.DEFAULT);
        Rules.Ranking r = new Rules.Ranking(q);
        r.rank(first);
        r.rank(d);
        PairResult full = Rules.evaluate(d, s, op, Margins.DEFAULT);
        assertEquals(full.verdict(), r.verdict());
        assertEquals(full.score(), r.score(), 0.0);
    }

    @Provide
    Arbitrary<List<DriverPart>> driverLists() {
        return drivers().list().ofMinSize(2).ofMaxSize(30);
    }

    @Property(tries = 50)
    void rankingIsATotalOrderIndependentOfInputOrder(@ForAll("driverLists") List<DriverPart> ds,
                                                     @ForAll("switches") SwitchPart s,
                                                     @ForAll("points") OperatingPoint.Spec spec, @ForAll long seed) {
        OperatingPoint op = spec.resolve(s);
        List<PairResult> rs = new ArrayList<>();
        List<String> seen = new ArrayList<>();
        for (DriverPart d : ds) {
            if (!seen.contains(d.partNumber())) {
                seen.add(d.partNumber());
                rs.add(Rules.evaluate(d, s, op, Margins.DEFAULT).withPrice(d.price()));
            }
        }
        List<PairResult> a = new ArrayList<>(rs);
        a.sort(Shortlist.RANKING);
        List<PairResult> b = new ArrayList<>(rs);
        Collections.shuffle(b, new Random(seed));
        b.sort(Shortlist.RANKING);
        assertEquals(a.stream().map(PairResult::driver).toList(), b.stream().map(PairResult::driver).toList());
        for (PairResult x : rs) {
            for (PairResult y : rs) {
                int xy = Integer.signum(Shortlist.RANKING.compare(x, y));
                assertEquals(-xy, Integer.signum(Shortlist.RANKING.compare(y, x)), "antisymmetric");
                assertEquals(x == y, xy == 0, "only a pair equals itself (distinct part numbers)");
            }
        }
        for (int i = 1; i < a.size(); i++) {
            PairResult p = a.get(i - 1);
            PairResult q = a.get(i);
            assertTrue(p.verdict().ordinal() <= q.verdict().ordinal(), "verdict first");
            if (p.verdict() != Verdict.FAIL && q.verdict() == Verdict.FAIL) {
                assertTrue(p.score() > q.score() || p.score() >= 0.25, "working pairs above failing ones");
            }
        }
    }
}
