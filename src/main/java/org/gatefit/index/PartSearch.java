package org.gatefit.index;

import java.io.IOException;
import java.io.StringReader;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.apache.lucene.analysis.Analyzer;
import org.apache.lucene.analysis.TokenStream;
import org.apache.lucene.analysis.standard.StandardAnalyzer;
import org.apache.lucene.analysis.tokenattributes.CharTermAttribute;
import org.apache.lucene.document.DoublePoint;
import org.apache.lucene.document.LongPoint;
import org.apache.lucene.index.Term;
import org.apache.lucene.search.BooleanClause.Occur;
import org.apache.lucene.search.BooleanQuery;
import org.apache.lucene.search.BoostQuery;
import org.apache.lucene.search.FieldExistsQuery;
import org.apache.lucene.search.MatchAllDocsQuery;
import org.apache.lucene.search.PrefixQuery;
import org.apache.lucene.search.Query;
import org.apache.lucene.search.Sort;
import org.apache.lucene.search.SortField;
import org.apache.lucene.search.TermQuery;
import org.gatefit.catalog.BadValueException;
import org.gatefit.catalog.Cells;
import org.gatefit.catalog.Column;
import org.gatefit.catalog.ColumnType;
import org.gatefit.catalog.Kind;
import org.gatefit.catalog.Op;
import org.gatefit.catalog.Row;
import org.gatefit.catalog.Schema;

/**
 * {@code find}: plain search words plus column conditions ({@code q_g_nc < 0.1uC}) and a sort,
 * answered from the index. Words are analyzed like the indexed text and matched as terms or
 * prefixes, so any characters are safe (no query syntax).
 */
public final class PartSearch {
    private static final Pattern WHERE = Pattern.compile("^\\s*([A-Za-z][A-Za-z0-9_]*)\\s*(<=|>=|!=|=|<|>)\\s*(.*?)\\s*$");

    /** One {@code --where} condition as typed. */
    public record Condition(String column, Op op, String value) {
        /** Parses {@code column op value}. */
        public static Condition parse(String text) throws BadValueException {
            Matcher m = WHERE.matcher(text);
            if (!m.matches() || m.group(3).isEmpty()) {
                throw new BadValueException("'" + text + "' is not a condition (expected 'column op value' with op one of"
                        + " < <= > >= = !=, e.g. 'q_g_nc < 100nC')");
            }
            return new Condition(m.group(1).toLowerCase(Locale.ROOT), Op.of(m.group(2)), m.group(3));
        }
    }

    private PartSearch() {
    }

    /**
     * Finds parts.
     *
     * @param kind   switch, driver or null for both
     * @param words  plain search words (all must match, as words or word starts)
     * @param sort   {@code column} or {@code column:desc}, or null (best text match, then part number)
     * @param limit  most parts to return
     * @throws BadValueException for an unknown column, an operator the column cannot take, or a
     *                           value that does not fit the column
     */
    public static List<Row> find(Catalog catalog, Kind kind, List<String> words, List<Condition> where, String sort,
                                 int limit) throws BadValueException, IOException {
        BooleanQuery.Builder q = new BooleanQuery.Builder();
        if (kind != null) {
            q.add(new TermQuery(new Term(Fields.KIND, kind.id())), Occur.FILTER);
        } else {
            BooleanQuery.Builder parts = new BooleanQuery.Builder();
            for (Kind k : Kind.values()) {
                if (k.isPart()) {
                    parts.add(new TermQuery(new Term(Fields.KIND, k.id())), Occur.SHOULD);
                }
            }
            q.add(parts.build(), Occur.FILTER);
        }
        boolean scored = false;
        try (Analyzer analyzer = new StandardAnalyzer()) {
            for (String w : words) {
                for (String token : tokens(analyzer, w)) {
                    BooleanQuery.Builder one = new BooleanQuery.Builder();
                    one.add(new BoostQuery(new TermQuery(new Term(Fields.ALL, token)), 2f), Occur.SHOULD);
                    one.add(new PrefixQuery(new Term(Fields.ALL, token)), Occur.SHOULD);
                    q.add(one.build(), Occur.MUST);
                    scored = true;
                }
            }
        }
        for (Condition c : where) {
            Column col = column(kind, c.column());
            addCondition(q, col, c);
        }
        if (!scored) {
            q.add(new MatchAllDocsQuery(), Occur.MUST);
        }
        Sort s = sort == null ? (scored ? new Sort(SortField.FIELD_SCORE, keySort(false)) : new Sort(keySort(false)))
                : parseSort(kind, sort);
        return catalog.search(q.build(), s, limit);
    }

    /** A filter of {@code --where} conditions (all must hold) for {@link Catalog#scan}; null when there are none. */
    public static Query filter(Kind kind, List<Condition> where) throws BadValueException {
        return filter(kind, where, List.of());
    }

