package org.gatefit.index;

import java.io.IOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.time.Clock;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.EnumSet;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Set;
import java.util.function.UnaryOperator;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;
import org.apache.lucene.analysis.standard.StandardAnalyzer;
import org.apache.lucene.codecs.CodecUtil;
import org.apache.lucene.document.Document;
import org.apache.lucene.document.Field;
import org.apache.lucene.document.StoredField;
import org.apache.lucene.document.StringField;
import org.apache.lucene.index.ConcurrentMergeScheduler;
import org.apache.lucene.index.DirectoryReader;
import org.apache.lucene.index.IndexWriter;
import org.apache.lucene.index.IndexWriterConfig;
import org.apache.lucene.index.SegmentInfos;
import org.apache.lucene.index.Term;
import org.apache.lucene.search.IndexSearcher;
import org.apache.lucene.search.TermQuery;
import org.apache.lucene.store.AlreadyClosedException;
import org.apache.lucene.store.ChecksumIndexInput;
import org.apache.lucene.store.Directory;
import org.apache.lucene.store.FSDirectory;
import org.apache.lucene.store.IOContext;
import org.apache.lucene.store.IndexInput;
import org.apache.lucene.store.Lock;
import org.apache.lucene.store.LockObtainFailedException;
import org.gatefit.catalog.CatalogDataException;
import org.gatefit.catalog.Kind;
import org.gatefit.catalog.Problem;
import org.gatefit.catalog.Row;
import org.gatefit.catalog.SheetReader;

/**
 * Write side of the catalog: imports CSV files in one Lucene commit. Nothing is visible to readers
 * until the commit at the very end; any problem (all-or-nothing mode), exception or kill before
 * it leaves the previous catalog exactly as it was ({@code setCommitOnClose(false)}, rollback).
 */
public final class Importer {

    /** Hears about progress; may throw to abort (tests use this to fail an import midway). */
    public interface Listener {
        void rowWritten(long rowsSoFar) throws IOException;
    }

    /**
     * @param forced  kind to read every file as, or null to tell from the columns
     * @param replace whether each imported kind's previous parts are dropped (in the same commit)
     * @param rejects where to write rejected rows; null means all-or-nothing
     * @param sheet   how to read the files (encoding, header row, sheet, mapping, notes)
     */
    public record Options(Kind forced, boolean replace, Path rejects, SheetReader.Options sheet) {
        /** With the sheet reader's defaults. */
        public Options(Kind forced, boolean replace, Path rejects) {
            this(forced, replace, rejects, SheetReader.Options.DEFAULT);
        }

        public Options {
            sheet = sheet == null ? SheetReader.Options.DEFAULT : sheet;
            if (forced == Kind.STAGE) {
                throw new IllegalArgumentException("expected --kind switch or driver, got stage (check a stage sheet with 'check')");
            }
        }
    }

    /**
     * @param files    what each file held
     * @param written  rows written in all
     * @param rejected rows rejected (written to the rejects file)
     * @param removed  parts of each kind --replace removed (the kinds it cleared only)
     */
    public record Result(List<SheetReader.Summary> files, long written, long rejected, Map<Kind, Integer> removed) {
        public Result {
            files = List.copyOf(files);
            Map<Kind, Integer> m = new EnumMap<>(Kind.class);
            m.putAll(removed);
            removed = java.util.Collections.unmodifiableMap(m);
        }
    }

    private final Path dir;
    private final Clock clock;
    private final int threads;
    private final int chunkRows;
    /** Wraps the folder's directory (tests: to stop or fail at a chosen file operation). */
    private UnaryOperator<Directory> directoryHook = d -> d;

    public Importer(Path dir, Clock clock) {
        this(dir, clock, THREADS, IndexPipeline.chunkRows(THREADS));
    }

    /** With {@code threads} segment writers and at most {@code chunkRows} parts per segment (tests use small chunks). */
    Importer(Path dir, Clock clock, int threads, int chunkRows) {
        this.dir = Objects.requireNonNull(dir, "dir");
        this.clock = Objects.requireNonNull(clock, "clock");
        if (threads < 1 || chunkRows < 1) {
            throw new IllegalArgumentException("expected at least one thread and one part per segment, got " + threads
                    + " and " + chunkRows);
        }
        this.threads = threads;
        this.chunkRows = chunkRows;
    }

