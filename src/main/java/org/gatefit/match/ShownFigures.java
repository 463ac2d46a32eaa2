package org.gatefit.match;

import java.util.ArrayList;
import java.util.List;
import org.gatefit.physics.Bootstrap;
import org.gatefit.physics.DvDt;
import org.gatefit.physics.ESeries;
import org.gatefit.physics.GateLoop;
import org.gatefit.physics.GatePower;
import org.gatefit.physics.SwitchingTimes;

/**
 * The figures of a pair that are shown but never ruled on — delay times, gate-drive power and its
 * split outside the driver, the gate-loop damping and resistor range, the bootstrap inrush, the
 * allowed dv/dt — computed from the pair's {@link PairFigures} only for the pairs that are shown
 * (ranking never builds one). Immutable. Each figure is NaN (left out) where its model refuses the
 * pair's values, so a display figure can never change a verdict or stop an evaluation.
 */
final class ShownFigures {
    /** Gate-loop damping ratio the recommended resistor aims at (common practice, no source: about 0.7, under 5 % overshoot). */
    static final double DAMPING_TARGET = 0.7;

    final PairFigures f;
    final double delayOn;
    final double delayOff;
    final double pGate;
    final double pExternal;
    final double pInternal;
    final double rCrit;
    final double zeta;
    final double rgMin;
    final double rgMax;
    final double rgRecommended;
    final double bootInrush;
    final double dvdtAllowed;

    ShownFigures(PairFigures f) {
        this.f = f;
        Question q = f.q();
        OperatingPoint op = f.op();
        SwitchPart s = f.s();
        int n = q.n;
        boolean cIss = !Double.isNaN(s.cIss());
        boolean edges = PairFigures.edges(q, f.rOnTot(), f.rOffTot()) && cIss;
        delayOn = edges ? shown(() -> SwitchingTimes.delayOn(f.rOnTot(), n * s.cIss(), op.vDrive(), s.vPlateau(),
                op.vDriveNeg())) : Double.NaN;
        delayOff = edges ? shown(() -> SwitchingTimes.delayOff(f.rOffTot(), n * s.cIss(), op.vDrive(), s.vPlateau(),
                op.vDriveNeg())) : Double.NaN;

        boolean power = PairFigures.gatePowerKnown(q, f.rOnTot(), f.rOffTot());
        pGate = power ? shown(() -> GatePower.total(q.qTotal, op.swing(), op.fSw())) : Double.NaN;
        GatePower.Split split = null;
        if (power) {
            try {
                split = GatePower.split(q.qTotal, op.swing(), op.fSw(), f.rSrc(), f.rSnk(), op.rG() / n, op.rGOff() / n,
                        q.rInt / n);
            } catch (IllegalArgumentException | ArithmeticException e) {
                split = null; // shown figures only: left out when the model refuses the values
            }
        }
        pExternal = split == null ? Double.NaN : split.external();
        pInternal = split == null ? Double.NaN : split.internal();

        double[] loop = cIss && s.cIss() > 0 ? gateLoop(f) : null;
        rCrit = loop == null ? Double.NaN : loop[0];
        zeta = loop == null ? Double.NaN : loop[1];
        rgMin = loop == null ? Double.NaN : loop[2];
        rgMax = loop == null ? Double.NaN : loop[3];
        rgRecommended = loop == null ? Double.NaN : loop[4];

        bootInrush = !Double.isNaN(f.bootDroop()) && f.bootDroop() > 0 && op.rBoot() > 0
                ? shown(() -> Bootstrap.inrush(op.vDrive(), op.diodeDrop(), op.rBoot())) : Double.NaN;

        double step = f.millerStep();
        dvdtAllowed = !Double.isNaN(f.slew()) && f.slew() > 0 && !Double.isNaN(s.cRss()) && cIss
                && !Double.isNaN(s.vThMin()) && s.vThMin() > 0 && f.rOffPath() > 0 && step > 0
                ? shown(() -> DvDt.allowedRcLimited(s.cRss(), f.rOffPath(), s.cIss(), step, s.vThMin(), op.vDriveNeg()))
                : Double.NaN;
    }

    /** A figure only shown: NaN (left out) when its model refuses the pair's values. */
    private static double shown(java.util.function.DoubleSupplier figure) {
        try {
            return figure.getAsDouble();
        } catch (IllegalArgumentException | ArithmeticException e) {
            return Double.NaN;
        }
    }

    /**
     * The gate-loop figures: critical resistance, damping with the chosen resistor, and the
     * per-switch external resistor range with its recommended E24 value — damping target at the low
     * end, the drive-current edge at the high end. Each is NaN where its model refuses the values.
     */
    private static double[] gateLoop(PairFigures f) {
        Question q = f.q();
        OperatingPoint op = f.op();
        int n = q.n;
        double cg = n * q.s.cIss();
        double rc = shown(() -> GateLoop.criticalResistance(op.loop(), cg));
        double z = shown(() -> GateLoop.dampingRatio(f.rOnTot(), op.loop(), cg));
        double fixed = f.rSrc() + q.rInt / n;
        double lo = Math.max(0, n * (DAMPING_TARGET * rc - fixed));
        double hi = n * (op.swing() * op.edge() / (Margins.DEFAULT.driveCurrent() * q.qTotal) - fixed);
        double rec = Double.NaN;
        if (hi >= lo && hi > 0 && Double.isFinite(hi)) {
            // Aim at half the edge-limited maximum (margin on the edge, damping to spare; common
            // practice, no source), but never below the damping minimum.
            double aim = Math.max(lo, hi / 2);
            double pick = shown(() -> ESeries.E24.roundNearest(aim));
            if (pick < lo) {
                pick = shown(() -> ESeries.E24.roundUp(lo));
            }
            if (pick > hi) {
                pick = shown(() -> ESeries.E24.roundDown(hi));
            }
            rec = pick >= lo && pick <= hi ? pick : Double.NaN;
        }
        return new double[] {rc, z, Double.isNaN(rc) ? Double.NaN : lo, hi, rec};
    }

