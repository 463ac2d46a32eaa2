package org.gatefit.synth;

import java.io.BufferedWriter;
import java.io.IOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import org.gatefit.catalog.Kind;
import org.gatefit.catalog.Schema;

/**
 * Deterministic synthetic catalogs for benchmarks and harnesses: invented parts ({@code TST-…},
 * maker {@code Testmaker}) of every technology and topology, with figures in plausible datasheet
 * ranges (common practice, no source) and the relations a datasheet keeps: Q_gs + Q_gd &lt; Q_g,
 * V_th,min &lt; V_th,max &lt; V_plateau &lt; recommended on level &lt; V_GS,max, UVLO falling below
 * UVLO rising below the supply minimum, V_IL &lt; V_IH &lt; V_in,max, sink ≥ source current.
 *
 * <p>Row {@code i} depends only on {@link #SEED} and {@code i} (its own {@link Random}), so the
 * first 10,000 rows of a 1,000,000-row catalog are the 10,000-row catalog. Columns and their order
 * come from the bundled schema ({@code catalog-schema/}), so the CSV always has every column.
 */
public final class SyntheticCatalog {
    /** The fixed seed; change it and every figure in the README's Performance section is void. */
    public static final long SEED = 0x6A7EF17L;

    private static final String[] TECH = {"si-mosfet", "sic-mosfet", "gan-hemt", "igbt"};
    private static final String[] TOPOLOGY = {"low-side", "high-side", "half-bridge", "isolated"};
    private static final String[] SWITCH_PACKAGES = {"TO-220", "TO-247-3", "TO-247-4", "D2PAK-7", "TOLL-8", "DFN-8x8", "SO-8FL"};
    private static final String[] DRIVER_PACKAGES = {"SO-8", "SO-16W", "DFN-10", "SOT-23-6", "QFN-16", "SO-8W"};

    private SyntheticCatalog() {
    }

    /** Switch {@code i}'s part number. */
    public static String switchNumber(long i) {
        return "TST-S" + pad(i);
    }

    /** Driver {@code i}'s part number. */
    public static String driverNumber(long i) {
        return "TST-D" + pad(i);
    }

    /** Technology of switch {@code i} (they cycle, so any size has all four). */
    public static String technology(long i) {
        return TECH[(int) (i % 4)];
    }

    /** Writes {@code n} switches to {@code csv}. */
    public static void writeSwitches(Path csv, long n) throws IOException {
        try (Writer w = writer(csv)) {
            writeSwitches(w, n);
        }
    }

    /** Writes {@code n} drivers to {@code csv}. */
    public static void writeDrivers(Path csv, long n) throws IOException {
        try (Writer w = writer(csv)) {
            writeDrivers(w, n);
        }
    }

    public static void writeSwitches(Writer w, long n) throws IOException {
        List<String> cols = Schema.of(Kind.SWITCH).names();
        header(w, cols);
        Map<String, String> row = new HashMap<>();
        StringBuilder sb = new StringBuilder(512);
        for (long i = 0; i < n; i++) {
            row.clear();
            switchRow(i, row);
            line(w, cols, row, sb);
        }
    }

    public static void writeDrivers(Writer w, long n) throws IOException {
        List<String> cols = Schema.of(Kind.DRIVER).names();
        header(w, cols);
        Map<String, String> row = new HashMap<>();
        StringBuilder sb = new StringBuilder(512);
        for (long i = 0; i < n; i++) {
            row.clear();
            driverRow(i, row);
            line(w, cols, row, sb);
        }
    }

    /**
     * Writes a stage sheet of {@code n} stages, each a random switch of {@code switches} and driver
     * of {@code drivers} at an operating point typical of the switch's technology.
     */
    public static void writeStages(Path csv, long n, long switches, long drivers) throws IOException {
        List<String> cols = Schema.of(Kind.STAGE).names();
        try (Writer w = writer(csv)) {
            header(w, cols);
            Map<String, String> row = new HashMap<>();
            StringBuilder sb = new StringBuilder(256);
            for (long i = 0; i < n; i++) {
                Random r = rnd(3, i);
                row.clear();
                long s = Math.floorMod(r.nextLong(), switches);
                long d = Math.floorMod(r.nextLong(), drivers);
                boolean high = (i & 1) == 1;
                row.put("stage", "ST-" + pad(i));
                row.put("driver", driverNumber(d));
                row.put("switch", switchNumber(s));
                row.put("side", high ? "high" : "low");
                switch (technology(s)) {
                    case "si-mosfet" -> op(row, 48, 100, 40, 10, 0);
                    case "sic-mosfet" -> op(row, 800, 50, 30, 18, -4);
                    case "gan-hemt" -> op(row, 400, 300, 10, 6, 0);
                    default -> op(row, 600, 20, 150, 15, -8);
                }
                row.put("logic", r.nextInt(4) == 0 ? "cmos-5v" : "lvcmos-3v3");
                row.put("pwm_sense", "active-high");
                row.put("r_g_ohm", num(1 + r.nextInt(100) / 10.0, 1));
                row.put("duty_max", high ? "0.9" : "0.95");
                row.put("loop_nh", num(5 + r.nextInt(15), 0));
                line(w, cols, row, sb);
            }
        }
    }

