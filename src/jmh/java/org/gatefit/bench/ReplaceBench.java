package org.gatefit.bench;

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
 * {@code replace} latency: {@code gatefit replace TST-S0000000 --format json} in process (open,
 * look up, prefilter, scan, grade, render) over a catalog of {@code switches} synthetic switches.
 * The part is a 30–200 V Si MOSFET, so the prefilter keeps Si MOSFETs of at least its rating.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 3, time = 2)
@Measurement(iterations = 5, time = 2)
@Fork(1)
public class ReplaceBench {
    @Param({"1000000"})
    public long switches;

    private String catalog;

    @Setup(Level.Trial)
    public void data() throws Exception {
        catalog = BenchCatalogs.catalog(switches, 0).toString();
    }

    @Benchmark
    public int replace() {
        return Files2.gatefit("--catalog", catalog, "replace", SyntheticCatalog.switchNumber(0), "--format", "json");
    }
}
