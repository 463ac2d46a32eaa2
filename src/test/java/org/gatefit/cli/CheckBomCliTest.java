package org.gatefit.cli;

import static org.gatefit.cli.CheckFixture.STAGE_HEADER;
import static org.gatefit.cli.CheckFixture.baseline;
import static org.gatefit.cli.CheckFixture.check;
import static org.gatefit.cli.CheckFixture.failing;
import static org.gatefit.cli.CheckFixture.json;
import static org.gatefit.cli.CheckFixture.stage;
import static org.gatefit.cli.CheckFixture.write;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import java.nio.file.Path;
import java.util.Map;
import java.util.Set;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code check --bom} end to end: designators resolved through lists and ranges, do-not-place and
 * missing designators as {@code catalog} failures, the quantity cross-check, bad BOM headers.
 * Every stage is the {@link CheckFixture} baseline, which passes every rule with TST-DRV1 and
 * TST-SW1, so a stage's verdict depends only on how its designators resolve.
 */
class CheckBomCliTest {
    @TempDir
    Path tmp;
    Path catalog;

    @BeforeEach
    void importTestCatalog() throws Exception {
        catalog = CheckFixture.importCatalog(tmp);
    }

    @Test
    void designatorListsAndRangesResolveAndEveryStagePasses() throws Exception {
        // Q1, Q3-Q6 → Q1 Q3 Q4 Q5 Q6; U01 - U03 (zero-padded, spaces around the dash) → U01 U02 U03.
        Path bom = write(tmp.resolve("bom.csv"), """
                Designator,Quantity,Manufacturer Part Number,DNP
                "Q1, Q3-Q6",5,TST-SW1,no
                U01 - U03,3,TST-DRV1,no
                "R1-R6, R16",7,TST-RES-2R2,no
                """);
        Path sheet = write(tmp.resolve("stages.csv"), STAGE_HEADER + baseline("S1", "U01", "Q1")
                + baseline("S2", "U02", "Q4") + baseline("S3", "u03", "q6"));
        CliRun r = CliRun.on(catalog, "check", sheet.toString(), "--bom", bom.toString(), "--format", "json");
        assertEquals(ExitCode.OK, r.exit(), r.dump());
        JsonNode report = json(r);
        assertEquals(3, report.at("/summary/passed").asInt(), r.out());
        JsonNode s2 = stage(report, "S2");
        assertEquals("TST-DRV1", s2.get("driver").asText());
        assertEquals("TST-SW1", s2.get("switch").asText());
        assertEquals("U02", s2.get("driver_ref").asText());
        assertEquals("Q4", s2.get("switch_ref").asText());
        assertEquals(0, report.get("bom_notes").size(), "quantities match the designator counts");
        assertTrue(!r.err().contains("warning"), r.dump());
    }

    @Test
    void aStageOnADoNotPlaceRowFailsTheCatalogRuleSayingSo() throws Exception {
        Path bom = write(tmp.resolve("bom.csv"), """
                Designator,Quantity,Manufacturer Part Number,DNP
                Q1,1,TST-SW1,no
                Q2,1,TST-SW1,yes
                U1,1,TST-DRV1,no
                """);
        Path sheet = write(tmp.resolve("stages.csv"), STAGE_HEADER + baseline("FITTED", "U1", "Q1")
                + baseline("UNFITTED", "U1", "Q2"));
        CliRun r = CliRun.on(catalog, "check", sheet.toString(), "--bom", bom.toString(), "--format", "json");
        assertEquals(ExitCode.FAILED, r.exit(), r.dump());
        JsonNode report = json(r);
        assertEquals(Map.of("FITTED", Set.of(), "UNFITTED", Set.of("catalog")), failing(report));
        String msg = check(stage(report, "UNFITTED"), "catalog").get("message").asText();
        assertTrue(msg.contains("Q2") && msg.contains("do-not-place"), msg);
    }

    @Test
    void aDesignatorMissingFromTheBomFailsTheCatalogRuleNamingIt() throws Exception {
        Path bom = write(tmp.resolve("bom.csv"), "Designator,MPN\nQ1,TST-SW1\nU1,TST-DRV1\n");
        Path sheet = write(tmp.resolve("stages.csv"), STAGE_HEADER + baseline("LOST", "U7", "Q1"));
        CliRun r = CliRun.on(catalog, "check", sheet.toString(), "--bom", bom.toString(), "--format", "json");
        assertEquals(ExitCode.FAILED, r.exit(), r.dump());
        JsonNode report = json(r);
        assertEquals(Set.of("catalog"), failing(report).get("LOST"));
        String msg = check(stage(report, "LOST"), "catalog").get("message").asText();
        assertTrue(msg.contains("'U7'") && msg.contains("bom.csv"), msg);
    }

