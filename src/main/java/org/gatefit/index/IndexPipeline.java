package org.gatefit.index;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.concurrent.ArrayBlockingQueue;
import java.util.concurrent.BlockingQueue;
import java.util.concurrent.atomic.AtomicLong;
import java.util.concurrent.atomic.AtomicReference;
import org.apache.lucene.index.DirectoryReader;
import org.apache.lucene.index.IndexWriter;
import org.apache.lucene.index.LeafReaderContext;
import org.apache.lucene.index.Term;
import org.apache.lucene.index.Terms;
import org.apache.lucene.index.TermsEnum;
import org.apache.lucene.util.BytesRef;
import org.gatefit.catalog.Row;

/**
 * Indexes rows on worker threads while the reader thread parses the next ones (Lucene's
 * {@link IndexWriter} takes documents from several threads at once). Rows with the same id always
 * go to the same worker, in order, so "the later row wins" holds as in a single thread. A row
 * whose id is neither in the committed catalog nor earlier in this import is added without the
 * delete-by-term an update costs.
 */
final class IndexPipeline implements AutoCloseable {
    private record Task(Row row, String id, boolean update) {
    }

    /** Rows travel in batches: one queue hand-off per batch, not per row. */
    private static final int BATCH = 256;
    private static final List<Task> STOP = List.of();

    private final IndexWriter writer;
    private final Importer.Listener listener;
    private final List<BlockingQueue<List<Task>>> queues = new ArrayList<>();
    private final List<List<Task>> pending = new ArrayList<>();
    private final List<Thread> workers = new ArrayList<>();
    private final AtomicLong written = new AtomicLong();
    private final AtomicReference<Throwable> failure = new AtomicReference<>();
    private final Set<String> seen = new HashSet<>();
    private final List<TermsEnum> committedIds = new ArrayList<>();
    private final Set<String> clearedKinds = new HashSet<>();
    private boolean closed;
    /** Set before the stop marker is queued (the queue hand-off makes it visible to the workers). */
    private volatile boolean writeSegments;

    IndexPipeline(IndexWriter writer, DirectoryReader committed, Importer.Listener listener, int threads)
            throws IOException {
        this.writer = writer;
        this.listener = listener;
        if (committed != null) {
            for (LeafReaderContext leaf : committed.leaves()) {
                Terms t = leaf.reader().terms(Fields.ID);
                if (t != null) {
                    committedIds.add(t.iterator());
                }
            }
        }
        for (int i = 0; i < threads; i++) {
            BlockingQueue<List<Task>> q = new ArrayBlockingQueue<>(16);
            queues.add(q);
            pending.add(new ArrayList<>(BATCH));
            Thread th = new Thread(() -> work(q), "gatefit-index-" + i);
            th.setDaemon(true);
            workers.add(th);
            th.start();
        }
    }

    /** The kind's committed parts were deleted in this import (--replace): their ids no longer exist. */
    void cleared(String kind) {
        clearedKinds.add(kind);
    }

    /** Queues a row; rethrows a worker's failure. */
    void submit(Row row) throws IOException {
        rethrow();
        String id = Fields.id(row.kind().id(), row.key());
        boolean update = !seen.add(id) || (!clearedKinds.contains(row.kind().id()) && committed(id));
        int w = Math.floorMod(id.hashCode(), queues.size());
        List<Task> batch = pending.get(w);
        batch.add(new Task(row, id, update));
        if (batch.size() >= BATCH) {
            send(w);
        }
    }

    private void send(int w) throws IOException {
        List<Task> batch = pending.get(w);
        if (batch.isEmpty()) {
            return;
        }
        pending.set(w, new ArrayList<>(BATCH));
        try {
            while (!queues.get(w).offer(batch, 100, java.util.concurrent.TimeUnit.MILLISECONDS)) {
                rethrow();
            }
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IOException("import interrupted", e);
        }
    }

    /** Rows written so far. */
    long written() {
        return written.get();
    }

    private boolean committed(String id) throws IOException {
        BytesRef b = new BytesRef(id);
        for (TermsEnum te : committedIds) {
            if (te.seekExact(b)) {
                return true;
            }
        }
        return false;
    }

    private void work(BlockingQueue<List<Task>> q) {
        try {
            while (true) {
                List<Task> batch = q.take();
                if (batch == STOP) {
                    // Write the rows still in memory as segments here, on every worker at once, rather
                    // than one buffer after the other on the thread that commits.
                    while (writeSegments && failure.get() == null && writer.flushNextBuffer()) {
                        // until no buffer is left
                    }
                    return;
                }
                for (Task t : batch) {
                    if (failure.get() != null) {
                        break;
                    }
                    Row row = t.row();
                    if (t.update()) {
                        writer.updateDocument(new Term(Fields.ID, t.id()), Documents.toDocument(row, t.id()));
                    } else {
                        writer.addDocument(Documents.toDocument(row, t.id()));
                    }
                    long n = written.incrementAndGet();
                    synchronized (listener) {
                        listener.rowWritten(n);
                    }
                }
            }
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            failure.compareAndSet(null, e);
        } catch (Throwable e) {
            failure.compareAndSet(null, e);
            // keep draining so the producer never blocks
            try {
                while (q.take() != STOP) {
                    // discard
                }
            } catch (InterruptedException ie) {
                Thread.currentThread().interrupt();
            }
        }
    }

    /**
     * Waits for every queued row to be written; rethrows a worker's failure.
     *
     * @param segments whether the workers then write what they hold in memory as segments (for an
     *                 import about to commit; one that will roll back leaves it to be dropped)
     */
    void finish(boolean segments) throws IOException {
        for (int w = 0; w < queues.size(); w++) {
            send(w);
        }
        writeSegments = segments;
        close();
        rethrow();
    }

    @Override
    public void close() {
        if (closed) {
            return;
        }
        closed = true;
        for (BlockingQueue<List<Task>> q : queues) {
            try {
                q.put(STOP);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
            }
        }
        for (Thread t : workers) {
            try {
                t.join();
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
            }
        }
    }

    private void rethrow() throws IOException {
        Throwable t = failure.get();
        if (t == null) {
            return;
        }
        if (t instanceof IOException io) {
            throw io;
        }
        if (t instanceof UncheckedIOException u) {
            throw u.getCause();
        }
        if (t instanceof RuntimeException r) {
            throw r;
        }
        if (t instanceof Error e) {
            throw e;
        }
        throw new IOException(t);
    }
}
