package org.gatefit.match;

/**
 * Where a rule leaves its judgement of one pair: verdict, reason and sub-score. One is kept per
 * ranking thread and reused for every rule and driver, so judging allocates nothing; the
 * sub-score of each verdict is computed here from the rule's margin, in one place ({@link Score}).
 */
final class Outcome {
    private static final Verdict[] VERDICTS = Verdict.values();
    /**
     * Whether the reason is kept: the full evaluation words it; a ranking needs only the verdict,
     * whether it is open and the sub-score. A ranking thread's outcome is written thirteen times for
     * every driver, and with the default collector (G1) each store of a reference into it, a
     * long-lived object, runs a write barrier with a memory fence; primitives run none
     * (docs/PERFORMANCE.md, 3 December).
     */
    private final boolean keepWhy;
    /** The verdict's ordinal, −1 before the first judgement. */
    private byte verdict = -1;
    private boolean open;
    private Reason why;
    private double score;

    /** An outcome that keeps the reason, for a judgement that is worded. */
    Outcome() {
        this(true);
    }

    private Outcome(boolean keepWhy) {
        this.keepWhy = keepWhy;
    }

    /** An outcome for ranking: verdict, open or not, and sub-score; {@link #why} is not kept. */
    static Outcome forRanking() {
        return new Outcome(false);
    }

    Verdict verdict() {
        return verdict < 0 ? null : VERDICTS[verdict];
    }

    /** The reason of the last judgement (not kept by an outcome {@link #forRanking}). */
    Reason why() {
        if (!keepWhy) {
            throw new IllegalStateException("a ranking's outcome keeps no reason; judge with new Outcome() to word it");
        }
        return why;
    }

    /** {@link #verdict()}'s ordinal, for a ranking that compares verdicts as numbers. */
    int verdictOrdinal() {
        return verdict;
    }

    double score() {
        return score;
    }

    /** A pass with {@code excess} margin beyond the limit (relative; saturates at 1). */
    void pass(Reason r, double excess) {
        set(Verdict.PASS, r, Score.pass(excess));
    }

    /** A warning, {@code towardPass} of the way from the fail edge (0) to the pass edge (1). */
    void warn(Reason r, double towardPass) {
        set(Verdict.WARN, r, Score.warn(towardPass));
    }

    void fail(Reason r) {
        set(Verdict.FAIL, r, 0);
    }

    /** Unknown: the parts' data are missing, or ({@link Reason#asks}) a value the asker did not give. */
    void unknown(Reason r) {
        set(Verdict.UNKNOWN, r, r.asks() == null ? Score.UNKNOWN : Score.OPEN);
    }

    /** Whether the verdict is an open question of the asker ({@link Reason#asks}), not of the parts. */
    boolean open() {
        return open;
    }

    private void set(Verdict v, Reason r, double s) {
        verdict = (byte) v.ordinal();
        open = v == Verdict.UNKNOWN && r.asks() != null;
        if (keepWhy) {
            why = r;
        }
        score = s;
    }
}
