package org.gatefit.match;

/**
 * Why a rule judged a pair as it did: each rule has its own enum of reasons. The rule chooses the
 * reason and the verdict together ({@link Outcome}); the sentence is worded later from the reason
 * and the pair's figures ({@link PairRule#word}) by an exhaustive switch.
 */
interface Reason {
    /** The reason of a rule whose figures a physics model refused (out of its domain): unknown. */
    enum Common implements Reason {
        CANNOT_ESTIMATE
    }
}
