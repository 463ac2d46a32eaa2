package org.gatefit.physics;

/**
 * Argument checks shared by the physics functions. Every failure is an
 * {@link IllegalArgumentException} whose message reads "expected …, got …" and names the
 * quantity and its unit, so a caller can pass it on to a person unchanged.
 */
final class Require {
    // Each check is a comparison or two on its hot path and a call to a separate method that builds
    // the message only when it fails: the checks run tens of times for every driver a shortlist
    // ranks, and a method small in bytecode is inlined by the JIT where one that also builds its
    // message is not ("callee is too large").

    private Require() {
    }

    /** A finite number (not NaN, not infinite). */
    static double finite(String name, String unit, double value) {
        if (!Double.isFinite(value)) {
            throw notFinite(name, unit, value);
        }
        return value;
    }

    /** A finite number strictly greater than zero. */
    static double positive(String name, String unit, double value) {
        if (!(value > 0 && value <= Double.MAX_VALUE)) {
            throw outside(name, unit, value, " > 0");
        }
        return value;
    }

    /** A finite number greater than or equal to zero. */
    static double nonNegative(String name, String unit, double value) {
        if (!(value >= 0 && value <= Double.MAX_VALUE)) {
            throw outside(name, unit, value, " >= 0");
        }
        return value;
    }

    /** A finite number less than or equal to zero (an off level or negative rail). */
    static double nonPositive(String name, String unit, double value) {
        if (!(value <= 0 && value >= -Double.MAX_VALUE)) {
            throw outside(name, unit, value, " <= 0");
        }
        return value;
    }

    /** A finite number in the closed interval [lo, hi]. */
    static double inRange(String name, String unit, double value, double lo, double hi) {
        if (!(value >= lo && value <= hi && Double.isFinite(value))) {
            throw outside(name, unit, value, " in [" + lo + ", " + hi + "]");
        }
        return value;
    }

    /** {@code a > b}, both already checked finite; {@code what} describes the relation. */
    static void greater(String what, double a, double b) {
        if (!(a > b)) {
            throw new IllegalArgumentException("expected " + what + ", got " + a + " and " + b);
        }
    }

    /** The refusal of a value that is not a finite number. */
    private static IllegalArgumentException notFinite(String name, String unit, double value) {
        return new IllegalArgumentException(
                "expected " + name + " to be a finite number" + (unit.isEmpty() ? "" : " of " + unit) + ", got " + value);
    }

    /** The refusal of a value outside {@code relation} (e.g. " > 0"), or not finite: that is said first. */
    private static IllegalArgumentException outside(String name, String unit, double value, String relation) {
        if (!Double.isFinite(value)) {
            return notFinite(name, unit, value);
        }
        return new IllegalArgumentException("expected " + name + relation + suffix(unit) + ", got " + value);
    }

    private static String suffix(String unit) {
        return unit.isEmpty() ? "" : " " + unit;
    }

    /** True when an optional catalog input is given (NaN means "not given"). */
    static boolean given(double value) {
        return !Double.isNaN(value);
    }
}
