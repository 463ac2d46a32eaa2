package org.gatefit.match;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import org.gatefit.catalog.Kind;
import org.gatefit.catalog.RowCursor;

/**
 * Ranks the catalog's drivers for one switch at one operating point.
 *
 * <p>The catalog side may prefilter with {@link #prefilter}: only constraints that are exact and
 * always known (topology and supply range are required columns), so no driver is dropped because
 * a value is unknown. Everything else is decided by the rules, driver by driver.
 */
public final class Shortlist {

    /**
     * Best first: verdict (pass, warn, fail; open questions of the asker left out,
     * {@link PairResult#rankVerdict}), then score, then price (unknown last), then part number.
     */
    public static final Comparator<PairResult> RANKING = Comparator
            .comparing((PairResult r) -> r.rankVerdict().ordinal())
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
     * @param asked        the filters the user asked for ({@code topology = isolated}, {@code stock > 0}, …)
     * @param filteredOut  drivers the asked filters left out (a driver lacking the value included)
     * @param switchStatus the switch's own lifecycle and stock, said once; null when there is nothing to note
     */
    public record Result(SwitchPart switchPart, OperatingPoint point, Margins margins, List<PairResult> candidates,
                         int evaluated, int passing, int warning, int failing, int skipped, List<String> prefilter,
                         List<String> asked, int filteredOut, String switchStatus) {
        public Result {
            candidates = List.copyOf(candidates);
            prefilter = List.copyOf(prefilter);
            asked = List.copyOf(asked);
        }

        /**
         * Each operating-point value the listed drivers' checks wait for ({@link Check#notGiven}),
         * said once above the table: the option, the checks it leaves unknown and for how many of
         * the drivers listed, and that they are ranked on their other checks.
         */
        public List<String> notGiven() {
            java.util.Map<String, java.util.Map<String, Integer>> by = new java.util.TreeMap<>();
            for (PairResult p : candidates) {
                for (Check c : p.checks()) {
                    if (c.notGiven() != null) {
                        by.computeIfAbsent(c.notGiven(), k -> new java.util.LinkedHashMap<>()).merge(c.rule().id(), 1,
                                Integer::sum);
                    }
                }
            }
            List<String> out = new ArrayList<>();
            by.forEach((option, rules) -> {
                List<String> what = new ArrayList<>();
                rules.forEach((rule, n) -> what.add(rule + " (" + n + " of the " + candidates.size() + " listed)"));
                out.add("--" + option + ": " + String.join(", ", what) + " unknown without it — said once here, and"
                        + " those drivers are ranked on their other checks; give --" + option + " to settle it");
            });
            return out;
        }

        Result asked(List<String> conditions, int left) {
            return new Result(switchPart, point, margins, candidates, evaluated, passing, warning, failing, skipped,
                    prefilter, conditions, left, switchStatus);
        }
    }

    /** Counts the parts a scan hands it. */
    private static final class Count implements java.util.function.Consumer<RowCursor> {
        int n;

        @Override
        public void accept(RowCursor r) {
            n++;
        }
    }

    private Shortlist() {
    }

    /**
     * The shortlist engine: the prefilter (none with {@code all}, or for fewer than
     * {@link #PREFILTER_FROM} drivers), a column scan split over {@code threads} partitions, each
     * ranking its drivers on verdict and score, the partitions' best merged and worded in full.
     */
    public static Result run(PartSource parts, SwitchPart sw, OperatingPoint op, Margins m, int top, boolean all,
                             int threads) throws java.io.IOException {
        return run(parts, sw, op, m, top, all, threads, List.of());
    }

