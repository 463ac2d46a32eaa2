package org.gatefit.bench;

import java.io.BufferedWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.FileVisitResult;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.SimpleFileVisitor;
import java.nio.file.attribute.BasicFileAttributes;
import java.time.Clock;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import org.gatefit.catalog.Kind;
import org.gatefit.index.Catalog;
import org.gatefit.index.Importer;
import org.gatefit.match.Margins;
import org.gatefit.match.OperatingPoint;
import org.gatefit.match.Shortlist;
import org.gatefit.match.SwitchPart;

/**
 * Shortlist latency, for a person to read: not a test, no assertion, never run by the build.
 * Generates N synthetic drivers (invented parts "TST-D…" from maker "Testmaker", all four
 * topologies, plausible ratings) and a few switches into a temporary catalog with {@link Importer},
 * then times what {@code shortlist --all} does — {@link Shortlist.Ranker} fed by
 * {@link Catalog#scan} over every driver — for each switch, after warm-up, and prints median and p90.
 *
 * <pre>
 * mvn -q -B test-compile dependency:build-classpath -Dmdep.outputFile=cp.txt
 * java -cp target/classes:target/test-classes:$(cat cp.txt) org.gatefit.bench.ShortlistLatency [N] [REPS]
 * </pre>
 */
public final class ShortlistLatency {
    private static final String[] TOPOLOGY = {"low-side", "high-side", "half-bridge", "isolated"};

    private ShortlistLatency() {
    }

