package org.gatefit.cli;

import java.io.IOException;
import org.gatefit.catalog.Kind;
import org.gatefit.catalog.Row;
import org.gatefit.index.Catalog;

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
