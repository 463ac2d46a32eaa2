package org.gatefit.report;

import java.io.IOException;
import java.io.Writer;
import org.gatefit.match.Eng;
import org.gatefit.match.Figure;
import org.gatefit.match.GateNetwork;
import org.gatefit.match.OperatingPoint;
import org.gatefit.match.PairResult;
import org.gatefit.match.SwitchPart;
import org.gatefit.physics.JunctionTemperature;

/**
 * {@code explain --format spice}: a plain SPICE netlist of one pair's gate loop, to run in any
 * SPICE simulator with behavioural sources (ngspice in the tests). The per-switch equivalent of one
 * driver output: the driver as a pulse source behind its source resistance while high and its sink
 * resistance while low (each edge sees its own, as gatefit's model), the loop inductance, the network's gate resistors, turn-off
 * diode, pull-down and clamp ({@link GateNetwork}), the internal gate resistance, and the switch's
 * gate as a charge model — C_gs, and a Miller capacitance C_gd = Q_gd / V_bus (the charge over the
 * swing, REFERENCES.md §8) — with a behavioural channel into a clamped inductive load from the bus,
 * as {@code NgspiceCrossCheckTest} models it. Every value's source is named in a comment, in ASCII
 * (simulators differ on other characters). {@code .tran} runs the turn-on edge; {@code .meas} lines
 * give its plateau time and peak gate voltage, gatefit's figures {@code plateau-time-on} and
 * {@code gate-peak-on}.
 */
final class GateSpice {
    /** When the pulse rises, s. */
    static final double DELAY = 10e-9;
    /** Bus used for the Miller capacitance when none is given, V (the plateau time depends on Q_gd only). */
    static final double BUS_ASSUMED = 100;
    /** Load current when the switch has no rating, A. */
    static final double LOAD_ASSUMED = 10;
    /** The channel's overdrive at the load current, V: a steep channel, so the plateau sits at V_pl. */
    static final double OVERDRIVE = 0.1;
    /** The resistor that stands for "none" (0 Ω), Ω. */
    static final double RG_MIN = 1e-3;

    private GateSpice() {
    }

