package org.gatefit.match;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import org.gatefit.catalog.Kind;
import org.gatefit.catalog.Row;
import org.gatefit.catalog.RowCursor;
import org.gatefit.catalog.Schema;

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
                         double isolationVrms, double pMax, Lifecycle lifecycle, long stock, double price,
                         DriverRatings ratings) {

    public DriverPart {
        Objects.requireNonNull(partNumber, "partNumber");
        Objects.requireNonNull(topology, "topology");
        inverting = List.copyOf(inverting);
        if (inverting.isEmpty()) {
            throw new IllegalArgumentException("expected an input polarity for " + partNumber + ", got none");
        }
        Objects.requireNonNull(lifecycle, "lifecycle");
        Objects.requireNonNull(ratings, "ratings");
    }

    /** A driver without the optional ratings ({@link DriverRatings#UNKNOWN}). */
    public DriverPart(String partNumber, String maker, String pinout, String packageName, Topology topology,
                      int channels, List<Boolean> inverting, double iSource, double iSink, double rSource,
                      double rSink, double vSupplyMin, double vSupplyMax, double uvloOn, double uvloOff,
                      double vIh, double vIl, double vInMax, double vOffsetMax, Boolean bootstrapDiode,
                      double iQbs, double vNegMin, double tProp, double tMatch, Boolean millerClamp,
                      double isolationVrms, double pMax, Lifecycle lifecycle, long stock, double price) {
        this(partNumber, maker, pinout, packageName, topology, channels, inverting, iSource, iSink, rSource, rSink,
                vSupplyMin, vSupplyMax, uvloOn, uvloOff, vIh, vIl, vInMax, vOffsetMax, bootstrapDiode, iQbs, vNegMin,
                tProp, tMatch, millerClamp, isolationVrms, pMax, lifecycle, stock, price, DriverRatings.UNKNOWN);
    }

    /** From a catalog row of kind driver. */
    public static DriverPart of(Row r) {
        if (r.kind() != Kind.DRIVER) {
            throw new IllegalArgumentException("expected a driver row, got " + r.kind());
        }
        return of(RowCursor.of(r), r.key());
    }

    /** From a driver row read column by column (a catalog scan); null when the row has no part number. */
    public static DriverPart of(RowCursor r) {
        if (r.kind() != Kind.DRIVER) {
            throw new IllegalArgumentException("expected a driver row, got " + r.kind());
        }
        return r.memo(DriverPart.class, x -> {
            String key = x.text(C.partNumber);
            return key == null ? null : of(x, key);
        });
    }

    /** Column positions in the driver schema, resolved once. */
    private static final class C {
        static final Schema S = Schema.of(Kind.DRIVER);
        static final int partNumber = S.position("part_number");
        static final int maker = S.position("maker");
        static final int pinout = S.position("pinout");
        static final int pkg = S.position("package");
        static final int topology = S.position("topology");
        static final int channels = S.position("channels");
        static final int polarity = S.position("input_polarity");
        static final int iSource = S.position("i_source_a");
        static final int iSink = S.position("i_sink_a");
        static final int rSource = S.position("r_source_ohm");
        static final int rSink = S.position("r_sink_ohm");
        static final int vSupplyMin = S.position("v_supply_min_v");
        static final int vSupplyMax = S.position("v_supply_max_v");
        static final int uvloOn = S.position("uvlo_on_v");
        static final int uvloOff = S.position("uvlo_off_v");
        static final int vIh = S.position("v_ih_v");
        static final int vIl = S.position("v_il_v");
        static final int vInMax = S.position("v_in_max_v");
        static final int vOffsetMax = S.position("v_offset_max_v");
        static final int bootstrapDiode = S.position("bootstrap_diode");
        static final int iQbs = S.position("i_qbs_ua");
        static final int vNegMin = S.position("v_neg_min_v");
        static final int tProp = S.position("t_prop_ns");
        static final int tMatch = S.position("t_match_ns");
        static final int millerClamp = S.position("miller_clamp");
        static final int isolation = S.position("isolation_vrms");
        static final int pMax = S.position("p_max_w");
        static final int lifecycle = S.position("lifecycle");
        static final int stock = S.position("stock");
        static final int price = S.position("unit_price");
        static final int vIorm = S.position("v_iorm_v");
        static final int cmti = S.position("cmti_kv_us");
        static final int uvloMonitors = S.position("uvlo_monitors");
        static final int iQOut = S.position("i_q_out_ma");
        static final int qLs = S.position("q_ls_nc");
        static final int desat = S.position("desat");
        static final int tDesat = S.position("t_desat_ns");
        static final int softOff = S.position("soft_off");
        static final int bootClamp = S.position("boot_clamp_v");
        static final int tPropMax = S.position("t_prop_max_ns");
    }

    /** Input senses as listed, e.g. {@code non-inverting;inverting}; the few distinct lists are decoded once. */
    private static final java.util.concurrent.ConcurrentHashMap<String, List<Boolean>> POLARITIES =
            new java.util.concurrent.ConcurrentHashMap<>();

    private static List<Boolean> polarities(String text) {
        List<Boolean> known = POLARITIES.get(text);
        if (known != null) {
            return known;
        }
        List<Boolean> inv = new ArrayList<>();
        for (String p : text.split(";")) {
            inv.add(p.strip().equals("inverting"));
        }
        List<Boolean> list = List.copyOf(inv);
        if (POLARITIES.size() < 256) {
            POLARITIES.putIfAbsent(text, list);
        }
        return list;
    }

    private static DriverPart of(RowCursor r, String key) {
        double ch = r.number(C.channels);
        String life = r.text(C.lifecycle);
        double stock = r.number(C.stock);
        return new DriverPart(key, r.text(C.maker), r.text(C.pinout), r.text(C.pkg),
                Topology.of(r.text(C.topology)), Double.isNaN(ch) ? 0 : (int) ch, polarities(r.text(C.polarity)),
                r.si(C.iSource), r.si(C.iSink), r.si(C.rSource), r.si(C.rSink), r.si(C.vSupplyMin),
                r.si(C.vSupplyMax), r.si(C.uvloOn), r.si(C.uvloOff), r.si(C.vIh), r.si(C.vIl),
                r.si(C.vInMax), r.si(C.vOffsetMax), yesNo(r.text(C.bootstrapDiode)), r.si(C.iQbs),
                r.si(C.vNegMin), r.si(C.tProp), r.si(C.tMatch), yesNo(r.text(C.millerClamp)),
                r.si(C.isolation), r.si(C.pMax), Lifecycle.of(life),
                Double.isNaN(stock) ? -1 : (long) stock, r.si(C.price),
                new DriverRatings(r.si(C.vIorm), r.number(C.cmti) * DriverRatings.KV_PER_US,
                        DriverRatings.uvloTotal(r.text(C.uvloMonitors)), r.si(C.iQOut), r.si(C.qLs),
                        yesNo(r.text(C.desat)), r.si(C.tDesat), yesNo(r.text(C.softOff)),
                        r.si(C.bootClamp), r.si(C.tPropMax)));
    }

    private static Boolean yesNo(String s) {
        return s == null ? null : s.equals("yes");
    }

    /** Whether an input_polarity text (as the catalog writes it) lists a channel of this sense; the driver's own reading. */
    public static boolean offers(String inputPolarity, boolean invertingInput) {
        return polarities(inputPolarity).contains(invertingInput);
    }

    /** Whether any channel is inverting / non-inverting. */
    boolean offers(boolean invertingInput) {
        return inverting.contains(invertingInput);
    }
}
