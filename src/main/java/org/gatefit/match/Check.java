package org.gatefit.match;

import java.util.List;
import java.util.Objects;

/**
 * The outcome of one rule for one pair.
 *
 * @param rule     which rule
 * @param verdict  pass, warn, fail or unknown
 * @param message  one sentence a person can act on
 * @param compared the figures and limits it compared
 * @param score    sub-score in [0,1] from the margin (saturating; 0 for a failure)
 * @param notGiven for an unknown that waits only for an operating-point value the asker did not
 *                 give, that option without its dashes ({@code duty-max}, {@code bus}); else null
 */
public record Check(Rule rule, Verdict verdict, String message, List<Comparison> compared, double score,
                    String notGiven) {
    /** A check the parts' data decide. */
    public Check(Rule rule, Verdict verdict, String message, List<Comparison> compared, double score) {
        this(rule, verdict, message, compared, score, null);
    }

    public Check {
        Objects.requireNonNull(rule, "rule");
        Objects.requireNonNull(verdict, "verdict");
        Objects.requireNonNull(message, "message");
        compared = List.copyOf(compared);
        if (!(score >= 0 && score <= 1)) {
            throw new IllegalArgumentException("expected a score in [0,1], got " + score);
        }
        if (notGiven != null && verdict != Verdict.UNKNOWN) {
            throw new IllegalArgumentException("expected an unknown verdict for a check waiting for " + notGiven + ", got "
                    + verdict);
        }
    }

    /**
     * One comparison: {@code value relation limit}, e.g. 1.9 A ≥ 3.9 A.
     *
     * @param quantity what was compared
     * @param value    the pair's value (SI; NaN when unknown)
     * @param relation {@code ≥}, {@code ≤}, {@code =}
     * @param limit    the limit it was held to (SI; NaN when unknown)
     * @param unit     SI unit
     */
    public record Comparison(String quantity, double value, String relation, double limit, String unit) {
        public Comparison {
            Objects.requireNonNull(quantity, "quantity");
            Objects.requireNonNull(relation, "relation");
            Objects.requireNonNull(unit, "unit");
        }
    }
}
