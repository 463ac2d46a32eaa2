package org.gatefit.index;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.function.Consumer;
import org.gatefit.catalog.Kind;
import org.gatefit.catalog.Row;
import org.gatefit.catalog.RowCursor;
import org.gatefit.catalog.Schema;
import org.gatefit.synth.SyntheticCatalog;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Column scans: split across threads they see every live part exactly once, in document order
 * per partition; parts replaced by a later import are not seen twice; a cursor reads the same
 * values as the row built from stored fields.
 */
class CatalogScanTest {
    private static final int DRIVERS = 3_000;

    @TempDir
    static Path tmp;
    static Path dir;

    @BeforeAll
    static void importTwice() throws Exception {
        dir = tmp.resolve("catalog");
        Path all = tmp.resolve("drivers.csv");
        Path again = tmp.resolve("again.csv");
        SyntheticCatalog.writeDrivers(all, DRIVERS);
        SyntheticCatalog.writeDrivers(again, 700); // the first 700 again: upserts leave deleted documents behind
        for (Path f : List.of(all, again)) {
            new Importer(dir, Clock.systemUTC()).run(List.of(f), List.of(f.toString()),
                    new Importer.Options(null, false, null), n -> { });
        }
    }

    /** Collects the part numbers a partition sees. */
    static final class Names implements Consumer<RowCursor> {
        final List<String> seen = new ArrayList<>();
        private final int key = Schema.of(Kind.DRIVER).position("part_number");

        @Override
        public void accept(RowCursor r) {
            seen.add(r.text(key));
        }
    }

    @Test
    void partitionsTogetherSeeEveryLivePartOnceInOrder() throws Exception {
        try (Catalog c = Catalog.open(dir)) {
            assertEquals(DRIVERS, c.count(Kind.DRIVER));
            assertTrue(c.searcher().getIndexReader().numDeletedDocs() > 0, "the second import left deleted documents");
            List<Names> one = c.scanColumns(Kind.DRIVER, null, 1, Names::new);
            assertEquals(1, one.size());
            assertEquals(DRIVERS, one.get(0).seen.size(), "upserted parts are seen once, not twice");
            assertEquals(DRIVERS, new HashSet<>(one.get(0).seen).size());
            for (int threads : new int[] {2, 3, 7}) {
                List<Names> parts = c.scanColumns(Kind.DRIVER, null, threads, 100, Names::new);
                assertEquals(threads, parts.size(), "a 3,000-part catalog splits into " + threads + " partitions of ≥ 100");
                List<String> joined = new ArrayList<>();
                for (Names n : parts) {
                    assertTrue(!n.seen.isEmpty(), "no partition is empty");
                    joined.addAll(n.seen);
                }
                assertEquals(one.get(0).seen, joined, threads + " partitions, concatenated, are the one-thread scan");
            }
            List<Names> big = c.scanColumns(Kind.DRIVER, null, 8, 10_000, Names::new);
            assertEquals(1, big.size(), "fewer documents than the minimum partition: one partition");
        }
    }

    /** Every column of every part as a cursor reads it. */
    static final class Everything implements Consumer<RowCursor> {
        final List<String> seen = new ArrayList<>();

        @Override
        public void accept(RowCursor r) {
            StringBuilder b = new StringBuilder();
            var cols = Schema.of(Kind.DRIVER).columns();
            for (int i = 0; i < cols.size(); i++) {
                switch (cols.get(i).type()) {
                    case NUMBER, INTEGER -> b.append(Double.doubleToRawLongBits(r.number(i)));
                    case TEXT, CHOICE -> b.append(r.text(i));
                }
                b.append('|');
            }
            seen.add(b.toString());
        }
    }

    /** Collects the object each row's memo gives. */
    static final class Memo implements Consumer<RowCursor> {
        final List<Object> seen = new ArrayList<>();
        private final int key = Schema.of(Kind.DRIVER).position("part_number");

        @Override
        public void accept(RowCursor r) {
            seen.add(r.memo(StringBuilder.class, x -> new StringBuilder(x.text(key))));
        }
    }

    @Test
    void keptColumnsReadTheSameAsDocValues() throws Exception {
        try (Catalog direct = Catalog.open(dir); Catalog kept = Catalog.open(dir).keepColumns(true)) {
            List<String> a = direct.scanColumns(Kind.DRIVER, null, 1, Everything::new).get(0).seen;
            for (int round = 0; round < 2; round++) { // the first round decodes, the second reads the kept arrays
                List<String> b = new ArrayList<>();
                kept.scanColumns(Kind.DRIVER, null, 3, 100, Everything::new).forEach(e -> b.addAll(e.seen));
                assertEquals(a, b);
            }
            assertTrue(a.get(0).contains("TST-D"), a.get(0));
            // Objects built from rows are kept with the columns: the second scan gets the very same ones.
            List<Object> first = new ArrayList<>();
            List<Object> second = new ArrayList<>();
            for (List<Object> into : List.of(first, second)) {
                kept.scanColumns(Kind.DRIVER, null, 3, 100, Memo::new).forEach(m -> into.addAll(m.seen));
            }
            assertEquals(DRIVERS, first.size());
            for (int i = 0; i < first.size(); i++) {
                assertTrue(first.get(i) == second.get(i), "kept object " + i);
            }
            List<Object> fresh = direct.scanColumns(Kind.DRIVER, null, 1, Memo::new).get(0).seen;
            assertTrue(fresh.get(0) != first.get(0) && fresh.get(0).toString().equals(first.get(0).toString()),
                    "without kept columns every scan builds anew");
        }
    }

    @Test
    void aCursorReadsWhatTheStoredRowHolds() throws Exception {
        try (Catalog c = Catalog.open(dir)) {
            List<Row> scanned = new ArrayList<>();
            long n = c.scan(Kind.DRIVER, null, scanned::add);
            assertEquals(DRIVERS, n);
            for (Row r : scanned.subList(0, 400)) {
                Row stored = c.get(Kind.DRIVER, r.key()).orElseThrow();
                // The scan leaves out words-only text (description), extras and the source line.
                for (var e : stored.values().entrySet()) {
                    boolean wordsOnly = Schema.of(Kind.DRIVER).column(e.getKey()).orElseThrow().wordsOnly();
                    if (!wordsOnly) {
                        assertEquals(e.getValue(), r.values().get(e.getKey()), r.key() + " " + e.getKey());
                    }
                }
                assertEquals(stored.values().size(), r.values().size()
                        + (stored.values().containsKey("description") ? 1 : 0), r.key());
            }
        }
    }

    @Test
    void aFilterAndDeletedDocumentsTogether() throws Exception {
        try (Catalog c = Catalog.open(dir)) {
            var filter = PartSearch.filter(Kind.DRIVER, List.of(PartSearch.Condition.parse("topology = isolated")));
            List<Row> rows = new ArrayList<>();
            c.scan(Kind.DRIVER, filter, rows::add);
            int expected = c.search(filter, null, DRIVERS * 2).size();
            assertEquals(expected, rows.size());
            assertTrue(rows.stream().allMatch(r -> r.text("topology").equals("isolated")));
            List<Names> parts = c.scanColumns(Kind.DRIVER, filter, 2, 50, Names::new);
            assertEquals(expected, parts.stream().mapToInt(p -> p.seen.size()).sum());
        }
        assertTrue(Files.isDirectory(dir));
    }
}
