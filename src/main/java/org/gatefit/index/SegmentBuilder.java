package org.gatefit.index;

import java.io.IOException;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.apache.lucene.analysis.Analyzer;
import org.apache.lucene.analysis.TokenStream;
import org.apache.lucene.analysis.tokenattributes.PositionIncrementAttribute;
import org.apache.lucene.analysis.tokenattributes.TermToBytesRefAttribute;
import org.apache.lucene.index.DocValuesType;
import org.apache.lucene.index.FieldInfo;
import org.apache.lucene.index.IndexOptions;
import org.apache.lucene.index.IndexWriter;
import org.apache.lucene.index.VectorEncoding;
import org.apache.lucene.index.VectorSimilarityFunction;
import org.apache.lucene.util.ArrayUtil;
import org.apache.lucene.util.BytesRef;
import org.apache.lucene.util.BytesRefHash;
import org.apache.lucene.util.FixedBitSet;
import org.apache.lucene.util.NumericUtils;
import org.apache.lucene.util.SmallFloat;
import org.apache.lucene.util.UnicodeUtil;
import org.gatefit.catalog.Column;
import org.gatefit.catalog.ColumnType;
import org.gatefit.catalog.Kind;
import org.gatefit.catalog.Row;
import org.gatefit.catalog.Schema;

/**
 * Collects the parts of one kind column by column and turns them into a {@link ColumnSegment}, an
 * in-memory segment that {@link IndexWriter#addIndexes(org.apache.lucene.index.CodecReader...)}
 * writes through the codec as it writes a merge. This is the import's write path: it skips Lucene's
 * per-document indexing chain (a field object, a hash lookup and a buffer per value), which cost
 * about two thirds of import time. The fields are those {@link Documents#toDocument} describes, value
 * for value ({@code SegmentBuilderTest} indexes the same rows both ways and compares every field).
 *
 * <p>A part can be withdrawn while its builder is open ({@link #withdraw}): a later row with the
 * same id in the same import replaces it, and the withdrawn document is not written.
 */
final class SegmentBuilder {
    /**
     * Longest term or sorted value Lucene accepts, in UTF-8 bytes ({@link IndexWriter#MAX_TERM_LENGTH}).
     * The reader refuses longer cells first ({@code Cells.MAX_TERM_BYTES}, the same figure); this is
     * the last guard for rows made elsewhere.
     */
    static final int MAX_TERM_BYTES = IndexWriter.MAX_TERM_LENGTH;

    private final Kind kind;
    private final int capacity;
    private final List<Column> columns;
    /** Per schema column: its values, or null for a words-only column (no field of its own). */
    private final ColumnValues[] values;
    /** Ids ({@link Fields#ID} terms) and each part's id in the hash. */
    private final BytesRefHash idTerms = new BytesRefHash();
    private int[] idOf;
    /** The words of {@link Fields#ALL}: term hash, (term, document, frequency) triples, norms. */
    private final BytesRefHash words = new BytesRefHash();
    private int[] pairTerm;
    private int[] pairDoc;
    private int[] pairFreq;
    private int pairs;
    private long[] norms;
    private final Tokens tokens;
    /** Texts seen before (makers, packages, descriptions), analyzed once; bounded. */
    private final Map<String, int[]> known = new HashMap<>();
    private int[] docTerms = new int[32];
    /** Stored records, one after the other: part {@code d}'s is {@code source[sourceStart[d] .. sourceStart[d + 1]]}. */
    private final Bytes source = new Bytes();
    /** The stored records' common start (layout version, kind, file) for {@link #headerFile}. */
    private byte[] header;
    private String headerFile;
    private int[] sourceStart;
    private FixedBitSet withdrawn;
    private int size;

    /** Texts kept as analyzed, at most. */
    private static final int KNOWN_TEXTS = 8192;

