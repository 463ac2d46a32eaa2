package org.gatefit.catalog;

import java.util.Objects;

/**
 * The unit of a catalog column: a dimension and a power-of-ten prefix, e.g. nanocoulombs is
 * {@code (CHARGE, -9)}. Values are held in the column's unit so that export prints exactly what
 * was imported; {@link #toSi(double)} converts for the physics.
 *
 * @param dimension what the column measures
 * @param exponent  power of ten of the prefix (nC: −9, kHz: 3, V: 0)
 */
public record Unit(Dimension dimension, int exponent) {

    public Unit {
        Objects.requireNonNull(dimension, "dimension");
        if (Prefix.ofExponent(exponent) == null && !(dimension == Dimension.RATIO && exponent == 0)) {
            throw new IllegalArgumentException("expected an SI prefix exponent, got " + exponent);
        }
    }

    /** Parses a unit symbol as the schema writes it: {@code nC}, {@code mΩ}, {@code kHz}, {@code 1}. */
    public static Unit parse(String symbol) {
        if ("1".equals(symbol)) {
            return new Unit(Dimension.RATIO, 0);
        }
        for (Dimension d : Dimension.values()) {
            for (String base : d.spellings()) {
                if (symbol.endsWith(base)) {
                    String prefix = symbol.substring(0, symbol.length() - base.length());
                    Prefix p = Prefix.ofSymbol(prefix);
                    if (p != null) {
                        return new Unit(d, p.exponent());
                    }
                }
            }
        }
        throw new IllegalArgumentException("expected a unit symbol such as V, nC, mΩ or kHz, got '" + symbol + "'");
    }

    /** Converts a value in this unit to SI. */
    public double toSi(double value) {
        return exponent == 0 ? value : value * pow10(exponent);
    }

    /** Converts an SI value to this unit. */
    public double fromSi(double si) {
        return exponent == 0 ? si : si / pow10(exponent);
    }

    /** Math.pow(10, e) for the prefix exponents, computed once (conversions run per cell and per column). */
    private static final double[] POW10 = new double[28];

    static {
        for (int e = -15; e <= 12; e++) {
            POW10[e + 15] = Math.pow(10, e);
        }
    }

    private static double pow10(int e) {
        return e >= -15 && e <= 12 ? POW10[e + 15] : Math.pow(10, e);
    }

    /** Symbol as people write it: {@code nC}, {@code mΩ}; empty for a ratio. */
    public String symbol() {
        if (dimension == Dimension.RATIO) {
            return "";
        }
        return Prefix.ofExponent(exponent).symbol() + dimension.symbol();
    }

    /** Plural name, e.g. {@code nanocoulombs}, {@code volts}, {@code fraction}. */
    public String plural() {
        if (dimension == Dimension.RATIO) {
            return "a fraction from 0 to 1";
        }
        return Prefix.ofExponent(exponent).word() + dimension.plural();
    }

    @Override
    public String toString() {
        return symbol();
    }

    /** SI prefixes accepted in cells and schema symbols. */
    enum Prefix {
        FEMTO("f", -15, "femto"), PICO("p", -12, "pico"), NANO("n", -9, "nano"), MICRO("µ", -6, "micro"),
        MILLI("m", -3, "milli"), NONE("", 0, ""), KILO("k", 3, "kilo"), MEGA("M", 6, "mega"), GIGA("G", 9, "giga");

        private final String symbol;
        private final int exponent;
        private final String word;

        Prefix(String symbol, int exponent, String word) {
            this.symbol = symbol;
            this.exponent = exponent;
            this.word = word;
        }

        String symbol() {
            return symbol;
        }

        int exponent() {
            return exponent;
        }

        String word() {
            return word;
        }

        /** The prefix for a symbol; {@code u}, {@code µ} (micro sign) and {@code μ} (Greek mu) are micro; K is kilo. */
        static Prefix ofSymbol(String s) {
            switch (s) {
                case "u", "µ", "μ" -> {
                    return MICRO;
                }
                case "K" -> {
                    return KILO;
                }
                default -> {
                    for (Prefix p : values()) {
                        if (p.symbol.equals(s)) {
                            return p;
                        }
                    }
                    return null;
                }
            }
        }

        static Prefix ofExponent(int e) {
            for (Prefix p : values()) {
                if (p.exponent == e) {
                    return p;
                }
            }
            return null;
        }
    }
}
