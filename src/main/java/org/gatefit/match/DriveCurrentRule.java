package org.gatefit.match;

import org.gatefit.catalog.Op;
import java.util.List;
import org.gatefit.match.Check.Comparison;
import org.gatefit.physics.ESeries;

/**
 * {@code drive-current}: the peak gate current through each loop (the lower of the driver's rated
 * peak and V / R_loop) against the current the target edge needs, Q_g / t_edge, with the
 * drive-current margin (REFERENCES.md §2; the margin covers the current of a resistive driver
 * falling during the edge: common practice, no source). The weaker of source and sink decides.
 */
final class DriveCurrentRule implements PairRule {
    enum Why implements Reason { NO_CHARGE, ENOUGH, THIN, SHORT }

    /** Whether the source (turn-on) side is the weaker one relative to the need (ties: the source). */
    private static boolean sourceWorse(PairFigures f) {
        return f.iPkSrc() / f.q().iReq <= f.iPkSnk() / f.q().iReq;
    }

    /** Peak current of the weaker side over the current the edge needs. */
    private static double ratio(PairFigures f) {
        return Math.min(f.iPkSrc() / f.q().iReq, f.iPkSnk() / f.q().iReq);
    }

    @Override
    public void judge(PairFigures f, Outcome out) {
        if (Double.isNaN(f.q().qTotal)) {
            out.unknown(Why.NO_CHARGE);
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
        if (w == Why.NO_CHARGE) {
            return new Worded("gate charge unknown");
        }
        double need = f.q().iReq * f.m().driveCurrent();
        boolean source = sourceWorse(f);
        double have = source ? f.iPkSrc() : f.iPkSnk();
        double rated = source ? f.d().iSource() : f.d().iSink();
        double rLoop = source ? f.rOnTot() : f.rOffTot();
        List<Comparison> cmp = List.of(
                new Comparison("peak source current (turn-on)", f.iPkSrc(), "≥", need, "A"),
                new Comparison("peak sink current (turn-off)", f.iPkSnk(), "≥", need, "A"));
        String what = "needs " + Eng.of(need, "A") + " for a " + Eng.of(f.op().edge(), "s") + " edge with "
                + Eng.num(f.m().driveCurrent()) + "× margin (" + Eng.of(f.q().qTotal, "C") + " at " + Eng.of(f.op().swing(), "V") + ")";
        String gives = "this driver " + (source ? "sources " : "sinks ") + Eng.of(have, "A") + " through "
                + Eng.of(rLoop, "Ω") + (have >= rated ? " (its rated peak)" : "");
        return switch (w) {
            case NO_CHARGE -> throw new IllegalStateException("worded above");
            case ENOUGH -> new Worded(what + "; " + gives, cmp);
            case THIN -> new Worded(what + "; " + gives + ", less margin than asked — " + fix(f, need, source), cmp);
            case SHORT -> new Worded(what + "; " + gives + " — " + fix(f, need, source), cmp);
        };
    }

    /** What would fix a short current: a smaller resistor when the driver's rating allows, else a stronger driver or a slower edge. */
    private static String fix(PairFigures f, double need, boolean source) {
        int n = f.op().parallel();
        double rDrv = source ? f.rSrc() : f.rSnk();
        double rated = source ? f.d().iSource() : f.d().iSink();
        double rgNow = source ? f.op().rG() : f.op().rGOff();
        double rgMax = n * (f.op().swing() / need - rDrv - f.q().rInt / n);
        double edgeOk = f.q().qTotal * (need / f.q().iReq) / Math.min(source ? f.iPkSrc() : f.iPkSnk(), Double.MAX_VALUE);
        String pick = "pick a driver rated ≥ " + Eng.of(Math.ceil(need * 10) / 10, "A");
        String relax = "relax the edge to " + Eng.of(edgeOk, "s");
        if (rated >= need && rgMax > 0 && rgMax < rgNow) {
            return "lower " + (source ? "R_g" : "R_g,off") + " to " + Eng.of(ESeries.E24.roundDown(rgMax), "Ω")
                    + " or " + pick;
        }
        return pick + " or " + relax;
    }

    /**
     * The peak through the loop never exceeds the rated peak, and a ratio below 1 (or below the
     * margin, when the margin is under 1) fails: a driver rated below the need fails.
     */
    @Override
    public void certainFailures(Question q, Prefilter.Builder b) {
        if (!Double.isNaN(q.iReq) && q.iReq > 0) {
            double need = q.iReq * Math.min(1, q.m.driveCurrent());
            b.require(Prefilter.Condition.of("i_source_a", Op.GE, need));
            b.require(Prefilter.Condition.of("i_sink_a", Op.GE, need));
        }
    }
}
