package org.gatefit.match;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import org.junit.jupiter.api.Test;

/**
 * The gate-drive network of test pairs ({@link Parts}: invented parts, round figures), each value
 * computed by hand from the formula named beside it; the sizing rules themselves are checked in
 * {@code NetworkSizingTest}.
 */
class GateNetworkTest {

    private static GateNetwork network(Parts.Sw s, Parts.Dr d, OperatingPoint.Spec op) {
        SwitchPart sp = s.build();
        DriverPart dp = d.build();
        return GateNetwork.of(dp, sp, Rules.evaluate(dp, sp, op.resolve(sp), Margins.DEFAULT));
    }

    private static GateNetwork.Part part(GateNetwork n, String role) {
        return n.part(role).orElseThrow(() -> new AssertionError("no " + role + " in " + n.parts() + " / " + n.notes()));
    }

    @Test
    void baselineLowSide() {
        GateNetwork n = network(Parts.sw(), Parts.dr(), Parts.op());
        // Supply: Q_g 50 nC over 0–10 V, droop 2 % of 10 V = 0.2 V, 50 % left at DC bias:
        // 50 nC/(0.2 V·0.5) = 500 nF → E6 680 nF (IEC 60063); rated ≥ 2×10 V → 25 V (ladder, from memory)
        GateNetwork.Part c = part(n, "output supply capacitor");
        assertEquals(680e-9, c.value(), 1e-15);
        assertTrue(c.rating().startsWith("≥ 25 V"), c.rating());
        // Gate resistor 2 Ω for both edges: on loop 2 + 2 + 1 = 5 Ω, off loop 1 + 2 + 1 = 4 Ω;
        // ½·50 nC·10 V·(2/5 + 2/4)·100 kHz = 22.5 mW (REFERENCES §2 split); peaks 10/5 = 2 A, 10/4 = 2.5 A;
        // worst pulse 2.5²·2 = 12.5 W → 1206 (12.5 W ≤ 50 × 250 mW; 0805's 6.25 W is short)
        GateNetwork.Part r = part(n, "gate resistor");
        assertEquals(2, r.value());
        assertTrue(r.rating().startsWith("22.5 mW average, 2.5 A peak (12.5 W I²R), 125 nJ per edge → 1206"), r.rating());
        assertFalse(n.part("turn-off diode").isPresent());
        // Pull-down: 99·5 Ω = 495 Ω and V_th,min/(10·100 nA) ≫ 100 kΩ: the usual 10 kΩ
        assertEquals(10e3, part(n, "gate–source pull-down").value());
        // Clamp: the R-L-C step is overdamped (ζ > 1, peak = 10 V): 10/0.95 = 10.5 → 11 V, 11.55 ≤ V_GS,max 20 V
        GateNetwork.Part z = part(n, "gate clamp (Zener)");
        assertEquals(11, z.value(), 1e-9);
        assertTrue(z.why().contains("optional"), z.why());
        assertFalse(n.part("bootstrap capacitor").isPresent());
        assertFalse(n.part("input supply capacitor").isPresent());
    }

    @Test
    void resistorPowersAreTheGatePowerSplitsExternalShare() {
        Parts.Sw s = Parts.sw();
        Parts.Dr d = Parts.dr();
        OperatingPoint.Spec op = Parts.op();
        op.rG = 3.3;
        op.rGOff = 1.0;
        op.parallel = 2;
        SwitchPart sp = s.build();
        DriverPart dp = d.build();
        PairResult p = Rules.evaluate(dp, sp, op.resolve(sp), Margins.DEFAULT);
        GateNetwork n = GateNetwork.of(dp, sp, p);
        double on = watts(part(n, "turn-on gate resistor").rating());
        double off = watts(part(n, "turn-off gate resistor").rating());
        // two switches, one resistor each: 2·(on + off) is the split's external share (printed to 3 digits)
        double external = p.figure("gate-resistor-power").orElseThrow().value();
        assertEquals(external, 2 * (on + off), 0.01 * external);
    }

