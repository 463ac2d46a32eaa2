package org.gatefit.cli;

import java.nio.file.Path;
import picocli.CommandLine.ParentCommand;

/** Base of commands that use the catalog directory. */
abstract class CatalogCommand {
    @ParentCommand
    GatefitCommand top;

    final Context ctx;

    CatalogCommand(Context ctx) {
        this.ctx = ctx;
    }

    /**
     * The catalog to answer from: a handle on the server's view when there is one
     * ({@link Context#view}), else the catalog in {@link #catalogDir()} opened now.
     */
    org.gatefit.index.Catalog openCatalog() throws java.io.IOException {
        return ctx.view != null ? ctx.view.handle() : org.gatefit.index.Catalog.open(catalogDir());
    }

    /**
     * The report header of this command's result from catalog {@code c}: now by the context's clock,
     * this gatefit's version, the catalog's folder and content hash, and the {@code inputs} that are
     * not null.
     */
    org.gatefit.report.ReportHeader header(String command, org.gatefit.index.Catalog c,
                                           org.gatefit.report.ReportHeader.Input... inputs)
            throws java.io.IOException {
        return org.gatefit.report.ReportHeader.of(command, ctx.clock, GatefitCommand.version(), c.directory(),
                c.contentSha256(), java.util.Arrays.stream(inputs).filter(java.util.Objects::nonNull).toList());
    }

    /** An input file of the report header: {@code given} as the user typed it, hashed now; null when not given. */
    org.gatefit.report.ReportHeader.Input input(org.gatefit.report.ReportHeader.Role role, Path given)
            throws java.io.IOException {
        return given == null ? null : org.gatefit.report.ReportHeader.Input.of(role, ctx.path(given), given.toString());
    }

    /** --catalog, else $GATEFIT_CATALOG, else the per-user data directory. */
    Path catalogDir() {
        if (top != null && top.catalog != null) {
            return ctx.path(top.catalog);
        }
        String env = ctx.env.get("GATEFIT_CATALOG");
        if (env != null && !env.isBlank()) {
            return Path.of(env);
        }
        return ctx.defaultCatalog();
    }
}
