package org.gatefit.match;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.function.Function;
import org.gatefit.catalog.Bom;
import org.gatefit.catalog.Row;

/**
 * {@code check}: every driver–switch pair of a design's stage sheet, with every rule, plus the
 * {@code catalog} rule (both parts found), the package checks ({@link PackageCheck}) and the
 * {@code dead-time} rule for half-bridges ({@link DeadTimeCheck}).
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
        out = twins(out, stages, bom, pn -> driverCache.computeIfAbsent(pn, drivers),
                pn -> switchCache.computeIfAbsent(pn, switches), m);
        out = DeadTimeCheck.apply(out, stages, pn -> driverCache.computeIfAbsent(pn, drivers),
                pn -> switchCache.computeIfAbsent(pn, switches), m);
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

    /**
     * The two stages of each half-bridge judged against each other's edge: a stage's dv-dt comes from
     * its partner's turn-on (the partner's pair at the partner's point, at both corners), not from its
     * own pair standing in for the twin, so a bridge of unlike halves is judged as built.
     */
    private static List<StageResult> twins(List<StageResult> results, List<Row> rows, Bom bom,
                                           Function<String, Optional<Row>> drivers,
                                           Function<String, Optional<Row>> switches, Margins m) {
        List<StageResult> out = new ArrayList<>(results);
        for (int[] g : DeadTimeCheck.bridges(results, rows)) {
            for (int k = 0; k < 2; k++) {
                int self = g[k];
                int other = g[1 - k];
                OperatingPoint.Twin twin = twin(results.get(other), drivers, switches, m);
                if (twin != null) {
                    out.set(self, one(rows.get(self), bom, drivers, switches, m, twin));
                }
            }
        }
        return out;
    }

    /**
     * A stage's bridge partner as {@code check} finds it ({@link DeadTimeCheck#bridges}, the one pairing
     * rule) and the partner's turn-on edge as {@code check} judges the stage's dv-dt on it.
     *
     * @param partner    the partner's stage id, or null when the stage has no partner in the sheet
     * @param twin       the partner's turn-on edge, or null when there is no partner or its edge cannot be
     *                   computed (then, as in {@code check}, the pair itself stands in for the twin)
     * @param unresolved the stages whose parts or operating point could not be resolved, as
     *                   {@code check} reports them (such a stage is no one's partner)
     */
    public record Partner(String partner, OperatingPoint.Twin twin, List<String> unresolved) {
        public Partner {
            unresolved = List.copyOf(unresolved);
        }
    }

    /**
     * The bridge partner of {@code stage}, one of {@code stages}, found exactly as {@link #run} finds it:
     * every stage resolved as {@code check} resolves it, then paired by {@link DeadTimeCheck#bridges}.
     */
    public static Partner partner(List<Row> stages, Row stage, Bom bom, PartSource parts, Margins m) {
        int self = stages.indexOf(stage);
        if (self < 0) {
            throw new IllegalArgumentException("expected a row of the stage sheet, got line " + stage.line());
        }
        Map<String, Optional<Row>> driverCache = new HashMap<>();
        Map<String, Optional<Row>> switchCache = new HashMap<>();
        Function<String, Optional<Row>> drivers = pn -> driverCache.computeIfAbsent(pn,
                p -> Replacement.lookup(parts, org.gatefit.catalog.Kind.DRIVER, p));
        Function<String, Optional<Row>> switches = pn -> switchCache.computeIfAbsent(pn,
                p -> Replacement.lookup(parts, org.gatefit.catalog.Kind.SWITCH, p));
        List<StageResult> results = new ArrayList<>(stages.size());
        List<String> unresolved = new ArrayList<>();
        for (Row st : stages) {
            StageResult r = one(st, bom, drivers, switches, m);
            results.add(r);
            if (r.point() == null) {
                unresolved.add(r.stage());
            }
        }
        for (int[] g : DeadTimeCheck.bridges(results, stages)) {
            if (g[0] == self || g[1] == self) {
                StageResult other = results.get(g[0] == self ? g[1] : g[0]);
                return new Partner(other.stage(), twin(other, drivers, switches, m), unresolved);
            }
        }
        return new Partner(null, null, unresolved);
    }

    /** The switch-node dv/dt of a stage's own turn-on at 25 °C and at its hot corner, as a twin; null when unknown. */
    private static OperatingPoint.Twin twin(StageResult r, Function<String, Optional<Row>> drivers,
                                            Function<String, Optional<Row>> switches, Margins m) {
        try {
            DriverPart d = DriverPart.of(drivers.apply(r.driver()).orElseThrow());
            SwitchPart s = SwitchPart.of(switches.apply(r.switchPart()).orElseThrow());
            OperatingPoint op = r.point();
            Question q = Question.of(s, op, m);
            PairFigures f = PairFigures.of(q, d);
            double cold = Double.isNaN(op.dvdt()) ? PairFigures.slewAt(q, d, f.rSrc(), op.rG()) : op.dvdt();
            double hot = Double.isNaN(op.dvdt()) ? PairFigures.slewAt(q, d, f.kHot() * f.rSrc(), op.rG()) : op.dvdt();
            return cold > 0 && hot > 0 ? new OperatingPoint.Twin(r.stage(), cold, hot) : null;
        } catch (IllegalArgumentException | ArithmeticException | java.util.NoSuchElementException e) {
            return null; // the partner's edge cannot be computed: the stage keeps its own pair as the twin
        }
    }

    private static StageResult one(Row st, Bom bom, Function<String, Optional<Row>> drivers,
                                   Function<String, Optional<Row>> switches, Margins m) {
        return one(st, bom, drivers, switches, m, null);
    }

    private static StageResult one(Row st, Bom bom, Function<String, Optional<Row>> drivers,
                                   Function<String, Optional<Row>> switches, Margins m, OperatingPoint.Twin twin) {
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
            spec.twin = twin;
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
}
