package org.gatefit.match;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import org.gatefit.catalog.Op;
import org.gatefit.catalog.Row;
import org.gatefit.physics.LogicFamily;
import org.junit.jupiter.api.Test;

/**
 * {@link Prefilter}: what a catalog may skip without evaluating. The property that matters is
 * soundness: every driver the prefilter of a shortlist question drops is one the full rules
 * ({@link Rules#evaluate}) fail, and a driver dropped by an exclusion group fails the very rule the
 * group names. The reference is the rules themselves, over a spread of invented drivers (every
 * topology, input sense, supply range, UVLO, logic thresholds, offset, working voltage, negative rail and
 * lifecycle, with values left unknown) and questions (Si, SiC and GaN switches; low and high side;
 * 24 to 800 V; unipolar and bipolar drive; 1.8 V, 3.3 V and 5 V logic; active-high and active-low).
 * The prefilter is applied as {@link ListParts#keeps} applies it (the catalog adapter's reading).
 * Then the conditions' rounding (towards skipping fewer drivers, Condition.of's contract) and how
 * they print.
 */
class PrefilterTest {

    // ---------------------------------------------------------------- soundness against the rules

    /** A spread of drivers from a fixed seed, plus a few at the edges of the declared conditions. */
    static List<Row> spread(int n) {
        Random rnd = new Random(20261203);
        List<Row> out = new ArrayList<>();
        Topology[] tops = Topology.values();
        List<List<Boolean>> senses = List.of(List.of(false), List.of(true), List.of(false, true));
        double[][] supply = {{8, 20}, {4.5, 10}, {13, 30}, {10, 25}, {4, 7}};
        double[][] logic = {{2.0, 0.8, 20}, {3.5, 1.5, 20}, {2.0, Double.NaN, 5.5}, {1.2, 0.3, 3.3}, {2.9, 0.8, 6},
            {Double.NaN, 0.8, 3.0}, {1.0, 0.5, Double.NaN}};
        double[] offset = {200, 700, 1200, 48, 30, Double.NaN};
        double[] iorm = {Double.NaN, 600, 1500, 300};
        double[] neg = {0, -5, -10, -3, -20};
        double[] current = {0.05, 0.3, 1, 4, 9};
        String[] life = {"active", "active", "obsolete", "nrnd"};
        for (int i = 0; i < n; i++) {
            Parts.Dr d = Parts.dr();
            d.pn = String.format("TST-PF%04d", i);
            d.topology = tops[rnd.nextInt(tops.length)];
            d.inverting = senses.get(rnd.nextInt(senses.size()));
            double[] s = supply[rnd.nextInt(supply.length)];
            d.vSupplyMin = s[0];
            d.vSupplyMax = s[1];
            // UVLO below the supply minimum, or now and then one no on level of these questions clears
            d.uvloOn = rnd.nextInt(6) == 0 ? 12.5 : Math.min(s[0] - 0.5, 7);
            d.uvloOff = d.uvloOn - 0.5;
            double[] l = logic[rnd.nextInt(logic.length)];
            d.vIh = l[0];
            d.vIl = l[1];
            d.vInMax = l[2];
            d.vOffsetMax = offset[rnd.nextInt(offset.length)];
            d.vIorm = iorm[rnd.nextInt(iorm.length)];
            d.isolationVrms = d.topology == Topology.ISOLATED ? 5000 : Double.NaN;
            d.vNegMin = neg[rnd.nextInt(neg.length)];
            d.iSource = current[rnd.nextInt(current.length)];
            d.iSink = current[rnd.nextInt(current.length)];
            d.lifecycle = life[rnd.nextInt(life.length)];
            d.bootstrapDiode = rnd.nextBoolean();
            out.add(ListParts.driverRow(d));
        }
        return out;
    }

    record Q(String what, SwitchPart sw, OperatingPoint op) {
    }

