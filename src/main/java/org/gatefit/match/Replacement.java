package org.gatefit.match;

import org.gatefit.catalog.Op;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.function.Function;
import org.gatefit.catalog.Bom;
import org.gatefit.catalog.Column;
import org.gatefit.catalog.Kind;
import org.gatefit.catalog.Numbers;
import org.gatefit.catalog.Row;
import org.gatefit.catalog.Schema;

/**
 * {@code replace}: ranks substitutes for a part as drop-in, pin-compatible or functional.
 *
 * <p>Each parameter has a sense (the README's table lists them):
 * <ul>
 *   <li><b>essential</b>: must be equal (technology, channel type, topology, input polarity,
 *       channel count) or at least as good (blocking voltage, gate-voltage window, offset and
 *       isolation ratings); a candidate that is worse is not offered at all;</li>
 *   <li><b>rating</b>: may be better; worse rules out drop-in (current rating, R_on, V_CE(sat),
 *       supply range, input limits, negative rail, package power, Miller clamp, bootstrap diode,
 *       input thresholds);</li>
 *   <li><b>window</b>: changes how the circuit behaves, so outside a window around the original
 *       it needs re-verification even when "better" (threshold voltages, gate charges and
 *       capacitances, plateau, internal gate resistance, recommended drive levels, UVLO, peak
 *       current and output resistance, propagation delay).</li>
 * </ul>
 * Grades: drop-in = same pinout, no worse rating, every window parameter inside its window, not
 * obsolete, and (with stages) no pairing fails or gets a worse verdict on any rule; pin-compatible
 * = same pinout otherwise; functional = other pinout, no worse rating and no failing pairing (parts
 * with another pinout and a worse rating are not offered).
 *
 * <p>An essential numeric rating worse than the original's by no more than {@link #RATING_TOLERANCE}
 * is not a reason to drop the part: it is assessed {@code re-verify} (the design may not need the
 * original's full rating) and so offered as pin-compatible at best, never drop-in or functional.
 * Every part compared and not offered can be listed with the reason ({@link NotOffered}).
 */
public final class Replacement {

    /** How a parameter is compared: {@link Column.Compare}, read from the schema files. */
    /**
     * One compared column, as the schema's {@code x-replacement} says ({@link Column.Substitute}).
     *
     * @param column    catalog column
     * @param label     name for people
     * @param sense     comparison
     * @param essential whether worse means "not offered"
     * @param window    half-width of the window: a fraction for WINDOW_RELATIVE, the column's unit for WINDOW_ABSOLUTE
     * @param unit      the column's unit symbol ("" when it has none)
     */
    record Param(String column, String label, Column.Compare sense, boolean essential, double window, String unit) {
    }

    /**
     * How far an essential numeric rating (blocking voltage, V_GS limits, offset and isolation
     * ratings) may fall short of the original's, as a fraction of it, and still be offered with a
     * re-verify note rather than dropped (common practice, no source).
     */
    public static final double RATING_TOLERANCE = 0.10;

    static final List<Param> SWITCH = params(Kind.SWITCH);
    static final List<Param> DRIVER = params(Kind.DRIVER);

    /**
     * The columns {@code replace} compares for a kind, from the schema files' {@code x-replacement}
     * (the one place this knowledge lives): essentials first, then ratings, then windows, each in
     * the schema's column order.
     */
    private static List<Param> params(Kind kind) {
        List<Param> out = new ArrayList<>();
        for (int group = 0; group < 3; group++) {
            for (Column c : Schema.of(kind).columns()) {
                Column.Substitute r = c.replacement();
                if (r == null) {
                    continue;
                }
                boolean window = r.compare() == Column.Compare.WINDOW_RELATIVE || r.compare() == Column.Compare.WINDOW_ABSOLUTE;
                int g = r.essential() ? 0 : window ? 2 : 1;
                if (g == group) {
                    out.add(new Param(c.name(), r.label(), r.compare(), r.essential(), r.window(),
                            c.unit() == null ? "" : c.unit().symbol()));
                }
            }
        }
        return List.copyOf(out);
    }

    /** Grades, best first. */
    public enum Grade {
        DROP_IN("drop-in"), PIN_COMPATIBLE("pin-compatible"), FUNCTIONAL("functional");