    /**
     * Documents to leave out of a filter: those meeting every condition of {@code when}, having a
     * value in every column of {@code known}, and matching {@code also} (null: no further test).
     * A point or term query matches only documents that have the value, so a document without it
     * is never left out.
     */
    public record Exclusion(List<Condition> when, List<String> known, Query also) {
        public Exclusion {
            when = List.copyOf(when);
            known = List.copyOf(known);
            if (when.isEmpty() && known.isEmpty() && also == null) {
                throw new IllegalArgumentException("expected at least one condition in an exclusion, got none");
            }
        }
    }

    /**
     * A filter of conditions that must all hold, less the documents of the {@code exclude} groups;
     * null when there is nothing to filter.
     */
    public static Query filter(Kind kind, List<Condition> require, List<Exclusion> exclude) throws BadValueException {
        if (require.isEmpty() && exclude.isEmpty()) {
            return null;
        }
        BooleanQuery.Builder q = new BooleanQuery.Builder();
        for (Condition c : require) {
            addCondition(q, column(kind, c.column()), c);
        }
        for (Exclusion e : exclude) {
            BooleanQuery.Builder g = new BooleanQuery.Builder();
            for (Condition c : e.when()) {
                addCondition(g, column(kind, c.column()), c);
            }
            for (String k : e.known()) {
                g.add(new FieldExistsQuery(column(kind, k).name()), Occur.FILTER);
            }
            if (e.also() != null) {
                g.add(e.also(), Occur.FILTER);
            }
            q.add(g.build(), Occur.MUST_NOT);
        }
        q.add(new MatchAllDocsQuery(), Occur.MUST);
        return q.build();
    }

    /**
     * Parts whose text in {@code column} passes {@code test}: the column's distinct values are read
     * from the index's term dictionary (a handful for a choice-like column) and the query matches
     * the ones that pass. For columns whose schema pattern allows lower case only, so the indexed
     * (lower-cased) term is the text as written.
     */
    public static Query textMatching(org.apache.lucene.index.IndexReader reader, Kind kind, String column,
                                     java.util.function.Predicate<String> test) throws BadValueException, IOException {
        Column col = column(kind, column);
        if (col.type() != org.gatefit.catalog.ColumnType.TEXT && col.type() != org.gatefit.catalog.ColumnType.CHOICE) {
            throw new BadValueException(column + " is not a text column (expected a text or choice column)");
        }
        java.util.Set<org.apache.lucene.util.BytesRef> hit = new java.util.TreeSet<>();
        for (org.apache.lucene.index.LeafReaderContext leaf : reader.leaves()) {
            org.apache.lucene.index.Terms terms = leaf.reader().terms(col.name());
            if (terms == null) {
                continue;
            }
            org.apache.lucene.index.TermsEnum te = terms.iterator();
            for (org.apache.lucene.util.BytesRef t = te.next(); t != null; t = te.next()) {
                if (test.test(t.utf8ToString())) {
                    hit.add(org.apache.lucene.util.BytesRef.deepCopyOf(t));
                }
            }
        }
        return hit.isEmpty() ? new org.apache.lucene.search.MatchNoDocsQuery("no " + column + " value passes")
                : new org.apache.lucene.search.TermInSetQuery(col.name(), hit);
    }

    /** The column a name refers to for this kind (or either kind); lists the valid names if none. */
    public static Column column(Kind kind, String name) throws BadValueException {
        List<Kind> kinds = kind == null ? List.of(Kind.SWITCH, Kind.DRIVER) : List.of(kind);
        for (Kind k : kinds) {
            Optional<Column> c = Schema.of(k).column(name.toLowerCase(Locale.ROOT));
            if (c.isPresent()) {
                return c.get();
            }
        }
        Set<String> valid = new LinkedHashSet<>();
        for (Kind k : kinds) {
            valid.addAll(Schema.of(k).names());
        }
        throw new BadValueException("unknown column '" + name + "' (expected one of: " + String.join(", ", valid) + ")");
    }

