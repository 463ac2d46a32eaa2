package org.gatefit.physics;

/**
 * Sizing rules for the supporting parts of a gate-drive circuit: the driver's supply capacitors,
 * the gate resistors' power, pulse and package, the turn-off diode, the gate–source pull-down and
 * the gate clamp. Each method is a formula of plain circuit theory or a stated rule of thumb;
 * where a number is a rule of thumb it is marked "common practice, no source", where it is a
 * recalled catalogue figure "from memory".
 *
 * <ul>
 *   <li><b>Supply capacitor</b> (plain circuit theory): a capacitor that gives a charge Q while its
 *       voltage may fall by ΔV needs {@code C ≥ Q/ΔV}; the capacitance left at its DC bias is a
 *       fraction b of nominal, so the nominal value is {@code Q/(ΔV·b)}; where a bootstrap capacitor
 *       recharges from the supply, at least {@link Bootstrap#DECOUPLING_FACTOR} times it (common
 *       practice, REFERENCES.md §4). Rounded up to E6.</li>
 *   <li><b>Resistor energy per edge</b> (plain circuit theory, as {@link GatePower}): charging the
 *       gate by Q over a swing ΔV from a stiff supply draws Q·ΔV; half is stored and returned at
 *       the other edge, and each edge dissipates {@code ½·Q·ΔV} in its loop, shared by the series
 *       resistances in proportion to their values (the same current flows through all), so a
 *       resistor R in a loop of total R_loop takes {@code E = ½·Q·ΔV·R/R_loop} per edge and
 *       {@code E·f} on average.</li>
 *   <li><b>Resistor package</b>: the smallest of {@link ResistorPackage} whose continuous rating
 *       covers the average power with {@link #CONTINUOUS_DERATING} and whose pulse allowance
 *       {@link #PULSE_FACTOR}× the rating covers the peak pulse power {@code I_pk²·R}.</li>
 *   <li><b>Pull-down</b>: the gate leakage I_GSS through R must leave the gate below a tenth of
 *       V_th,min ({@code R ≤ V_th,min/(10·I_GSS)}); the divider it forms with the turn-on loop must
 *       cost at most 1 % of the on level ({@code R ≥ 99·R_loop}); within the usual 10 kΩ–100 kΩ
 *       (common practice, no source). With the driver unpowered it alone holds the gate, so a
 *       drain ramp injects {@code C_gd·dv/dt} (C_gd averaged over the swing, Q_gd/V_bus,
 *       REFERENCES.md §8) and the gate stays below V_th,min up to
 *       {@code dv/dt = V_th,min·V_bus/(R·Q_gd)} (slow ramps, where C_gs carries no current).</li>
 *   <li><b>Clamp</b>: a Zener whose voltage with its tolerance lies above the level it must not
 *       load and below the limit it guards ({@link #clampVoltage}).</li>
 * </ul>
 */
public final class NetworkSizing {

    /** Allowed droop of the driver's output supply per switching event, as a fraction of the supply (common practice, no source). */
    public static final double SUPPLY_DROOP_FRACTION = 0.02;

    /** The smallest output supply capacitor, F (100 nF beside the supply pin whatever the charge; common practice, no source). */
    public static final double SUPPLY_MIN = 100e-9;

    /** A capacitor's voltage rating is at least this many times its working voltage (common practice, no source). */
    public static final double CAPACITOR_VOLTAGE_FACTOR = 2;

    /** The logic-side supply capacitor of a driver with two supplies, F (100 nF beside the pin; common practice, no source). */
    public static final double LOGIC_DECOUPLING = 100e-9;

    /** A resistor runs at most this fraction of its continuous rating (common practice, no source). */
    public static final double CONTINUOUS_DERATING = 0.5;

    /**
     * Peak pulse power a chip resistor takes in a repeated gate edge shorter than
     * {@link #PULSE_MAX_DURATION}, as a multiple of its continuous rating (from memory: a cautious
     * reading of thick-film pulse-load curves, which allow far more for sub-microsecond pulses; use
     * the chosen part's curve).
     */
    public static final double PULSE_FACTOR = 50;

    /** The longest edge pulse {@link #PULSE_FACTOR} is meant for, s. */
    public static final double PULSE_MAX_DURATION = 1e-6;

    /** Gate leakage I_GSS assumed when the catalog gives none, A (from memory: the usual datasheet maximum of ±100 nA for Si and SiC MOSFETs and IGBTs). */
    public static final double GATE_LEAKAGE_ASSUMED = 100e-9;

