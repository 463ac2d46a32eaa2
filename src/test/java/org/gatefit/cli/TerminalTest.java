package org.gatefit.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestInstance;
import org.junit.jupiter.api.io.TempDir;

/** Colour, progress bars and completion: for a person at a terminal, never in pipes or files. */
@TestInstance(TestInstance.Lifecycle.PER_CLASS)
class TerminalTest {
    static final String ESC = "\u001b[";

    Path tmp;
    HtmlFixture fx;

    @BeforeAll
    void setUp(@TempDir Path dir) throws IOException {
        tmp = dir;
        fx = new HtmlFixture(dir.resolve("fx"));
    }

    /** Runs through {@link Cli#create} with captured streams, as a terminal or not. */
    private static CliRun run(boolean terminal, Map<String, String> env, String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        PrintWriter o = new PrintWriter(out, true);
        PrintWriter e = new PrintWriter(err, true);
        int code = Cli.create(o, e, env, CliRun.CLOCK, terminal).execute(args);
        o.flush();
        e.flush();
        return new CliRun(code, out.toString(), err.toString());
    }

    private List<String[]> textCommands() {
        String cat = fx.catalog.toString();
        List<String[]> cmds = new ArrayList<>();
        List<String> explain = new ArrayList<>(List.of("--catalog", cat, "explain", "--driver", "TST-D06B", "--switch",
                "TST-G650A"));
        explain.addAll(List.of(HtmlFixture.POINT));
        cmds.add(explain.toArray(String[]::new));
        List<String> shortlist = new ArrayList<>(List.of("--catalog", cat, "shortlist", "--switch", "TST-G650A", "--all"));
        shortlist.addAll(List.of(HtmlFixture.POINT));
        cmds.add(shortlist.toArray(String[]::new));
        cmds.add(new String[] {"--catalog", cat, "check", fx.stages.toString()});
        cmds.add(new String[] {"--catalog", cat, "replace", "TST-G650A", "--stages", fx.stages.toString()});
        cmds.add(new String[] {"--catalog", cat, "find"});
        return cmds;
    }

    @Test
    void colourCodesNeverReachAPipeAFileOrANoColorTerminal() throws IOException {
        for (String[] args : textCommands()) {
            CliRun piped = run(false, Map.of(), args);
            assertFalse(piped.out().contains(ESC) || piped.err().contains(ESC), String.join(" ", args) + piped.dump());
            CliRun noColor = run(true, Map.of("NO_COLOR", "1"), args);
            assertFalse(noColor.out().contains(ESC), "NO_COLOR: " + String.join(" ", args));
            Path file = tmp.resolve("out-" + args[2] + ".txt");
            List<String> withFile = new ArrayList<>(List.of(args));
            withFile.addAll(List.of("--output", file.toString()));
            CliRun toFile = run(true, Map.of(), withFile.toArray(String[]::new));
            assertFalse(Files.readString(file, StandardCharsets.UTF_8).contains(ESC), "--output: " + args[2]);
            assertFalse(toFile.out().contains(ESC));
        }
    }

    @Test
    void verdictsAreColouredOnATerminalWithTheirWordsKept() {
        List<String[]> cmds = textCommands();
        for (String[] args : cmds.subList(0, 3)) {
            CliRun tty = run(true, Map.of(), args);
            assertTrue(tty.out().contains(ESC), "colour on a terminal: " + args[2] + tty.dump());
            CliRun piped = run(false, Map.of(), args);
            assertEquals(piped.out(), tty.out().replaceAll("\u001b\\[[0-9;]*m", ""),
                    "colour only adds escape codes: " + args[2]);
        }
        CliRun check = run(true, Map.of(), cmds.get(2));
        assertTrue(check.out().contains("\u001b[1;31m✗ FAIL\u001b[0m"), check.dump());
    }

