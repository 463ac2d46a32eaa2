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
}
