package org.gatefit.bench;

import java.io.BufferedWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.FileVisitResult;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.SimpleFileVisitor;
import java.nio.file.attribute.BasicFileAttributes;
import java.time.Clock;
import java.util.List;
import java.util.Locale;
import org.gatefit.index.Importer;

/**
 * Import throughput, for a person to read: not a test, no assertion, never run by the build.
 * Generates N synthetic switch rows (invented parts "TST-…" from maker "Testmaker") into a temporary
 * CSV, times {@link Importer#run} into a temporary catalog, and prints rows per second.
 *
 * <pre>
 * mvn -q -B test-compile dependency:build-classpath -Dmdep.outputFile=cp.txt
 * java -cp target/classes:target/test-classes:$(cat cp.txt) org.gatefit.bench.ImportThroughput [N]
 * </pre>
 */
public final class ImportThroughput {
    private static final String[] TECH = {"si-mosfet", "sic-mosfet", "gan-hemt", "igbt"};

    private ImportThroughput() {
    }

    public static void main(String[] args) throws Exception {
        int n = args.length > 0 ? Integer.parseInt(args[0]) : 200_000;
        Path tmp = Files.createTempDirectory("gatefit-bench");
        try {
            Path csv = tmp.resolve("switches.csv");
            try (BufferedWriter w = Files.newBufferedWriter(csv, StandardCharsets.UTF_8)) {
                w.write("part_number,maker,package,lifecycle,stock,unit_price,description,technology,v_block_v,"
                        + "i_cont_a,r_on_mohm,r_on_vgs_v,v_th_min_v,v_th_max_v,v_gs_max_v,v_gs_min_v,q_g_nc,"
                        + "q_gd_nc,c_iss_pf,r_g_int_ohm\n");
                for (int i = 0; i < n; i++) {
                    w.write(String.format(Locale.ROOT,
                            "TST-%07d,Testmaker,PKG-%d,active,%d,%.2f,\"synthetic switch %d, bench row\",%s,%d,%d,"
                                    + "%.1f,10,2,4,20,-20,%d nC,%d,%d,1R%d\n",
                            i, i % 17, i % 5000, 0.5 + (i % 300) / 100.0, i, TECH[i % 4], 40 + (i % 12) * 100,
                            5 + i % 200, 1 + (i % 900) / 10.0, 10 + i % 190, 2 + i % 60, 500 + i % 9000, i % 10));
                }
            }
            long bytes = Files.size(csv);
            Path catalog = tmp.resolve("catalog");
            long t0 = System.nanoTime();
            Importer.Result r = new Importer(catalog, Clock.systemUTC()).run(List.of(csv), List.of(csv.toString()),
                    new Importer.Options(null, false, null), x -> { });
            double s = (System.nanoTime() - t0) / 1e9;
            System.out.printf(Locale.ROOT, "imported %d rows (%.1f MB CSV) in %.2f s: %.0f rows/s (%d cores)%n",
                    r.written(), bytes / 1e6, s, r.written() / s, Runtime.getRuntime().availableProcessors());
        } finally {
            delete(tmp);
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
