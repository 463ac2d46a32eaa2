package org.gatefit.match;

import java.util.ArrayList;
import java.util.List;
import org.gatefit.physics.Bootstrap;
import org.gatefit.physics.DriveCurrent;
import org.gatefit.physics.DvDt;
import org.gatefit.physics.ESeries;
import org.gatefit.physics.GateLoop;
import org.gatefit.physics.GatePower;
import org.gatefit.physics.SwitchingTimes;

/**
 * The figures of one driver–switch pair at one operating point, computed once from
 * {@code org.gatefit.physics} and read by every rule. Immutable: a pair's figures are one value,
 * built in the constructor (NaN: not known or not computed).
 *
 * <p>Figures that no rule reads (delay times, the resistor range, the gate-loop damping, the split
 * of gate power outside the driver, the bootstrap inrush, the allowed dv/dt) are computed only
 * with {@code detail}, for the pairs that are shown; ranking skips them. Conventions:
 * {@code r_g_ohm} is the resistor of each switch when several are in parallel (their gates then
 * share the driver's output resistance); an unknown internal gate resistance is taken as 0 Ω,
 * which makes currents upper bounds (the operating point prints the assumption).
 */
final class PairFigures {
    /** Gate-loop damping ratio the recommended resistor aims at (common practice, no source: about 0.7, under 5 % overshoot). */
    static final double DAMPING_TARGET = 0.7;

    final Question q;
    final DriverPart d;
    final SwitchPart s;
    final OperatingPoint op;
    final Margins m;
    final boolean detail;

    final double rSrc;
    final double rSnk;
    final boolean rSrcEstimated;
    final boolean rSnkEstimated;
    final double rOnTot;
    final double rOffTot;
    final double iPkSrc;
    final double iPkSnk;
    final double delayOn;
    final double delayOff;
    final double plateauOn;
    final double plateauOff;
    final double pGate;
    final double pDriver;
    final double pExternal;
    final double pInternal;
    final double rCrit;
    final double zeta;
    final double rgMin;
    final double rgMax;
    final double rgRecommended;
    final double bootCharge;
    final double bootDroop;
    final double bootFloor;
    final boolean bootBelowFull;
    final double bootCMin;
    final double bootCRec;
    final double bootDutyMax;
    final double bootInrush;
    final double nmHigh;
    final double nmLow;
    final double slew;
    final double rOffPath;
    final double vInduced;
    final double dvdtAllowed;

