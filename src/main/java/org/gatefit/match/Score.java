package org.gatefit.match;

/**
 * The ranking score of a pair, in [0,1], built so a person can follow it:
 * <ol>
 *   <li>each rule gives a sub-score from its margin: a pass scores 0.7 to 1.0, rising with the
 *       margin beyond the pass limit and saturating (more margin than needed earns nothing more);
 *       a warning 0.35 to 0.65; an unknown 0.4 — but {@link #OPEN} when only an operating-point value
 *       the asker did not give is missing ({@link Reason#asks}); a failure 0;</li>
 *   <li>the electrical score is the weighted mean of the sub-scores (weights: drive-current and
 *       gate-voltage 3, uvlo and high-side 2, the others 1);</li>
 *   <li>it is multiplied by availability: lifecycle (active 1, preview 0.9, nrnd 0.8, ltb 0.7,
 *       unknown 0.85, obsolete 0.3) times stock (0.8 when out of stock) for each part;</li>
 *   <li>it is multiplied by what the choice costs the design ({@link #supplyCost}): a high side
 *       whose driver needs its own isolated supply {@link #ISOLATED_SUPPLY};</li>
 *   <li>a failing pair's score is capped at 0.25, so it ranks below every working pair.</li>
 * </ol>
 * Price is not in the score; it only breaks ties in ranking.
 */
public final class Score {
    static final double UNKNOWN = 0.4;
    /**
     * Sub-score of an open question ({@link Reason#asks}): a bare pass, no margin credited, so the
     * driver ranks on its other checks until the value is given.
     */
    static final double OPEN = 0.7;
    /**
     * The cost factor of a high side whose driver needs its own isolated supply (an isolated
     * DC-DC converter or a transformer winding per high side, its parts, area and isolation barrier)
     * where a bootstrapped driver needs a capacitor and a diode: ×0.9, a judgement (common
     * practice, no source). Enough to rank a bootstrapped driver first when both work with
     * similar margins, not enough to put a thin one above a sound isolated one.
     */
    static final double ISOLATED_SUPPLY = 0.9;
    static final double FAIL_CAP = 0.25;

    private Score() {
    }

    /** Sub-score of a pass, rising from 0.7 with {@code excess} (margin beyond the limit, relative) to 1.0 at 1. */
    static double pass(double excess) {
        double x = excess >= 1 ? 1 : excess > 0 ? excess : 0; // NaN: 0
        return 0.7 + 0.3 * x;
    }

    /** Sub-score of a warning, from 0.35 at the fail edge to 0.65 at the pass edge. */
    static double warn(double towardPass) {
        double x = towardPass >= 1 ? 1 : towardPass > 0 ? towardPass : towardPass <= 0 ? 0 : 0.5; // NaN: 0.5
        return 0.35 + 0.3 * x;
    }

    /** What the driver's supply costs the design at this point: {@link #ISOLATED_SUPPLY} for an isolated high side, else 1. */
    static double supplyCost(OperatingPoint op, DriverPart d) {
        return op.highSide() && d.topology().floats() && !d.topology().bootstrapped() ? ISOLATED_SUPPLY : 1;
    }

    /**
     * The score from the weighted sum of sub-scores, the weights' total and both parts' availability
     * factors ({@link Lifecycle#availability}) and the supply cost ({@link #supplyCost}): steps 2 to 5 above.
     */
    static double combine(double sum, double w, double driverAvailability, double switchAvailability, double supplyCost,
            Verdict pair) {
        double electrical = w == 0 ? 0 : sum / w;
        double score = electrical * driverAvailability * switchAvailability * supplyCost;
        if (pair == Verdict.FAIL) {
            score = Math.min(score, FAIL_CAP);
        }
        return Math.max(0, Math.min(1, score));
    }
}
