package org.gatefit.cli;

import static org.junit.jupiter.api.Assertions.assertAll;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import com.networknt.schema.JsonSchema;
import com.networknt.schema.JsonSchemaFactory;
import com.networknt.schema.SpecVersion;
import com.networknt.schema.ValidationMessage;
import java.io.IOException;
import java.io.InputStream;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.regex.Pattern;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;
import org.apache.lucene.analysis.standard.StandardAnalyzer;
import org.apache.lucene.index.IndexWriter;
import org.apache.lucene.index.IndexWriterConfig;
import org.apache.lucene.store.Directory;
import org.apache.lucene.store.FSDirectory;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * End to end through {@link Cli#create}: import the example catalogs, then find, show, export,
 * info. Expected values are worked out independently of gatefit: counts and filters by reading
 * the example files with Commons CSV, hashes with the JDK's SHA-256, JSON rows with the
 * networknt JSON Schema validator against {@code catalog-schema/}. The example figures are only
 * input, never a check value of an engineering figure.
 */
class CatalogCliTest {
    private static final ObjectMapper JSON = new ObjectMapper();
    private static final Path SWITCHES = Project.file("examples/switches.csv");
    private static final Path DRIVERS = Project.file("examples/drivers.csv");

    @TempDir
    Path tmp;
    Path catalog;

    @BeforeEach
    void importExamples() {
        catalog = CliRun.examples(tmp.resolve("catalog"));
    }

    private static List<CSVRecord> records(Path csv) throws IOException {
        try (Reader in = Files.newBufferedReader(csv, StandardCharsets.UTF_8)) {
            return CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true).get().parse(in).getRecords();
        }
    }

    private static JsonNode json(CliRun r) throws IOException {
        assertEquals(ExitCode.OK, r.exit(), r.dump());
        return JSON.readTree(r.out());
    }

    @Test
    void infoShowsTheCountsOfTheImportedFilesAndTheirHistory() throws Exception {
        long switches = records(SWITCHES).size();
        long drivers = records(DRIVERS).size();
        CliRun text = CliRun.on(catalog, "info");
        assertEquals(ExitCode.OK, text.exit(), text.dump());
        assertTrue(text.out().contains(switches + " switches, " + drivers + " drivers"), text.dump());
        assertTrue(text.out().contains("2030-01-02 03:04:05Z"), "the fixed clock's time: " + text.dump());

        JsonNode info = json(CliRun.on(catalog, "info", "--format", "json"));
        assertEquals(switches, info.at("/counts/switch").asLong());
        assertEquals(drivers, info.at("/counts/driver").asLong());
        JsonNode imports = info.get("imports");
        assertEquals(2, imports.size(), info.toString());
        assertEquals(SWITCHES.toString(), imports.get(0).get("file").asText());
        assertEquals("switch", imports.get(0).get("kind").asText());
        assertEquals(switches, imports.get(0).get("rows").asLong());
        assertEquals("upsert", imports.get(0).get("mode").asText());
        assertEquals(CliRun.NOW.toString(), imports.get(0).get("time").asText());
        assertEquals(sha256(SWITCHES), imports.get(0).get("sha256").asText(), "JDK MessageDigest SHA-256");
        assertEquals(sha256(DRIVERS), imports.get(1).get("sha256").asText(), "JDK MessageDigest SHA-256");
    }

    private static String sha256(Path p) throws Exception {
        return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(Files.readAllBytes(p)));
    }

    @Test
    void findWhereWithUnitsFiltersAndSortsAsTheSiPrefixesSay() throws Exception {
        // 0.1 µC = 100 nC (SI prefixes µ = 10^-6, n = 10^-9; SI Brochure 9th ed., from memory)
        JsonNode parts = json(CliRun.on(catalog, "find", "--kind", "switch", "--where", "q_g_nc < 0.1uC",
                "--sort", "q_g_nc", "--format", "json")).get("parts");
        List<String> expected = new ArrayList<>();
        for (CSVRecord rec : records(SWITCHES)) {
            String q = rec.get("q_g_nc");
            if (!q.isBlank() && Double.parseDouble(q) < 100) {
                expected.add(rec.get("part_number"));
            }
        }
        List<String> got = new ArrayList<>();
        double previous = Double.NEGATIVE_INFINITY;
        for (JsonNode p : parts) {
            got.add(p.get("part_number").asText());
            double q = p.get("q_g_nc").asDouble();
            assertTrue(q < 100, p.toString());
            assertTrue(q >= previous, "ascending by q_g_nc: " + got);
            previous = q;
        }
        assertFalse(expected.isEmpty(), "the filter must select something to be a test");
        assertEquals(Set.copyOf(expected), Set.copyOf(got));
        assertEquals(expected.size(), got.size());

        JsonNode desc = json(CliRun.on(catalog, "find", "--kind", "switch", "--where", "q_g_nc < 100",
                "--sort", "q_g_nc:desc", "--format", "json")).get("parts");
        assertEquals(got.size(), desc.size(), "100 bare in the nC column is the same bound as 0.1uC");
        assertEquals(got.get(got.size() - 1), desc.get(0).get("part_number").asText());
    }

    @Test
    void findWithWordsListsExactlyThePartsWhoseTextHoldsAWordStartingWithIt() throws Exception {
        JsonNode parts = json(CliRun.on(catalog, "find", "GaN", "--format", "json")).get("parts");
        // A word start, case-insensitively, in part number, maker, package, pinout or description.
        Pattern word = Pattern.compile("(?i)(^|[^\\p{L}\\p{N}])gan");
        Set<String> expected = new java.util.HashSet<>();
        for (Path f : List.of(SWITCHES, DRIVERS)) {
            for (CSVRecord rec : records(f)) {
                String text = String.join(" ", rec.get("part_number"), rec.get("maker"), rec.get("package"),
                        rec.get("pinout"), rec.get("description"));
                if (word.matcher(text).find()) {
                    expected.add(rec.get("part_number"));
                }
            }
        }
        Set<String> got = new java.util.HashSet<>();
        parts.forEach(p -> got.add(p.get("part_number").asText()));
        assertFalse(expected.isEmpty(), "the word must select something to be a test");
        assertEquals(expected, got);
    }

    @Test
    void findWithoutWordsOrFiltersListsEveryPart() throws Exception {
        JsonNode parts = json(CliRun.on(catalog, "find", "--format", "json")).get("parts");
        assertEquals(records(SWITCHES).size() + records(DRIVERS).size(), parts.size());
    }

    @Test
    void showPrintsEveryColumnOfOnePartFoundCaseInsensitively() throws Exception {
        CSVRecord first = records(SWITCHES).get(0);
        String pn = first.get("part_number");
        CliRun text = CliRun.on(catalog, "show", pn.toLowerCase(Locale.ROOT));
        assertEquals(ExitCode.OK, text.exit(), text.dump());
        assertTrue(text.out().contains("switch " + pn), text.dump());
        assertTrue(text.out().contains("line 2"), "first data row is physical line 2: " + text.dump());
        JsonNode part = json(CliRun.on(catalog, "show", pn, "--format", "json"));
        assertEquals(pn, part.get("part_number").asText());
        assertEquals("switch", part.get("kind").asText());
        assertEquals(Double.parseDouble(first.get("q_g_nc")), part.get("q_g_nc").asDouble(), 0.0,
                "stored in the column unit as written");
    }

    @Test
    void exportThenImportThenExportIsByteIdentical() throws Exception {
        for (String kind : List.of("switch", "driver")) {
            CliRun first = CliRun.on(catalog, "export", "--kind", kind, "--format", "csv");
            assertEquals(ExitCode.OK, first.exit(), first.dump());
            Path exported = tmp.resolve(kind + "-export.csv");
            Files.writeString(exported, first.out(), StandardCharsets.UTF_8);
            Path second = tmp.resolve("second-" + kind);
            CliRun imp = CliRun.on(second, "import", exported.toString());
            assertEquals(ExitCode.OK, imp.exit(), imp.dump());
            CliRun again = CliRun.on(second, "export", "--kind", kind, "--format", "csv");
            assertEquals(ExitCode.OK, again.exit(), again.dump());
            assertEquals(first.out(), again.out(), kind + " export must survive a round trip unchanged");
            List<CSVRecord> source = records(kind.equals("switch") ? SWITCHES : DRIVERS);
            assertEquals(source.size() + 1, first.out().lines().count(), "header plus one line per part");
        }
    }

    @Test
    void jsonExportRowsValidateAgainstTheCatalogSchema() throws Exception {
        JsonSchemaFactory factory = JsonSchemaFactory.getInstance(SpecVersion.VersionFlag.V202012);
        for (String kind : List.of("switch", "driver")) {
            JsonSchema schema;
            try (InputStream in = Files.newInputStream(Project.file("catalog-schema/" + kind + ".schema.json"))) {
                schema = factory.getSchema(in);
            }
            JsonNode parts = json(CliRun.on(catalog, "export", "--kind", kind, "--format", "json")).get("parts");
            assertEquals(records(kind.equals("switch") ? SWITCHES : DRIVERS).size(), parts.size());
            for (JsonNode p : parts) {
                Set<ValidationMessage> errors = schema.validate(p);
                assertTrue(errors.isEmpty(), p.get("part_number") + ": " + errors);
            }
            // The validator is not vacuous: the same row without its part number is rejected.
            ObjectNode broken = ((ObjectNode) parts.get(0).deepCopy());
            broken.remove("part_number");
            assertFalse(schema.validate(broken).isEmpty(), "schema must reject a row lacking part_number");
        }
    }

    @Test
    void formulaTextIsNeutralisedOnExportAndRestoredOnImport() throws Exception {
        Path csv = tmp.resolve("formula.csv");
        Files.writeString(csv, "part_number,technology,v_block_v,v_gs_max_v,v_gs_min_v,q_g_nc,description,note\n"
                + "TST-001,si-mosfet,100,20,-20,50,=1+2,@SUM(A1)\n"
                + "TST-002,si-mosfet,100,20,-20,50,+3 dB,plain\n"
                + "TST-003,si-mosfet,100,20,-20,50,'=already neutralised,-5 V\n");
        Path one = tmp.resolve("formula-catalog");
        assertEquals(ExitCode.OK, CliRun.on(one, "import", csv.toString()).exit());
        CliRun export = CliRun.on(one, "export", "--kind", "switch");
        assertEquals(ExitCode.OK, export.exit(), export.dump());
        List<CSVRecord> rows = CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true).get()
                .parse(new java.io.StringReader(export.out())).getRecords();
        // OWASP CSV injection guidance: a cell starting with = + - @ is prefixed with an apostrophe.
        assertEquals("'=1+2", rows.get(0).get("description"));
        assertEquals("'@SUM(A1)", rows.get(0).get("note"));
        assertEquals("'+3 dB", rows.get(1).get("description"));
        assertEquals("'-5 V", rows.get(2).get("note"));

        Path exported = tmp.resolve("formula-export.csv");
        Files.writeString(exported, export.out());
        Path two = tmp.resolve("formula-catalog-2");
        assertEquals(ExitCode.OK, CliRun.on(two, "import", exported.toString()).exit());
        JsonNode part = json(CliRun.on(two, "show", "TST-001", "--format", "json"));
        assertEquals("=1+2", part.get("description").asText());
        assertEquals("@SUM(A1)", part.get("note").asText());
        JsonNode third = json(CliRun.on(two, "show", "TST-003", "--format", "json"));
        // export --help: the leading apostrophe before a formula character is removed by import,
        // also in a file that a spreadsheet neutralised the same way.
        assertEquals("=already neutralised", third.get("description").asText());
        assertEquals("-5 V", third.get("note").asText());
        assertEquals(export.out(), CliRun.on(two, "export", "--kind", "switch").out());
    }

    @Test
    void exitCodesFollowTheDesign() {
        // DESIGN.md: 0 done; 2 usage error; 3 bad input data.
        assertAll(
                () -> assertEquals(ExitCode.OK, CliRun.on(catalog, "info").exit()),
                () -> assertEquals(2, CliRun.on(catalog, "frobnicate").exit(), "unknown command"),
                () -> assertEquals(2, CliRun.on(catalog, "find", "--bogus").exit(), "unknown option"),
                () -> assertEquals(2, CliRun.on(catalog, "find", "--where", "no_such_column < 3").exit()),
                () -> assertEquals(2, CliRun.on(catalog, "find", "--where", "q_g_nc < 12 A").exit(),
                        "wrong unit on the command line"),
                () -> assertEquals(2, CliRun.on(catalog, "show", "TST-NOPE").exit(), "unknown part"),
                () -> assertEquals(2, CliRun.on(catalog, "export", "--kind", "stage").exit()),
                () -> assertEquals(3, CliRun.on(catalog, "import", tmp.resolve("missing.csv").toString()).exit(),
                        "a file that does not exist is bad input"),
                () -> assertEquals(3, CliRun.on(catalog, "validate", Project.file("examples/bom.csv").toString())
                        .exit(), "a BOM is not a catalog"),
                () -> assertEquals(0, CliRun.on(catalog, "validate", SWITCHES.toString()).exit()));
    }

    @Test
    void catalogDirectoryComesFromTheEnvironmentWhenNotGiven() throws Exception {
        JsonNode info = json(CliRun.raw(Map.of("GATEFIT_CATALOG", catalog.toString()), "info", "--format", "json"));
        assertEquals(catalog.toString(), info.get("catalog").asText());
        assertEquals(records(SWITCHES).size(), info.at("/counts/switch").asInt());
    }

    @Test
    void importWhileAnotherWriterHoldsTheLockExitsFourWithoutAStackTrace() throws Exception {
        String before = CliRun.on(catalog, "export", "--kind", "switch").out();
        try (Directory d = FSDirectory.open(catalog);
             IndexWriter other = new IndexWriter(d, new IndexWriterConfig(new StandardAnalyzer()))) {
            CliRun r = CliRun.on(catalog, "import", SWITCHES.toString());
            assertEquals(4, r.exit(), r.dump());
            assertTrue(r.err().contains("locked"), r.dump());
            assertFalse(r.err().contains("\tat "), "no stack trace without --verbose: " + r.dump());
            CliRun verbose = CliRun.on(catalog, "--verbose", "import", SWITCHES.toString());
            assertEquals(4, verbose.exit(), verbose.dump());
            assertTrue(verbose.err().contains("\tat "), "stack trace with --verbose: " + verbose.dump());
            other.rollback();
        }
        assertEquals(before, CliRun.on(catalog, "export", "--kind", "switch").out());
    }
}
