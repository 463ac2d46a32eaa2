package org.gatefit.cli;

import java.io.IOException;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.function.Consumer;
import org.apache.commons.text.similarity.LevenshteinDistance;
import org.gatefit.catalog.Kind;
import org.gatefit.catalog.Row;
import org.gatefit.catalog.RowCursor;
import org.gatefit.catalog.Schema;
import org.gatefit.index.Catalog;
import org.gatefit.index.CatalogParts;
import org.gatefit.match.OperatingPoint;
import org.gatefit.match.Plausibility;
import org.gatefit.match.Prefilter;
import org.gatefit.match.SwitchPart;

/** Lookups the pair commands share. */
final class PairSupport {
    private PairSupport() {
    }

    /** How many nearest part numbers a "no part" message suggests. */
    static final int SUGGESTIONS = 5;

    /** A part of a kind, or a usage error that says where to look. */
    static Row part(Catalog c, Kind kind, String pn) throws IOException, UsageException {
        java.util.Optional<Row> r = c.get(kind, pn);
        if (r.isEmpty()) {
            throw notFound(c, kind, pn);
        }
        return r.get();
    }

    /**
     * The usage error for a part number not in the catalog (of {@code kind}, or of either kind when
     * null), naming the nearest part numbers that exist: the one place {@code shortlist},
     * {@code explain}, {@code replace} and {@code show} word it.
     */
    static UsageException notFound(Catalog c, Kind kind, String pn) throws IOException {
        return new PartNotFoundException(notFoundMessage(c, kind, pn));
    }

    private static String notFoundMessage(Catalog c, Kind kind, String pn) throws IOException {
        String what = kind == null ? "part" : kind.toString();
        String where = "no " + what + " '" + pn + "' in the catalog " + c.directory();
        if (c.isEmpty()) {
            return where + " (it is empty: import parts with 'gatefit import FILE...')";
        }
        List<String> near = nearest(c, kind, pn, SUGGESTIONS);
        if (near.isEmpty()) {
            return where + " (none is near it; try 'gatefit find "
                    + pn.replaceAll("[^A-Za-z0-9]+", " ").strip() + "')";
        }
        return where + "; nearest: " + String.join(", ", near);
    }

    /**
     * The {@code limit} part numbers of {@code kind} (both kinds when null) nearest to {@code pn} by
     * edit distance, case ignored (ties by part number): a scan of the kind's part numbers.
     */
    static List<String> nearest(Catalog c, Kind kind, String pn, int limit) throws IOException {
        String key = pn.strip().toUpperCase(Locale.ROOT);
        LevenshteinDistance distance = LevenshteinDistance.getDefaultInstance();
        record Near(String pn, int d) {
        }
        List<Near> all = new ArrayList<>();
        CatalogParts parts = new CatalogParts(c);
        for (Kind k : kind == null ? List.of(Kind.SWITCH, Kind.DRIVER) : List.of(kind)) {
            int column = Schema.of(k).position("part_number");
            final class Collect implements Consumer<RowCursor> {
                final List<String> seen = new ArrayList<>();

                @Override
                public void accept(RowCursor r) {
                    seen.add(r.text(column));
                }
            }
            for (Collect s : parts.scanColumns(k, Prefilter.NONE, 1, Collect::new)) {
                for (String p : s.seen) {
                    if (p != null) {
                        all.add(new Near(p, distance.apply(key, p.toUpperCase(Locale.ROOT))));
                    }
                }
            }
        }
        // A near miss only: at most half the typed length apart (else the list is noise).
        int most = Math.max(2, key.length() / 2);
        return all.stream().filter(n -> n.d() <= most).distinct()
                .sorted(Comparator.comparingInt(Near::d).thenComparing(Near::pn)).limit(limit).map(Near::pn).toList();
    }

    /**
     * Warns on {@code err} of every operating-point value given on the command line that is far
     * outside what the switch's technology uses ({@link Plausibility}), naming the option.
     */
    static void warnImplausible(Context ctx, OperatingPoint.Spec spec, SwitchPart sw) {
        for (Plausibility.Finding f : Plausibility.check(spec, sw.technology())) {
            ctx.err.println("warning: " + f.word(OperatingPointOptions.option(f.quantity())));
        }
    }

    /** The operating point for a switch, or a usage error naming what is missing or wrong. */
    static org.gatefit.match.OperatingPoint resolve(org.gatefit.match.OperatingPoint.Spec spec,
                                                    org.gatefit.match.SwitchPart sw) throws UsageException {
        try {
            return spec.resolve(sw);
        } catch (IllegalArgumentException e) {
            throw new UsageException(e.getMessage());
        }
    }

}