    /** Lets tests see (and stop at) every file operation of the import. */
    Importer withDirectory(UnaryOperator<Directory> hook) {
        this.directoryHook = Objects.requireNonNull(hook, "hook");
        return this;
    }

    /**
     * Imports {@code files} (shown in messages by {@code names}) in one commit.
     *
     * @throws CatalogDataException when a file has problems (nothing is written unless rows are
     *                              being skipped, and never for a file that cannot be read through)
     * @throws CatalogBusyException when another import holds the catalog's lock
     */
    @SuppressWarnings("try") // the lock is held for the try's body; the writer is closed early to commit
    public Result run(List<Path> files, List<String> names, Options options, Listener listener)
            throws IOException, CatalogDataException, CatalogBusyException {
        if (files.size() != names.size()) {
            throw new IllegalArgumentException("expected one name per file, got " + names.size() + " for " + files.size());
        }
        // Nothing is touched before the folder is known to be a catalog (or new, or empty).
        if (CatalogFolder.inspect(dir) == CatalogFolder.State.NONE) {
            try {
                Files.createDirectories(dir);
            } catch (IOException e) {
                throw CatalogStorageException.writeFailed(dir, e);
            }
        }
        try (Directory fs = directoryHook.apply(FSDirectory.open(dir)); Lock lock = lock(fs)) {
            // Under the lock, again: another import may have made the catalog meanwhile.
            if (CatalogFolder.inspect(dir) != CatalogFolder.State.CATALOG) {
                try {
                    CatalogFolder.mark(dir);
                } catch (IOException e) {
                    throw CatalogStorageException.writeFailed(dir, e);
                }
            }
            CatalogFolder.Own directory = new CatalogFolder.Own(fs, dir);
            try {
                return run(directory, files, names, options, listener);
            } finally {
                try {
                    directory.cleanUp();
                } catch (IOException e) {
                    // the journal stays; the next import deletes what is left
                }
            }
        }
    }

    /** The import's own lock, held from before it looks at the folder until its clean-up is done. */
    private Lock lock(Directory fs) throws IOException, CatalogBusyException {
        try {
            return fs.obtainLock(CatalogFolder.LOCK);
        } catch (LockObtainFailedException e) {
            throw new CatalogBusyException("the catalog in " + dir + " is locked by another import;"
                    + " wait for it to finish and try again", e);
        } catch (IOException e) {
            throw CatalogStorageException.writeFailed(dir, e);
        }
    }

    @SuppressWarnings("try") // the writer is closed explicitly to commit before the rejects move
    private Result run(CatalogFolder.Own directory, List<Path> files, List<String> names, Options options,
                       Listener listener) throws IOException, CatalogDataException, CatalogBusyException {
        SegmentInfos start;
        try {
            start = DirectoryReader.indexExists(directory) ? SegmentInfos.readLatestCommit(directory) : null;
        } catch (IOException e) {
            throw refused(e);
        }
        if (start != null) { // the last commit, read under the lock
            Catalog.checkFormat(dir, start.getUserData());
        }
        IndexWriter writer;
        ReportingMerges merges = new ReportingMerges();
        // Each chunk's segment is written as a merge (addIndexes): let every indexing thread write
        // one at once, at full speed (the import is what the user waits for).
        merges.setMaxMergesAndThreads(threads + 4, threads);
        merges.disableAutoIOThrottle();
        IndexWriterConfig cfg = new IndexWriterConfig(new StandardAnalyzer())
                .setOpenMode(IndexWriterConfig.OpenMode.CREATE_OR_APPEND)
                .setCommitOnClose(false)
                .setCodec(new ColumnCodec())
                .setMergeScheduler(merges);
        try {
            writer = new IndexWriter(directory, cfg);
        } catch (LockObtainFailedException e) {
            throw new CatalogBusyException("the catalog in " + dir + " is locked by another import;"
                    + " wait for it to finish and try again", e);
        } catch (IOException e) {
            throw refused(e);
        }
        boolean committed = false;
        Path tmpRejects = null;
        try (RejectsFile rejects = options.rejects() == null ? null
                : new RejectsFile(tmpRejects = Files.createTempFile(absoluteParent(options.rejects()), ".rejects", ".csv"))) {
            Result r = write(writer, files, names, options, listener, rejects);
            try {
                writer.setLiveCommitData(Map.of(Fields.FORMAT_KEY, Fields.FORMAT).entrySet());
                writer.prepareCommit();
                if (start != null) {
                    verifyKept(directory, start);
                }
                writer.commit();
            } catch (CatalogStorageException e) {
                throw e;
            } catch (IOException e) {
                throw refused(e);
            }
            committed = true;
            writer.close();
            if (rejects != null) {
                rejects.close();
                Files.move(tmpRejects, options.rejects(), StandardCopyOption.REPLACE_EXISTING);
                tmpRejects = null;
            }
            return r;
        } catch (WriteFailed e) {
            throw refused(e.getCause());
        } catch (AlreadyClosedException e) {
            // the writer stopped on a failure it counts as fatal (a full disk in a merge, say)
            if (writer.getTragicException() instanceof IOException io) {
                throw refused(io);
            }
            throw e;
        } finally {
            if (!committed) {
                try {
                    writer.rollback();
                } catch (IOException | RuntimeException e) {
                    // the previous commit is untouched; the clean-up deletes what this import left
                }
            }
            if (tmpRejects != null) {
                Files.deleteIfExists(tmpRejects);
            }
        }
    }