    @Test
    void aQuantityDisagreeingWithTheDesignatorCountWarnsOnStderrAndInJson() throws Exception {
        // Q1-Q4 is four designators; the row says 3.
        Path bom = write(tmp.resolve("bom.csv"), "Designator,Qty,MPN\nQ1-Q4,3,TST-SW1\nU1,1,TST-DRV1\n");
        Path sheet = write(tmp.resolve("stages.csv"), STAGE_HEADER + baseline("S1", "U1", "Q2"));
        CliRun r = CliRun.on(catalog, "check", sheet.toString(), "--bom", bom.toString(), "--format", "json");
        assertEquals(ExitCode.OK, r.exit(), "a note, not a failure: " + r.dump());
        assertTrue(r.err().contains("warning:") && r.err().contains("line 2") && r.err().contains("quantity 3 but 4"),
                r.dump());
        JsonNode notes = json(r).get("bom_notes");
        assertEquals(1, notes.size(), notes.toString());
        assertTrue(notes.get(0).asText().contains("quantity 3 but 4 designators (Q1-Q4)"), notes.toString());
    }

    @Test
    void headerSynonymsAreMatchedCaseInsensitively() throws Exception {
        Path bom = write(tmp.resolve("bom.csv"), "REFERENCE,qty,mpn\nQ1,1,TST-SW1\nU1,1,TST-DRV1\n");
        Path bom2 = write(tmp.resolve("bom2.csv"), "refdes,MPN,QTY\nQ1,TST-SW1,1\nU1,TST-DRV1,1\n");
        Path sheet = write(tmp.resolve("stages.csv"), STAGE_HEADER + baseline("S1", "U1", "Q1"));
        for (Path b : new Path[] {bom, bom2}) {
            CliRun r = CliRun.on(catalog, "check", sheet.toString(), "--bom", b.toString(), "--format", "json");
            assertEquals(ExitCode.OK, r.exit(), r.dump());
            assertEquals("TST-SW1", json(r).at("/results/0/switch").asText());
        }
    }

    @Test
    void aBomWithoutADesignatorOrPartNumberColumnIsBadInputListingTheColumnsFound() throws Exception {
        Path sheet = write(tmp.resolve("stages.csv"), STAGE_HEADER + baseline("S1", "U1", "Q1"));
        Path noDes = write(tmp.resolve("nodes.csv"), "Item,MPN,Qty\n1,TST-SW1,1\n");
        CliRun r = CliRun.on(catalog, "check", sheet.toString(), "--bom", noDes.toString());
        assertEquals(ExitCode.BAD_DATA, r.exit(), r.dump());
        assertTrue(r.err().contains("nodes.csv line 1") && r.err().contains("designator")
                && r.err().contains("found: Item, MPN, Qty"), r.dump());
        Path noPn = write(tmp.resolve("nopn.csv"), "Designator,Value\nQ1,2R2\n");
        r = CliRun.on(catalog, "check", sheet.toString(), "--bom", noPn.toString());
        assertEquals(ExitCode.BAD_DATA, r.exit(), r.dump());
        assertTrue(r.err().contains("nopn.csv line 1") && r.err().contains("part-number")
                && r.err().contains("found: Designator, Value"), r.dump());
    }

    @Test
    void aBadRangeInTheBomIsBadInputWithLineAndColumn() throws Exception {
        Path sheet = write(tmp.resolve("stages.csv"), STAGE_HEADER + baseline("S1", "U1", "Q1"));
        Path bom = write(tmp.resolve("bom.csv"), "Designator,MPN\nU1,TST-DRV1\nR1-R99999999999999999999,TST-RES\n");
        CliRun r = CliRun.on(catalog, "check", sheet.toString(), "--bom", bom.toString());
        assertEquals(ExitCode.BAD_DATA, r.exit(), r.dump());
        assertTrue(r.err().contains("bom.csv line 3") && r.err().contains("column Designator"), r.dump());
    }
}
