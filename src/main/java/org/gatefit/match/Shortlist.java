package org.gatefit.match;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import org.gatefit.catalog.RowCursor;

/**
 * Ranks the catalog's drivers for one switch at one operating point.
 *
 * <p>The catalog side may prefilter with {@link #prefilter}: only constraints that are exact and
 * always known (topology and supply range are required columns), so no driver is dropped because
 * a value is unknown. Everything else is decided by the rules, driver by driver.
 */
public final class Shortlist {

    /** Best first: verdict (pass, warn, fail), then score, then price (unknown last), then part number. */
    public static final Comparator<PairResult> RANKING = Comparator
            .comparing((PairResult r) -> r.verdict().ordinal())
            .thenComparing(Comparator.comparingDouble(PairResult::score).reversed())
            .thenComparingDouble(r -> Double.isNaN(r.priceTieBreak()) ? Double.MAX_VALUE : r.priceTieBreak())
            .thenComparing(PairResult::driver);

    /**
     * @param switchPart   the switch
     * @param point        the operating point after defaults
     * @param margins      the margins applied
     * @param candidates   ranked pairs, best first ({@code top} of them, failing ones only with --all)
     * @param evaluated    drivers evaluated
     * @param passing      of those, how many pass
     * @param warning      how many warn
     * @param failing      how many fail
     * @param skipped      drivers the prefilter skipped without evaluating (each certain to fail)
     * @param prefilter    the catalog conditions used to skip drivers that must fail
     */
    public record Result(SwitchPart switchPart, OperatingPoint point, Margins margins, List<PairResult> candidates,
                         int evaluated, int passing, int warning, int failing, int skipped, List<String> prefilter) {
        public Result {
            candidates = List.copyOf(candidates);
            prefilter = List.copyOf(prefilter);
        }
    }

    private Shortlist() {
    }

    /**
     * Catalogs with fewer drivers than this are evaluated driver by driver without a prefilter:
     * building and running the query costs more than evaluating a few hundred drivers (it loads
     * a good part of Lucene's query classes on a cold start), and the counts then cover every
     * failure by rule.
     */
    public static final int PREFILTER_FROM = 2_000;

    /**
     * What the catalog may skip without evaluating: drivers that a rule is certain to fail on
     * values they have (never on a value they lack).
     *
     * @param require conditions every driver left must meet ({@code column op value}, as {@code find --where})
     * @param exclude groups of conditions: a driver meeting every condition of a group is skipped
     */
    public record Prefilter(List<String> require, List<Exclusion> exclude) {
        public Prefilter {
            require = List.copyOf(require);
            exclude = List.copyOf(exclude);
        }

        /** No prefilter: every driver is evaluated (p-channel switches, {@code --all}). */
        public static final Prefilter NONE = new Prefilter(List.of(), List.of());

        /** One line per condition, as printed with the results. */
        public List<String> describe() {
            List<String> out = new ArrayList<>(require);
            for (Exclusion e : exclude) {
                List<String> parts = new ArrayList<>(e.when());
                for (String k : e.known()) {
                    parts.add(k + " known");
                }
                if (e.text() != null) {
                    parts.add(e.text().says());
                }
                out.add("skip " + String.join(" and ", parts) + " (" + e.rule().id() + " fails)");
            }
            return out;
        }
    }

    /**
     * Drivers meeting every condition of {@code when}, with values in the {@code known} columns and
     * passing {@code text} (null: no text test), fail {@code rule}.
     */
    public record Exclusion(Rule rule, List<String> when, List<String> known, TextTest text) {
        public Exclusion {
            when = List.copyOf(when);
            known = List.copyOf(known);
        }

        Exclusion(Rule rule, List<String> when) {
            this(rule, when, List.of(), null);
        }
    }

    /**
     * A test of a text column's value as written.
     *
     * @param says how it reads in the printed prefilter
     */
    public record TextTest(String column, String says, java.util.function.Predicate<String> test) {
    }

