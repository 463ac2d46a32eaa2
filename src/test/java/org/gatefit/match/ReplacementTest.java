package org.gatefit.match;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Random;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.Combinators;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import org.gatefit.catalog.Kind;
import org.gatefit.catalog.Row;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * {@link Replacement#assess} for each parameter sense, and invariants of {@link Replacement#run}:
 * scores in [0,1] and a ranking that does not depend on the order the catalog hands parts over.
 * Windows are Replacement's documented ±20 % (charges, capacitances, currents) and ±0.5 V (levels),
 * common practice, no source; the expectations below are arithmetic on them.
 */
class ReplacementTest {

    private static Replacement.Param param(String column) {
        for (Replacement.Param p : Replacement.SWITCH) {
            if (p.column().equals(column)) {
                return p;
            }
        }
        for (Replacement.Param p : Replacement.DRIVER) {
            if (p.column().equals(column)) {
                return p;
            }
        }
        throw new AssertionError(column);
    }

    @ParameterizedTest(name = "{0}: {1} → {2} is {3}")
    @CsvSource({
        // SAME (technology must match; case does not matter)
        "technology, si-mosfet, si-mosfet, equal",
        "technology, si-mosfet, SI-MOSFET, equal",
        "technology, si-mosfet, sic-mosfet, worse",
        "input_polarity, non-inverting, inverting, worse",
        // HIGHER is better: blocking voltage, current
        "v_block_v, 100, 100, equal",
        "v_block_v, 100, 120, better",
        "v_block_v, 100, 80, worse",
        "i_cont_a, 200, 199.9, worse",
        // LOWER is better: R_on, V_GS min (more negative allowed = wider window)
        "r_on_mohm, 3.0, 2.6, better",
        "r_on_mohm, 3.0, 3.5, worse",
        "v_gs_min_v, -20, -25, better",
        "v_gs_min_v, -20, -10, worse",
        // YES is better: built-in bootstrap diode, Miller clamp
        "bootstrap_diode, no, yes, better",
        "bootstrap_diode, yes, no, worse",
        "miller_clamp, yes, yes, equal",
        // WINDOW_REL ±20 %: 100 nC → 80…120 nC inside; 120 is the edge (|Δ| = 20 ≤ 20)
        "q_g_nc, 100, 118, within-window",
        "q_g_nc, 100, 120, within-window",
        "q_g_nc, 100, 121, re-verify",
        "q_g_nc, 100, 79, re-verify",
        "q_g_nc, 100, 100, equal",
        "i_source_a, 5, 4, within-window",
        "i_source_a, 5, 7, re-verify",
        // WINDOW_ABS ±0.5 V: a threshold 2.0 V → 1.5…2.5 V inside, also when "better" outside it
        "v_th_min_v, 2.0, 2.4, within-window",
        "v_th_min_v, 2.0, 2.6, re-verify",
        "v_th_min_v, 2.0, 1.4, re-verify",
        "uvlo_on_v, 8.0, 8.5, within-window",
    })
    void assessFollowsTheSenseAndWindow(String column, String original, String candidate, String expected) {
        Replacement.Param p = param(column);
        Object a = value(p, original);
        Object b = value(p, candidate);
        assertEquals(expected, Replacement.assess(p, a, b));
    }

    private static Object value(Replacement.Param p, String text) {
        return switch (p.sense()) {
            case SAME, YES -> text;
            default -> Double.parseDouble(text);
        };
    }

    @ParameterizedTest
    @CsvSource({"technology, si-mosfet", "v_block_v, 100", "r_on_mohm, 3", "q_g_nc, 100", "v_th_min_v, 2",
        "miller_clamp, yes"})
    void anUnknownCandidateValueIsReVerifyForEverySense(String column, String original) {
        Replacement.Param p = param(column);
        assertEquals("re-verify", Replacement.assess(p, value(p, original), null));
    }

    // ---------------------------------------------------------------- run()

    /** A catalog switch row (an n-channel Si MOSFET, invented) with {@code changes}, a null value removing the column. */
    static Row sw(String pn, Map<String, Object> changes) {
        Map<String, Object> v = new LinkedHashMap<>();
        v.put("part_number", pn);
        v.put("maker", "Testmaker");
        v.put("package", "TSTPAK-8");
        v.put("pinout", "TP8");
        v.put("lifecycle", "active");
        v.put("stock", 1000L);
        v.put("unit_price", 2.0);
        v.put("technology", "si-mosfet");
        v.put("channel", "n");
        v.put("v_block_v", 100.0);
        v.put("i_cont_a", 200.0);
        v.put("r_on_mohm", 3.0);
        v.put("r_on_vgs_v", 10.0);
        v.put("v_th_min_v", 2.0);
        v.put("v_th_max_v", 4.0);
        v.put("v_gs_max_v", 20.0);
        v.put("v_gs_min_v", -20.0);
        v.put("q_g_nc", 100.0);
        v.put("q_g_vgs_v", 10.0);
        v.put("c_iss_pf", 6000.0);
        v.putAll(changes);
        v.values().removeIf(java.util.Objects::isNull);
        return new Row(Kind.SWITCH, pn, "test", 2, v, Map.of());
    }

    private static Row drv(String pn, Map<String, Object> changes) {
        Map<String, Object> v = new LinkedHashMap<>();
        v.put("part_number", pn);
        v.put("maker", "Testmaker");
        v.put("pinout", "SO8-ISO");
        v.put("lifecycle", "active");
        v.put("stock", 1000L);
        v.put("topology", "isolated");
        v.put("channels", 1L);
        v.put("input_polarity", "non-inverting");
        v.put("i_source_a", 4.0);
        v.put("i_sink_a", 6.0);
        v.put("v_supply_min_v", 13.0);
        v.put("v_supply_max_v", 30.0);
        v.put("isolation_vrms", 5000.0);
        v.putAll(changes);
        v.values().removeIf(java.util.Objects::isNull);
        return new Row(Kind.DRIVER, pn, "test", 2, v, Map.of());
    }

    private static Replacement.Result run(Row original, List<Row> candidates, boolean includeObsolete) {
        return Replacement.run(original, candidates, candidates.size() + 1, 1000, includeObsolete, "", List.of(), null,
                pn -> Optional.empty(), pn -> Optional.empty(), Margins.DEFAULT);
    }

    private static Optional<Replacement.Candidate> find(Replacement.Result r, String pn) {
        return r.candidates().stream().filter(c -> c.partNumber().equals(pn)).findFirst();
    }

    private static String assessment(Replacement.Candidate c, String parameter) {
        return c.differences().stream().filter(d -> d.parameter().equals(parameter)).map(Replacement.Difference::assessment)
                .findFirst().orElseThrow(() -> new AssertionError("no " + parameter + " in " + c.differences()));
    }

    @Test
    void gradesFromTheDocumentedRules() {
        Row original = sw("TST-A", Map.of());
        Replacement.Result r = run(original, List.of(
                sw("TST-WORSE-RON", Map.of("r_on_mohm", 3.5)),                       // same pinout, worse rating
                sw("TST-OTHER-WORSE", Map.of("pinout", "TP7", "r_on_mohm", 3.5)),   // other pinout, worse rating
                sw("TST-UNKNOWN-QG", mapOf("q_g_nc", null)),                         // unknown charge: re-verify
                sw("TST-THRESHOLD", Map.of("v_th_min_v", 2.6)),                      // 0.6 V > 0.5 V window
                sw("TST-P", Map.of("channel", "p"))), false);                        // essential: not offered
        assertEquals("pin-compatible", find(r, "TST-WORSE-RON").orElseThrow().grade().id());
        assertEquals("worse", assessment(find(r, "TST-WORSE-RON").orElseThrow(), "r_on_mohm"));
        assertTrue(find(r, "TST-OTHER-WORSE").isEmpty(), "functional needs no worse rating");
        Replacement.Candidate u = find(r, "TST-UNKNOWN-QG").orElseThrow();
        assertEquals("pin-compatible", u.grade().id());
        assertEquals("re-verify", assessment(u, "q_g_nc"));
        assertEquals("unknown", u.differences().stream().filter(d -> d.parameter().equals("q_g_nc")).findFirst()
                .orElseThrow().candidate());
        assertEquals("re-verify", assessment(find(r, "TST-THRESHOLD").orElseThrow(), "v_th_min_v"));
        assertTrue(find(r, "TST-P").isEmpty(), "channel type must be equal");
        assertEquals(5, r.considered());
        assertEquals(2, r.notOffered());
    }

    /*
     * DESIGN.md, driver columns: v_neg_min_v "empty or 0 = none". A bipolar original (−8 V rail) against a
     * candidate with the cell empty is a driver without a negative rail: worse, not "unknown". With another
     * pinout that rules it out as functional (the negative-bias rule would fail it in any −V stage). The
     * other way round, a negative rail where the original has none is better.
     */
    @Test
    void anEmptyNegativeRailMeansNoneAsDesignSays() {
        Row bipolar = drv("TST-BI", Map.of("v_neg_min_v", -8.0));
        Replacement.Result r = run(bipolar, List.of(
                drv("TST-UNI-SAME", Map.of()),
                drv("TST-UNI-OTHER", Map.of("pinout", "SO16-ISO")),
                drv("TST-ZERO-SAME", Map.of("v_neg_min_v", 0.0))), false);
        assertEquals("worse", assessment(find(r, "TST-UNI-SAME").orElseThrow(), "v_neg_min_v"));
        assertEquals("worse", assessment(find(r, "TST-ZERO-SAME").orElseThrow(), "v_neg_min_v"));
        assertTrue(find(r, "TST-UNI-OTHER").isEmpty(), "no negative rail, other pinout: not functional");

        Row unipolar = drv("TST-UNI", Map.of());
        Replacement.Result back = run(unipolar, List.of(drv("TST-BI2", Map.of("v_neg_min_v", -8.0))), false);
        Replacement.Candidate c = find(back, "TST-BI2").orElseThrow();
        assertEquals("better", assessment(c, "v_neg_min_v"));
        assertEquals("drop-in", c.grade().id());
    }

    private static Map<String, Object> mapOf(String k, Object v) {
        Map<String, Object> m = new LinkedHashMap<>();
        m.put(k, v);
        return m;
    }

    // ---------------------------------------------------------------- properties

    @Provide
    Arbitrary<List<Row>> candidates() {
        return candidate().list().ofMaxSize(25);
    }

    private static Arbitrary<Row> candidate() {
        Arbitrary<Double> vBlock = Arbitraries.of(80.0, 100.0, 120.0, 150.0);
        Arbitrary<Double> rOn = Arbitraries.doubles().between(1.0, 6.0).ofScale(1);
        Arbitrary<Double> qg = Arbitraries.doubles().between(40.0, 200.0).ofScale(0).injectNull(0.1);
        Arbitrary<Double> vth = Arbitraries.doubles().between(1.0, 3.0).ofScale(1).injectNull(0.1);
        Arbitrary<String> pinout = Arbitraries.of("TP8", "TP7");
        Arbitrary<String> life = Arbitraries.of("active", "nrnd", "ltb", "obsolete", "preview", "unknown");
        Arbitrary<Long> stock = Arbitraries.longs().between(0, 5000).injectNull(0.2);
        Arbitrary<Double> price = Arbitraries.doubles().between(0.5, 5.0).ofScale(2).injectNull(0.2);
        Arbitrary<Integer> id = Arbitraries.integers().between(0, 1_000_000);
        List<Arbitrary<Object>> parts = List.of(vBlock.map(Object.class::cast), rOn.map(Object.class::cast),
                qg.map(o -> (Object) o), vth.map(o -> (Object) o), pinout.map(Object.class::cast),
                life.map(Object.class::cast), stock.map(o -> (Object) o), price.map(o -> (Object) o),
                id.map(Object.class::cast));
        return Combinators.combine(parts).as(v -> {
            Map<String, Object> m = new LinkedHashMap<>();
            m.put("v_block_v", v.get(0));
            m.put("r_on_mohm", v.get(1));
            m.put("q_g_nc", v.get(2));
            m.put("v_th_min_v", v.get(3));
            m.put("pinout", v.get(4));
            m.put("lifecycle", v.get(5));
            m.put("stock", v.get(6));
            m.put("unit_price", v.get(7));
            return sw("TST-" + v.get(8), m);
        });
    }

    @Property(tries = 200)
    void scoresAreInRangeAndRankingIgnoresInputOrder(@ForAll("candidates") List<Row> rows,
                                                      @ForAll boolean includeObsolete, @ForAll Random random) {
        // Part numbers are unique in a catalog.
        Map<String, Row> unique = new LinkedHashMap<>();
        rows.forEach(r -> unique.putIfAbsent(r.key(), r));
        List<Row> list = new ArrayList<>(unique.values());
        Row original = sw("TST-ORIGINAL", Map.of("stock", 0L));
        Replacement.Result first = run(original, list, includeObsolete);
        for (Replacement.Candidate c : first.candidates()) {
            assertTrue(c.score() >= 0 && c.score() <= 1, c.partNumber() + " score " + c.score());
            assertFalse(!includeObsolete && c.lifecycle().equals("obsolete"), c.partNumber());
            assertFalse(c.grade() == Replacement.Grade.DROP_IN && c.lifecycle().equals("obsolete"), c.partNumber());
        }
        for (int i = 1; i < first.candidates().size(); i++) {
            assertTrue(first.candidates().get(i - 1).grade().ordinal() <= first.candidates().get(i).grade().ordinal(),
                    "grades best first");
        }
        List<Row> shuffled = new ArrayList<>(list);
        Collections.shuffle(shuffled, random);
        Replacement.Result second = run(original, shuffled, includeObsolete);
        assertEquals(first.candidates().stream().map(Replacement.Candidate::partNumber).toList(),
                second.candidates().stream().map(Replacement.Candidate::partNumber).toList());
        assertEquals(first.candidates(), second.candidates(), "same grades, scores and differences");
    }
}