    /**
     * @param capacity the most parts it takes
     * @param analyzer the index's analyzer, for {@link Fields#ALL} (used from one thread at a time)
     */
    SegmentBuilder(Kind kind, int capacity, Analyzer analyzer) {
        if (kind == Kind.STAGE) {
            throw new IllegalArgumentException("expected switch or driver parts, got stages");
        }
        this.kind = kind;
        this.capacity = capacity;
        this.columns = Schema.of(kind).columns();
        this.values = new ColumnValues[columns.size()];
        for (int i = 0; i < columns.size(); i++) {
            Column c = columns.get(i);
            values[i] = switch (c.type()) {
                case NUMBER, INTEGER -> new Numbers(Math.min(capacity, INITIAL));
                case TEXT, CHOICE -> c.wordsOnly() ? null
                        : new Texts(c.name(), Math.min(capacity, INITIAL), !c.name().equals(PartNumberQuery.FIELD));
            };
        }
        int initial = Math.min(capacity, INITIAL);
        idOf = new int[initial];
        norms = new long[initial];
        pairTerm = new int[initial * 4];
        pairDoc = new int[initial * 4];
        pairFreq = new int[initial * 4];
        sourceStart = new int[initial + 1];
        withdrawn = new FixedBitSet(initial);
        tokens = new Tokens(analyzer, words);
    }

    /** Arrays start this long and grow as parts arrive (a small import allocates little). */
    private static final int INITIAL = 1024;

    private void ensureRoom() {
        if (size < idOf.length) {
            return;
        }
        int len = (int) Math.min(capacity, 2L * idOf.length); // doubling: each value copied about once
        idOf = Arrays.copyOf(idOf, len);
        norms = Arrays.copyOf(norms, len);
        sourceStart = Arrays.copyOf(sourceStart, len + 1);
        withdrawn = FixedBitSet.ensureCapacity(withdrawn, len);
        for (ColumnValues v : values) {
            if (v != null) {
                v.grow(len);
            }
        }
    }

    boolean full() {
        return size == capacity;
    }

    /**
     * Adds a part; returns its document number in this builder.
     *
     * @param id the row's {@link Fields#id}
     */
    int add(Row row, String id) {
        if (row.kind() != kind) {
            throw new IllegalArgumentException("expected a " + kind.id() + ", got a " + row.kind().id());
        }
        if (full()) {
            throw new IllegalStateException("segment builder full at " + capacity + " parts");
        }
        ensureRoom();
        int doc = size;
        checkTerm(Fields.ID, id);
        int idInHash = idTerms.add(new BytesRef(id));
        idOf[doc] = idInHash < 0 ? -idInHash - 1 : idInHash; // a withdrawn part shares its id with its successor
        int count = 0;
        for (int at = 0; at < columns.size(); at++) {
            Object x = row.valueAt(at);
            if (x == null) {
                continue;
            }
            Column c = columns.get(at);
            ColumnValues v = values[at];
            switch (c.type()) {
                case NUMBER -> ((Numbers) v).set(doc, Double.doubleToRawLongBits((Double) x),
                        NumericUtils.doubleToSortableLong((Double) x));
                case INTEGER -> ((Numbers) v).set(doc, (Long) x, (Long) x);
                case TEXT, CHOICE -> {
                    String s = (String) x;
                    if (v != null) {
                        ((Texts) v).set(doc, s);
                    }
                    if (c.type() == ColumnType.TEXT) {
                        count = words(s, c.name().equals(PartNumberQuery.FIELD), count);
                    }
                }
            }
        }
        endWords(doc, count);
        try {
            if (row.file() != headerFile) { // a new file (the same string on every row of a file)
                headerFile = row.file();
                header = Documents.sourceHeader(row);
            }
            Documents.writeSource(row, source, header);
        } catch (IOException e) {
            throw new java.io.UncheckedIOException("in-memory output failed", e);
        }
        sourceStart[doc + 1] = source.length;
        size++;
        return doc;
    }

    /** Leaves out a part added earlier (a later row of the same import replaces it). */
    void withdraw(int doc) {
        if (doc < 0 || doc >= size) {
            throw new IllegalArgumentException("expected a document below " + size + ", got " + doc);
        }
        withdrawn.set(doc);
    }

