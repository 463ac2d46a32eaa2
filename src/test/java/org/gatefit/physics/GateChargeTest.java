package org.gatefit.physics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Optional;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class GateChargeTest {

    private static final double NC = 1e-9;
    private static final double NF = 1e-9;
    private static final double NAN = Double.NaN;

    @Test
    void theSpecifiedSwingReturnsTheDatasheetChargeUnflagged() {
        // JEDEC JESD24-2 / IEC 60747-8: Q_g is the charge from 0 V to V_spec, so that swing needs
        // no extrapolation
        GateCharge.Estimate e = GateCharge.atSwing(44 * NC, NAN, NAN, 10, NAN, NAN, 10, 0)
                .orElseThrow();
        assertEquals(44 * NC, e.coulombs(), 0);
        assertFalse(e.estimated());
    }

    @Test
    void theEndOfThePlateauHoldsQgsPlusQgd() {
        // gate-charge curve definition (JESD24-2): Q_gs up to the plateau, Q_gd across it
        GateCharge.Estimate e = GateCharge.atSwing(44 * NC, 10 * NC, 14 * NC, 10, 4, NAN, 4, 0)
                .orElseThrow();
        assertEquals(24 * NC, e.coulombs(), 1e-21);
        assertTrue(e.estimated());
    }

    @ParameterizedTest(name = "{0}: V_on {7}, V_off {8} -> {9} nC")
    @CsvSource(textBlock = """
        # source,                                                          qg, qgs, qgd, vspec, vpl, ciss nF, von, voff, expected nC
        'plain circuit theory, issue 3 slope (Qg-Qgs-Qgd)/(Vspec-Vpl)',   44, 10,  14,  10,    4,   3.0,     15,  0,    60.667
        'plain circuit theory, slope above plateau plus Ciss*|Voff|',     44, 10,  14,  10,    4,   3.0,     15, -5,    75.667
        'plain circuit theory, extrapolating down toward the plateau',    44, 10,  14,  10,    4,   3.0,      7,  0,    34.0
        'plain circuit theory, below plateau Q = Qgs*V/Vpl',              44, 10,  14,  10,    4,   3.0,      2,  0,    5.0
        """)
    void extrapolatesAlongTheGateChargeCurve(String source, double qg, double qgs, double qgd,
            double vspec, double vpl, double ciss, double von, double voff, double expected) {
        GateCharge.Estimate e = GateCharge.atSwing(qg * NC, qgs * NC, qgd * NC, vspec, vpl,
                ciss * NF, von, voff).orElseThrow();
        assertEquals(expected, e.coulombs() / NC, 0.001, source);
        assertTrue(e.estimated(), source);
    }

    @Test
    void agreesWithTheGateCurveItDefines() {
        // the same piecewise-linear curve built by GateWaveform.GateCurve from the datasheet
        // points; with C_iss not given the slope below the plateau (Q_gs/V_pl) stands in for it.
        // (Exactly at V_pl the two differ by design: a drive level at the plateau is taken to
        // cross it, so it is left out here.)
        GateWaveform.GateCurve curve = GateWaveform.GateCurve.fromGateCharge(130 * NC, 30 * NC,
                50 * NC, 10, 5.5);
        for (double von = 6.0; von <= 20; von += 0.5) {
            for (double voff = 0; voff >= -8; voff -= 1) {
                double q = GateCharge.atSwing(130 * NC, 30 * NC, 50 * NC, 10, 5.5, NAN, von,
                        voff).orElseThrow().coulombs();
                assertEquals(curve.chargeAt(von) - curve.chargeAt(voff), q, 1e-18,
                        von + " / " + voff);
            }
        }
    }

    @Test
    void isUnknownWhenTheInputsItNeedsAreMissing() {
        assertEquals(Optional.empty(),
                GateCharge.atSwing(44 * NC, 10 * NC, 14 * NC, NAN, 4, NAN, 10, 0));
        assertEquals(Optional.empty(),
                GateCharge.atSwing(44 * NC, NAN, 14 * NC, 10, 4, NAN, 12, 0));
        assertEquals(Optional.empty(),
                GateCharge.atSwing(44 * NC, NAN, NAN, 10, NAN, NAN, 10, -5));
        assertTrue(GateCharge.atSwing(44 * NC, NAN, NAN, 10, NAN, 2 * NF, 10, -5).isPresent());
    }

    @Test
    void chargesThatExactlyFillThePlateauAreAccepted() {
        // gate-charge curve definition (JESD24-2): Q_g ≥ Q_gs + Q_gd; at equality (24 = 10 + 14 nC,
        // exact in binary floating point too) nothing is left above the plateau, so the slope is
        // (24 − 10 − 14) nC / (10 − 4) V = 0 and the specified swing still returns Q_g
        assertEquals(24e-9 - 10e-9 - 14e-9, 0.0, 0, "inputs not exact in binary");
        assertEquals(0.0, GateCharge.aboveSlope(24e-9, 10e-9, 14e-9, 10, 4), 0);
        assertEquals(24e-9, GateCharge.atSwing(24e-9, 10e-9, 14e-9, 10, 4, NAN, 10, 0)
                .orElseThrow().coulombs(), 0);
    }

    @Test
    void rejectsAPlateauAtOrAboveTheSpecificationVoltage() {
        // JESD24-2: Q_g is specified above the plateau (V_spec > V_pl), else there is no slope
        // above it to extrapolate along; checked even when the swing needs no extrapolation
        assertEquals("expected V_spec above V_plateau (V_spec, V_plateau), got 4.0 and 4.0",
                assertThrows(IllegalArgumentException.class,
                        () -> GateCharge.aboveSlope(44 * NC, 10 * NC, 14 * NC, 4, 4))
                        .getMessage());
        assertEquals("expected V_spec above V_plateau (V_spec, V_plateau), got 4.0 and 4.5",
                assertThrows(IllegalArgumentException.class,
                        () -> GateCharge.atSwing(44 * NC, 10 * NC, 14 * NC, 4, 4.5, NAN, 4, 0))
                        .getMessage());
    }

    @Test
    void rejectsInconsistentChargesAtTheSpecifiedSwing() {
        // Q_gs + Q_gd ≤ Q_g (JESD24-2 curve), checked even when V_on = V_spec needs no slope
        assertEquals("expected Q_gs + Q_gd <= Q_g, got 3.0E-8 + 2.0E-8 > 4.4E-8 C",
                assertThrows(IllegalArgumentException.class,
                        () -> GateCharge.atSwing(44e-9, 30e-9, 20e-9, 10, 4, NAN, 10, 0))
                        .getMessage());
    }

    @Test
    void rejectsInconsistentCharges() {
        assertEquals("expected Q_gs + Q_gd <= Q_g, got 3.0E-8 + 2.0E-8 > 4.4E-8 C",
                assertThrows(IllegalArgumentException.class,
                        () -> GateCharge.atSwing(44e-9, 30e-9, 20e-9, 10, 4, NAN, 12, 0))
                        .getMessage());
        assertEquals("expected gate charge Q_g to be a finite number of C, got NaN",
                assertThrows(IllegalArgumentException.class,
                        () -> GateCharge.atSwing(NAN, 1, 1, 10, 4, NAN, 12, 0)).getMessage());
        assertEquals("expected off level V_off <= 0 V, got 1.0",
                assertThrows(IllegalArgumentException.class,
                        () -> GateCharge.atSwing(1e-9, NAN, NAN, 10, NAN, NAN, 10, 1))
                        .getMessage());
    }
}