    @Test
    void aFasterTurnOffResistorGetsASchottkyInSeries() {
        OperatingPoint.Spec op = Parts.op();
        op.rGOff = 0.5;
        GateNetwork n = network(Parts.sw(), Parts.dr(), op);
        assertEquals(2, part(n, "turn-on gate resistor").value());
        assertEquals(0.5, part(n, "turn-off gate resistor").value());
        // sink peak per switch: min(6 A, 10 V/(1 + 0.5 + 1) Ω) = 4 A; V_R ≥ the 10 V swing → 20 V (ladder, from memory)
        GateNetwork.Part dio = part(n, "turn-off diode");
        assertEquals(20, dio.value());
        assertTrue(dio.rating().contains("peak 4 A"), dio.rating());
        assertTrue(dio.why().contains("R_g,off (anode at the gate)"), dio.why());
    }

    @Test
    void bootstrappedHighSide() {
        Parts.Dr d = Parts.dr();
        d.bootstrapDiode = false;
        OperatingPoint.Spec op = Parts.op();
        op.highSide = true;
        SwitchPart sp = Parts.sw().build();
        DriverPart dp = d.build();
        PairResult p = Rules.evaluate(dp, sp, op.resolve(sp), Margins.DEFAULT);
        GateNetwork n = GateNetwork.of(dp, sp, p);
        double cBoot = p.figure("bootstrap-capacitance-recommended").orElseThrow().value();
        assertEquals(cBoot, part(n, "bootstrap capacitor").value());
        // supply: ≥ 10 × C_boot (REFERENCES §4, common practice) and ≥ (Q_g + Q_boot)/(ΔV·b)
        double qBoot = p.figure("bootstrap-charge").orElseThrow().value();
        double c = part(n, "output supply capacitor").value();
        assertTrue(c >= 10 * cBoot, c + " < 10 × " + cBoot);
        assertTrue(c >= (50e-9 + qBoot) / (0.2 * 0.5), c + " below the charge rule");
        String why = part(n, "output supply capacitor").why();
        assertTrue(why.contains("the bootstrap recharge (the high side's Q_g and drain) = " + Eng.of(50e-9 + qBoot, "C")), why);
        // diode: 48 V bus + 20 % offset margin = 57.6 V → 60 V (ladder, from memory)
        assertEquals(60, part(n, "bootstrap diode").value());
        // resistor: the assumed 2.2 Ω; each refresh puts back Q_boot: ½·C·ΔV² = Q²/(2C) per cycle and
        // ΔV/R = Q/(C·R) peak (plain circuit theory); first charge (10 − 0.7) V/2.2 Ω = 4.23 A (REFERENCES §4)
        GateNetwork.Part rb = part(n, "bootstrap resistor");
        assertEquals(2.2, rb.value(), 1e-12);
        double avg = qBoot * qBoot / (2 * cBoot) * 100e3;
        double peak = qBoot / (cBoot * 2.2);
        assertTrue(rb.rating().startsWith(Eng.of(avg, "W") + " average, " + Eng.of(peak, "A") + " peak per refresh"),
                rb.rating());
        assertTrue(rb.rating().contains("first charge 4.23 A peak"), rb.rating());
    }

    @Test
    void aBuiltInBootstrapDiodeIsNotAddedAgain() {
        OperatingPoint.Spec op = Parts.op();
        op.highSide = true;
        GateNetwork n = network(Parts.sw(), Parts.dr(), op);
        assertFalse(n.part("bootstrap diode").isPresent());
        assertTrue(n.notes().stream().anyMatch(s -> s.startsWith("bootstrap diode: the driver has its own")), n.notes().toString());
    }

    @Test
    void isolatedDriverGetsALogicSideCapacitorAndABipolarDriveANegativeClamp() {
        Parts.Dr d = Parts.dr();
        d.topology = Topology.ISOLATED;
        d.vNegMin = -10;
        OperatingPoint.Spec op = Parts.op();
        op.vDriveNeg = -5.0;
        GateNetwork n = network(Parts.sw(), d, op);
        // a fixed 100 nF (common practice, no source); 2 × 3.3 V = 6.6 V → 10 V
        GateNetwork.Part in = part(n, "input supply capacitor");
        assertEquals(100e-9, in.value(), 1e-18);
        assertTrue(in.rating().startsWith("≥ 10 V"), in.rating());
        // −5 V off, overdamped (trough −5 V): 5/0.95 = 5.26 → 5.6 V, 5.88 ≤ |V_GS,min| 20 V
        assertEquals(5.6, part(n, "negative gate clamp (Zener)").value(), 1e-9);
        assertFalse(part(n, "gate clamp (Zener)").why().contains("forward-biased"));
    }

