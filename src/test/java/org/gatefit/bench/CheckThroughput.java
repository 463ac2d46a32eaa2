package org.gatefit.bench;

import java.io.BufferedWriter;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.FileVisitResult;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.SimpleFileVisitor;
import java.nio.file.attribute.BasicFileAttributes;
import java.time.Clock;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.gatefit.cli.Cli;
import org.gatefit.index.Importer;

/**
 * {@code check} throughput, for a person to read: not a test, no assertion, never run by the build.
 * Generates a catalog of N invented parts (half switches, half drivers, maker "Testmaker", part
 * numbers "TST-…", cells in physically plausible ranges), imports it with {@link Importer}, writes a
 * stage sheet of S stages referring to random pairs of them, then runs {@code check} in process
 * through {@link Cli#create} (as {@code main} does; JSON output to a discarded writer) once to warm up
 * and once timed, and prints stages per second.
 *
 * <pre>
 * mvn -q -B test-compile dependency:build-classpath -Dmdep.outputFile=cp.txt
 * java -cp target/classes:target/test-classes:$(cat cp.txt) org.gatefit.bench.CheckThroughput [PARTS] [STAGES]
 * </pre>
 */
public final class CheckThroughput {
    private static final String[] TECH = {"si-mosfet", "sic-mosfet", "gan-hemt", "igbt"};
    private static final String[] TOPOLOGY = {"low-side", "high-side", "half-bridge", "isolated"};

    private CheckThroughput() {
    }

    public static void main(String[] args) throws Exception {
        int parts = args.length > 0 ? Integer.parseInt(args[0]) : 100_000;
        int stages = args.length > 1 ? Integer.parseInt(args[1]) : 10_000;
        int half = parts / 2;
        Path tmp = Files.createTempDirectory("gatefit-check-bench");
        try {
            Path sw = tmp.resolve("switches.csv");
            Path drv = tmp.resolve("drivers.csv");
            writeSwitches(sw, half);
            writeDrivers(drv, parts - half);
            Path catalog = tmp.resolve("catalog");
            long t0 = System.nanoTime();
            Importer.Result imp = new Importer(catalog, Clock.systemUTC()).run(List.of(sw, drv),
                    List.of(sw.toString(), drv.toString()), new Importer.Options(null, false, null), x -> { });
            System.out.printf(Locale.ROOT, "imported %d parts in %.2f s%n", imp.written(), (System.nanoTime() - t0) / 1e9);
            Path sheet = tmp.resolve("stages.csv");
            writeStages(sheet, stages, half, parts - half);
            String[] cmd = {"--catalog", catalog.toString(), "check", sheet.toString(), "--format", "json"};
            int code = run(cmd); // warm-up
            long t1 = System.nanoTime();
            code = run(cmd);
            double s = (System.nanoTime() - t1) / 1e9;
            System.out.printf(Locale.ROOT, "checked %d stages in %.2f s: %.0f stages/s (exit %d, %d cores)%n",
                    stages, s, stages / s, code, Runtime.getRuntime().availableProcessors());
        } finally {
            delete(tmp);
        }
    }

    private static int run(String[] cmd) {
        PrintWriter out = new PrintWriter(Writer.nullWriter());
        StringWriter errText = new StringWriter();
        PrintWriter err = new PrintWriter(errText);
        int code = Cli.create(out, err, Map.of(), Clock.systemUTC()).execute(cmd);
        err.flush();
        if (code > 1) {
            throw new IllegalStateException("check exited " + code + ": " + errText);
        }
        return code;
    }

    /** Switches: ratings grouped by technology in plausible datasheet ranges. */
    private static void writeSwitches(Path csv, int n) throws Exception {
        try (BufferedWriter w = Files.newBufferedWriter(csv, StandardCharsets.UTF_8)) {
            w.write("part_number,maker,package,lifecycle,stock,technology,v_block_v,i_cont_a,r_on_mohm,r_on_vgs_v,"
                    + "v_th_min_v,v_th_max_v,v_gs_max_v,v_gs_min_v,v_gate_on_v,v_gate_off_v,q_g_nc,q_g_vgs_v,q_gs_nc,"
                    + "q_gd_nc,v_plateau_v,c_iss_pf,c_rss_pf,r_g_int_ohm\n");
            for (int i = 0; i < n; i++) {
                String t = TECH[i % 4];
                double k = 1 + (i % 97) / 24.0; // die size factor 1..5
                String row = switch (t) {
                    case "si-mosfet" -> String.format(Locale.ROOT, "%d,%.0f,%.2f,10,2.0,4.0,20,-20,10,0,%.0f,10,%.1f,%.1f,4.8,%.0f,%.0f,1.2",
                            60 + (i % 5) * 40, 40 * k, 8 / k, 25 * k, 8 * k, 6 * k, 1800 * k, 15 * k);
                    case "sic-mosfet" -> String.format(Locale.ROOT, "1200,%.0f,%.1f,18,1.8,4.0,22,-8,18,-4,%.0f,22,%.1f,%.1f,9,%.0f,%.1f,2.5",
                            20 * k, 80 / k, 40 * k, 12 * k, 14 * k, 1200 * k, 5 * k);
                    case "gan-hemt" -> String.format(Locale.ROOT, "650,%.0f,%.0f,6,1.1,2.6,7,-10,6,0,%.1f,6,%.1f,%.1f,3,%.0f,%.1f,0.6",
                            8 * k, 200 / k, 2.5 * k, 0.6 * k, 0.8 * k, 100 * k, 0.5 * k);
                    default -> String.format(Locale.ROOT, "650,%.0f,,15,5.0,6.5,20,-20,15,0,%.0f,15,%.0f,%.0f,9.5,%.0f,%.0f,3",
                            25 * k, 60 * k, 12 * k, 25 * k, 2500 * k, 20 * k);
                };
                w.write("TST-S" + i + ",Testmaker,TST-PAK" + (i % 7) + "," + (i % 50 == 0 ? "nrnd" : "active") + ","
                        + (i % 300) + "," + t + "," + row + "\n");
            }
        }
    }

