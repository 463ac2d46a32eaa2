package org.gatefit.match;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.gatefit.physics.LogicFamily;
import org.gatefit.physics.NetworkSizing;
import org.junit.jupiter.api.Test;

/**
 * The gate-drive network ({@link GateNetwork}) at its guards and in the sentences that carry its
 * numbers: per-switch current caps, the diode branch of split resistors, the pull-down's holding
 * ramp, the clamps of a ringing gate, the bootstrap parts. Each number is a hand calculation from
 * the formula named beside it on {@link Parts}' invented round pair (R_source 2 Ω, R_sink 1 Ω,
 * R_g 2 Ω, R_g,int 1 Ω, C_iss 3 nF, Q_g 50 nC, Q_gd 15 nC, V_pl 5 V, V_th,min 2 V, 10 V / 0 V,
 * 100 kHz, 48 V, hot corner 125 °C); the sizing rules themselves are {@code NetworkSizingTest}'s.
 */
class GateNetworkBoundaryTest {

    private static GateNetwork network(Parts.Sw s, Parts.Dr d, OperatingPoint.Spec op) {
        SwitchPart sp = s.build();
        DriverPart dp = d.build();
        return GateNetwork.of(dp, sp, Rules.evaluate(dp, sp, op.resolve(sp), Margins.DEFAULT));
    }

    private static GateNetwork.Part part(GateNetwork n, String role) {
        return n.part(role).orElseThrow(() -> new AssertionError("no " + role + " in " + n.parts() + " / " + n.notes()));
    }

    private static boolean noted(GateNetwork n, String start) {
        return n.notes().stream().anyMatch(x -> x.startsWith(start));
    }

    @Test
    void supplyCapacitorSaysTheChargeOfAllSwitchesAndOfABipolarDrive() {
        GateNetwork one = network(Parts.sw(), Parts.dr(), Parts.op());
        String why = part(one, "output supply capacitor").why();
        // one switch: Q_g = 50 nC per event; no bootstrap, no C_boot rule; unipolar, one capacitor
        assertTrue(why.startsWith("gives Q_g = 50 nC per event"), why);
        assertFalse(why.contains("C_boot"), why);
        assertFalse(why.contains("one on each rail"), why);

        OperatingPoint.Spec o = Parts.op();
        o.parallel = 2;
        o.vDriveNeg = -5.0;
        Parts.Dr d = Parts.dr();
        d.vNegMin = -10;
        String two = part(network(Parts.sw(), d, o), "output supply capacitor").why();
        // two switches at 10 V / −5 V: 2·Q_g over the 15 V swing, one capacitor on each rail
        assertTrue(two.startsWith("gives 2·Q_g = "), two);
        assertTrue(two.contains("one on each rail to the source reference"), two);

        OperatingPoint.Spec hs = Parts.op();
        hs.highSide = true;
        String boot = part(network(Parts.sw(), Parts.dr(), hs), "output supply capacitor").why();
        // REFERENCES §4: the V_DD capacitor about ten times C_boot (common practice)
        assertTrue(boot.contains(", and ≥ 10× C_boot"), boot);
    }

    @Test
    void aFiveVoltControllerNeedsASixteenVoltInputCapacitor() {
        Parts.Dr d = Parts.dr();
        d.topology = Topology.ISOLATED;
        OperatingPoint.Spec o = Parts.op();
        o.logic = LogicFamily.CMOS_5V;
        // the logic supply at the top of its range, 5.5 V (JEDEC 5 V CMOS, from memory), × 2 = 11 V → 16 V in the
        // usual ladder 6.3/10/16/25 V (from memory)
        GateNetwork.Part in = part(network(Parts.sw(), d, o), "input supply capacitor");
        assertTrue(in.rating().startsWith("≥ 16 V"), in.rating());
    }

    @Test
    void theRatedPeakIsSharedByParallelSwitches() {
        Parts.Dr d = Parts.dr();
        d.iSource = 2;
        d.iSink = 2;
        OperatingPoint.Spec o = Parts.op();
        o.parallel = 2;
        // Per switch the loop is n·R_driver + R_g + R_g,int: 2·2 + 2 + 1 = 7 Ω on (10/7 = 1.43 A), 2·1 + 3 = 5 Ω off
        // (2 A); the driver's 2 A shared by two gates caps each at 1 A (REFERENCES §1: I_pk capped at the rating).
        GateNetwork.Part r = part(network(Parts.sw(), d, o), "gate resistor");
        assertTrue(r.rating().contains(", 1 A peak (2 W I²R)"), r.rating()); // 1²·2 Ω
    }

