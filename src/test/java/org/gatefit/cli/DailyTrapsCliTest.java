package org.gatefit.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The traps of daily use (issue 19), end to end: implausible operating points (unit slips), misspelt
 * commands, options and part numbers, a decimal comma on the command line, and {@code check} without
 * a catalog. The example catalog is input only; the ranges the warnings quote are common practice,
 * no source (README, "Plausible operating points").
 */
class DailyTrapsCliTest {
    /** A SiC MOSFET and a driver of the example catalog (input only). */
    private static final String SIC = "OBP-12M016K4";
    private static final String DRIVER = "VHM-4410N";

    @TempDir
    Path tmp;
    Path catalog;

    @BeforeEach
    void importExamples() {
        catalog = CliRun.examples(tmp.resolve("catalog"));
    }

    @Test
    void aFrequencyTypedInHertzIsNamedAsTheLikelySlip() {
        // 20000 in a kHz option is 20 MHz, ten times the top of SiC practice (2 MHz; common practice, no source);
        // 20000 Hz = 20 kHz is inside it.
        CliRun r = CliRun.on(catalog, "explain", "--driver", DRIVER, "--switch", SIC, "--freq", "20000", "--bus", "800");
        assertTrue(r.err().contains("warning: 20 MHz? --freq is in kHz; did you mean 20kHz?"), r.dump());
        CliRun s = CliRun.on(catalog, "shortlist", "--switch", SIC, "--freq", "20000", "--bus", "800");
        assertTrue(s.err().contains("warning: 20 MHz? --freq is in kHz; did you mean 20kHz?"), s.dump());
    }

    @Test
    void edgeBusDriveAndLoopSlipsAreNamedAndPlausibleValuesAreNot() {
        CliRun r = CliRun.on(catalog, "explain", "--driver", DRIVER, "--switch", SIC, "--freq", "10", "--bus",
                "800000", "--edge", "50000", "--drive", "18000", "--loop", "0.01");
        assertTrue(r.err().contains("warning: 800 kV? --bus is in V; did you mean 800V?"), r.dump());
        assertTrue(r.err().contains("warning: 50 µs? --edge is in ns; did you mean 50ns?"), r.dump());
        assertTrue(r.err().contains("warning: 18 kV? --drive is in V; did you mean 18V?"), r.dump());
        assertTrue(r.err().contains("warning: 10 pH? --loop is in nH; did you mean 10nH?"), r.dump());
        // An ordinary SiC traction point: 10 kHz, 800 V, 60 ns, +18 V, 10 nH (common practice, no source).
        CliRun ok = CliRun.on(catalog, "explain", "--driver", DRIVER, "--switch", SIC, "--freq", "10", "--bus", "800",
                "--edge", "60", "--drive", "18", "--loop", "10");
        assertFalse(ok.err().contains("warning:"), ok.dump());
    }

    @Test
    void aStageRowWithASlipIsWarnedByStageAndColumn() throws IOException {
        Path stages = tmp.resolve("stages.csv");
        Files.writeString(stages, "stage,driver,switch,side,bus_v,f_sw_khz,v_drive_v,v_drive_neg_v\n"
                + "INV-A," + DRIVER + "," + SIC + ",low,800,10,18,-4\n"
                + "INV-B," + DRIVER + "," + SIC + ",low,800,20000,18,-4\n");
        CliRun r = CliRun.on(catalog, "check", stages.toString());
        assertTrue(r.err().contains("warning: stage INV-B (" + stages + " line 3): 20 MHz? f_sw_khz is in kHz;"
                + " did you mean 20kHz?"), r.dump());
        assertFalse(r.err().contains("stage INV-A"), r.dump());
    }

    @Test
    void aMisspeltCommandOrOptionSuggestsTheNearest() {
        CliRun c = CliRun.raw(java.util.Map.of(), "shortlst");
        assertEquals(ExitCode.USAGE, c.exit(), c.dump());
        assertTrue(c.err().contains("Did you mean: gatefit shortlist"), c.dump());
        CliRun o = CliRun.on(catalog, "shortlist", "--swich", SIC, "--freq", "10");
        assertEquals(ExitCode.USAGE, o.exit(), o.dump());
        assertTrue(o.err().contains("--swich") && o.err().contains("Possible solutions: --switch"), o.dump());
        // Two letters swapped, which picocli's own similarity misses: the nearest by edit distance.
        CliRun swapped = CliRun.on(catalog, "shortlist", "--switch", SIC, "--freq", "10", "--bsu", "800");
        assertEquals(ExitCode.USAGE, swapped.exit(), swapped.dump());
        assertTrue(swapped.err().contains("Did you mean: --bus?"), swapped.dump());
        CliRun far = CliRun.on(catalog, "shortlist", "--switch", SIC, "--freq", "10", "--quux", "800");
        assertTrue(far.err().contains("--quux") && !far.err().contains("Did you mean"), "nothing near: " + far.dump());
    }

    @Test
    void aPartNumberNotInTheCatalogNamesTheNearestThatExist() {
        String typo = "OBP-12M016"; // the suffix left off
        for (String[] args : new String[][] {{"show", typo}, {"replace", typo},
            {"shortlist", "--switch", typo, "--freq", "10"},
            {"explain", "--driver", DRIVER, "--switch", typo, "--freq", "10"}}) {
            CliRun r = CliRun.on(catalog, args);
            assertEquals(ExitCode.USAGE, r.exit(), r.dump());
            assertTrue(r.err().contains("'" + typo + "' in the catalog") && r.err().contains("nearest: ")
                    && r.err().contains(SIC), String.join(" ", args) + "\n" + r.dump());
        }
        CliRun d = CliRun.on(catalog, "explain", "--driver", "VHM-4401N", "--switch", SIC, "--freq", "10");
        assertTrue(d.err().contains("no driver 'VHM-4401N'") && d.err().contains(DRIVER), d.dump());
    }

    @Test
    void aDecimalCommaOnTheCommandLineIsRefusedAsACommandLineMatter() {
        CliRun r = CliRun.on(catalog, "explain", "--driver", DRIVER, "--switch", SIC, "--freq", "10", "--rg", "4,7");
        assertEquals(ExitCode.USAGE, r.exit(), r.dump());
        assertTrue(r.err().contains("--rg: '4,7' has a comma; on the command line write a decimal point (4.7)"),
                r.dump());
        assertFalse(r.err().contains("comma-separated file"), r.dump());
    }

    @Test
    void checkWithoutACatalogIsAnEnvironmentErrorNotAFailedPair() throws IOException {
        Path stages = tmp.resolve("stages.csv");
        Files.writeString(stages, "stage,driver,switch,f_sw_khz,v_drive_v\nS1," + DRIVER + "," + SIC + ",10,18\n");
        CliRun missing = CliRun.on(tmp.resolve("nowhere"), "check", stages.toString());
        assertEquals(ExitCode.ENVIRONMENT, missing.exit(), missing.dump());
        assertTrue(missing.err().contains("nowhere") && missing.err().contains("import"), missing.dump());
        Path empty = Files.createDirectories(tmp.resolve("empty"));
        CliRun none = CliRun.on(empty, "check", stages.toString());
        assertEquals(ExitCode.ENVIRONMENT, none.exit(), none.dump());
        assertTrue(none.err().contains("empty") && none.err().contains("import"), none.dump());
        assertFalse(none.err().contains("org.gatefit"), none.dump());
    }
}
