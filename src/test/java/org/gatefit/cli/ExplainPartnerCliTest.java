package org.gatefit.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code explain --stages FILE --stage ID} judges the pair as {@code check} judges that stage: in a
 * half-bridge the dv-dt rule judges the bridge partner's turn-on edge, so the dv-dt check and figure
 * are check's own. The example design has two bridges of unlike halves: TI-VH (ISY-5710U) against
 * TI-VL (CRW-GI5712) on one leg, and GC-CLAMP (QND-65G300D) against GC-MAIN (QND-65G150D). The
 * expected values are what {@code check} reports for the same stage (the reference here is the
 * command that judges the whole design, not a number of our own).
 */
class ExplainPartnerCliTest {
    private static final ObjectMapper JSON = new ObjectMapper();
    private static final Path STAGES = Project.file("examples/stages.csv");
    private static final Path BOM = Project.file("examples/bom.csv");
    /** Stage-sheet column → the option of the same meaning. */
    private static final String[][] COLUMNS = {{"side", "--side"}, {"bus_v", "--bus"}, {"f_sw_khz", "--freq"},
        {"edge_ns", "--edge"}, {"v_drive_v", "--drive"}, {"v_drive_neg_v", "--drive-neg"}, {"logic", "--logic"},
        {"v_oh_v", "--v-oh"}, {"v_ol_v", "--v-ol"}, {"pwm_sense", "--pwm"}, {"r_g_ohm", "--rg"},
        {"r_g_off_ohm", "--rg-off"}, {"duty_max", "--duty-max"}, {"parallel", "--parallel"}, {"loop_nh", "--loop"},
        {"bridge", "--bridge"}, {"t_j_c", "--tj"}};

    @TempDir
    Path tmp;
    Path catalog;
    JsonNode check;

    @BeforeEach
    void importExamplesAndCheckTheDesign() throws IOException {
        catalog = CliRun.examples(tmp.resolve("catalog"));
        CliRun c = CliRun.on(catalog, "check", STAGES.toString(), "--bom", BOM.toString(), "--format", "json");
        assertTrue(c.exit() == ExitCode.OK || c.exit() == ExitCode.FAILED, c.dump());
        check = JSON.readTree(c.out());
    }

    private JsonNode stage(String id) {
        for (JsonNode s : check.get("results")) {
            if (s.get("stage").asText().equals(id)) {
                return s;
            }
        }
        throw new AssertionError(id);
    }

    private static JsonNode named(JsonNode list, String field, String name) {
        for (JsonNode n : list) {
            if (n.get(field).asText().equals(name)) {
                return n;
            }
        }
        throw new AssertionError(name + " not in " + list);
    }

    private JsonNode explain(List<String> args) throws IOException {
        List<String> all = new ArrayList<>(args);
        all.addAll(List.of("--format", "json"));
        CliRun r = CliRun.on(catalog, all.toArray(String[]::new));
        assertTrue(r.exit() == ExitCode.OK || r.exit() == ExitCode.FAILED, r.dump());
        return JSON.readTree(r.out());
    }

    /** explain of the stage's own pair (as check resolved it), with {@code more}. */
    private List<String> pair(String id, String... more) {
        JsonNode s = stage(id);
        List<String> a = new ArrayList<>(List.of("explain", "--driver", s.get("driver").asText(), "--switch",
                s.get("switch").asText()));
        a.addAll(List.of(more));
        return a;
    }

