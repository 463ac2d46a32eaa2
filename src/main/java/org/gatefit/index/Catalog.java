package org.gatefit.index;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.LinkedHashMap;
import org.apache.lucene.document.Document;
import org.apache.lucene.index.LeafReader;
import org.apache.lucene.index.PostingsEnum;
import org.apache.lucene.index.ReaderUtil;
import org.apache.lucene.index.Terms;
import org.apache.lucene.index.TermsEnum;
import org.apache.lucene.util.Bits;
import org.apache.lucene.util.BytesRef;
import org.apache.lucene.index.LeafReaderContext;
import org.apache.lucene.index.NumericDocValues;
import org.apache.lucene.index.SortedDocValues;
import org.apache.lucene.search.BooleanClause;
import org.apache.lucene.search.BooleanQuery;
import org.apache.lucene.search.DocIdSetIterator;
import org.apache.lucene.search.ScoreMode;
import org.apache.lucene.search.Scorer;
import org.apache.lucene.search.Weight;
import org.gatefit.catalog.Column;
import org.gatefit.catalog.ColumnType;
import org.gatefit.catalog.Schema;
import org.apache.lucene.index.CheckIndex;
import org.apache.lucene.index.DirectoryReader;
import org.apache.lucene.index.IndexNotFoundException;
import org.apache.lucene.index.Term;
import org.apache.lucene.search.IndexSearcher;
import org.apache.lucene.search.MatchNoDocsQuery;
import org.apache.lucene.search.Query;
import org.apache.lucene.search.ScoreDoc;
import org.apache.lucene.search.Sort;
import org.apache.lucene.search.TermQuery;
import org.apache.lucene.search.TopDocs;
import org.apache.lucene.store.Directory;
import org.apache.lucene.store.FSDirectory;
import org.apache.lucene.index.StoredFields;
import org.gatefit.catalog.Kind;
import org.gatefit.catalog.Row;
import org.gatefit.catalog.RowCursor;

/**
 * Read side of the catalog: a point-in-time view of the last committed import. Open it in
 * try-with-resources; an empty or missing directory reads as an empty catalog.
 */
public final class Catalog implements AutoCloseable {
    /** Largest number of distinct values per segment whose texts {@link #scan} keeps decoded. */
    private static final int ORD_CACHE_MAX = 4096;

    private final Path dir;
    private final Directory directory;
    private final DirectoryReader reader;
    private final IndexSearcher searcher;
    /**
     * {@link #contentSha256} of this view, computed when it is opened: later another process's
     * import may delete the files of this commit from the folder (the view keeps reading them
     * through its open files, but they can no longer be opened by name).
     */
    private final String contentSha256;
    /** Decoded columns per segment, when {@link #keepColumns} is on; null otherwise. */
    private volatile java.util.concurrent.ConcurrentHashMap<Long, Object> columns;
    /** Objects built from rows ({@link RowCursor#memo}) per segment and key, when {@link #keepColumns} is on. */
    private volatile java.util.concurrent.ConcurrentHashMap<List<Object>, Object[]> memos; // (segment, type) → one object per document

    /** Whether {@link #close} ran on this handle (a handle closes its share of the reader once). */
    private final java.util.concurrent.atomic.AtomicBoolean closed = new java.util.concurrent.atomic.AtomicBoolean();

    private Catalog(Path dir, Directory directory, DirectoryReader reader, String contentSha256) {
        this.dir = dir;
        this.directory = directory;
        this.reader = reader;
        this.searcher = reader == null ? null : new IndexSearcher(reader);
        this.contentSha256 = contentSha256;
    }

    private static Catalog empty(Path dir) {
        return new Catalog(dir, null, null, null);
    }

    /**
     * Another handle on this same point-in-time view, for a long-running process that answers
     * several questions at once from one opened catalog (the web server): each handle is closed on
     * its own, and the files stay open until the last handle is closed. Refused as {@link #open}
     * refuses when nothing has been imported.
     *
     * @throws CatalogFormatException when this view holds no catalog
     */
    public Catalog handle() throws CatalogFormatException {
        if (reader == null) {
            throw noCatalog(dir);
        }
        reader.incRef();
        Catalog c = new Catalog(dir, directory, reader, contentSha256);
        c.columns = columns;
        c.memos = memos;
        return c;
    }

    /**
     * Whether this view is still the catalog's last commit: false once another process's import has
     * committed (or, for a view of an empty folder, once there is a catalog), so a long-running
     * reader can open the new one. Reads the folder's commit point only; the view is unchanged.
     */
    public boolean isCurrent() throws IOException {
        if (reader == null) {
            try (Catalog now = openIfPresent(dir)) {
                return now.reader == null;
            }
        }
        try {
            return reader.isCurrent();
        } catch (IOException e) {
            throw CatalogStorageException.reading(dir, e);
        }
    }

    private static CatalogFormatException noCatalog(Path dir) {
        return new CatalogFormatException("there is no catalog in " + dir + " yet: import your CSV files first"
                + " (gatefit --catalog " + dir + " import FILE...)");
    }

