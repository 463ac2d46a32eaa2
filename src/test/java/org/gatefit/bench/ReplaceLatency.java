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
import java.util.Arrays;
import java.util.Locale;
import java.util.Map;
import org.gatefit.cli.Cli;

/**
 * {@code replace} latency, for a person to read: not a test, no assertion, never run by the build.
 * Imports N synthetic switches (invented parts "TST-…" from maker "Testmaker", plausible figures)
 * through the CLI into a temporary catalog, then runs {@code replace} of one of them in-process
 * through {@link Cli#create} (open the catalog, prefilter, scan, grade, render JSON), after
 * warm-up, and prints the median of 20 runs.
 *
 * <p>The part replaced is a 40 V Si MOSFET: the prefilter keeps every Si MOSFET rated 40 V or more
 * with a gate window at least as wide, which is a quarter of the catalog — a heavy case.
 *
 * <pre>
 * mvn -q -B test-compile dependency:build-classpath -Dmdep.outputFile=cp.txt
 * java -cp target/classes:target/test-classes:$(cat cp.txt) org.gatefit.bench.ReplaceLatency [N]
 * </pre>
 */
public final class ReplaceLatency {
    private static final String[] TECH = {"si-mosfet", "sic-mosfet", "gan-hemt", "igbt"};
    private static final int WARMUP = 10;
    private static final int RUNS = 20;

    private ReplaceLatency() {
    }

    public static void main(String[] args) throws Exception {
        int n = args.length > 0 ? Integer.parseInt(args[0]) : 200_000;
        Path tmp = Files.createTempDirectory("gatefit-bench");
        try {
            Path csv = tmp.resolve("switches.csv");
            try (BufferedWriter w = Files.newBufferedWriter(csv, StandardCharsets.UTF_8)) {
                w.write("part_number,maker,package,pinout,lifecycle,stock,unit_price,technology,v_block_v,i_cont_a,"
                        + "r_on_mohm,r_on_vgs_v,v_th_min_v,v_th_max_v,v_gs_max_v,v_gs_min_v,v_gate_on_v,v_gate_off_v,"
                        + "q_g_nc,q_g_vgs_v,q_gs_nc,q_gd_nc,v_plateau_v,c_iss_pf,c_rss_pf,r_g_int_ohm\n");
                for (int i = 0; i < n; i++) {
                    int tech = i % 4;
                    double vBlock = tech == 0 ? 40 + (i / 4 % 8) * 20 : tech == 3 ? 650 : 650 + (i % 2) * 550;
                    double qg = 20 + i % 180;
                    w.write(String.format(Locale.ROOT,
                            "TST-%07d,Testmaker,PKG-%d,PIN-%d,%s,%d,%.2f,%s,%.0f,%d,%.1f,10,%.1f,%.1f,20,-20,10,0,"
                                    + "%.0f,10,%.0f,%.0f,4.5,%d,%d,%.1f\n",
                            i, i % 7, i % 7, i % 50 == 49 ? "obsolete" : "active", i % 5000, 0.5 + (i % 300) / 100.0,
                            TECH[tech], vBlock, 20 + i % 200, 1 + (i % 90) / 10.0, 1.8 + (i % 5) / 10.0,
                            3.6 + (i % 5) / 10.0, qg, qg * 0.3, qg * 0.2, 1000 + (int) qg * 60, 20 + i % 40,
                            0.5 + (i % 20) / 10.0));
                }
            }
            Path catalog = tmp.resolve("catalog");
            long t0 = System.nanoTime();
            int code = gatefit(catalog, new StringWriter(), "import", csv.toString());
            System.out.printf(Locale.ROOT, "import of %d switches: exit %d in %.1f s%n", n, code,
                    (System.nanoTime() - t0) / 1e9);

            String part = "TST-0000000";
            StringWriter first = new StringWriter();
            code = gatefit(catalog, first, "replace", part, "--format", "json");
            String out = first.toString();
            int listed = out.split("\"part_number\"", -1).length - 1;
            int considered = out.indexOf("\"considered\"");
            System.out.printf(Locale.ROOT, "replace %s: exit %d, %d listed, %s%n", part, code, listed,
                    considered < 0 ? "?" : out.substring(considered, out.indexOf(',', considered)).trim());
            for (int i = 0; i < WARMUP; i++) {
                gatefit(catalog, Writer.nullWriter(), "replace", part, "--format", "json");
            }
            long[] ns = new long[RUNS];
            for (int i = 0; i < RUNS; i++) {
                long s = System.nanoTime();
                gatefit(catalog, Writer.nullWriter(), "replace", part, "--format", "json");
                ns[i] = System.nanoTime() - s;
            }
            Arrays.sort(ns);
            System.out.printf(Locale.ROOT, "replace latency over %d switches: median %.1f ms (min %.1f, max %.1f; %d runs"
                    + " after %d warm-up; %d cores)%n", n, (ns[RUNS / 2 - 1] + ns[RUNS / 2]) / 2e6, ns[0] / 1e6,
                    ns[RUNS - 1] / 1e6, RUNS, WARMUP, Runtime.getRuntime().availableProcessors());
        } finally {
            delete(tmp);
        }
    }

    private static int gatefit(Path catalog, Writer out, String... args) {
        String[] all = new String[args.length + 2];
        all[0] = "--catalog";
        all[1] = catalog.toString();
        System.arraycopy(args, 0, all, 2, args.length);
        StringWriter err = new StringWriter();
        int code = Cli.create(new PrintWriter(out, true), new PrintWriter(err, true), Map.of(), Clock.systemUTC())
                .execute(all);
        if (code != 0) {
            System.err.print(err);
        }
        return code;
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
