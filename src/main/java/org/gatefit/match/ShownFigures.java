package org.gatefit.match;

import java.util.ArrayList;
import java.util.List;
import org.gatefit.physics.Bootstrap;
import org.gatefit.physics.ESeries;
import org.gatefit.physics.GateLoop;
import org.gatefit.physics.GatePower;
import org.gatefit.physics.JunctionTemperature;
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
    /** What sets {@link #rgMin}: the damping target, the gate-ringing rule or the dv-dt rule. */
    final String rgFloor;
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
        rgFloor = loop == null ? "" : loop[5] == 2 ? "the dv-dt rule (the twin's turn-on edge)"
                : loop[5] == 1 ? "the gate-ringing rule" : "damping ζ ≥ " + DAMPING_TARGET;

        bootInrush = !Double.isNaN(f.bootDroop()) && f.bootDroop() > 0 && op.rBoot() > 0
                ? shown(() -> Bootstrap.inrush(op.vDrive(), op.diodeDrop(), op.rBoot())) : Double.NaN;

        dvdtAllowed = !Double.isNaN(f.vInduced()) && !Double.isNaN(f.vThSeen()) && f.vThSeen() > 0
                ? shown(() -> allowedSlew(f)) : Double.NaN;
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
     * per-switch external turn-on resistor range with its recommended E24 value. The floor is the
     * highest of the damping target, the resistor below which the gate-ringing rule would not pass
     * and the resistor below which the twin's turn-on edge would make the dv-dt rule fail; the top is
     * the drive-current margin on the turn-on plateau at the slow corner (one definition of the edge
     * with the drive-current rule). Element 5 says which floor decided (0 damping, 1 ringing, 2 dv-dt).
     * Each is NaN where its model refuses the values; the top may be below the floor (no resistor
     * satisfies all, said by the recommendations) or below zero.
     */
    private static double[] gateLoop(PairFigures f) {
        Question q = f.q();
        OperatingPoint op = f.op();
        SwitchPart s = q.s;
        int n = q.n;
        double cg = n * s.cIss();
        double rc = shown(() -> GateLoop.criticalResistance(op.loop(), cg));
        double z = shown(() -> GateLoop.dampingRatio(f.rOnTot(), op.loop(), cg));
        double kFast = Math.min(1, f.kHot());
        double kSlow = Math.max(1, f.kHot());
        double fixedFast = kFast * f.rSrc() + q.rInt / n;
        double lo = Math.max(0, n * (DAMPING_TARGET * rc - fixedFast));
        int floor = 0;
        // Ringing: the overshoot that keeps the turn-on peak out of the gate headroom.
        double allowed = Double.isNaN(s.vGsMax()) ? Double.NaN
                : (s.vGsMax() * (1 - q.m.gateHeadroom()) - op.vDrive()) / op.swing();
        if (allowed > 0 && allowed < 1) {
            double zr = GateLoop.dampingForOvershoot(allowed);
            double ring = n * (2 * zr * Math.sqrt(op.loop() / cg) - fixedFast);
            if (ring > lo) {
                lo = ring;
                floor = 1;
            }
        }
        double hi = Double.NaN;
        if (q.plateau && f.d().iSource() >= q.m.driveCurrent() * q.iReqPlateau) {
            hi = Math.max(0, n * ((op.vDrive() - s.vPlateau()) / (q.m.driveCurrent() * q.iReqPlateau) - kSlow * f.rSrc())
                    - q.rInt);
        } else if (q.plateau) {
            hi = 0; // the rated peak alone is short of the need: no resistor helps (never a negative bound)
        }
        double dv = dvdtFloor(f, Double.isFinite(hi) && hi > lo ? hi : Math.max(lo, 1) * 1e3);
        if (dv > lo) {
            lo = dv;
            floor = 2;
        }
        double rec = Double.NaN;
        if (hi >= lo && hi > 0 && Double.isFinite(hi)) {
            // Aim at half the edge-limited maximum (margin on the edge, damping to spare; common
            // practice, no source), but never below the floor.
            double low = lo;
            double high = hi;
            double aim = Math.max(lo, hi / 2);
            double pick = shown(() -> ESeries.E24.roundNearest(aim));
            if (pick < lo) {
                pick = shown(() -> ESeries.E24.roundUp(low));
            }
            if (pick > hi) {
                pick = shown(() -> ESeries.E24.roundDown(high));
            }
            rec = pick >= lo && pick <= hi ? pick : Double.NaN;
        }
        return new double[] {rc, z, Double.isNaN(rc) ? Double.NaN : lo, hi, rec, floor};
    }

    /**
     * The smallest turn-on resistor per switch (0 to {@code top} Ω) at which the twin's turn-on edge
     * leaves the dv-dt rule no worse than a warning at both corners (a slower edge injects less);
     * 0 when even 0 Ω is fine or dv/dt is given, +∞ when no resistor up to {@code top} is, NaN when
     * the injection cannot be computed.
     */
    private static double dvdtFloor(PairFigures f, double top) {
        Question q = f.q();
        if (!Double.isNaN(q.op.dvdt()) || q.op.twin() != null || !q.op.bridge() || !PairFigures.millerKnown(q) || !q.plateau || Double.isNaN(q.s.vThMin())) {
            return Double.NaN;
        }
        java.util.function.DoubleUnaryOperator excess = rg -> {
            double worst = Double.NEGATIVE_INFINITY;
            for (double t : new double[] {JunctionTemperature.DATASHEET_C, q.op.tj()}) {
                double k = JunctionTemperature.driverResistanceFactor(t);
                double slew = PairFigures.slewAt(q, f.d(), k * f.rSrc(), rg);
                double v = PairFigures.inducedAt(q, slew, PairFigures.holdPath(q, f.d(), k * f.rSnk())) + q.op.vDriveNeg();
                worst = Math.max(worst, v - PairFigures.thresholdAt(q.s, t));
            }
            return worst; // ≥ 0: the dv-dt rule fails
        };
        try {
            if (excess.applyAsDouble(0) < 0) {
                return 0;
            }
            if (!(top > 0) || excess.applyAsDouble(top) >= 0) {
                return Double.POSITIVE_INFINITY;
            }
            double a = 0;
            double b = top;
            for (int i = 0; i < 60 && b - a > 1e-4 * b; i++) {
                double m = 0.5 * (a + b);
                if (excess.applyAsDouble(m) >= 0) {
                    a = m;
                } else {
                    b = m;
                }
            }
            return b;
        } catch (IllegalArgumentException | ArithmeticException e) {
            return Double.NaN;
        }
    }

    /**
     * The switch-node dv/dt at which the induced voltage plus the off level reaches V_th,min at the
     * corner that decided the dv-dt rule (the injection rises with dv/dt), V/s; +∞ when even a step
     * stays below (the capacitive divider).
     */
    private static double allowedSlew(PairFigures f) {
        Question q = f.q();
        return crossing(slew -> PairFigures.inducedAt(q, slew, f.rOffPath()),
                f.vThSeen() - q.op.vDriveNeg(), Math.max(f.slew(), 1e6), 1e15);
    }

    /**
     * Where a rising function {@code v} reaches {@code limit}, by doubling from {@code start} and then
     * bisection to a relative 1e-6; +∞ when even {@code far} stays below. One search for the allowed
     * dv/dt and the allowed holding resistance.
     */
    private static double crossing(java.util.function.DoubleUnaryOperator v, double limit, double start, double far) {
        if (v.applyAsDouble(far) < limit) {
            return Double.POSITIVE_INFINITY;
        }
        double lo = 0;
        double hi = start;
        while (v.applyAsDouble(hi) < limit) {
            lo = hi;
            hi *= 2;
        }
        for (int i = 0; i < 100 && hi - lo > 1e-6 * hi; i++) {
            double m = 0.5 * (lo + hi);
            if (v.applyAsDouble(m) < limit) {
                lo = m;
            } else {
                hi = m;
            }
        }
        return lo;
    }

    /**
     * What fixes a Miller turn-on, in words: the turn-off resistor the holding path may have, a
     * turn-on resistor that slows the twin's edge enough (when one exists within the edge), a
     * negative off level or a Miller clamp.
     */
    String dvdtFix() {
        Question q = f.q();
        double limit = f.vThSeen() * q.m.dvdt() - q.op.vDriveNeg();
        List<String> ways = new ArrayList<>();
        boolean clamp = Boolean.TRUE.equals(f.d().millerClamp());
        if (!clamp && limit > 0) {
            double k = f.dvdtCornerC() == JunctionTemperature.DATASHEET_C ? 1 : f.kHot();
            double fixed = q.n * k * f.rSnk() + q.rInt;
            double hold = shown(() -> maxHold(f, limit));
            double rgOff = hold - fixed;
            if (rgOff >= 0 && rgOff < q.op.rGOff() && rgOff < 1e6) {
                ways.add("lower R_g,off to ≤ " + Eng.of(ESeries.E24.roundDown(Math.max(rgOff, 0.1)), "Ω"));
            }
        }
        if (q.op.twin() != null) {
            ways.add("slow " + q.op.twin().name() + "'s turn-on (a larger R_g there)");
        }
        if (Double.isFinite(rgMin) && rgMin < 1e6 && rgMin > q.op.rG() && rgFloor.startsWith("the dv-dt") && rgMax >= rgMin) {
            ways.add("raise R_g (turn-on) to ≥ " + Eng.of(ESeries.E24.roundUp(rgMin), "Ω") + " to slow the edge");
        }
        ways.add(q.op.vDriveNeg() < 0 ? "a deeper negative off level" : "a negative off level");
        if (!clamp) {
            ways.add("a driver with a Miller clamp");
        }
        return String.join(", ", ways.subList(0, ways.size() - 1)) + (ways.size() > 1 ? " or " : "")
                + ways.get(ways.size() - 1);
    }

    /** The holding resistance at which the induced voltage reaches {@code limit} at the deciding slew, Ω. */
    private static double maxHold(PairFigures f, double limit) {
        Question q = f.q();
        return crossing(r -> PairFigures.inducedAt(q, f.slew(), r), limit,
                Math.max(f.rOffPath(), 1), 1e9);
    }

    /** Every figure of the pair that is a number, ruled and shown, in a fixed order, named as DESIGN.md fixes. */
    List<Figure> figures() {
        Question q = f.q();
        boolean qEst = q.qEstimated;
        List<Figure> l = new ArrayList<>();
        add(l, "gate-charge-at-swing", q.qSwing, "C", "Q_g over the actual swing, per switch", qEst);
        add(l, "gate-current-required", q.iReq, "A", "Q_g / target edge", qEst);
        add(l, "gate-current-peak-source", f.iPkSrc(), "A", "min(rated, V / R_on), start of the edge, 25 °C",
                f.rSrcEstimated());
        add(l, "gate-current-peak-sink", f.iPkSnk(), "A", "min(rated, V / R_off), start of the edge, 25 °C",
                f.rSnkEstimated());
        add(l, "gate-current-plateau-required", q.iReqPlateau, "A", "n·Q_gd / edge (the drain-voltage transition)", false);
        add(l, "gate-current-plateau-on", f.iPlOn(), "A", "min(rated, (V_drive − V_pl) / R_on), "
                + Eng.num(f.driveCornerC()) + " °C", f.rSrcEstimated());
        add(l, "gate-current-plateau-off", f.iPlOff(), "A", "min(rated, (V_pl − V_off) / R_off), "
                + Eng.num(f.driveCornerC()) + " °C", f.rSnkEstimated());
        add(l, "driver-resistance-source", f.rSrc(), "Ω", f.rSrcEstimated() ? "estimated as V / I_source,peak"
                : "from the catalog", f.rSrcEstimated());
        add(l, "driver-resistance-sink", f.rSnk(), "Ω", f.rSnkEstimated() ? "estimated as V / I_sink,peak"
                : "from the catalog", f.rSnkEstimated());
        add(l, "delay-time-on", delayOn, "s", "R·C_iss·ln(V_drive / (V_drive − V_pl))", false);
        add(l, "plateau-time-on", f.plateauOn(), "s", "n·Q_gd / gate-current-plateau-on", false);
        add(l, "delay-time-off", delayOff, "s", "R·C_iss·ln((V_drive − V_off) / (V_pl − V_off))", false);
        add(l, "plateau-time-off", f.plateauOff(), "s", "n·Q_gd / gate-current-plateau-off", false);
        add(l, "gate-drive-power", pGate, "W", "Q_g·ΔV·f", qEst);
        add(l, "driver-power", f.pDriver(), "W", "channels × (gate-power share + quiescent + level shift)", qEst);
        add(l, "gate-resistor-power", pExternal, "W", "share of gate power in the external resistors", qEst);
        add(l, "gate-internal-power", pInternal, "W", "share of gate power in the internal gate resistance", qEst);
        add(l, "gate-resistance-critical", rCrit, "Ω", "2·√(L/C) of the gate loop", false);
        add(l, "gate-loop-damping", zeta, "1", "ζ = (R/2)·√(C/L) with the chosen resistor", false);
        add(l, "gate-resistor-min", rgMin, "Ω", "per switch, set by " + rgFloor, false);
        add(l, "gate-resistor-max", rgMax, "Ω", "per switch, drive-current margin on the plateau, "
                + Eng.num(Math.max(q.op.tj(), JunctionTemperature.DATASHEET_C)) + " °C", false);
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
        add(l, "dv-dt", f.slew() * 1e-9, "V/ns", (!Double.isNaN(f.op().dvdt()) ? "as given" : f.op().twin() != null
                ? "bus / " + f.op().twin().name() + "'s turn-on plateau" : "bus / the twin's turn-on plateau") + ", " + Eng.num(f.dvdtCornerC()) + " °C", Double.isNaN(f.op().dvdt()));
        add(l, "miller-induced-voltage", f.vInduced(), "V", "(Q_gd/V_bus)·dv/dt·R, RC-limited, "
                + Eng.num(f.dvdtCornerC()) + " °C", true);
        add(l, "threshold-min-at-corner", f.vThSeen(), "V", "V_th,min at " + Eng.num(f.dvdtCornerC()) + " °C", true);
        add(l, "dv-dt-allowed", dvdtAllowed * 1e-9, "V/ns", "slew at which the induced voltage reaches V_th,min", false);
        add(l, "gate-peak-on", f.ringPeak(), "V", "series R-L-C step to the on level, " + Eng.num(f.ringCornerC()) + " °C",
                true);
        add(l, "gate-trough-off", f.ringTrough(), "V", "series R-L-C step to the off level, " + Eng.num(f.ringCornerC())
                + " °C", true);
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
