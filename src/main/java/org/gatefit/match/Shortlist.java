package org.gatefit.match;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import org.gatefit.catalog.Numbers;
import org.gatefit.catalog.Row;

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
     * @param prefilter    the catalog conditions used to skip drivers that must fail
     */
    public record Result(SwitchPart switchPart, OperatingPoint point, Margins margins, List<PairResult> candidates,
                         int evaluated, int passing, int warning, int failing, List<String> prefilter) {
        public Result {
            candidates = List.copyOf(candidates);
            prefilter = List.copyOf(prefilter);
        }
    }

    private Shortlist() {
    }

    /**
     * Catalog conditions ({@code column op value}, as {@code find --where} takes them) that only
     * remove drivers certain to fail: a low-side driver for a high-side switch, and a supply range
     * that excludes the swing.
     */
    public static List<String> prefilter(OperatingPoint op) {
        List<String> c = new ArrayList<>();
        if (op.highSide()) {
            c.add("topology != low-side");
        }
        String swing = Numbers.format(op.swing());
        c.add("v_supply_max_v >= " + swing);
        c.add("v_supply_min_v <= " + swing);
        return c;
    }

    /**
     * Streams drivers through the rules and keeps only the best {@code top} (a bounded heap), so
     * memory does not grow with the catalog.
     */
    public static final class Ranker implements java.util.function.Consumer<Row> {
        private final SwitchPart sw;
        private final OperatingPoint op;
        private final Margins m;
        private final int top;
        private final boolean all;
        private final List<String> prefilterUsed;
        private final java.util.PriorityQueue<Ranked> best;
        private int pass;
        private int warn;
        private int fail;

        public Ranker(SwitchPart sw, OperatingPoint op, Margins m, int top, boolean all, List<String> prefilterUsed) {
            if (top < 1) {
                throw new IllegalArgumentException("expected --top of at least 1, got " + top);
            }
            this.sw = sw;
            this.op = op;
            this.m = m;
            this.top = top;
            this.all = all;
            this.prefilterUsed = List.copyOf(prefilterUsed);
            this.best = new java.util.PriorityQueue<>(Math.min(top, 1024) + 1,
                    java.util.Comparator.comparing(Ranked::result, RANKING).reversed());
        }

        /** A driver with its verdict and score, before its checks are worded. */
        private record Ranked(DriverPart driver, PairResult result) {
        }

        @Override
        public void accept(Row r) {
            DriverPart d = DriverPart.of(r);
            PairResult pr = PairEvaluator.rank(d, sw, op, m).withPrice(d.price());
            switch (pr.verdict()) {
                case PASS -> pass++;
                case WARN, UNKNOWN -> warn++;
                case FAIL -> fail++;
            }
            if (!all && pr.verdict() == Verdict.FAIL) {
                return;
            }
            best.add(new Ranked(d, pr));
            if (best.size() > top) {
                best.poll();
            }
        }

        /** The best drivers, best first, each evaluated in full (sentences, comparisons, figures). */
        public Result result() {
            List<PairResult> out = new ArrayList<>(best.size());
            for (Ranked x : best) {
                out.add(PairEvaluator.evaluate(x.driver(), sw, op, m).withPrice(x.driver().price()));
            }
            out.sort(RANKING);
            return new Result(sw, op, m, out, pass + warn + fail, pass, warn, fail, prefilterUsed);
        }
    }
}