    /**
     * Checks every checksum of the files the last commit and the one about to be made share (the
     * segments this import builds on; the new files were just written and checked as written).
     * Prepared, not yet committed: a damaged catalog is refused and the commit rolled back.
     */
    private void verifyKept(CatalogFolder.Own directory, SegmentInfos start) throws IOException {
        String pending = directory.pendingCommit();
        if (pending == null) {
            throw new IllegalStateException("prepareCommit wrote no pending commit file");
        }
        long gen = Long.parseLong(pending.substring(pending.lastIndexOf('_') + 1), Character.MAX_RADIX);
        SegmentInfos next;
        try (ChecksumIndexInput in = directory.openChecksumInput(pending, IOContext.READONCE)) {
            next = SegmentInfos.readCommit(directory, in, gen);
        }
        java.util.TreeSet<String> kept = new java.util.TreeSet<>(next.files(false));
        kept.retainAll(start.files(false));
        for (String f : kept) {
            try (IndexInput in = directory.openInput(f, IOContext.READONCE)) {
                CodecUtil.checksumEntireFile(in);
            }
        }
    }

    /** An exception of the index side worded for the user: damage with its advice, else a failed write. */
    private CatalogStorageException refused(IOException e) {
        if (e instanceof CatalogStorageException s) {
            return s;
        }
        String damage = CatalogStorageException.damage(e);
        if (damage != null) {
            return new CatalogStorageException("the catalog in " + dir + " is damaged (" + damage + "); nothing was"
                    + " imported. " + CatalogStorageException.DAMAGE_ADVICE, e);
        }
        return CatalogStorageException.writeFailed(dir, e);
    }

    /** An index-side failure carried through the sheet reader (which passes a sink's exceptions on). */
    private static final class WriteFailed extends IOException {
        private static final long serialVersionUID = 1L;

        WriteFailed(IOException cause) {
            super(cause);
        }

        @Override
        public synchronized IOException getCause() {
            return (IOException) super.getCause();
        }
    }

    /**
     * Runs merges on threads like Lucene's scheduler, but a failed merge is not printed by the
     * thread (Lucene's default prints its stack trace on standard error): the writer reports it to
     * the indexing thread that waits for the segment, which fails the import with one message.
     */
    static final class ReportingMerges extends ConcurrentMergeScheduler {
        @Override
        protected void handleMergeException(Throwable exc) {
            // IndexWriter.merge has recorded it; addIndexes and commit rethrow it.
        }
    }

    /** Segments written at once: one per core, at most four. */
    private static final int THREADS = Math.max(1, Math.min(4, Runtime.getRuntime().availableProcessors()));

    private static Path absoluteParent(Path p) {
        Path parent = p.toAbsolutePath().getParent();
        return parent == null ? Path.of(".") : parent;
    }

