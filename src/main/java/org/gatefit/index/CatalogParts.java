package org.gatefit.index;

import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.function.Consumer;
import java.util.function.Supplier;
import org.apache.lucene.search.Query;
import org.gatefit.catalog.BadValueException;
import org.gatefit.catalog.Kind;
import org.gatefit.catalog.Row;
import org.gatefit.catalog.RowCursor;
import org.gatefit.match.PartSource;
import org.gatefit.match.Prefilter;

/**
 * The Lucene catalog as the engines' {@link PartSource}: the adapter between {@code match}'s port
 * and the index. A {@link Prefilter} becomes a Lucene query here (points for numbers, terms for
 * choices), so no Lucene type reaches the engines or the command line.
 */
public final class CatalogParts implements PartSource {
    private final Catalog catalog;

    public CatalogParts(Catalog catalog) {
        this.catalog = catalog;
    }

    @Override
    public Optional<Row> get(Kind kind, String partNumber) throws IOException {
        return catalog.get(kind, partNumber);
    }

    @Override
    public int count(Kind kind) throws IOException {
        return catalog.count(kind);
    }

    @Override
    public boolean isEmpty() {
        return catalog.isEmpty();
    }

    @Override
    public String describe() {
        return catalog.directory().toString();
    }

    @Override
    public long scan(Kind kind, Prefilter skip, Consumer<Row> sink) throws IOException {
        return catalog.scan(kind, query(kind, skip), sink);
    }

    @Override
    public <S extends Consumer<RowCursor>> List<S> scanColumns(Kind kind, Prefilter skip, int threads, Supplier<S> sinks)
            throws IOException {
        return catalog.scanColumns(kind, query(kind, skip), threads, sinks);
    }

    /** The prefilter as a query on this catalog (null: none). */
    Query query(Kind kind, Prefilter p) throws IOException {
        if (p.isEmpty()) {
            return null;
        }
        try {
            List<PartSearch.Condition> require = new ArrayList<>();
            for (Prefilter.Condition c : p.require()) {
                require.add(condition(c));
            }
            List<PartSearch.Exclusion> exclude = new ArrayList<>();
            for (Prefilter.Exclusion e : p.exclude()) {
                List<PartSearch.Condition> when = new ArrayList<>();
                for (Prefilter.Condition c : e.when()) {
                    when.add(condition(c));
                }
                Query also = null;
                if (e.text() != null) {
                    if (catalog.searcher() == null) {
                        continue;
                    }
                    also = PartSearch.textMatching(catalog.searcher().getIndexReader(), kind, e.text().column(),
                            e.text().test());
                }
                exclude.add(new PartSearch.Exclusion(when, e.known(), also));
            }
            return PartSearch.filter(kind, require, exclude);
        } catch (BadValueException e) {
            // The engines' conditions name schema columns; one that does not is a defect, not bad input.
            throw new IllegalStateException("a prefilter names no column of the " + kind + " schema: " + e.getMessage(), e);
        }
    }

    private static PartSearch.Condition condition(Prefilter.Condition c) {
        return new PartSearch.Condition(c.column(), c.op(), c.value());
    }
}
