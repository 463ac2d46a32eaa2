package org.gatefit.match;

import java.util.Locale;

/** Outcome of one check, or of a pair: ordered from best to worst for ranking. */
public enum Verdict {
    PASS, WARN, UNKNOWN, FAIL;

    /** Lower-case id used in output: {@code pass}, {@code warn}, {@code unknown}, {@code fail}. */
    public String id() {
        return name().toLowerCase(Locale.ROOT);
    }

    /** The worse of two verdicts. */
    public Verdict and(Verdict o) {
        return o.ordinal() > ordinal() ? o : this;
    }

    /** How a pair's verdict reads given its checks' worst: unknown counts as warn (DESIGN.md). */
    public Verdict forPair() {
        return this == UNKNOWN ? WARN : this;
    }

    @Override
    public String toString() {
        return id();
    }
}
