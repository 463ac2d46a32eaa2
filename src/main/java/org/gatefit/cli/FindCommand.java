package org.gatefit.cli;

import java.io.Writer;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import org.gatefit.catalog.Kind;
import org.gatefit.catalog.Row;
import org.gatefit.index.Catalog;
import org.gatefit.index.PartSearch;
import org.gatefit.report.PartsReport;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

@Command(name = "find", mixinStandardHelpOptions = true,
        header = "Search the catalog by words and column conditions.",
        description = {"Lists the parts whose text (part number, maker, package, pinout, description) holds every WORD (as a word or the start of one) and that meet every --where condition. Without words, lists every part that passes the conditions. Values may carry units: --where 'q_g_nc < 0.1uC'. A part whose value is unknown never meets a condition on that column."},
        footer = {"", "Examples:",
            "  gatefit find --kind switch --where 'technology = sic-mosfet' --where 'v_block_v >= 1200'",
            "  gatefit find gate driver --where 'i_sink_a >= 4 A' --sort i_sink_a:desc --limit 5"})
final class FindCommand extends CatalogCommand implements Callable<Integer> {
    @Parameters(paramLabel = "WORD", arity = "0..*", description = "Plain search words (any characters are safe).")
    List<String> words = new ArrayList<>();

    @Option(names = "--kind", paramLabel = "KIND", converter = KindConverter.class,
            description = "Only switches or only drivers.")
    Kind kind;

    @Option(names = "--where", paramLabel = "COND",
            description = "Condition 'column op value', op one of < <= > >= = != (repeatable; all must hold).")
    List<String> where = new ArrayList<>();

    @Option(names = "--sort", paramLabel = "COL[:desc]",
            description = "Sort by a column, ascending or with :desc descending; unknown values last."
                    + " Default: best word match, then part number.")
    String sort;

    @Option(names = "--limit", paramLabel = "N", description = "At most N parts (default: all).")
    Integer limit;

    @Mixin
    OutputOptions output;

    FindCommand(Context ctx) {
        super(ctx);
    }

    @Override
    public Integer call() throws Exception {
        if (limit != null && limit < 1) {
            throw new UsageException("--limit: expected a positive number, got " + limit);
        }
        List<PartSearch.Condition> conds = new ArrayList<>();
        for (String w : where) {
            conds.add(PartSearch.Condition.parse(w));
        }
        try (Catalog c = openCatalog()) {
            List<Row> rows = PartSearch.find(c, kind, words, conds, sort, limit == null ? Integer.MAX_VALUE : limit);
            if (c.isEmpty()) {
                ctx.err.println("note: the catalog in " + c.directory() + " is empty; import parts with 'gatefit import FILE...'");
            }
            try (Writer w = output.open(ctx)) {
                PartsReport.list(rows, output.rendering(ctx, null), w);
                OutputFile.finish(w);
            }
        }
        return ExitCode.OK;
    }
}