    /**
     * The segment: term dictionaries sorted, postings and norms built, {@link Fields#ALL} analyzed
     * with {@code analyzer} (the index's analyzer; not thread-safe, one per calling thread).
     */
    ColumnSegment build() {
        List<FieldInfo> infos = new ArrayList<>();
        Map<String, ColumnSegment.Postings> postings = new HashMap<>();
        Map<String, ColumnSegment.Numeric> numerics = new HashMap<>();
        Map<String, ColumnSegment.Sorted> sorted = new HashMap<>();
        int n = size;

        int[] docs = new int[n];
        for (int d = 0; d < n; d++) {
            docs[d] = d;
        }
        infos.add(keyword(Fields.ID, infos.size(), false));
        postings.put(Fields.ID, ColumnSegment.Postings.of(idTerms, idOf, docs, null, n));
        infos.add(keyword(Fields.KIND, infos.size(), false));
        postings.put(Fields.KIND, ColumnSegment.Postings.everyDoc(new BytesRef(kind.id()), n));

        for (int i = 0; i < columns.size(); i++) {
            ColumnValues v = values[i];
            if (v == null || !v.any()) {
                continue;
            }
            String name = columns.get(i).name();
            if (v instanceof Numbers num) {
                infos.add(numeric(name, infos.size()));
                numerics.put(name, num.freeze());
            } else {
                Texts t = (Texts) v;
                infos.add(t.terms == null ? sortedOnly(name, infos.size()) : keyword(name, infos.size(), true));
                sorted.put(name, t.sortedValues());
                if (t.terms != null) {
                    postings.put(name, t.postings());
                }
            }
        }
        infos.add(storedOnly(Fields.SOURCE, infos.size()));
        infos.add(text(Fields.ALL, infos.size()));
        postings.put(Fields.ALL, ColumnSegment.Postings.of(words, pairTerm, pairDoc, pairFreq, pairs));
        FixedBitSet live = null;
        if (withdrawn.cardinality() > 0) {
            live = new FixedBitSet(n);
            live.set(0, n);
            for (int d = withdrawn.nextSetBit(0); d < n; d = d + 1 < n ? withdrawn.nextSetBit(d + 1) : Integer.MAX_VALUE) {
                live.clear(d);
            }
        }
        return new ColumnSegment(n, infos, postings, numerics, sorted, Fields.ALL, norms,
                Fields.SOURCE, source.bytes, sourceStart, live);
    }

    /**
     * Adds the words of one text of the current part to {@link #docTerms} after {@code count};
     * returns the new count. Tokens never span the space Documents puts between the texts, so the
     * words of their concatenation are the words of each text in turn: a text that recurs (a maker,
     * a package, a description) is analyzed once. Part numbers are unique: not kept.
     */
    private int words(String text, boolean unique, int count) {
        int[] ids = unique ? null : known.get(text);
        if (ids == null) {
            ids = tokens.of(text);
            if (!unique && known.size() < KNOWN_TEXTS) {
                known.put(text, ids);
            }
        }
        if (count + ids.length > docTerms.length) {
            docTerms = ArrayUtil.grow(docTerms, count + ids.length);
        }
        System.arraycopy(ids, 0, docTerms, count, ids.length);
        return count + ids.length;
    }

    /** The current part's words as (term, document, frequency) triples, and its norm. */
    private void endWords(int doc, int count) {
        // Lucene's BM25 norm (IndexingChain, BM25Similarity.computeNorm): the number of tokens in
        // SmallFloat's byte (StandardAnalyzer never stacks tokens); 0 for a field without tokens.
        norms[doc] = count == 0 ? 0 : SmallFloat.intToByte4(count);
        Arrays.sort(docTerms, 0, count);
        for (int k = 0; k < count; ) {
            int id = docTerms[k];
            int f = 0;
            while (k < count && docTerms[k] == id) {
                f++;
                k++;
            }
            if (pairs == pairTerm.length) {
                int cap = 2 * pairs;
                pairTerm = Arrays.copyOf(pairTerm, cap);
                pairFreq = Arrays.copyOf(pairFreq, cap);
                pairDoc = Arrays.copyOf(pairDoc, cap);
            }
            pairTerm[pairs] = id;
            pairFreq[pairs] = f;
            pairDoc[pairs] = doc;
            pairs++;
        }
    }

