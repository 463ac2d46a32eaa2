package org.gatefit.match;

/**
 * Where a rule leaves its judgement of one pair: verdict, reason and sub-score. One is kept per
 * ranking thread and reused for every rule and driver, so judging allocates nothing; the
 * sub-score of each verdict is computed here from the rule's margin, in one place ({@link Score}).
 */
final class Outcome {
    private Verdict verdict;
    private Reason why;
    private double score;

    Verdict verdict() {
        return verdict;
    }

    Reason why() {
        return why;
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
        return verdict == Verdict.UNKNOWN && why.asks() != null;
    }

    private void set(Verdict v, Reason r, double s) {
        verdict = v;
        why = r;
        score = s;
    }
}
