package org.gatefit.physics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class DriveCurrentTest {

    @ParameterizedTest(name = "{0}: {1} nC in {2} ns -> {3} A")
    @CsvSource(textBlock = """
        # source,                             qg nC, t ns, expected A
        'common practice, no source',          130,   50,   2.6
        'plain circuit theory (I = Q/t)',       44,   20,   2.2
        """)
    void requiredCurrentIsChargeOverTime(String source, double qg, double t, double expected) {
        assertEquals(expected, DriveCurrent.required(qg * 1e-9, t * 1e-9), 1e-9, source);
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(textBlock = """
        # source,                                                 swing, rdrv, rg, rgint, rated, expected A
        'plain circuit theory (Ohm), REFERENCES §2 resistances',  10,    2,    3,  1.2,   4.0,   1.6129
        'plain circuit theory (Ohm), sink side',                  10,    1,    3,  1.2,   4.0,   1.9231
        'REFERENCES §1: capped at the rated peak',                12,    1,    0,  0.5,   2.0,   2.0
        'plain circuit theory, negative off level adds to swing', 20,    2,    3,  1.2,   9.0,   3.2258
        """)
    void peakCurrentIsSwingOverLoopResistanceCappedAtRating(String source, double swing,
            double rdrv, double rg, double rgint, double rated, double expected) {
        assertEquals(expected, DriveCurrent.peak(swing, rdrv, rg, rgint, rated), 1e-4, source);
    }

    @Test
    void outputResistanceIsEstimatedFromSupplyAndPeakWhenNotGiven() {
        // documented estimate R ≈ V / I_pk (plain circuit theory on a resistive output)
        DriveCurrent.DriverResistance est = DriveCurrent.outputResistance(Double.NaN, 12, 4);
        assertEquals(3.0, est.ohms(), 1e-12);
        assertTrue(est.estimated());
        DriveCurrent.DriverResistance given = DriveCurrent.outputResistance(2.0, 12, 4);
        assertEquals(2.0, given.ohms(), 0);
        assertFalse(given.estimated());
    }

    @Test
    void zeroLoopResistanceGivesTheRatedPeak() {
        assertEquals(4.0, DriveCurrent.peak(12, 0, 0, 0, 4.0), 0);
    }

    @Test
    void rejectsInvalidInputWithExpectedGotMessages() {
        assertEquals("expected transition time t > 0 s, got 0.0",
                assertThrows(IllegalArgumentException.class,
                        () -> DriveCurrent.required(1e-9, 0)).getMessage());
        assertEquals("expected external gate resistance R_g >= 0 Ω, got -1.0",
                assertThrows(IllegalArgumentException.class,
                        () -> DriveCurrent.peak(12, 1, -1, 0, 2)).getMessage());
        assertEquals("expected rated peak current to be a finite number of A, got NaN",
                assertThrows(IllegalArgumentException.class,
                        () -> DriveCurrent.peak(12, 1, 1, 0, Double.NaN)).getMessage());
    }
}
