package org.gatefit.physics;

import java.util.OptionalDouble;

/**
 * Noise margins of a logic output driving an input:
 * {@code NM_H = V_OH − V_IH}, {@code NM_L = V_IL − V_OL} (plain circuit theory; the JEDEC
 * interface standards JESD8C.01, JESD8-5 and JESD8-7 define levels so these are positive within
 * a family). A negative margin means the input is not guaranteed to see the level: the output
 * and the driver's input thresholds are incompatible.
 *
 * @param high NM_H, V
 * @param low NM_L, V
 */
public record NoiseMargins(double high, double low) {

    public NoiseMargins {
        Require.finite("high noise margin", "V", high);
        Require.finite("low noise margin", "V", low);
    }

    /**
     * Margins of output levels into input thresholds.
     *
     * @param vOh output high (min), V
     * @param vOl output low (max), V
     * @param vIh input high threshold (the driver's V_IH max), V
     * @param vIl input low threshold (the driver's V_IL min), V
     */
    public static NoiseMargins of(double vOh, double vOl, double vIh, double vIl) {
        return new NoiseMargins(
                Require.finite("V_OH", "V", vOh) - Require.finite("V_IH", "V", vIh),
                Require.finite("V_IL", "V", vIl) - Require.finite("V_OL", "V", vOl));
    }

    /** Margins of a family's outputs at a supply into a driver's input thresholds. */
    public static NoiseMargins of(LogicFamily.Levels output, double vIh, double vIl) {
        return of(output.vOh(), output.vOl(), vIh, vIl);
    }

    /** NM_H = V_OH − V_IH, or empty when either is NaN (not given). */
    public static OptionalDouble high(double vOh, double vIh) {
        if (!Require.given(vOh) || !Require.given(vIh)) {
            return OptionalDouble.empty();
        }
        return OptionalDouble.of(Require.finite("V_OH", "V", vOh)
                - Require.finite("V_IH", "V", vIh));
    }

    /** NM_L = V_IL − V_OL, or empty when either is NaN (not given). */
    public static OptionalDouble low(double vIl, double vOl) {
        if (!Require.given(vIl) || !Require.given(vOl)) {
            return OptionalDouble.empty();
        }
        return OptionalDouble.of(Require.finite("V_IL", "V", vIl)
                - Require.finite("V_OL", "V", vOl));
    }

    /** True when both margins are at least zero. */
    public boolean compatible() {
        return high >= 0 && low >= 0;
    }

    /** The smaller of the two margins, V. */
    public double worst() {
        return Math.min(high, low);
    }
}