    /** The usual pull-down range, Ω (common practice, no source). */
    public static final double PULL_DOWN_LOW = 10e3;
    public static final double PULL_DOWN_HIGH = 100e3;

    /** Tolerance of a Zener voltage (from memory: the common ±5 % grade, E24 voltages). */
    public static final double ZENER_TOLERANCE = 0.05;

    /** Rated voltages of ceramic capacitors, V (from memory: the usual ladder). */
    private static final double[] CAPACITOR_VOLTAGES = {6.3, 10, 16, 25, 35, 50, 63, 100, 200, 250, 450, 500, 630, 1000,
        1500, 2000, 3000};

    /** Rated reverse voltages of small diodes, V (from memory: the usual ladder). */
    private static final double[] DIODE_VOLTAGES = {20, 30, 40, 60, 100, 150, 200, 300, 400, 600, 800, 1000, 1200, 1700,
        2000, 3300};

    private NetworkSizing() {
    }

    /** Chip-resistor packages and their continuous ratings at 70 °C, W (from memory: thick-film catalogue values). */
    public enum ResistorPackage {
        R0402("0402", 0.063), R0603("0603", 0.1), R0805("0805", 0.125), R1206("1206", 0.25), R2010("2010", 0.75),
        R2512("2512", 1.0);

        private final String code;
        private final double rating;

        ResistorPackage(String code, double rating) {
            this.code = code;
            this.rating = rating;
        }

        /** The EIA inch size code, e.g. 0603. */
        public String code() {
            return code;
        }

        /** Continuous power rating at 70 °C, W. */
        public double rating() {
            return rating;
        }
    }

    /** The allowed droop {@code SUPPLY_DROOP_FRACTION·V}, V; V the supply (&gt; 0). */
    public static double supplyDroop(double supply) {
        Require.positive("supply", "V", supply);
        return SUPPLY_DROOP_FRACTION * supply;
    }

    /**
     * The smallest capacitance that gives {@code charge} within {@code droop} at the capacitance
     * left at its DC bias, {@code Q/(ΔV·b)}, F (not rounded).
     *
     * @param charge charge per switching event, C (≥ 0)
     * @param droop allowed droop, V (&gt; 0)
     * @param biasLeft fraction of nominal capacitance left at the working bias (0 &lt; b ≤ 1)
     */
    public static double supplyCapacitanceMin(double charge, double droop, double biasLeft) {
        Require.nonNegative("charge per switching event", "C", charge);
        Require.positive("allowed droop", "V", droop);
        Require.inRange("capacitance left at DC bias", "", biasLeft, 1e-3, 1);
        return charge / (droop * biasLeft);
    }

    /**
     * The output-side supply capacitor: {@link #supplyCapacitanceMin}, and at least
     * {@link Bootstrap#decoupling} of the bootstrap capacitor where there is one and at least
     * {@link #SUPPLY_MIN}, rounded up to E6, F.
     *
     * @param bootstrap the bootstrap capacitor it recharges, F, or NaN for none
     */
    public static double supplyCapacitance(double charge, double droop, double biasLeft, double bootstrap) {
        double c = supplyCapacitanceMin(charge, droop, biasLeft);
        if (!Double.isNaN(bootstrap)) {
            c = Math.max(c, Bootstrap.decoupling(bootstrap));
        }
        return ESeries.E6.roundUp(Math.max(c, SUPPLY_MIN));
    }

    /** The smallest usual capacitor rating ≥ {@link #CAPACITOR_VOLTAGE_FACTOR}× the working voltage, V (NaN above the ladder). */
    public static double capacitorRating(double working) {
        Require.nonNegative("working voltage", "V", working);
        return ladder(CAPACITOR_VOLTAGES, CAPACITOR_VOLTAGE_FACTOR * working);
    }

    /** The smallest usual diode reverse rating ≥ {@code reverse}, V (NaN above the ladder). */
    public static double diodeRating(double reverse) {
        Require.nonNegative("reverse voltage", "V", reverse);
        return ladder(DIODE_VOLTAGES, reverse);
    }

    private static double ladder(double[] steps, double atLeast) {
        for (double v : steps) {
            if (v >= atLeast * (1 - 1e-9)) {
                return v;
            }
        }
        return Double.NaN;
    }

