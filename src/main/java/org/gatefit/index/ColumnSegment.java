package org.gatefit.index;

import java.io.IOException;
import java.util.List;
import java.util.Map;
import org.apache.lucene.index.BaseTermsEnum;
import org.apache.lucene.index.BinaryDocValues;
import org.apache.lucene.index.ByteVectorValues;
import org.apache.lucene.index.FieldInfo;
import org.apache.lucene.index.FieldInfos;
import org.apache.lucene.index.FloatVectorValues;
import org.apache.lucene.index.ImpactsEnum;
import org.apache.lucene.index.LeafMetaData;
import org.apache.lucene.index.LeafReader;
import org.apache.lucene.index.NumericDocValues;
import org.apache.lucene.index.PointValues;
import org.apache.lucene.index.PostingsEnum;
import org.apache.lucene.index.SlowImpactsEnum;
import org.apache.lucene.index.SortedDocValues;
import org.apache.lucene.index.SortedNumericDocValues;
import org.apache.lucene.index.SortedSetDocValues;
import org.apache.lucene.index.StoredFieldVisitor;
import org.apache.lucene.index.StoredFields;
import org.apache.lucene.index.TermVectors;
import org.apache.lucene.index.Terms;
import org.apache.lucene.index.TermsEnum;
import org.apache.lucene.search.DocIdSetIterator;
import org.apache.lucene.search.KnnCollector;
import org.apache.lucene.util.Bits;
import org.apache.lucene.util.BytesRef;
import org.apache.lucene.util.BytesRefHash;
import org.apache.lucene.util.FixedBitSet;
import org.apache.lucene.util.NumericUtils;
import org.apache.lucene.util.Version;

/**
 * A segment held in memory as columns (built by {@link SegmentBuilder}): keyword and word postings,
 * numeric and sorted doc values, one-dimensional points, norms of one text field and one stored
 * binary field. Read through {@link org.apache.lucene.index.SlowCodecReaderWrapper} by
 * {@code IndexWriter.addIndexes}, which writes it with the index's codec. It is read once, from one
 * thread; it serves nothing else (no vectors, no term vectors, no positions).
 */
final class ColumnSegment extends LeafReader {
    private final int maxDoc;
    private final FieldInfos infos;
    private final Map<String, Postings> postings;
    private final Map<String, Numeric> numerics;
    private final Map<String, Sorted> sorted;
    private final String normsField;
    private final long[] norms;
    private final String storedField;
    private final byte[] stored;
    private final int[] storedStart;
    private final FixedBitSet live;
    private final int numDocs;

    ColumnSegment(int maxDoc, List<FieldInfo> infos, Map<String, Postings> postings, Map<String, Numeric> numerics,
                  Map<String, Sorted> sorted, String normsField, long[] norms, String storedField, byte[] stored,
                  int[] storedStart, FixedBitSet live) {
        this.maxDoc = maxDoc;
        this.infos = new FieldInfos(infos.toArray(new FieldInfo[0]));
        this.postings = Map.copyOf(postings);
        this.numerics = Map.copyOf(numerics);
        this.sorted = Map.copyOf(sorted);
        this.normsField = normsField;
        this.norms = norms;
        this.storedField = storedField;
        this.stored = stored;
        this.storedStart = storedStart;
        this.live = live;
        this.numDocs = live == null ? maxDoc : live.cardinality();
    }

    // ---- the columns ------------------------------------------------------------------------

    /** Terms in byte order, each with its documents (ascending) and, for a text field, frequencies. */
    static final class Postings {
        final BytesRef[] terms;
        /** Documents of term {@code t}: {@code docs[start[t]] .. docs[start[t + 1] - 1]}. */
        final int[] start;
        final int[] docs;
        final int[] freqs;
        final int docCount;

        private Postings(BytesRef[] terms, int[] start, int[] docs, int[] freqs, int docCount) {
            this.terms = terms;
            this.start = start;
            this.docs = docs;
            this.freqs = freqs;
            this.docCount = docCount;
        }

