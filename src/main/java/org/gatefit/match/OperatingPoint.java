package org.gatefit.match;

import java.util.ArrayList;
import java.util.List;
import org.gatefit.physics.JunctionTemperature;
import org.gatefit.physics.LogicFamily;

/**
 * Where a pair works, in SI units, after defaults were applied; {@link #assumed()} lists every
 * value that was not given, so reports can print it. NaN marks a value that stays unknown.
 *
 * @param highSide   whether the switch's source floats (high side of a bridge)
 * @param bus        DC bus voltage, V (NaN unknown)
 * @param fSw        switching frequency, Hz
 * @param edge       target gate transition time, s
 * @param vDrive     on level, V (driver positive rail relative to source)
 * @param vDriveNeg  off level, V (≤ 0)
 * @param logic      controller family, or null when explicit levels are given
 * @param vOh        controller output-high minimum, V
 * @param vOl        controller output-low maximum, V
 * @param vOhMax     highest voltage the controller's output reaches, V (for the input's absolute maximum)
 * @param activeHigh whether the switch is meant to be on while the PWM signal is high
 * @param rG         external gate resistor for turn-on, per switch, Ω
 * @param rGOff      external gate resistor for turn-off, per switch, Ω
 * @param dutyMax    largest duty cycle, 0..1 (NaN unknown)
 * @param parallel   switches on this output
 * @param loop       gate-loop inductance, H
 * @param diodeDrop  bootstrap diode forward drop, V
 * @param rBoot      bootstrap charging resistance, Ω
 * @param dvdt       switch-node slew rate to check against, V/s (NaN: estimate from the pair)
 * @param bootAssumed whether the bootstrap diode drop or resistance was assumed (said by the bootstrap check)
 * @param assumed    what was assumed, one line each
 * @param channelsUsed how many channels of the driver's package switch at this point (their
 *                   dissipation adds up in the package); 0: all of the driver's channels
 * @param bridge     whether another switch turns on against this one (half-bridge, totem pole,
 *                   synchronous rectifier): its edge is what can turn this switch on through C_gd
 * @param twin       the other switch of the half-bridge, when its edge is known apart from this pair
 *                   ({@code check} knows both stages of a bridge), or null: the twin is taken to be
 *                   the same pair at the same point
 * @param powerLoop  power commutation loop inductance, H (NaN: unknown, the offset margin stands for the overshoot)
 * @param iLoad      load current the switch turns off, A (NaN unknown)
 * @param tj         junction temperature of the hot corner, °C: the rules that depend on temperature
 *                   judge at 25 °C (where datasheets specify) and here, and the worse decides
 */
