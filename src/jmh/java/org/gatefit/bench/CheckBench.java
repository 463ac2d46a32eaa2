package org.gatefit.bench;

import java.nio.file.Path;
import java.util.concurrent.TimeUnit;
import org.gatefit.synth.BenchCatalogs;
import org.gatefit.synth.SyntheticCatalog;
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
import org.openjdk.jmh.annotations.Warmup;

/**
 * {@code check} throughput: {@code gatefit check SHEET --format json} in process (read the sheet,
 * open the catalog, look up both parts of every stage, run every rule, render JSON to a discarded
 * writer) over {@code stages} random pairs of a 10,000-switch, 10,000-driver catalog.
 * Stages/s = stages / the reported seconds.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(1)
public class CheckBench {
    private static final long PARTS = 10_000;

    @Param({"1000", "10000"})
    public long stages;

    private String catalog;
    private String sheet;

    @Setup(Level.Trial)
    public void data() throws Exception {
        catalog = BenchCatalogs.catalog(PARTS, PARTS).toString();
        Path p = BenchCatalogs.root().resolve("stages-" + stages + ".csv");
        SyntheticCatalog.writeStages(p, stages, PARTS, PARTS);
        sheet = p.toString();
    }

    @Benchmark
    public int check() {
        return Files2.gatefit("--catalog", catalog, "check", sheet, "--format", "json");
    }
}