    @Test
    void textTablesFitOneHundredColumns() {
        for (String[] args : textCommands()) {
            CliRun r = run(false, Map.of(), args);
            // the command ran and printed its report (check exits 1 on the fixture's failing stage)
            assertTrue(r.exit() == ExitCode.OK || r.exit() == ExitCode.FAILED, r.dump());
            assertTrue(r.err().isEmpty(), r.dump());
            int widest = 0;
            for (String line : r.out().split("\n")) {
                int width = line.codePointCount(0, line.length());
                assertTrue(width <= 100, args[2] + ": " + width + ": " + line);
                widest = Math.max(widest, width);
            }
            // a report with lines near the limit: text was wrapped at 100 columns, not merely short
            assertTrue(widest >= 90, args[2] + ": widest line " + widest + "\n" + r.out());
        }
    }

    @Test
    void longImportsShowAProgressBarOnATerminalOnly() throws IOException {
        StringBuilder csv = new StringBuilder("part_number,maker,technology,v_block_v,v_gs_max_v,v_gs_min_v,q_g_nc\n");
        for (int i = 0; i < 2500; i++) {
            csv.append("TST-P").append(i).append(",Testmaker,si-mosfet,100,20,-20,50\n");
        }
        Path f = tmp.resolve("many.csv");
        Files.writeString(f, csv, StandardCharsets.UTF_8);
        CliRun tty = run(true, Map.of(), "--catalog", tmp.resolve("cat-tty").toString(), "import", f.toString());
        assertEquals(0, tty.exit(), tty.dump());
        assertTrue(tty.err().contains("\r[") && tty.err().contains("100 % 2500 / 2500 rows imported"), tty.dump());
        assertFalse(tty.out().contains("\r"), "the bar stays on standard error");
        CliRun piped = run(false, Map.of(), "--catalog", tmp.resolve("cat-pipe").toString(), "import", f.toString());
        assertEquals(0, piped.exit(), piped.dump());
        assertFalse(piped.err().contains("\r") || piped.err().contains("rows imported"), piped.dump());
    }

    /**
     * Bash's own programmable completion (the reference): the generated script, sourced in bash, offers
     * the fixed values of an option — each from the one place that defines them (the stage sheet's and
     * the driver schema's choices, the CSV styles).
     */
    @Test
    void bashCompletesTheValuesOfOptionsWithAFixedSet() throws Exception {
        CliRun r = run(false, Map.of(), "completion");
        assertEquals(0, r.exit(), r.dump());
        Path script = tmp.resolve("gatefit-completion.bash");
        Files.writeString(script, r.out(), StandardCharsets.UTF_8);
        String[][] asks = {{"explain", "--bridge", "", "yes no"}, {"shortlist", "--logic", "lvc",
            "lvcmos-3v3 lvcmos-2v5 lvcmos-1v8"}, {"shortlist", "--topology", "", "low-side high-side half-bridge isolated"},
            {"check", "--csv-style", "", "comma semicolon"}, {"explain", "--side", "", "low high"},
            {"shortlist", "--pwm", "active-", "active-high active-low"}};
        for (String[] a : asks) {
            String line = "gatefit " + a[0] + " " + a[1] + " " + a[2];
            String bash = "source '" + script + "' 2>/dev/null; COMP_WORDS=(gatefit " + a[0] + " " + a[1] + " '" + a[2]
                    + "'); COMP_CWORD=3; COMP_LINE='" + line + "'; COMP_POINT=${#COMP_LINE}; _complete_gatefit gatefit '"
                    + a[2] + "' " + a[1] + " 2>/dev/null; echo \"${COMPREPLY[@]}\"";
            Process p = new ProcessBuilder("bash", "-c", bash).redirectErrorStream(true).start();
            String got = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8).strip();
            assertEquals(0, p.waitFor(), got);
            assertEquals(a[3], got, line);
        }
    }

    @Test
    void completionPrintsABashScriptCoveringTheCommandsAndOptions() {
        CliRun r = run(false, Map.of(), "completion");
        assertEquals(0, r.exit(), r.dump());
        assertTrue(r.out().startsWith("#!/usr/bin/env bash"), r.out().substring(0, 40));
        for (String word : List.of("complete -F", "shortlist", "explain", "replace", "--format", "--switch", "completion")) {
            assertTrue(r.out().contains(word), word);
        }
    }
}
