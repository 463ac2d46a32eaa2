package org.gatefit.index;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Deque;
import java.util.EnumMap;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.concurrent.ArrayBlockingQueue;
import java.util.concurrent.BlockingQueue;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicReference;
import org.apache.lucene.index.DirectoryReader;
import org.apache.lucene.index.IndexWriter;
import org.apache.lucene.index.LeafReaderContext;
import org.apache.lucene.index.SlowCodecReaderWrapper;
import org.apache.lucene.index.Term;
import org.apache.lucene.index.Terms;
import org.apache.lucene.index.TermsEnum;
import org.apache.lucene.util.ArrayUtil;
import org.apache.lucene.util.BytesRef;
import org.apache.lucene.util.BytesRefHash;
import org.gatefit.catalog.Kind;
import org.gatefit.catalog.Row;

/**
 * Writes an import's rows as column segments. The reading thread deals rows out in small batches
 * to worker threads, a chunk (the rows of one future segment, one kind) to one worker; the worker
 * puts them into its {@link SegmentBuilder}'s columns at once (a parsed row lives only moments) and,
 * when the chunk is sealed, writes the segment with {@code addIndexes} while the other workers fill
 * the next chunks.
 *
 * <p>"The later row wins" holds as with one document at a time. A row whose id was already written
 * in an earlier import is deleted by its id term before the chunk holding the new row is added (a
 * delete reaches only segments present when it is made). A row whose id came earlier in this import
 * replaces that row: withdrawn from its chunk if that chunk is still open, otherwise deleted by term
 * once every chunk sealed before has been written.
 */
final class IndexPipeline implements RowWriter {
    /** Most rows per chunk (memory bounds it further; see {@link #chunkRows}). */
    static final int MAX_CHUNK = 131_072;
    /** Rows per hand-off to a worker. */
    private static final int BATCH = 512;

    /** What the reading thread knows of a chunk: where its rows went and what must precede its writing. */
    private static final class Chunk {
        final Kind kind;
        final Worker worker;
        final int number;
        int rows;
        List<Row> batch = new ArrayList<>(BATCH);
        List<String> batchIds = new ArrayList<>(BATCH);
        final List<Integer> withdrawn = new ArrayList<>();
        /** Ids to delete from the catalog (earlier imports, or chunks sealed before) before this one is added. */
        final List<Term> deletes = new ArrayList<>();
        /** Whether some of {@link #deletes} hit chunks sealed before: they must be written first. */
        boolean afterSealed;
        final CompletableFuture<Void> done = new CompletableFuture<>();

        Chunk(Kind kind, Worker worker, int number) {
            this.kind = kind;
            this.worker = worker;
            this.number = number;
        }
    }

    /** Messages to a worker, in order: rows of a chunk, then the chunk sealed (write it). */
    private record Message(Chunk chunk, List<Row> rows, List<String> ids, boolean seal) {
    }

    private static final Message STOP = new Message(null, null, null, false);

    private final IndexWriter writer;
    private final Importer.Listener listener;
    private final int chunkRows;
    private final List<Worker> workers = new ArrayList<>();
    private final Deque<Chunk> sealed = new ArrayDeque<>();
    private final Map<Kind, Chunk> open = new EnumMap<>(Kind.class);
    /**
     * Ids seen in this import (bytes in pooled blocks, not an object per id: they live as long as
     * the import) and, per id, where its latest row went: chunk number in the high half, document
     * number in the low.
     */
    private final BytesRefHash seen = new BytesRefHash();
    private long[] placeOf = new long[1024];
    private final List<TermsEnum> committedIds = new ArrayList<>();
    private final Set<String> clearedKinds = new HashSet<>();
    private final AtomicReference<Throwable> failure = new AtomicReference<>();
    private int chunks;
    private long written;
    private boolean closed;

