package org.gatefit.index;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apache.lucene.analysis.standard.StandardAnalyzer;
import org.apache.lucene.index.IndexWriter;
import org.apache.lucene.index.IndexWriterConfig;
import org.apache.lucene.store.ByteBuffersDirectory;
import org.apache.lucene.util.Version;
import org.gatefit.catalog.FastPath;
import org.junit.jupiter.api.Test;

/**
 * Which import writer runs: the column segments on the Lucene line they were written for (9.12.x,
 * the pom's {@code lucene.version}), Lucene's own indexing on any other version by itself, and
 * whenever {@code -Dgatefit.reference} names the import.
 */
class RowWriterTest {

    @Test
    void theSegmentPathRunsOnlyOnLuceneNineTwelve() {
        assertTrue(RowWriter.segmentsFit(Version.LATEST), "the Lucene this build runs on: " + Version.LATEST);
        assertTrue(RowWriter.segmentsFit(Version.fromBits(9, 12, 0)));
        assertTrue(RowWriter.segmentsFit(Version.fromBits(9, 12, 7)), "a later bug-fix release");
        assertFalse(RowWriter.segmentsFit(Version.fromBits(9, 11, 1)), "an earlier minor version");
        assertFalse(RowWriter.segmentsFit(Version.fromBits(9, 13, 0)), "a later minor version");
        assertFalse(RowWriter.segmentsFit(Version.fromBits(10, 0, 0)), "the next major version");
    }

    @Test
    void thePropertySelectsLucenesOwnIndexing() throws Exception {
        String before = System.getProperty(FastPath.PROPERTY);
        try (ByteBuffersDirectory dir = new ByteBuffersDirectory();
             IndexWriter w = new IndexWriter(dir, new IndexWriterConfig(new StandardAnalyzer()))) {
            System.clearProperty(FastPath.PROPERTY);
            try (RowWriter r = RowWriter.open(w, null, n -> { }, 1, 16)) {
                assertInstanceOf(IndexPipeline.class, r);
            }
            for (String v : new String[] {"true", "all", "import", "csv, import", "IMPORT"}) {
                System.setProperty(FastPath.PROPERTY, v);
                try (RowWriter r = RowWriter.open(w, null, n -> { }, 1, 16)) {
                    assertInstanceOf(RowWriter.ByDocument.class, r, v);
                }
            }
            for (String v : new String[] {"false", "csv", "json", ""}) {
                System.setProperty(FastPath.PROPERTY, v);
                try (RowWriter r = RowWriter.open(w, null, n -> { }, 1, 16)) {
                    assertInstanceOf(IndexPipeline.class, r, v);
                }
            }
            w.rollback();
        } finally {
            if (before == null) {
                System.clearProperty(FastPath.PROPERTY);
            } else {
                System.setProperty(FastPath.PROPERTY, before);
            }
        }
    }
}
