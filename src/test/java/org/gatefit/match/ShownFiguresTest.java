package org.gatefit.match;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * The figures a pair shows but no rule judges ({@link ShownFigures}): delay times, gate-drive power
 * and its split, the gate loop's critical resistance and damping, the resistor range with its
 * recommended value, the bootstrap inrush — each against a hand calculation from the formula named
 * beside it, on {@link Parts}' invented round parts (which are test inputs, never check values).
 *
 * <p>Baseline pair unless a test says otherwise: R_source 2 Ω, R_sink 1 Ω, I_source 4 A, R_g 2 Ω,
 * R_g,int 1 Ω, C_iss 3 nF, Q_g 50 nC over 0–10 V, Q_gd 15 nC, V_pl 5 V, 10 V / 0 V at 100 kHz,
 * 50 ns edge, 10 nH loop, hot corner 125 °C (driver resistance × (1 + 0.004·100) = 1.4, the
 * coefficient of {@code JunctionTemperature}, from memory), default margins (drive current 1.5×,
 * gate headroom 10 %).
 */
class ShownFiguresTest {

    static ShownFigures shown(Parts.Sw s, Parts.Dr d, OperatingPoint.Spec o) {
        return shown(s, d, o, Margins.DEFAULT);
    }

    static ShownFigures shown(Parts.Sw s, Parts.Dr d, OperatingPoint.Spec o, Margins m) {
        SwitchPart sp = s.build();
        return new ShownFigures(PairFigures.of(Question.of(sp, o.resolve(sp), m), d.build()));
    }

    static Margins margins(double driveCurrent, double gateHeadroom) {
        Margins m = Margins.DEFAULT;
        return new Margins(driveCurrent, gateHeadroom, m.uvloHeadroom(), m.logicNoise(), m.offset(), m.isolation(),
                m.driverPower(), m.dvdt(), m.cmti(), m.uvloPlateau(), m.bootCapBias(), m.protectionBus(), m.deadTime());
    }

    private static void close(double expected, double actual, double rel, String what) {
        assertEquals(expected, actual, Math.abs(expected) * rel, what);
    }

    @Test
    void delaysAreTheRcChargeToThePlateau() {
        ShownFigures f = shown(Parts.sw(), Parts.dr(), Parts.op());
        // REFERENCES §1: t_d(on) = R·C_iss·ln(V / (V − V_pl)), t_d(off) = R·C_iss·ln(V / V_pl), at 25 °C:
        // R_on = 2 + 2 + 1 = 5 Ω → 5·3 nF·ln(10/5) = 10.397 ns; R_off = 1 + 2 + 1 = 4 Ω → 4·3 nF·ln 2 = 8.318 ns.
        close(10.397e-9, f.delayOn, 1e-4, "delay on");
        close(8.3178e-9, f.delayOff, 1e-4, "delay off");
    }

    @Test
    void delaysOfParallelSwitchesChargeAllTheirInputCapacitance() {
        OperatingPoint.Spec o = Parts.op();
        o.parallel = 2;
        o.vDriveNeg = -5.0;
        Parts.Dr d = Parts.dr();
        d.vNegMin = -10;
        ShownFigures f = shown(Parts.sw(), d, o);
        // REFERENCES §1 with an off level (SwitchingTimes): t_d(on) = R·n·C_iss·ln((V_on − V_off)/(V_on − V_pl)),
        // t_d(off) = R·n·C_iss·ln((V_on − V_off)/(V_pl − V_off)); R_on = 2 + (2 + 1)/2 = 3.5 Ω, R_off = 1 + 1.5
        // = 2.5 Ω, 2·3 nF: 3.5·6 nF·ln(15/5) = 23.071 ns; 2.5·6 nF·ln(15/10) = 6.0820 ns.
        close(3.5 * 6e-9 * Math.log(3), f.delayOn, 1e-9, "delay on");
        close(2.5 * 6e-9 * Math.log(1.5), f.delayOff, 1e-9, "delay off");
        close(23.071e-9, f.delayOn, 1e-4, "delay on, by hand");
        close(6.0820e-9, f.delayOff, 1e-4, "delay off, by hand");
    }

