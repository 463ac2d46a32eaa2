package org.gatefit.match;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.stream.Stream;
import org.gatefit.match.Plausibility.Finding;
import org.gatefit.match.Plausibility.Quantity;
import org.gatefit.match.Plausibility.Range;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * {@link Plausibility}: the operating-point ranges per technology (common practice, no source, from
 * memory of application notes, as the class and the README's table "Plausible operating points" say;
 * the table is the check value here, so code and documentation agree), their inclusive bounds, and the
 * unit-slip suggestion (a thousand times smaller or larger) with its wording.
 */
class PlausibilityTest {

    /** The README table "Plausible operating points", row by row, in SI units. */
    static Stream<Arguments> readmeTable() {
        return Stream.of(
                Arguments.of(Quantity.BUS, Technology.SI_MOSFET, 1, 1_000),
                Arguments.of(Quantity.BUS, Technology.SIC_MOSFET, 12, 3_300),
                Arguments.of(Quantity.BUS, Technology.GAN_HEMT, 1, 1_000),
                Arguments.of(Quantity.BUS, Technology.IGBT, 24, 6_500),
                Arguments.of(Quantity.F_SW, Technology.SI_MOSFET, 10, 5e6),
                Arguments.of(Quantity.F_SW, Technology.SIC_MOSFET, 10, 2e6),
                Arguments.of(Quantity.F_SW, Technology.GAN_HEMT, 1e3, 10e6),
                Arguments.of(Quantity.F_SW, Technology.IGBT, 10, 150e3),
                Arguments.of(Quantity.EDGE, Technology.SI_MOSFET, 1e-9, 2e-6),
                Arguments.of(Quantity.EDGE, Technology.SIC_MOSFET, 1e-9, 1e-6),
                Arguments.of(Quantity.EDGE, Technology.GAN_HEMT, 0.2e-9, 200e-9),
                Arguments.of(Quantity.EDGE, Technology.IGBT, 10e-9, 10e-6),
                Arguments.of(Quantity.V_DRIVE, Technology.SI_MOSFET, 1.5, 20),
                Arguments.of(Quantity.V_DRIVE, Technology.SIC_MOSFET, 8, 25),
                Arguments.of(Quantity.V_DRIVE, Technology.GAN_HEMT, 3, 15),
                Arguments.of(Quantity.V_DRIVE, Technology.IGBT, 8, 20),
                Arguments.of(Quantity.V_DRIVE_NEG, Technology.SI_MOSFET, -20, 0),
                Arguments.of(Quantity.V_DRIVE_NEG, Technology.SIC_MOSFET, -12, 0),
                Arguments.of(Quantity.V_DRIVE_NEG, Technology.GAN_HEMT, -10, 0),
                Arguments.of(Quantity.V_DRIVE_NEG, Technology.IGBT, -20, 0),
                Arguments.of(Quantity.LOOP, Technology.SI_MOSFET, 0.5e-9, 500e-9),
                Arguments.of(Quantity.LOOP, Technology.SIC_MOSFET, 0.5e-9, 300e-9),
                Arguments.of(Quantity.LOOP, Technology.GAN_HEMT, 0.1e-9, 100e-9),
                Arguments.of(Quantity.LOOP, Technology.IGBT, 1e-9, 1e-6));
    }

    @ParameterizedTest(name = "{0} {1}: {2} to {3}")
    @MethodSource("readmeTable")
    void theRangesAreTheReadmesAndTheirBoundsArePlausible(Quantity q, Technology t, double low, double high) {
        Range r = Plausibility.range(q, t);
        assertEquals(low, r.low(), Math.abs(low) * 1e-12);
        assertEquals(high, r.high(), Math.abs(high) * 1e-12);
        // the bounds themselves are inside (≤), the next double beyond each is not
        assertTrue(findings(q, r.low(), t).isEmpty(), "low bound");
        assertTrue(findings(q, r.high(), t).isEmpty(), "high bound");
        assertEquals(1, findings(q, Math.nextDown(r.low()), t).size(), "just below");
        assertEquals(1, findings(q, Math.nextUp(r.high()), t).size(), "just above");
    }

    /** The findings of a spec that gives only {@code q}, at {@code v}. */
    private static List<Finding> findings(Quantity q, double v, Technology t) {
        OperatingPoint.Spec s = new OperatingPoint.Spec();
        switch (q) {
            case BUS -> s.bus = v;
            case F_SW -> s.fSw = v;
            case EDGE -> s.edge = v;
            case V_DRIVE -> s.vDrive = v;
            case V_DRIVE_NEG -> s.vDriveNeg = v;
            case LOOP -> s.loop = v;
            default -> throw new AssertionError(q);
        }
        return Plausibility.check(s, t);
    }