    /** Drivers: 0.5–10 A peaks, supplies and UVLO of 12 V-class and 5 V-class parts. */
    private static void writeDrivers(Path csv, int n) throws Exception {
        try (BufferedWriter w = Files.newBufferedWriter(csv, StandardCharsets.UTF_8)) {
            w.write("part_number,maker,package,lifecycle,stock,topology,channels,input_polarity,i_source_a,i_sink_a,"
                    + "r_source_ohm,r_sink_ohm,v_supply_min_v,v_supply_max_v,uvlo_on_v,uvlo_off_v,v_ih_v,v_il_v,"
                    + "v_in_max_v,v_offset_max_v,bootstrap_diode,i_qbs_ua,v_neg_min_v,t_prop_ns,t_match_ns,miller_clamp,"
                    + "isolation_vrms,p_max_w\n");
            for (int i = 0; i < n; i++) {
                String topo = TOPOLOGY[i % 4];
                double src = 0.5 + (i % 20) * 0.5;
                boolean fiveVolt = i % 5 == 0;
                w.write(String.format(Locale.ROOT,
                        "TST-D%d,Testmaker,TST-SOT%d,active,%d,%s,%d,%s,%.1f,%.1f,%.2f,%.2f,%s,%s,%s,%s,%s,%s,20,%s,%s,%s,%s,%d,%s,%s,%s,%.2f%n",
                        i, i % 5, i % 400, topo, topo.equals("half-bridge") ? 2 : 1,
                        i % 11 == 0 ? "inverting" : "non-inverting", src, src * 1.5, 12 / src / 2, 12 / src / 3,
                        fiveVolt ? "4.5" : "9", topo.equals("isolated") ? "30" : "20",
                        fiveVolt ? "4.2" : "8.2", fiveVolt ? "3.9" : "7.6",
                        i % 7 == 0 ? "3.5" : "2.0", i % 7 == 0 ? "1.5" : "0.8",
                        topo.equals("high-side") || topo.equals("half-bridge") ? "120" : "",
                        topo.equals("half-bridge") ? "yes" : topo.equals("high-side") ? "no" : "",
                        topo.equals("high-side") || topo.equals("half-bridge") ? "80" : "",
                        topo.equals("isolated") && i % 3 != 0 ? "-10" : "0", 20 + i % 60,
                        topo.equals("half-bridge") ? "5" : "", topo.equals("isolated") ? "yes" : "no",
                        topo.equals("isolated") ? "5000" : "", 0.3 + (i % 10) * 0.1));
            }
        }
    }

    /** Stages: random pairs at operating points typical for each technology. */
    private static void writeStages(Path csv, int n, int switches, int drivers) throws Exception {
        java.util.Random rnd = new java.util.Random(42);
        try (BufferedWriter w = Files.newBufferedWriter(csv, StandardCharsets.UTF_8)) {
            w.write("stage,driver,switch,side,bus_v,f_sw_khz,edge_ns,v_drive_v,v_drive_neg_v,logic,pwm_sense,r_g_ohm,"
                    + "r_g_off_ohm,duty_max,parallel,loop_nh\n");
            for (int i = 0; i < n; i++) {
                int s = rnd.nextInt(switches);
                int d = rnd.nextInt(drivers);
                String op = switch (TECH[s % 4]) {
                    case "si-mosfet" -> "48,50,60,12,0";
                    case "sic-mosfet" -> "800,20,80,18,-4";
                    case "gan-hemt" -> "400,200,10,6,0";
                    default -> "400,20,100,15,0";
                };
                w.write(String.format(Locale.ROOT, "ST-%d,TST-D%d,TST-S%d,%s,%s,lvcmos-3v3,active-high,%.1f,1.0,0.9,1,8%n",
                        i, d, s, i % 2 == 0 ? "low" : "high", op, 1.0 + rnd.nextInt(40) / 10.0));
            }
        }
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