    @Test
    void gatePowerAndItsSplitOutsideTheDriver() {
        ShownFigures f = shown(Parts.sw(), Parts.dr(), Parts.op());
        // REFERENCES §2: P = Q_g·ΔV·f = 50 nC·10 V·100 kHz = 50 mW; each edge spends half (25 mW), divided in
        // proportion to R: on loop 2 + 2 + 1 = 5 Ω, off loop 1 + 2 + 1 = 4 Ω.
        // external 25 mW·(2/5 + 2/4) = 22.5 mW; internal 25 mW·1·(1/5 + 1/4) = 11.25 mW.
        close(50e-3, f.pGate, 1e-12, "gate power");
        close(22.5e-3, f.pExternal, 1e-12, "external share");
        close(11.25e-3, f.pInternal, 1e-12, "internal share");
    }

    @Test
    void gatePowerSplitOfParallelSwitchesSharesTheResistorsPerSwitch() {
        OperatingPoint.Spec o = Parts.op();
        o.parallel = 2;
        o.rGOff = 1.0;
        ShownFigures f = shown(Parts.sw(), Parts.dr(), o);
        // REFERENCES §2 with two switches: 2·50 nC·10 V·100 kHz = 100 mW, 50 mW per edge. Seen from the driver the
        // two resistors and R_g,int are in parallel: R_g/2 = 1 Ω, R_g,off/2 = 0.5 Ω, R_g,int/2 = 0.5 Ω;
        // on loop 2 + 1 + 0.5 = 3.5 Ω, off loop 1 + 0.5 + 0.5 = 2 Ω.
        // external 50 mW·(1/3.5 + 0.5/2) = 26.786 mW; internal 50 mW·0.5·(1/3.5 + 1/2) = 19.643 mW.
        close(100e-3, f.pGate, 1e-12, "gate power");
        close(26.786e-3, f.pExternal, 1e-4, "external share");
        close(19.643e-3, f.pInternal, 1e-4, "internal share");
    }

    @Test
    void gateLoopCriticalResistanceAndDamping() {
        ShownFigures f = shown(Parts.sw(), Parts.dr(), Parts.op());
        // REFERENCES §3 (series R-L-C): R_crit = 2·√(L/C) = 2·√(10 nH / 3 nF) = 3.6515 Ω;
        // ζ = (R/2)·√(C/L) with the 25 °C loop 5 Ω: 2.5·√(0.3) = 1.3693.
        close(3.6515, f.rCrit, 1e-4, "critical resistance");
        close(1.3693, f.zeta, 1e-4, "damping");
    }

    @Test
    void resistorRangeOfTheBaseline() {
        ShownFigures f = shown(Parts.sw(), Parts.dr(), Parts.op());
        // Floor (REFERENCES §3): 0.7·R_crit − R_source − R_g,int = 0.7·3.6515 − 2 − 1 = −0.444 Ω: nothing, 0 Ω.
        assertEquals(0, f.rgMin, 0.0);
        assertEquals("damping ζ ≥ 0.7", f.rgFloor);
        // Top (REFERENCES §8, plateau current): the plateau needs n·Q_gd/t = 15 nC/50 ns = 0.3 A, with the 1.5×
        // margin 0.45 A; (V_on − V_pl)/0.45 A − 1.4·R_source − R_g,int = 5/0.45 − 2.8 − 1 = 7.3111 Ω.
        close(7.3111, f.rgMax, 1e-4, "top");
        // Recommended: E24 nearest half the top, 3.656 Ω → 3.6 Ω (IEC 60063 E24: 3.3, 3.6, 3.9).
        assertEquals(3.6, f.rgRecommended, 1e-12);
    }

