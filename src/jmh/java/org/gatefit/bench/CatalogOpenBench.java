package org.gatefit.bench;

import java.nio.file.Path;
import java.util.concurrent.TimeUnit;
import org.gatefit.catalog.Kind;
import org.gatefit.index.Catalog;
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
import org.openjdk.jmh.annotations.Warmup;

/** Catalog open time: {@link Catalog#open}, count the drivers, close (warm JVM, files in the page cache). */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(1)
public class CatalogOpenBench {
    @Param({"10000", "1000000"})
    public long drivers;

    private Path dir;

    @Setup(Level.Trial)
    public void catalog() throws Exception {
        dir = BenchCatalogs.catalog(100, drivers);
    }

    @Benchmark
    public int openCountClose() throws Exception {
        try (Catalog c = Catalog.open(dir)) {
            return c.count(Kind.DRIVER);
        }
    }
}
