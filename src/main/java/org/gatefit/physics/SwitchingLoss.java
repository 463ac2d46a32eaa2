package org.gatefit.physics;

/**
 * Hard-switching loss estimates, for context in reports and rankings.
 *
 * <p>Clamped inductive load with linear voltage and current transitions: during each edge the
 * full current flows while the full voltage is across the switch for part of the time, and the
 * energy per edge is {@code E ≈ ½·V·I·t} with t the edge (crossover) time; {@code P =
 * (E_on + E_off)·f}. Source: Mohan, Undeland, Robbins, <i>Power Electronics</i>, 3rd ed., ch. 2
 * (switching losses); Erickson and Maksimović, <i>Fundamentals of Power Electronics</i>, 3rd ed.
 * (switching loss). Ignores reverse recovery and the output-capacitance energy, so it is an
 * underestimate at high bus voltage.
 */
public final class SwitchingLoss {

    private SwitchingLoss() {
    }

    /**
     * Energy of one edge {@code E = ½·V·I·t}.
     *
     * @param voltage switched voltage, V (≥ 0)
     * @param current switched current, A (≥ 0)
     * @param edgeTime crossover time of the edge, s (≥ 0)
     * @return energy, J
     */
    public static double edgeEnergy(double voltage, double current, double edgeTime) {
        Require.nonNegative("switched voltage", "V", voltage);
        Require.nonNegative("switched current", "A", current);
        Require.nonNegative("edge time", "s", edgeTime);
        return 0.5 * voltage * current * edgeTime;
    }

    /**
     * Switching power {@code P = ½·V·I·(t_on + t_off)·f}.
     *
     * @param frequency switching frequency, Hz (≥ 0)
     * @return power, W
     */
    public static double power(double voltage, double current, double onEdge, double offEdge,
            double frequency) {
        Require.nonNegative("switching frequency f", "Hz", frequency);
        return (edgeEnergy(voltage, current, onEdge) + edgeEnergy(voltage, current, offEdge))
                * frequency;
    }

    /**
     * Crossover time of a turn-on edge estimated from the gate drive: current rise (threshold to
     * plateau) plus voltage fall (the plateau), from {@link SwitchingTimes}.
     */
    public static double turnOnEdge(double rOn, double cIss, double qgd, double vOn, double vTh,
            double vPlateau) {
        return SwitchingTimes.currentRise(rOn, cIss, vOn, vTh, vPlateau)
                + SwitchingTimes.plateauOn(qgd, rOn, vOn, vPlateau);
    }

    /**
     * Crossover time of a turn-off edge estimated from the gate drive: voltage rise (the
     * plateau) plus current fall (plateau to threshold), from {@link SwitchingTimes}.
     */
    public static double turnOffEdge(double rOff, double cIss, double qgd, double vTh,
            double vPlateau, double vOff) {
        return SwitchingTimes.plateauOff(qgd, rOff, vPlateau, vOff)
                + SwitchingTimes.currentFall(rOff, cIss, vTh, vPlateau, vOff);
    }
}