    @Test
    void dampingFloorOfALongLoopAndParallelSwitches() {
        OperatingPoint.Spec o = Parts.op();
        o.loop = 40e-9;
        ShownFigures one = shown(Parts.sw(), Parts.dr(), o);
        // REFERENCES §3: R_crit = 2·√(40 nH / 3 nF) = 7.3030 Ω; floor 0.7·7.3030 − 2 − 1 = 2.1121 Ω.
        close(7.3030, one.rCrit, 1e-4, "critical resistance");
        close(2.1121, one.rgMin, 1e-4, "floor");
        assertEquals("damping ζ ≥ 0.7", one.rgFloor);
        // aim max(2.1121, 7.3111/2 = 3.656) → E24 3.6 Ω
        assertEquals(3.6, one.rgRecommended, 1e-12);

        o.parallel = 2;
        ShownFigures two = shown(Parts.sw(), Parts.dr(), o);
        // Two switches: C = 6 nF, R_crit = 2·√(40 nH / 6 nF) = 5.1640 Ω; per switch the floor is
        // n·(0.7·R_crit − R_source − R_g,int/n) = 2·(3.6148 − 2 − 0.5) = 2.2296 Ω.
        close(5.1640, two.rCrit, 1e-4, "critical resistance, two switches");
        close(2.2296, two.rgMin, 1e-4, "floor, two switches");
        // ζ with the loop 2 + (2 + 1)/2 = 3.5 Ω: 1.75·√(6 nF / 40 nH) = 0.67777
        close(0.67777, two.zeta, 1e-4, "damping, two switches");
        // Top: the plateau needs 2·15 nC / 50 ns·1.5 = 0.9 A; per switch n·(5/0.9 − 1.4·2) − R_g,int
        // = 2·(5.5556 − 2.8) − 1 = 4.5111 Ω; aim max(2.2296, 2.2556) → E24 2.2 Ω, below the floor → rounded up: 2.4 Ω.
        close(4.5111, two.rgMax, 1e-4, "top, two switches");
        assertEquals(2.4, two.rgRecommended, 1e-12);
    }

    @Test
    void ringingFloorWhenTheHeadroomAllowsLessOvershootThanTheDampingTarget() {
        Parts.Sw s = Parts.sw();
        s.vGsMax = 11.3;
        OperatingPoint.Spec o = Parts.op();
        o.loop = 40e-9;
        o.parallel = 2;
        ShownFigures f = shown(s, Parts.dr(), o);
        // Allowed overshoot (11.3·(1 − 0.10) − 10)/10 = 0.017 of the step; the series R-L-C step overshoots by
        // exp(−πζ/√(1 − ζ²)) (REFERENCES §8), so ζ = −ln 0.017/√(π² + ln² 0.017) = 0.79194. Two switches, C = 6 nF:
        // R = 2ζ·√(L/C) = 2·0.79194·2.5820 = 4.0895 Ω in the loop, per switch 2·(4.0895 − 2 − 0.5) = 3.1791 Ω,
        // above the damping floor 2.2296 Ω (dampingFloorOfALongLoopAndParallelSwitches).
        close(3.1791, f.rgMin, 1e-4, "floor");
        assertEquals("the gate-ringing rule", f.rgFloor);
        // aim max(3.1791, 4.5111/2) → E24 nearest 3.3 Ω (IEC 60063), inside 3.18–4.51 Ω
        assertEquals(3.3, f.rgRecommended, 1e-12);
    }

    @Test
    void noRingingFloorAtZeroOrFullAllowedOvershoot() {
        // Gate headroom 50 %: V_GS,max 20 V leaves 20·0.5 − 10 = 0 V of overshoot, 40 V leaves 10 V, the whole
        // step (a fraction of 1). Neither is an overshoot a damping ratio gives (0 < os < 1, REFERENCES §8): the
        // damping floor stands, 0.7·7.3030 − 3 = 2.1121 Ω with a 40 nH loop (REFERENCES §3).
        for (double vGsMax : new double[] {20, 40}) {
            Parts.Sw s = Parts.sw();
            s.vGsMax = vGsMax;
            OperatingPoint.Spec o = Parts.op();
            o.loop = 40e-9;
            ShownFigures f = shown(s, Parts.dr(), o, margins(1.5, 0.5));
            close(2.1121, f.rgMin, 1e-4, "floor at V_GS,max " + vGsMax);
            assertEquals("damping ζ ≥ 0.7", f.rgFloor);
        }
        // Without V_GS,max there is no ringing floor either.
        Parts.Sw s = Parts.sw();
        s.vGsMax = Double.NaN;
        OperatingPoint.Spec o = Parts.op();
        o.loop = 40e-9;
        assertEquals("damping ζ ≥ 0.7", shown(s, Parts.dr(), o).rgFloor);
    }

