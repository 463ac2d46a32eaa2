package org.gatefit.match;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.function.Function;
import org.gatefit.catalog.Row;
import org.gatefit.match.Check.Comparison;
import org.gatefit.match.StageCheck.StageResult;
import org.gatefit.physics.DeadTime;
import org.gatefit.physics.DriveCurrent;
import org.gatefit.physics.JunctionTemperature;

/**
 * {@code dead-time} in {@code check}: for the two stages of a half-bridge (one high, one low, on one
 * driver designator or with the same {@code leg}), the least dead time before each stage's switch may
 * turn on, {@code dead-time-min}, and the stage's configured {@code dead_time_ns} against it.
 *
 * <p>Model (REFERENCES.md §8 and §9, plain timing on the gate-charge curve): the outgoing switch's
 * gate must fall below V_th,min before the incoming one's rises to it, so
 * {@code t_dead,min = t_d(off),out + t_plateau,off,out + t_fall,out − t_on→V_th,in + skew}, where
 * <ul>
 *   <li>t_d(off) is the on level down to the plateau through R_off,total at the hot corner with the
 *       capacitance above the plateau, (Q_g − Q_gs − Q_gd)/(V_spec − V_plateau) — not C_iss, which is
 *       smaller there — or the datasheet's t_d(off) where it is longer;</li>
 *   <li>t_plateau,off is the turn-off plateau at the plateau current ({@code plateau-time-off});</li>
 *   <li>t_fall is the plateau down to V_th,min (hot) through C_iss, or the datasheet's t_f where it
 *       is longer; an IGBT needs the datasheet's t_f (its current tail), else the minimum is unknown;</li>
 *   <li>t_on→V_th is the incoming switch's delay from the off level to V_th,min, the shorter of the
 *       two corners (lower resistance cold, lower threshold hot);</li>
 *   <li>skew is the drivers' delay matching when both stages share a package and it is given, else
 *       the outgoing driver's maximum propagation delay less the incoming one's minimum, taken as
 *       2·t_prop − t_prop,max (a spread symmetric about the typical; common practice, no source).</li>
 * </ul>
 * The check fails below the minimum and warns within the dead-time margin above it (common practice,
 * no source: temperature, supply and part spread beyond the model); with the skew unknown the minimum
 * is a lower bound and the check never passes.
 */
final class DeadTimeCheck {

    private DeadTimeCheck() {
    }

    /** One stage's side of a bridge: its result, its row, and its parts. */
    private record Side(int index, StageResult r, Row row, DriverPart d, SwitchPart s) {
    }

    /**
     * The half-bridges of a check: pairs of stage indices, one high and one low, on one driver
     * designator or with the same {@code leg} cell (only stages whose parts and point resolved).
     */
    static List<int[]> bridges(List<StageResult> results, List<Row> rows) {
        Map<String, List<Integer>> bridges = new LinkedHashMap<>();
        for (int i = 0; i < results.size(); i++) {
            StageResult r = results.get(i);
            if (r.point() == null) {
                continue;
            }
            String leg = rows.get(i).text("leg");
            String key = leg != null ? "leg " + leg.strip().toUpperCase(Locale.ROOT)
                    : "driver " + r.driverRef().toUpperCase(Locale.ROOT);
            bridges.computeIfAbsent(key, k -> new ArrayList<>()).add(i);
        }
        List<int[]> out = new ArrayList<>();
        for (List<Integer> g : bridges.values()) {
            if (g.size() == 2 && results.get(g.get(0)).point().highSide() != results.get(g.get(1)).point().highSide()) {
                out.add(new int[] {g.get(0), g.get(1)});
            }
        }
        return out;
    }

    static List<StageResult> apply(List<StageResult> results, List<Row> rows, Function<String, Optional<Row>> drivers,
                                   Function<String, Optional<Row>> switches, Margins m) {
        List<StageResult> out = new ArrayList<>(results);
        for (int[] g : bridges(results, rows)) {
            Side a = side(g[0], results, rows, drivers, switches);
            Side b = side(g[1], results, rows, drivers, switches);
            out.set(a.index(), judged(a, b, m));
            out.set(b.index(), judged(b, a, m));
        }
        return out;
    }

    private static Side side(int i, List<StageResult> results, List<Row> rows, Function<String, Optional<Row>> drivers,
                             Function<String, Optional<Row>> switches) {
        StageResult r = results.get(i);
        return new Side(i, r, rows.get(i), DriverPart.of(drivers.apply(r.driver()).orElseThrow()),
                SwitchPart.of(switches.apply(r.switchPart()).orElseThrow()));
    }

