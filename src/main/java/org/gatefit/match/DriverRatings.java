package org.gatefit.match;

/**
 * A driver's ratings beyond the basic drive figures, from optional catalog columns: isolation
 * working voltage and CMTI, what its UVLO monitors, output-side quiescent current and level-shift
 * charge (package power), and fault protection. SI units, NaN where the catalog says nothing,
 * null for an unknown yes/no or reference.
 *
 * @param vIorm     maximum working isolation voltage, peak, V ({@code v_iorm_v})
 * @param cmti      common-mode transient immunity, V/s ({@code cmti_kv_us} × 1e9)
 * @param uvloTotal whether the UVLO monitors the total supply (positive minus negative rail);
 *                  false: the positive rail against the source/emitter; null: unknown
 * @param iQOut     output-side quiescent current per channel, A ({@code i_q_out_ma})
 * @param qLs       high-side level-shifter charge per cycle, C ({@code q_ls_nc})
 * @param desat     desaturation / over-current detection built in ({@code desat})
 * @param tDesat    fault detection time, s ({@code t_desat_ns})
 * @param softOff   soft turn-off after a fault ({@code soft_off})
 * @param bootClamp highest level the built-in bootstrap clamp lets the high-side supply reach, V ({@code boot_clamp_v})
 * @param tPropMax  maximum propagation delay over temperature and parts, s ({@code t_prop_max_ns})
 */
public record DriverRatings(double vIorm, double cmti, Boolean uvloTotal, double iQOut, double qLs, Boolean desat,
                            double tDesat, Boolean softOff, double bootClamp, double tPropMax) {

    /** Nothing known. */
    public static final DriverRatings UNKNOWN = new DriverRatings(Double.NaN, Double.NaN, null, Double.NaN, Double.NaN,
            null, Double.NaN, null, Double.NaN, Double.NaN);

    /** kV/µs in V/s: 1e3 V / 1e-6 s. */
    static final double KV_PER_US = 1e9;

    /** The {@code uvlo_monitors} cell: {@code total-supply} → true, {@code positive-rail} → false, empty → null. */
    static Boolean uvloTotal(String cell) {
        return cell == null ? null : cell.equals("total-supply");
    }
}
