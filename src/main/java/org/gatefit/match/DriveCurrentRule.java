package org.gatefit.match;

import org.gatefit.catalog.Op;
import java.util.List;
import org.gatefit.match.Check.Comparison;
import org.gatefit.physics.ESeries;

/**
 * {@code drive-current}: the drain-voltage edge (what {@code --edge} and {@code edge_ns} mean) is
 * the Miller plateau, so the gate current on the plateau sets it: (V_on − V_plateau) / R_on,total
 * into the turn-on plateau and (V_plateau − V_off) / R_off,total out of the turn-off plateau, each
 * capped at the driver's rated peak (REFERENCES.md §8, plateau-limited gate current), at the slow
 * corner (the driver's output resistance at the junction temperature asked for, from memory:
 * {@link org.gatefit.physics.JunctionTemperature}). Each must reach the plateau charge over the
 * edge, n·Q_gd / t_edge, with the drive-current margin (common practice, no source: the plateau
 * rises with load current and the driver's current sags). The weaker of the two decides. Without
 * Q_gd and the plateau voltage the edge cannot be judged: unknown, never pass.
 */
final class DriveCurrentRule extends PairRule {
    enum Why implements Reason { NO_PLATEAU, ENOUGH, THIN, SHORT }

    /** Whether the turn-on side is the weaker one (ties: turn-on). */
    private static boolean sourceWorse(PairFigures f) {
        return f.iPlOn() <= f.iPlOff();
    }

    /** Plateau current of the weaker side over the current the edge needs. */
    private static double ratio(PairFigures f) {
        return Math.min(f.iPlOn(), f.iPlOff()) / f.q().iReqPlateau;
    }

    @Override
    public void judge(PairFigures f, Outcome out) {
        if (Double.isNaN(f.iPlOn()) || Double.isNaN(f.iPlOff()) || Double.isNaN(f.q().iReqPlateau)) {
            out.unknown(Why.NO_PLATEAU);
            return;
        }
        double margin = f.m().driveCurrent();
        double ratio = ratio(f);
        if (ratio >= margin) {
            out.pass(Why.ENOUGH, (ratio - margin) / margin);
        } else if (ratio >= 1) {
            out.warn(Why.THIN, (ratio - 1) / (margin - 1));
        } else {
            out.fail(Why.SHORT);
        }
    }

    @Override
    public Worded word(ShownFigures shown, Reason why) {
        PairFigures f = shown.f;
        Why w = (Why) why;
        if (w == Why.NO_PLATEAU) {
            String orientation = Double.isNaN(f.q().iReq) ? "" : "; for orientation only, the whole charge over the edge is "
                    + Eng.of(f.q().iReq, "A") + " against a peak of " + Eng.of(Math.min(f.iPkSrc(), f.iPkSnk()), "A");
            return new Worded(!f.q().plateau && !Double.isNaN(f.s().qGd()) && !Double.isNaN(f.s().vPlateau())
                    ? "the drive levels " + Eng.of(f.op().vDriveNeg(), "V") + " / " + Eng.of(f.op().vDrive(), "V")
                    + " do not straddle the switch's " + Eng.of(f.s().vPlateau(), "V") + " Miller plateau, so the drain edge"
                    + " is not driven" + orientation
                    : "Q_gd or the plateau voltage of the switch unknown, so the drain edge cannot be judged" + orientation);
        }
        double need = f.q().iReqPlateau * f.m().driveCurrent();
        boolean source = sourceWorse(f);
        double have = source ? f.iPlOn() : f.iPlOff();
        double rated = source ? f.d().iSource() : f.d().iSink();
        List<Comparison> cmp = List.of(
                new Comparison("plateau current, turn-on", f.iPlOn(), "≥", need, "A"),
                new Comparison("plateau current, turn-off", f.iPlOff(), "≥", need, "A"));
        String what = "the drain edge needs " + Eng.of(need, "A") + " on the Miller plateau for " + Eng.of(f.op().edge(), "s")
                + " with " + Eng.num(f.m().driveCurrent()) + "× margin (Q_gd " + Eng.of(f.q().n * f.s().qGd(), "C") + ")";
        String drive = source ? Eng.of(f.op().vDrive() - f.s().vPlateau(), "V") + " above the plateau"
                : Eng.of(f.s().vPlateau() - f.op().vDriveNeg(), "V") + " above the off level";
        String gives = "at " + Eng.num(f.driveCornerC()) + " °C this driver " + (source ? "drives " : "pulls ")
                + Eng.of(have, "A") + (source ? " into the turn-on plateau" : " out of the turn-off plateau")
                + (have >= rated ? " (its rated peak)" : " (" + drive + " through " + Eng.of(loop(f, source), "Ω") + ")");
        return switch (w) {
            case NO_PLATEAU -> throw new IllegalStateException("worded above");
            case ENOUGH -> new Worded(what + "; " + gives, cmp);
            case THIN -> new Worded(what + "; " + gives + ", less margin than asked — " + fix(f, need, source), cmp);
            case SHORT -> new Worded(what + "; " + gives + " — " + fix(f, need, source), cmp);
        };
    }

    /** The loop resistance of one side at the slow corner, Ω. */
    private static double loop(PairFigures f, boolean source) {
        double k = Math.max(1, f.kHot());
        Question q = f.q();
        return source ? PairFigures.loop(q, k * f.rSrc(), f.op().rG()) : PairFigures.loop(q, k * f.rSnk(), f.op().rGOff());
    }

    /** What would fix a short current: a smaller resistor when the driver's rating allows, else a stronger driver or a slower edge. */
    private static String fix(PairFigures f, double need, boolean source) {
        Question q = f.q();
        int n = q.n;
        double k = Math.max(1, f.kHot());
        double rDrv = k * (source ? f.rSrc() : f.rSnk());
        double rated = source ? f.d().iSource() : f.d().iSink();
        double rgNow = source ? f.op().rG() : f.op().rGOff();
        double dv = source ? f.op().vDrive() - f.s().vPlateau() : f.s().vPlateau() - f.op().vDriveNeg();
        double rgMax = n * (dv / need - rDrv) - q.rInt;
        double have = source ? f.iPlOn() : f.iPlOff();
        double edgeOk = f.op().edge() * need / have;
        String pick = "pick a driver rated ≥ " + Eng.of(Math.ceil(need * 10) / 10, "A");
        String relax = "relax the edge to " + Eng.of(edgeOk, "s");
        if (rated >= need && rgMax > 0 && rgMax < rgNow && rgMax < 1e6) {
            return "lower " + (source ? "R_g" : "R_g,off") + " to " + Eng.of(ESeries.E24.roundDown(rgMax), "Ω")
                    + " or " + pick;
        }
        return pick + " or " + relax;
    }

    /**
     * The plateau current never exceeds the rated peak, and a ratio below 1 (or below the margin,
     * when the margin is under 1) fails: a driver rated below the plateau need fails.
     */
    @Override
    public void certainFailures(Question q, Prefilter.Builder b) {
        if (!Double.isNaN(q.iReqPlateau) && q.iReqPlateau > 0) {
            double need = q.iReqPlateau * Math.min(1, q.m.driveCurrent());
            b.require(Prefilter.Condition.of("i_source_a", Op.GE, need));
            b.require(Prefilter.Condition.of("i_sink_a", Op.GE, need));
        }
    }
}
