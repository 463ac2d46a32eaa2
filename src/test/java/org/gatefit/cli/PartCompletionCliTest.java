package org.gatefit.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeSet;
import java.util.stream.Collectors;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestInstance;
import org.junit.jupiter.api.io.TempDir;

/**
 * Shell completion of part numbers: the hidden {@code part-numbers} command answers from the
 * catalog, and the completion script, run in real bash, puts its answer into COMPREPLY. Expected
 * part numbers are read from the example CSV files themselves (Commons CSV), not from gatefit.
 */
@TestInstance(TestInstance.Lifecycle.PER_CLASS)
class PartCompletionCliTest {
    Path tmp;
    Path catalog;

    @BeforeAll
    void setUp(@TempDir Path dir) {
        tmp = dir;
        catalog = CliRun.examples(dir.resolve("cat"));
    }

    /** The part numbers of an example file starting with {@code prefix} (case not mattering), sorted. */
    private static List<String> examplePartsStartingWith(String file, String prefix) throws IOException {
        TreeSet<String> out = new TreeSet<>();
        try (CSVParser p = CSVParser.parse(Project.file("examples/" + file), StandardCharsets.UTF_8,
                CSVFormat.DEFAULT.builder().setHeader().setSkipHeaderRecord(true).get())) {
            for (CSVRecord r : p) {
                String pn = r.get("part_number").strip();
                if (pn.toUpperCase(Locale.ROOT).startsWith(prefix.toUpperCase(Locale.ROOT))) {
                    out.add(pn);
                }
            }
        }
        return List.copyOf(out);
    }

    private static String lines(List<String> parts) {
        return parts.stream().map(p -> p + "\n").collect(Collectors.joining());
    }

    @Test
    void partNumbersListsTheMatchingPartsOfTheKindOnePerLine() throws IOException {
        List<String> switches = examplePartsStartingWith("switches.csv", "CVL-10");
        assertTrue(switches.size() >= 3, "the examples have several CVL-10 switches: " + switches);
        for (String prefix : List.of("CVL-10", "cvl-10")) {
            CliRun r = CliRun.on(catalog, "part-numbers", "--kind", "switch", prefix);
            assertEquals(0, r.exit(), r.dump());
            assertEquals(lines(switches), r.out(), prefix);
            assertEquals("", r.err());
        }
        // Drivers only, and without --kind both kinds in one sorted list.
        List<String> drivers = examplePartsStartingWith("drivers.csv", "V");
        assertFalse(drivers.isEmpty());
        assertEquals(lines(drivers), CliRun.on(catalog, "part-numbers", "--kind", "driver", "V").out());
        TreeSet<String> both = new TreeSet<>(examplePartsStartingWith("drivers.csv", ""));
        both.addAll(examplePartsStartingWith("switches.csv", ""));
        assertEquals(lines(List.copyOf(both)), CliRun.on(catalog, "part-numbers").out());
        assertEquals("", CliRun.on(catalog, "part-numbers", "--kind", "driver", "CVL-10").out());
    }

    @Test
    void partNumbersPrintsNothingAndExitsZeroWithoutACatalog() {
        CliRun missing = CliRun.on(tmp.resolve("no-such-catalog"), "part-numbers", "--kind", "switch", "CVL");
        assertEquals(0, missing.exit(), missing.dump());
        assertEquals("", missing.out() + missing.err());
        // $GATEFIT_CATALOG is the catalog when the line names none.
        CliRun env = CliRun.raw(Map.of("GATEFIT_CATALOG", catalog.toString()), "part-numbers", "--kind", "switch",
                "CVL-10");
        assertEquals(0, env.exit(), env.dump());
        assertFalse(env.out().isEmpty(), env.dump());
    }

    @Test
    void partNumbersIsHiddenFromHelpAndFromCompletion() {
        assertFalse(CliRun.raw(Map.of(), "--help").out().contains("part-numbers"));
        String script = CliRun.raw(Map.of(), "completion").out();
        assertFalse(script.contains("_picocli_gatefit_part"), "no completion of the hidden command itself");
    }

