package org.gatefit.match;

import java.util.ArrayList;
import java.util.List;

/**
 * Runs every rule of DESIGN.md on driver–switch pairs. Both ways of running them — the full
 * evaluation with sentences, comparisons and figures ({@link #evaluate}) and the ranking of many
 * drivers on verdict and score alone ({@link Ranking}) — call each rule's one {@link PairRule#judge};
 * only the wording is left out while ranking.
 */
public final class Rules {
    /** The rules a pair is checked against, in the order checks are listed ({@code catalog} belongs to stage checks). */
    private static final Entry[] PAIR_RULES = {new Entry(Rule.DRIVE_CURRENT, new DriveCurrentRule()),
        new Entry(Rule.GATE_VOLTAGE, new GateVoltageRule()), new Entry(Rule.NEGATIVE_BIAS, new NegativeBiasRule()),
        new Entry(Rule.UVLO, new UvloRule()), new Entry(Rule.LOGIC_LEVEL, new LogicLevelRule()),
        new Entry(Rule.POLARITY, new PolarityRule()), new Entry(Rule.HIGH_SIDE, new HighSideRule()),
        new Entry(Rule.BOOTSTRAP, new BootstrapRule()), new Entry(Rule.DRIVER_POWER, new DriverPowerRule()),
        new Entry(Rule.DV_DT, new DvDtRule()), new Entry(Rule.GATE_RINGING, new GateRingingRule()),
        new Entry(Rule.PROTECTION, new ProtectionRule()), new Entry(Rule.LIFECYCLE, new LifecycleRule())};

    /** A rule's id (name, weight, description) and its implementation. */
    private record Entry(Rule id, PairRule rule) {
    }

    /** {@link #PAIR_RULES} as the ranking reads them, driver after driver: the rules and their weights in plain arrays. */
    private static final PairRule[] RANKED = new PairRule[PAIR_RULES.length];
    private static final int[] WEIGHTS = new int[PAIR_RULES.length];
    private static final Verdict[] VERDICTS = Verdict.values();
    private static final byte PASS = (byte) Verdict.PASS.ordinal();
    private static final byte FAIL = (byte) Verdict.FAIL.ordinal();
    /** The weights' total, what a ranking that runs every rule divides by. */
    private static final int TOTAL_WEIGHT;

    static {
        for (int i = 0; i < PAIR_RULES.length; i++) {
            RANKED[i] = PAIR_RULES[i].rule();
            WEIGHTS[i] = PAIR_RULES[i].id().weight();
        }
        TOTAL_WEIGHT = java.util.Arrays.stream(WEIGHTS).sum();
    }

    private Rules() {
    }

    /** All checks and figures of a pair. */
    public static PairResult evaluate(DriverPart d, SwitchPart s, OperatingPoint op, Margins m) {
        return evaluate(d, Question.of(s, op, m));
    }

    /** All checks and figures of a pair, with the switch side computed once ({@link Question}). */
    public static PairResult evaluate(DriverPart d, Question q) {
        String without = withoutFigures(q);
        PairFigures f = null;
        ShownFigures shown = null;
        if (without == null) {
            try {
                f = PairFigures.of(q, d);
            } catch (IllegalArgumentException | ArithmeticException e) {
                without = "cannot estimate: " + e.getMessage();
            }
        }
        if (f != null) {
            shown = new ShownFigures(f); // never throws: a shown figure its model refuses is left out
        }
        Outcome out = new Outcome();
        List<Check> checks = new ArrayList<>(PAIR_RULES.length);
        Verdict v = Verdict.PASS;
        double sum = 0;
        int w = 0;
        for (Entry e : PAIR_RULES) {
            String refused = judge(e.rule(), f, d, q, out);
            PairRule.Worded said = out.why() == Reason.Common.CANNOT_ESTIMATE
                    ? new PairRule.Worded(refused != null ? "cannot estimate: " + refused : without)
                    : f == null ? LifecycleRule.word(d, q.lifecycleSwitch(), (LifecycleRule.Why) out.why())
                    : e.rule().word(shown, out.why());
            checks.add(new Check(e.id(), out.verdict(), said.message(), said.compared(), out.score(),
                    out.open() ? out.why().asks() : null));
            v = v.and(out.verdict());
            sum += e.id().weight() * out.score();
            w += e.id().weight();
        }
        v = v.forPair();
        double score = Score.combine(sum, w, d.lifecycle().availability(d.stock()),
                q.s.lifecycle().availability(q.s.stock()), Score.supplyCost(q.op, d), v);
        return new PairResult(d.partNumber(), q.s.partNumber(), v, score, checks, shown == null ? List.of() : shown.figures(), q.op,
                q.m, Double.NaN);
    }

    /**
     * Why no pair of this question has figures, or null when they can be computed: the rules model
     * an n-type gate (on level positive against the source); a p-channel switch's gate drive is the
     * mirror image and is not modelled, so every electrical check says so.
     */
    private static String withoutFigures(Question q) {
        return q.s.nChannel() ? null : q.s.partNumber() + " is a p-channel switch; gatefit's rules model n-channel gate"
                + " drive only — check this pair by hand against both datasheets";
    }

