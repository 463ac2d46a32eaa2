package org.gatefit.report;

/** The caution every output that recommends parts or values carries. */
public final class Caution {
    /** One paragraph. */
    public static final String TEXT = "Caution: these figures are estimates from datasheet values and simple models."
            + " Verify every pair on the bench and against each part's datasheet before you rely on it."
            + " High voltage can kill: follow local codes and licensed practice.";

    private Caution() {
    }
}
