package org.gatefit.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code --header-row N}: the heading is read from the line the user names, not detected — the way
 * out when a sheet's first lines look like a heading but are not. Invented parts (CheckFixture's).
 */
class HeaderRowCliTest {
    @TempDir
    Path tmp;

    /** The fixture's heading and first switch, below two lines; line 1 is a decoy that names the required columns. */
    private Path sheet() throws Exception {
        String[] fixture = CheckFixture.SWITCHES.strip().split("\n");
        String heading = fixture[0];
        // A legend row a spreadsheet might carry above the table: the same column names, no data under them.
        String decoy = heading;
        String text = decoy + "\n" + "(legend above; the list starts below)\n" + heading + "\n" + fixture[1] + "\n"
                + fixture[2] + "\n";
        return CheckFixture.write(tmp.resolve("switches.csv"), text);
    }

    @Test
    void theNamedLineIsTheHeadingAndTheRowsBelowItAreRead() throws Exception {
        Path f = sheet();
        CliRun r = CliRun.on(tmp.resolve("catalog"), "import", f.toString(), "--header-row", "3");
        assertEquals(ExitCode.OK, r.exit(), r.dump());
        assertTrue(r.out().contains("2 switch rows imported"), r.dump());
        CliRun show = CliRun.on(tmp.resolve("catalog"), "show", "TST-SW3");
        assertEquals(ExitCode.OK, show.exit(), show.dump());
        assertTrue(show.out().contains("gan-hemt"), show.dump());
    }

    @Test
    void withoutTheOptionTheDecoyIsTakenAndTheImportWritesNothing() throws Exception {
        Path f = sheet();
        Path catalog = tmp.resolve("catalog-auto");
        CliRun r = CliRun.on(catalog, "import", f.toString());
        assertEquals(ExitCode.BAD_DATA, r.exit(), r.dump());
        assertTrue(r.err().contains("line 2"), "the error names the line after the heading it took: " + r.dump());
        CliRun info = CliRun.on(catalog, "info");
        assertTrue(info.out().contains("0 switches, 0 drivers"), "a refused import writes nothing: " + info.dump());
    }

    @Test
    void aLineNumberBelowOneIsAUsageError() throws Exception {
        CliRun r = CliRun.on(tmp.resolve("catalog"), "import", sheet().toString(), "--header-row", "0");
        assertEquals(ExitCode.USAGE, r.exit(), r.dump());
        assertTrue(r.err().contains("--header-row"), r.dump());
    }
}