    /**
     * @param threads   segments written at once (at least one; the importer checks)
     * @param chunkRows most rows per segment (at least one)
     */
    IndexPipeline(IndexWriter writer, DirectoryReader committed, Importer.Listener listener, int threads, int chunkRows)
            throws IOException {
        this.writer = writer;
        this.listener = listener;
        this.chunkRows = chunkRows;
        if (committed != null) {
            for (LeafReaderContext leaf : committed.leaves()) {
                Terms t = leaf.reader().terms(Fields.ID);
                if (t != null) {
                    committedIds.add(t.iterator());
                }
            }
        }
        for (int i = 0; i < threads; i++) {
            workers.add(new Worker("gatefit-index-" + i));
        }
    }

    /**
     * Rows per chunk for {@code threads} writers: at most {@link #MAX_CHUNK}, and small enough that
     * the chunks held at once (one filling and one being written per worker) take at most a quarter
     * of the heap at some 1.5 KB a row in columns.
     */
    static int chunkRows(int threads) {
        long quarterHeap = Runtime.getRuntime().maxMemory() / 4;
        long rows = quarterHeap / (1536L * 2 * threads);
        return (int) Math.max(1024, Math.min(MAX_CHUNK, rows));
    }

    /** The kind's committed parts were deleted in this import (--replace): their ids no longer exist. */
    @Override
    public void cleared(String kind) {
        clearedKinds.add(kind);
    }

    /** Takes a row; rethrows a worker's failure. */
    @Override
    public void submit(Row row) throws IOException {
        ensureOpen();
        String id = Fields.id(row.kind().id(), row.key());
        Chunk chunk = open.get(row.kind());
        if (chunk == null) {
            Worker w = workers.get(chunks % workers.size());
            chunk = new Chunk(row.kind(), w, chunks++);
            open.put(row.kind(), chunk);
        }
        BytesRef idBytes = new BytesRef(id);
        int slot = seen.add(idBytes);
        if (slot < 0) { // seen before in this import; the same id is the same kind, so the same open chunk if any
            slot = -slot - 1;
            int before = (int) (placeOf[slot] >>> 32);
            if (before == chunk.number) {
                chunk.withdrawn.add((int) placeOf[slot]);
            } else {
                chunk.deletes.add(new Term(Fields.ID, idBytes));
                chunk.afterSealed = true;
            }
        } else if (!clearedKinds.contains(row.kind().id()) && committed(idBytes)) {
            chunk.deletes.add(new Term(Fields.ID, idBytes));
        }
        if (slot >= placeOf.length) {
            placeOf = ArrayUtil.grow(placeOf, slot + 1);
        }
        placeOf[slot] = ((long) chunk.number << 32) | chunk.rows++;
        chunk.batch.add(row);
        chunk.batchIds.add(id);
        written++;
        listener.rowWritten(written);
        if (chunk.batch.size() >= BATCH) {
            flushBatch(chunk);
        }
        if (chunk.rows >= chunkRows) {
            seal(chunk);
        }
    }

    /** Rows taken so far. */
    @Override
    public long written() {
        return written;
    }

    private boolean committed(BytesRef b) throws IOException {
        if (committedIds.isEmpty()) {
            return false;
        }
        for (TermsEnum te : committedIds) {
            if (te.seekExact(b)) {
                return true;
            }
        }
        return false;
    }

    private void flushBatch(Chunk chunk) throws IOException {
        if (chunk.batch.isEmpty()) {
            return;
        }
        rethrow();
        Message m = new Message(chunk, chunk.batch, chunk.batchIds, false);
        chunk.batch = new ArrayList<>(BATCH);
        chunk.batchIds = new ArrayList<>(BATCH);
        chunk.worker.send(m);
    }

    private void seal(Chunk chunk) throws IOException {
        flushBatch(chunk);
        open.remove(chunk.kind);
        if (chunk.afterSealed) {
            waitFor(0); // the rows these deletes replace must be in the index first
        }
        if (!chunk.deletes.isEmpty()) {
            writer.deleteDocuments(chunk.deletes.toArray(new Term[0]));
        }
        chunk.worker.send(new Message(chunk, null, null, true));
        sealed.add(chunk);
        waitFor(workers.size()); // bounds the chunks in memory; a worker never idles for want of one
    }