    static List<Q> questions() {
        List<Q> out = new ArrayList<>();
        Parts.Sw si = Parts.sw();
        Parts.Sw sic = Parts.sw();
        sic.pn = "TST-SIC";
        sic.tech = Technology.SIC_MOSFET;
        sic.vBlock = 1200;
        sic.vGsMax = 22;
        sic.vGsMin = -8;
        sic.vGateOn = 18;
        sic.vGateOff = -4;
        sic.qG = 100e-9;
        sic.qGVgs = 22;
        sic.qGd = 30e-9;
        sic.vPlateau = 9;
        Parts.Sw gan = Parts.sw();
        gan.pn = "TST-GAN";
        gan.tech = Technology.GAN_HEMT;
        gan.vBlock = 650;
        gan.vGsMax = 7;
        gan.vGsMin = -10;
        gan.vGateOn = 6;
        gan.vThMin = 1.1;
        gan.vThMax = 2.5;
        gan.qG = 6e-9;
        gan.qGVgs = 6;
        gan.qGs = 2e-9;
        gan.qGd = 2e-9;
        gan.vPlateau = 3;
        gan.cIss = 500e-12;
        gan.cRss = 5e-12;
        // {switch, high side, bus, on, off, logic, active high}
        Object[][] rows = {
            {si, false, 48.0, 10.0, 0.0, LogicFamily.LVCMOS_3V3, true},
            {si, true, 48.0, 12.0, 0.0, LogicFamily.CMOS_5V, false},
            {si, true, 24.0, 10.0, 0.0, LogicFamily.LVCMOS_1V8, true},
            {si, true, null, 10.0, 0.0, LogicFamily.LVCMOS_3V3, true},
            {sic, true, 800.0, 18.0, -4.0, LogicFamily.LVCMOS_3V3, true},
            {sic, true, 400.0, 15.0, -5.0, LogicFamily.CMOS_5V, false},
            {sic, false, 800.0, 18.0, -8.0, LogicFamily.TTL_5V, true},
            {gan, true, 400.0, 6.0, -3.0, LogicFamily.LVCMOS_3V3, true},
            {gan, false, 48.0, 5.0, 0.0, LogicFamily.LVCMOS_1V8, false},
        };
        for (Object[] r : rows) {
            OperatingPoint.Spec s = new OperatingPoint.Spec();
            s.fSw = 100e3;
            s.rG = 2.0;
            s.highSide = (Boolean) r[1];
            s.bus = (Double) r[2];
            s.vDrive = (Double) r[3];
            s.vDriveNeg = (Double) r[4];
            s.logic = (LogicFamily) r[5];
            s.activeHigh = (Boolean) r[6];
            SwitchPart sw = ((Parts.Sw) r[0]).build();
            out.add(new Q(sw.partNumber() + " " + java.util.Arrays.toString(r), sw, s.resolve(sw)));
        }
        return out;
    }

    @Test
    void everyDriverThePrefilterDropsFailsTheRules() {
        List<Row> drivers = spread(900);
        Map<Rule, Integer> dropsBy = new EnumMap<>(Rule.class);
        int requireDrops = 0;
        int kept = 0;
        for (Q q : questions()) {
            Question question = Question.ofShortlist(q.sw(), q.op(), Margins.DEFAULT);
            Prefilter p = Shortlist.prefilter(question);
            assertFalse(p.isEmpty(), q.what());
            for (Row r : drivers) {
                DriverPart d = DriverPart.of(r);
                PairResult full = Rules.evaluate(d, question);
                for (Prefilter.Condition c : p.require()) {
                    if (!ListParts.meets(c, r)) {
                        requireDrops++;
                        assertEquals(Verdict.FAIL, full.verdict(), () -> q.what() + ": " + d.partNumber()
                                + " dropped by " + c + " but " + full.verdict());
                    }
                }
                for (Prefilter.Exclusion e : p.exclude()) {
                    Prefilter only = new Prefilter(List.of(), List.of(e));
                    if (!ListParts.keeps(only, r)) {
                        dropsBy.merge(e.rule(), 1, Integer::sum);
                        Check c = full.check(e.rule()).orElseThrow();
                        assertEquals(Verdict.FAIL, c.verdict(), () -> q.what() + ": " + d.partNumber() + " skipped by "
                                + p.describe() + " but " + e.rule().id() + " says " + c.verdict() + ": " + c.message());
                    }
                }
                if (ListParts.keeps(p, r)) {
                    kept++;
                } else {
                    assertEquals(Verdict.FAIL, full.verdict(), q.what() + ": " + d.partNumber());
                }
            }
        }
        // Not vacuous: each kind of declaration dropped drivers, and many drivers were kept.
        assertTrue(requireDrops > 100, "required conditions dropped " + requireDrops);
        for (Rule r : List.of(Rule.HIGH_SIDE, Rule.LIFECYCLE, Rule.LOGIC_LEVEL, Rule.NEGATIVE_BIAS, Rule.POLARITY,
                Rule.UVLO)) {
            assertTrue(dropsBy.getOrDefault(r, 0) > 10, r + " skipped " + dropsBy.get(r));
        }
        assertTrue(kept > 200, "kept " + kept);
    }

