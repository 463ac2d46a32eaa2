package org.gatefit.match;

/**
 * The ranking score of a pair, in [0,1], built so a person can follow it:
 * <ol>
 *   <li>each rule gives a sub-score from its margin: a pass scores 0.7 to 1.0, rising with the
 *       margin beyond the pass limit and saturating (more margin than needed earns nothing more);
 *       a warning 0.35 to 0.65; an unknown 0.4; a failure 0;</li>
 *   <li>the electrical score is the weighted mean of the sub-scores (weights: drive-current and
 *       gate-voltage 3, uvlo and high-side 2, the others 1);</li>
 *   <li>it is multiplied by availability: lifecycle (active 1, preview 0.9, nrnd 0.8, ltb 0.7,
 *       unknown 0.85, obsolete 0.3) times stock (0.8 when out of stock) for each part;</li>
 *   <li>a failing pair's score is capped at 0.25, so it ranks below every working pair.</li>
 * </ol>
 * Price is not in the score; it only breaks ties in ranking.
 */
public final class Score {
    static final double UNKNOWN = 0.4;
    static final double FAIL_CAP = 0.25;

    private Score() {
    }

    /** Sub-score of a pass, rising from 0.7 with {@code excess} (margin beyond the limit, relative) to 1.0 at 1. */
    static double pass(double excess) {
        double x = Double.isNaN(excess) ? 0 : Math.max(0, Math.min(1, excess));
        return 0.7 + 0.3 * x;
    }

    /** Sub-score of a warning, from 0.35 at the fail edge to 0.65 at the pass edge. */
    static double warn(double towardPass) {
        double x = Double.isNaN(towardPass) ? 0.5 : Math.max(0, Math.min(1, towardPass));
        return 0.35 + 0.3 * x;
    }

    /**
     * The score from the weighted sum of sub-scores, the weights' total and both parts' availability
     * factors ({@link Lifecycle#availability}): steps 2 to 4 above.
     */
    static double combine(double sum, double w, double driverAvailability, double switchAvailability, Verdict pair) {
        double electrical = w == 0 ? 0 : sum / w;
        double score = electrical * driverAvailability * switchAvailability;
        if (pair == Verdict.FAIL) {
            score = Math.min(score, FAIL_CAP);
        }
        return Math.max(0, Math.min(1, score));
    }
}