        private final String id;

        Grade(String id) {
            this.id = id;
        }

        public String id() {
            return id;
        }
    }

    /**
     * One parameter compared.
     *
     * @param parameter  column name
     * @param label      for people
     * @param original   original's value as text (unit in {@code unit}), or "unknown"
     * @param candidate  candidate's value as text, or "unknown"
     * @param unit       unit symbol
     * @param assessment {@code equal}, {@code better}, {@code worse}, {@code within-window}, {@code re-verify}
     */
    public record Difference(String parameter, String label, String original, String candidate, String unit,
                             String assessment) {
    }

    /**
     * A stage re-checked with the candidate in place.
     *
     * @param stage   stage id
     * @param rule    rule id
     * @param verdict with the candidate
     * @param was     with the original
     * @param message the check's sentence
     */
    public record StageNote(String stage, String rule, Verdict verdict, Verdict was, String message) {
    }

    /** How a stage's result with a candidate in place compares with the original's. */
    public enum Change {
        UNCHANGED("unchanged"), BETTER("better"), WORSE("worse");

        private final String id;

        Change(String id) {
            this.id = id;
        }

        public String id() {
            return id;
        }
    }

    /**
     * One stage re-checked with a candidate in place, against the original: worse when any rule's
     * verdict got worse, better when some got better and none worse, unchanged otherwise.
     *
     * @param stage   stage id
     * @param verdict the stage's verdict with the candidate
     * @param was     with the original
     * @param change  unchanged / better / worse
     */
    public record StageOutcome(String stage, Verdict verdict, Verdict was, Change change) {
    }

    /** A part compared and not offered, with the reason in words. */
    public record NotOffered(String partNumber, String reason) {
    }

    /**
     * A ranked substitute; {@code checks} holds only the stage checks whose verdict differs from the
     * original's (what stays the same is said once, {@link Result#standing}).
     */
    public record Candidate(String partNumber, String maker, String pinout, String lifecycle, long stock, double price,
                            Grade grade, double score, List<Difference> differences, List<StageNote> checks,
                            List<String> reasons, List<StageOutcome> stages) {
        public Candidate {
            differences = List.copyOf(differences);
            checks = List.copyOf(checks);
            reasons = List.copyOf(reasons);
            stages = List.copyOf(stages);
        }
    }

    /**
     * @param part        the original part number
     * @param kind        switch or driver
     * @param original    the original's row
     * @param candidates  best first
     * @param considered  catalog parts of the kind other than the original
     * @param notOffered  of those, how many are not offered (worse essential rating, obsolete, or
     *                    another pinout with a worse rating or a failing pairing)
     * @param stagesUsing stage ids the part sits in (empty without --stages)
     * @param standing    the checks that do not pass in those stages with the original in place, said
     *                    once (a candidate's {@code checks} hold only what it changes)
     * @param listed      whether {@code notOfferedParts} lists every part not offered (asked for)
     * @param notOfferedParts each part not offered with the reason, by part number (when listed)
     */
    public record Result(String part, Kind kind, Row original, List<Candidate> candidates, int considered,
                         int notOffered, List<String> stagesUsing, Margins margins, List<StageNote> standing,
                         boolean listed, List<NotOffered> notOfferedParts) {
        public Result {
            candidates = List.copyOf(candidates);
            stagesUsing = List.copyOf(stagesUsing);
            standing = List.copyOf(standing);
            notOfferedParts = List.copyOf(notOfferedParts);
        }
    }

    /** Best first: grade, score, price (unknown last), part number. */
    static final Comparator<Candidate> RANKING = Comparator.comparing((Candidate c) -> c.grade().ordinal())
            .thenComparing(Comparator.comparingDouble(Candidate::score).reversed())
            .thenComparingDouble(c -> Double.isNaN(c.price()) ? Double.MAX_VALUE : c.price())
            .thenComparing(Candidate::partNumber);

    private Replacement() {
    }

