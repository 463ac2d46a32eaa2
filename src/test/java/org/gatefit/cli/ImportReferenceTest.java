package org.gatefit.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.gatefit.catalog.FastPath;
import org.gatefit.synth.SyntheticCatalog;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The import seam ({@link FastPath#IMPORT}) side by side: the same imports (the bundled examples, a
 * synthetic catalog, an upsert that replaces parts, a --replace, a --skip-invalid with a bad row)
 * run once on the fast paths (the hand-written CSV lexer, column segments) and once on the shipped
 * references (Commons CSV, Lucene's own per-document indexing: {@code -Dgatefit.reference=true});
 * every question asked of the two catalogs afterwards must get the same answer: exports, info, find,
 * show, shortlist, check, replace.
 */
class ImportReferenceTest {
    private static final ObjectMapper JSON = new ObjectMapper();

    @TempDir
    Path tmp;

    /** Runs {@code work} with every reference path selected (tests run one at a time in one JVM). */
    private static <T> T withReference(java.util.function.Supplier<T> work) {
        String before = System.getProperty(FastPath.PROPERTY);
        System.setProperty(FastPath.PROPERTY, "true");
        try {
            assertTrue(FastPath.IMPORT.reference() && FastPath.CSV.reference());
            return work.get();
        } finally {
            if (before == null) {
                System.clearProperty(FastPath.PROPERTY);
            } else {
                System.setProperty(FastPath.PROPERTY, before);
            }
        }
    }

    /** The same import into {@code fast} and (reference) {@code ref}; both must agree on the outcome. */
    private static void importBoth(Path fast, Path ref, String... args) {
        CliRun a = CliRun.on(fast, args);
        CliRun b = withReference(() -> CliRun.on(ref, args));
        assertEquals(a.exit(), b.exit(), a.dump() + "\n" + b.dump());
        assertEquals(CliRun.sameContentHash(a.out().replace(fast.toString(), "CATALOG")),
                CliRun.sameContentHash(b.out().replace(ref.toString(), "CATALOG")));
        assertEquals(a.err().replace(fast.toString(), "CATALOG"), b.err().replace(ref.toString(), "CATALOG"));
    }

    /** Questions whose answers must not depend on how the catalog was written. */
    private List<List<String>> questions() throws Exception {
        List<List<String>> q = new ArrayList<>();
        q.add(List.of("export", "--kind", "switch"));
        q.add(List.of("export", "--kind", "driver", "--format", "json"));
        q.add(List.of("find", "--kind", "switch", "--where", "v_block_v >= 600", "--format", "csv"));
        q.add(List.of("find", "--kind", "driver", "isolated"));
        q.add(List.of("show", "QND-65G150D"));
        q.add(List.of("show", SyntheticCatalog.driverNumber(17)));
        q.add(List.of("shortlist", "--switch", "QND-65G150D", "--freq", "200", "--bus", "375", "--edge", "10",
                "--drive", "6", "--top", "8", "--format", "json"));
        q.add(List.of("shortlist", "--switch", SyntheticCatalog.switchNumber(5), "--freq", "50", "--bus", "400",
                "--side", "high", "--top", "20"));
        q.add(List.of("check", Project.file("examples/stages.csv").toString(), "--bom",
                Project.file("examples/bom.csv").toString()));
        q.add(List.of("replace", "PGL-HB1046", "--stages", Project.file("examples/stages.csv").toString(), "--bom",
                Project.file("examples/bom.csv").toString()));
        return q;
    }

    /** @param answered whether every question must get an answer (not a usage error: the parts it names exist) */
    private void sameAnswers(Path fast, Path ref, boolean answered) throws Exception {
        for (List<String> q : questions()) {
            CliRun a = CliRun.on(fast, q.toArray(String[]::new));
            CliRun b = CliRun.on(ref, q.toArray(String[]::new));
            assertEquals(a.exit(), b.exit(), q + "\n" + a.dump() + "\n" + b.dump());
            assertEquals(CliRun.sameContentHash(a.out().replace(fast.toString(), "CATALOG")),
                    CliRun.sameContentHash(b.out().replace(ref.toString(), "CATALOG")), q.toString());
            assertEquals(a.err().replace(fast.toString(), "CATALOG"), b.err().replace(ref.toString(), "CATALOG"), q.toString());
            if (answered) {
                assertTrue(a.exit() == ExitCode.OK || a.exit() == ExitCode.FAILED, q + ": " + a.dump());
            }
        }
        ObjectNode a = (ObjectNode) JSON.readTree(CliRun.on(fast, "info", "--format", "json").out());
        ObjectNode b = (ObjectNode) JSON.readTree(CliRun.on(ref, "info", "--format", "json").out());
        // where, how big and which commit (each import names its own content): not an answer
        for (String differs : List.of("catalog", "size_bytes", "bytes", "content_sha256")) {
            a.remove(differs);
            b.remove(differs);
        }
        assertEquals(a, b);
    }

    @Test
    void bothImportPathsGiveCatalogsThatAnswerAlike() throws Exception {
        Path fast = tmp.resolve("fast");
        Path ref = tmp.resolve("reference");
        Path switches = tmp.resolve("synth-switches.csv");
        Path drivers = tmp.resolve("synth-drivers.csv");
        SyntheticCatalog.writeSwitches(switches, 1500);
        SyntheticCatalog.writeDrivers(drivers, 2500);
        importBoth(fast, ref, "import", Project.file("examples/switches.csv").toString(),
                Project.file("examples/drivers.csv").toString(), switches.toString(), drivers.toString());
        sameAnswers(fast, ref, true);
        JsonNode counts = JSON.readTree(CliRun.on(ref, "info", "--format", "json").out()).get("counts");
        assertTrue(counts.get("driver").asInt() > 2500, counts.toString());

        // Upsert: later rows replace parts of both earlier files; the replaced figures must win in both.
        List<String> lines = Files.readAllLines(drivers);
        List<String> changed = new ArrayList<>(List.of(lines.get(0)));
        for (int i = 1; i < lines.size(); i += 7) {
            changed.add(lines.get(i).replaceFirst(",([^,]*)$", ",changed in a later import"));
        }
        Path upsert = tmp.resolve("upsert.csv");
        Files.write(upsert, changed);
        importBoth(fast, ref, "import", upsert.toString());
        sameAnswers(fast, ref, true);

        // --replace drops the kind's earlier parts in the same commit.
        importBoth(fast, ref, "import", "--replace", Project.file("examples/switches.csv").toString());
        sameAnswers(fast, ref, false);

        // --skip-invalid writes the good rows and reports the bad one.
        Path bad = tmp.resolve("bad.csv");
        Files.write(bad, List.of(lines.get(0), lines.get(3), lines.get(4).replaceFirst(",[^,]*,", ",,"), lines.get(5)));
        importBoth(fast, ref, "import", "--skip-invalid", tmp.resolve("rejects.csv").toString(), bad.toString());
        sameAnswers(fast, ref, false);
    }
}
