package org.gatefit.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.gatefit.catalog.Problem;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Issue 14, finding 5, through the command line: a megabyte number cell is a bad cell (exit 3)
 * located by file, line and column, the catalog is left as it was, and neither the message nor
 * validate's report repeats the cell. Invented parts (maker Testmaker, TST-…).
 */
class LongCellCliTest {
    private static final String MILLION = "4".repeat(1_000_000);

    @TempDir
    Path tmp;

    private Path write(String name, String text) throws Exception {
        return Files.writeString(tmp.resolve(name), text, StandardCharsets.UTF_8);
    }

    @Test
    void importRefusesAMillionDigitCellNamingFileLineAndColumnInAShortMessage() throws Exception {
        Path catalog = tmp.resolve("catalog");
        Path good = write("good.csv", BadInputTest.HEADER + "\n" + BadInputTest.row("TST-100", "40") + "\n");
        assertEquals(ExitCode.OK, CliRun.on(catalog, "import", good.toString()).exit());
        String before = CliRun.on(catalog, "export", "--kind", "switch").out();

        Path bad = write("long.csv", BadInputTest.HEADER + "\n" + BadInputTest.row("TST-101", MILLION) + "\n");
        CliRun r = CliRun.on(catalog, "import", bad.toString());
        assertEquals(ExitCode.BAD_DATA, r.exit(), () -> Problem.excerpt(r.dump()));
        assertTrue(r.err().startsWith(bad + " line 2, column q_g_nc (7): '" + "4".repeat(80) + "…' (1,000,000 characters)"
                + " is too long for a number"), () -> Problem.excerpt(r.err()));
        assertTrue(r.err().length() < 400, () -> r.err().length() + " characters");
        assertEquals(before, CliRun.on(catalog, "export", "--kind", "switch").out(), "the catalog is as it was");
    }

    @Test
    void validateReportsQuoteAtMostEightyCharactersOfTheCell() throws Exception {
        Path bad = write("long.csv", BadInputTest.HEADER + "\n" + BadInputTest.row("TST-101", MILLION) + "\n");
        CliRun r = CliRun.on(tmp.resolve("catalog"), "validate", bad.toString(), "--format", "json");
        assertEquals(ExitCode.BAD_DATA, r.exit(), () -> Problem.excerpt(r.err()));
        assertTrue(r.out().length() < 2000, () -> r.out().length() + " characters");
        JsonNode problem = new ObjectMapper().readTree(r.out()).findValue("problems").get(0);
        assertEquals("4".repeat(80) + "… (1,000,000 characters)", problem.get("text").asText());
    }
}
