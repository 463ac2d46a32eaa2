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
