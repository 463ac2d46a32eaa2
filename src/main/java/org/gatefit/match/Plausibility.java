package org.gatefit.match;

import java.util.ArrayList;
import java.util.List;

/**
 * Operating-point values far outside what the trade uses with a technology, and what was likely
 * meant: a value read a thousand times too large or too small is usually a unit slip ({@code --freq
 * 20000} meant as 20 kHz, in an option that reads kHz). Judged here once, worded by whoever names
 * the value (an option on the command line, a column of a stage sheet).
 *
 * <p>The ranges are deliberately wide, so only a slip is caught, never an unusual design. They are
 * common practice, no source: what datasheets' application sections and design notes of each
 * technology show, from memory. The README's table "Plausible operating points" lists them.
 */
public final class Plausibility {
    private Plausibility() {
    }

    /** A checked quantity: its stage-sheet column, the unit a bare number is read in, and its SI unit. */
    public enum Quantity {
        BUS("bus_v", "V", 1, "V"),
        F_SW("f_sw_khz", "kHz", 1e3, "Hz"),
        EDGE("edge_ns", "ns", 1e-9, "s"),
        V_DRIVE("v_drive_v", "V", 1, "V"),
        V_DRIVE_NEG("v_drive_neg_v", "V", 1, "V"),
        LOOP("loop_nh", "nH", 1e-9, "H");

        private final String column;
        private final String bareUnit;
        private final double bareScale;
        private final String siUnit;

        Quantity(String column, String bareUnit, double bareScale, String siUnit) {
            this.column = column;
            this.bareUnit = bareUnit;
            this.bareScale = bareScale;
            this.siUnit = siUnit;
        }

        /** The stage-sheet column. */
        public String column() {
            return column;
        }

        /** The unit a bare number is read in (kHz for the frequency). */
        public String bareUnit() {
            return bareUnit;
        }
    }

    /** A plausible range in SI units, low ≤ value ≤ high (for the off level: low ≤ value, all ≤ 0). */
    public record Range(double low, double high) {
        public Range {
            if (!(low < high)) {
                throw new IllegalArgumentException("expected low < high, got " + low + " and " + high);
            }
        }

        boolean holds(double v) {
            return v >= low && v <= high;
        }
    }

    /**
     * The plausible range of a quantity for a technology (common practice, no source; from memory of
     * application notes — wide on purpose: bounds a design rarely reaches, not typical values).
     */
    public static Range range(Quantity q, Technology t) {
        return switch (q) {
            case BUS -> switch (t) {
                case SI_MOSFET -> new Range(1, 1_000);
                case SIC_MOSFET -> new Range(12, 3_300);
                case GAN_HEMT -> new Range(1, 1_000);
                case IGBT -> new Range(24, 6_500);
            };
            case F_SW -> switch (t) {
                case SI_MOSFET -> new Range(10, 5e6); // 10 Hz (line-frequency unfolders) to 5 MHz
                case SIC_MOSFET -> new Range(10, 2e6);
                case GAN_HEMT -> new Range(1e3, 10e6);
                case IGBT -> new Range(10, 150e3);
            };
            case EDGE -> switch (t) {
                case SI_MOSFET -> new Range(1e-9, 2e-6);
                case SIC_MOSFET -> new Range(1e-9, 1e-6);
                case GAN_HEMT -> new Range(0.2e-9, 200e-9);
                case IGBT -> new Range(10e-9, 10e-6);
            };
            case V_DRIVE -> switch (t) {
                case SI_MOSFET -> new Range(1.5, 20);
                case SIC_MOSFET -> new Range(8, 25);
                case GAN_HEMT -> new Range(3, 15);
                case IGBT -> new Range(8, 20);
            };
            case V_DRIVE_NEG -> switch (t) {
                case SI_MOSFET, IGBT -> new Range(-20, 0);
                case SIC_MOSFET -> new Range(-12, 0);
                case GAN_HEMT -> new Range(-10, 0);
            };
            case LOOP -> switch (t) {
                case SI_MOSFET -> new Range(0.5e-9, 500e-9);
                case SIC_MOSFET -> new Range(0.5e-9, 300e-9);
                case GAN_HEMT -> new Range(0.1e-9, 100e-9);
                case IGBT -> new Range(1e-9, 1e-6);
            };
        };
    }

    /**
     * A value outside its range.
     *
     * @param value     the value as read, SI
     * @param range     the plausible range, SI
     * @param suggested the value a thousand times smaller or larger when that one is plausible (a unit
     *                  slip), SI; NaN when neither is
     */
    public record Finding(Quantity quantity, Technology technology, double value, Range range, double suggested) {
        /**
         * The warning, naming the value as {@code name} ({@code --freq}, or a stage-sheet column):
         * "20 MHz? --freq is in kHz; did you mean 20kHz?".
         */
        public String word(String name) {
            String as = Eng.of(value, quantity.siUnit);
            String bounds = Eng.of(range.low(), quantity.siUnit) + " to " + Eng.of(range.high(), quantity.siUnit);
            String base = as + "? " + name + " is in " + quantity.bareUnit + "; ";
            if (!Double.isNaN(suggested)) {
                return base + "did you mean " + Eng.of(suggested, quantity.siUnit).replace(" ", "") + "? (" + technology.id()
                        + " designs use " + bounds + "; common practice)";
            }
            return base + as + " is far outside what " + technology.id() + " designs use (" + bounds
                    + "; common practice) — check the value";
        }
    }

    /** The given values of {@code spec} (null: not given, not checked) that are implausible for {@code t}. */
    public static List<Finding> check(OperatingPoint.Spec spec, Technology t) {
        List<Finding> out = new ArrayList<>();
        check(out, Quantity.BUS, spec.bus, t);
        check(out, Quantity.F_SW, spec.fSw, t);
        check(out, Quantity.EDGE, spec.edge, t);
        check(out, Quantity.V_DRIVE, spec.vDrive, t);
        check(out, Quantity.V_DRIVE_NEG, spec.vDriveNeg, t);
        check(out, Quantity.LOOP, spec.loop, t);
        return out;
    }

    private static void check(List<Finding> out, Quantity q, Double v, Technology t) {
        if (v == null || Double.isNaN(v)) {
            return;
        }
        Range r = range(q, t);
        if (r.holds(v)) {
            return;
        }
        double suggested = Double.NaN;
        for (double f : new double[] {1e-3, 1e3}) {
            if (v * f != 0 && r.holds(v * f)) {
                suggested = v * f;
            }
        }
        out.add(new Finding(q, t, v, r, suggested));
    }
}
