package org.gatefit.cli;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.gatefit.catalog.Kind;
import org.gatefit.catalog.RowCursor;
import org.gatefit.index.Catalog;
import org.gatefit.index.CatalogParts;
import org.gatefit.match.DriverPart;
import org.gatefit.match.Margins;
import org.gatefit.match.OperatingPoint;
import org.gatefit.match.Question;
import org.gatefit.match.Rules;
import org.gatefit.match.Shortlist;
import org.gatefit.match.SwitchPart;
import org.gatefit.synth.BenchCatalogs;
import org.gatefit.synth.SyntheticCatalog;

/**
 * The ranking loop alone, on one thread: {@link Rules.Ranking#rank} over the drivers that
 * {@code ShortlistBench}'s question leaves after the prefilter, in scan order, run after run, with
 * nanoseconds per driver. Steadier than a full benchmark for trying a change to the rules' hot
 * path (no scan, no threads, no Lucene). Built only by the bench profile.
 *
 * <p>{@code java -cp target/benchmarks.jar org.gatefit.cli.RankHarness [drivers, default 1,000,000] [runs, default 200]}
 */
public final class RankHarness {
    private RankHarness() {
    }

    public static void main(String[] args) throws Exception {
        long drivers = args.length > 0 ? Long.parseLong(args[0]) : 1_000_000;
        int runs = args.length > 1 ? Integer.parseInt(args[1]) : 200;
        Path dir = BenchCatalogs.catalog(100, drivers);
        try (Catalog c = Catalog.open(dir).keepColumns(true)) {
            OperatingPoint.Spec spec = org.gatefit.bench.ShortlistBench.question();
            SwitchPart sw = SwitchPart.of(c.get(Kind.SWITCH, SyntheticCatalog.switchNumber(0)).orElseThrow());
            Question p = Question.of(sw, spec.copy().resolve(sw), Margins.DEFAULT);
            List<DriverPart> left = new ArrayList<>();
            new CatalogParts(c).scanColumns(Kind.DRIVER, Shortlist.prefilter(p), 1,
                    () -> (java.util.function.Consumer<RowCursor>) r -> left.add(DriverPart.of(r)));
            DriverPart[] ds = left.toArray(new DriverPart[0]);
            Rules.Ranking ranking = new Rules.Ranking(p, false);
            double[] ns = new double[runs];
            double[] cpu = new double[runs];
            java.lang.management.ThreadMXBean threads = java.lang.management.ManagementFactory.getThreadMXBean();
            long verdicts = 0;
            for (int i = 0; i < runs; i++) {
                long c0 = threads.getCurrentThreadCpuTime();
                long t0 = System.nanoTime();
                for (DriverPart d : ds) {
                    ranking.rank(d);
                    verdicts += ranking.verdict().ordinal();
                }
                ns[i] = (System.nanoTime() - t0) / (double) ds.length;
                cpu[i] = (threads.getCurrentThreadCpuTime() - c0) / (double) ds.length;
            }
            Arrays.sort(ns);
            Arrays.sort(cpu);
            // The thread's CPU time leaves out the time other processes held the core, so on a shared
            // machine it is the steadier figure (cache sharing still shows in it).
            System.out.printf("%,d of %,d drivers left by the prefilter; rank: median %.1f ns a driver, fastest run %.1f,"
                    + " slowest %.1f; CPU time median %.1f ns a driver, least %.1f (verdict sum %d)%n", ds.length, drivers,
                    ns[runs / 2], ns[0], ns[runs - 1], cpu[runs / 2], cpu[0], verdicts);
        }
    }
}
