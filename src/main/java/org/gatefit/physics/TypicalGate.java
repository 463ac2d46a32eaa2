package org.gatefit.physics;

/**
 * The typical gate window of Si MOSFETs and IGBTs (common practice, no source): most gates turn
 * on properly 5 to 20 V above the source, and more than 20 V damages most gates. For a first
 * look only; the part's own V_GS limits and the V_GS its R_DS(on) is specified at decide. GaN
 * and logic-level parts have much lower windows.
 */
public final class TypicalGate {

    /** Common practice, no source: below this most gates are not fully on, V. */
    public static final double ON_MIN = 5.0;

    /** Common practice, no source: above this most gates are damaged, V. */
    public static final double DAMAGE_ABOVE = 20.0;

    private TypicalGate() {
    }

    /** Where a gate-source voltage falls in the typical window. */
    public enum Zone {
        /** Below {@link #ON_MIN}: most gates are not properly on. */
        TOO_LOW,
        /** {@link #ON_MIN} to {@link #DAMAGE_ABOVE} inclusive: most gates turn on properly. */
        ON,
        /** Above {@link #DAMAGE_ABOVE}: damages most gates. */
        DAMAGING
    }

    /**
     * Classify a gate-source voltage against the typical window.
     *
     * @param vGs gate-source on voltage, V (finite)
     */
    public static Zone classify(double vGs) {
        Require.finite("gate-source voltage", "V", vGs);
        if (vGs > DAMAGE_ABOVE) {
            return Zone.DAMAGING;
        }
        return vGs >= ON_MIN ? Zone.ON : Zone.TOO_LOW;
    }
}
