package org.gatefit.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.regex.Pattern;
import org.gatefit.catalog.Sha256;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Issue 19, reports fit to forward: every explain, compare, shortlist, check and replace report
 * names when it was made, by which gatefit, from which catalog (folder and content hash, the one
 * {@code info} prints) and from which input files (each one's SHA-256, as {@code sha256sum} prints
 * it), in every format but CSV.
 */
class ReportHeaderCliTest {
    private static final ObjectMapper JSON = new ObjectMapper();
    /** ISO 8601 extended date and time to the second with a numeric offset (ISO 8601-1:2019, 5.4.2 and 4.3.13). */
    static final Pattern ISO_OFFSET = Pattern.compile("\\d{4}-\\d{2}-\\d{2}T\\d{2}:\\d{2}:\\d{2}[+-]\\d{2}:\\d{2}");
    private static final List<String> POINT = List.of("--freq", "200", "--bus", "375", "--edge", "10", "--drive", "6",
            "--rg", "10", "--rg-off", "0.5", "--loop", "3", "--v-oh", "4.6", "--v-ol", "0.2");

    @TempDir
    Path tmp;
    Path catalog;
    Path stages;
    Path bom;

    @BeforeEach
    void importExamples() {
        catalog = CliRun.examples(tmp.resolve("catalog"));
        stages = Project.file("examples/stages.csv");
        bom = Project.file("examples/bom.csv");
    }

    /** Each report command with its arguments, and the input files it names (role to file). */
    private record Case(String command, List<String> args, Map<String, Path> inputs) {
    }

    private List<Case> cases() {
        List<Case> out = new ArrayList<>();
        List<String> explain = new ArrayList<>(List.of("explain", "--driver", "QND-D06L", "--switch", "QND-65G150D"));
        explain.addAll(POINT);
        out.add(new Case("explain", explain, Map.of()));
        List<String> compare = new ArrayList<>(List.of("explain", "--driver", "QND-D06L", "--driver", "VHM-4410N",
                "--switch", "QND-65G150D"));
        compare.addAll(POINT);
        out.add(new Case("explain", compare, Map.of()));
        out.add(new Case("shortlist", List.of("shortlist", "--switch", "QND-65G150D", "--stages", stages.toString(),
                "--stage", "GC-MAIN", "--top", "3"), Map.of("stages", stages)));
        Map<String, Path> both = new LinkedHashMap<>();
        both.put("stages", stages);
        both.put("bom", bom);
        out.add(new Case("check", List.of("check", stages.toString(), "--bom", bom.toString()), both));
        out.add(new Case("replace", List.of("replace", "CVL-1025TL", "--stages", stages.toString(), "--bom",
                bom.toString(), "--top", "3"), both));
        return out;
    }

    private CliRun run(Case c, String... more) {
        List<String> a = new ArrayList<>(c.args());
        a.addAll(List.of(more));
        CliRun r = CliRun.on(catalog, a.toArray(String[]::new));
        assertTrue(r.exit() == ExitCode.OK || r.exit() == ExitCode.FAILED, r.dump());
        return r;
    }

    private String contentHash() throws Exception {
        CliRun info = CliRun.on(catalog, "info", "--format", "json");
        assertEquals(ExitCode.OK, info.exit(), info.dump());
        String h = JSON.readTree(info.out()).get("content_sha256").asText();
        assertTrue(h.matches("[0-9a-f]{64}"), h);
        return h;
    }

    @Test
    void everyJsonReportNamesTimeVersionCatalogAndEachInputWithItsSha256() throws Exception {
        String hash = contentHash();
        for (Case c : cases()) {
            JsonNode report = JSON.readTree(run(c, "--format", "json").out()).get("report");
            String what = c.args().toString();
            assertEquals(c.command(), report.get("command").asText(), what);
            // CliRun's fixed clock (2030-01-02T03:04:05Z) in its zone, UTC
            assertEquals("2030-01-02T03:04:05+00:00", report.get("generated").asText(), what);
            assertTrue(ISO_OFFSET.matcher(report.get("generated").asText()).matches(), what);
            assertEquals(GatefitCommand.version(), report.get("gatefit").asText(), what);
            assertEquals(catalog.toString(), report.get("catalog").get("path").asText(), what);
            assertEquals(hash, report.get("catalog").get("content_sha256").asText(), what + ": the hash info prints");
            JsonNode inputs = report.get("inputs");
            assertEquals(c.inputs().size(), inputs.size(), what + " " + inputs);
            int i = 0;
            for (Map.Entry<String, Path> e : c.inputs().entrySet()) {
                JsonNode in = inputs.get(i++);
                assertEquals(e.getKey(), in.get("role").asText(), what);
                assertEquals(e.getValue().toString(), in.get("file").asText(), what);
                assertEquals(referenceSha256(e.getValue()), in.get("sha256").asText(), what + " " + e.getValue());
            }
        }
    }

    /** The file's SHA-256 as sha256sum prints it, where the tool is; else as {@link Sha256} computes it. */
    private static String referenceSha256(Path f) throws Exception {
        String ref = org.gatefit.testsupport.Sha256Sum.of(f);
        return ref != null ? ref : Sha256.of(f);
    }

