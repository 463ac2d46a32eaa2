package org.gatefit.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
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
 * Saved operating points (issue 19): {@code --stages FILE --stage ID} on {@code explain},
 * {@code shortlist} and {@code replace}. The expected operating point is the stage row's cells,
 * read here with Commons CSV and typed as the equivalent command-line options; the answer must be
 * the one gatefit gives for those options.
 */
class SavedPointCliTest {
    private static final ObjectMapper JSON = new ObjectMapper();
    private static final Path STAGES = Project.file("examples/stages.csv");
    /** Stage-sheet column → the option of the same meaning (OperatingPointOptions' help says which). */
    private static final String[][] COLUMNS = {{"side", "--side"}, {"bus_v", "--bus"}, {"f_sw_khz", "--freq"},
        {"edge_ns", "--edge"}, {"v_drive_v", "--drive"}, {"v_drive_neg_v", "--drive-neg"}, {"logic", "--logic"},
        {"v_oh_v", "--v-oh"}, {"v_ol_v", "--v-ol"}, {"pwm_sense", "--pwm"}, {"r_g_ohm", "--rg"},
        {"r_g_off_ohm", "--rg-off"}, {"duty_max", "--duty-max"}, {"parallel", "--parallel"}, {"loop_nh", "--loop"},
        {"bridge", "--bridge"}, {"t_j_c", "--tj"}, {"power_loop_nh", "--power-loop"}, {"i_load_a", "--load"}};

    @TempDir
    Path tmp;
    Path catalog;

    @BeforeEach
    void importExamples() {
        catalog = CliRun.examples(tmp.resolve("catalog"));
    }