    /**
     * As above, over only the drivers meeting every condition of {@code asked} (the user's filters:
     * topology, in stock, price, maker), applied by the catalog always — with or without the rules'
     * prefilter — and returned with the result as what was asked. A driver lacking a filtered value
     * is left out (an unknown stock is not "in stock").
     */
    public static Result run(PartSource parts, SwitchPart sw, OperatingPoint op, Margins m, int top, boolean all,
                             int threads, List<Prefilter.Condition> asked) throws java.io.IOException {
        Question q = Question.ofShortlist(sw, op, m);
        int drivers = parts.count(Kind.DRIVER);
        Prefilter rules = all || drivers < PREFILTER_FROM ? Prefilter.NONE : prefilter(q);
        List<Prefilter.Condition> require = new ArrayList<>(asked);
        require.addAll(rules.require());
        Prefilter pre = new Prefilter(require, rules.exclude());
        Ranker template = new Ranker(q, top, all, rules.describe(), 0);
        List<Ranker> ranked = parts.scanColumns(Kind.DRIVER, pre, threads, template::sibling);
        int scanned = 0;
        for (Ranker r : ranked) {
            scanned += r.evaluated();
        }
        // The drivers the asked filters keep: all of them scanned when the rules skip none.
        int kept = drivers;
        if (!asked.isEmpty()) {
            kept = scanned;
            if (!rules.isEmpty()) {
                kept = 0;
                for (Count c : parts.scanColumns(Kind.DRIVER, new Prefilter(asked, List.of()), threads, Count::new)) {
                    kept += c.n;
                }
            }
        }
        List<String> said = new ArrayList<>();
        for (Prefilter.Condition c : asked) {
            said.add(c.toString());
        }
        // Without a prefilter every driver the filters keep is scanned, so skipped is 0.
        return Ranker.merge(ranked.isEmpty() ? List.of(template) : ranked, kept - scanned).result()
                .asked(said, drivers - kept);
    }

    /**
     * The prefilter for a question: the conditions under which the rules declare a driver certain
     * to fail ({@link Rules#prefilter}); each is checked against the rules by
     * {@code ShortlistPrefilterTest}.
     */
    public static Prefilter prefilter(Question q) {
        return Rules.prefilter(q);
    }

    /**
     * Catalogs with fewer drivers than this are evaluated driver by driver without a prefilter:
     * building and running the query costs more than evaluating a few hundred drivers (it loads
     * a good part of Lucene's query classes on a cold start), and the counts then cover every
     * failure by rule.
     */
    public static final int PREFILTER_FROM = 2_000;

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

    /** A driver with the verdict it ranks by and its score, before its checks are worded. */
    private record Ranked(DriverPart driver, Verdict verdict, double score) {
    }

    /**
     * Streams drivers through the rules and keeps only the best {@code top} (a bounded heap), so
     * memory does not grow with the catalog. A catalog scan split across threads gives each
     * partition its own ranker ({@link #sibling}); {@link #merge} joins them.
     */
    public static final class Ranker implements java.util.function.Consumer<RowCursor> {
        private final Question prepared;
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
            final Rules.Ranking ranking;
            int pass;
            int warn;
            int fail;

            Tally(Question p, boolean all) {
                ranking = new Rules.Ranking(p, all); // failing drivers are only counted unless all are listed
            }
        }

        /**
         * @param skipped drivers the catalog skipped by the prefilter (each certain to fail), for the counts
         */
        public Ranker(Question prepared, int top, boolean all, List<String> prefilterUsed, int skipped) {
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
            Verdict rank = t.ranking.rankVerdict();
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
                if (compare(rank, qs, d, worst.verdict(), worst.score(), worst.driver()) >= 0) {
                    return; // decided before allocating: most drivers end here once the heap is full
                }
            }
            keep(new Ranked(d, rank, qs));
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
                out.add(Rules.evaluate(x.driver(), prepared).withPrice(x.driver().price()));
            }
            out.sort(RANKING);
            return new Result(prepared.switchPart(), prepared.point(), prepared.margins(), out, evaluated(), passing(),
                    warning(), failing(), skipped, prefilterUsed, List.of(), 0,
                    prepared.switchStatusApart ? LifecycleRule.switchStatus(prepared.switchPart()) : null);
        }
    }
}
