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
