package org.gatefit.match;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;
import java.util.function.Consumer;
import java.util.function.Supplier;
import org.gatefit.catalog.Column;
import org.gatefit.catalog.ColumnType;
import org.gatefit.catalog.Kind;
import org.gatefit.catalog.Row;
import org.gatefit.catalog.RowCursor;
import org.gatefit.catalog.Schema;

/**
 * A {@link PartSource} over rows held in a list, for the engine tests (no Lucene). A prefilter is
 * applied as {@link PartSource} and {@link Prefilter} document it and the catalog adapter does
 * ({@code index.PartSearch.filter}): a required condition holds only on a value the part has; an
 * exclusion group skips a part that meets every condition, has every {@code known} column and
 * passes the text test. Numbers are compared on the condition's printed value (what the adapter
 * hands the index), choices case-insensitively. {@link #scanColumns} deals parts out round-robin
 * to {@code threads} partitions, so a test sees the rankers of several partitions merged.
 */
final class ListParts implements PartSource {
    private final Map<Kind, TreeMap<String, Row>> rows = new LinkedHashMap<>();
    /** Parts handed out by the scans so far, for checking what a prefilter skipped. */
    final List<String> scanned = new ArrayList<>();

    ListParts(List<Row> parts) {
        for (Kind k : Kind.values()) {
            rows.put(k, new TreeMap<>());
        }
        for (Row r : parts) {
            rows.get(r.kind()).put(Row.normaliseKey(r.key()), r);
        }
    }

    @Override
    public Optional<Row> get(Kind kind, String partNumber) {
        return Optional.ofNullable(rows.get(kind).get(Row.normaliseKey(partNumber)));
    }

    @Override
    public int count(Kind kind) {
        return rows.get(kind).size();
    }

    @Override
    public boolean isEmpty() {
        return rows.values().stream().allMatch(Map::isEmpty);
    }

    @Override
    public String describe() {
        return "a list of " + rows.values().stream().mapToInt(Map::size).sum() + " parts";
    }

    @Override
    public long scan(Kind kind, Prefilter skip, Consumer<Row> sink) {
        long n = 0;
        for (Row r : rows.get(kind).values()) {
            if (keeps(skip, r)) {
                scanned.add(r.key());
                sink.accept(r);
                n++;
            }
        }
        return n;
    }

    @Override
    public <S extends Consumer<RowCursor>> List<S> scanColumns(Kind kind, Prefilter skip, int threads,
                                                                Supplier<S> sinks) {
        List<Row> kept = new ArrayList<>();
        for (Row r : rows.get(kind).values()) {
            if (keeps(skip, r)) {
                kept.add(r);
            }
        }
        List<S> out = new ArrayList<>();
        if (rows.get(kind).isEmpty()) {
            return out;
        }
        int n = Math.max(1, Math.min(threads, kept.size()));
        for (int i = 0; i < n; i++) {
            out.add(sinks.get());
        }
        for (int i = 0; i < kept.size(); i++) {
            scanned.add(kept.get(i).key());
            out.get(i % n).accept(RowCursor.of(kept.get(i)));
        }
        return out;
    }

    /** Whether a prefilter leaves the part to be evaluated. */
    static boolean keeps(Prefilter p, Row r) {
        for (Prefilter.Condition c : p.require()) {
            if (!meets(c, r)) {
                return false;
            }
        }
        for (Prefilter.Exclusion e : p.exclude()) {
            boolean all = true;
            for (Prefilter.Condition c : e.when()) {
                all &= meets(c, r);
            }
            for (String k : e.known()) {
                all &= r.values().get(k) != null;
            }
            if (e.text() != null) {
                String t = r.text(e.text().column());
                all &= t != null && e.text().test().test(t);
            }
            if (all) {
                return false;
            }
        }
        return true;
    }

    /** Whether the part has a value meeting the condition (a part without the value meets none). */
    static boolean meets(Prefilter.Condition c, Row r) {
        Column col = Schema.of(r.kind()).column(c.column())
                .orElseThrow(() -> new AssertionError("no column " + c.column()));
        Object v = r.values().get(c.column());
        if (v == null) {
            return false;
        }
        if (col.type() == ColumnType.TEXT || col.type() == ColumnType.CHOICE) {
            boolean eq = v.toString().toLowerCase(Locale.ROOT).equals(c.value().toLowerCase(Locale.ROOT));
            return switch (c.op()) {
                case EQ -> eq;
                case NE -> !eq;
                default -> throw new AssertionError(c);
            };
        }
        double x = ((Number) v).doubleValue();
        double lim = Double.parseDouble(c.value());
        return switch (c.op()) {
            case LT -> x < lim;
            case LE -> x <= lim;
            case GT -> x > lim;
            case GE -> x >= lim;
            case EQ -> x == lim;
            case NE -> x != lim;
        };
    }

    // ------------------------------------------------------------------ rows from the test builders

