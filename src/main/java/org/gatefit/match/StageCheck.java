package org.gatefit.match;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.function.Function;
import org.gatefit.catalog.Bom;
import org.gatefit.catalog.Row;
import org.gatefit.physics.DeadTime;

/**
 * {@code check}: every driver–switch pair of a design's stage sheet, with every rule, plus the
 * {@code catalog} rule (both parts found) and a dead-time note for half-bridges.
 */
public final class StageCheck {

    /**
     * One stage's outcome.
     *
     * @param stage      stage id
     * @param line       line of the stage sheet
     * @param driverRef  the driver cell as written (part number or designator)
     * @param driver     resolved driver part number, or null
     * @param switchRef  the switch cell as written
     * @param switchPart resolved switch part number, or null
     * @param verdict    fail / warn / pass of the stage
     * @param score      the pair's score (0 when a part is missing)
     * @param checks     catalog check first, then the rules (only the catalog check when a part is missing)
     * @param figures    the pair's figures (empty when a part is missing)
     * @param point      the operating point after defaults, or null when a part is missing
     * @param notes      further remarks, e.g. dead time for a half-bridge
     */
    public record StageResult(String stage, long line, String driverRef, String driver, String switchRef,
                              String switchPart, Verdict verdict, double score, List<Check> checks, List<Figure> figures,
                              OperatingPoint point, List<String> notes) {
        public StageResult {
            checks = List.copyOf(checks);
            figures = List.copyOf(figures);
            notes = List.copyOf(notes);
        }

        /** The figure by name, if computed. */
        public Optional<Figure> figure(String name) {
            return figures.stream().filter(f -> f.name().equals(name)).findFirst();
        }
    }

    /**
     * The whole check.
     *
     * @param file     the stage sheet as given
     * @param results  one per stage, in sheet order
     * @param bomNotes warnings from the BOM (quantity disagreeing with designators)
     * @param margins  the margins applied
     */
    public record Report(String file, List<StageResult> results, List<String> bomNotes, Margins margins) {
        public Report {
            results = List.copyOf(results);
            bomNotes = List.copyOf(bomNotes);
        }

        public long count(Verdict v) {
            return results.stream().filter(r -> r.verdict() == v).count();
        }

        /** Whether any stage failed (exit code 1). */
        public boolean failed() {
            return count(Verdict.FAIL) > 0;
        }
    }

    private StageCheck() {
    }

    /**
     * Checks every stage.
     *
     * @param stages  rows of a stage sheet
     * @param bom     the BOM to resolve designators, or null
     * @param drivers looks up a driver by part number
     * @param switches looks up a switch by part number
     */
    public static Report run(String file, List<Row> stages, Bom bom, Function<String, Optional<Row>> drivers,
                             Function<String, Optional<Row>> switches, Margins m) {
        return run(file, stages, bom, drivers, switches, m, n -> { });
    }

    /** The check engine over a catalog: {@link #run(String, List, Bom, Function, Function, Margins, java.util.function.IntConsumer)} with its parts. */
    public static Report run(String file, List<Row> stages, Bom bom, PartSource parts, Margins m,
                             java.util.function.IntConsumer progress) {
        return run(file, stages, bom, pn -> Replacement.lookup(parts, org.gatefit.catalog.Kind.DRIVER, pn),
                pn -> Replacement.lookup(parts, org.gatefit.catalog.Kind.SWITCH, pn), m, progress);
    }

    /** As {@link #run(String, List, Bom, Function, Function, Margins)}, telling {@code progress} the stages done so far. */
    public static Report run(String file, List<Row> stages, Bom bom, Function<String, Optional<Row>> drivers,
                             Function<String, Optional<Row>> switches, Margins m, java.util.function.IntConsumer progress) {
        Map<String, Optional<Row>> driverCache = new HashMap<>();
        Map<String, Optional<Row>> switchCache = new HashMap<>();
        List<StageResult> out = new ArrayList<>(stages.size());
        for (Row st : stages) {
            out.add(one(st, bom, pn -> driverCache.computeIfAbsent(pn, drivers),
                    pn -> switchCache.computeIfAbsent(pn, switches), m));
            progress.accept(out.size());
        }
        out = deadTime(out, pn -> driverCache.computeIfAbsent(pn, drivers));
        out = PackageCheck.apply(out, pn -> driverCache.computeIfAbsent(pn, drivers),
                pn -> switchCache.computeIfAbsent(pn, switches), m);
        return new Report(file, out, bom == null ? List.of() : bom.notes(), m);
    }