    /**
     * Energy dissipated in a resistor {@code r} per edge, {@code ½·Q·ΔV·r/R_loop}, J (class comment).
     *
     * @param charge gate charge over the swing through this resistor, C (≥ 0)
     * @param swing ΔV, V (≥ 0)
     * @param resistance the resistor, Ω (≥ 0)
     * @param loop total resistance of the edge's loop, including the resistor, Ω (&gt; 0, ≥ r)
     */
    public static double edgeEnergy(double charge, double swing, double resistance, double loop) {
        Require.nonNegative("gate charge", "C", charge);
        Require.nonNegative("swing ΔV", "V", swing);
        Require.nonNegative("resistor", "Ω", resistance);
        Require.positive("loop resistance", "Ω", loop);
        if (resistance > loop * (1 + 1e-12)) {
            throw new IllegalArgumentException("expected a resistor no larger than its loop (" + loop + " Ω), got "
                    + resistance + " Ω");
        }
        return 0.5 * charge * swing * resistance / loop;
    }

    /**
     * The smallest package of the table that carries {@code average} W continuously within
     * {@link #CONTINUOUS_DERATING} and a peak pulse of {@code peakPulse} W within
     * {@link #PULSE_FACTOR}; null when none does.
     */
    public static ResistorPackage resistorPackage(double average, double peakPulse) {
        Require.nonNegative("average power", "W", average);
        Require.nonNegative("peak pulse power", "W", peakPulse);
        for (ResistorPackage p : ResistorPackage.values()) {
            if (average <= CONTINUOUS_DERATING * p.rating() && peakPulse <= PULSE_FACTOR * p.rating()) {
                return p;
            }
        }
        return null;
    }

    /** The largest pull-down that keeps leakage below a tenth of V_th,min, {@code V_th,min/(10·I_GSS)}, Ω. */
    public static double pullDownMax(double vThMin, double leakage) {
        Require.positive("V_th,min", "V", vThMin);
        Require.positive("gate leakage I_GSS", "A", leakage);
        return vThMin / (10 * leakage);
    }

    /** The smallest pull-down that costs at most 1 % of the on level against the turn-on loop, {@code 99·R_loop}, Ω. */
    public static double pullDownMin(double loop) {
        Require.nonNegative("turn-on loop resistance", "Ω", loop);
        return 99 * loop;
    }

    /**
     * The pull-down value, E24: the smallest value ≥ the larger of {@link #PULL_DOWN_LOW} and
     * {@link #pullDownMin}; when that exceeds the smaller of {@link #PULL_DOWN_HIGH} and
     * {@link #pullDownMax}, the largest E24 value ≤ {@link #pullDownMax} (leakage decides), Ω.
     */
    public static double pullDown(double vThMin, double leakage, double loop) {
        double lo = Math.max(PULL_DOWN_LOW, pullDownMin(loop));
        double hi = Math.min(PULL_DOWN_HIGH, pullDownMax(vThMin, leakage));
        double pick = ESeries.E24.roundUp(lo);
        return pick <= hi ? pick : ESeries.E24.roundDown(pullDownMax(vThMin, leakage));
    }

    /**
     * The fastest drain ramp the pull-down alone holds below V_th,min, {@code V_th,min·V_bus/(R·Q_gd)}, V/s.
     *
     * @param vThMin V_th,min, V (&gt; 0)
     * @param bus the drain swing, V (&gt; 0)
     * @param pullDown R, Ω (&gt; 0)
     * @param qGd Q_gd over that swing, C (&gt; 0)
     */
    public static double pullDownSlew(double vThMin, double bus, double pullDown, double qGd) {
        Require.positive("V_th,min", "V", vThMin);
        Require.positive("bus", "V", bus);
        Require.positive("pull-down", "Ω", pullDown);
        Require.positive("Q_gd", "C", qGd);
        return vThMin * bus / (pullDown * qGd);
    }

    /**
     * A clamp Zener voltage (E24, {@link #ZENER_TOLERANCE}): the smallest whose lowest voltage is
     * at least {@code above} and whose highest is at most {@code below}, V; NaN when none fits.
     */
    public static double clampVoltage(double above, double below) {
        Require.positive("level the clamp must not load", "V", above);
        Require.positive("limit the clamp guards", "V", below);
        double v = ESeries.E24.roundUp(above / (1 - ZENER_TOLERANCE));
        return v * (1 + ZENER_TOLERANCE) <= below * (1 + 1e-12) ? v : Double.NaN;
    }
}