    /**
     * Opens the catalog in {@code dir} for a command that needs its data.
     *
     * @throws CatalogFormatException  when there is no catalog there yet (a missing or empty folder, or
     *                                 one nothing was imported into), or the path is not a catalog
     * @throws CatalogStorageException when the catalog's files are damaged
     */
    public static Catalog open(Path dir) throws IOException {
        Catalog c = openIfPresent(dir);
        if (c.reader == null) {
            c.close();
            throw noCatalog(dir);
        }
        return c;
    }

    /**
     * Opens the catalog in {@code dir}; a missing or empty folder, or a catalog nothing was imported
     * into yet, gives an empty catalog. A path that is a file or a folder of other files is refused,
     * and nothing in the folder is changed.
     */
    public static Catalog openIfPresent(Path dir) throws IOException {
        if (CatalogFolder.inspect(dir) == CatalogFolder.State.NONE) {
            return empty(dir);
        }
        Directory d = new CatalogFolder.Own(FSDirectory.open(dir), null);
        try {
            if (!DirectoryReader.indexExists(d)) {
                d.close();
                return empty(dir);
            }
            for (int attempt = 1; ; attempt++) {
                DirectoryReader r = DirectoryReader.open(d);
                String sha;
                try {
                    checkFormat(dir, r.getIndexCommit().getUserData());
                    verifySmall(r);
                    sha = hash(d, r);
                } catch (java.nio.file.NoSuchFileException | java.io.FileNotFoundException e) {
                    r.close();
                    if (attempt < OPEN_ATTEMPTS) {
                        continue; // an import committed and removed this commit's files meanwhile: open its commit
                    }
                    throw e;
                } catch (IOException | RuntimeException e) {
                    r.close();
                    throw e;
                }
                return new Catalog(dir, d, r, sha);
            }
        } catch (IndexNotFoundException e) {
            d.close();
            return empty(dir);
        } catch (IOException e) {
            d.close();
            throw CatalogStorageException.reading(dir, e);
        } catch (RuntimeException e) {
            d.close();
            throw e;
        }
    }

    /**
     * Catalogs up to this size (files of the commit, in bytes) have every checksum checked each
     * time they are opened, so a damaged byte is reported instead of read as a value. Opening
     * already checks the commit, segment and field-info files and each metadata file in full and
     * every data file's footer; the data files of a larger catalog are checked by {@code gatefit
     * verify} and, before each commit, by import.
     */
    static final long VERIFY_ON_OPEN_BYTES = 8L << 20;

    private static void verifySmall(DirectoryReader r) throws IOException {
        long bytes = 0;
        for (LeafReaderContext leaf : r.leaves()) {
            if (!(leaf.reader() instanceof org.apache.lucene.index.SegmentReader sr)) {
                return;
            }
            bytes += sr.getSegmentInfo().sizeInBytes();
            if (bytes > VERIFY_ON_OPEN_BYTES) {
                return;
            }
        }
        for (LeafReaderContext leaf : r.leaves()) {
            leaf.reader().checkIntegrity();
        }
    }

    /**
     * What {@link #verify} checked in a sound catalog.
     *
     * @param files    files of the last commit, every one's checksum verified
     * @param bytes    their size in all
     * @param segments segments, each checked by Lucene's index checker
     * @param parts    switches and drivers
     */
    public record Verification(int files, long bytes, int segments, long parts) {
    }

    /**
     * Verifies the catalog in {@code dir}: the checksum of every file of its last commit (naming
     * each damaged one), then Lucene's index checker ({@link CheckIndex}: every segment opened and
     * its postings, doc values, points and stored fields walked). Holds the import lock meanwhile
     * (on a read-only folder, where no import can run, without it). Changes nothing.
     *
     * @throws CatalogStorageException when something is damaged: the message says what and what to do
     * @throws CatalogBusyException    when an import is running
     */
    @SuppressWarnings("try") // the lock is held for the try's body, never referenced in it
    public static Verification verify(Path dir) throws IOException, CatalogBusyException {
        if (CatalogFolder.inspect(dir) == CatalogFolder.State.NONE) {
            throw new CatalogFormatException("there is no catalog in " + dir + " yet: nothing to verify");
        }
        try (Directory fs = FSDirectory.open(dir); Directory d = new CatalogFolder.Own(fs, null)) {
            if (!DirectoryReader.indexExists(d)) {
                throw new CatalogFormatException("there is no catalog in " + dir + " yet (nothing was imported into it):"
                        + " nothing to verify");
            }
            org.apache.lucene.store.Lock lock = null;
            try {
                lock = fs.obtainLock(CatalogFolder.LOCK);
            } catch (org.apache.lucene.store.LockObtainFailedException e) {
                throw new CatalogBusyException("an import into the catalog in " + dir + " is running;"
                        + " verify it when the import has finished", e);
            } catch (IOException e) {
                // a folder that cannot take the lock file (read-only) takes no import either
            }
            try (org.apache.lucene.store.Lock held = lock) {
                return verify(dir, d);
            }
        }
    }

