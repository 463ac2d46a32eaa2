package org.gatefit.physics;

/**
 * Minimum dead time between the two switches of a half bridge (common practice, no source): the
 * outgoing switch must finish turning off before the incoming one starts to conduct, with the
 * worst-case spread of both and of the driver channels,
 * {@code t_dead > t_d(off),max + t_f,max − t_d(on),min + t_mismatch}.
 */
public final class DeadTime {

    private DeadTime() {
    }

    /**
     * Minimum dead time, clamped at zero (a negative result means the delays alone already
     * separate the edges).
     *
     * @param turnOffDelayMax longest turn-off delay of the outgoing switch, s (≥ 0)
     * @param fallTimeMax longest current-fall time of the outgoing switch, s (≥ 0)
     * @param turnOnDelayMin shortest turn-on delay of the incoming switch, s (≥ 0)
     * @param driverMismatch driver propagation-delay mismatch between channels, s (≥ 0)
     * @return minimum dead time, s
     */
    public static double minimum(double turnOffDelayMax, double fallTimeMax,
            double turnOnDelayMin, double driverMismatch) {
        Require.nonNegative("turn-off delay", "s", turnOffDelayMax);
        Require.nonNegative("fall time", "s", fallTimeMax);
        Require.nonNegative("turn-on delay", "s", turnOnDelayMin);
        Require.nonNegative("delay mismatch", "s", driverMismatch);
        return Math.max(0, turnOffDelayMax + fallTimeMax - turnOnDelayMin + driverMismatch);
    }
}