    /** Every figure of the pair that is a number, ruled and shown, in a fixed order, named as DESIGN.md fixes. */
    List<Figure> figures() {
        Question q = f.q();
        boolean qEst = q.qEstimated;
        List<Figure> l = new ArrayList<>();
        add(l, "gate-charge-at-swing", q.qSwing, "C", "Q_g over the actual swing, per switch", qEst);
        add(l, "gate-current-required", q.iReq, "A", "Q_g / target edge", qEst);
        add(l, "gate-current-peak-source", f.iPkSrc(), "A", "lower of rated peak and V / (R_source + R_g + R_g,int)",
                f.rSrcEstimated());
        add(l, "gate-current-peak-sink", f.iPkSnk(), "A", "lower of rated peak and V / (R_sink + R_g,off + R_g,int)",
                f.rSnkEstimated());
        add(l, "driver-resistance-source", f.rSrc(), "Ω", f.rSrcEstimated() ? "estimated as V / I_source,peak"
                : "from the catalog", f.rSrcEstimated());
        add(l, "driver-resistance-sink", f.rSnk(), "Ω", f.rSnkEstimated() ? "estimated as V / I_sink,peak"
                : "from the catalog", f.rSnkEstimated());
        add(l, "delay-time-on", delayOn, "s", "R·C_iss·ln(V_drive / (V_drive − V_pl))", false);
        add(l, "plateau-time-on", f.plateauOn(), "s", "Q_gd·R_on,total / (V_drive − V_plateau)", false);
        add(l, "delay-time-off", delayOff, "s", "R·C_iss·ln((V_drive − V_off) / (V_pl − V_off))", false);
        add(l, "plateau-time-off", f.plateauOff(), "s", "Q_gd·R_off,total / (V_plateau − V_drive,neg)", false);
        add(l, "gate-drive-power", pGate, "W", "Q_g·ΔV·f", qEst);
        add(l, "driver-power", f.pDriver(), "W", "channels × (gate-power share + quiescent + level shift)", qEst);
        add(l, "gate-resistor-power", pExternal, "W", "share of gate power in the external resistors", qEst);
        add(l, "gate-internal-power", pInternal, "W", "share of gate power in the internal gate resistance", qEst);
        add(l, "gate-resistance-critical", rCrit, "Ω", "2·√(L/C) of the gate loop", false);
        add(l, "gate-loop-damping", zeta, "1", "ζ = (R/2)·√(C/L) with the chosen resistor", false);
        add(l, "gate-resistor-min", rgMin, "Ω", "per switch, for damping ζ ≥ " + DAMPING_TARGET, false);
        add(l, "gate-resistor-max", rgMax, "Ω", "per switch, for the target edge with the drive-current margin", false);
        add(l, "gate-resistor-recommended", rgRecommended, "Ω", "IEC 60063 E24 value in the range", false);
        add(l, "bootstrap-charge", f.bootCharge(), "C", "Q_g + Q_ls + (I_qbs + " + Eng.of(Bootstrap.LEAKAGE_ALLOWANCE, "A")
                + " leakage)·t_on,max per cycle", qEst);
        add(l, "bootstrap-capacitance-min", f.bootCMin(), "F", "Q / allowed droop", qEst);
        add(l, "bootstrap-capacitance-recommended", f.bootCRec(), "F", Eng.num(Bootstrap.RECOMMENDED_FACTOR)
                + "× the minimum at " + Eng.pct(q.m.bootCapBias()) + " of nominal left at DC bias, E12", qEst);
        add(l, "bootstrap-duty-max", f.bootDutyMax(), "1", "charge balance: lowest voltage ≥ the high side's floor",
                false);
        add(l, "bootstrap-inrush", bootInrush, "A", "(V_drive − V_F) / R_boot at first charge", false);
        add(l, "noise-margin-high", f.nmHigh(), "V", "V_OH − V_IH", false);
        add(l, "noise-margin-low", f.nmLow(), "V", "V_IL − V_OL", false);
        add(l, "dv-dt", f.slew(), "V/s", Double.isNaN(f.op().dvdt()) ? "bus / plateau-time-on" : "as given",
                Double.isNaN(f.op().dvdt()));
        add(l, "miller-induced-voltage", f.vInduced(), "V", "C_gd·dv/dt·R_off·(1 − e^(−T/(R·C_iss)))",
                Double.isNaN(f.op().dvdt()));
        add(l, "dv-dt-allowed", dvdtAllowed, "V/s", "slew at which the induced voltage reaches V_th,min", false);
        return l;
    }

    /**
     * Adds a figure when it is a number: NaN (unknown) and ±∞ (unbounded, e.g. the allowed dv/dt
     * when even a step cannot lift the gate to V_th,min) are left out, so every figure's value
     * is a finite number (JSON has no infinity).
     */
    private static void add(List<Figure> l, String name, double v, String unit, String label, boolean est) {
        if (Double.isFinite(v)) {
            l.add(new Figure(name, v, unit, label, est));
        }
    }
}
