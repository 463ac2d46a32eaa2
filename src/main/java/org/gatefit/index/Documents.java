package org.gatefit.index;

import java.io.IOException;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import org.apache.lucene.document.Document;
import org.apache.lucene.document.Field;
import org.apache.lucene.document.FieldType;
import org.apache.lucene.document.SortedDocValuesField;
import org.apache.lucene.document.StoredField;
import org.apache.lucene.document.StringField;
import org.apache.lucene.document.TextField;
import org.apache.lucene.index.DocValuesType;
import org.apache.lucene.index.IndexOptions;
import org.apache.lucene.index.IndexableField;
import org.apache.lucene.index.LeafReader;
import org.apache.lucene.store.ByteArrayDataInput;
import org.apache.lucene.store.ByteBuffersDataOutput;
import org.apache.lucene.store.DataOutput;
import org.apache.lucene.util.BytesRef;
import org.apache.lucene.util.NumericUtils;
import org.gatefit.catalog.Column;
import org.gatefit.catalog.ColumnType;
import org.gatefit.catalog.Kind;
import org.gatefit.catalog.Row;
import org.gatefit.catalog.Schema;

/**
 * Maps catalog rows to Lucene documents and back (see {@link Fields} for the field types). A row
 * is read back from the one stored {@link Fields#SOURCE} record that holds all its values (one
 * stored field per part, not one per column); scans read the doc values instead.
 *
 * <p>{@link #toDocument} is the layout's definition as one Lucene document: the import writes the
 * same fields column by column ({@link SegmentBuilder}), and {@code SegmentBuilderTest} indexes
 * rows both ways, this one through Lucene's own {@code IndexWriter}, and requires equal segments.
 * Change the layout here and in the builder together.
 */
final class Documents {
    /** A one-dimensional point and a numeric doc value in one field (as Lucene's own {@code LongField}). */
    private static final FieldType POINT_AND_NUMERIC = new FieldType();
    /** An exact (not analyzed) term and a sorted doc value of the same bytes in one field. */
    private static final FieldType TERM_AND_SORTED = new FieldType();
    /** {@code _all}: analyzed like {@link TextField}, without positions (only term and prefix queries read it). */
    private static final FieldType WORDS = new FieldType(TextField.TYPE_NOT_STORED);
    /** Version of {@link Fields#SOURCE}'s layout. */
    private static final byte SOURCE_VERSION = 2;

    static {
        POINT_AND_NUMERIC.setDimensions(1, Long.BYTES);
        POINT_AND_NUMERIC.setDocValuesType(DocValuesType.NUMERIC);
        POINT_AND_NUMERIC.freeze();
        TERM_AND_SORTED.setIndexOptions(IndexOptions.DOCS);
        TERM_AND_SORTED.setOmitNorms(true);
        TERM_AND_SORTED.setTokenized(false);
        TERM_AND_SORTED.setDocValuesType(DocValuesType.SORTED);
        TERM_AND_SORTED.freeze();
        WORDS.setIndexOptions(IndexOptions.DOCS_AND_FREQS);
        WORDS.freeze();
    }

    /** Scratch for the stored record, one per indexing thread (the bytes are copied out per row). */
    private static final ThreadLocal<ByteBuffersDataOutput> SCRATCH =
            ThreadLocal.withInitial(ByteBuffersDataOutput::newResettableInstance);

    private Documents() {
    }

    /**
     * The value of a NUMBER or INTEGER column: its point (what {@code DoublePoint} or {@code LongPoint}
     * would index) and its numeric doc value (what {@code DoubleDocValuesField}, i.e. the raw bits of
     * the double, or {@code NumericDocValuesField} would write), without a second field per value.
     */
    private static final class PointAndNumeric extends Field {
        private final long sortable;

        PointAndNumeric(String name, long docValue, long sortable) {
            super(name, POINT_AND_NUMERIC);
            this.fieldsData = docValue;
            this.sortable = sortable;
        }

        @Override
        public BytesRef binaryValue() {
            byte[] b = new byte[Long.BYTES];
            NumericUtils.longToSortableBytes(sortable, b, 0);
            return new BytesRef(b);
        }
    }