    /**
     * The prefilter for a question: conditions on a driver's own values that make one of the
     * rules fail, whatever its other values (each is checked against the rules by
     * {@code ShortlistPrefilterTest}). A p-channel switch gets none (its electrical checks are
     * unknown, so no driver is certain to fail).
     */
    public static Prefilter prefilter(PairEvaluator.Prepared p) {
        SwitchPart s = p.switchPart();
        OperatingPoint op = p.point();
        Margins m = p.margins();
        if (!s.nChannel()) {
            return Prefilter.NONE;
        }
        List<String> require = new ArrayList<>();
        List<Exclusion> exclude = new ArrayList<>();
        if (op.highSide()) {
            require.add("topology != low-side");                    // high-side: cannot float
        }
        if (!Double.isNaN(s.vGsMax())) {                              // gate-voltage: supply range
            require.add("v_supply_max_v >= " + down(op.swing()));
            require.add("v_supply_min_v <= " + up(op.swing()));
        }
        double iReq = p.currentRequired();
        if (!Double.isNaN(iReq) && iReq > 0) {
            // drive-current: the peak through the loop never exceeds the rated peak, and a ratio
            // below 1 (or below the margin, when the margin is under 1) fails.
            String need = down(iReq * Math.min(1, m.driveCurrent()));
            require.add("i_source_a >= " + need);
            require.add("i_sink_a >= " + need);
        }
        if (op.highSide() && !Double.isNaN(op.bus())) {
            String bus = down(op.bus());
            exclude.add(new Exclusion(Rule.HIGH_SIDE, List.of("topology = high-side", "v_offset_max_v < " + bus)));
            exclude.add(new Exclusion(Rule.HIGH_SIDE, List.of("topology = half-bridge", "v_offset_max_v < " + bus)));
            exclude.add(new Exclusion(Rule.HIGH_SIDE, List.of("topology = isolated", "isolation_vrms < " + bus)));
        }
        exclude.add(new Exclusion(Rule.UVLO, List.of("uvlo_on_v > " + up(op.swing()))));
        if (op.vDriveNeg() < 0 && !Double.isNaN(s.vGsMin()) && op.vDriveNeg() >= s.vGsMin()) {
            exclude.add(new Exclusion(Rule.NEGATIVE_BIAS, List.of("v_neg_min_v > " + up(op.vDriveNeg()))));
        }
        // logic-level: with both thresholds known, a negative noise margin or an input maximum below
        // the controller's high level fails.
        if (Double.isFinite(op.vOh())) {
            exclude.add(new Exclusion(Rule.LOGIC_LEVEL, List.of("v_ih_v > " + up(op.vOh())),
                    List.of("v_il_v"), null));
        }
        if (Double.isFinite(op.vOl())) {
            exclude.add(new Exclusion(Rule.LOGIC_LEVEL, List.of("v_il_v < " + down(op.vOl())),
                    List.of("v_ih_v"), null));
        }
        if (Double.isFinite(op.vOhMax())) {
            exclude.add(new Exclusion(Rule.LOGIC_LEVEL, List.of("v_in_max_v < " + down(op.vOhMax())),
                    List.of("v_ih_v", "v_il_v"), null));
        }
        // polarity: no channel of the PWM's sense.
        boolean wantInverting = !op.activeHigh();
        String sense = wantInverting ? "inverting" : "non-inverting";
        exclude.add(new Exclusion(Rule.POLARITY, List.of(), List.of(), new TextTest("input_polarity",
                "input_polarity without a " + sense + " channel", t -> !DriverPart.offers(t, wantInverting))));
        exclude.add(new Exclusion(Rule.LIFECYCLE, List.of("lifecycle = obsolete")));
        return new Prefilter(require, exclude);
    }

    /**
     * A limit for a condition that skips values below it, written with four significant digits and
     * rounded down: it can only skip fewer drivers than the exact limit, never one the rules pass.
     */
    public static String down(double x) {
        return limit(x, java.math.RoundingMode.FLOOR);
    }

    /** The same for a condition that skips values above the limit: rounded up. */
    public static String up(double x) {
        return limit(x, java.math.RoundingMode.CEILING);
    }

    /** A short number as it is (it reads back as the same double); a long one rounded to four digits. */
    private static String limit(double x, java.math.RoundingMode mode) {
        java.math.BigDecimal shortest = java.math.BigDecimal.valueOf(x).stripTrailingZeros();
        if (shortest.precision() <= 6) {
            return shortest.toPlainString();
        }
        return new java.math.BigDecimal(x).round(new java.math.MathContext(4, mode)).stripTrailingZeros().toPlainString();
    }

    /** Best first, as {@link #RANKING} orders the full results: verdict, score, price (unknown last), part number. */
    private static int compare(Verdict av, double as, DriverPart a, Verdict bv, double bs, DriverPart b) {
        int c = Integer.compare(av.ordinal(), bv.ordinal());
        if (c != 0) {
            return c;
        }
        c = Double.compare(bs, as);
        if (c != 0) {
            return c;
        }
        double ap = Double.isNaN(a.price()) ? Double.MAX_VALUE : a.price();
        double bp = Double.isNaN(b.price()) ? Double.MAX_VALUE : b.price();
        c = Double.compare(ap, bp);
        return c != 0 ? c : a.partNumber().compareTo(b.partNumber());
    }

    private static final Comparator<Ranked> RANKED = (x, y) -> compare(x.verdict(), x.score(), x.driver(), y.verdict(),
            y.score(), y.driver());