    private static void op(Map<String, String> row, double bus, double fKhz, double edgeNs, double on, double off) {
        row.put("bus_v", num(bus, 0));
        row.put("f_sw_khz", num(fKhz, 0));
        row.put("edge_ns", num(edgeNs, 0));
        row.put("v_drive_v", num(on, 0));
        row.put("v_drive_neg_v", num(off, 0));
    }

    /** The cells of switch {@code i} (column name to cell text; absent = empty cell). */
    public static void switchRow(long i, Map<String, String> row) {
        Random r = rnd(1, i);
        String tech = technology(i);
        double k = 1 + 4 * r.nextDouble(); // die size factor
        common(i, r, row, switchNumber(i), SWITCH_PACKAGES);
        row.put("technology", tech);
        double vBlock;
        double vThMin;
        double vThSpan;
        double vGsMax;
        double vGsMin;
        double on;
        double off;
        double qg;
        double plateauAbove;
        double rgInt;
        switch (tech) {
            case "si-mosfet" -> {
                vBlock = pick(r, 30, 40, 60, 80, 100, 150, 200);
                vThMin = 1.5 + r.nextDouble();
                vThSpan = 1.5 + r.nextDouble() * 0.5;
                vGsMax = 20;
                vGsMin = -20;
                on = 10;
                off = 0;
                qg = 12 * k * (0.5 + vBlock / 100);
                plateauAbove = 0.5 + r.nextDouble();
                rgInt = 0.5 + r.nextDouble() * 2;
                row.put("r_on_mohm", num(400 / (k * k) * (vBlock / 100) * (vBlock / 100) + 0.8, 2));
                row.put("r_on_vgs_v", "10");
                row.put("i_cont_a", num(30 * k, 0));
                row.put("channel", i % 53 == 7 ? "p" : "n");
            }
            case "sic-mosfet" -> {
                vBlock = pick(r, 650, 900, 1200, 1700);
                vThMin = 1.8 + r.nextDouble() * 0.6;
                vThSpan = 1.6 + r.nextDouble();
                vGsMax = pick(r, 22, 23, 25);
                vGsMin = pick(r, -8, -10);
                on = pick(r, 15, 18);
                off = pick(r, -4, -3, 0);
                qg = 25 * k * vBlock / 900;
                plateauAbove = 3 + r.nextDouble() * 2;
                rgInt = 1 + r.nextDouble() * 6;
                row.put("r_on_mohm", num(160 / k * vBlock / 1200, 1));
                row.put("r_on_vgs_v", num(on, 0));
                row.put("i_cont_a", num(20 * k, 0));
            }
            case "gan-hemt" -> {
                vBlock = pick(r, 100, 650);
                vThMin = 1.0 + r.nextDouble() * 0.3;
                vThSpan = 1.0 + r.nextDouble() * 0.6;
                vGsMax = 7;
                vGsMin = pick(r, -10, -20);
                on = 6;
                off = r.nextInt(4) == 0 ? -3 : 0;
                qg = 1.5 * k * (vBlock == 100 ? 2 : 1);
                plateauAbove = 0.3 + r.nextDouble() * 0.4;
                rgInt = 0.3 + r.nextDouble();
                row.put("r_on_mohm", num(vBlock == 100 ? 15 / k : 200 / k, 1));
                row.put("r_on_vgs_v", "6");
                row.put("i_cont_a", num(10 * k, 0));
            }
            default -> {
                vBlock = pick(r, 600, 650, 1200);
                vThMin = 5.0 + r.nextDouble() * 0.5;
                vThSpan = 1.0 + r.nextDouble() * 0.5;
                vGsMax = 20;
                vGsMin = -20;
                on = 15;
                off = pick(r, 0, -8, -15);
                qg = 60 * k * k;
                plateauAbove = 2 + r.nextDouble() * 2;
                rgInt = 2 + r.nextDouble() * 8;
                row.put("v_ce_sat_v", num(1.4 + r.nextDouble(), 2));
                row.put("i_cont_a", num(25 * k, 0));
            }
        }
        double vThMax = vThMin + vThSpan;
        double plateau = Math.min(vThMax + plateauAbove, on - 1);
        double qgs = qg * (0.2 + r.nextDouble() * 0.1);
        double qgd = qg * (0.2 + r.nextDouble() * 0.15);
        row.put("v_block_v", num(vBlock, 0));
        row.put("v_th_min_v", num(vThMin, 2));
        row.put("v_th_max_v", num(vThMax, 2));
        row.put("v_gs_max_v", num(vGsMax, 0));
        row.put("v_gs_min_v", num(vGsMin, 0));
        row.put("v_gate_on_v", num(on, 0));
        row.put("v_gate_off_v", num(off, 0));
        row.put("q_g_nc", num(qg, 1));
        row.put("q_g_vgs_v", num(on - off, 0));
        row.put("q_gs_nc", num(qgs, 2));
        row.put("q_gd_nc", num(qgd, 2));
        row.put("v_plateau_v", num(plateau, 2));
        row.put("c_iss_pf", num(qg * 1000 / (on - off) * (0.8 + r.nextDouble() * 0.4), 0));
        row.put("c_rss_pf", num(qgd * 1000 / vBlock * 0.5 + 0.2, 1)); // C_rss at V_DS,max / 2 is well below Q_gd / V
        row.put("r_g_int_ohm", num(rgInt, 2));
        row.put("description", "synthetic " + tech + " " + num(vBlock, 0) + " V bench part");
    }

