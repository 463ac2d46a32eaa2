package org.gatefit.match;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import org.gatefit.physics.DriveCurrent;
import org.gatefit.physics.JunctionTemperature;
import org.gatefit.physics.NetworkSizing;
import org.gatefit.physics.NetworkSizing.ResistorPackage;

/**
 * The supporting parts of one driver output's gate-drive circuit at an operating point — supply
 * capacitors, gate resistors, turn-off diode, pull-down, clamp and the bootstrap parts — sized
 * from the pair's figures ({@link PairResult#figures()}: gate charge, driver resistances, gate
 * peak, bootstrap sizing), never recomputing one, with the rules of {@link NetworkSizing}. Built
 * in this one place for every report. Resistors, pull-down and clamp are per switch; the supply
 * and bootstrap parts per driver output.
 *
 * @param parts the parts, in circuit order (supply, gate path, gate–source, bootstrap)
 * @param notes what was left out and why (a missing column), one sentence each
 */
public record GateNetwork(List<Part> parts, List<String> notes) {

    public GateNetwork {
        parts = List.copyOf(parts);
        notes = List.copyOf(notes);
    }

    /**
     * One supporting part.
     *
     * @param role   what it does, e.g. {@code output supply capacitor}
     * @param value  its value in SI units (for a diode its reverse-voltage rating)
     * @param unit   F, Ω or V
     * @param rating what it must be rated for, in words with the numbers
     * @param why    one sentence: the sizing rule and its source
     */
    public record Part(String role, double value, String unit, String rating, String why) {
        public Part {
            Objects.requireNonNull(role, "role");
            Objects.requireNonNull(unit, "unit");
            Objects.requireNonNull(rating, "rating");
            Objects.requireNonNull(why, "why");
            if (!Double.isFinite(value) || value <= 0) {
                throw new IllegalArgumentException("expected a positive value for " + role + ", got " + value);
            }
        }
    }

    /** A part by role. */
    public java.util.Optional<Part> part(String role) {
        return parts.stream().filter(p -> p.role().equals(role)).findFirst();
    }

    /** The resistor and the per-edge figures of one gate path (per switch). */
    record Edge(double r, double loop, double peak, double energy, double power) {
    }