    /** A driver with its verdict and score, before its checks are worded. */
    private record Ranked(DriverPart driver, Verdict verdict, double score) {
    }

    /**
     * Streams drivers through the rules and keeps only the best {@code top} (a bounded heap), so
     * memory does not grow with the catalog. A catalog scan split across threads gives each
     * partition its own ranker ({@link #sibling}); {@link #merge} joins them.
     */
    public static final class Ranker implements java.util.function.Consumer<RowCursor> {
        private final PairEvaluator.Prepared prepared;
        private final int top;
        private final boolean all;
        private final List<String> prefilterUsed;
        private final int skipped;
        private final java.util.PriorityQueue<Ranked> best;
        /**
         * What a partition writes for every driver, allocated by the thread that ranks (on first
         * use): rankers of one scan are made together on one thread, and state written per driver
         * in neighbouring objects would share cache lines between the cores.
         */
        private Tally tally;
        private int pass;
        private int warn;
        private int fail;

        private static final class Tally {
            final PairEvaluator.Ranking ranking;
            int pass;
            int warn;
            int fail;

            Tally(PairEvaluator.Prepared p, boolean all) {
                ranking = new PairEvaluator.Ranking(p, all); // failing drivers are only counted unless all are listed
            }
        }

        /**
         * @param skipped drivers the catalog skipped by the prefilter (each certain to fail), for the counts
         */
        public Ranker(PairEvaluator.Prepared prepared, int top, boolean all, List<String> prefilterUsed, int skipped) {
            if (top < 1) {
                throw new IllegalArgumentException("expected --top of at least 1, got " + top);
            }
            this.prepared = prepared;
            this.top = top;
            this.all = all;
            this.prefilterUsed = List.copyOf(prefilterUsed);
            this.skipped = skipped;
            this.best = new java.util.PriorityQueue<>(Math.min(top, 1024) + 1, RANKED.reversed());
        }

        /** Drivers ranked so far. */
        public int evaluated() {
            return passing() + warning() + failing();
        }

        private int passing() {
            return pass + (tally == null ? 0 : tally.pass);
        }

        private int warning() {
            return warn + (tally == null ? 0 : tally.warn);
        }

        private int failing() {
            return fail + (tally == null ? 0 : tally.fail);
        }

        /** A ranker for another partition of the same scan. */
        public Ranker sibling() {
            return new Ranker(prepared, top, all, prefilterUsed, 0);
        }

        @Override
        public void accept(RowCursor r) {
            DriverPart d = DriverPart.of(r);
            if (d != null) {
                accept(d);
            }
        }

        /** Ranks one driver. */
        public void accept(DriverPart d) {
            Tally t = tally;
            if (t == null) {
                t = new Tally(prepared, all);
                tally = t;
            }
            t.ranking.rank(d);
            Verdict qv = t.ranking.verdict();
            double qs = t.ranking.score();
            switch (qv) {
                case PASS -> t.pass++;
                case WARN, UNKNOWN -> t.warn++;
                case FAIL -> t.fail++;
            }
            if (!all && qv == Verdict.FAIL) {
                return;
            }
            if (best.size() == top) {
                Ranked worst = best.peek();
                if (compare(qv, qs, d, worst.verdict(), worst.score(), worst.driver()) >= 0) {
                    return; // decided before allocating: most drivers end here once the heap is full
                }
            }
            keep(new Ranked(d, qv, qs));
        }

        /** Adds to the best {@code top}, dropping the worst when full. */
        private void keep(Ranked x) {
            if (best.size() < top) {
                best.add(x);
            } else if (RANKED.compare(x, best.peek()) < 0) {
                best.poll();
                best.add(x);
            }
        }

        /** The rankers of all partitions as one (this one's settings, everyone's drivers). */
        public static Ranker merge(List<Ranker> parts, int skipped) {
            if (parts.isEmpty()) {
                throw new IllegalArgumentException("expected at least one ranker, got none");
            }
            Ranker first = parts.get(0);
            Ranker all = new Ranker(first.prepared, first.top, first.all, first.prefilterUsed, skipped);
            for (Ranker r : parts) {
                all.pass += r.passing();
                all.warn += r.warning();
                all.fail += r.failing();
                r.best.forEach(all::keep);
            }
            return all;
        }

        /** The best drivers, best first, each evaluated in full (sentences, comparisons, figures). */
        public Result result() {
            List<PairResult> out = new ArrayList<>(best.size());
            for (Ranked x : best) {
                out.add(PairEvaluator.evaluate(x.driver(), prepared).withPrice(x.driver().price()));
            }
            out.sort(RANKING);
            return new Result(prepared.switchPart(), prepared.point(), prepared.margins(), out, evaluated(), passing(),
                    warning(), failing(), skipped, prefilterUsed);
        }
    }
}