    /** The cells of driver {@code i} (column name to cell text; absent = empty cell). */
    public static void driverRow(long i, Map<String, String> row) {
        Random r = rnd(2, i);
        String topo = TOPOLOGY[(int) (i % 4)];
        common(i, r, row, driverNumber(i), DRIVER_PACKAGES);
        row.put("topology", topo);
        int channels = switch (topo) {
            case "half-bridge" -> 2;
            case "high-side" -> 1;
            default -> r.nextBoolean() ? 1 : 2;
        };
        row.put("channels", Integer.toString(channels));
        String pol = r.nextInt(8) == 0 ? "inverting" : "non-inverting";
        if (channels == 2) {
            pol = r.nextInt(6) == 0 ? "non-inverting;inverting" : pol + ";" + pol;
        }
        row.put("input_polarity", pol);
        // supply class: 5 V (GaN), 12 V (Si, IGBT), wide (SiC, isolated)
        int cls = topo.equals("isolated") ? 2 : r.nextInt(5) == 0 ? 0 : r.nextInt(6) == 0 ? 2 : 1;
        double sMin;
        double sMax;
        switch (cls) {
            case 0 -> {
                sMin = 4.5;
                sMax = pick(r, 5.5, 6.5, 7);
            }
            case 1 -> {
                sMin = pick(r, 8, 9, 10);
                sMax = pick(r, 18, 20);
            }
            default -> {
                sMin = pick(r, 13, 14, 15);
                sMax = pick(r, 25, 30, 33);
            }
        }
        double src = 0.5 + r.nextInt(20) * 0.5;
        double sink = src * (1 + r.nextDouble());
        row.put("i_source_a", num(src, 1));
        row.put("i_sink_a", num(sink, 1));
        row.put("r_source_ohm", num(sMax / 2 / src * (0.6 + r.nextDouble() * 0.4), 2));
        row.put("r_sink_ohm", num(sMax / 2 / sink * (0.4 + r.nextDouble() * 0.4), 2));
        row.put("v_supply_min_v", num(sMin, 1));
        row.put("v_supply_max_v", num(sMax, 1));
        double uvloOn = sMin - 0.2 - r.nextDouble() * 0.6;
        double hyst = 0.2 + r.nextDouble() * 0.8;
        row.put("uvlo_on_v", num(uvloOn, 2));
        row.put("uvlo_off_v", num(uvloOn - hyst, 2));
        boolean ttlIn = r.nextInt(7) == 0;
        double vIh = ttlIn ? 3.5 : 1.6 + r.nextDouble() * 0.9;
        double vIl = ttlIn ? 1.5 : 0.8 + r.nextDouble() * 0.4;
        row.put("v_ih_v", num(vIh, 2));
        row.put("v_il_v", num(Math.min(vIl, vIh - 0.3), 2));
        row.put("v_in_max_v", cls == 0 ? "6" : num(pick(r, 5.5, 18, 20), 1));
        boolean floating = topo.equals("high-side") || topo.equals("half-bridge");
        if (floating) {
            row.put("v_offset_max_v", num(pick(r, 100, 200, 600, 1200), 0));
            row.put("bootstrap_diode", r.nextBoolean() ? "yes" : "no");
            row.put("i_qbs_ua", num(40 + r.nextInt(160), 0));
        }
        if (topo.equals("isolated")) {
            double withstand = pick(r, 2500, 3750, 5000, 5700);
            row.put("isolation_vrms", num(withstand, 0));
            // The working voltage (peak) a third of the withstand rating, rounded to 10 V, derived
            // rather than drawn so the random sequence, and every other column, stays as it was.
            row.put("v_iorm_v", num(Math.round(withstand * 0.3 / 10) * 10.0, 0));
            row.put("v_neg_min_v", r.nextInt(3) == 0 ? "0" : num(pick(r, -5, -8, -10), 0));
            row.put("miller_clamp", r.nextBoolean() ? "yes" : "no");
        } else if (r.nextInt(3) == 0) {
            row.put("miller_clamp", "no");
        }
        row.put("t_prop_ns", num(15 + r.nextInt(135), 0));
        if (channels == 2) {
            row.put("t_match_ns", num(1 + r.nextInt(10), 0));
        }
        row.put("p_max_w", num(0.3 + r.nextInt(13) * 0.1, 1));
        row.put("description", "synthetic " + topo + " " + num(src, 1) + " A bench driver");
    }

