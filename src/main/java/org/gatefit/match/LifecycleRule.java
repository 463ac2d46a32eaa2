package org.gatefit.match;

import org.gatefit.catalog.Op;
import java.util.ArrayList;
import java.util.List;

/**
 * {@code lifecycle}: production status and stock of both parts ({@link Lifecycle}): obsolete
 * fails, not-recommended, last-time-buy, preview and out of stock warn, an unknown status is
 * unknown. Weight 0 in the electrical score: it counts through availability ({@link Score}).
 */
final class LifecycleRule extends PairRule {
    enum Why implements Reason { CLEAR, NOTED }

    /** Whether a part has anything to note: not active, or out of stock. */
    private static boolean noted(Lifecycle l, long stock) {
        return l != Lifecycle.ACTIVE || stock == 0;
    }

    @Override
    public void judge(PairFigures f, Outcome out) {
        judge(f.d(), f.q().lifecycleSwitch(), out);
    }

    /**
     * The judgement on the parts alone (a p-channel pair has no figures, but a lifecycle); {@code s}
     * null: the driver alone (a shortlist says the switch's status once, {@link Question#ofShortlist}).
     */
    static void judge(DriverPart d, SwitchPart s, Outcome out) {
        if (!noted(d.lifecycle(), d.stock()) && (s == null || !noted(s.lifecycle(), s.stock()))) {
            out.pass(Why.CLEAR, 1);
            return;
        }
        switch (d.lifecycle().verdict(d.stock()).and(s == null ? Verdict.PASS : s.lifecycle().verdict(s.stock()))) {
            case FAIL -> out.fail(Why.NOTED);
            case WARN -> out.warn(Why.NOTED, 0.5);
            case UNKNOWN -> out.unknown(Why.NOTED);
            case PASS -> throw new IllegalStateException("a noted part never passes");
        }
    }

    @Override
    public Worded word(ShownFigures shown, Reason why) {
        return word(shown.f.d(), shown.f.q().lifecycleSwitch(), (Why) why);
    }

    /** As {@link #judge(DriverPart, SwitchPart, Outcome)}: {@code s} null words the driver alone. */
    static Worded word(DriverPart d, SwitchPart s, Why why) {
        return switch (why) {
            case CLEAR -> s == null ? new Worded("the driver is active" + (d.stock() > 0 ? " and in stock" : ""))
                    : new Worded("both parts are active" + (d.stock() > 0 && s.stock() > 0 ? " and in stock" : ""));
            case NOTED -> {
                List<String> notes = new ArrayList<>();
                note(notes, d.partNumber(), d.lifecycle(), d.stock());
                if (s != null) {
                    note(notes, s.partNumber(), s.lifecycle(), s.stock());
                }
                boolean fails = d.lifecycle().verdict(d.stock()).and(s == null ? Verdict.PASS
                        : s.lifecycle().verdict(s.stock())) == Verdict.FAIL;
                yield new Worded(String.join("; ", notes) + (fails ? " — find a replacement ('gatefit replace')"
                        : " — check availability or plan a second source"));
            }
        };
    }

    /**
     * The switch's own lifecycle and stock, said once above a shortlist, or null when there is
     * nothing to note (active and not out of stock).
     */
    static String switchStatus(SwitchPart s) {
        if (!noted(s.lifecycle(), s.stock())) {
            return null;
        }
        List<String> notes = new ArrayList<>();
        note(notes, s.partNumber(), s.lifecycle(), s.stock());
        if (notes.isEmpty()) {
            notes.add(s.partNumber() + " has an unknown lifecycle status");
        }
        return String.join("; ", notes) + (s.lifecycle().verdict(s.stock()) == Verdict.FAIL
                ? " — find a replacement ('gatefit replace " + s.partNumber() + "')"
                : " — check availability or plan a second source") + " (said once; each driver's lifecycle check is"
                + " about the driver alone)";
    }

    private static void note(List<String> notes, String pn, Lifecycle l, long stock) {
        if (l.note() != null) {
            notes.add(pn + " " + l.note());
        }
        if (stock == 0) {
            notes.add(pn + " is out of stock");
        }
    }

    /** An obsolete driver fails. */
    @Override
    public void certainFailures(Question q, Prefilter.Builder b) {
        b.skip(Rule.LIFECYCLE, Prefilter.Condition.is("lifecycle", Op.EQ, Lifecycle.OBSOLETE.id()));
    }
}
