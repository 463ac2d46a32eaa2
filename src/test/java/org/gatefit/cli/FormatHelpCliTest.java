package org.gatefit.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.gatefit.report.Format;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;

/**
 * {@code --help} lists only the formats a command makes (issue 19: {@code validate --help} offered
 * html, which it refuses): html for the commands with an HTML report, never for the others; the
 * rebuilt option still sets the format.
 */
class FormatHelpCliTest {
    @TempDir
    Path tmp;

    @Test
    void eachCommandsHelpListsTheFormatsItMakes() {
        CommandLine all = Cli.create(new java.io.PrintWriter(new java.io.StringWriter()),
                new java.io.PrintWriter(new java.io.StringWriter()), Map.of(), CliRun.CLOCK, false, null, null);
        int withFormat = 0;
        for (String name : all.getSubcommands().keySet()) {
            CliRun r = CliRun.full(Map.of(), name, "--help");
            assertEquals(ExitCode.OK, r.exit(), r.dump());
            Matcher m = Pattern.compile("--format=FORMAT\\s+Output format: ([a-z, ]+) \\(default").matcher(r.out());
            if (!m.find()) {
                continue;
            }
            withFormat++;
            String listed = m.group(1);
            assertTrue(listed.startsWith("text, json, csv, markdown"), name + ": " + listed);
            assertEquals(Format.HTML_COMMANDS.contains(name), listed.contains("html"), name + ": " + listed);
        }
        assertTrue(withFormat >= 9, "commands with --format: " + withFormat);
    }

    @Test
    void validateStillTakesTheFormatsItListsAndRefusesHtml() {
        CliRun json = CliRun.on(tmp.resolve("c"), "validate", "--format", "json",
                Project.file("examples/stages.csv").toString());
        assertEquals(ExitCode.OK, json.exit(), json.dump());
        assertTrue(json.out().startsWith("{"), json.dump());
        CliRun html = CliRun.on(tmp.resolve("c"), "validate", "--format", "html",
                Project.file("examples/stages.csv").toString());
        assertEquals(ExitCode.USAGE, html.exit(), html.dump());
        assertTrue(html.err().contains("--format html is not available for validate"), html.dump());
    }
}