    /** The network of a pair: the driver and switch the result {@code p} was evaluated for. */
    public static GateNetwork of(DriverPart d, SwitchPart s, PairResult p) {
        Objects.requireNonNull(d, "driver");
        Objects.requireNonNull(s, "switch");
        OperatingPoint op = p.point();
        Margins m = p.margins();
        int n = op.parallel();
        List<Part> parts = new ArrayList<>();
        List<String> notes = new ArrayList<>();
        double q = fig(p, "gate-charge-at-swing");
        double rSrc = fig(p, "driver-resistance-source");
        double rSnk = fig(p, "driver-resistance-sink");
        double rInt = s.rGIntOrZero();
        double swing = op.swing();
        double bootC = fig(p, "bootstrap-capacitance-recommended");
        double bootQ = fig(p, "bootstrap-charge");

        // Output-side supply.
        if (!Double.isNaN(q)) {
            double charge = n * q + (Double.isNaN(bootQ) ? 0 : bootQ);
            double droop = NetworkSizing.supplyDroop(swing);
            double c = NetworkSizing.supplyCapacitance(charge, droop, m.bootCapBias(), bootC);
            parts.add(new Part("output supply capacitor", c, "F", "≥ " + Eng.of(NetworkSizing.capacitorRating(swing), "V")
                    + " X7R or better, ≥ " + Eng.pct(m.bootCapBias()) + " of nominal left at " + Eng.of(swing, "V") + " DC bias",
                    "gives " + (n > 1 ? n + "·" : "") + "Q_g" + (Double.isNaN(bootQ) ? "" : " (the twin's turn-on on the same"
                    + " supply) + the bootstrap recharge (the high side's Q_g and drain)") + " = "
                    + Eng.of(charge, "C") + " per event within a droop of " + Eng.pct(NetworkSizing.SUPPLY_DROOP_FRACTION)
                    + " of the " + Eng.of(swing, "V") + " supply (" + Eng.of(droop, "V") + "; common practice, no source) at "
                    + Eng.pct(m.bootCapBias()) + " of nominal left at its DC bias (boot-cap-bias)"
                    + (Double.isNaN(bootC) ? "" : ", and ≥ " + Eng.num(org.gatefit.physics.Bootstrap.DECOUPLING_FACTOR)
                            + "× C_boot (common practice, no source)")
                    + ", at least " + Eng.of(NetworkSizing.SUPPLY_MIN, "F") + " (common practice, no source), E6, rated ≥ " + Eng.num(NetworkSizing.CAPACITOR_VOLTAGE_FACTOR) + "× the supply (common practice,"
                    + " no source); beside the driver's supply pins" + (op.vDriveNeg() < 0 ? ", one on each rail to the"
                    + " source reference for a bipolar drive" : "") + "."));
        } else {
            notes.add("output supply capacitor: needs the switch's gate charge (q_g_nc).");
        }
        if (d.topology() == Topology.ISOLATED || !Double.isNaN(d.isolationVrms())) {
            double logic = Double.isNaN(op.vOhMax()) ? 5 : Math.max(op.vOhMax(), 3.3);
            parts.add(new Part("input supply capacitor", NetworkSizing.LOGIC_DECOUPLING, "F", "≥ "
                    + Eng.of(NetworkSizing.capacitorRating(logic), "V") + " X7R",
                    "the logic side of a driver with two supplies gets its own " + Eng.of(NetworkSizing.LOGIC_DECOUPLING, "F")
                    + " beside its supply pin, returned to the logic ground, never to the output side (common practice,"
                    + " no source)."));
        }

        // Gate path.
        double rOn = op.rG() > 0 ? op.rG() : fig(p, "gate-resistor-recommended");
        boolean rOnRecommended = !(op.rG() > 0);
        double rOff = op.rGOff() != op.rG() ? op.rGOff() : rOn;
        Edge on = Double.isNaN(rOn) || Double.isNaN(rSrc) || Double.isNaN(q) ? null
                : edge(q, swing, op.fSw(), n * rSrc, rOn, rInt, d.iSource() / n);
        Edge off = Double.isNaN(rOff) || Double.isNaN(rSnk) || Double.isNaN(q) || !(rOff > 0) ? null
                : edge(q, swing, op.fSw(), n * rSnk, rOff, rInt, d.iSink() / n);
        double pulse = fig(p, "delay-time-on") + fig(p, "plateau-time-on");
        String pulseNote = pulse > NetworkSizing.PULSE_MAX_DURATION ? " The edge lasts " + Eng.of(pulse, "s") + ", longer than the "
                + Eng.of(NetworkSizing.PULSE_MAX_DURATION, "s") + " the pulse allowance is meant for: check the part's pulse curve."
                : "";
        String src = rOnRecommended ? "the recommended E24 value (no R_g given)" : "the operating point's R_g";
        if (on == null) {
            notes.add("gate resistor: needs a resistor (--rg) or the switch's C_iss for a recommended one, the gate charge"
                    + " and the driver's output resistance.");
        } else if (off != null && rOff == rOn) {
            double power = on.power() + off.power();
            Edge worst = on.peak() * on.peak() * on.r() >= off.peak() * off.peak() * off.r() ? on : off;
            parts.add(resistor("gate resistor", rOn, power, worst, Math.max(on.energy(), off.energy()),
                    src + ", one resistor for both edges; average power from the gate-power split (½·Q_g·ΔV·f shared in"
                    + " proportion to R at each edge), peak current swing / loop resistance." + pulseNote));
        } else {
            parts.add(resistor("turn-on gate resistor", rOn, on.power(), on, on.energy(),
                    src + "; average power its share of the turn-on half of the gate power, peak current swing / turn-on"
                    + " loop resistance." + pulseNote));
            if (off != null) {
                parts.add(resistor("turn-off gate resistor", rOff, off.power(), off, off.energy(),
                        "the operating point's R_g,off; average power its share of the turn-off half of the gate power, peak"
                        + " current swing / turn-off loop resistance."));
                boolean faster = rOff < rOn;
                double vr = NetworkSizing.diodeRating(swing);
                if (!Double.isNaN(vr)) {
                    parts.add(new Part(faster ? "turn-off diode" : "turn-on diode", vr, "V", "Schottky, V_R ≥ " + Eng.of(swing, "V") + ", peak "
                            + Eng.of(faster ? off.peak() : on.peak(), "A") + " repetitive",
                            "in series with " + (faster ? "R_g,off (anode at the gate)" : "R_g (anode at the driver)") + ", that branch beside "
                            + (faster ? "R_g" : "R_g,off") + ": " + (faster ? "turn-on" : "turn-off") + " flows through "
                            + (faster ? "R_g" : "R_g,off") + " alone, " + (faster ? "turn-off" : "turn-on") + " through both in"
                            + " parallel (" + Eng.of(rOn * rOff / (rOn + rOff), "Ω") + " plus the diode's drop); the figures take"
                            + " each resistor alone, which a second diode in the other branch or a driver with split outputs"
                            + " makes exact; a Schottky has no reverse-recovery charge to slow the edge."));
                }
            }
        }

        // Gate to source.
        double vTh = Math.min(PairFigures.thresholdAt(s, JunctionTemperature.DATASHEET_C), PairFigures.thresholdAt(s, op.tj()));
        if (!Double.isNaN(vTh) && vTh > 0 && on != null) {
            double leak = NetworkSizing.GATE_LEAKAGE_ASSUMED;
            double r = NetworkSizing.pullDown(vTh, leak, on.loop());
            String held = op.bus() > 0 && s.qGd() > 0 ? " With the driver unpowered it alone holds the gate below V_th,min"
                    + " against a drain ramp up to " + Eng.slew(NetworkSizing.pullDownSlew(vTh, op.bus(), r, s.qGd()))
                    + " (V_th,min·V_bus/(R·Q_gd)); faster ramps need the driver powered first." : "";
            parts.add(new Part("gate–source pull-down", r, "Ω", "≥ " + Eng.of(op.vDrive() * op.vDrive() / r, "W")
                    + " at the on level, any package",
                    "E24 within " + Eng.of(NetworkSizing.PULL_DOWN_LOW, "Ω") + "–" + Eng.of(NetworkSizing.PULL_DOWN_HIGH, "Ω")
                    + " (common practice, no source): gate leakage " + Eng.of(leak, "A") + " (I_GSS assumed, from memory)"
                    + " × R ≤ V_th,min/10 (" + Eng.of(vTh, "V") + " at the hotter corner) and ≥ 99× the turn-on loop ("
                    + Eng.of(on.loop(), "Ω") + ") so the gate settles within 1 % of the on level; at each switch's gate and"
                    + " source." + held));
        } else {
            notes.add("gate–source pull-down: needs the switch's V_th,min and a gate resistor.");
        }
        clamps(p, s, op, parts, notes);

        // Bootstrap.
        if (!Double.isNaN(bootC)) {
            double vBoot = op.vDrive() - op.diodeDrop();
            parts.add(new Part("bootstrap capacitor", bootC, "F", "≥ " + Eng.of(NetworkSizing.capacitorRating(op.vDrive()), "V")
                    + " X7R or better, ≥ " + Eng.pct(m.bootCapBias()) + " of nominal left at " + Eng.of(vBoot, "V") + " DC bias",
                    "the bootstrap-capacitance-recommended figure: " + Eng.num(org.gatefit.physics.Bootstrap.RECOMMENDED_FACTOR)
                    + "× the minimum Q/ΔV at the capacitance left at its DC bias, E12; between the driver's boot and"
                    + " switch-node pins."));
            if (Boolean.TRUE.equals(d.bootstrapDiode())) {
                notes.add("bootstrap diode: the driver has its own (bootstrap_diode = yes).");
            } else if (op.bus() > 0) {
                double need = op.bus() * (1 + m.offset());
                double vr = NetworkSizing.diodeRating(need);
                if (!Double.isNaN(vr)) {
                    parts.add(new Part("bootstrap diode", vr, "V", "V_RRM ≥ " + Eng.of(need, "V") + ", ultrafast (t_rr ≤ 50 ns)"
                            + " or Schottky",
                            "blocks the bus when the switch node is high: the bus plus the offset margin ("
                            + Eng.pct(m.offset()) + ", for switch-node overshoot); a fast part, because its recovery charge is"
                            + " drawn from the bootstrap capacitor at every rise of the switch node (from memory)."));
                } else {
                    notes.add("bootstrap diode: " + Eng.of(need, "V") + " is above the usual ratings; use an isolated supply.");
                }
            } else {
                notes.add("bootstrap diode: needs the bus voltage (--bus) for its reverse rating.");
            }
            double inrush = fig(p, "bootstrap-inrush");
            if (op.rBoot() > 0 && !Double.isNaN(inrush) && !Double.isNaN(bootQ)) {
                // Each refresh recharges C_boot by ΔV = Q/C through R_boot: ½·C·ΔV² = Q²/(2C) in the loop
                // (plain circuit theory, the resistor's share at most that), peak ΔV/R_boot.
                double energy = bootQ * bootQ / (2 * bootC);
                double peak = bootQ / (bootC * op.rBoot());
                ResistorPackage pkg = NetworkSizing.resistorPackage(energy * op.fSw(), peak * peak * op.rBoot());
                double first = 0.5 * bootC * vBoot * vBoot;
                parts.add(new Part("bootstrap resistor", op.rBoot(), "Ω", Eng.of(energy * op.fSw(), "W") + " average, "
                        + Eng.of(peak, "A") + " peak per refresh → " + (pkg == null ? "no chip size of the table: a"
                        + " pulse-rated part" : pkg.code() + " (" + Eng.of(pkg.rating(), "W") + ")") + "; first charge "
                        + Eng.of(inrush, "A") + " peak, " + Eng.of(first, "J") + " once",
                        "limits the first-charge inrush (V_drive − V_F)/R_boot (bootstrap-inrush) and the diode's recovery"
                        + " current; each refresh puts back the bootstrap charge, dissipating at most Q²/(2·C_boot) ("
                        + "½·C·ΔV², plain circuit theory) at a peak of ΔV/R_boot, package as for the gate resistors; the"
                        + " first charge at power-up is a single pulse of ½·C·V²: check it against the part's single-pulse"
                        + " rating."));
            }
        }
        return new GateNetwork(parts, notes);
    }

