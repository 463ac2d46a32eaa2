package org.gatefit.match;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.util.function.Consumer;

/**
 * One pair built from the baseline of {@link Parts} and changed by three consumers, evaluated by
 * {@link Rules#evaluate}, and the assertions the per-rule tests share (verdict, sub-score, the
 * sentence's numbers, the comparisons). The sub-scores follow {@link Score}: a pass scores
 * 0.7 + 0.3·excess, a warning 0.35 + 0.3·towardPass (both clamped to [0, 1] first), an unknown 0.4
 * (0.7 when it waits for an operating-point value), a failure 0.
 */
final class RuleCase {
    private RuleCase() {
    }

    static final Consumer<Parts.Sw> S0 = s -> { };
    static final Consumer<Parts.Dr> D0 = d -> { };
    static final Consumer<OperatingPoint.Spec> O0 = o -> { };

    /** The check of {@code rule} for the baseline pair changed by {@code s}, {@code d} and {@code o}, default margins. */
    static Check check(Rule rule, Consumer<Parts.Sw> s, Consumer<Parts.Dr> d, Consumer<OperatingPoint.Spec> o) {
        return check(rule, Margins.DEFAULT, s, d, o);
    }

    static Check check(Rule rule, Margins m, Consumer<Parts.Sw> s, Consumer<Parts.Dr> d, Consumer<OperatingPoint.Spec> o) {
        return result(m, s, d, o).check(rule).orElseThrow();
    }

    static PairResult result(Margins m, Consumer<Parts.Sw> s, Consumer<Parts.Dr> d, Consumer<OperatingPoint.Spec> o) {
        Parts.Sw sw = Parts.sw();
        Parts.Dr dr = Parts.dr();
        OperatingPoint.Spec op = Parts.op();
        s.accept(sw);
        d.accept(dr);
        o.accept(op);
        return Parts.eval(sw, dr, op, m);
    }

    /** Pass sub-score for a relative excess (Score.pass: 0.7 + 0.3·clamp(excess, 0, 1)). */
    static double pass(double excess) {
        return 0.7 + 0.3 * Math.max(0, Math.min(1, excess));
    }

    /** Warning sub-score for a fraction of the way to the pass edge (Score.warn: 0.35 + 0.3·clamp(x, 0, 1)). */
    static double warn(double towardPass) {
        return 0.35 + 0.3 * Math.max(0, Math.min(1, towardPass));
    }

    /** Verdict and sub-score (to 1e-9). */
    static void verdict(Check c, Verdict v, double score) {
        assertEquals(v, c.verdict(), () -> c.rule() + ": " + c.message());
        assertEquals(score, c.score(), 1e-9, () -> c.rule() + " sub-score: " + c.message());
    }

    /** The sentence holds every fragment (the numbers as the rule formats them, Eng). */
    static void says(Check c, String... fragments) {
        for (String f : fragments) {
            assertTrue(c.message().contains(f), () -> c.rule() + " should say '" + f + "': " + c.message());
        }
    }

    /** The sentence holds none of the fragments. */
    static void saysNot(Check c, String... fragments) {
        for (String f : fragments) {
            assertTrue(!c.message().contains(f), () -> c.rule() + " should not say '" + f + "': " + c.message());
        }
    }

    /** A comparison of that quantity, relation, value and limit (relative 1e-6; NaN matches NaN) is listed. */
    static void compared(Check c, String quantity, double value, String relation, double limit) {
        for (Check.Comparison k : c.compared()) {
            if (k.quantity().equals(quantity) && k.relation().equals(relation)) {
                assertClose(value, k.value(), c + " value of " + quantity);
                assertClose(limit, k.limit(), c + " limit of " + quantity);
                return;
            }
        }
        fail(c.rule() + " should compare '" + quantity + "' " + relation + ": " + c.compared());
    }

    /** No comparison of that quantity is listed. */
    static void notCompared(Check c, String quantity) {
        for (Check.Comparison k : c.compared()) {
            assertTrue(!k.quantity().equals(quantity), () -> c.rule() + " should not compare '" + quantity + "': "
                    + c.compared());
        }
    }

    static void assertClose(double expected, double actual, String what) {
        if (Double.isNaN(expected)) {
            assertTrue(Double.isNaN(actual), () -> what + ": expected NaN, got " + actual);
            return;
        }
        assertEquals(expected, actual, Math.max(1e-12, Math.abs(expected) * 1e-6), what);
    }
}
