package org.gatefit.match;

/** The checks of a driver–switch pair, with their DESIGN.md ids and weights in the score. */
public enum Rule {
    DRIVE_CURRENT("drive-current", 3, "gate current on the Miller plateau against the charge the drain edge moves"),
    GATE_VOLTAGE("gate-voltage", 3, "on level against driver supply range, V_GS limit and full-enhancement level"),
    NEGATIVE_BIAS("negative-bias", 1, "off level against V_GS,min, the driver's negative rail and the switch's advice"),
    UVLO("uvlo", 2, "driver undervoltage lockout against the supply and what the switch needs"),
    LOGIC_LEVEL("logic-level", 1, "controller output levels against the driver's input thresholds and maximum"),
    POLARITY("polarity", 1, "driver input sense against the PWM sense"),
    HIGH_SIDE("high-side", 2, "floating offset or isolation rating against the bus"),
    BOOTSTRAP("bootstrap", 1, "bootstrap capacitor, diode and duty limit"),
    DRIVER_POWER("driver-power", 1, "driver dissipation against its package limit"),
    DV_DT("dv-dt", 1, "Miller-induced gate voltage against the threshold at both corners"),
    GATE_RINGING("gate-ringing", 1, "gate-loop overshoot and undershoot against V_GS,max and V_GS,min"),
    PROTECTION("protection", 1, "desaturation detection of an IGBT or SiC stage and its speed against the withstand time"),
    LIFECYCLE("lifecycle", 0, "production status and stock of both parts"),
    CATALOG("catalog", 0, "both parts are in the catalog"),
    DESIGN("design", 0, "one driver package used consistently across the stages of a check"),
    DEAD_TIME("dead-time", 0, "a half-bridge stage's configured dead time against the minimum (check only)");

    private final String id;
    private final int weight;
    private final String covers;

    Rule(String id, int weight, String covers) {
        this.id = id;
        this.weight = weight;
        this.covers = covers;
    }

    public String id() {
        return id;
    }

    /**
     * The rules from the most to the least fundamental failure, in one place: when several fail, the
     * first of these is the one that decides (a part missing; a driver that cannot float on a high
     * side or has the wrong input sense or supply range is wrong in kind, before a UVLO or a drive
     * current that is merely too small). Common practice, no source.
     */
    private static final java.util.List<Rule> FUNDAMENTAL = java.util.List.of(CATALOG, DESIGN, HIGH_SIDE, POLARITY,
            GATE_VOLTAGE, NEGATIVE_BIAS, LOGIC_LEVEL, UVLO, DRIVE_CURRENT, DEAD_TIME, DV_DT, GATE_RINGING, BOOTSTRAP,
            DRIVER_POWER, PROTECTION, LIFECYCLE);

    static {
        if (FUNDAMENTAL.size() != values().length || !FUNDAMENTAL.containsAll(java.util.List.of(values()))) {
            throw new ExceptionInInitializerError("Rule.FUNDAMENTAL must list every rule once");
        }
    }

    /** Position in the order of fundamental failures (0 the most fundamental). */
    public int fundamental() {
        return FUNDAMENTAL.indexOf(this);
    }

    /** Weight in the electrical part of the score (0: counted through availability instead). */
    public int weight() {
        return weight;
    }

    /** What the rule covers, for help and reports. */
    public String covers() {
        return covers;
    }

    @Override
    public String toString() {
        return id;
    }
}
