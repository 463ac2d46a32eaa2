package org.gatefit.cli;

import java.util.LinkedHashMap;
import java.util.Map;
import org.gatefit.catalog.BadValueException;
import org.gatefit.catalog.Cells;
import org.gatefit.catalog.Column;
import org.gatefit.catalog.Kind;
import org.gatefit.catalog.Row;
import org.gatefit.catalog.Schema;
import org.gatefit.match.OperatingPoint;
import org.gatefit.match.Plausibility;
import picocli.CommandLine.Option;

/**
 * The operating point shared by {@code shortlist} and {@code explain}. Each option is the stage
 * sheet's column of the same meaning and reads the same way: a bare number is in that column's
 * unit (kHz, ns, nH, V, Ω), or give a unit ({@code 100kHz}, {@code 4k7}, {@code 0.05us}).
 */
final class OperatingPointOptions {
    @Option(names = "--side", paramLabel = "low|high", description = "Switch position (default: low).")
    String side;

    @Option(names = "--bus", paramLabel = "V", description = "DC bus voltage, V (no default: high-side and dv/dt checks need it).")
    String bus;

    @Option(names = "--freq", paramLabel = "kHz",
            description = "Switching frequency; a bare number is kHz (required unless a --stage row gives it).")
    String freq;

    @Option(names = "--edge", paramLabel = "ns",
            description = "Target gate transition time; bare number in ns (default per technology: Si 50, SiC 30, GaN 10, IGBT 150 ns).")
    String edge;

    @Option(names = "--drive", paramLabel = "V", description = "On level, V (default: the switch's recommended level).")
    String drive;

    @Option(names = "--drive-neg", paramLabel = "V", description = "Off level, ≤ 0 V (default: the switch's recommended level, else 0).")
    String driveNeg;

    @Option(names = "--logic", paramLabel = "FAMILY",
            description = "Controller output family: ttl-5v, cmos-5v, lvttl-3v3, lvcmos-3v3, lvcmos-2v5, lvcmos-1v8 (default: lvcmos-3v3).")
    String logic;

    @Option(names = "--v-oh", paramLabel = "V", description = "Controller output-high minimum, instead of --logic.")
    String vOh;

    @Option(names = "--v-ol", paramLabel = "V", description = "Controller output-low maximum, instead of --logic.")
    String vOl;

    @Option(names = "--pwm", paramLabel = "SENSE", description = "active-high (switch on while PWM is high; default) or active-low.")
    String pwm;

    @Option(names = "--rg", paramLabel = "Ω", description = "External gate resistor per switch, turn-on (default 0 Ω).")
    String rg;

    @Option(names = "--rg-off", paramLabel = "Ω", description = "External gate resistor per switch, turn-off (default: --rg).")
    String rgOff;

    @Option(names = "--duty-max", paramLabel = "D", description = "Largest duty cycle, 0 to 1 or a percentage (bootstrap check).")
    String dutyMax;

    @Option(names = "--parallel", paramLabel = "N", description = "Switches on this driver output (default 1).")
    String parallel;

    @Option(names = "--loop", paramLabel = "nH", description = "Gate-loop inductance; bare number in nH (default 10 nH).")
    String loop;

    @Option(names = "--v-f-boot", paramLabel = "V", description = "Bootstrap diode forward drop (default 0.7 V).")
    String vfBoot;

    @Option(names = "--r-boot", paramLabel = "Ω", description = "Bootstrap charging resistance (default 2.2 Ω).")
    String rBoot;

    @Option(names = "--dvdt", paramLabel = "V/ns",
            description = "Switch-node slew rate to check, V/ns (default: estimated as bus / turn-on plateau time).")
    String dvdt;

    @Option(names = "--bridge", paramLabel = "yes|no",
            description = "Whether another switch turns on hard against this one (half-bridge, totem pole, synchronous"
                    + " rectifier) — its edge is what the dv-dt rule judges; no for a single switch or a partner that"
                    + " turns on at zero voltage (default: yes, printed).")
    String bridge;

    @Option(names = "--power-loop", paramLabel = "nH",
            description = "Power commutation loop inductance; with --load it gives the switch-node overshoot the"
                    + " high-side rating must carry (default: none, the offset margin stands for it).")
    String powerLoop;

    @Option(names = "--load", paramLabel = "A", description = "Load current the switch turns off (for the overshoot).")
    String load;

    @Option(names = "--tj", paramLabel = "°C",
            description = "Junction temperature of the hot corner, °C (default 125): the threshold falls and the driver's"
                    + " output resistance rises with it; rules that depend on them judge at 25 °C and here, the worse decides.")
    String tj;

    @Option(names = "--channels-used", paramLabel = "N",
            description = "Channels of the driver's package that switch at this point; their dissipation adds up in the"
                    + " package (default: all of the driver's channels).")
    String channelsUsed;