    /**
     * Catalog conditions that only skip parts certain to be left out: an essential parameter that
     * is required (so always known) and worse, and obsolete parts unless asked for.
     */
    public static Prefilter prefilter(Row original, boolean includeObsolete) {
        Prefilter.Builder b = new Prefilter.Builder();
        for (Param p : original.kind() == Kind.SWITCH ? SWITCH : DRIVER) {
            Column c = Schema.of(original.kind()).column(p.column()).orElseThrow();
            if (!p.essential() || !c.required()) {
                continue; // a candidate lacking the value is not certain to be left out
            }
            boolean text = c.type() == org.gatefit.catalog.ColumnType.TEXT || c.type() == org.gatefit.catalog.ColumnType.CHOICE;
            switch (p.sense()) {
                case SAME -> b.require(text ? Prefilter.Condition.is(p.column(), Op.EQ, original.text(p.column()))
                        : Prefilter.Condition.of(p.column(), Op.EQ, original.number(p.column())));
                case HIGHER -> b.require(Prefilter.Condition.of(p.column(), Op.GE, tolerated(p.sense(), original.number(p.column()))));
                case LOWER -> b.require(Prefilter.Condition.of(p.column(), Op.LE, tolerated(p.sense(), original.number(p.column()))));
                default -> throw new IllegalStateException("essential " + p.column() + " compared as " + p.sense());
            }
        }
        if (!includeObsolete) {
            b.require(Prefilter.Condition.is("lifecycle", Op.NE, Lifecycle.OBSOLETE.id()));
        }
        return b.build();
    }

    /**
     * The replacement engine over a catalog: the candidates the prefilter leaves stream from a scan
     * into a {@link Search}, which keeps only the best {@code top}. See {@link #run} for the parameters.
     */
    public static Result search(PartSource parts, Row original, int top, boolean includeObsolete, String stageFile,
                                List<Row> stages, Bom bom, Margins m) throws java.io.IOException {
        return search(parts, original, top, includeObsolete, false, stageFile, stages, bom, m);
    }

    /**
     * As {@link #search(PartSource, Row, int, boolean, String, List, Bom, Margins)}; with
     * {@code listAll} every part of the kind is compared (no prefilter) and each one not offered is
     * listed with the reason.
     */
    public static Result search(PartSource parts, Row original, int top, boolean includeObsolete, boolean listAll,
                                String stageFile, List<Row> stages, Bom bom, Margins m) throws java.io.IOException {
        Search search = new Search(original, top, includeObsolete, stageFile, stages, bom,
                pn -> lookup(parts, Kind.DRIVER, pn), pn -> lookup(parts, Kind.SWITCH, pn), m, listAll);
        parts.scan(original.kind(), listAll ? Prefilter.NONE : prefilter(original, includeObsolete),
                search);
        return search.result(parts.count(original.kind()));
    }