    private static Verification verify(Path dir, Directory d) throws IOException {
        org.apache.lucene.index.SegmentInfos commit;
        try {
            commit = org.apache.lucene.index.SegmentInfos.readLatestCommit(d);
        } catch (IOException e) {
            throw CatalogStorageException.reading(dir, e);
        }
        checkFormat(dir, commit.getUserData());
        List<String> bad = new ArrayList<>();
        IOException first = null;
        long bytes = 0;
        List<String> files = new ArrayList<>(commit.files(true));
        java.util.Collections.sort(files);
        for (String f : files) {
            try (org.apache.lucene.store.IndexInput in = d.openInput(f, org.apache.lucene.store.IOContext.READONCE)) {
                bytes += in.length();
                org.apache.lucene.codecs.CodecUtil.checksumEntireFile(in);
            } catch (IOException e) {
                String what = CatalogStorageException.damage(e);
                bad.add(f + ": " + (what == null ? e.toString() : what));
                first = first == null ? e : first;
            }
        }
        if (!bad.isEmpty()) {
            throw CatalogStorageException.damaged(dir, bad.size() + " of " + files.size() + " files failed their"
                    + " checksum: " + String.join("; ", bad), first);
        }
        java.io.ByteArrayOutputStream log = new java.io.ByteArrayOutputStream();
        CheckIndex.Status status;
        try (CheckIndex checker = new CheckIndex(d, null)) {
            checker.setInfoStream(new java.io.PrintStream(log, true, java.nio.charset.StandardCharsets.UTF_8));
            status = checker.checkIndex();
        }
        if (!status.clean) {
            List<String> why = new ArrayList<>();
            Throwable cause = null;
            for (CheckIndex.Status.SegmentInfoStatus seg : status.segmentInfos) {
                if (seg.error != null) {
                    String what = CatalogStorageException.damage(seg.error);
                    why.add("segment " + seg.name + ": " + (what == null ? String.valueOf(seg.error.getMessage()) : what));
                    cause = cause == null ? seg.error : cause;
                }
            }
            if (why.isEmpty()) {
                why.add(status.missingSegments ? "the commit file cannot be read" : "Lucene's index checker found"
                        + " problems: " + log.toString(java.nio.charset.StandardCharsets.UTF_8).strip());
            }
            throw CatalogStorageException.damaged(dir, String.join("; ", why), cause);
        }
        long parts = 0;
        try (DirectoryReader r = DirectoryReader.open(d)) {
            IndexSearcher s = new IndexSearcher(r);
            for (Kind k : Kind.values()) {
                if (k.isPart()) {
                    parts += s.count(new TermQuery(new Term(Fields.KIND, k.id())));
                }
            }
        }
        return new Verification(files.size(), bytes, status.numSegments, parts);
    }

    /**
     * Keeps every column that a {@link #scanColumns} reads decoded in memory (a {@code double[]} per
     * number column, ordinals and a dictionary per text column, per segment) for as long as the
     * catalog is open, so later scans read arrays instead of doc values. For long-running
     * processes that ask many questions of one catalog; a one-off command gains nothing (the first
     * scan decodes every document of a column, not only the candidates). Costs about 8 bytes per
     * part per column read.
     */
    public Catalog keepColumns(boolean keep) {
        columns = keep ? new java.util.concurrent.ConcurrentHashMap<>() : null;
        memos = keep ? new java.util.concurrent.ConcurrentHashMap<>() : null;
        return this;
    }

    /**
     * Refuses a catalog written in another index layout ({@link Fields#FORMAT}), which this version
     * would misread, with what to do instead.
     */
    static void checkFormat(Path dir, Map<String, String> commitUserData) throws CatalogFormatException {
        String format = commitUserData.get(Fields.FORMAT_KEY);
        if (!Fields.FORMAT.equals(format)) {
            throw new CatalogFormatException("the catalog in " + dir + " was written by another version of gatefit"
                    + " (index format " + (format == null ? "1" : format) + "; expected " + Fields.FORMAT + "):"
                    + " import the CSV files again into a new catalog directory, or delete " + dir + " first");
        }
    }

    /** Where the catalog lives. */
    public Path directory() {
        return dir;
    }

    /**
     * A SHA-256 that names the content of this view, the catalog's commit it reads: over the files
     * of that commit in name order, each as one line {@code name TAB size TAB crc32} (lower-case
     * hex), where crc32 is the CRC-32 of the file's every byte that Lucene keeps in the file's own
     * footer. Only the footers are read, so it costs the same on a catalog of any size. Each import
     * gives a new value (an import of the same files into another folder too: Lucene names every
     * segment with a random id); an unchanged catalog keeps its value. Whether the bytes still match
     * their CRCs is {@link #verify}'s job. Null when nothing has been imported. Computed when the
     * view is opened (a file of the commit that cannot be read or has no footer is refused then, as
     * damage), so a view whose files another process's import has since removed still names itself.
     */
    public String contentSha256() {
        return contentSha256;
    }