    @Test
    void topIsZeroWhenTheRatedPeakIsShortOfThePlateauNeedOrTheDriverTooWeak() {
        // The plateau needs 1.5·0.3 A = 0.45 A (REFERENCES §8, README margin): a 0.4 A driver cannot give it at
        // any resistor, so the top is 0 Ω and nothing is recommended.
        Parts.Dr weak = Parts.dr();
        weak.iSource = 0.4;
        ShownFigures f = shown(Parts.sw(), weak, Parts.op());
        assertEquals(0, f.rgMax, 0.0);
        assertTrue(Double.isNaN(f.rgRecommended), "recommended " + f.rgRecommended);
        // An 8 Ω source: 5/0.45 − 1.4·8 − 1 = −1.09 Ω, never a negative bound: 0 Ω.
        Parts.Dr slow = Parts.dr();
        slow.rSource = 8;
        ShownFigures g = shown(Parts.sw(), slow, Parts.op());
        assertEquals(0, g.rgMax, 0.0);
        assertTrue(Double.isNaN(g.rgRecommended), "recommended " + g.rgRecommended);
    }

    @Test
    void aDriverRatedExactlyAtThePlateauNeedHasATop() {
        Parts.Sw s = Parts.sw();
        SwitchPart sp = s.build();
        Question q = Question.of(sp, Parts.op().resolve(sp), Margins.DEFAULT);
        // rated peak = margin × n·Q_gd/t exactly (0.45 A): the need is met, the top is the resistance formula's,
        // 5/0.45 − 1.4·2 − 1 = 7.3111 Ω (REFERENCES §8)
        Parts.Dr d = Parts.dr();
        d.iSource = q.m.driveCurrent() * q.iReqPlateau;
        ShownFigures f = new ShownFigures(PairFigures.of(q, d.build()));
        close(7.3111, f.rgMax, 1e-4, "top");
    }

    @Test
    void withoutAPlateauThereIsNoTop() {
        // A plateau at the on level: the drain edge is never crossed (Question.plateau), no top, no recommendation.
        Parts.Sw s = Parts.sw();
        s.vPlateau = 10;
        ShownFigures f = shown(s, Parts.dr(), Parts.op());
        assertTrue(Double.isNaN(f.rgMax), "top " + f.rgMax);
        assertTrue(Double.isNaN(f.rgRecommended), "recommended " + f.rgRecommended);
        assertTrue(Double.isNaN(f.delayOn), "delay " + f.delayOn);
    }

    @Test
    void withoutInputCapacitanceThereIsNoGateLoop() {
        Parts.Sw s = Parts.sw();
        s.cIss = 0;
        ShownFigures f = shown(s, Parts.dr(), Parts.op());
        assertTrue(Double.isNaN(f.rgMax), "top " + f.rgMax);
        assertTrue(Double.isNaN(f.rCrit), "critical " + f.rCrit);
        assertEquals("", f.rgFloor);
    }

    /**
     * The dv-dt figures below are REFERENCES §8's charge-consistent Miller injection — C_gd = Q_gd/V_bus, the
     * off gate held through n·R_sink + R_g,off + R_g,int and loaded by C_iss, V = C_gd·dv/dt·R·(1 − e^(−t/(R·C_iss)))
     * with t = V_bus/(dv/dt), at most V_bus·C_gd/(C_gd + C_gs) — with the twin's edge dv/dt = V_bus·I_pl/(n·Q_gd)
     * and I_pl = (V_on − V_pl)/R_on (REFERENCES §8), solved by bisection in a separate Python script over these
     * formulas (computed, like ReferenceFiguresTest's dv-dt floor). Baseline pair in a bridge at 48 V: the twin's
     * edge is 48·(5/5.8 Ω)/15 nC = 2.7586 V/ns at 125 °C (R_source 1.4·2 Ω), held through 1.4 + 2 + 1 = 4.4 Ω:
     * 2.778 V induced against V_th,min 2 − 0.006·100 = 1.4 V (the 125 °C corner decides).
     */
    private static OperatingPoint.Spec bridge() {
        OperatingPoint.Spec o = Parts.op();
        o.bridge = true;
        return o;
    }

