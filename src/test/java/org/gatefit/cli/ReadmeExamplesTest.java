package org.gatefit.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The README's worked examples are what gatefit prints: every {@code $ gatefit …} line in a
 * {@code text} block of README.md is run, in order, against a catalog made by the README's own
 * import of the bundled example catalog, and every line shown under it must be printed
 * (messages, then results), in that order. The README may leave lines out (it shows a few stages
 * of a long check) but never shows a line gatefit does not print. A change to a rule, a figure or a
 * report therefore shows up here, and the README is re-run with it.
 */
class ReadmeExamplesTest {
    /** The catalog folder the README shows (the per-user default). */
    private static final String SHOWN_CATALOG = "~/.local/share/gatefit/catalog";

    @TempDir
    Path tmp;

    record Example(String command, String printed) {
    }

    static List<Example> examples(String readme) {
        List<Example> out = new ArrayList<>();
        Matcher block = Pattern.compile("```text\\n(.*?)```", Pattern.DOTALL).matcher(readme);
        while (block.find()) {
            String[] lines = block.group(1).split("\n", -1);
            String command = null;
            StringBuilder printed = new StringBuilder();
            for (String line : lines) {
                if (line.startsWith("$ gatefit ")) {
                    if (command != null) {
                        out.add(new Example(command, printed.toString().stripTrailing()));
                    }
                    command = line.substring("$ gatefit ".length());
                    printed.setLength(0);
                } else if (command != null) {
                    printed.append(line).append('\n');
                }
            }
            if (command != null) {
                out.add(new Example(command, printed.toString().stripTrailing()));
            }
        }
        return out;
    }

    /** Splits a command line as a shell would for these examples: spaces, and single-quoted words. */
    static List<String> words(String command) {
        List<String> w = new ArrayList<>();
        Matcher m = Pattern.compile("'([^']*)'|(\\S+)").matcher(command);
        while (m.find()) {
            w.add(m.group(1) != null ? m.group(1) : m.group(2));
        }
        return w;
    }

    /** Every non-blank line the README shows is printed, in the README's order. */
    private static void shownInOrder(Example e, String printed) {
        String[] got = printed.split("\n", -1);
        int at = 0;
        for (String want : e.printed().split("\n", -1)) {
            if (want.isBlank() || want.strip().equals("…")) {
                continue; // a blank line, or the README's mark for lines left out
            }
            while (at < got.length && !got[at].stripTrailing().equals(want.stripTrailing())) {
                at++;
            }
            if (at == got.length) {
                assertEquals(e.printed(), printed, "README example: gatefit " + e.command() + "\nshows a line not"
                        + " printed (or out of order): " + want);
            }
            at++;
        }
    }

    @Test
    void everyWorkedExamplePrintsWhatTheReadmeShows() throws Exception {
        String readme = Files.readString(Project.file("README.md"), StandardCharsets.UTF_8);
        List<Example> examples = examples(readme);
        assertTrue(examples.size() >= 5, "the README's worked examples: import, find, shortlist, explain, check, replace");
        assertTrue(examples.get(0).command().startsWith("import "), "the first example makes the catalog");
        Path catalog = tmp.resolve("catalog");
        for (Example e : examples) {
            List<String> args = words(e.command());
            for (int i = 0; i < args.size(); i++) {
                if (args.get(i).startsWith("examples/")) {
                    args.set(i, Project.file(args.get(i)).toString());
                }
            }
            CliRun r = CliRun.on(catalog, args.toArray(String[]::new));
            String printed = (r.err() + r.out()).replace(catalog.toString(), SHOWN_CATALOG)
                    .replace(Project.file("examples").toString(), "examples").stripTrailing();
            shownInOrder(e, printed);
        }
    }
}
