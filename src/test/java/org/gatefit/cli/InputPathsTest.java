package org.gatefit.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Issue 14, finding 12 (input files): a folder given where a file is read is bad input (exit 3)
 * naming it; rejects into a folder that does not exist are refused (exit 2) naming the path as
 * typed, never a temporary file, and nothing is imported. Uses the invented example scenario.
 */
class InputPathsTest {
    @TempDir
    Path tmp;
    Path catalog;
    String before;

    @BeforeEach
    void project() throws IOException {
        for (String f : DemoCommand.FILES) {
            Files.copy(Project.file("examples/" + f), tmp.resolve(f));
        }
        Files.createDirectories(tmp.resolve("a-folder"));
        catalog = tmp.resolve("catalog");
        CliRun r = CliRun.on(catalog, "import", p("switches.csv"));
        assertEquals(ExitCode.OK, r.exit(), r.dump());
        before = CliRun.on(catalog, "info").out();
    }

    private String p(String name) {
        return tmp.resolve(name).toString();
    }

    static Stream<List<String>> folderAsInput() {
        return Stream.of(
                List.of("import", "@drivers.csv", "@a-folder"),
                List.of("import", "--skip-invalid", "@rejects.csv", "@a-folder"),
                List.of("validate", "@a-folder"),
                List.of("check", "@a-folder"),
                List.of("check", "@stages.csv", "--bom", "@a-folder"),
                List.of("replace", "CVL-1025TL", "--stages", "@a-folder"));
    }

    @ParameterizedTest
    @MethodSource("folderAsInput")
    void aFolderGivenAsAnInputFileIsBadInputNamingIt(List<String> raw) {
        CliRun r = CliRun.on(catalog, raw.stream().map(a -> a.startsWith("@") ? p(a.substring(1)) : a)
                .toArray(String[]::new));
        assertEquals(ExitCode.BAD_DATA, r.exit(), r.dump());
        assertEquals(p("a-folder") + ": this is a folder (expected a CSV file)\n", r.err());
        assertEquals(before, CliRun.on(catalog, "info").out(), "nothing imported");
    }

    @Test
    void rejectsIntoAMissingFolderNameThePathAsTypedAndImportNothing() throws IOException {
        String rejects = p("no-such-folder") + "/rejects.csv";
        CliRun r = CliRun.on(catalog, "import", "--skip-invalid", rejects, p("drivers.csv"));
        assertEquals(ExitCode.USAGE, r.exit(), r.dump());
        assertEquals("gatefit import: --skip-invalid " + rejects + ": the folder " + p("no-such-folder")
                + " does not exist (create it, or name a file in an existing folder); nothing was imported\n", r.err());
        assertFalse(r.err().contains(".rejects"), "no temporary file named");
        assertEquals(before, CliRun.on(catalog, "info").out(), "nothing imported");
        assertFalse(Files.exists(tmp.resolve("no-such-folder")));
    }

    @Test
    void rejectsIntoAnExistingFolderAreWritten() throws IOException {
        Path bad = Files.writeString(tmp.resolve("bad.csv"), Files.readString(tmp.resolve("drivers.csv"))
                .replaceFirst("\n([^,\n]*),", "\n$1-X,not-a-maker-column-shift,"));
        CliRun r = CliRun.on(catalog, "import", "--skip-invalid", p("a-folder/rejects.csv"), bad.toString());
        assertEquals(ExitCode.OK, r.exit(), r.dump());
        assertTrue(Files.size(tmp.resolve("a-folder/rejects.csv")) > 0, r.dump());
    }
}