    private static void addCondition(BooleanQuery.Builder q, Column col, Condition c) throws BadValueException {
        String n = col.name();
        if (col.wordsOnly()) {
            throw new BadValueException("--where " + n + ": " + n + " is searched by its words (find WORDS), not compared"
                    + " (expected a column other than " + n + ")");
        }
        Object v;
        try {
            v = Cells.parse(col, c.value(), false);
        } catch (BadValueException e) {
            throw new BadValueException("--where " + n + " " + c.op().symbol() + " " + c.value() + ": " + e.getMessage());
        }
        if (v == null) {
            throw new BadValueException("--where " + n + ": missing value (expected " + col.expectation() + ")");
        }
        switch (col.type()) {
            case NUMBER -> {
                double x = (Double) v;
                Query eq = DoublePoint.newExactQuery(n, x);
                switch (c.op()) {
                    case LT -> q.add(DoublePoint.newRangeQuery(n, Double.NEGATIVE_INFINITY, Math.nextDown(x)), Occur.FILTER);
                    case LE -> q.add(DoublePoint.newRangeQuery(n, Double.NEGATIVE_INFINITY, x), Occur.FILTER);
                    case GT -> q.add(DoublePoint.newRangeQuery(n, Math.nextUp(x), Double.POSITIVE_INFINITY), Occur.FILTER);
                    case GE -> q.add(DoublePoint.newRangeQuery(n, x, Double.POSITIVE_INFINITY), Occur.FILTER);
                    case EQ -> q.add(eq, Occur.FILTER);
                    case NE -> {
                        q.add(new FieldExistsQuery(n), Occur.FILTER);
                        q.add(eq, Occur.MUST_NOT);
                    }
                }
            }
            case INTEGER -> {
                long x = (Long) v;
                Query eq = LongPoint.newExactQuery(n, x);
                switch (c.op()) {
                    case LT -> q.add(LongPoint.newRangeQuery(n, Long.MIN_VALUE, x - 1), Occur.FILTER);
                    case LE -> q.add(LongPoint.newRangeQuery(n, Long.MIN_VALUE, x), Occur.FILTER);
                    case GT -> q.add(LongPoint.newRangeQuery(n, x + 1, Long.MAX_VALUE), Occur.FILTER);
                    case GE -> q.add(LongPoint.newRangeQuery(n, x, Long.MAX_VALUE), Occur.FILTER);
                    case EQ -> q.add(eq, Occur.FILTER);
                    case NE -> {
                        q.add(new FieldExistsQuery(n), Occur.FILTER);
                        q.add(eq, Occur.MUST_NOT);
                    }
                }
            }
            case TEXT, CHOICE -> {
                String lower = v.toString().toLowerCase(Locale.ROOT);
                Query eq = n.equals(PartNumberQuery.FIELD) ? new PartNumberQuery(lower) : new TermQuery(new Term(n, lower));
                switch (c.op()) {
                    case EQ -> q.add(eq, Occur.FILTER);
                    case NE -> {
                        q.add(new FieldExistsQuery(n), Occur.FILTER);
                        q.add(eq, Occur.MUST_NOT);
                    }
                    case LT, LE, GT, GE -> throw new BadValueException("--where " + n + " " + c.op().symbol()
                            + ": " + n + " is text, so only = and != apply (expected a number column for "
                            + c.op().symbol() + ")");
                }
            }
        }
    }

    private static Sort parseSort(Kind kind, String spec) throws BadValueException {
        String s = spec.strip();
        boolean desc = false;
        int colon = s.indexOf(':');
        if (colon >= 0) {
            String dir = s.substring(colon + 1).strip().toLowerCase(Locale.ROOT);
            if (!dir.equals("desc") && !dir.equals("asc")) {
                throw new BadValueException("--sort '" + spec + "': expected column or column:asc or column:desc");
            }
            desc = dir.equals("desc");
            s = s.substring(0, colon).strip();
        }
        Column col = column(kind, s);
        if (col.wordsOnly()) {
            throw new BadValueException("--sort " + s + ": " + s + " is free text and cannot be sorted (expected another column)");
        }
        SortField f = switch (col.type()) {
            case NUMBER -> {
                SortField sf = new SortField(col.name(), SortField.Type.DOUBLE, desc);
                sf.setMissingValue(desc ? Double.NEGATIVE_INFINITY : Double.POSITIVE_INFINITY);
                yield sf;
            }
            case INTEGER -> {
                SortField sf = new SortField(col.name(), SortField.Type.LONG, desc);
                sf.setMissingValue(desc ? Long.MIN_VALUE : Long.MAX_VALUE);
                yield sf;
            }
            case TEXT, CHOICE -> {
                SortField sf = new SortField(col.name(), SortField.Type.STRING, desc);
                sf.setMissingValue(desc ? SortField.STRING_FIRST : SortField.STRING_LAST);
                yield sf;
            }
        };
        return new Sort(f, keySort(false));
    }

    private static SortField keySort(boolean desc) {
        return new SortField("part_number", SortField.Type.STRING, desc);
    }

    private static List<String> tokens(Analyzer analyzer, String text) throws IOException {
        List<String> out = new ArrayList<>();
        try (TokenStream ts = analyzer.tokenStream(Fields.ALL, new StringReader(text))) {
            CharTermAttribute term = ts.addAttribute(CharTermAttribute.class);
            ts.reset();
            while (ts.incrementToken()) {
                out.add(term.toString());
            }
            ts.end();
        }
        return out;
    }

}
