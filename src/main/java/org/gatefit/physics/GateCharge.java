package org.gatefit.physics;

import java.util.Optional;

/**
 * Gate charge at the drive levels actually used, extrapolated along the datasheet
 * gate-charge curve (JEDEC JESD24-2 test method; IEC 60747-8).
 *
 * <p>Datasheets give the total gate charge Q_g from 0 V up to one gate voltage V_spec, with the
 * pieces Q_gs (0 V up to the plateau) and Q_gd (across the Miller plateau at V_plateau). The
 * curve is modelled as three straight pieces:
 * <ul>
 *   <li>below the plateau: Q = Q_gs · V / V_plateau;</li>
 *   <li>across the plateau: Q rises by Q_gd at constant V_plateau;</li>
 *   <li>above the plateau: slope {@code C_above = (Q_g − Q_gs − Q_gd) / (V_spec − V_plateau)},
 *       so Q(V_on) = Q_g + C_above · (V_on − V_spec).</li>
 * </ul>
 * A negative off level adds roughly {@code C_iss · |V_off|} (the gate is below threshold there,
 * where the input capacitance is about C_iss). The result is an estimate: real curves bend, and
 * C_iss depends on V_DS. Source: plain circuit theory on the piecewise-linear gate-charge curve;
 * Mohan, Undeland, Robbins, <i>Power Electronics</i>, 3rd ed., gate-drive chapter.
 */
public final class GateCharge {

    private GateCharge() {
    }

    /**
     * Gate charge for a swing from {@code vOff} (≤ 0) up to {@code vOn}.
     *
     * <p>Returns the datasheet Q_g unchanged (not flagged an estimate) when the swing equals the
     * specified one (V_on = V_spec, V_off = 0). Otherwise extrapolates as described in the class
     * comment and flags the result as an estimate. Empty ("unknown") when an input the
     * extrapolation needs is NaN (not given): V_spec always; Q_gs, Q_gd and V_plateau when
     * V_on ≠ V_spec; C_iss when V_off &lt; 0 (if C_iss is not given, the slope below the plateau
     * Q_gs / V_plateau stands in for it when those are known).
     *
     * @param qg total gate charge Q_g, C (required, ≥ 0)
     * @param qgs gate-source charge Q_gs, C, or NaN
     * @param qgd gate-drain (Miller) charge Q_gd, C, or NaN
     * @param vSpec the gate voltage Q_g is specified at, V, or NaN
     * @param vPlateau the Miller plateau voltage, V, or NaN
     * @param cIss input capacitance C_iss, F, or NaN
     * @param vOn drive on level, V (&gt; 0)
     * @param vOff drive off level, V (≤ 0)
     * @return the charge for the swing, or empty when inputs are missing
     * @throws IllegalArgumentException for an invalid given input (negative charge, V_spec not
     *         above the plateau, Q_gs + Q_gd &gt; Q_g, positive off level …)
     */
    public static Optional<Estimate> atSwing(double qg, double qgs, double qgd, double vSpec,
            double vPlateau, double cIss, double vOn, double vOff) {
        Require.nonNegative("gate charge Q_g", "C", qg);
        Require.positive("on level V_on", "V", vOn);
        Require.nonPositive("off level V_off", "V", vOff);
        if (!Require.given(vSpec)) {
            return Optional.empty();
        }
        Require.positive("Q_g specification voltage V_spec", "V", vSpec);
        boolean plateauKnown = Require.given(qgs) && Require.given(qgd) && Require.given(vPlateau);
        if (plateauKnown) {
            Require.nonNegative("gate-source charge Q_gs", "C", qgs);
            Require.nonNegative("gate-drain charge Q_gd", "C", qgd);
            Require.positive("plateau voltage V_plateau", "V", vPlateau);
            Require.greater("V_spec above V_plateau (V_spec, V_plateau)", vSpec, vPlateau);
            if (qgs + qgd > qg) {
                throw new IllegalArgumentException("expected Q_gs + Q_gd <= Q_g, got "
                        + qgs + " + " + qgd + " > " + qg + " C");
            }
        }
        double onCharge;
        if (vOn == vSpec) {
            onCharge = qg;
        } else if (!plateauKnown) {
            return Optional.empty();
        } else if (vOn >= vPlateau) {
            onCharge = qg + aboveSlope(qg, qgs, qgd, vSpec, vPlateau) * (vOn - vSpec);
        } else {
            onCharge = qgs * vOn / vPlateau;
        }
        double offCharge = 0;
        if (vOff < 0) {
            double c;
            if (Require.given(cIss)) {
                c = Require.nonNegative("input capacitance C_iss", "F", cIss);
            } else if (plateauKnown) {
                c = qgs / vPlateau;
            } else {
                return Optional.empty();
            }
            offCharge = c * -vOff;
        }
        boolean exact = vOn == vSpec && vOff == 0;
        return Optional.of(new Estimate(onCharge + offCharge, !exact));
    }

    /**
     * Slope of the gate-charge curve above the plateau,
     * {@code C_above = (Q_g − Q_gs − Q_gd) / (V_spec − V_plateau)}.
     *
     * @return incremental gate capacitance above the plateau, F
     */
    public static double aboveSlope(double qg, double qgs, double qgd, double vSpec,
            double vPlateau) {
        Require.nonNegative("gate charge Q_g", "C", qg);
        Require.nonNegative("gate-source charge Q_gs", "C", qgs);
        Require.nonNegative("gate-drain charge Q_gd", "C", qgd);
        Require.finite("Q_g specification voltage V_spec", "V", vSpec);
        Require.positive("plateau voltage V_plateau", "V", vPlateau);
        Require.greater("V_spec above V_plateau (V_spec, V_plateau)", vSpec, vPlateau);
        double rest = qg - qgs - qgd;
        if (rest < 0) {
            throw new IllegalArgumentException("expected Q_gs + Q_gd <= Q_g, got "
                    + qgs + " + " + qgd + " > " + qg + " C");
        }
        return rest / (vSpec - vPlateau);
    }

    /**
     * A gate charge and whether it was extrapolated from the datasheet swing.
     *
     * @param coulombs gate charge, C (finite, ≥ 0)
     * @param estimated true when extrapolated along the gate-charge curve
     */
    public record Estimate(double coulombs, boolean estimated) {
        public Estimate {
            Require.nonNegative("gate charge", "C", coulombs);
        }
    }
}
