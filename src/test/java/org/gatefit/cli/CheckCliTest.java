package org.gatefit.cli;

import static org.gatefit.cli.CheckFixture.STAGE_HEADER;
import static org.gatefit.cli.CheckFixture.baseline;
import static org.gatefit.cli.CheckFixture.check;
import static org.gatefit.cli.CheckFixture.failing;
import static org.gatefit.cli.CheckFixture.figure;
import static org.gatefit.cli.CheckFixture.json;
import static org.gatefit.cli.CheckFixture.stage;
import static org.gatefit.cli.CheckFixture.write;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import javax.xml.parsers.DocumentBuilder;
import javax.xml.parsers.DocumentBuilderFactory;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.w3c.dom.Document;
import org.w3c.dom.Element;
import org.w3c.dom.NodeList;

/**
 * {@code check} end to end through {@link Cli#create}: a stage sheet with one clear mismatch per
 * rule over the invented {@link CheckFixture} catalog, bad input, JUnit XML and the half-bridge
 * dead-time note. Each failing stage is the baseline stage of {@link CheckFixture} with one cell
 * or one part changed; the comment beside it derives why exactly that rule fails.
 */
class CheckCliTest {
    private static final List<String> RULES = List.of("catalog", "drive-current", "gate-voltage", "negative-bias", "uvlo",
            "logic-level", "polarity", "high-side", "bootstrap", "driver-power", "dv-dt", "gate-ringing", "protection", "lifecycle");

    /** Stage id → the one rule it must fail, in sheet order. */
    private static final Map<String, String> INTENDED = new LinkedHashMap<>();

    static {
        INTENDED.put("F-DRIVE", "drive-current");
        INTENDED.put("F-GATE", "gate-voltage");
        INTENDED.put("F-NEG", "negative-bias");
        INTENDED.put("F-UVLO", "uvlo");
        INTENDED.put("F-LOGIC", "logic-level");
        INTENDED.put("F-POL", "polarity");
        INTENDED.put("F-HIGH", "high-side");
        INTENDED.put("F-BOOT", "bootstrap");
        INTENDED.put("F-POWER", "driver-power");
        INTENDED.put("F-DVDT", "dv-dt");
        INTENDED.put("F-LIFE", "lifecycle");
        INTENDED.put("F-CAT", "catalog");
    }

