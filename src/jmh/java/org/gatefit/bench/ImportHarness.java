package org.gatefit.bench;

import com.sun.management.OperatingSystemMXBean;
import java.lang.management.GarbageCollectorMXBean;
import java.lang.management.ManagementFactory;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.util.List;
import org.gatefit.index.Importer;
import org.gatefit.synth.BenchCatalogs;

/**
 * Import throughput in one JVM, run after run, with what each run cost: wall time, rows/s, CPU
 * per row (every thread: parsing, indexing, the JIT, the collector) and time collecting garbage.
 * The first runs include the JIT's warm-up; later ones show the warm rate. For one core:
 * {@code taskset -c 0 java -cp target/benchmarks.jar org.gatefit.bench.ImportHarness 1000000 4}.
 *
 * <p>Arguments: rows (half switches, half drivers; default 1,000,000), runs (default 3).
 */
public final class ImportHarness {
    private ImportHarness() {
    }

    public static void main(String[] args) throws Exception {
        long rows = args.length > 0 ? Long.parseLong(args[0]) : 1_000_000;
        int runs = args.length > 1 ? Integer.parseInt(args[1]) : 3;
        Path switches = BenchCatalogs.switchesCsv(rows / 2);
        Path drivers = BenchCatalogs.driversCsv(rows - rows / 2);
        OperatingSystemMXBean os = (OperatingSystemMXBean) ManagementFactory.getOperatingSystemMXBean();
        System.out.printf("import of %,d rows, %d runs, %d processors, heap %,d MB%n", rows, runs,
                Runtime.getRuntime().availableProcessors(), Runtime.getRuntime().maxMemory() >> 20);
        for (int i = 1; i <= runs; i++) {
            Path target = Files.createTempDirectory(BenchCatalogs.root(), "harness-");
            long cpu0 = os.getProcessCpuTime();
            long gc0 = gcMillis();
            long t0 = System.nanoTime();
            Importer.Result r = new Importer(target, Clock.systemUTC()).run(List.of(switches, drivers),
                    List.of(switches.toString(), drivers.toString()), new Importer.Options(null, false, null), n -> { });
            double s = (System.nanoTime() - t0) / 1e9;
            double cpuUs = (os.getProcessCpuTime() - cpu0) / 1e3 / r.written();
            System.out.printf("run %d: %,d rows in %.2f s, %,.0f rows/s, %.1f µs CPU a row, %,d ms collecting garbage%n",
                    i, r.written(), s, r.written() / s, cpuUs, gcMillis() - gc0);
            Files2.delete(target);
        }
    }

    private static long gcMillis() {
        long t = 0;
        for (GarbageCollectorMXBean g : ManagementFactory.getGarbageCollectorMXBeans()) {
            t += Math.max(0, g.getCollectionTime());
        }
        return t;
    }
}
