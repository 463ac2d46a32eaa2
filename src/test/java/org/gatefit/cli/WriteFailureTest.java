package org.gatefit.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.ByteArrayOutputStream;
import java.io.FileOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Issue 14, finding 3: a write to standard output that fails (a full disk, a closed pipe) or stops
 * part-way makes every command exit 4 with one message, never 0 with a truncated result; files
 * written with --output and --junit likewise, naming the file.
 */
class WriteFailureTest {
    private static final String SWITCHES = Project.file("examples/switches.csv").toString();
    private static final String DRIVERS = Project.file("examples/drivers.csv").toString();
    private static final String STAGES = Project.file("examples/stages.csv").toString();
    private static final String BOM = Project.file("examples/bom.csv").toString();
    private static final String[] POINT = {"--freq", "10", "--bus", "800", "--side", "high", "--drive", "18",
        "--drive-neg", "-4", "--rg", "1", "--edge", "60", "--logic", "lvcmos-3v3"};

    @TempDir
    static Path tmp;
    static Path catalog;

    @BeforeAll
    static void importExamples() {
        catalog = tmp.resolve("catalog");
        CliRun r = CliRun.on(catalog, "import", SWITCHES, DRIVERS);
        assertEquals(ExitCode.OK, r.exit(), r.dump());
    }

    /** Standard output on a disk that takes {@code room} bytes, then fails as Linux reports ENOSPC. */
    static final class FullDisk extends OutputStream {
        private int room;

        FullDisk(int room) {
            this.room = room;
        }

        @Override
        public void write(int b) throws IOException {
            write(new byte[] {(byte) b}, 0, 1);
        }

        @Override
        public void write(byte[] b, int off, int len) throws IOException {
            if (len > room) {
                room = 0;
                throw new IOException("No space left on device");
            }
            room -= len;
        }
    }

    /** Every command that prints to standard output, as a user would type it. */
    static Stream<List<String>> commands() {
        String c = catalog.toString();
        return Stream.of(
                List.of("--catalog", c, "import", SWITCHES),
                List.of("--catalog", c, "validate", STAGES),
                List.of("--catalog", c, "info"),
                List.of("--catalog", c, "find", "--kind", "switch"),
                List.of("--catalog", c, "show", "OBP-12M016K4"),
                List.of("--catalog", c, "export", "--kind", "switch"),
                List.of("--catalog", c, "export", "--kind", "driver", "--format", "json"),
                concat(List.of("--catalog", c, "shortlist", "--switch", "OBP-12M016K4"), POINT),
                concat(List.of("--catalog", c, "explain", "--driver", "ISY-5710S", "--switch", "OBP-12M016K4"), POINT),
                List.of("--catalog", c, "check", STAGES, "--bom", BOM),
                List.of("--catalog", c, "replace", "CVL-1025TL"),
                List.of("completion"),
                List.of("--help"),
                List.of("--version"),
                List.of("check", "--help"),
                List.of("demo"));
    }

    private static List<String> concat(List<String> a, String[] b) {
        return Stream.concat(a.stream(), Stream.of(b)).toList();
    }

    private static CliRun run(OutputStream stdout, List<String> args) {
        StringWriter err = new StringWriter();
        int code = Cli.run(StdoutWriter.of(stdout), new PrintWriter(err, true), Map.of(), CliRun.CLOCK, false,
                args.toArray(String[]::new));
        return new CliRun(code, "", err.toString());
    }

    private static void assertOneMessage(CliRun r, String expected) {
        assertEquals(ExitCode.ENVIRONMENT, r.exit(), r.dump());
        int at = r.err().indexOf(expected);
        assertTrue(at >= 0, r.dump());
        assertEquals(-1, r.err().indexOf(expected, at + 1), "said once: " + r.dump());
        assertFalse(r.err().contains("\tat ") || r.err().contains("Exception"), "no stack trace: " + r.dump());
    }

    @ParameterizedTest
    @MethodSource("commands")
    void aFullDiskOnStandardOutputExitsFourWithOneMessage(List<String> args) {
        assertOneMessage(run(new FullDisk(0), args), "cannot write to standard output: No space left on device");
    }

    @ParameterizedTest
    @MethodSource("commands")
    void aWriteThatStopsPartWayExitsFourWhereTheWholeOutputExitsAsUsual(List<String> args) {
        ByteArrayOutputStream whole = new ByteArrayOutputStream();
        CliRun r = run(whole, args);
        assertTrue(r.exit() == ExitCode.OK || r.exit() == ExitCode.FAILED, r.dump());
        assertFalse(r.err().contains("cannot write"), r.dump());
        assertTrue(whole.size() > 1, whole.toString(StandardCharsets.UTF_8));
        // Half of it goes out, then the disk is full: standard output is cut short.
        assertOneMessage(run(new FullDisk(whole.size() / 2), args),
                "cannot write to standard output: No space left on device");
    }

    /** Linux's /dev/full fails every write with ENOSPC (full(4)); skipped where there is none. */
    @Test
    void exportToDevFullExitsFourWhetherRedirectedOrGivenAsOutput() throws IOException {
        Path full = Path.of("/dev/full");
        assumeTrue(Files.isWritable(full), "no writable /dev/full");
        try (FileOutputStream out = new FileOutputStream(full.toFile())) {
            assertOneMessage(run(out, List.of("--catalog", catalog.toString(), "export", "--kind", "switch")),
                    "cannot write to standard output: No space left on device");
        }
        CliRun r = CliRun.on(catalog, "export", "--kind", "switch", "--output", full.toString());
        assertOneMessage(r, "cannot write /dev/full: No space left on device");
        CliRun j = CliRun.on(catalog, "check", STAGES, "--bom", BOM, "--junit", full.toString());
        assertOneMessage(j, "cannot write /dev/full: No space left on device");
    }

    @Test
    void anOutputFileIsReplacedWholeAndNoTemporaryFileStays() throws IOException {
        Path dir = Files.createDirectories(tmp.resolve("reports"));
        Path out = dir.resolve("switches.csv");
        Files.writeString(out, "an earlier export\n", StandardCharsets.UTF_8);
        CliRun r = CliRun.on(catalog, "export", "--kind", "switch", "--output", out.toString());
        assertEquals(ExitCode.OK, r.exit(), r.dump());
        assertTrue(Files.readString(out).startsWith("part_number,"), "the export replaced the earlier file");
        try (Stream<Path> files = Files.list(dir)) {
            assertEquals(List.of(out), files.toList(), "only the export is left in the folder");
        }
    }

    @Test
    void anOutputInAFolderThatCannotBeCreatedNamesTheFileAsTyped() throws IOException {
        Path blocker = Files.writeString(tmp.resolve("plain-file"), "x");
        String target = blocker.resolve("sub").resolve("out.csv").toString();
        CliRun r = CliRun.on(catalog, "export", "--kind", "switch", "--output", target);
        assertOneMessage(r, "cannot write " + target + ": ");
        assertFalse(r.err().contains(".tmp"), "no temporary name in the message: " + r.dump());
    }
}