    @Test
    void aPChannelSwitchHasNoPrefilter() {
        Parts.Sw p = Parts.sw();
        p.nChannel = false;
        SwitchPart sw = p.build();
        assertTrue(Shortlist.prefilter(Question.ofShortlist(sw, Parts.op().resolve(sw), Margins.DEFAULT)).isEmpty());
    }

    @Test
    void theQuestionsLimitsAreTheOnesTheRulesDeclare() {
        // High side, 400 V bus, +15/−5 V from 5 V CMOS, active low, on the Si MOSFET of Parts (V_GS ±20 V).
        OperatingPoint.Spec s = Parts.op();
        s.highSide = true;
        s.bus = 400.0;
        s.vDrive = 15.0;
        s.vDriveNeg = -5.0;
        s.logic = LogicFamily.CMOS_5V;
        s.activeHigh = false;
        SwitchPart sw = Parts.sw().build();
        List<String> d = Shortlist.prefilter(Question.ofShortlist(sw, s.resolve(sw), Margins.DEFAULT)).describe();
        // swing 15 − (−5) = 20 V within the supply range; 5 V CMOS V_OH 4.4, V_OL 0.1, up to 5.5 V (REFERENCES.md §6)
        for (String want : List.of("v_supply_max_v >= 20", "v_supply_min_v <= 20", "topology != low-side",
                "skip topology = high-side and v_offset_max_v < 400 (high-side fails)",
                "skip topology = half-bridge and v_offset_max_v < 400 (high-side fails)",
                "skip topology = isolated and v_iorm_v < 400 (high-side fails)",
                "skip v_ih_v > 4.4 and v_il_v known (logic-level fails)",
                "skip v_il_v < 0.1 and v_ih_v known (logic-level fails)",
                "skip v_in_max_v < 5.5 and v_ih_v known and v_il_v known (logic-level fails)",
                "skip v_neg_min_v > -5 (negative-bias fails)",
                "skip uvlo_on_v > 20 (uvlo fails)",
                "skip input_polarity without an inverting channel (polarity fails)",
                "skip lifecycle = obsolete (lifecycle fails)")) {
            assertTrue(d.contains(want), () -> want + " not in " + d);
        }
    }

    // ---------------------------------------------------------------- conditions

    @Test
    void longLimitsAreRoundedTowardsSkippingFewer() {
        double x = 2.123456789;
        // four significant digits: ≥ and < round down, ≤ and > round up
        assertEquals(2.123, Prefilter.Condition.of("v_ih_v", Op.GE, x).number());
        assertEquals(2.123, Prefilter.Condition.of("v_ih_v", Op.LT, x).number());
        assertEquals(2.124, Prefilter.Condition.of("v_ih_v", Op.LE, x).number());
        assertEquals(2.124, Prefilter.Condition.of("v_ih_v", Op.GT, x).number());
        // up to six significant digits a limit is kept as it is
        assertEquals(1.23456, Prefilter.Condition.of("v_ih_v", Op.GE, 1.23456).number());
        assertEquals(1.23456, Prefilter.Condition.of("v_ih_v", Op.LE, 1.23456).number());
        assertEquals(1.234, Prefilter.Condition.of("v_ih_v", Op.GE, 1.234567).number());
        assertEquals(-2.124, Prefilter.Condition.of("v_neg_min_v", Op.GE, -x).number(), "floor of −2.1234… is −2.124");
        // never past the limit in the direction that would skip a driver the rules keep
        for (double v : new double[] {0.22000000000000003, 19.99999999, 400.0000001, 1e-7 / 3, 123456.789}) {
            assertTrue(Prefilter.Condition.of("c", Op.GE, v).number() <= v);
            assertTrue(Prefilter.Condition.of("c", Op.LT, v).number() <= v);
            assertTrue(Prefilter.Condition.of("c", Op.LE, v).number() >= v);
            assertTrue(Prefilter.Condition.of("c", Op.GT, v).number() >= v);
        }
    }

