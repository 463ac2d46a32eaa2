package org.gatefit.cli;

import java.util.concurrent.Callable;
import org.gatefit.catalog.Kind;
import org.gatefit.index.Catalog;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/**
 * The completion script's question (hidden from help): the catalog's part numbers that start with
 * the word being completed, one a line, in order. No catalog (a missing or empty folder) prints
 * nothing and exits 0, as an empty answer; the script also drops standard error, so a damaged or
 * refused catalog never writes into the user's command line.
 */
@Command(name = "part-numbers", hidden = true, mixinStandardHelpOptions = true,
        header = "List the catalog's part numbers that start with PREFIX (for shell completion).",
        description = "Prints each part number of the kind (both kinds without --kind) that starts with PREFIX,"
                + " case not mattering, one a line in order, at most " + PartNumbersCommand.LIMIT + ".")
final class PartNumbersCommand extends CatalogCommand implements Callable<Integer> {
    /** Most part numbers listed: a shell asks before showing more than a screenful anyway. */
    static final int LIMIT = 500;

    @Parameters(paramLabel = "PREFIX", arity = "0..1", defaultValue = "", description = "The start of the part number.")
    String prefix;

    @Option(names = "--kind", paramLabel = "KIND", converter = KindConverter.class,
            description = "switch or driver (default: both).")
    Kind kind;

    PartNumbersCommand(Context ctx) {
        super(ctx);
    }

    @Override
    public Integer call() throws Exception {
        try (Catalog c = Catalog.openIfPresent(catalogDir())) {
            for (String p : c.partNumbers(kind, prefix, LIMIT)) {
                ctx.out.print(p);
                ctx.out.print('\n');
            }
        }
        ctx.out.flush();
        return ExitCode.OK;
    }
}