public record OperatingPoint(boolean highSide, double bus, double fSw, double edge, double vDrive, double vDriveNeg,
                             LogicFamily logic, double vOh, double vOl, double vOhMax, boolean activeHigh, double rG,
                             double rGOff, double dutyMax, int parallel, double loop, double diodeDrop, double rBoot,
                             double dvdt, boolean bootAssumed, List<String> assumed, int channelsUsed, boolean bridge, Twin twin, double powerLoop,
                             double iLoad, double tj) {

    /**
     * The other switch of a half-bridge whose turn-on is what can lift this switch's off gate: its
     * name (a stage id) and its switch-node dv/dt at 25 °C and at the hot corner, V/s.
     */
    public record Twin(String name, double slewCold, double slewHot) {
        public Twin {
            java.util.Objects.requireNonNull(name, "name");
            if (!(slewCold > 0) || !(slewHot > 0)) {
                throw new IllegalArgumentException("expected the twin's dv/dt above 0, got " + slewCold + " / " + slewHot);
            }
        }
    }


    /** Gate-loop inductance assumed when none is given (REFERENCES.md §3: 10–20 nH leaded, from memory). */
    public static final double DEFAULT_LOOP = 10e-9;
    /** Bootstrap diode drop assumed when none is given (REFERENCES.md §4 check value, common practice). */
    public static final double DEFAULT_DIODE_DROP = 0.7;
    /** Bootstrap charging resistance assumed when none is given (REFERENCES.md §4 check value). */
    public static final double DEFAULT_R_BOOT = 2.2;
    /** Controller family assumed when none is given: 3.3 V LVCMOS, the usual microcontroller output. */
    public static final LogicFamily DEFAULT_LOGIC = LogicFamily.LVCMOS_3V3;
    /**
     * Junction temperature of the hot corner when none is given, °C: a usual design maximum for
     * silicon and SiC power stages (common practice, no source; give the design's own).
     */
    public static final double DEFAULT_TJ = 125;

    public OperatingPoint {
        assumed = List.copyOf(assumed);
        positive("switching frequency", fSw);
        positive("edge time", edge);
        positive("on level", vDrive);
        if (!(vDriveNeg <= 0)) {
            throw new IllegalArgumentException("expected an off level ≤ 0 V, got " + vDriveNeg + " V");
        }
        if (parallel < 1) {
            throw new IllegalArgumentException("expected at least 1 switch on the output, got " + parallel);
        }
        if (!Double.isNaN(dutyMax) && (dutyMax < 0 || dutyMax > 1)) {
            throw new IllegalArgumentException("expected a duty cycle from 0 to 1, got " + dutyMax);
        }
        if (channelsUsed < 0) {
            throw new IllegalArgumentException("expected at least 1 channel used (0: all), got " + channelsUsed);
        }
        if (!(tj >= JunctionTemperature.MIN_C && tj <= JunctionTemperature.MAX_C)) {
            throw new IllegalArgumentException("expected a junction temperature from " + (int) JunctionTemperature.MIN_C
                    + " to " + (int) JunctionTemperature.MAX_C + " °C, got " + tj + " °C");
        }
        if (!(rG >= 0) || !(rGOff >= 0)) {
            throw new IllegalArgumentException("expected gate resistors ≥ 0 Ω, got " + rG + " / " + rGOff);
        }
    }

    private static void positive(String what, double v) {
        if (!(v > 0) || Double.isInfinite(v)) {
            throw new IllegalArgumentException("expected a positive " + what + ", got " + v);
        }
    }

    /** The full swing on the gate: on level minus off level. */
    public double swing() {
        return vDrive - vDriveNeg;
    }

    /**
     * What a user or a stage sheet gave; null means "not given". {@link #resolve} applies the
     * defaults for a switch and records each as assumed.
     */
    public static final class Spec {
        public Boolean highSide;
        public Double bus;
        public Double fSw;
        public Double edge;
        public Double vDrive;
        public Double vDriveNeg;
        public LogicFamily logic;
        public Double vOh;
        public Double vOl;
        public Boolean activeHigh;
        public Double rG;
        public Double rGOff;
        public Double dutyMax;
        public Integer parallel;
        public Double loop;
        public Double diodeDrop;
        public Double rBoot;
        public Double dvdt;
        /** Channels of the driver's package that switch (null: all). */
        public Integer channelsUsed;
        /** Junction temperature of the hot corner, °C (null: {@link #DEFAULT_TJ}). */
        public Double tj;
        /** Whether another switch turns on against this one (null: assumed yes, printed). */
        public Boolean bridge;
        /** The twin's edge when known apart from this pair (set by {@code check} for a half-bridge), or null. */
        public Twin twin;
        /** Power commutation loop inductance, H (null unknown). */
        public Double powerLoop;
        /** Load current turned off, A (null unknown). */
        public Double iLoad;

        /**
         * What a stage-sheet row (or the same columns typed on the command line) gives; empty
         * cells stay null so {@link #resolve} can apply and print the defaults.
         */
        public static Spec fromStage(org.gatefit.catalog.Row r) {
            Spec s = new Spec();
            if (r.text("side") != null) {
                s.highSide = r.text("side").equals("high");
            }
            s.bus = si(r, "bus_v");
            s.fSw = si(r, "f_sw_khz");
            s.edge = si(r, "edge_ns");
            s.vDrive = si(r, "v_drive_v");
            s.vDriveNeg = si(r, "v_drive_neg_v");
            if (r.text("logic") != null) {
                s.logic = LogicFamily.fromId(r.text("logic"));
            }
            s.vOh = si(r, "v_oh_v");
            s.vOl = si(r, "v_ol_v");
            if (r.text("pwm_sense") != null) {
                s.activeHigh = !r.text("pwm_sense").equals("active-low");
            }
            s.rG = si(r, "r_g_ohm");
            s.rGOff = si(r, "r_g_off_ohm");
            s.dutyMax = si(r, "duty_max");
            Double par = si(r, "parallel");
            s.parallel = par == null ? null : (int) Math.round(par);
            s.loop = si(r, "loop_nh");
            s.diodeDrop = si(r, "v_f_boot_v");
            s.rBoot = si(r, "r_boot_ohm");
            s.tj = si(r, "t_j_c");
            s.powerLoop = si(r, "power_loop_nh");
            s.iLoad = si(r, "i_load_a");
            if (r.text("bridge") != null) {
                s.bridge = r.text("bridge").equals("yes");
            }
            return s;
        }

        private static Double si(org.gatefit.catalog.Row r, String col) {
            double v = r.si(col);
            return Double.isNaN(v) ? null : v;
        }

        /** A copy, so one spec can serve many switches. */
        public Spec copy() {
            Spec s = new Spec();
            s.highSide = highSide;
            s.bus = bus;
            s.fSw = fSw;
            s.edge = edge;
            s.vDrive = vDrive;
            s.vDriveNeg = vDriveNeg;
            s.logic = logic;
            s.vOh = vOh;
            s.vOl = vOl;
            s.activeHigh = activeHigh;
            s.rG = rG;
            s.rGOff = rGOff;
            s.dutyMax = dutyMax;
            s.parallel = parallel;
            s.loop = loop;
            s.diodeDrop = diodeDrop;
            s.rBoot = rBoot;
            s.dvdt = dvdt;
            s.channelsUsed = channelsUsed;
            s.tj = tj;
            s.bridge = bridge;
            s.twin = twin;
            s.powerLoop = powerLoop;
            s.iLoad = iLoad;
            return s;
        }

        /** Applies defaults for this switch; unknown stays NaN where no sensible default exists. */
        public OperatingPoint resolve(SwitchPart sw) {
            List<String> a = new ArrayList<>();
            if (fSw == null) {
                throw new IllegalArgumentException("expected a switching frequency (--freq or f_sw_khz), got none");
            }
            double e;
            if (edge != null) {
                e = edge;
            } else {
                e = sw.technology().defaultEdge();
                a.add("edge: " + Eng.of(e, "s") + " assumed for a " + sw.technology() + " (common practice; give --edge or edge_ns)");
            }
            double on;
            if (vDrive != null) {
                on = vDrive;
            } else if (sw.vGateOn() > 0) {
                on = sw.vGateOn();
                a.add("on level: " + Eng.of(on, "V") + ", the switch's recommended level (give --drive or v_drive_v)");
            } else if (!Double.isNaN(sw.rOnVgs()) && sw.rOnVgs() > 0) {
                on = sw.rOnVgs();
                a.add("on level: " + Eng.of(on, "V") + ", the level R_on is specified at (give --drive)");
            } else {
                on = sw.technology().typicalOn();
                a.add("on level: " + Eng.of(on, "V") + ", typical for a " + sw.technology() + " (give --drive)");
            }
            double off;
            if (vDriveNeg != null) {
                off = vDriveNeg;
            } else if (vDrive == null && !Double.isNaN(sw.vGateOff())) {
                off = sw.vGateOff();
                a.add("off level: " + Eng.of(off, "V") + ", the switch's recommended level (give --drive-neg)");
            } else {
                off = 0;
            }
            LogicFamily fam = logic;
            double oh;
            double ol;
            double ohMax;
            if (vOh != null || vOl != null) {
                LogicFamily.Levels base = (fam == null ? DEFAULT_LOGIC : fam).levels();
                oh = vOh != null ? vOh : base.vOh();
                ol = vOl != null ? vOl : base.vOl();
                ohMax = Math.max(oh, fam == null ? oh : fam.maxSupply());
                if (vOh == null || vOl == null) {
                    a.add("controller levels: " + (vOh == null ? "V_OH " + Eng.of(oh, "V") : "V_OL " + Eng.of(ol, "V"))
                            + " taken from " + (fam == null ? DEFAULT_LOGIC.id() : fam.id()));
                }
            } else {
                if (fam == null) {
                    fam = DEFAULT_LOGIC;
                    a.add("controller: " + fam.id() + " assumed (give --logic or logic)");
                }
                LogicFamily.Levels l = fam.levels();
                oh = l.vOh();
                ol = l.vOl();
                ohMax = fam.maxSupply(); // the highest the output reaches: the top of the supply range
            }
            boolean hs = highSide != null && highSide;
            double rg = rG != null ? rG : 0;
            if (rG == null) {
                a.add("external gate resistor: 0 Ω assumed (give --rg or r_g_ohm)");
            }
            double rgOff = rGOff != null ? rGOff : rg;
            double l = loop != null ? loop : DEFAULT_LOOP;
            if (loop == null) {
                a.add("gate loop: " + Eng.of(l, "H") + " assumed (give --loop or loop_nh)");
            }
            double vf = diodeDrop != null ? diodeDrop : DEFAULT_DIODE_DROP;
            double rb = rBoot != null ? rBoot : DEFAULT_R_BOOT;
            double t = tj != null ? tj : DEFAULT_TJ;
            if (tj == null) {
                a.add("hot corner: junction " + Eng.num(t) + " °C assumed (give --tj or t_j_c)");
            }
            if (bridge == null) {
                a.add("bridge: another switch assumed to turn on against this one (dv-dt; give --bridge no or bridge = no"
                        + " for a single-switch stage)");
            }
            if (sw.rGInt() != sw.rGInt()) {
                a.add("internal gate resistance of " + sw.partNumber() + " unknown: 0 Ω used (currents are upper bounds)");
            }
            return new OperatingPoint(hs, bus == null ? Double.NaN : bus, fSw, e, on, off, fam, oh, ol, ohMax,
                    activeHigh == null || activeHigh, rg, rgOff, dutyMax == null ? Double.NaN : dutyMax,
                    parallel == null ? 1 : parallel, l, vf, rb, dvdt == null ? Double.NaN : dvdt,
                    diodeDrop == null || rBoot == null, a, channelsUsed == null ? 0 : channelsUsed, bridge == null || bridge, twin,
                    powerLoop == null ? Double.NaN : powerLoop, iLoad == null ? Double.NaN : iLoad, t);
        }
    }
}