    /** Times {@link #openIfPresent} opens the last commit again when an import replaces it while it is being opened. */
    static final int OPEN_ATTEMPTS = 5;

    /** {@link #contentSha256} of the commit {@code reader} reads, from the files' footers. */
    private static String hash(Directory directory, DirectoryReader reader) throws IOException {
        List<String> files = new ArrayList<>(reader.getIndexCommit().getFileNames());
        java.util.Collections.sort(files);
        java.security.MessageDigest sha = org.gatefit.catalog.Sha256.digest();
        for (String f : files) {
            try (org.apache.lucene.store.IndexInput in = directory.openInput(f,
                    org.apache.lucene.store.IOContext.READONCE)) {
                long crc = org.apache.lucene.codecs.CodecUtil.retrieveChecksum(in);
                sha.update((f + "\t" + in.length() + "\t" + Long.toHexString(crc) + "\n")
                        .getBytes(java.nio.charset.StandardCharsets.UTF_8));
            }
        }
        return org.gatefit.catalog.Sha256.hex(sha);
    }

    /** Whether nothing has been imported. */
    public boolean isEmpty() {
        return reader == null || reader.numDocs() == 0;
    }

    /** The searcher, for engines that query the index directly; null when the catalog is empty. */
    public IndexSearcher searcher() {
        return searcher;
    }

    /** Number of parts of a kind. */
    public int count(Kind kind) throws IOException {
        try {
            if (searcher == null) {
                return 0;
            }
            return searcher.count(new TermQuery(new Term(Fields.KIND, kind.id())));
        } catch (IOException e) {
            throw CatalogStorageException.reading(dir, e);
        }
    }

    /** Parts per kind (switch, driver). */
    public Map<Kind, Integer> counts() throws IOException {
        Map<Kind, Integer> m = new EnumMap<>(Kind.class);
        for (Kind k : Kind.values()) {
            if (k.isPart()) {
                m.put(k, count(k));
            }
        }
        return m;
    }

    /**
     * A part by kind and part number (matched case-insensitively): a direct term lookup on each
     * segment, then one stored-fields load.
     */
    public Optional<Row> get(Kind kind, String partNumber) throws IOException {
        try {
            if (reader == null) {
                return Optional.empty();
            }
            BytesRef id = new BytesRef(Fields.id(kind.id(), partNumber));
            for (LeafReaderContext leaf : reader.leaves()) {
                Terms terms = leaf.reader().terms(Fields.ID);
                if (terms == null) {
                    continue;
                }
                TermsEnum te = terms.iterator();
                if (!te.seekExact(id)) {
                    continue;
                }
                PostingsEnum pe = te.postings(null, PostingsEnum.NONE);
                Bits live = leaf.reader().getLiveDocs();
                for (int doc = pe.nextDoc(); doc != DocIdSetIterator.NO_MORE_DOCS; doc = pe.nextDoc()) {
                    if (live == null || live.get(doc)) {
                        return Optional.of(Documents.row(leaf.reader(), doc));
                    }
                }
            }
            return Optional.empty();
        } catch (IOException e) {
            throw CatalogStorageException.reading(dir, e);
        }
    }

    /** Parts with this part number, of any kind. */
    public List<Row> lookup(String partNumber) throws IOException {
        List<Row> out = new ArrayList<>();
        for (Kind k : Kind.values()) {
            if (k.isPart()) {
                get(k, partNumber).ifPresent(out::add);
            }
        }
        return out;
    }

    /**
     * The part numbers, as written, of the parts of {@code kind} (null: switches and drivers) whose
     * part number starts with {@code prefix}, case not mattering as in {@link #get}: a prefix query on
     * the {@link Fields#ID} terms, sorted by the part number's doc value, so no stored record is read
     * (shell completion asks this on every Tab). Sorted, each once, at most {@code limit}.
     */
    public List<String> partNumbers(Kind kind, String prefix, int limit) throws IOException {
        if (limit < 1) {
            throw new IllegalArgumentException("expected a limit of at least 1, got " + limit);
        }
        try {
            if (searcher == null) {
                return List.of();
            }
            BooleanQuery.Builder q = new BooleanQuery.Builder();
            for (Kind k : Kind.values()) {
                if (k.isPart() && (kind == null || kind == k)) {
                    q.add(new org.apache.lucene.search.PrefixQuery(new Term(Fields.ID, Fields.id(k.id(), prefix))),
                            BooleanClause.Occur.SHOULD);
                }
            }
            // Both kinds may hold one part number: ask for twice the limit, keep each once.
            int n = Math.max(1, Math.min(2 * limit, reader.maxDoc()));
            TopDocs td = searcher.search(q.build(), n,
                    new Sort(new org.apache.lucene.search.SortField(PartNumberQuery.FIELD,
                            org.apache.lucene.search.SortField.Type.STRING)));
            java.util.LinkedHashSet<String> out = new java.util.LinkedHashSet<>();
            for (ScoreDoc hit : td.scoreDocs) {
                BytesRef v = (BytesRef) ((org.apache.lucene.search.FieldDoc) hit).fields[0];
                if (v != null && out.size() < limit) {
                    out.add(v.utf8ToString());
                }
            }
            return List.copyOf(out);
        } catch (IOException e) {
            throw CatalogStorageException.reading(dir, e);
        }
    }

