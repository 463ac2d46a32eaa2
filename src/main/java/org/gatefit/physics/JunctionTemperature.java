package org.gatefit.physics;

/**
 * What the junction temperature does to the gate drive: the gate threshold falls as the switch
 * heats, and a driver's output resistance rises as its own die heats. Both are taken linear in the
 * temperature from 25 °C, where datasheets specify them, so a design is judged at two corners —
 * 25 °C and the junction temperature asked for — and a rule takes the worse.
 *
 * <p>Coefficients (from memory of datasheet curves; REFERENCES.md §8 gives −4 to −7 mV/K for Si
 * MOSFETs and a 30–50 % rise of driver output resistance from 25 °C to 125 °C): Si MOSFET
 * −6 mV/K, SiC MOSFET −5 mV/K, e-mode GaN HEMT −2 mV/K (nearly flat), IGBT −11 mV/K; driver
 * output resistance +0.4 %/K. Take a part's datasheet curve where it differs.
 */
public final class JunctionTemperature {
    /** Temperature datasheets specify thresholds and output resistances at, °C. */
    public static final double DATASHEET_C = 25;
    /** V_GS(th) temperature coefficient of a Si MOSFET, V/K (from memory; REFERENCES.md §8: −4 to −7 mV/K). */
    public static final double THRESHOLD_TC_SI = -6e-3;
    /** V_GS(th) temperature coefficient of a SiC MOSFET, V/K (from memory). */
    public static final double THRESHOLD_TC_SIC = -5e-3;
    /** V_GS(th) temperature coefficient of an e-mode GaN HEMT, V/K (from memory: nearly flat). */
    public static final double THRESHOLD_TC_GAN = -2e-3;
    /** V_GE(th) temperature coefficient of an IGBT, V/K (from memory). */
    public static final double THRESHOLD_TC_IGBT = -11e-3;
    /** Relative rise of a driver's output resistance, 1/K (from memory; REFERENCES.md §8: 30–50 % over 100 K). */
    public static final double DRIVER_RESISTANCE_TC = 0.004;
    /** Lowest and highest junction temperature the linear coefficients are used over, °C (common practice, no source). */
    public static final double MIN_C = -55;
    public static final double MAX_C = 200;

    private JunctionTemperature() {
    }

    /**
     * Threshold at a junction temperature, {@code V_th(T) = V_th(25 °C) + tc·(T − 25 °C)}.
     *
     * @param vTh25 threshold at 25 °C, V
     * @param tc    temperature coefficient, V/K (≤ 0)
     * @param tj    junction temperature, °C (−55 to 200)
     * @return threshold at tj, V
     */
    public static double threshold(double vTh25, double tc, double tj) {
        Require.finite("threshold V_th", "V", vTh25);
        Require.nonPositive("threshold temperature coefficient", "V/K", tc);
        Require.inRange("junction temperature", "°C", tj, MIN_C, MAX_C);
        return vTh25 + tc * (tj - DATASHEET_C);
    }

    /**
     * Factor on a driver's 25 °C output resistance at a temperature,
     * {@code 1 + DRIVER_RESISTANCE_TC·(T − 25 °C)}.
     *
     * @param tj junction temperature, °C (−55 to 200)
     * @return resistance factor (0.68 at −55 °C, 1.4 at 125 °C)
     */
    public static double driverResistanceFactor(double tj) {
        Require.inRange("junction temperature", "°C", tj, MIN_C, MAX_C);
        return 1 + DRIVER_RESISTANCE_TC * (tj - DATASHEET_C);
    }
}
