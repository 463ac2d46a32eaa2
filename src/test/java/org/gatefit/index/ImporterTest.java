package org.gatefit.index;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.time.Clock;
import java.time.Instant;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;
import org.apache.lucene.analysis.standard.StandardAnalyzer;
import org.apache.lucene.index.IndexWriter;
import org.apache.lucene.index.IndexWriterConfig;
import org.apache.lucene.index.SegmentInfos;
import org.apache.lucene.store.Directory;
import org.apache.lucene.store.FSDirectory;
import org.gatefit.catalog.CatalogDataException;
import org.gatefit.catalog.Kind;
import org.gatefit.catalog.Row;
import org.gatefit.catalog.SheetReader;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The write side's contract (STYLE.md, Lucene): one commit per import, nothing visible before it,
 * rollback on any failure, one writer at a time (Lucene's write lock), upsert by part number.
 * Invented parts "TST-…" from maker "Testmaker"; their figures are input only.
 */
class ImporterTest {
    /** Starts at a fixed instant and moves one second per reading, so history order is by time. */
    private static final class TickingClock extends Clock {
        private final java.util.concurrent.atomic.AtomicLong millis =
                new java.util.concurrent.atomic.AtomicLong(Instant.parse("2030-01-02T03:04:05Z").toEpochMilli());

        @Override
        public java.time.ZoneId getZone() {
            return ZoneOffset.UTC;
        }

        @Override
        public Clock withZone(java.time.ZoneId zone) {
            throw new UnsupportedOperationException();
        }

        @Override
        public Instant instant() {
            return Instant.ofEpochMilli(millis.getAndAdd(1000));
        }
    }

    private final Clock clock = new TickingClock();
    private static final String SWITCH_HEADER = "part_number,maker,technology,v_block_v,v_gs_max_v,v_gs_min_v,q_g_nc\n";
    private static final String DRIVER_HEADER = "part_number,maker,topology,input_polarity,i_source_a,i_sink_a,"
            + "v_supply_min_v,v_supply_max_v\n";
    private static final Importer.Options UPSERT = new Importer.Options(null, false, null);
    private static final Importer.Options REPLACE = new Importer.Options(null, true, null);

    @TempDir
    Path tmp;
    Path dir;

    @BeforeEach
    void setUp() {
        dir = tmp.resolve("catalog");
    }

    private Path switches(String name, int from, int to, double qg) throws IOException {
        StringBuilder sb = new StringBuilder(SWITCH_HEADER);
        for (int i = from; i < to; i++) {
            sb.append("TST-").append(i).append(",Testmaker,si-mosfet,100,20,-20,").append(qg).append('\n');
        }
        return Files.writeString(tmp.resolve(name), sb.toString());
    }

    private Path drivers(String name, int n) throws IOException {
        StringBuilder sb = new StringBuilder(DRIVER_HEADER);
        for (int i = 0; i < n; i++) {
            sb.append("TST-D").append(i).append(",Testmaker,low-side,non-inverting,2,3,10,20\n");
        }
        return Files.writeString(tmp.resolve(name), sb.toString());
    }

    private Importer.Result run(Importer.Options o, Importer.Listener l, Path... files) throws Exception {
        List<Path> fs = List.of(files);
        return new Importer(dir, clock).run(fs, fs.stream().map(Path::toString).toList(), o, l);
    }

    private static Importer.Listener quiet() {
        return n -> { };
    }

    /** Everything a reader can see: every part, the history and the commit generation. */
    private record Snapshot(List<Row> parts, List<ImportRecord> history, long generation) {
    }

    private Snapshot snapshot() throws Exception {
        try (Catalog c = Catalog.open(dir); Directory d = FSDirectory.open(dir)) {
            return new Snapshot(PartSearch.find(c, null, List.of(), List.of(), null, Integer.MAX_VALUE), c.history(),
                    SegmentInfos.readLatestCommit(d).getGeneration());
        }
    }

    @Test
    void aListenerThrowingMidwayLeavesThePreviousCatalogExactlyAsItWas() throws Exception {
        run(UPSERT, quiet(), switches("a.csv", 0, 5, 50), drivers("d.csv", 3));
        Snapshot before = snapshot();
        assertEquals(8, before.parts().size());
        // Overlapping part numbers with other values plus new ones; abort after 7 rows.
        Path b = switches("b.csv", 2, 20, 70);
        IOException e = assertThrows(IOException.class, () -> run(UPSERT, n -> {
            if (n == 7) {
                throw new IOException("disk unplugged (test)");
            }
        }, b));
        assertEquals("disk unplugged (test)", e.getMessage());
        assertEquals(before, snapshot());
        IOException r = assertThrows(IOException.class, () -> run(REPLACE, n -> {
            if (n == 3) {
                throw new IOException("killed (test)");
            }
        }, b));
        assertEquals("killed (test)", r.getMessage());
        assertEquals(before, snapshot(), "--replace aborted midway deletes nothing either");
    }

    @Test
    void aRuntimeExceptionMidwayAlsoRollsBack() throws Exception {
        run(UPSERT, quiet(), switches("a.csv", 0, 5, 50));
        Snapshot before = snapshot();
        assertThrows(IllegalStateException.class, () -> run(UPSERT, n -> {
            throw new IllegalStateException("bug (test)");
        }, switches("b.csv", 0, 10, 60)));
        assertEquals(before, snapshot());
        // And the catalog stays writable afterwards (the lock was released).
        run(UPSERT, quiet(), switches("c.csv", 5, 6, 50));
        assertEquals(6, snapshot().parts().size());
    }

    @Test
    void badDataWritesNothingEvenWhenEarlierRowsAndFilesWereGood() throws Exception {
        run(UPSERT, quiet(), switches("a.csv", 0, 3, 50));
        Snapshot before = snapshot();
        Path good = switches("good.csv", 10, 20, 50);
        Path bad = Files.writeString(tmp.resolve("bad.csv"), SWITCH_HEADER
                + "TST-30,Testmaker,si-mosfet,100,20,-20,50\nTST-31,Testmaker,si-mosfet,100,20,-20,13O\n");
        CatalogDataException e = assertThrows(CatalogDataException.class, () -> run(UPSERT, quiet(), good, bad));
        assertEquals(1, e.total());
        assertEquals(3, e.problems().get(0).line());
        assertEquals("q_g_nc", e.problems().get(0).column());
        assertEquals(before, snapshot());
    }

    @Test
    void anotherIndexWriterOnTheDirectoryMakesImportFailAsBusy() throws Exception {
        run(UPSERT, quiet(), switches("a.csv", 0, 2, 50));
        Snapshot before = snapshot();
        try (Directory d = FSDirectory.open(dir);
             IndexWriter other = new IndexWriter(d, new IndexWriterConfig(new StandardAnalyzer()))) {
            CatalogBusyException e = assertThrows(CatalogBusyException.class,
                    () -> run(UPSERT, quiet(), switches("b.csv", 0, 5, 60)));
            assertTrue(e.getMessage().contains(dir.toString()), e.getMessage());
            assertTrue(e.getMessage().contains("locked by another import"), e.getMessage());
            assertTrue(e.getMessage().contains("try again"), e.getMessage());
            other.rollback();
        }
        assertEquals(before, snapshot());
    }

    @Test
    void aSecondImportWhileTheFirstHoldsTheLockFailsAsBusyAndTheFirstStillCommits() throws Exception {
        CountDownLatch inside = new CountDownLatch(1);
        CountDownLatch release = new CountDownLatch(1);
        ExecutorService pool = Executors.newSingleThreadExecutor();
        try {
            Path first = switches("first.csv", 0, 4, 50);
            Future<Importer.Result> holder = pool.submit(() -> run(UPSERT, n -> {
                if (n == 1) {
                    inside.countDown();
                    try {
                        if (!release.await(60, TimeUnit.SECONDS)) {
                            throw new IOException("test latch was never released");
                        }
                    } catch (InterruptedException ie) {
                        Thread.currentThread().interrupt();
                        throw new IOException(ie);
                    }
                }
            }, first));
            assertTrue(inside.await(60, TimeUnit.SECONDS), "first import started writing");
            assertThrows(CatalogBusyException.class, () -> run(UPSERT, quiet(), switches("second.csv", 10, 12, 50)));
            release.countDown();
            assertEquals(4, holder.get(60, TimeUnit.SECONDS).written());
        } finally {
            release.countDown();
            pool.shutdownNow();
        }
        Snapshot after = snapshot();
        assertEquals(4, after.parts().size());
        assertEquals(1, after.history().size());
    }

    @Test
    void replaceSwapsOneKindInASingleCommitAndLeavesTheOtherKind() throws Exception {
        run(UPSERT, quiet(), switches("a.csv", 0, 5, 50), drivers("d.csv", 3));
        long generation = snapshot().generation();
        try (Catalog old = Catalog.open(dir)) {
            run(REPLACE, quiet(), switches("b.csv", 100, 102, 60));
            assertEquals(5, old.count(Kind.SWITCH), "a reader opened before keeps its point-in-time view");
        }
        Snapshot after = snapshot();
        assertEquals(generation + 1, after.generation(), "exactly one commit");
        try (Catalog c = Catalog.open(dir)) {
            assertEquals(2, c.count(Kind.SWITCH));
            assertTrue(c.get(Kind.SWITCH, "TST-100").isPresent());
            assertTrue(c.get(Kind.SWITCH, "TST-0").isEmpty());
            assertEquals(3, c.count(Kind.DRIVER), "drivers untouched");
        }
        assertEquals("replace", after.history().get(after.history().size() - 1).mode());
    }

    @Test
    void plainImportUpsertsByPartNumberIgnoringCase() throws Exception {
        run(UPSERT, quiet(), switches("a.csv", 0, 3, 50));
        Path again = Files.writeString(tmp.resolve("again.csv"), SWITCH_HEADER
                + "tst-1,Testmaker,si-mosfet,100,20,-20,60\n"
                + " TST-2 ,Testmaker,si-mosfet,100,20,-20,61\n"
                + "TST-9,Testmaker,si-mosfet,100,20,-20,62\n");
        long generation = snapshot().generation();
        Importer.Result r = run(UPSERT, quiet(), again);
        assertEquals(3, r.written());
        Snapshot after = snapshot();
        assertEquals(generation + 1, after.generation(), "exactly one commit");
        assertEquals(4, after.parts().size(), "TST-0, TST-1, TST-2, TST-9");
        try (Catalog c = Catalog.open(dir)) {
            assertEquals(50.0, c.get(Kind.SWITCH, "TST-0").orElseThrow().number("q_g_nc"), 0.0);
            assertEquals(60.0, c.get(Kind.SWITCH, "TST-1").orElseThrow().number("q_g_nc"), 0.0);
            assertEquals(61.0, c.get(Kind.SWITCH, "tst-2").orElseThrow().number("q_g_nc"), 0.0);
            assertEquals(62.0, c.get(Kind.SWITCH, "TST-9").orElseThrow().number("q_g_nc"), 0.0);
        }
    }

    @Test
    void theSamePartNumberMayBeASwitchAndADriver() throws Exception {
        run(UPSERT, quiet(), switches("a.csv", 0, 1, 50));
        Path d = Files.writeString(tmp.resolve("d.csv"), DRIVER_HEADER
                + "TST-0,Testmaker,low-side,non-inverting,2,3,10,20\n");
        run(UPSERT, quiet(), d);
        try (Catalog c = Catalog.open(dir)) {
            assertEquals(2, c.lookup("tst-0").size());
        }
    }

    @Test
    void aPartReadsBackExactlyAsTheFileReadIt() throws Exception {
        // Every column type, a unit-suffixed number, a mixed-case text, a default from another column,
        // a description with a comma and non-ASCII text, and extra columns in a non-alphabetical order.
        Path f = Files.writeString(tmp.resolve("all.csv"), "part_number,maker,package,pinout,lifecycle,stock,unit_price,"
                + "description,technology,channel,v_block_v,q_g_nc,v_gs_max_v,v_gs_min_v,r_g_int_ohm,zeta_note,alpha_note\n"
                + "TST-A1,TestMaker,TO-247-4,,NRND,12,1.25,\"Kelvin-source, 4 µm² die\",SiC-MOSFET,n,1.2kV,0.13 uC,22,-8,4R7,z1,a1\n"
                + "tst-b2,Testmaker,SO-8,SO-8-B,,,,,si-mosfet,,100,57.7,20,-20,,,only alpha\n"
                + "TST-C3,Testmaker,DFN-8x8,,active,0,0,plain,gan-hemt,,650,5.8,7,-10,0.78,z3,\n", StandardCharsets.UTF_8);
        List<Row> read = new ArrayList<>();
        SheetReader.Summary s = SheetReader.read(f, f.toString(), null, new SheetReader.Sink() {
            @Override
            public void accept(Row row) {
                read.add(row);
            }
        });
        assertTrue(s.clean(), s.problems().toString());
        run(UPSERT, quiet(), f);
        try (Catalog c = Catalog.open(dir)) {
            List<Row> found = PartSearch.find(c, Kind.SWITCH, List.of(), List.of(), null, 10);
            assertEquals(read.size(), found.size());
            for (Row expected : read) {
                Row got = c.get(Kind.SWITCH, expected.key()).orElseThrow();
                Row searched = found.stream().filter(r -> r.key().equals(expected.key())).findFirst().orElseThrow();
                for (Row r : List.of(got, searched)) {
                    assertEquals(expected, r, "values (with their types), extras, file and line");
                    assertEquals(List.copyOf(expected.values().keySet()), List.copyOf(r.values().keySet()), "schema order");
                    assertEquals(List.copyOf(expected.extras().keySet()), List.copyOf(r.extras().keySet()), "extras in file order");
                }
            }
            assertEquals(List.of("TST-A1", "TST-C3", "tst-b2"), found.stream().map(Row::key).toList(),
                    "sorted by part number as written, in UTF-8 byte order");
        }
    }

    @Test
    void aCatalogInAnotherIndexFormatIsRefusedWithWhatToDo() throws Exception {
        Files.createDirectories(dir);
        try (Directory d = FSDirectory.open(dir);
             IndexWriter w = new IndexWriter(d, new IndexWriterConfig(new StandardAnalyzer()))) {
            org.apache.lucene.document.Document doc = new org.apache.lucene.document.Document();
            doc.add(new org.apache.lucene.document.StringField(Fields.KIND, "switch", org.apache.lucene.document.Field.Store.YES));
            w.addDocument(doc);
            w.commit();
        }
        long generation;
        try (Directory d = FSDirectory.open(dir)) {
            generation = SegmentInfos.readLatestCommit(d).getGeneration();
        }
        CatalogFormatException open = assertThrows(CatalogFormatException.class, () -> Catalog.open(dir));
        CatalogFormatException imp = assertThrows(CatalogFormatException.class,
                () -> run(UPSERT, quiet(), switches("a.csv", 0, 2, 50)));
        for (CatalogFormatException e : List.of(open, imp)) {
            assertTrue(e.getMessage().contains("index format 1; expected " + Fields.FORMAT), e.getMessage());
            assertTrue(e.getMessage().contains("import the CSV files again into a new catalog directory"), e.getMessage());
            assertTrue(e.getMessage().contains(dir.toString()), e.getMessage());
        }
        try (Directory d = FSDirectory.open(dir)) {
            assertEquals(generation, SegmentInfos.readLatestCommit(d).getGeneration(), "nothing was written");
        }
    }
}
