package org.gatefit.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.List;
import java.util.Map;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;
import org.gatefit.synth.SyntheticCatalog;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A real full file system and a read-only one (issue 14, finding 9). Full: a 1 MiB tmpfs that the
 * test mounts (so it runs only as root, and is skipped with the reason otherwise); the import
 * fails with one line on standard error (no merge thread's stack trace), the catalog is as it was
 * byte for byte and no file of the failed import is left. Read-only: the same tmpfs remounted
 * read-only as root, else a folder without write permission; the import fails with one line naming
 * the folder, and every read still works. Input: the invented example catalogs and the synthetic
 * catalog.
 */
class FullAndReadOnlyDiskCliTest {
    private static final Path SWITCHES = Project.file("examples/switches.csv");
    private static final Path DRIVERS = Project.file("examples/drivers.csv");

    @TempDir
    Path tmp;
    private Path mounted;

    /** Mounts a tmpfs of {@code size} on a new folder, or skips the test saying why it cannot. */
    private Path tmpfs(String size) throws Exception {
        Path dir = Files.createDirectories(tmp.resolve("tmpfs"));
        String mount = run("mount", "-t", "tmpfs", "-o", "size=" + size, "tmpfs", dir.toString());
        Assumptions.assumeTrue(mount == null, () -> "skipped: mounting a tmpfs needs root (this test runs"
                + " 'mount -t tmpfs'), and it failed: " + mount);
        mounted = dir;
        return dir;
    }

    /** Runs a command; null when it succeeded, else what it printed. */
    private static String run(String... cmd) throws Exception {
        Process p;
        try {
            p = new ProcessBuilder(cmd).redirectErrorStream(true).start();
        } catch (IOException e) {
            return e.toString();
        }
        String out = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        if (!p.waitFor(60, TimeUnit.SECONDS)) {
            p.destroyForcibly();
            return "timed out";
        }
        return p.exitValue() == 0 ? null : "exit " + p.exitValue() + ": " + out.strip();
    }

    @AfterEach
    void unmount() throws Exception {
        if (mounted != null) {
            String r = run("umount", mounted.toString());
            if (r != null) {
                run("umount", "-l", mounted.toString());
            }
        }
    }

    @Test
    void aFullDiskGivesOneMessageAndLeavesTheCatalogAsItWas() throws Exception {
        Path disk = tmpfs("1m");
        Path catalog = disk.resolve("catalog");
        assertEquals(ExitCode.OK, CliRun.on(catalog, "import", SWITCHES.toString(), DRIVERS.toString()).exit());
        Map<String, String> before = CatalogFolderCliTest.files(catalog);
        String export = CliRun.on(catalog, "export", "--kind", "switch").out();
        Path big = tmp.resolve("switches-8000.csv");
        SyntheticCatalog.writeSwitches(big, 8000); // about 1.7 MB of index: more than the disk holds

        PrintStream err = System.err;
        ByteArrayOutputStream printed = new ByteArrayOutputStream();
        CliRun r;
        try {
            System.setErr(new PrintStream(printed, true, StandardCharsets.UTF_8));
            r = CliRun.on(catalog, "import", big.toString());
        } finally {
            System.setErr(err);
        }
        assertEquals(ExitCode.ENVIRONMENT, r.exit(), r.dump());
        assertEquals(List.of("gatefit import: could not write the catalog in " + catalog + " (No space left on device)."
                + " Nothing was changed: the catalog is as it was before this import. Free some space on that disk,"
                + " or make the folder writable, and import again (or give --catalog a folder elsewhere)."),
                r.err().lines().toList(), r.dump());
        assertEquals("", printed.toString(StandardCharsets.UTF_8), "no thread printed a stack trace");
        assertEquals(before, CatalogFolderCliTest.files(catalog), "every file as it was, no orphan left");
        assertEquals(export, CliRun.on(catalog, "export", "--kind", "switch").out());
        assertEquals(ExitCode.OK, CliRun.on(catalog, "verify").exit());
    }

    @Test
    void aReadOnlyCatalogRefusesImportsInOneLineAndStillAnswers() throws Exception {
        Path catalog;
        boolean root = "root".equals(System.getProperty("user.name"));
        if (root) {
            Path disk = tmpfs("4m");
            catalog = disk.resolve("catalog");
            assertEquals(ExitCode.OK, CliRun.on(catalog, "import", SWITCHES.toString(), DRIVERS.toString()).exit());
            String ro = run("mount", "-o", "remount,ro", disk.toString());
            Assumptions.assumeTrue(ro == null, () -> "skipped: remounting the tmpfs read-only failed: " + ro);
        } else {
            catalog = tmp.resolve("catalog");
            assertEquals(ExitCode.OK, CliRun.on(catalog, "import", SWITCHES.toString(), DRIVERS.toString()).exit());
            try (Stream<Path> s = Files.list(catalog)) {
                for (Path p : s.toList()) {
                    Files.setPosixFilePermissions(p, PosixFilePermissions.fromString("r--r--r--"));
                }
            }
            Files.setPosixFilePermissions(catalog, PosixFilePermissions.fromString("r-xr-xr-x"));
        }
        try {
            Map<String, String> before = CatalogFolderCliTest.files(catalog);
            CliRun r = CliRun.on(catalog, "import", DRIVERS.toString());
            assertEquals(ExitCode.ENVIRONMENT, r.exit(), r.dump());
            assertEquals(1, r.err().lines().count(), r.dump());
            assertTrue(r.err().startsWith("gatefit import: could not write the catalog in " + catalog + " ("), r.dump());
            assertTrue(r.err().contains("make the folder writable"), r.dump());
            assertFalse(r.err().contains("internal error"), r.dump());
            assertEquals(before, CatalogFolderCliTest.files(catalog));
            for (String[] args : new String[][] {{"info"}, {"verify"}, {"export", "--kind", "driver"}, {"show", "CVL-1025TL"}}) {
                CliRun read = CliRun.on(catalog, args);
                assertEquals(ExitCode.OK, read.exit(), String.join(" ", args) + ": " + read.dump());
            }
            assertEquals(before, CatalogFolderCliTest.files(catalog));
        } finally {
            if (!root) {
                Files.setPosixFilePermissions(catalog, PosixFilePermissions.fromString("rwxr-xr-x"));
            }
        }
    }
}