    /** Runs a query and loads the matching parts, in the order of {@code sort} (null: by score). */
    public List<Row> search(Query query, Sort sort, int limit) throws IOException {
        try {
            if (searcher == null || query instanceof MatchNoDocsQuery) {
                return List.of();
            }
            int n = Math.max(1, Math.min(limit, Math.max(1, reader.maxDoc())));
            TopDocs td = sort == null ? searcher.search(query, n) : searcher.search(query, n, sort);
            // Each row comes from its stored record, so the hits are read in rank order.
            List<LeafReaderContext> leaves = reader.leaves();
            List<Row> rows = new ArrayList<>(td.scoreDocs.length);
            for (ScoreDoc hit : td.scoreDocs) {
                LeafReaderContext leaf = leaves.get(ReaderUtil.subIndex(hit.doc, leaves));
                rows.add(Documents.row(leaf.reader(), hit.doc - leaf.docBase));
            }
            return rows;
        } catch (IOException e) {
            throw CatalogStorageException.reading(dir, e);
        }
    }

    /**
     * Streams the parts of a kind that match {@code filter}, built from doc values only (no
     * stored-field loads), for engines that evaluate every candidate. Extra columns and
     * words-only text (description) are not included; source file and line are left empty.
     */
    public long scan(Kind kind, Query filter, java.util.function.Consumer<Row> sink) throws IOException {
        List<Column> cols = Schema.of(kind).columns();
        String keyColumn = kind == Kind.STAGE ? "stage" : "part_number";
        long[] n = {0};
        scanColumns(kind, filter, 1, () -> (java.util.function.Consumer<RowCursor>) r -> {
            LinkedHashMap<String, Object> values = new LinkedHashMap<>(cols.size() * 2); // no rehash per row
            for (int i = 0; i < cols.size(); i++) {
                Column c = cols.get(i);
                Object v = switch (c.type()) {
                    case NUMBER -> {
                        double x = r.number(i);
                        yield Double.isNaN(x) ? null : (Object) x;
                    }
                    case INTEGER -> ((LeafCursor) r).integer(i);
                    case TEXT, CHOICE -> r.text(i);
                };
                if (v != null) {
                    values.put(c.name(), v);
                }
            }
            Object key = values.get(keyColumn);
            if (key != null) {
                sink.accept(new Row(kind, key.toString(), "", 0, Row.owned(values), Map.of()));
                n[0]++;
            }
        });
        return n[0];
    }

    /** Parts per partition below which a scan is not split across threads (thread hand-off costs more than it saves). */
    static final int MIN_PARTITION = 16_384;

    /** Threads that run scan partitions besides the caller's (daemon: they never keep the JVM alive). */
    private static final java.util.concurrent.ExecutorService SCAN_THREADS =
            java.util.concurrent.Executors.newCachedThreadPool(r -> {
                Thread t = new Thread(r, "gatefit-scan");
                t.setDaemon(true);
                return t;
            });

    /**
     * Streams the parts of a kind that match {@code filter} through a {@link RowCursor} that reads
     * doc values column by column, only the columns a sink asks for (no row map, no stored
     * fields). The documents are split into up to {@code parallelism} partitions (ranges of
     * document ids, at least {@link #MIN_PARTITION} each) that run at once, the first on the
     * calling thread; each partition feeds its own sink from {@code sinks}, so sinks need no
     * locking. Deleted documents (replaced by a later import) are skipped.
     *
     * @return the sinks, one per partition, in document order, for the caller to merge
     */
    public <S extends java.util.function.Consumer<RowCursor>> List<S> scanColumns(Kind kind, Query filter,
            int parallelism, java.util.function.Supplier<S> sinks) throws IOException {
        return scanColumns(kind, filter, parallelism, MIN_PARTITION, sinks);
    }

    /** {@link #scanColumns(Kind, Query, int, java.util.function.Supplier)} with partitions of at least {@code minPartition} documents. */
    public <S extends java.util.function.Consumer<RowCursor>> List<S> scanColumns(Kind kind, Query filter,
            int parallelism, int minPartition, java.util.function.Supplier<S> sinks) throws IOException {
        try {
            return scanPartitions(kind, filter, parallelism, minPartition, sinks);
        } catch (IOException e) {
            throw CatalogStorageException.reading(dir, e);
        }
    }

