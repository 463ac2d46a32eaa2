package org.gatefit.physics;

/**
 * Preferred-number series for resistors and capacitors, IEC 60063:2015 ("Preferred number
 * series for resistors and capacitors"): E6, E12 and E24, two significant figures per decade.
 *
 * <p>Rounding works on any positive value in any decade. "Nearest" is nearest on a logarithmic
 * scale (the series are geometric, so that is the nearest step in ratio); ties go up.
 */
public enum ESeries {
    /** E6 (±20 % tolerance series). */
    E6(10, 15, 22, 33, 47, 68),
    /** E12 (±10 % tolerance series). */
    E12(10, 12, 15, 18, 22, 27, 33, 39, 47, 56, 68, 82),
    /** E24 (±5 % tolerance series). */
    E24(10, 11, 12, 13, 15, 16, 18, 20, 22, 24, 27, 30, 33, 36, 39, 43, 47, 51, 56, 62, 68, 75,
            82, 91);

    /** Relative tolerance for "already a series value". */
    private static final double EPS = 1e-9;

    private final int[] mantissas;
    /** Every series value from 10^{@value #E_MIN} up, ascending, as {@link #scaled} gives them. */
    private final double[] table;
    /**
     * For each binary exponent e from that of {@code table[0]} to that of the last value, the index
     * of the first table value ≥ 2^e: a value's own exponent ({@link Math#getExponent}) points
     * a few entries below its round-up (an octave holds two E6 values, four E12, eight E24 at most).
     */
    private final int[] octave;
    private final int octaveMin;
    private static final int E_MIN = -18;
    private static final int E_MAX = 15;

    ESeries(int... mantissas) {
        this.mantissas = mantissas;
        this.table = new double[(E_MAX - E_MIN + 1) * mantissas.length];
        int i = 0;
        for (int e = E_MIN; e <= E_MAX; e++) {
            for (int m : mantissas) {
                table[i++] = scaled(m, e);
            }
        }
        this.octaveMin = Math.getExponent(table[0]);
        this.octave = new int[Math.getExponent(table[table.length - 1]) - octaveMin + 1];
        int k = 0;
        for (int b = 0; b < octave.length; b++) {
            double low = Math.scalb(1.0, octaveMin + b);
            while (table[k] < low) {
                k++;
            }
            octave[b] = k;
        }
    }

    /** The two-digit values of one decade (10 … 91), in order. */
    public int[] decade() {
        return mantissas.clone();
    }

    /**
     * The values a series rounds: 1e-30 to 1e30 covers every component value (femtofarads to
     * gigaohms) with room to spare; beyond it the decade arithmetic would underflow or overflow.
     */
    static final double MIN_VALUE = 1e-30;
    static final double MAX_VALUE = 1e30;

    /** Round to the nearest series value on a log scale (ties up). */
    public double roundNearest(double value) {
        double up = roundUp(value);
        double down = roundDown(value);
        return Math.log(up / value) <= Math.log(value / down) ? up : down;
    }

    /**
     * Round up to the smallest series value ≥ {@code value} (for a minimum capacitance): a binary
     * search of the table (ranking rounds per candidate), the decade walk outside it; both give
     * the same value (ESeriesTest).
     */
    public double roundUp(double value) {
        Require.inRange("value to round", "", value, MIN_VALUE, MAX_VALUE);
        double t = value * (1 - EPS);
        if (t > table[0] && t <= table[table.length - 1]) {
            return table[atLeast(t)];
        }
        return roundUpByDecades(value);
    }

    /**
     * The index of the first table value ≥ {@code t} ({@code table[0] < t ≤ table[last]}): from the
     * first value of {@code t}'s octave ({@link #octave}), a few steps up. A ranking rounds a
     * capacitor for every driver; a binary search over the 400-odd values branches on each of its
     * nine comparisons and mispredicts about half of them (docs/PERFORMANCE.md, 3 December).
     */
    private int atLeast(double t) {
        int i = octave[Math.getExponent(t) - octaveMin];
        while (table[i] < t) {
            i++;
        }
        return i;
    }

    /** {@link #roundUp} by walking the decades around the value. */
    double roundUpByDecades(double value) {
        Require.inRange("value to round", "", value, MIN_VALUE, MAX_VALUE);
        int decade = (int) Math.floor(Math.log10(value));
        for (int d = decade - 1; d <= decade + 1; d++) {
            for (int m : mantissas) {
                double v = scaled(m, d - 1);
                if (v >= value * (1 - EPS)) {
                    return v;
                }
            }
        }
        throw new AssertionError("no series value above " + value);
    }

    /** Round down to the largest series value ≤ {@code value} (for a maximum resistance); as {@link #roundUp}. */
    public double roundDown(double value) {
        Require.inRange("value to round", "", value, MIN_VALUE, MAX_VALUE);
        double t = value * (1 + EPS);
        if (t >= table[0] && t < table[table.length - 1]) {
            int i = atLeast(t);
            return table[table[i] == t ? i : i - 1];
        }
        return roundDownByDecades(value);
    }

    /** {@link #roundDown} by walking the decades around the value. */
    double roundDownByDecades(double value) {
        Require.inRange("value to round", "", value, MIN_VALUE, MAX_VALUE);
        int decade = (int) Math.floor(Math.log10(value));
        for (int d = decade + 1; d >= decade - 1; d--) {
            for (int k = mantissas.length - 1; k >= 0; k--) {
                double v = scaled(mantissas[k], d - 1);
                if (v <= value * (1 + EPS)) {
                    return v;
                }
            }
        }
        throw new AssertionError("no series value below " + value);
    }

    /** True when the value is in the series (to a relative 1e-9). */
    public boolean contains(double value) {
        Require.positive("value", "", value);
        return Math.abs(roundNearest(value) - value) <= EPS * value;
    }

    /** m·10^e, computed so that exact decimal values round once (10^e is exact for |e| ≤ 22). */
    private static double scaled(int m, int e) {
        int k = Math.abs(e);
        double p = k < Pow10.TABLE.length ? Pow10.TABLE[k] : Math.pow(10, k);
        return e >= 0 ? m * p : m / p;
    }

    /**
     * Math.pow(10, k) for k = 0 … 308, computed once (rounding runs per candidate while ranking);
     * a holder class, because the constants' constructors run before the enum's own statics.
     */
    private static final class Pow10 {
        static final double[] TABLE = new double[309];

        static {
            for (int k = 0; k < TABLE.length; k++) {
                TABLE[k] = Math.pow(10, k);
            }
        }
    }
}