        /**
         * From (term id of {@code hash}, document, frequency) pairs in document order.
         *
         * @param freqs frequencies, or null for a keyword field (documents only)
         */
        static Postings of(BytesRefHash hash, int[] pairTerm, int[] pairDoc, int[] freqs, int pairs) {
            int terms = hash.size();
            BytesRef[] bytes = new BytesRef[terms];
            int[] sortedIds = hash.sort(); // term ids in byte order (the hash is read-only afterwards)
            int[] ordOf = new int[terms];
            for (int ord = 0; ord < terms; ord++) {
                ordOf[sortedIds[ord]] = ord;
                bytes[ord] = BytesRef.deepCopyOf(hash.get(sortedIds[ord], new BytesRef()));
            }
            int[] start = new int[terms + 1];
            for (int p = 0; p < pairs; p++) {
                start[ordOf[pairTerm[p]] + 1]++;
            }
            for (int t = 0; t < terms; t++) {
                start[t + 1] += start[t];
            }
            int[] fill = java.util.Arrays.copyOf(start, terms);
            int[] docs = new int[pairs];
            int[] f = freqs == null ? null : new int[pairs];
            int docCount = 0;
            int lastDoc = -1;
            for (int p = 0; p < pairs; p++) {
                int at = fill[ordOf[pairTerm[p]]]++;
                docs[at] = pairDoc[p];
                if (f != null) {
                    f[at] = freqs[p];
                }
                if (pairDoc[p] != lastDoc) {
                    docCount++;
                    lastDoc = pairDoc[p];
                }
            }
            return new Postings(bytes, start, docs, f, docCount);
        }

        /** One term that every document has. */
        static Postings everyDoc(BytesRef term, int maxDoc) {
            int[] docs = new int[maxDoc];
            for (int d = 0; d < maxDoc; d++) {
                docs[d] = d;
            }
            return new Postings(new BytesRef[] {term}, new int[] {0, maxDoc}, docs, null, maxDoc);
        }

        long sumDocFreq() {
            return docs.length;
        }

        long sumTotalTermFreq() {
            if (freqs == null) {
                return docs.length;
            }
            long s = 0;
            for (int f : freqs) {
                s += f;
            }
            return s;
        }
    }

    /** A numeric doc value and a one-dimensional 8-byte point per document that has a value. */
    record Numeric(long[] docValue, long[] sortable, FixedBitSet has, int count) {
    }

    /** Sorted doc values: per document an ordinal into values in byte order, -1 for none. */
    static final class Sorted {
        final BytesRef[] values;
        final int[] ordOf;
        final int count;

        private Sorted(BytesRef[] values, int[] ordOf, int count) {
            this.values = values;
            this.ordOf = ordOf;
            this.count = count;
        }

        /** @param valueOf per document, the value's id in {@code hash}, -1 for none */
        static Sorted of(BytesRefHash hash, int[] valueOf, int count) {
            int n = hash.size();
            int[] sortedIds = hash.sort();
            int[] ordOfId = new int[n];
            BytesRef[] values = new BytesRef[n];
            for (int ord = 0; ord < n; ord++) {
                ordOfId[sortedIds[ord]] = ord;
                values[ord] = BytesRef.deepCopyOf(hash.get(sortedIds[ord], new BytesRef()));
            }
            int[] ords = new int[valueOf.length];
            for (int d = 0; d < valueOf.length; d++) {
                ords[d] = valueOf[d] < 0 ? -1 : ordOfId[valueOf[d]];
            }
            return new Sorted(values, ords, count);
        }
    }

    // ---- LeafReader -------------------------------------------------------------------------

    @Override
    public Terms terms(String field) {
        Postings p = postings.get(field);
        return p == null ? null : new ColumnTerms(p);
    }

    @Override
    public NumericDocValues getNumericDocValues(String field) {
        Numeric n = numerics.get(field);
        if (n == null) {
            return null;
        }
        return new NumericDocValues() {
            private final BitsIterator it = new BitsIterator(n.has(), maxDoc, n.count());

            @Override
            public long longValue() {
                return n.docValue()[it.doc];
            }

            @Override
            public boolean advanceExact(int target) {
                return it.advanceExact(target);
            }

            @Override
            public int docID() {
                return it.doc;
            }

            @Override
            public int nextDoc() {
                return it.nextDoc();
            }

            @Override
            public int advance(int target) {
                return it.advance(target);
            }

            @Override
            public long cost() {
                return n.count();
            }
        };
    }

