package org.gatefit.report;

import java.util.Objects;
import org.gatefit.match.Figure;
import org.gatefit.match.OperatingPoint;
import org.gatefit.match.PairResult;
import org.gatefit.match.SwitchPart;

/**
 * What the explain report needs beyond the pair's result to plot the gate: the switch (C_iss, Q_gd,
 * plateau, thresholds, limits) and the gate-loop resistances of one driver output.
 *
 * @param switchPart the switch as the rules saw it
 * @param rOn        total turn-on loop resistance: driver source + (R_g + R_g,int) / parallel, Ω
 * @param rOff       total turn-off loop resistance: driver sink + (R_g,off + R_g,int) / parallel, Ω
 * @param rFixedOn   the turn-on loop without the external resistor: driver source + R_g,int / parallel, Ω
 */
public record GateDrive(SwitchPart switchPart, double rOn, double rOff, double rFixedOn) {
    public GateDrive {
        Objects.requireNonNull(switchPart, "switchPart");
    }

    /** From the pair's driver-resistance figures and operating point (NaN where unknown). */
    public static GateDrive of(SwitchPart sw, PairResult p) {
        OperatingPoint op = p.point();
        double rInt = Double.isNaN(sw.rGInt()) ? 0 : sw.rGInt();
        int n = op.parallel();
        double src = p.figure("driver-resistance-source").map(Figure::value).orElse(Double.NaN);
        double snk = p.figure("driver-resistance-sink").map(Figure::value).orElse(Double.NaN);
        return new GateDrive(sw, src + (op.rG() + rInt) / n, snk + (op.rGOff() + rInt) / n, src + rInt / n);
    }
}
