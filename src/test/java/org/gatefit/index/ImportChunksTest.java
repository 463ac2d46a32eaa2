package org.gatefit.index;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.gatefit.catalog.Kind;
import org.gatefit.catalog.Row;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The chunked write path keeps the import contract of DESIGN.md whatever the chunk size and the
 * number of writing threads: the later row of a part number wins (within a file set and across
 * imports), {@code --replace} swaps a kind, and a failure anywhere leaves the previous catalog as
 * it was. Chunks of a few rows make every case happen: a replaced row still in an open chunk,
 * in a chunk already written, or committed by an earlier import.
 */
class ImportChunksTest {
    private static final String HEADER = "part_number,maker,topology,input_polarity,i_source_a,i_sink_a,"
            + "v_supply_min_v,v_supply_max_v\n";
    private static final Importer.Options UPSERT = new Importer.Options(null, false, null);
    private static final Importer.Options REPLACE = new Importer.Options(null, true, null);

    @TempDir
    Path tmp;

    /** Drivers {@code from} .. {@code to - 1}, each with source current {@code amps}. */
    private Path drivers(String name, int from, int to, double amps) throws IOException {
        StringBuilder sb = new StringBuilder(HEADER);
        for (int i = from; i < to; i++) {
            sb.append("TST-D").append(i).append(",Testmaker,low-side,non-inverting,").append(amps).append(",3,10,20\n");
        }
        return Files.writeString(tmp.resolve(name), sb.toString());
    }

    private static void run(Path dir, int threads, int chunk, Importer.Options o, Importer.Listener l, Path... files)
            throws Exception {
        List<Path> fs = List.of(files);
        new Importer(dir, Clock.systemUTC(), threads, chunk).run(fs, fs.stream().map(Path::toString).toList(), o, l);
    }

    /** Part number → source current, for every driver in the catalog. */
    private static Map<String, Double> amps(Path dir) throws IOException {
        Map<String, Double> m = new TreeMap<>();
        try (Catalog c = Catalog.open(dir)) {
            c.scan(Kind.DRIVER, null, r -> m.put(r.key(), (Double) r.values().get("i_source_a")));
            assertEquals(m.size(), c.count(Kind.DRIVER), "count agrees with the parts seen");
        }
        return m;
    }

    private static Map<String, Double> expect(int from, int to, double amps, Map<String, Double> onto) {
        Map<String, Double> m = new TreeMap<>(onto);
        for (int i = from; i < to; i++) {
            m.put("TST-D" + i, amps);
        }
        return m;
    }

    @ParameterizedTest(name = "{0} thread(s), {1} rows a chunk")
    @CsvSource({"1, 7", "2, 7", "3, 16", "2, 64", "2, 100000"})
    void theLaterFileOfOneImportWins(int threads, int chunk) throws Exception {
        Path dir = tmp.resolve("c");
        // a (0..49) then b (30..79, other values): 30..49 replaced within the import, some in
        // chunks already written, some still open; then c replaces 0..9 in the same import
        Path a = drivers("a.csv", 0, 50, 1);
        Path b = drivers("b.csv", 30, 80, 2);
        Path c = drivers("c.csv", 0, 10, 3);
        run(dir, threads, chunk, UPSERT, n -> { }, a, b, c);
        Map<String, Double> want = expect(0, 50, 1, Map.of());
        want = expect(30, 80, 2, want);
        want = expect(0, 10, 3, want);
        assertEquals(want, amps(dir));
    }

    @ParameterizedTest(name = "{0} thread(s), {1} rows a chunk")
    @CsvSource({"1, 5", "2, 5", "2, 1000"})
    void aLaterImportReplacesCommittedPartsAndKeepsTheRest(int threads, int chunk) throws Exception {
        Path dir = tmp.resolve("c");
        run(dir, threads, chunk, UPSERT, n -> { }, drivers("a.csv", 0, 40, 1));
        run(dir, threads, chunk, UPSERT, n -> { }, drivers("b.csv", 20, 60, 2));
        assertEquals(expect(20, 60, 2, expect(0, 40, 1, Map.of())), amps(dir));
        run(dir, threads, chunk, REPLACE, n -> { }, drivers("c.csv", 50, 55, 3), drivers("d.csv", 54, 58, 4));
        assertEquals(expect(54, 58, 4, expect(50, 55, 3, Map.of())), amps(dir), "replace keeps only this import's parts");
    }

    @ParameterizedTest(name = "failing after {0} rows")
    @CsvSource({"1", "9", "33", "79"})
    void aFailureAfterSomeChunksWereWrittenLeavesThePreviousCatalog(long failAt) throws Exception {
        Path dir = tmp.resolve("c");
        run(dir, 2, 8, UPSERT, n -> { }, drivers("a.csv", 0, 30, 1));
        Map<String, Double> before = amps(dir);
        Path b = drivers("b.csv", 10, 90, 2);
        IOException e = assertThrows(IOException.class, () -> run(dir, 2, 8, UPSERT, n -> {
            if (n == failAt) {
                throw new IOException("injected failure at row " + n);
            }
        }, b));
        assertTrue(e.getMessage().contains("injected"), e.getMessage());
        assertEquals(before, amps(dir));
        run(dir, 2, 8, UPSERT, n -> { }, b); // and the catalog still takes the import afterwards
        assertEquals(expect(10, 90, 2, before), amps(dir));
    }

    @ParameterizedTest(name = "{0} rows a chunk")
    @CsvSource({"3", "50", "5000"})
    void partsReadBackAsTheFileReadThem(int chunk) throws Exception {
        Path dir = tmp.resolve("c");
        Path a = drivers("a.csv", 0, 120, 1.5);
        run(dir, 2, chunk, UPSERT, n -> { }, a);
        List<Row> read = new ArrayList<>();
        org.gatefit.catalog.SheetReader.read(a, a.toString(), null, read::add);
        try (Catalog c = Catalog.open(dir)) {
            for (Row r : read) {
                assertEquals(r, c.get(Kind.DRIVER, r.key()).orElseThrow());
            }
            List<String> order = new ArrayList<>();
            c.scan(Kind.DRIVER, null, r -> order.add(r.key()));
            // segments written at once land in the order they finish: outputs sort by part number
            assertEquals(read.stream().map(Row::key).sorted().toList(), order.stream().sorted().toList());
        }
    }
}
