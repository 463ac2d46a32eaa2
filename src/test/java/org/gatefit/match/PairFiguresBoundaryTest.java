package org.gatefit.match;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * The figures the rules judge ({@link PairFigures}) at and just past their guards — a loop without
 * resistance, a bus of 0 V, an overshoot estimate with no inductance, a threshold at 0 V — and the
 * figures no other test reads (the fastest switch-node edge, the turn-off damping, the switch-node
 * overshoot, the driver's share of the gate power, the bootstrap duty limit), each against a hand
 * calculation from the formula named beside it. Parts: {@link Parts}' invented round baseline
 * (R_source 2 Ω, R_sink 1 Ω, R_g 2 Ω, R_g,int 1 Ω, C_iss 3 nF, Q_gd 15 nC, V_pl 5 V, V_th 2–4 V,
 * 48 V bus, 10 V / 0 V, 100 kHz, 10 nH gate loop, hot corner 125 °C where the driver's resistance
 * is 1 + 0.004·100 = 1.4 times its 25 °C value, JunctionTemperature's coefficient, from memory).
 */
class PairFiguresBoundaryTest {

    static PairFigures figures(Parts.Sw s, Parts.Dr d, OperatingPoint.Spec o) {
        SwitchPart sp = s.build();
        return PairFigures.of(Question.of(sp, o.resolve(sp), Margins.DEFAULT), d.build());
    }

    private static void close(double expected, double actual, double rel, String what) {
        assertEquals(expected, actual, Math.abs(expected) * rel, what);
    }

    @Test
    void theFastestSwitchNodeEdgeIsTheQuickestOfTurnOnAndTurnOffAtEitherCorner() {
        // REFERENCES §8: the drain edge moves the bus in n·Q_gd / I_plateau, dv/dt = V_bus·I/(n·Q_gd), with
        // I_on = (V_on − V_pl)/R_on and I_off = (V_pl − V_off)/R_off. At 25 °C: on 5/(2 + 3) = 1 A → 3.2 V/ns,
        // off 5/(1 + 3) = 1.25 A → 4.0 V/ns; at 125 °C slower (2.76 and 3.64 V/ns). The fastest: 4.0 V/ns.
        close(4.0e9, figures(Parts.sw(), Parts.dr(), Parts.op()).slewMax(), 1e-12, "fastest edge");
        // A 0.5 Ω sink: off at 25 °C 5/(0.5 + 3) = 1.4286 A → 48·1.4286/15 nC = 4.5714 V/ns.
        Parts.Dr d = Parts.dr();
        d.rSink = 0.5;
        close(4.5714e9, figures(Parts.sw(), d, Parts.op()).slewMax(), 1e-4, "fastest edge, 0.5 Ω sink");
    }

    @Test
    void aSlowKnownTwinLeavesTheSwitchsOwnTurnOnTheFastestEdge() {
        OperatingPoint.Spec o = Parts.op();
        o.bridge = true;
        o.twin = new OperatingPoint.Twin("HS1", 1e9, 1e9);
        o.rGOff = 10.0;
        // twin 1 V/ns; own turn-off 48·(5/(1 + 11))/15 nC = 1.333 V/ns; own turn-on at 25 °C 3.2 V/ns (REFERENCES §8)
        PairFigures f = figures(Parts.sw(), Parts.dr(), o);
        close(3.2e9, f.slewMax(), 1e-12, "fastest edge");
        // the dv-dt rule judges the twin's edge
        assertEquals(1e9, f.slew(), 0.0);
    }

    @Test
    void outsideABridgeTheTwinsEdgeIsShownAtTheDatasheetCorner() {
        // No injection to judge (single-switch stage): the first corner, 25 °C, is kept, with its 3.2 V/ns edge.
        PairFigures f = figures(Parts.sw(), Parts.dr(), Parts.op());
        assertEquals(25, f.dvdtCornerC(), 0.0);
        close(3.2e9, f.slew(), 1e-12, "dv/dt");
        assertTrue(Double.isNaN(f.vInduced()), "induced " + f.vInduced());
    }

    @Test
    void aThresholdAtOrBelowZeroIsTheWorstCaseAtTheFirstCornerItReaches() {
        // V_th,min 0 V at 25 °C and −0.6 V at 125 °C (−6 mV/K): any injection turns the switch on at both, the
        // badness is infinite at both, and the first corner (25 °C) stands — even with a −5 V off level, which
        // keeps the induced voltage below 0 V above the off level.
        Parts.Sw s = Parts.sw();
        s.vThMin = 0;
        Parts.Dr d = Parts.dr();
        d.vNegMin = -10;
        OperatingPoint.Spec o = Parts.op();
        o.bridge = true;
        o.vDriveNeg = -5.0;
        PairFigures f = figures(s, d, o);
        assertEquals(25, f.dvdtCornerC(), 0.0);
        assertEquals(0, f.vThSeen(), 0.0);
    }

    @Test
    void turnOffDampingOfTheGateLoop() {
        Parts.Dr d = Parts.dr();
        d.rSink = 0.5;
        PairFigures f = figures(Parts.sw(), d, Parts.op());
        // REFERENCES §3: ζ = (R/2)·√(C/L) at the fast corner (25 °C): on (2 + 2 + 1)/2·√(3 nF/10 nH) = 1.3693,
        // off (0.5 + 2 + 1)/2·√0.3 = 0.95851
        close(1.3693, f.ringZetaOn(), 1e-4, "damping on");
        close(0.95851, f.ringZetaOff(), 1e-4, "damping off");
        assertEquals(25, f.ringCornerC(), 0.0);
    }

    @Test
    void noRingingWithoutInputCapacitanceOrLoopInductance() {
        Parts.Sw s = Parts.sw();
        s.cIss = 0;
        assertTrue(Double.isNaN(figures(s, Parts.dr(), Parts.op()).ringPeak()), "no C_iss");
        OperatingPoint.Spec o = Parts.op();
        o.loop = 0.0;
        PairFigures f = figures(Parts.sw(), Parts.dr(), o);
        assertTrue(Double.isNaN(f.ringPeak()), "no loop inductance: " + f.ringPeak());
        assertTrue(Double.isNaN(f.ringCornerC()));
    }

    @Test
    void switchNodeOvershootIsTheLoopInductanceTimesTheCurrentOverTheFall() {
        Parts.Dr d = Parts.dr();
        d.rSink = 0.5;
        OperatingPoint.Spec o = Parts.op();
        o.powerLoop = 10e-9;
        o.iLoad = 20.0;
        // Current fall from the plateau to V_th,max at the fast corner, R_off·C_iss·ln((V_pl − V_off)/(V_th − V_off))
        // (RC discharge of the gate, plain circuit theory): (0.5 + 2 + 1)·3 nF·ln(5/4) = 2.3430 ns;
        // overshoot L·I/t = 10 nH·20 A/2.3430 ns = 85.361 V (SwitchNode, plain circuit theory).
        close(85.361, figures(Parts.sw(), d, o).nodeOvershoot(), 1e-4, "overshoot");

        // No inductance or no current: no overshoot, 0 V (not unknown).
        o.powerLoop = 0.0;
        assertEquals(0, figures(Parts.sw(), d, o).nodeOvershoot(), 0.0);
        o.powerLoop = 10e-9;
        o.iLoad = 0.0;
        assertEquals(0, figures(Parts.sw(), d, o).nodeOvershoot(), 0.0);
    }

    @Test
    void anIgbtsOvershootUsesItsDatasheetFallTime() {
        Parts.Sw s = Parts.sw();
        s.tech = Technology.IGBT;
        s.tF = 100e-9;
        OperatingPoint.Spec o = Parts.op();
        o.powerLoop = 10e-9;
        o.iLoad = 20.0;
        // L·I/t_f = 10 nH·20 A/100 ns = 2 V
        close(2.0, figures(s, Parts.dr(), o).nodeOvershoot(), 1e-12, "IGBT overshoot");
        // A MOSFET's t_f column is not used: the RC fall (1 + 2 + 1)·3 nF·ln(5/4) = 2.6777 ns → 74.690 V.
        Parts.Sw m = Parts.sw();
        m.tF = 100e-9;
        close(74.690, figures(m, Parts.dr(), o).nodeOvershoot(), 1e-4, "MOSFET overshoot");
        // A zero fall time is no estimate (never an infinite overshoot).
        s.tF = 0;
        assertTrue(Double.isNaN(figures(s, Parts.dr(), o).nodeOvershoot()));
    }

    @Test
    void aThresholdAtTheOffLevelGivesNoFallEstimate() {
        // V_th 0 V = the off level: the gate never falls to it (ln of infinity), the overshoot is not estimated.
        Parts.Sw s = Parts.sw();
        s.vThMin = 0;
        s.vThMax = Double.NaN;
        OperatingPoint.Spec o = Parts.op();
        o.powerLoop = 10e-9;
        o.iLoad = 20.0;
        assertTrue(Double.isNaN(figures(s, Parts.dr(), o).nodeOvershoot()));
    }

    @Test
    void driverShareOfTheGatePowerWithParallelSwitches() {
        OperatingPoint.Spec o = Parts.op();
        o.parallel = 2;
        o.rGOff = 1.0;
        // REFERENCES §2: 2·50 nC·10 V·100 kHz = 100 mW, 50 mW per edge; the driver's share of each in proportion to
        // its resistance: on 2/(2 + 2/2 + 1/2) = 2/3.5, off 1/(1 + 1/2 + 1/2) = 1/2 → 50·(0.5714 + 0.5) = 53.571 mW
        // per channel; both of the package's channels switch (channels_used not given): 107.14 mW.
        close(107.14e-3, figures(Parts.sw(), Parts.dr(), o).pDriver(), 1e-4, "driver power");
    }

    @Test
    void aLoopWithoutResistanceHasNoDelaysAndNoGatePowerSplit() {
        // R_source 0, R_g 0 and R_g,int unknown (0): the turn-on loop is 0 Ω, the RC delay and the resistive split
        // of the gate power have no meaning (REFERENCES §1, §2 divide by it); the rated peak is the current.
        Parts.Sw s = Parts.sw();
        s.rGInt = Double.NaN;
        Parts.Dr d = Parts.dr();
        d.rSource = 0;
        OperatingPoint.Spec o = Parts.op();
        o.rG = 0.0;
        PairFigures f = figures(s, d, o);
        assertEquals(0, f.rOnTot(), 0.0);
        assertEquals(4, f.iPkSrc(), 0.0);
        assertTrue(Double.isNaN(f.pDriver()), "driver power " + f.pDriver());
        ShownFigures shown = new ShownFigures(f);
        assertTrue(Double.isNaN(shown.delayOn), "delay " + shown.delayOn);
        assertTrue(Double.isNaN(shown.pGate), "gate power " + shown.pGate);
    }

    @Test
    void aTurnOffLoopWithoutResistanceHasNoDelaysAndNoGatePowerSplitEither() {
        // R_sink 0, R_g,off 0 and R_g,int unknown (0): the turn-off loop is 0 Ω (REFERENCES §1, §2 divide by it);
        // the rated 6 A sink is the current.
        Parts.Sw s = Parts.sw();
        s.rGInt = Double.NaN;
        Parts.Dr d = Parts.dr();
        d.rSink = 0;
        OperatingPoint.Spec o = Parts.op();
        o.rGOff = 0.0;
        PairFigures f = figures(s, d, o);
        assertEquals(0, f.rOffTot(), 0.0);
        assertEquals(6, f.iPkSnk(), 0.0);
        assertTrue(Double.isNaN(f.pDriver()), "driver power " + f.pDriver());
        ShownFigures shown = new ShownFigures(f);
        assertTrue(Double.isNaN(shown.delayOff), "delay " + shown.delayOff);
        assertTrue(Double.isNaN(shown.pGate), "gate power " + shown.pGate);
    }

    @Test
    void withoutABusThereIsNoSwitchNodeEdge() {
        for (Double bus : new Double[] {0.0, null}) {
            OperatingPoint.Spec o = Parts.op();
            o.bus = bus;
            o.bridge = true;
            PairFigures f = figures(Parts.sw(), Parts.dr(), o);
            assertTrue(Double.isNaN(f.slewMax()), "bus " + bus + ": " + f.slewMax());
            assertTrue(Double.isNaN(f.vInduced()), "bus " + bus + ": " + f.vInduced());
        }
    }

    @Test
    void fullEnhancementIsWhereOnResistanceIsSpecifiedElseTheRecommendedLevel() {
        // REFERENCES §5: the on level must reach the V_GS at which R_DS(on) is specified.
        Parts.Sw s = Parts.sw();
        s.rOnVgs = 4.5;
        assertEquals(4.5, PairFigures.fullEnhancement(s.build()), 0.0);
        s.rOnVgs = 0;
        assertEquals(10, PairFigures.fullEnhancement(s.build()), 0.0);
        s.rOnVgs = Double.NaN;
        assertEquals(10, PairFigures.fullEnhancement(s.build()), 0.0);
    }

    @Test
    void aBootstrapChargingExactlyToFullEnhancementIsSizedToTheUvlo() {
        // 10 V − 1 V diode = 9 V, exactly the 9 V R_on is specified at: never above it, so the capacitor is sized to
        // UVLO,off 6.5 V (REFERENCES §4: ΔV = V_DD − V_F − V_UVLO,off = 2.5 V) and the rule warns.
        Parts.Sw s = Parts.sw();
        s.rOnVgs = 9;
        OperatingPoint.Spec o = Parts.op();
        o.highSide = true;
        o.diodeDrop = 1.0;
        PairFigures f = figures(s, Parts.dr(), o);
        assertTrue(f.bootBelowFull());
        assertEquals(6.5, f.bootFloor(), 0.0);
        close(2.5, f.bootDroop(), 1e-12, "droop");
    }

    /**
     * High side with R_boot 22 Ω and a 5 nC level shift: per cycle Q = 50 nC + 100 µA·10 µs + 5 nC = 56 nC
     * (REFERENCES §4: I_qbs 50 µA plus the 50 µA leakage allowance, t_on the whole 10 µs period), ΔV = 10 − 0.7
     * − 6.5 = 2.8 V (UVLO,off: 9.3 V never reaches the 10 V full enhancement) → C_min 20 nF; 3× at 50 % left at
     * DC bias → 120 nF E12, 60 nF effective. REFERENCES §9's charge balance, lowest voltage
     * V_S − I·R − (Q_g + Q_ls + I·D·T)/(C·(1 − e^(−(1−D)·T/(R·C)))) = 6.5 V, solved for D by bisection in Python
     * (computed): D_max = 0.94649.
     */
    private static PairFigures dutyCase() {
        Parts.Dr d = Parts.dr();
        d.qLs = 5e-9;
        OperatingPoint.Spec o = Parts.op();
        o.highSide = true;
        o.rBoot = 22.0;
        return figures(Parts.sw(), d, o);
    }

    @Test
    void bootstrapDutyLimitByChargeBalance() {
        PairFigures f = dutyCase();
        close(120e-9, f.bootCRec(), 1e-9, "recommended capacitor");
        close(0.94649, f.bootDutyMax(), 1e-5, "duty limit");
        assertTrue(f.bootDutyAllows(0.9464), "just below the limit");
        assertFalse(f.bootDutyAllows(0.9466), "just above the limit");
    }

    @Test
    void bootstrapDutyHeadroomIsCappedAtEnoughAndIsTheDistanceToTheLimitBelowIt() {
        PairFigures f = dutyCase();
        // 0.5 + 0.1 is well inside the 0.94649 limit: the headroom saturates at 0.1
        assertEquals(0.1, f.bootDutyHeadroom(0.5, 0.1), 0.0);
        // 0.9 + 0.06 = 0.96 is past it: 0.94649 − 0.9 = 0.04649
        close(0.04649, f.bootDutyHeadroom(0.9, 0.06), 2e-4, "headroom below the limit");
        // 0.9 + 0.2 is past 100 %: the same distance
        close(0.04649, f.bootDutyHeadroom(0.9, 0.2), 2e-4, "headroom past 100 %");
    }

    @Test
    void aKnownTwinsEdgeIsTakenAtEachCornerUnlessADvDtIsGiven() {
        OperatingPoint.Spec o = Parts.op();
        o.bridge = true;
        o.twin = new OperatingPoint.Twin("HS1", 5e9, 1e9);
        PairFigures f = figures(Parts.sw(), Parts.dr(), o);
        // REFERENCES §8 injection, C_gd = 15 nC/48 V = 0.3125 nF, V = C_gd·dv/dt·R·(1 − e^(−t/(R·C_iss))):
        // 25 °C, 5 V/ns through 4 Ω: 6.25·(1 − e^(−9.6/12)) = 3.442 V against 2 V (1.72×);
        // 125 °C, 1 V/ns through 4.4 Ω: 1.375·(1 − e^(−48/13.2)) = 1.339 V against 1.4 V (0.96×): 25 °C decides.
        assertEquals(25, f.dvdtCornerC(), 0.0);
        assertEquals(5e9, f.slew(), 0.0);
        close(3.442, f.vInduced(), 1e-3, "induced");
        // A dv/dt given is judged as given, whatever the twin.
        o.dvdt = 50e9;
        assertEquals(50e9, figures(Parts.sw(), Parts.dr(), o).slew(), 0.0);
    }

    @Test
    void theCornerNearerToTurningOnCountsTheOffLevel() {
        Parts.Dr d = Parts.dr();
        d.vNegMin = -10;
        OperatingPoint.Spec o = Parts.op();
        o.bridge = true;
        o.vDriveNeg = -3.0;
        o.tj = -55.0;
        PairFigures f = figures(Parts.sw(), d, o);
        // REFERENCES §8 injection (computed as in ShownFiguresTest): 25 °C 2.854 V against V_th,min 2 V,
        // −55 °C (driver 0.68×, faster) 2.930 V against 2 + 0.006·80 = 2.48 V. Above the −3 V off level:
        // (2.854 − 3)/2 = −0.073 and (2.930 − 3)/2.48 = −0.028: the cold corner is nearer to V_th,min.
        assertEquals(-55, f.dvdtCornerC(), 0.0);
        close(2.48, f.vThSeen(), 1e-12, "threshold");
        close(2.9296, f.vInduced(), 1e-4, "induced");
    }

    @Test
    void turnOffPlateauCurrentAtTheSlowCorner() {
        Parts.Dr d = Parts.dr();
        d.rSink = 0.5;
        // REFERENCES §8: (V_pl − V_off)/(1.4·R_sink + R_g,off + R_g,int) = 5/(0.7 + 2 + 1) = 1.3514 A
        close(1.3514, figures(Parts.sw(), d, Parts.op()).iPlOff(), 1e-4, "plateau current off");
    }

    @Test
    void aGivenDvDtWithoutABusIsNoInjectionToCompute() {
        for (Double bus : new Double[] {0.0, null}) {
            OperatingPoint.Spec o = Parts.op();
            o.bus = bus;
            o.bridge = true;
            o.dvdt = 50e9;
            // The charge-consistent injection needs Q_gd over the bus swing (REFERENCES §8): no bus, no figure.
            PairFigures f = figures(Parts.sw(), Parts.dr(), o);
            assertTrue(Double.isNaN(f.vInduced()), "bus " + bus + ": " + f.vInduced());
            assertEquals(50e9, f.slew(), 0.0);
        }
    }
}
