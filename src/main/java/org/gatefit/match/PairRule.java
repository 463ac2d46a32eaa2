package org.gatefit.match;

import java.util.List;
import org.gatefit.match.Check.Comparison;

/**
 * One rule of DESIGN.md, in its own file. A rule <em>judges</em> a pair once — it leaves a reason
 * from its own enum (which carries the verdict) and a sub-score in an {@link Outcome}, reading
 * only the pair's immutable {@link PairFigures}, building no strings and allocating nothing — and
 * <em>words</em> that judgement for the pairs that are shown: the sentence and the comparisons come
 * from the reason, the same figures and the figures only shown ({@link ShownFigures}). Ranking and the full evaluation call the same
 * {@link #judge}, so they agree by construction ({@link Rules}).
 *
 * <p>A rule that is certain to fail on a driver's own values declares those values as typed
 * conditions ({@link #certainFailures}); the shortlist's catalog prefilter is built from the
 * declarations.
 *
 * <p>An abstract class rather than an interface: the ranking calls {@link #judge} of thirteen rules
 * for every driver, and a class's virtual call is dispatched through its vtable, an interface's
 * through a search of the receiver's interface table.
 */
abstract sealed class PairRule permits DriveCurrentRule, GateVoltageRule, NegativeBiasRule, UvloRule, LogicLevelRule,
        PolarityRule, HighSideRule, BootstrapRule, DriverPowerRule, DvDtRule, GateRingingRule, ProtectionRule, LifecycleRule {

    /**
     * Judges the pair: calls one of {@code out}'s pass, warn, fail or unknown with a reason of this
     * rule. May throw {@link IllegalArgumentException} when a physics model refuses the pair's
     * values (the evaluation then says unknown, "cannot estimate").
     */
    abstract void judge(PairFigures f, Outcome out);

    /** The sentence and the comparisons of a judgement {@code why} of this rule on these figures. */
    abstract Worded word(ShownFigures shown, Reason why);

    /**
     * Adds the conditions on a driver's own catalog values under which this rule fails whatever the
     * driver's other values: never on a value the driver lacks ({@code ShortlistPrefilterTest}
     * holds the shortlist equal with and without them).
     */
    void certainFailures(Question q, Prefilter.Builder b) {
    }

    /**
     * A judgement in words.
     *
     * @param message  one sentence a person can act on
     * @param compared the figures and limits the rule compared
     */
    record Worded(String message, List<Comparison> compared) {
        public Worded {
            compared = List.copyOf(compared);
        }

        Worded(String message) {
            this(message, List.of());
        }
    }
}