    private Result write(IndexWriter writer, List<Path> files, List<String> names, Options options, Listener listener,
                         RejectsFile rejects) throws IOException, CatalogDataException {
        boolean skip = rejects != null;
        Set<Kind> cleared = EnumSet.noneOf(Kind.class);
        Map<Kind, Integer> removed = new EnumMap<>(Kind.class);
        List<SheetReader.Summary> summaries = new ArrayList<>();
        List<Problem> problems = new ArrayList<>();
        long[] problemTotal = {0};
        long rejected = 0;
        long written;
        DirectoryReader committed;
        try {
            committed = DirectoryReader.indexExists(writer.getDirectory())
                    ? DirectoryReader.open(writer.getDirectory()) : null;
        } catch (IOException e) {
            throw new WriteFailed(e);
        }
        IndexSearcher before = committed == null ? null : new IndexSearcher(committed);
        Listener heard = n -> {
            try {
                listener.rowWritten(n);
            } catch (IOException e) {
                throw new ListenerFailed(e);
            }
        };
        try (committed; RowWriter pipeline = RowWriter.open(writer, committed, heard, threads, chunkRows)) {
        IndexOp clear = kind -> {
            if (options.replace() && cleared.add(kind)) {
                removed.put(kind, before == null ? 0 : before.count(new TermQuery(new Term(Fields.KIND, kind.id()))));
                writer.deleteDocuments(new Term(Fields.KIND, kind.id()));
                pipeline.cleared(kind.id());
            }
        };
        for (int i = 0; i < files.size(); i++) {
            String name = names.get(i);
            boolean[] stop = {false};
            SheetReader.Summary s = SheetReader.read(files.get(i), name, options.forced(), new SheetReader.Sink() {
                @Override
                public void format(SheetReader.Format format) {
                    if (rejects != null) {
                        rejects.format(format);
                    }
                }

                @Override
                public void accept(Row row) throws IOException {
                    if (row.kind() == Kind.STAGE || stop[0]) {
                        return;
                    }
                    try {
                        clear.on(row.kind());
                        pipeline.submit(row);
                    } catch (ListenerFailed e) {
                        throw e.getCause(); // the caller's own failure, as it was
                    } catch (WriteFailed e) {
                        throw e;
                    } catch (IOException e) {
                        throw new WriteFailed(e);
                    }
                }

                @Override
                public void reject(List<String> header, long line, List<String> cells, List<Problem> rowProblems)
                        throws IOException {
                    if (rejects != null) {
                        rejects.write(header, line, cells, rowProblems);
                    } else {
                        stop[0] = true; // all-or-nothing: keep checking, stop writing
                    }
                }
            }, options.sheet());
            summaries.add(s);
            if (s.kind() == Kind.STAGE) {
                problems.add(Problem.ofLine(name, 1, "this is a stage sheet (expected a switch or driver catalog;"
                        + " check a design with 'gatefit check " + name + "')"));
                problemTotal[0]++;
                continue;
            }
            if (s.fatal() || !skip) {
                problems.addAll(s.problems());
                problemTotal[0] += s.problemCount();
            }
            rejected += s.rejected();
            if (s.kind() != null && (s.rows() > 0 || options.replace())) {
                try {
                    clear.on(s.kind());
                } catch (IOException e) {
                    throw new WriteFailed(e);
                }
            }
        }
        if (skip && problemTotal[0] == 0) {
            for (Problem p : everyRowRejected(summaries, options.replace(), before)) {
                problems.add(p);
                problemTotal[0]++;
            }
        }
        try {
            pipeline.finish(problemTotal[0] == 0); // segments are written only for an import that will commit
        } catch (IOException e) {
            throw new WriteFailed(e);
        }
        written = pipeline.written();
        }
        if (problemTotal[0] > 0) {
            throw new CatalogDataException(problems, problemTotal[0]);
        }
        long now = clock.millis();
        for (SheetReader.Summary s : summaries) {
            Document d = new Document();
            d.add(new StringField(Fields.KIND, Fields.IMPORT, Field.Store.YES));
            d.add(new StoredField(Fields.SOURCE_FILE, s.file()));
            d.add(new StoredField(Fields.IMPORT_SHA, s.sha256()));
            d.add(new StoredField(Fields.IMPORT_KIND, s.kind().id()));
            d.add(new StoredField(Fields.IMPORT_ROWS, s.rows()));
            d.add(new StoredField(Fields.IMPORT_TIME, now));
            d.add(new StoredField(Fields.IMPORT_MODE, options.replace() ? "replace" : skip ? "skip-invalid" : "upsert"));
            try {
                writer.addDocument(d);
            } catch (IOException e) {
                throw new WriteFailed(e);
            }
        }
        return new Result(summaries, written, rejected, removed);
    }

