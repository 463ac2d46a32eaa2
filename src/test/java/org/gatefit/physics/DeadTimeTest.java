package org.gatefit.physics;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class DeadTimeTest {

    @ParameterizedTest(name = "{0}")
    @CsvSource(textBlock = """
        # source,                                                    tdoff, tf, tdon, mismatch, expected ns
        'common practice, no source (REFERENCES §9 budget)',         50,    20, 15,   10,       65
        'common practice, no source: fast turn-on needs no margin',  10,    5,  40,   0,        0
        """)
    void deadTimeCoversTheWorstCaseTurnOff(String source, double tdoff, double tf, double tdon,
            double mismatch, double expected) {
        assertEquals(expected,
                DeadTime.minimum(tdoff * 1e-9, tf * 1e-9, tdon * 1e-9, mismatch * 1e-9) * 1e9,
                1e-9, source);
    }

    @Test
    void rejectsNegativeTimes() {
        assertEquals("expected delay mismatch >= 0 s, got -1.0E-9",
                assertThrows(IllegalArgumentException.class,
                        () -> DeadTime.minimum(1e-9, 1e-9, 1e-9, -1e-9)).getMessage());
    }

    @Test
    void aSegmentThatDoesNotMoveTakesNoTimeAndAPlateauAtQgsVoltageIsRefused() {
        // First-order RC, t = R·C·ln((V_target − V_from)/(V_target − V_to)) (REFERENCES.md §1): from a
        // level to itself ln 1 = 0.
        assertEquals(0.0, DeadTime.rcSegment(5, 3e-9, 10, 2, 2));
        // The charge above the plateau is spread over V_spec − V_plateau, which must be positive.
        assertThrows(IllegalArgumentException.class, () -> DeadTime.capacitanceAbovePlateau(50e-9, 15e-9, 15e-9, 5, 5));
    }
}
