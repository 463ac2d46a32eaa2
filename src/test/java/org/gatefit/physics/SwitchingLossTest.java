package org.gatefit.physics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

class SwitchingLossTest {

    @Test
    void clampedInductiveSwitchingLoss() {
        // REFERENCES §8; Mohan, Undeland, Robbins 3rd ed. ch. 2; Erickson & Maksimović 3rd ed.:
        // 400 V, 10 A, 20 ns + 30 ns, 100 kHz → 40 + 60 µJ → 10.0 W
        assertEquals(40e-6, SwitchingLoss.edgeEnergy(400, 10, 20e-9), 1e-15);
        assertEquals(60e-6, SwitchingLoss.edgeEnergy(400, 10, 30e-9), 1e-15);
        assertEquals(10.0, SwitchingLoss.power(400, 10, 20e-9, 30e-9, 100e3), 1e-9);
    }

    @Test
    void edgeTimesFromTheGateDriveAddCurrentAndVoltageTransitions() {
        // REFERENCES §1 inputs: voltage edge = plateau 4.753 ns; current edge = RC time from
        // V_th 2 V to V_pl 3 V, 6.2 Ω·3.9 nF·ln(10/9) = 2.548 ns (plain circuit theory)
        double on = SwitchingLoss.turnOnEdge(6.2, 3.9e-9, 6.9e-9, 12, 2, 3);
        assertEquals(4.753 + 2.548, on * 1e9, 0.002);
        // turn-off: plateau 11.96 ns + 5.2 Ω·3.9 nF·ln(3/2) = 8.223 ns
        double off = SwitchingLoss.turnOffEdge(5.2, 3.9e-9, 6.9e-9, 2, 3, 0);
        assertEquals(11.96 + 8.223, off * 1e9, 0.006);
    }

    @Test
    void rejectsNegativeCurrent() {
        assertEquals("expected switched current >= 0 A, got -1.0",
                assertThrows(IllegalArgumentException.class,
                        () -> SwitchingLoss.edgeEnergy(400, -1, 1e-9)).getMessage());
    }
}
