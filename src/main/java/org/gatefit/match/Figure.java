package org.gatefit.match;

import java.util.Objects;

/**
 * A computed value of a pair, named as DESIGN.md fixes (e.g. {@code gate-current-required}).
 *
 * @param name      stable id
 * @param value     SI value
 * @param unit      SI unit symbol (A, s, W, F, Ω, V, V/s, C, Hz, 1)
 * @param label     what it is, for people
 * @param estimated whether it rests on an estimate (extrapolated charge, derived resistance)
 */
public record Figure(String name, double value, String unit, String label, boolean estimated) {
    public Figure {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(unit, "unit");
        if (Double.isNaN(value)) {
            throw new IllegalArgumentException("expected a computed value for " + name + ", got NaN");
        }
    }
}