    /** The clamp parts: the positive side, and the negative side for a bipolar drive. */
    private static void clamps(PairResult p, SwitchPart s, OperatingPoint op, List<Part> parts, List<String> notes) {
        String ring = p.check(Rule.GATE_RINGING).map(c -> c.verdict() == Verdict.PASS
                ? "the gate-ringing check passes, so the gate keeps its margin without one: optional, against spikes the"
                        + " model leaves out (Miller, ESD)"
                : "the gate-ringing check does not pass (" + c.verdict().id() + "): recommended").orElse("");
        if (Double.isNaN(s.vGsMax()) || !(s.vGsMax() > op.vDrive())) {
            notes.add("gate clamp: needs V_GS,max above the on level.");
            return;
        }
        double peak = fig(p, "gate-peak-on");
        double v = Double.isNaN(peak) ? Double.NaN : NetworkSizing.clampVoltage(Math.max(peak, op.vDrive()), s.vGsMax());
        boolean abovePeak = !Double.isNaN(v);
        if (!abovePeak) {
            v = NetworkSizing.clampVoltage(op.vDrive(), s.vGsMax());
        }
        if (Double.isNaN(v)) {
            notes.add("gate clamp: no E24 Zener (±" + Eng.pct(NetworkSizing.ZENER_TOLERANCE) + ") fits between the on level "
                    + Eng.of(op.vDrive(), "V") + " and V_GS,max " + Eng.of(s.vGsMax(), "V") + "; lower the on level.");
            return;
        }
        parts.add(new Part("gate clamp (Zener)", v, "V", "V_Z ±" + Eng.pct(NetworkSizing.ZENER_TOLERANCE) + ", "
                + Eng.of(v * (1 - NetworkSizing.ZENER_TOLERANCE), "V") + " to " + Eng.of(v * (1 + NetworkSizing.ZENER_TOLERANCE), "V"),
                "between " + (abovePeak ? "the ringing peak " + Eng.of(peak, "V") + " (gate-peak-on)" : "the on level "
                + Eng.of(op.vDrive(), "V") + " (it clips the ringing peak " + Eng.of(peak, "V") + ")") + " and V_GS,max "
                + Eng.of(s.vGsMax(), "V") + " with its tolerance, E24 (from memory: Zeners come in E24 voltages); "
                + (ring.isEmpty() ? "" : ring + "; ") + "at each gate, short leads to the source"
                + (op.vDriveNeg() < 0 ? "" : "; forward-biased it also clamps negative spikes at about −0.7 V") + "."));
        if (op.vDriveNeg() < 0) {
            double trough = fig(p, "gate-trough-off");
            double low = Double.isNaN(trough) ? -op.vDriveNeg() : Math.max(-trough, -op.vDriveNeg());
            double vn = Double.isNaN(s.vGsMin()) || s.vGsMin() >= 0 ? Double.NaN : NetworkSizing.clampVoltage(low, -s.vGsMin());
            if (Double.isNaN(vn) && !Double.isNaN(s.vGsMin()) && s.vGsMin() < 0) {
                vn = NetworkSizing.clampVoltage(-op.vDriveNeg(), -s.vGsMin());
            }
            if (Double.isNaN(vn)) {
                notes.add("negative gate clamp: needs V_GS,min below the off level " + Eng.of(op.vDriveNeg(), "V") + " with room"
                        + " for an E24 Zener.");
            } else {
                parts.add(new Part("negative gate clamp (Zener)", vn, "V", "V_Z ±" + Eng.pct(NetworkSizing.ZENER_TOLERANCE),
                        "back to back with the positive clamp (a bipolar drive would forward-bias a single Zener): between"
                        + " the off level " + Eng.of(op.vDriveNeg(), "V") + (Double.isNaN(trough) ? "" : " (trough "
                        + Eng.of(trough, "V") + ")") + " and V_GS,min " + Eng.of(s.vGsMin(), "V") + " with its tolerance, E24."));
            }
        }
    }