    private static final String SHEET = STAGE_HEADER
            + baseline("PASS-1", "TST-DRV1", "TST-SW1")
            // Edge 5 ns: I_req = 50 nC / 5 ns = 10 A (REFERENCES.md §1), but the driver gives at most
            // 12 V / 5.2 Ω = 2.31 A source: ratio 0.23 < 1 → fail. No other rule uses the edge.
            + "F-DRIVE,TST-DRV1,TST-SW1,low,48,20,5,12,0,,3.1,0.2,active-high,2.2,1.0,0.9,1,5,no\n"
            // TST-SW3 is an e-mode GaN part with V_GS,max 7 V: 12 V on > 7 V → fail (REFERENCES.md §5).
            // Its UVLO need is max(V_pl 3, V_th,max 2.5) = 3 V ≤ 6.5 V; dv/dt bound 2 pF · (48 V /
            // (1.5 nC · 4.7 Ω / 9 V = 0.78 ns)) · 2.5 Ω = 0.31 V ≤ 0.7 · 1.2 V = 0.84 V.
            + "F-GATE,TST-DRV1,TST-SW3,low,48,20,100,12,0,,3.1,0.2,active-high,2.2,1.0,0.9,1,5,no\n"
            // Off at −1 V, but TST-DRV1 has no negative rail (v_neg_min_v 0) → fail. UVLO still passes:
            // at lock-out 6.5 V total leaves 6.5 − 1 = 5.5 V on ≥ the 5 V plateau; 13 V swing ≤ 20 V.
            + "F-NEG,TST-DRV1,TST-SW1,low,48,20,100,12,-1,,3.1,0.2,active-high,2.2,1.0,0.9,1,5,no\n"
            // TST-DRV4 locks out only at 4.2 V (falling), below the 5 V plateau: a sagging supply leaves
            // the switch half-on (REFERENCES.md §5) → fail. It starts at 4.5 V + 1 V ≤ 12 V; supply 4.5–20 V.
            + "F-UVLO,TST-DRV4,TST-SW1,low,48,20,100,12,0,,3.1,0.2,active-high,2.2,1.0,0.9,1,5,no\n"
            // 1.8 V LVCMOS: V_OH = V_DD − 0.45 = 1.35 V (JESD8-7, REFERENCES.md §6, from memory) into
            // V_IH 2.0 V: NM_H = −0.65 V < 0 → fail. NM_L = 0.8 − 0.45 = 0.35 V ≥ 0.1 V.
            + "F-LOGIC,TST-DRV1,TST-SW1,low,48,20,100,12,0,lvcmos-1v8,,,active-high,2.2,1.0,0.9,1,5,no\n"
            // Active-low PWM into a non-inverting driver: on when it should be off → fail (plain logic).
            + "F-POL,TST-DRV1,TST-SW1,low,48,20,100,12,0,,3.1,0.2,active-low,2.2,1.0,0.9,1,5,no\n"
            // High side on TST-DRV5, floating offset rated 40 V < 48 V bus → fail. Its bootstrap passes
            // (built-in diode, duty 0.9, 12 − 0.7 − 10 = 1.3 V droop allowed; REFERENCES.md §4).
            + "F-HIGH,TST-DRV5,TST-SW1,high,48,20,100,12,0,,3.1,0.2,active-high,2.2,1.0,0.9,1,5,no\n"
            // High side on TST-DRV2 (200 V offset ≥ 1.2 · 48 V = 57.6 V) at 100 % duty: a bootstrap
            // recharges only while the low side is on, so 100 % is impossible (REFERENCES.md §4) → fail.
            + "F-BOOT,TST-DRV2,TST-SW1,high,48,20,100,12,0,,3.1,0.2,active-high,2.2,1.0,1.0,1,5,no\n"
            // 1 MHz: P_G = 50 nC · 12 V · 1 MHz = 0.6 W; driver share 0.3 W · 2/5.2 + 0.3 W · 1/3 =
            // 0.2154 W (REFERENCES.md §2) > TST-DRV6's 0.1 W package limit → fail.
            + "F-POWER,TST-DRV6,TST-SW1,low,48,1000,100,12,0,,3.1,0.2,active-high,2.2,1.0,0.9,1,5,no\n"
            // In a bridge (bridge = yes): the twin turns on against it. Charge-consistent (REFERENCES.md §7,
            // §8): at 125 °C (driver ×1.4, V_th −0.6 V, from memory) the twin's plateau current is
            // 7 V / (2.8 + 2.2 + 1) Ω = 1.167 A, so 48 V moves in 10 nC / 1.167 A = 8.571 ns (5.6 V/ns);
            // C_gd,avg 10 nC / 48 V carries the same 1.167 A through 1.4 + 1 + 1 = 3.4 Ω and C_iss 3 nF:
            // 3.967 V · (1 − e^(−8.571/10.2)) = 2.255 V ≥ V_th,min 1.4 V, no Miller clamp → fail (at 25 °C
            // 2.269 V against 2 V: the hot corner is nearer). TST-SW5's large C_rss no longer matters.
            + "F-DVDT,TST-DRV1,TST-SW5,low,48,20,100,12,0,,3.1,0.2,active-high,2.2,1.0,0.9,1,5,yes\n"
            // TST-SW6 is the baseline switch marked obsolete → lifecycle fail (DESIGN.md: obsolete fails).
            + baseline("F-LIFE", "TST-DRV1", "TST-SW6")
            // TST-SW99 is not in the catalog → catalog fail.
            + baseline("F-CAT", "TST-DRV1", "TST-SW99");

    @TempDir
    Path tmp;
    Path catalog;