    @Test
    void theWorseEdgeOfOneResistorIsTheOneWithTheLargerPulse() {
        Parts.Dr d = Parts.dr();
        d.rSource = 1;
        d.rSink = 2;
        // on 10/(1 + 2 + 1) = 2.5 A, off 10/(2 + 2 + 1) = 2 A: the turn-on pulse 2.5²·2 = 12.5 W is the larger
        GateNetwork.Part r = part(network(Parts.sw(), d, Parts.op()), "gate resistor");
        assertTrue(r.rating().contains(", 2.5 A peak (12.5 W I²R)"), r.rating());
    }

    @Test
    void aZeroTurnOffResistorLeavesOnlyTheTurnOnOne() {
        OperatingPoint.Spec o = Parts.op();
        o.rGOff = 0.0;
        GateNetwork n = network(Parts.sw(), Parts.dr(), o);
        assertEquals(2, part(n, "turn-on gate resistor").value());
        assertFalse(n.part("turn-off gate resistor").isPresent());
        assertFalse(n.part("turn-off diode").isPresent());
    }

    @Test
    void aSlowerTurnOffResistorGetsTheDiodeInTheTurnOnBranch() {
        OperatingPoint.Spec o = Parts.op();
        o.rGOff = 5.0;
        GateNetwork.Part dio = part(network(Parts.sw(), Parts.dr(), o), "turn-on diode");
        // both in parallel: 2·5/(2 + 5) = 1.43 Ω (plain circuit theory); turn-on peak 10/(2 + 2 + 1) = 2 A
        assertTrue(dio.why().contains("in series with R_g (anode at the driver), that branch beside R_g,off: turn-off"
                + " flows through R_g,off alone, turn-on through both in parallel (1.43 Ω"), dio.why());
        assertTrue(dio.rating().contains("peak 2 A"), dio.rating());
    }

    @Test
    void anEdgeLongerThanThePulseAllowanceIsSaid() {
        OperatingPoint.Spec o = Parts.op();
        o.rG = 300.0;
        // delay to the plateau (REFERENCES §1) (2 + 300 + 1)·3 nF·ln 2 = 630.1 ns at 25 °C, plateau 15 nC at
        // 5/(1.4·2 + 301) = 16.46 mA (125 °C) = 911.4 ns: 1.54 µs, past the 1 µs pulse allowance
        GateNetwork.Part r = part(network(Parts.sw(), Parts.dr(), o), "gate resistor");
        assertTrue(r.why().contains(" The edge lasts 1.54 µs, longer than the 1 µs"), r.why());
        assertTrue(r.why().startsWith("E24; "), r.why()); // 300 Ω = 3.0 × 100, an E24 value (IEC 60063)
    }

    @Test
    void aResistorOffTheE24SeriesSaysItsNearestValue() {
        OperatingPoint.Spec o = Parts.op();
        o.rG = 2.5;
        // IEC 60063 E24: 2.4, 2.7 → nearest 2.4 Ω
        assertTrue(part(network(Parts.sw(), Parts.dr(), o), "gate resistor").why().startsWith("not an E24 value (nearest 2.4 Ω); "));
        assertTrue(part(network(Parts.sw(), Parts.dr(), Parts.op()), "gate resistor").why().startsWith("E24; "));
    }

    @Test
    void pullDownRatingAndTheRampItHoldsAlone() {
        GateNetwork.Part r = part(network(Parts.sw(), Parts.dr(), Parts.op()), "gate–source pull-down");
        // on level across it: 10²/10 kΩ = 10 mW
        assertTrue(r.rating().startsWith("≥ 10 mW at the on level"), r.rating());
        // V_th,min·V_bus/(R·Q_gd) = 1.4 V (125 °C)·48 V/(10 kΩ·15 nC) = 448 kV/s
        assertTrue(r.why().contains("against a drain ramp up to " + Eng.slew(448e3) + " "), r.why());

        OperatingPoint.Spec noBus = Parts.op();
        noBus.bus = 0.0;
        assertFalse(part(network(Parts.sw(), Parts.dr(), noBus), "gate–source pull-down").why().contains("drain ramp"));
        Parts.Sw noQgd = Parts.sw();
        noQgd.qGd = 0;
        assertFalse(part(network(noQgd, Parts.dr(), Parts.op()), "gate–source pull-down").why().contains("drain ramp"));
    }

