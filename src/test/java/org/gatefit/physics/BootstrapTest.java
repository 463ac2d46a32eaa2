package org.gatefit.physics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class BootstrapTest {

    @Test
    void chargePerCycleAndMinimumCapacitance() {
        // REFERENCES §4 (computed): 44 nC + 100 µA·9.5 µs + 2.5 nC = 47.45 nC; at ΔV 0.5 V → 94.9 nF
        double q = Bootstrap.chargePerCycle(44e-9, 100e-6, 9.5e-6, 2.5e-9, 0);
        assertEquals(47.45, q * 1e9, 1e-9);
        assertEquals(94.9, Bootstrap.minCapacitance(q, 0.5) * 1e9, 1e-9);
    }

    @Test
    void leakageDrawsChargeForTheWholeOnTime() {
        // REFERENCES §4: Q = Q_g + I_qbs·t_on,max + Q_ls + I_leak·t_on,max; computed by hand:
        // 44 nC + 100 µA·9.5 µs + 2.5 nC + 50 µA·9.5 µs = 44 + 0.95 + 2.5 + 0.475 = 47.925 nC
        assertEquals(47.925, Bootstrap.chargePerCycle(44e-9, 100e-6, 9.5e-6, 2.5e-9, 50e-6) * 1e9,
                1e-9);
    }

    @Test
    void recommendedIsSeveralTimesTheMinimumRoundedUp() {
        // common practice, no source: 3 × 94.9 nF = 284.7 nF, rounded up on IEC 60063 E12 → 330 nF
        assertEquals(330e-9, Bootstrap.recommended(94.9e-9), 1e-18);
        // IEC 60063 E12, factor 1: 94.9 nF → 100 nF
        assertEquals(100e-9, Bootstrap.recommended(94.9e-9, 1, ESeries.E12), 1e-18);
        // REFERENCES §4, common practice: V_DD decoupling about ten times C_boot
        assertEquals(3.3e-6, Bootstrap.decoupling(330e-9), 1e-15);
    }

    @Test
    void allowedDroopKeepsTheHighSideAboveItsUvlo() {
        // REFERENCES §4: ΔV ≤ V_DD − V_F − V_UVLO,off; 12 − 0.7 − 8.5 = 2.8 V (plain arithmetic)
        assertEquals(2.8, Bootstrap.maxDroop(12, 0.7, 8.5), 1e-12);
        assertTrue(Bootstrap.maxDroop(10, 0.7, 9.5) < 0);
    }

    @Test
    void refreshLimitsTheDutyCycle() {
        // REFERENCES §4 (computed): R_boot 2.2 Ω, C 100 nF → τ 220 ns; 3τ at 100 kHz → D_max 0.934
        double t = Bootstrap.refreshTime(2.2, 100e-9, Bootstrap.REFRESH_TIME_CONSTANTS);
        assertEquals(660e-9, t, 1e-15);
        assertEquals(0.934, Bootstrap.maxDuty(t, 100e3), 1e-12);
        assertEquals(0.0, Bootstrap.maxDuty(20e-6, 100e3), 0);
    }

    @Test
    void inrushAndDiodeRating() {
        // REFERENCES §4 (computed): (12 − 0.7) V / 2.2 Ω = 5.14 A; diode reverse rating ≥ bus
        assertEquals(5.14, Bootstrap.inrush(12, 0.7, 2.2), 0.005);
        assertEquals(400, Bootstrap.diodeReverseVoltage(400, 0), 0);
        assertEquals(480, Bootstrap.diodeReverseVoltage(400, 80), 0);
    }

    @Test
    void rejectsNoDroopAndFactorsBelowOne() {
        assertEquals("expected allowed droop ΔV > 0 V, got -0.2",
                assertThrows(IllegalArgumentException.class,
                        () -> Bootstrap.minCapacitance(47e-9, -0.2)).getMessage());
        assertTrue(assertThrows(IllegalArgumentException.class,
                () -> Bootstrap.recommended(1e-7, 0.5, ESeries.E12)).getMessage()
                .startsWith("expected safety factor in [1.0, "));
    }

    @Test
    void withoutOffTimeTheCapacitorIsNeverRefreshed() {
        // Charge balance (REFERENCES.md §9): with no off time the capacitor gets no charge back, so no
        // level is held — through a bootstrap resistor or none, with or without a charge per cycle.
        assertEquals(Double.NEGATIVE_INFINITY, Bootstrap.steadyLowest(12, 0, 1e-6, 50e-9, 0, 0));
        assertEquals(Double.NEGATIVE_INFINITY, Bootstrap.steadyLowest(12, 1, 1e-6, 0, 0, 0));
    }
}
