package org.gatefit.index;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.concurrent.atomic.AtomicLong;
import org.apache.lucene.store.Directory;
import org.apache.lucene.store.FilterDirectory;
import org.apache.lucene.store.IOContext;
import org.apache.lucene.store.IndexOutput;
import org.gatefit.synth.SyntheticCatalog;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A write that fails midway (issue 14, finding 9), on any machine: the disk "fills" after a set
 * number of bytes, in whichever thread writes them (the segments are written by merge threads).
 * The import fails with one worded exception, nothing is printed by a thread on standard error,
 * the catalog is as it was byte for byte, and no file of the failed import is left behind — while
 * a file of the user's in the folder is kept. {@code DiskFullCliTest} does the same on a real full
 * file system. Input: the synthetic catalog.
 */
class ImportFailureTest {
    @TempDir
    Path tmp;

    /** A directory whose files accept {@code room} bytes in all, then fail as a full disk does. */
    private static final class FillingUp extends FilterDirectory {
        private final AtomicLong room;

        FillingUp(Directory in, long room) {
            super(in);
            this.room = new AtomicLong(room);
        }

        @Override
        public IndexOutput createOutput(String name, IOContext context) throws IOException {
            IndexOutput out = in.createOutput(name, context);
            return new IndexOutput("filling(" + name + ")", name) {
                private void take(long n) throws IOException {
                    if (room.addAndGet(-n) < 0) {
                        throw new IOException("No space left on device");
                    }
                }

                @Override
                public void writeByte(byte b) throws IOException {
                    take(1);
                    out.writeByte(b);
                }

                @Override
                public void writeBytes(byte[] b, int offset, int length) throws IOException {
                    take(length);
                    out.writeBytes(b, offset, length);
                }

                @Override
                public long getFilePointer() {
                    return out.getFilePointer();
                }

                @Override
                public long getChecksum() throws IOException {
                    return out.getChecksum();
                }

                @Override
                public void close() throws IOException {
                    out.close();
                }
            };
        }
    }

    @Test
    void aDiskFillingUpMidImportGivesOneMessageAndLeavesTheCatalogAndNoOrphans() throws Exception {
        Path dir = tmp.resolve("catalog");
        Path sw = tmp.resolve("s.csv");
        Path dr = tmp.resolve("d.csv");
        SyntheticCatalog.writeSwitches(sw, 300);
        SyntheticCatalog.writeDrivers(dr, 300);
        ImportChild.importInto(dir, List.of(sw, dr), null);
        Files.writeString(dir.resolve("_notes.txt"), "bench notes\n");
        Map<String, byte[]> before = ImportKillTest.commitFiles(dir);
        ImportKillTest.Snapshot state = ImportKillTest.snapshot(dir);
        List<String> listing = list(dir);

        Path more = tmp.resolve("more.csv");
        SyntheticCatalog.writeSwitches(more, 4000);
        PrintStream err = System.err;
        ByteArrayOutputStream printed = new ByteArrayOutputStream();
        CatalogStorageException e;
        try {
            System.setErr(new PrintStream(printed, true, StandardCharsets.UTF_8));
            e = assertThrows(CatalogStorageException.class, () -> new Importer(dir, ImportChild.CLOCK, 2, 400)
                    .withDirectory(d -> new FillingUp(d, 150_000))
                    .run(List.of(more), List.of("more.csv"), new Importer.Options(null, false, null), n -> { }));
        } finally {
            System.setErr(err);
        }
        assertTrue(e.getMessage().contains("could not write the catalog in " + dir + " (No space left on device)"),
                e.getMessage());
        assertTrue(e.getMessage().contains("Nothing was changed"), e.getMessage());
        assertEquals("", printed.toString(StandardCharsets.UTF_8), "no thread printed a stack trace");
        assertEquals(listing, list(dir), "no file of the failed import left, the user's file kept");
        Map<String, byte[]> after = ImportKillTest.commitFiles(dir);
        assertEquals(before.keySet(), after.keySet());
        for (String f : before.keySet()) {
            assertTrue(java.util.Arrays.equals(before.get(f), after.get(f)), f);
        }
        assertEquals(state, ImportKillTest.snapshot(dir));
        assertFalse(Files.exists(dir.resolve(CatalogFolder.JOURNAL)));
    }

    private static List<String> list(Path dir) throws IOException {
        try (java.util.stream.Stream<Path> s = Files.list(dir)) {
            return s.map(p -> p.getFileName().toString()).sorted().toList();
        }
    }
}
