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

    private Catalog(Path dir, Directory directory, DirectoryReader reader) {
        this.dir = dir;
        this.directory = directory;
        this.reader = reader;
        this.searcher = reader == null ? null : new IndexSearcher(reader);
    }

    /** Opens the catalog in {@code dir}; a directory without an index gives an empty catalog. */
    public static Catalog open(Path dir) throws IOException {
        if (!Files.isDirectory(dir)) {
            return new Catalog(dir, null, null);
        }
        Directory d = FSDirectory.open(dir);
        try {
            if (!DirectoryReader.indexExists(d)) {
                d.close();
                return new Catalog(dir, null, null);
            }
            DirectoryReader r = DirectoryReader.open(d);
            try {
                checkFormat(dir, r.getIndexCommit().getUserData());
            } catch (IOException e) {
                r.close();
                throw e;
            }
            return new Catalog(dir, d, r);
        } catch (IndexNotFoundException e) {
            d.close();
            return new Catalog(dir, null, null);
        } catch (IOException | RuntimeException e) {
            d.close();
            throw e;
        }
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
        if (searcher == null) {
            return 0;
        }
        return searcher.count(new TermQuery(new Term(Fields.KIND, kind.id())));
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
                    return Optional.of(new Documents.LeafRows(leaf.reader()).row(doc));
                }
            }
        }
        return Optional.empty();
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

    /** Runs a query and loads the matching parts, in the order of {@code sort} (null: by score). */
    public List<Row> search(Query query, Sort sort, int limit) throws IOException {
        if (searcher == null || query instanceof MatchNoDocsQuery) {
            return List.of();
        }
        int n = Math.max(1, Math.min(limit, Math.max(1, reader.maxDoc())));
        TopDocs td = sort == null ? searcher.search(query, n) : searcher.search(query, n, sort);
        // Rows are read from doc values, whose iterators only go forward: read the hits in index
        // order, one segment after the other, and put each row back at its rank.
        ScoreDoc[] hits = td.scoreDocs;
        Integer[] byDoc = new Integer[hits.length];
        for (int i = 0; i < hits.length; i++) {
            byDoc[i] = i;
        }
        java.util.Arrays.sort(byDoc, Comparator.comparingInt(i -> hits[i].doc));
        Row[] rows = new Row[hits.length];
        List<LeafReaderContext> leaves = reader.leaves();
        Documents.LeafRows leafRows = null;
        int leafIndex = -1;
        for (int i : byDoc) {
            int doc = hits[i].doc;
            int li = ReaderUtil.subIndex(doc, leaves);
            if (li != leafIndex) {
                leafIndex = li;
                leafRows = new Documents.LeafRows(leaves.get(li).reader());
            }
            rows[i] = leafRows.row(doc - leaves.get(li).docBase);
        }
        return new ArrayList<>(java.util.Arrays.asList(rows));
    }

    /**
     * Streams the parts of a kind that match {@code filter}, built from doc values only (no
     * stored-field loads), for engines that evaluate every candidate. Extra columns and
     * words-only text (description) are not included; source file and line are left empty.
     */
    public long scan(Kind kind, Query filter, java.util.function.Consumer<Row> sink) throws IOException {
        if (searcher == null) {
            return 0;
        }
        BooleanQuery.Builder b = new BooleanQuery.Builder();
        b.add(new TermQuery(new Term(Fields.KIND, kind.id())), BooleanClause.Occur.FILTER);
        if (filter != null) {
            b.add(filter, BooleanClause.Occur.FILTER);
        }
        Weight w = searcher.createWeight(searcher.rewrite(b.build()), ScoreMode.COMPLETE_NO_SCORES, 1f);
        Schema schema = Schema.of(kind);
        List<Column> cols = schema.columns();
        long n = 0;
        for (LeafReaderContext leaf : reader.leaves()) {
            Scorer sc = w.scorer(leaf);
            if (sc == null) {
                continue;
            }
            LeafReader lr = leaf.reader();
            Object[] dv = new Object[cols.size()];
            // Text of each ord, decoded once per leaf: maker, package, topology, lifecycle and the
            // like repeat across most rows (unique columns such as part_number are decoded per row).
            String[][] ordText = new String[cols.size()][];
            for (int i = 0; i < cols.size(); i++) {
                Column c = cols.get(i);
                dv[i] = switch (c.type()) {
                    case NUMBER, INTEGER -> lr.getNumericDocValues(c.name());
                    case TEXT, CHOICE -> c.wordsOnly() ? null : lr.getSortedDocValues(c.name());
                };
            }
            for (int i = 0; i < cols.size(); i++) {
                if (dv[i] instanceof SortedDocValues sd && sd.getValueCount() <= ORD_CACHE_MAX) {
                    ordText[i] = new String[sd.getValueCount()];
                }
            }
            DocIdSetIterator it = sc.iterator();
            for (int doc = it.nextDoc(); doc != DocIdSetIterator.NO_MORE_DOCS; doc = it.nextDoc()) {
                LinkedHashMap<String, Object> values = new LinkedHashMap<>(cols.size() * 2); // no rehash per row
                for (int i = 0; i < cols.size(); i++) {
                    Column c = cols.get(i);
                    Object o = dv[i];
                    if (o instanceof NumericDocValues nd) {
                        if (nd.docID() < doc) {
                            nd.advance(doc);
                        }
                        if (nd.docID() == doc) {
                            long raw = nd.longValue();
                            values.put(c.name(), c.type() == ColumnType.NUMBER
                                    ? (Object) Double.longBitsToDouble(raw) : (Object) raw);
                        }
                    } else if (o instanceof SortedDocValues sd) {
                        if (sd.docID() < doc) {
                            sd.advance(doc);
                        }
                        if (sd.docID() == doc) {
                            int ord = sd.ordValue();
                            String[] cache = ordText[i];
                            String text = cache == null ? null : cache[ord];
                            if (text == null) {
                                text = sd.lookupOrd(ord).utf8ToString();
                                if (cache != null) {
                                    cache[ord] = text;
                                }
                            }
                            values.put(c.name(), text);
                        }
                    }
                }
                Object key = values.get(kind == Kind.STAGE ? "stage" : "part_number");
                if (key == null) {
                    continue;
                }
                sink.accept(new Row(kind, key.toString(), "", 0, Row.owned(values), Map.of()));
                n++;
            }
        }
        return n;
    }

    /** The import history, oldest first. */
    public List<ImportRecord> history() throws IOException {
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
    }

    @Override
    public void close() throws IOException {
        if (reader != null) {
            reader.close();
        }
        if (directory != null) {
            directory.close();
        }
    }
}