    /** A growable byte array written as a Lucene {@link org.apache.lucene.store.DataOutput} (the stored records). */
    private static final class Bytes extends org.apache.lucene.store.DataOutput {
        byte[] bytes = new byte[1 << 16];
        int length;

        private byte[] utf8 = new byte[256];

        private void room(int n) {
            if (length + n > bytes.length) {
                bytes = Arrays.copyOf(bytes, Math.max(length + n, 2 * bytes.length));
            }
        }

        @Override
        public void writeByte(byte b) {
            room(1);
            bytes[length++] = b;
        }

        @Override
        public void writeBytes(byte[] b, int offset, int n) {
            room(n);
            System.arraycopy(b, offset, bytes, length, n);
            length += n;
        }

        /** As {@link org.apache.lucene.store.DataOutput#writeString} (length, then UTF-8), without a BytesRef per string. */
        @Override
        public void writeString(String s) throws IOException {
            int max = UnicodeUtil.maxUTF8Length(s.length());
            if (max > utf8.length) {
                utf8 = new byte[Math.max(max, 2 * utf8.length)];
            }
            int n = UnicodeUtil.UTF16toUTF8(s, 0, s.length(), utf8);
            writeVInt(n);
            writeBytes(utf8, 0, n);
        }
    }

    /** Analyzes one text into term ids of a hash. */
    private static final class Tokens {
        private final Analyzer analyzer;
        private final BytesRefHash terms;
        private int[] scratch = new int[16];

        Tokens(Analyzer analyzer, BytesRefHash terms) {
            this.analyzer = analyzer;
            this.terms = terms;
        }

        int[] of(String text) {
            int count = 0;
            try (TokenStream ts = analyzer.tokenStream(Fields.ALL, text)) {
                TermToBytesRefAttribute term = ts.getAttribute(TermToBytesRefAttribute.class);
                PositionIncrementAttribute pos = ts.getAttribute(PositionIncrementAttribute.class);
                ts.reset();
                while (ts.incrementToken()) {
                    if (pos.getPositionIncrement() == 0) {
                        throw new IllegalStateException("expected an analyzer that never stacks tokens");
                    }
                    BytesRef b = term.getBytesRef();
                    if (b.length > MAX_TERM_BYTES) {
                        throw immense(Fields.ALL, b.length);
                    }
                    int id = terms.add(b);
                    if (count == scratch.length) {
                        scratch = ArrayUtil.grow(scratch, count + 1);
                    }
                    scratch[count++] = id < 0 ? -id - 1 : id;
                }
                ts.end();
            } catch (IOException e) {
                throw new java.io.UncheckedIOException("analyzing text in memory failed", e);
            }
            return Arrays.copyOf(scratch, count);
        }
    }

    private static void checkTerm(String field, String s) {
        // UTF-8 takes at most three bytes per UTF-16 char; only a long string needs counting.
        if (s.length() * 3 > MAX_TERM_BYTES) {
            int bytes = new BytesRef(s).length;
            if (bytes > MAX_TERM_BYTES) {
                throw immense(field, bytes);
            }
        }
    }

    private static IllegalArgumentException immense(String field, int bytes) {
        return new IllegalArgumentException("the value of " + field + " is " + bytes + " bytes long in UTF-8;"
                + " the catalog takes at most " + MAX_TERM_BYTES);
    }

    private abstract static class ColumnValues {
        abstract boolean any();

        abstract void grow(int length);
    }

    /** A NUMBER or INTEGER column: point (sortable long) and numeric doc value of each part that has one. */
    private static final class Numbers extends ColumnValues {
        long[] docValue;
        long[] sortable;
        FixedBitSet has;
        int count;

        Numbers(int capacity) {
            docValue = new long[capacity];
            sortable = new long[capacity];
            has = new FixedBitSet(capacity);
        }

        @Override
        void grow(int length) {
            docValue = Arrays.copyOf(docValue, length);
            sortable = Arrays.copyOf(sortable, length);
            has = FixedBitSet.ensureCapacity(has, length);
        }

        void set(int doc, long dv, long point) {
            docValue[doc] = dv;
            sortable[doc] = point;
            has.set(doc);
            count++;
        }