    @Test
    void theReadmesExampleAFrequencyReadAThousandTimesTooLarge() {
        // README: "--freq 20000 is read as 20 MHz (the option is in kHz), so warning: 20 MHz? --freq is in
        // kHz; did you mean 20kHz?"
        List<Finding> f = findings(Quantity.F_SW, 20e6, Technology.SI_MOSFET);
        assertEquals(1, f.size());
        Finding x = f.get(0);
        assertEquals(Quantity.F_SW, x.quantity());
        assertEquals(20e3, x.suggested(), 1e-9);
        assertEquals(20e6, x.value());
        assertEquals("20 MHz? --freq is in kHz; did you mean 20kHz? (si-mosfet designs use 10 Hz to 5 MHz; common"
                + " practice)", x.word("--freq"));
    }

    @Test
    void aValueAThousandTimesTooSmallIsOfferedAThousandTimesLarger() {
        // 0.048 V for a 48 V bus typed in kV by mistake: 48 V is plausible for a Si MOSFET
        Finding x = findings(Quantity.BUS, 0.048, Technology.SI_MOSFET).get(0);
        assertEquals(48, x.suggested(), 1e-9);
        assertEquals("48 mV? bus_v is in V; did you mean 48V? (si-mosfet designs use 1 V to 1 kV; common practice)",
                x.word("bus_v"));
    }

    @Test
    void aValueFarOutsideWithNoSlipThatFitsIsSaidToBeFarOutside() {
        Finding x = findings(Quantity.BUS, 1e8, Technology.SI_MOSFET).get(0);
        assertTrue(Double.isNaN(x.suggested()));
        assertEquals("100 MV? bus_v is in V; 100 MV is far outside what si-mosfet designs use (1 V to 1 kV; common"
                + " practice) — check the value", x.word("bus_v"));
    }

    @Test
    void anOffLevelAHairAboveZeroIsNotOfferedZero() {
        // 1e-322 V: a thousandth of it underflows to 0 V, which is no unit slip; nothing to suggest.
        Finding x = findings(Quantity.V_DRIVE_NEG, 1e-322, Technology.SI_MOSFET).get(0);
        assertTrue(Double.isNaN(x.suggested()), "suggested " + x.suggested());
        // 5 V as an off level: neither 5 mV nor 5 kV is ≤ 0
        assertTrue(Double.isNaN(findings(Quantity.V_DRIVE_NEG, 5, Technology.SI_MOSFET).get(0).suggested()));
    }

    @Test
    void everyGivenValueIsCheckedInTheQuantitiesOrder() {
        // Each a thousand times too large for a SiC MOSFET: 800 kV bus, 100 MHz, 50 µs edge, 18 kV on level,
        // −5 kV off level, 10 µH loop; each a thousandth of it is plausible.
        OperatingPoint.Spec s = new OperatingPoint.Spec();
        s.bus = 800e3;
        s.fSw = 100e6;
        s.edge = 50e-6;
        s.vDrive = 18e3;
        s.vDriveNeg = -5e3;
        s.loop = 10e-6;
        List<Finding> f = Plausibility.check(s, Technology.SIC_MOSFET);
        assertEquals(List.of(Quantity.BUS, Quantity.F_SW, Quantity.EDGE, Quantity.V_DRIVE, Quantity.V_DRIVE_NEG,
                Quantity.LOOP), f.stream().map(Finding::quantity).toList());
        double[] meant = {800, 100e3, 50e-9, 18, -5, 10e-9};
        for (int i = 0; i < meant.length; i++) {
            assertEquals(meant[i], f.get(i).suggested(), Math.abs(meant[i]) * 1e-12, f.get(i).quantity().toString());
            assertEquals(Technology.SIC_MOSFET, f.get(i).technology());
        }
    }

    @Test
    void valuesNotGivenOrUnknownAreNotChecked() {
        assertTrue(Plausibility.check(new OperatingPoint.Spec(), Technology.IGBT).isEmpty());
        OperatingPoint.Spec s = new OperatingPoint.Spec();
        s.bus = Double.NaN;
        s.fSw = Double.NaN;
        assertTrue(Plausibility.check(s, Technology.IGBT).isEmpty());
        // the baseline point of the tests is plausible for a Si MOSFET
        assertTrue(Plausibility.check(Parts.op(), Technology.SI_MOSFET).isEmpty());
    }

    @Test
    void aQuantityNamesItsColumnAndTheUnitABareNumberIsReadIn() {
        assertEquals("f_sw_khz", Quantity.F_SW.column());
        assertEquals("kHz", Quantity.F_SW.bareUnit());
        assertEquals("loop_nh", Quantity.LOOP.column());
        assertEquals("nH", Quantity.LOOP.bareUnit());
        assertEquals("v_drive_neg_v", Quantity.V_DRIVE_NEG.column());
        assertEquals("V", Quantity.V_DRIVE_NEG.bareUnit());
    }

    @Test
    void aRangeRunsFromLowToAHigherHigh() {
        assertEquals(2.0, new Range(1, 2).high());
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> new Range(1, 1));
        assertEquals("expected low < high, got 1.0 and 1.0", e.getMessage());
        assertThrows(IllegalArgumentException.class, () -> new Range(2, 1));
        assertThrows(IllegalArgumentException.class, () -> new Range(Double.NaN, 1));
    }
}
