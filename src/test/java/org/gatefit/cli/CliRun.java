package org.gatefit.cli;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Path;
import java.time.Clock;
import java.time.Instant;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/**
 * Runs gatefit through {@link Cli#create} as {@code main} does (building only the subcommands the
 * arguments name, {@link Cli#reachable}), with captured streams, an empty environment and a fixed
 * clock.
 *
 * @param exit exit code
 * @param out  standard output
 * @param err  standard error
 */
record CliRun(int exit, String out, String err) {
    /** The fixed time every import in the tests is recorded at. */
    static final Instant NOW = Instant.parse("2030-01-02T03:04:05Z");
    static final Clock CLOCK = Clock.fixed(NOW, ZoneOffset.UTC);

    /** {@code gatefit --catalog CATALOG ARGS...} */
    static CliRun on(Path catalog, String... args) {
        List<String> all = new ArrayList<>(List.of("--catalog", catalog.toString()));
        all.addAll(List.of(args));
        return raw(Map.of(), all.toArray(String[]::new));
    }

    /** {@code gatefit ARGS...} with the given environment. */
    static CliRun raw(Map<String, String> env, String... args) {
        return run(env, Cli.reachable(args), args);
    }

    /** {@code gatefit ARGS...} with every subcommand built. */
    static CliRun full(Map<String, String> env, String... args) {
        return run(env, null, args);
    }

    private static CliRun run(Map<String, String> env, java.util.Set<String> only, String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        PrintWriter o = new PrintWriter(out, true);
        PrintWriter e = new PrintWriter(err, true);
        int code = Cli.create(o, e, env, CLOCK, false, null, only).execute(args);
        o.flush();
        e.flush();
        return new CliRun(code, out.toString(), err.toString());
    }

    /** {@code catalog} with the bundled example catalog imported into it (import must succeed). */
    static Path examples(Path catalog) {
        CliRun r = on(catalog, "import", Project.file("examples/switches.csv").toString(),
                Project.file("examples/drivers.csv").toString());
        org.junit.jupiter.api.Assertions.assertEquals(ExitCode.OK, r.exit(), r.dump());
        return catalog;
    }

    /**
     * {@code printed} with the catalog's content hash of every report header as {@code CONTENT-HASH}:
     * for comparing what two catalogs of the same parts answer (each import names its own content).
     */
    static String sameContentHash(String printed) {
        return printed.replaceAll("(\"content_sha256\" : \"|content SHA-256[ `]+|catalog\\s+\\S+\\s+)[0-9a-f]{12,64}…?",
                "$1CONTENT-HASH");
    }

    /** A readable dump for assertion messages. */
    String dump() {
        return "exit " + exit + "\n--- stdout\n" + out + "\n--- stderr\n" + err;
    }
}