    PairFigures(Question q, DriverPart d, boolean detail) {
        this.q = q;
        this.d = d;
        this.s = q.s;
        this.op = q.op;
        this.m = q.m;
        this.detail = detail;
        int n = q.n;
        double rInt = q.rInt;
        double swing = op.swing();
        double qTotal = q.qTotal;
        rSrc = DriveCurrent.outputOhms(d.rSource(), swing, d.iSource());
        rSnk = DriveCurrent.outputOhms(d.rSink(), swing, d.iSink());
        rSrcEstimated = Double.isNaN(d.rSource());
        rSnkEstimated = Double.isNaN(d.rSink());
        rOnTot = rSrc + (op.rG() + rInt) / n;
        rOffTot = rSnk + (op.rGOff() + rInt) / n;
        // Q_g is a required column, but a part built elsewhere may lack it: every figure that
        // needs it stays unknown (NaN) and the rules that use them say unknown.
        boolean qKnown = !Double.isNaN(qTotal);
        iPkSrc = rOnTot > 0 ? Math.min(d.iSource(), swing / rOnTot) : d.iSource();
        iPkSnk = rOffTot > 0 ? Math.min(d.iSink(), swing / rOffTot) : d.iSink();

        double tOnPl = Double.NaN;
        double tOffPl = Double.NaN;
        double tdOn = Double.NaN;
        double tdOff = Double.NaN;
        if (q.plateau && rOnTot > 0 && rOffTot > 0) {
            tOnPl = SwitchingTimes.plateauOn(n * s.qGd(), rOnTot, op.vDrive(), s.vPlateau());
            tOffPl = SwitchingTimes.plateauOff(n * s.qGd(), rOffTot, s.vPlateau(), op.vDriveNeg());
            if (detail && !Double.isNaN(s.cIss())) {
                tdOn = shown(() -> SwitchingTimes.delayOn(rOnTot, n * s.cIss(), op.vDrive(), s.vPlateau(), op.vDriveNeg()));
                tdOff = shown(() -> SwitchingTimes.delayOff(rOffTot, n * s.cIss(), op.vDrive(), s.vPlateau(),
                        op.vDriveNeg()));
            }
        }
        plateauOn = tOnPl;
        plateauOff = tOffPl;
        delayOn = tdOn;
        delayOff = tdOff;

        double pg = Double.NaN;
        double pd = Double.NaN;
        double pe = Double.NaN;
        double pi = Double.NaN;
        if (qKnown && rOnTot > 0 && rOffTot > 0) {
            double hs = op.highSide() && d.topology().bootstrapped() && !Double.isNaN(d.iQbs())
                    ? GatePower.highSideQuiescent(op.vDrive(), d.iQbs()) : 0;
            // Only the driver's share is ruled on (driver-power); the split's other shares are figures,
            // computed for the pairs that are shown (split's driver share is this same function).
            pd = GatePower.driverShare(qTotal, swing, op.fSw(), rSrc, rSnk, op.rG() / n, op.rGOff() / n, rInt / n) + hs;
            if (detail) {
                pg = shown(() -> GatePower.total(qTotal, swing, op.fSw()));
                GatePower.Split split;
                try {
                    split = GatePower.split(qTotal, swing, op.fSw(), rSrc, rSnk, op.rG() / n, op.rGOff() / n, rInt / n);
                } catch (IllegalArgumentException | ArithmeticException e) {
                    split = null; // shown figures only: left out when the model refuses the values
                }
                pe = split == null ? Double.NaN : split.external();
                pi = split == null ? Double.NaN : split.internal();
            }
        }
        pGate = pg;
        pDriver = pd;
        pExternal = pe;
        pInternal = pi;

        double[] loop = detail && !Double.isNaN(s.cIss()) && s.cIss() > 0 ? gateLoop(q, rSrc, rOnTot) : null;
        double rc = loop == null ? Double.NaN : loop[0];
        double z = loop == null ? Double.NaN : loop[1];
        double lo = loop == null ? Double.NaN : loop[2];
        double hi = loop == null ? Double.NaN : loop[3];
        double rec = loop == null ? Double.NaN : loop[4];
        rCrit = rc;
        zeta = z;
        rgMin = lo;
        rgMax = hi;
        rgRecommended = rec;

        double bCharge = Double.NaN;
        double bDroop = Double.NaN;
        double bFloor = Double.NaN;
        boolean bBelow = false;
        double bCMin = Double.NaN;
        double bCRec = Double.NaN;
        double bDuty = Double.NaN;
        double bInrush = Double.NaN;
        if (op.highSide() && d.topology().bootstrapped()) {
            double uv = Double.isNaN(d.uvloOff()) ? d.uvloOn() : d.uvloOff();
            double full = fullEnhancement(s);
            bFloor = Math.max(Double.isNaN(uv) ? 0 : uv, Double.isNaN(full) ? 0 : full);
            if (!Double.isNaN(uv) && !Double.isNaN(full) && op.vDrive() - op.diodeDrop() <= full) {
                // The bootstrap never reaches full enhancement, whatever the capacitor: size it to the
                // UVLO as REFERENCES §4 does (ΔV ≤ V_DD − V_F − V_UVLO,off) and let the rule warn.
                bFloor = uv;
                bBelow = true;
            }
            if (qKnown && (!Double.isNaN(uv) || !Double.isNaN(full))) {
                double tOn = (Double.isNaN(op.dutyMax()) ? 1 : op.dutyMax()) / op.fSw();
                bCharge = Bootstrap.chargePerCycle(qTotal, Double.isNaN(d.iQbs()) ? 0 : d.iQbs(), tOn, 0, 0);
                bDroop = op.vDrive() - op.diodeDrop() - bFloor;
                if (bDroop > 0) {
                    bCMin = Bootstrap.minCapacitance(bCharge, bDroop);
                    bCRec = Bootstrap.recommended(bCMin);
                    bDuty = Bootstrap.maxDuty(Bootstrap.refreshTime(op.rBoot(), bCRec,
                            Bootstrap.REFRESH_TIME_CONSTANTS), op.fSw());
                    if (detail && op.rBoot() > 0) {
                        bInrush = shown(() -> Bootstrap.inrush(op.vDrive(), op.diodeDrop(), op.rBoot()));
                    }
                }
            }
        }
        bootCharge = bCharge;
        bootDroop = bDroop;
        bootFloor = bFloor;
        bootBelowFull = bBelow;
        bootCMin = bCMin;
        bootCRec = bCRec;
        bootDutyMax = bDuty;
        bootInrush = bInrush;

        nmHigh = Double.isNaN(d.vIh()) ? Double.NaN : op.vOh() - d.vIh();
        nmLow = Double.isNaN(d.vIl()) ? Double.NaN : d.vIl() - op.vOl();
        rOffPath = rSnk * n + op.rGOff() + rInt;

        double sl = Double.NaN;
        if (!Double.isNaN(op.dvdt())) {
            sl = op.dvdt();
        } else if (!Double.isNaN(op.bus()) && op.bus() > 0 && !Double.isNaN(plateauOn) && plateauOn > 0) {
            sl = op.bus() / plateauOn;
        }
        slew = sl;
        double vi = Double.NaN;
        double allowed = Double.NaN;
        if (!Double.isNaN(sl) && !Double.isNaN(s.cRss()) && !Double.isNaN(s.cIss()) && sl > 0) {
            double step = Double.isNaN(op.bus()) ? sl * 1e-6 : op.bus();
            vi = rOffPath > 0 ? DvDt.induced(s.cRss(), sl, rOffPath, s.cIss(), step) : 0;
            if (detail && !Double.isNaN(s.vThMin()) && s.vThMin() > 0 && rOffPath > 0 && step > 0) {
                double r = rOffPath;
                allowed = shown(() -> DvDt.allowedRcLimited(s.cRss(), r, s.cIss(), step, s.vThMin(), op.vDriveNeg()));
            }
        } else if (!Double.isNaN(sl) && !Double.isNaN(s.cRss())) {
            vi = DvDt.inducedBound(s.cRss(), sl, rOffPath);
        }
        vInduced = vi;
        dvdtAllowed = allowed;
    }

