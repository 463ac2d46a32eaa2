package org.gatefit.match;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * The match package's small enums as the catalog and the output spell them (catalog-schema/README.md,
 * DESIGN.md): the words read and written, the order of verdicts, and the per-technology assumptions
 * the rules use (REFERENCES §5 typical on levels, from memory).
 */
class MatchEnumsTest {

    @Test
    void verdictsReadLowerCaseAndTheWorseWins() {
        assertEquals("pass", Verdict.PASS.id());
        assertEquals("unknown", Verdict.UNKNOWN.toString());
        assertSame(Verdict.FAIL, Verdict.WARN.and(Verdict.FAIL));
        assertSame(Verdict.WARN, Verdict.WARN.and(Verdict.PASS));
        assertSame(Verdict.WARN, Verdict.UNKNOWN.forPair());
        assertSame(Verdict.FAIL, Verdict.FAIL.forPair());
    }

    @Test
    void technologiesReadTheCatalogsWords() {
        for (Technology t : Technology.values()) {
            assertSame(t, Technology.of(t.id()));
            assertEquals(t.id(), t.toString());
        }
        assertEquals("si-mosfet", Technology.SI_MOSFET.id());
        assertEquals("gan-hemt", Technology.GAN_HEMT.toString());
        assertThrows(IllegalArgumentException.class, () -> Technology.of("bjt"));
    }

    @Test
    void typicalOnLevelsAreTheTechnologiesUsualOnes() {
        // REFERENCES §5 (from memory): Si 10–12 V, SiC +15 to +20 V, e-mode GaN about +5 to +6 V, IGBT +15 V
        assertEquals(12, Technology.SI_MOSFET.typicalOn());
        assertEquals(18, Technology.SIC_MOSFET.typicalOn());
        assertEquals(6, Technology.GAN_HEMT.typicalOn());
        assertEquals(15, Technology.IGBT.typicalOn());
    }

    @Test
    void topologiesReadTheCatalogsWords() {
        for (Topology t : Topology.values()) {
            assertSame(t, Topology.of(t.id()));
            assertEquals(t.id(), t.toString());
        }
        assertEquals("half-bridge", Topology.HALF_BRIDGE.id());
        assertThrows(IllegalArgumentException.class, () -> Topology.of("bridge"));
        assertFalse(Topology.LOW_SIDE.floats());
        assertTrue(Topology.ISOLATED.floats());
        assertFalse(Topology.ISOLATED.bootstrapped());
    }

    @Test
    void rulesReadTheirIdsAndOrder() {
        assertEquals("high-side", Rule.HIGH_SIDE.toString());
        assertEquals("gate-ringing", Rule.GATE_RINGING.id());
        assertEquals(0, Rule.CATALOG.fundamental());
        assertEquals(2, Rule.HIGH_SIDE.fundamental());
        assertTrue(Rule.HIGH_SIDE.fundamental() < Rule.UVLO.fundamental(), "wrong in kind before merely too small");
        assertEquals("bootstrap capacitor, diode and duty limit", Rule.BOOTSTRAP.covers());
    }

    @Test
    void lifecyclesReadTheCatalogsWords() {
        assertSame(Lifecycle.NRND, Lifecycle.of("nrnd"));
        assertEquals("ltb", Lifecycle.LTB.toString());
        assertSame(Lifecycle.UNKNOWN, Lifecycle.of(null));
        assertThrows(IllegalArgumentException.class, () -> Lifecycle.of("eol"));
    }
}
