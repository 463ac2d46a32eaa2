package org.gatefit.catalog;

import java.math.BigDecimal;

/** Formatting of stored numbers so that export then import gives the same double back. */
public final class Numbers {
    private Numbers() {
    }

    /** Shortest decimal text that reads back as {@code d}, without exponent: 130, 0.47, 1e-3 → 0.001. */
    public static String format(double d) {
        if (d == Math.rint(d) && Math.abs(d) < 1e15) {
            return Long.toString((long) d);
        }
        return BigDecimal.valueOf(d).stripTrailingZeros().toPlainString();
    }
}
