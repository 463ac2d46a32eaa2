package org.gatefit.match;

/**
 * Why a rule judged a pair as it did: each rule has its own enum of reasons. The rule chooses the
 * reason and the verdict together ({@link Outcome}); the sentence is worded later from the reason
 * and the pair's figures ({@link PairRule#word}) by an exhaustive switch.
 */
interface Reason {
    /**
     * The operating-point option whose absence alone makes this reason's verdict unknown (without
     * its dashes: {@code duty-max}, {@code bus}), or null when the parts' data decide it. Such an
     * unknown is an open question of the asker, not a defect of the part: it is shown as unknown
     * (never pass), scores {@link Score#OPEN} and does not lower the pair's rank
     * ({@link PairResult#rankVerdict}), so a bootstrapped driver is not ranked below an isolated one
     * only because the duty was not given.
     */
    default String asks() {
        return null;
    }

    /** The reason of a rule whose figures a physics model refused (out of its domain): unknown. */
    enum Common implements Reason {
        CANNOT_ESTIMATE
    }
}