    /**
     * The JUnit XML carries the header as the suite's properties (JUnit's own place for them), in XML a
     * standard parser reads, with each input's SHA-256 as sha256sum prints it.
     */
    @Test
    void theJunitXmlCarriesTheHeaderAsProperties() throws Exception {
        Path xml = tmp.resolve("check.junit.xml");
        CliRun r = CliRun.on(catalog, "check", stages.toString(), "--bom", bom.toString(), "--junit", xml.toString());
        assertEquals(ExitCode.FAILED, r.exit(), r.dump());
        org.w3c.dom.Document doc = javax.xml.parsers.DocumentBuilderFactory.newInstance().newDocumentBuilder()
                .parse(xml.toFile());
        Map<String, String> props = new LinkedHashMap<>();
        org.w3c.dom.NodeList list = doc.getElementsByTagName("property");
        for (int i = 0; i < list.getLength(); i++) {
            org.w3c.dom.Element e = (org.w3c.dom.Element) list.item(i);
            props.put(e.getAttribute("name"), e.getAttribute("value"));
        }
        assertEquals("check", props.get("report.command"), props.toString());
        assertTrue(Pattern.matches("\\d{4}-\\d\\d-\\d\\dT\\d\\d:\\d\\d:\\d\\d[+-]\\d\\d:\\d\\d",
                props.get("report.generated")), props.toString());
        assertEquals(referenceSha256(stages), props.get("report.input.stages.sha256"), props.toString());
        assertEquals(referenceSha256(bom), props.get("report.input.bom.sha256"), props.toString());
        assertTrue(props.get("report.catalog.content_sha256").matches("[0-9a-f]{64}"), props.toString());
    }

    @Test
    void theTimeCarriesTheClocksOffset() throws Exception {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        Clock plusTwo = Clock.fixed(CliRun.NOW, ZoneOffset.ofHours(2));
        List<String> a = new ArrayList<>(List.of("--catalog", catalog.toString()));
        a.addAll(cases().get(0).args());
        a.addAll(List.of("--format", "json"));
        int code = Cli.create(new PrintWriter(out, true), new PrintWriter(err, true), Map.of(), plusTwo)
                .execute(a.toArray(String[]::new));
        assertEquals(ExitCode.OK, code, err.toString());
        // 03:04:05 UTC is 05:04:05 at UTC+02:00
        assertEquals("2030-01-02T05:04:05+02:00", JSON.readTree(out.toString()).get("report").get("generated").asText());
    }

    @Test
    void textOnStandardOutputOpensWithOneHeaderLineAndAFileCarriesTheWholeHeader() throws Exception {
        String hash = contentHash();
        for (Case c : cases()) {
            String what = c.args().toString();
            String first = run(c).out().split("\n")[0];
            assertTrue(first.startsWith(c.command() + ", 2030-01-02T03:04:05+00:00, gatefit " + GatefitCommand.version()
                    + "; catalog"), what + ": " + first);
            String printed = run(c).out();
            assertTrue(printed.replace("\n  ", " ").contains(catalog + " " + hash.substring(0, 12) + "…"), what + printed);
            assertFalse(printed.contains(hash), what + ": the one line shows the hash shortened");

            Path file = tmp.resolve("report.txt");
            run(c, "--output", file.toString());
            String text = Files.readString(file, StandardCharsets.UTF_8);
            assertTrue(text.startsWith("Report:"), what + "\n" + text);
            assertTrue(text.contains("content SHA-256 " + hash + "\n"), what + "\n" + text);
            for (Path in : c.inputs().values()) {
                assertTrue(text.contains(in + "\n"), what + " names " + in);
                assertTrue(text.contains("SHA-256 " + Sha256.of(in) + "\n"), what + " hashes " + in);
            }
            for (String line : text.split("\n")) {
                assertTrue(line.length() <= 100 || !line.contains("SHA-256"), what + ": " + line);
            }
        }
    }

    @Test
    void markdownAndHtmlCarryTheWholeHeaderAndCsvStaysATable() throws Exception {
        String hash = contentHash();
        for (Case c : cases()) {
            String what = c.args().toString();
            String md = run(c, "--format", "markdown").out();
            assertTrue(md.startsWith("- **Report:** " + c.command() + ", 2030-01-02T03:04:05+00:00"), what + "\n" + md);
            assertTrue(md.contains("content SHA-256 `" + hash + "`"), what);
            for (Path in : c.inputs().values()) {
                assertTrue(md.contains("SHA-256 `" + Sha256.of(in) + "`"), what + " " + in);
            }
            String html = run(c, "--format", "html").out();
            int head = html.indexOf("<header class=\"report-head\"");
            assertTrue(head > html.indexOf("<body>") && head < html.indexOf("<h1>"), what + ": the header opens the page");
            assertTrue(html.contains("<time datetime=\"2030-01-02T03:04:05+00:00\">"), what);
            assertTrue(html.contains("<code class=\"hash\">" + hash + "</code>"), what);
            for (Path in : c.inputs().values()) {
                assertTrue(html.contains("<code class=\"hash\">" + Sha256.of(in) + "</code>"), what + " " + in);
            }
            String csv = run(c, "--format", "csv").out();
            assertFalse(csv.contains(hash) || csv.contains("2030-01-02"), what + ": CSV is the table alone\n" + csv);
            assertTrue(csv.split("\n")[0].matches("[a-z_,A-Z0-9-]+"), what + ": the first line names the columns: "
                    + csv.split("\n")[0]);
        }
    }

    @Test
    void theCatalogHashStaysWithTheCatalogAndChangesWithAnImport() throws Exception {
        String before = contentHash();
        assertEquals(before, contentHash(), "the same catalog, the same hash");
        Path one = tmp.resolve("one.csv");
        Files.writeString(one, "part_number,technology,v_block_v,v_gs_max_v,v_gs_min_v,q_g_nc\nTST-ONE,si-mosfet,100,20,-20,30\n",
                StandardCharsets.UTF_8);
        assertEquals(ExitCode.OK, CliRun.on(catalog, "import", one.toString()).exit());
        String after = contentHash();
        assertNotEquals(before, after, "an import changes the content");
        JsonNode report = JSON.readTree(run(cases().get(0), "--format", "json").out()).get("report");
        assertEquals(after, report.get("catalog").get("content_sha256").asText());
    }
}
