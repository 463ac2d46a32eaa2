package org.gatefit.physics;

import static org.junit.jupiter.api.Assertions.assertEquals;

import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import org.junit.jupiter.api.Test;

/** {@link Decay#oneMinusExp} against the JDK's {@code −Math.expm1(−x)} (the reference, exact to an ulp). */
class DecayTest {

    private static void agrees(double x) {
        double reference = -Math.expm1(-x);
        assertEquals(reference, Decay.oneMinusExp(x), 1e-12 * reference, "x = " + x);
    }

    @Property(tries = 2000)
    void agreesWithExpm1OverTwentyDecades(@ForAll @DoubleRange(min = -15, max = 2) double log10x) {
        agrees(Math.pow(10, log10x));
    }

    @Test
    void atTheEdgesAndAtTheSwitchOver() {
        for (double x : new double[] {1e-300, 1e-12, Decay.SMALL * (1 - 1e-12), Decay.SMALL, Decay.SMALL * (1 + 1e-12), 0.5, 1,
            36, 745, 1e6}) {
            agrees(x);
        }
        assertEquals(0, Decay.oneMinusExp(0));
        assertEquals(1, Decay.oneMinusExp(Double.POSITIVE_INFINITY));
        // e^-1 = 0.36787944117144233 (a textbook constant): 1 − e^-1 = 0.6321205588285577
        assertEquals(0.6321205588285577, Decay.oneMinusExp(1), 1e-16);
    }
}
