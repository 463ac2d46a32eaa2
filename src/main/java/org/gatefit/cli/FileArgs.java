package org.gatefit.cli;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collection;
import java.util.List;
import java.util.Set;
import org.gatefit.catalog.CatalogDataException;
import org.gatefit.catalog.Problem;
import picocli.CommandLine;
import picocli.CommandLine.Model.ArgSpec;
import picocli.CommandLine.Model.OptionSpec;
import picocli.CommandLine.Model.PositionalParamSpec;

/**
 * The files a command line names, checked before a command does any work: an input that is a
 * folder is bad input (exit 3); an output that is one of the command's inputs (the same file by
 * path, symbolic or hard link), another of its outputs, a folder, or inside the catalog folder is
 * refused (exit 2), so nothing a user owns is overwritten by a slip of the keyboard.
 */
final class FileArgs {
    /** Options naming a file the command writes. */
    static final Set<String> OUTPUTS = Set.of("--output", "--junit", "--network-bom", "--skip-invalid");
    /** Options and parameters (by label) naming a file the command reads. */
    static final Set<String> INPUTS = Set.of("--stages", "--bom", "FILE", "STAGES.csv", "--map-file");

    /** The catalog folder (an option of every command): outputs may not go inside it. */
    static final String CATALOG = "--catalog";

    private FileArgs() {
    }

    /** A named file of the command line. */
    private record Named(String label, String given, Path path) {
        String says() {
            return label.startsWith("-") ? label + " " + given : given;
        }
    }

    /**
     * Checks the files of the command {@code parsed} runs.
     *
     * @throws CatalogDataException an input is a folder
     * @throws UsageException       an output would overwrite an input, another output, the catalog, or is a folder
     */
    static void check(CommandLine.ParseResult parsed, Context ctx) throws CatalogDataException, UsageException {
        CommandLine.ParseResult last = parsed;
        while (last.hasSubcommand()) {
            if (last.isUsageHelpRequested() || last.isVersionHelpRequested()) {
                return;
            }
            last = last.subcommand();
        }
        if (last.isUsageHelpRequested() || last.isVersionHelpRequested()) {
            return;
        }
        List<Named> inputs = new ArrayList<>();
        List<Named> outputs = new ArrayList<>();
        for (ArgSpec a : last.matchedArgs()) {
            String label = a instanceof OptionSpec o ? o.longestName() : ((PositionalParamSpec) a).paramLabel();
            List<Path> paths = paths(a);
            if (paths.isEmpty() || label.equals(CATALOG)) {
                continue;
            }
            boolean output = OUTPUTS.contains(label);
            if (!output && !INPUTS.contains(label)) {
                throw new IllegalStateException(label + " names a file: add it to FileArgs.INPUTS or OUTPUTS");
            }
            for (Path p : paths) {
                (output ? outputs : inputs).add(new Named(label, p.toString(), ctx.path(p)));
            }
        }
        for (Named in : inputs) {
            if (Files.isDirectory(in.path())) {
                throw new CatalogDataException(Problem.ofLine(in.given(), 0, "this is a folder (expected a CSV file)"));
            }
        }
        Path catalog = last.commandSpec().userObject() instanceof CatalogCommand c ? c.catalogDir() : null;
        for (int i = 0; i < outputs.size(); i++) {
            Named out = outputs.get(i);
            if (Files.isDirectory(out.path())) {
                throw new UsageException(out.says() + " is a folder (expected the name of a file to write)");
            }
            for (Named in : inputs) {
                if (same(out.path(), in.path())) {
                    throw new UsageException(out.says() + " would overwrite the input file " + in.given()
                            + "; name another file (nothing was written)");
                }
            }
            for (Named other : outputs.subList(0, i)) {
                if (same(out.path(), other.path())) {
                    throw new UsageException(out.says() + " and " + other.says() + " are the same file; name two files"
                            + " (nothing was written)");
                }
            }
            if (catalog != null && canonical(out.path()).startsWith(canonical(catalog))) {
                throw new UsageException(out.says() + " is inside the catalog folder " + catalog
                        + ", which only gatefit writes; name a file outside it (nothing was written)");
            }
        }
    }

    /** The paths an argument holds: a Path, or a list of them; none for any other type. */
    static List<Path> paths(ArgSpec a) {
        Object v = a.getValue();
        List<Path> out = new ArrayList<>();
        if (v instanceof Path p) {
            out.add(p);
        } else if (v instanceof Collection<?> c) {
            for (Object o : c) {
                if (o instanceof Path p) {
                    out.add(p);
                }
            }
        }
        return out;
    }

    /** Whether two paths name one file: the same file when both exist (hard links too), else the same canonical path. */
    static boolean same(Path a, Path b) {
        try {
            if (Files.exists(a) && Files.exists(b)) {
                return Files.isSameFile(a, b);
            }
        } catch (IOException e) {
            // compare the paths
        }
        return canonical(a).equals(canonical(b));
    }

    /** The absolute, normalised path with symbolic links resolved as far as the path exists. */
    static Path canonical(Path p) {
        Path abs = p.toAbsolutePath().normalize();
        for (Path q = abs; q != null; q = q.getParent()) {
            if (Files.exists(q)) {
                try {
                    return q.toRealPath().resolve(q.relativize(abs));
                } catch (IOException e) {
                    return abs;
                }
            }
        }
        return abs;
    }
}