    private record Resolved(String pn, String problem) {
    }

    private static Resolved resolve(String ref, String what, Bom bom, Function<String, Optional<Row>> lookup) {
        if (bom != null) {
            Optional<Bom.Entry> e = bom.get(ref);
            if (e.isPresent()) {
                if (e.get().doNotPlace()) {
                    return new Resolved(null, what + " " + ref + " is marked do-not-place in " + bom.file()
                            + " (line " + e.get().line() + ") — fit it, or point the stage at the part that is placed");
                }
                String pn = e.get().partNumber();
                if (lookup.apply(pn).isEmpty()) {
                    return new Resolved(null, what + " " + ref + " is " + pn + " in " + bom.file() + ", which is not in the"
                            + " catalog — import its datasheet values, or correct the BOM");
                }
                return new Resolved(pn, null);
            }
            if (lookup.apply(ref).isPresent()) {
                return new Resolved(ref, null);
            }
            return new Resolved(null, what + " '" + ref + "' is neither a designator in " + bom.file()
                    + " nor a part in the catalog — add it to the BOM or correct the stage sheet");
        }
        if (lookup.apply(ref).isPresent()) {
            return new Resolved(ref, null);
        }
        return new Resolved(null, what + " '" + ref + "' is not in the catalog" + (ref.matches("[A-Za-z]{1,3}\\d+")
                ? " (it looks like a designator: give the BOM with --bom)" : " — import it, or check the part number"));
    }

    private static StageResult one(Row st, Bom bom, Function<String, Optional<Row>> drivers,
                                   Function<String, Optional<Row>> switches, Margins m) {
        String dRef = st.text("driver");
        String sRef = st.text("switch");
        Resolved d = resolve(dRef, "driver", bom, drivers);
        Resolved s = resolve(sRef, "switch", bom, switches);
        List<String> missing = new ArrayList<>();
        if (d.problem() != null) {
            missing.add(d.problem());
        }
        if (s.problem() != null) {
            missing.add(s.problem());
        }
        if (!missing.isEmpty()) {
            Check c = new Check(Rule.CATALOG, Verdict.FAIL, String.join("; ", missing), List.of(), 0);
            return new StageResult(st.key(), st.line(), dRef, d.pn(), sRef, s.pn(), Verdict.FAIL, 0, List.of(c), List.of(),
                    null, List.of());
        }
        DriverPart dp = DriverPart.of(drivers.apply(d.pn()).orElseThrow());
        SwitchPart sp = SwitchPart.of(switches.apply(s.pn()).orElseThrow());
        OperatingPoint op;
        try {
            OperatingPoint.Spec spec = OperatingPoint.Spec.fromStage(st);
            spec.channelsUsed = 1; // a stage is one channel; PackageCheck adds up the stages of one package
            op = spec.resolve(sp);
        } catch (IllegalArgumentException e) {
            Check c = new Check(Rule.CATALOG, Verdict.FAIL, "the stage's operating point cannot be used: " + e.getMessage(),
                    List.of(), 0);
            return new StageResult(st.key(), st.line(), dRef, d.pn(), sRef, s.pn(), Verdict.FAIL, 0, List.of(c), List.of(),
                    null, List.of());
        }
        PairResult pr = Rules.evaluate(dp, sp, op, m);
        List<Check> checks = new ArrayList<>();
        checks.add(new Check(Rule.CATALOG, Verdict.PASS, "driver " + describe(dRef, d.pn()) + " and switch "
                + describe(sRef, s.pn()) + " are in the catalog", List.of(), 1));
        checks.addAll(pr.checks());
        return new StageResult(st.key(), st.line(), dRef, d.pn(), sRef, s.pn(), pr.verdict(), pr.score(), checks,
                pr.figures(), op, List.of());
    }

