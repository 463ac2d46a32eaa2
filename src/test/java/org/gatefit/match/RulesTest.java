package org.gatefit.match;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import java.util.function.Consumer;
import java.util.stream.Stream;
import org.gatefit.physics.LogicFamily;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * One table per rule: invented parts with round figures ({@link Parts}), each row changing the
 * baseline pair just enough for a clear-cut pass, warn, fail or unknown. The comment of a row
 * (its display name) gives the arithmetic and the source of each engineering value. Every row
 * asserts the verdict, that the message names the figures that decide it, and for a failure
 * that the message says what to do.
 *
 * <p>Margins are the defaults of {@link Margins#DEFAULT} (all "common practice, no source"):
 * drive current 1.5×, gate headroom 10 %, UVLO headroom 1 V, logic noise 0.1 V, offset 20 %,
 * isolation 2×, driver power 70 %, dv/dt 70 % of V_th,min.
 */
class RulesTest {

    /** One row: what to change from the baseline, the expected verdict of {@code rule}, and text the message must hold. */
    record Row(String why, Consumer<Parts.Sw> s, Consumer<Parts.Dr> d, Consumer<OperatingPoint.Spec> o, Verdict expect,
               List<String> mentions) {
        @Override
        public String toString() {
            return expect.id() + ": " + why;
        }
    }

    private static final Consumer<Parts.Sw> S0 = s -> { };
    private static final Consumer<Parts.Dr> D0 = d -> { };
    private static final Consumer<OperatingPoint.Spec> O0 = o -> { };

    private static Row row(Verdict v, String why, Consumer<Parts.Sw> s, Consumer<Parts.Dr> d,
                           Consumer<OperatingPoint.Spec> o, String... mentions) {
        return new Row(why, s, d, o, v, List.of(mentions));
    }

    private static void check(Rule rule, Row r) {
        Parts.Sw s = Parts.sw();
        Parts.Dr d = Parts.dr();
        OperatingPoint.Spec o = Parts.op();
        r.s().accept(s);
        r.d().accept(d);
        r.o().accept(o);
        PairResult pr = Parts.eval(s, d, o);
        Check c = pr.check(rule).orElseThrow();
        assertEquals(r.expect(), c.verdict(), () -> rule + ": " + c.message());
        for (String m : r.mentions()) {
            assertTrue(c.message().contains(m), () -> rule + " message should name '" + m + "': " + c.message());
        }
        if (c.verdict() == Verdict.FAIL) {
            assertTrue(c.message().contains(" — "), () -> "a failure says what to do after ' — ': " + c.message());
            assertEquals(0.0, c.score(), "a failing check scores 0");
            assertEquals(Verdict.FAIL, pr.verdict(), "one failing rule fails the pair");
        }
        if (c.verdict() == Verdict.UNKNOWN) {
            assertNotEquals(Verdict.PASS, pr.verdict(), "an unknown check never lets the pair pass");
        }
    }

    // ------------------------------------------------------------------ drive-current

    /*
     * drive-current: the plateau current (REFERENCES §8: (V_on − V_pl)/R_on,total and (V_pl − V_off)/
     * R_off,total, capped at the rated peak) against n·Q_gd / edge with the 1.5× margin. The slow
     * corner is 125 °C by default, where the driver's output resistance is 1.4× its 25 °C value
     * (JunctionTemperature, from memory; REFERENCES §8: 30–50 % rise over 100 K). Baseline: Q_gd
     * 15 nC over a 50 ns edge → 0.3 A, 0.45 A with margin; R_on = 1.4·2 + 2 + 1 = 5.8 Ω →
     * (10 − 5)/5.8 = 862 mA; R_off = 1.4·1 + 2 + 1 = 4.4 Ω → 5/4.4 = 1.14 A.
     */
    static Stream<Row> driveCurrent() {
        return Stream.of(
                row(Verdict.PASS, "862 mA into the turn-on plateau ≥ 1.5 × 0.3 A (§8)", S0, D0, O0, "needs 450 mA",
                        "862 mA", "125 °C", "50 ns"),
                row(Verdict.WARN, "R_g 10 Ω: 5/(2.8 + 10 + 1) = 362 mA, 1.21× the 0.3 A: above 1× but under 1.5×;"
                        + " R_g ≤ 5/0.45 − 2.8 − 1 = 7.31 Ω → E24 6.8 Ω", S0, D0, o -> o.rG = 10.0, "450 mA", "362 mA",
                        "lower R_g to 6.8 Ω"),
                row(Verdict.FAIL, "R_g 20 Ω: 5/(2.8 + 20 + 1) = 210 mA < 0.3 A; the rated 4 A would do with R_g ≤ 7.31 Ω",
                        S0, D0, o -> o.rG = 20.0, "needs 450 mA", "210 mA", "lower R_g to 6.8 Ω"),
                row(Verdict.FAIL, "rated 0.25 A < 0.3 A: pick ≥ 0.45 A (rounded up to 500 mA), or slow the edge to"
                        + " 50 ns · 0.45/0.25 = 90 ns", S0, d -> {
                            d.iSource = 0.25;
                            d.iSink = 0.25;
                        }, o -> o.rG = 0.0, "250 mA", "its rated peak", "pick a driver rated ≥ 500 mA",
                        "relax the edge to 90 ns"),
                row(Verdict.WARN, "R_g 7.5 Ω at 125 °C: 5/(2.8 + 7.5 + 1) = 442 mA, 1.47× — the hot corner decides",
                        S0, D0, o -> o.rG = 7.5, "442 mA", "125 °C"),
                row(Verdict.PASS, "R_g 7.5 Ω judged at 25 °C (--tj 25): 5/(2 + 7.5 + 1) = 476 mA, 1.59×", S0, D0, o -> {
                    o.rG = 7.5;
                    o.tj = 25.0;
                }, "476 mA", "25 °C"),
                row(Verdict.UNKNOWN, "Q_gd not known: the drain edge cannot be judged (never pass)", s -> s.qGd = Double.NaN,
                        D0, O0, "Q_gd or the plateau voltage"),
                row(Verdict.UNKNOWN, "a 11 V plateau above the 10 V on level: the edge is not driven", s -> s.vPlateau = 11,
                        D0, O0, "do not straddle"));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource
    void driveCurrent(Row r) {
        check(Rule.DRIVE_CURRENT, r);
    }

    // ------------------------------------------------------------------ gate-voltage

    static Stream<Row> gateVoltage() {
        return Stream.of(
                row(Verdict.WARN, "SiC on 20 V above the 18 V top of its recommended range (v_gate_on_max_v): more drive,"
                        + " more short-circuit current, a shorter withstand time (REFERENCES §9, common practice)",
                        s -> {
                            s.tech = Technology.SIC_MOSFET;
                            s.vGsMax = 25;
                            s.vGateOnMax = 18;
                        }, D0, o -> o.vDrive = 20.0, "18 V", "short-circuit"),
                row(Verdict.PASS, "the same range on a Si MOSFET: no short-circuit rating to lose", s -> {
                    s.vGsMax = 25;
                    s.vGateOnMax = 18;
                }, D0, o -> o.vDrive = 20.0, "20 V"),
                row(Verdict.PASS, "10 V on = the 10 V R_DS(on) is specified at (full enhancement, REFERENCES §5) and"
                        + " ≤ 20 V − 10 % = 18 V; 10 V swing within the 8–20 V supply", S0, D0, O0, "10 V", "18 V"),
                row(Verdict.WARN, "19 V on: above 18 V (20 V less 10 % headroom) but not above V_GS,max 20 V", S0, D0,
                        o -> o.vDrive = 19.0, "19 V", "18 V"),
                row(Verdict.WARN, "8 V on: above V_th,max 4 V but below the 10 V R_DS(on) is specified at (§5)", S0, D0,
                        o -> o.vDrive = 8.0, "8 V", "10 V"),
                row(Verdict.FAIL, "22 V on > V_GS,max 20 V (§5: on level ≤ V_GS,max); driver runs to 30 V", S0,
                        d -> d.vSupplyMax = 30, o -> o.vDrive = 22.0, "22 V", "20 V", "drive at 18 V or less"),
                row(Verdict.FAIL, "3.5 V on ≤ V_th,max 4 V (§5: on level above V_th,max at all); driver runs from 3 V", S0,
                        d -> d.vSupplyMin = 3, o -> o.vDrive = 3.5, "3.5 V", "4 V", "drive at 10 V or more"),
                row(Verdict.FAIL, "22 V swing above the driver's 20 V supply maximum", s -> s.vGsMax = 30, D0,
                        o -> o.vDrive = 22.0, "22 V", "20 V", "pick a driver rated ≥ 22 V"),
                row(Verdict.FAIL, "6 V swing below the driver's 8 V supply minimum", S0, D0, o -> o.vDrive = 6.0, "6 V",
                        "8 V", "raise the supply"),
                row(Verdict.FAIL, "a 7 V gate (GaN-like) at 6 V on a driver that needs 8 V: raising the supply would leave"
                        + " the window (≤ 7 V less 10 % = 6.3 V), so only another driver is advised", s -> {
                            s.vGsMax = 7;
                            s.rOnVgs = 6;
                        }, D0, o -> o.vDrive = 6.0, "8 V", "— pick a driver that runs from 6 V"),
                row(Verdict.UNKNOWN, "neither r_on_vgs_v nor v_gate_on_v: full enhancement cannot be judged", s -> {
                    s.rOnVgs = Double.NaN;
                    s.vGateOn = Double.NaN;
                }, D0, O0, "r_on_vgs_v"),
                row(Verdict.UNKNOWN, "V_GS,max unknown: the gate limit cannot be checked", s -> s.vGsMax = Double.NaN,
                        D0, O0, "V_GS,max"));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource
    void gateVoltage(Row r) {
        check(Rule.GATE_VOLTAGE, r);
    }

    // ------------------------------------------------------------------ negative-bias

    static Stream<Row> negativeBias() {
        return Stream.of(
                row(Verdict.WARN, "SiC off at −8 V, deeper than the −5 V it recommends at most (v_gate_off_min_v): its"
                        + " threshold drifts (REFERENCES §9, from memory)", s -> {
                            s.tech = Technology.SIC_MOSFET;
                            s.vGateOffMin = -5;
                        }, d -> {
                            d.vNegMin = -10;
                            d.vSupplyMax = 25;
                        }, o -> o.vDriveNeg = -8.0, "-5 V", "drifts"),
                row(Verdict.PASS, "0 V off ≥ V_GS,min −20 V, and the switch recommends 0 V", S0, D0, O0, "0 V", "-20 V"),
                row(Verdict.PASS, "−5 V off: within −20 V (less 10 %: −18 V) and the driver's −10 V rail", S0,
                        d -> d.vNegMin = -10, o -> o.vDriveNeg = -5.0, "-5 V", "-10 V"),
                row(Verdict.WARN, "−19 V off: below −20 V·0.9 = −18 V, so within 10 % of V_GS,min −20 V", S0,
                        d -> d.vNegMin = -20, o -> o.vDriveNeg = -19.0, "-19 V", "-18 V"),
                row(Verdict.WARN, "switch recommends −4 V off, stage gives 0 V, driver has no Miller clamp"
                        + " (REFERENCES §7 remedies)", s -> s.vGateOff = -4, D0, O0, "-4 V", "add a negative rail"),
                row(Verdict.FAIL, "−4 V asked of a driver without negative rail (v_neg_min_v 0 = none, DESIGN.md)", S0,
                        D0, o -> o.vDriveNeg = -4.0, "-4 V", "no negative output rail",
                        "pick a driver with a negative rail"),
                row(Verdict.FAIL, "−8 V asked of a driver whose rail goes to −5 V", S0, d -> d.vNegMin = -5,
                        o -> o.vDriveNeg = -8.0, "-8 V", "-5 V", "pick a driver rated for -8 V"),
                row(Verdict.FAIL, "−25 V off < V_GS,min −20 V (§5: off level ≥ V_GS,min)", S0, d -> d.vNegMin = -30,
                        o -> o.vDriveNeg = -25.0, "-25 V", "-20 V", "use -18 V or less negative"),
                row(Verdict.UNKNOWN, "V_GS,min unknown: the off level cannot be checked", s -> s.vGsMin = Double.NaN,
                        D0, O0, "V_GS,min"));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource
    void negativeBias(Row r) {
        check(Rule.NEGATIVE_BIAS, r);
    }

    // ------------------------------------------------------------------ uvlo

    static Stream<Row> uvlo() {
        return Stream.of(
                row(Verdict.PASS, "10 V supply ≥ UVLO rising 7 V + 1 V; UVLO falling 6.5 V ≥ plateau 5 V (§5)", S0, D0,
                        O0, "7 V", "6.5 V", "10 V"),
                row(Verdict.WARN, "UVLO rising 9.5 V: 10 V supply clears it by 0.5 V < 1 V headroom", S0, d -> {
                    d.uvloOn = 9.5;
                    d.uvloOff = 9;
                }, O0, "9.5 V", "10 V"),
                row(Verdict.FAIL, "UVLO rising 11 V > 10 V supply: never leaves lock-out (§5); needs > 11 + 1 V", S0,
                        d -> {
                            d.uvloOn = 11;
                            d.uvloOff = 10.5;
                        }, O0, "11 V", "raise the supply above 12 V"),
                row(Verdict.FAIL, "UVLO falling 4.5 V < plateau 5 V: a sagging supply leaves the switch half-on (§5);"
                        + " with the 15 % uvlo-plateau margin it needs ≥ 5.75 V", S0, d -> d.uvloOff = 4.5, O0, "4.5 V",
                        "5 V", "pick a driver with UVLO falling ≥ 5.75 V"),
                row(Verdict.FAIL, "+10/−6 V, UVLO on the total supply: UVLO falling 6.5 V leaves 6.5 − 6 = 0.5 V on the"
                        + " gate < plateau 5 V; needs UVLO falling ≥ 5.75 + 6 = 11.75 V", S0, d -> {
                            d.vNegMin = -10;
                            d.uvloTotal = true;
                        }, o -> o.vDriveNeg = -6.0, "500 mV", "pick a driver with UVLO falling ≥ 11.8 V"),
                row(Verdict.UNKNOWN, "uvlo_on_v unknown", S0, d -> {
                    d.uvloOn = Double.NaN;
                    d.uvloOff = Double.NaN;
                }, O0, "uvlo_on_v"),
                row(Verdict.UNKNOWN, "plateau, V_th,max and full-enhancement level all unknown", s -> {
                    s.vPlateau = Double.NaN;
                    s.vThMax = Double.NaN;
                    s.rOnVgs = Double.NaN;
                    s.vGateOn = Double.NaN;
                }, D0, O0, "7 V"),
                // uvlo-plateau margin 15 % above the plateau (common practice, no source): 5 V · 1.15 = 5.75 V.
                row(Verdict.WARN, "UVLO falling 5.5 V: above the 5 V plateau but under 5.75 V", S0, d -> d.uvloOff = 5.5,
                        O0, "5.5 V", "15 %", "UVLO falling ≥ 5.75 V"),
                // What the UVLO monitors (REFERENCES §5): +10/−3 V, UVLO falling 6.5 V. On the positive rail the gate
                // keeps 6.5 V ≥ 5.75 V; on the total supply it keeps 6.5 − 3 = 3.5 V < 5 V (half-on).
                row(Verdict.WARN, "reference unknown, +10/−3 V: positive-rail reading 6.5 V passes, total-supply reading"
                        + " 3.5 V fails — they disagree", S0, d -> d.vNegMin = -10, o -> o.vDriveNeg = -3.0,
                        "uvlo_monitors", "6.5 V", "3.5 V"),
                row(Verdict.PASS, "UVLO on the positive rail, +10/−3 V: 6.5 V at lock-out ≥ 5.75 V", S0, d -> {
                    d.vNegMin = -10;
                    d.uvloTotal = false;
                }, o -> o.vDriveNeg = -3.0, "positive rail", "6.5 V"),
                row(Verdict.FAIL, "UVLO on the total supply, +10/−3 V: 3.5 V at lock-out < 5 V plateau; needs UVLO falling"
                        + " ≥ 5.75 + 3 = 8.75 V", S0, d -> {
                            d.vNegMin = -10;
                            d.uvloTotal = true;
                        }, o -> o.vDriveNeg = -3.0, "3.5 V", "UVLO falling ≥ 8.75 V"),
                // IGBT: near the plateau at rated current it desaturates (REFERENCES §9 practice; from memory).
                row(Verdict.PASS, "IGBT, +15 V, plateau 9 V, UVLO 12/11 V: 11 V ≥ 9·1.15 = 10.35 V, but below the 15 V"
                        + " V_CE(sat) level the sentence warns of desaturation", IGBT, d -> {
                            d.uvloOn = 12;
                            d.uvloOff = 11;
                        }, o -> o.vDrive = 15.0, "desaturate", "15 V"),
                row(Verdict.WARN, "IGBT, UVLO falling 10 V < 10.35 V: near the plateau an IGBT desaturates", IGBT, d -> {
                    d.uvloOn = 12;
                    d.uvloOff = 10;
                }, o -> o.vDrive = 15.0, "desaturates", "10.4 V"),
                // Advice stays in the gate window: V_GS,max 20 V less 10 % = 18 V; starting needs 19 + 1 = 20 V.
                row(Verdict.FAIL, "UVLO rising 19 V: starting needs 20 V on the gate, beyond the 18 V window", S0, d -> {
                    d.uvloOn = 19;
                    d.uvloOff = 18;
                }, O0, "no on level within the switch's gate window", "lower UVLO"));
    }

    /** An IGBT with round figures: plateau 9 V, V_th 5–6.5 V, V_CE(sat) specified at 15 V, ±20 V. */
    private static final Consumer<Parts.Sw> IGBT = s -> {
        s.tech = Technology.IGBT;
        s.vPlateau = 9;
        s.vThMin = 5;
        s.vThMax = 6.5;
        s.rOnVgs = 15;
        s.vGateOn = 15;
        s.qGVgs = 15;
    };

    @ParameterizedTest(name = "{0}")
    @MethodSource
    void uvlo(Row r) {
        check(Rule.UVLO, r);
    }

    // ------------------------------------------------------------------ logic-level

    static Stream<Row> logicLevel() {
        return Stream.of(
                row(Verdict.PASS, "LVCMOS 3.3 V at its minimum supply 3.0 V (REFERENCES §9: judge every family there):"
                        + " V_OH 3.0 − 0.2 = 2.8, V_OL 0.2 (JESD8C.01, from memory) into V_IH 2.0 / V_IL 0.8: NM_H 0.8 V,"
                        + " NM_L 0.6 V (REFERENCES §6)", S0, D0, O0, "800 mV", "600 mV"),
                row(Verdict.WARN, "V_IH 2.75 V: NM_H = 2.8 − 2.75 = 50 mV < 0.1 V", S0, d -> d.vIh = 2.75, O0, "50 mV",
                        "2.75 V"),
                row(Verdict.FAIL, "5 V CMOS thresholds V_IH 3.5 / V_IL 1.5 (0.7/0.3·V_CC, from memory): NM_H = 2.8 − 3.5"
                        + " = −0.7 V (§6); needs V_IH ≤ 2.8 − 0.1 = 2.7 V", S0, d -> {
                            d.vIh = 3.5;
                            d.vIl = 1.5;
                        }, O0, "3.5 V", "-700 mV", "pick a driver with V_IH ≤ 2.7 V"),
                row(Verdict.FAIL, "V_IL 0.15 V < V_OL 0.2 V: NM_L −50 mV", S0, d -> d.vIl = 0.15, O0, "-50 mV",
                        "pick a driver with V_IL ≥ 300 mV"),
                row(Verdict.FAIL, "5 V CMOS controller, up to the top of its 4.5–5.5 V supply, into a 3.6 V input maximum",
                        S0, d -> d.vInMax = 3.6, o -> o.logic = LogicFamily.CMOS_5V, "5.5 V", "3.6 V", "add a level shifter"),
                row(Verdict.UNKNOWN, "v_ih_v unknown", S0, d -> d.vIh = Double.NaN, O0, "v_ih_v"));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource
    void logicLevel(Row r) {
        check(Rule.LOGIC_LEVEL, r);
    }

    // ------------------------------------------------------------------ polarity

    static Stream<Row> polarity() {
        return Stream.of(
                row(Verdict.PASS, "non-inverting input, active-high PWM", S0, D0, O0, "non-inverting"),
                row(Verdict.PASS, "channel A non-inverting, B inverting, active-low PWM: use channel 2", S0,
                        d -> d.inverting = List.of(false, true), o -> o.activeHigh = false, "channel 2"),
                row(Verdict.WARN, "inverting input with active-low PWM: on while the pin is low or unpowered", S0,
                        d -> d.inverting = List.of(true), o -> o.activeHigh = false, "add a pull-up"),
                row(Verdict.FAIL, "inverting input with active-high PWM: on when it should be off", S0,
                        d -> d.inverting = List.of(true), O0, "inverting", "use the non-inverting variant"),
                row(Verdict.FAIL, "non-inverting input with active-low PWM", S0, D0, o -> o.activeHigh = false,
                        "active-low", "use an inverting driver"));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource
    void polarity(Row r) {
        check(Rule.POLARITY, r);
    }

    /** Polarity has no unknown: input_polarity is a required column and a driver without one is refused. */
    @Test
    void aDriverWithoutInputPolarityIsRefused() {
        Parts.Dr d = Parts.dr();
        d.inverting = List.of();
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, d::build);
        assertTrue(e.getMessage().contains("expected an input polarity"), e.getMessage());
    }

    // ------------------------------------------------------------------ high-side

    private static final Consumer<OperatingPoint.Spec> HIGH = o -> o.highSide = true;

    /** An isolated driver with a 150 kV/µs (150 V/ns) CMTI and no isolation ratings yet. */
    private static final Consumer<Parts.Dr> ISO = d -> {
        d.topology = Topology.ISOLATED;
        d.cmti = 150e9;
    };

    static Stream<Row> highSide() {
        return Stream.of(
                row(Verdict.PASS, "low side: nothing floats", S0, D0, O0, "low side"),
                row(Verdict.PASS, "200 V offset ≥ 48 V bus + 20 % = 57.6 V", S0, D0, HIGH, "200 V", "48 V"),
                row(Verdict.WARN, "180 V bus: 200 V ≥ 180 V but < 180·1.2 = 216 V", S0, D0,
                        HIGH.andThen(o -> o.bus = 180.0), "180 V", "pick a driver rated ≥ 216 V"),
                row(Verdict.FAIL, "250 V bus above the 200 V offset rating; needs 250·1.2 = 300 V", S0, D0,
                        HIGH.andThen(o -> o.bus = 250.0), "250 V", "pick a driver rated ≥ 300 V"),
                row(Verdict.FAIL, "a low-side driver cannot float", S0, d -> d.topology = Topology.LOW_SIDE, HIGH,
                        "low-side", "pick a high-side, half-bridge or isolated driver"),
                row(Verdict.UNKNOWN, "v_offset_max_v unknown", S0, d -> d.vOffsetMax = Double.NaN, HIGH,
                        "v_offset_max_v"),
                // Switch-node overshoot L·I/t_fall (plain circuit theory, v = L·di/dt): the current falls as
                // the gate goes from the 5 V plateau to V_th,max 4 V through 1 + 2 + 1 Ω and C_iss 3 nF at
                // 25 °C (the fastest corner): 12 ns · ln(5/4) = 2.678 ns (REFERENCES §1's RC form).
                row(Verdict.PASS, "100 V bus, 2 nH, 10 A: 20 nV·s / 2.678 ns = 7.47 V; (100 + 7.47)·1.2 = 129 V ≤ 200 V",
                        S0, D0, HIGH.andThen(o -> {
                            o.bus = 100.0;
                            o.powerLoop = 2e-9;
                            o.iLoad = 10.0;
                        }), "7.47 V", "overshoot"),
                row(Verdict.WARN, "150 V bus, 5 nH, 10 A: 18.7 V; (150 + 18.7)·1.2 = 202 V > 200 V ≥ the bus", S0, D0,
                        HIGH.andThen(o -> {
                            o.bus = 150.0;
                            o.powerLoop = 5e-9;
                            o.iLoad = 10.0;
                        }), "18.7 V", "202 V"),
                row(Verdict.UNKNOWN, "bus not given", S0, D0, HIGH.andThen(o -> o.bus = null), "--bus"),
                // Isolated: V_IORM (peak working voltage, IEC 60747-17's definition; REFERENCES §9) against the
                // bus plus the 20 % overshoot allowance (offset margin, common practice, no source). Turn-on
                // plateau Q_gd·R/(V−V_pl) = 15 nC·(2+2+1) Ω/(10−5) V = 15 ns (REFERENCES §1), so the
                // The fastest edge at either corner (25 °C here) sets the CMTI need: turn-on 800 V in 15 nC/1 A =
                // 15 ns (53.3 V/ns), turn-off 15 nC at 5 V/4 Ω = 1.25 A → 12 ns (66.7 V/ns; 48 V: 4 V/ns);
                // CMTI margin 2× (common practice).
                row(Verdict.PASS, "isolated, V_IORM 1.5 kV peak ≥ 800·1.2 = 960 V; CMTI 150 V/ns ≥ 2·66.7 V/ns", S0,
                        ISO.andThen(d -> d.vIorm = 1500), HIGH.andThen(o -> o.bus = 800.0), "1.5 kV", "800 V", "CMTI"),
                row(Verdict.WARN, "isolated, V_IORM 900 V peak ≥ 800 V bus but < 960 V", S0, ISO.andThen(d -> d.vIorm = 900),
                        HIGH.andThen(o -> o.bus = 800.0), "900 V", "960 V"),
                row(Verdict.FAIL, "isolated, V_IORM 700 V peak < 800 V bus", S0, ISO.andThen(d -> d.vIorm = 700),
                        HIGH.andThen(o -> o.bus = 800.0), "700 V", "V_IORM ≥ 960 V"),
                row(Verdict.WARN, "isolated, only a 5 kV rms one-minute withstand at an 800 V bus: a test level, the"
                        + " working voltage is unknown (REFERENCES §9) — never a pass above 60 V (IEC 62368-1 ES1, from memory)",
                        S0, ISO.andThen(d -> d.isolationVrms = 5000), HIGH.andThen(o -> o.bus = 800.0), "5 kV",
                        "working isolation voltage", "960 V"),
                row(Verdict.PASS, "isolated, 5 kV rms withstand at a 48 V bus (≤ 60 V): 5 kV ≥ 2·48 V; CMTI 150 V/ns ≥"
                        + " 2·3.2 V/ns", S0, ISO.andThen(d -> d.isolationVrms = 5000), HIGH, "5 kV", "48 V"),
                row(Verdict.WARN, "isolated, 60 V rms withstand at a 48 V bus: ≥ the bus but < 2·48 V", S0,
                        ISO.andThen(d -> d.isolationVrms = 60), HIGH, "60 V", "48 V"),
                row(Verdict.FAIL, "isolated, 600 V rms withstand < 800 V bus", S0, ISO.andThen(d -> d.isolationVrms = 600),
                        HIGH.andThen(o -> o.bus = 800.0), "600 V", "V_IORM) is ≥ 960 V"),
                row(Verdict.UNKNOWN, "isolated with unknown isolation ratings", S0, d -> d.topology = Topology.ISOLATED,
                        HIGH, "isolation"),
                row(Verdict.FAIL, "isolated, CMTI 40 V/ns < the 66.7 V/ns switch node", S0,
                        ISO.andThen(d -> { d.vIorm = 1500; d.cmti = 40e9; }), HIGH.andThen(o -> o.bus = 800.0),
                        "66.7 V/ns", "CMTI ≥ 133 V/ns"),
                row(Verdict.WARN, "isolated, CMTI 80 V/ns ≥ 66.7 V/ns but < 2× = 133 V/ns", S0,
                        ISO.andThen(d -> { d.vIorm = 1500; d.cmti = 80e9; }), HIGH.andThen(o -> o.bus = 800.0), "80 V/ns",
                        "133 V/ns"),
                row(Verdict.UNKNOWN, "isolated, working voltage fine but CMTI unknown with the dv/dt estimated", S0,
                        ISO.andThen(d -> { d.vIorm = 1500; d.cmti = Double.NaN; }), HIGH.andThen(o -> o.bus = 800.0),
                        "cmti_kv_us"),
                row(Verdict.FAIL, "bootstrapped level shifter with a 2 V/ns dv/dt immunity < the 3.2 V/ns switch node", S0,
                        d -> d.cmti = 2e9, HIGH, "4 V/ns", "CMTI ≥ 8 V/ns"),
                row(Verdict.PASS, "bootstrapped with CMTI unknown: offset judged alone (a level shifter's immunity is"
                        + " judged only where given)", S0, D0, HIGH, "200 V"));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource
    void highSide(Row r) {
        check(Rule.HIGH_SIDE, r);
    }

    // ------------------------------------------------------------------ bootstrap

    /** High side at 12 V: Q_g at 12 V = 50 nC + 4 nC/V·2 V = 58 nC (slope (50−15−15)/(10−5), piecewise-linear curve). */
    private static final Consumer<OperatingPoint.Spec> HIGH12 = o -> {
        o.highSide = true;
        o.vDrive = 12.0;
    };

    /** An e-mode GaN HEMT with round figures: V_GS −10 V to 7 V, full enhancement at 6 V, plateau 3 V. */
    private static final Consumer<Parts.Sw> GAN = s -> {
        s.tech = Technology.GAN_HEMT;
        s.vGsMax = 7;
        s.vGsMin = -10;
        s.vThMin = 1.1;
        s.vThMax = 2.5;
        s.rOnVgs = 6;
        s.vGateOn = 6;
        s.vPlateau = 3;
        s.qG = 2.2e-9;
        s.qGVgs = 6;
        s.qGs = 0.7e-9;
        s.qGd = 0.6e-9;
        s.cIss = 125e-12;
        s.cRss = 0.6e-12;
    };
    /** A GaN half-bridge driver: 4.5–6.5 V supply, UVLO 4 / 3.6 V. */
    private static final Consumer<Parts.Dr> GAN_DR = d -> {
        d.vSupplyMin = 4.5;
        d.vSupplyMax = 6.5;
        d.uvloOn = 4;
        d.uvloOff = 3.6;
    };
    private static final Consumer<OperatingPoint.Spec> HIGH_GAN = o -> {
        o.highSide = true;
        o.vDrive = 6.0;
        o.edge = 10e-9;
        o.dutyMax = 0.5;
    };

    static Stream<Row> bootstrap() {
        return Stream.of(
                row(Verdict.PASS, "low side: no bootstrap", S0, D0, O0, "low side"),
                row(Verdict.PASS, "isolated output needs its own supply, no duty limit", S0, d -> {
                    d.topology = Topology.ISOLATED;
                    d.isolationVrms = 5000;
                }, HIGH12.andThen(o -> o.dutyMax = 1.0), "isolated"),
                // Charge per cycle (REFERENCES §4, §9): Q = 58 nC + (50 µA I_qbs + 50 µA leakage allowance, from
                // memory)·t_on; ΔV = 12 − 0.7 − max(UVLO,off 6.5, full 10) = 1.3 V; C_min = Q/ΔV; nominal = E12 above
                // 3·C_min / 0.5 (half the capacitance left at DC bias, REFERENCES §9 from memory). Duty limit by the
                // steady-state balance (§9): 11.3 − 100 µA·2.2 Ω − (58 nC + 100 µA·D·10 µs)
                // / (135 nF·(1 − e^(−(1−D)·10 µs/297 ns))) = 10 V → D ≈ 0.988 (computed; BootstrapBalanceTest holds
                // the closed form to a cycle-by-cycle simulation). Three time constants of 270 nF would have said 82 %.
                row(Verdict.PASS, "duty 0.5: Q = 58 + 100 µA·5 µs = 58.5 nC, C_min = 45 nF, 270 nF nominal (135 nF at"
                        + " bias); balance limit 98.8 % ≥ 50 %", S0, D0, HIGH12.andThen(o -> o.dutyMax = 0.5), "45 nF",
                        "270 nF", "98.8 %"),
                row(Verdict.FAIL, "duty 100 %: a bootstrap recharges only while the low side is on (§4)", S0, D0,
                        HIGH12.andThen(o -> o.dutyMax = 1.0), "100 %", "cap the duty at 98.8 %"),
                row(Verdict.PASS, "duty 95 % passes the charge balance (98.8 %) though it failed the old three-time-constant"
                        + " rule (1 − 3·2.2 Ω·330 nF·100 kHz = 78 %)", S0, D0, HIGH12.andThen(o -> o.dutyMax = 0.95), "95 %",
                        "98.8 %"),
                row(Verdict.FAIL, "duty 99 % > the 98.8 % balance limit", S0, D0, HIGH12.andThen(o -> o.dutyMax = 0.99),
                        "99 %", "98.8 %", "lower the duty"),
                row(Verdict.FAIL, "duty 95 % with a 10 kΩ bootstrap resistance: τ = 10 kΩ·135 nF = 1.35 ms ≫ the 0.5 µs"
                        + " off time, the balance limit falls far below", S0, D0, HIGH12.andThen(o -> {
                            o.dutyMax = 0.95;
                            o.rBoot = 10e3;
                        }), "95 %", "bootstrap resistance"),
                row(Verdict.UNKNOWN, "duty not given: the refresh limit cannot be checked; t_on taken as 1/f = 10 µs, so"
                        + " Q = 58 nC + 100 µA·10 µs = 59 nC and C ≥ 59 nC / 1.3 V = 45.4 nF (§4)", S0, D0, HIGH12,
                        "45.4 nF", "--duty-max"),
                // GaN high side (REFERENCES §9, from memory): the low-side GaN conducts in reverse in dead time at
                // about 2.5 V, so the capacitor charges to 6 − 0.7 + 2.5 = 7.8 V > V_GS,max 7 V.
                row(Verdict.FAIL, "GaN, 6 V drive, no clamp: 7.8 V > 7 V; lowering V_DD to ≤ 6.3 + 0.7 − 2.5 = 4.5 V would"
                        + " leave the low side below its 6 V full enhancement, so nothing in the window works", GAN, GAN_DR,
                        HIGH_GAN, "7.8 V", "no supply level in the switch's gate window", "clamp", "isolated supply"),
                row(Verdict.WARN, "GaN with a 6.5 V bootstrap clamp: 6.5 V ≤ 7 V but above 7 V less 10 % = 6.3 V", GAN,
                        GAN_DR.andThen(d -> d.bootClamp = 6.5), HIGH_GAN, "6.5 V", "within 10 %"),
                row(Verdict.WARN, "GaN with a 6.2 V clamp: no over-charge, but V_DD − V_F = 5.3 V < 6 V full enhancement and"
                        + " raising V_DD to 6.7 V exceeds the 6.3 V window: the advice says so instead", GAN,
                        GAN_DR.andThen(d -> d.bootClamp = 6.2), HIGH_GAN, "5.3 V", "no supply level in the switch's gate"
                        + " window", "isolated supply"),
                row(Verdict.WARN, "external diode needed, but the bus (its rating) is not given", S0,
                        d -> d.bootstrapDiode = false, HIGH12.andThen(o -> {
                            o.dutyMax = 0.5;
                            o.bus = null;
                        }), "external fast diode"),
                row(Verdict.WARN, "10 V drive: V_drive − V_F = 9.3 V is below the 10 V full-enhancement level but above"
                        + " UVLO,off 6.5 V, so the capacitor is sized to UVLO (§4: ΔV ≤ V_DD − V_F − V_UVLO,off) and"
                        + " the high-side gate sits below full enhancement: raise V_drive to 10 + 0.7 V", S0, D0,
                        o -> {
                            o.highSide = true;
                            o.dutyMax = 0.5;
                        }, "9.3 V", "10 V", "10.7 V"),
                row(Verdict.FAIL, "V_drive − V_F = 6.3 V ≤ UVLO,off 6.5 V: no capacitor helps", S0, D0, o -> {
                    o.highSide = true;
                    o.vDrive = 7.0;
                    o.dutyMax = 0.5;
                }, "6.3 V", "6.5 V", "raise V_drive"),
                row(Verdict.FAIL, "a low-side driver has no floating supply", S0, d -> d.topology = Topology.LOW_SIDE,
                        HIGH12.andThen(o -> o.dutyMax = 0.5), "low-side", "pick a high-side, half-bridge or isolated"),
                row(Verdict.UNKNOWN, "UVLO and full-enhancement level unknown: no droop limit", s -> {
                    s.rOnVgs = Double.NaN;
                    s.vGateOn = Double.NaN;
                }, d -> {
                    d.uvloOn = Double.NaN;
                    d.uvloOff = Double.NaN;
                }, HIGH12.andThen(o -> o.dutyMax = 0.5), "UVLO"));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource
    void bootstrap(Row r) {
        check(Rule.BOOTSTRAP, r);
    }

    // ------------------------------------------------------------------ driver-power

    static Stream<Row> driverPower() {
        // Per package (the baseline driver has 2 channels; all switch unless --channels-used says fewer):
        // P_G = 50 nC·10 V·100 kHz = 50 mW (REFERENCES §2); share per channel 25 mW·(2/5 + 1/4) = 16.25 mW.
        Consumer<OperatingPoint.Spec> one = o -> o.channelsUsed = 1;
        return Stream.of(
                row(Verdict.PASS, "2 channels × 16.25 mW = 32.5 mW ≤ 0.7·1 W", S0, D0, O0, "32.5 mW", "2 channels", "1 W"),
                row(Verdict.WARN, "P_max 40 mW: 32.5 mW > 0.7·40 = 28 mW but ≤ 40 mW", S0, d -> d.pMax = 0.04, O0,
                        "40 mW", "70 %"),
                row(Verdict.FAIL, "P_max 20 mW < 32.5 mW for both channels", S0, d -> d.pMax = 0.02, O0, "20 mW",
                        "add external gate resistance"),
                row(Verdict.WARN, "--channels-used 1, P_max 20 mW: 16.25 mW > 14 mW but ≤ 20 mW", S0, d -> d.pMax = 0.02,
                        one, "16.3 mW", "1 channel"),
                row(Verdict.WARN, "one channel with 2 mA output-side quiescent: 16.25 + 10 V·2 mA = 36.25 mW > 0.7·40 mW",
                        S0, d -> {
                            d.pMax = 0.04;
                            d.iQOut = 2e-3;
                        }, one, "36.3 mW"),
                row(Verdict.PASS, "one high-side channel: 16.25 + I_qbs 50 µA·10 V = 16.75 mW ≤ 0.7·30 mW", S0,
                        d -> d.pMax = 0.03, one.andThen(HIGH), "16.8 mW"),
                row(Verdict.WARN, "plus level shift Q_ls·V_bus·f = 2 nC·48 V·100 kHz = 9.6 mW (REFERENCES §2):"
                        + " 26.35 mW > 21 mW", S0, d -> {
                            d.pMax = 0.03;
                            d.qLs = 2e-9;
                        }, one.andThen(HIGH), "26.4 mW"),
                row(Verdict.UNKNOWN, "p_max_w unknown", S0, d -> d.pMax = Double.NaN, O0, "p_max_w"),
                row(Verdict.UNKNOWN, "Q_g unknown", s -> s.qG = Double.NaN, D0, O0, "gate charge"));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource
    void driverPower(Row r) {
        check(Rule.DRIVER_POWER, r);
    }

    // ------------------------------------------------------------------ dv-dt

    /**
     * REFERENCES §7 check: C_gd 10 pF, 50 V/ns, R_off 6 Ω (1 Ω sink + 4 Ω R_g,off + 1 Ω internal),
     * C_iss 1 nF, 400 V step → V_pk = 3.0 V·(1 − e^(−8 ns/6 ns)) = 2.21 V. Charge-consistent (§8):
     * C_gd averaged over the swing is Q_gd / V_bus, so Q_gd = 10 pF × 400 V = 4 nC gives the same
     * 10 pF; judged at 25 °C only (--tj 25), where the catalog's V_th,min applies.
     */
    private static Consumer<Parts.Sw> sec7(double vThMin) {
        return s -> {
            s.qGd = 4e-9;
            s.cRss = 10e-12;
            s.cIss = 1e-9;
            s.vThMin = vThMin;
        };
    }

    private static final Consumer<OperatingPoint.Spec> SLEW50 = o -> {
        o.bus = 400.0;
        o.dvdt = 50e9;
        o.rGOff = 4.0;
        o.tj = 25.0;
    };

    /** The baseline in a half-bridge: the twin (the same pair) turns on against the off switch. */
    private static final Consumer<OperatingPoint.Spec> TWIN = o -> o.bridge = true;

    /*
     * Baseline in a bridge (§8, charge-consistent; V_th −6 mV/K from memory, REFERENCES §8 −4 to −7):
     * at 25 °C the twin's plateau current 5 V/5 Ω = 1 A moves 48 V in 15 nC/1 A = 15 ns (3.2 V/ns);
     * C_gd,avg 15 nC/48 V = 312.5 pF carries 1 A through 4 Ω (1 + 2 + 1) and C_iss 3 nF:
     * 4 V·(1 − e^(−15/12)) = 2.85 V against V_th,min 2 V. At 125 °C: 862 mA, 2.76 V/ns, 4.4 Ω →
     * 3.79 V·(1 − e^(−17.4/13.2)) = 2.78 V against 2 − 0.6 = 1.4 V: the hot corner decides.
     */
    static Stream<Row> dvdt() {
        return Stream.of(
                row(Verdict.PASS, "2.21 V (§7) ≤ 0.7 · V_th,min 4 V = 2.8 V", sec7(4), D0, SLEW50, "2.21 V", "50 V/ns",
                        "6 Ω", "4 V"),
                row(Verdict.WARN, "2.21 V above 0.7·3 V = 2.1 V, below V_th,min 3 V", sec7(3), D0, SLEW50, "2.21 V",
                        "3 V"),
                row(Verdict.FAIL, "2.21 V ≥ V_th,min 2 V, no clamp: false turn-on (§7)", sec7(2), D0, SLEW50, "2.21 V",
                        "2 V", "a driver with a Miller clamp"),
                row(Verdict.PASS, "−4 V off: 2.21 − 4 = −1.79 V ≤ 1.4 V (§7: risk if V_pk + V_off ≥ V_th,min)", sec7(2),
                        d -> d.vNegMin = -10, SLEW50.andThen(o -> o.vDriveNeg = -4.0), "-1.79 V"),
                row(Verdict.FAIL, "V_th,min 2.8 V: 2.21 V warns at 25 °C, but at 125 °C the sink is 1.4 Ω (6.4 Ω path):"
                        + " 3.2 V·(1 − e^(−8/6.4)) = 2.28 V ≥ 2.8 − 0.6 = 2.2 V", sec7(2.8), D0,
                        SLEW50.andThen(o -> o.tj = 125.0), "2.28 V", "2.2 V", "125 °C"),
                row(Verdict.FAIL, "baseline in a bridge: 2.78 V ≥ 1.4 V at 125 °C", S0, D0, TWIN, "2.78 V", "1.4 V",
                        "125 °C", "2.76 V/ns"),
                row(Verdict.FAIL, "a Miller clamp bypasses R_g,off (hold 1.4 + 1 = 2.4 Ω) but 0.862 A still lifts the"
                        + " gate to 1.88 V ≥ 1.4 V: a clamp is judged, not trusted", S0, d -> d.millerClamp = true, TWIN,
                        "1.88 V", "Miller clamp's path"),
                row(Verdict.PASS, "dv/dt given 0.5 V/ns: 156 mA through 4.4 Ω, 687 mV (hot) ≤ 0.7·1.4 V = 980 mV", S0, D0,
                        TWIN.andThen(o -> o.dvdt = 0.5e9), "687 mV", "0.5 V/ns"),
                row(Verdict.PASS, "bridge: no — no other switch turns on against this one", S0, D0, O0, "bridge: no"),
                row(Verdict.UNKNOWN, "V_th,min unknown", s -> s.vThMin = Double.NaN, D0, TWIN, "V_th,min"),
                row(Verdict.UNKNOWN, "Q_gd unknown: C_rss alone would understate the charge", s -> s.qGd = Double.NaN, D0,
                        TWIN, "Q_gd"),
                row(Verdict.UNKNOWN, "no bus: the Miller current cannot be computed", S0, D0, TWIN.andThen(o -> o.bus = null),
                        "bus voltage unknown"));
    }

    /*
     * gate-ringing (REFERENCES §3 and §8: first peak overshoots by exp(−πζ/√(1−ζ²)) of the step;
     * ngspice cross-check in physics/NgspiceCrossCheckTest). C_iss 200 pF, loop 10 nH, at 25 °C (the
     * fast corner): ζ_on = (5/2)·√(200p/10n) = 0.354 → 30.5 % → peak 13.05 V; ζ_off = (4/2)·0.1414
     * = 0.283 → 39.6 % → trough −3.96 V.
     */
    private static final Consumer<Parts.Sw> SMALL_GATE = s -> s.cIss = 200e-12;

    static Stream<Row> gateRinging() {
        return Stream.of(
                row(Verdict.PASS, "baseline C_iss 3 nF: ζ_on = 2.5·√(3n/10n) = 1.37 ≥ 1, no overshoot", S0, D0, O0,
                        "does not overshoot"),
                row(Verdict.PASS, "13.05 V peak, −3.96 V trough within ±20 V less 10 %", SMALL_GATE, D0, O0, "13.1 V",
                        "-3.96 V"),
                row(Verdict.FAIL, "V_GS,max 12 V < 13.05 V: allowed overshoot (10.8 − 10)/10 = 8 % → ζ 0.627 →"
                        + " R_total 2ζ√(L/C) = 8.86 Ω → R_g ≥ 5.86 → E24 6.2 Ω, or L ≤ (5/(2·0.627))²·200 pF = 3.18 nH",
                        SMALL_GATE.andThen(s -> s.vGsMax = 12), D0, O0, "13.1 V", "raise R_g to ≥ 6.2 Ω",
                        "3.18 nH"),
                row(Verdict.WARN, "V_GS,max 14 V: 13.05 V inside the 10 % headroom (12.6 V)",
                        SMALL_GATE.andThen(s -> s.vGsMax = 14), D0, O0, "headroom"),
                row(Verdict.FAIL, "V_GS,min −3 V > −3.96 V trough", SMALL_GATE.andThen(s -> s.vGsMin = -3), D0, O0,
                        "-3.96 V", "V_GS,min"),
                row(Verdict.FAIL, "−40 °C is the fast corner (driver 0.74×, ζ 0.317 → 35 % → 13.5 V > 13.3 V) though"
                        + " 25 °C would only warn", SMALL_GATE.andThen(s -> s.vGsMax = 13.3), D0, o -> o.tj = -40.0,
                        "13.5 V", "-40 °C"),
                row(Verdict.UNKNOWN, "C_iss unknown", s -> s.cIss = Double.NaN, D0, O0, "C_iss"),
                row(Verdict.UNKNOWN, "rings but V_GS,min unknown", SMALL_GATE.andThen(s -> s.vGsMin = Double.NaN), D0, O0,
                        "unknown"));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource
    void gateRinging(Row r) {
        check(Rule.GATE_RINGING, r);
    }

    // ------------------------------------------------------------------ protection

    /** An IGBT on 400 V: above the 100 V protection-bus margin (common practice, no source). */
    private static final Consumer<Parts.Sw> IGBT_SW = s -> s.tech = Technology.IGBT;
    private static final Consumer<OperatingPoint.Spec> BUS400 = o -> o.bus = 400.0;

    /*
     * protection (REFERENCES §9: IGBT and SiC withstand times of a few µs at a stated gate voltage;
     * desaturation detection with soft turn-off is the usual protection).
     */
    static Stream<Row> protection() {
        return Stream.of(
                row(Verdict.PASS, "a Si MOSFET: desaturation detection not expected", S0, D0, O0, "not expected"),
                row(Verdict.PASS, "an IGBT at 48 V: at or below the 100 V protection bus", IGBT_SW, D0, O0, "100 V"),
                row(Verdict.UNKNOWN, "an IGBT at 400 V, the driver's desat column empty", IGBT_SW, D0, BUS400, "desat"),
                row(Verdict.WARN, "an IGBT at 400 V on a driver without detection", IGBT_SW, d -> d.desat = false, BUS400,
                        "no desaturation"),
                row(Verdict.PASS, "detection in 1.5 µs inside a 5 µs withstand time", IGBT_SW.andThen(s -> s.tSc = 5e-6),
                        d -> {
                            d.desat = true;
                            d.tDesat = 1.5e-6;
                            d.softOff = true;
                        }, BUS400, "1.5 µs", "5 µs", "soft turn-off"),
                row(Verdict.WARN, "detection in 3 µs, not before a 2 µs withstand time",
                        IGBT_SW.andThen(s -> s.tSc = 2e-6), d -> {
                            d.desat = true;
                            d.tDesat = 3e-6;
                        }, BUS400, "3 µs", "2 µs"),
                row(Verdict.UNKNOWN, "detection but no withstand time: the timing is unknown", IGBT_SW, d -> {
                    d.desat = true;
                    d.tDesat = 1.5e-6;
                }, BUS400, "t_sc_us"),
                row(Verdict.UNKNOWN, "a SiC stage without a bus", s -> s.tech = Technology.SIC_MOSFET, D0,
                        o -> o.bus = null, "bus voltage unknown"));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource
    void protection(Row r) {
        check(Rule.PROTECTION, r);
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource
    void dvdt(Row r) {
        check(Rule.DV_DT, r);
    }

    // ------------------------------------------------------------------ lifecycle

    static Stream<Row> lifecycle() {
        return Stream.of(
                row(Verdict.PASS, "both active and in stock", S0, D0, O0, "active", "in stock"),
                row(Verdict.WARN, "driver nrnd", S0, d -> d.lifecycle = "nrnd", O0, "TST-D1", "not recommended"),
                row(Verdict.WARN, "switch at last-time buy", s -> s.lifecycle = "ltb", D0, O0, "TST-S1",
                        "last-time buy"),
                row(Verdict.WARN, "driver in preview", S0, d -> d.lifecycle = "preview", O0, "not yet in production"),
                row(Verdict.WARN, "switch out of stock", s -> s.stock = 0, D0, O0, "out of stock"),
                row(Verdict.FAIL, "driver obsolete", S0, d -> d.lifecycle = "obsolete", O0, "obsolete",
                        "find a replacement"),
                row(Verdict.UNKNOWN, "lifecycle unknown", S0, d -> d.lifecycle = "unknown", O0, "no lifecycle status"));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource
    void lifecycle(Row r) {
        check(Rule.LIFECYCLE, r);
    }

    // ------------------------------------------------------------------ the pair

    @Test
    void theBaselinePairPassesEveryRule() {
        PairResult r = Parts.eval(Parts.sw(), Parts.dr(), Parts.op());
        for (Check c : r.checks()) {
            assertEquals(Verdict.PASS, c.verdict(), () -> c.rule() + ": " + c.message());
        }
        assertEquals(Verdict.PASS, r.verdict());
        assertEquals(13, r.checks().size(), "one check per pair rule (catalog, design and dead-time belong to check)");
    }

    @Test
    void aPairFailsIfAnyRuleFailsEvenWhenOthersWarnOrAreUnknown() {
        Parts.Dr d = Parts.dr();
        d.inverting = List.of(true); // polarity fails
        d.pMax = Double.NaN; // driver-power unknown
        d.lifecycle = "nrnd"; // lifecycle warns
        PairResult r = Parts.eval(Parts.sw(), d, Parts.op());
        assertEquals(Verdict.FAIL, r.check(Rule.POLARITY).orElseThrow().verdict());
        assertEquals(Verdict.UNKNOWN, r.check(Rule.DRIVER_POWER).orElseThrow().verdict());
        assertEquals(Verdict.WARN, r.check(Rule.LIFECYCLE).orElseThrow().verdict());
        assertEquals(Verdict.FAIL, r.verdict());
    }

    @Test
    void anUnknownCheckMakesThePairWarn() {
        Parts.Dr d = Parts.dr();
        d.pMax = Double.NaN;
        PairResult r = Parts.eval(Parts.sw(), d, Parts.op());
        assertEquals(Verdict.UNKNOWN, r.check(Rule.DRIVER_POWER).orElseThrow().verdict());
        assertEquals(Verdict.WARN, r.verdict());
    }

    @Test
    void aWarningCheckMakesThePairWarn() {
        Parts.Dr d = Parts.dr();
        d.lifecycle = "nrnd";
        PairResult r = Parts.eval(Parts.sw(), d, Parts.op());
        assertEquals(Verdict.WARN, r.verdict());
    }

    /** Everything the catalog may leave empty, left empty: no rule that needs it may pass, and nothing throws. */
    @Test
    void missingOptionalDataIsUnknownNeverPass() {
        Parts.Sw s = Parts.sw();
        s.rOnVgs = s.vThMin = s.vThMax = s.vGateOn = s.qGVgs = s.qGs = s.qGd = s.vPlateau = Double.NaN;
        s.cIss = s.cRss = s.rGInt = s.iCont = s.rOn = Double.NaN;
        s.vGateOff = Double.NaN;
        s.lifecycle = "unknown";
        s.stock = -1;
        Parts.Dr d = Parts.dr();
        d.rSource = d.rSink = d.uvloOn = d.uvloOff = d.vIh = d.vIl = d.vInMax = d.vOffsetMax = d.iQbs = Double.NaN;
        d.vNegMin = d.tProp = d.pMax = d.isolationVrms = Double.NaN;
        d.bootstrapDiode = null;
        d.millerClamp = null;
        d.lifecycle = "unknown";
        OperatingPoint.Spec o = Parts.op();
        o.highSide = true;
        o.bus = null;
        o.bridge = true; // in a bridge, so the dv-dt rule has something to judge and lacks the data
        PairResult r = Parts.eval(s, d, o);
        for (Rule rule : List.of(Rule.GATE_VOLTAGE, Rule.UVLO, Rule.LOGIC_LEVEL, Rule.HIGH_SIDE, Rule.BOOTSTRAP,
                Rule.DRIVER_POWER, Rule.DV_DT, Rule.LIFECYCLE)) {
            Check c = r.check(rule).orElseThrow();
            assertEquals(Verdict.UNKNOWN, c.verdict(), () -> rule + ": " + c.message());
        }
        assertEquals(Verdict.WARN, r.verdict());
    }

    // ------------------------------------------------------------------ score

    @Test
    void scoresAreInRangeAndFailingPairsRankBelowEveryPassingPair() {
        List<PairResult> pass = new ArrayList<>();
        List<PairResult> fail = new ArrayList<>();
        for (Rule rule : Rule.values()) {
            for (Row r : rowsOf(rule)) {
                Parts.Sw s = Parts.sw();
                Parts.Dr d = Parts.dr();
                OperatingPoint.Spec o = Parts.op();
                r.s().accept(s);
                r.d().accept(d);
                r.o().accept(o);
                PairResult pr = Parts.eval(s, d, o);
                assertTrue(pr.score() >= 0 && pr.score() <= 1, () -> r + ": score " + pr.score());
                (pr.verdict() == Verdict.PASS ? pass : pr.verdict() == Verdict.FAIL ? fail : new ArrayList<PairResult>())
                        .add(pr);
            }
        }
        assertTrue(pass.size() >= 5 && fail.size() >= 20, pass.size() + " passing, " + fail.size() + " failing");
        double worstPass = pass.stream().mapToDouble(PairResult::score).min().orElseThrow();
        for (PairResult f : fail) {
            assertTrue(f.score() <= Score.FAIL_CAP, () -> "failing pair scored " + f.score());
            assertTrue(f.score() < worstPass, () -> "failing pair " + f.score() + " not below passing " + worstPass);
        }
    }

    private static List<Row> rowsOf(Rule rule) {
        return switch (rule) {
            case DRIVE_CURRENT -> driveCurrent().toList();
            case GATE_VOLTAGE -> gateVoltage().toList();
            case NEGATIVE_BIAS -> negativeBias().toList();
            case UVLO -> uvlo().toList();
            case LOGIC_LEVEL -> logicLevel().toList();
            case POLARITY -> polarity().toList();
            case HIGH_SIDE -> highSide().toList();
            case BOOTSTRAP -> bootstrap().toList();
            case DRIVER_POWER -> driverPower().toList();
            case DV_DT -> dvdt().toList();
            case GATE_RINGING -> gateRinging().toList();
            case PROTECTION -> protection().toList();
            case LIFECYCLE -> lifecycle().toList();
            case CATALOG, DESIGN, DEAD_TIME -> List.of(); // stage-level rules: cli/CheckCliTest, PackageCheckCliTest
        };
    }

    @Test
    void moreMarginLeftScoresHigherWithinPass() {
        // 2 A available against 1.5 A needed (baseline) scores higher than 1.67 A (R_g 3 Ω: 10/(2+3+1)).
        OperatingPoint.Spec tight = Parts.op();
        tight.rG = 3.0;
        double wide = Parts.eval(Parts.sw(), Parts.dr(), Parts.op()).check(Rule.DRIVE_CURRENT).orElseThrow().score();
        Check t = Parts.eval(Parts.sw(), Parts.dr(), tight).check(Rule.DRIVE_CURRENT).orElseThrow();
        assertEquals(Verdict.PASS, t.verdict(), t.message());
        assertTrue(wide > t.score(), wide + " vs " + t.score());
    }

    // ------------------------------------------------------------------ margins

    @Test
    void theDriveCurrentMarginOverrideMovesTheVerdict() {
        // Baseline (REFERENCES §8): 862 mA on the turn-on plateau at 125 °C / 0.3 A (15 nC over 50 ns) = 2.87×.
        Margins two = Margins.DEFAULT.with("drive-current=2");
        Margins twoAndHalf = Margins.DEFAULT.with("drive-current=3");
        assertEquals(2.0, two.driveCurrent());
        Check atTwo = Parts.eval(Parts.sw(), Parts.dr(), Parts.op(), two).check(Rule.DRIVE_CURRENT).orElseThrow();
        assertEquals(Verdict.PASS, atTwo.verdict(), "2.87× meets a 2× margin: " + atTwo.message());
        assertTrue(atTwo.message().contains("needs 600 mA"), atTwo.message());
        Check atTwoHalf = Parts.eval(Parts.sw(), Parts.dr(), Parts.op(), twoAndHalf).check(Rule.DRIVE_CURRENT)
                .orElseThrow();
        assertEquals(Verdict.WARN, atTwoHalf.verdict(), "2.87× is short of 3× but above 1×: " + atTwoHalf.message());
        assertTrue(atTwoHalf.message().contains("needs 900 mA"), atTwoHalf.message());
        // R_g 10 Ω: 5/(2.8 + 10 + 1) = 362 mA, 1.21× warns at the default 1.5× and passes at 1.2×.
        OperatingPoint.Spec o = Parts.op();
        o.rG = 10.0;
        assertEquals(Verdict.WARN, Parts.eval(Parts.sw(), Parts.dr(), o).check(Rule.DRIVE_CURRENT).orElseThrow().verdict());
        assertEquals(Verdict.PASS, Parts.eval(Parts.sw(), Parts.dr(), o, Margins.DEFAULT.with("drive-current=1.2"))
                .check(Rule.DRIVE_CURRENT).orElseThrow().verdict());
    }

    @Test
    void marginOverridesAreValidated() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> Margins.DEFAULT.with("drive-current=0.5"));
        assertTrue(e.getMessage().contains("drive-current") && e.getMessage().contains("0.5"), e.getMessage());
        e = assertThrows(IllegalArgumentException.class, () -> Margins.DEFAULT.with("speed=2"));
        assertTrue(e.getMessage().contains("unknown margin 'speed'"), e.getMessage());
        assertEquals(Margins.DEFAULT.driveCurrent(), Margins.DEFAULT.with("isolation=3").driveCurrent());
        assertEquals(3.0, Margins.DEFAULT.with("isolation=3").isolation());
    }
}
