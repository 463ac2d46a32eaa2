package org.gatefit.testsupport;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.concurrent.atomic.AtomicInteger;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.lifecycle.AfterProperty;

/** The mutation profile's tries cap: a property runs its own tries without the cap, at most the cap with it. */
class TriesCapTest {
    private static final AtomicInteger RUN = new AtomicInteger();

    @Property(tries = 40)
    void countsItsTries(@ForAll int any) {
        RUN.incrementAndGet();
    }

    @AfterProperty
    void triesAsConfigured() {
        int cap = TriesCap.cap();
        int expected = cap > 0 && cap < 40 ? cap : 40;
        assertEquals(expected, RUN.getAndSet(0), "tries with gatefit.tries.max=" + System.getProperty("gatefit.tries.max"));
        assertTrue(expected > 0);
    }
}