    @Test
    void inABridgeNoResistorWithinTheEdgeAvoidsAMillerTurnOn() {
        ShownFigures f = shown(Parts.sw(), Parts.dr(), bridge());
        // Even the top 7.3111 Ω leaves the induced voltage above V_th,min (computed: the floor would be
        // 11.42 Ω, past the edge): no floor within the range, nothing recommended.
        assertEquals(Double.POSITIVE_INFINITY, f.rgMin);
        assertEquals("the dv-dt rule (the twin's turn-on edge)", f.rgFloor);
        close(7.3111, f.rgMax, 1e-4, "top");
        assertTrue(Double.isNaN(f.rgRecommended), "recommended " + f.rgRecommended);
        // The dv/dt at which the 4.4 Ω path reaches 1.4 V: 1.0513 V/ns (computed).
        close(1.0513e9, f.dvdtAllowed, 1e-4, "allowed dv/dt");
        // The holding path that would do is 1.144 Ω, below the fixed 1.4·1 + 1 Ω: no R_g,off helps.
        assertEquals("a negative off level or a driver with a Miller clamp", f.dvdtFix());
    }

    @Test
    void aDvDtFloorInsideTheRangeAndEveryWayOut() {
        Parts.Dr d = Parts.dr();
        d.rSink = 0.5;
        d.vNegMin = -10;
        OperatingPoint.Spec o = bridge();
        o.vDriveNeg = -1.5;
        o.rGOff = 5.0;
        ShownFigures f = shown(Parts.sw(), d, o);
        // The twin's turn-on resistor below which dv-dt fails at one corner: 4.3073 Ω (computed, bisection to 1e-4).
        close(4.3073, f.rgMin, 2e-4, "floor");
        assertEquals("the dv-dt rule (the twin's turn-on edge)", f.rgFloor);
        // aim max(4.3073, 7.3111/2) → E24 nearest 4.3, below the floor → up: 4.7 Ω (IEC 60063)
        assertEquals(4.7, f.rgRecommended, 1e-12);
        // R_g,off: the holding path may be 3.5908 Ω (computed: 0.7·1.4 + 1.5 = 2.48 V at 2.7586 V/ns), less the fixed
        // 1.4·0.5 + 1 = 1.7 Ω: 1.8908 Ω → E24 down 1.8 Ω; R_g up to the floor's E24 4.7 Ω.
        assertEquals("lower R_g,off to ≤ 1.8 Ω, raise R_g (turn-on) to ≥ 4.7 Ω to slow the edge, a deeper negative off"
                + " level or a driver with a Miller clamp", f.dvdtFix());
        // The dv/dt at which the 1.4·0.5 + 5 + 1 = 6.7 Ω path reaches 1.4 + 1.5 V: 1.9736 V/ns (computed).
        close(1.9736e9, f.dvdtAllowed, 1e-4, "allowed dv/dt");
    }

    @Test
    void aDriverShortOfThePlateauNeedStillHasADvDtFloorButNoWayToReachIt() {
        Parts.Dr d = Parts.dr();
        d.iSource = 0.4;
        ShownFigures f = shown(Parts.sw(), d, bridge());
        // 0.4 A < 0.45 A: top 0 Ω. The twin's edge at the 0.4 A rating, 48·0.4/15 nC = 1.28 V/ns, still lifts the
        // off gate past 1.4 V; only a resistor that brings the plateau current below the rating slows it: 11.420 Ω
        // (computed), searched up to 1000× the floor since the top gives no bound.
        close(11.420, f.rgMin, 2e-4, "floor");
        assertEquals(0, f.rgMax, 0.0);
        assertEquals("the dv-dt rule (the twin's turn-on edge)", f.rgFloor);
        // R_g,off: the holding path may be 2.4655 Ω at 1.28 V/ns (computed), less 1.4 + 1 Ω: 0.0655 Ω, said as the
        // smallest E24 value offered, 0.1 Ω; no turn-on resistor within the (empty) range is offered.
        assertEquals("lower R_g,off to ≤ 100 mΩ, a negative off level or a driver with a Miller clamp", f.dvdtFix());
    }

