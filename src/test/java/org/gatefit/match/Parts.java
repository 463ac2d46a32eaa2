package org.gatefit.match;

import java.util.List;
import org.gatefit.physics.LogicFamily;

/**
 * Test parts with invented, round figures (not the demo catalog). {@link #sw()} and {@link #dr()}
 * start from a baseline pair that passes every rule at {@link #op()}'s baseline operating point:
 *
 * <ul>
 *   <li>switch TST-S1: Si MOSFET, 100 V, V_GS ±20 V, R_on specified at 10 V, V_th 2–4 V,
 *       Q_g 50 nC over 0–10 V (Q_gs 15 nC, Q_gd 15 nC, plateau 5 V), C_iss 3 nF, C_rss 50 pF,
 *       R_g,int 1 Ω;</li>
 *   <li>driver TST-D1: half-bridge, 4 A / 6 A, R_source 2 Ω, R_sink 1 Ω, supply 8–20 V, UVLO
 *       7 V rising / 6.5 V falling, V_IH 2.0 V, V_IL 0.8 V, 200 V offset, built-in bootstrap
 *       diode, I_qbs 50 µA, no negative rail, P_max 1 W;</li>
 *   <li>operating point: low side, 48 V bus, 100 kHz, 50 ns edge, +10 / 0 V, LVCMOS 3.3 V,
 *       R_g 2 Ω, a single-switch stage (no twin turns on against it), hot corner 125 °C.</li>
 * </ul>
 */
final class Parts {
    private Parts() {
    }

    static final class Sw {
        String pn = "TST-S1";
        Technology tech = Technology.SI_MOSFET;
        boolean nChannel = true;
        double vBlock = 100, iCont = 50, rOn = 5e-3, rOnVgs = 10, vCeSat = Double.NaN;
        double vThMin = 2, vThMax = 4, vGsMax = 20, vGsMin = -20, vGateOn = 10, vGateOff = 0;
        double qG = 50e-9, qGVgs = 10, qGs = 15e-9, qGd = 15e-9, vPlateau = 5;
        double cIss = 3e-9, cRss = 50e-12, rGInt = 1;
        double vGateOnMax = Double.NaN, vGateOffMin = Double.NaN, tSc = Double.NaN, tDOff = Double.NaN, tF = Double.NaN;
        String lifecycle = "active";
        long stock = 1000;
        double price = 1;

        SwitchPart build() {
            return new SwitchPart(pn, "Testmaker", "PKG", "PKG", tech, nChannel, vBlock, iCont, rOn, rOnVgs, vCeSat, vThMin,
                    vThMax, vGsMax, vGsMin, vGateOn, vGateOff, qG, qGVgs, qGs, qGd, vPlateau, cIss, cRss, rGInt,
                    Lifecycle.of(lifecycle), stock, price, new SwitchRatings(vGateOnMax, vGateOffMin, tSc, tDOff, tF));
        }
    }

    static final class Dr {
        String pn = "TST-D1";
        Topology topology = Topology.HALF_BRIDGE;
        List<Boolean> inverting = List.of(false);
        double iSource = 4, iSink = 6, rSource = 2, rSink = 1, vSupplyMin = 8, vSupplyMax = 20;
        double uvloOn = 7, uvloOff = 6.5, vIh = 2.0, vIl = 0.8, vInMax = 20, vOffsetMax = 200;
        Boolean bootstrapDiode = true;
        double iQbs = 50e-6, vNegMin = 0, tProp = 20e-9, tMatch = Double.NaN;
        Boolean millerClamp = false;
        double isolationVrms = Double.NaN, pMax = 1.0;
        int channels = 2;
        /** Optional ratings: V_IORM (V), CMTI (V/s), UVLO reference (null unknown, true total supply), I_q,out (A), Q_ls (C), fault protection. */
        double vIorm = Double.NaN, cmti = Double.NaN, iQOut = Double.NaN, qLs = Double.NaN, tDesat = Double.NaN;
        double bootClamp = Double.NaN, tPropMax = Double.NaN;
        Boolean uvloTotal = null, desat = null, softOff = null;
        String lifecycle = "active";
        long stock = 1000;
        double price = 1;

        DriverPart build() {
            return new DriverPart(pn, "Testmaker", "PKG", "PKG", topology, channels, inverting, iSource, iSink, rSource,
                    rSink, vSupplyMin, vSupplyMax, uvloOn, uvloOff, vIh, vIl, vInMax, vOffsetMax, bootstrapDiode, iQbs,
                    vNegMin, tProp, tMatch, millerClamp, isolationVrms, pMax, Lifecycle.of(lifecycle), stock, price,
                    new DriverRatings(vIorm, cmti, uvloTotal, iQOut, qLs, desat, tDesat, softOff, bootClamp, tPropMax));
        }
    }

    static Sw sw() {
        return new Sw();
    }

    static Dr dr() {
        return new Dr();
    }

    /** The baseline operating point as a spec, to be changed by a row and then resolved. */
    static OperatingPoint.Spec op() {
        OperatingPoint.Spec s = new OperatingPoint.Spec();
        s.highSide = false;
        s.bus = 48.0;
        s.fSw = 100e3;
        s.edge = 50e-9;
        s.vDrive = 10.0;
        s.vDriveNeg = 0.0;
        s.logic = LogicFamily.LVCMOS_3V3;
        s.rG = 2.0;
        s.loop = 10e-9;
        s.bridge = false; // a single-switch stage: the dv-dt rows put it in a bridge
        return s;
    }

    static PairResult eval(Sw s, Dr d, OperatingPoint.Spec op) {
        return eval(s, d, op, Margins.DEFAULT);
    }

    static PairResult eval(Sw s, Dr d, OperatingPoint.Spec op, Margins m) {
        SwitchPart sp = s.build();
        return Rules.evaluate(d.build(), sp, op.resolve(sp), m);
    }
}
