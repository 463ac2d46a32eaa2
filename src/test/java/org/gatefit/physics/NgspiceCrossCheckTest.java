package org.gatefit.physics;

import org.gatefit.testsupport.Ngspice;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.fail;

import java.io.IOException;
import java.nio.file.Path;
import java.util.Locale;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The closed forms of the switching dynamics against a circuit simulator, ngspice (Debian package
 * {@code ngspice}; {@code .ci/run} installs it when missing): each test writes a netlist, runs
 * {@code ngspice -b} and reads its {@code .meas} results.
 *
 * <ul>
 *   <li>the first peak of the series R-L-C gate loop's step response ({@link GateLoop#extreme}),
 *       turn-on overshoot and turn-off undershoot, within 0.5 % of the swing;</li>
 *   <li>the turn-on plateau (drain-voltage fall) time of a gate-charge model — C_gs, a Miller
 *       capacitance C_gd = Q_gd / V_bus (the charge over the swing), a behavioural channel current
 *       g_m·(V_gs − V_th) against a clamped inductive load — against Q_gd / I_plateau
 *       ({@link DriveCurrent#plateau}, {@link SwitchingTimes#plateauTime}), within 2 % (the simulated
 *       plateau sits a little above V_th + I_L/g_m because the channel also discharges C_gd), for a
 *       resistive driver, unipolar and bipolar (the cap at the rated peak is checked in
 *       {@code DynamicsTest} only).</li>
 * </ul>
 *
 * Without ngspice the tests fail in CI ({@code CI=true}) unless {@code GATEFIT_SKIP_NGSPICE=1}, and
 * are skipped with the install command elsewhere (as {@code HtmlBrowserTest} does for Chromium).
 */
class NgspiceCrossCheckTest {

    @TempDir
    Path dir;

    /** Runs a netlist in batch mode and returns ngspice's output. */
    private String run(String name, String netlist) throws IOException, InterruptedException {
        return Ngspice.run(dir, name, netlist, 120);
    }

    private static double meas(String output, String name) {
        return Ngspice.meas(output, name);
    }

    private static String n(double v) {
        return String.format(Locale.ROOT, "%.6g", v);
    }

    private void ringing(double r, double l, double c, double from, double to) throws Exception {
        double period = 2 * Math.PI * Math.sqrt(l * c);
        String netlist = "* series R-L-C gate loop, step " + from + " -> " + to + " V\n"
                + "V1 in 0 PULSE(" + n(from) + " " + n(to) + " 1n 1p 1p 1 2)\n"
                + "R1 in a " + n(r) + "\nL1 a g " + n(l) + "\nC1 g 0 " + n(c) + " IC=" + n(from) + "\n"
                + ".ic v(g)=" + n(from) + "\n"
                + ".tran " + n(period / 2000) + " " + n(2 * period) + " UIC\n"
                + ".meas tran vext " + (to > from ? "MAX" : "MIN") + " v(g)\n.end\n";
        double sim = meas(run("ring", netlist), "vext");
        double closed = GateLoop.extreme(r, l, c, from, to);
        assertEquals(sim, closed, 0.005 * Math.abs(to - from), "R " + r + " Ω, L " + l + " H, C " + c + " F, "
                + from + " → " + to + " V: ngspice " + sim + " V, closed form " + closed + " V");
    }

    @Test
    void gateLoopPeakAgreesWithNgspice() throws Exception {
        ringing(2, 100e-9, 4e-9, 0, 6);      // ζ 0.2: 9.16 V (REFERENCES §8)
        ringing(3, 100e-9, 3e-9, 0, 15);     // ζ 0.26: 21.4 V, the gate-ringing rule's fail row
        ringing(2, 100e-9, 3e-9, 10, 0);     // ζ 0.17: undershoot to −5.76 V
        ringing(1.5, 20e-9, 3.9e-9, 18, -5); // ζ 0.33, bipolar SiC-like swing
    }

    private double plateauSim(String gateSource, double qgd, double bus, double ciss) throws Exception {
        double cgd = qgd / bus;
        String netlist = "* gate-charge model: turn-on into a clamped inductive load\n"
                + gateSource
                + "Cgs g 0 " + n(ciss - cgd) + "\nCgd g d " + n(cgd) + "\n"
                + "Bd d 0 I=100*max(V(g)-2.9,0)*(1-exp(-max(V(d),0)/0.5))\n"
                + "IL bus d 10\nD1 d bus DMOD\n.model DMOD D(IS=1e-12 RS=1m)\n"
                + "Vbus bus 0 " + n(bus) + "\n"
                + ".tran 10p 300n\n"
                + ".meas tran t1 WHEN v(d)=" + n(0.99 * bus) + " FALL=1\n"
                + ".meas tran t2 WHEN v(d)=" + n(0.01 * bus) + " FALL=1\n.end\n";
        String out = run("plateau", netlist);
        return (meas(out, "t2") - meas(out, "t1")) / 0.98;
    }

    @Test
    void turnOnPlateauTimeAgreesWithNgspice() throws Exception {
        // REFERENCES §1's switch: Q_gd 6.9 nC, C_iss 3.9 nF, 12 V through 6.2 Ω; plateau 2.9 V + 10 A / (100 A/V) = 3 V.
        double sim = plateauSim("Vdrv drv 0 PULSE(0 12 1n 1p 1p 1u 2u)\nRg drv g 6.2\n", 6.9e-9, 400, 3.9e-9);
        double closed = SwitchingTimes.plateauTime(6.9e-9, DriveCurrent.plateau(12 - 3, 6.2, 4));
        assertEquals(closed, sim, 0.02 * closed, "ngspice " + sim + " s, closed form " + closed + " s (4.753 ns)");
        // A bipolar drive (−8 / +15 V) and REFERENCES §8's Q_gd 120 nC over a 600 V bus: (15 − 3) V / 4.7 Ω = 2.55 A → 47 ns.
        double big = plateauSim("Vdrv drv 0 PULSE(-8 15 1n 1p 1p 1u 2u)\nRg drv g 4.7\n", 120e-9, 600, 20e-9);
        double closedBig = SwitchingTimes.plateauTime(120e-9, DriveCurrent.plateau(15 - 3, 4.7, 10));
        assertEquals(closedBig, big, 0.02 * closedBig, "ngspice " + big + " s, closed form " + closedBig);
    }
}