    @Test
    void atACornerBelowTwentyFiveDegreesTheDatasheetCornerDecidesAndItsSinkResistanceCounts() {
        Parts.Dr d = Parts.dr();
        d.rSink = 0.5;
        d.vNegMin = -10;
        OperatingPoint.Spec o = bridge();
        o.vDriveNeg = -1.5;
        o.rGOff = 5.0;
        o.tj = -55.0;
        ShownFigures f = shown(Parts.sw(), d, o);
        assertEquals(25, f.f.dvdtCornerC(), 0.0);
        // At 25 °C (V_th,min 2 V, twin's edge 3.2 V/ns): the holding path may be 4.1322 Ω (computed), less
        // 1·0.5 + 1 Ω at 25 °C = 2.6322 Ω → E24 down 2.4 Ω. The dv-dt floor 1.949 Ω is below R_g 2 Ω: not raised.
        assertEquals("lower R_g,off to ≤ 2.4 Ω, a deeper negative off level or a driver with a Miller clamp",
                f.dvdtFix());
        // The slow corner is 25 °C here (factor 1 − 0.004·80 = 0.68 at −55 °C): top 5/0.45 − 2 − 1 = 8.1111 Ω.
        close(8.1111, f.rgMax, 1e-4, "top");
        close(1.9494, f.rgMin, 2e-4, "floor");
    }

    @Test
    void aDvDtFloorOfZeroLeavesTheDampingFloor() {
        Parts.Dr d = Parts.dr();
        d.vNegMin = -10;
        OperatingPoint.Spec o = bridge();
        o.vDriveNeg = -2.0;
        ShownFigures f = shown(Parts.sw(), d, o);
        // −2 V off: even 0 Ω keeps the induced voltage (2.778 V) below V_th,min + 2 V at both corners (computed);
        // the damping floor (0 Ω, REFERENCES §3) stands.
        assertEquals(0, f.rgMin, 0.0);
        assertEquals("damping ζ ≥ 0.7", f.rgFloor);
        // R_g,off: the holding path may be 5.0758 Ω (computed), less 2.4 Ω = 2.68 Ω, more than the 2 Ω it has.
        assertEquals("a deeper negative off level or a driver with a Miller clamp", f.dvdtFix());
    }

    @Test
    void aMillerClampDriverAboveTheFloorHasOneWayLeft() {
        Parts.Dr d = Parts.dr();
        d.millerClamp = true;
        OperatingPoint.Spec o = bridge();
        o.rG = 5.0;
        ShownFigures f = shown(Parts.sw(), d, o);
        // Held by the clamp, 1.4·1 + 1 Ω: the floor is 4.5021 Ω (computed), below R_g 5 Ω.
        close(4.5021, f.rgMin, 2e-4, "floor");
        assertEquals("a negative off level", f.dvdtFix());
    }

    @Test
    void aKnownTwinIsNamedAndSetsNoFloor() {
        OperatingPoint.Spec o = bridge();
        o.twin = new OperatingPoint.Twin("HS1", 5e9, 4e9);
        ShownFigures f = shown(Parts.sw(), Parts.dr(), o);
        assertEquals("damping ζ ≥ 0.7", f.rgFloor);
        assertEquals("slow HS1's turn-on (a larger R_g there), a negative off level or a driver with a Miller clamp",
                f.dvdtFix());
        Figure dv = figure(f, "dv-dt");
        assertTrue(dv.label().startsWith("bus / HS1's turn-on plateau, 125 °C"), dv.label());
        assertTrue(dv.estimated());
    }

    @Test
    void aCapacitiveDividerBelowThresholdAllowsAnyDvDt() {
        Parts.Dr d = Parts.dr();
        d.vNegMin = -10;
        OperatingPoint.Spec o = bridge();
        o.vDriveNeg = -5.0;
        ShownFigures f = shown(Parts.sw(), d, o);
        // An open gate takes V_bus·C_gd/(C_gd + C_gs) = 48·0.3125/(0.3125 + 2.95) = 4.598 V of the edge (REFERENCES §8),
        // short of 1.4 + 5 V: no dv/dt reaches V_th,min, the figure is left out (JSON has no infinity).
        assertEquals(Double.POSITIVE_INFINITY, f.dvdtAllowed);
        assertTrue(f.figures().stream().noneMatch(x -> x.name().equals("dv-dt-allowed")), f.figures().toString());
    }

    private static Figure figure(ShownFigures f, String name) {
        return f.figures().stream().filter(x -> x.name().equals(name)).findFirst()
                .orElseThrow(() -> new AssertionError("no " + name + " in " + f.figures()));
    }

