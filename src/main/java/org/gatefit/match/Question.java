package org.gatefit.match;

import java.util.Objects;
import java.util.Optional;
import org.gatefit.physics.DriveCurrent;
import org.gatefit.physics.DvDt;
import org.gatefit.physics.GateCharge;
import org.gatefit.physics.JunctionTemperature;

/**
 * One question put to the rules — a switch at an operating point, with margins — and the
 * switch-side figures every driver shares (gate charge over the actual swing, the current the edge
 * needs), computed once. Immutable.
 */
public final class Question {
    final SwitchPart s;
    final OperatingPoint op;
    final Margins m;
    /** Switches in parallel on the output. */
    final int n;
    /** Internal gate resistance, 0 when unknown (the operating point says so). */
    final double rInt;
    /** Q_g of one switch over the actual swing, C. */
    final double qSwing;
    /** Whether {@link #qSwing} is an estimate (extrapolated or taken as the datasheet's Q_g). */
    final boolean qEstimated;
    /** Q_g of all switches on the output, C; NaN when unknown. */
    final double qTotal;
    /** Gate current the target edge needs (before the drive-current margin), A; NaN when Q_g is unknown. */
    final double iReq;
    /**
     * Gate current the drain-voltage edge needs on the Miller plateau (before the drive-current
     * margin): the plateau charge of all switches over the edge, n·Q_gd / t_edge, A; NaN without a
     * plateau. The edge ({@code --edge}, {@code edge_ns}) is the drain-voltage transition.
     */
    final double iReqPlateau;
    /** Whether the switch has a Miller plateau between the off and on levels (turn-on and turn-off times). */
    final boolean plateau;
    /**
     * Whether the switch's own lifecycle and stock are said once apart from the pairs (a shortlist):
     * the {@code lifecycle} rule then judges the driver alone, so a switch that is out of stock does
     * not turn every driver's pass into a warning.
     */
    final boolean switchStatusApart;
    /**
     * The off switch's side of the Miller injection ({@link DvDt#offSwitch}), computed once for every
     * driver; null without a bus or Q_gd, or when the model refuses the switch's values (each pair
     * then calls the model itself and reports its refusal).
     */
    final DvDt.OffSwitch offSwitch;
    /**
     * The two temperature corners every driver shares (REFERENCES.md §8: 25 °C, where datasheets
     * specify, and the junction temperature asked for): the factor on a driver's output resistance
     * at the hot corner and V_th,min at each corner (NaN when unknown). {@code cornersKnown} false
     * when a model refuses them; each pair then calls it itself and reports its refusal.
     */
    final boolean cornersKnown;
    /** The gate side of each loop per switch, (R_g + R_g,int)/n on and (R_g,off + R_g,int)/n off, Ω ({@link PairFigures#loop}). */
    final double gateOn;
    final double gateOff;
    /** The on level for full enhancement ({@link PairFigures#fullEnhancement}), V. */
    final double fullOn;
    final double kHot;
    final double thCold;
    final double thHot;

