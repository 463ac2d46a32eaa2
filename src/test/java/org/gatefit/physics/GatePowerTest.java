package org.gatefit.physics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

class GatePowerTest {

    private static final double MW = 1e-3;

    @Test
    void totalGatePowerIsChargeTimesSwingTimesFrequency() {
        // REFERENCES §2 (computed): 44 nC, 10 V, 100 kHz → 44.0 mW
        assertEquals(44.0, GatePower.total(44e-9, 10, 100e3) / MW, 1e-9);
    }

    @Test
    void splitFollowsTheResistanceRatiosOfEachEdge() {
        // REFERENCES §2 (computed): R_src 2 Ω, R_sink 1 Ω, R_g 3 Ω, R_g,int 1.2 Ω →
        // driver 11.33 mW, external 23.34 mW, internal 9.33 mW
        GatePower.Split s = GatePower.split(44e-9, 10, 100e3, 2, 1, 3, 3, 1.2);
        assertEquals(11.33, s.driver() / MW, 0.005);
        assertEquals(23.34, s.external() / MW, 0.005);
        assertEquals(9.33, s.internal() / MW, 0.01);
        // plain circuit theory: the split accounts for all of Q·ΔV·f
        assertEquals(GatePower.total(44e-9, 10, 100e3), s.total(), 1e-15);
    }

    @Test
    void driverPowerAddsQuiescentAndLevelShiftTermsWhereGiven() {
        // REFERENCES §2: V_DD·I_DD + V·I_qbs + V·Q_ls·f; 15 V·1 mA = 15 mW, 15 V·100 µA = 1.5 mW,
        // 400 V·2.5 nC·100 kHz = 100 mW (plain circuit theory)
        GatePower.DriverPower p = GatePower.driverPower(11.33 * MW, 15, 1e-3, 15, 100e-6, 400,
                2.5e-9, 100e3);
        assertEquals(15.0, p.quiescent() / MW, 1e-9);
        assertEquals(1.5, p.highSide() / MW, 1e-9);
        assertEquals(100.0, p.levelShift() / MW, 1e-9);
        assertEquals(11.33 + 15 + 1.5 + 100, p.total() / MW, 1e-9);
        assertTrue(p.complete());
        GatePower.DriverPower partial = GatePower.driverPower(11.33 * MW, 15, 1e-3, Double.NaN,
                Double.NaN, Double.NaN, Double.NaN, 100e3);
        assertFalse(partial.complete());
        assertEquals(26.33, partial.total() / MW, 1e-9);
    }

    @Test
    void rejectsAnEdgeWithNoResistanceToSplitOver() {
        assertEquals("expected turn-off loop resistance > 0 Ω, got 0.0",
                assertThrows(IllegalArgumentException.class,
                        () -> GatePower.split(1e-9, 10, 1e5, 1, 0, 1, 0, 0)).getMessage());
        assertEquals("expected switching frequency f >= 0 Hz, got -1.0",
                assertThrows(IllegalArgumentException.class,
                        () -> GatePower.total(1e-9, 10, -1)).getMessage());
    }
}