    private <S extends java.util.function.Consumer<RowCursor>> List<S> scanPartitions(Kind kind, Query filter,
            int parallelism, int minPartition, java.util.function.Supplier<S> sinks) throws IOException {
        if (minPartition < 1) {
            throw new IllegalArgumentException("expected a partition of at least 1 document, got " + minPartition);
        }
        if (searcher == null) {
            return List.of();
        }
        BooleanQuery.Builder b = new BooleanQuery.Builder();
        b.add(new TermQuery(new Term(Fields.KIND, kind.id())), BooleanClause.Occur.FILTER);
        if (filter != null) {
            b.add(filter, BooleanClause.Occur.FILTER);
        }
        Weight w = searcher.createWeight(searcher.rewrite(b.build()), ScoreMode.COMPLETE_NO_SCORES, 1f);
        List<List<int[]>> parts = partitions(kind, Math.max(1, parallelism), minPartition);
        List<S> out = new ArrayList<>(parts.size());
        for (int i = 0; i < parts.size(); i++) {
            out.add(sinks.get());
        }
        List<java.util.concurrent.Future<?>> running = new ArrayList<>();
        try {
            for (int i = 1; i < parts.size(); i++) {
                List<int[]> part = parts.get(i);
                S sink = out.get(i);
                running.add(SCAN_THREADS.submit(() -> {
                    scanPartition(kind, w, part, sink);
                    return null;
                }));
            }
            if (!parts.isEmpty()) {
                scanPartition(kind, w, parts.get(0), out.get(0));
            }
            for (java.util.concurrent.Future<?> f : running) {
                f.get();
            }
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new java.io.InterruptedIOException("scan interrupted");
        } catch (java.util.concurrent.ExecutionException e) {
            Throwable c = e.getCause();
            if (c instanceof IOException io) {
                throw io;
            }
            if (c instanceof RuntimeException re) {
                throw re;
            }
            if (c instanceof Error er) {
                throw er;
            }
            throw new IOException(c);
        } finally {
            for (java.util.concurrent.Future<?> f : running) {
                f.cancel(true);
            }
        }
        return out;
    }

    /** Partitions computed for this catalog's reader, by kind, parallelism and minimum size. */
    private final java.util.concurrent.ConcurrentHashMap<String, List<List<int[]>>> partitionCache =
            new java.util.concurrent.ConcurrentHashMap<>();

    /**
     * At most {@code parallelism} partitions holding about equal numbers of the kind's live parts
     * (deleted documents and other kinds do not count: an import that replaced the first half of a
     * segment leaves it half dead), each a list of {leaf ordinal, first doc, end doc} pieces in
     * document order.
     */
    private List<List<int[]>> partitions(Kind kind, int parallelism, int minPartition) throws IOException {
        String key = kind.id() + "/" + parallelism + "/" + minPartition;
        List<List<int[]>> cached = partitionCache.get(key);
        if (cached == null) {
            cached = computePartitions(kind, parallelism, minPartition);
            partitionCache.putIfAbsent(key, cached);
        }
        return cached;
    }

    private List<List<int[]>> computePartitions(Kind kind, int parallelism, int minPartition) throws IOException {
        List<LeafReaderContext> leaves = reader.leaves();
        Term t = new Term(Fields.KIND, kind.id());
        long[] live = new long[leaves.size()];
        long total = 0;
        for (int li = 0; li < leaves.size(); li++) {
            LeafReader lr = leaves.get(li).reader();
            Bits liveDocs = lr.getLiveDocs();
            if (liveDocs == null) {
                live[li] = lr.docFreq(t);
            } else {
                PostingsEnum pe = lr.postings(t, PostingsEnum.NONE);
                for (int d = pe == null ? DocIdSetIterator.NO_MORE_DOCS : pe.nextDoc(); d != DocIdSetIterator.NO_MORE_DOCS;
                     d = pe.nextDoc()) {
                    if (liveDocs.get(d)) {
                        live[li]++;
                    }
                }
            }
            total += live[li];
        }
        int n = (int) Math.max(1, Math.min(parallelism, total / minPartition));
        long size = Math.max(1, (total + n - 1) / n);
        List<List<int[]>> out = new ArrayList<>();
        List<int[]> current = new ArrayList<>();
        long room = size;
        for (int li = 0; li < leaves.size(); li++) {
            LeafReader lr = leaves.get(li).reader();
            int max = lr.maxDoc();
            if (live[li] == 0) {
                continue;
            }
            if (live[li] < room || out.size() == n - 1) {
                current.add(new int[] {li, 0, max});
                room -= live[li];
                continue;
            }
            // a cut falls in this segment: walk its parts of the kind to find where
            Bits liveDocs = lr.getLiveDocs();
            PostingsEnum pe = lr.postings(t, PostingsEnum.NONE);
            int from = 0;
            for (int d = pe.nextDoc(); d != DocIdSetIterator.NO_MORE_DOCS; d = pe.nextDoc()) {
                if (liveDocs != null && !liveDocs.get(d)) {
                    continue;
                }
                if (--room == 0 && out.size() < n - 1) {
                    current.add(new int[] {li, from, d + 1});
                    out.add(current);
                    current = new ArrayList<>();
                    room = size;
                    from = d + 1;
                }
            }
            if (from < max) {
                current.add(new int[] {li, from, max});
            }
        }
        if (!current.isEmpty() || out.isEmpty()) {
            out.add(current);
        }
        return List.copyOf(out);
    }