    /** A driver row in catalog units (A, Ω, V, µA, ns, kV/µs) from a {@link Parts.Dr} in SI units. */
    static Row driverRow(Parts.Dr d) {
        Map<String, Object> v = new LinkedHashMap<>();
        v.put("part_number", d.pn);
        v.put("maker", "Testmaker");
        v.put("package", "PKG");
        v.put("pinout", "PKG");
        v.put("lifecycle", d.lifecycle);
        v.put("stock", d.stock < 0 ? null : d.stock);
        v.put("unit_price", num(d.price));
        v.put("topology", d.topology.id());
        v.put("channels", (long) d.channels);
        v.put("input_polarity", String.join(";", d.inverting.stream().map(i -> i ? "inverting" : "non-inverting").toList()));
        v.put("i_source_a", num(d.iSource));
        v.put("i_sink_a", num(d.iSink));
        v.put("r_source_ohm", num(d.rSource));
        v.put("r_sink_ohm", num(d.rSink));
        v.put("v_supply_min_v", num(d.vSupplyMin));
        v.put("v_supply_max_v", num(d.vSupplyMax));
        v.put("uvlo_on_v", num(d.uvloOn));
        v.put("uvlo_off_v", num(d.uvloOff));
        v.put("v_ih_v", num(d.vIh));
        v.put("v_il_v", num(d.vIl));
        v.put("v_in_max_v", num(d.vInMax));
        v.put("v_offset_max_v", num(d.vOffsetMax));
        v.put("bootstrap_diode", yesNo(d.bootstrapDiode));
        v.put("i_qbs_ua", num(d.iQbs * 1e6));
        v.put("v_neg_min_v", num(d.vNegMin));
        v.put("t_prop_ns", num(d.tProp * 1e9));
        v.put("t_match_ns", num(d.tMatch * 1e9));
        v.put("miller_clamp", yesNo(d.millerClamp));
        v.put("isolation_vrms", num(d.isolationVrms));
        v.put("p_max_w", num(d.pMax));
        v.put("v_iorm_v", num(d.vIorm));
        v.put("cmti_kv_us", num(d.cmti / 1e9));
        v.put("uvlo_monitors", d.uvloTotal == null ? null : d.uvloTotal ? "total-supply" : "positive-rail");
        v.put("i_q_out_ma", num(d.iQOut * 1e3));
        v.put("q_ls_nc", num(d.qLs * 1e9));
        v.put("desat", yesNo(d.desat));
        v.put("t_desat_ns", num(d.tDesat * 1e9));
        v.put("soft_off", yesNo(d.softOff));
        v.put("boot_clamp_v", num(d.bootClamp));
        v.put("t_prop_max_ns", num(d.tPropMax * 1e9));
        v.values().removeIf(java.util.Objects::isNull);
        return new Row(Kind.DRIVER, d.pn, "test", 2, v, Map.of());
    }

    /** A switch row in catalog units (mΩ, nC, pF) from a {@link Parts.Sw} in SI units. */
    static Row switchRow(Parts.Sw s) {
        Map<String, Object> v = new LinkedHashMap<>();
        v.put("part_number", s.pn);
        v.put("maker", "Testmaker");
        v.put("package", "PKG");
        v.put("pinout", "PKG");
        v.put("lifecycle", s.lifecycle);
        v.put("stock", s.stock < 0 ? null : s.stock);
        v.put("unit_price", num(s.price));
        v.put("technology", s.tech.id());
        v.put("channel", s.nChannel ? "n" : "p");
        v.put("v_block_v", num(s.vBlock));
        v.put("i_cont_a", num(s.iCont));
        v.put("r_on_mohm", num(s.rOn * 1e3));
        v.put("r_on_vgs_v", num(s.rOnVgs));
        v.put("v_ce_sat_v", num(s.vCeSat));
        v.put("v_th_min_v", num(s.vThMin));
        v.put("v_th_max_v", num(s.vThMax));
        v.put("v_gs_max_v", num(s.vGsMax));
        v.put("v_gs_min_v", num(s.vGsMin));
        v.put("v_gate_on_v", num(s.vGateOn));
        v.put("v_gate_off_v", num(s.vGateOff));
        v.put("q_g_nc", num(s.qG * 1e9));
        v.put("q_g_vgs_v", num(s.qGVgs));
        v.put("q_gs_nc", num(s.qGs * 1e9));
        v.put("q_gd_nc", num(s.qGd * 1e9));
        v.put("v_plateau_v", num(s.vPlateau));
        v.put("c_iss_pf", num(s.cIss * 1e12));
        v.put("c_rss_pf", num(s.cRss * 1e12));
        v.put("r_g_int_ohm", num(s.rGInt));
        v.put("v_gate_on_max_v", num(s.vGateOnMax));
        v.put("v_gate_off_min_v", num(s.vGateOffMin));
        v.put("t_sc_us", num(s.tSc * 1e6));
        v.put("t_d_off_ns", num(s.tDOff * 1e9));
        v.put("t_f_ns", num(s.tF * 1e9));
        v.values().removeIf(java.util.Objects::isNull);
        return new Row(Kind.SWITCH, s.pn, "test", 2, v, Map.of());
    }

    private static Double num(double x) {
        return Double.isNaN(x) ? null : x;
    }

    private static String yesNo(Boolean b) {
        return b == null ? null : b ? "yes" : "no";
    }

    /** Rows sorted by part number, for comparing lists. */
    static final Comparator<Row> BY_KEY = Comparator.comparing(Row::key);
}