    /** Waits until at most {@code most} sealed chunks are unwritten; rethrows the first failure. */
    private void waitFor(int most) throws IOException {
        while (!sealed.isEmpty() && (sealed.size() > most || sealed.peekFirst().done.isDone())) {
            Chunk c = sealed.removeFirst();
            try {
                c.done.get();
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                throw new IOException("import interrupted", e);
            } catch (ExecutionException e) {
                rethrow(e.getCause());
            }
        }
        rethrow();
    }

    /**
     * Writes what is left and waits for every chunk; rethrows a worker's failure.
     *
     * @param segments whether the open chunks are written (for an import about to commit; one that
     *                 will roll back drops them)
     */
    @Override
    public void finish(boolean segments) throws IOException {
        ensureOpen();
        for (Chunk c : new ArrayList<>(open.values())) {
            if (segments && c.rows > 0) {
                seal(c);
            }
        }
        open.clear();
        waitFor(0);
    }

    private void ensureOpen() {
        if (closed) {
            throw new IllegalStateException("the index pipeline is closed");
        }
    }

    /** Stops the workers; a segment being written is let finish (the writer must stay usable for a rollback). */
    @Override
    public void close() {
        if (closed) {
            return;
        }
        closed = true;
        for (Worker w : workers) {
            w.stop();
        }
        for (Worker w : workers) {
            w.join();
        }
    }

    private void rethrow() throws IOException {
        Throwable t = failure.get();
        if (t != null) {
            rethrow(t);
        }
    }

    private static void rethrow(Throwable t) throws IOException {
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

    /** One indexing thread: fills the builders of its chunks and writes each sealed one. */
    private final class Worker {
        private final BlockingQueue<Message> queue = new ArrayBlockingQueue<>(4);
        private final Map<Integer, SegmentBuilder> builders = new HashMap<>();
        private final Thread thread;

        Worker(String name) {
            thread = new Thread(this::run, name);
            thread.setDaemon(true);
            thread.start();
        }

        void send(Message m) throws IOException {
            try {
                while (!queue.offer(m, 100, TimeUnit.MILLISECONDS)) {
                    rethrow();
                }
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                throw new IOException("import interrupted", e);
            }
        }

        void stop() {
            queue.clear(); // rows not yet in a builder are dropped: the import is over or failing
            boolean put = false;
            while (!put) {
                try {
                    queue.put(STOP);
                    put = true;
                } catch (InterruptedException e) {
                    Thread.currentThread().interrupt();
                    return;
                }
            }
        }

        void join() {
            try {
                thread.join();
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
            }
        }

        private void run() {
            while (true) {
                Message m;
                try {
                    m = queue.take();
                } catch (InterruptedException e) {
                    failure.compareAndSet(null, e);
                    return;
                }
                if (m == STOP) {
                    return;
                }
                Chunk c = m.chunk();
                if (failure.get() != null) {
                    c.done.completeExceptionally(failure.get());
                    builders.remove(c.number);
                    continue;
                }
                try {
                    if (m.seal()) {
                        SegmentBuilder b = builders.remove(c.number);
                        if (b != null) { // null: every row of the chunk was dropped
                            for (int doc : c.withdrawn) {
                                b.withdraw(doc);
                            }
                            writer.addIndexes(SlowCodecReaderWrapper.wrap(b.build()));
                        }
                        c.done.complete(null);
                    } else {
                        SegmentBuilder b = builders.computeIfAbsent(c.number, k -> new SegmentBuilder(c.kind, chunkRows, writer.getAnalyzer()));
                        for (int i = 0; i < m.rows().size(); i++) {
                            b.add(m.rows().get(i), m.ids().get(i));
                        }
                    }
                } catch (Throwable e) {
                    failure.compareAndSet(null, e);
                    c.done.completeExceptionally(e);
                }
            }
        }
    }
}
