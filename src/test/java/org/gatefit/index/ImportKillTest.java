package org.gatefit.index;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeMap;
import java.util.TreeSet;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;
import org.apache.lucene.index.IndexWriter;
import org.apache.lucene.index.SegmentInfos;
import org.apache.lucene.store.Directory;
import org.apache.lucene.store.FSDirectory;
import org.gatefit.catalog.Kind;
import org.gatefit.catalog.Row;
import org.gatefit.synth.SyntheticCatalog;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Real process death (issue 14): a child JVM ({@link ImportChild}) imports into a catalog and is
 * killed with SIGKILL ({@link Process#destroyForcibly}) at each moment of the import, from row
 * parsing to after the commit. After the kill the catalog must be exactly the old one — every file
 * of its commit byte for byte as before — up to the commit point (the commit file's rename), and
 * the new one after it (the same parts and history as the same import run to completion in this
 * JVM; Lucene writes a random segment id and a time stamp into each new segment, so a second run
 * is never byte-identical). It must open and answer, and the next import must succeed and leave no
 * file of the killed one behind. Input: the synthetic catalog ({@code src/synth}).
 */
class ImportKillTest {
    @TempDir
    static Path shared;
    static Path oldCatalog;
    static Path newSwitches;
    /** Every file of the old catalog's commit, by name. */
    static Map<String, byte[]> oldFiles;
    static Snapshot oldState;
    static Snapshot newState;

    /** What a reader sees: every part and the history. */
    record Snapshot(long generation, List<Row> parts, List<ImportRecord> history) {
    }

    @BeforeAll
    static void catalogs() throws Exception {
        Path oldSwitches = shared.resolve("switches-300.csv");
        Path oldDrivers = shared.resolve("drivers-300.csv");
        SyntheticCatalog.writeSwitches(oldSwitches, 300);
        SyntheticCatalog.writeDrivers(oldDrivers, 300);
        newSwitches = shared.resolve("switches-800.csv");
        SyntheticCatalog.writeSwitches(newSwitches, 800);
        oldCatalog = shared.resolve("old");
        ImportChild.importInto(oldCatalog, List.of(oldSwitches, oldDrivers), null);
        oldFiles = commitFiles(oldCatalog);
        oldState = snapshot(oldCatalog);
        Path reference = shared.resolve("reference");
        copy(oldCatalog, reference);
        ImportChild.importInto(reference, List.of(newSwitches), null);
        newState = snapshot(reference);
        assertEquals(800, newState.parts().stream().filter(r -> r.kind() == Kind.SWITCH).count());
        assertTrue(newState.generation() > oldState.generation());
    }

    static Map<String, byte[]> commitFiles(Path dir) throws IOException {
        Map<String, byte[]> out = new TreeMap<>();
        try (Directory d = FSDirectory.open(dir)) {
            for (String f : SegmentInfos.readLatestCommit(d).files(true)) {
                out.put(f, Files.readAllBytes(dir.resolve(f)));
            }
        }
        return out;
    }

    static Snapshot snapshot(Path dir) throws Exception {
        try (Catalog c = Catalog.open(dir); Directory d = FSDirectory.open(dir)) {
            List<Row> parts = new ArrayList<>(PartSearch.find(c, null, List.of(), List.of(), null, Integer.MAX_VALUE));
            parts.sort(Comparator.comparing((Row r) -> r.kind()).thenComparing(Row::key));
            return new Snapshot(SegmentInfos.readLatestCommit(d).getGeneration(), parts, c.history());
        }
    }

    static void copy(Path from, Path to) throws IOException {
        Files.createDirectories(to);
        try (Stream<Path> s = Files.list(from)) {
            for (Path p : s.toList()) {
                Files.copy(p, to.resolve(p.getFileName()));
            }
        }
    }

    static List<String> moments() {
        return ImportChild.MOMENTS;
    }

    @ParameterizedTest
    @MethodSource("moments")
    void aKillAtAnyMomentLeavesTheOldCatalogOrTheNewOne(String moment, @TempDir Path tmp) throws Exception {
        Path dir = tmp.resolve("catalog");
        copy(oldCatalog, dir);
        killAt(moment, dir);

        Snapshot after = snapshot(dir); // opens and answers
        if (ImportChild.BEFORE_COMMIT.contains(moment)) {
            assertEquals(oldState, after, "the old catalog, as readers see it");
            Map<String, byte[]> files = commitFiles(dir);
            assertEquals(oldFiles.keySet(), files.keySet(), "the old commit is the latest");
            for (Map.Entry<String, byte[]> f : oldFiles.entrySet()) {
                assertArrayEquals(f.getValue(), files.get(f.getKey()), f.getKey() + " byte for byte as before");
            }
        } else {
            assertEquals(newState.parts(), after.parts(), "the new catalog's parts");
            assertEquals(newState.history(), after.history(), "the new catalog's history");
        }
        try (Catalog c = Catalog.open(dir)) {
            assertTrue(c.get(Kind.SWITCH, SyntheticCatalog.switchNumber(0)).isPresent());
            assertTrue(c.get(Kind.DRIVER, SyntheticCatalog.driverNumber(299)).isPresent());
        }

        // restart: the same import again succeeds and leaves nothing of the killed one behind
        ImportChild.importInto(dir, List.of(newSwitches), null);
        Snapshot again = snapshot(dir);
        assertEquals(newState.parts(), again.parts());
        Set<String> expected = new TreeSet<>(commitFiles(dir).keySet());
        expected.addAll(List.of(CatalogFolder.MARKER, CatalogFolder.LOCK, IndexWriter.WRITE_LOCK_NAME));
        try (Stream<Path> s = Files.list(dir)) {
            assertEquals(expected, new TreeSet<>(s.map(p -> p.getFileName().toString()).toList()),
                    "only the commit's files, the marker and the lock files");
        }
    }

    /** Runs {@link ImportChild} on {@code dir} and kills it (SIGKILL) when it reports the moment. */
    private static void killAt(String moment, Path dir) throws Exception {
        List<String> cmd = new ArrayList<>(List.of(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-XX:TieredStopAtLevel=1", "-XX:+UseSerialGC", "-Xshare:auto", "-cp", System.getProperty("java.class.path"), ImportChild.class.getName(),
                dir.toString(), moment, newSwitches.toString()));
        Process p = new ProcessBuilder(cmd).redirectErrorStream(true).start();
        try {
            CompletableFuture<String> reached = CompletableFuture.supplyAsync(() -> {
                StringBuilder all = new StringBuilder();
                try (BufferedReader r = new BufferedReader(new InputStreamReader(p.getInputStream(), StandardCharsets.UTF_8))) {
                    for (String line = r.readLine(); line != null; line = r.readLine()) {
                        all.append(line).append('\n');
                        if (line.equals("AT " + moment)) {
                            return null;
                        }
                    }
                } catch (IOException e) {
                    all.append(e);
                }
                return all.toString();
            });
            String failed = reached.get(120, TimeUnit.SECONDS);
            if (failed != null) {
                fail("the child never reached " + moment + ":\n" + failed);
            }
        } finally {
            p.destroyForcibly(); // SIGKILL on Unix: no shutdown hook, no finally block runs
            p.waitFor(60, TimeUnit.SECONDS);
        }
        assertTrue(!p.isAlive());
    }
}