    /**
     * The figures of a pair for ranking, computed into a ranking thread's {@code scratch}, or null
     * when the rules cannot compute them (every electrical rule unknown).
     */
    private static PairFigures figuresOrNull(Question q, DriverPart d, PairFigures scratch) {
        if (!q.s.nChannel()) {
            return null; // as withoutFigures says, without building its sentence for every driver
        }
        try {
            scratch.compute(q, d);
            return scratch;
        } catch (IllegalArgumentException | ArithmeticException e) {
            return null;
        }
    }

    /**
     * Judges one rule. Without figures (a p-channel switch, or a physics model that refused the
     * pair's values) every rule but the lifecycle is unknown; a rule whose own model refuses the
     * values is unknown too. Returns the model's refusal when the rule's own judgement was refused
     * (for the sentence), else null.
     */
    private static String judge(PairRule rule, PairFigures f, DriverPart d, Question q, Outcome out) {
        if (f == null) {
            if (rule instanceof LifecycleRule) {
                LifecycleRule.judge(d, q.lifecycleSwitch(), out); // needs the parts only
            } else {
                out.unknown(Reason.Common.CANNOT_ESTIMATE);
            }
            return null;
        }
        try {
            rule.judge(f, out);
            return null;
        } catch (IllegalArgumentException | ArithmeticException x) {
            out.unknown(Reason.Common.CANNOT_ESTIMATE);
            return x.getMessage();
        }
    }

    /** The prefilter of a question: every rule's declared certain failures ({@link PairRule#certainFailures}). */
    public static Prefilter prefilter(Question q) {
        if (!q.s.nChannel()) {
            return Prefilter.NONE; // every electrical check is unknown, so no driver is certain to fail
        }
        Prefilter.Builder b = new Prefilter.Builder();
        for (Entry e : PAIR_RULES) {
            e.rule().certainFailures(q, b);
        }
        return b.build();
    }

    /**
     * Verdicts and scores for one question, driver after driver (a ranker keeps one per thread;
     * each driver's figures are computed into the ranking's one scratch, so ranking allocates
     * nothing per driver). Not thread-safe.
     */
    public static final class Ranking {
        private final Question q;
        private final boolean scoreFailing;
        private final Outcome out = Outcome.forRanking();
        private final PairFigures scratch = PairFigures.scratch();
        // Ordinals, not references: written for every driver into this long-lived object (Outcome#keepWhy).
        private byte verdict = -1;
        private byte rankVerdict = -1;
        private double score;

        /** A ranking that scores every driver, failing ones included. */
        public Ranking(Question q) {
            this(q, true);
        }

        /**
         * @param scoreFailing whether a failing driver gets its score; when false, the rules after
         *                     the first that fails are not run (the verdict is fail whatever they
         *                     say) and {@link #score()} is NaN for it, for a shortlist that lists
         *                     no failing driver but counts them
         */
        public Ranking(Question q, boolean scoreFailing) {
            this.q = q;
            this.scoreFailing = scoreFailing;
        }

        /**
         * Ranks one driver; {@link #verdict()} and {@link #score()} then hold its outcome (the score
         * NaN for a failing driver when failing drivers are not scored).
         */
        public void rank(DriverPart d) {
            PairFigures f = figuresOrNull(q, d, scratch);
            // Ordinals: Verdict is ordered best to worst, so the worse of two is the larger (Verdict#and).
            int v = PASS;
            int rv = PASS;
            double sum = 0;
            for (int i = 0; i < RANKED.length; i++) {
                judge(RANKED[i], f, d, q, out);
                int ov = out.verdictOrdinal();
                v = Math.max(v, ov);
                if (!out.open()) {
                    rv = Math.max(rv, ov);
                }
                if (v == FAIL && !scoreFailing) {
                    verdict = FAIL;
                    rankVerdict = FAIL;
                    score = Double.NaN;
                    return;
                }
                sum += WEIGHTS[i] * out.score();
            }
            Verdict pair = VERDICTS[v].forPair();
            verdict = (byte) pair.ordinal();
            rankVerdict = (byte) VERDICTS[rv].forPair().ordinal();
            score = Score.combine(sum, TOTAL_WEIGHT, d.lifecycle().availability(d.stock()),
                    q.s.lifecycle().availability(q.s.stock()), Score.supplyCost(q.op, d), pair);
        }

        public Verdict verdict() {
            return verdict < 0 ? null : VERDICTS[verdict];
        }

        /** The verdict the driver ranks by: {@link #verdict()} with open questions left out ({@link PairResult#rankVerdict}). */
        public Verdict rankVerdict() {
            return rankVerdict < 0 ? null : VERDICTS[rankVerdict];
        }

        public double score() {
            return score;
        }
    }
}
