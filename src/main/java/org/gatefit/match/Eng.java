package org.gatefit.match;

import java.math.BigDecimal;
import java.math.RoundingMode;
import java.util.Locale;

/** Engineering notation for messages: 3.9 A, 50 ns, 94.9 nF, 11.3 mW (three significant digits). */
public final class Eng {
    private static final String[] PREFIX = {"f", "p", "n", "µ", "m", "", "k", "M", "G"};

    private Eng() {
    }

    /** A value with an SI prefix and unit; "unknown" for NaN; the unit {@code 1} prints as a plain number. */
    public static String of(double v, String unit) {
        if (Double.isNaN(v)) {
            return "unknown";
        }
        if (Double.isInfinite(v)) {
            return (v > 0 ? "∞" : "−∞") + (unit.isEmpty() || unit.equals("1") ? "" : " " + unit);
        }
        if (unit.isEmpty() || unit.equals("1")) {
            return num(v);
        }
        if (unit.equals("V/ns")) {
            return num(v) + " V/ns"; // the trade's unit as it is, never mV/ns or kV/ns
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
        String digits = num(scaled);
        // 999.5 and up may print as 1000: one prefix up (below 999.5 it cannot round to 1000).
        if (e3 < 3 && Math.abs(scaled) >= 999.5 && Math.abs(Double.parseDouble(digits)) >= 1000) {
            e3++;
            digits = num(v / Math.pow(10, 3 * e3));
        }
        return digits + " " + PREFIX[e3 + 5] + unit;
    }

    /**
     * A slew rate given in V/s written in the trade's unit, V/ns (1 V/ns = 1 kV/µs), three
     * significant digits: dv/dt and CMTI are said this way everywhere.
     */
    public static String slew(double voltsPerSecond) {
        return of(voltsPerSecond * 1e-9, "V/ns");
    }

    /** Three significant digits, trailing zeros dropped; "unknown" for NaN, ∞ for an unbounded value. */
    public static String num(double v) {
        if (v == 0) {
            return "0";
        }
        if (!Double.isFinite(v)) {
            return Double.isNaN(v) ? "unknown" : v > 0 ? "∞" : "−∞";
        }
        double a = Math.abs(v);
        if (a >= 1e15) {
            // Far beyond any catalog figure (an extreme value the schema admits): keep it short.
            return String.format(Locale.ROOT, "%.3g", v);
        }
        int digits = a >= 100 ? 0 : a >= 10 ? 1 : a >= 1 ? 2 : 3;
        if (a < 0.01) {
            return String.format(Locale.ROOT, "%.3g", v);
        }
        // Same digits as String.format("%.nf") (half-up on the shortest decimal form of v) with
        // trailing zeros dropped, without a Formatter and two regexes per number: messages are
        // built for every pair of a shortlist, and this was its hot spot.
        double x = a * SCALE[digits];
        if (x < 1e7) {
            // a·10^n is within 1e-8 of the shortest decimal form times 10^n here (both within
            // half an ulp), so away from a tie (.5) both round to the same integer.
            double whole = Math.floor(x);
            double frac = x - whole;
            if (Math.abs(frac - 0.5) > 1e-6) {
                return plain(v < 0, (long) whole + (frac > 0.5 ? 1 : 0), digits);
            }
        }
        BigDecimal b = BigDecimal.valueOf(v).setScale(digits, RoundingMode.HALF_UP);
        return b.signum() == 0 ? "0" : b.stripTrailingZeros().toPlainString();
    }

    private static final double[] SCALE = {1, 10, 100, 1000};
    private static final long[] TENS = {1, 10, 100, 1000};

    /** {@code m / 10^digits} written out, trailing zeros of the fraction dropped. */
    private static String plain(boolean negative, long m, int digits) {
        if (m == 0) {
            return "0";
        }
        long whole = m / TENS[digits];
        long frac = m % TENS[digits];
        StringBuilder sb = new StringBuilder(12);
        if (negative) {
            sb.append('-');
        }
        sb.append(whole);
        if (frac != 0) {
            int d = digits;
            while (frac % 10 == 0) {
                frac /= 10;
                d--;
            }
            sb.append('.');
            String f = Long.toString(frac);
            for (int i = f.length(); i < d; i++) {
                sb.append('0');
            }
            sb.append(f);
        }
        return sb.toString();
    }

    /** A percentage of a fraction: 0.934 → 93.4 %. */
    public static String pct(double fraction) {
        return num(fraction * 100) + " %";
    }
}