    @Override
    public SortedDocValues getSortedDocValues(String field) {
        Sorted s = sorted.get(field);
        if (s == null) {
            return null;
        }
        return new SortedDocValues() {
            private int doc = -1;

            @Override
            public int ordValue() {
                return s.ordOf[doc];
            }

            @Override
            public BytesRef lookupOrd(int ord) {
                return s.values[ord];
            }

            @Override
            public int getValueCount() {
                return s.values.length;
            }

            @Override
            public boolean advanceExact(int target) {
                doc = target;
                return s.ordOf[target] >= 0;
            }

            @Override
            public int docID() {
                return doc;
            }

            @Override
            public int nextDoc() {
                return advance(doc + 1);
            }

            @Override
            public int advance(int target) {
                for (int d = target; d < maxDoc; d++) {
                    if (s.ordOf[d] >= 0) {
                        return doc = d;
                    }
                }
                return doc = NO_MORE_DOCS;
            }

            @Override
            public long cost() {
                return s.count;
            }
        };
    }

    @Override
    public NumericDocValues getNormValues(String field) {
        if (!field.equals(normsField)) {
            return null;
        }
        return new NumericDocValues() {
            private int doc = -1;

            @Override
            public long longValue() {
                return norms[doc];
            }

            @Override
            public boolean advanceExact(int target) {
                doc = target;
                return true;
            }

            @Override
            public int docID() {
                return doc;
            }

            @Override
            public int nextDoc() {
                return advance(doc + 1);
            }

            @Override
            public int advance(int target) {
                return doc = target < maxDoc ? target : NO_MORE_DOCS;
            }

            @Override
            public long cost() {
                return maxDoc;
            }
        };
    }

    @Override
    public PointValues getPointValues(String field) {
        Numeric n = numerics.get(field);
        return n == null ? null : new ColumnPoints(n, maxDoc);
    }

    @Override
    public StoredFields storedFields() {
        FieldInfo fi = infos.fieldInfo(storedField);
        return new StoredFields() {
            @Override
            public void document(int docID, StoredFieldVisitor visitor) throws IOException {
                if (visitor.needsField(fi) == StoredFieldVisitor.Status.YES) {
                    visitor.binaryField(fi, java.util.Arrays.copyOfRange(stored, storedStart[docID], storedStart[docID + 1]));
                }
            }
        };
    }

    @Override
    @SuppressWarnings("deprecation") // Lucene 9 still declares it abstract; it delegates to storedFields()
    public void document(int docID, StoredFieldVisitor visitor) throws IOException {
        storedFields().document(docID, visitor);
    }

    @Override
    public FieldInfos getFieldInfos() {
        return infos;
    }

    @Override
    public Bits getLiveDocs() {
        return live;
    }

    @Override
    public int numDocs() {
        return numDocs;
    }

    @Override
    public int maxDoc() {
        return maxDoc;
    }

    @Override
    public LeafMetaData getMetaData() {
        return new LeafMetaData(Version.LATEST.major, Version.LATEST, null, false);
    }

    @Override
    public BinaryDocValues getBinaryDocValues(String field) {
        return null;
    }

    @Override
    public SortedNumericDocValues getSortedNumericDocValues(String field) {
        return null;
    }

    @Override
    public SortedSetDocValues getSortedSetDocValues(String field) {
        return null;
    }

    @Override
    public FloatVectorValues getFloatVectorValues(String field) {
        return null;
    }

    @Override
    public ByteVectorValues getByteVectorValues(String field) {
        return null;
    }

    @Override
    public void searchNearestVectors(String field, float[] target, KnnCollector knnCollector, Bits acceptDocs) {
        throw new UnsupportedOperationException("a column segment holds no vectors");
    }

    @Override
    public void searchNearestVectors(String field, byte[] target, KnnCollector knnCollector, Bits acceptDocs) {
        throw new UnsupportedOperationException("a column segment holds no vectors");
    }

    @Override
    @SuppressWarnings("deprecation") // Lucene 9 still declares it abstract
    public org.apache.lucene.index.Fields getTermVectors(int docID) {
        return null;
    }

    @Override
    public TermVectors termVectors() {
        return new TermVectors() {
            @Override
            public org.apache.lucene.index.Fields get(int doc) {
                return null;
            }
        };
    }

    @Override
    public void checkIntegrity() {
        // built in memory: nothing to verify
    }

    @Override
    public CacheHelper getCoreCacheHelper() {
        return null;
    }

    @Override
    public CacheHelper getReaderCacheHelper() {
        return null;
    }

    @Override
    protected void doClose() {
    }

    // ---- iterators --------------------------------------------------------------------------

    /** Documents of a bit set in order. */
    private static final class BitsIterator {
        final FixedBitSet bits;
        final int maxDoc;
        /** Every document has a value (the usual case): no bit to look up. */
        final boolean dense;
        int doc = -1;