    private void scanPartition(Kind kind, Weight w, List<int[]> pieces, java.util.function.Consumer<RowCursor> sink)
            throws IOException {
        try {
            for (int[] part : pieces) {
                LeafReaderContext leaf = reader.leaves().get(part[0]);
                Scorer sc = w.scorer(leaf);
                if (sc == null) {
                    continue;
                }
                LeafReader lr = leaf.reader();
                Bits live = lr.getLiveDocs();
                LeafCursor cursor = new LeafCursor(kind, lr, columns, memos, part[0]);
                DocIdSetIterator it = sc.iterator();
                int end = part[2];
                for (int doc = it.advance(part[1]); doc < end; doc = it.nextDoc()) {
                    if (live != null && !live.get(doc)) {
                        continue;
                    }
                    cursor.doc = doc;
                    sink.accept(cursor);
                }
            }
        } catch (java.io.UncheckedIOException e) {
            throw e.getCause();
        }
    }

    /**
     * A cursor over one segment's doc values: each column's iterator is opened on first use and
     * moved forward to the current document only when the column is read; texts of columns with
     * few distinct values (maker, topology, lifecycle) are decoded once per segment.
     */
    private static final class LeafCursor implements RowCursor {
        private final Kind kind;
        private final LeafReader lr;
        private final List<Column> cols;
        private final Object[] dv;
        private final boolean[] opened;
        private final String[][] ordText;
        private final int[] readAt;
        private final long[] raw;
        private final boolean[] present;
        int doc = -1;
        /** The catalog's decoded columns (null: read doc values), and this segment's slot in them. */
        private final java.util.concurrent.ConcurrentHashMap<Long, Object> cache;
        private final long slot;
        private final Object[] decoded;
        private final java.util.concurrent.ConcurrentHashMap<List<Object>, Object[]> memos;
        private final int leaf;
        /** Objects kept per document for one {@link #memo} key (the last key asked for). */
        private Object memoKey;
        private Object[] memoSlots;
        /** Each column's unit (null: none), for {@link #si} without a schema lookup per value. */
        private final org.gatefit.catalog.Unit[] units;

        LeafCursor(Kind kind, LeafReader lr, java.util.concurrent.ConcurrentHashMap<Long, Object> cache,
                   java.util.concurrent.ConcurrentHashMap<List<Object>, Object[]> memos, int leaf) {
            this.memos = memos;
            this.leaf = leaf;
            this.kind = kind;
            this.lr = lr;
            this.cache = cache;
            this.slot = ((long) leaf << 32) | ((long) kind.ordinal() << 16);
            this.cols = Schema.of(kind).columns();
            int n = cols.size();
            this.dv = new Object[n];
            this.opened = new boolean[n];
            this.ordText = new String[n][];
            this.readAt = new int[n];
            java.util.Arrays.fill(readAt, -1);
            this.raw = new long[n];
            this.present = new boolean[n];
            this.decoded = new Object[n];
            this.units = new org.gatefit.catalog.Unit[n];
            for (int i = 0; i < n; i++) {
                units[i] = cols.get(i).unit();
            }
        }

        /** Column {@code i} of this segment decoded (built on first use, shared by every scan of the catalog). */
        private Object decoded(int i) {
            Object d = decoded[i];
            if (d == null) {
                d = cache.computeIfAbsent(slot | i, k -> decode(cols.get(i)));
                decoded[i] = d;
            }
            return d;
        }

        private Object decode(Column c) {
            int max = lr.maxDoc();
            try {
                switch (c.type()) {
                    case NUMBER, INTEGER -> {
                        double[] v = new double[max];
                        java.util.Arrays.fill(v, Double.NaN);
                        NumericDocValues nd = lr.getNumericDocValues(c.name());
                        if (nd != null) {
                            boolean number = c.type() == ColumnType.NUMBER;
                            for (int d = nd.nextDoc(); d != DocIdSetIterator.NO_MORE_DOCS; d = nd.nextDoc()) {
                                long x = nd.longValue();
                                v[d] = number ? Double.longBitsToDouble(x) : x;
                            }
                        }
                        return v;
                    }
                    case TEXT, CHOICE -> {
                        int[] ords = new int[max];
                        java.util.Arrays.fill(ords, -1);
                        SortedDocValues sd = c.wordsOnly() ? null : lr.getSortedDocValues(c.name());
                        String[] dict = new String[sd == null ? 0 : sd.getValueCount()];
                        if (sd != null) {
                            for (int d = sd.nextDoc(); d != DocIdSetIterator.NO_MORE_DOCS; d = sd.nextDoc()) {
                                ords[d] = sd.ordValue();
                            }
                            for (int o = 0; o < dict.length; o++) {
                                dict[o] = sd.lookupOrd(o).utf8ToString();
                            }
                        }
                        return new Object[] {ords, dict};
                    }
                }
            } catch (IOException e) {
                throw new java.io.UncheckedIOException(e);
            }
            throw new AssertionError(c.type());
        }

        @Override
        public Kind kind() {
            return kind;
        }