    @Test
    void noPullDownAgainstAZeroThreshold() {
        Parts.Sw s = Parts.sw();
        s.vThMin = 0;
        OperatingPoint.Spec o = Parts.op();
        o.tj = 25.0;
        GateNetwork n = network(s, Parts.dr(), o);
        assertFalse(n.part("gate–source pull-down").isPresent());
        assertTrue(noted(n, "gate–source pull-down: needs"), n.notes().toString());
    }

    @Test
    void bootstrapCapacitorRatingAndItsResistor() {
        Parts.Dr d = Parts.dr();
        d.bootstrapDiode = false;
        OperatingPoint.Spec o = Parts.op();
        o.highSide = true;
        GateNetwork n = network(Parts.sw(), d, o);
        // charged to 10 − 0.7 = 9.3 V (REFERENCES §4)
        assertTrue(part(n, "bootstrap capacitor").rating().contains("of nominal left at 9.3 V DC bias"),
                part(n, "bootstrap capacitor").rating());
        // Q = 50 nC + 100 µA·10 µs = 51 nC into 120 nF (ReferenceFiguresTest / ShownFiguresTest sizing):
        // per refresh Q²/(2C)·f = 1.084 mW, peak Q/(C·R) = 0.1932 A; first charge ½·C·V² = ½·120 nF·9.3² = 5.19 µJ
        GateNetwork.Part rb = part(n, "bootstrap resistor");
        NetworkSizing.ResistorPackage pkg = NetworkSizing.resistorPackage(1.084e-3, 0.1932 * 0.1932 * 2.2);
        assertTrue(rb.rating().contains("peak per refresh → " + pkg.code() + " ("), rb.rating());
        assertTrue(rb.rating().contains("first charge 4.23 A peak, 5.19 µJ once"), rb.rating());
    }

    @Test
    void aBootstrapDiodeNeedsABusAboveZero() {
        Parts.Dr d = Parts.dr();
        d.bootstrapDiode = false;
        OperatingPoint.Spec o = Parts.op();
        o.highSide = true;
        o.bus = 0.0;
        GateNetwork n = network(Parts.sw(), d, o);
        assertFalse(n.part("bootstrap diode").isPresent());
        assertTrue(noted(n, "bootstrap diode: needs the bus voltage"), n.notes().toString());
    }

    @Test
    void clampAboveAnOverdampedPeakAndItsTolerance() {
        GateNetwork.Part z = part(network(Parts.sw(), Parts.dr(), Parts.op()), "gate clamp (Zener)");
        // ζ > 1: the peak is the 10 V on level; 10/0.95 = 10.53 → E24 11 V, ±5 %: 10.45 V to 11.55 V
        assertEquals("V_Z ±5 %, 10.5 V to 11.6 V", z.rating()); // printed to three digits
        assertTrue(z.why().startsWith("between the ringing peak 10 V (gate-peak-on)"), z.why());
        assertTrue(z.why().contains("; forward-biased it also clamps negative spikes"), z.why());
    }

    @Test
    void aRingingPeakTooHighForAClampBelowTheLimitIsClippedFromTheOnLevel() {
        Parts.Sw s = Parts.sw();
        s.vGsMax = 16;
        OperatingPoint.Spec o = Parts.op();
        o.rG = 0.0;
        o.loop = 100e-9;
        // REFERENCES §3/§8: loop 2 + 0 + 1 = 3 Ω, ζ = 1.5·√(3 nF/100 nH) = 0.2598, overshoot
        // exp(−πζ/√(1 − ζ²)) = 0.4295: peak 14.29 V. Above it: 14.29/0.95 → 16 V, 16.8 V > 16 V: none fits;
        // above the on level: 11 V (11.55 V ≤ 16 V).
        GateNetwork.Part z = part(network(s, Parts.dr(), o), "gate clamp (Zener)");
        assertEquals(11, z.value(), 1e-9);
        assertTrue(z.why().startsWith("between the on level 10 V (it clips the ringing peak 14.3 V)"), z.why());
    }

    @Test
    void anOnLevelAtTheLimitHasNoClamp() {
        Parts.Sw s = Parts.sw();
        s.vGsMax = 10;
        GateNetwork n = network(s, Parts.dr(), Parts.op());
        assertFalse(n.part("gate clamp (Zener)").isPresent());
        assertTrue(noted(n, "gate clamp: needs V_GS,max above the on level."), n.notes().toString());
    }

    private static OperatingPoint.Spec bipolarRinging() {
        OperatingPoint.Spec o = Parts.op();
        o.vDriveNeg = -5.0;
        o.rG = 0.0;
        o.loop = 100e-9;
        return o;
    }

