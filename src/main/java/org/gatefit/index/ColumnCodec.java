package org.gatefit.index;

import java.io.IOException;
import org.apache.lucene.codecs.Codec;
import org.apache.lucene.codecs.FilterCodec;
import org.apache.lucene.codecs.MutablePointTree;
import org.apache.lucene.codecs.PointsFormat;
import org.apache.lucene.codecs.PointsReader;
import org.apache.lucene.codecs.PointsWriter;
import org.apache.lucene.codecs.lucene90.Lucene90PointsWriter;
import org.apache.lucene.index.FieldInfo;
import org.apache.lucene.index.MergeState;
import org.apache.lucene.index.PointValues;
import org.apache.lucene.index.SegmentReadState;
import org.apache.lucene.index.SegmentWriteState;
import org.apache.lucene.util.BytesRef;

/**
 * The catalog's writing codec: Lucene's default codec with one change on the write side. When the
 * segments being merged are {@link ColumnSegment}s (an import's parts, added with
 * {@code addIndexes}), their points are handed to Lucene's points writer as an in-memory sortable
 * tree, the path a flush takes, instead of the generic merge that rebuilds the tree point by point
 * (a third of import time). The files written are exactly the default codec's, and the codec
 * carries the default codec's name, so any Lucene 9.12 reader opens the catalog; reading goes
 * straight to the default formats.
 */
final class ColumnCodec extends FilterCodec {
    private final PointsFormat points;

    ColumnCodec() {
        this(Codec.getDefault());
    }

    private ColumnCodec(Codec base) {
        super(base.getName(), base);
        points = new ColumnPointsFormat(base.pointsFormat());
    }

    @Override
    public PointsFormat pointsFormat() {
        return points;
    }

    private static final class ColumnPointsFormat extends PointsFormat {
        private final PointsFormat base;

        ColumnPointsFormat(PointsFormat base) {
            this.base = base;
        }

        @Override
        public PointsWriter fieldsWriter(SegmentWriteState state) throws IOException {
            PointsWriter w = base.fieldsWriter(state);
            if (!(w instanceof Lucene90PointsWriter)) {
                return w; // another default codec: keep its own merge
            }
            return new PointsWriter() {
                @Override
                public void writeField(FieldInfo fieldInfo, PointsReader values) throws IOException {
                    w.writeField(fieldInfo, values);
                }

                @Override
                public void merge(MergeState mergeState) throws IOException {
                    if (!allColumns(mergeState)) {
                        w.merge(mergeState);
                        return;
                    }
                    for (FieldInfo fi : mergeState.mergeFieldInfos) {
                        if (fi.getPointDimensionCount() != 0) {
                            SortableTree tree = SortableTree.of(mergeState, fi.name);
                            w.writeField(fi, new PointsReader() {
                                @Override
                                public PointValues getValues(String field) {
                                    return tree.asValues();
                                }

                                @Override
                                public void checkIntegrity() {
                                }

                                @Override
                                public void close() {
                                }
                            });
                        }
                    }
                    w.finish();
                }

                @Override
                public void finish() throws IOException {
                    w.finish();
                }

                @Override
                public void close() throws IOException {
                    w.close();
                }
            };
        }

        @Override
        public PointsReader fieldsReader(SegmentReadState state) throws IOException {
            return base.fieldsReader(state);
        }

        /** Whether every segment being merged that has points is an in-memory column segment. */
        private static boolean allColumns(MergeState mergeState) throws IOException {
            for (int i = 0; i < mergeState.pointsReaders.length; i++) {
                PointsReader r = mergeState.pointsReaders[i];
                if (r == null) {
                    continue;
                }
                for (FieldInfo fi : mergeState.fieldInfos[i]) {
                    if (fi.getPointDimensionCount() != 0) {
                        PointValues v = r.getValues(fi.name);
                        if (v != null && !(v instanceof ColumnSegment.ColumnPoints)) {
                            return false;
                        }
                    }
                }
            }
            return true;
        }
    }

    /**
     * One field's 8-byte one-dimensional points of the merged segments, renumbered to the merged
     * documents (withdrawn ones left out), in the form Lucene's writer sorts in memory.
     */
    private static final class SortableTree extends MutablePointTree {
        private final int[] docs;
        /** Packed (sortable big-endian) values, {@link Long#BYTES} per point. */
        private final byte[] packed;
        private final int[] ords;
        private int[] temp;
        private final int size;

        private SortableTree(int[] docs, byte[] packed, int size) {
            this.docs = docs;
            this.packed = packed;
            this.size = size;
            ords = new int[size];
            for (int i = 0; i < size; i++) {
                ords[i] = i;
            }
        }

        static SortableTree of(MergeState mergeState, String field) throws IOException {
            long total = 0;
            for (int i = 0; i < mergeState.pointsReaders.length; i++) {
                PointValues v = values(mergeState, i, field);
                total += v == null ? 0 : v.size();
            }
            if (total > Integer.MAX_VALUE / Long.BYTES) {
                throw new IllegalStateException("too many points to sort in memory: " + total);
            }
            int[] docs = new int[(int) total];
            byte[] packed = new byte[(int) total * Long.BYTES];
            int n = 0;
            for (int i = 0; i < mergeState.pointsReaders.length; i++) {
                PointValues v = values(mergeState, i, field);
                if (v != null) {
                    n = ((ColumnSegment.ColumnPoints) v).copyTo(mergeState.docMaps[i], docs, packed, n);
                }
            }
            return new SortableTree(docs, packed, n);
        }

        private static PointValues values(MergeState mergeState, int i, String field) throws IOException {
            PointsReader r = mergeState.pointsReaders[i];
            FieldInfo fi = mergeState.fieldInfos[i].fieldInfo(field);
            return r == null || fi == null || fi.getPointDimensionCount() == 0 ? null : r.getValues(field);
        }

        PointValues asValues() {
            SortableTree tree = this;
            return new ColumnSegment.LongPoints() {
                @Override
                public PointTree getPointTree() {
                    return tree;
                }

                @Override
                public byte[] getMinPackedValue() {
                    throw new UnsupportedOperationException();
                }

                @Override
                public byte[] getMaxPackedValue() {
                    throw new UnsupportedOperationException();
                }

                @Override
                public long size() {
                    return size;
                }

                @Override
                public int getDocCount() {
                    return size; // one value per document
                }
            };
        }

        @Override
        public long size() {
            return size;
        }

        @Override
        public void visitDocValues(PointValues.IntersectVisitor visitor) throws IOException {
            byte[] b = new byte[Long.BYTES];
            for (int i = 0; i < size; i++) {
                System.arraycopy(packed, ords[i] * Long.BYTES, b, 0, Long.BYTES);
                visitor.visit(getDocID(i), b);
            }
        }

        @Override
        public void getValue(int i, BytesRef packedValue) {
            packedValue.bytes = packed;
            packedValue.offset = ords[i] * Long.BYTES;
            packedValue.length = Long.BYTES;
        }

        @Override
        public byte getByteAt(int i, int k) {
            return packed[ords[i] * Long.BYTES + k];
        }

        @Override
        public int getDocID(int i) {
            return docs[ords[i]];
        }

        @Override
        public void swap(int i, int j) {
            int t = ords[i];
            ords[i] = ords[j];
            ords[j] = t;
        }

        @Override
        public void save(int i, int j) {
            if (temp == null) {
                temp = new int[ords.length];
            }
            temp[j] = ords[i];
        }

        @Override
        public void restore(int i, int j) {
            if (temp != null) {
                System.arraycopy(temp, i, ords, i, j - i);
            }
        }
    }
}
