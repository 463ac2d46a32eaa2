package org.gatefit.physics;

/**
 * Argument checks shared by the physics functions. Every failure is an
 * {@link IllegalArgumentException} whose message reads "expected …, got …" and names the
 * quantity and its unit, so a caller can pass it on to a person unchanged.
 */
final class Require {

    private Require() {
    }

    /** A finite number (not NaN, not infinite). */
    static double finite(String name, String unit, double value) {
        if (!Double.isFinite(value)) {
            throw new IllegalArgumentException(
                    "expected " + name + " to be a finite number"
                            + (unit.isEmpty() ? "" : " of " + unit) + ", got " + value);
        }
        return value;
    }

    /** A finite number strictly greater than zero. */
    static double positive(String name, String unit, double value) {
        finite(name, unit, value);
        if (value <= 0) {
            throw new IllegalArgumentException(
                    "expected " + name + " > 0" + suffix(unit) + ", got " + value);
        }
        return value;
    }

    /** A finite number greater than or equal to zero. */
    static double nonNegative(String name, String unit, double value) {
        finite(name, unit, value);
        if (value < 0) {
            throw new IllegalArgumentException(
                    "expected " + name + " >= 0" + suffix(unit) + ", got " + value);
        }
        return value;
    }

    /** A finite number less than or equal to zero (an off level or negative rail). */
    static double nonPositive(String name, String unit, double value) {
        finite(name, unit, value);
        if (value > 0) {
            throw new IllegalArgumentException(
                    "expected " + name + " <= 0" + suffix(unit) + ", got " + value);
        }
        return value;
    }

    /** A finite number in the closed interval [lo, hi]. */
    static double inRange(String name, String unit, double value, double lo, double hi) {
        finite(name, unit, value);
        if (value < lo || value > hi) {
            throw new IllegalArgumentException(
                    "expected " + name + " in [" + lo + ", " + hi + "]" + suffix(unit)
                            + ", got " + value);
        }
        return value;
    }

    /** {@code a > b}, both already checked finite; {@code what} describes the relation. */
    static void greater(String what, double a, double b) {
        if (!(a > b)) {
            throw new IllegalArgumentException("expected " + what + ", got " + a + " and " + b);
        }
    }

    private static String suffix(String unit) {
        return unit.isEmpty() ? "" : " " + unit;
    }

    /** True when an optional catalog input is given (NaN means "not given"). */
    static boolean given(double value) {
        return !Double.isNaN(value);
    }
}
