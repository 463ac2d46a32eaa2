package org.gatefit.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Collectors;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Issue 14, finding 10, through {@code check}: a BOM whose header line is longer than 64 KiB (a
 * long extra column) resolves the designators as the plain BOM does, instead of an I/O error
 * (exit 4). Uses the invented example scenario.
 */
class BomHeaderCliTest {
    @TempDir
    Path tmp;

    @Test
    void aBomWithA70KiBHeaderLineChecksLikeThePlainBom() throws Exception {
        Path catalog = tmp.resolve("catalog");
        CliRun imp = CliRun.on(catalog, "import", Project.file("examples/switches.csv").toString(),
                Project.file("examples/drivers.csv").toString());
        assertEquals(ExitCode.OK, imp.exit(), imp.dump());
        Path bom = Project.file("examples/bom.csv");
        List<String> lines = Files.readAllLines(bom, StandardCharsets.UTF_8);
        String wide = lines.get(0) + ",notes " + "x".repeat(70_000) + "\n"
                + lines.stream().skip(1).map(l -> l.isBlank() ? l : l + ",").collect(Collectors.joining("\n")) + "\n";
        Path longBom = Files.writeString(tmp.resolve("bom.csv"), wide, StandardCharsets.UTF_8);
        String stages = Project.file("examples/stages.csv").toString();

        CliRun plain = CliRun.on(catalog, "check", stages, "--bom", bom.toString(), "--format", "json");
        CliRun longer = CliRun.on(catalog, "check", stages, "--bom", longBom.toString(), "--format", "json");
        assertEquals(ExitCode.FAILED, plain.exit(), plain.dump()); // the scenario's deliberate mistakes
        assertEquals(plain.exit(), longer.exit(), longer.dump());
        assertEquals(CheckFixture.failing(CheckFixture.json(plain)), CheckFixture.failing(CheckFixture.json(longer)));
        assertTrue(longer.err().isEmpty() || !longer.err().contains("Mark invalid"), longer.err());
    }
}
