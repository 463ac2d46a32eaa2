package org.gatefit.physics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import org.gatefit.physics.NetworkSizing.ResistorPackage;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.api.Test;

/**
 * The sizing rules of the gate-drive network, one table per rule, each check value computed by
 * hand from the formula and source named beside it; then the monotone properties the issue asks
 * for (jqwik).
 */
class NetworkSizingTest {

    private static final double NC = 1e-9;
    private static final double NF = 1e-9;

    @Test
    void edgeEnergiesAddUpToTheGatePowerSplitsExternalShare() {
        // REFERENCES §2 (computed): 44 nC, 10 V, 100 kHz, R_src 2 Ω, R_sink 1 Ω, R_g 3 Ω, R_g,int 1.2 Ω
        // → external 23.34 mW. Per edge (plain circuit theory, ½·Q·ΔV·R/R_loop): turn-on
        // ½·44 nC·10 V·3/6.2 = 106.45 nJ, turn-off ½·44 nC·10 V·3/5.2 = 126.92 nJ.
        double on = NetworkSizing.edgeEnergy(44 * NC, 10, 3, 2 + 3 + 1.2);
        double off = NetworkSizing.edgeEnergy(44 * NC, 10, 3, 1 + 3 + 1.2);
        assertEquals(106.45e-9, on, 0.01e-9);
        assertEquals(126.92e-9, off, 0.01e-9);
        assertEquals(23.34e-3, (on + off) * 100e3, 0.005e-3);
        assertEquals(GatePower.split(44 * NC, 10, 100e3, 2, 1, 3, 3, 1.2).external(), (on + off) * 100e3, 1e-12);
    }

    @Test
    void aResistorLargerThanItsLoopIsRefused() {
        assertThrows(IllegalArgumentException.class, () -> NetworkSizing.edgeEnergy(44 * NC, 10, 7, 6.2));
    }

    @ParameterizedTest(name = "{0} C within {1} V at {2} of nominal, C_boot {3} F → min {4} F, value {5} F")
    @CsvSource({
        // REFERENCES §4 (computed): 47.45 nC at ΔV 0.5 V → 94.9 nF; E6 (IEC 60063) rounds 94.9 nF up to 100 nF
        "47.45e-9, 0.5, 1.0, NaN, 94.9e-9, 100e-9",
        // the same at 50 % of nominal left at DC bias: 189.8 nF → E6 220 nF
        "47.45e-9, 0.5, 0.5, NaN, 189.8e-9, 220e-9",
        // with a 100 nF bootstrap capacitor, 10× C_boot (REFERENCES §4, common practice) = 1 µF decides
        "47.45e-9, 0.5, 0.5, 100e-9, 189.8e-9, 1e-6",
        // 50 nC at 2 % of 10 V (0.2 V) and 50 %: 500 nF → E6 680 nF
        "50e-9, 0.2, 0.5, NaN, 500e-9, 680e-9",
        // 2 nC at 0.24 V, 50 %: 16.7 nF, below the 100 nF floor (common practice, no source) → 100 nF
        "2e-9, 0.24, 0.5, NaN, 16.67e-9, 100e-9"})
    void supplyCapacitorIsChargeOverDroopAtTheBiasLeft(double q, double droop, double bias, double boot, double min,
            double value) {
        assertEquals(min, NetworkSizing.supplyCapacitanceMin(q, droop, bias), min * 1e-3);
        assertEquals(value, NetworkSizing.supplyCapacitance(q, droop, bias, boot), value * 1e-9);
    }

    @Test
    void droopIsTwoPercentOfTheSupply() {
        // the stated rule (common practice, no source): 2 % of 12 V = 0.24 V
        assertEquals(0.24, NetworkSizing.supplyDroop(12), 1e-12);
    }

    @ParameterizedTest(name = "working {0} V → capacitor rated {1} V")
    @CsvSource({
        // 2× the working voltage (common practice, no source) up to the usual ladder (from memory)
        "6, 16", "12, 25", "15, 35", "20, 50", "3.3, 10", "25, 50", "1000, 2000"})
    void capacitorRatingIsTheNextLadderStepAboveTwiceTheWorkingVoltage(double working, double rated) {
        assertEquals(rated, NetworkSizing.capacitorRating(working));
    }

    @ParameterizedTest(name = "reverse {0} V → diode rated {1} V")
    @CsvSource({"6, 20", "23, 30", "57.6, 60", "450, 600", "960, 1000"})
    void diodeRatingIsTheNextLadderStep(double reverse, double rated) {
        // the usual reverse-voltage ladder (from memory); 48 V bus + 20 % = 57.6 V → 60 V; 375 V + 20 % = 450 V → 600 V
        assertEquals(rated, NetworkSizing.diodeRating(reverse));
    }

    @ParameterizedTest(name = "{0} W average, {1} W peak → {2}")
    @CsvSource({
        // continuous ≤ 50 % of the rating (common practice, no source), peak ≤ 50× it (from memory);
        // ratings from memory: 0402 63 mW, 0603 100 mW, 0805 125 mW, 1206 250 mW, 2010 750 mW, 2512 1 W
        "0.01, 1, 0402", // 10 mW ≤ 31.5 mW, 1 W ≤ 3.15 W
        "0.04, 1, 0603", // 40 mW > 31.5 mW, ≤ 50 mW
        "0.0225, 12.5, 1206", // baseline pair's turn-off edge: 12.5 W > 6.25 W (0805), ≤ 12.5 W (1206)
        "0.1, 0, 1206", // 100 mW > 62.5 mW (0805), ≤ 125 mW
        "0, 4, 0603", // 4 W > 3.15 W (0402), ≤ 5 W
        "0.3, 0, 2010", // 300 mW > 125 mW (1206), ≤ 375 mW
        "0.45, 0, 2512"})
    void packageIsTheSmallestThatCarriesBothPowers(double average, double peak, String code) {
        assertEquals(code, NetworkSizing.resistorPackage(average, peak).code());
    }