    @BeforeEach
    void importTestCatalog() throws Exception {
        catalog = CheckFixture.importCatalog(tmp);
    }

    @Test
    void eachMismatchFailsExactlyItsRuleAndTheExitCodeIsOne() throws Exception {
        Path sheet = write(tmp.resolve("stages.csv"), SHEET);
        CliRun r = CliRun.on(catalog, "check", sheet.toString(), "--format", "json");
        assertEquals(ExitCode.FAILED, r.exit(), r.dump());
        JsonNode report = json(r);
        Map<String, Set<String>> failing = failing(report);
        assertEquals(Set.of(), failing.get("PASS-1"), r.out());
        assertEquals("pass", stage(report, "PASS-1").get("verdict").asText(), r.out());
        for (Map.Entry<String, String> e : INTENDED.entrySet()) {
            assertEquals(Set.of(e.getValue()), failing.get(e.getKey()), e.getKey() + ": " + stage(report, e.getKey()));
            assertEquals("fail", stage(report, e.getKey()).get("verdict").asText());
        }
        JsonNode summary = report.get("summary");
        assertEquals(13, summary.get("stages").asInt());
        assertEquals(12, summary.get("failed").asInt());
        assertEquals(1, summary.get("passed").asInt());
        assertEquals(0, summary.get("warned").asInt());
        assertTrue(check(stage(report, "F-CAT"), "catalog").get("message").asText().contains("TST-SW99"));
    }

    @Test
    void jsonHasTheShapeOfDesignMd() throws Exception {
        Path sheet = write(tmp.resolve("stages.csv"), SHEET);
        JsonNode report = json(CliRun.on(catalog, "check", sheet.toString(), "--format", "json"));
        List<String> order = new ArrayList<>();
        for (JsonNode s : report.get("results")) {
            order.add(s.get("stage").asText());
            for (String k : List.of("stage", "driver", "switch", "verdict")) {
                assertTrue(s.get(k).isTextual(), k + " in " + s);
            }
            assertTrue(s.get("score").isNumber(), s.toString());
            double score = s.get("score").asDouble();
            assertTrue(score >= 0 && score <= 1, "score in [0, 1]: " + s);
            assertTrue(s.get("checks").isArray() && s.get("checks").size() >= 1, s.toString());
            for (JsonNode c : s.get("checks")) {
                assertTrue(RULES.contains(c.get("rule").asText()), c.toString());
                assertTrue(Set.of("pass", "warn", "fail", "unknown").contains(c.get("verdict").asText()), c.toString());
                assertFalse(c.get("message").asText().isBlank(), c.toString());
            }
            assertTrue(s.get("figures").isArray(), s.toString());
            for (JsonNode f : s.get("figures")) {
                assertTrue(f.get("name").isTextual() && f.get("value").isNumber() && f.get("unit").isTextual(), f.toString());
            }
            assertTrue(s.get("notes").isArray(), s.toString());
        }
        List<String> expected = new ArrayList<>(List.of("PASS-1"));
        expected.addAll(INTENDED.keySet());
        assertEquals(expected, order, "results in sheet order");
        // Both parts found → the catalog check then every rule once; a missing part → only the catalog check.
        List<String> rules = new ArrayList<>();
        stage(report, "PASS-1").get("checks").forEach(c -> rules.add(c.get("rule").asText()));
        assertEquals(RULES, rules);
        assertEquals(1, stage(report, "F-CAT").get("checks").size());
        assertEquals(0, stage(report, "F-CAT").get("figures").size());
        assertEquals("TST-DRV1", stage(report, "PASS-1").get("driver").asText());
        assertEquals("TST-SW1", stage(report, "PASS-1").get("switch").asText());
    }