    private Question(SwitchPart s, OperatingPoint op, Margins m, boolean switchStatusApart) {
        this.switchStatusApart = switchStatusApart;
        this.s = Objects.requireNonNull(s, "switch");
        this.op = Objects.requireNonNull(op, "operating point");
        this.m = Objects.requireNonNull(m, "margins");
        this.n = op.parallel();
        this.rInt = s.rGIntOrZero();
        double qs;
        boolean est;
        try {
            // q_g_vgs_v is the swing Q_g is specified over. When it equals the switch's recommended
            // bipolar swing (e.g. −5 V to +18 V for SiC), the datasheet curve starts at the negative
            // level: extrapolate from the recommended on level and take the negative part's charge,
            // C_iss·|V_off,spec|, back out (REFERENCES.md §1 gate-charge curve; an estimate).
            double vSpec = specVoltage(s);
            double specNegCharge = s.qG() - specCharge(s);
            Optional<GateCharge.Estimate> q = GateCharge.atSwing(s.qG() - specNegCharge, s.qGs(), s.qGd(), vSpec,
                    s.vPlateau(), s.cIss(), op.vDrive(), op.vDriveNeg());
            if (q.isPresent()) {
                qs = q.get().coulombs();
                est = q.get().estimated() || specNegCharge > 0;
            } else {
                qs = s.qG();
                est = true;
            }
        } catch (IllegalArgumentException e) {
            qs = s.qG();
            est = true;
        }
        this.qSwing = qs;
        this.qEstimated = est;
        this.qTotal = n * qs;
        this.iReq = Double.isNaN(qTotal) ? Double.NaN : DriveCurrent.required(qTotal, op.edge());
        this.plateau = !Double.isNaN(s.qGd()) && !Double.isNaN(s.vPlateau()) && s.qGd() > 0
                && op.vDrive() > s.vPlateau() && s.vPlateau() > op.vDriveNeg();
        this.iReqPlateau = plateau ? DriveCurrent.required(n * s.qGd(), op.edge()) : Double.NaN;
        DvDt.OffSwitch off = null;
        if (op.bus() > 0 && !Double.isNaN(s.qGd())) {
            try {
                off = DvDt.offSwitch(s.qGd(), op.bus(), s.cIss(), s.cRss());
            } catch (IllegalArgumentException e) {
                off = null;
            }
        }
        this.offSwitch = off;
        this.gateOn = PairFigures.gateSide(op.rG(), rInt, n);
        this.gateOff = PairFigures.gateSide(op.rGOff(), rInt, n);
        this.fullOn = PairFigures.fullEnhancement(s);
        boolean known = true;
        double k = Double.NaN;
        double cold = Double.NaN;
        double hot = Double.NaN;
        try {
            k = JunctionTemperature.driverResistanceFactor(op.tj());
            cold = PairFigures.thresholdAt(s, JunctionTemperature.DATASHEET_C);
            hot = PairFigures.thresholdAt(s, op.tj());
        } catch (IllegalArgumentException e) {
            known = false;
        }
        this.cornersKnown = known;
        this.kHot = k;
        this.thCold = cold;
        this.thHot = hot;
    }

    /** Whether Q_g is specified over the switch's recommended bipolar swing (e.g. −5 V to +18 V). */
    private static boolean bipolarSpec(SwitchPart s) {
        return !Double.isNaN(s.vGateOff()) && s.vGateOff() < 0 && !Double.isNaN(s.vGateOn())
                && Math.abs(s.qGVgs() - (s.vGateOn() - s.vGateOff())) < 0.5;
    }

    /**
     * The gate voltage the datasheet's gate-charge curve ends at, counted from 0 V: q_g_vgs_v, or
     * the recommended on level when Q_g is specified over the bipolar swing.
     */
    static double specVoltage(SwitchPart s) {
        return bipolarSpec(s) ? s.vGateOn() : s.qGVgs();
    }

    /**
     * Q_g from 0 V to {@link #specVoltage}: the datasheet's Q_g, less the negative part's charge
     * C_iss·|V_off,spec| when it is specified over the bipolar swing (REFERENCES.md §1 gate-charge
     * curve; an estimate).
     */
    static double specCharge(SwitchPart s) {
        if (!bipolarSpec(s)) {
            return s.qG();
        }
        double cEq = !Double.isNaN(s.cIss()) ? s.cIss()
                : !Double.isNaN(s.qGs()) && !Double.isNaN(s.vPlateau()) ? s.qGs() / s.vPlateau() : 0;
        return s.qG() - cEq * -s.vGateOff();
    }

    /** The question for a switch at an operating point (after defaults) with these margins. */
    public static Question of(SwitchPart s, OperatingPoint op, Margins m) {
        return new Question(s, op, m, false);
    }

    /**
     * The question of a shortlist: as {@link #of}, but the switch's own lifecycle and stock are left
     * to be said once with the result ({@link Shortlist.Result#switchStatus}), and the
     * {@code lifecycle} rule judges each driver's alone.
     */
    public static Question ofShortlist(SwitchPart s, OperatingPoint op, Margins m) {
        return new Question(s, op, m, true);
    }

    /** The switch whose lifecycle the pair's {@code lifecycle} rule judges, or null when it is said apart. */
    SwitchPart lifecycleSwitch() {
        return switchStatusApart ? null : s;
    }

    /** The switch asked about. */
    public SwitchPart switchPart() {
        return s;
    }

    /** The operating point after defaults. */
    public OperatingPoint point() {
        return op;
    }

    /** The margins applied. */
    public Margins margins() {
        return m;
    }

    /** Total gate charge over the swing (all switches in parallel), C; NaN when Q_g is unknown. */
    public double gateCharge() {
        return qTotal;
    }

    /** Gate current the target edge needs (before the drive-current margin), A; NaN when Q_g is unknown. */
    public double currentRequired() {
        return iReq;
    }
}