    /**
     * Writes the deck. The switch's C_iss, Q_gd and plateau and the driver's resistances must be
     * known (else IllegalArgumentException naming what is missing).
     */
    static void write(PairResult p, GateDrive drive, GateNetwork network, Writer out) throws IOException {
        if (drive == null) {
            throw new IllegalArgumentException("cannot write a SPICE deck without the switch");
        }
        SwitchPart s = drive.switchPart();
        OperatingPoint op = p.point();
        int n = op.parallel();
        double rSrc = fig(p, "driver-resistance-source");
        double rSnk = fig(p, "driver-resistance-sink");
        require(s.cIss(), "the switch's C_iss (c_iss_pf)");
        require(s.qGd(), "the switch's Q_gd (q_gd_nc)");
        require(s.vPlateau(), "the switch's plateau voltage (v_plateau_v)");
        require(rSrc, "the driver's source resistance");
        require(rSnk, "the driver's sink resistance");
        double kHot = JunctionTemperature.driverResistanceFactor(op.tj());
        double kFast = Math.min(1, kHot);
        double kSlow = Math.max(1, kHot);
        double bus = op.bus() > 0 ? op.bus() : BUS_ASSUMED;
        double cgd = s.qGd() / bus;
        double cgs = s.cIss() - cgd;
        if (!(cgs > 0)) {
            throw new IllegalArgumentException("cannot write a SPICE deck: Q_gd / V_bus (" + Eng.of(cgd, "F")
                    + ") is not below C_iss (" + Eng.of(s.cIss(), "F") + ")");
        }
        double il = s.iCont() > 0 ? s.iCont() : LOAD_ASSUMED;
        double vth = s.vPlateau() - OVERDRIVE;
        double gm = il / OVERDRIVE;
        double rInt = Double.isNaN(s.rGInt()) ? 0 : s.rGInt();
        double edge = fig(p, "delay-time-on") + fig(p, "plateau-time-on");
        double ring = 2 * Math.PI * Math.sqrt(n * op.loop() * s.cIss());
        double ton = Math.min(0.5 / op.fSw(), Math.max(20 * ring, Double.isNaN(edge) ? 100e-9 : 10 * edge));
        double stop = DELAY + ton;
        double plateau = fig(p, "plateau-time-on");
        double step = Math.min(ring / 100, Double.isNaN(plateau) ? ring / 100 : plateau / 200);
        step = Math.max(step, stop / 2e6);

        StringBuilder d = new StringBuilder();
        d.append("* gatefit gate-loop deck: driver ").append(p.driver()).append(" with switch ").append(p.switchPart()).append('\n');
        d.append("* operating point: ").append(MatchJson.pointLine(op)).append('\n');
        d.append("* ").append(Caution.TEXT).append('\n');
        d.append("* Dialect: .param, B sources with u(), max() and exp(), and .meas, as ngspice reads them (gatefit's")
                .append(" tests run such decks in ngspice; LTspice reads the same, from memory). A simulator without B sources")
                .append(" needs the two B lines rewritten as its own behavioural current sources.\n");
        d.append("* One switch's share of the driver output: with ").append(n).append(" switch(es) in parallel the driver's")
                .append(" resistances and the loop inductance are taken ").append(n).append(" times (the same damping and")
                .append(" ring frequency as the whole output).\n");
        d.append("* Driver output resistance factor kdrv: 1 at 25 C, ").append(num(kHot)).append(" at ").append(num(op.tj()))
                .append(" C (JunctionTemperature, from memory, REFERENCES.md section 8). gate-peak-on is judged at the fast")
                .append(" corner, kdrv = ").append(num(kFast)).append("; plateau-time-on at the slow corner, kdrv = ")
                .append(num(kSlow)).append(".\n");
        d.append("* The pulse source does not limit the current to the driver's rated peak; gatefit's figures do.\n");
        d.append(".param kdrv=").append(num(kFast)).append('\n');
        d.append(".param von=").append(num(op.vDrive())).append(" voff=").append(num(op.vDriveNeg()))
                .append(" ; operating point's on and off levels, V\n");
        d.append(".param rsrc=").append(num(n * rSrc)).append(" ; figure driver-resistance-source")
                .append(n > 1 ? " x " + n : "").append(", ohm\n");
        d.append(".param rsnk=").append(num(n * rSnk)).append(" ; figure driver-resistance-sink")
                .append(n > 1 ? " x " + n : "").append(", ohm\n");
        d.append(".param lloop=").append(num(n * op.loop())).append(" ; operating point's gate-loop inductance")
                .append(n > 1 ? " x " + n : "").append(", H\n");
        d.append(".param rgint=").append(num(rInt)).append(" ; switch's r_g_int_ohm")
                .append(Double.isNaN(s.rGInt()) ? " (unknown: 0)" : "").append(", ohm\n");
        d.append(".param cgd=").append(num(cgd)).append(" ; Q_gd / V_bus = ").append(num(s.qGd())).append(" C / ")
                .append(num(bus)).append(" V").append(op.bus() > 0 ? "" : " (bus assumed)").append(", F\n");
        d.append(".param cgs=").append(num(cgs)).append(" ; C_iss - C_gd, C_iss from c_iss_pf, F\n");
        d.append(".param vbus=").append(num(bus)).append(" il=").append(num(il)).append(" ; bus, V; load current")
                .append(s.iCont() > 0 ? " = the switch's i_cont_a" : " assumed").append(", A\n");
        d.append(".param vth=").append(num(vth)).append(" gm=").append(num(gm)).append(" ; a steep behavioural channel:")
                .append(" the plateau sits at v_plateau_v ").append(num(s.vPlateau())).append(" V at the load current\n");
        d.append(".param ton=").append(num(ton)).append(" ; on time: the turn-on edge and its settling\n");
        d.append("* .tran runs the turn-on edge, whose figures gatefit gives; run it to ").append(num(DELAY + 2 * ton))
                .append(" s to see the turn-off (the hard-switched drain and its clamp diode make that part slow to simulate)\n");

        d.append("* Driver: pulse source behind its source resistance while high, its sink resistance while low (a\n"
                + "* behavioural resistor; ideal diodes with a small emission coefficient do the same but slow the simulation)\n");
        d.append("Vdrv drv 0 PULSE({voff} {von} ").append(num(DELAY)).append(" 1p 1p {ton} ").append(num(4 * ton)).append(")\n");
        // The unit step u() rather than "? :": ngspice reads it (SpiceDeckNgspiceTest) and, from memory, so does LTspice.
        d.append("Bdrv drv out I=(V(drv)-V(out))/({rsnk*kdrv}+({rsrc*kdrv}-{rsnk*kdrv})*u(V(drv)-{(von+voff)/2}))\n");
        d.append("Lloop out gx {lloop}\n");
        d.append("* Gate-drive network (GateNetwork; explain's section)\n");
        // The operating point's resistors, which the figures were computed with; the network's parts
        // where they are the same resistors (its turn-off diode), its recommendation as a comment.
        double rg = Math.max(op.rG(), RG_MIN);
        double rgOff = Math.max(op.rGOff(), RG_MIN);
        boolean offDiode = network != null && network.part("turn-off diode").isPresent() && op.rG() > 0;
        boolean onDiode = network != null && network.part("turn-on diode").isPresent() && op.rG() > 0;
        if (offDiode) {
            d.append("Rgon gx g ").append(num(rg)).append(" ; turn-on gate resistor R_g\n");
            d.append("Dgoff g ngoff DSCHOTTKY ; turn-off diode, anode at the gate\n");
            d.append("Rgoff ngoff gx ").append(num(rgOff)).append(" ; turn-off gate resistor R_g,off\n");
        } else if (onDiode) {
            d.append("Dgon gx ngon DSCHOTTKY ; turn-on diode, anode at the driver\n");
            d.append("Rgon ngon g ").append(num(rg)).append(" ; turn-on gate resistor R_g\n");
            d.append("Rgoff gx g ").append(num(rgOff)).append(" ; turn-off gate resistor R_g,off\n");
        } else {
            d.append("Rg gx g ").append(num(rg)).append(" ; the operating point's R_g").append(op.rG() > 0 ? ""
                    : " (none given: " + num(RG_MIN) + " ohm stands for the short)").append('\n');
            if (!(op.rG() > 0) && network != null) {
                network.part("gate resistor").ifPresent(r -> d.append("* the network recommends R_g = ").append(num(r.value()))
                        .append(" ohm; put it here to see its effect\n"));
            }
        }
        double pd = value(network, "gate–source pull-down");
        if (!Double.isNaN(pd)) {
            d.append("Rpd g 0 ").append(num(pd)).append(" ; gate-source pull-down\n");
        }
        double vz = value(network, "gate clamp (Zener)");
        double vzn = value(network, "negative gate clamp (Zener)");
        if (!Double.isNaN(vz) && !Double.isNaN(vzn)) {
            d.append("Dz1 nz g DZP ; positive gate clamp, ").append(num(vz)).append(" V, cathode at the gate\n");
            d.append("Dz2 nz 0 DZN ; negative gate clamp, ").append(num(vzn)).append(" V, back to back\n");
        } else if (!Double.isNaN(vz)) {
            d.append("Dz1 0 g DZP ; gate clamp, ").append(num(vz)).append(" V, cathode at the gate\n");
        }
        if (network != null) {
            network.part("output supply capacitor").ifPresent(c -> d.append("* output supply capacitor ")
                    .append(num(c.value())).append(" F: the pulse source stands for the driver and its decoupled supply\n"));
            network.part("bootstrap capacitor").ifPresent(c -> d.append("* bootstrap capacitor ").append(num(c.value()))
                    .append(" F: the source of this deck is the switch's own source; the bootstrap supply is not modelled\n"));
        }
        d.append("* Switch: internal gate resistance and the gate-charge model\n");
        d.append("Rgint g gi {rgint}\nCgs gi 0 {cgs}\nCgd gi d {cgd}\n");
        d.append("Bch d 0 I={gm}*max(V(gi)-{vth},0)*(1-exp(-max(V(d),0)/0.5))\n");
        d.append("* Load: a clamped inductive load from the bus (a current source and a freewheeling diode)\n");
        d.append("IL bus d {il}\nDfw d bus DFW\nVbus bus 0 {vbus}\n");
        d.append(".model DSCHOTTKY D(IS=1e-6 N=1.05 RS=0.05) ; a small Schottky (from memory); its junction capacitance,"
                + " tens of pF, is left out: it slows the simulation and barely moves the turn-on figures\n");
        d.append(".model DFW D(IS=1e-12 RS=1m)\n");
        if (!Double.isNaN(vz)) {
            d.append(".model DZP D(IS=1e-12 RS=0.5 BV=").append(num(vz)).append(" IBV=1m) ; Zener, 0.5 ohm dynamic (from memory)\n");
        }
        if (!Double.isNaN(vzn)) {
            d.append(".model DZN D(IS=1e-12 RS=0.5 BV=").append(num(vzn)).append(" IBV=1m)\n");
        }
        d.append(".tran ").append(num(step)).append(' ').append(num(stop)).append(" 0 ").append(num(step)).append('\n');
        d.append("* turn-on plateau: the drain falls from 99 % to 1 % of the bus, scaled to the full swing (plateau-time-on)\n");
        d.append(".meas tran tpl1 WHEN v(d)=").append(num(0.99 * bus)).append(" FALL=1\n");
        d.append(".meas tran tpl2 WHEN v(d)=").append(num(0.01 * bus)).append(" FALL=1\n");
        d.append(".meas tran plateau_on PARAM='(tpl2-tpl1)/0.98'\n");
        d.append("* peak of the internal gate during the on time (gate-peak-on)\n");
        d.append(".meas tran vg_peak_on MAX v(gi) FROM=").append(num(DELAY)).append(" TO=").append(num(DELAY + ton)).append('\n');
        d.append(".end\n");
        out.write(ascii(d.toString()));
    }