    @Test
    void figuresOfTheFailingStagesAgreeWithTheHandDerivations() throws Exception {
        Path sheet = write(tmp.resolve("stages.csv"), SHEET);
        JsonNode report = json(CliRun.on(catalog, "check", sheet.toString(), "--format", "json"));
        JsonNode pass = stage(report, "PASS-1");
        // Q_g / t = 50 nC / 100 ns (REFERENCES.md §1)
        assertEquals(0.5, figure(pass, "gate-current-required"), 1e-9);
        // min(4 A, 12 V / (2 + 2.2 + 1) Ω) and min(6 A, 12 V / (1 + 1 + 1) Ω) (REFERENCES.md §1)
        assertEquals(12 / 5.2, figure(pass, "gate-current-peak-source"), 1e-9);
        assertEquals(4.0, figure(pass, "gate-current-peak-sink"), 1e-9);
        // Q_gd·R_on / (V − V_pl) at the 125 °C corner (REFERENCES.md §1 and §8; driver ×1.4 from memory):
        // 10 nC · (1.4·2 + 2.2 + 1) Ω / 7 V
        assertEquals(10e-9 * 6.0 / 7, figure(pass, "plateau-time-on"), 1e-15);
        // P_G = Q_g·ΔV·f (REFERENCES.md §2)
        assertEquals(50e-9 * 12 * 20e3, figure(pass, "gate-drive-power"), 1e-12);
        JsonNode power = stage(report, "F-POWER");
        assertEquals(0.6, figure(power, "gate-drive-power"), 1e-9);
        // each edge spends half, split in proportion to R (REFERENCES.md §2)
        assertEquals(0.3 * 2 / 5.2 + 0.3 * 1 / 3, figure(power, "driver-power"), 1e-9);
        JsonNode dvdt = stage(report, "F-DVDT");
        // the twin's turn-on at 125 °C: 48 V in 10 nC / (7 V / 6 Ω), in V/ns
        double slew = 48 / (10e-9 * 6.0 / 7);
        assertEquals(slew * 1e-9, figure(dvdt, "dv-dt"), 1e-9);
        // (Q_gd / V_bus)·s·R·(1 − e^(−T/(R·C_iss))), T = 48 V / s (REFERENCES.md §7, §8)
        double vpk = 10e-9 / 48 * slew * 3.4 * (1 - Math.exp(-(48 / slew) / (3.4 * 3000e-12)));
        assertEquals(2.255, vpk, 5e-4, "hand value");
        assertEquals(vpk, figure(dvdt, "miller-induced-voltage"), 1e-9);
    }

    @Test
    void aSheetWithOnlyThePassingStageExitsZero() throws Exception {
        Path sheet = write(tmp.resolve("ok.csv"), STAGE_HEADER + baseline("PASS-1", "TST-DRV1", "TST-SW1"));
        CliRun r = CliRun.on(catalog, "check", sheet.toString(), "--format", "json");
        assertEquals(ExitCode.OK, r.exit(), r.dump());
        JsonNode report = json(r);
        assertEquals(1, report.at("/summary/passed").asInt());
        assertEquals(0, report.at("/summary/failed").asInt());
        for (JsonNode c : report.at("/results/0/checks")) {
            assertEquals("pass", c.get("verdict").asText(), c.toString());
        }
        CliRun text = CliRun.on(catalog, "check", sheet.toString());
        assertEquals(ExitCode.OK, text.exit(), text.dump());
        assertTrue(text.out().contains("1 passed"), text.out());
    }

    // ------------------------------------------------------------------ bad input

    @Test
    void aDuplicateStageIdIsBadInputWithFileLineAndColumn() throws Exception {
        Path sheet = write(tmp.resolve("dup.csv"), STAGE_HEADER + baseline("A", "TST-DRV1", "TST-SW1")
                + baseline("A", "TST-DRV1", "TST-SW1"));
        CliRun r = CliRun.on(catalog, "check", sheet.toString());
        assertEquals(ExitCode.BAD_DATA, r.exit(), r.dump());
        assertTrue(r.err().contains(sheet.toString()) && r.err().contains("line 3") && r.err().contains("column stage")
                && r.err().contains("line 2"), r.dump());
        assertEquals("", r.out(), "no results on bad input");
    }