    /** The listener's own exception, told apart from the index's on its way through the pipeline. */
    private static final class ListenerFailed extends IOException {
        private static final long serialVersionUID = 1L;

        ListenerFailed(IOException cause) {
            super(cause);
        }

        @Override
        public synchronized IOException getCause() {
            return (IOException) super.getCause();
        }
    }

    /** A step on the index for one kind. */
    private interface IndexOp {
        void on(Kind kind) throws IOException;
    }

    /**
     * With rows skipped: a problem for each kind of which every row was rejected and that the
     * import would leave with no parts (replaced, or none before), listing the rows' problems too.
     */
    private static List<Problem> everyRowRejected(List<SheetReader.Summary> summaries, boolean replace,
                                                  IndexSearcher before) throws IOException {
        List<Problem> out = new ArrayList<>();
        for (Kind k : Kind.values()) {
            long rows = 0;
            long rejectedRows = 0;
            List<String> files = new ArrayList<>();
            List<Problem> why = new ArrayList<>();
            for (SheetReader.Summary s : summaries) {
                if (s.kind() == k) {
                    rows += s.rows();
                    rejectedRows += s.rejected();
                    files.add(s.file());
                    why.addAll(s.problems());
                }
            }
            if (rows > 0 || rejectedRows == 0) {
                continue;
            }
            int had = before == null ? 0 : before.count(new TermQuery(new Term(Fields.KIND, k.id())));
            if (!replace && had > 0) {
                continue; // the catalog keeps its parts of this kind
            }
            out.add(Problem.ofLine(files.get(0), 0, "every " + k.id() + " row was rejected (" + rejectedRows
                    + (rejectedRows == 1 ? " row" : " rows") + (files.size() > 1 ? " in " + String.join(", ", files) : "")
                    + "), which would leave the catalog with no " + k.id() + " parts"
                    + (replace && had > 0 ? " (--replace would remove the " + had + " there now)" : "")
                    + "; nothing was written. Fix the rows below and import again"));
            out.addAll(why);
        }
        return out;
    }

    /**
     * Rejected rows as they were, under their file's header, with two columns added at the end
     * ({@code rejected_line}, {@code rejected_because}): fix the cells and import the file again
     * (the two added columns are then reported as unknown and ignored). A file whose header
     * differs from the previous one's starts a new header line.
     */
    private static final class RejectsFile implements AutoCloseable {
        private final Writer out;
        private CSVPrinter printer;
        private List<String> header;
        private SheetReader.Format format;
        private boolean closed;

        RejectsFile(Path path) throws IOException {
            out = Files.newBufferedWriter(path, StandardCharsets.UTF_8);
        }

        /**
         * How the next rows' sheet is written: the rejects keep its separator (so decimal commas read
         * back) and its units row, under a header the importer reads back (its two columns of reasons
         * are ignored on import).
         */
        void format(SheetReader.Format f) {
            this.format = f;
        }

        void write(List<String> fileHeader, long line, List<String> cells, List<Problem> problems) throws IOException {
            if (printer == null) {
                char d = format == null ? ',' : format.delimiter();
                printer = new CSVPrinter(out, CSVFormat.DEFAULT.builder().setDelimiter(d).setRecordSeparator('\n').get());
            }
            if (!fileHeader.equals(header)) {
                header = List.copyOf(fileHeader);
                List<String> h = new ArrayList<>(header);
                h.add(SheetReader.REJECTED_LINE);
                h.add(SheetReader.REJECTED_BECAUSE);
                printer.printRecord(h);
                if (format != null && !format.units().isEmpty()) {
                    List<String> u = new ArrayList<>(format.units());
                    while (u.size() < h.size()) {
                        u.add("");
                    }
                    printer.printRecord(u);
                }
            }
            StringBuilder because = new StringBuilder();
            for (Problem p : problems) {
                if (because.length() > 0) {
                    because.append("; ");
                }
                because.append(p.column() == null ? "" : p.column() + ": ").append(p.message());
            }
            List<Object> rec = new ArrayList<>(cells);
            while (rec.size() < header.size()) {
                rec.add("");
            }
            rec.add(line);
            rec.add(because.toString());
            printer.printRecord(rec);
        }

        @Override
        public void close() throws IOException {
            if (!closed) {
                closed = true;
                if (printer != null) {
                    printer.close(true);
                } else {
                    out.close();
                }
            }
        }
    }
}