    /**
     * Each operating-point option and the stage-sheet column it stands for, in the order of the fields
     * {@link #spec(Row)} reads: one table, so parsing, errors and shell completion (the column's
     * choices, {@link #completionCandidates}) agree.
     */
    static final String[][] COLUMNS = {
        {"--side", "side"}, {"--bus", "bus_v"}, {"--freq", "f_sw_khz"}, {"--edge", "edge_ns"}, {"--drive", "v_drive_v"},
        {"--drive-neg", "v_drive_neg_v"}, {"--logic", "logic"}, {"--v-oh", "v_oh_v"}, {"--v-ol", "v_ol_v"},
        {"--pwm", "pwm_sense"}, {"--rg", "r_g_ohm"}, {"--rg-off", "r_g_off_ohm"}, {"--duty-max", "duty_max"},
        {"--parallel", "parallel"}, {"--loop", "loop_nh"}, {"--v-f-boot", "v_f_boot_v"}, {"--r-boot", "r_boot_ohm"},
        {"--tj", "t_j_c"}, {"--bridge", "bridge"}, {"--power-loop", "power_loop_nh"}, {"--load", "i_load_a"}};

    /**
     * The values a shell may complete for an operating-point option: the choices of its stage-sheet
     * column in the schema (empty for a number).
     */
    static java.util.List<String> completionCandidates(String option) {
        for (String[] c : COLUMNS) {
            if (c[0].equals(option)) {
                return Schema.of(Kind.STAGE).column(c[1]).map(Column::choices).orElse(java.util.List.of());
            }
        }
        return java.util.List.of();
    }

    /** The option that sets a checked quantity, for warnings. */
    static String option(Plausibility.Quantity q) {
        return switch (q) {
            case BUS -> "--bus";
            case F_SW -> "--freq";
            case EDGE -> "--edge";
            case V_DRIVE -> "--drive";
            case V_DRIVE_NEG -> "--drive-neg";
            case LOOP -> "--loop";
        };
    }

    /** The options as a stage-sheet row, parsed exactly as a stage sheet's cells would be. */
    OperatingPoint.Spec spec() throws BadValueException, UsageException {
        return spec(null);
    }

    /**
     * The operating point of a stage-sheet row (null for none) with the options given here over its
     * cells, parsed exactly as a stage sheet's cells would be.
     */
    OperatingPoint.Spec spec(Row stage) throws BadValueException, UsageException {
        // Option, stage-sheet column, value as typed: one row each, so errors name the option.
        String[] typed = {side, bus, freq, edge, drive, driveNeg, logic, vOh, vOl, pwm, rg, rgOff, dutyMax, parallel, loop,
            vfBoot, rBoot, tj, bridge, powerLoop, load};
        String[][] cells = new String[COLUMNS.length][];
        for (int i = 0; i < COLUMNS.length; i++) {
            cells[i] = new String[] {COLUMNS[i][0], COLUMNS[i][1], typed[i]};
        }
        Schema sheet = Schema.of(Kind.STAGE);
        Map<String, Object> values = new LinkedHashMap<>();
        if (stage != null) {
            for (String[] cell : cells) {
                Object v = stage.values().get(cell[1]);
                if (v != null) {
                    values.put(cell[1], v);
                }
            }
        }
        for (String[] cell : cells) {
            if (cell[2] == null) {
                continue;
            }
            Column c = sheet.column(cell[1]).orElseThrow();
            if (cell[2].matches(".*\\d,\\d.*")) {
                // Refused rather than read: "1,000" may be a thousands separator as well as a decimal comma.
                throw new BadValueException(cell[0] + ": '" + cell[2] + "' has a comma; on the command line write a"
                        + " decimal point (" + cell[2].strip().replace(',', '.') + ") — gatefit does not guess whether"
                        + " a comma is a decimal mark or a thousands separator");
            }
            try {
                Object v = Cells.parse(c, cell[2], false);
                if (v != null) {
                    values.put(c.name(), v);
                }
            } catch (BadValueException ex) {
                throw new BadValueException(cell[0] + ": " + ex.getMessage());
            }
        }
        if (!values.containsKey("f_sw_khz")) {
            throw new UsageException(stage == null ? "Missing required option: '--freq=kHz' (or take the operating"
                    + " point from a stage-sheet row: --stages FILE --stage ID)" : "--stage " + stage.key() + ": the row"
                    + " has no f_sw_khz; give --freq");
        }
        OperatingPoint.Spec s = OperatingPoint.Spec.fromStage(new Row(Kind.STAGE, "command line", "", 0, values, Map.of()));
        if (dvdt != null) {
            try {
                double v = Double.parseDouble(dvdt.strip());
                if (!(v > 0) || Double.isInfinite(v)) {
                    throw new NumberFormatException();
                }
                s.dvdt = v * 1e9;
            } catch (NumberFormatException e) {
                throw new BadValueException("--dvdt: '" + dvdt + "' is not a positive number (expected V/ns, e.g. 50)");
            }
        }
        if (channelsUsed != null) {
            try {
                int n = Integer.parseInt(channelsUsed.strip());
                if (n < 1) {
                    throw new NumberFormatException();
                }
                s.channelsUsed = n;
            } catch (NumberFormatException e) {
                throw new BadValueException("--channels-used: '" + channelsUsed + "' is not a whole number ≥ 1 (expected"
                        + " how many channels of the package switch, e.g. 2)");
            }
        }
        return s;
    }
}