    @Test
    void theFigureListCarriesThePlateauFiguresAndSaysWhereTheResistancesComeFrom() {
        ShownFigures f = shown(Parts.sw(), Parts.dr(), Parts.op());
        // REFERENCES §8: the plateau needs n·Q_gd/t = 15 nC/50 ns = 0.3 A; the turn-off plateau current at the slow
        // corner is (V_pl − V_off)/R_off = 5/(1.4·1 + 2 + 1) = 1.1364 A, under the 6 A rating.
        close(0.3, figure(f, "gate-current-plateau-required").value(), 1e-12, "plateau need");
        Figure off = figure(f, "gate-current-plateau-off");
        close(1.1364, off.value(), 1e-4, "plateau current off");
        assertTrue(off.label().endsWith(", 125 °C"), off.label());
        assertEquals("from the catalog", figure(f, "driver-resistance-source").label());
        assertEquals("from the catalog", figure(f, "driver-resistance-sink").label());
        assertFalse(figure(f, "driver-resistance-sink").estimated());

        // REFERENCES §1: without catalog resistances the driver is V/I_peak, 10/4 = 2.5 Ω and 10/6 = 1.667 Ω, said so.
        Parts.Dr d = Parts.dr();
        d.rSource = Double.NaN;
        d.rSink = Double.NaN;
        ShownFigures e = shown(Parts.sw(), d, Parts.op());
        Figure src = figure(e, "driver-resistance-source");
        Figure snk = figure(e, "driver-resistance-sink");
        close(2.5, src.value(), 1e-12, "estimated source");
        close(10.0 / 6, snk.value(), 1e-12, "estimated sink");
        assertEquals("estimated as V / I_source,peak", src.label());
        assertEquals("estimated as V / I_sink,peak", snk.label());
        assertTrue(figure(e, "gate-current-plateau-off").estimated());
    }

    @Test
    void theFigureListCarriesTheDvDtFiguresOfABridge() {
        ShownFigures f = shown(Parts.sw(), Parts.dr(), bridge());
        // V_th,min at the deciding 125 °C corner: 2 − 0.006·100 = 1.4 V (JunctionTemperature's Si coefficient, from memory)
        Figure th = figure(f, "threshold-min-at-corner");
        close(1.4, th.value(), 1e-12, "threshold");
        assertEquals("V_th,min at 125 °C", th.label());
        Figure dv = figure(f, "dv-dt");
        close(2.7586, dv.value(), 1e-4, "dv/dt in V/ns"); // 48 V·(5 V/5.8 Ω)/15 nC
        assertTrue(dv.label().startsWith("bus / the twin's turn-on plateau, 125 °C"), dv.label());
        close(1.0513, figure(f, "dv-dt-allowed").value(), 1e-4, "allowed dv/dt in V/ns");

        OperatingPoint.Spec given = bridge();
        given.dvdt = 50e9;
        Figure g = figure(shown(Parts.sw(), Parts.dr(), given), "dv-dt");
        assertEquals(50, g.value(), 1e-9);
        assertTrue(g.label().startsWith("as given"), g.label());
        assertFalse(g.estimated());
    }

    @Test
    void bootstrapInrushAndDutyLimitOfAHighSide() {
        OperatingPoint.Spec o = Parts.op();
        o.highSide = true;
        ShownFigures f = shown(Parts.sw(), Parts.dr(), o);
        // REFERENCES §4: first charge (V_drive − V_F)/R_boot = (10 − 0.7)/2.2 Ω = 4.2273 A
        close(4.2273, f.bootInrush, 1e-4, "inrush");
        close(4.2273, figure(f, "bootstrap-inrush").value(), 1e-4, "inrush figure");
        // the duty limit PairFigures solves (BootstrapBalanceTest checks it) is listed as it is
        assertEquals(f.f.bootDutyMax(), figure(f, "bootstrap-duty-max").value(), 0.0);
    }

    @Test
    void noInrushWhenTheBootstrapHasNoDroopToSpare() {
        // UVLO,off 9 V and a 1 V diode: the capacitor charges to 10 − 1 = 9 V, exactly the floor (R_on specified at
        // 4.5 V, below it): ΔV = 0 (REFERENCES §4), the bootstrap is not sized and its inrush not shown.
        Parts.Sw s = Parts.sw();
        s.rOnVgs = 4.5;
        Parts.Dr d = Parts.dr();
        d.uvloOn = 9.5;
        d.uvloOff = 9.0;
        OperatingPoint.Spec o = Parts.op();
        o.highSide = true;
        o.diodeDrop = 1.0;
        ShownFigures f = shown(s, d, o);
        assertEquals(0, f.f.bootDroop(), 0.0);
        assertTrue(Double.isNaN(f.bootInrush), "inrush " + f.bootInrush);
    }

