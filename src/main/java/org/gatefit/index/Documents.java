package org.gatefit.index;

import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;
import org.apache.lucene.document.Document;
import org.apache.lucene.document.DoubleDocValuesField;
import org.apache.lucene.document.DoublePoint;
import org.apache.lucene.document.Field;
import org.apache.lucene.document.LongPoint;
import org.apache.lucene.document.NumericDocValuesField;
import org.apache.lucene.document.SortedDocValuesField;
import org.apache.lucene.document.StoredField;
import org.apache.lucene.document.StringField;
import org.apache.lucene.document.TextField;
import org.apache.lucene.index.IndexableField;
import org.apache.lucene.util.BytesRef;
import org.gatefit.catalog.Column;
import org.gatefit.catalog.Kind;
import org.gatefit.catalog.Row;
import org.gatefit.catalog.Schema;

/** Maps catalog rows to Lucene documents and back (see {@link Fields} for the field types). */
final class Documents {
    private Documents() {
    }

    static Document toDocument(Row row) {
        Document d = new Document();
        d.add(new StringField(Fields.ID, Fields.id(row.kind().id(), row.key()), Field.Store.NO));
        d.add(new StringField(Fields.KIND, row.kind().id(), Field.Store.YES));
        d.add(new StoredField(Fields.SOURCE_FILE, row.file() == null ? "" : row.file()));
        d.add(new StoredField(Fields.SOURCE_LINE, row.line()));
        StringBuilder all = new StringBuilder();
        Schema schema = Schema.of(row.kind());
        for (Column c : schema.columns()) {
            Object v = row.values().get(c.name());
            if (v == null) {
                continue;
            }
            String n = c.name();
            switch (c.type()) {
                case NUMBER -> {
                    double x = (Double) v;
                    d.add(new DoublePoint(n, x));
                    d.add(new DoubleDocValuesField(n, x));
                    d.add(new StoredField(n, x));
                }
                case INTEGER -> {
                    long x = (Long) v;
                    d.add(new LongPoint(n, x));
                    d.add(new NumericDocValuesField(n, x));
                    d.add(new StoredField(n, x));
                }
                case TEXT, CHOICE -> {
                    String s = (String) v;
                    if (!c.wordsOnly()) {
                        d.add(new StringField(n, s.toLowerCase(Locale.ROOT), Field.Store.NO));
                        d.add(new SortedDocValuesField(n, new BytesRef(s)));
                    }
                    d.add(new StoredField(n, s));
                    if (c.type() == org.gatefit.catalog.ColumnType.TEXT) {
                        all.append(s).append(' ');
                    }
                }
            }
        }
        row.extras().forEach((k, v) -> {
            d.add(new StoredField(Fields.EXTRA_NAME, k));
            d.add(new StoredField(Fields.EXTRA_VALUE, v));
        });
        d.add(new TextField(Fields.ALL, all.toString(), Field.Store.NO));
        return d;
    }

    static Row toRow(Document d) {
        Kind kind = Kind.fromId(d.get(Fields.KIND));
        Schema schema = Schema.of(kind);
        Map<String, Object> values = new LinkedHashMap<>();
        for (Column c : schema.columns()) {
            IndexableField f = d.getField(c.name());
            if (f == null) {
                continue;
            }
            switch (c.type()) {
                case NUMBER -> values.put(c.name(), f.numericValue().doubleValue());
                case INTEGER -> values.put(c.name(), f.numericValue().longValue());
                case TEXT, CHOICE -> values.put(c.name(), f.stringValue());
            }
        }
        Map<String, String> extras = new LinkedHashMap<>();
        String[] names = d.getValues(Fields.EXTRA_NAME);
        String[] vals = d.getValues(Fields.EXTRA_VALUE);
        for (int i = 0; i < names.length && i < vals.length; i++) {
            extras.put(names[i], vals[i]);
        }
        IndexableField line = d.getField(Fields.SOURCE_LINE);
        return new Row(kind, (String) values.get("part_number"), d.get(Fields.SOURCE_FILE),
                line == null ? 0 : line.numericValue().longValue(), values, extras);
    }
}