    /** The incoming stage {@code in} after the outgoing {@code outgoing}: its dead-time check and figure added. */
    private static StageResult judged(Side in, Side outgoing, Margins m) {
        Minimum min = minimum(in, outgoing);
        List<Check> checks = new ArrayList<>(in.r().checks());
        checks.add(check(in, outgoing, min, m));
        List<Figure> figures = new ArrayList<>(in.r().figures());
        if (Double.isFinite(min.seconds())) {
            figures.add(new Figure("dead-time-min", min.seconds(), "s", "turn-off of " + outgoing.r().stage()
                    + " to V_th,min + driver skew − this switch's delay to V_th,min", true));
        }
        StageResult withFigure = new StageResult(in.r().stage(), in.r().line(), in.r().driverRef(), in.r().driver(),
                in.r().switchRef(), in.r().switchPart(), in.r().verdict(), in.r().score(), in.r().checks(), figures,
                in.r().point(), in.r().notes());
        return PackageCheck.rescored(withFigure, checks, in.d(), in.s());
    }

    /**
     * The least dead time before {@code in} may turn on, and how it was found.
     *
     * @param seconds      the minimum, s (NaN: unknown)
     * @param why          the sum in words, or what is missing
     * @param skewKnown    whether the drivers' skew is known (else the minimum is a lower bound)
     */
    record Minimum(double seconds, String why, boolean skewKnown) {
    }

    static Minimum minimum(Side in, Side outgoing) {
        String off;
        double tOff;
        try {
            double[] t = turnOffToThreshold(outgoing);
            if (Double.isNaN(t[0])) {
                return new Minimum(Double.NaN, outgoing.s().partNumber() + " is an IGBT without the datasheet's fall time"
                        + " (t_f_ns), so its current tail and the dead time it needs are unknown", false);
            }
            tOff = t[0] + t[1] + t[2];
            off = "turn-off of " + outgoing.r().stage() + " " + Eng.of(tOff, "s") + " (delay " + Eng.of(t[0], "s")
                    + ", plateau " + Eng.of(t[1], "s") + ", fall to V_th,min " + Eng.of(t[2], "s") + ")";
        } catch (IllegalArgumentException | ArithmeticException e) {
            return new Minimum(Double.NaN, "the turn-off of " + outgoing.r().stage() + " cannot be estimated: "
                    + e.getMessage(), false);
        }
        double tOn;
        try {
            tOn = delayToThreshold(in);
        } catch (IllegalArgumentException | ArithmeticException e) {
            return new Minimum(Double.NaN, "the turn-on delay of " + in.r().stage() + " cannot be estimated: "
                    + e.getMessage(), false);
        }
        double skew;
        String sk;
        boolean samePackage = in.r().driverRef().equalsIgnoreCase(outgoing.r().driverRef())
                && !in.r().driverRef().equalsIgnoreCase(in.r().driver());
        if (samePackage && !Double.isNaN(in.d().tMatch())) {
            skew = in.d().tMatch();
            sk = "delay matching " + Eng.of(skew, "s");
        } else if (!Double.isNaN(outgoing.d().ratings().tPropMax()) && !Double.isNaN(in.d().tProp())
                && !Double.isNaN(in.d().ratings().tPropMax())) {
            double inMin = Math.max(0, 2 * in.d().tProp() - in.d().ratings().tPropMax());
            skew = Math.max(0, outgoing.d().ratings().tPropMax() - inMin);
            sk = "driver skew " + Eng.of(skew, "s") + " (t_prop,max " + Eng.of(outgoing.d().ratings().tPropMax(), "s")
                    + " less t_prop,min " + Eng.of(inMin, "s") + ")";
        } else {
            double est = DeadTime.minimum(tOff, 0, tOn, 0);
            return new Minimum(est, off + " less the delay of " + in.r().stage() + " to V_th,min " + Eng.of(tOn, "s")
                    + "; the drivers' skew is unknown (give t_match_ns, or t_prop_ns and t_prop_max_ns), so "
                    + Eng.of(est, "s") + " is a lower bound", false);
        }
        double need = DeadTime.minimum(tOff, 0, tOn, skew);
        return new Minimum(need, off + " + " + sk + " − delay of " + in.r().stage() + " to V_th,min " + Eng.of(tOn, "s")
                + " = " + Eng.of(need, "s"), true);
    }

