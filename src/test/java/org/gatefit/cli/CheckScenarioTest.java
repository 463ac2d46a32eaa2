package org.gatefit.cli;

import static org.gatefit.cli.CheckFixture.failing;
import static org.gatefit.cli.CheckFixture.json;
import static org.gatefit.cli.CheckFixture.stage;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The demo scenario: {@code check examples/stages.csv --bom examples/bom.csv} over the example
 * catalogs gives, stage by stage, the failing rules of the intended-results table in
 * {@code examples/README.md} (read from the README here, so the two cannot drift apart). The
 * README states the engineering reason for each mismatch; the data is only input.
 */
class CheckScenarioTest {
    @TempDir
    Path tmp;

    /** A row of the README's "Stages and intended results" table. */
    private record Intended(String stage, String driverRef, String driver, String switchRef, String switchPart,
                            String side, String intended) {
    }

    private static List<Intended> readmeTable() throws Exception {
        List<String> lines = Files.readAllLines(Project.file("examples/README.md"), StandardCharsets.UTF_8);
        int start = lines.indexOf("## Stages and intended results");
        assertTrue(start >= 0, "README section present");
        List<Intended> rows = new java.util.ArrayList<>();
        boolean inTable = false;
        for (int i = start + 1; i < lines.size(); i++) {
            String l = lines.get(i).strip();
            if (l.startsWith("| stage | driver")) {
                inTable = true;
                continue;
            }
            if (!inTable || l.startsWith("|---")) {
                continue;
            }
            if (!l.startsWith("|")) {
                break;
            }
            String[] c = l.substring(1, l.length() - 1).split("\\|");
            String[] d = c[1].strip().split("\\s*→\\s*");
            String[] s = c[2].strip().split("\\s*→\\s*");
            rows.add(new Intended(c[0].strip(), d[0], d[1], s[0], s[1], c[3].strip(), c[4].strip().replace("*", "")));
        }
        return rows;
    }

    @Test
    void everyStageFailsExactlyItsIntendedMismatch() throws Exception {
        List<Intended> table = readmeTable();
        assertEquals(17, table.size(), "README: 17 stages");
        Path catalog = tmp.resolve("catalog");
        CliRun imp = CliRun.on(catalog, "import", Project.file("examples/switches.csv").toString(),
                Project.file("examples/drivers.csv").toString());
        assertEquals(ExitCode.OK, imp.exit(), imp.dump());
        CliRun r = CliRun.on(catalog, "check", Project.file("examples/stages.csv").toString(), "--bom",
                Project.file("examples/bom.csv").toString(), "--format", "json");
        assertEquals(ExitCode.FAILED, r.exit(), r.dump());
        JsonNode report = json(r);

        // Second rules that follow from the same mismatch (README, "Secondary effects" and the table):
        // MC-BRK's 10 V rail is also below VHM-0605S's 12.5 V minimum supply → gate-voltage;
        // GC-CLAMP's low-side-only driver has no floating supply either → bootstrap; GC-SR's 12 V driver
        // also makes its twin's edge fast enough to lift the 0 V off gate past V_th,min → dv-dt.
        Map<String, Set<String>> also = Map.of("MC-BRK", Set.of("gate-voltage"), "GC-CLAMP", Set.of("bootstrap"),
                "GC-SR", Set.of("dv-dt"));
        Map<String, Set<String>> expected = new LinkedHashMap<>();
        for (Intended t : table) {
            Set<String> f = new TreeSet<>();
            if (!t.intended().equals("sound")) {
                f.add(t.intended());
            }
            f.addAll(also.getOrDefault(t.stage(), Set.of()));
            expected.put(t.stage(), f);
        }
        assertEquals(expected, failing(report), r.out());

        for (Intended t : table) {
            JsonNode s = stage(report, t.stage());
            assertEquals(t.driverRef(), s.get("driver_ref").asText(), t.stage());
            assertEquals(t.driver(), s.get("driver").asText(), t.stage() + ": BOM resolution");
            assertEquals(t.switchRef(), s.get("switch_ref").asText(), t.stage());
            assertEquals(t.switchPart(), s.get("switch").asText(), t.stage() + ": BOM resolution");
            assertEquals(t.intended().equals("sound"), !s.get("verdict").asText().equals("fail"), t.stage() + ": " + s);
        }
        for (String id : List.of("PFC-A1", "TI-UH", "TI-UL", "GC-MAIN")) {
            assertEquals("pass", stage(report, id).get("verdict").asText(), id + ": " + stage(report, id));
        }
        // The motor stages are sound but CVL-1025TL has stock 0 (README): the only remark is that.
        for (String id : List.of("MC-UH", "MC-UL", "MC-VH", "MC-VL", "MC-WH", "MC-WL")) {
            JsonNode s = stage(report, id);
            for (JsonNode c : s.get("checks")) {
                if (!c.get("verdict").asText().equals("pass")) {
                    assertEquals("lifecycle", c.get("rule").asText(), id + ": " + c);
                    assertEquals("warn", c.get("verdict").asText(), id + ": " + c);
                    assertTrue(c.get("message").asText().contains("out of stock"), c.toString());
                }
            }
            // it shares its driver with the other side: a half-bridge, so its dead time is checked (and passes)
            boolean dead = false;
            for (JsonNode c : s.get("checks")) {
                dead |= c.get("rule").asText().equals("dead-time") && c.get("verdict").asText().equals("pass");
            }
            assertTrue(dead, id + ": " + s);
        }
        // The traction legs are on two isolated drivers each: their leg cell pairs them.
        for (String id : List.of("TI-UH", "TI-UL", "TI-VH", "TI-VL", "GC-MAIN", "GC-CLAMP")) {
            assertTrue(stage(report, id).toString().contains("\"dead-time-min\""), id);
        }
        // README: C4-C9 lists six designators but Quantity says 5.
        assertEquals(1, report.get("bom_notes").size(), report.get("bom_notes").toString());
        assertTrue(report.get("bom_notes").get(0).asText().contains("quantity 5 but 6 designators (C4-C9)"));
        assertTrue(r.err().contains("C4-C9"), r.dump());
        assertEquals(7, report.at("/summary/failed").asInt());
    }
}
