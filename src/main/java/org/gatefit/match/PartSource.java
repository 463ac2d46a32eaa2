package org.gatefit.match;

import java.io.IOException;
import java.util.List;
import java.util.Optional;
import java.util.function.Consumer;
import java.util.function.Supplier;
import org.gatefit.catalog.Kind;
import org.gatefit.catalog.Row;
import org.gatefit.catalog.RowCursor;

/**
 * The parts the engines work on: what the shortlist, check and replacement engines need from a
 * catalog, and nothing of how it is stored. The Lucene catalog implements it in
 * {@code org.gatefit.index.CatalogParts}; a test may implement it over a list.
 */
public interface PartSource {
    /** A part of a kind by part number (case as stored, or as the catalog matches it). */
    Optional<Row> get(Kind kind, String partNumber) throws IOException;

    /** How many parts of a kind the catalog holds. */
    int count(Kind kind) throws IOException;

    /** Whether the catalog holds no part at all. */
    boolean isEmpty() throws IOException;

    /** Where the parts come from, for messages (a catalog folder). */
    String describe();

    /**
     * Every part of a kind that {@code skip} does not skip, as rows, in part-number order, to one sink.
     *
     * @return parts read
     */
    long scan(Kind kind, Prefilter skip, Consumer<Row> sink) throws IOException;

    /**
     * Every part of a kind that {@code skip} does not skip, read column by column, split into at most
     * {@code threads} partitions read at once, each by its own sink from {@code sinks}.
     *
     * @return the sinks, one per partition read (none for an empty kind)
     */
    <S extends Consumer<RowCursor>> List<S> scanColumns(Kind kind, Prefilter skip, int threads, Supplier<S> sinks)
            throws IOException;
}