    @Test
    void aMissingRequiredColumnIsBadInputNamingIt() throws Exception {
        Path sheet = write(tmp.resolve("miss.csv"), "stage,driver,switch,f_sw_khz\nA,TST-DRV1,TST-SW1,20\n");
        CliRun r = CliRun.on(catalog, "check", sheet.toString());
        assertEquals(ExitCode.BAD_DATA, r.exit(), r.dump());
        assertTrue(r.err().contains(sheet.toString()) && r.err().contains("line 1") && r.err().contains("v_drive_v"),
                r.dump());
    }

    @Test
    void aUnitOfTheWrongDimensionIsBadInputWithFileLineAndColumn() throws Exception {
        Path sheet = write(tmp.resolve("unit.csv"), "stage,driver,switch,f_sw_khz,v_drive_v\nA,TST-DRV1,TST-SW1,20,12 A\n");
        CliRun r = CliRun.on(catalog, "check", sheet.toString());
        assertEquals(ExitCode.BAD_DATA, r.exit(), r.dump());
        assertTrue(r.err().contains(sheet.toString()) && r.err().contains("line 2") && r.err().contains("column v_drive_v")
                && r.err().contains("12 A"), r.dump());
    }

    @Test
    void aMissingStageSheetOrBomIsBadInput() throws Exception {
        CliRun r = CliRun.on(catalog, "check", tmp.resolve("nope.csv").toString());
        assertEquals(ExitCode.BAD_DATA, r.exit(), r.dump());
        assertTrue(r.err().contains("nope.csv"), r.dump());
        Path sheet = write(tmp.resolve("ok.csv"), STAGE_HEADER + baseline("PASS-1", "TST-DRV1", "TST-SW1"));
        CliRun b = CliRun.on(catalog, "check", sheet.toString(), "--bom", tmp.resolve("nobom.csv").toString());
        assertEquals(ExitCode.BAD_DATA, b.exit(), b.dump());
        assertTrue(b.err().contains("nobom.csv"), b.dump());
    }

    // ------------------------------------------------------------------ JUnit XML

    private static Document parseXml(Path p) throws Exception {
        DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
        f.setFeature("http://apache.org/xml/features/disallow-doctype-decl", true);
        DocumentBuilder b = f.newDocumentBuilder();
        try (InputStream in = Files.newInputStream(p)) {
            return b.parse(in);
        }
    }

    @Test
    void junitXmlHasOneCasePerStageAndRuleAndFailuresOnExactlyTheFailingPairs() throws Exception {
        Path sheet = write(tmp.resolve("stages.csv"), SHEET);
        Path xml = tmp.resolve("reports/check.xml");
        CliRun r = CliRun.on(catalog, "check", sheet.toString(), "--format", "json", "--junit", xml.toString());
        assertEquals(ExitCode.FAILED, r.exit(), r.dump());
        JsonNode report = json(r);
        Set<String> expectedCases = new HashSet<>();
        Set<String> expectedFailures = new HashSet<>();
        for (JsonNode s : report.get("results")) {
            for (JsonNode c : s.get("checks")) {
                String key = "stage." + s.get("stage").asText() + "/" + c.get("rule").asText();
                expectedCases.add(key);
                if (c.get("verdict").asText().equals("fail")) {
                    expectedFailures.add(key);
                }
            }
        }
        // 12 stages with both parts × 14 checks + F-CAT's one catalog check; one failure per failing stage.
        assertEquals(12 * 14 + 1, expectedCases.size());
        assertEquals(12, expectedFailures.size());

        Document doc = parseXml(xml);
        Element suite = (Element) doc.getElementsByTagName("testsuite").item(0);
        assertEquals(Integer.toString(expectedCases.size()), suite.getAttribute("tests"));
        assertEquals(Integer.toString(expectedFailures.size()), suite.getAttribute("failures"));
        assertEquals(suite.getAttribute("failures"), doc.getDocumentElement().getAttribute("failures"));
        NodeList cases = doc.getElementsByTagName("testcase");
        Set<String> gotCases = new HashSet<>();
        Set<String> gotFailures = new HashSet<>();
        for (int i = 0; i < cases.getLength(); i++) {
            Element tc = (Element) cases.item(i);
            String key = tc.getAttribute("classname") + "/" + tc.getAttribute("name");
            assertTrue(gotCases.add(key), "one case per stage and rule: " + key);
            NodeList f = tc.getElementsByTagName("failure");
            if (f.getLength() > 0) {
                assertEquals(1, f.getLength(), key);
                assertEquals(tc.getAttribute("name"), ((Element) f.item(0)).getAttribute("type"), key);
                gotFailures.add(key);
            }
        }
        assertEquals(expectedCases, gotCases);
        assertEquals(expectedFailures, gotFailures);
        for (Map.Entry<String, String> e : INTENDED.entrySet()) {
            assertTrue(gotFailures.contains("stage." + e.getKey() + "/" + e.getValue()), e.toString());
        }
    }

