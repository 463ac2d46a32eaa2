package org.gatefit.index;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.apache.lucene.analysis.standard.StandardAnalyzer;
import org.apache.lucene.codecs.Codec;
import org.apache.lucene.index.DirectoryReader;
import org.apache.lucene.index.FieldInfo;
import org.apache.lucene.index.IndexWriter;
import org.apache.lucene.index.IndexWriterConfig;
import org.apache.lucene.index.LeafReader;
import org.apache.lucene.index.NumericDocValues;
import org.apache.lucene.index.PointValues;
import org.apache.lucene.index.PostingsEnum;
import org.apache.lucene.index.SlowCodecReaderWrapper;
import org.apache.lucene.index.SortedDocValues;
import org.apache.lucene.index.Terms;
import org.apache.lucene.index.TermsEnum;
import org.apache.lucene.search.DocIdSetIterator;
import org.apache.lucene.store.ByteBuffersDirectory;
import org.apache.lucene.store.Directory;
import org.apache.lucene.util.BytesRef;
import org.gatefit.catalog.Column;
import org.gatefit.catalog.Kind;
import org.gatefit.catalog.Row;
import org.gatefit.catalog.Schema;
import org.gatefit.catalog.SheetReader;
import org.gatefit.synth.SyntheticCatalog;
import net.jqwik.api.Arbitraries;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import org.junit.jupiter.api.Test;

/**
 * The import's write path ({@link SegmentBuilder} + {@code addIndexes}) writes the same index as
 * Lucene's own per-document indexing of {@link Documents#toDocument}: the reference is Lucene's
 * {@code IndexWriter} (a general-purpose library), compared field by field — field infos, every
 * term with its documents and frequencies, norms, numeric and sorted doc values, points and the
 * stored record. Rows: the bundled example catalogs, synthetic catalogs and random rows with
 * awkward text (upper/lower case, accents, CJK, characters outside the BMP, long tokens, empty texts).
 */
class SegmentBuilderTest {

    @Test
    void exampleCatalogsIndexAlike() throws IOException {
        for (String f : List.of("switches.csv", "drivers.csv")) {
            List<Row> rows = read(Path.of("examples", f));
            assertTrue(rows.size() >= 25, f);
            assertSameIndex(rows, true);
            assertSameIndex(rows, false);
        }
    }

    @Test
    void syntheticCatalogsIndexAlike() throws IOException {
        StringWriter sw = new StringWriter();
        SyntheticCatalog.writeSwitches(sw, 3000);
        assertSameIndex(read(sw.toString()), true);
        StringWriter dw = new StringWriter();
        SyntheticCatalog.writeDrivers(dw, 3000);
        assertSameIndex(read(dw.toString()), true);
    }

    @Test
    void aBuilderGrowsPastItsFirstArraysAndStopsAtCapacity() throws IOException {
        StringWriter dw = new StringWriter();
        SyntheticCatalog.writeDrivers(dw, 2500);
        List<Row> rows = read(dw.toString());
        SegmentBuilder b = new SegmentBuilder(Kind.DRIVER, rows.size(), new StandardAnalyzer());
        for (Row r : rows) {
            b.add(r, id(r));
        }
        assertTrue(b.full());
        assertThrows(IllegalStateException.class, () -> b.add(rows.get(0), id(rows.get(0))));
        assertThrows(IllegalArgumentException.class, () -> new SegmentBuilder(Kind.SWITCH, 4, new StandardAnalyzer()).add(rows.get(0), id(rows.get(0))));
    }

    @Test
    void aWithdrawnPartIsNotWritten() throws IOException {
        List<Row> rows = read(Path.of("examples", "drivers.csv"));
        SegmentBuilder b = new SegmentBuilder(Kind.DRIVER, 100, new StandardAnalyzer());
        for (Row r : rows) {
            b.add(r, id(r));
        }
        b.withdraw(0);
        b.withdraw(3);
        Directory dir = new ByteBuffersDirectory();
        try (IndexWriter w = new IndexWriter(dir, new IndexWriterConfig(new StandardAnalyzer()).setCodec(new ColumnCodec()))) {
            w.addIndexes(SlowCodecReaderWrapper.wrap(b.build()));
            w.commit();
        }
        try (DirectoryReader r = DirectoryReader.open(dir)) {
            assertEquals(rows.size() - 2, r.numDocs());
            LeafReader leaf = r.leaves().get(0).reader();
            TermsEnum te = leaf.terms(Fields.ID).iterator();
            assertTrue(!te.seekExact(new BytesRef(id(rows.get(0)))), "withdrawn part's id is gone");
            assertTrue(te.seekExact(new BytesRef(id(rows.get(1)))));
            // documents keep their order: the first written is the second row
            assertEquals(rows.get(1), Documents.row(leaf, 0));
        }
    }

