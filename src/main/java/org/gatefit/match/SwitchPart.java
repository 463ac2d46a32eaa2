package org.gatefit.match;

import java.util.Objects;
import org.gatefit.catalog.Kind;
import org.gatefit.catalog.Row;

/**
 * A switch as the rules see it: SI units (V, A, Ω, C, F), NaN where the catalog says nothing.
 * {@code stock} is −1 when unknown.
 */
public record SwitchPart(String partNumber, String maker, String pinout, String packageName, Technology technology,
                         boolean nChannel, double vBlock, double iCont, double rOn, double rOnVgs, double vCeSat,
                         double vThMin, double vThMax, double vGsMax, double vGsMin, double vGateOn,
                         double vGateOff, double qG, double qGVgs, double qGs, double qGd, double vPlateau,
                         double cIss, double cRss, double rGInt, Lifecycle lifecycle, long stock, double price,
                         SwitchRatings ratings) {

    public SwitchPart {
        Objects.requireNonNull(partNumber, "partNumber");
        Objects.requireNonNull(technology, "technology");
        Objects.requireNonNull(lifecycle, "lifecycle");
        Objects.requireNonNull(ratings, "ratings");
    }

    /** A switch without the optional ratings ({@link SwitchRatings#UNKNOWN}). */
    public SwitchPart(String partNumber, String maker, String pinout, String packageName, Technology technology,
                      boolean nChannel, double vBlock, double iCont, double rOn, double rOnVgs, double vCeSat,
                      double vThMin, double vThMax, double vGsMax, double vGsMin, double vGateOn,
                      double vGateOff, double qG, double qGVgs, double qGs, double qGd, double vPlateau,
                      double cIss, double cRss, double rGInt, Lifecycle lifecycle, long stock, double price) {
        this(partNumber, maker, pinout, packageName, technology, nChannel, vBlock, iCont, rOn, rOnVgs, vCeSat, vThMin,
                vThMax, vGsMax, vGsMin, vGateOn, vGateOff, qG, qGVgs, qGs, qGd, vPlateau, cIss, cRss, rGInt, lifecycle,
                stock, price, SwitchRatings.UNKNOWN);
    }

    /** From a catalog row of kind switch. */
    public static SwitchPart of(Row r) {
        if (r.kind() != Kind.SWITCH) {
            throw new IllegalArgumentException("expected a switch row, got " + r.kind());
        }
        return new SwitchPart(r.key(), r.text("maker"), r.text("pinout"), r.text("package"),
                Technology.of(r.text("technology")), !"p".equals(r.text("channel")), r.si("v_block_v"),
                r.si("i_cont_a"), r.si("r_on_mohm"), r.si("r_on_vgs_v"), r.si("v_ce_sat_v"), r.si("v_th_min_v"),
                r.si("v_th_max_v"), r.si("v_gs_max_v"), r.si("v_gs_min_v"), r.si("v_gate_on_v"),
                r.si("v_gate_off_v"), r.si("q_g_nc"), r.si("q_g_vgs_v"), r.si("q_gs_nc"), r.si("q_gd_nc"),
                r.si("v_plateau_v"), r.si("c_iss_pf"), r.si("c_rss_pf"), r.si("r_g_int_ohm"),
                Lifecycle.of(r.text("lifecycle")),
                Double.isNaN(r.number("stock")) ? -1 : (long) r.number("stock"), r.si("unit_price"),
                new SwitchRatings(r.si("v_gate_on_max_v"), r.si("v_gate_off_min_v"), r.si("t_sc_us"),
                        r.si("t_d_off_ns"), r.si("t_f_ns")));
    }

    /** Internal gate resistance, 0 when unknown (the message of a check says when it was assumed). */
    double rGIntOrZero() {
        return Double.isNaN(rGInt) ? 0 : rGInt;
    }
}