    private static void common(long i, Random r, Map<String, String> row, String pn, String[] packages) {
        String pkg = packages[r.nextInt(packages.length)];
        row.put("part_number", pn);
        row.put("maker", "Testmaker");
        row.put("package", pkg);
        row.put("pinout", pkg + (r.nextInt(4) == 0 ? "-B" : ""));
        int life = r.nextInt(100);
        row.put("lifecycle", life < 80 ? "active" : life < 88 ? "nrnd" : life < 92 ? "ltb" : life < 95 ? "preview"
                : life < 98 ? "obsolete" : "unknown");
        if (r.nextInt(20) != 0) {
            row.put("stock", Integer.toString(r.nextInt(10) == 0 ? 0 : r.nextInt(20_000)));
        }
        if (r.nextInt(20) != 0) {
            row.put("unit_price", num(0.3 + r.nextDouble() * 6, 2));
        }
    }

    private static Random rnd(int stream, long i) {
        return new Random(SEED ^ (stream * 0x9E3779B97F4A7C15L) ^ (i * 0xBF58476D1CE4E5B9L));
    }

    private static double pick(Random r, double... v) {
        return v[r.nextInt(v.length)];
    }

    private static String pad(long i) {
        String s = Long.toString(i);
        return s.length() >= 7 ? s : "0".repeat(7 - s.length()) + s;
    }

    /** Fixed-point text with up to {@code decimals} decimals, trailing zeros dropped (no exponent). */
    static String num(double v, int decimals) {
        long scale = 1;
        for (int d = 0; d < decimals; d++) {
            scale *= 10;
        }
        long m = Math.round(Math.abs(v) * scale);
        StringBuilder sb = new StringBuilder();
        if (v < 0 && m != 0) {
            sb.append('-');
        }
        sb.append(m / scale);
        long frac = m % scale;
        if (frac != 0) {
            String f = Long.toString(frac + scale).substring(1);
            int end = f.length();
            while (f.charAt(end - 1) == '0') {
                end--;
            }
            sb.append('.').append(f, 0, end);
        }
        return sb.toString();
    }

    private static Writer writer(Path csv) throws IOException {
        return new BufferedWriter(Files.newBufferedWriter(csv, StandardCharsets.UTF_8), 1 << 16);
    }

    private static void header(Writer w, List<String> cols) throws IOException {
        w.write(String.join(",", cols));
        w.write('\n');
    }

    private static void line(Writer w, List<String> cols, Map<String, String> row, StringBuilder sb) throws IOException {
        sb.setLength(0);
        for (int c = 0; c < cols.size(); c++) {
            if (c > 0) {
                sb.append(',');
            }
            String v = row.get(cols.get(c));
            if (v != null) {
                sb.append(v);
            }
        }
        sb.append('\n');
        w.append(sb);
    }
}
