package org.gatefit.index;

import java.io.IOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.time.Clock;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Set;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;
import org.apache.lucene.analysis.standard.StandardAnalyzer;
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
import org.apache.lucene.store.Directory;
import org.apache.lucene.store.FSDirectory;
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
     */
    public record Options(Kind forced, boolean replace, Path rejects) {
        public Options {
            if (forced == Kind.STAGE) {
                throw new IllegalArgumentException("expected --kind switch or driver, got stage (check a stage sheet with 'check')");
            }
        }
    }

    /**
     * @param files    what each file held
     * @param written  rows written in all
     * @param rejected rows rejected (written to the rejects file)
     */
    public record Result(List<SheetReader.Summary> files, long written, long rejected) {
        public Result {
            files = List.copyOf(files);
        }
    }

    private final Path dir;
    private final Clock clock;
    private final int threads;
    private final int chunkRows;

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

    /**
     * Imports {@code files} (shown in messages by {@code names}) in one commit.
     *
     * @throws CatalogDataException when a file has problems (nothing is written unless rows are
     *                              being skipped, and never for a file that cannot be read through)
     * @throws CatalogBusyException when another import holds the catalog's lock
     */
    public Result run(List<Path> files, List<String> names, Options options, Listener listener)
            throws IOException, CatalogDataException, CatalogBusyException {
        if (files.size() != names.size()) {
            throw new IllegalArgumentException("expected one name per file, got " + names.size() + " for " + files.size());
        }
        Files.createDirectories(dir);
        try (Directory directory = FSDirectory.open(dir)) {
            boolean existed = DirectoryReader.indexExists(directory);
            IndexWriter writer;
            ConcurrentMergeScheduler merges = new ConcurrentMergeScheduler();
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
            }
            boolean committed = false;
            Path tmpRejects = null;
            try (RejectsFile rejects = options.rejects() == null ? null
                    : new RejectsFile(tmpRejects = Files.createTempFile(absoluteParent(options.rejects()), ".rejects", ".csv"))) {
                if (existed) { // the last commit, read under the write lock
                    Catalog.checkFormat(dir, SegmentInfos.readLatestCommit(directory).getUserData());
                }
                Result r = write(writer, files, names, options, listener, rejects);
                writer.setLiveCommitData(Map.of(Fields.FORMAT_KEY, Fields.FORMAT).entrySet());
                writer.commit();
                committed = true;
                writer.close();
                if (rejects != null) {
                    rejects.close();
                    Files.move(tmpRejects, options.rejects(), StandardCopyOption.REPLACE_EXISTING);
                    tmpRejects = null;
                }
                return r;
            } finally {
                if (!committed) {
                    writer.rollback();
                }
                if (tmpRejects != null) {
                    Files.deleteIfExists(tmpRejects);
                }
            }
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
        List<SheetReader.Summary> summaries = new ArrayList<>();
        List<Problem> problems = new ArrayList<>();
        long[] problemTotal = {0};
        long rejected = 0;
        long written;
        DirectoryReader committed = DirectoryReader.indexExists(writer.getDirectory())
                ? DirectoryReader.open(writer.getDirectory()) : null;
        try (committed; RowWriter pipeline = RowWriter.open(writer, committed, listener, threads, chunkRows)) {
        for (int i = 0; i < files.size(); i++) {
            String name = names.get(i);
            boolean[] stop = {false};
            SheetReader.Summary s = SheetReader.read(files.get(i), name, options.forced(), new SheetReader.Sink() {
                @Override
                public void accept(Row row) throws IOException {
                    if (row.kind() == Kind.STAGE || stop[0]) {
                        return;
                    }
                    if (options.replace() && cleared.add(row.kind())) {
                        writer.deleteDocuments(new Term(Fields.KIND, row.kind().id()));
                        pipeline.cleared(row.kind().id());
                    }
                    pipeline.submit(row);
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
            });
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
                if (options.replace() && cleared.add(s.kind())) {
                    writer.deleteDocuments(new Term(Fields.KIND, s.kind().id()));
                    pipeline.cleared(s.kind().id());
                }
            }
        }
        pipeline.finish(problemTotal[0] == 0); // segments are written only for an import that will commit
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
            writer.addDocument(d);
        }
        return new Result(summaries, written, rejected);
    }

    /**
     * Rejected rows as they were, under their file's header, with two columns added at the end
     * ({@code rejected_line}, {@code rejected_because}): fix the cells and import the file again
     * (the two added columns are then reported as unknown and ignored). A file whose header
     * differs from the previous one's starts a new header line.
     */
    private static final class RejectsFile implements AutoCloseable {
        private final Writer out;
        private final CSVPrinter printer;
        private List<String> header;
        private boolean closed;

        RejectsFile(Path path) throws IOException {
            out = Files.newBufferedWriter(path, StandardCharsets.UTF_8);
            printer = new CSVPrinter(out, CSVFormat.DEFAULT.builder().setRecordSeparator('\n').get());
        }

        void write(List<String> fileHeader, long line, List<String> cells, List<Problem> problems) throws IOException {
            if (!fileHeader.equals(header)) {
                header = List.copyOf(fileHeader);
                List<String> h = new ArrayList<>(header);
                h.add("rejected_line");
                h.add("rejected_because");
                printer.printRecord(h);
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
                printer.close(true);
            }
        }
    }
}
