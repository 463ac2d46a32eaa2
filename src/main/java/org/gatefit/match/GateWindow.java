package org.gatefit.match;

/**
 * The switch's gate window as advice must respect it: no rule advises an on level above V_GS,max
 * less the gate headroom (the same limit {@code gate-voltage} passes), so a fix that would need one
 * says that nothing in the window works instead and offers a clamp, an isolated supply or another
 * part.
 */
final class GateWindow {
    private GateWindow() {
    }

    /** The highest on level advice may name: V_GS,max less the gate headroom; NaN when V_GS,max is unknown. */
    static double onLimit(SwitchPart s, Margins m) {
        return s.vGsMax() * (1 - m.gateHeadroom());
    }

    /** Whether an on level may be advised: within {@link #onLimit} (or the limit is unknown). */
    static boolean allows(SwitchPart s, Margins m, double on) {
        double limit = onLimit(s, m);
        return Double.isNaN(limit) || on <= limit + 1e-9;
    }
}
