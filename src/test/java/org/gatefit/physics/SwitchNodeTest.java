package org.gatefit.physics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

/** {@link SwitchNode#overshoot}: v = L·di/dt for a current falling linearly (plain circuit theory). */
class SwitchNodeTest {
    @Test
    void overshootIsTheLoopInductanceTimesTheCurrentSlope() {
        // 20 nH · 30 A / 2 ns = 300 V (hand calculation)
        assertEquals(300.0, SwitchNode.overshoot(20e-9, 30, 2e-9), 1e-9);
        // no loop, no overshoot; twice the current, twice the overshoot
        assertEquals(0.0, SwitchNode.overshoot(0, 30, 2e-9));
        assertEquals(2 * SwitchNode.overshoot(5e-9, 10, 3e-9), SwitchNode.overshoot(5e-9, 20, 3e-9), 1e-12);
    }

    @Test
    void aFallTimeOfZeroOrANegativeInputIsRefused() {
        assertThrows(IllegalArgumentException.class, () -> SwitchNode.overshoot(1e-9, 1, 0));
        assertThrows(IllegalArgumentException.class, () -> SwitchNode.overshoot(-1e-9, 1, 1e-9));
        assertThrows(IllegalArgumentException.class, () -> SwitchNode.overshoot(1e-9, -1, 1e-9));
    }
}
