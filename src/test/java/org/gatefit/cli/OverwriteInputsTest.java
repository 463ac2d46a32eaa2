package org.gatefit.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import picocli.CommandLine;
import picocli.CommandLine.Model.ArgSpec;

/**
 * Issue 14, finding 6: an output option that names one of the command's input files (as typed,
 * through another spelling of the path, a symbolic link or a hard link), another output, a folder
 * or a file inside the catalog folder is refused with exit 2 before anything is written; every
 * file is left byte for byte as it was. Uses the invented example scenario.
 */
class OverwriteInputsTest {
    @TempDir
    Path tmp;
    Path catalog;
    /** Every file in the project folder, by name, with its bytes before the run. */
    final Map<Path, byte[]> before = new LinkedHashMap<>();

    @BeforeEach
    void project() throws IOException {
        for (String f : DemoCommand.FILES) {
            Files.copy(Project.file("examples/" + f), tmp.resolve(f));
        }
        catalog = tmp.resolve("catalog");
        CliRun r = CliRun.on(catalog, "import", p("switches.csv"), p("drivers.csv"));
        assertEquals(ExitCode.OK, r.exit(), r.dump());
        Files.createLink(tmp.resolve("bom-hardlink.csv"), tmp.resolve("bom.csv"));
        Files.createSymbolicLink(tmp.resolve("stages-link.csv"), tmp.resolve("stages.csv"));
        Files.createDirectories(tmp.resolve("reports"));
        try (Stream<Path> all = Files.walk(tmp)) {
            for (Path f : all.filter(Files::isRegularFile).toList()) {
                before.put(f, Files.readAllBytes(f));
            }
        }
    }

    private String p(String name) {
        return tmp.resolve(name).toString();
    }

    /** columns: the arguments after --catalog (file names relative to the project folder), a fragment of the message. */
    static Stream<List<String>> refused() {
        return Stream.of(
                List.of("check", "@stages.csv", "--output", "@stages.csv"),
                List.of("check", "@stages.csv", "--bom", "@bom.csv", "--junit", "@bom.csv"),
                List.of("check", "@stages.csv", "--bom", "@bom.csv", "--output", "@reports/../bom.csv"),
                List.of("check", "@stages.csv", "--bom", "@bom.csv", "--junit", "@bom-hardlink.csv"),
                List.of("check", "@stages-link.csv", "--output", "@stages.csv"),
                List.of("check", "@stages.csv", "--output", "@stages-link.csv"),
                List.of("check", "@stages.csv", "--output", "@reports/r.txt", "--junit", "@reports/./r.txt"),
                List.of("check", "@stages.csv", "--output", "@reports"),
                List.of("import", "--skip-invalid", "@switches.csv", "@drivers.csv", "@switches.csv"),
                List.of("import", "--skip-invalid", "@catalog/rejects.csv", "@switches.csv"),
                List.of("validate", "@switches.csv", "@drivers.csv", "--output", "@drivers.csv"),
                List.of("replace", "CVL-1025TL", "--stages", "@stages.csv", "--bom", "@bom.csv", "--output", "@bom.csv"),
                List.of("export", "--kind", "switch", "--output", "@catalog/segments_9"),
                List.of("find", "--kind", "switch", "--output", "@catalog/found.txt"),
                List.of("info", "--output", "@catalog"),
                List.of("check", "@stages.csv", "--catalog", "@catalog", "--output", "@stages.csv"));
    }

    private String[] args(List<String> raw) {
        List<String> out = new ArrayList<>(List.of("--catalog", catalog.toString()));
        for (String a : raw) {
            out.add(a.startsWith("@") ? p(a.substring(1)) : a);
        }
        return out.toArray(String[]::new);
    }

    @ParameterizedTest
    @MethodSource("refused")
    void anOutputThatWouldOverwriteAnInputIsRefusedBeforeAnythingIsWritten(List<String> raw) throws IOException {
        CliRun r = CliRun.raw(Map.of(), args(raw));
        assertEquals(ExitCode.USAGE, r.exit(), r.dump());
        assertTrue(r.err().contains("would overwrite the input file") || r.err().contains("are the same file")
                || r.err().contains("is a folder") || r.err().contains("inside the catalog folder"), r.dump());
        assertTrue(r.out().isEmpty(), r.dump());
        try (Stream<Path> all = Files.walk(tmp)) {
            List<Path> now = all.filter(Files::isRegularFile).toList();
            assertEquals(before.keySet().stream().sorted().toList(), now.stream().sorted().toList(), "no file added");
        }
        for (Map.Entry<Path, byte[]> e : before.entrySet()) {
            assertArrayEquals(e.getValue(), Files.readAllBytes(e.getKey()), e.getKey() + " is unchanged");
        }
    }

    @Test
    void theMessageNamesTheOptionAndTheInputAsTyped() {
        CliRun r = CliRun.raw(Map.of(), args(List.of("check", "@stages.csv", "--bom", "@bom.csv", "--junit",
                "@bom-hardlink.csv")));
        assertEquals("gatefit check: --junit " + p("bom-hardlink.csv") + " would overwrite the input file " + p("bom.csv")
                + "; name another file (nothing was written)\n", r.err());
    }

    @Test
    void outputsBesideTheInputsAreWritten() throws IOException {
        CliRun r = CliRun.raw(Map.of(), args(List.of("check", "@stages.csv", "--bom", "@bom.csv", "--output",
                "@reports/check.txt", "--junit", "@reports/check.xml")));
        assertEquals(ExitCode.FAILED, r.exit(), r.dump()); // the scenario's deliberate mistakes
        assertTrue(Files.size(tmp.resolve("reports/check.txt")) > 0 && Files.size(tmp.resolve("reports/check.xml")) > 0);
    }

    /** A new option naming a file must be declared an input or an output, or the check above cannot cover it. */
    @Test
    void everyFileOptionOfEveryCommandIsAnInputOrAnOutput() {
        CommandLine cl = Cli.create(new java.io.PrintWriter(new java.io.StringWriter()),
                new java.io.PrintWriter(new java.io.StringWriter()), Map.of(), CliRun.CLOCK);
        int files = 0;
        for (CommandLine sub : cl.getSubcommands().values()) {
            for (ArgSpec a : sub.getCommandSpec().args()) {
                boolean path = a.type() == Path.class || a.auxiliaryTypes().length > 0 && a.auxiliaryTypes()[0] == Path.class;
                if (path) {
                    String label = a instanceof CommandLine.Model.OptionSpec o ? o.longestName()
                            : ((CommandLine.Model.PositionalParamSpec) a).paramLabel();
                    assertTrue(FileArgs.INPUTS.contains(label) || FileArgs.OUTPUTS.contains(label)
                            || label.equals(FileArgs.CATALOG),
                            sub.getCommandName() + " " + label);
                    files++;
                }
            }
        }
        assertTrue(files >= 12, files + " file arguments");
    }
}