    @Test
    void noAllowedDvDtAgainstAZeroThreshold() {
        // V_th,min 0 V at the 25 °C corner: any injection reaches it; the allowed dv/dt is left out.
        Parts.Sw s = Parts.sw();
        s.vThMin = 0;
        OperatingPoint.Spec o = bridge();
        o.tj = 25.0;
        ShownFigures f = shown(s, Parts.dr(), o);
        assertEquals(0, f.f.vThSeen(), 0.0);
        assertTrue(Double.isNaN(f.dvdtAllowed), "allowed " + f.dvdtAllowed);
    }

    @Test
    void withoutLoopInductanceThereIsNoCriticalResistanceOrDamping() {
        OperatingPoint.Spec o = Parts.op();
        o.loop = 0.0;
        ShownFigures f = shown(Parts.sw(), Parts.dr(), o);
        // R_crit = 2·√(L/C) and ζ = (R/2)·√(C/L) (REFERENCES §3) have no meaning at L = 0: left out, not 0.
        assertTrue(Double.isNaN(f.rCrit), "critical " + f.rCrit);
        assertTrue(Double.isNaN(f.zeta), "damping " + f.zeta);
        assertTrue(Double.isNaN(f.rgMin), "floor " + f.rgMin);
    }

    /**
     * A pair whose range is exact in binary: 25 °C (driver factor 1), R_source 0, R_g,int 0, drive-current
     * margin 1, a 30 ns edge: the plateau needs 15 nC/30 ns = 0.5 A, the top is (10 − 5)/0.5 = 10 Ω exactly
     * (REFERENCES §8); with C_iss 3 nF the damping floor is 0.7·2·√(L/3 nF) (REFERENCES §3).
     */
    private static ShownFigures exactRange(double loop) {
        Parts.Sw s = Parts.sw();
        s.rGInt = 0;
        Parts.Dr d = Parts.dr();
        d.rSource = 0;
        OperatingPoint.Spec o = Parts.op();
        o.tj = 25.0;
        o.edge = 30e-9;
        o.loop = loop;
        return shown(s, d, o, margins(1, 0.10));
    }

    @Test
    void aFloorThatIsItselfAnE24ValueIsRecommended() {
        // L = 126.75 nH: R_crit = 2·√42.25 = 13 Ω, floor 0.7·13 = 9.1 Ω, an E24 value; aim max(9.1, 5) → 9.1 Ω
        ShownFigures f = exactRange(126.75e-9);
        assertEquals(9.1, f.rgMin, 1e-12);
        assertEquals(10, f.rgMax, 0.0);
        assertEquals(9.1, f.rgRecommended, 1e-12);
    }

    @Test
    void aTopThatIsItselfAnE24ValueIsRecommended() {
        // L = 147 nH: R_crit = 2·√49 = 14 Ω, floor 9.8 Ω; aim 9.8 → E24 nearest 10 Ω, exactly the top
        ShownFigures f = exactRange(147e-9);
        close(9.8, f.rgMin, 1e-12, "floor");
        assertEquals(10, f.rgMax, 0.0);
        assertEquals(10, f.rgRecommended, 1e-12);
    }

    @Test
    void noTurnOffResistorIsOfferedAgainstAZeroThreshold() {
        // V_th,min 0 V at 25 °C and a 0 V off level: the dv-dt limit 0.7·0 − 0 = 0 V leaves no holding resistance
        // to offer, even with a 0 Ω sink and no R_g,int (the path would be 0 Ω, nothing to lower).
        Parts.Sw s = Parts.sw();
        s.vThMin = 0;
        s.rGInt = Double.NaN;
        Parts.Dr d = Parts.dr();
        d.rSink = 0;
        OperatingPoint.Spec o = bridge();
        o.tj = 25.0;
        ShownFigures f = shown(s, d, o);
        assertEquals("a negative off level or a driver with a Miller clamp", f.dvdtFix());
    }
}