    @Test
    void hostileTextIsEscapedAndTheJunitFileStillParses() throws Exception {
        String hostile = "<&\">";
        // CSV quoting (RFC 4180): the cell "<&"">" holds <&">. The switch TST-<&"> is not in the catalog.
        String sheetText = STAGE_HEADER + baseline("\"" + hostile.replace("\"", "\"\"") + "\"", "TST-DRV1",
                "\"TST-" + hostile.replace("\"", "\"\"") + "\"") + baseline("PASS-1", "TST-DRV1", "TST-SW1");
        Path sheet = write(tmp.resolve("hostile.csv"), sheetText);
        Path xml = tmp.resolve("hostile.xml");
        CliRun r = CliRun.on(catalog, "check", sheet.toString(), "--junit", xml.toString());
        assertEquals(ExitCode.FAILED, r.exit(), r.dump());
        Document doc = parseXml(xml);
        NodeList cases = doc.getElementsByTagName("testcase");
        Element hostileCase = null;
        for (int i = 0; i < cases.getLength(); i++) {
            Element tc = (Element) cases.item(i);
            if (tc.getAttribute("classname").equals("stage." + hostile)) {
                hostileCase = tc;
            }
        }
        assertTrue(hostileCase != null, "the parsed classname holds the stage id as written");
        assertEquals("catalog", hostileCase.getAttribute("name"));
        Element failure = (Element) hostileCase.getElementsByTagName("failure").item(0);
        assertTrue(failure.getAttribute("message").contains("TST-" + hostile), failure.getAttribute("message"));
        assertTrue(failure.getTextContent().contains(hostile), failure.getTextContent());
        assertEquals("1", doc.getDocumentElement().getAttribute("failures"));
    }

    // ------------------------------------------------------------------ half-bridge dead time

