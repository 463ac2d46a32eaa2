package org.gatefit.match;

/** Driver topologies of the catalog. */
public enum Topology {
    LOW_SIDE("low-side"), HIGH_SIDE("high-side"), HALF_BRIDGE("half-bridge"), ISOLATED("isolated");

    private final String id;

    Topology(String id) {
        this.id = id;
    }

    public String id() {
        return id;
    }

    /** Whether the output can float on a switch node. */
    public boolean floats() {
        return switch (this) {
            case LOW_SIDE -> false;
            case HIGH_SIDE, HALF_BRIDGE, ISOLATED -> true;
        };
    }

    /** Whether the floating output is fed by a bootstrap capacitor (not an isolated supply). */
    public boolean bootstrapped() {
        return switch (this) {
            case HIGH_SIDE, HALF_BRIDGE -> true;
            case LOW_SIDE, ISOLATED -> false;
        };
    }

    /** The constants, copied once ({@code values()} copies on every call; this is read per catalog row). */
    private static final Topology[] ALL = values();

    static Topology of(String id) {
        for (Topology t : ALL) {
            if (t.id.equals(id)) {
                return t;
            }
        }
        throw new IllegalArgumentException("expected low-side, high-side, half-bridge or isolated, got " + id);
    }

    @Override
    public String toString() {
        return id;
    }
}