    /** Every value labelled PART is completed with the right kind: a new one is found by its label. */
    @Test
    void everyPartValueOfTheCommandsIsCompleted() {
        List<String> got = new ArrayList<>();
        for (CompletionCommand.PartValue v : CompletionCommand.partValues(Cli.create(
                new java.io.PrintWriter(java.io.Writer.nullWriter()), new java.io.PrintWriter(java.io.Writer.nullWriter()),
                Map.of(), CliRun.CLOCK))) {
            got.add(v.command() + " " + (v.option().isEmpty() ? "PART" : String.join("|", v.option())) + " "
                    + (v.kind() == null ? "any" : v.kind().id()));
        }
        assertEquals(List.of("show PART any", "shortlist --switch switch", "explain --driver driver",
                "explain --switch switch", "replace PART any"), got);
    }

    /**
     * The completion script in real bash, with COMP_WORDS and COMP_CWORD as bash sets them for the
     * line. The script calls {@code gatefit} from the PATH; here that is a small wrapper running
     * this test's class path (no jar needs to be built for a unit test).
     */
    private String complete(Map<String, String> env, String... words) throws Exception {
        Path script = tmp.resolve("gatefit-completion.bash");
        if (!Files.exists(script)) {
            CliRun r = CliRun.raw(Map.of(), "completion");
            assertEquals(0, r.exit(), r.dump());
            Files.writeString(script, r.out(), StandardCharsets.UTF_8);
        }
        Path bin = tmp.resolve("bin");
        Path wrapper = bin.resolve("gatefit");
        if (!Files.exists(wrapper)) {
            Files.createDirectories(bin);
            String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
            Files.writeString(wrapper, "#!/bin/sh\nexec " + quote(java) + " -XX:TieredStopAtLevel=1 -Xshare:auto -cp "
                    + quote(System.getProperty("java.class.path")) + " org.gatefit.cli.Main \"$@\"\n");
            assertTrue(wrapper.toFile().setExecutable(true));
        }
        String array = java.util.Arrays.stream(words).map(PartCompletionCliTest::quote).collect(Collectors.joining(" "));
        String bash = "source " + quote(script.toString()) + " 2>/dev/null; COMP_WORDS=(" + array + "); COMP_CWORD="
                + (words.length - 1) + "; COMP_LINE=" + quote(String.join(" ", words)) + "; COMP_POINT=${#COMP_LINE};"
                + " _complete_gatefit gatefit " + quote(words[words.length - 1]) + " " + quote(words[words.length - 2])
                + " 2>/dev/null; printf '%s\\n' \"${COMPREPLY[@]}\"";
        ProcessBuilder pb = new ProcessBuilder("bash", "--norc", "-c", bash).redirectErrorStream(true);
        pb.environment().remove("GATEFIT_CATALOG");
        pb.environment().put("PATH", bin + java.io.File.pathSeparator + System.getenv("PATH"));
        pb.environment().putAll(env);
        Process p = pb.start();
        String got = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        assertEquals(0, p.waitFor(), got);
        return got.strip();
    }

    private static String quote(String s) {
        return "'" + s.replace("'", "'\\''") + "'";
    }

    @Test
    void bashCompletesSwitchPartNumbersFromGatefitCatalog() throws Exception {
        String want = String.join("\n", examplePartsStartingWith("switches.csv", "CVL-10"));
        assertEquals(want, complete(Map.of("GATEFIT_CATALOG", catalog.toString()), "gatefit", "shortlist", "--switch",
                "CVL-10"));
    }

    @Test
    void bashCompletesFromTheCatalogTheLineNamesAndByKind() throws Exception {
        // --catalog on the line wins over $GATEFIT_CATALOG (here a folder with no catalog).
        Map<String, String> elsewhere = Map.of("GATEFIT_CATALOG", tmp.resolve("empty").toString());
        assertEquals(String.join("\n", examplePartsStartingWith("drivers.csv", "VHM-44")), complete(elsewhere, "gatefit",
                "--catalog", catalog.toString(), "explain", "--switch", "CVL-1025TL", "--driver", "VHM-44"));
        // A positional part of either kind, narrowed by --kind on the line.
        assertEquals(String.join("\n", examplePartsStartingWith("switches.csv", "YSP-G6")), complete(elsewhere,
                "gatefit", "--catalog", catalog.toString(), "replace", "--kind", "switch", "YSP-G6"));
        // No catalog: nothing offered, nothing printed.
        assertEquals("", complete(elsewhere, "gatefit", "shortlist", "--switch", "CVL-10"));
    }
}
