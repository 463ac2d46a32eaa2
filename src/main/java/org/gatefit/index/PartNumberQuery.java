package org.gatefit.index;

import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Objects;
import org.apache.lucene.index.DocValues;
import org.apache.lucene.index.LeafReader;
import org.apache.lucene.index.LeafReaderContext;
import org.apache.lucene.index.PostingsEnum;
import org.apache.lucene.index.SortedDocValues;
import org.apache.lucene.index.Terms;
import org.apache.lucene.index.TermsEnum;
import org.apache.lucene.search.ConstantScoreScorer;
import org.apache.lucene.search.ConstantScoreWeight;
import org.apache.lucene.search.DocIdSetIterator;
import org.apache.lucene.search.IndexSearcher;
import org.apache.lucene.search.Query;
import org.apache.lucene.search.QueryVisitor;
import org.apache.lucene.search.ScoreMode;
import org.apache.lucene.search.Scorer;
import org.apache.lucene.search.TwoPhaseIterator;
import org.apache.lucene.search.Weight;
import org.apache.lucene.util.BytesRef;
import org.apache.lucene.util.DocIdSetBuilder;
import org.apache.lucene.util.LongBitSet;
import org.gatefit.catalog.Kind;

/**
 * {@code part_number = X} of {@code find --where}: the parts whose part number, lower-cased
 * ({@link Locale#ROOT}), equals {@code X} lower-cased, which is exactly what a term query on a
 * lower-cased keyword field matched. The index keeps no such keyword term for the part number (a
 * unique term per part is costly to write); this query answers from the {@link Fields#ID} terms
 * and the part number's sorted doc values instead.
 *
 * <p>When the lower-cased value is ASCII, the only texts that lower-case to it are its ASCII case
 * variants, in which a {@code k} may also be written as the Kelvin sign U+212A (the one non-ASCII
 * character whose lower case is ASCII alone; U+0130 lower-cases to {@code i} plus a combining dot).
 * Their upper-cased ids are few, so the candidates come from direct {@link Fields#ID} lookups and
 * are then checked against the doc value. Any other value is compared with every distinct part
 * number of the segment.
 */
final class PartNumberQuery extends Query {
    static final String FIELD = "part_number";
    private static final char KELVIN = '\u212A';
    /** Most {@code k}s expanded into id lookups (2^n of them); beyond, every part number is compared. */
    private static final int MAX_K = 8;

    private final String lower;

    /** @param lower the value to match, already lower-cased with {@link Locale#ROOT} */
    PartNumberQuery(String lower) {
        this.lower = Objects.requireNonNull(lower, "lower");
    }

    /** The ids whose parts may match, or null when they are too many to list. */
    private List<BytesRef> candidateIds() {
        int ks = 0;
        for (int i = 0; i < lower.length(); i++) {
            char c = lower.charAt(i);
            if (c >= 0x80) {
                return null;
            }
            if (c == 'k') {
                ks++;
            }
        }
        if (ks > MAX_K) {
            return null;
        }
        String upper = lower.toUpperCase(Locale.ROOT);
        List<String> variants = new ArrayList<>();
        variants.add(upper);
        for (int i = 0; i < upper.length(); i++) {
            if (upper.charAt(i) == 'K') {
                int n = variants.size();
                for (int v = 0; v < n; v++) {
                    char[] chars = variants.get(v).toCharArray();
                    chars[i] = KELVIN;
                    variants.add(new String(chars));
                }
            }
        }
        List<BytesRef> ids = new ArrayList<>();
        for (Kind k : Kind.values()) {
            if (k.isPart()) {
                for (String v : variants) {
                    ids.add(new BytesRef(Fields.id(k.id(), v)));
                }
            }
        }
        return ids;
    }

    private boolean lowerCaseEquals(BytesRef text) {
        return text.utf8ToString().toLowerCase(Locale.ROOT).equals(lower);
    }

    @Override
    public Weight createWeight(IndexSearcher searcher, ScoreMode scoreMode, float boost) {
        List<BytesRef> ids = candidateIds();
        return new ConstantScoreWeight(this, boost) {
            @Override
            public Scorer scorer(LeafReaderContext context) throws IOException {
                LeafReader reader = context.reader();
                SortedDocValues dv = DocValues.getSorted(reader, FIELD);
                DocIdSetIterator it = ids == null ? null : fromIds(reader, dv);
                if (it != null) {
                    return new ConstantScoreScorer(this, score(), scoreMode, it);
                }
                if (ids != null) {
                    return null;
                }
                LongBitSet ords = new LongBitSet(Math.max(1, dv.getValueCount()));
                TermsEnum te = dv.termsEnum();
                boolean any = false;
                for (BytesRef t = te.next(); t != null; t = te.next()) {
                    if (lowerCaseEquals(t)) {
                        ords.set(te.ord());
                        any = true;
                    }
                }
                if (!any) {
                    return null;
                }
                TwoPhaseIterator two = new TwoPhaseIterator(dv) {
                    @Override
                    public boolean matches() throws IOException {
                        return ords.get(dv.ordValue());
                    }

                    @Override
                    public float matchCost() {
                        return 1;
                    }
                };
                return new ConstantScoreScorer(this, score(), scoreMode, two);
            }

            /** Docs of the candidate ids whose part number matches, or null when none does. */
            private DocIdSetIterator fromIds(LeafReader reader, SortedDocValues dv) throws IOException {
                Terms terms = reader.terms(Fields.ID);
                if (terms == null) {
                    return null;
                }
                TermsEnum te = terms.iterator();
                List<Integer> docs = new ArrayList<>();
                PostingsEnum pe = null;
                for (BytesRef id : ids) {
                    if (te.seekExact(id)) {
                        pe = te.postings(pe, PostingsEnum.NONE);
                        for (int d = pe.nextDoc(); d != DocIdSetIterator.NO_MORE_DOCS; d = pe.nextDoc()) {
                            docs.add(d);
                        }
                    }
                }
                if (docs.isEmpty()) {
                    return null;
                }
                docs.sort(null);
                DocIdSetBuilder b = new DocIdSetBuilder(reader.maxDoc());
                DocIdSetBuilder.BulkAdder add = b.grow(docs.size());
                int kept = 0;
                int prev = -1;
                for (int d : docs) {
                    if (d != prev && dv.advanceExact(d) && lowerCaseEquals(dv.lookupOrd(dv.ordValue()))) {
                        add.add(d);
                        kept++;
                    }
                    prev = d;
                }
                return kept == 0 ? null : b.build().iterator();
            }

            @Override
            public boolean isCacheable(LeafReaderContext ctx) {
                return DocValues.isCacheable(ctx, FIELD);
            }
        };
    }

    @Override
    public void visit(QueryVisitor visitor) {
        if (visitor.acceptField(FIELD)) {
            visitor.visitLeaf(this);
        }
    }

    @Override
    public String toString(String field) {
        return FIELD + ":=" + lower + " (lower case)";
    }

    @Override
    public boolean equals(Object other) {
        return sameClassAs(other) && lower.equals(((PartNumberQuery) other).lower);
    }

    @Override
    public int hashCode() {
        return 31 * classHash() + lower.hashCode();
    }
}
