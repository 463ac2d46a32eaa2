package org.gatefit.cli;

import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import org.gatefit.catalog.BadValueException;
import org.gatefit.catalog.Kind;
import org.gatefit.catalog.Row;
import org.gatefit.index.Catalog;
import org.gatefit.index.PartSearch;

/** Lookups the pair commands share. */
final class PairSupport {
    private PairSupport() {
    }

    /** A part of a kind, or a usage error that says where to look. */
    static Row part(Catalog c, Kind kind, String pn) throws IOException, UsageException {
        return c.get(kind, pn).orElseThrow(() -> new UsageException("no " + kind + " '" + pn + "' in the catalog "
                + c.directory() + (c.isEmpty() ? " (it is empty: import parts with 'gatefit import FILE...')"
                : " (try 'gatefit find --kind " + kind + " " + pn.replaceAll("[^A-Za-z0-9]+", " ").strip() + "')")));
    }

    /** The prefilter conditions as a catalog query. */
    static org.apache.lucene.search.Query filter(List<String> conditions) throws BadValueException {
        List<PartSearch.Condition> parsed = new ArrayList<>();
        for (String s : conditions) {
            parsed.add(PartSearch.Condition.parse(s));
        }
        return PartSearch.filter(Kind.DRIVER, parsed);
    }
}