    /**
     * Dead time of a half-bridge (REFERENCES.md §8 and §9, plain timing on the gate-charge curve; the
     * hot corner's coefficients from memory: driver resistance ×1.4 and V_th −0.6 V at 125 °C).
     * TST-SW1: Q_g 50 nC at 12 V, Q_gs 15 nC, Q_gd 10 nC, V_pl 5 V, C_iss 3 nF, V_th,min 2 V, R_g,int 1 Ω;
     * TST-DRV2: R_source 2 Ω, R_sink 1 Ω, delay matching 5 ns; 12 V / 0 V, R_g 2.2 Ω / 1.0 Ω.
     * Outgoing (125 °C): R_off = 1.4·1 + 1 + 1 = 3.4 Ω; C above the plateau (50 − 15 − 10) nC / (12 − 5) V
     * = 3.571 nF; delay 3.4·3.571n·ln(12/5) = 10.63 ns; plateau 10 nC / (5/3.4 A) = 6.8 ns; fall to
     * V_th,min 1.4 V through C_iss 3.4·3n·ln(5/1.4) = 12.98 ns: 30.41 ns. Incoming delay to V_th,min,
     * the shorter corner: 25 °C 5.2·3n·ln(12/10) = 2.844 ns, 125 °C 6.0·3n·ln(12/10.6) = 2.233 ns.
     * dead-time-min = 30.41 + 5 − 2.233 = 33.18 ns; with the 25 % margin 41.5 ns.
     */
    @Test
    void aHalfBridgeGetsTheDeadTimeRuleAndItsMinimum() throws Exception {
        Path bom = write(tmp.resolve("bom.csv"), "Designator,Quantity,MPN\nU1,1,TST-DRV2\n\"Q1, Q2\",2,TST-SW1\n");
        String header = STAGE_HEADER.replace("\n", ",dead_time_ns\n");
        Path sheet = write(tmp.resolve("hb.csv"), header
                + "HB-H,U1,Q1,high,48,20,100,12,0,,3.1,0.2,active-high,2.2,1.0,0.9,1,5,yes,30\n"
                + "HB-L,U1,Q2,low,48,20,100,12,0,,3.1,0.2,active-high,2.2,1.0,0.9,1,5,yes,40\n");
        CliRun r = CliRun.on(catalog, "check", sheet.toString(), "--bom", bom.toString(), "--format", "json");
        JsonNode report = json(r);
        double expected = 33.182e-9;
        Map<String, String> verdict = Map.of("HB-H", "fail", "HB-L", "warn");
        for (String id : List.of("HB-H", "HB-L")) {
            JsonNode s = stage(report, id);
            assertEquals(expected, figure(s, "dead-time-min"), 0.01e-9, id);
            JsonNode dt = null;
            for (JsonNode c : s.get("checks")) {
                if (c.get("rule").asText().equals("dead-time")) {
                    dt = c;
                }
            }
            assertTrue(dt != null, s.toString());
            assertEquals(verdict.get(id), dt.get("verdict").asText(), dt.toString());
            assertTrue(dt.get("message").asText().contains(id.equals("HB-H") ? "HB-L" : "HB-H"), dt.toString());
            assertTrue(dt.get("message").asText().contains("delay matching 5 ns"), dt.toString());
        }
        assertEquals(ExitCode.FAILED, r.exit(), r.dump());
    }

    /**
     * Unlike halves (REFERENCES.md §7 and §8, charge-consistent; hot corner ×1.4 and −0.6 V from memory):
     * each stage's dv-dt comes from the other's turn-on, not from its own pair. HB-H turns on through
     * 2.2 Ω: 7 V / 5.2 Ω = 1.35 A moves 48 V in 7.43 ns (6.46 V/ns); HB-L holds its gate through
     * 1 + 0.5 + 1 = 2.5 Ω: 1.35 A · 2.5 Ω · (1 − e^(−7.43/7.5)) = 2.11 V ≥ V_th,min 2 V → fail (hot: 2.12 V
     * against 1.4 V). HB-L turns on through 22 Ω: 7/25 = 0.28 A, 1.34 V/ns, so HB-H sees 0.69 V (0.78 V
     * hot, under 0.7 · 1.4 V) → pass. Judged as its own twin, HB-L would have passed (0.78 V): the
     * false pass this guards against.
     */
    @Test
    void aBridgeOfUnlikeHalvesIsJudgedOnEachOthersEdge() throws Exception {
        Path bom = write(tmp.resolve("bom.csv"), "Designator,Quantity,MPN\nU1,1,TST-DRV2\n\"Q1, Q2\",2,TST-SW1\n");
        String high = "HB-H,U1,Q1,high,48,20,100,12,0,,3.1,0.2,active-high,2.2,0.5,0.9,1,5,yes\n";
        String low = "HB-L,U1,Q2,low,48,20,100,12,0,,3.1,0.2,active-high,22,0.5,0.9,1,5,yes\n";
        JsonNode bridge = json(CliRun.on(catalog, "check", write(tmp.resolve("hb.csv"), STAGE_HEADER + high + low)
                .toString(), "--bom", bom.toString(), "--format", "json"));
        JsonNode lowDvdt = check(stage(bridge, "HB-L"), "dv-dt");
        assertEquals("fail", lowDvdt.get("verdict").asText(), lowDvdt.toString());
        assertTrue(lowDvdt.get("message").asText().contains("HB-H's turn-on"), lowDvdt.toString());
        JsonNode highDvdt = check(stage(bridge, "HB-H"), "dv-dt");
        assertEquals("pass", highDvdt.get("verdict").asText(), highDvdt.toString());
        assertTrue(highDvdt.get("message").asText().contains("HB-L's turn-on"), highDvdt.toString());
        // The same low stage alone (its own designator, no leg) stands in as its own twin and passes.
        Path bom2 = write(tmp.resolve("bom2.csv"), "Designator,Quantity,MPN\nU2,1,TST-DRV2\nQ2,1,TST-SW1\n");
        JsonNode alone = json(CliRun.on(catalog, "check", write(tmp.resolve("alone.csv"), STAGE_HEADER
                + low.replace(",U1,", ",U2,")).toString(), "--bom", bom2.toString(), "--format", "json"));
        assertEquals("pass", check(stage(alone, "HB-L"), "dv-dt").get("verdict").asText());
    }