    @Test
    void aTermLongerThanLuceneTakesIsRefusedWithTheField() {
        Row r = row(Kind.DRIVER, Map.of("part_number", "TST-LONG", "maker", "x".repeat(40_000)));
        SegmentBuilder b = new SegmentBuilder(Kind.DRIVER, 4, new StandardAnalyzer());
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> b.add(r, id(r)));
        assertTrue(e.getMessage().contains("maker"), e.getMessage());
    }

    @Test
    void theReaderRefusesWhatLuceneWouldRefuseAndNoMore() {
        // Lucene's own figure (IndexWriter.MAX_TERM_LENGTH) is the reader's limit
        assertEquals(IndexWriter.MAX_TERM_LENGTH, org.gatefit.catalog.Cells.MAX_TERM_BYTES);
        assertEquals(IndexWriter.MAX_TERM_LENGTH, SegmentBuilder.MAX_TERM_BYTES);
    }

    @Test
    void anOverlongTextCellIsABadCellWithItsPlaceAndALongDescriptionIsNot() throws Exception {
        Path dir = java.nio.file.Files.createTempDirectory("long-text");
        Path csv = dir.resolve("long.csv");
        String header = "part_number,maker,topology,input_polarity,i_source_a,i_sink_a,v_supply_min_v,v_supply_max_v,description\n";
        // "é" is two bytes in UTF-8: 16,384 of them are 32,768 bytes, two over the limit
        java.nio.file.Files.writeString(csv, header
                + "TST-D1,Testmaker,low-side,non-inverting,2,3,10,20," + "word ".repeat(20_000) + "\n"
                + "TST-D2," + "é".repeat(16_384) + ",low-side,non-inverting,2,3,10,20,short\n");
        org.gatefit.catalog.CatalogDataException e = assertThrows(org.gatefit.catalog.CatalogDataException.class,
                () -> new Importer(dir.resolve("cat"), java.time.Clock.systemUTC()).run(List.of(csv), List.of("long.csv"),
                        new Importer.Options(null, false, null), n -> { }));
        assertEquals(1, e.problems().size(), e.getMessage());
        org.gatefit.catalog.Problem p = e.problems().get(0);
        assertEquals(3, p.line(), "the second row is on line 3");
        assertEquals("maker", p.column());
        assertTrue(p.message().contains("32768 bytes") && p.message().contains("32766"), p.message());
    }

    @Property(tries = 60)
    void randomRowsIndexAlike(@ForAll("rows") List<Map<String, Object>> specs) throws IOException {
        List<Row> rows = new ArrayList<>();
        for (int i = 0; i < specs.size(); i++) {
            Map<String, Object> v = new LinkedHashMap<>(specs.get(i));
            v.put("part_number", "P-" + i + v.getOrDefault("part_number", ""));
            rows.add(row(Kind.DRIVER, v));
        }
        assertSameIndex(rows, true);
    }

    @Provide
    Arbitrary<List<Map<String, Object>>> rows() {
        Arbitrary<String> text = Arbitraries.oneOf(
                Arbitraries.of("", " ", "Testmaker", "TESTMAKER", "testmaker", "Zürich Ωhm µ-cap", "ÅÄÖ åäö",
                        "変換器 ドライバ", "\uD83D\uDE00 smile", "a\uD800\uDC00b", "SOT-23-6", "4.7uF 2R2 1,000.5",
                        "the and of", "x".repeat(300), "e\u0301 accent"),
                Arbitraries.strings().ofMaxLength(20));
        Arbitrary<Double> number = Arbitraries.oneOf(Arbitraries.doubles().between(-1e12, 1e12),
                Arbitraries.of(0.0, -0.0, Double.MIN_VALUE, Double.MAX_VALUE, -Double.MAX_VALUE, 1e-300));
        Arbitrary<Long> integer = Arbitraries.oneOf(Arbitraries.longs(), Arbitraries.of(0L, Long.MIN_VALUE, Long.MAX_VALUE));
        Arbitrary<Map<String, Object>> row = Arbitraries.just(0).flatMap(z -> {
            List<Arbitrary<Object>> cells = new ArrayList<>();
            List<Column> cols = Schema.of(Kind.DRIVER).columns();
            for (Column c : cols) {
                Arbitrary<Object> v = switch (c.type()) {
                    case NUMBER -> number.map(x -> (Object) x);
                    case INTEGER -> integer.map(x -> (Object) x);
                    case TEXT -> text.map(x -> (Object) x);
                    case CHOICE -> Arbitraries.of(c.choices()).map(x -> (Object) x);
                };
                cells.add(Arbitraries.oneOf(v, Arbitraries.just((Object) "\0absent")));
            }
            return net.jqwik.api.Combinators.combine(cells).as(list -> {
                Map<String, Object> m = new LinkedHashMap<>();
                for (int i = 0; i < cols.size(); i++) {
                    if (!"\0absent".equals(list.get(i))) {
                        m.put(cols.get(i).name(), list.get(i));
                    }
                }
                return m;
            });
        });
        return row.list().ofMinSize(1).ofMaxSize(40);
    }

    // ---- helpers ----------------------------------------------------------------------------

    static String id(Row r) {
        return Fields.id(r.kind().id(), r.key());
    }

    private static Row row(Kind kind, Map<String, Object> given) {
        LinkedHashMap<String, Object> v = new LinkedHashMap<>();
        for (Column c : Schema.of(kind).columns()) {
            if (given.containsKey(c.name())) {
                v.put(c.name(), given.get(c.name()));
            }
        }
        return new Row(kind, (String) v.get("part_number"), "random.csv", 2, v, Map.of("extra col", "kept"));
    }

    private static List<Row> read(Path p) throws IOException {
        List<Row> rows = new ArrayList<>();
        SheetReader.Summary s = SheetReader.read(p, p.toString(), null, rows::add);
        assertTrue(s.clean(), s.problems().toString());
        return rows;
    }

    private static List<Row> read(String csv) throws IOException {
        List<Row> rows = new ArrayList<>();
        SheetReader.Summary s = SheetReader.read(new java.io.ByteArrayInputStream(csv.getBytes(StandardCharsets.UTF_8)),
                "synthetic.csv", null, rows::add);
        assertTrue(s.clean(), s.problems().toString());
        return rows;
    }

    /**
     * Indexes {@code rows} with IndexWriter.addDocument (the reference) and with the builder, and
     * compares the two segments.
     *
     * @param columnCodec whether the builder's segment is written with {@link ColumnCodec} (else
     *                    the default codec's generic merge)
     */
    static void assertSameIndex(List<Row> rows, boolean columnCodec) throws IOException {
        Directory expectedDir = new ByteBuffersDirectory();
        try (IndexWriter w = new IndexWriter(expectedDir, new IndexWriterConfig(new StandardAnalyzer()))) {
            for (Row r : rows) {
                w.addDocument(Documents.toDocument(r, id(r)));
            }
            w.forceMerge(1);
        }
        Directory actualDir = new ByteBuffersDirectory();
        IndexWriterConfig cfg = new IndexWriterConfig(new StandardAnalyzer());
        cfg.setCodec(columnCodec ? new ColumnCodec() : Codec.getDefault());
        try (IndexWriter w = new IndexWriter(actualDir, cfg)) {
            SegmentBuilder b = new SegmentBuilder(rows.get(0).kind(), rows.size(), w.getAnalyzer());
            for (Row r : rows) {
                b.add(r, id(r));
            }
            w.addIndexes(SlowCodecReaderWrapper.wrap(b.build()));
            w.commit();
        }
        try (DirectoryReader e = DirectoryReader.open(expectedDir); DirectoryReader a = DirectoryReader.open(actualDir)) {
            assertEquals(1, e.leaves().size());
            assertEquals(1, a.leaves().size());
            assertSameSegment(e.leaves().get(0).reader(), a.leaves().get(0).reader());
        }
    }

    private static void assertSameSegment(LeafReader e, LeafReader a) throws IOException {
        assertEquals(e.maxDoc(), a.maxDoc(), "documents");
        Map<String, FieldInfo> ef = new TreeMap<>();
        Map<String, FieldInfo> af = new TreeMap<>();
        e.getFieldInfos().forEach(f -> ef.put(f.name, f));
        a.getFieldInfos().forEach(f -> af.put(f.name, f));
        assertEquals(ef.keySet(), af.keySet(), "fields");
        for (String name : ef.keySet()) {
            FieldInfo x = ef.get(name);
            FieldInfo y = af.get(name);
            String what = "field " + name;
            assertEquals(x.getIndexOptions(), y.getIndexOptions(), what);
            assertEquals(x.getDocValuesType(), y.getDocValuesType(), what);
            assertEquals(x.omitsNorms(), y.omitsNorms(), what);
            assertEquals(x.hasNorms(), y.hasNorms(), what);
            assertEquals(x.hasPayloads(), y.hasPayloads(), what);
            assertEquals(x.getPointDimensionCount(), y.getPointDimensionCount(), what);
            assertEquals(x.getPointIndexDimensionCount(), y.getPointIndexDimensionCount(), what);
            assertEquals(x.getPointNumBytes(), y.getPointNumBytes(), what);
            assertSameTerms(name, e.terms(name), a.terms(name));
            if (x.hasNorms()) {
                assertSameNumbers(what + " norms", e.getNormValues(name), a.getNormValues(name));
            }
            switch (x.getDocValuesType()) {
                case NUMERIC -> assertSameNumbers(what, e.getNumericDocValues(name), a.getNumericDocValues(name));
                case SORTED -> assertSameSorted(what, e.getSortedDocValues(name), a.getSortedDocValues(name));
                case NONE -> { }
                default -> throw new AssertionError("unexpected doc values " + x.getDocValuesType() + " of " + name);
            }
            if (x.getPointDimensionCount() > 0) {
                assertSamePoints(what, e.getPointValues(name), a.getPointValues(name));
            }
        }
        for (int d = 0; d < e.maxDoc(); d++) {
            assertArrayEquals(BytesRef.deepCopyOf(e.storedFields().document(d).getBinaryValue(Fields.SOURCE)).bytes,
                    BytesRef.deepCopyOf(a.storedFields().document(d).getBinaryValue(Fields.SOURCE)).bytes, "stored record of " + d);
            assertEquals(Documents.row(e, d), Documents.row(a, d));
        }
    }

    private static void assertSameTerms(String field, Terms e, Terms a) throws IOException {
        if (e == null) {
            assertNull(a, field + " terms");
            return;
        }
        assertNotNull(a, field + " terms");
        assertEquals(e.size(), a.size(), field + " term count");
        assertEquals(e.getDocCount(), a.getDocCount(), field + " doc count");
        assertEquals(e.getSumDocFreq(), a.getSumDocFreq(), field + " sum doc freq");
        assertEquals(e.getSumTotalTermFreq(), a.getSumTotalTermFreq(), field + " sum total term freq");
        assertEquals(e.hasFreqs(), a.hasFreqs(), field);
        TermsEnum x = e.iterator();
        TermsEnum y = a.iterator();
        BytesRef t;
        while ((t = x.next()) != null) {
            BytesRef u = y.next();
            assertEquals(t, u, field + " term");
            assertEquals(x.docFreq(), y.docFreq(), field + " " + t.utf8ToString());
            assertEquals(x.totalTermFreq(), y.totalTermFreq(), field + " " + t.utf8ToString());
            PostingsEnum p = x.postings(null, PostingsEnum.FREQS);
            PostingsEnum q = y.postings(null, PostingsEnum.FREQS);
            int d;
            while ((d = p.nextDoc()) != DocIdSetIterator.NO_MORE_DOCS) {
                assertEquals(d, q.nextDoc(), field + " " + t.utf8ToString());
                assertEquals(p.freq(), q.freq(), field + " " + t.utf8ToString() + " in " + d);
            }
            assertEquals(DocIdSetIterator.NO_MORE_DOCS, q.nextDoc());
        }
        assertNull(y.next(), field + " has more terms");
    }

    private static void assertSameNumbers(String what, NumericDocValues e, NumericDocValues a) throws IOException {
        assertNotNull(e, what);
        assertNotNull(a, what);
        int d;
        while ((d = e.nextDoc()) != DocIdSetIterator.NO_MORE_DOCS) {
            assertEquals(d, a.nextDoc(), what);
            assertEquals(e.longValue(), a.longValue(), what + " of " + d);
        }
        assertEquals(DocIdSetIterator.NO_MORE_DOCS, a.nextDoc(), what);
    }

    private static void assertSameSorted(String what, SortedDocValues e, SortedDocValues a) throws IOException {
        assertEquals(e.getValueCount(), a.getValueCount(), what + " values");
        for (int o = 0; o < e.getValueCount(); o++) {
            assertEquals(e.lookupOrd(o), a.lookupOrd(o), what + " ord " + o);
        }
        int d;
        while ((d = e.nextDoc()) != DocIdSetIterator.NO_MORE_DOCS) {
            assertEquals(d, a.nextDoc(), what);
            assertEquals(e.ordValue(), a.ordValue(), what + " of " + d);
        }
        assertEquals(DocIdSetIterator.NO_MORE_DOCS, a.nextDoc(), what);
    }

    private static void assertSamePoints(String what, PointValues e, PointValues a) throws IOException {
        assertEquals(e.size(), a.size(), what + " points");
        assertEquals(e.getDocCount(), a.getDocCount(), what);
        assertArrayEquals(e.getMinPackedValue(), a.getMinPackedValue(), what + " min");
        assertArrayEquals(e.getMaxPackedValue(), a.getMaxPackedValue(), what + " max");
        Map<Integer, String> all = points(e);
        assertEquals(all, points(a), what);
        // Range searches through each tree (cells inside, outside or crossing the range), between
        // values that occur, find the same documents: the trees are built right, not only filled.
        List<String> values = all.values().stream().distinct().sorted().toList();
        for (int i = 0; i < values.size(); i += Math.max(1, values.size() / 7)) {
            for (int j = i; j < values.size(); j += Math.max(1, values.size() / 5)) {
                byte[] lo = BytesRef.deepCopyOf(bytes(values.get(i))).bytes;
                byte[] hi = BytesRef.deepCopyOf(bytes(values.get(j))).bytes;
                assertEquals(range(e, lo, hi), range(a, lo, hi), what + " range " + i + ".." + j);
            }
        }
    }

    private static BytesRef bytes(String hex) {
        String[] parts = hex.substring(1, hex.length() - 1).split(" ");
        byte[] b = new byte[parts.length];
        for (int k = 0; k < parts.length; k++) {
            b[k] = (byte) Integer.parseInt(parts[k], 16);
        }
        return new BytesRef(b);
    }

    private static List<Integer> range(PointValues v, byte[] lo, byte[] hi) throws IOException {
        List<Integer> docs = new ArrayList<>();
        v.intersect(new PointValues.IntersectVisitor() {
            @Override
            public void visit(int docID) {
                docs.add(docID);
            }

            @Override
            public void visit(int docID, byte[] packed) {
                if (java.util.Arrays.compareUnsigned(packed, lo) >= 0 && java.util.Arrays.compareUnsigned(packed, hi) <= 0) {
                    docs.add(docID);
                }
            }

            @Override
            public PointValues.Relation compare(byte[] min, byte[] max) {
                if (java.util.Arrays.compareUnsigned(max, lo) < 0 || java.util.Arrays.compareUnsigned(min, hi) > 0) {
                    return PointValues.Relation.CELL_OUTSIDE_QUERY;
                }
                if (java.util.Arrays.compareUnsigned(min, lo) >= 0 && java.util.Arrays.compareUnsigned(max, hi) <= 0) {
                    return PointValues.Relation.CELL_INSIDE_QUERY;
                }
                return PointValues.Relation.CELL_CROSSES_QUERY;
            }
        });
        docs.sort(null);
        return docs;
    }

    /** Every (document, packed value) of a field, visited through the tree as a query would. */
    private static Map<Integer, String> points(PointValues v) throws IOException {
        Map<Integer, String> m = new TreeMap<>();
        v.intersect(new PointValues.IntersectVisitor() {
            @Override
            public void visit(int docID) {
                throw new AssertionError("expected values");
            }

            @Override
            public void visit(int docID, byte[] packed) {
                m.put(docID, new BytesRef(packed).toString());
            }

            @Override
            public PointValues.Relation compare(byte[] min, byte[] max) {
                return PointValues.Relation.CELL_CROSSES_QUERY;
            }
        });
        return m;
    }
}