    @Test
    void noClampFitsBetweenTheOnLevelAndATightLimit() {
        Parts.Sw s = Parts.sw();
        s.vGsMax = 10.5;
        GateNetwork n = network(s, Parts.dr(), Parts.op());
        assertFalse(n.part("gate clamp (Zener)").isPresent());
        assertTrue(n.notes().stream().anyMatch(x -> x.startsWith("gate clamp: no E24 Zener")), n.notes().toString());
    }

    @Test
    void withoutAResistorTheRecommendedOneIsSized() {
        OperatingPoint.Spec op = Parts.op();
        op.rG = null;
        SwitchPart sp = Parts.sw().build();
        DriverPart dp = Parts.dr().build();
        PairResult p = Rules.evaluate(dp, sp, op.resolve(sp), Margins.DEFAULT);
        GateNetwork n = GateNetwork.of(dp, sp, p);
        double rec = p.figure("gate-resistor-recommended").orElseThrow().value();
        GateNetwork.Part r = part(n, "gate resistor");
        assertEquals(rec, r.value());
        assertTrue(r.why().contains("the recommended E24 value"), r.why());
    }

    @Test
    void everyPartHasARatingAndAReason() {
        OperatingPoint.Spec op = Parts.op();
        op.highSide = true;
        op.rGOff = 1.0;
        List<GateNetwork.Part> parts = network(Parts.sw(), Parts.dr(), op).parts();
        assertTrue(parts.size() >= 7, parts.toString());
        for (GateNetwork.Part x : parts) {
            assertFalse(x.rating().isBlank(), x.role());
            assertTrue(x.why().endsWith("."), x.role() + ": " + x.why());
        }
    }

    @Property(tries = 200)
    void moreGateChargeNeverGivesASmallerSupplyCapacitor(@ForAll @DoubleRange(min = 5, max = 2000) double qNc,
            @ForAll @DoubleRange(min = 0, max = 2000) double moreNc) {
        double c1 = supply(qNc);
        double c2 = supply(qNc + moreNc);
        assertTrue(c2 >= c1, c2 + " < " + c1);
    }

    @Property(tries = 200)
    void aStrongerDriverNeverGivesASmallerResistorPackage(@ForAll @DoubleRange(min = 0.2, max = 10) double rSrc,
            @ForAll @DoubleRange(min = 0, max = 1) double fraction) {
        // a lower source resistance is a larger peak current, a faster edge
        int slow = pkg(rSrc);
        int fast = pkg(rSrc * fraction + 0.01);
        assertTrue(fast >= slow, "faster edge " + fast + " < " + slow);
    }

    /** The leading "1.05 mW" of a rating, W. */
    private static double watts(String rating) {
        String[] w = rating.split(" ");
        String prefix = w[1].substring(0, w[1].length() - 1);
        double scale = switch (prefix) {
            case "" -> 1;
            case "m" -> 1e-3;
            case "µ" -> 1e-6;
            case "n" -> 1e-9;
            default -> throw new AssertionError(rating);
        };
        return Double.parseDouble(w[0]) * scale;
    }

    private static double supply(double qNc) {
        Parts.Sw s = Parts.sw();
        s.qG = qNc * 1e-9;
        s.qGs = qNc * 0.3e-9;
        s.qGd = qNc * 0.3e-9;
        return part(network(s, Parts.dr(), Parts.op()), "output supply capacitor").value();
    }

    private static int pkg(double rSrc) {
        Parts.Dr d = Parts.dr();
        d.rSource = rSrc;
        d.iSource = 100;
        OperatingPoint.Spec op = Parts.op();
        op.rGOff = 5.0;
        String rating = part(network(Parts.sw(), d, op), "turn-on gate resistor").rating();
        List<String> codes = List.of("0402", "0603", "0805", "1206", "2010", "2512");
        for (int i = 0; i < codes.size(); i++) {
            if (rating.contains("→ " + codes.get(i) + " ")) {
                return i;
            }
        }
        return codes.size();
    }
}