        BitsIterator(FixedBitSet bits, int maxDoc, int count) {
            this.bits = bits;
            this.maxDoc = maxDoc;
            this.dense = count == maxDoc;
        }

        int nextDoc() {
            return advance(doc + 1);
        }

        int advance(int target) {
            if (target >= maxDoc) {
                return doc = DocIdSetIterator.NO_MORE_DOCS;
            }
            if (dense) {
                return doc = target;
            }
            int d = bits.nextSetBit(target);
            return doc = d >= maxDoc ? DocIdSetIterator.NO_MORE_DOCS : d;
        }

        boolean advanceExact(int target) {
            doc = target;
            return bits.get(target);
        }
    }

    private static final class ColumnTerms extends Terms {
        private final Postings p;

        ColumnTerms(Postings p) {
            this.p = p;
        }

        @Override
        public TermsEnum iterator() {
            return new ColumnTermsEnum(p);
        }

        @Override
        public long size() {
            return p.terms.length;
        }

        @Override
        public long getSumTotalTermFreq() {
            return p.sumTotalTermFreq();
        }

        @Override
        public long getSumDocFreq() {
            return p.sumDocFreq();
        }

        @Override
        public int getDocCount() {
            return p.docCount;
        }

        @Override
        public boolean hasFreqs() {
            return p.freqs != null;
        }

        @Override
        public boolean hasOffsets() {
            return false;
        }

        @Override
        public boolean hasPositions() {
            return false;
        }

        @Override
        public boolean hasPayloads() {
            return false;
        }
    }

    private static final class ColumnTermsEnum extends BaseTermsEnum {
        private final Postings p;
        private int ord = -1;

        ColumnTermsEnum(Postings p) {
            this.p = p;
        }

        @Override
        public BytesRef next() {
            if (ord + 1 >= p.terms.length) {
                ord = p.terms.length;
                return null;
            }
            return p.terms[++ord];
        }

        @Override
        public SeekStatus seekCeil(BytesRef text) {
            int lo = 0;
            int hi = p.terms.length - 1;
            while (lo <= hi) {
                int mid = (lo + hi) >>> 1;
                int c = p.terms[mid].compareTo(text);
                if (c < 0) {
                    lo = mid + 1;
                } else if (c > 0) {
                    hi = mid - 1;
                } else {
                    ord = mid;
                    return SeekStatus.FOUND;
                }
            }
            ord = lo;
            return lo == p.terms.length ? SeekStatus.END : SeekStatus.NOT_FOUND;
        }

        @Override
        public void seekExact(long ord) {
            this.ord = (int) ord;
        }

        @Override
        public BytesRef term() {
            return p.terms[ord];
        }

        @Override
        public long ord() {
            return ord;
        }

        @Override
        public int docFreq() {
            return p.start[ord + 1] - p.start[ord];
        }

        @Override
        public long totalTermFreq() {
            if (p.freqs == null) {
                return docFreq();
            }
            long s = 0;
            for (int i = p.start[ord]; i < p.start[ord + 1]; i++) {
                s += p.freqs[i];
            }
            return s;
        }

        @Override
        public PostingsEnum postings(PostingsEnum reuse, int flags) {
            ColumnPostingsEnum e = reuse instanceof ColumnPostingsEnum c && c.p == p ? c : new ColumnPostingsEnum(p);
            e.reset(p.start[ord], p.start[ord + 1]);
            return e;
        }

        @Override
        public ImpactsEnum impacts(int flags) {
            return new SlowImpactsEnum(postings(null, flags));
        }
    }

    private static final class ColumnPostingsEnum extends PostingsEnum {
        final Postings p;
        private int at;
        private int end;
        private int doc = -1;

        ColumnPostingsEnum(Postings p) {
            this.p = p;
        }

        void reset(int from, int to) {
            at = from - 1;
            end = to;
            doc = -1;
        }

        @Override
        public int freq() {
            return p.freqs == null ? 1 : p.freqs[at];
        }

        @Override
        public int nextPosition() {
            return -1;
        }

        @Override
        public int startOffset() {
            return -1;
        }

        @Override
        public int endOffset() {
            return -1;
        }

        @Override
        public BytesRef getPayload() {
            return null;
        }

        @Override
        public int docID() {
            return doc;
        }

