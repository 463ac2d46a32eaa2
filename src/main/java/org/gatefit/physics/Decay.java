package org.gatefit.physics;

/**
 * {@code 1 − e^(−x)}, the share of a first-order step reached after x time constants, as the
 * ranking needs it for every driver (the RC-limited Miller injection, the bootstrap refresh).
 * {@code Math.expm1} gives it exactly but is not a JIT intrinsic on Java 17 (it runs
 * {@code StrictMath}'s software routine, a quarter of a million-driver shortlist's time when
 * measured with JMH's stack profiler); {@code Math.exp} is an intrinsic. {@code 1 − e^(−x)} loses
 * digits only when x is small (cancellation: the absolute error stays about 1e-16, so the relative
 * error is about 1e-16/x), so below {@link #SMALL} it keeps {@code expm1}: both are the JDK's own
 * functions, and {@code DecayTest} holds the result to {@code −Math.expm1(−x)} within 1e-12
 * relative over the whole range.
 */
public final class Decay {
    /** Below this x, {@code expm1} (relative error of {@code 1 − e^(−x)} at this x: about 1e-13). */
    static final double SMALL = 1e-3;

    private Decay() {
    }

    /** {@code 1 − e^(−x)} for x ≥ 0 (NaN stays NaN; +∞ gives 1). */
    public static double oneMinusExp(double x) {
        return x < SMALL ? -Math.expm1(-x) : 1 - Math.exp(-x);
    }
}
