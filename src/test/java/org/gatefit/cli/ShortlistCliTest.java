package org.gatefit.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code shortlist} and {@code explain} end to end through {@link Cli#create}, on the example
 * catalog. The example rows are input only; which drivers must win and which must fail, and why,
 * is worked out by hand below from the CSV cells and REFERENCES.md, not taken from gatefit.
 */
class ShortlistCliTest {
    private static final ObjectMapper JSON = new ObjectMapper();
    private static final Path DRIVERS = Project.file("examples/drivers.csv");

    /**
     * The SiC traction high side of the scenario: OBP-12M016K4 on an 800 V bus at 10 kHz, +18 / −4 V,
     * R_g 2 Ω, 60 ns target edge, 3.3 V LVCMOS controller.
     */
    private static final String[] SIC_HIGH = {"--switch", "OBP-12M016K4", "--freq", "10", "--bus", "800", "--side",
        "high", "--drive", "18", "--drive-neg", "-4", "--rg", "2", "--edge", "60", "--logic", "lvcmos-3v3"};

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

    private CliRun run(String[] base, String... more) {
        List<String> a = new ArrayList<>(List.of(base));
        a.addAll(List.of(more));
        return CliRun.on(catalog, a.toArray(String[]::new));
    }

    private static Set<String> failing(JsonNode candidate) {
        Set<String> rules = new LinkedHashSet<>();
        for (JsonNode c : candidate.get("checks")) {
            if (c.get("verdict").asText().equals("fail")) {
                rules.add(c.get("rule").asText());
            }
        }
        return rules;
    }

    /**
     * Hand derivation from the CSV rows (OBP-12M016K4: Q_g 210 nC over the 22 V swing −4/+18 V,
     * V_GS −8/+22 V, plateau 7.5 V, R_g,int 1.5 Ω, R_DS(on) at 18 V):
     * <ul>
     *   <li>the drain edge needs Q_gd/t = 62 nC / 60 ns = 1.033 A on the Miller plateau (REFERENCES §8),
     *       1.55 A with the 1.5× margin (common practice, no source); a driver gives (18 − 7.5) V /
     *       (1.4·R_source + 2 + 1.5) Ω into it at 125 °C (output resistance ×1.4, from memory);</li>
     *   <li>every low-side driver (no floating output) and every high-side / half-bridge driver
     *       (offset ratings 100–700 V, all below the 800 V bus) fails {@code high-side};</li>
     *   <li>ISY-5710S (isolated, 5.7 kV rms ≥ 2 × 800 V; supply 13–33 V holds 22 V; rail to −10 V;
     *       10.5 / (1.26 + 3.5) = 2.21 A into the plateau ≥ 1.55 A, 11.5 / (0.84 + 3.5) = 2.65 A out; UVLO 12.4 V rising ≤ 22 − 1 V; falling 11.6 V − 4 V = 7.6 V on the gate ≥ 7.5 V
     *       plateau; V_IH 2.0 / V_IL 0.8 against V_OH 2.8 / V_OL 0.2 (JEDEC, from memory; at the 3.0 V minimum supply);
     *       non-inverting; active; Miller clamp and −4 V hold the off gate) passes every rule: it must be
     *       first and the only passing driver;</li>
     *   <li>ISY-5702S: 10.5 / (5.04 + 3.5) = 1.23 A, 1.19× the plateau need: above 1× but under the
     *       margin → {@code drive-current} warns, nothing fails: second, the only warning driver;</li>
     *   <li>ISY-5710U: the same but {@code v_neg_min_v} 0 — no negative rail for −4 V: fails
     *       {@code negative-bias} only;</li>
     *   <li>CRW-GI5712: V_IH 3.5 V (5 V CMOS thresholds) against V_OH 2.8 V (LVCMOS at its 3.0 V minimum
     *       supply, REFERENCES §9): NM_H −0.7 V
     *       (REFERENCES §6): fails {@code logic-level}; its other figures pass (min(8 A, 22/(1.1+1+1.5)) =
     *       6.1 A; UVLO falling 11.8 − 4 = 7.8 V ≥ 7.5 V);</li>
     *   <li>ISY-3020D: rail 0 V → {@code negative-bias}; V_IORM 630 V peak below the 800 V bus →
     *       {@code high-side};</li>
     *   <li>ISY-5040D: {@code v_neg_min_v} empty = no negative rail (DESIGN.md) → {@code negative-bias};</li>
     *   <li>ISY-3015S: obsolete → {@code lifecycle}; 10.5 / (8.4 + 3.5) = 0.882 A < 1.033 A →
     *       {@code drive-current};</li>
     *   <li>ISY-5006G: 22 V swing above its 6.5 V supply maximum → {@code gate-voltage}.</li>
     * </ul>
     */
    @Test
    void shortlistOnTheSiCHighSideRanksTheOneFitDriverFirstAndFailsTheRestForTheirReasons() throws Exception {
        CliRun r = run(new String[] {"shortlist"}, concat(SIC_HIGH, "--format", "json", "--all", "--top", "100"));
        assertEquals(ExitCode.OK, r.exit(), r.dump());
        JsonNode root = JSON.readTree(r.out());
        assertEquals("OBP-12M016K4", root.get("switch").isTextual() ? root.get("switch").asText()
                : root.get("switch").get("part_number").asText());
        JsonNode cands = root.get("candidates");
        List<CSVRecord> drivers = records(DRIVERS);
        assertEquals(drivers.size(), cands.size(), "--all lists every driver of the catalog");

        JsonNode first = cands.get(0);
        assertEquals("ISY-5710S", first.get("driver").asText(), r.out());
        assertEquals("pass", first.get("verdict").asText());
        assertEquals("ISY-5702S", cands.get(1).get("driver").asText(), r.out());
        assertEquals("warn", cands.get(1).get("verdict").asText());
        for (int i = 2; i < cands.size(); i++) {
            assertEquals("fail", cands.get(i).get("verdict").asText(), cands.get(i).get("driver").asText()
                    + " should fail");
            assertTrue(cands.get(i).get("score").asDouble() <= 0.25, "failing pairs score at most 0.25");
            assertTrue(cands.get(i).get("score").asDouble() < first.get("score").asDouble());
        }

        Map<String, JsonNode> by = new HashMap<>();
        cands.forEach(c -> by.put(c.get("driver").asText(), c));
        for (CSVRecord d : drivers) {
            if (!d.get("topology").equals("isolated")) {
                assertTrue(failing(by.get(d.get("part_number"))).contains("high-side"),
                        d.get("part_number") + " (" + d.get("topology") + ", offset '" + d.get("v_offset_max_v")
                                + "' V) must fail high-side on an 800 V high side");
            }
        }
        assertEquals(Set.of("negative-bias"), failing(by.get("ISY-5710U")));
        assertEquals(Set.of("logic-level"), failing(by.get("CRW-GI5712")));
        assertTrue(failing(by.get("ISY-3020D")).containsAll(Set.of("negative-bias", "high-side")));
        assertTrue(failing(by.get("ISY-5040D")).contains("negative-bias"));
        assertEquals(Set.of(), failing(by.get("ISY-5702S")));
        assertTrue(failing(by.get("ISY-3015S")).containsAll(Set.of("lifecycle", "drive-current")));
        assertTrue(failing(by.get("ISY-5006G")).contains("gate-voltage"));
        // Messages carry the figures: 1.033 A × 1.5 = 1.55 A needed, 1.23 A given, printed to three digits.
        String dc = message(by.get("ISY-5702S"), "drive-current");
        assertTrue(dc.contains("1.55 A") && dc.contains("1.23 A") && dc.contains("125 °C"), dc);
        String ll = message(by.get("CRW-GI5712"), "logic-level");
        assertTrue(ll.contains("3.5 V") && ll.contains("2.8 V"), ll);
    }

    @Test
    void shortlistWithoutAllListsOnlyWorkingDriversAndCarriesTheCaution() {
        CliRun r = run(new String[] {"shortlist"}, SIC_HIGH);
        assertEquals(ExitCode.OK, r.exit(), r.dump());
        assertTrue(r.out().contains("ISY-5710S"), r.dump());
        assertFalse(r.out().contains("CRW-GI5712"), "failing drivers are left out without --all: " + r.out());
        assertTrue(r.out().replaceAll("\\s+", " ").contains("High voltage can kill"), r.out());
    }

    @Test
    void aSmallCatalogIsEvaluatedDriverByDriverSoEveryFailureIsCounted() throws Exception {
        // Fewer drivers than Shortlist.PREFILTER_FROM: no prefilter, every driver evaluated and counted.
        CliRun r = run(new String[] {"shortlist"}, concat(SIC_HIGH, "--format", "json"));
        JsonNode root = JSON.readTree(r.out());
        int n = records(DRIVERS).size();
        assertTrue(n < org.gatefit.match.Shortlist.PREFILTER_FROM);
        assertEquals(n, root.get("evaluated").asInt(), r.out());
        assertEquals(0, root.get("skipped").asInt());
        assertEquals(0, root.get("prefilter").size());
        assertEquals(n, root.get("passing").asInt() + root.get("warning").asInt() + root.get("failing").asInt());
    }

    private static String message(JsonNode candidate, String rule) {
        for (JsonNode c : candidate.get("checks")) {
            if (c.get("rule").asText().equals(rule)) {
                return c.get("message").asText();
            }
        }
        throw new AssertionError("no check " + rule);
    }

    private static String[] concat(String[] a, String... b) {
        List<String> l = new ArrayList<>(List.of(a));
        l.addAll(List.of(b));
        return l.toArray(String[]::new);
    }

    // ------------------------------------------------------------------ explain

    /**
     * The motor controller's high side: YSP-N10T22 (100 V, Q_g 105 nC at 10 V) on PGL-HB1046
     * (100 V half-bridge, built-in bootstrap diode) at 48 V, 20 kHz, 12 V, duty ≤ 0.9, 150 ns edge, R_g 22 Ω on
     * and 0.5 Ω off (a slow turn-on and a stiff turn-off, so the twin's edge cannot lift the off gate: dv-dt).
     * Every input of every DESIGN.md figure is in the two rows (C_iss, C_rss, Q_gd, plateau, V_th,min,
     * R_g,int, UVLO, V_IH/V_IL, P_max), and a bootstrapped high side has a bootstrap capacitor.
     */
    private static final String[] MOTOR_HIGH = {"explain", "--driver", "PGL-HB1046", "--switch", "YSP-N10T22", "--freq",
        "20", "--bus", "48", "--side", "high", "--drive", "12", "--duty-max", "0.9", "--rg", "22", "--rg-off", "0.5",
        "--edge", "150",
        "--logic", "lvcmos-3v3"};

    @Test
    void explainOfASoundPairExitsZeroWithTheDesignJsonKeysAndEveryFigure() throws Exception {
        CliRun r = run(MOTOR_HIGH, "--format", "json");
        assertEquals(ExitCode.OK, r.exit(), r.dump());
        JsonNode root = JSON.readTree(r.out());
        for (String k : List.of("driver", "switch", "verdict", "checks", "figures")) {
            assertTrue(root.has(k), "explain JSON has '" + k + "': " + r.out());
        }
        assertEquals("PGL-HB1046", root.get("driver").asText());
        assertEquals("YSP-N10T22", root.get("switch").asText());
        assertFalse(root.get("verdict").asText().equals("fail"), r.out());
        Set<String> rules = new LinkedHashSet<>();
        for (JsonNode c : root.get("checks")) {
            assertTrue(c.has("rule") && c.has("verdict") && c.has("message"), c.toString());
            rules.add(c.get("rule").asText());
        }
        assertEquals(Set.of("drive-current", "gate-voltage", "negative-bias", "uvlo", "logic-level", "polarity",
                "high-side", "bootstrap", "driver-power", "dv-dt", "gate-ringing", "protection", "lifecycle"), rules);
        Map<String, JsonNode> figs = new HashMap<>();
        for (JsonNode f : root.get("figures")) {
            assertTrue(f.has("name") && f.has("value") && f.has("unit"), f.toString());
            figs.put(f.get("name").asText(), f);
        }
        Map<String, String> units = Map.ofEntries(Map.entry("gate-current-required", "A"),
                Map.entry("gate-current-peak-source", "A"), Map.entry("gate-current-peak-sink", "A"),
                Map.entry("plateau-time-on", "s"), Map.entry("plateau-time-off", "s"),
                Map.entry("gate-drive-power", "W"), Map.entry("driver-power", "W"),
                Map.entry("bootstrap-capacitance-min", "F"), Map.entry("gate-resistance-critical", "Ω"),
                Map.entry("noise-margin-high", "V"), Map.entry("noise-margin-low", "V"),
                Map.entry("miller-induced-voltage", "V"));
        for (Map.Entry<String, String> e : units.entrySet()) {
            JsonNode f = figs.get(e.getKey());
            assertTrue(f != null, "figure " + e.getKey() + " present: " + figs.keySet());
            assertEquals(e.getValue(), f.get("unit").asText(), e.getKey());
            assertTrue(f.get("value").isNumber() && Double.isFinite(f.get("value").asDouble()), f.toString());
        }
        // Q_g over the swing, divided by the edge (REFERENCES §1); checked against the figure's own charge.
        double q = figs.get("gate-charge-at-swing").get("value").asDouble();
        assertEquals(q / 150e-9, figs.get("gate-current-required").get("value").asDouble(), 1e-9 * q / 150e-9);
        // P_G = Q_g·ΔV·f (REFERENCES §2) with ΔV 12 V, f 20 kHz.
        assertEquals(q * 12 * 20e3, figs.get("gate-drive-power").get("value").asDouble(), 1e-9);
        // NM = V_OH − V_IH = 2.8 − 2.0 (LVCMOS at its 3.0 V minimum supply, REFERENCES §9); V_IL − V_OL =
        // 0.8 − 0.2 (REFERENCES §6, JEDEC from memory; driver row).
        assertEquals(0.8, figs.get("noise-margin-high").get("value").asDouble(), 1e-9);
        assertEquals(0.6, figs.get("noise-margin-low").get("value").asDouble(), 1e-9);
    }

    @Test
    void explainOfAFailingPairExitsOneAndNamesTheRule() throws Exception {
        // ISY-5710U has no negative rail (v_neg_min_v 0) but the stage asks −4 V off: negative-bias fails.
        CliRun r = run(new String[] {"explain", "--driver", "ISY-5710U"}, concat(SIC_HIGH, "--format", "json"));
        assertEquals(ExitCode.FAILED, r.exit(), r.dump());
        JsonNode root = JSON.readTree(r.out());
        assertEquals("fail", root.get("verdict").asText());
        boolean found = false;
        for (JsonNode c : root.get("checks")) {
            if (c.get("rule").asText().equals("negative-bias")) {
                assertEquals("fail", c.get("verdict").asText());
                assertTrue(c.get("message").asText().contains("-4 V"), c.toString());
                found = true;
            }
        }
        assertTrue(found);
    }

    @Test
    void explainTextCarriesTheSafetyCaution() {
        CliRun r = run(MOTOR_HIGH);
        assertEquals(ExitCode.OK, r.exit(), r.dump());
        String flat = r.out().replaceAll("\\s+", " ");
        assertTrue(flat.contains("estimates from datasheet values"), r.out());
        assertTrue(flat.contains("Verify every pair on the bench and against each part's datasheet"), r.out());
        assertTrue(flat.contains("High voltage can kill"), r.out());
        assertTrue(flat.contains("follow local codes and licensed practice"), r.out());
    }

    @Test
    void helpOfBothCommandsExitsZero() {
        for (String cmd : List.of("shortlist", "explain")) {
            CliRun r = CliRun.on(catalog, cmd, "--help");
            assertEquals(ExitCode.OK, r.exit(), r.dump());
            assertTrue(r.out().contains("--freq") && r.out().contains("--drive-neg"), r.dump());
        }
    }

    @Test
    void aFrequencyInAmperesIsAUsageErrorNamingTheOption() {
        for (String cmd : List.of("shortlist", "explain")) {
            List<String> a = new ArrayList<>(List.of(cmd, "--switch", "OBP-12M016K4", "--freq", "12A"));
            if (cmd.equals("explain")) {
                a.addAll(List.of("--driver", "ISY-5710S"));
            }
            CliRun r = CliRun.on(catalog, a.toArray(String[]::new));
            assertEquals(ExitCode.USAGE, r.exit(), r.dump());
            assertTrue(r.err().contains("--freq"), r.dump());
            assertTrue(r.out().isEmpty(), "nothing on standard output: " + r.dump());
        }
    }
}
