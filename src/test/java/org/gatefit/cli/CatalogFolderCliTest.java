package org.gatefit.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;
import java.util.Map;
import java.util.TreeMap;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The catalog folder is gatefit's alone (issue 14, findings 1, 2 and 12): a folder of the user's
 * files is refused before anything is touched, a user's file inside a catalog is never deleted,
 * a catalog path that is a file or holds no catalog is an environment error naming the path, and
 * an import that would empty a kind because every row was rejected writes nothing. Input: the
 * invented example catalogs.
 */
class CatalogFolderCliTest {
    private static final Path SWITCHES = Project.file("examples/switches.csv");
    private static final Path DRIVERS = Project.file("examples/drivers.csv");

    @TempDir
    Path tmp;

    /** Every regular file under {@code dir} by relative name, with its SHA-256: what a user would miss. */
    static Map<String, String> files(Path dir) throws IOException {
        Map<String, String> out = new TreeMap<>();
        if (!Files.exists(dir)) {
            return out;
        }
        try (Stream<Path> s = Files.walk(dir)) {
            for (Path p : s.filter(Files::isRegularFile).toList()) {
                out.put(dir.relativize(p).toString(), sha256(Files.readAllBytes(p)));
            }
        }
        return out;
    }

    private static String sha256(byte[] b) {
        try {
            return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(b));
        } catch (NoSuchAlgorithmException e) {
            throw new AssertionError(e);
        }
    }

    /** A project folder: notes, a backup whose name starts with '_', a file named like Lucene's commit. */
    private Path projectFolder() throws IOException {
        Path p = Files.createDirectories(tmp.resolve("project"));
        Files.writeString(p.resolve("_notes.txt"), "bench notes\n");
        Files.writeString(p.resolve("_backup.csv"), "part_number\nX-1\n");
        Files.writeString(p.resolve("segments_report.txt"), "weekly report\n");
        Files.writeString(p.resolve("design.txt"), "rev B\n");
        return p;
    }

    @Test
    void importIntoAFolderOfTheUsersFilesIsRefusedAndTouchesNothing() throws Exception {
        Path project = projectFolder();
        Map<String, String> before = files(project);
        CliRun r = CliRun.on(project, "import", SWITCHES.toString());
        assertEquals(ExitCode.ENVIRONMENT, r.exit(), r.dump());
        assertTrue(r.err().contains(project + " is not a gatefit catalog"), r.dump());
        assertTrue(r.err().contains("new or empty folder"), "says what to do: " + r.dump());
        assertEquals(before, files(project), "not a file added, changed or removed");
        for (String command : new String[] {"info", "verify"}) {
            CliRun read = CliRun.on(project, command);
            assertEquals(ExitCode.ENVIRONMENT, read.exit(), read.dump());
            assertTrue(read.err().contains(project.toString()), read.dump());
        }
        CliRun export = CliRun.on(project, "export", "--kind", "switch", "--output", tmp.resolve("out.csv").toString());
        assertEquals(ExitCode.ENVIRONMENT, export.exit(), export.dump());
        assertFalse(Files.exists(tmp.resolve("out.csv")), "no empty 'backup' written");
        assertEquals(before, files(project));
    }

    @Test
    void theUsersFilesInsideACatalogSurviveEveryImport() throws Exception {
        Path catalog = tmp.resolve("catalog");
        assertEquals(ExitCode.OK, CliRun.on(catalog, "import", SWITCHES.toString()).exit());
        assertTrue(Files.exists(catalog.resolve("gatefit-catalog.txt")), "a new catalog is marked");
        Files.writeString(catalog.resolve("_notes.txt"), "bench notes\n");
        Files.writeString(catalog.resolve("_backup.csv"), "part_number\nX-1\n");
        Files.writeString(catalog.resolve("segments_report.txt"), "weekly report\n");
        Map<String, String> mine = new TreeMap<>(files(catalog));
        mine.keySet().retainAll(java.util.Set.of("_notes.txt", "_backup.csv", "segments_report.txt"));

        CliRun upsert = CliRun.on(catalog, "import", DRIVERS.toString());
        assertEquals(ExitCode.OK, upsert.exit(), upsert.dump());
        CliRun replace = CliRun.on(catalog, "import", "--replace", SWITCHES.toString());
        assertEquals(ExitCode.OK, replace.exit(), replace.dump());
        Path bad = Files.writeString(tmp.resolve("bad.csv"), "part_number,maker,technology,v_block_v,v_gs_max_v,"
                + "v_gs_min_v,q_g_nc\nTST-1,Testmaker,si-mosfet,abc,20,-20,50\n");
        assertEquals(ExitCode.BAD_DATA, CliRun.on(catalog, "import", bad.toString()).exit(), "a rolled-back import");

        Map<String, String> after = files(catalog);
        for (Map.Entry<String, String> f : mine.entrySet()) {
            assertEquals(f.getValue(), after.get(f.getKey()), f.getKey() + " kept as it was");
        }
        CliRun info = CliRun.on(catalog, "info");
        assertEquals(ExitCode.OK, info.exit(), info.dump());
        assertTrue(info.out().contains(" switches, "), info.dump());
    }

    @Test
    void anEmptyFolderBecomesACatalog() throws Exception {
        Path empty = Files.createDirectories(tmp.resolve("empty"));
        CliRun r = CliRun.on(empty, "import", SWITCHES.toString());
        assertEquals(ExitCode.OK, r.exit(), r.dump());
        assertTrue(Files.exists(empty.resolve("gatefit-catalog.txt")));
    }

    @Test
    void aCatalogPathThatIsAFileIsAnEnvironmentErrorNamingIt() throws Exception {
        Path file = Files.writeString(tmp.resolve("catalog.txt"), "not a folder\n");
        for (String[] args : new String[][] {{"export", "--kind", "switch"}, {"info"}, {"show", "X-1"},
                {"find", "--kind", "switch"}, {"verify"}, {"import", SWITCHES.toString()}}) {
            CliRun r = CliRun.on(file, args);
            assertEquals(ExitCode.ENVIRONMENT, r.exit(), String.join(" ", args) + ": " + r.dump());
            assertTrue(r.err().contains(file + " is a file, not a catalog folder"), r.dump());
            assertEquals("", r.out(), "no empty 'backup' on standard output");
        }
        assertEquals("not a folder\n", Files.readString(file, StandardCharsets.UTF_8));
    }

    @Test
    void aMissingCatalogIsAnEnvironmentErrorWhereDataIsNeededAndEmptyForInfo() throws Exception {
        Path missing = tmp.resolve("nowhere");
        for (String[] args : new String[][] {{"export", "--kind", "switch"}, {"show", "X-1"}, {"find", "--kind", "switch"},
                {"shortlist", "--switch", "X-1", "--side", "low", "--bus", "48", "--freq", "100"}, {"verify"}}) {
            CliRun r = CliRun.on(missing, args);
            assertEquals(ExitCode.ENVIRONMENT, r.exit(), String.join(" ", args) + ": " + r.dump());
            assertTrue(r.err().contains("no catalog in " + missing), r.dump());
            assertEquals("", r.out());
        }
        CliRun info = CliRun.on(missing, "info");
        assertEquals(ExitCode.OK, info.exit(), info.dump());
        assertFalse(Files.exists(missing), "reading makes no folder");
    }

    @Test
    void replacingAKindWithOnlyRejectedRowsWritesNothingAndSaysWhy() throws Exception {
        Path catalog = tmp.resolve("catalog");
        assertEquals(ExitCode.OK, CliRun.on(catalog, "import", SWITCHES.toString(), DRIVERS.toString()).exit());
        Map<String, String> before = files(catalog);
        String exportBefore = CliRun.on(catalog, "export", "--kind", "driver").out();
        // every driver row with a non-number where the source current belongs
        StringBuilder sb = new StringBuilder();
        int rows = 0;
        try (java.io.Reader in = Files.newBufferedReader(DRIVERS);
             org.apache.commons.csv.CSVPrinter out = new org.apache.commons.csv.CSVPrinter(sb,
                     org.apache.commons.csv.CSVFormat.DEFAULT)) {
            org.apache.commons.csv.CSVParser parser = org.apache.commons.csv.CSVFormat.DEFAULT.builder().setHeader()
                    .setSkipHeaderRecord(true).get().parse(in);
            java.util.List<String> header = parser.getHeaderNames();
            int col = header.indexOf("i_source_a");
            assertTrue(col >= 0);
            out.printRecord(header);
            for (org.apache.commons.csv.CSVRecord rec : parser) {
                java.util.List<String> cells = new java.util.ArrayList<>(rec.toList());
                cells.set(col, "lots");
                out.printRecord(cells);
                rows++;
            }
        }
        Path bad = Files.writeString(tmp.resolve("drivers-bad.csv"), sb.toString());
        Path rejects = tmp.resolve("rejects.csv");

        CliRun r = CliRun.on(catalog, "import", "--replace", "--skip-invalid", rejects.toString(), bad.toString());
        assertEquals(ExitCode.BAD_DATA, r.exit(), r.dump());
        assertTrue(r.err().contains("every driver row was rejected (" + rows + " rows)"), r.dump());
        assertTrue(r.err().contains("nothing was written"), r.dump());
        assertEquals(before, files(catalog), "the catalog is as it was");
        assertEquals(exportBefore, CliRun.on(catalog, "export", "--kind", "driver").out());
        assertFalse(Files.exists(rejects));

        // Without --replace into a catalog that has drivers, nothing is emptied: the good import path stays.
        CliRun upsert = CliRun.on(catalog, "import", "--skip-invalid", rejects.toString(), bad.toString());
        assertEquals(ExitCode.OK, upsert.exit(), upsert.dump());
        assertEquals(exportBefore, CliRun.on(catalog, "export", "--kind", "driver").out());
    }

    @Test
    void replaceSaysHowManyPartsItRemoves() throws Exception {
        Path catalog = tmp.resolve("catalog");
        assertEquals(ExitCode.OK, CliRun.on(catalog, "import", SWITCHES.toString(), DRIVERS.toString()).exit());
        long drivers = Files.readString(DRIVERS).lines().skip(1).filter(l -> !l.isBlank()).count();
        CliRun r = CliRun.on(catalog, "import", "--replace", DRIVERS.toString());
        assertEquals(ExitCode.OK, r.exit(), r.dump());
        assertTrue(r.err().contains("--replace removed the " + drivers + " driver parts"), r.dump());
        assertFalse(r.err().contains("switch parts"), "only the kinds imported are replaced: " + r.dump());
    }
}
