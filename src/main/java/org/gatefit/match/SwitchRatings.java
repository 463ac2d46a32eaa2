package org.gatefit.match;

/**
 * A switch's recommended gate window and short-circuit rating, from optional catalog columns; SI
 * units, NaN where the catalog says nothing.
 *
 * @param vGateOnMax  top of the recommended on-level range, V ({@code v_gate_on_max_v})
 * @param vGateOffMin most negative recommended off level, V ({@code v_gate_off_min_v})
 * @param tSc         short-circuit withstand time, s ({@code t_sc_us})
 * @param tDOff       datasheet turn-off delay at the datasheet's gate resistor, s ({@code t_d_off_ns})
 * @param tF          datasheet current fall time (an IGBT's includes its tail), s ({@code t_f_ns})
 */
public record SwitchRatings(double vGateOnMax, double vGateOffMin, double tSc, double tDOff, double tF) {

    /** Nothing known. */
    public static final SwitchRatings UNKNOWN = new SwitchRatings(Double.NaN, Double.NaN, Double.NaN, Double.NaN,
            Double.NaN);
}
