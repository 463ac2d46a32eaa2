package org.gatefit.physics;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

class ESeriesTest {

    @Test
    void decadesAreTheIec60063Tables() {
        // IEC 60063:2015, E6, E12 and E24 (two significant figures)
        assertArrayEquals(new int[] {10, 15, 22, 33, 47, 68}, ESeries.E6.decade());
        assertArrayEquals(new int[] {10, 12, 15, 18, 22, 27, 33, 39, 47, 56, 68, 82},
                ESeries.E12.decade());
        assertArrayEquals(new int[] {10, 11, 12, 13, 15, 16, 18, 20, 22, 24, 27, 30, 33, 36, 39,
            43, 47, 51, 56, 62, 68, 75, 82, 91}, ESeries.E24.decade());
    }

    @ParameterizedTest(name = "{0}: {1} {2} -> nearest {3}, up {4}, down {5}")
    @CsvSource(textBlock = """
        # source,                                              series, value,     nearest,  up,       down
        'IEC 60063 E12; REFERENCES §3 critical R 4.53 Ω',       E12,    4.53,      4.7,      4.7,      3.9
        'IEC 60063 E24; REFERENCES §3 critical R 9.64 Ω',       E24,    9.64,      10,       10,       9.1
        'IEC 60063 E12; REFERENCES §4 C_boot,min 94.9 nF',      E12,    94.9e-9,   100e-9,   100e-9,   82e-9
        'IEC 60063 E12; common practice 3 × 94.9 nF',           E12,    284.7e-9,  270e-9,   330e-9,   270e-9
        'IEC 60063 E24; a series value maps to itself',         E24,    4.7e3,     4.7e3,    4.7e3,    4.7e3
        'IEC 60063 E12; a series value maps to itself',         E12,    2.2e-12,   2.2e-12,  2.2e-12,  2.2e-12
        'IEC 60063 E6; across a decade boundary',               E6,     8.5,       10,       10,       6.8
        'IEC 60063 E24; decade boundary, down',                 E24,    0.099,     0.1,      0.1,      0.091
        """)
    void roundsToTheSeries(String source, ESeries series, double value, double nearest,
            double up, double down) {
        assertEquals(nearest, series.roundNearest(value), 1e-9 * nearest, source);
        assertEquals(up, series.roundUp(value), 1e-9 * up, source);
        assertEquals(down, series.roundDown(value), 1e-9 * down, source);
    }

    @Test
    void theTableSearchGivesWhatTheDecadeWalkGives() {
        // Rounding searches a precomputed table; the decade walk it replaced is the reference.
        java.util.Random r = new java.util.Random(60063);
        for (ESeries s : ESeries.values()) {
            for (int i = 0; i < 200_000; i++) {
                double v = Math.pow(10, -20 + 40 * r.nextDouble());
                assertEquals(s.roundUpByDecades(v), s.roundUp(v), 0.0, s + " up " + v);
                assertEquals(s.roundDownByDecades(v), s.roundDown(v), 0.0, s + " down " + v);
            }
            for (int e = -17; e <= 15; e++) {
                for (int m : s.decade()) {
                    double v = m * Math.pow(10, e - 1); // on a series value, and just either side of it
                    for (double x : new double[] {v, Math.nextUp(v), Math.nextDown(v), v * (1 + 1e-9), v * (1 - 1e-9)}) {
                        assertEquals(s.roundUpByDecades(x), s.roundUp(x), 0.0, s + " up " + x);
                        assertEquals(s.roundDownByDecades(x), s.roundDown(x), 0.0, s + " down " + x);
                    }
                }
            }
        }
    }

    @Test
    void aTieOnTheLogScaleGoesUp() {
        // IEC 60063 E12 neighbours 10 and 12 (and E6 neighbours 33 and 47): their geometric mean is
        // the midpoint on the log scale, where the documented rule sends the value up. Checked where
        // this JVM's Math.log makes the two distances equal (it does on the reference JDK 17).
        double[][] neighbours = {{10, 12}, {33, 47}};
        ESeries[] series = {ESeries.E12, ESeries.E6};
        for (int k = 0; k < neighbours.length; k++) {
            double down = neighbours[k][0];
            double up = neighbours[k][1];
            double mid = Math.sqrt(down * up);
            assumeTrue(Math.log(up / mid) == Math.log(mid / down), "no exact tie at " + mid);
            assertEquals(up, series[k].roundNearest(mid), 0, series[k] + " " + mid);
            assertEquals(down, series[k].roundNearest(Math.nextDown(mid)), 0);
        }
    }

    @Test
    void aValueWithinTheToleranceBelowTheLowestTableEntryRoundsDownToIt() {
        // IEC 60063 value 10·10^−18 (the lowest the search table holds): a value within the 1e-9
        // "already a series value" tolerance below it rounds down to it, as the decade walk says
        double lowest = 10 / 1e18;
        double x = lowest / (1 + 1e-9);
        for (int k = 0; k < 3; k++) {
            x = Math.nextDown(x);
        }
        for (int k = 0; k < 7; k++, x = Math.nextUp(x)) {
            for (ESeries s : ESeries.values()) {
                assertEquals(s.roundDownByDecades(x), s.roundDown(x), 0.0, s + " down " + x);
                assertEquals(s.roundUpByDecades(x), s.roundUp(x), 0.0, s + " up " + x);
            }
        }
        assertEquals(lowest, ESeries.E24.roundDown(lowest / (1 + 1e-9)), 0);
    }

    @Test
    void containsOnlySeriesValues() {
        assertTrue(ESeries.E12.contains(68e-9));
        assertFalse(ESeries.E12.contains(75e-9));
        assertTrue(ESeries.E24.contains(75e-9));
    }

    @Test
    void rejectsValuesOutsideComponentRange() {
        assertEquals("expected value to round in [1.0E-30, 1.0E30], got 0.0",
                assertThrows(IllegalArgumentException.class, () -> ESeries.E12.roundUp(0))
                        .getMessage());
        assertThrows(IllegalArgumentException.class, () -> ESeries.E24.roundDown(-1));
        assertThrows(IllegalArgumentException.class,
                () -> ESeries.E6.roundNearest(Double.POSITIVE_INFINITY));
        // A subnormal capacitance (an extreme value a catalog admits) is refused, not walked into
        // decades that underflow.
        assertThrows(IllegalArgumentException.class, () -> ESeries.E12.roundUp(1.485e-317));
        assertThrows(IllegalArgumentException.class, () -> ESeries.E24.roundDown(1e300));
        assertEquals(1e-12, ESeries.E12.roundUp(1e-12), 1e-24, "a picofarad is in range");
    }
}
