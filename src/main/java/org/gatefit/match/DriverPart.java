package org.gatefit.match;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import org.gatefit.catalog.Kind;
import org.gatefit.catalog.Row;

/**
 * A gate driver as the rules see it: SI units, NaN where the catalog says nothing; booleans as
 * {@link Boolean} with null for unknown; {@code stock} −1 when unknown.
 *
 * @param inverting input sense per channel (true = inverting); one entry per listed channel
 */
public record DriverPart(String partNumber, String maker, String pinout, String packageName, Topology topology,
                         int channels, List<Boolean> inverting, double iSource, double iSink, double rSource,
                         double rSink, double vSupplyMin, double vSupplyMax, double uvloOn, double uvloOff,
                         double vIh, double vIl, double vInMax, double vOffsetMax, Boolean bootstrapDiode,
                         double iQbs, double vNegMin, double tProp, double tMatch, Boolean millerClamp,
                         double isolationVrms, double pMax, String lifecycle, long stock, double price) {

    public DriverPart {
        Objects.requireNonNull(partNumber, "partNumber");
        Objects.requireNonNull(topology, "topology");
        inverting = List.copyOf(inverting);
        if (inverting.isEmpty()) {
            throw new IllegalArgumentException("expected an input polarity for " + partNumber + ", got none");
        }
        Objects.requireNonNull(lifecycle, "lifecycle");
    }

    /** From a catalog row of kind driver. */
    public static DriverPart of(Row r) {
        if (r.kind() != Kind.DRIVER) {
            throw new IllegalArgumentException("expected a driver row, got " + r.kind());
        }
        List<Boolean> inv = new ArrayList<>();
        for (String p : r.text("input_polarity").split(";")) {
            inv.add(p.strip().equals("inverting"));
        }
        double ch = r.number("channels");
        return new DriverPart(r.key(), r.text("maker"), r.text("pinout"), r.text("package"),
                Topology.of(r.text("topology")), Double.isNaN(ch) ? 0 : (int) ch, inv, r.si("i_source_a"),
                r.si("i_sink_a"), r.si("r_source_ohm"), r.si("r_sink_ohm"), r.si("v_supply_min_v"),
                r.si("v_supply_max_v"), r.si("uvlo_on_v"), r.si("uvlo_off_v"), r.si("v_ih_v"), r.si("v_il_v"),
                r.si("v_in_max_v"), r.si("v_offset_max_v"), yesNo(r.text("bootstrap_diode")), r.si("i_qbs_ua"),
                r.si("v_neg_min_v"), r.si("t_prop_ns"), r.si("t_match_ns"), yesNo(r.text("miller_clamp")),
                r.si("isolation_vrms"), r.si("p_max_w"), r.text("lifecycle") == null ? "unknown" : r.text("lifecycle"),
                Double.isNaN(r.number("stock")) ? -1 : (long) r.number("stock"), r.si("unit_price"));
    }

    private static Boolean yesNo(String s) {
        return s == null ? null : s.equals("yes");
    }

    /** Whether any channel is inverting / non-inverting. */
    boolean offers(boolean invertingInput) {
        return inverting.contains(invertingInput);
    }
}
