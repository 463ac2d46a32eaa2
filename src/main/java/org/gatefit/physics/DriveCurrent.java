package org.gatefit.physics;

/**
 * Gate-drive current: the average current a transition needs and the peak current a driver
 * can deliver through the gate resistance.
 *
 * <p>Sources: plain circuit theory (I = Q/t, Ohm's law); the peak-current form and the cap at
 * the rated peak follow the gate-drive chapter of Mohan, Undeland, Robbins, <i>Power
 * Electronics</i>, 3rd ed. All values are SI: V, A, C, s, Ω.
 */
public final class DriveCurrent {

    private DriveCurrent() {
    }

    /**
     * Average gate current needed to move a gate charge in a given time: {@code I = Q_g / t}.
     * The rule of thumb is a driver rated well above this figure (common practice).
     *
     * @param gateCharge Q_g over the swing used, C (≥ 0)
     * @param transitionTime target edge time t, s (&gt; 0)
     * @return required average gate current, A
     */
    public static double required(double gateCharge, double transitionTime) {
        Require.nonNegative("gate charge Q_g", "C", gateCharge);
        Require.positive("transition time t", "s", transitionTime);
        return gateCharge / transitionTime;
    }

    /**
     * Peak gate current through the loop resistance, capped at the driver's rated peak:
     * {@code I_pk = min(I_rated, ΔV / (R_driver + R_g,ext + R_g,int))}. The uncapped value is the
     * current at the start of the edge, when the gate is still at the opposite level, so ΔV is
     * the full swing (on level minus off level). Use the source resistance and the turn-on
     * resistor for the source current, the sink resistance and the turn-off resistor for the
     * sink current.
     *
     * <p>Assumes a resistive driver output stage; a real output also saturates, which the cap
     * models crudely.
     *
     * @param swing ΔV across the gate loop at the start of the edge, V (≥ 0)
     * @param driverResistance driver output resistance (source or sink), Ω (≥ 0)
     * @param externalGateResistance external gate resistor, Ω (≥ 0)
     * @param internalGateResistance switch internal gate resistance, Ω (≥ 0; 0 if not given)
     * @param ratedPeak the driver's rated peak current, A (&gt; 0)
     * @return peak gate current, A
     */
    public static double peak(double swing, double driverResistance, double externalGateResistance,
            double internalGateResistance, double ratedPeak) {
        Require.nonNegative("swing ΔV", "V", swing);
        Require.positive("rated peak current", "A", ratedPeak);
        double r = totalResistance(driverResistance, externalGateResistance, internalGateResistance);
        if (r == 0) {
            return ratedPeak;
        }
        return Math.min(ratedPeak, swing / r);
    }

    /**
     * Gate current during the Miller plateau, which sets the drain-voltage edge:
     * {@code I = min(I_rated, ΔV_plateau / R_total)}, with ΔV_plateau = V_on − V_plateau at turn-on
     * and V_plateau − V_off at turn-off. While the drain voltage moves, the gate sits at the plateau,
     * so only the drive level's excess over (or the off level's distance under) the plateau drives
     * current through the loop — not the full swing that {@link #peak} uses at the start of the
     * edge. Source: plain circuit theory on the constant-voltage plateau (Mohan, Undeland, Robbins,
     * <i>Power Electronics</i>, 3rd ed., gate-drive chapter; REFERENCES.md §8 "plateau-limited gate
     * current").
     *
     * @param plateauDrive voltage across the loop on the plateau, V (≥ 0)
     * @param totalResistance loop resistance R_driver + R_g + R_g,int, Ω (≥ 0)
     * @param ratedPeak the driver's rated peak current, A (&gt; 0)
     * @return plateau current, A (the rated peak when the loop has no resistance)
     */
    public static double plateau(double plateauDrive, double totalResistance, double ratedPeak) {
        Require.nonNegative("plateau drive voltage", "V", plateauDrive);
        Require.nonNegative("loop resistance", "Ω", totalResistance);
        Require.positive("rated peak current", "A", ratedPeak);
        return totalResistance == 0 ? ratedPeak : Math.min(ratedPeak, plateauDrive / totalResistance);
    }

    /**
     * Sum of the gate-loop resistances {@code R_driver + R_g,ext + R_g,int}.
     *
     * @return total loop resistance, Ω
     */
    public static double totalResistance(double driverResistance, double externalGateResistance,
            double internalGateResistance) {
        Require.nonNegative("driver resistance", "Ω", driverResistance);
        Require.nonNegative("external gate resistance R_g", "Ω", externalGateResistance);
        Require.nonNegative("internal gate resistance R_g,int", "Ω", internalGateResistance);
        return driverResistance + externalGateResistance + internalGateResistance;
    }

    /**
     * The driver output resistance to use: the catalog value when given, else the estimate
     * {@code R ≈ V_supply / I_peak}. The estimate assumes the rated peak is the short-circuit
     * current of a resistive output at the given supply; real outputs are partly current
     * sources, so the estimate is flagged.
     *
     * @param catalogResistance the datasheet output resistance, Ω (≥ 0), or NaN when not given
     * @param supply the driver output supply, V (&gt; 0)
     * @param ratedPeak the rated peak current of that output, A (&gt; 0)
     * @return the resistance and whether it is an estimate
     */
    public static DriverResistance outputResistance(double catalogResistance, double supply,
            double ratedPeak) {
        return new DriverResistance(outputOhms(catalogResistance, supply, ratedPeak),
                !Require.given(catalogResistance));
    }

    /**
     * {@link #outputResistance}'s ohms without its object (it is estimated exactly when
     * {@code catalogResistance} is NaN), for ranking, which computes it for every candidate.
     */
    public static double outputOhms(double catalogResistance, double supply, double ratedPeak) {
        if (Require.given(catalogResistance)) {
            Require.nonNegative("driver output resistance", "Ω", catalogResistance);
            return catalogResistance;
        }
        Require.positive("driver supply", "V", supply);
        Require.positive("rated peak current", "A", ratedPeak);
        return supply / ratedPeak;
    }

    /**
     * A driver output resistance, and whether it was estimated from V / I_peak rather than
     * taken from the datasheet.
     *
     * @param ohms resistance, Ω (finite, ≥ 0)
     * @param estimated true when derived from supply and rated peak current
     */
    public record DriverResistance(double ohms, boolean estimated) {
        public DriverResistance {
            Require.nonNegative("driver output resistance", "Ω", ohms);
        }
    }
}