    private static JsonNode check(JsonNode stage, String rule) {
        for (JsonNode c : stage.get("checks")) {
            if (c.get("rule").asText().equals(rule)) {
                return c;
            }
        }
        throw new AssertionError("no " + rule + " in " + stage);
    }

    @Test
    void aHalfBridgeWithoutADeadTimeSaysUnknownNeverPass() throws Exception {
        Path bom = write(tmp.resolve("bom.csv"), "Designator,Quantity,MPN\nU1,1,TST-DRV2\n\"Q1, Q2\",2,TST-SW1\n");
        Path sheet = write(tmp.resolve("hb.csv"), STAGE_HEADER
                + "HB-H,U1,Q1,high,48,20,100,12,0,,3.1,0.2,active-high,2.2,1.0,0.9,1,5,no\n"
                + "HB-L,U1,Q2,low,48,20,100,12,0,,3.1,0.2,active-high,2.2,1.0,0.9,1,5,no\n");
        JsonNode report = json(CliRun.on(catalog, "check", sheet.toString(), "--bom", bom.toString(), "--format", "json"));
        for (String id : List.of("HB-H", "HB-L")) {
            JsonNode s = stage(report, id);
            boolean found = false;
            for (JsonNode c : s.get("checks")) {
                if (c.get("rule").asText().equals("dead-time")) {
                    found = true;
                    assertEquals("unknown", c.get("verdict").asText(), c.toString());
                    assertTrue(c.get("message").asText().contains("dead_time_ns"), c.toString());
                }
            }
            assertTrue(found, s.toString());
            assertEquals("warn", s.get("verdict").asText(), s.toString());
        }
    }

    @Test
    void twoLowSideStagesOnOneDriverGetNoDeadTimeRule() throws Exception {
        Path bom = write(tmp.resolve("bom.csv"), "Designator,Quantity,MPN\nU1,1,TST-DRV2\n\"Q1, Q2\",2,TST-SW1\n");
        Path sheet = write(tmp.resolve("ll.csv"), STAGE_HEADER + baseline("LS-A", "U1", "Q1") + baseline("LS-B", "U1", "Q2"));
        CliRun r = CliRun.on(catalog, "check", sheet.toString(), "--bom", bom.toString(), "--format", "json");
        assertEquals(ExitCode.OK, r.exit(), r.dump());
        JsonNode report = json(r);
        assertEquals(2, report.get("results").size(), r.dump());
        for (String id : List.of("LS-A", "LS-B")) {
            JsonNode s = stage(report, id);
            // the timing is there; only the pairing of a high and a low side is not, so no dead-time rule
            assertTrue(figure(s, "delay-time-off") > 0, s.toString());
            for (JsonNode c : s.get("checks")) {
                assertTrue(!c.get("rule").asText().equals("dead-time"), c.toString());
            }
        }
    }
}
