package org.gatefit.physics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** The argument checks: each passes its value through and names what it expected (STYLE.md). */
class RequireTest {

    @Test
    void eachCheckReturnsTheValueItAccepts() {
        assertEquals(2.5, Require.finite("x", "V", 2.5), 0);
        assertEquals(2.5, Require.positive("x", "V", 2.5), 0);
        assertEquals(0.0, Require.nonNegative("x", "V", 0.0), 0);
        assertEquals(-2.5, Require.nonPositive("x", "V", -2.5), 0);
        assertEquals(2.5, Require.inRange("x", "V", 2.5, 1, 3), 0);
    }

    @Test
    void aRangeIncludesBothEnds() {
        assertEquals(1.0, Require.inRange("x", "V", 1.0, 1, 3), 0);
        assertEquals(3.0, Require.inRange("x", "V", 3.0, 1, 3), 0);
        assertEquals("expected x in [1.0, 3.0] V, got 3.0000000000000004",
                assertThrows(IllegalArgumentException.class,
                        () -> Require.inRange("x", "V", Math.nextUp(3.0), 1, 3)).getMessage());
        assertEquals("expected x in [1.0, 3.0], got 0.9999999999999999",
                assertThrows(IllegalArgumentException.class,
                        () -> Require.inRange("x", "", Math.nextDown(1.0), 1, 3)).getMessage());
    }

    @Test
    void zeroIsNotPositiveButIsNonPositive() {
        assertEquals("expected x > 0 Ω, got 0.0", assertThrows(IllegalArgumentException.class,
                () -> Require.positive("x", "Ω", 0)).getMessage());
        assertEquals(0.0, Require.nonPositive("x", "V", 0), 0);
        assertEquals("expected x <= 0 V, got 1.0E-300", assertThrows(
                IllegalArgumentException.class, () -> Require.nonPositive("x", "V", 1e-300))
                .getMessage());
        assertEquals("expected a > b, got 1.0 and 1.0", assertThrows(
                IllegalArgumentException.class, () -> Require.greater("a > b", 1, 1))
                .getMessage());
        assertTrue(Require.given(0));
        assertFalse(Require.given(Double.NaN));
    }

    @Test
    void theLargestFiniteNumbersAreFinite() {
        // Double.MAX_VALUE is finite (IEEE 754-2008 §3.4: the largest finite binary64 number), so the
        // sign checks accept it; only the infinities are refused.
        assertEquals(Double.MAX_VALUE, Require.nonNegative("x", "", Double.MAX_VALUE));
        assertEquals(-Double.MAX_VALUE, Require.nonPositive("x", "", -Double.MAX_VALUE));
        assertEquals(Double.MAX_VALUE, Require.positive("x", "", Double.MAX_VALUE));
        assertThrows(IllegalArgumentException.class, () -> Require.nonNegative("x", "", Double.POSITIVE_INFINITY));
        assertThrows(IllegalArgumentException.class, () -> Require.nonPositive("x", "", Double.NEGATIVE_INFINITY));
    }
}
