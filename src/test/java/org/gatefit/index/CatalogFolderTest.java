package org.gatefit.index;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.apache.lucene.analysis.standard.StandardAnalyzer;
import org.apache.lucene.document.Document;
import org.apache.lucene.document.Field;
import org.apache.lucene.document.StringField;
import org.apache.lucene.index.IndexWriter;
import org.apache.lucene.index.IndexWriterConfig;
import org.apache.lucene.store.FSDirectory;
import org.gatefit.synth.SyntheticCatalog;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Which folders are catalogs (issue 14, finding 1): the marker, catalogs of older versions
 * (adopted), other Lucene indexes and folders of other files (refused untouched), and which files
 * an import may delete (its own and an interrupted import's, never a user's). Input: the synthetic
 * catalog.
 */
class CatalogFolderTest {
    @TempDir
    Path tmp;
    Path sw;

    @BeforeEach
    void csv() throws IOException {
        sw = tmp.resolve("s.csv");
        SyntheticCatalog.writeSwitches(sw, 50);
    }

    private static Importer.Result run(Path dir, Path csv) throws Exception {
        return new Importer(dir, ImportChild.CLOCK).run(List.of(csv), List.of(csv.toString()),
                new Importer.Options(null, false, null), n -> { });
    }

    private static Map<String, String> files(Path dir) throws IOException {
        Map<String, String> out = new TreeMap<>();
        try (var s = Files.list(dir)) {
            for (Path p : s.toList()) {
                out.put(p.getFileName().toString(), java.util.HexFormat.of().formatHex(Files.readAllBytes(p)));
            }
        }
        return out;
    }

    @Test
    void aCatalogOfAnOlderVersionIsReadAsItIsAndMarkedByTheNextImport() throws Exception {
        Path dir = tmp.resolve("catalog");
        run(dir, sw);
        Files.delete(dir.resolve(CatalogFolder.MARKER)); // as older versions left it
        Map<String, String> before = files(dir);
        try (Catalog c = Catalog.open(dir)) {
            assertEquals(50, c.count(org.gatefit.catalog.Kind.SWITCH));
        }
        assertEquals(before, files(dir), "reading writes nothing");
        run(dir, sw);
        assertTrue(Files.exists(dir.resolve(CatalogFolder.MARKER)), "adopted");
    }

    @Test
    void aLuceneIndexGatefitDidNotWriteIsRefusedUntouched() throws Exception {
        Path dir = tmp.resolve("other-index");
        try (IndexWriter w = new IndexWriter(FSDirectory.open(dir), new IndexWriterConfig(new StandardAnalyzer()))) {
            Document d = new Document();
            d.add(new StringField("title", "someone else's", Field.Store.YES));
            w.addDocument(d);
        }
        Map<String, String> before = files(dir);
        assertThrows(CatalogFormatException.class, () -> run(dir, sw));
        assertThrows(CatalogFormatException.class, () -> Catalog.open(dir));
        assertEquals(before, files(dir));
    }

    @Test
    void aFolderOfOtherFilesIsRefusedUntouchedByReadersAndImports() throws Exception {
        Path dir = Files.createDirectories(tmp.resolve("project"));
        Files.writeString(dir.resolve("_notes.txt"), "notes\n");
        Map<String, String> before = files(dir);
        CatalogFormatException e = assertThrows(CatalogFormatException.class, () -> run(dir, sw));
        assertTrue(e.getMessage().contains(dir + " is not a gatefit catalog"), e.getMessage());
        assertThrows(CatalogFormatException.class, () -> Catalog.openIfPresent(dir));
        assertEquals(before, files(dir));
    }

    @Test
    void aFolderHoldingOnlyALockFileLeftBehindCountsAsEmpty() throws Exception {
        Path dir = Files.createDirectories(tmp.resolve("catalog"));
        Files.createFile(dir.resolve(IndexWriter.WRITE_LOCK_NAME)); // what a failed first import of an older version left
        run(dir, sw);
        try (Catalog c = Catalog.open(dir)) {
            assertEquals(50, c.count(org.gatefit.catalog.Kind.SWITCH));
        }
    }

    @Test
    void anInterruptedImportsFilesAreDeletedByTheNextButAUsersFileOfALuceneLikeNameIsKept() throws Exception {
        Path dir = tmp.resolve("catalog");
        run(dir, sw);
        // left by an import killed midway: named in its journal (one created empty), or written with Lucene's header
        Files.write(dir.resolve("_z.fdt"), new byte[0]);
        Files.write(dir.resolve("_z.si"), new byte[] {0x3f, (byte) 0xd7, 0x6c, 0x17, 0, 0, 0, 1});
        Files.writeString(dir.resolve(CatalogFolder.JOURNAL), "_z.fdt\n_z.fd");
        // the user's: names Lucene could have written, but neither journaled nor Lucene's header
        Files.writeString(dir.resolve("_a.si"), "my segment notes\n");
        Files.writeString(dir.resolve("_z.fd"), "a name cut short in the journal is no name\n");
        run(dir, sw);
        assertFalse(Files.exists(dir.resolve("_z.fdt")));
        assertFalse(Files.exists(dir.resolve("_z.si")));
        assertFalse(Files.exists(dir.resolve(CatalogFolder.JOURNAL)));
        assertEquals("my segment notes\n", Files.readString(dir.resolve("_a.si")));
        assertTrue(Files.exists(dir.resolve("_z.fd")));
    }
}