    /** The stage row's non-empty cells as command-line options (read with Commons CSV). */
    private static List<String> typed(String id) throws IOException {
        try (Reader in = Files.newBufferedReader(STAGES, StandardCharsets.UTF_8)) {
            for (CSVRecord r : CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true).get().parse(in)) {
                if (r.get("stage").equals(id)) {
                    List<String> out = new ArrayList<>();
                    for (String[] c : COLUMNS) {
                        if (!r.get(c[0]).isBlank()) {
                            out.add(c[1]);
                            out.add(r.get(c[0]));
                        }
                    }
                    return out;
                }
            }
        }
        throw new AssertionError(id);
    }

    private static void sameDvDt(JsonNode want, JsonNode got, String id) {
        JsonNode w = named(want.get("checks"), "rule", "dv-dt");
        JsonNode g = named(got.get("checks"), "rule", "dv-dt");
        assertEquals(w.get("verdict"), g.get("verdict"), id);
        assertEquals(w.get("message"), g.get("message"), id);
        assertEquals(w.get("comparisons"), g.get("comparisons"), id);
        assertEquals(named(want.get("figures"), "name", "dv-dt"), named(got.get("figures"), "name", "dv-dt"), id);
        assertEquals(named(want.get("figures"), "name", "miller-induced-voltage"),
                named(got.get("figures"), "name", "miller-induced-voltage"), id);
    }

    @Test
    void aStageOfABridgeOfUnlikeHalvesIsJudgedOnItsPartnersEdgeAsCheckJudgesIt() throws Exception {
        for (String[] s : new String[][] {{"TI-VH", "TI-VL"}, {"GC-CLAMP", "GC-MAIN"}}) {
            String id = s[0];
            JsonNode saved = explain(pair(id, "--stages", STAGES.toString(), "--bom", BOM.toString(), "--stage", id));
            sameDvDt(stage(id), saved, id);
            assertTrue(named(saved.get("checks"), "rule", "dv-dt").get("message").asText()
                    .contains("(" + s[1] + "'s turn-on)"), "the sentence names whose edge: " + saved);
            assertEquals(s[1], saved.get("operating_point").get("twin").get("name").asText());
            assertEquals(stage(id).get("operating_point").get("twin"), saved.get("operating_point").get("twin"), id);

            // The same pair at the same point typed without the sheet judges its own edge.
            List<String> plainArgs = pair(id);
            plainArgs.addAll(typed(id));
            JsonNode plain = explain(plainArgs);
            assertTrue(named(plain.get("checks"), "rule", "dv-dt").get("message").asText()
                    .contains("(the twin's turn-on)"), plain.toString());
            assertNotEquals(named(saved.get("figures"), "name", "dv-dt").get("value"),
                    named(plain.get("figures"), "name", "dv-dt").get("value"), id + ": unlike halves, unlike edges");
        }
    }

    @Test
    void twinEdgeTakesThePartnersEdgeFromChecksJson() throws Exception {
        JsonNode t = stage("GC-CLAMP").get("operating_point").get("twin");
        String edge = t.get("name").asText() + "=" + t.get("dv_dt_25c_v_per_ns").asText() + ","
                + t.get("dv_dt_tj_v_per_ns").asText();
        List<String> args = pair("GC-CLAMP", "--twin-edge", edge);
        args.addAll(typed("GC-CLAMP"));
        JsonNode given = explain(args);
        JsonNode w = named(stage("GC-CLAMP").get("checks"), "rule", "dv-dt");
        JsonNode g = named(given.get("checks"), "rule", "dv-dt");
        assertEquals(w.get("verdict"), g.get("verdict"));
        assertEquals(w.get("message"), g.get("message"));
        assertEquals(named(stage("GC-CLAMP").get("figures"), "name", "dv-dt").get("value").asDouble(),
                named(given.get("figures"), "name", "dv-dt").get("value").asDouble(), 1e-9, "V/ns through text and back");

        // --twin-edge over the row's partner: options given override the sheet.
        JsonNode over = explain(pair("TI-VH", "--stages", STAGES.toString(), "--bom", BOM.toString(), "--stage", "TI-VH",
                "--twin-edge", "OTHER=10,9"));
        assertEquals("OTHER", over.get("operating_point").get("twin").get("name").asText());
        double slew = named(over.get("figures"), "name", "dv-dt").get("value").asDouble();
        assertTrue(slew == 10 || slew == 9, "the slew of the deciding corner is one of the two given: " + slew);
    }

    @Test
    void withoutTheBomThePartnerIsUnknownAndTheWarningSaysWhy() {
        CliRun r = CliRun.on(catalog, pair("TI-VH", "--stages", STAGES.toString(), "--stage", "TI-VH")
                .toArray(String[]::new));
        assertTrue(r.exit() == ExitCode.OK || r.exit() == ExitCode.FAILED, r.dump());
        assertTrue(r.err().contains("warning: --stage TI-VH: 17 stages of " + STAGES + " could not be resolved as check"
                + " resolves them (MC-UH, MC-UL, MC-VH, MC-VL, MC-WH, …; give --bom for designators)"), r.dump());
        assertTrue(r.out().contains("(the twin's turn-on)"), r.out());
    }

    @Test
    void badTwinEdgeOrBomWithoutStagesIsAUsageError() {
        for (String bad : List.of("28.5,26.9", "X=28.5", "X=0,1", "X=a,b", "=1,2")) {
            CliRun r = CliRun.on(catalog, pair("TI-VH", "--freq", "10", "--twin-edge", bad).toArray(String[]::new));
            assertEquals(ExitCode.USAGE, r.exit(), r.dump());
            assertTrue(r.err().contains("--twin-edge: '" + bad + "' is not NAME=COLD,HOT"), r.dump());
        }
        CliRun r = CliRun.on(catalog, pair("TI-VH", "--freq", "10", "--bom", BOM.toString()).toArray(String[]::new));
        assertEquals(ExitCode.USAGE, r.exit(), r.dump());
        assertTrue(r.err().contains("--bom needs --stages and --stage"), r.dump());
        String help = CliRun.on(catalog, "explain", "--help").out().replaceAll("\\s+", " ");
        assertTrue(help.contains("--twin-edge=NAME=COLD,HOT The turn-on edge of the other switch of the bridge")
                && help.contains("--bom=BOM.csv BOM to resolve the designators of the --stages sheet"), help);
    }

    /**
     * shortlist --stages --stage judges the same partner's edge (the other half of the bridge is fixed
     * whichever driver is chosen here): the stage's own driver, listed among the candidates, gets
     * check's dv-dt check and figures.
     */
    @Test
    void shortlistOfAStageJudgesItsPartnersEdgeToo() throws Exception {
        for (String[] s : new String[][] {{"TI-VH", "TI-VL"}, {"GC-CLAMP", "GC-MAIN"}}) {
            String id = s[0];
            JsonNode st = stage(id);
            CliRun r = CliRun.on(catalog, "shortlist", "--switch", st.get("switch").asText(), "--stages", STAGES.toString(),
                    "--bom", BOM.toString(), "--stage", id, "--all", "--top", "60", "--format", "json");
            assertEquals(ExitCode.OK, r.exit(), r.dump());
            JsonNode j = JSON.readTree(r.out());
            assertEquals(s[1], j.get("operating_point").get("twin").get("name").asText(), id);
            JsonNode own = named(j.get("candidates"), "driver", st.get("driver").asText());
            sameDvDt(st, own, id);
        }
    }
}
