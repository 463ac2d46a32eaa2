package org.gatefit.match;

import org.gatefit.physics.JunctionTemperature;

/** Switch technologies of the catalog, with the assumptions gatefit makes per technology. */
public enum Technology {
    SI_MOSFET("si-mosfet", 50e-9, 12),
    SIC_MOSFET("sic-mosfet", 30e-9, 18),
    GAN_HEMT("gan-hemt", 10e-9, 6),
    IGBT("igbt", 150e-9, 15);

    private final String id;
    private final double defaultEdge;
    private final double typicalOn;

    Technology(String id, double defaultEdge, double typicalOn) {
        this.id = id;
        this.defaultEdge = defaultEdge;
        this.typicalOn = typicalOn;
    }

    public String id() {
        return id;
    }

    /**
     * Gate transition time assumed when none is given (common practice, no source): about 50 ns
     * for Si MOSFETs, 30 ns for SiC, 10 ns for GaN, 150 ns for IGBTs.
     */
    public double defaultEdge() {
        return defaultEdge;
    }

    /** Typical on level when the switch gives none (REFERENCES.md §5, from memory). */
    public double typicalOn() {
        return typicalOn;
    }

    /**
     * Temperature coefficient of the gate threshold, V/K, for judging at the hot corner
     * ({@link JunctionTemperature}; from memory).
     */
    public double thresholdTc() {
        return switch (this) {
            case SI_MOSFET -> JunctionTemperature.THRESHOLD_TC_SI;
            case SIC_MOSFET -> JunctionTemperature.THRESHOLD_TC_SIC;
            case GAN_HEMT -> JunctionTemperature.THRESHOLD_TC_GAN;
            case IGBT -> JunctionTemperature.THRESHOLD_TC_IGBT;
        };
    }

    /** The constants, copied once ({@code values()} copies on every call; this is read per catalog row). */
    private static final Technology[] ALL = values();

    static Technology of(String id) {
        for (Technology t : ALL) {
            if (t.id.equals(id)) {
                return t;
            }
        }
        throw new IllegalArgumentException("expected si-mosfet, sic-mosfet, gan-hemt or igbt, got " + id);
    }

    @Override
    public String toString() {
        return id;
    }
}