    private static void require(double v, String what) {
        if (Double.isNaN(v)) {
            throw new IllegalArgumentException("cannot write a SPICE deck: " + what + " is unknown");
        }
    }

    private static double value(GateNetwork n, String role) {
        return n == null ? Double.NaN : n.part(role).map(GateNetwork.Part::value).orElse(Double.NaN);
    }

    private static double fig(PairResult p, String name) {
        return p.figure(name).map(Figure::value).orElse(Double.NaN);
    }

    /** A number as SPICE reads it (six significant digits, no locale). */
    static String num(double v) {
        return v == 0 ? "0" : new java.math.BigDecimal(v).round(new java.math.MathContext(6)).stripTrailingZeros().toString();
    }

    /** The deck in ASCII: the few non-ASCII signs of gatefit's words spelled out. */
    static String ascii(String s) {
        StringBuilder sb = new StringBuilder(s.length());
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            switch (c) {
                case 'Ω' -> sb.append("ohm");
                case 'µ' -> sb.append('u');
                case '·', '×' -> sb.append('*');
                case '−', '–', '—' -> sb.append('-');
                case '≥' -> sb.append(">=");
                case '≤' -> sb.append("<=");
                case '°' -> sb.append("deg");
                case '≈' -> sb.append('~');
                default -> sb.append(c < 128 ? c : '?');
            }
        }
        return sb.toString();
    }
}
