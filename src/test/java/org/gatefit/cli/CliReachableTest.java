package org.gatefit.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code main} builds only the subcommands its arguments name (start-up): every answer must be the
 * one the full command line gives — help, versions, usage errors, misspelt commands, option values
 * that happen to be command names, and real work.
 */
class CliReachableTest {
    @TempDir
    Path tmp;

    @Test
    void namedCommandsOnlyOrAllWhenNoneIsNamed() {
        assertEquals(Set.of("shortlist"), Cli.reachable("--catalog", "x", "shortlist", "--switch", "A"));
        assertEquals(Set.of("find", "show"), Cli.reachable("--catalog", "find", "show", "TST-1"));
        Set<String> all = Cli.reachable("--help");
        assertEquals(15, all.size());
        assertEquals(all, Cli.reachable("shortlst"));
        assertEquals(all, Cli.reachable("completion"));
        assertEquals(all, Cli.reachable("demo"));
    }

    @Test
    void everyAnswerIsTheFullCommandLinesAnswer() throws Exception {
        Path cat = tmp.resolve("cat");
        CliRun.on(cat, "import", "examples/switches.csv", "examples/drivers.csv");
        String c = cat.toString();
        List<String[]> runs = List.of(
                new String[] {"--help"},
                new String[] {"--version"},
                new String[] {},
                new String[] {"shortlst"},
                new String[] {"shortlist", "--help"},
                new String[] {"find", "--help"},
                new String[] {"shortlist"},
                new String[] {"--catalog", c, "find", "--limit", "3"},
                new String[] {"--catalog", "find", "show", "x"},
                new String[] {"--catalog", c, "info"},
                new String[] {"--catalog", c, "shortlist", "--switch", "nope"},
                new String[] {"--catalog", c, "explain", "--help"});
        for (String[] args : runs) {
            CliRun full = CliRun.full(Map.of(), args);
            CliRun some = CliRun.raw(Map.of(), args);
            String what = String.join(" ", args).replace(c, "CAT");
            assertEquals(full.exit(), some.exit(), what);
            assertEquals(full.out(), some.out(), what);
            assertEquals(full.err(), some.err(), what);
        }
    }
}
