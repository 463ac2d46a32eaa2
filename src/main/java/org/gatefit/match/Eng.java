package org.gatefit.match;

import java.math.BigDecimal;
import java.math.RoundingMode;
import java.util.Locale;

/** Engineering notation for messages: 3.9 A, 50 ns, 94.9 nF, 11.3 mW (three significant digits). */
public final class Eng {
    private static final String[] PREFIX = {"f", "p", "n", "µ", "m", "", "k", "M", "G"};

    /**
     * Set while a pair is evaluated only for its verdict and score ({@link PairEvaluator#rankOnly}):
     * the words are then thrown away, so numbers are not formatted (the formatting is most of the
     * cost of a rule).
     */
    private static final ThreadLocal<boolean[]> QUIET = ThreadLocal.withInitial(() -> new boolean[1]);

    private Eng() {
    }

    /** Runs {@code body} with formatting switched off on this thread (every call returns "·"). */
    static <T> T quietly(java.util.function.Supplier<T> body) {
        boolean[] q = QUIET.get();
        boolean was = q[0];
        q[0] = true;
        try {
            return body.get();
        } finally {
            q[0] = was;
        }
    }

    /** A value with an SI prefix and unit; "unknown" for NaN; the unit {@code 1} prints as a plain number. */
    public static String of(double v, String unit) {
        if (QUIET.get()[0]) {
            return "·";
        }
        if (Double.isNaN(v)) {
            return "unknown";
        }
        if (Double.isInfinite(v)) {
            return (v > 0 ? "∞" : "−∞") + (unit.isEmpty() || unit.equals("1") ? "" : " " + unit);
        }
        if (unit.isEmpty() || unit.equals("1")) {
            return num(v);
        }
        if (unit.equals("%")) {
            return num(v * 100) + " %";
        }
        if (v == 0) {
            return "0 " + unit;
        }
        int e3 = (int) Math.floor(Math.log10(Math.abs(v)) / 3);
        e3 = Math.max(-5, Math.min(3, e3));
        double scaled = v / Math.pow(10, 3 * e3);
        if (Math.abs(Double.parseDouble(num(scaled))) >= 1000 && e3 < 3) {
            e3++;
            scaled = v / Math.pow(10, 3 * e3);
        }
        return num(scaled) + " " + PREFIX[e3 + 5] + unit;
    }

    /** Three significant digits, trailing zeros dropped. */
    public static String num(double v) {
        if (QUIET.get()[0]) {
            return "·";
        }
        if (v == 0) {
            return "0";
        }
        double a = Math.abs(v);
        int digits = a >= 100 ? 0 : a >= 10 ? 1 : a >= 1 ? 2 : 3;
        if (a < 0.01) {
            return String.format(Locale.ROOT, "%.3g", v);
        }
        // Half-up on the decimal digits of Double.toString, which is what Formatter's %.Nf does,
        // without building a format string and two regular expressions per call (the hot spot of
        // check: every message holds several numbers).
        String s = new BigDecimal(Double.toString(v)).setScale(digits, RoundingMode.HALF_UP).toPlainString();
        if (s.indexOf('.') >= 0) {
            int end = s.length();
            while (s.charAt(end - 1) == '0') {
                end--;
            }
            if (s.charAt(end - 1) == '.') {
                end--;
            }
            s = s.substring(0, end);
        }
        return s.equals("-0") ? "0" : s;
    }

    /** A percentage of a fraction: 0.934 → 93.4 %. */
    public static String pct(double fraction) {
        return num(fraction * 100) + " %";
    }
}
