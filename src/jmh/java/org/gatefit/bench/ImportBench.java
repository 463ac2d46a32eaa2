package org.gatefit.bench;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.gatefit.index.Importer;
import org.gatefit.synth.BenchCatalogs;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.TearDown;
import org.openjdk.jmh.annotations.Warmup;

/**
 * Import throughput: one {@link Importer#run} of {@code rows} synthetic rows (half switches, half
 * drivers, two CSV files) into an empty catalog, all-or-nothing mode, one commit. Single shot per
 * iteration; rows/s = rows / the reported seconds. The CSVs are generated once and cached.
 * {@code -p rows=1000000} for a million rows (6–15 s per iteration on 2 cores). Ten warm-ups: the JIT
 * settles after about eight imports of 100,000 rows. Forked with the collector {@code bin/gatefit} uses.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.SingleShotTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 10)
@Measurement(iterations = 3)
@Fork(value = 1, jvmArgsAppend = {"-XX:+UseParallelGC"}) // the collector bin/gatefit runs with
public class ImportBench {
    @Param({"10000", "100000"})
    public long rows;

    private Path switches;
    private Path drivers;
    private Path target;

    @Setup(Level.Trial)
    public void csv() throws Exception {
        switches = BenchCatalogs.switchesCsv(rows / 2);
        drivers = BenchCatalogs.driversCsv(rows - rows / 2);
    }

    @Setup(Level.Iteration)
    public void emptyCatalog() throws Exception {
        target = Files.createTempDirectory(BenchCatalogs.root(), "import-");
    }

    @TearDown(Level.Iteration)
    public void dropCatalog() throws Exception {
        Files2.delete(target);
    }

    @Benchmark
    public long importRows() throws Exception {
        Importer.Result r = new Importer(target, Clock.systemUTC()).run(List.of(switches, drivers),
                List.of(switches.toString(), drivers.toString()), new Importer.Options(null, false, null), x -> { });
        if (r.written() != rows) {
            throw new IllegalStateException("expected " + rows + " rows written, got " + r.written());
        }
        return r.written();
    }
}