    @Test
    void noPackageWhenEvenTheLargestIsShort() {
        // 2512: 1 W × 50 % = 0.5 W continuous, 50 W pulse
        assertNull(NetworkSizing.resistorPackage(0.6, 0));
        assertNull(NetworkSizing.resistorPackage(0, 51));
    }

    @ParameterizedTest(name = "V_th,min {0} V, I_GSS {1} A, loop {2} Ω → {3} Ω")
    @CsvSource({
        // V_th,min/(10·I_GSS) = 2 MΩ and 99·5 Ω = 495 Ω: the usual 10 kΩ (common practice, no source)
        "2, 100e-9, 5, 10e3",
        // 99·200 Ω = 19.8 kΩ → E24 20 kΩ
        "2, 100e-9, 200, 20e3",
        // leakage 1 µA at V_th,min 0.05 V: ≤ 5 kΩ, below the usual range → E24 down, 4.7 kΩ
        "0.05, 1e-6, 5, 4.7e3"})
    void pullDownHoldsAgainstLeakageAndCostsAtMostOnePercent(double vTh, double leak, double loop, double r) {
        assertEquals(r, NetworkSizing.pullDown(vTh, leak, loop), r * 1e-9);
        assertEquals(vTh / (10 * leak), NetworkSizing.pullDownMax(vTh, leak), 1e-9 * vTh / leak);
        assertEquals(99 * loop, NetworkSizing.pullDownMin(loop), 1e-9);
    }

    @Test
    void pullDownHoldsARampUpToVthTimesBusOverRQgd() {
        // C_gd averaged over the swing = Q_gd/V_bus (REFERENCES §8); V = C_gd·dv/dt·R ≤ V_th,min →
        // dv/dt ≤ 0.9 V·375 V/(10 kΩ·600 pC) = 56.25 V/µs (hand calculation)
        assertEquals(56.25e6, NetworkSizing.pullDownSlew(0.9, 375, 10e3, 600e-12), 1e-3);
    }

    @ParameterizedTest(name = "above {0} V, below {1} V → {2} V")
    @CsvSource({
        // E24 Zener voltages, ±5 % (from memory): 15/0.95 = 15.8 → 16 V, 16·1.05 = 16.8 ≤ 20
        "15, 20, 16",
        // 10/0.95 = 10.5 → 11 V, 11.55 ≤ 20
        "10, 20, 11",
        // 5/0.95 = 5.26 → 5.6 V, 5.88 ≤ 8
        "5, 8, 5.6",
        // 6/0.95 = 6.32 → 6.8 V, 7.14 > 7: none fits
        "6, 7, NaN",
        // 18/0.95 = 18.9 → 20 V, 21 > 20: none fits
        "18, 20, NaN"})
    void clampSitsAboveTheLevelAndBelowTheLimitWithItsTolerance(double above, double below, double v) {
        assertEquals(v, NetworkSizing.clampVoltage(above, below), 1e-9);
    }

    // ---------------------------------------------------------------- properties

    @Property
    void moreGateChargeNeverGivesASmallerSupplyCapacitor(@ForAll @DoubleRange(min = 0.1, max = 10000) double qNc,
            @ForAll @DoubleRange(min = 0, max = 10000) double moreNc, @ForAll @DoubleRange(min = 0.01, max = 2) double droop,
            @ForAll @DoubleRange(min = 0.1, max = 1) double bias) {
        double q = qNc * NC;
        double more = moreNc * NC;
        double c = NetworkSizing.supplyCapacitance(q, droop, bias, Double.NaN);
        double c2 = NetworkSizing.supplyCapacitance(q + more, droop, bias, Double.NaN);
        assertTrue(c2 >= c, c2 + " < " + c);
        // and strictly more before rounding (plain circuit theory, C = Q/ΔV)
        if (more > 0) {
            assertTrue(NetworkSizing.supplyCapacitanceMin(q + more, droop, bias) > NetworkSizing.supplyCapacitanceMin(q, droop,
                    bias));
        }
        assertTrue(c >= NetworkSizing.supplyCapacitanceMin(q, droop, bias) * (1 - 1e-12), "rounded below the need");
    }

    @Property
    void aLargerPeakCurrentNeverGivesASmallerPackage(@ForAll @DoubleRange(min = 0.1, max = 20) double r,
            @ForAll @DoubleRange(min = 0.01, max = 5) double peak, @ForAll @DoubleRange(min = 0, max = 5) double more,
            @ForAll @DoubleRange(min = 0, max = 0.4) double average) {
        ResistorPackage p = NetworkSizing.resistorPackage(average, peak * peak * r);
        ResistorPackage p2 = NetworkSizing.resistorPackage(average, (peak + more) * (peak + more) * r);
        int i = p == null ? ResistorPackage.values().length : p.ordinal();
        int i2 = p2 == null ? ResistorPackage.values().length : p2.ordinal();
        assertTrue(i2 >= i, "faster edge gave " + p2 + " after " + p);
        if (p2 != null) {
            assertTrue((peak + more) * (peak + more) * r <= NetworkSizing.PULSE_FACTOR * p2.rating() * (1 + 1e-12));
        }
    }
}
