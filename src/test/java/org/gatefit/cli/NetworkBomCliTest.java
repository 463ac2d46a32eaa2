package org.gatefit.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Path;
import org.gatefit.catalog.Bom;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code check --network-bom FILE}: every stage's gate-drive network as a BOM fragment that gatefit's
 * own BOM reader ({@link Bom#read}, the one {@code --bom} uses) reads back, one designator per part,
 * none clashing, each the same part {@code explain} sizes for that stage's pair at its point.
 */
class NetworkBomCliTest {
    @TempDir
    Path tmp;

    @Test
    void theFragmentReadsBackAndHoldsEachStagesNetwork() throws Exception {
        Path catalog = CliRun.examples(tmp.resolve("catalog"));
        Path stages = Project.file("examples/stages.csv");
        Path bom = Project.file("examples/bom.csv");
        Path out = tmp.resolve("network-bom.csv");
        CliRun r = CliRun.on(catalog, "check", stages.toString(), "--bom", bom.toString(), "--network-bom", out.toString(),
                "--format", "json");
        assertEquals(ExitCode.FAILED, r.exit(), r.dump()); // the example design's deliberate failures
        Bom back = Bom.read(out, out.toString());
        assertTrue(back.notes().isEmpty(), "read back without a note: " + back.notes());
        // MC-UH: its network as explain sizes it for U1/Q1 (PGL-HB1046 with CVL-1025TL) at the stage's point.
        CliRun explain = CliRun.on(catalog, "explain", "--driver", "PGL-HB1046", "--switch", "CVL-1025TL", "--stages",
                stages.toString(), "--stage", "MC-UH", "--format", "json");
        JsonNode network = new ObjectMapper().readTree(explain.out()).get("network");
        int resistors = 0;
        int total = 0;
        for (JsonNode part : network) {
            total++;
            if (part.get("unit").asText().equals("Ω")) {
                resistors++;
                Bom.Entry e = back.get("RQ1" + (char) ('A' + resistors - 1)).orElseThrow(() -> new AssertionError(
                        "RQ1? in " + out));
                assertTrue(e.partNumber().startsWith("choose: "), e.toString());
            }
        }
        assertTrue(total >= 5 && resistors >= 3, "a network of gate resistors, pull-down and more: " + network);
        assertEquals("choose: 22 Ω", back.get("RQ1A").orElseThrow().partNumber(),
                "the stage's own turn-on resistor at Q1, r_g_ohm 22 in examples/stages.csv");
        // Every stage with both parts has its parts; designators never repeat (the reader would note it).
        JsonNode report = new ObjectMapper().readTree(r.out());
        int stagesWithParts = 0;
        for (JsonNode s : report.get("results")) {
            if (s.has("operating_point")) {
                stagesWithParts++;
                String first = "R" + s.get("switch_ref").asText() + "A"; // the stage's switch designator, e.g. RQ8A
                assertTrue(back.get(first).isPresent(), first + " in " + out);
            }
        }
        assertEquals(17, stagesWithParts, "every example stage resolves with the BOM");
    }
}