    /** The stage row's non-empty cells as command-line options. */
    private static List<String> options(String stage) throws IOException {
        try (Reader in = Files.newBufferedReader(STAGES, StandardCharsets.UTF_8)) {
            for (CSVRecord r : CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true).get().parse(in)) {
                if (r.get("stage").equals(stage)) {
                    List<String> out = new ArrayList<>();
                    for (String[] c : COLUMNS) {
                        if (r.isMapped(c[0]) && !r.get(c[0]).isBlank()) {
                            out.add(c[1]);
                            out.add(r.get(c[0]));
                        }
                    }
                    return out;
                }
            }
        }
        throw new AssertionError(stage);
    }

    private JsonNode json(List<String> args) throws IOException {
        CliRun r = CliRun.on(catalog, args.toArray(String[]::new));
        assertTrue(r.exit() == ExitCode.OK || r.exit() == ExitCode.FAILED, r.dump());
        JsonNode j = JSON.readTree(r.out());
        if (j instanceof ObjectNode o) {
            o.remove("report"); // the provenance header names the input files, which differ
        }
        return j;
    }

    private static List<String> list(String... a) {
        return new ArrayList<>(List.of(a));
    }

    @Test
    void explainTakesTheRowsOperatingPointAndTheCommandLineOverridesIt() throws Exception {
        // GC-MAIN: QND-D06L (U12) on QND-65G150D (Q15), 375 V, 200 kHz, 10 ns, 6 V, V_OH 4.6 V, …
        List<String> pair = list("explain", "--driver", "QND-D06L", "--switch", "QND-65G150D", "--format", "json");
        List<String> typed = list();
        typed.addAll(pair);
        typed.addAll(options("GC-MAIN"));
        List<String> saved = list();
        saved.addAll(pair);
        saved.addAll(List.of("--stages", STAGES.toString(), "--stage", "GC-MAIN"));
        JsonNode want = json(typed);
        assertEquals("375.0", want.get("operating_point").get("bus_v").asText(), "the row's bus, as typed");
        assertEquals(want, json(saved));

        // --freq on the command line wins over the row's 200 kHz.
        typed.set(typed.indexOf("--freq") + 1, "100");
        saved.addAll(List.of("--freq", "100"));
        JsonNode over = json(saved);
        assertEquals(100_000.0, over.get("operating_point").get("f_sw_hz").asDouble());
        assertEquals(json(typed), over);
    }

    @Test
    void shortlistTakesTheRowsOperatingPoint() throws Exception {
        // PFC-A1: 400 V, 65 kHz, 60 ns, 12 V on THW-65R099F (Q8 in the BOM).
        List<String> base = list("shortlist", "--switch", "THW-65R099F", "--top", "5", "--format", "json");
        List<String> typed = list();
        typed.addAll(base);
        typed.addAll(options("PFC-A1"));
        List<String> saved = list();
        saved.addAll(base);
        saved.addAll(List.of("--stages", STAGES.toString(), "--stage", "pfc-a1"));
        JsonNode want = json(typed);
        assertTrue(want.get("candidates").size() > 0, want.toString());
        assertEquals(want, json(saved), "stage ids are matched without regard to case");
    }

    @Test
    void replaceReChecksOnlyTheNamedStage() throws Exception {
        JsonNode r = json(list("replace", "CVL-1025TL", "--stages", STAGES.toString(), "--bom",
                Project.file("examples/bom.csv").toString(), "--stage", "MC-VH", "--format", "json"));
        assertEquals("[\"MC-VH\"]", r.get("stages").toString());
        for (JsonNode c : r.get("candidates")) {
            for (JsonNode s : c.get("stage_results")) {
                assertEquals("MC-VH", s.get("stage").asText());
            }
        }
        CliRun other = CliRun.on(catalog, "replace", "CVL-1025TL", "--stages", STAGES.toString(), "--bom",
                Project.file("examples/bom.csv").toString(), "--stage", "PFC-A1");
        assertEquals(ExitCode.USAGE, other.exit(), other.dump());
        assertTrue(other.err().contains("--stage PFC-A1: that row of " + STAGES + " does not use CVL-1025TL"),
                other.dump());
    }

    @Test
    void aMissingRowOrOptionIsAUsageErrorSayingWhatToGive() {
        CliRun none = CliRun.on(catalog, "explain", "--driver", "QND-D06L", "--switch", "QND-65G150D", "--stages",
                STAGES.toString(), "--stage", "NOPE");
        assertEquals(ExitCode.USAGE, none.exit(), none.dump());
        assertTrue(none.err().contains("--stage: no stage 'NOPE' in " + STAGES + "; its stages: MC-UH, MC-UL"),
                none.dump());

        CliRun noSheet = CliRun.on(catalog, "shortlist", "--switch", "QND-65G150D", "--stage", "GC-MAIN");
        assertEquals(ExitCode.USAGE, noSheet.exit(), noSheet.dump());
        assertTrue(noSheet.err().contains("--stage GC-MAIN needs --stages FILE"), noSheet.dump());

        CliRun noRow = CliRun.on(catalog, "shortlist", "--switch", "QND-65G150D", "--stages", STAGES.toString());
        assertEquals(ExitCode.USAGE, noRow.exit(), noRow.dump());
        assertTrue(noRow.err().contains("name the row to take the operating point from with --stage ID"), noRow.dump());

        CliRun noFreq = CliRun.on(catalog, "explain", "--driver", "QND-D06L", "--switch", "QND-65G150D");
        assertEquals(ExitCode.USAGE, noFreq.exit(), noFreq.dump());
        assertTrue(noFreq.err().contains("Missing required option: '--freq=kHz'"), noFreq.dump());

        CliRun missing = CliRun.on(catalog, "explain", "--driver", "QND-D06L", "--switch", "QND-65G150D", "--stages",
                tmp.resolve("nope.csv").toString(), "--stage", "X");
        assertEquals(ExitCode.BAD_DATA, missing.exit(), missing.dump());
        assertTrue(missing.err().contains("nope.csv"), missing.dump());
    }

    /**
     * replace reads its stage sheet through the same front end as check (issue 18, "One front end"):
     * the example sheet saved as a European office saves it — a title row, semicolons, decimal
     * commas, Windows-1252, and a heading of the office's own ("Stufe" for stage) — is read with
     * --encoding, --header-row and --map, and gives the same re-checked stages as the original sheet.
     */
    /** The example stage sheet as a European office saves it (see below), written to {@code tmp}. */
    private Path officeCopy() throws IOException {
        List<String> lines = Files.readAllLines(STAGES, StandardCharsets.UTF_8);
        StringBuilder office = new StringBuilder("Stufenliste Antrieb, Rev. B (Entwurf für Prüfung)\r\n");
        office.append(lines.get(0).replace("stage,", "Stufe,").replace(',', ';')).append("\r\n");
        for (String l : lines.subList(1, lines.size())) {
            office.append(l.replace(',', ';').replaceAll("(\\d)\\.(\\d)", "$1,$2")).append("\r\n");
        }
        Path sheet = tmp.resolve("stufen.csv");
        Files.write(sheet, office.toString().getBytes(java.nio.charset.Charset.forName("windows-1252")));
        return sheet;
    }

    @Test
    void replaceReadsItsStageSheetWithTheSheetOptionsCheckTakes() throws Exception {
        Path sheet = officeCopy();
        String bom = Project.file("examples/bom.csv").toString();
        JsonNode want = json(list("replace", "CVL-1025TL", "--stages", STAGES.toString(), "--bom", bom, "--format", "json"));
        JsonNode got = json(list("replace", "CVL-1025TL", "--stages", sheet.toString(), "--bom", bom, "--encoding",
                "windows-1252", "--header-row", "2", "--map", "Stufe=stage", "--format", "json"));
        assertEquals(want.get("stages"), got.get("stages"));
        assertTrue(want.get("stages").size() >= 3, want.get("stages").toString());
        assertEquals(want.get("candidates").toString().replace(STAGES.toString(), "SHEET"),
                got.get("candidates").toString().replace(sheet.toString(), "SHEET"));
        CliRun plain = CliRun.on(catalog, "replace", "CVL-1025TL", "--stages", sheet.toString(), "--bom", bom);
        assertTrue(plain.exit() != ExitCode.OK, "without the options the title row is no header: " + plain.dump());
    }

    /** explain and shortlist read a --stages sheet with the same options too (and the partner search with them). */
    @Test
    void explainAndShortlistReadTheirStageSheetWithTheSheetOptions() throws Exception {
        Path sheet = officeCopy();
        String bom = Project.file("examples/bom.csv").toString();
        List<String> options = List.of("--encoding", "windows-1252", "--header-row", "2", "--map", "Stufe=stage");
        List<String> explain = list("explain", "--driver", "CRW-GI5712", "--switch", "OBP-12M016K4", "--bom", bom,
                "--stage", "TI-VL", "--format", "json");
        List<String> original = new ArrayList<>(explain);
        original.addAll(List.of("--stages", STAGES.toString()));
        List<String> office = new ArrayList<>(explain);
        office.addAll(List.of("--stages", sheet.toString()));
        office.addAll(options);
        assertEquals(json(original).get("checks"), json(office).get("checks"));
        assertEquals("TI-VH", json(office).get("operating_point").get("twin").get("name").asText());
        List<String> shortlist = list("shortlist", "--switch", "OBP-12M016K4", "--stage", "ti-vl", "--top", "5",
                "--format", "json", "--stages", sheet.toString());
        shortlist.addAll(options);
        List<String> typed = list("shortlist", "--switch", "OBP-12M016K4", "--stage", "ti-vl", "--top", "5",
                "--format", "json", "--stages", STAGES.toString());
        assertEquals(json(typed).get("candidates"), json(shortlist).get("candidates"));
    }
}
