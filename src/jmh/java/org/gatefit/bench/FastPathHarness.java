package org.gatefit.bench;

import com.sun.management.OperatingSystemMXBean;
import java.lang.management.ManagementFactory;
import java.lang.management.ThreadMXBean;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.util.List;
import org.gatefit.catalog.FastPath;
import org.gatefit.catalog.SheetReader;
import org.gatefit.index.Importer;
import org.gatefit.synth.BenchCatalogs;

/**
 * Each fast path against its shipped reference in one JVM, runs alternating (fast, reference, fast,
 * …) so both see the same machine load: reading the CSV files alone (the sheet reader over
 * {@code CsvLexer} or Commons CSV; one thread, so its CPU time is the figure least disturbed by other
 * work on the machine) and the whole import (CSV reading and index writing, every thread: wall time
 * and the process's CPU time). (The JSON reader's fast path was deleted on 3 December 2026; its
 * figures are in docs/PERFORMANCE.md.)
 *
 * <p>Arguments: rows (half switches, half drivers; default 100,000), rounds (default 6; the first
 * two are warm-up and not summarised). {@code java -cp target/benchmarks.jar org.gatefit.bench.FastPathHarness}
 */
public final class FastPathHarness {
    private FastPathHarness() {
    }

    public static void main(String[] args) throws Exception {
        long rows = args.length > 0 ? Long.parseLong(args[0]) : 100_000;
        int rounds = args.length > 1 ? Integer.parseInt(args[1]) : 6;
        Path switches = BenchCatalogs.switchesCsv(rows / 2);
        Path drivers = BenchCatalogs.driversCsv(rows - rows / 2);
        System.out.printf("%,d rows, %d rounds, %d processors, heap %,d MB, Java %s%n", rows, rounds,
                Runtime.getRuntime().availableProcessors(), Runtime.getRuntime().maxMemory() >> 20,
                System.getProperty("java.version"));
        double[][] csv = new double[2][rounds];
        double[][] importWall = new double[2][rounds];
        double[][] importCpu = new double[2][rounds];
        for (int r = 0; r < rounds; r++) {
            for (int ref = 0; ref < 2; ref++) {
                String path = ref == 1 ? "reference" : "fast     ";
                select(ref == 1 ? "csv" : null);
                csv[ref][r] = readCsv(switches, drivers, rows);
                select(ref == 1 ? "import" : null);
                double[] imp = importRows(switches, drivers, rows);
                importWall[ref][r] = imp[0];
                importCpu[ref][r] = imp[1];
                System.out.printf("round %d %s: CSV read %.0f ns CPU a row; import %.2f s wall, %.1f µs CPU a row%n",
                        r + 1, path, csv[ref][r], imp[0], imp[1]);
            }
        }
        select(null);
        System.out.println("median of rounds 3.." + rounds + " (fast / reference):");
        System.out.printf("  CSV read, ns CPU a row:   %.0f / %.0f (reference %.2f×)%n", median(csv[0]), median(csv[1]),
                median(csv[1]) / median(csv[0]));
        System.out.printf("  import, s wall:           %.2f / %.2f (reference %.2f×)%n", median(importWall[0]),
                median(importWall[1]), median(importWall[1]) / median(importWall[0]));
        System.out.printf("  import, µs CPU a row:     %.1f / %.1f (reference %.2f×)%n", median(importCpu[0]),
                median(importCpu[1]), median(importCpu[1]) / median(importCpu[0]));
    }

    private static void select(String seams) {
        if (seams == null) {
            System.clearProperty(FastPath.PROPERTY);
        } else {
            System.setProperty(FastPath.PROPERTY, seams);
        }
    }

    /** Both files through the sheet reader (rows counted, nothing kept): thread CPU ns a row. */
    private static double readCsv(Path switches, Path drivers, long rows) throws Exception {
        ThreadMXBean t = ManagementFactory.getThreadMXBean();
        long[] n = {0};
        long c0 = t.getCurrentThreadCpuTime();
        for (Path p : List.of(switches, drivers)) {
            SheetReader.read(p, p.toString(), null, row -> n[0]++);
        }
        long cpu = t.getCurrentThreadCpuTime() - c0;
        if (n[0] != rows) {
            throw new IllegalStateException("expected " + rows + " rows, got " + n[0]);
        }
        return (double) cpu / rows;
    }

    /** One import into an empty catalog: wall seconds and process CPU µs a row. */
    private static double[] importRows(Path switches, Path drivers, long rows) throws Exception {
        OperatingSystemMXBean os = (OperatingSystemMXBean) ManagementFactory.getOperatingSystemMXBean();
        Path target = Files.createTempDirectory(BenchCatalogs.root(), "fastpath-");
        long cpu0 = os.getProcessCpuTime();
        long t0 = System.nanoTime();
        Importer.Result r = new Importer(target, Clock.systemUTC()).run(List.of(switches, drivers),
                List.of(switches.toString(), drivers.toString()), new Importer.Options(null, false, null), x -> { });
        double s = (System.nanoTime() - t0) / 1e9;
        double cpu = (os.getProcessCpuTime() - cpu0) / 1e3 / rows;
        Files2.delete(target);
        if (r.written() != rows) {
            throw new IllegalStateException("expected " + rows + " rows written, got " + r.written());
        }
        return new double[] {s, cpu};
    }

    private static double median(double[] all) {
        double[] v = java.util.Arrays.copyOfRange(all, Math.min(2, all.length - 1), all.length);
        java.util.Arrays.sort(v);
        return v.length % 2 == 1 ? v[v.length / 2] : (v[v.length / 2 - 1] + v[v.length / 2]) / 2;
    }
}
