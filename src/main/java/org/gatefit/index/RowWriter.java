package org.gatefit.index;

import java.io.IOException;
import org.apache.lucene.index.DirectoryReader;
import org.apache.lucene.index.IndexWriter;
import org.apache.lucene.index.Term;
import org.apache.lucene.util.Version;
import org.gatefit.catalog.FastPath;
import org.gatefit.catalog.Row;

/**
 * Where an import's rows go, in file order, "the later row wins" (a row replaces an earlier one with
 * the same id, from this import or a committed one). Two writers stand behind it: {@link IndexPipeline}
 * (the fast path: column segments added with {@code addIndexes}) and {@link Documents} (the
 * reference: Lucene's own {@link IndexWriter#updateDocument} of {@link Documents#toDocument}, one
 * row at a time). {@link #open} picks one.
 */
interface RowWriter extends AutoCloseable {

    /** Takes a row (its kind's previous parts may have been deleted first: {@link #cleared}). */
    void submit(Row row) throws IOException;

    /** The kind's committed parts were deleted in this import (--replace): their ids no longer exist. */
    void cleared(String kind);

    /**
     * Writes what is left.
     *
     * @param segments whether rows still held are written (for an import about to commit; one that
     *                 will roll back drops them)
     */
    void finish(boolean segments) throws IOException;

    /** Rows taken so far. */
    long written();

    @Override
    void close();

    /**
     * The segment path when this Lucene is the one it was built against ({@link #segmentsFit}) and
     * the reference is not asked for ({@link FastPath#IMPORT}); Lucene's own indexing otherwise.
     */
    static RowWriter open(IndexWriter writer, DirectoryReader committed, Importer.Listener listener, int threads,
                          int chunkRows) throws IOException {
        if (segmentsFit(Version.LATEST) && !FastPath.IMPORT.reference()) {
            return new IndexPipeline(writer, committed, listener, threads, chunkRows);
        }
        return new ByDocument(writer, listener);
    }

    /**
     * Whether the segment path may run on Lucene {@code running}: {@link ColumnSegment} implements
     * Lucene's reader interfaces and {@link ColumnCodec} relies on how a merge is written, both as of
     * Lucene 9.12 (any 9.12.x bug-fix release); on another version the import takes Lucene's own
     * indexing by itself, which any version does right.
     */
    static boolean segmentsFit(Version running) {
        return running.major == 9 && running.minor == 12;
    }

    /** The reference: each row as one document, {@code updateDocument} by its id term (replaces earlier rows). */
    final class ByDocument implements RowWriter {
        private final IndexWriter writer;
        private final Importer.Listener listener;
        private long written;

        ByDocument(IndexWriter writer, Importer.Listener listener) {
            this.writer = writer;
            this.listener = listener;
        }

        @Override
        public void submit(Row row) throws IOException {
            String id = Fields.id(row.kind().id(), row.key());
            writer.updateDocument(new Term(Fields.ID, id), Documents.toDocument(row, id));
            written++;
            listener.rowWritten(written);
        }

        /** Nothing to do: the importer's delete by kind reaches every document added before it. */
        @Override
        public void cleared(String kind) {
        }

        /** Nothing held: every document is in the writer, which commits or rolls back. */
        @Override
        public void finish(boolean segments) {
        }

        @Override
        public long written() {
            return written;
        }

        @Override
        public void close() {
        }
    }
}