    /** A lookup for the stage re-checks, which take plain functions. */
    static Optional<Row> lookup(PartSource parts, Kind k, String pn) {
        try {
            return parts.get(k, pn);
        } catch (java.io.IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
    }

    /**
     * Compares every candidate with the original and, when stages are given, re-checks every stage
     * the original sits in with the candidate in its place.
     *
     * @param ofKind   parts of the original's kind in the catalog (for the "not offered" count)
     * @param stages   stage-sheet rows (empty for none)
     * @param bom      BOM for the stages' designators, or null
     * @param drivers  catalog lookup of drivers by part number
     * @param switches catalog lookup of switches by part number
     */
    public static Result run(Row original, Iterable<Row> candidates, int ofKind, int top, boolean includeObsolete,
                             String stageFile,
                             List<Row> stages, Bom bom, Function<String, Optional<Row>> drivers,
                             Function<String, Optional<Row>> switches, Margins m) {
        Search s = new Search(original, top, includeObsolete, stageFile, stages, bom, drivers, switches, m);
        candidates.forEach(s);
        return s.result(ofKind);
    }

    /**
     * A replacement search fed candidate by candidate (a catalog scan streams them in): every
     * candidate is graded and scored without being worded, the best {@code top} are kept in a
     * bounded heap (memory does not grow with the catalog) and only those are worded.
     */
    public static final class Search implements java.util.function.Consumer<Row> {
        private record Kept(Candidate quick, Row row) {
        }

        private final Row original;
        private final int top;
        private final boolean includeObsolete;
        private final boolean listAll;
        private final String stageFile;
        private final Bom bom;
        private final Function<String, Optional<Row>> drivers;
        private final Function<String, Optional<Row>> switches;
        private final Margins m;
        private final List<Param> params;
        private final String pn;
        private final List<Row> using = new ArrayList<>();
        private final List<StageCheck.StageResult> baseline = new ArrayList<>();
        private final List<StageNote> standing = new ArrayList<>();
        private final List<NotOffered> left = new ArrayList<>();
        private final java.util.PriorityQueue<Kept> best;
        private int offered;

        /** See {@link #run} for the parameters; the stages the original sits in are checked here, once. */
        public Search(Row original, int top, boolean includeObsolete, String stageFile, List<Row> stages, Bom bom,
                      Function<String, Optional<Row>> drivers, Function<String, Optional<Row>> switches, Margins m) {
            this(original, top, includeObsolete, stageFile, stages, bom, drivers, switches, m, false);
        }

        /** As above; with {@code listAll} every part not offered is kept with the reason. */
        public Search(Row original, int top, boolean includeObsolete, String stageFile, List<Row> stages, Bom bom,
                      Function<String, Optional<Row>> drivers, Function<String, Optional<Row>> switches, Margins m,
                      boolean listAll) {
            this.original = original;
            this.top = top;
            this.includeObsolete = includeObsolete;
            this.listAll = listAll;
            this.stageFile = stageFile;
            this.bom = bom;
            this.drivers = drivers;
            this.switches = switches;
            this.m = m;
            Kind kind = original.kind();
            this.params = kind == Kind.SWITCH ? SWITCH : DRIVER;
            this.pn = original.key();
            this.best = new java.util.PriorityQueue<>(Math.min(Math.max(top, 1), 1024) + 1,
                    Comparator.comparing(Kept::quick, RANKING).reversed());
            // Stages that use the part, with the original in place.
            if (!stages.isEmpty()) {
                StageCheck.Report all = StageCheck.run(stageFile, stages, bom, drivers, switches, m);
                for (int i = 0; i < stages.size(); i++) {
                    StageCheck.StageResult r = all.results().get(i);
                    String used = kind == Kind.DRIVER ? r.driver() : r.switchPart();
                    if (used != null && used.equalsIgnoreCase(pn)) {
                        using.add(stages.get(i));
                        baseline.add(r);
                        for (Check c : r.checks()) {
                            if (c.verdict() != Verdict.PASS) {
                                standing.add(new StageNote(r.stage(), c.rule().id(), c.verdict(), c.verdict(),
                                        c.message()));
                            }
                        }
                    }
                }
            }
        }

        @Override
        public void accept(Row cand) {
            if (cand.key().equalsIgnoreCase(pn)) {
                return;
            }
            if (!includeObsolete && Lifecycle.of(cand.text("lifecycle")) == Lifecycle.OBSOLETE) {
                if (listAll) {
                    left.add(new NotOffered(cand.key(), "obsolete (--include-obsolete considers it)"));
                }
                return;
            }
            Evaluation q = evaluate(original, cand, params, using, baseline, stageFile, bom, drivers, switches, m,
                    false, listAll);
            if (q.candidate() == null) {
                if (listAll) {
                    left.add(new NotOffered(cand.key(), q.rejected()));
                }
                return;
            }
            offered++;
            if (best.size() < top) {
                best.add(new Kept(q.candidate(), cand));
            } else if (top > 0 && RANKING.compare(q.candidate(), best.peek().quick()) < 0) {
                best.poll();
                best.add(new Kept(q.candidate(), cand));
            }
        }

        /**
         * The best candidates, worded, best first.
         *
         * @param ofKind parts of the original's kind in the catalog (for the "not offered" count)
         */
        public Result result(int ofKind) {
            List<Candidate> out = new ArrayList<>(best.size());
            for (Kept k : best) {
                out.add(java.util.Objects.requireNonNull(evaluate(original, k.row(), params, using, baseline, stageFile,
                        bom, drivers, switches, m, true, false).candidate()));
            }
            int considered = Math.max(0, ofKind - 1);
            int notOffered = Math.max(0, considered - offered);
            out.sort(RANKING);
            List<String> ids = using.stream().map(Row::key).toList();
            List<NotOffered> listed = new ArrayList<>(left);
            listed.sort(Comparator.comparing(NotOffered::partNumber));
            return new Result(pn, original.kind(), original, out, considered, notOffered, ids, m, standing, listAll,
                    listed);
        }
    }

    /** A candidate offered, or the reason it is not (worded only when asked for). */
    private record Evaluation(Candidate candidate, String rejected) {
        static Evaluation no(boolean word, java.util.function.Supplier<String> why) {
            return new Evaluation(null, word ? why.get() : "");
        }
    }

    private static Evaluation evaluate(Row orig, Row cand, List<Param> params, List<Row> using,
                                       List<StageCheck.StageResult> baseline, String stageFile, Bom bom,
                                       Function<String, Optional<Row>> drivers,
                                       Function<String, Optional<Row>> switches, Margins m,
                                       boolean describe, boolean wordRejection) {
        Schema schema = Schema.of(orig.kind());
        List<Difference> diffs = new ArrayList<>();
        List<String> reasons = new ArrayList<>();
        List<String> shortOf = new ArrayList<>();
        String firstWorse = null;
        int worse = 0;
        int reverify = 0;
        for (Param p : params) {
            Column col = schema.column(p.column()).orElseThrow();
            Object a = value(orig, p);
            Object b = value(cand, p);
            if (a == null) {
                continue;
            }
            String assessment = assess(p, a, b);
            String unit = col.unitSymbol();
            if (p.essential() && assessment.equals("worse")) {
                return Evaluation.no(wordRejection, () -> p.sense() == Column.Compare.SAME
                        ? p.label() + " " + show(b) + ", not " + show(a) + " (must be equal)"
                        : p.label() + " " + show(b) + suffix(unit) + " against " + show(a) + suffix(unit)
                        + ": short by more than the " + Eng.pct(RATING_TOLERANCE) + " tolerance (must be equal or "
                        + (p.sense() == Column.Compare.HIGHER ? "higher" : "lower") + ")");
            }
            if (p.essential() && assessment.equals("re-verify") && b != null) {
                shortOf.add(p.label() + " " + show(a) + " → " + show(b) + suffix(unit));
            }
            switch (assessment) {
                case "worse" -> {
                    worse++;
                    if (firstWorse == null) {
                        firstWorse = p.label() + " " + show(a) + " → " + show(b) + suffix(unit);
                    }
                }
                case "re-verify" -> reverify++;
                default -> {
                }
            }
            if (describe) {
                diffs.add(new Difference(p.column(), p.label(), show(a), b == null ? "unknown" : show(b), unit,
                        assessment));
            }
        }
        boolean samePinout = orig.text("pinout") != null && cand.text("pinout") != null
                && orig.text("pinout").equalsIgnoreCase(cand.text("pinout"));
        diffs.add(0, new Difference("pinout", "pinout", String.valueOf(orig.text("pinout")),
                String.valueOf(cand.text("pinout")), "", samePinout ? "equal" : "re-verify"));
        // Re-check every stage the original sits in, with the candidate in its place.
        List<StageNote> notes = new ArrayList<>();
        List<StageOutcome> outcomes = new ArrayList<>();
        String failedStage = null;
        boolean stageWorse = false;
        double stageScore = 1;
        if (!using.isEmpty()) {
            String pn = orig.key();
            Function<String, Optional<Row>> d = orig.kind() == Kind.DRIVER
                    ? x -> x.equalsIgnoreCase(pn) ? Optional.of(cand) : drivers.apply(x) : drivers;
            Function<String, Optional<Row>> s = orig.kind() == Kind.SWITCH
                    ? x -> x.equalsIgnoreCase(pn) ? Optional.of(cand) : switches.apply(x) : switches;
            StageCheck.Report rep = StageCheck.run(stageFile, using, bom, d, s, m);
            double sum = 0;
            for (int i = 0; i < rep.results().size(); i++) {
                StageCheck.StageResult now = rep.results().get(i);
                StageCheck.StageResult was = baseline.get(i);
                sum += now.score();
                boolean anyWorse = false;
                boolean anyBetter = false;
                for (Check c : now.checks()) {
                    Verdict before = was.checks().stream().filter(x -> x.rule() == c.rule()).map(Check::verdict)
                            .findFirst().orElse(Verdict.UNKNOWN);
                    boolean got = c.verdict().ordinal() > before.ordinal() && c.rule() != Rule.LIFECYCLE;
                    if (c.verdict() == Verdict.FAIL && before != Verdict.FAIL && failedStage == null) {
                        failedStage = now.stage(); // a failure the original did not have
                    }
                    stageWorse |= got;
                    anyWorse |= c.verdict().ordinal() > before.ordinal();
                    anyBetter |= c.verdict().ordinal() < before.ordinal();
                    // What changes, said per candidate; a lifecycle check that got better is the candidate's
                    // own status, which its row shows.
                    if (c.verdict().ordinal() > before.ordinal()
                            || (c.verdict().ordinal() < before.ordinal() && c.rule() != Rule.LIFECYCLE)) {
                        notes.add(new StageNote(now.stage(), c.rule().id(), c.verdict(), before, c.message()));
                    }
                }
                outcomes.add(new StageOutcome(now.stage(), now.verdict(), was.verdict(),
                        anyWorse ? Change.WORSE : anyBetter ? Change.BETTER : Change.UNCHANGED));
            }
            stageScore = sum / rep.results().size();
        }
        boolean stageFail = failedStage != null;
        boolean obsolete = Lifecycle.of(cand.text("lifecycle")) == Lifecycle.OBSOLETE;
        Grade grade;
        if (samePinout && worse == 0 && reverify == 0 && !stageFail && !stageWorse && !obsolete) {
            grade = Grade.DROP_IN;
        } else if (samePinout) {
            grade = Grade.PIN_COMPATIBLE;
            if (worse > 0) {
                reasons.add(worse + " rating" + (worse == 1 ? " is" : "s are") + " worse than the original's");
            }
            for (String r : shortOf) {
                reasons.add(r + " falls short of the original's rating by less than the "
                        + Eng.pct(RATING_TOLERANCE) + " tolerance: re-verify that the design does not need it");
            }
            int outside = reverify - shortOf.size();
            if (outside > 0) {
                reasons.add(outside + " parameter" + (outside == 1 ? "" : "s") + " outside the re-verify window");
            }
            if (stageFail) {
                reasons.add("a stage fails with it in place");
            } else if (stageWorse) {
                reasons.add("a stage check gets a worse verdict with it in place");
            }
            if (obsolete) {
                reasons.add("it is obsolete");
            }
        } else {
            // Functional means electrically fit: no worse rating, no rating short of the original's and
            // no failing pairing.
            if (stageFail || worse > 0 || !shortOf.isEmpty() || obsolete) {
                String pinout = String.valueOf(cand.text("pinout"));
                String fw = firstWorse;
                String sf = failedStage;
                return Evaluation.no(wordRejection, () -> "other pinout (" + pinout + ") and "
                        + (fw != null ? "a worse rating: " + fw
                        : !shortOf.isEmpty() ? "a rating short of the original's: " + shortOf.get(0)
                        : sf != null ? "stage " + sf + " fails with it in place" : "obsolete"));
            }
            grade = Grade.FUNCTIONAL;
            reasons.add("other pinout (" + cand.text("pinout") + "): new footprint or layout");
        }
        long stock = Double.isNaN(cand.number("stock")) ? -1 : (long) cand.number("stock");
        Lifecycle life = Lifecycle.of(cand.text("lifecycle"));
        double score = life.availability(stock) * Math.max(0.2, 1 - 0.05 * reverify - 0.1 * worse)
                * Math.max(0, Math.min(1, stageScore));
        return new Evaluation(new Candidate(cand.key(), cand.text("maker"), cand.text("pinout"), life.id(), stock,
                cand.number("unit_price"), grade, Math.max(0, Math.min(1, score)), diffs, notes, reasons, outcomes),
                null);
    }

    private static String suffix(String unit) {
        return unit.isEmpty() ? "" : " " + unit;
    }

    /**
     * The least an essential rating may be (HIGHER) or the most (LOWER) and still be offered: the
     * original's value less {@link #RATING_TOLERANCE} of its magnitude. The prefilter and
     * {@link #assess} use this one expression, so they agree at the edge.
     */
    static double tolerated(Column.Compare sense, double original) {
        double slack = RATING_TOLERANCE * Math.abs(original);
        return sense == Column.Compare.HIGHER ? original - slack : original + slack;
    }

    /**
     * A row's value of a parameter. An empty {@code v_neg_min_v} means the driver has no negative
     * rail (DESIGN.md: "empty or 0 = none"), so it compares as 0 V, not as unknown.
     */
    private static Object value(Row row, Param p) {
        Object v = row.values().get(p.column());
        return v == null && p.column().equals("v_neg_min_v") ? (Object) 0.0 : v;
    }

    /** equal / better / worse / within-window / re-verify for one parameter (original known). */
    static String assess(Param p, Object a, Object b) {
        if (b == null) {
            return "re-verify";
        }
        switch (p.sense()) {
            case SAME -> {
                return a.toString().equalsIgnoreCase(b.toString()) ? "equal" : "worse";
            }
            case YES -> {
                if (a.equals(b)) {
                    return "equal";
                }
                return "yes".equals(b) ? "better" : "worse";
            }
            default -> {
            }
        }
        double x = ((Number) a).doubleValue();
        double y = ((Number) b).doubleValue();
        if (x == y) {
            return "equal";
        }
        return switch (p.sense()) {
            case HIGHER -> y > x ? "better" : p.essential() && y >= tolerated(Column.Compare.HIGHER, x) ? "re-verify" : "worse";
            case LOWER -> y < x ? "better" : p.essential() && y <= tolerated(Column.Compare.LOWER, x) ? "re-verify" : "worse";
            case WINDOW_RELATIVE -> Math.abs(y - x) <= p.window() * Math.abs(x) ? "within-window" : "re-verify";
            case WINDOW_ABSOLUTE -> Math.abs(y - x) <= p.window() ? "within-window" : "re-verify";
            case SAME, YES -> throw new IllegalStateException();
        };
    }

    private static String show(Object v) {
        return v instanceof Double d ? Numbers.format(d) : v.toString();
    }

    /** The parameter tables of both kinds as Markdown, for the README (a test keeps the two in step). */
    public static String parameterMarkdown() {
        StringBuilder sb = new StringBuilder();
        for (Kind k : List.of(Kind.SWITCH, Kind.DRIVER)) {
            sb.append("| ").append(k.id()).append(" parameter | class | rule |\n| --- | --- | --- |\n");
            List<Param> ps = k == Kind.SWITCH ? SWITCH : DRIVER;
            List<Map.Entry<String, String>> how = parameterTable(k);
            for (int i = 0; i < ps.size(); i++) {
                Param p = ps.get(i);
                String cls = p.essential() ? "essential" : switch (p.sense()) {
                    case WINDOW_RELATIVE, WINDOW_ABSOLUTE -> "window";
                    default -> "rating";
                };
                sb.append("| `").append(p.column()).append("` | ").append(cls).append(" | ").append(how.get(i).getValue())
                        .append(" |\n");
            }
            sb.append('\n');
        }
        return sb.toString();
    }

    /** The parameter table for documentation: column, sense, window. */
    public static List<Map.Entry<String, String>> parameterTable(Kind kind) {
        List<Map.Entry<String, String>> out = new ArrayList<>();
        for (Param p : kind == Kind.SWITCH ? SWITCH : DRIVER) {
            String how = switch (p.sense()) {
                case SAME -> "must be equal";
                case HIGHER -> p.essential() ? "must be equal or higher" : "higher is better";
                case LOWER -> p.essential() ? "must be equal or lower" : "lower is better";
                case YES -> "yes is better";
                case WINDOW_RELATIVE -> "re-verify outside ±" + Eng.pct(p.window());
                case WINDOW_ABSOLUTE -> "re-verify outside ±" + Eng.num(p.window()) + " " + p.unit();
            };
            out.add(Map.entry(p.column(), how));
        }
        return out;
    }
}
