package org.gatefit.match;

import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;

/**
 * The margins the rules apply, as named constants with documented defaults. Each can be
 * overridden ({@code --margin drive-current=2}) and is printed with results.
 *
 * @param driveCurrent     available peak current must exceed the required average current by this
 *                         factor to pass (default 1.5: the current of a resistive driver falls
 *                         during the edge; common practice, no source)
 * @param gateHeadroom     the on level must stay this fraction below V_GS,max (and the off level
 *                         this fraction above V_GS,min) to pass, leaving room for overshoot
 *                         (default 0.10; common practice, no source)
 * @param uvloHeadroom     the supply must exceed the UVLO rising threshold by this many volts to
 *                         pass, for supply tolerance and droop (default 1 V; common practice)
 * @param logicNoise       smallest noise margin, V, that passes (default 0.1 V: JEDEC families
 *                         guarantee at least 0.18 V into their own inputs; common practice)
 * @param offset           high-side offset rating must exceed the bus by this fraction to pass,
 *                         for switch-node overshoot (default 0.20; common practice, no source)
 * @param isolation        isolation withstand rating must be this many times the bus to pass
 *                         (default 2; common practice, no source — check the working-voltage rating)
 * @param driverPower      driver dissipation may use this fraction of the package limit to pass
 *                         (default 0.7, for ambient temperature derating; common practice)
 * @param dvdt             Miller-induced gate voltage plus off level may reach this fraction of
 *                         V_th,min to pass (default 0.7; common practice, no source)
 * @param cmti             a floating output's common-mode transient immunity must be this many times
 *                         the estimated switch-node dv/dt to pass (default 2: the estimate is the
 *                         average slew over the transition, the peak is steeper; common practice,
 *                         no source)
 * @param uvloPlateau      the gate level at UVLO lock-out must exceed the Miller plateau by this
 *                         fraction to pass (default 0.15: the plateau rises with current above the
 *                         datasheet's test current and with temperature; common practice, no source)
 * @param bootCapBias      fraction of a bootstrap capacitor's nominal capacitance left at its
 *                         working DC bias (default 0.5: high-K MLCCs lose 30–70 % at rated bias,
 *                         REFERENCES.md §9, from memory; use the part's curve where known)
 * @param protectionBus    bus voltage above which an IGBT or SiC stage is expected to have
 *                         desaturation or over-current detection (default 100 V; common practice,
 *                         no source)
 * @param deadTime         a half-bridge's configured dead time must exceed its minimum by this
 *                         fraction to pass (default 0.25: temperature, supply and part spread beyond
 *                         the model; common practice, no source)
 */
public record Margins(double driveCurrent, double gateHeadroom, double uvloHeadroom, double logicNoise, double offset,
                      double isolation, double driverPower, double dvdt, double cmti, double uvloPlateau,
                      double bootCapBias, double protectionBus, double deadTime) {

    /** The defaults documented above. */
    public static final Margins DEFAULT = new Margins(1.5, 0.10, 1.0, 0.1, 0.20, 2.0, 0.7, 0.7, 2.0, 0.15, 0.5, 100, 0.25);

    public Margins {
        check("drive-current", driveCurrent, 1, 100);
        check("gate-headroom", gateHeadroom, 0, 0.9);
        check("uvlo-headroom", uvloHeadroom, 0, 20);
        check("logic-noise", logicNoise, 0, 5);
        check("offset", offset, 0, 10);
        check("isolation", isolation, 1, 100);
        check("driver-power", driverPower, 0.01, 1);
        check("dv-dt", dvdt, 0.01, 1);
        check("cmti", cmti, 1, 100);
        check("uvlo-plateau", uvloPlateau, 0, 1);
        check("boot-cap-bias", bootCapBias, 0.05, 1);
        check("protection-bus", protectionBus, 0, 10000);
        check("dead-time", deadTime, 0, 10);
    }

    /** The margins of a map in {@link #asMap}'s order and names. */
    private static Margins of(Map<String, Double> v) {
        return new Margins(v.get("drive-current"), v.get("gate-headroom"), v.get("uvlo-headroom"), v.get("logic-noise"),
                v.get("offset"), v.get("isolation"), v.get("driver-power"), v.get("dv-dt"), v.get("cmti"),
                v.get("uvlo-plateau"), v.get("boot-cap-bias"), v.get("protection-bus"),
                v.get("dead-time"));
    }

    private static void check(String name, double v, double lo, double hi) {
        if (!(v >= lo && v <= hi)) {
            throw new IllegalArgumentException("expected margin " + name + " from " + Eng.num(lo) + " to "
                    + Eng.num(hi) + ", got " + v);
        }
    }

    /** Names and values, in order, for printing. */
    public Map<String, Double> asMap() {
        Map<String, Double> m = new LinkedHashMap<>();
        m.put("drive-current", driveCurrent);
        m.put("gate-headroom", gateHeadroom);
        m.put("uvlo-headroom", uvloHeadroom);
        m.put("logic-noise", logicNoise);
        m.put("offset", offset);
        m.put("isolation", isolation);
        m.put("driver-power", driverPower);
        m.put("dv-dt", dvdt);
        m.put("cmti", cmti);
        m.put("uvlo-plateau", uvloPlateau);
        m.put("boot-cap-bias", bootCapBias);
        m.put("protection-bus", protectionBus);
        m.put("dead-time", deadTime);
        return m;
    }

    /** Units of the margins, for printing: × for factors, V for volts, blank for fractions. */
    public static String unitOf(String name) {
        return switch (name) {
            case "drive-current", "isolation", "cmti" -> "×";
            case "uvlo-headroom", "logic-noise", "protection-bus" -> "V";
            default -> "";
        };
    }

    /** A copy with one margin changed: {@code name=value}. */
    public Margins with(String assignment) {
        int eq = assignment.indexOf('=');
        if (eq < 0) {
            throw new IllegalArgumentException("expected name=value, e.g. drive-current=2, got '" + assignment + "'");
        }
        String name = assignment.substring(0, eq).strip().toLowerCase(Locale.ROOT);
        double v;
        try {
            v = Double.parseDouble(assignment.substring(eq + 1).strip());
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException("expected a number after '" + name + "=', got '"
                    + assignment.substring(eq + 1) + "'");
        }
        Map<String, Double> values = asMap();
        if (!values.containsKey(name)) {
            throw new IllegalArgumentException("unknown margin '" + name + "' (expected one of "
                    + String.join(", ", values.keySet()) + ")");
        }
        values.put(name, v);
        return of(values);
    }
}
