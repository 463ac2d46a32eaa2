package org.gatefit.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.gatefit.report.Caution;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code explain} shows the gate-drive network in every format: a section after the
 * recommendations in text and Markdown, a table in HTML, {@code network} in JSON — each in a report
 * that carries the caution. The sizing itself is checked in GateNetworkTest and NetworkSizingTest.
 */
class ExplainNetworkCliTest {
    /** A bootstrapped high side with an external bootstrap diode, faster turn-off (invented demo parts). */
    private static final List<String> HIGH = List.of("explain", "--driver", "PGL-HB6005", "--switch", "THW-65R190T",
            "--side", "high", "--bus", "400", "--freq", "50", "--edge", "100", "--drive", "12", "--rg", "10", "--rg-off", "4.7");

    @TempDir
    Path tmp;
    Path catalog;

    @BeforeEach
    void importExamples() {
        catalog = CliRun.examples(tmp.resolve("catalog"));
    }

    private CliRun run(String... format) {
        List<String> a = new ArrayList<>(HIGH);
        a.addAll(List.of(format));
        return CliRun.on(catalog, a.toArray(String[]::new));
    }

    @Test
    void textHasTheSectionAfterTheRecommendationsAndBeforeTheCaution() {
        String out = run().out();
        int rec = out.indexOf("\nRecommendations\n");
        int net = out.indexOf("\nGate-drive network\n");
        int caution = out.indexOf("Caution:");
        assertTrue(rec > 0 && net > rec && caution > net, out);
        for (String role : List.of("output supply capacitor:", "turn-on gate resistor: 10 Ω", "turn-off gate resistor: 4.7 Ω",
                "turn-off diode:", "gate–source pull-down:", "bootstrap capacitor:", "bootstrap diode: 600 V",
                "bootstrap resistor:")) {
            assertTrue(out.substring(net, caution).contains("  " + role), role + " missing in\n" + out.substring(net, caution));
        }
    }

    @Test
    void jsonCarriesTheNetworkListAndTheCaution() throws Exception {
        CliRun r = run("--format", "json");
        JsonNode j = new ObjectMapper().readTree(r.out());
        JsonNode net = j.get("network");
        assertTrue(net.isArray() && net.size() >= 7, r.out());
        for (JsonNode p : net) {
            for (String field : List.of("role", "value", "unit", "rating", "why")) {
                assertTrue(p.hasNonNull(field), field + " missing in " + p);
            }
            assertTrue(p.get("value").asDouble() > 0, p.toString());
        }
        // 400 V bus + 20 % offset margin = 480 V → a 600 V diode (the usual ladder, from memory)
        JsonNode diode = null;
        for (JsonNode p : net) {
            if (p.get("role").asText().equals("bootstrap diode")) {
                diode = p;
            }
        }
        assertEquals(600, diode.get("value").asDouble(), r.out());
        assertEquals("V", diode.get("unit").asText());
        assertEquals(Caution.TEXT, j.get("caution").asText());
    }

    @Test
    void markdownAndHtmlShowATable() {
        String md = run("--format", "markdown").out();
        int net = md.indexOf("### Gate-drive network");
        assertTrue(net > md.indexOf("### Recommendations") && md.indexOf("| part | value | rating | why |") > net, md);
        assertTrue(md.indexOf("> " + Caution.TEXT) > net, md);
        String html = run("--format", "html").out();
        int table = html.indexOf("<table class=\"network\">");
        assertTrue(table > html.indexOf("<h2>Recommendations</h2>"), html);
        assertTrue(html.indexOf("<td>bootstrap diode</td><td class=\"num\">600 V</td>") > table, html);
        assertTrue(html.contains("class=\"caution\""), html);
    }

    @Test
    void spiceIsForOnePairOfExplainOnly() {
        CliRun find = CliRun.on(catalog, "find", "--kind", "switch", "--format", "spice");
        assertEquals(ExitCode.USAGE, find.exit(), find.dump());
        assertTrue(find.err().contains("--format spice is not available for find; SPICE netlists are made by explain"),
                find.err());
        CliRun two = CliRun.on(catalog, "explain", "--driver", "PGL-HB6005", "--driver", "PGL-HB1046", "--switch",
                "THW-65R190T", "--format", "spice");
        assertEquals(ExitCode.USAGE, two.exit(), two.dump());
        assertTrue(two.err().contains("--format spice: one --driver"), two.err());
        CliRun help = CliRun.on(catalog, "find", "--help");
        assertTrue(help.out().contains("Output format: text, json, csv, markdown (default"), help.out());
    }

    /**
     * A deck needs C_iss, Q_gd and the plateau: without C_iss it is a usage error naming what is
     * missing, and a file given with --output keeps what it held (nothing lost on a refusal).
     */
    @Test
    void aSwitchWithoutCissGetsNoDeckAndTheOutputFileIsKept() throws Exception {
        String[] fixture = CheckFixture.SWITCHES.strip().split("\n");
        String heading = fixture[0];
        String[] cells = fixture[1].split(",", -1);
        java.util.List<String> cols = java.util.List.of(heading.split(","));
        cells[cols.indexOf("c_iss_pf")] = "";
        cells[cols.indexOf("part_number")] = "TST-NOCISS";
        Path sw = CheckFixture.write(tmp.resolve("sw.csv"), heading + "\n" + String.join(",", cells) + "\n");
        Path dr = CheckFixture.write(tmp.resolve("dr.csv"), CheckFixture.DRIVERS);
        Path cat = tmp.resolve("cat-nociss");
        assertEquals(ExitCode.OK, CliRun.on(cat, "import", sw.toString(), dr.toString()).exit());
        Path kept = CheckFixture.write(tmp.resolve("deck.cir"), "* the user's own deck\n");
        CliRun r = CliRun.on(cat, "explain", "--driver", "TST-DRV1", "--switch", "TST-NOCISS", "--freq", "20",
                "--format", "spice", "--output", kept.toString());
        assertEquals(ExitCode.USAGE, r.exit(), r.dump());
        assertTrue(r.err().toLowerCase(java.util.Locale.ROOT).contains("c_iss"), r.dump());
        assertEquals("* the user's own deck\n", java.nio.file.Files.readString(kept), "the file keeps what it held");
    }

    @Test
    void theDemoShowsTheNetworkOfItsFirstChoice() {
        String out = CliRun.on(catalog, "demo").out();
        int eight = out.indexOf("== 8.");
        int net = out.indexOf("\nGate-drive network\n", eight);
        assertTrue(eight > 0 && net > eight && net < out.indexOf("== 9."), out);
        assertTrue(out.substring(net, out.indexOf("== 9.")).contains("  negative gate clamp (Zener):"), out.substring(net));
    }
}