        private Object open(int i) {
            if (!opened[i]) {
                opened[i] = true;
                Column c = cols.get(i);
                try {
                    dv[i] = switch (c.type()) {
                        case NUMBER, INTEGER -> lr.getNumericDocValues(c.name());
                        case TEXT, CHOICE -> c.wordsOnly() ? null : lr.getSortedDocValues(c.name());
                    };
                } catch (IOException e) {
                    throw new java.io.UncheckedIOException(e);
                }
                if (dv[i] instanceof SortedDocValues sd && sd.getValueCount() <= ORD_CACHE_MAX) {
                    ordText[i] = new String[sd.getValueCount()];
                }
            }
            return dv[i];
        }

        /** Reads column {@code i} at the current document into {@code raw}/{@code present}. */
        private boolean read(int i) {
            if (readAt[i] == doc) {
                return present[i];
            }
            readAt[i] = doc;
            Object o = open(i);
            boolean has = false;
            try {
                if (o instanceof NumericDocValues nd) {
                    has = nd.advanceExact(doc); // documents only move forward; readAt stops a second read
                    if (has) {
                        raw[i] = nd.longValue();
                    }
                } else if (o instanceof SortedDocValues sd) {
                    has = sd.advanceExact(doc);
                    if (has) {
                        raw[i] = sd.ordValue();
                    }
                }
            } catch (IOException e) {
                throw new java.io.UncheckedIOException(e);
            }
            present[i] = has;
            return has;
        }

        @Override
        public <T> T memo(Class<T> key, java.util.function.Function<RowCursor, ? extends T> make) {
            if (memos == null) {
                return make.apply(this);
            }
            if (memoKey != key) {
                // One array per segment and key, shared by every scan of the catalog; partitions write
                // disjoint document ranges, and a later scan sees them after the executor hand-off.
                memoSlots = memos.computeIfAbsent(List.of(leaf, key), k -> new Object[lr.maxDoc()]);
                memoKey = key;
            }
            Object o = memoSlots[doc];
            if (o == null) {
                o = make.apply(this);
                memoSlots[doc] = o;
            }
            return key.cast(o);
        }

        @Override
        public double si(int column) {
            double v = number(column);
            if (Double.isNaN(v)) {
                return v;
            }
            org.gatefit.catalog.Unit u = units[column];
            return u == null ? v : u.toSi(v);
        }

        @Override
        public double number(int column) {
            if (cache != null) {
                return ((double[]) decoded(column))[doc];
            }
            if (!read(column)) {
                return Double.NaN;
            }
            return cols.get(column).type() == ColumnType.NUMBER ? Double.longBitsToDouble(raw[column]) : raw[column];
        }

        /** An INTEGER column as a boxed count, or null when unknown (what a {@link Row} holds). */
        Long integer(int column) {
            return read(column) ? raw[column] : null;
        }

        @Override
        public String text(int column) {
            if (cache != null) {
                Object[] d = (Object[]) decoded(column);
                int ord = ((int[]) d[0])[doc];
                return ord < 0 ? null : ((String[]) d[1])[ord];
            }
            if (!read(column)) {
                return null;
            }
            SortedDocValues sd = (SortedDocValues) dv[column];
            int ord = (int) raw[column];
            String[] cache = ordText[column];
            String text = cache == null ? null : cache[ord];
            if (text == null) {
                try {
                    text = sd.lookupOrd(ord).utf8ToString();
                } catch (IOException e) {
                    throw new java.io.UncheckedIOException(e);
                }
                if (cache != null) {
                    cache[ord] = text;
                }
            }
            return text;
        }
    }

    /** The import history, oldest first. */
    public List<ImportRecord> history() throws IOException {
        try {
            if (searcher == null) {
                return List.of();
            }
            List<ImportRecord> out = new ArrayList<>();
            TopDocs td = searcher.search(new TermQuery(new Term(Fields.KIND, Fields.IMPORT)), Math.max(1, reader.maxDoc()));
            StoredFields sf = searcher.storedFields();
            for (ScoreDoc sd : td.scoreDocs) {
                Document d = sf.document(sd.doc);
                out.add(new ImportRecord(d.get(Fields.SOURCE_FILE), d.get(Fields.IMPORT_SHA), d.get(Fields.IMPORT_KIND),
                        d.getField(Fields.IMPORT_ROWS).numericValue().longValue(),
                        Instant.ofEpochMilli(d.getField(Fields.IMPORT_TIME).numericValue().longValue()),
                        d.get(Fields.IMPORT_MODE)));
            }
            out.sort(Comparator.comparing(ImportRecord::time));
            return out;
        } catch (IOException e) {
            throw CatalogStorageException.reading(dir, e);
        }
    }

    @Override
    public void close() throws IOException {
        if (!closed.compareAndSet(false, true)) {
            return;
        }
        if (reader != null) {
            reader.decRef(); // closes the reader when the last handle ({@link #handle}) is closed
        }
        if (directory != null && (reader == null || reader.getRefCount() == 0)) {
            directory.close();
        }
    }
}