    private static String describe(String ref, String pn) {
        return ref.equalsIgnoreCase(pn) ? pn : ref + " (" + pn + ")";
    }

    /**
     * Stages that share a driver reference, one high and one low, form a half-bridge: the dead
     * time must cover the slower switch's turn-off (delay plus plateau, estimated) less the other's
     * turn-on delay, plus the drivers' delay mismatch (REFERENCES.md §9, common practice).
     */
    private static List<StageResult> deadTime(List<StageResult> results, Function<String, Optional<Row>> drivers) {
        Map<String, List<Integer>> byDriver = new LinkedHashMap<>();
        for (int i = 0; i < results.size(); i++) {
            StageResult r = results.get(i);
            if (r.point() != null) {
                byDriver.computeIfAbsent(r.driverRef().toUpperCase(java.util.Locale.ROOT), k -> new ArrayList<>()).add(i);
            }
        }
        List<StageResult> out = new ArrayList<>(results);
        for (List<Integer> group : byDriver.values()) {
            if (group.size() != 2) {
                continue;
            }
            StageResult a = results.get(group.get(0));
            StageResult b = results.get(group.get(1));
            if (a.point().highSide() == b.point().highSide()) {
                continue;
            }
            String note = deadTimeNote(a, b, drivers);
            if (note != null) {
                out.set(group.get(0), withNote(a, "half-bridge with stage " + b.stage() + ": " + note));
                out.set(group.get(1), withNote(b, "half-bridge with stage " + a.stage() + ": " + note));
            }
        }
        return out;
    }

    private static String deadTimeNote(StageResult a, StageResult b, Function<String, Optional<Row>> drivers) {
        double offA = sum(a, "delay-time-off", "plateau-time-off");
        double offB = sum(b, "delay-time-off", "plateau-time-off");
        double onA = a.figure("delay-time-on").map(Figure::value).orElse(Double.NaN);
        double onB = b.figure("delay-time-on").map(Figure::value).orElse(Double.NaN);
        if (Double.isNaN(offA) || Double.isNaN(offB) || Double.isNaN(onA) || Double.isNaN(onB)) {
            return null;
        }
        DriverPart da = DriverPart.of(drivers.apply(a.driver()).orElseThrow());
        DriverPart db = DriverPart.of(drivers.apply(b.driver()).orElseThrow());
        double mismatch;
        String mm;
        if (a.driver().equals(b.driver()) && !Double.isNaN(da.tMatch())) {
            mismatch = da.tMatch();
            mm = "delay matching " + Eng.of(mismatch, "s");
        } else if (!Double.isNaN(da.tProp()) && !Double.isNaN(db.tProp())) {
            mismatch = Math.abs(da.tProp() - db.tProp()) + (Double.isNaN(da.tMatch()) ? 0 : da.tMatch());
            mm = "propagation-delay difference " + Eng.of(mismatch, "s");
        } else {
            mismatch = 0;
            mm = "driver delay mismatch unknown, taken as 0";
        }
        double needAB = DeadTime.minimum(offA, 0, onB, mismatch);
        double needBA = DeadTime.minimum(offB, 0, onA, mismatch);
        double need = Math.max(needAB, needBA);
        StageResult slow = needAB >= needBA ? a : b;
        return "dead time ≥ " + Eng.of(need, "s")
                + " (turn-off of " + slow.stage() + " ≈ " + Eng.of(slow == a ? offA : offB, "s")
                + " less the other's turn-on delay, plus " + mm + "; add margin for temperature and spread)";
    }

    private static double sum(StageResult r, String x, String y) {
        return r.figure(x).map(Figure::value).orElse(Double.NaN) + r.figure(y).map(Figure::value).orElse(Double.NaN);
    }

    private static StageResult withNote(StageResult r, String note) {
        List<String> n = new ArrayList<>(r.notes());
        n.add(note);
        return new StageResult(r.stage(), r.line(), r.driverRef(), r.driver(), r.switchRef(), r.switchPart(), r.verdict(),
                r.score(), r.checks(), r.figures(), r.point(), n);
    }
}
