package org.gatefit.physics;

/**
 * The switch node's overshoot at turn-off: the load current falls through the power commutation loop's
 * inductance, which drives the node past the bus by {@code L·di/dt} — for a current falling linearly
 * from I to 0 in t_fall, {@code L·I/t_fall} (plain circuit theory, v = L·di/dt; the ringing that follows
 * is damped by the loop's resistance and is not modelled). SI units.
 */
public final class SwitchNode {
    private SwitchNode() {
    }

    /**
     * Overshoot above the bus, {@code L·I/t_fall}.
     *
     * @param loopInductance power commutation loop inductance, H (≥ 0)
     * @param current        load current turned off, A (≥ 0)
     * @param fallTime       current fall time, s (&gt; 0)
     * @return overshoot, V
     */
    public static double overshoot(double loopInductance, double current, double fallTime) {
        Require.nonNegative("power loop inductance", "H", loopInductance);
        Require.nonNegative("load current", "A", current);
        Require.positive("current fall time", "s", fallTime);
        return loopInductance * current / fallTime;
    }
}
