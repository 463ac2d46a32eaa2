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

    /**
     * The highest on level advice may name: V_GS,max less the gate headroom, and for an IGBT or SiC
     * MOSFET no more than the top of its recommended range where the catalog gives one (more drive
     * shortens the short-circuit withstand time: {@code gate-voltage}); NaN when V_GS,max is unknown.
     */
    static double onLimit(SwitchPart s, Margins m) {
        double limit = s.vGsMax() * (1 - m.gateHeadroom());
        double top = s.ratings().vGateOnMax();
        return GateVoltageRule.shortCircuitRated(s) && !Double.isNaN(top) ? Math.min(limit, top) : limit;
    }

    /** Whether an on level may be advised: within {@link #onLimit} (or the limit is unknown). */
    static boolean allows(SwitchPart s, Margins m, double on) {
        double limit = onLimit(s, m);
        return Double.isNaN(limit) || on <= limit + 1e-9;
    }
}