    @Test
    void valuesPrintPlainUnlessLong() {
        assertEquals("v_ih_v > 2.124", Prefilter.Condition.of("v_ih_v", Op.GT, 2.123456789).toString());
        assertEquals("400", Prefilter.Condition.of("v_offset_max_v", Op.LT, 400).value());
        assertEquals("topology = isolated", Prefilter.Condition.is("topology", Op.EQ, "isolated").toString());
        // 24 characters printed plain: 10⁻²² is "0." and 21 zeros and "1"; 10⁻²³ would take 25
        assertEquals("0.0000000000000000000001", Prefilter.Condition.of("c", Op.GE, 1e-22).value());
        assertEquals("1.0E-23", Prefilter.Condition.of("c", Op.GE, 1e-23).value());
        assertEquals("1.0E30", Prefilter.Condition.of("c", Op.GE, 1e30).value());
    }

    @Test
    void conditionsRefuseWhatTheyCannotSay() {
        assertThrows(IllegalArgumentException.class, () -> Prefilter.Condition.of("c", Op.EQ, 1));
        assertThrows(IllegalArgumentException.class, () -> Prefilter.Condition.of("c", Op.NE, 1));
        assertThrows(IllegalArgumentException.class, () -> Prefilter.Condition.is("c", Op.GT, "x"));
        assertThrows(IllegalArgumentException.class, () -> Prefilter.Condition.is("c", Op.LE, "x"));
        assertEquals("c != x", Prefilter.Condition.is("c", Op.NE, "x").toString());
        assertThrows(NullPointerException.class, () -> Prefilter.Condition.is("c", Op.EQ, null));
        assertThrows(IllegalArgumentException.class, () -> Prefilter.Condition.of("c", Op.GE, Double.NaN));
        assertThrows(IllegalArgumentException.class, () -> Prefilter.Condition.of("c", Op.GE, Double.POSITIVE_INFINITY));
        assertThrows(NullPointerException.class, () -> new Prefilter.Condition(null, Op.GE, 1, null));
        assertThrows(NullPointerException.class, () -> new Prefilter.Condition("c", null, 1, null));
        assertNotNull(new Prefilter.Condition("c", Op.EQ, Double.NaN, "text"));
        assertThrows(NullPointerException.class,
                () -> new Prefilter.Exclusion(null, List.of(), List.of(), null));
    }

    @Test
    void emptyOnlyWithoutConditionsAndExclusions() {
        assertTrue(Prefilter.NONE.isEmpty());
        assertEquals(List.of(), Prefilter.NONE.describe());
        Prefilter.Condition c = Prefilter.Condition.of("i_source_a", Op.GE, 1);
        assertFalse(new Prefilter(List.of(c), List.of()).isEmpty());
        Prefilter skip = new Prefilter.Builder().skip(Rule.LIFECYCLE, Prefilter.Condition.is("lifecycle", Op.EQ,
                "obsolete")).build();
        assertFalse(skip.isEmpty());
        assertEquals(List.of("skip lifecycle = obsolete (lifecycle fails)"), skip.describe());
    }

    @Test
    void theBuilderCollectsEveryDeclarationInOrder() {
        Prefilter p = new Prefilter.Builder()
                .require(Prefilter.Condition.of("i_source_a", Op.GE, 1.5))
                .skip(Rule.HIGH_SIDE, Prefilter.Condition.is("topology", Op.EQ, "high-side"),
                        Prefilter.Condition.of("v_offset_max_v", Op.LT, 600))
                .skipKnown(Rule.LOGIC_LEVEL, Prefilter.Condition.of("v_ih_v", Op.GT, 2.8), "v_il_v")
                .skipText(Rule.POLARITY, new Prefilter.TextTest("input_polarity", "input_polarity without an inverting"
                        + " channel", t -> !DriverPart.offers(t, true)))
                .require(Prefilter.Condition.of("i_sink_a", Op.GE, 2))
                .build();
        assertEquals(List.of("i_source_a >= 1.5", "i_sink_a >= 2",
                "skip topology = high-side and v_offset_max_v < 600 (high-side fails)",
                "skip v_ih_v > 2.8 and v_il_v known (logic-level fails)",
                "skip input_polarity without an inverting channel (polarity fails)"), p.describe());
        assertEquals(List.of("v_il_v"), p.exclude().get(1).known());
        // the copies are the prefilter's own
        assertThrows(UnsupportedOperationException.class, () -> p.require().add(null));
        assertThrows(UnsupportedOperationException.class, () -> p.exclude().get(0).when().add(null));
    }
}