    /**
     * The outgoing switch's turn-off to V_th,min at the hot corner: delay to the plateau, plateau,
     * fall to V_th,min, s; the delay NaN for an IGBT without its datasheet fall time.
     */
    static double[] turnOffToThreshold(Side o) {
        Question q = Question.of(o.s(), o.r().point(), Margins.DEFAULT);
        PairFigures f = PairFigures.of(q, o.d());
        SwitchPart s = o.s();
        OperatingPoint op = o.r().point();
        int n = q.n;
        double k = Math.max(1, f.kHot());
        double rOff = PairFigures.loop(q, k * f.rSnk(), op.rGOff());
        double tHot = Math.max(op.tj(), JunctionTemperature.DATASHEET_C);
        double vTh = PairFigures.thresholdAt(s, tHot);
        double tf = s.ratings().tF();
        if (s.technology() == Technology.IGBT && Double.isNaN(tf)) {
            return new double[] {Double.NaN, Double.NaN, Double.NaN};
        }
        double cAbove = DeadTime.capacitanceAbovePlateau(Question.specCharge(s), s.qGs(), s.qGd(), Question.specVoltage(s),
                s.vPlateau());
        double delay = DeadTime.rcSegment(rOff, n * cAbove, op.vDriveNeg(), op.vDrive(), s.vPlateau());
        if (!Double.isNaN(s.ratings().tDOff())) {
            delay = Math.max(delay, s.ratings().tDOff());
        }
        double plateau = f.plateauOff();
        if (Double.isNaN(plateau)) {
            throw new IllegalArgumentException("the plateau voltage or Q_gd of " + s.partNumber() + " is unknown");
        }
        if (vTh <= op.vDriveNeg()) {
            // The off level does not take the gate below V_th,min at the hot corner: the switch is not
            // held off, so no dead time is enough — never a finite minimum that could pass.
            throw new IllegalArgumentException("V_th,min of " + s.partNumber() + " at " + Eng.num(tHot) + " °C ("
                    + Eng.of(vTh, "V") + ") is at or below the off level (" + Eng.of(op.vDriveNeg(), "V")
                    + "), so the switch is not held off and no dead time is enough");
        }
        double fall = vTh < s.vPlateau()
                ? DeadTime.rcSegment(rOff, n * s.cIss(), op.vDriveNeg(), s.vPlateau(), vTh) : 0;
        if (!Double.isNaN(tf)) {
            fall = Math.max(fall, tf);
        }
        return new double[] {delay, plateau, fall};
    }

    /** The incoming switch's delay from the off level to V_th,min, the shorter of the two corners, s. */
    static double delayToThreshold(Side in) {
        OperatingPoint op = in.r().point();
        SwitchPart s = in.s();
        Question q = Question.of(s, op, Margins.DEFAULT);
        double rSrc = DriveCurrent.outputOhms(in.d().rSource(), op.swing(), in.d().iSource());
        double best = Double.POSITIVE_INFINITY;
        for (double t : new double[] {JunctionTemperature.DATASHEET_C, op.tj()}) {
            double r = PairFigures.loop(q, JunctionTemperature.driverResistanceFactor(t) * rSrc, op.rG());
            double vTh = PairFigures.thresholdAt(s, t);
            if (Double.isNaN(vTh)) {
                throw new IllegalArgumentException("V_th,min of " + s.partNumber() + " is unknown");
            }
            double d = vTh <= op.vDriveNeg() ? 0 : DeadTime.rcSegment(r, q.n * s.cIss(), op.vDrive(), op.vDriveNeg(), vTh);
            best = Math.min(best, d);
        }
        return best;
    }

    private static Check check(Side in, Side outgoing, Minimum min, Margins m) {
        String bridge = "half-bridge with " + outgoing.r().stage() + ": ";
        double dt = in.row().si("dead_time_ns");
        if (Double.isNaN(min.seconds())) {
            return new Check(Rule.DEAD_TIME, Verdict.UNKNOWN, bridge + min.why(), List.of(), Score.UNKNOWN);
        }
        if (Double.isNaN(dt)) {
            return new Check(Rule.DEAD_TIME, Verdict.UNKNOWN, bridge + "needs ≥ " + Eng.of(min.seconds(), "s") + " of dead"
                    + " time before " + in.r().stage() + " turns on (" + min.why() + "); give the stage's dead_time_ns"
                    + " to check it", List.of(), Score.UNKNOWN);
        }
        double want = min.seconds() * (1 + m.deadTime());
        List<Comparison> cmp = List.of(new Comparison("dead time before " + in.r().stage() + " turns on", dt, "≥", want,
                "s"));
        String what = bridge + "dead time " + Eng.of(dt, "s") + " before " + in.r().stage() + " turns on against ≥ "
                + Eng.of(min.seconds(), "s") + " (" + min.why() + ")";
        if (dt < min.seconds()) {
            return new Check(Rule.DEAD_TIME, Verdict.FAIL, what + " — both switches conduct at once (shoot-through):"
                    + " raise the dead time to ≥ " + Eng.of(Math.ceil(want * 1e9) * 1e-9, "s") + " or speed up the"
                    + " turn-off (smaller R_g,off)", cmp, 0);
        }
        if (!min.skewKnown()) {
            return new Check(Rule.DEAD_TIME, Verdict.WARN, what + ", but that is a lower bound — look up the drivers'"
                    + " delay matching or maximum propagation delay", cmp, Score.warn(0.5));
        }
        if (dt < want) {
            return new Check(Rule.DEAD_TIME, Verdict.WARN, what + ", with less than the " + Eng.pct(m.deadTime())
                    + " margin — raise it to ≥ " + Eng.of(Math.ceil(want * 1e9) * 1e-9, "s"), cmp,
                    Score.warn((dt - min.seconds()) / (want - min.seconds())));
        }
        return new Check(Rule.DEAD_TIME, Verdict.PASS, what, cmp, Score.pass(want > 0 ? dt / want - 1 : 1));
    }
}