    public static void main(String[] args) throws Exception {
        int n = args.length > 0 ? Integer.parseInt(args[0]) : 100_000;
        int reps = args.length > 1 ? Integer.parseInt(args[1]) : 50;
        Path tmp = Files.createTempDirectory("gatefit-bench");
        try {
            Path drivers = tmp.resolve("drivers.csv");
            try (BufferedWriter w = Files.newBufferedWriter(drivers, StandardCharsets.UTF_8)) {
                w.write("part_number,maker,package,lifecycle,stock,unit_price,topology,channels,input_polarity,"
                        + "i_source_a,i_sink_a,r_source_ohm,r_sink_ohm,v_supply_min_v,v_supply_max_v,uvlo_on_v,"
                        + "uvlo_off_v,v_ih_v,v_il_v,v_in_max_v,v_offset_max_v,bootstrap_diode,i_qbs_ua,v_neg_min_v,"
                        + "t_prop_ns,miller_clamp,isolation_vrms,p_max_w\n");
                for (int i = 0; i < n; i++) {
                    String topo = TOPOLOGY[i % 4];
                    boolean floats = !topo.equals("low-side");
                    boolean iso = topo.equals("isolated");
                    double src = 0.5 + (i % 20) * 0.5;
                    double snk = src * 1.5;
                    double vmin = iso ? 13 : 4.5 + (i % 3) * 4;
                    double vmax = iso ? 30 : vmin + 12;
                    double uvlo = vmin - 0.5;
                    w.write(String.format(Locale.ROOT,
                            "TST-D%06d,Testmaker,PKG-%d,%s,%d,%.2f,%s,%d,%s,%.1f,%.2f,%.2f,%.2f,%.1f,%.1f,%.1f,%.1f,"
                                    + "%.1f,0.8,%.1f,%s,%s,%s,%s,%d,%s,%s,%.2f\n",
                            i, i % 13, i % 7 == 0 ? "nrnd" : "active", i % 3000, 0.4 + (i % 400) / 100.0, topo,
                            1 + i % 2, i % 9 == 0 ? "inverting" : "non-inverting", src, snk, 12 / src, 12 / snk, vmin,
                            vmax, uvlo, uvlo - 0.5, i % 5 == 0 ? 3.5 : 2.0, vmax,
                            floats && !iso ? Integer.toString(100 + (i % 12) * 100) : "",
                            floats && !iso ? (i % 2 == 0 ? "yes" : "no") : "no", floats && !iso ? "60" : "",
                            iso && i % 3 != 0 ? "-10" : "0", 20 + i % 100, iso ? "yes" : "no",
                            iso ? Integer.toString(2500 + (i % 4) * 1000) : "", 0.4 + (i % 10) * 0.1));
                }
            }
            Path switches = tmp.resolve("switches.csv");
            Files.writeString(switches, String.join("\n",
                    "part_number,maker,technology,v_block_v,r_on_mohm,r_on_vgs_v,v_th_min_v,v_th_max_v,v_gs_max_v,"
                            + "v_gs_min_v,v_gate_on_v,v_gate_off_v,q_g_nc,q_g_vgs_v,q_gs_nc,q_gd_nc,v_plateau_v,"
                            + "c_iss_pf,c_rss_pf,r_g_int_ohm,lifecycle,stock",
                    "TST-S0001,Testmaker,si-mosfet,100,3,10,2,4,20,-20,10,0,100,10,30,25,5,6000,40,1,active,100",
                    "TST-S0002,Testmaker,sic-mosfet,1200,20,18,2,4,22,-8,18,-4,150,22,40,45,7.5,5000,12,1.5,active,100",
                    "TST-S0003,Testmaker,gan-hemt,650,50,6,1.1,2.5,7,-10,6,0,6,6,2,1.8,3,350,1.5,0.8,active,100",
                    "TST-S0004,Testmaker,igbt,650,,15,5,6.5,20,-20,15,0,200,15,40,90,8.5,4500,20,2,active,100") + "\n");
            Path catalog = tmp.resolve("catalog");
            long t0 = System.nanoTime();
            new Importer(catalog, Clock.systemUTC()).run(List.of(switches, drivers),
                    List.of(switches.toString(), drivers.toString()), new Importer.Options(null, false, null), x -> { });
            System.out.printf(Locale.ROOT, "imported %d drivers + 4 switches in %.1f s%n", n,
                    (System.nanoTime() - t0) / 1e9);
            try (Catalog c = Catalog.open(catalog)) {
                List<SwitchPart> sws = new ArrayList<>();
                List<OperatingPoint> ops = new ArrayList<>();
                String[] pns = {"TST-S0001", "TST-S0002", "TST-S0003", "TST-S0004"};
                boolean[] high = {true, true, false, false};
                double[] bus = {48, 800, 400, 400};
                for (int k = 0; k < pns.length; k++) {
                    SwitchPart sw = SwitchPart.of(c.get(Kind.SWITCH, pns[k]).orElseThrow());
                    OperatingPoint.Spec spec = new OperatingPoint.Spec();
                    spec.fSw = 50e3;
                    spec.bus = bus[k];
                    spec.highSide = high[k];
                    spec.dutyMax = 0.9;
                    spec.rG = 2.2;
                    sws.add(sw);
                    ops.add(spec.resolve(sw));
                }
                for (int warm = 0; warm < 10; warm++) {
                    once(c, sws.get(warm % 4), ops.get(warm % 4));
                }
                double[] ms = new double[reps];
                long evaluated = 0;
                for (int r = 0; r < reps; r++) {
                    long s = System.nanoTime();
                    evaluated = once(c, sws.get(r % 4), ops.get(r % 4));
                    ms[r] = (System.nanoTime() - s) / 1e6;
                }
                Arrays.sort(ms);
                System.out.printf(Locale.ROOT, "shortlist --all over %d drivers (%d evaluated in the last run),"
                                + " %d runs after warm-up: median %.1f ms, p90 %.1f ms, min %.1f ms, max %.1f ms (%d cores)%n",
                        n, evaluated, reps, ms[reps / 2], ms[(int) Math.ceil(reps * 0.9) - 1], ms[0], ms[reps - 1],
                        Runtime.getRuntime().availableProcessors());
            }
        } finally {
            delete(tmp);
        }
    }

    /** What ShortlistCommand does with --all (no prefilter): every driver through the rules, top 10 kept. */
    private static long once(Catalog c, SwitchPart sw, OperatingPoint op) throws java.io.IOException {
        Shortlist.Ranker ranker = new Shortlist.Ranker(sw, op, Margins.DEFAULT, 10, true, List.of());
        c.scan(Kind.DRIVER, null, ranker);
        return ranker.result().evaluated();
    }

    private static void delete(Path root) throws java.io.IOException {
        Files.walkFileTree(root, new SimpleFileVisitor<>() {
            @Override
            public FileVisitResult visitFile(Path f, BasicFileAttributes a) throws java.io.IOException {
                Files.delete(f);
                return FileVisitResult.CONTINUE;
            }

            @Override
            public FileVisitResult postVisitDirectory(Path d, java.io.IOException e) throws java.io.IOException {
                Files.delete(d);
                return FileVisitResult.CONTINUE;
            }
        });
    }
}