        @Override
        public int nextDoc() {
            return doc = ++at < end ? p.docs[at] : NO_MORE_DOCS;
        }

        @Override
        public int advance(int target) {
            int d;
            while ((d = nextDoc()) < target) {
                // linear: the merge reads every document
            }
            return d;
        }

        @Override
        public long cost() {
            return end - at;
        }
    }

    /** One-dimensional points of 8 bytes (a sortable long), as every number column indexes them. */
    abstract static class LongPoints extends PointValues {
        @Override
        public final int getNumDimensions() {
            return 1;
        }

        @Override
        public final int getNumIndexDimensions() {
            return 1;
        }

        @Override
        public final int getBytesPerDimension() {
            return Long.BYTES;
        }
    }

    /** All points of a column as one leaf (the merge visits them all; the codec builds the tree). */
    static final class ColumnPoints extends LongPoints {
        private final Numeric n;
        private final int maxDoc;
        private final byte[] min = new byte[Long.BYTES];
        private final byte[] max = new byte[Long.BYTES];

        private boolean bounds;

        ColumnPoints(Numeric n, int maxDoc) {
            this.n = n;
            this.maxDoc = maxDoc;
        }

        /** Least and greatest value, found when first asked (a merge through ColumnCodec never asks). */
        private void bounds() {
            if (bounds) {
                return;
            }
            long lo = Long.MAX_VALUE;
            long hi = Long.MIN_VALUE;
            for (int d = n.has().nextSetBit(0); d < maxDoc; d = d + 1 < maxDoc ? n.has().nextSetBit(d + 1) : maxDoc) {
                lo = Math.min(lo, n.sortable()[d]);
                hi = Math.max(hi, n.sortable()[d]);
            }
            NumericUtils.longToSortableBytes(lo, min, 0);
            NumericUtils.longToSortableBytes(hi, max, 0);
            bounds = true;
        }

        /**
         * Copies the live points, renumbered by {@code map}, to {@code docs} and {@code packed} (8 sortable
         * bytes each) from position {@code at}; returns the position after the last.
         */
        int copyTo(org.apache.lucene.index.MergeState.DocMap map, int[] docs, byte[] packed, int at) {
            boolean dense = n.count() == maxDoc;
            for (int d = dense ? 0 : n.has().nextSetBit(0); d < maxDoc;
                 d = dense ? d + 1 : d + 1 < maxDoc ? n.has().nextSetBit(d + 1) : maxDoc) {
                int to = map.get(d);
                if (to >= 0) {
                    docs[at] = to;
                    NumericUtils.longToSortableBytes(n.sortable()[d], packed, at * Long.BYTES);
                    at++;
                }
            }
            return at;
        }

        @Override
        public PointTree getPointTree() {
            return new PointTree() {
                @Override
                public PointTree clone() {
                    return this;
                }

                @Override
                public boolean moveToChild() {
                    return false;
                }

                @Override
                public boolean moveToSibling() {
                    return false;
                }

                @Override
                public boolean moveToParent() {
                    return false;
                }

                @Override
                public byte[] getMinPackedValue() {
                    return ColumnPoints.this.getMinPackedValue();
                }

                @Override
                public byte[] getMaxPackedValue() {
                    return ColumnPoints.this.getMaxPackedValue();
                }

                @Override
                public long size() {
                    return ColumnPoints.this.size();
                }

                @Override
                public void visitDocIDs(IntersectVisitor visitor) throws IOException {
                    for (int d = n.has().nextSetBit(0); d < maxDoc; d = d + 1 < maxDoc ? n.has().nextSetBit(d + 1) : maxDoc) {
                        visitor.visit(d);
                    }
                }

                @Override
                public void visitDocValues(IntersectVisitor visitor) throws IOException {
                    byte[] packed = new byte[Long.BYTES];
                    for (int d = n.has().nextSetBit(0); d < maxDoc; d = d + 1 < maxDoc ? n.has().nextSetBit(d + 1) : maxDoc) {
                        NumericUtils.longToSortableBytes(n.sortable()[d], packed, 0);
                        visitor.visit(d, packed);
                    }
                }
            };
        }

        @Override
        public byte[] getMinPackedValue() {
            bounds();
            return min;
        }

        @Override
        public byte[] getMaxPackedValue() {
            bounds();
            return max;
        }

        @Override
        public long size() {
            return n.count();
        }

        @Override
        public int getDocCount() {
            return n.count();
        }
    }
}
