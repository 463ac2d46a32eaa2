package org.gatefit.match;

import static org.gatefit.match.RuleCase.verdict;
import static org.gatefit.match.RuleCase.warn;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertSame;

import org.junit.jupiter.api.Test;

/**
 * {@code lifecycle} as DESIGN.md states it (production status and stock; obsolete fails, nrnd, ltb,
 * preview and out of stock warn at 0.5, unknown is unknown): the pair's check, the driver alone in a
 * shortlist, and the switch's status said once above a shortlist. No engineering limit: the statuses
 * are the catalog's words (catalog-schema/README.md).
 */
class LifecycleRuleTest {

    private static Check shortlisted(Parts.Dr d) {
        Parts.Sw s = Parts.sw();
        s.lifecycle = "obsolete"; // said apart: never in the driver's check
        SwitchPart sp = s.build();
        return Rules.evaluate(d.build(), Question.ofShortlist(sp, Parts.op().resolve(sp), Margins.DEFAULT))
                .check(Rule.LIFECYCLE).orElseThrow();
    }

    @Test
    void aShortlistJudgesTheDriverAlone() {
        Check c = shortlisted(Parts.dr());
        verdict(c, Verdict.PASS, 1.0);
        assertEquals("the driver is active and in stock", c.message());
    }

    @Test
    void aDriverWithUnknownStockIsNotSaidToBeInStock() {
        Parts.Dr d = Parts.dr();
        d.stock = -1;
        assertEquals("the driver is active", shortlisted(d).message());
        assertEquals("both parts are active", RuleCase.check(Rule.LIFECYCLE, s -> { }, x -> x.stock = -1, o -> { })
                .message());
    }

    @Test
    void aDriverOutOfStockInAShortlistWarns() {
        Parts.Dr d = Parts.dr();
        d.stock = 0;
        Check c = shortlisted(d);
        verdict(c, Verdict.WARN, warn(0.5));
        assertEquals("TST-D1 is out of stock — check availability or plan a second source", c.message());
    }

    @Test
    void thePairNamesBothPartsNotes() {
        Check c = RuleCase.check(Rule.LIFECYCLE, s -> s.lifecycle = "ltb", d -> d.lifecycle = "obsolete", o -> { });
        verdict(c, Verdict.FAIL, 0);
        assertEquals("TST-D1 is obsolete; TST-S1 is at last-time buy — find a replacement ('gatefit replace')", c.message());
    }

    @Test
    void anUnknownStatusIsUnknown() {
        assertSame(Lifecycle.UNKNOWN, Lifecycle.of(null));
        Check c = RuleCase.check(Rule.LIFECYCLE, s -> s.lifecycle = "unknown", d -> { }, o -> { });
        verdict(c, Verdict.UNKNOWN, Score.UNKNOWN);
        assertEquals("TST-S1 has no lifecycle status — check availability or plan a second source", c.message());
    }

    @Test
    void theSwitchsStatusIsSaidOnce() {
        Parts.Sw s = Parts.sw();
        assertNull(LifecycleRule.switchStatus(s.build()), "nothing to say of an active switch in stock");
        s.lifecycle = "obsolete";
        assertEquals("TST-S1 is obsolete — find a replacement ('gatefit replace TST-S1') (said once; each driver's"
                + " lifecycle check is about the driver alone)", LifecycleRule.switchStatus(s.build()));
        s.lifecycle = "nrnd";
        s.stock = 0;
        assertEquals("TST-S1 is not recommended for new designs; TST-S1 is out of stock — check availability or plan a"
                + " second source (said once; each driver's lifecycle check is about the driver alone)",
                LifecycleRule.switchStatus(s.build()));
        s.lifecycle = "active";
        assertEquals("TST-S1 is out of stock — check availability or plan a second source (said once; each driver's"
                + " lifecycle check is about the driver alone)", LifecycleRule.switchStatus(s.build()));
    }
}