    /**
     * One gate path, per switch: the resistor {@code r} in a loop of the driver's resistance
     * {@code rDriver} (already times n), r and R_g,int; peak current swing / loop capped at the
     * rated peak per switch; energy per edge and average power ({@link NetworkSizing#edgeEnergy}).
     */
    static Edge edge(double q, double swing, double f, double rDriver, double r, double rInt, double ratedPerSwitch) {
        double loop = rDriver + r + rInt;
        double peak = DriveCurrent.peak(swing, rDriver, r, rInt, ratedPerSwitch);
        double e = NetworkSizing.edgeEnergy(q, swing, r, loop);
        return new Edge(r, loop, peak, e, e * f);
    }

    private static Part resistor(String role, double r, double power, Edge e, double energy, String why) {
        double pulse = e.peak() * e.peak() * r;
        ResistorPackage pkg = NetworkSizing.resistorPackage(power, pulse);
        String rating = Eng.of(power, "W") + " average, " + Eng.of(e.peak(), "A") + " peak (" + Eng.of(pulse, "W") + " I²R), "
                + Eng.of(energy, "J") + " per edge → " + (pkg == null ? "no chip size of the table: parallel resistors or"
                + " a pulse-rated part" : pkg.code() + " (" + Eng.of(pkg.rating(), "W") + ")");
        String series = org.gatefit.physics.ESeries.E24.contains(r) ? "E24; "
                : "not an E24 value (nearest " + Eng.of(org.gatefit.physics.ESeries.E24.roundNearest(r), "Ω") + "); ";
        return new Part(role, r, "Ω", rating, series + why + " Package: average ≤ " + Eng.pct(NetworkSizing.CONTINUOUS_DERATING)
                + " of the continuous rating (common practice, no source), peak ≤ " + Eng.num(NetworkSizing.PULSE_FACTOR)
                + "× it for edges under " + Eng.of(NetworkSizing.PULSE_MAX_DURATION, "s") + " (from memory; the part's pulse"
                + " curve decides).");
    }

    private static double fig(PairResult p, String name) {
        return p.figure(name).map(Figure::value).orElse(Double.NaN);
    }
}