    private static Parts.Dr bipolarDriver() {
        Parts.Dr d = Parts.dr();
        d.vNegMin = -10;
        return d;
    }

    @Test
    void negativeClampAboveTheRingingTrough() {
        // REFERENCES §8: the turn-off step from 10 V to −5 V through 1 + 0 + 1 = 2 Ω: ζ = √(3 nF/100 nH) = 0.1732,
        // undershoot exp(−πζ/√(1 − ζ²)) = 0.5755 of 15 V: trough −13.63 V; 13.63/0.95 → E24 15 V, 15.75 ≤ 20 V.
        GateNetwork n = network(Parts.sw(), bipolarDriver(), bipolarRinging());
        GateNetwork.Part z = part(n, "negative gate clamp (Zener)");
        assertEquals(15, z.value(), 1e-9);
        assertTrue(z.why().contains(" (trough -13.6 V)"), z.why());
    }

    @Test
    void negativeClampFallsBackToTheOffLevelWhenTheTroughLeavesNoRoom() {
        Parts.Sw s = Parts.sw();
        s.vGsMin = -15;
        // 15 V clamp: 15.75 V > 15 V; from the −5 V off level: 5/0.95 → 5.6 V, 5.88 ≤ 15 V
        GateNetwork.Part z = part(network(s, bipolarDriver(), bipolarRinging()), "negative gate clamp (Zener)");
        assertEquals(5.6, z.value(), 1e-9);
    }

    @Test
    void negativeClampFromTheOffLevelWithoutARingingFigure() {
        OperatingPoint.Spec o = Parts.op();
        o.vDriveNeg = -5.0;
        o.loop = 0.0;
        // no loop inductance, no trough figure: 5/0.95 → 5.6 V
        GateNetwork.Part z = part(network(Parts.sw(), bipolarDriver(), o), "negative gate clamp (Zener)");
        assertEquals(5.6, z.value(), 1e-9);
        assertFalse(z.why().contains("(trough"), z.why());
    }

    @Test
    void noNegativeClampWithoutANegativeLimit() {
        for (double vGsMin : new double[] {0, Double.NaN}) {
            Parts.Sw s = Parts.sw();
            s.vGsMin = vGsMin;
            OperatingPoint.Spec o = Parts.op();
            o.vDriveNeg = -5.0;
            GateNetwork n = network(s, bipolarDriver(), o);
            assertFalse(n.part("negative gate clamp (Zener)").isPresent());
            assertTrue(noted(n, "negative gate clamp: needs V_GS,min below the off level"), n.notes().toString());
        }
    }

    @Test
    void aPartOfZeroIsRefused() {
        assertThrows(IllegalArgumentException.class, () -> new GateNetwork.Part("x", 0, "Ω", "r", "w"));
    }

    @Test
    void bootstrapResistorPackageByItsAveragePowerAndByItsPulse() {
        // Package table (NetworkSizing, common practice / from memory): 0402 0.063 W, 0603 0.1 W; average ≤ 50 % of
        // the rating, pulse ≤ 50× it.
        Parts.Dr d = Parts.dr();
        d.bootstrapDiode = false;
        // Average-limited: four switches at 1 MHz. Q = 4·50 nC + 100 µA·1 µs = 200.1 nC (REFERENCES §4), ΔV 2.8 V →
        // C_min 71.46 nF, 3× at 50 % left → 428.8 nF → E12 470 nF. Per refresh Q²/(2C) = 42.60 nJ, × 1 MHz =
        // 42.6 mW: above 0402's 31.5 mW, within 0603's 50 mW; peak Q/(C·R) = 0.1935 A, pulse 82 mW.
        OperatingPoint.Spec a = Parts.op();
        a.highSide = true;
        a.parallel = 4;
        a.fSw = 1e6;
        GateNetwork.Part ra = part(network(Parts.sw(), d, a), "bootstrap resistor");
        assertTrue(ra.rating().startsWith("42.6 mW average, 194 mA peak per refresh → 0603 ("), ra.rating());
        // Pulse-limited: one switch, R_boot 0.05 Ω. Q = 51 nC into 120 nF: peak Q/(C·R) = 8.5 A, pulse 8.5²·0.05 =
        // 3.61 W: above 0402's 3.15 W, within 0603's 5 W.
        OperatingPoint.Spec b = Parts.op();
        b.highSide = true;
        b.rBoot = 0.05;
        GateNetwork.Part rb = part(network(Parts.sw(), d, b), "bootstrap resistor");
        assertTrue(rb.rating().contains(", 8.5 A peak per refresh → 0603 ("), rb.rating());
    }
}