    /**
     * A figure only shown, never ruled on: NaN (left out) when its model refuses the pair's values,
     * so a display figure can never change a verdict.
     */
    private static double shown(java.util.function.DoubleSupplier figure) {
        try {
            return figure.getAsDouble();
        } catch (IllegalArgumentException | ArithmeticException e) {
            return Double.NaN;
        }
    }

    /**
     * The gate-loop figures (shown only): critical resistance, damping with the chosen resistor, and
     * the per-switch external resistor range with its recommended E24 value — damping target at the
     * low end, the drive-current edge at the high end. Each is NaN where its model refuses the values.
     */
    private static double[] gateLoop(Question q, double rSrc, double rOnTot) {
        OperatingPoint op = q.op;
        int n = q.n;
        double cg = n * q.s.cIss();
        double rc = shown(() -> GateLoop.criticalResistance(op.loop(), cg));
        double z = shown(() -> GateLoop.dampingRatio(rOnTot, op.loop(), cg));
        double fixed = rSrc + q.rInt / n;
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

    /** The on level for full enhancement: where R_DS(on) / V_CE(sat) is specified, else the recommended level. */
    static double fullEnhancement(SwitchPart s) {
        if (!Double.isNaN(s.rOnVgs()) && s.rOnVgs() > 0) {
            return s.rOnVgs();
        }
        return s.vGateOn();
    }

    /** Every figure that is a number, in a fixed order, named as DESIGN.md fixes. */
    List<Figure> figures() {
        boolean qEst = q.qEstimated;
        List<Figure> f = new ArrayList<>();
        add(f, "gate-charge-at-swing", q.qSwing, "C", "Q_g over the actual swing, per switch", qEst);
        add(f, "gate-current-required", q.iReq, "A", "Q_g / target edge", qEst);
        add(f, "gate-current-peak-source", iPkSrc, "A", "lower of rated peak and V / (R_source + R_g + R_g,int)", rSrcEstimated);
        add(f, "gate-current-peak-sink", iPkSnk, "A", "lower of rated peak and V / (R_sink + R_g,off + R_g,int)", rSnkEstimated);
        add(f, "driver-resistance-source", rSrc, "Ω", rSrcEstimated ? "estimated as V / I_source,peak" : "from the catalog", rSrcEstimated);
        add(f, "driver-resistance-sink", rSnk, "Ω", rSnkEstimated ? "estimated as V / I_sink,peak" : "from the catalog", rSnkEstimated);
        add(f, "delay-time-on", delayOn, "s", "R·C_iss·ln(V_drive / (V_drive − V_pl))", false);
        add(f, "plateau-time-on", plateauOn, "s", "Q_gd·R_on,total / (V_drive − V_plateau)", false);
        add(f, "delay-time-off", delayOff, "s", "R·C_iss·ln((V_drive − V_off) / (V_pl − V_off))", false);
        add(f, "plateau-time-off", plateauOff, "s", "Q_gd·R_off,total / (V_plateau − V_drive,neg)", false);
        add(f, "gate-drive-power", pGate, "W", "Q_g·ΔV·f", qEst);
        add(f, "driver-power", pDriver, "W", "share of gate power in the driver, plus high-side quiescent", qEst);
        add(f, "gate-resistor-power", pExternal, "W", "share of gate power in the external resistors", qEst);
        add(f, "gate-internal-power", pInternal, "W", "share of gate power in the internal gate resistance", qEst);
        add(f, "gate-resistance-critical", rCrit, "Ω", "2·√(L/C) of the gate loop", false);
        add(f, "gate-loop-damping", zeta, "1", "ζ = (R/2)·√(C/L) with the chosen resistor", false);
        add(f, "gate-resistor-min", rgMin, "Ω", "per switch, for damping ζ ≥ " + DAMPING_TARGET, false);
        add(f, "gate-resistor-max", rgMax, "Ω", "per switch, for the target edge with the drive-current margin", false);
        add(f, "gate-resistor-recommended", rgRecommended, "Ω", "IEC 60063 E24 value in the range", false);
        add(f, "bootstrap-charge", bootCharge, "C", "Q_g + I_qbs·t_on,max per cycle", qEst);
        add(f, "bootstrap-capacitance-min", bootCMin, "F", "Q / allowed droop", qEst);
        add(f, "bootstrap-capacitance-recommended", bootCRec, "F", Eng.num(Bootstrap.RECOMMENDED_FACTOR)
                + "× the minimum, E12 (common practice)", qEst);
        add(f, "bootstrap-duty-max", bootDutyMax, "1", "1 − 3·R_boot·C_boot·f", false);
        add(f, "bootstrap-inrush", bootInrush, "A", "(V_drive − V_F) / R_boot at first charge", false);
        add(f, "noise-margin-high", nmHigh, "V", "V_OH − V_IH", false);
        add(f, "noise-margin-low", nmLow, "V", "V_IL − V_OL", false);
        add(f, "dv-dt", slew, "V/s", Double.isNaN(op.dvdt()) ? "bus / plateau-time-on" : "as given", Double.isNaN(op.dvdt()));
        add(f, "miller-induced-voltage", vInduced, "V", "C_gd·dv/dt·R_off·(1 − e^(−T/(R·C_iss)))", Double.isNaN(op.dvdt()));
        add(f, "dv-dt-allowed", dvdtAllowed, "V/s", "slew at which the induced voltage reaches V_th,min", false);
        return f;
    }

    /**
     * Adds a figure when it is a number: NaN (unknown) and ±∞ (unbounded, e.g. the allowed dv/dt
     * when even a step cannot lift the gate to V_th,min) are left out, so every figure's value
     * is a finite number (JSON has no infinity).
     */
    private static void add(List<Figure> f, String name, double v, String unit, String label, boolean est) {
        if (Double.isFinite(v)) {
            f.add(new Figure(name, v, unit, label, est));
        }
    }
}
