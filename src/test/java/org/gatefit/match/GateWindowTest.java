package org.gatefit.match;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * The gate window advice respects: V_GS,max less the 10 % gate headroom (common practice, no source),
 * and for IGBT and SiC no more than the top of the recommended range (more drive, more short-circuit
 * current and a shorter withstand time: REFERENCES §9).
 */
class GateWindowTest {

    private static SwitchPart sw(Technology t, double vGsMax, double top) {
        Parts.Sw s = Parts.sw();
        s.tech = t;
        s.vGsMax = vGsMax;
        s.vGateOnMax = top;
        return s.build();
    }

    @Test
    void aSicWindowStopsAtTheTopOfItsRecommendedRange() {
        // 25 V less 10 % = 22.5 V, the range's top 18 V is lower
        assertEquals(18, GateWindow.onLimit(sw(Technology.SIC_MOSFET, 25, 18), Margins.DEFAULT), 1e-12);
        assertEquals(18, GateWindow.onLimit(sw(Technology.IGBT, 25, 18), Margins.DEFAULT), 1e-12);
    }

    @Test
    void aSiliconMosfetOrAMissingTopKeepsTheHeadroomLimit() {
        assertEquals(22.5, GateWindow.onLimit(sw(Technology.SI_MOSFET, 25, 18), Margins.DEFAULT), 1e-12);
        assertEquals(22.5, GateWindow.onLimit(sw(Technology.SIC_MOSFET, 25, Double.NaN), Margins.DEFAULT), 1e-12);
    }

    @Test
    void anOnLevelAtTheLimitIsAllowedAndJustAboveItIsNot() {
        SwitchPart s = sw(Technology.SIC_MOSFET, 25, 18);
        assertTrue(GateWindow.allows(s, Margins.DEFAULT, 18));
        assertFalse(GateWindow.allows(s, Margins.DEFAULT, 18.001));
        assertTrue(GateWindow.allows(sw(Technology.SI_MOSFET, Double.NaN, Double.NaN), Margins.DEFAULT, 100),
                "an unknown limit allows any level");
    }
}