    /**
     * A part as one document, field for field what {@link SegmentBuilder} writes (the reference
     * {@code SegmentBuilderTest} holds the builder to).
     *
     * @param id the row's {@link Fields#id}
     */
    static Document toDocument(Row row, String id) {
        Document d = new Document();
        d.add(new StringField(Fields.ID, id, Field.Store.NO));
        d.add(new StringField(Fields.KIND, row.kind().id(), Field.Store.NO));
        StringBuilder all = new StringBuilder(128);
        Schema schema = Schema.of(row.kind());
        List<Column> columns = schema.columns();
        // The values are in schema order (Row's contract), so the columns are found by walking
        // along the schema, not by a map lookup per column.
        int at = 0;
        for (Map.Entry<String, Object> e : row.values().entrySet()) {
            String n = e.getKey();
            int from = at;
            while (at < columns.size() && !columns.get(at).name().equals(n)) {
                at++;
            }
            if (at == columns.size()) {
                throw new IllegalArgumentException("expected the values of a " + row.kind().id() + " in schema order,"
                        + " got column " + n + " after " + (from == 0 ? "none" : columns.get(from - 1).name()));
            }
            Column c = columns.get(at++);
            Object v = e.getValue();
            switch (c.type()) {
                case NUMBER -> {
                    double x = (Double) v;
                    d.add(new PointAndNumeric(n, Double.doubleToRawLongBits(x), NumericUtils.doubleToSortableLong(x)));
                }
                case INTEGER -> {
                    long x = (Long) v;
                    d.add(new PointAndNumeric(n, x, x));
                }
                case TEXT, CHOICE -> {
                    String s = (String) v;
                    if (c.wordsOnly()) {
                        // In the stored record and _all only: searched by its words, never compared.
                    } else if (n.equals(PartNumberQuery.FIELD)) {
                        // No keyword term: unique per part, costly to write; PartNumberQuery matches it exactly.
                        d.add(new SortedDocValuesField(n, new BytesRef(s)));
                    } else {
                        String lower = s.toLowerCase(Locale.ROOT);
                        if (lower.equals(s)) {
                            d.add(new Field(n, new BytesRef(s), TERM_AND_SORTED));
                        } else {
                            d.add(new StringField(n, lower, Field.Store.NO));
                            d.add(new SortedDocValuesField(n, new BytesRef(s)));
                        }
                    }
                    if (c.type() == ColumnType.TEXT) {
                        all.append(s).append(' ');
                    }
                }
            }
        }
        d.add(new StoredField(Fields.SOURCE, source(row)));
        d.add(new Field(Fields.ALL, all.toString(), WORDS));
        return d;
    }

    /**
     * The stored record: kind, file, line, every value (column position and value, in schema
     * order) and the extra columns. Reading a part by its number then takes one stored-record
     * read, not a doc-value iterator per column (which costs far more for a single document).
     */
    static byte[] source(Row row) {
        ByteBuffersDataOutput out = SCRATCH.get();
        out.reset();
        try {
            writeSource(row, out, sourceHeader(row));
        } catch (IOException e) {
            throw new IllegalStateException("in-memory output failed", e);
        }
        return out.toArrayCopy();
    }

    /** The start of a row's stored record: layout version, kind and file (the same for every row of a file). */
    static byte[] sourceHeader(Row row) {
        ByteBuffersDataOutput out = new ByteBuffersDataOutput();
        out.writeByte(SOURCE_VERSION);
        out.writeString(row.kind().id());
        out.writeString(row.file() == null ? "" : row.file());
        return out.toArrayCopy();
    }

    /** Writes {@link #source}'s record to {@code out}, starting with {@code header} ({@link #sourceHeader} of the row). */
    static void writeSource(Row row, DataOutput out, byte[] header) throws IOException {
        out.writeBytes(header, 0, header.length);
        out.writeVLong(row.line());
        List<Column> columns = Schema.of(row.kind()).columns();
        out.writeVInt(row.values().size());
        for (int at = 0; at < columns.size(); at++) {
            Object v = row.valueAt(at);
            if (v == null) {
                continue;
            }
            out.writeVInt(at);
            switch (columns.get(at).type()) {
                case NUMBER -> out.writeLong(Double.doubleToRawLongBits((Double) v));
                case INTEGER -> out.writeZLong((Long) v);
                case TEXT, CHOICE -> out.writeString((String) v);
            }
        }
        out.writeVInt(row.extras().size());
        for (Map.Entry<String, String> e : row.extras().entrySet()) {
            out.writeString(e.getKey());
            out.writeString(e.getValue());
        }
    }

    private static final Set<String> SOURCE_ONLY = Set.of(Fields.SOURCE);

    /** A part of a segment read back from its stored record. */
    static Row row(LeafReader reader, int doc) throws IOException {
        Document stored = reader.storedFields().document(doc, SOURCE_ONLY);
        IndexableField f = stored.getField(Fields.SOURCE);
        if (f == null) {
            throw new IOException("document " + doc + " has no " + Fields.SOURCE + " record (expected a part written by"
                    + " gatefit's importer)");
        }
        BytesRef b = f.binaryValue();
        ByteArrayDataInput in = new ByteArrayDataInput(b.bytes, b.offset, b.length);
        byte version = in.readByte();
        if (version != SOURCE_VERSION) {
            throw new IOException("document " + doc + ": stored record version " + version + " (expected " + SOURCE_VERSION + ")");
        }
        Kind kind = Kind.fromId(in.readString());
        String file = in.readString();
        long line = in.readVLong();
        List<Column> cols = Schema.of(kind).columns();
        int n = in.readVInt();
        LinkedHashMap<String, Object> values = new LinkedHashMap<>(cols.size() * 2);
        for (int i = 0; i < n; i++) {
            Column c = cols.get(in.readVInt());
            values.put(c.name(), switch (c.type()) {
                case NUMBER -> (Object) Double.longBitsToDouble(in.readLong());
                case INTEGER -> (Object) in.readZLong();
                case TEXT, CHOICE -> in.readString();
            });
        }
        int nExtras = in.readVInt();
        Map<String, String> extras = new LinkedHashMap<>();
        for (int i = 0; i < nExtras; i++) {
            extras.put(in.readString(), in.readString());
        }
        return new Row(kind, (String) values.get("part_number"), file, line, Row.owned(values), extras);
    }
}
