package org.gatefit.match;

/**
 * Production status of a part, as the catalog's {@code lifecycle} column lists it (DESIGN.md). The
 * lifecycle rule's verdict, its note and the score's availability factor are read from here, so
 * each status is described in one place.
 */
public enum Lifecycle {
    ACTIVE("active", Verdict.PASS, 1.0, null),
    NRND("nrnd", Verdict.WARN, 0.8, "is not recommended for new designs"),
    LTB("ltb", Verdict.WARN, 0.7, "is at last-time buy"),
    OBSOLETE("obsolete", Verdict.FAIL, 0.3, "is obsolete"),
    PREVIEW("preview", Verdict.WARN, 0.9, "is not yet in production"),
    UNKNOWN("unknown", Verdict.UNKNOWN, 0.85, "has no lifecycle status");

    /** Availability factor of a part that is out of stock (multiplies its lifecycle's; common practice, no source). */
    static final double OUT_OF_STOCK = 0.8;

    private final String id;
    private final Verdict verdict;
    private final double availability;
    private final String note;

    Lifecycle(String id, Verdict verdict, double availability, String note) {
        this.id = id;
        this.verdict = verdict;
        this.availability = availability;
        this.note = note;
    }

    /** The catalog's word: {@code active}, {@code nrnd}, … */
    public String id() {
        return id;
    }

    /** The lifecycle rule's verdict for a part with this status and stock (out of stock warns at least). */
    public Verdict verdict(long stock) {
        return stock == 0 ? verdict.and(Verdict.WARN) : verdict;
    }

    /** The score's availability factor for a part with this status and stock. */
    public double availability(long stock) {
        return stock == 0 ? availability * OUT_OF_STOCK : availability;
    }

    /** What the lifecycle check says of a part with this status ("… is obsolete"), null when active. */
    String note() {
        return note;
    }

    private static final Lifecycle[] ALL = values();

    /** From the catalog's text; an empty cell (null) is {@link #UNKNOWN}. */
    public static Lifecycle of(String id) {
        if (id == null) {
            return UNKNOWN;
        }
        for (Lifecycle l : ALL) {
            if (l.id.equals(id)) {
                return l;
            }
        }
        throw new IllegalArgumentException("expected active, nrnd, ltb, obsolete, preview or unknown, got " + id);
    }

    @Override
    public String toString() {
        return id;
    }
}
