package org.gatefit.synth;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.util.ArrayList;
import java.util.List;
import org.gatefit.index.Fields;
import org.gatefit.index.Importer;

/**
 * Synthetic catalogs imported once and kept under a folder (by default {@code target/bench-data},
 * or the system property {@code gatefit.bench.data}), so benchmark forks and repeated runs do not
 * re-import a million rows. A catalog is rebuilt when its folder lacks the {@code complete} marker
 * or the marker names another index format ({@link Fields#FORMAT}).
 */
public final class BenchCatalogs {
    private BenchCatalogs() {
    }

    /** Where cached catalogs and CSVs live. */
    public static Path root() {
        return Path.of(System.getProperty("gatefit.bench.data", "target/bench-data")).toAbsolutePath();
    }

    /** The CSV of {@code n} switches, written if missing. */
    public static Path switchesCsv(long n) throws IOException {
        Path p = root().resolve("switches-" + n + ".csv");
        if (!Files.exists(p)) {
            Files.createDirectories(p.getParent());
            Path tmp = Files.createTempFile(p.getParent(), "switches", ".tmp");
            SyntheticCatalog.writeSwitches(tmp, n);
            Files.move(tmp, p, java.nio.file.StandardCopyOption.ATOMIC_MOVE);
        }
        return p;
    }

    /** The CSV of {@code n} drivers, written if missing. */
    public static Path driversCsv(long n) throws IOException {
        Path p = root().resolve("drivers-" + n + ".csv");
        if (!Files.exists(p)) {
            Files.createDirectories(p.getParent());
            Path tmp = Files.createTempFile(p.getParent(), "drivers", ".tmp");
            SyntheticCatalog.writeDrivers(tmp, n);
            Files.move(tmp, p, java.nio.file.StandardCopyOption.ATOMIC_MOVE);
        }
        return p;
    }

    /** A catalog of {@code switches} switches and {@code drivers} drivers, imported if missing. */
    public static Path catalog(long switches, long drivers) throws Exception {
        Path dir = root().resolve("catalog-s" + switches + "-d" + drivers);
        Path marker = dir.resolve("complete");
        if (Files.exists(marker) && Files.readString(marker).equals(Fields.FORMAT)) {
            return dir;
        }
        if (Files.exists(dir)) { // unfinished, or written in another index format: start again
            try (java.util.stream.Stream<Path> s = Files.walk(dir)) {
                for (Path p : s.sorted(java.util.Comparator.reverseOrder()).toList()) {
                    Files.delete(p);
                }
            }
        }
        List<Path> files = new ArrayList<>();
        if (switches > 0) {
            files.add(switchesCsv(switches));
        }
        if (drivers > 0) {
            files.add(driversCsv(drivers));
        }
        List<String> names = files.stream().map(Path::toString).toList();
        new Importer(dir, Clock.systemUTC()).run(files, names, new Importer.Options(null, true, null), x -> { });
        Files.writeString(marker, Fields.FORMAT);
        return dir;
    }
}