        @Override
        boolean any() {
            return count > 0;
        }

        ColumnSegment.Numeric freeze() {
            return new ColumnSegment.Numeric(docValue, sortable, has, count);
        }
    }

    /**
     * A TEXT or CHOICE column: the sorted doc value (text as written) and, unless it is the part
     * number, a keyword term in lower case. Repeated texts (makers, packages, choices) are looked up
     * once each.
     */
    private static final class Texts extends ColumnValues {
        final String name;
        final BytesRefHash values = new BytesRefHash();
        final BytesRefHash terms;
        int[] valueOf;
        int[] termOf;
        final Map<String, int[]> seen;
        int count;

        Texts(String name, int capacity, boolean keyword) {
            this.name = name;
            valueOf = new int[capacity];
            Arrays.fill(valueOf, -1);
            terms = keyword ? new BytesRefHash() : null;
            termOf = keyword ? new int[capacity] : null;
            seen = keyword ? new HashMap<>() : null;
        }

        void set(int doc, String s) {
            if (terms == null) { // the part number: unique, nothing to share
                checkTerm(name, s);
                valueOf[doc] = id(values.add(new BytesRef(s)));
            } else {
                int[] ids = seen.get(s);
                if (ids == null) {
                    checkTerm(name, s);
                    ids = new int[] {id(values.add(new BytesRef(s))), id(terms.add(new BytesRef(s.toLowerCase(Locale.ROOT))))};
                    seen.put(s, ids);
                }
                valueOf[doc] = ids[0];
                termOf[doc] = ids[1];
            }
            count++;
        }

        @Override
        void grow(int length) {
            int from = valueOf.length;
            valueOf = Arrays.copyOf(valueOf, length);
            Arrays.fill(valueOf, from, length, -1);
            if (termOf != null) {
                termOf = Arrays.copyOf(termOf, length);
            }
        }

        private static int id(int added) {
            return added < 0 ? -added - 1 : added;
        }

        @Override
        boolean any() {
            return count > 0;
        }

        ColumnSegment.Sorted sortedValues() {
            return ColumnSegment.Sorted.of(values, valueOf, count);
        }

        ColumnSegment.Postings postings() {
            int n = valueOf.length;
            int[] pairTerm = new int[count];
            int[] pairDoc = new int[count];
            int k = 0;
            for (int d = 0; d < n && k < count; d++) {
                if (valueOf[d] >= 0) {
                    pairTerm[k] = termOf[d];
                    pairDoc[k] = d;
                    k++;
                }
            }
            return ColumnSegment.Postings.of(terms, pairTerm, pairDoc, null, count);
        }
    }

    // Field infos as IndexWriter records them for Documents' field types (held equal by SegmentBuilderTest).

    private static FieldInfo keyword(String name, int number, boolean sortedDocValue) {
        return info(name, number, true, IndexOptions.DOCS, sortedDocValue ? DocValuesType.SORTED : DocValuesType.NONE, 0, 0);
    }

    private static FieldInfo sortedOnly(String name, int number) {
        return info(name, number, false, IndexOptions.NONE, DocValuesType.SORTED, 0, 0);
    }

    private static FieldInfo numeric(String name, int number) {
        return info(name, number, false, IndexOptions.NONE, DocValuesType.NUMERIC, 1, Long.BYTES);
    }

    private static FieldInfo storedOnly(String name, int number) {
        return info(name, number, false, IndexOptions.NONE, DocValuesType.NONE, 0, 0);
    }

    private static FieldInfo text(String name, int number) {
        return info(name, number, false, IndexOptions.DOCS_AND_FREQS, DocValuesType.NONE, 0, 0);
    }

    private static FieldInfo info(String name, int number, boolean omitNorms, IndexOptions index, DocValuesType dv,
                                  int pointDims, int pointBytes) {
        return new FieldInfo(name, number, false, omitNorms, false, index, dv, -1, new HashMap<>(),
                pointDims, pointDims, pointBytes, 0, VectorEncoding.FLOAT32, VectorSimilarityFunction.EUCLIDEAN,
                false, false);
    }
}
